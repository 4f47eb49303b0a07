import { describe, expect, it } from 'vitest';
import type { GateReport } from '../../src/core/report/types.js';
import { runGate } from '../../src/core/gate.js';
import { renderComment } from '../../src/core/render/comment.js';
import { cpuClock } from '../support/cpu-time.js';
import {
  CASES,
  CONTROL,
  expectFinding,
  POLICY_PATH,
  TIME_LIMIT_MS,
  useHostileCheckout,
} from './hostile-checkout.js';
import type { HostileCase } from './hostile-files.js';
import { findingProblems, markdownProblems, numberProblems } from './report-checks.js';

// Hostile and broken files in a pull request, each through the whole gate with the real git
// adapter (timed per file). Each file gets a finding naming file and line where there is one; the
// other file of the pull request is still judged; nothing is followed out of the checkout;
// nothing reaches a prototype. The same files through the bundled action and the CLI's file
// reader in child processes are in hostile-files.bundle.test.ts, a 100 MiB file over the REST
// API in hostile-files.slow.test.ts (both in `npm run test:full`).

const prototypeBefore = Object.getOwnPropertyNames(Object.prototype).sort();
const figures: string[] = [];
const checkout = useHostileCheckout(figures);

function gate(c: HostileCase): Promise<GateReport> {
  return runGate(checkout().source, {
    base: checkout().repo.base,
    head: checkout().repo.head,
    policyPath: POLICY_PATH,
    changes: [
      { status: 'added', path: c.path, previousPath: null },
      { status: 'modified', path: CONTROL, previousPath: null },
    ],
  });
}

describe('runGate(git source, …) on a hostile file beside a good one', () => {
  it.each(CASES.map((c) => [c.name, c] as const))(
    '%s: a finding naming file and line, within 2 s, the other file still judged',
    async (_, c) => {
      const started = performance.now();
      const cpu = cpuClock();
      const report = await gate(c);
      const body = renderComment(report, {
        blobUrl: `https://github.example/o/r/blob/${checkout().repo.head}`,
      });
      // This process's CPU time (git's own is a few ms a call): what the wall clock adds is other work.
      const cpuMs = cpu();
      const elapsed = performance.now() - started;
      figures.push(
        `  in-process ${c.name}: ${elapsed.toFixed(0)} ms wall, ${cpuMs.toFixed(0)} ms CPU, findings ${report.files
          .find((f) => f.path === c.path)
          ?.findings.map((f) => `${f.rule}@${f.line ?? 'file'}`)
          .join(' ')}`,
      );

      expectFinding(
        c,
        report.files.find((f) => f.path === c.path),
      );
      expect(report.files.find((f) => f.path === CONTROL)).toEqual(checkout().control);
      expect(numberProblems(report)).toEqual([]);
      expect(findingProblems(report)).toEqual([]);
      expect(
        markdownProblems(body, report, /^https:\/\/github\.example\/o\/r\/blob\/[0-9a-f]{40}\//),
      ).toEqual([]);
      expect(cpuMs, 'ms of CPU time').toBeLessThan(TIME_LIMIT_MS);
    },
  );

  it('leaves Object.prototype as it was: no key of any file became a property of every object', () => {
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(prototypeBefore);
    const probe: Record<string, unknown> = {};
    expect(probe.polluted).toBeUndefined();
    expect(Object.getPrototypeOf(probe)).toBe(Object.prototype);
    expect(
      (probe.constructor as unknown as { prototype?: { polluted?: unknown } }).prototype?.polluted,
    ).toBeUndefined();
  });
});
