import { describe, expect, it } from 'vitest';
import { decide, decideFile, type ChangedConfig } from '../../src/core/compare/decide.js';
import { BUILT_IN_JUDGING, type Judging } from '../../src/core/policy/judging.js';
import { inspectModel } from '../../src/core/inspect.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import { changeFindings } from '../../src/core/rules/change-rules.js';

const report = (overrides: Record<string, unknown> = {}, path = 'models/a/config.json') =>
  inspectModel(checkpointConfig(overrides), path);

function config(
  base: ReturnType<typeof report> | null,
  head: ReturnType<typeof report>,
  judging: Judging = BUILT_IN_JUDGING,
): ChangedConfig {
  return {
    change: { status: base ? 'modified' : 'added', path: head.path, previousPath: null },
    base,
    head,
    judging,
  };
}

const gate = (configs: ChangedConfig[], waiver = false) =>
  decide({
    configs,
    deleted: [],
    policy: { source: 'built-in', path: '.github/context-reach.yml', changedInHead: false },
    waiver: { label: 'w', applied: waiver },
    notices: [],
    base: 'a'.repeat(40),
    head: 'b'.repeat(40),
  });

describe('changeFindings(base, head)', () => {
  it('blocks a declared span that grew while the position code stayed the same', () => {
    const rules = changeFindings(report(), report({ max_position_embeddings: 8192 })).map(
      (f) => f.rule,
    );
    expect(rules).toContain('span-grew-code-unchanged');
  });

  it('does not raise span-grew when the scaling grew with it', () => {
    const head = report({
      max_position_embeddings: 8192,
      rope_scaling: { rope_type: 'linear', factor: 2 },
    });
    expect(changeFindings(report(), head).map((f) => f.rule)).not.toContain(
      'span-grew-code-unchanged',
    );
  });

  it('warns when the rotary base changes, a retraining-level change', () => {
    const found = changeFindings(report(), report({ rope_theta: 500000 })).find(
      (f) => f.rule === 'frequencies-changed',
    );
    expect(found?.severity).toBe('warn');
    expect(found?.message).toContain('10,000');
    expect(found?.message).toContain('500,000');
  });

  it('notes the cache per token change when key/value heads change, with the line of the key', () => {
    const found = changeFindings(report(), report({ num_key_value_heads: 8 })).find(
      (f) => f.rule === 'cache-per-token-changed',
    );
    expect(found).toMatchObject({ severity: 'info', key: 'num_key_value_heads', line: 7 });
  });
});

