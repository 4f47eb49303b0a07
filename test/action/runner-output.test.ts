import crypto from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { syncBuiltinESMExports } from 'node:module';
import { EOL, tmpdir } from 'node:os';
import { join } from 'node:path';
import * as core from '@actions/core';
import fc from 'fast-check';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { forgetSummaryPath } from '../support/summary-path.js';
import { readSettings } from '../../src/action/inputs.js';
import { createRunnerOutput, type Toolkit } from '../../src/action/runner-output.js';
import * as toolkit from '../../src/action/toolkit.js';
import type { Annotation } from '../../src/core/render/annotations.js';
import { parseAnnotations, parseOutputFile } from '../support/run-bundle.js';

// The runner protocol as the action writes it through the toolkit (@actions/core), checked
// against GitHub's documented commands ("Workflow commands for GitHub Actions": `%`, CR and LF
// escaped as `%25`, `%0D`, `%0A` in messages; in property values also `:` and `,` as `%3A`,
// `%2C`; outputs as `name<<delimiter` blocks in the file at GITHUB_OUTPUT; the job summary
// appended to the file at GITHUB_STEP_SUMMARY).

/** What the adapter writes to standard output for one call, line end removed. */
function printed(call: () => void): string {
  const lines: string[] = [];
  const spy = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    lines.push(String(chunk));
    return true;
  });
  try {
    call();
  } finally {
    spy.mockRestore();
  }
  return lines.join('').replace(/\r?\n$/, '');
}

/** A message as GitHub's documentation escapes it. */
const documentedMessage = (text: string): string =>
  text.replace(/%/g, '%25').replace(/\r/g, '%0D').replace(/\n/g, '%0A');

/** A property value as GitHub's documentation escapes it. */
const documentedProperty = (text: string): string =>
  documentedMessage(text).replace(/:/g, '%3A').replace(/,/g, '%2C');

const annotation = (fields: Partial<Annotation>): Annotation => ({
  level: 'error',
  title: '',
  message: '',
  file: '',
  line: null,
  ...fields,
});

const text = fc.string({
  unit: fc.constantFrom('a', 'Z', ' ', '%', '\r', '\n', ':', ',', '=', 'ü', '<', '25'),
  maxLength: 20,
});

// The action loads its toolkit (src/action/toolkit.ts: @actions/core's own command, file-command and
// summary modules, without the entry's OIDC client); every check runs on it and on @actions/core.
const toolkits: [string, Toolkit & Pick<typeof core, 'getInput'>][] = [
  ['@actions/core', core],
  ["the action's toolkit", toolkit],
];

