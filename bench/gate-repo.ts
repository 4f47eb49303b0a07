/**
 * The W6 repository of issue 16: a monorepo of invented model configs (no real checkpoint) as a
 * platform team might keep them, and a pull request that touches every one of them.
 *
 *   - shapes: a few model families (widths 2,048–5,120, 16–40 layers, grouped-query heads,
 *     dense and mixture-of-experts feed-forward blocks), in both dialects (checkpoint JSON and
 *     the own YAML);
 *   - position codes: rotary at bases 10,000 to 1,000,000, partial rotary, rotary with linear,
 *     yarn and banded (llama3-style) scaling, ALiBi and a learned table;
 *   - spans from the policy: a served span of 32,768 by default and overrides of 65,536 and
 *     131,072 for two folders, with memory and discrimination limits;
 *   - the pull request: every config gains a layer (so both versions are read and judged), and
 *     about one in ten also gets a change that blocks, cycling through a served span past the
 *     code's reach, a declared span grown without scaling, a cache over the device budget and a
 *     rotary base below the discrimination limit, so every kind of remedy is searched.
 *
 * The same seed gives the same bytes on every machine, so runs and reports compare.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** One file of the repository. */
export interface RepoFile {
  path: string;
  text: string;
}

/** The policy of the W6 repository (`.github/context-reach.yml`). */
export const GATE_POLICY = [
  'files:',
  '  - "models/**/config.json"',
  '  - "models/**/*.reach.yaml"',
  'serving:',
  '  span: 32768',
  '  sequences: 4',
  '  device-memory-gib: 80',
  '  reserve: 0.1',
  'limits:',
  '  memoryBytes:',
  '    max-increase-pct: 60',
  '    severity: warn',
  '  discriminationSpan:',
  '    min: 8192',
  '    severity: warn',
  'overrides:',
  '  - files: ["models/mid/**"]',
  '    serving:',
  '      span: 65536',
  '      sequences: 2',
  '  - files: ["models/long/**"]',
  '    serving:',
  '      span: 131072',
  '      sequences: 1',
  '    limits:',
  '      discriminationSpan:',
  '        min: 12288',
  '        severity: block',
  '',
].join('\n');

/** Park–Miller minimal standard generator: tiny, seeded, the same on every platform. */
function seeded(seed: number): () => number {
  let state = seed % 2147483647;
  if (state <= 0) state += 2147483646;
  return () => {
    state = (state * 16807) % 2147483647;
    return (state - 1) / 2147483646;
  };
}

type Code = 'rotary' | 'partial' | 'linear' | 'yarn' | 'banded' | 'alibi' | 'learned';
type Folder = 'short' | 'mid' | 'long';
type Blocker = 'none' | 'served-past-reach' | 'span-grew' | 'memory' | 'base-low';

interface Shape {
  folder: Folder;
  code: Code;
  base: number;
  layers: number;
  hidden: number;
  heads: number;
  kvHeads: number;
  headDim: number;
  experts: number;
  declared: number;
  yaml: boolean;
  cache: 'bf16' | 'fp8';
}

const SERVED: Record<Folder, number> = { short: 32_768, mid: 65_536, long: 131_072 };
const BASES = [10_000, 50_000, 100_000, 250_000, 500_000, 1_000_000];
const FAMILIES = [
  { hidden: 2048, heads: 16, kvHeads: 4, headDim: 128, layers: 16 },
  { hidden: 3072, heads: 24, kvHeads: 8, headDim: 128, layers: 28 },
  { hidden: 4096, heads: 32, kvHeads: 8, headDim: 128, layers: 32 },
  { hidden: 2560, heads: 32, kvHeads: 8, headDim: 80, layers: 24 },
  { hidden: 5120, heads: 40, kvHeads: 8, headDim: 128, layers: 40 },
];

function shapeOf(next: () => number): Shape {
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)]!;
  const roll = next();
  const folder: Folder = roll < 0.5 ? 'short' : roll < 0.8 ? 'mid' : 'long';
  const codeRoll = next();
  const code: Code =
    codeRoll < 0.4
      ? 'rotary'
      : codeRoll < 0.5
        ? 'partial'
        : codeRoll < 0.6
          ? 'linear'
          : codeRoll < 0.75
            ? 'yarn'
            : codeRoll < 0.9
              ? 'banded'
              : codeRoll < 0.95
                ? 'alibi'
                : 'learned';
  const family = pick(FAMILIES);
  // Long-span folders use the slow bases real long-context models use; short ones any.
  const base = folder === 'long' ? pick([500_000, 1_000_000]) : pick(BASES);
  return {
    folder,
    code,
    base,
    layers: family.layers,
    hidden: family.hidden,
    heads: family.heads,
    kvHeads: family.kvHeads,
    headDim: family.headDim,
    experts: next() < 0.15 && family.hidden <= 3072 ? 8 : 0,
    declared: SERVED[folder] * (next() < 0.3 ? 2 : 1),
    yaml: next() < 0.2,
    cache: next() < 0.2 ? 'fp8' : 'bf16',
  };
}

