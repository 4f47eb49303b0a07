import { describe, expect, it } from 'vitest';
import { checkpointConfig } from '../support/scenario-repo.js';
import { checkedFakes } from './checked-scenarios.js';

// Pull requests of 3,500 files (more than GitHub's file list gives) through the action in-process,
// as in api-faults.test.ts; thousands of files make them slow, so they run in `npm run test:full`.

const { scenario } = checkedFakes();

describe('pull requests with more files than the API lists (over 3,000)', () => {
  const MANY = 3500;
  /** 3,500 changed files: notes, and model configs at positions 10 and 3,200 of the list. */
  function manyFiles(): { base: Record<string, string>; head: Record<string, string> } {
    const base: Record<string, string> = {};
    const head: Record<string, string> = {};
    for (let i = 0; i < MANY; i += 1) {
      const path =
        i === 10 || i === 3200
          ? `m${String(i).padStart(4, '0')}/config.json`
          : `notes/n${String(i).padStart(4, '0')}.txt`;
      base[path] = path.endsWith('.json') ? checkpointConfig() : 'a';
      head[path] = path.endsWith('.json')
        ? checkpointConfig({ max_position_embeddings: 16384 })
        : 'b';
    }
    return { base, head };
  }

  it('with the history checked out, reads the change from git: every file judged, no file list asked for', async () => {
    // Review suggestions list the diff on their own to place a suggestion on a changed line: off here, where the gate's reads are counted.
    const result = await scenario({ ...manyFiles(), inputs: { suggestions: 'off' } });
    expect(result.error).toBeNull();
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files.map((f: { path: string }) => f.path).sort()).toEqual([
      'm0010/config.json',
      'm3200/config.json',
    ]);
    expect(result.fake.calls('pulls/list-files')).toHaveLength(0);
    expect(report.notices).toEqual([]);
  }, 60_000);

  it("without the history, completes the cut list from the two commits' trees: every file judged, no notice", async () => {
    const result = await scenario({ ...manyFiles(), noHistory: true });
    expect(result.error).toBeNull();
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files.map((f: { path: string }) => f.path).sort()).toEqual([
      'm0010/config.json',
      'm3200/config.json',
    ]);
    expect(report.notices).toEqual([]);
    expect(result.fake.calls('git/get-tree')).toHaveLength(2);
    expect(result.out.outputs.verdict).toBe('block');
  }, 60_000);
});
