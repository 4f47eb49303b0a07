import { describe, expect, it } from 'vitest';
import type { GateReport } from '../../src/core/report/types.js';
import { BaseUnreadableError, runGate, type ContentSource } from '../../src/core/gate.js';
import { runScenario, type ScenarioResult } from '../support/action-harness.js';
import { checkedFakes } from './checked-scenarios.js';
import { checkpointConfig, type Tree } from '../support/scenario-repo.js';

// Issue 13's "done when": no path through the action turns a block into ok because something
// could not be read or parsed. A base version that reads but does not parse, or that is not a
// regular file, used to leave the head judged alone (every base-against-head rule dropped out):
// a span grown with the code unchanged passed. Now it blocks with `base-unreadable`, which the
// policy's waiver label (or a `rules` entry in the base branch's policy) lets a team pass
// deliberately, so a pull request that repairs a broken base is not stuck. The action runs
// in-process with the real git and GitHub adapters (git history, and none: the API path).

const MODEL = 'models/a/config.json';
const YAML_MODEL = 'models/b/chat.reach.yaml';
const POLICY_PATH = '.github/context-reach.yml';
/** Judged on its own this head passes; against a base of 4,096 positions it blocks. */
const HEAD = checkpointConfig({ max_position_embeddings: 16384 });
const YAML_HEAD = `format: context-reach-model/1
model:
  layers: 24
  hidden: 2048
  heads: 16
  vocab: 50304
  position: { code: rotary }
  declared-span: 16384
`;

/** Every fake of a run, checked against GitHub's REST description and closed after each test. */
const { fakes } = checkedFakes();

async function run(
  base: Tree,
  head: Tree,
  options: { noHistory?: boolean; labels?: string[] } = {},
): Promise<{ result: ScenarioResult; report: GateReport }> {
  const result = await runScenario({ base, head, ...options });
  fakes.push(result.fake);
  expect(result.error).toBeNull();
  const json = Object.values(result.written)[0];
  expect(json, 'a report was written').toBeDefined();
  return { result, report: JSON.parse(json!) as GateReport };
}

const ruleIds = (report: GateReport, path: string) =>
  report.files.find((f) => f.path === path)!.findings.map((f) => f.rule);

describe('the same head, judged alone, passes (the control: what the old code fell back to)', () => {
  it.each([[false], [true]])('an added file (no history: %s): verdict ok', async (noHistory) => {
    const { result } = await run({}, { [MODEL]: HEAD, [YAML_MODEL]: YAML_HEAD }, { noHistory });
    expect(result.out.outputs.verdict).toBe('ok');
  });
});

describe('a base version that reads but does not parse fails closed', () => {
  const broken: [string, Tree, Tree, string][] = [
    [
      'JSON with a syntax error',
      { [MODEL]: checkpointConfig().replace('"hidden_size": 2048,', '"hidden_size": 2048,,') },
      { [MODEL]: HEAD },
      MODEL,
    ],
    [
      'JSON with a duplicate key',
      {
        [MODEL]: checkpointConfig().replace(
          '"hidden_size": 2048,',
          '"vocab_size": 1, "hidden_size": 2048,',
        ),
      },
      { [MODEL]: HEAD },
      MODEL,
    ],
    [
      'YAML with a bad indentation',
      {
        [YAML_MODEL]: YAML_HEAD.replace('declared-span: 16384', 'declared-span: 4096\n   heads: 2'),
      },
      { [YAML_MODEL]: YAML_HEAD },
      YAML_MODEL,
    ],
  ];
  for (const noHistory of [false, true]) {
    it.each(broken)(
      `%s (no history: ${noHistory}): verdict block, base-unreadable names the file and why`,
      async (_name, base, head, path) => {
        const { result, report } = await run(base, head, { noHistory });
        expect(result.out.outputs.verdict).toBe('block');
        const file = report.files.find((f) => f.path === path)!;
        expect(file.status).toBe('modified');
        expect(file.baseError).not.toBeNull();
        const finding = file.findings.find((f) => f.rule === 'base-unreadable')!;
        expect(finding).toMatchObject({ severity: 'block', counts: 'block', line: null });
        expect(finding.message).toContain(`The base version does not read: ${path}`);
        expect(finding.message).toMatch(/not judged against the base/);
        expect(finding.message).toMatch(/waiver label/);
        // The head is still judged on its own: its own findings are there beside it.
        expect(file.head).not.toBeNull();
        expect(result.out.failed).toMatch(/1 blocking finding/);
      },
    );
  }
});

describe('a base version over the size limit fails closed, and can be passed deliberately', () => {
  // 4 MiB + 1 byte of spaces after a valid config: refused from its size, never read.
  const huge = `${checkpointConfig()}${' '.repeat(4 * 1024 * 1024 + 1)}`;
  const policy = 'waiver-label: repair-base\n';

  it.each([[false], [true]])(
    'no history: %s: base-unreadable with the size, the waiver label turns it into a warning',
    async (noHistory) => {
      const base = { [POLICY_PATH]: policy, [MODEL]: huge };
      const head = { [POLICY_PATH]: policy, [MODEL]: HEAD };
      const blocked = await run(base, head, { noHistory });
      expect(blocked.result.out.outputs.verdict).toBe('block');
      const finding = blocked.report.files[0]!.findings.find((f) => f.rule === 'base-unreadable')!;
      expect(finding.message).toMatch(
        /models\/a\/config\.json is 4194\d{3} bytes; expected at most 4194304 bytes/,
      );
      const waived = await run(base, head, { noHistory, labels: ['repair-base'] });
      expect(waived.result.out.outputs.verdict).toBe('warn');
    },
    60_000,
  );
});

