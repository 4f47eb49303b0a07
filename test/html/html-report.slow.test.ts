import { describe, expect, it } from 'vitest';
import { renderHtmlReport } from '../../src/core/render/html-report.js';
import { gateOver } from '../support/demo-gate.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// The HTML report of html-report.test.ts over one rotary pair and 2^31 − 1 tokens: the scans run
// to their work limit, seconds of CPU by design (`npm run test:full`).

/** Substring checks that do not print a 170 KB page when they fail. */
const has = (html: string, text: string) => expect(html.includes(text), text).toBe(true);

describe('renderHtmlReport on a span the curve cannot afford', () => {
  it('says the similarity curve is not drawn, and the gate plus page for one pair over 2^31 − 1 tokens take under 4 s of CPU', async () => {
    const policy = { '.github/context-reach.yml': 'files: ["models/**"]\n' };
    const cpu = process.cpuUsage();
    const { report: long } = await gateOver(
      { ...policy, 'models/x/config.json': checkpointConfig({ head_dim: 2 }) },
      {
        ...policy,
        'models/x/config.json': checkpointConfig({
          head_dim: 2,
          max_position_embeddings: 2 ** 31 - 1,
        }),
      },
    );
    const page = renderHtmlReport(long);
    const used = process.cpuUsage(cpu);
    has(page, 'is not drawn: visiting every offset would take too long for a report');
    // Drawing the curve would visit 2^31 offsets: minutes. The scans stop at their work limits
    // (under 2 s in one clean CI run, 2.1 s in the next, with the worker's first
    // compilation and git's start included), so 4 s tells the two apart with room for a busy
    // machine.
    expect((used.user + used.system) / 1000).toBeLessThan(4000);
  }, 30_000);
});
