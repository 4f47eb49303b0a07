import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { EOL, tmpdir } from 'node:os';
import { join } from 'node:path';
import * as core from '@actions/core';
import fc from 'fast-check';
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  appendSummary,
  commandLine,
  outputBlock,
  readInput,
  setOutput,
} from '../../src/action/workflow-commands.js';
import { parseOutputFile } from '../support/run-bundle.js';

// The runner protocol written by the action itself, checked against GitHub's documented examples
// and against the toolkit's own implementation (@actions/core, the npm reference library), which
// it replaces at run time only to spare start-up.

/** What @actions/core writes to standard output for one call, line end removed. */
function printedByToolkit(call: () => void): string {
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

const text = fc.string({
  unit: fc.constantFrom('a', 'Z', ' ', '%', '\r', '\n', ':', ',', '=', 'ü', '<', '25'),
  maxLength: 20,
});

describe('commandLine(name, properties, message)', () => {
  it("writes GitHub's documented annotation example (workflow commands docs, from memory)", () => {
    expect(
      commandLine('error', { file: 'app.js', line: 1, col: 5, endColumn: 7 }, 'Missing semicolon'),
    ).toBe('::error file=app.js,line=1,col=5,endColumn=7::Missing semicolon');
  });

  it('escapes %, CR and LF in messages and also : and , in property values', () => {
    expect(commandLine('warning', { title: 'a:b,c' }, '50%\r\nnext')).toBe(
      '::warning title=a%3Ab%2Cc::50%25%0D%0Anext',
    );
  });

  it('leaves out empty properties and prints no space without any', () => {
    expect(commandLine('notice', { title: '', file: undefined }, 'm')).toBe('::notice::m');
  });

  it('is what @actions/core prints for annotations, for any message, title and file', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<'error' | 'warning' | 'notice'>('error', 'warning', 'notice'),
        text,
        text,
        text,
        fc.option(fc.integer({ min: 1, max: 10_000 }), { nil: undefined }),
        (level, message, title, file, line) => {
          const ours = commandLine(level, { title, file, line }, message);
          // With every property empty the toolkit still prints the space before `::`; the runner
          // splits the command name at that space and reads the same command (from memory).
          const theirs = printedByToolkit(() =>
            core[level](message, {
              title,
              file,
              ...(line !== undefined ? { startLine: line } : {}),
            }),
          ).replace(/^::(error|warning|notice) ::/, '::$1::');
          expect(ours).toBe(theirs);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('masks a secret the way @actions/core does', () => {
    fc.assert(
      fc.property(text, (secret) => {
        expect(commandLine('add-mask', {}, secret)).toBe(
          printedByToolkit(() => core.setSecret(secret)),
        );
      }),
    );
  });
});

describe('readInput(env, name)', () => {
  it('reads INPUT_<NAME> upper-cased with spaces as underscores, trimmed, as @actions/core.getInput does', () => {
    const env = {
      'INPUT_GITHUB-TOKEN': '  t0k  ',
      INPUT_FAIL_ON: 'warn',
      'INPUT_HTML-REPORT-URL': '',
    };
    expect(readInput(env, 'github-token')).toBe('t0k');
    expect(readInput(env, 'fail on')).toBe('warn');
    expect(readInput(env, 'html-report-url')).toBe('');
    expect(readInput(env, 'missing')).toBe('');
    const saved = { ...process.env };
    try {
      Object.assign(process.env, env);
      for (const name of ['github-token', 'fail on', 'html-report-url', 'missing'])
        expect(readInput(env, name)).toBe(core.getInput(name));
    } finally {
      for (const key of Object.keys(env)) if (!(key in saved)) delete process.env[key];
    }
  });
});

describe('setOutput(env, name, value) and appendSummary(env, markdown)', () => {
  let dir: string | undefined;
  afterEach(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
    dir = undefined;
  });

  it('appends name<<delimiter blocks that read back exactly, multi-line values included', () => {
    dir = mkdtempSync(join(tmpdir(), 'context-reach-commands-'));
    const file = join(dir, 'output.txt');
    writeFileSync(file, '');
    setOutput({ GITHUB_OUTPUT: file }, 'verdict', 'block');
    setOutput({ GITHUB_OUTPUT: file }, 'comment-url', 'line one\nline two');
    expect(parseOutputFile(readFileSync(file, 'utf8'))).toEqual({
      verdict: 'block',
      'comment-url': 'line one\nline two',
    });
  });

  it('writes the block @actions/core writes, delimiter aside', () => {
    dir = mkdtempSync(join(tmpdir(), 'context-reach-commands-'));
    const file = join(dir, 'output.txt');
    writeFileSync(file, '');
    const saved = process.env.GITHUB_OUTPUT;
    process.env.GITHUB_OUTPUT = file;
    try {
      core.setOutput('report-json', '/tmp/r.json');
    } finally {
      if (saved === undefined) delete process.env.GITHUB_OUTPUT;
      else process.env.GITHUB_OUTPUT = saved;
    }
    const theirs = readFileSync(file, 'utf8');
    const delimiter = /<<(.+)/.exec(theirs)![1]!.trim();
    expect(`${outputBlock('report-json', '/tmp/r.json', delimiter)}${EOL}`).toBe(theirs);
  });

  it('refuses a value that contains its delimiter, and a missing output file', () => {
    expect(() => outputBlock('x', 'a ghadelimiter_1 b', 'ghadelimiter_1')).toThrow(
      /contains the delimiter/,
    );
    expect(() =>
      setOutput({ GITHUB_OUTPUT: join(tmpdir(), 'context-reach-no-such-file') }, 'x', 'y'),
    ).toThrow(/is missing/);
  });

  it('appends the summary with a line end, and says when the runner names no summary file', () => {
    dir = mkdtempSync(join(tmpdir(), 'context-reach-commands-'));
    const file = join(dir, 'summary.md');
    writeFileSync(file, 'before\n');
    appendSummary({ GITHUB_STEP_SUMMARY: file }, '## Report');
    expect(readFileSync(file, 'utf8')).toBe(`before\n## Report${EOL}`);
    expect(() => appendSummary({}, 'x')).toThrow(/GITHUB_STEP_SUMMARY is not set/);
  });
});
