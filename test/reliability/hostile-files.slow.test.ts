import { describe, expect, it } from 'vitest';
import type { GateReport } from '../../src/core/report/types.js';
import { runScenario } from '../support/action-harness.js';
import {
  CASES,
  CONTROL,
  CONTROL_BASE,
  CONTROL_HEAD,
  expectFinding,
  POLICY,
  POLICY_PATH,
} from './hostile-checkout.js';

// The 100 MiB file of hostile-files.test.ts over the REST API (`npm run test:full`: building and
// serving a repository with 100 MiB in it is slow).

describe('the REST API path (a checkout without history) on a 100 MiB config', () => {
  it('refuses it from the size GitHub states, without downloading it, and judges the other file', async () => {
    const huge = CASES.find((c) => c.path === 'models/huge/config.json')!;
    const result = await runScenario({
      base: { [POLICY_PATH]: POLICY, [CONTROL]: CONTROL_BASE },
      head: {
        [POLICY_PATH]: POLICY,
        [CONTROL]: CONTROL_HEAD,
        [huge.path]: huge.content as Uint8Array,
      },
      noHistory: true,
    });
    await result.fake.close();
    expect(result.error).toBeNull();
    const report = JSON.parse(Object.values(result.written)[0]!) as GateReport;
    expectFinding(
      huge,
      report.files.find((f) => f.path === huge.path),
    );
    expect(report.files.find((f) => f.path === CONTROL)!.head).not.toBeNull();
    // One metadata request for the file: its raw 100 MiB were never asked for.
    expect(
      result.fake.calls('repos/get-content').filter((c) => c.path.endsWith(huge.path)),
    ).toHaveLength(1);
  }, 60_000);
});
