import { afterEach, describe, expect, it } from 'vitest';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { runScenario, type ScenarioResult } from '../support/action-harness.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// Scenario tests of the gate: the action in-process, real git and GitHub adapters, a temporary
// repository and the loopback API stand-in. One scenario per test, named by what it shows.

const POLICY = 'serving:\n  device-memory-gib: 24\n  reserve: 0.1\n';

function ownModel(serving: string, cache = 'bf16', kvHeads = 2): string {
  return `format: context-reach-model/1
model:
  name: scenario-model
  layers: 28
  hidden: 1536
  heads: 12
  kv-heads: ${kvHeads}
  head-dim: 128
  feed-forward: { size: 8960, gated: true }
  vocab: 151936
  position:
    code: rotary
    base: 1000000
    scaling: { kind: yarn, factor: 4, original-span: 32768 }
  declared-span: 131072
  dtypes: { weights: bf16, cache: ${cache} }
serving:
${serving}`;
}

let result: ScenarioResult | null = null;
afterEach(async () => {
  await result?.fake.close();
  result = null;
});

const comments = (r: ScenarioResult) =>
  r.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));

describe('gate scenarios', () => {
  it('blocks a served span raised past the reach of the scaled rotary code', async () => {
    result = await runScenario({
      base: { 'm/model.reach.yaml': ownModel('  span: 65536\n') },
      head: { 'm/model.reach.yaml': ownModel('  span: 262144\n') },
    });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.failed).toMatch(/blocking finding/);
    const annotation = result.out.annotations.find((a) => a.title.includes('span-past-reach'));
    expect(annotation).toMatchObject({ level: 'error', file: 'm/model.reach.yaml', line: 18 });
    expect(comments(result)[0]!.body).toContain('span-past-reach');
  });

  it('passes a cache dtype change that makes the service fit again, and marks the old block resolved', async () => {
    const serving = '  span: 131072\n  sequences: 4\n';
    result = await runScenario({
      base: {
        '.github/context-reach.yml': POLICY,
        'm/model.reach.yaml': ownModel(serving, 'fp32'),
      },
      head: { '.github/context-reach.yml': POLICY, 'm/model.reach.yaml': ownModel(serving, 'fp8') },
    });
    expect(result.error).toBeNull();
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files[0].base.metrics.memoryBytes).toBeGreaterThan(24 * 0.9 * 2 ** 30);
    expect(report.files[0].head.metrics.memoryBytes).toBeLessThan(24 * 0.9 * 2 ** 30);
    expect(result.out.outputs.verdict).not.toBe('block');
    expect(result.out.failed).toBeNull();
  });

  it('judges a new file on its head version alone', async () => {
    result = await runScenario({
      base: { 'README.md': 'models' },
      head: {
        'README.md': 'models',
        'models/new/config.json': checkpointConfig({ max_position_embeddings: 8192 }),
      },
    });
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files).toHaveLength(1);
    expect(report.files[0]).toMatchObject({
      path: 'models/new/config.json',
      status: 'added',
      base: null,
    });
    expect(report.files[0].head.metrics.declaredSpan).toBe(8192);
    expect(comments(result)[0]!.body).toContain('new file, judged on its own');
  });

  it('compares a renamed file with its old path', async () => {
    result = await runScenario({
      base: { 'models/old/config.json': checkpointConfig() },
      head: { 'models/new/config.json': checkpointConfig({ num_key_value_heads: 2 }) },
    });
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files[0]).toMatchObject({
      path: 'models/new/config.json',
      previousPath: 'models/old/config.json',
      status: 'renamed',
    });
    expect(report.files[0].base.metrics.cachePerTokenBytes).toBe(
      2 * report.files[0].head.metrics.cachePerTokenBytes,
    );
  });

  it('lists a deleted file without judging it', async () => {
    result = await runScenario({
      base: {
        'models/gone/config.json': checkpointConfig(),
        'models/kept/config.json': checkpointConfig(),
      },
      head: { 'models/kept/config.json': checkpointConfig() },
    });
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files).toHaveLength(0);
    expect(report.deleted).toEqual([
      { status: 'deleted', path: 'models/gone/config.json', previousPath: null },
    ]);
    expect(result.out.outputs.verdict).toBe('ok');
    expect(comments(result)[0]!.body).toContain('Deleted, not judged');
  });

  it('judges by the base policy when the pull request loosens it, and says so', async () => {
    const strict = 'limits:\n  cachePerTokenBytes: { max: 1000 }\n';
    const loose = 'limits:\n  cachePerTokenBytes: { max: 100000000 }\n';
    result = await runScenario({
      base: { '.github/context-reach.yml': strict, 'models/a/config.json': checkpointConfig() },
      head: {
        '.github/context-reach.yml': loose,
        'models/a/config.json': checkpointConfig({ num_key_value_heads: 8 }),
      },
    });
    expect(result.out.outputs.verdict).toBe('block');
    const body = comments(result)[0]!.body;
    expect(body).toContain('limit-crossed');
    expect(body).toContain(
      "this run judged by the base commit's policy. After merge: <code>limits.",
    );
  });

  it('still decides with a read-only fork token: no comment, report in the summary, a notice', async () => {
    result = await runScenario({
      base: { 'models/a/config.json': checkpointConfig() },
      head: { 'models/a/config.json': checkpointConfig({ max_position_embeddings: 65536 }) },
      readOnly: true,
      fork: true,
    });
    expect(result.error).toBeNull();
    expect(comments(result)).toHaveLength(0);
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.outputs['comment-url']).toBe('');
    expect(result.out.failed).toMatch(/blocking/);
    expect(result.out.summaries[0]).toContain('span-grew-code-unchanged');
    expect(result.out.summaries[0]).toContain('Pull requests from forks');
    expect(result.out.annotations.some((a) => a.level === 'error')).toBe(true);
    expect(
      result.out.log.some((l) => l.level === 'notice' && l.message.includes('read-only')),
    ).toBe(true);
  });

  it('turns blocks into warnings under the waiver label and records it', async () => {
    const policy = 'waiver-label: accept-context-risk\n';
    result = await runScenario({
      base: { '.github/context-reach.yml': policy, 'models/a/config.json': checkpointConfig() },
      head: {
        '.github/context-reach.yml': policy,
        'models/a/config.json': checkpointConfig({ max_position_embeddings: 65536 }),
      },
      labels: ['accept-context-risk'],
    });
    expect(result.out.outputs.verdict).toBe('warn');
    expect(result.out.failed).toBeNull();
    const body = comments(result)[0]!.body;
    expect(body).toContain('accept\\-context\\-risk');
    expect(body).toContain('1 blocking finding counted as warnings');
    expect(body).toContain('waived');
  });

  it('reads the change from the REST API when the checkout has no history', async () => {
    result = await runScenario({
      base: { 'models/a/config.json': checkpointConfig() },
      head: { 'models/a/config.json': checkpointConfig({ max_position_embeddings: 65536 }) },
      noHistory: true,
    });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.fake.calls('pulls/list-files').length).toBeGreaterThan(0);
    expect(result.fake.calls('repos/get-content').length).toBeGreaterThan(0);
    expect(result.fake.mismatches).toEqual([]);
  });

  it('fails closed, naming key and line, when the base policy is broken', async () => {
    result = await runScenario({
      base: {
        '.github/context-reach.yml': 'limits:\n  headroom: { minimum: 0 }\n',
        'models/a/config.json': checkpointConfig(),
      },
      head: {
        '.github/context-reach.yml': 'limits:\n  headroom: { minimum: 0 }\n',
        'models/a/config.json': checkpointConfig({ rope_theta: 20000 }),
      },
    });
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.failed).toMatch(/context-reach\.yml/);
    expect(result.out.failed).toMatch(/context-reach\.yml:2: limits\.headroom\.minimum/);
  });

  it('names, but does not block on, a config.json that is not a model when only the default globs picked it', async () => {
    result = await runScenario({
      base: { 'web/config.json': '{"port": 8080}\n' },
      head: { 'web/config.json': '{"port": 8081}\n' },
    });
    expect(result.out.outputs.verdict).toBe('ok');
    expect(comments(result)[0]!.body).toContain(
      'matched the default file globs but is not a model config',
    );
  });

  it('blocks the same file when the policy lists it as a model config', async () => {
    const policy = 'files: ["web/config.json"]\n';
    result = await runScenario({
      base: { '.github/context-reach.yml': policy, 'web/config.json': '{"port": 8080}\n' },
      head: { '.github/context-reach.yml': policy, 'web/config.json': '{"port": 8081}\n' },
    });
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.annotations[0]).toMatchObject({
      level: 'error',
      file: 'web/config.json',
      line: 1,
    });
  });
  it('judges memory per device under a tensor-parallel policy override, and offers a larger tensor degree', async () => {
    // A 70B-class shape (80 layers, 64 heads, head 128; Touvron et al. 2023, Llama 2: 8 key/value heads) served
    // over tensor-parallel 8 on 80 GiB devices: 17,244,162,048 weight bytes per device. With 8 kv heads one
    // device holds 1 per layer: 64 sequences × 4,096 tokens × 40,960 bytes = 10 GiB of cache (fits 72 GiB usable).
    // The pull request goes to 64 kv heads (full multi-head attention, 78,371,889,152 parameters, 18.2 GiB of fp16
    // weights per device): 8 kv heads per device, 64 × 4,096 × 327,680 bytes = 80 GiB of cache per device: over.
    const policy =
      'serving:\n  device-memory-gib: 80\n  sequences: 64\n  span: 4096\noverrides:\n  - files: ["models/big/**"]\n    serving:\n      tensor-parallel: 8\n';
    const big = (kv: number) =>
      checkpointConfig({
        hidden_size: 8192,
        intermediate_size: 28672,
        num_hidden_layers: 80,
        num_attention_heads: 64,
        num_key_value_heads: kv,
        torch_dtype: 'float16',
      });
    result = await runScenario({
      base: { '.github/context-reach.yml': policy, 'models/big/config.json': big(8) },
      head: { '.github/context-reach.yml': policy, 'models/big/config.json': big(64) },
    });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    const body = comments(result)[0]!.body.replace(/\\/g, '');
    expect(body).toContain('memory-over-budget');
    expect(body).toContain(
      'Head: per device, 8 devices (tensor-parallel 8 × pipeline-parallel 1): weights 18.2 GiB, cache 80 GiB at 4,096 tokens × 64 sequences',
    );
    expect(body).toMatch(/Per device \(8 devices: tensor-parallel 8 × pipeline-parallel 1\)/);
    expect(body).toContain('reserve kept for activations, workspace and fragmentation');
    // The remedy search finds the next tensor degree that shards 64 heads and 64 kv heads and fits: 16.
    // The comment lists two other fixes at most; the JSON report carries every one.
    const report = JSON.parse(Object.values(result.written)[0]!);
    const finding = report.files[0].findings.find(
      (f: { rule: string }) => f.rule === 'memory-over-budget',
    );
    const tensor = [finding.remedy, ...(finding.remedyAlternatives ?? [])].find(
      (r: { change: Record<string, unknown> }) => 'serving.tensorParallel' in r.change,
    );
    expect(tensor.change['serving.tensorParallel']).toBe(16);
    expect(tensor.cost).toBe(
      '16 devices per replica (tensor-parallel 16 × pipeline-parallel 1), was 8',
    );
  });
});
