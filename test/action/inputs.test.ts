import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { describe, expect, test } from 'vitest';
import { parse } from 'yaml';
import { InputError, readSettings } from '../../src/action/inputs.js';

const action = parse(readFileSync(new URL('../../action.yml', import.meta.url), 'utf8')) as {
  inputs: Record<string, { description: string; default?: string; required?: boolean }>;
  outputs: Record<string, { description: string }>;
  runs: { using: string; main: string };
  branding: { icon: string; color: string };
};

/** Inputs as the runner passes them: every input of action.yml with its default, then overrides. */
function inputs(overrides: Record<string, string> = {}): (name: string) => string {
  const values: Record<string, string> = {};
  for (const [name, spec] of Object.entries(action.inputs)) values[name] = spec.default ?? '';
  // The runner expands the expression before the action sees it.
  values['github-token'] = 'ghs_exampleToken123';
  Object.assign(values, overrides);
  return (name) => {
    if (!(name in action.inputs))
      throw new Error(`readSettings asked for ${name}, which action.yml does not declare`);
    return values[name] ?? '';
  };
}

describe('readSettings(getInput, env)', () => {
  test("every default, with the runner passing action.yml's defaults", () => {
    expect(readSettings(inputs(), { RUNNER_TEMP: '/runner/_temp' })).toEqual({
      token: 'ghs_exampleToken123',
      policyPath: '.github/context-reach.yml',
      failOn: 'block',
      comment: 'update',
      suggestions: 'on',
      reportJson: join('/runner/_temp', 'context-reach', 'report.json'),
      sarif: null,
      base: null,
      htmlReport: null,
      htmlReportUrl: null,
      publishReport: null,
    });
  });

  test('every default, with no input set at all (e.g. a local run)', () => {
    expect(readSettings(() => '', {})).toEqual({
      token: '',
      policyPath: '.github/context-reach.yml',
      failOn: 'block',
      comment: 'update',
      suggestions: 'on',
      reportJson: join(tmpdir(), 'context-reach', 'report.json'),
      sarif: null,
      base: null,
      htmlReport: null,
      htmlReportUrl: null,
      publishReport: null,
    });
  });

  test('takes every input it is given, trimmed', () => {
    expect(
      readSettings(
        inputs({
          policy: ' config/reach-policy.yaml ',
          'fail-on': 'warn',
          comment: 'off',
          'report-json': 'out/r.json',
          sarif: 'out/r.sarif',
          base: 'release/2.0',
          'html-report': 'out/r.html',
          'publish-report': ' artifact/report.json ',
          'html-report-url': ' https://example.org/reports/7.html ',
          suggestions: ' off ',
        }),
        { RUNNER_TEMP: '/t' },
      ),
    ).toEqual({
      token: 'ghs_exampleToken123',
      policyPath: 'config/reach-policy.yaml',
      failOn: 'warn',
      comment: 'off',
      suggestions: 'off',
      reportJson: 'out/r.json',
      sarif: 'out/r.sarif',
      base: 'release/2.0',
      htmlReport: 'out/r.html',
      publishReport: 'artifact/report.json',
      htmlReportUrl: 'https://example.org/reports/7.html',
    });
    expect(readSettings(inputs({ 'fail-on': 'never' }), {}).failOn).toBe('never');
  });

  test.each([
    [
      'fail-on',
      'sometimes',
      'Input "fail-on" is "sometimes"; expected one of block, warn, never (action.yml, input fail-on).',
    ],
    [
      'fail-on',
      'Block',
      'Input "fail-on" is "Block"; expected one of block, warn, never (action.yml, input fail-on).',
    ],
    [
      'comment',
      'create',
      'Input "comment" is "create"; expected one of update, off (action.yml, input comment).',
    ],
    [
      'suggestions',
      'yes',
      'Input "suggestions" is "yes"; expected one of on, off (action.yml, input suggestions).',
    ],
    [
      'policy',
      '../outside.yml',
      'Input "policy" is "../outside.yml"; expected a path inside the repository such as ".github/context-reach.yml" (relative, "/" separators, no "." or ".." parts) (action.yml, input policy).',
    ],
    [
      'policy',
      '/etc/policy.yml',
      'Input "policy" is "/etc/policy.yml"; expected a path inside the repository such as ".github/context-reach.yml" (relative, "/" separators, no "." or ".." parts) (action.yml, input policy).',
    ],
    [
      'policy',
      'C:/policy.yml',
      'Input "policy" is "C:/policy.yml"; expected a path inside the repository such as ".github/context-reach.yml" (relative, "/" separators, no "." or ".." parts) (action.yml, input policy).',
    ],
    [
      'base',
      '--upload-pack=x',
      'Input "base" is "--upload-pack=x"; expected a branch, tag or commit id such as "main" (action.yml, input base).',
    ],
    [
      'base',
      'main..feature',
      'Input "base" is "main..feature"; expected a branch, tag or commit id such as "main" (action.yml, input base).',
    ],
    [
      'report-json',
      'out/\u0007.json',
      'Input "report-json" is "out/\\u0007.json"; expected a file path without control characters (action.yml, input report-json).',
    ],
    [
      'sarif',
      'a\u0000b',
      'Input "sarif" is "a\\u0000b"; expected a file path without control characters (action.yml, input sarif).',
    ],
    [
      'html-report',
      'x\u001bb',
      'Input "html-report" is "x\\u001bb"; expected a file path without control characters (action.yml, input html-report).',
    ],
    [
      'html-report-url',
      'javascript:alert(1)',
      'Input "html-report-url" is "javascript:alert(1)"; expected an absolute http or https URL such as "https://example.org/report.html" (action.yml, input html-report-url).',
    ],
    [
      'html-report-url',
      'reports/7.html',
      'Input "html-report-url" is "reports/7.html"; expected an absolute http or https URL such as "https://example.org/report.html" (action.yml, input html-report-url).',
    ],
    [
      'publish-report',
      'report\n.json',
      'Input "publish-report" is "report\\n.json"; expected a file path without control characters (action.yml, input publish-report).',
    ],
  ])('input %s = %j is refused with a message naming it', (name, value, message) => {
    const read = (): unknown => readSettings(inputs({ [name]: value }), {});
    expect(read).toThrow(InputError);
    expect(read).toThrow(message);
  });

  test('a token with whitespace is refused without quoting it', () => {
    const read = (): unknown => readSettings(inputs({ 'github-token': 'ghs_abc def' }), {});
    expect(read).toThrow(
      'Input "github-token" contains whitespace; expected a single token (action.yml, input github-token).',
    );
    try {
      read();
    } catch (error) {
      expect((error as Error).message).not.toContain('ghs_abc');
    }
  });
});

