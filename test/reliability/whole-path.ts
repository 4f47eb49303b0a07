/**
 * The whole-path property, shared by the test files that split its runs so vitest can run them
 * side by side.
 *
 * Property: whatever bytes a pull request puts in a model config, the whole path (bytes → text →
 * parse → metrics → decision → comment, JSON, SARIF, annotations) finishes without an exception,
 * lets no NaN or Infinity into the report unexplained, turns every unreadable file into a finding
 * naming file and line, escapes everything it quotes, and judges the other file of the pull
 * request exactly as it would alone.
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import type { FileDecision, GateReport } from '../../src/core/report/types.js';
import { runGate, type ContentSource } from '../../src/core/gate.js';
import { planAnnotations } from '../../src/core/render/annotations.js';
import { renderComment } from '../../src/core/render/comment.js';
import { renderGateJson } from '../../src/core/render/gate-json.js';
import { renderSarif } from '../../src/core/render/sarif.js';
import { cpuClock } from '../support/cpu-time.js';
import { checkpointConfig as validCheckpoint } from '../support/scenario-repo.js';
import { generatedPair, MAX_GENERATED_SPAN, type GeneratedPair } from './generators.js';
import { findingProblems, markdownProblems, numberProblems } from './report-checks.js';

const BASE = 'b'.repeat(40);
const HEAD = 'c'.repeat(40);
const POLICY_PATH = '.github/context-reach.yml';
const POLICY = `files: ["models/**"]
serving:
  device-memory-gib: 80
  sequences: 2
limits:
  cachePerTokenBytes: { max: 1000000 }
  fitSequences: { min: 1, severity: warn }
  headroom: { min: 0 }
  memoryBytes: { max-increase-pct: 50 }
`;
const CONTROL = 'models/control/config.json';
const CONTROL_BASE = validCheckpoint({ max_position_embeddings: 2048 });
// The control changes only its cache per token (an info finding): nothing to remedy, cheap to judge.
const CONTROL_HEAD = validCheckpoint({ max_position_embeddings: 2048, num_key_value_heads: 8 });
const LINK = /^https:\/\/github\.example\/o\/r\/blob\/c{40}\//;

function source(pair: GeneratedPair | null): ContentSource {
  const encode = (text: string) => new TextEncoder().encode(text);
  const files: Record<string, Record<string, Uint8Array | null>> = {
    [BASE]: {
      [POLICY_PATH]: encode(POLICY),
      [CONTROL]: encode(CONTROL_BASE),
      ...(pair ? { [pair.path]: pair.base } : {}),
    },
    [HEAD]: {
      [POLICY_PATH]: encode(POLICY),
      [CONTROL]: encode(CONTROL_HEAD),
      ...(pair ? { [pair.path]: pair.head } : {}),
    },
  };
  return { read: async (ref, path) => files[ref]?.[path] ?? null };
}

function gate(pair: GeneratedPair | null): Promise<GateReport> {
  const changes = [{ status: 'modified' as const, path: CONTROL, previousPath: null }];
  if (pair)
    changes.push({
      status: pair.base === null ? ('added' as never) : 'modified',
      path: pair.path,
      previousPath: null,
    });
  return runGate(source(pair), { base: BASE, head: HEAD, changes, policyPath: POLICY_PATH });
}

/** The control file's decision with nothing else in the pull request. */
const alone = gate(null).then((report) => report.files.find((f) => f.path === CONTROL)!);

const stats = {
  runs: 0,
  clean: 0,
  readable: 0,
  unreadable: 0,
  damaged: 0,
  findings: 0,
  blocked: 0,
  totalMs: 0,
  maxMs: 0,
  slowest: '',
};

/** When set, each generated pull request is written here before it runs, so a hang names its input. */
const DUMP = process.env.CONTEXT_REACH_DUMP_CASE;

async function checkOne(pair: GeneratedPair, control: FileDecision): Promise<void> {
  if (DUMP)
    writeFileSync(
      `${DUMP}.${process.pid}`,
      `${pair.path}\n---base\n${pair.base ? new TextDecoder().decode(pair.base) : 'null'}\n---head\n${new TextDecoder().decode(pair.head)}`,
    );
  const started = performance.now();
  const cpu = cpuClock();
  const report = await gate(pair);
  const body = renderComment(report, { blobUrl: 'https://github.example/o/r/blob/' + HEAD });
  const json = renderGateJson(report);
  renderSarif(report, '0.0.0');
  planAnnotations(report);
  const cpuMs = cpu();
  const elapsed = performance.now() - started;

  const file = report.files.find((f) => f.path === pair.path);
  expect(file, 'the generated file is judged').toBeDefined();
  expect(
    report.files.find((f) => f.path === CONTROL),
    'the other file is judged as it is alone',
  ).toEqual(control);
  expect(numberProblems(report)).toEqual([]);
  expect(findingProblems(report)).toEqual([]);
  expect(markdownProblems(body, report, LINK)).toEqual([]);
  expect(JSON.parse(json).files).toHaveLength(report.files.length);
  expect(cpuMs, 'one pull request with this file is judged within 2 s of CPU time').toBeLessThan(
    2000,
  );

  stats.runs += 1;
  stats.totalMs += elapsed;
  if (elapsed > stats.maxMs) {
    stats.maxMs = elapsed;
    stats.slowest = new TextDecoder().decode(pair.head).slice(0, 300);
  }
  if (file!.head) stats.readable += 1;
  else stats.unreadable += 1;
  if (pair.damage !== 'none') stats.damaged += 1;
  stats.findings += file!.findings.length;
  if (file!.verdict === 'block') stats.blocked += 1;
  else stats.clean += 1;
}

/**
 * Defines part `part` of the property (a number for the quarters of the 10,000 runs in `npm run
 * test:full`, 'sample' for the few hundred in `npm test`): `blocks` tests of `runsPerBlock`
 * generated pull requests each.
 */
export function describeWholePath(
  part: number | 'sample',
  blocks: number,
  runsPerBlock: number,
): void {
  const name = part === 'sample' ? 'a sample' : `part ${part}`;
  describe(`the whole path, ${name}: ${blocks * runsPerBlock} generated configs, valid and broken (spans ≤ ${MAX_GENERATED_SPAN})`, () => {
    for (let block = 1; block <= blocks; block += 1) {
      it(`block ${block}: runGate → renderComment/renderGateJson/renderSarif finish, explain every odd number, locate every unreadable file, escape everything, and judge the other file as alone`, async () => {
        const control = await alone;
        await fc.assert(
          fc.asyncProperty(generatedPair, (pair) => checkOne(pair, control)),
          { numRuns: runsPerBlock },
        );
      }, 600_000);
    }

    afterAll(() => {
      // Figures for docs/reliability.md.
      console.log(
        `whole-path property, ${name}: ${stats.runs} runs, ${stats.readable} read as models, ${stats.unreadable} unreadable (finding with file and line), ${stats.damaged} with damaged bytes, ${stats.blocked} blocked, ${stats.clean} passed or warned, ${stats.findings} findings; mean ${(stats.totalMs / stats.runs).toFixed(2)} ms, max ${stats.maxMs.toFixed(0)} ms per pull request`,
      );
    });
  });
}
