import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { FORK_NOTICE } from '../../src/action/run-action.js';

// The fork-safe recipe as the repository ships it (.github/workflows) and as the README shows it:
// the same text, the least permissions, no checkout or script in the privileged workflow; and
// the dependencies pinned by the lockfile that dist/ is built from.

const ROOT = resolve(import.meta.dirname, '../..');
const read = (path: string) => readFileSync(resolve(ROOT, path), 'utf8');
const GATE = '.github/workflows/context-reach.yml';
const PUBLISH = '.github/workflows/context-reach-publish.yml';

interface Step {
  uses?: string;
  run?: string;
  if?: string;
  // GitHub Actions gives a step's inputs as scalars.
  with?: Record<string, string | number | boolean>;
}
interface Workflow {
  name: string;
  on: Record<string, unknown>;
  permissions: Record<string, string>;
  jobs: Record<string, { if?: string; steps: Step[] }>;
}

const gate = parse(read(GATE)) as Workflow;
const publish = parse(read(PUBLISH)) as Workflow;
const steps = (w: Workflow) => Object.values(w.jobs).flatMap((job) => job.steps);
const action = (w: Workflow) => steps(w).find((s) => s.uses?.includes('context-reach'))!;

describe('the example workflows (.github/workflows)', () => {
  it('the gate runs on pull_request (never pull_request_target) with read-only permissions', () => {
    expect(Object.keys(gate.on)).toEqual(['pull_request']);
    expect(gate.permissions).toEqual({ contents: 'read', 'pull-requests': 'read' });
    expect(action(gate).with).toMatchObject({
      comment: 'off',
      'report-json': 'context-reach/report.json',
    });
    const checkout = steps(gate).find((s) => s.uses?.startsWith('actions/checkout'))!;
    expect(checkout.with).toMatchObject({ 'fetch-depth': 0, 'persist-credentials': false });
    const upload = steps(gate).find((s) => s.uses?.startsWith('actions/upload-artifact'))!;
    expect(upload).toMatchObject({
      if: 'always()',
      with: { name: 'context-reach-json', path: 'context-reach/report.json' },
    });
    expect(read(GATE)).not.toMatch(/secrets\./);
  });

  it('the publish workflow runs after the gate, with only actions: read and pull-requests: write', () => {
    expect(publish.on).toEqual({ workflow_run: { workflows: [gate.name], types: ['completed'] } });
    expect(publish.permissions).toEqual({ actions: 'read', 'pull-requests': 'write' });
    expect(Object.values(publish.jobs)[0]!.if).toBe(
      "github.event.workflow_run.event == 'pull_request'",
    );
  });

  it('the publish workflow checks out nothing and runs no script: the artifact is its only input, as data', () => {
    for (const step of steps(publish)) {
      expect(step.run).toBeUndefined();
      expect(step.uses).not.toMatch(/^actions\/checkout|^\.\//);
    }
    expect(read(PUBLISH)).not.toMatch(/head_sha|head_branch|head\.ref|head\.sha|secrets\./);
    const download = steps(publish).find((s) => s.uses?.startsWith('actions/download-artifact'))!;
    expect(download.with).toMatchObject({
      name: 'context-reach-json',
      'run-id': '${{ github.event.workflow_run.id }}',
    });
    expect(action(publish).with).toEqual({
      'publish-report': `${download.with!.path}/report.json`,
    });
  });

  it('are in the README word for word, under "Pull requests from forks", which the fork notice names', () => {
    const readme = read('README.md');
    const section = readme.slice(readme.indexOf('### Pull requests from forks'));
    expect(section).toContain(`\`\`\`yaml\n# ${GATE}\n${read(GATE)}\`\`\``);
    expect(section).toContain(`\`\`\`yaml\n# ${PUBLISH}\n${read(PUBLISH)}\`\`\``);
    expect(FORK_NOTICE).toContain('("Pull requests from forks")');
    expect(readme).toMatch(/^## Permissions and security$/m);
    expect(readme).toContain(
      "Never check out and run the head's code under `pull_request_target`.",
    );
  });

  it("the README's generated inputs table has publish-report (from action.yml)", () => {
    const action = parse(read('action.yml')) as { inputs: Record<string, { description: string }> };
    expect(action.inputs['publish-report']!.description).toContain('workflow_run');
    expect(read('README.md')).toMatch(/^\| `publish-report` +\| Publish mode/m);
  });
});

describe('the dependencies', () => {
  const lock = JSON.parse(read('package-lock.json')) as {
    lockfileVersion: number;
    packages: Record<
      string,
      {
        version?: string;
        integrity?: string;
        dev?: boolean;
        link?: boolean;
        dependencies?: Record<string, string>;
        devDependencies?: Record<string, string>;
      }
    >;
  };
  const pkg = JSON.parse(read('package.json')) as {
    dependencies: Record<string, string>;
    devDependencies: Record<string, string>;
  };

  it('are pinned by package-lock.json: an exact version and a sha512 integrity for every package', () => {
    expect(lock.lockfileVersion).toBeGreaterThanOrEqual(2);
    const entries = Object.entries(lock.packages).filter(([path]) => path !== '');
    expect(entries.length).toBeGreaterThan(50);
    for (const [path, entry] of entries) {
      if (entry.link) continue;
      expect(entry.version, path).toMatch(/^\d+\.\d+\.\d+/);
      expect(entry.integrity, path).toMatch(/^sha512-[A-Za-z0-9+/]+={0,2}$/);
    }
  });

  it('the lockfile holds exactly the dependencies package.json asks for, and CI installs from it (npm ci)', () => {
    expect(lock.packages['']!.dependencies).toEqual(pkg.dependencies);
    expect(lock.packages['']!.devDependencies).toEqual(pkg.devDependencies);
    for (const name of Object.keys(pkg.dependencies))
      expect(lock.packages[`node_modules/${name}`]?.dev, name).not.toBe(true);
    expect(read('.ci/run')).toMatch(/^npm ci\b/m);
  });
});
