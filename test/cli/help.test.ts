import { describe, expect, it } from 'vitest';
import { DIFF_USAGE } from '../../src/cli/diff.js';
import { INSPECT_USAGE } from '../../src/cli/inspect.js';
import { SERVING_FLAGS } from '../../src/cli/options.js';
import { DEMO_USAGE } from '../../src/cli/run.js';
import { FLOAT_FORMATS, STORAGE_DTYPES } from '../../src/core/model.js';

/** The option lines of a usage text: flag and description. */
function options(usage: string): Map<string, string> {
  const body = usage.slice(usage.indexOf('options:\n') + 'options:\n'.length);
  return new Map(
    body
      .split('\n')
      .map((line) => /^ {2}(--[a-z-]+|\S+)(?: \S+)?\s{2,}(.*)$/.exec(line))
      .filter((m) => m !== null)
      .map((m) => [m[1]!, m[2]!]),
  );
}

describe('--help of every command', () => {
  const commands: [string, string, string[]][] = [
    [
      'inspect',
      INSPECT_USAGE,
      ['--json', '--at', ...Object.keys(SERVING_FLAGS).map((f) => `--${f}`)],
    ],
    [
      'diff',
      DIFF_USAGE,
      [
        '--base',
        '--head',
        '--policy',
        '--format',
        '--fail-on',
        '--label',
        '--html',
        ...Object.keys(SERVING_FLAGS).map((f) => `--${f}`),
      ],
    ],
    ['demo', DEMO_USAGE, ['--format', '--keep', '--html']],
  ];

  it.each(commands)('%s lists each option it accepts, with a default', (_name, usage, flags) => {
    const listed = options(usage);
    for (const flag of flags) {
      expect(listed.has(flag), flag).toBe(true);
      expect(listed.get(flag), flag).toMatch(/\(default: [^)]+\)$/);
    }
  });

  it('gives units for sizes and the allowed values for choices', () => {
    const listed = options(INSPECT_USAGE);
    expect(listed.get('--served-span')).toMatch(/^tokens /);
    expect(listed.get('--device-gib')).toContain('GiB (2^30 bytes)');
    expect(listed.get('--cache-dtype')).toContain(`one of ${STORAGE_DTYPES.join(', ')}`);
    expect(listed.get('--position-dtype')).toContain(`one of ${FLOAT_FORMATS.join(', ')}`);
    expect(options(DIFF_USAGE).get('--fail-on')).toContain('one of block, warn, never');
    expect(options(DEMO_USAGE).get('--format')).toContain('one of markdown, text, json');
  });
});
