import { execFile } from 'node:child_process';
import {
  chmodSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { delimiter, dirname, join, resolve } from 'node:path';
import { Ajv } from 'ajv';
import { parse as parseYaml } from 'yaml';
import { afterAll, describe, expect, it } from 'vitest';
import { checkpointConfig } from '../support/scenario-repo.js';
// @ts-expect-error: a plain ES module script without types
import { buildInputs } from '../../scripts/build-inputs.mjs';

// The package as a user gets it: packed with `npm pack` (after checking dist/ was built from
// these sources, so an old dist/ is never tested), installed from the tarball into an empty
// folder, run with npx. Dependencies come from the registry or npm's cache (`--prefer-offline`);
// the bundles need none of them at run time.
const ROOT = resolve(import.meta.dirname, '../..');
const PACKAGE = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as {
  name: string;
  version: string;
  bin: Record<string, string>;
};
const { validateWorkflow } = createRequire(import.meta.url)('@action-validator/core') as {
  validateWorkflow: (src: string) => { errors: unknown[] };
};

/** The environment without npm's variables of the run that started the tests (they would steer the nested npm). */
const ENV: Record<string, string> = Object.fromEntries(
  Object.entries(process.env).filter(
    (entry): entry is [string, string] => entry[1] !== undefined && !/^npm_/i.test(entry[0]),
  ),
);
ENV.NO_COLOR = '1';

interface Ran {
  code: number;
  stdout: string;
  stderr: string;
}

function sh(
  command: string,
  args: string[],
  cwd: string,
  env: Record<string, string> = ENV,
): Promise<Ran> {
  return new Promise((done) => {
    execFile(
      command,
      args,
      { cwd, env, maxBuffer: 64 * 1024 * 1024, timeout: 300_000 },
      (error, stdout, stderr) => {
        done({
          code: error
            ? typeof (error as { code?: unknown }).code === 'number'
              ? (error as { code: number }).code
              : -1
            : 0,
          stdout,
          stderr,
        });
      },
    );
  });
}

async function must(command: string, args: string[], cwd: string): Promise<string> {
  const ran = await sh(command, args, cwd);
  if (ran.code !== 0)
    throw new Error(`${command} ${args.join(' ')} exited ${ran.code}: ${ran.stderr || ran.stdout}`);
  return ran.stdout;
}

const git = (cwd: string, ...args: string[]) =>
  must(
    'git',
    [
      '-c',
      'user.name=test',
      '-c',
      'user.email=test@example.invalid',
      '-c',
      'commit.gpgsign=false',
      ...args,
    ],
    cwd,
  );

function write(dir: string, path: string, text: string): void {
  mkdirSync(dirname(join(dir, path)), { recursive: true });
  writeFileSync(join(dir, path), text);
}

const work = mkdtempSync(join(tmpdir(), 'context-reach-package-'));
const installed = join(work, 'installed');
const repo = join(installed, 'repo');
let ready = false;
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('the packed package, installed from its tarball', () => {
  it('packs, installs, and then init in a fresh repository writes a valid policy and diff judges a changed config', async () => {
    // The committed or freshly built dist/, never an older one: its fingerprint must be the sources'.
    const built = JSON.parse(readFileSync(join(ROOT, 'dist/build-info.json'), 'utf8')) as {
      inputs: string;
    };
    expect(built.inputs, 'dist/ was built from other sources: run npm run build').toBe(
      buildInputs(ROOT),
    );
    const packed = JSON.parse(
      await must('npm', ['pack', '--json', '--pack-destination', work], ROOT),
    ) as { filename: string; files: { path: string }[] }[];
    const shipped = packed[0]!.files.map((f) => f.path);
    expect(
      shipped.every((path) => /^(dist\/|schema\/|README\.md$|LICENSE$|package\.json$)/.test(path)),
      shipped.join(', '),
    ).toBe(true);
    expect(shipped).toEqual(
      expect.arrayContaining([
        'dist/cli.js',
        'dist/index.js',
        'dist/build-info.json',
        'dist/fixtures/demo/head/models/quill-8b/config.json',
        'schema/policy.schema.json',
        'schema/report.schema.json',
        'LICENSE',
        'README.md',
      ]),
    );

    mkdirSync(installed);
    await must(
      'npm',
      ['install', '--prefer-offline', '--no-audit', '--no-fund', join(work, packed[0]!.filename)],
      installed,
    );
    expect(readdirSync(join(installed, 'node_modules', PACKAGE.name)).sort()).toEqual([
      'LICENSE',
      'README.md',
      'dist',
      'package.json',
      'schema',
    ]);
    ready = true;

    // A fresh repository with two model configs.
    mkdirSync(repo);
    await git(repo, 'init', '--quiet', '--initial-branch=main');
    write(repo, 'models/quill-a/config.json', checkpointConfig());
    write(
      repo,
      'models/quill-b/config.json',
      checkpointConfig({ max_position_embeddings: 8192, num_key_value_heads: 8 }),
    );
    await git(repo, 'add', '--all');
    await git(repo, 'commit', '--quiet', '-m', 'two models');

    const init = await sh('npx', ['--no-install', 'context-reach', 'init'], repo);
    expect(init.code, init.stderr).toBe(0);
    expect(init.stdout).toContain('2 model configs found');
    expect(init.stdout).toMatch(/wrote\s+\.github\/context-reach\.yml/);
    expect(init.stdout).toMatch(/verdict now: ok/);
    expect(init.stdout).toMatch(/Next:/);

    const policyText = readFileSync(join(repo, '.github/context-reach.yml'), 'utf8');
    expect(policyText.split('\n')[0]).toMatch(
      /^# yaml-language-server: \$schema=https:\/\/\S+\/schema\/policy\.schema\.json$/,
    );
    const schema = JSON.parse(
      readFileSync(
        join(installed, 'node_modules', PACKAGE.name, 'schema/policy.schema.json'),
        'utf8',
      ),
    );
    const validate = new Ajv({ strict: false, allErrors: true }).compile(schema);
    const policy = parseYaml(policyText);
    expect(validate(policy), JSON.stringify(validate.errors)).toBe(true);
    expect(policy.files).toEqual(['models/**/config.json']);
    expect(policy.serving).toEqual({ weights: 'bf16' }); // both configs state torch_dtype bfloat16
    const workflow = readFileSync(join(repo, '.github/workflows/context-reach.yml'), 'utf8');
    expect(validateWorkflow(workflow).errors).toEqual([]);

    await git(repo, 'add', '--all');
    await git(repo, 'commit', '--quiet', '-m', 'context-reach policy and workflow');
    // The change a pull request would make: a longer span with the position code unchanged.
    write(repo, 'models/quill-a/config.json', checkpointConfig({ max_position_embeddings: 32768 }));
    const diff = await sh('npx', ['--no-install', 'context-reach', 'diff'], repo);
    expect(diff.code, diff.stderr).toBe(1);
    expect(diff.stdout).toMatch(/context-reach BLOCK: 1 blocking/);
    expect(diff.stdout).toContain('models/quill-a/config.json');
    expect(diff.stdout).toContain('span-grew-code-unchanged');
  }, 900_000);

  it('prints the package version with --version', async () => {
    expect(ready).toBe(true);
    const ran = await sh('npx', ['--no-install', 'context-reach', '--version'], installed);
    expect(ran).toMatchObject({ code: 0, stdout: `context-reach ${PACKAGE.version}\n` });
  }, 120_000);

  it('runs inspect and carries the tool version in its JSON', async () => {
    expect(ready).toBe(true);
    write(installed, 'one/config.json', checkpointConfig());
    const ran = await sh(
      'npx',
      ['--no-install', 'context-reach', 'inspect', '--json', 'one/config.json'],
      installed,
    );
    expect(ran.code, ran.stderr).toBe(0);
    const doc = JSON.parse(ran.stdout);
    expect(doc.toolVersion).toBe(PACKAGE.version);
    expect(doc.files[0].metrics.declaredSpan).toBe(4096);
  }, 120_000);

  it('runs the demo, whose JSON report validates against the published report schema', async () => {
    expect(ready).toBe(true);
    const text = await sh('npx', ['--no-install', 'context-reach', 'demo'], installed);
    expect(text.code, text.stderr).toBe(0);
    expect(text.stdout).toMatch(/verdict: block/);
    const json = await sh(
      'npx',
      ['--no-install', 'context-reach', 'demo', '--format', 'json'],
      installed,
    );
    const report = JSON.parse(json.stdout);
    expect(report.toolVersion).toBe(PACKAGE.version);
    const schema = JSON.parse(
      readFileSync(
        join(installed, 'node_modules', PACKAGE.name, 'schema/report.schema.json'),
        'utf8',
      ),
    );
    const validate = new Ajv({
      strict: true,
      strictRequired: false,
      allowUnionTypes: true,
    }).compile(schema);
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
  }, 120_000);

  it("stops a push of a blocking change with the README's pre-push hook, and lets the fixed one through", async () => {
    expect(ready).toBe(true);
    const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
    const block =
      /<!-- pre-push-hook:start -->\s*```sh\n([\s\S]*?)```\s*<!-- pre-push-hook:end -->/.exec(
        readme,
      );
    expect(block, "the README's hook snippet between its markers").not.toBeNull();
    const remote = join(work, 'remote.git');
    await git(work, 'init', '--quiet', '--bare', '--initial-branch=main', remote);
    await git(repo, 'checkout', '--quiet', '--', '.');
    await git(repo, 'remote', 'add', 'origin', remote);
    await git(repo, 'push', '--quiet', '-u', 'origin', 'main');
    write(repo, '.git/hooks/pre-push', block![1]!);
    chmodSync(join(repo, '.git/hooks/pre-push'), 0o755);

    write(
      repo,
      'models/quill-b/config.json',
      checkpointConfig({ max_position_embeddings: 65536, num_key_value_heads: 8 }),
    );
    await git(repo, 'commit', '--quiet', '-am', 'serve quill-b at 64k');
    const refused = await sh('git', ['push', 'origin', 'main'], repo);
    expect(refused.code).not.toBe(0);
    expect(refused.stdout + refused.stderr).toMatch(/BLOCK/);
    expect(await git(repo, 'rev-parse', 'origin/main')).not.toBe(
      await git(repo, 'rev-parse', 'HEAD'),
    );

    write(
      repo,
      'models/quill-b/config.json',
      checkpointConfig({ max_position_embeddings: 8192, num_key_value_heads: 8 }),
    );
    await git(repo, 'commit', '--quiet', '-am', 'back to 8k');
    const pushed = await sh('git', ['push', 'origin', 'main'], repo);
    expect(pushed.code, pushed.stderr).toBe(0);
  }, 300_000);

  it("runs the hook manager's manifest entry (.pre-commit-hooks.yaml) as the manager would, with no file names", async () => {
    expect(ready).toBe(true);
    const [hook] = parseYaml(readFileSync(join(ROOT, '.pre-commit-hooks.yaml'), 'utf8')) as Record<
      string,
      unknown
    >[];
    expect(hook).toMatchObject({
      id: 'context-reach',
      language: 'node',
      pass_filenames: false,
      stages: ['pre-push'],
    });
    const [command, ...args] = String(hook!.entry).split(' ');
    expect(Object.keys(PACKAGE.bin)).toContain(command);
    // The manager installs the package and puts its bin folder on PATH; the install above has the same.
    const env = {
      ...ENV,
      PATH: `${join(installed, 'node_modules', '.bin')}${delimiter}${ENV.PATH ?? ''}`,
    };
    const clean = await sh(command!, args, repo, env);
    expect(clean.code, clean.stderr).toBe(0);
    write(repo, 'models/quill-a/config.json', checkpointConfig({ max_position_embeddings: 32768 }));
    const blocked = await sh(command!, args, repo, env);
    expect(blocked.code).toBe(1);
    expect(blocked.stdout).toMatch(/BLOCK/);
  }, 120_000);
});
