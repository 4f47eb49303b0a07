import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { GateReport } from '../../src/core/report/types.js';
import { runGate } from '../../src/core/gate.js';
import { jsonSyntaxErrorOffset, parseSource } from '../../src/core/parse/source.js';
import { ReadError } from '../../src/core/parse/errors.js';
import { renderComment } from '../../src/core/render/comment.js';
import { readGateJson } from '../../src/core/report/read.js';
import { renderGateJson } from '../../src/core/render/gate-json.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// Two readers of untrusted JSON added for issue 5: the syntax-error locator behind every
// "is not valid JSON" finding's line, checked against the engine's own JSON.parse as the
// reference; and the reader publish mode uses to take back a JSON report.

describe('jsonSyntaxErrorOffset(text)', () => {
  it('is -1 exactly when JSON.parse (ECMA-404 / RFC 8259, the reference) accepts the text', () => {
    const texts = fc.oneof(
      fc.json(),
      fc.string({
        unit: fc.constantFrom(
          '{',
          '}',
          '[',
          ']',
          '"',
          ':',
          ',',
          '1',
          '-',
          '.',
          'e',
          't',
          'r',
          'u',
          'n',
          'l',
          ' ',
          '\\',
          'x',
        ),
      }),
      fc.json().chain((j) => fc.nat({ max: j.length }).map((cut) => j.slice(0, cut))),
      fc
        .tuple(fc.json(), fc.nat(), fc.constantFrom('x', ',', '}', '"', '\u0001', ' '))
        .map(([j, at, c]) => j.slice(0, at % (j.length + 1)) + c + j.slice(at % (j.length + 1))),
    );
    fc.assert(
      fc.property(texts, (text) => {
        let valid = true;
        try {
          JSON.parse(text);
        } catch {
          valid = false;
        }
        expect(jsonSyntaxErrorOffset(text) === -1, JSON.stringify(text)).toBe(valid);
      }),
      { numRuns: 5000 },
    );
  });

  it('points at the character JSON.parse names when it gives a position', () => {
    for (const text of [
      '{"a": 1,}',
      '{"a" 1}',
      '[1, 2',
      '{"a": tru}',
      '{"a": "b\u0001"}',
      '{"a": 0x10}',
      '{}x',
      '["\\q"]',
    ]) {
      let position: number | null = null;
      try {
        JSON.parse(text);
      } catch (error) {
        const at = /position (\d+)/.exec((error as Error).message);
        position = at ? Number(at[1]) : null;
      }
      // Engines differ in which messages carry a position; compare where they do.
      if (position !== null) expect(jsonSyntaxErrorOffset(text), text).toBe(position);
      else expect(jsonSyntaxErrorOffset(text), text).toBeGreaterThanOrEqual(0);
    }
  });

  it('handles 100,000 levels of nesting without recursion', () => {
    const deep = `${'['.repeat(100_000)}${']'.repeat(100_000)}`;
    expect(jsonSyntaxErrorOffset(deep)).toBe(-1);
    expect(jsonSyntaxErrorOffset(`${deep.slice(0, -1)}}`)).toBe(deep.length - 1);
  });

  it('gives parseSource the line of a control character that starts a config.json (an engine message without a position)', () => {
    const error = (() => {
      try {
        parseSource('\u000e{\n  "a": 1\n}\n', 'models/x/config.json');
      } catch (e) {
        return e;
      }
      return null;
    })();
    expect(error).toBeInstanceOf(ReadError);
    expect((error as ReadError).line).toBe(1);
    expect((error as ReadError).reason).toMatch(/^is not valid JSON: Unexpected token/);
    expect((error as ReadError).reason).not.toContain(
      "is not valid JSON: Unexpected token '\u000e', \"",
    );
  });
});

async function report(head: Record<string, unknown>, policy = ''): Promise<GateReport> {
  const path = 'models/a/config.json';
  const files: Record<string, Record<string, Uint8Array>> = {
    ['b'.repeat(40)]: {
      [path]: new TextEncoder().encode(checkpointConfig()),
      'p.yml': new TextEncoder().encode(policy),
    },
    ['c'.repeat(40)]: {
      [path]: new TextEncoder().encode(checkpointConfig(head)),
      'p.yml': new TextEncoder().encode(policy),
    },
  };
  return runGate(
    { read: async (ref, p) => files[ref]?.[p] ?? null },
    {
      base: 'b'.repeat(40),
      head: 'c'.repeat(40),
      changes: [{ status: 'modified', path, previousPath: null }],
      policyPath: 'p.yml',
    },
  );
}

describe('readGateJson(renderGateJson(report), file)', () => {
  it('renders the same comment as the report it was written from (a change that passes, judged by limits)', async () => {
    const original = await report(
      { num_key_value_heads: 8 },
      'serving: { device-memory-gib: 80 }\nlimits:\n  memoryBytes: { max: 100000000000 }\n',
    );
    expect(original.verdict).not.toBe('block');
    const back = readGateJson(renderGateJson(original), 'report.json');
    expect(renderComment(back, { blobUrl: 'https://github.example/o/r/blob/c' })).toBe(
      renderComment(original, { blobUrl: 'https://github.example/o/r/blob/c' }),
    );
  });

  it('renders the same comment for a blocked change, its remedies included', async () => {
    const original = await report({ max_position_embeddings: 16384 });
    expect(original.verdict).toBe('block');
    const back = readGateJson(renderGateJson(original), 'report.json');
    expect(renderComment(back)).toContain('✓ **Fix**');
    expect(renderComment(back)).toBe(renderComment(original));
  });

  it('reads a spec value the JSON wrote as null (it was NaN) back as NaN, so sizes stay "not a number"', async () => {
    const original = await report({ intermediate_size: 'wide' });
    expect(Number.isNaN(original.files[0]!.head!.spec.ffn)).toBe(true);
    const back = readGateJson(renderGateJson(original), 'report.json');
    expect(Number.isNaN(back.files[0]!.head!.spec.ffn)).toBe(true);
    expect(back.files[0]!.head!.spec.trainedSpan).toBe(original.files[0]!.head!.spec.trainedSpan);
    expect(renderComment(back)).toBe(renderComment(original));
  });

  it('refuses a report whose counts do not follow from its findings, and text past its size bound', () => {
    const text = renderGateJson({
      version: 1,
      verdict: 'ok',
      blocking: 2,
      warnings: 0,
      files: [],
      deleted: [],
      notices: [],
      base: 'b'.repeat(40),
      head: 'e'.repeat(40),
      policy: { source: 'built-in', path: 'p', changedInHead: false },
      waiver: { label: null, applied: false, waivedBlocks: 0 },
    });
    expect(() => readGateJson(text, 'r.json')).toThrow(
      'r.json: /blocking is 2 but the findings make it 0; the report was altered',
    );
    expect(() => readGateJson(' '.repeat(64 * 1024 * 1024 + 1), 'r.json')).toThrow(
      /characters long; a report is read up to 67108864/,
    );
  });
});
