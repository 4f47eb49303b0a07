import { describe, expect, it } from 'vitest';
import { ContentTooLargeError, MAX_CONFIG_BYTES } from '../../src/adapters/content-limit.js';
import { runGate, type ContentSource } from '../../src/core/gate.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// The action asks GitHub for the pull request's labels while the gate reads and measures: the
// gate takes them as a promise and waits for them only when it decides.

const POLICY = '.github/context-reach.yml';
const MODEL = 'models/a/config.json';
const encoder = new TextEncoder();

/** A pull request whose base version is over the size limit: `base-unreadable` blocks, the waiver label turns it into a warning. */
function source(reads: string[]): ContentSource {
  return {
    read: async (ref, path) => {
      reads.push(`${ref} ${path}`);
      if (path === POLICY) return encoder.encode('waiver-label: repair-base\n');
      if (ref === 'base')
        throw new ContentTooLargeError(path, MAX_CONFIG_BYTES + 1, MAX_CONFIG_BYTES);
      return encoder.encode(checkpointConfig());
    },
  };
}

const request = (labels: string[] | Promise<string[]>) => ({
  base: 'base',
  head: 'head',
  changes: [{ status: 'modified' as const, path: MODEL, previousPath: null }],
  policyPath: POLICY,
  labels,
});

describe('labels that arrive while the gate works', () => {
  it('reads every version before it waits for the labels, and the late waiver label still applies', async () => {
    const reads: string[] = [];
    let answer!: (labels: string[]) => void;
    const labels = new Promise<string[]>((resolve) => (answer = resolve));
    const judged = runGate(source(reads), request(labels));
    // Let the gate run as far as it can without the labels.
    for (let turn = 0; turn < 50 && !reads.includes(`head ${MODEL}`); turn += 1)
      await new Promise((resolve) => setImmediate(resolve));
    expect(reads).toContain(`base ${MODEL}`);
    expect(reads).toContain(`head ${MODEL}`);
    answer(['repair-base']);
    const report = await judged;
    expect(report.waiver).toMatchObject({ label: 'repair-base', applied: true, waivedBlocks: 1 });
    expect(report.verdict).toBe('warn');
  });

  it('decides the same from labels given as a list and as a promise of it', async () => {
    for (const labels of [[], ['repair-base']]) {
      const listed = await runGate(source([]), request(labels));
      const promised = await runGate(source([]), request(Promise.resolve(labels)));
      expect(promised).toEqual(listed);
      expect(listed.verdict).toBe(labels.length === 0 ? 'block' : 'warn');
    }
  });
});
