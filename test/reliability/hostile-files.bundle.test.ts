import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FileDecision, GateReport } from '../../src/core/report/types.js';
import { freshBundle } from '../support/fresh-bundle.js';
import {
  PEAK_RSS_PRELOAD,
  pullRequestEvent,
  runBundle,
  takePeakRss,
  type BundleRun,
} from '../support/run-bundle.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import {
  CANARY,
  CASES,
  CONTROL,
  expectFinding,
  MEMORY_LIMIT_MIB,
  TIME_LIMIT_MS,
  useHostileCheckout,
} from './hostile-checkout.js';

// The hostile files of hostile-files.test.ts all at once through the bundled action in a child
// process (peak memory measured), then one by one through the CLI's file reader in a child
// process, and spans just inside the scan bound through the CLI: `npm run test:full`, as these
// run dist/ (which must be built from these sources).

const CLI_BUNDLE = resolve(import.meta.dirname, '../../dist/cli.js');
const figures: string[] = [];
const checkout = useHostileCheckout(figures);

describe('the bundled action (dist/index.js) on a pull request with every hostile file at once', () => {
  let run: BundleRun;
  let report: GateReport & { files: (FileDecision & { head: unknown })[] };

  beforeAll(async () => {
    run = await runBundle({
      eventName: 'pull_request',
      event: pullRequestEvent({
        owner: 'example-org',
        repo: 'model-zoo',
        number: 7,
        base: checkout().repo.base,
        head: checkout().repo.head,
      }),
      workspace: checkout().repo.dir,
      apiUrl: 'http://127.0.0.1:9',
      repository: 'example-org/model-zoo',
      inputs: { 'github-token': '', comment: 'off' },
      nodeArgs: ['--require', PEAK_RSS_PRELOAD],
      timeoutMs: 60_000,
    });
    report = JSON.parse(run.files[run.outputs['report-json']!]!);
    figures.push(
      `  bundled action, ${CASES.length} hostile files + 1 good: ${run.elapsedMs.toFixed(0)} ms, peak RSS ${run.peakRssMiB?.toFixed(1)} MiB, exit ${run.code}`,
    );
  }, 90_000);

  it('blocks (exit status 1) with a one-line failure, no stack trace', () => {
    expect(run.code).toBe(1);
    expect(run.outputs.verdict).toBe('block');
    expect(`${run.stdout}\n${run.stderr}`).not.toMatch(/\n\s+at .+:\d+:\d+/);
  });

  it(`stays under ${MEMORY_LIMIT_MIB} MiB of peak memory, the 100 MiB file included`, () => {
    expect(run.peakRssMiB).not.toBeNull();
    expect(run.peakRssMiB!).toBeLessThan(MEMORY_LIMIT_MIB);
  });

  it('reports every hostile file with its finding, and still judges the good one', () => {
    for (const c of CASES) {
      const file = report.files.find((f) => f.path === c.path);
      expectFinding(c, file);
    }
    const good = report.files.find((f) => f.path === CONTROL)!;
    expect(good.head).not.toBeNull();
    expect(good.findings.map((f) => f.rule)).toEqual(
      checkout().control.findings.map((f) => f.rule),
    );
  });

  it('annotates the unreadable files at their lines', () => {
    const unreadable = run.annotations.filter(
      (a) =>
        a.message.includes('config-unreadable') ||
        a.properties.title?.includes('config-unreadable'),
    );
    expect(unreadable.length).toBeGreaterThan(0);
    for (const a of unreadable) expect(CASES.some((c) => c.path === a.properties.file)).toBe(true);
  });

  it('never follows a symlink out of the checkout: the file it points at appears nowhere', () => {
    for (const text of [run.stdout, run.stderr, run.summary, ...Object.values(run.files)])
      expect(text).not.toContain(CANARY);
  });
});

