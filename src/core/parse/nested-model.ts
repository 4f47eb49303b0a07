/**
 * Multimodal configs keep the language model in a nested block (`text_config` in LLaVA-, Gemma 3-,
 * Mllama-, Idefics- and Llama-4-style files; `language_config` in DeepSeek-VL-style files;
 * `llm_config` in InternVL-style files) beside a vision tower (`vision_config`). The language
 * model is found without `--at`; the vision tower is never read as one, and is counted apart when
 * its config gives the ViT-style sizes.
 */
import type { Finding, VisionTower } from '../model.js';
import { familyOf } from './checkpoint-families.js';
import { GATED_ACTIVATIONS, isCheckpointConfig } from './checkpoint-dialect.js';
import { FieldReader } from './fields.js';
import type { PathSegment } from './quote.js';
import type { SourceDocument, SourceMapping, SourceValue } from './source.js';

/** Keys published multimodal configs keep the language model under, in the order tried. */
export const NESTED_MODEL_KEYS: readonly string[] = [
  'text_config',
  'language_config',
  'llm_config',
  'language_model',
  'text_model',
];

/** Keys of vision (and other non-text) towers: never read as the language model. */
export const TOWER_KEY = /vision|visual|image|audio|speech/i;

/** Number of image channels when the tower states none (the ViT-style config classes' default: 3, RGB). */
export const DEFAULT_VISION_CHANNELS = 3;

function isMapping(v: SourceValue | undefined): v is SourceMapping {
  return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}

/** Whether `block` reads as a (possibly sparse) language-model config. */
export function isLanguageModelBlock(block: SourceMapping): boolean {
  if (isCheckpointConfig(block)) return true;
  const type = block.model_type;
  // A family with published defaults fills in what a sparse block leaves out.
  return typeof type === 'string' && familyOf(type.toLowerCase())?.published !== undefined;
}

/** The key of the nested language model in `root`, or null. */
export function nestedModelKey(root: SourceMapping): string | null {
  for (const key of NESTED_MODEL_KEYS) {
    const block = root[key];
    if (isMapping(block) && isLanguageModelBlock(block)) return key;
  }
  return null;
}

/**
 * A tower whose config says it is unlike the ViT-style count (Pixtral-style: a gated feed-forward,
 * `hidden_act` silu, and a rotary code in place of the position table, `rope_theta`): reported
 * with the direction and size of the difference, as `vision-not-counted` (info).
 */
function reportUnlikeViT(r: FieldReader, block: SourceMapping): void {
  const num = (k: string) => (typeof block[k] === 'number' ? block[k] : NaN);
  const act = block.hidden_act;
  if (typeof act === 'string' && GATED_ACTIVATIONS.includes(act.toLowerCase())) {
    const extra = num('num_hidden_layers') * num('hidden_size') * num('intermediate_size');
    r.report(
      'vision-not-counted',
      ['hidden_act'],
      `${r.key(['hidden_act'])} is ${r.quote(['hidden_act'])}, a gated feed-forward (three matrices), but visionParams counts the ViT-style plain one (two): the tower is understated${Number.isFinite(extra) ? ` by ${extra.toLocaleString('en-US')} parameters (layers × hidden × intermediate)` : ''}`,
    );
  }
  if (block.rope_theta !== undefined && block.rope_theta !== null) {
    const side = Math.floor(num('image_size') / num('patch_size'));
    const table = (side * side + 1) * num('hidden_size');
    r.report(
      'vision-not-counted',
      ['rope_theta'],
      `${r.key(['rope_theta'])}: the tower uses a rotary code, not a learned position table, but visionParams counts the ViT-style table: the tower is overstated${Number.isFinite(table) ? ` by ${table.toLocaleString('en-US')} parameters ((image/patch)² + 1 positions × hidden)` : ''}`,
    );
  }
}

/**
 * The vision tower beside a language model: `vision_config` of `parent` (the mapping that holds
 * the model block, or the model block itself for flat files), read ViT style. Returns the tower
 * when every size is stated, and the findings (a `vision-not-counted` info otherwise, and one
 * for the projector into the language model, which no count covers; `modelHidden` is the
 * language model's width, for its smallest size).
 */
export function readVisionTower(
  doc: SourceDocument,
  parent: SourceMapping,
  prefix: readonly PathSegment[],
  modelHidden = NaN,
): { tower: VisionTower | null; findings: Finding[] } {
  const block = parent.vision_config;
  if (!isMapping(block)) return { tower: null, findings: [] };
  const r = new FieldReader(doc, block, [...prefix, 'vision_config'], true);
  const keys = [
    'hidden_size',
    'num_hidden_layers',
    'intermediate_size',
    'patch_size',
    'image_size',
  ] as const;
  const missing = keys.filter((k) => !r.has([k]));
  if (missing.length > 0) {
    r.report(
      'vision-not-counted',
      [],
      `${r.key([])} does not state ${missing.join(', ')}, which a ViT-style count needs, so the vision tower's parameters are not counted: params, weights and memory cover the language model only`,
    );
    return { tower: null, findings: r.findings };
  }
  const n = (k: string): number => r.count(`vision.${k}`, [k], 'a size') ?? NaN;
  // Mllama's tower adds num_global_layers encoder layers of the same shape after its
  // num_hidden_layers (MllamaVisionModel's global transformer).
  const global = r.has(['num_global_layers'])
    ? (r.count('vision.layers', ['num_global_layers'], 'a number of layers') ?? NaN)
    : 0;
  reportUnlikeViT(r, block);
  const least = (block.hidden_size as number) * modelHidden;
  r.report(
    'vision-not-counted',
    [],
    `${r.key([])}: the projector from the tower into the language model (one or more matrices${Number.isFinite(least) ? `, at least ${least.toLocaleString('en-US')} parameters (tower width × model width)` : ''}) is not counted in params or visionParams, which understate the model by its size`,
  );
  const channels = r.has(['num_channels']) ? n('num_channels') : DEFAULT_VISION_CHANNELS;
  if (!r.has(['num_channels'])) {
    r.report(
      'family-default-taken',
      [],
      `${r.key(['num_channels'])} is not stated; the vision tower is counted with ${DEFAULT_VISION_CHANNELS} image channels (RGB, the ViT-style config classes' default)`,
    );
  }
  return {
    tower: {
      hidden: n('hidden_size'),
      layers: n('num_hidden_layers') + global,
      ffn: n('intermediate_size'),
      patch: n('patch_size'),
      image: n('image_size'),
      channels,
    },
    findings: r.findings,
  };
}
