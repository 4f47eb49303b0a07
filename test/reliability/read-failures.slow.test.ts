import { describe, expect, it } from 'vitest';
import { checkpointConfig } from '../support/scenario-repo.js';
import { checkedFakes } from './checked-scenarios.js';

// Fail-closed reading as in read-failures.test.ts, on a pull request of 3,200 files: thousands of
// files make these slow (`npm run test:full`).

const { scenario } = checkedFakes();

describe('more changed files than the API lists (point 3)', () => {
  /** 3,200 changed files, the model config past the API's 3,000. */
  function manyFiles() {
    const base: Record<string, string> = {};
    const head: Record<string, string> = {};
    for (let i = 0; i < 3200; i += 1) {
      const path = i === 3100 ? `m${i}/config.json` : `notes/n${String(i).padStart(4, '0')}.txt`;
      base[path] = path.endsWith('.json') ? checkpointConfig() : 'a';
      head[path] = path.endsWith('.json')
        ? checkpointConfig({ max_position_embeddings: 16384 })
        : 'b';
    }
    return { base, head };
  }

  it('no history and GitHub cuts the trees short too: the run fails closed and says why', async () => {
    const result = await scenario({
      ...manyFiles(),
      noHistory: true,
      prepare: (f) => {
        f.state.truncatedTrees = new Set(f.state.trees.keys());
      },
    });
    expect(result.error).toBeInstanceOf(Error);
    expect((result.error as Error).message).toMatch(
      /GitHub lists only the first 3,000 files of this pull request, and the full list could not be read \(.*cut the file tree .* short/,
    );
    expect(result.out.outputs.verdict).not.toBe('ok');
  }, 60_000);
});