describe('a base version that is not a regular file fails closed', () => {
  it.each([[false], [true]])(
    'a symbolic link at base, a regular file at head (no history: %s): verdict block, the path named',
    async (noHistory) => {
      const { result, report } = await run(
        {
          'models/real/config.json': checkpointConfig(),
          [MODEL]: { symlink: '../real/config.json' },
        },
        { 'models/real/config.json': checkpointConfig(), [MODEL]: HEAD },
        { noHistory },
      );
      expect(result.out.outputs.verdict).toBe('block');
      const file = report.files.find((f) => f.path === MODEL)!;
      expect(file.status).toBe('modified');
      expect(ruleIds(report, MODEL)).toContain('base-unreadable');
      expect(file.findings.find((f) => f.rule === 'base-unreadable')!.message).toContain(
        `${MODEL} is not a regular file at base (a symbolic link, a submodule or a directory)`,
      );
    },
  );

  const source = (exists: ContentSource['exists']): ContentSource => ({
    read: async (ref, path) =>
      ref === 'h'.repeat(40) && path === MODEL ? new TextEncoder().encode(HEAD) : null,
    exists,
  });
  const gate = (s: ContentSource) =>
    runGate(s, {
      base: 'b'.repeat(40),
      head: 'h'.repeat(40),
      changes: [{ status: 'modified', path: MODEL, previousPath: null }],
      policyPath: POLICY_PATH,
    });

  it('anything at the path that reads as no file (a submodule, a directory): base-unreadable', async () => {
    const report = await gate(
      source(async (ref, path) => path === MODEL && ref === 'b'.repeat(40)),
    );
    expect(report.verdict).toBe('block');
    expect(ruleIds(report, MODEL)).toEqual(['base-unreadable']);
  });

  it('nothing at the path (the source says so): an added file, judged alone', async () => {
    const report = await gate(source(async () => false));
    expect(report.files[0]!.status).toBe('added');
    expect(report.verdict).toBe('ok');
  });

  it('the look itself fails: the run fails closed, naming the file and the reason', async () => {
    await expect(
      gate(
        source(async (_ref, path) => {
          if (path === MODEL) throw new Error('status 502');
          return false;
        }),
      ),
    ).rejects.toThrow(
      new BaseUnreadableError(
        `${MODEL} could not be looked up at base ${'b'.repeat(40)}: status 502. Its head cannot be judged against it, so the check fails until it can be read (re-run the job)`,
      ),
    );
  });
});

describe('a team gets past it deliberately, with what the policy already has', () => {
  const brokenBase = checkpointConfig().replace('"hidden_size": 2048,', '"hidden_size": 2048,,');

  it('the waiver label: the block counts as a warning and the report says it was waived', async () => {
    const policy = 'waiver-label: repair-base\n';
    const { result, report } = await run(
      { [POLICY_PATH]: policy, [MODEL]: brokenBase },
      { [POLICY_PATH]: policy, [MODEL]: HEAD },
      { labels: ['repair-base'] },
    );
    expect(result.out.outputs.verdict).toBe('warn');
    expect(result.out.failed).toBeNull();
    const finding = report.files[0]!.findings.find((f) => f.rule === 'base-unreadable')!;
    expect(finding).toMatchObject({ severity: 'block', counts: 'warn', waived: true });
    expect(report.waiver).toMatchObject({ label: 'repair-base', applied: true, waivedBlocks: 1 });
  });

  it('without the label the same pull request blocks', async () => {
    const policy = 'waiver-label: repair-base\n';
    const { result } = await run(
      { [POLICY_PATH]: policy, [MODEL]: brokenBase },
      { [POLICY_PATH]: policy, [MODEL]: HEAD },
    );
    expect(result.out.outputs.verdict).toBe('block');
  });

  it("the base branch's policy sets the rule to warn (an override for one folder)", async () => {
    const policy = 'overrides:\n  - files: ["models/a/**"]\n    rules: { base-unreadable: warn }\n';
    const { result, report } = await run(
      { [POLICY_PATH]: policy, [MODEL]: brokenBase },
      { [POLICY_PATH]: policy, [MODEL]: HEAD },
    );
    expect(result.out.outputs.verdict).toBe('warn');
    expect(report.files[0]!.findings.find((f) => f.rule === 'base-unreadable')).toMatchObject({
      severity: 'warn',
      counts: 'warn',
      waived: false,
    });
  });

  it('a base that reads but describes no model is not a broken base: the head is a new model', async () => {
    const { result, report } = await run(
      { [MODEL]: '{"architectures": null, "note": "not a model yet"}\n' },
      { [MODEL]: HEAD },
    );
    expect(ruleIds(report, MODEL)).not.toContain('base-unreadable');
    expect(result.out.outputs.verdict).toBe('ok');
  });
});
