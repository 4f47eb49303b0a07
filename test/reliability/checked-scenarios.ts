/**
 * What the tests of the action against the fake API share (api-faults.*.ts, read-failures.*.ts,
 * base-unreadable.test.ts, moved-configs.test.ts): the change that blocks, and the fakes of a
 * file's runs, each checked and closed after every test.
 */
import { afterEach, expect } from 'vitest';
import {
  runScenario,
  type ScenarioOptions,
  type ScenarioResult,
} from '../support/action-harness.js';
import type { FakeGitHub } from '../support/fake-github.js';
import { checkpointConfig } from '../support/scenario-repo.js';

export const MODEL = 'models/a/config.json';
/** A change that blocks: the declared span quadruples and the position code stays. */
export const BLOCKING = {
  base: { [MODEL]: checkpointConfig() },
  head: { [MODEL]: checkpointConfig({ max_position_embeddings: 16384 }) },
};

/**
 * For the calling test file: after each test every fake it used must have seen only requests
 * GitHub's REST description allows, all handled, and is closed. `scenario` runs the action on
 * BLOCKING (or what `options` says) and registers its fake; `fakes` takes others.
 */
export function checkedFakes(): {
  fakes: FakeGitHub[];
  scenario: (options?: Partial<ScenarioOptions>) => Promise<ScenarioResult>;
} {
  const fakes: FakeGitHub[] = [];
  afterEach(async () => {
    for (const fake of fakes.splice(0)) {
      expect(fake.mismatches).toEqual([]);
      expect(fake.unhandled).toEqual([]);
      await fake.close();
    }
  });
  return {
    fakes,
    scenario: async (options = {}) => {
      const result = await runScenario({ ...BLOCKING, ...options });
      if (!fakes.includes(result.fake)) fakes.push(result.fake);
      return result;
    },
  };
}