describe('action.yml', () => {
  test('runs the bundle on node24 and declares the inputs and outputs of the gate', () => {
    expect(action.runs).toEqual({ using: 'node24', main: 'dist/index.js' });
    expect(Object.keys(action.inputs)).toEqual([
      'github-token',
      'policy',
      'fail-on',
      'comment',
      'suggestions',
      'report-json',
      'sarif',
      'base',
      'html-report',
      'html-report-url',
      'publish-report',
    ]);
    expect(Object.keys(action.outputs)).toEqual([
      'verdict',
      'blocking',
      'warnings',
      'report-json',
      'comment-url',
    ]);
    expect(action.branding.icon).not.toBe('');
  });

  test('every input has a description and a default', () => {
    for (const [name, spec] of Object.entries(action.inputs)) {
      expect(spec.description.length, name).toBeGreaterThan(20);
      expect(typeof spec.default, name).toBe('string');
    }
    expect(action.inputs['github-token']?.default).toBe('${{ github.token }}');
    expect(action.inputs['fail-on']?.default).toBe('block');
    expect(action.inputs.comment?.default).toBe('update');
    expect(action.inputs.suggestions?.default).toBe('on');
    expect(action.inputs.policy?.default).toBe('.github/context-reach.yml');
  });

  test('every output has a description', () => {
    for (const [name, spec] of Object.entries(action.outputs))
      expect(spec.description.length, name).toBeGreaterThan(10);
  });

  test('the Settings doc lines give the same defaults as action.yml', () => {
    const source = readFileSync(new URL('../../src/action/inputs.ts', import.meta.url), 'utf8');
    expect(source).toContain('(default: `${{ github.token }}`)');
    expect(source).toContain('(default: `.github/context-reach.yml`)');
    expect(source).toContain('(default: `block`)');
    expect(source).toContain('(default: `update`)');
    expect(source).toContain('(default: `on`)');
    expect(source).toContain('(default: `${RUNNER_TEMP}/context-reach/report.json`)');
  });
});
