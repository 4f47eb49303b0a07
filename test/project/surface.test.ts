import { existsSync, readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as core from '../../src/core/index.js';
import { METRIC_PATHS } from '../../src/core/metrics/metric-path.js';
import { SCALAR_METRICS } from '../../src/core/metrics/types.js';

const ROOT = resolve(import.meta.dirname, '../..');
const read = (path: string) => readFileSync(resolve(ROOT, path), 'utf8');

describe("the core's public surface", () => {
  it('exports exactly this list (widen it on purpose)', () => {
    expect(Object.keys(core).sort()).toEqual([
      'ANNOTATIONS_PER_LEVEL',
      'COMMENT_LIMIT',
      'COMMENT_MARKER',
      'DEFAULT_POLICY',
      'DEFAULT_POLICY_PATH',
      'ESTIMATE_NOTICE',
      'FLOAT_FORMATS',
      'METRIC_PATHS',
      'NotAModelError',
      'PLAIN',
      'PolicyError',
      'REPORT_VERSION',
      'RULES',
      'ReadError',
      'STORAGE_DTYPES',
      'VERSION',
      'attachRemedies',
      'computeMetrics',
      'decide',
      'decodeText',
      'escapeHtml',
      'escapeMarkdown',
      'inspectModel',
      'isModelConfig',
      'metricValue',
      'parsePolicy',
      'planAnnotations',
      'readModel',
      'remedyFileReport',
      'renderComment',
      'renderDiffText',
      'renderGateJson',
      'renderHtmlReport',
      'renderInspectJson',
      'renderInspectText',
      'renderSarif',
      'resolvePolicy',
      'runGate',
      'toFailure',
    ]);
  });

  it('imports nothing with side effects: no fs, process, child_process or @actions in src/core', async () => {
    const { readdirSync, statSync } = await import('node:fs');
    const files: string[] = [];
    const walk = (dir: string) => {
      for (const name of readdirSync(dir)) {
        const path = resolve(dir, name);
        if (statSync(path).isDirectory()) walk(path);
        else if (path.endsWith('.ts')) files.push(path);
      }
    };
    walk(resolve(ROOT, 'src/core'));
    for (const file of files) {
      const text = readFileSync(file, 'utf8');
      expect(text, file).not.toMatch(
        /from ['"](node:)?(fs|fs\/promises|child_process|os|http|https|net|worker_threads)['"]/,
      );
      expect(text, file).not.toMatch(/from ['"]@actions\//);
      expect(text, file).not.toMatch(/\bprocess\.(env|exit|argv|stdout|cwd)/);
    }
  });
});

describe("the project's documents", () => {
  it('keeps the version in package.json and the code equal', () => {
    expect(JSON.parse(read('package.json')).version).toBe(core.VERSION);
  });

  it('documents every metric of the contract in docs/metrics.md and the README', () => {
    const contract = read('docs/metrics.md');
    const readme = read('README.md');
    for (const metric of SCALAR_METRICS.filter((m) => m !== 'evaluationSpan')) {
      expect(contract, metric).toContain(`\`${metric}\``);
      expect(readme, metric).toContain(metric);
    }
    expect(METRIC_PATHS.length).toBe(SCALAR_METRICS.length + 15);
  });

  it("documents every rule id in the README's rules table", () => {
    const readme = read('README.md');
    for (const id of Object.keys(core.RULES)) expect(readme, id).toContain(`\`${id}\``);
  });

  it('has the two-command quick start at the top of the README', () => {
    const readme = read('README.md');
    const quick = readme.slice(
      readme.indexOf('## Quick start'),
      readme.indexOf('## Quick start') + 600,
    );
    expect(quick).toContain('node dist/cli.js demo');
    expect(quick).toContain('npm ci && npm test');
    expect(readme.slice(0, 1500)).toMatch(/pull request/);
  });

  it("keeps the README's performance tables and points to the write-up in docs/performance.md", () => {
    const readme = read('README.md');
    const section = readme.slice(
      readme.indexOf('## Performance'),
      readme.indexOf('\n## ', readme.indexOf('## Performance') + 1),
    );
    expect(section).toContain('](docs/performance.md)');
    expect(section).toMatch(/^\| workload \| median \| target \| result \|$/m);
    expect(section).toMatch(/^\| changed configs \(files blocked\) \|/m);
    // The prose lives in one place: the method is not written in both.
    expect(section).not.toContain('Chebyshev');
    expect(read('docs/performance.md')).toContain('Chebyshev');
  });

  it('links only to files that exist from the README and docs/performance.md', () => {
    for (const doc of ['README.md', 'docs/performance.md']) {
      const targets = [...read(doc).matchAll(/\]\(([^)#\s]+)(?:#[^)]*)?\)/g)]
        .map((match) => match[1] ?? '')
        .filter((target) => !/^[a-z]+:/.test(target));
      expect(targets.length, doc).toBeGreaterThan(0);
      for (const target of targets)
        expect(existsSync(resolve(ROOT, dirname(doc), target)), `${doc} → ${target}`).toBe(true);
    }
  });

  it("names every suffix of the full project and the coverage floor in docs/architecture.md (and the suffixes in the README's quick start)", () => {
    const config = read('vitest.config.ts');
    const suffixes = [...config.matchAll(/'test\/\*\*\/\*(\.[a-z]+)\.test\.ts'/g)].map(
      (match) => match[1] ?? '',
    );
    expect(suffixes.sort()).toEqual(
      ['.browser', '.bundle', '.numpy', '.pack', '.property', '.slow'].sort(),
    );
    const architecture = read('docs/architecture.md');
    const readme = read('README.md');
    for (const suffix of suffixes) {
      expect(architecture, suffix).toContain(`\`*${suffix}.test.ts\``);
      expect(readme, suffix).toContain(`\`*${suffix}.test.ts\``);
    }
    const floor =
      /thresholds: \{ statements: (\d+), branches: (\d+), functions: (\d+), lines: (\d+) \}/.exec(
        config,
      );
    expect(floor, 'the coverage thresholds in vitest.config.ts').not.toBeNull();
    const [, statements, branches, functions, lines] = floor ?? [];
    expect(architecture.replace(/\s+/g, ' ')).toContain(
      `statements ${statements} %, branches ${branches} %, functions ${functions} %, lines ${lines} %`,
    );
  });

  it("calls the README's test command from CI, and the heavy tests after it", () => {
    expect(read('.ci/run')).toMatch(/^npm test( |$)/m);
    expect(read('.ci/run')).toMatch(/^npm run test:full( |$)/m);
    const scripts = JSON.parse(read('package.json')).scripts;
    expect(scripts.test).toBe('vitest run --project unit');
    expect(scripts['test:full']).toBe('vitest run --project full');
  });
});