describe.each(toolkits)('through %s', (_name, kit) => {
  const out = createRunnerOutput(kit);

  describe('createRunnerOutput(core).annotate(annotation)', () => {
    it("writes GitHub's documented annotation example (workflow commands docs, from memory)", () => {
      expect(
        printed(() =>
          out.annotate(annotation({ file: 'app.js', line: 1, message: 'Missing semicolon' })),
        ),
      ).toBe('::error file=app.js,line=1::Missing semicolon');
    });

    it('escapes %, CR and LF in messages and also : and , in property values', () => {
      expect(
        printed(() =>
          out.annotate(annotation({ level: 'warning', title: 'a:b,c', message: '50%\r\nnext' })),
        ),
      ).toBe('::warning title=a%3Ab%2Cc::50%25%0D%0Anext');
    });

    it('leaves out empty properties; the runner reads the command without any', () => {
      const line = printed(() => out.annotate(annotation({ level: 'notice', message: 'm' })));
      // The toolkit prints a space after the name even when every property is empty; the runner
      // splits the command name at that space and reads the same command (from memory).
      expect(line).toBe('::notice ::m');
      expect(parseAnnotations(line)).toEqual([{ level: 'notice', properties: {}, message: 'm' }]);
      expect(printed(() => out.notice('m'))).toBe('::notice::m');
    });

    it('is the documented command for any message, title and file', () => {
      fc.assert(
        fc.property(
          fc.constantFrom<'error' | 'warning' | 'notice'>('error', 'warning', 'notice'),
          text,
          text,
          text,
          fc.option(fc.integer({ min: 1, max: 10_000 }), { nil: null }),
          (level, message, title, file, line) => {
            const properties = [
              title !== '' ? `title=${documentedProperty(title)}` : '',
              file !== '' ? `file=${documentedProperty(file)}` : '',
              line !== null ? `line=${line}` : '',
            ].filter(Boolean);
            expect(printed(() => out.annotate({ level, message, title, file, line }))).toBe(
              `::${level} ${properties.join(',')}::${documentedMessage(message)}`,
            );
          },
        ),
        { numRuns: 300 },
      );
    });

    it('masks a secret with the documented add-mask command', () => {
      fc.assert(
        fc.property(text, (secret) => {
          expect(printed(() => out.secret(secret))).toBe(
            `::add-mask::${documentedMessage(secret)}`,
          );
        }),
      );
    });
  });

  describe('the inputs, read through getInput', () => {
    afterEach(() => {
      vi.unstubAllEnvs();
    });

    it('reads INPUT_<NAME> upper-cased with spaces as underscores, trimmed (action metadata docs)', () => {
      const env = {
        'INPUT_GITHUB-TOKEN': '  t0k  ',
        INPUT_FAIL_ON: 'warn',
        'INPUT_HTML-REPORT-URL': '',
      };
      for (const [name, value] of Object.entries(env)) vi.stubEnv(name, value);
      expect(kit.getInput('github-token')).toBe('t0k');
      expect(kit.getInput('fail on')).toBe('warn');
      expect(kit.getInput('html-report-url')).toBe('');
      expect(kit.getInput('missing')).toBe('');
      // The entry hands kit.getInput to readSettings: the token arrives trimmed.
      expect(readSettings((name) => kit.getInput(name), {}).token).toBe('t0k');
    });
  });

  describe('createRunnerOutput(core).output(name, value) and .summary(markdown)', () => {
    let dir: string | undefined;
    afterEach(() => {
      vi.unstubAllEnvs();
      if (dir) rmSync(dir, { recursive: true, force: true });
      dir = undefined;
    });
    /** An empty output file in a folder of its own, named by GITHUB_OUTPUT. */
    const outputFile = (): string => {
      dir = mkdtempSync(join(tmpdir(), 'context-reach-commands-'));
      const file = join(dir, 'output.txt');
      writeFileSync(file, '');
      vi.stubEnv('GITHUB_OUTPUT', file);
      return file;
    };

    it('appends name<<delimiter blocks that read back exactly, multi-line values included', () => {
      const file = outputFile();
      out.output('verdict', 'block');
      out.output('comment-url', 'line one\nline two');
      expect(parseOutputFile(readFileSync(file, 'utf8'))).toEqual({
        verdict: 'block',
        'comment-url': 'line one\nline two',
      });
    });

    it('writes the documented block with a random delimiter', () => {
      const file = outputFile();
      out.output('report-json', '/tmp/r.json');
      const written = readFileSync(file, 'utf8');
      const delimiter = /<<(.+)/.exec(written)![1]!.trim();
      expect(delimiter).toMatch(/^ghadelimiter_[0-9a-f-]{36}$/);
      expect(written).toBe(`report-json<<${delimiter}${EOL}/tmp/r.json${EOL}${delimiter}${EOL}`);
    });

    it('refuses a value that contains its delimiter, and a missing output file', () => {
      const file = outputFile();
      // The delimiter is random; fixed here so a value can contain it.
      const uuid = vi.spyOn(crypto, 'randomUUID').mockReturnValue('1-1-1-1-1');
      syncBuiltinESMExports();
      try {
        expect(() => out.output('x', 'a ghadelimiter_1-1-1-1-1 b')).toThrow(
          /should not contain the delimiter/,
        );
      } finally {
        uuid.mockRestore();
        syncBuiltinESMExports();
      }
      expect(readFileSync(file, 'utf8')).toBe('');
      vi.stubEnv('GITHUB_OUTPUT', join(tmpdir(), 'context-reach-no-such-file'));
      expect(() => out.output('x', 'y')).toThrow(/Missing file at path/);
    });

    it('appends the summary with a line end, and says when the runner names no summary file', async () => {
      dir = mkdtempSync(join(tmpdir(), 'context-reach-commands-'));
      const file = join(dir, 'summary.md');
      writeFileSync(file, 'before\n');
      // The toolkit keeps the file's path once it has found one: forgotten first, then asked.
      forgetSummaryPath();
      vi.stubEnv('GITHUB_STEP_SUMMARY', '');
      await expect(out.summary('x')).rejects.toThrow(/GITHUB_STEP_SUMMARY/);
      vi.stubEnv('GITHUB_STEP_SUMMARY', file);
      await out.summary('## Report');
      expect(readFileSync(file, 'utf8')).toBe(`before\n## Report${EOL}`);
      forgetSummaryPath();
    });

    it('fails the step: exit status 1 and an error command', () => {
      const saved = process.exitCode;
      try {
        expect(printed(() => out.fail('stop: 100%'))).toBe('::error::stop: 100%25');
        expect(process.exitCode).toBe(1);
      } finally {
        process.exitCode = saved;
      }
    });
  });
});

