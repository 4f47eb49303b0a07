/**
 * `angleErrorMax` in fp32 past 2^24 against numpy's binary32 arithmetic (numpy 2, an outside
 * reference: the casts and the float32 multiply are the hardware's IEEE 754 operations, not ours).
 * Needs python3 with numpy; the test fails, not skips, without it.
 */
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { angleErrorMax } from '../../src/core/metrics/angle-rounding.js';

const SCRIPT = resolve(import.meta.dirname, 'angle-error-numpy.py');

function numpyPython(): string {
  for (const candidate of [process.env.PYTHON, 'python3', '/usr/bin/python3']) {
    if (!candidate) continue;
    const probe = spawnSync(candidate, ['-c', 'import numpy'], { encoding: 'utf8' });
    if (probe.status === 0) return candidate;
  }
  throw new Error(
    'python3 with numpy is needed for this reference test (set PYTHON to one that has it)',
  );
}

function numpyAngleErrorMax(theta: number[], span: number): number {
  const run = spawnSync(numpyPython(), [SCRIPT], {
    input: JSON.stringify({ theta, span }),
    encoding: 'utf8',
    timeout: 120_000,
  });
  if (run.status !== 0) throw new Error(`numpy reference failed: ${run.stderr}`);
  return (JSON.parse(run.stdout) as { angleErrorMax: number }).angleErrorMax;
}

describe('angleErrorMax in fp32 against numpy float32 arithmetic', () => {
  it.each([
    { theta: [1, 500000 ** (-2 / 128), 0.75, Math.PI / 1000], span: 2 ** 25 + 12345 },
    { theta: [0.9, 1 - 2 ** -30, 3 * 2 ** -12, 0.75 + 2 ** -40], span: 2 ** 26 - 1 },
  ])(
    'equals numpy bit for bit for θ = $theta over T = $span',
    ({ theta, span }) => {
      expect(angleErrorMax('fp32', Float64Array.from(theta), span)).toBe(
        numpyAngleErrorMax(theta, span),
      );
    },
    120_000,
  );
});
