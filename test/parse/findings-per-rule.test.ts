import { describe, expect, test } from 'vitest';
import { MAX_FINDINGS_PER_RULE } from '../../src/core/parse/fields.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// A file of thousands of unknown or unread keys gets a finding for each of the first
// MAX_FINDINGS_PER_RULE of one rule and one more that counts the rest and names the first of
// them, with its line: every key is still accounted for, the verdict is the same, and the report
// is not tens of thousands of lines long.

const EXTRA = MAX_FINDINGS_PER_RULE + 250;

function checkpointWithUnreadKeys(count: number): string {
  const config = JSON.parse(checkpointConfig()) as Record<string, unknown>;
  for (let i = 0; i < count; i += 1) config[`unread_${i}`] = i;
  return JSON.stringify(config, null, 2);
}

describe('findings of one rule in one file', () => {
  test(`unread checkpoint keys: ${MAX_FINDINGS_PER_RULE} one by one, then one counting the rest from the first not listed`, () => {
    const text = checkpointWithUnreadKeys(EXTRA);
    const { findings } = readModel(text, 'models/a/config.json');
    const unread = findings.filter((f) => f.rule === 'key-unread');
    expect(unread).toHaveLength(MAX_FINDINGS_PER_RULE + 1);
    const listed = unread.slice(0, MAX_FINDINGS_PER_RULE);
    expect(listed.map((f) => f.key)).toEqual(
      Array.from({ length: MAX_FINDINGS_PER_RULE }, (_, i) => `unread_${i}`),
    );
    const rest = unread[MAX_FINDINGS_PER_RULE]!;
    const first = `unread_${MAX_FINDINGS_PER_RULE}`;
    // The line of the first key not listed, counted in the text itself.
    const line = text.split('\n').findIndex((l) => l.includes(`"${first}"`)) + 1;
    expect(rest.key).toBe(first);
    expect(rest.line).toBe(line);
    expect(rest.severity).toBe(listed[0]!.severity);
    expect(rest.message).toContain(`250 more key-unread findings in this file`);
    expect(rest.message).toContain(`the first about ${first} (line ${line})`);
  });

  test('a file just at the limit lists every finding and adds none', () => {
    const { findings } = readModel(
      checkpointWithUnreadKeys(MAX_FINDINGS_PER_RULE),
      'models/a/config.json',
    );
    const unread = findings.filter((f) => f.rule === 'key-unread');
    expect(unread).toHaveLength(MAX_FINDINGS_PER_RULE);
    expect(unread.every((f) => /is not read/.test(f.message))).toBe(true);
  });

  test('unknown keys in the own dialect: every one listed or counted, and the file still has its errors', () => {
    const keys = Array.from({ length: EXTRA }, (_, i) => `extra-${i}: ${i}\n`).join('');
    const text = `format: context-reach-model/1\n${keys}`;
    const { findings } = readModel(text, 'models/a/model.reach.yaml');
    const invalid = findings.filter((f) => f.rule === 'value-invalid');
    expect(invalid).toHaveLength(MAX_FINDINGS_PER_RULE + 1);
    const listed = invalid.filter((f) => /is not a known key/.test(f.message)).length;
    const rest = invalid.find((f) => /more value-invalid findings in this file/.test(f.message));
    const counted = Number(/^([\d,]+) more/.exec(rest?.message ?? '')?.[1]?.replace(/,/g, ''));
    // The missing model block takes one of the listed places; every unknown key is accounted for.
    expect(listed + counted).toBe(EXTRA);
    expect(rest?.severity).toBe('block');
    expect(rest?.key).toBe(`extra-${listed}`);
    expect(rest?.line).toBe(listed + 2);
  });
});