describe("the action's toolkit against @actions/core", () => {
  afterEach(() => {
    vi.unstubAllEnvs();
  });

  const properties = fc.record(
    {
      title: text,
      file: text,
      startLine: fc.nat({ max: 1000 }),
      endLine: fc.nat({ max: 1000 }),
      startColumn: fc.nat({ max: 100 }),
    },
    { requiredKeys: [] },
  );

  it('writes byte for byte the workflow commands @actions/core writes, for any text', () => {
    const saved = process.exitCode;
    try {
      fc.assert(
        fc.property(text, properties, text, (message, props, name) => {
          for (const kind of ['error', 'warning', 'notice'] as const)
            expect(printed(() => toolkit[kind](message, props))).toBe(
              printed(() => core[kind](message, props)),
            );
          expect(printed(() => toolkit.setSecret(message))).toBe(
            printed(() => core.setSecret(message)),
          );
          expect(printed(() => toolkit.info(message))).toBe(printed(() => core.info(message)));
          expect(printed(() => toolkit.setFailed(message))).toBe(
            printed(() => core.setFailed(message)),
          );
          // Without an output file, the old set-output command.
          vi.stubEnv('GITHUB_OUTPUT', '');
          expect(printed(() => toolkit.setOutput(name, message))).toBe(
            printed(() => core.setOutput(name, message)),
          );
        }),
        { numRuns: 200 },
      );
    } finally {
      process.exitCode = saved;
    }
  });

  it('writes the same output blocks, but for the random delimiter', () => {
    const dir = mkdtempSync(join(tmpdir(), 'context-reach-commands-'));
    try {
      const ours = join(dir, 'ours.txt');
      const theirs = join(dir, 'theirs.txt');
      const delimiters = (written: string) => written.replace(/ghadelimiter_[0-9a-f-]{36}/g, 'D');
      fc.assert(
        fc.property(text, text, (name, value) => {
          writeFileSync(ours, '');
          writeFileSync(theirs, '');
          vi.stubEnv('GITHUB_OUTPUT', ours);
          toolkit.setOutput(name, value);
          vi.stubEnv('GITHUB_OUTPUT', theirs);
          core.setOutput(name, value);
          expect(delimiters(readFileSync(ours, 'utf8'))).toBe(
            delimiters(readFileSync(theirs, 'utf8')),
          );
        }),
        { numRuns: 100 },
      );
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('reads an input as @actions/core does: INPUT_<NAME>, spaces as _, upper case, trimmed', () => {
    fc.assert(
      fc.property(fc.stringMatching(/^[a-z][a-z -]{0,12}$/), text, (name, value) => {
        vi.stubEnv(`INPUT_${name.replace(/ /g, '_').toUpperCase()}`, value);
        expect(toolkit.getInput(name)).toBe(core.getInput(name));
      }),
    );
  });
});