describe('decideFile(config, waiver)', () => {
  it('fails closed on a limit whose metric the scans left uncomputed (span past the scan bound)', () => {
    const judging: Judging = {
      ...BUILT_IN_JUDGING,
      limits: {
        separationFloor: { min: 0.01, severity: 'block' },
        params: { max: 1e12, severity: 'block' },
      },
    };
    const head = report({ max_position_embeddings: 2 ** 40 });
    expect(head.findings.map((f) => f.rule)).toContain('scan-incomplete');
    const decision = decideFile(config(report(), head, judging), false);
    const crossed = decision.findings.filter((f) => f.rule === 'limit-crossed');
    expect(crossed.map((f) => f.metric)).toEqual(['separationFloor']);
    expect(crossed[0]!.message).toContain('not computed');
    const spanLine =
      checkpointConfig({ max_position_embeddings: 2 ** 40 })
        .split('\n')
        .findIndex((l) => l.includes('max_position_embeddings')) + 1;
    expect(crossed[0]!.line).toBe(spanLine);
    expect(decision.deltas.find((d) => d.metric === 'separationFloor')?.state).toBe('crossed');
    expect(decision.deltas.find((d) => d.metric === 'params')?.state).toBe('ok');
    expect(decision.verdict).toBe('block');
  });

  it('leaves a limit on a metric that does not apply unjudged, not crossed (learned positions have no separation floor)', () => {
    const judging: Judging = {
      ...BUILT_IN_JUDGING,
      limits: { separationFloor: { min: 0.01, severity: 'block' } },
    };
    const learned = {
      model_type: 'gpt2',
      rope_theta: undefined,
      position_embedding_type: 'absolute',
    };
    expect(report(learned).spec.position.kind).toBe('learned');
    const decision = decideFile(config(report(learned), report(learned), judging), false);
    expect(decision.findings.filter((f) => f.rule === 'limit-crossed')).toEqual([]);
    expect(decision.deltas.find((d) => d.metric === 'separationFloor')?.state).toBe('unjudged');
  });

  it('marks a finding the base already had as standing and lets it report, not block', () => {
    const broken = { num_key_value_heads: 5 };
    const decision = decideFile(
      config(report(broken), report({ ...broken, rope_theta: 20000 })),
      false,
    );
    const standing = decision.findings.find((f) => f.rule === 'kv-heads-indivisible');
    expect(standing).toMatchObject({ standing: true, severity: 'block', counts: 'info' });
    expect(decision.verdict).not.toBe('block');
  });

  it('blocks on a standing finding when the policy says standing: block', () => {
    const broken = { num_key_value_heads: 5 };
    const decision = decideFile(
      config(report(broken), report(broken), { ...BUILT_IN_JUDGING, standing: 'block' }),
      false,
    );
    expect(decision.verdict).toBe('block');
  });

  it('checks max, min and max-increase-pct limits against head and base', () => {
    const judging: Judging = {
      ...BUILT_IN_JUDGING,
      limits: {
        cachePerTokenBytes: { maxIncreasePct: 50, severity: 'warn' },
        declaredSpan: { max: 4096, severity: 'block' },
      },
    };
    const decision = decideFile(
      config(report(), report({ num_key_value_heads: 8 }), judging),
      false,
    );
    const crossed = decision.deltas.filter((d) => d.state === 'crossed').map((d) => d.metric);
    expect(crossed).toEqual(['cachePerTokenBytes']);
    expect(decision.deltas.find((d) => d.metric === 'declaredSpan')?.state).toBe('ok');
    const limit = decision.findings.find((f) => f.rule === 'limit-crossed');
    expect(limit?.message).toContain('up 100 % over base, more than the 50 % allowed');
    expect(decision.verdict).toBe('warn');
  });

  it('turns a rule off or changes its severity as the policy says', () => {
    const change = config(report(), report({ rope_theta: 500000 }), {
      ...BUILT_IN_JUDGING,
      rules: { 'frequencies-changed': 'off' },
    });
    expect(decideFile(change, false).findings.map((f) => f.rule)).not.toContain(
      'frequencies-changed',
    );
    const raised = config(report(), report({ rope_theta: 500000 }), {
      ...BUILT_IN_JUDGING,
      rules: { 'frequencies-changed': 'block' },
    });
    expect(decideFile(raised, false).verdict).toBe('block');
  });

  it('counts a waived block as a warning and flags it', () => {
    const decision = decideFile(config(report(), report({ max_position_embeddings: 8192 })), true);
    const waived = decision.findings.find((f) => f.rule === 'span-grew-code-unchanged');
    expect(waived).toMatchObject({ severity: 'block', counts: 'warn', waived: true });
    expect(decision.verdict).toBe('warn');
  });

  it('blocks an unreadable head with the file and line of the error', () => {
    const decision = decideFile(
      {
        change: { status: 'modified', path: 'x.json', previousPath: null },
        base: report(),
        head: { path: 'x.json', line: 3, message: 'x.json, line 3: bad' },
        judging: BUILT_IN_JUDGING,
      },
      false,
    );
    expect(decision.findings[0]).toMatchObject({
      rule: 'config-unreadable',
      line: 3,
      counts: 'block',
    });
  });
});

describe('decide(input)', () => {
  it('gives one verdict for the pull request: the worst file decides, blocks sort first', () => {
    const ok = config(report({}, 'b.json'), report({ rope_theta: 10000 }, 'b.json'));
    const block = config(report({}, 'a.json'), report({ max_position_embeddings: 8192 }, 'a.json'));
    const result = gate([ok, block]);
    expect(result.verdict).toBe('block');
    expect(result.files.map((f) => f.path)).toEqual(['a.json', 'b.json']);
    expect(result.blocking).toBe(1);
  });

  it('records how many blocks a waiver turned into warnings', () => {
    const result = gate([config(report(), report({ max_position_embeddings: 8192 }))], true);
    expect(result.verdict).toBe('warn');
    expect(result.waiver.waivedBlocks).toBe(1);
  });

  it('is ok with nothing to judge', () => {
    expect(gate([])).toMatchObject({ verdict: 'ok', blocking: 0, warnings: 0 });
  });
});
