import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { ChangedFile } from '../../src/core/changes.js';
import { runGate, type ContentSource } from '../../src/core/gate.js';
import { gateJsonParts, renderGateJson } from '../../src/core/render/gate-json.js';

// The JSON report is written a file at a time (`gateJsonParts`) so that 3,000 files never sit in
// memory as one 40 MB text; the parts must join to exactly what one JSON.stringify of the whole
// report with two-space indentation gives (ECMA-262, JSON.stringify with `space` 2), which the
// round trip through JSON.parse reproduces independently of how the text was put together.

const FIXTURES = new URL('../../fixtures/checkpoints/', import.meta.url);
const encoder = new TextEncoder();

async function reportOf(paths: string[], notices: string[] = []) {
  const head = new Map<string, Uint8Array>();
  const changes: ChangedFile[] = [];
  for (const [i, name] of paths.entries()) {
    // Non-ASCII folder names too: the parts keep every character as the whole text does.
    const file = name.endsWith('.yaml') ? 'model.reach.yaml' : 'config.json';
    const path = `models/${i % 2 === 0 ? 'модели' : 'plain'}/${name.replace(/\..*$/, '')}/${file}`;
    head.set(path, encoder.encode(readFileSync(new URL(name, FIXTURES), 'utf8')));
    changes.push({ status: 'added', path, previousPath: null });
  }
  const source: ContentSource = {
    read: async (ref, path) => (ref === 'head' ? (head.get(path) ?? null) : null),
  };
  return runGate(source, {
    base: 'b'.repeat(40),
    head: 'h'.repeat(40),
    changes,
    policyPath: '.github/context-reach.yml',
    notices,
  });
}

describe('gateJsonParts(report)', () => {
  it('joins to the text of JSON.stringify(whole, null, 2) for a report of many files', async () => {
    const names = readdirSync(FIXTURES).filter((n) => /\.(json|yaml)$/.test(n));
    const report = await reportOf(names, ['a notice with "quotes" and ünïcödé']);
    expect(report.files.length).toBe(names.length);
    const parts = [...gateJsonParts(report)];
    // One part before the files, one per file, one after.
    expect(parts).toHaveLength(report.files.length + 2);
    const text = parts.join('');
    expect(text).toBe(renderGateJson(report));
    expect(text).toBe(`${JSON.stringify(JSON.parse(text), null, 2)}\n`);
    expect((JSON.parse(text) as { files: unknown[] }).files).toHaveLength(names.length);
  });

  it('joins to the same text for one file and for none', async () => {
    for (const names of [['llama2-7b-shape.json'], []]) {
      const report = await reportOf(names);
      const text = [...gateJsonParts(report)].join('');
      expect(text).toBe(`${JSON.stringify(JSON.parse(text), null, 2)}\n`);
      expect((JSON.parse(text) as { files: unknown[] }).files).toHaveLength(names.length);
    }
  });
});
