import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { METRIC_PATHS } from '../../src/core/metrics/metric-path.js';
import { checkpointConfig, scenarioRepo } from '../support/scenario-repo.js';
import { freshBundle } from '../support/fresh-bundle.js';

// The committed bundle, run as a user would: `node dist/cli.js …`.
const CLI = resolve(import.meta.dirname, '../../dist/cli.js');
const ROOT = resolve(import.meta.dirname, '../..');
const run = promisify(execFile);

async function cli(
  args: string[],
  cwd = ROOT,
): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, [freshBundle(CLI), ...args], {
      cwd,
      env: { ...process.env, NO_COLOR: '1' },
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

/** Folders `tempFile` made, removed when the file's tests end. */
const folders: string[] = [];
afterAll(() => {
  for (const folder of folders) rmSync(folder, { recursive: true, force: true });
});

function tempFile(name: string, text: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'context-reach-cli-'));
  folders.push(dir);
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

describe('context-reach inspect', () => {
  it('prints one JSON document with every metric of the contract for each file', async () => {
    const { code, stdout } = await cli([
      'inspect',
      '--json',
      'fixtures/demo/head/models/quill-8b/config.json',
      'fixtures/demo/head/models/quill-mini/model.reach.yaml',
    ]);
    expect(code).toBe(0);
    const doc = JSON.parse(stdout);
    expect(doc.version).toBe(1);
    expect(doc.files.map((f: { dialect: string }) => f.dialect)).toEqual([
      'checkpoint',
      'context-reach',
    ]);
    for (const file of doc.files) {
      for (const metric of METRIC_PATHS) {
        const value = metric.startsWith('precision.')
          ? file.metrics.precision[metric.split('.')[1]!][metric.split('.')[2]!]
          : file.metrics[metric];
        expect(value === null || typeof value === 'number', metric).toBe(true);
      }
      // Blocking findings also carry their remedy (issue 6); the others are exactly the five keys.
      for (const finding of file.findings) {
        expect(Object.keys(finding)).toEqual(
          finding.severity === 'block'
            ? [
                'rule',
                'severity',
                'message',
                'key',
                'line',
                'remedy',
                'remedyWhyNot',
                'remedyAlternatives',
              ]
            : ['rule', 'severity', 'message', 'key', 'line'],
        );
      }
    }
  });

  it('groups the readable report as range, spectrum, number formats, budget, findings', async () => {
    const { code, stdout } = await cli([
      'inspect',
      'fixtures/demo/head/models/quill-mini/model.reach.yaml',
    ]);
    expect(code).toBe(0);
    const order = ['Range', 'Spectrum', 'Number formats', 'Budget', 'Findings'].map((h) =>
      stdout.indexOf(`  ${h}`),
    );
    expect(order.every((i) => i > 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    expect(stdout).toContain('not a guarantee of model quality');
    expect(stdout).not.toContain('\u001b['); // no colour when not on a terminal
  });

  it('applies serving flags over the file', async () => {
    const { stdout } = await cli([
      'inspect',
      '--json',
      '--served-span',
      '4096',
      '--cache-dtype',
      'fp8',
      'fixtures/demo/head/models/quill-8b/config.json',
    ]);
    const file = JSON.parse(stdout).files[0];
    expect(file.metrics.servedSpan).toBe(4096);
    expect(file.spec.dtypes.cache).toBe('fp8');
  });

  it('exits 2 naming file and line for a broken file, still reporting the others, with no stack trace', async () => {
    const broken = tempFile(
      'config.json',
      '{\n  "hidden_size": 4096,\n  "num_hidden_layers": 32,\n  oops\n}\n',
    );
    const { code, stdout, stderr } = await cli([
      'inspect',
      broken,
      'fixtures/demo/head/models/quill-8b/config.json',
    ]);
    expect(code).toBe(2);
    expect(stdout).toContain('quill-8b');
    expect(stdout).toMatch(
      new RegExp(`${broken.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}.*line 4|:4`),
    );
    expect(stdout + stderr).not.toMatch(/\n\s+at .+:\d+:\d+/);
  });

  it('exits 2 with usage for an unknown flag or a bad number', async () => {
    expect((await cli(['inspect', '--served-span', 'lots', 'x.json'])).code).toBe(2);
    const unknown = await cli(['inspect', '--nope', 'x.json']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain('usage: context-reach inspect');
  });

  it('reads a model block nested in a larger document with --at', async () => {
    const nested = tempFile(
      'train.json',
      JSON.stringify({ trainer: { steps: 10 }, model: JSON.parse(checkpointConfig()) }, null, 2),
    );
    const { code, stdout } = await cli(['inspect', '--json', '--at', '/model', nested]);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).files[0].metrics.declaredSpan).toBe(4096);
  });
});

describe('context-reach diff', () => {
  it('exits 1 on a blocking change and prints the same decision as JSON', async () => {
    const repo = scenarioRepo(
      { 'models/a/config.json': checkpointConfig() },
      { 'models/a/config.json': checkpointConfig({ max_position_embeddings: 32768 }) },
    );
    try {
      const json = await cli(
        ['diff', '--base', repo.base, '--head', repo.head, '--format', 'json'],
        repo.dir,
      );
      expect(json.code).toBe(1);
      const report = JSON.parse(json.stdout);
      expect(report.verdict).toBe('block');
      expect(report.files[0].findings.map((f: { rule: string }) => f.rule)).toContain(
        'span-grew-code-unchanged',
      );
      const never = await cli(['diff', '--base', repo.base, '--fail-on', 'never'], repo.dir);
      expect(never.code).toBe(0);
      expect(never.stdout).toContain('BLOCK');
    } finally {
      repo.remove();
    }
  });

  it('uses the parent commit as base when on the main line', async () => {
    const repo = scenarioRepo(
      { 'models/a/config.json': checkpointConfig() },
      { 'models/a/config.json': checkpointConfig({ rope_theta: 500000 }) },
    );
    try {
      const { code, stdout } = await cli(['diff', '--format', 'json'], repo.dir);
      expect(code).toBe(0);
      expect(JSON.parse(stdout).base).toBe(repo.base);
    } finally {
      repo.remove();
    }
  });
});

describe('context-reach demo', () => {
  it("shows the invented pull request's comment and verdict and exits 0", async () => {
    const { code, stdout } = await cli(['demo']);
    expect(code).toBe(0);
    expect(stdout).toContain('<!-- context-reach:pull-request-report -->');
    expect(stdout).toContain('quill');
    expect(stdout).toMatch(/verdict: block/);
  });
});
