import {
  mkdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  symlinkSync,
  writeFileSync,
  lstatSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { writeReportFile } from '../../src/action/write-report.js';

// Round two (issue 13, point 11): the report files are never written through a symbolic link a
// pull request put in the checkout (a file named like the report, or a folder on its way).

/** Folders `setup` made, removed after each test. */
const roots: string[] = [];
afterEach(() => {
  for (const root of roots.splice(0)) rmSync(root, { recursive: true, force: true });
});

function setup() {
  const root = mkdtempSync(join(tmpdir(), 'context-reach-write-'));
  roots.push(root);
  const workspace = join(root, 'checkout');
  const outside = join(root, 'outside');
  mkdirSync(workspace);
  mkdirSync(outside);
  const canary = join(outside, 'hook.sh');
  writeFileSync(canary, '#!/bin/sh\necho canary\n');
  return { workspace, outside, canary };
}

describe('report files and symbolic links in the checkout', () => {
  it('a symlink named like the report: refused, the file it points to untouched', async () => {
    const { workspace, canary } = setup();
    mkdirSync(join(workspace, 'context-reach'));
    symlinkSync(canary, join(workspace, 'context-reach', 'report.json'));
    await expect(
      writeReportFile('context-reach/report.json', '{"x":1}', workspace, workspace),
    ).rejects.toThrow(/report\.json is a symbolic link; the report is not written through it/);
    expect(readFileSync(canary, 'utf8')).toContain('canary');
  });

  it('a symlinked folder on the way: refused, nothing written outside the checkout', async () => {
    const { workspace, outside } = setup();
    symlinkSync(outside, join(workspace, 'reports'));
    await expect(
      writeReportFile(join(workspace, 'reports', 'out', 'report.sarif'), '{}', workspace),
    ).rejects.toThrow(/reports in the checkout is a symbolic link/);
    expect(() => lstatSync(join(outside, 'out'))).toThrow();
  });

  it('a regular path in the checkout is written, folders made; a path outside it (RUNNER_TEMP) too', async () => {
    const { workspace, outside } = setup();
    await writeReportFile('a/b/report.json', 'one', workspace, workspace);
    await writeReportFile('a/b/report.json', 'two', workspace, workspace);
    expect(readFileSync(join(workspace, 'a', 'b', 'report.json'), 'utf8')).toBe('two');
    await writeReportFile(
      join(outside, 'temp', 'context-reach', 'report.json'),
      'three',
      workspace,
    );
    expect(readFileSync(join(outside, 'temp', 'context-reach', 'report.json'), 'utf8')).toBe(
      'three',
    );
  });
});

describe('a report given in parts', () => {
  it('is written byte for byte as Node encodes the joined text as UTF-8 (TextEncoder)', async () => {
    const { workspace } = setup();
    // Parts past Latin-1 (−, ×, an astral character as a surrogate pair), many small parts that
    // cross the 1 MiB write size, and single parts larger than it.
    const parts = [
      '{"a": "−×\u{1F600}"',
      ...Array.from({ length: 40_000 }, (_, i) => `,\n  "k${i}": "${'é'.repeat(i % 50)}−"`),
      `, "big": "${'\u{1F600}'.repeat(300_000)}"`,
      `, "ascii": "${'x'.repeat(1_500_000)}"`,
      '',
      '}\n',
    ];
    await writeReportFile('report.json', parts, workspace, workspace);
    const written = readFileSync(join(workspace, 'report.json'));
    const expected = new TextEncoder().encode(parts.join(''));
    expect(written.length).toBe(expected.length);
    expect(Buffer.compare(written, Buffer.from(expected))).toBe(0);
  });
});