/** The scaled codes' original (trained) span: a quarter of the declared span. */
function originalSpan(shape: Shape): number {
  return shape.declared / 4;
}

function checkpointText(shape: Shape, name: string): string {
  const config: Record<string, unknown> = {
    architectures: [shape.experts > 0 ? 'BenchMoeForCausalLM' : 'BenchForCausalLM'],
    model_type: shape.code === 'alibi' ? 'bloom' : shape.experts > 0 ? 'mixtral' : 'llama',
    _name_or_path: name,
    hidden_size: shape.hidden,
    intermediate_size: Math.round((shape.hidden * 3.5) / 256) * 256,
    num_hidden_layers: shape.layers,
    num_attention_heads: shape.heads,
    num_key_value_heads: shape.kvHeads,
    head_dim: shape.headDim,
    hidden_act: 'silu',
    vocab_size: 128_256,
    max_position_embeddings: shape.declared,
    tie_word_embeddings: false,
    torch_dtype: 'bfloat16',
  };
  if (shape.experts > 0) {
    config.num_local_experts = shape.experts;
    config.num_experts_per_tok = 2;
  }
  switch (shape.code) {
    case 'rotary':
      config.rope_theta = shape.base;
      break;
    case 'partial':
      config.rope_theta = shape.base;
      config.partial_rotary_factor = 0.5;
      break;
    case 'linear':
      config.rope_theta = shape.base;
      config.rope_scaling = { rope_type: 'linear', factor: 4 };
      break;
    case 'yarn':
      config.rope_theta = shape.base;
      config.rope_scaling = {
        rope_type: 'yarn',
        factor: 4,
        original_max_position_embeddings: originalSpan(shape),
      };
      break;
    case 'banded':
      config.rope_theta = shape.base;
      config.rope_scaling = {
        rope_type: 'llama3',
        factor: 4,
        low_freq_factor: 1,
        high_freq_factor: 4,
        original_max_position_embeddings: originalSpan(shape),
      };
      break;
    case 'alibi':
      config.alibi = true;
      break;
    case 'learned':
      config.position_embedding_type = 'absolute';
      break;
  }
  return `${JSON.stringify(config, null, 2)}\n`;
}

function ownText(shape: Shape, name: string): string {
  const rotary = (fraction: number, scaling: string[]) => [
    '  position:',
    '    code: rotary',
    `    base: ${shape.base}`,
    `    fraction: ${fraction}`,
    ...scaling,
  ];
  const scaled = (kind: string, extra: string[] = []) => [
    '    scaling:',
    `      kind: ${kind}`,
    '      factor: 4',
    `      original-span: ${originalSpan(shape)}`,
    ...extra,
  ];
  const position =
    shape.code === 'rotary'
      ? rotary(1, [])
      : shape.code === 'partial'
        ? rotary(0.5, [])
        : shape.code === 'linear'
          ? rotary(1, ['    scaling:', '      kind: linear', '      factor: 4'])
          : shape.code === 'yarn'
            ? rotary(1, scaled('yarn'))
            : shape.code === 'banded'
              ? rotary(1, scaled('banded', ['      low: 1', '      high: 4']))
              : [`  position: {code: ${shape.code}}`];
  return [
    'format: context-reach-model/1',
    'model:',
    `  name: ${name}`,
    `  layers: ${shape.layers}`,
    `  hidden: ${shape.hidden}`,
    `  heads: ${shape.heads}`,
    `  kv-heads: ${shape.kvHeads}`,
    `  head-dim: ${shape.headDim}`,
    '  feed-forward:',
    `    size: ${Math.round((shape.hidden * 3.5) / 256) * 256}`,
    '    gated: true',
    ...(shape.experts > 0 ? ['  experts:', `    total: ${shape.experts}`, '    active: 2'] : []),
    '  vocab: 128256',
    '  tied-output: false',
    ...position,
    `  declared-span: ${shape.declared}`,
    '  dtypes:',
    '    weights: bf16',
    `    cache: ${shape.cache}`,
    '',
  ].join('\n');
}

function fileOf(shape: Shape, i: number): RepoFile {
  const name = `gate-model-${String(i).padStart(4, '0')}`;
  return shape.yaml
    ? { path: `models/${shape.folder}/${name}/model.reach.yaml`, text: ownText(shape, name) }
    : { path: `models/${shape.folder}/${name}/config.json`, text: checkpointText(shape, name) };
}

