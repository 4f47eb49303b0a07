import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import { Ajv } from 'ajv';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { ACTION_REPOSITORY, ACTION_USES, MAJOR_TAG } from '../../src/core/home.js';
import {
  renderStarterPolicy,
  starterGlob,
  workflowPaths,
  type FoundConfig,
} from '../../src/core/init/starter-policy.js';
import { forkWorkflows, simpleWorkflow } from '../../src/core/init/workflows.js';
import { inspectModel } from '../../src/core/inspect.js';
import { parsePolicy } from '../../src/core/policy/index.js';
import { publishedReportSchema } from '../../src/core/report/schema.js';
import { VERSION } from '../../src/core/version.js';
import { checkpointConfig } from '../support/scenario-repo.js';
// @ts-expect-error: a plain ES module script without types
import { releaseNotes } from '../../scripts/changelog-notes.mjs';

const ROOT = resolve(import.meta.dirname, '../..');
const read = (path: string) => readFileSync(resolve(ROOT, path), 'utf8');
const { validateAction, validateWorkflow } = createRequire(import.meta.url)(
  '@action-validator/core',
) as {
  validateAction: (src: string) => { errors: unknown[] };
  validateWorkflow: (src: string) => { errors: unknown[] };
};
const MODELS = ['models/**', '.github/context-reach.yml'];

/** The README's fenced yaml blocks whose first line names `path`. */
function readmeBlocks(path: string): string[] {
  return [...read('README.md').matchAll(/```yaml\n([\s\S]*?)```/g)]
    .map((m) => m[1]!)
    .filter((block) => block.startsWith(`# ${path}\n`))
    .map((block) => block.slice(`# ${path}\n`.length));
}

