import { describe, expect, it } from 'vitest';
import { runGate, type ContentSource } from '../../src/core/gate.js';
import { renderComment } from '../../src/core/render/comment.js';
import { renderDiffText } from '../../src/core/render/diff-text.js';
import type { GateReport } from '../../src/core/report/types.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// Issue 13, point 2: when the base version of a changed config does not read, the head is judged
// on its own beside a `base-unreadable` finding. The comment (which is also the job summary) and
// the text output must say so plainly: the rules that compare base and head were not applied,
// why, and that the change blocks; never show the file as new, or a change measured against
// nothing as "no metric changed".

const MODEL = 'models/a/config.json';
const POLICY = '.github/context-reach.yml';
const BROKEN_BASE = checkpointConfig().replace('"hidden_size": 2048,', '"hidden_size": 2048,,');
const HEAD = checkpointConfig({ max_position_embeddings: 16384 });

async function judged(policy: string | null, labels: string[] = []): Promise<GateReport> {
  const trees: Record<string, Record<string, string>> = {
    base: { [MODEL]: BROKEN_BASE, ...(policy ? { [POLICY]: policy } : {}) },
    head: { [MODEL]: HEAD, ...(policy ? { [POLICY]: policy } : {}) },
  };
  const source: ContentSource = {
    read: (ref, path) => {
      const text = trees[ref]?.[path];
      return Promise.resolve(text === undefined ? null : new TextEncoder().encode(text));
    },
  };
  return runGate(source, {
    base: 'base',
    head: 'head',
    policyPath: POLICY,
    labels,
    changes: [{ status: 'modified', path: MODEL, previousPath: null }],
  });
}

const NOT_APPLIED =
  /The base version could not be read \(models\/a\/config\.json, line 3: is not valid JSON: [^)]*\), so the rules that compare base and head \(.*\) were not applied: the head is judged on its own, and no change against the base is measured\./;
/** The comment with markdown's escapes taken out, to read its words. */
const plain = (markdown: string) => markdown.replace(/\\([\\`*_{}[\]()#+\-.!|<>~])/g, '$1');

describe('a file whose base version does not read, as reviewers see it', () => {
  it('the comment and job summary say the base-against-head rules were not applied, why, and that it blocks', async () => {
    const report = await judged(null);
    expect(report.verdict).toBe('block');
    const comment = plain(renderComment(report));
    const summary = comment.match(
      /<summary>■ <code>models\/a\/config\.json<\/code>[^<]*<\/summary>/,
    )!;
    expect(summary[0]).toBe(
      '<summary>■ <code>models/a/config.json</code>, base version unreadable, head judged without it: 1 blocking</summary>',
    );
    expect(comment).toMatch(NOT_APPLIED);
    expect(comment).toMatch(/were not applied: [^\n]* This blocks the change\.\*\*/);
    // Neither "new file" nor a change measured against nothing.
    expect(comment).not.toMatch(/new file/);
    expect(comment).not.toMatch(/No metric changed/);
    expect(comment).toMatch(/No change is measured: the base version did not read/);
    // The remedy line does not send the author to fix a value of the head.
    expect(comment).not.toMatch(/the value itself must be corrected/);
    expect(comment).toMatch(/no change to it can make the base version read/);
  });

  it('the text output says the same on the file line and under it', async () => {
    const text = renderDiffText(await judged(null));
    expect(text).toMatch(
      /^models\/a\/config\.json \(base unreadable: head judged without it\) {2}block$/m,
    );
    expect(text).not.toMatch(/^models\/a\/config\.json \(new\)/m);
    expect(text).toMatch(NOT_APPLIED);
    expect(text).toMatch(/^ {2}base unreadable: .* This blocks the change\.$/m);
  });

  it('with the waiver label it says the block is waived; set to warn, that it warns', async () => {
    const waived = await judged('waiver-label: repair-base\n', ['repair-base']);
    expect(waived.verdict).toBe('warn');
    expect(plain(renderComment(waived))).toMatch(
      /were not applied: [^\n]* It would block; the waiver label makes it a warning\.\*\*/,
    );
    const warned = await judged('rules: { base-unreadable: warn }\n');
    expect(warned.verdict).toBe('warn');
    expect(renderDiffText(warned)).toMatch(
      /were not applied: .* This is a warning here \(the policy's rules say so\), not a block\.$/m,
    );
  });
});