/** The blocking change of the head, if any: about one file in ten, cycling through four kinds. */
function blockerOf(i: number): Blocker {
  if (i % 10 !== 3) return 'none';
  const kinds: Blocker[] = ['served-past-reach', 'span-grew', 'memory', 'base-low'];
  return kinds[Math.floor(i / 10) % kinds.length]!;
}

function headShape(shape: Shape, blocker: Blocker): Shape {
  const grown = { ...shape, layers: shape.layers + 1 };
  switch (blocker) {
    case 'none':
      return grown;
    // The declared span drops below the policy's served span: the code does not reach it.
    case 'served-past-reach':
      return {
        ...grown,
        code: shape.code === 'alibi' || shape.code === 'learned' ? 'rotary' : shape.code,
        declared: SERVED[shape.folder] / 2,
      };
    // The declared span doubles, the code stays.
    case 'span-grew':
      return { ...grown, declared: shape.declared * 2 };
    // Twice the layers, every head its own key/value head, twice the head size: the cache outgrows the device.
    case 'memory':
      return {
        ...grown,
        layers: shape.layers * 2,
        kvHeads: shape.heads,
        headDim: shape.headDim * 2,
        cache: 'bf16',
      };
    // A fast rotary base in a long-span folder: offsets past a few thousand tokens no longer discriminate.
    case 'base-low':
      return { ...grown, folder: shape.folder, code: 'rotary', base: 10_000 };
  }
}

/**
 * The base and head trees of the W6 pull request over `count` configs (policy included), and
 * how many head files carry a blocking change.
 */
export function gateRepository(
  count: number,
  seed = 16,
): { base: RepoFile[]; head: RepoFile[]; blockingChanges: number } {
  const next = seeded(seed);
  const base: RepoFile[] = [{ path: '.github/context-reach.yml', text: GATE_POLICY }];
  const head: RepoFile[] = [{ path: '.github/context-reach.yml', text: GATE_POLICY }];
  let blockingChanges = 0;
  for (let i = 0; i < count; i++) {
    let shape = shapeOf(next);
    const blocker = blockerOf(i);
    // The base-low change needs the long folder, where the discrimination limit blocks.
    if (blocker === 'base-low') shape = { ...shape, folder: 'long' };
    if (blocker !== 'none') blockingChanges += 1;
    base.push(fileOf(shape, i));
    head.push(fileOf(headShape(shape, blocker), i));
  }
  return { base, head, blockingChanges };
}

/** A W6 repository on disk: base and head commits, the same ids on every machine. */
export interface GateRepo {
  dir: string;
  base: string;
  head: string;
  /** Configs in the pull request, and how many of them carry a blocking change. */
  count: number;
  blockingChanges: number;
  remove(): void;
}

/** Fixed identity and dates, so the commits (and every report naming them) are the same on every run. */
const FIXED_COMMIT_ENV = {
  GIT_AUTHOR_NAME: 'context-reach bench',
  GIT_AUTHOR_EMAIL: 'bench@example.invalid',
  GIT_AUTHOR_DATE: '2026-01-01T00:00:00Z',
  GIT_COMMITTER_NAME: 'context-reach bench',
  GIT_COMMITTER_EMAIL: 'bench@example.invalid',
  GIT_COMMITTER_DATE: '2026-01-01T00:00:00Z',
};

/** Writes the W6 repository of `count` configs to a temporary folder and commits base and head. */
export function writeGateRepository(count: number, seed = 16): GateRepo {
  const { base, head, blockingChanges } = gateRepository(count, seed);
  const dir = mkdtempSync(path.join(tmpdir(), 'context-reach-w6-'));
  const git = (...args: string[]) =>
    execFileSync('git', ['-c', 'commit.gpgsign=false', '-c', 'core.autocrlf=false', ...args], {
      cwd: dir,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'pipe'],
      env: { ...process.env, ...FIXED_COMMIT_ENV },
    }).trim();
  const commit = (files: RepoFile[], message: string) => {
    for (const entry of readdirSync(dir))
      if (entry !== '.git') rmSync(path.join(dir, entry), { recursive: true, force: true });
    for (const file of files) {
      mkdirSync(path.dirname(path.join(dir, file.path)), { recursive: true });
      writeFileSync(path.join(dir, file.path), file.text);
    }
    git('add', '--all');
    git('commit', '--quiet', '--no-verify', '-m', message);
    return git('rev-parse', 'HEAD');
  };
  git('init', '--quiet');
  git('symbolic-ref', 'HEAD', 'refs/heads/main');
  const baseSha = commit(base, 'base');
  const headSha = commit(head, 'head');
  return {
    dir,
    base: baseSha,
    head: headSha,
    count,
    blockingChanges,
    remove: () => rmSync(dir, { recursive: true, force: true }),
  };
}
