/**
 * Generated model configs for W3 and W4 of issue 4 (invented models, no real checkpoint): a
 * fixed, seeded mixture of codes (rotary, partial rotary, ALiBi, learned, sinusoidal) and rotary
 * scalings (none, linear, dynamic, yarn, banded), in both dialects (checkpoint JSON and the own
 * YAML), with declared spans from 2,048 to 131,072. The same seed gives the same bytes on every
 * machine, so runs compare.
 */

/** Longest declared span of a generated config, in tokens (default: `131072`). */
export const MAX_CONFIG_SPAN = 131_072;

const SPANS = [2048, 4096, 8192, 16_384, 32_768, 65_536, MAX_CONFIG_SPAN];
const SCALINGS = ['none', 'linear', 'dynamic', 'yarn', 'banded'] as const;
type Scaling = (typeof SCALINGS)[number];
type Code = 'rotary' | 'partial-rotary' | 'alibi' | 'learned' | 'sinusoidal';

/** One generated config as a file: path and text. */
export interface ConfigFile {
  path: string;
  text: string;
}

/** Park–Miller minimal standard generator: tiny, seeded, the same on every platform. */
function seeded(seed: number): () => number {
  let state = seed % 2147483647;
  if (state <= 0) state += 2147483646;
  return () => {
    state = (state * 16807) % 2147483647;
    return (state - 1) / 2147483646;
  };
}

interface Shape {
  code: Code;
  scaling: Scaling;
  span: number;
  base: number;
  layers: number;
  hidden: number;
  heads: number;
  kvHeads: number;
  yaml: boolean;
}

function shapeOf(next: () => number): Shape {
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)]!;
  const roll = next();
  const code: Code =
    roll < 0.6
      ? 'rotary'
      : roll < 0.7
        ? 'partial-rotary'
        : roll < 0.8
          ? 'alibi'
          : roll < 0.9
            ? 'learned'
            : 'sinusoidal';
  const heads = pick([16, 32]);
  const headDim = pick([64, 128]);
  return {
    code,
    scaling: code === 'rotary' ? pick(SCALINGS) : 'none',
    span: pick(SPANS),
    base: pick([10_000, 500_000, 1_000_000]),
    layers: pick([16, 24, 32]),
    hidden: heads * headDim,
    heads,
    kvHeads: pick([4, 8]),
    yaml: next() < 0.25,
  };
}

function scalingJson(shape: Shape): Record<string, unknown> | null {
  const original = Math.max(1024, shape.span / 4);
  switch (shape.scaling) {
    case 'none':
      return null;
    case 'linear':
      return { rope_type: 'linear', factor: 4 };
    case 'dynamic':
      return { rope_type: 'dynamic', factor: 4, original_max_position_embeddings: original };
    case 'yarn':
      return { rope_type: 'yarn', factor: 4, original_max_position_embeddings: original };
    case 'banded':
      return {
        rope_type: 'llama3',
        factor: 4,
        low_freq_factor: 1,
        high_freq_factor: 4,
        original_max_position_embeddings: original,
      };
  }
}

function checkpointText(shape: Shape, name: string): string {
  const config: Record<string, unknown> = {
    architectures: ['BenchForCausalLM'],
    model_type: shape.code === 'alibi' ? 'bloom' : 'llama',
    _name_or_path: name,
    hidden_size: shape.hidden,
    intermediate_size: shape.hidden * 4,
    num_hidden_layers: shape.layers,
    num_attention_heads: shape.heads,
    num_key_value_heads: shape.kvHeads,
    hidden_act: 'silu',
    vocab_size: 32_000,
    max_position_embeddings: shape.span,
    tie_word_embeddings: false,
    torch_dtype: 'bfloat16',
  };
  if (shape.code === 'rotary' || shape.code === 'partial-rotary') {
    config.rope_theta = shape.base;
    const scaling = scalingJson(shape);
    if (scaling) config.rope_scaling = scaling;
    if (shape.code === 'partial-rotary') config.partial_rotary_factor = 0.5;
  } else if (shape.code === 'alibi') {
    config.alibi = true;
  } else {
    config.position_embedding_type = shape.code === 'learned' ? 'absolute' : 'sinusoidal';
  }
  return `${JSON.stringify(config, null, 2)}\n`;
}

function ownText(shape: Shape, name: string): string {
  const original = Math.max(1024, shape.span / 4);
  const position =
    shape.code === 'rotary' || shape.code === 'partial-rotary'
      ? [
          '  position:',
          '    code: rotary',
          `    base: ${shape.base}`,
          `    fraction: ${shape.code === 'partial-rotary' ? 0.5 : 1}`,
          ...(shape.scaling === 'none'
            ? []
            : [
                '    scaling:',
                `      kind: ${shape.scaling}`,
                '      factor: 4',
                `      original-span: ${original}`,
                ...(shape.scaling === 'banded' ? ['      low: 1', '      high: 4'] : []),
              ]),
        ]
      : [`  position: {code: ${shape.code}}`];
  return [
    'format: context-reach-model/1',
    'model:',
    `  name: ${name}`,
    `  layers: ${shape.layers}`,
    `  hidden: ${shape.hidden}`,
    `  heads: ${shape.heads}`,
    `  kv-heads: ${shape.kvHeads}`,
    `  head-dim: ${shape.hidden / shape.heads}`,
    '  feed-forward:',
    `    size: ${shape.hidden * 4}`,
    '    gated: true',
    '  vocab: 32000',
    '  tied-output: false',
    ...position,
    `  declared-span: ${shape.span}`,
    '  dtypes:',
    '    weights: bf16',
    '    cache: bf16',
    'serving:',
    '  sequences: 4',
    '  device-memory-gib: 80',
    '',
  ].join('\n');
}

function fileOf(shape: Shape, i: number): ConfigFile {
  const name = `bench-model-${String(i).padStart(3, '0')}`;
  return shape.yaml
    ? { path: `models/${name}/model.reach.yaml`, text: ownText(shape, name) }
    : { path: `models/${name}/config.json`, text: checkpointText(shape, name) };
}

/** `count` configs, the same for the same `seed` (default: `4`). */
export function generatedConfigs(count: number, seed = 4): ConfigFile[] {
  const next = seeded(seed);
  return Array.from({ length: count }, (_, i) => fileOf(shapeOf(next), i));
}

/**
 * A pull request over `count` configs, as a large refactoring might be: every file differs, so
 * each is judged at both commits; one in ten doubles its declared span (capped at
 * `MAX_CONFIG_SPAN`; at the cap the rotary base doubles instead), the rest gain a layer.
 */
export function pullRequestConfigs(
  count: number,
  seed = 4,
): { base: ConfigFile[]; head: ConfigFile[] } {
  const next = seeded(seed);
  const base: ConfigFile[] = [];
  const head: ConfigFile[] = [];
  for (let i = 0; i < count; i++) {
    const shape = shapeOf(next);
    base.push(fileOf(shape, i));
    const grown =
      i % 10 !== 0
        ? { ...shape, layers: shape.layers + 1 }
        : shape.span < MAX_CONFIG_SPAN
          ? { ...shape, span: shape.span * 2 }
          : { ...shape, base: shape.base * 2 };
    head.push(fileOf(grown, i));
  }
  return { base, head };
}