describe('the CLI file reader (dist/cli.js inspect FILE) on each hostile file', () => {
  let folder: string;
  beforeAll(() => {
    folder = mkdtempSync(join(tmpdir(), 'context-reach-cli-hostile-'));
  });
  afterAll(() => rmSync(folder, { recursive: true, force: true }));

  // The CLI reads the file a user names, links included (as cat does); links are the checkout's concern above.
  it.each(CASES.filter((c) => c.content instanceof Uint8Array).map((c) => [c.name, c] as const))(
    '%s: exits within 2 s and 256 MiB, naming file and line',
    (_, c) => {
      const path = join(folder, c.path);
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(path, c.content as Uint8Array);
      const started = performance.now();
      const child = spawnSync(
        process.execPath,
        ['--require', PEAK_RSS_PRELOAD, freshBundle(CLI_BUNDLE), 'inspect', c.path, '--json'],
        { cwd: folder, encoding: 'utf8', timeout: 20_000 },
      );
      const elapsed = performance.now() - started;
      const { peakRssMiB, cpuMs, stderr } = takePeakRss(child.stderr);
      figures.push(
        `  cli inspect ${c.name}: ${elapsed.toFixed(0)} ms wall, ${cpuMs} ms CPU, peak RSS ${peakRssMiB?.toFixed(1)} MiB, exit ${child.status}`,
      );
      const unreadable = c.finding?.rule === 'config-unreadable';
      expect(child.status).toBe(unreadable ? 2 : 0);
      expect(stderr).not.toMatch(/\n\s+at .+:\d+:\d+/);
      const out = JSON.parse(child.stdout) as {
        files: {
          path: string;
          findings: { rule: string; line: number | null }[];
          error?: { line: number | null };
        }[];
      };
      expect(out.files.map((f) => f.path)).toEqual([c.path]);
      const file = out.files[0]!;
      if (unreadable) {
        expect(file.error).toBeDefined();
        // The CLI refuses a large file before parsing it: its own size message, at no line.
        expect(file.error!.line).toBe(
          c.path === 'models/huge/config.json' ? null : c.finding!.line,
        );
        expect(stderr).toContain(c.path);
      } else if (c.finding && c.finding.rule !== 'limit-crossed') {
        // Limits come from a policy, which inspect does not read.
        expect(
          file.findings.some((f) => f.rule === c.finding!.rule && f.line === c.finding!.line),
        ).toBe(true);
      }
      // CPU time of the CLI's process, which other work on the machine does not inflate.
      expect(cpuMs!, 'ms of CPU time').toBeLessThan(TIME_LIMIT_MS);
      expect(peakRssMiB!).toBeLessThan(MEMORY_LIMIT_MIB);
    },
  );
});

describe('a span just inside the scan bound (MAX_SCAN_SPAN = 2^31)', () => {
  // The scans are exact, so their cost depends on the frequencies: 64 pairs of an ordinary code
  // finish, while a code of one or two fast pairs (head size 2 or 4) would need minutes to prove
  // its similarity floor over 2^31 offsets and stops at MAX_SCAN_WORK with scan-incomplete.
  // Held to CPU time, which other test files running beside this one do not inflate; the wall
  // clock is printed with it, and a hang is stopped by spawnSync's timeout.
  const cases = [
    {
      name: '64 pairs, rotary base 500000',
      overrides: { head_dim: 128, rope_theta: 500000 },
      complete: true,
    },
    {
      name: '64 pairs, rotary base 10000 (cut just before the end: 2^30 tokens finish)',
      overrides: { head_dim: 128 },
      complete: false,
    },
    {
      name: '2 pairs, head size 4, rotary base 1.0001',
      overrides: { head_dim: 4, rope_theta: 1.0001 },
      complete: false,
    },
    { name: '1 pair, head size 2, rotary base 10000', overrides: { head_dim: 2 }, complete: false },
    {
      name: '16 pairs, head size 32, rotary base 1.0001',
      overrides: { head_dim: 32, rope_theta: 1.0001 },
      complete: false,
    },
  ];
  it.each(cases)(
    '2^31 − 1 tokens, $name: judged by the CLI within 2 s of CPU and 256 MiB',
    ({ name, overrides, complete }) => {
      const folder = mkdtempSync(join(tmpdir(), 'context-reach-cli-span-'));
      const text = checkpointConfig({ max_position_embeddings: 2 ** 31 - 1, ...overrides });
      writeFileSync(join(folder, 'config.json'), text);
      const started = performance.now();
      const child = spawnSync(
        process.execPath,
        [
          '--require',
          PEAK_RSS_PRELOAD,
          freshBundle(CLI_BUNDLE),
          'inspect',
          'config.json',
          '--json',
        ],
        { cwd: folder, encoding: 'utf8', timeout: 60_000 },
      );
      const elapsed = performance.now() - started;
      rmSync(folder, { recursive: true, force: true });
      const { peakRssMiB, cpuMs } = takePeakRss(child.stderr);
      figures.push(
        `  cli inspect span 2^31 - 1, ${name}: ${elapsed.toFixed(0)} ms wall, ${cpuMs} ms CPU, peak RSS ${peakRssMiB?.toFixed(1)} MiB, exit ${child.status}`,
      );
      expect(child.status).toBe(0);
      type Out = {
        files: {
          metrics: {
            evaluationSpan: number;
            separationFloor: number | null;
            discriminationSpan: number | null;
          };
          findings: { rule: string; line: number | null }[];
        }[];
      };
      const file = (JSON.parse(child.stdout) as Out).files[0]!;
      expect(file.metrics.evaluationSpan).toBe(2 ** 31 - 1);
      const spanLine = text.split('\n').findIndex((l) => l.includes('max_position_embeddings')) + 1;
      const incomplete = file.findings.filter((f) => f.rule === 'scan-incomplete');
      if (complete) {
        expect(file.metrics.separationFloor).not.toBeNull();
        expect(incomplete).toEqual([]);
      } else {
        expect(file.metrics.separationFloor).toBeNull();
        expect(incomplete.map((f) => f.line)).toEqual([spanLine]);
      }
      expect(cpuMs!).toBeLessThan(TIME_LIMIT_MS);
      expect(child.signal, 'not stopped by the timeout').toBeNull();
      expect(peakRssMiB!).toBeLessThan(MEMORY_LIMIT_MIB);
    },
    60_000,
  );
});