/** The starter policy with its commented `limits:` block (from `# limits:` to the blank line) uncommented. */
function uncommentLimits(text: string): string {
  let inside = false;
  return text
    .split('\n')
    .map((line) => {
      if (line === '# limits:') inside = true;
      else if (line === '') inside = false;
      return inside ? line.replace(/^# /, '') : line;
    })
    .join('\n');
}

function found(path: string, overrides: Record<string, unknown> = {}): FoundConfig {
  const report = inspectModel(checkpointConfig(overrides), path);
  return { path, dialect: report.dialect, spec: report.spec };
}

describe('the workflows init writes, the README shows and the project ships', () => {
  it("are one text: the README's simple recipe and the fork recipe, and .github/workflows", () => {
    const simple = simpleWorkflow(MODELS);
    const [gate, publish] = forkWorkflows(MODELS);
    expect(readmeBlocks(simple.path)).toEqual([simple.text, gate!.text]);
    expect(readmeBlocks(publish!.path)).toEqual([publish!.text]);
    expect(read('.github/workflows/context-reach.yml')).toBe(gate!.text);
    expect(read('.github/workflows/context-reach-publish.yml')).toBe(publish!.text);
  });

  it("name the action at the real major tag of this version, as package.json's repository", () => {
    expect(MAJOR_TAG).toBe(`v${VERSION.split('.')[0]}`);
    expect(JSON.parse(read('package.json')).repository.url).toBe(
      `git+https://github.com/${ACTION_REPOSITORY}.git`,
    );
    const uses = [...read('README.md').matchAll(/uses: ([\w.-]+\/context-reach)@(\S+)/g)];
    expect(uses.length).toBeGreaterThanOrEqual(3);
    for (const [, repo, ref] of uses.filter(([, , r]) => !r!.startsWith('<')))
      expect(`${repo}@${ref}`).toBe(ACTION_USES);
    expect(read('README.md')).toMatch(/pin the full commit id/i);
  });

  it('pass the workflow validator, for found folders, top-level files and none', () => {
    for (const paths of [
      MODELS,
      workflowPaths([found('config.json'), found('models/a/config.json')]),
      null,
    ]) {
      for (const file of [simpleWorkflow(paths), ...forkWorkflows(paths)])
        expect(validateWorkflow(file.text).errors, file.path).toEqual([]);
    }
    for (const name of ['context-reach.yml', 'context-reach-publish.yml', 'release.yml']) {
      expect(validateWorkflow(read(`.github/workflows/${name}`)).errors, name).toEqual([]);
    }
  });

  it('are checked by a validator that does reject a broken workflow and a broken action', () => {
    expect(
      validateWorkflow(simpleWorkflow(MODELS).text.replace('runs-on:', 'runs_on:')).errors.length,
    ).toBeGreaterThan(0);
    expect(
      validateAction(read('action.yml').replace('description:', 'summary:')).errors.length,
    ).toBeGreaterThan(0);
  });
});

describe('the starter policy', () => {
  const two = [
    found('models/a/config.json'),
    found('models/b/model.reach.yaml'.replace('model.reach.yaml', 'config.json'), {
      max_position_embeddings: 8192,
    }),
  ];

  it('starts with the schema comment, picks the found folders, and infers the shared weight format', () => {
    const text = renderStarterPolicy(two);
    expect(text.split('\n')[0]).toBe(
      `# yaml-language-server: $schema=https://raw.githubusercontent.com/${ACTION_REPOSITORY}/${MAJOR_TAG}/schema/policy.schema.json`,
    );
    const policy = parseYaml(text);
    expect(policy).toEqual({
      files: ['models/**/config.json'],
      serving: { weights: 'bf16' },
      standing: 'report',
    });
    expect(parsePolicy(text, '.github/context-reach.yml').files).toEqual(['models/**/config.json']);
  });

  it('validates against schema/policy.schema.json as written and with every commented limit uncommented', () => {
    const validate = new Ajv({ strict: false, allErrors: true }).compile(
      JSON.parse(read('schema/policy.schema.json')),
    );
    for (const configs of [
      two,
      [],
      [found('models/a/config.json'), found('models/c/config.json', { torch_dtype: 'float32' })],
    ]) {
      const text = renderStarterPolicy(configs);
      expect(validate(parseYaml(text)), JSON.stringify(validate.errors)).toBe(true);
      const limits = uncommentLimits(text);
      const uncommented = parseYaml(limits);
      expect(Object.keys(uncommented.limits ?? {}).length, limits).toBeGreaterThanOrEqual(5);
      expect(validate(uncommented), JSON.stringify(validate.errors)).toBe(true);
      expect(() => parsePolicy(limits, '.github/context-reach.yml')).not.toThrow();
    }
  });

  it('leaves serving unset when the configs disagree, and keeps a file name with a newline inside a comment', () => {
    const text = renderStarterPolicy([
      found('models/a/config.json'),
      found('models/evil\nstanding: block/config.json', { torch_dtype: 'float32' }),
    ]);
    const policy = parseYaml(text);
    expect(policy.serving).toBeUndefined();
    expect(policy.standing).toBe('report');
  });

  it("uses the built-in glob a config's name matches, under its top folder", () => {
    expect(starterGlob('models/x/config.json')).toBe('models/**/config.json');
    expect(starterGlob('serving/x/tiny.reach.yaml')).toBe('serving/**/*.reach.{yaml,yml,json}');
    expect(starterGlob('cfg/big-model.yml')).toBe('cfg/**/*model*.{json,yaml,yml}');
    expect(starterGlob('config.json')).toBe('**/config.json');
    expect(workflowPaths([found('serving/x/config.json'), found('models/y/config.json')])).toEqual([
      'models/**',
      'serving/**',
      '.github/context-reach.yml',
    ]);
  });
});

describe('releases', () => {
  it('have a CHANGELOG in keep-a-changelog shape with a dated section for this version', () => {
    const changelog = read('CHANGELOG.md');
    expect(changelog).toMatch(/^# Changelog\n/);
    expect(changelog).toContain('## [Unreleased]');
    expect(changelog).toMatch(
      new RegExp(`^## \\[${VERSION.replace(/\./g, '\\.')}\\] - \\d{4}-\\d{2}-\\d{2}$`, 'm'),
    );
    expect(changelog).toMatch(new RegExp(`^\\[${VERSION.replace(/\./g, '\\.')}\\]: https://`, 'm'));
    const notes = releaseNotes(changelog, VERSION) as string;
    expect(notes).toMatch(/^### Added\n/);
    expect(notes).not.toContain('## [');
    expect(releaseNotes(changelog, '0.0.0')).toBeNull();
  });

  it('run from a version tag: tag check, fresh dist, tests, notes, release, the major tag moved', () => {
    const workflow = parseYaml(read('.github/workflows/release.yml'));
    expect(workflow.on.push.tags).toEqual(['v[0-9]+.[0-9]+.[0-9]+']);
    expect(workflow.permissions).toEqual({ contents: 'write' });
    const runs = (workflow.jobs.release.steps as { run?: string }[])
      .map((s) => s.run ?? '')
      .join('\n');
    const order = [
      'package.json").version',
      'npm run build',
      'git diff --exit-code',
      'npm test',
      'scripts/changelog-notes.mjs',
      'gh release create',
      'git push --force origin "refs/tags/${major}"',
    ];
    const at = order.map((needle) => runs.indexOf(needle));
    expect(
      at.every((i) => i >= 0),
      JSON.stringify(at),
    ).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
  });

  it("give action.yml branding from GitHub's allowed colours", () => {
    const { branding } = parseYaml(read('action.yml'));
    expect([
      'white',
      'black',
      'yellow',
      'blue',
      'green',
      'orange',
      'red',
      'purple',
      'gray-dark',
    ]).toContain(branding.color);
    expect(branding.icon).toMatch(/^[a-z0-9-]+$/);
  });

  it("publish schema/report.schema.json exactly as the code's report schema (npm run build writes it)", () => {
    expect(JSON.parse(read('schema/report.schema.json'))).toEqual(publishedReportSchema());
  });
});
