/**
 * Checkpoint-style configs: which decoder layers attend how (docs/metrics.md, "Layers that differ"),
 * keyed as the published configs write it:
 * - `layer_types`: one entry per layer, `sliding_attention`, `full_attention` or
 *   `chunked_attention`.
 * - `sliding_window` (unless `use_sliding_window` is false; Qwen families turn it off unless it
 *   is true), with, first match: `sliding_window_pattern` N (every Nth layer is global: layer i
 *   slides when `(i + 1) % N != 0`, as the Gemma-3-style config classes expand it) or letters
 *   such as "LLLG" (L local, G global, repeated, the last layer global: EXAONE 4); the family
 *   patterns (`globalEvery` in `checkpoint-families.ts`; gemma2: local and global alternate,
 *   starting with a local layer; gemma3 / gemma3_text: N = 6; cohere2: N = 4 — each class's
 *   default); `max_window_layers`
 *   (layers from that index on slide, as the Qwen code does); otherwise every layer slides.
 *   In cohere2 (`ropeOnSlidingOnly`) the layers that do not slide have no position code: its
 *   attention applies the rotary code only in layers with a window.
 * - `attention_chunk_size` with `no_rope_layers` (one entry per layer, 1 = the layer has the
 *   rotary code, 0 = none) or `no_rope_layer_interval` (every Nth layer has none; default 4 for
 *   llama4 / llama4_text): as the Llama-4-style config class expands it, layers with the rotary
 *   code use chunked attention and the others full attention.
 * - `no_rope_layers` alone: the layers without a position code.
 * - `cross_attention_layers` (Mllama): those layers cross-attend to the image tokens only, with no
 *   position code and no cache per text token.
 * - `rope_local_base_freq`, or `rope_parameters.sliding_attention.rope_theta`: the rotary base
 *   of the local layers, which run without the model's context scaling (as the Gemma-3-style
 *   code builds its local rotary embedding).
 * A pattern the reader cannot resolve is reported (`key-ignored`), never silently defaulted.
 */
import type { LayerAttention } from '../model.js';
import type { FieldReader } from './fields.js';
import { familyOf } from './checkpoint-families.js';
import { isCount } from '../metrics/sizes.js';
import type { SourceMapping, SourceValue } from './source.js';

const LAYER_TYPE_NAMES: Readonly<Record<string, LayerAttention>> = {
  full_attention: 'full',
  sliding_attention: 'sliding',
  chunked_attention: 'chunked',
};

export interface LayerPlanDraft {
  slidingWindow: number | null;
  windowLayers: number | null;
  layerTypes: LayerAttention[] | null;
  positionFreeLayers: number[] | null;
  chunkSize: number | null;
  localBase: number | null;
}

function isMapping(v: SourceValue | undefined): v is SourceMapping {
  return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}

/** Reads the per-layer attention pattern; every problem becomes a finding on `r`. */
export function readLayerPlan(
  r: FieldReader,
  modelType: string | null,
  layers: number,
): LayerPlanDraft {
  const plan = readLayerKinds(r, modelType, layers);
  readCrossLayers(r, plan, isCount(layers) && layers <= 1 << 16 ? layers : null);
  // A family whose global layers carry no position code (`ropeOnSlidingOnly`), unless the file
  // says which layers have none.
  if (
    familyOf(modelType)?.ropeOnSlidingOnly &&
    plan.positionFreeLayers === null &&
    plan.layerTypes?.includes('sliding')
  ) {
    const free = plan.layerTypes.flatMap((kind, i) => (kind === 'sliding' ? [] : [i]));
    if (free.length > 0) {
      plan.positionFreeLayers = free;
      r.locate('positionFreeLayers', ['model_type']);
    }
  }
  return plan;
}

/**
 * `cross_attention_layers` (Mllama, Llama 3.2 Vision): the listed layers attend to the image
 * tokens only, through their own key and value projections, and apply no position code (the
 * published MllamaTextCrossAttention rotates nothing): they hold no cache per text token. The
 * image tokens' keys and values they keep (fixed per image) are not counted, which a
 * `vision-not-counted` finding says.
 */
function readCrossLayers(r: FieldReader, plan: LayerPlanDraft, n: number | null): void {
  const path = ['cross_attention_layers'];
  if (!r.has(path)) return;
  const list = r.get(path);
  if (
    !Array.isArray(list) ||
    list.some(
      (x) => typeof x !== 'number' || !Number.isInteger(x) || x < 0 || (n !== null && x >= n),
    )
  ) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} ${Array.isArray(list) ? 'lists an entry that is not a layer index' : r.is(path)}; expected a list of layer indices from 0${n !== null ? ` to ${n - 1}` : ''}`,
    );
    return;
  }
  if (n === null || list.length === 0) return;
  if (plan.layerTypes === null && plan.slidingWindow !== null) {
    r.report(
      'key-ignored',
      path,
      `${r.key(path)} is not read: the sliding window is not stated per layer, so which layers cross-attend cannot be combined with it; every layer is read as self-attention and the cache is overstated — state layer_types`,
    );
    return;
  }
  const kinds: LayerAttention[] = plan.layerTypes ?? Array.from({ length: n }, () => 'full');
  const cross = [...new Set(list as number[])].sort((a, b) => a - b);
  for (const i of cross) kinds[i] = 'cross';
  plan.layerTypes = kinds;
  plan.windowLayers = kinds.filter((t) => t === 'sliding').length || null;
  if (plan.windowLayers === null) plan.slidingWindow = null;
  plan.positionFreeLayers = [...new Set([...(plan.positionFreeLayers ?? []), ...cross])].sort(
    (a, b) => a - b,
  );
  r.locate('layerTypes', path);
  r.locate('positionFreeLayers', path);
  r.report(
    'vision-not-counted',
    path,
    `${r.key(path)}: ${cross.length} of ${n} layers attend to the image tokens only; they hold no keys or values per text token, so cachePerTokenBytes and cacheBytesAtSpan leave them out, and the image tokens' own keys and values in those layers (fixed per image) are not counted: the cache is understated by that amount when images are present`,
  );
}

function readLayerKinds(r: FieldReader, modelType: string | null, layers: number): LayerPlanDraft {
  const plan: LayerPlanDraft = {
    slidingWindow: null,
    windowLayers: null,
    layerTypes: null,
    positionFreeLayers: null,
    chunkSize: null,
    localBase: null,
  };
  const n = isCount(layers) && layers <= 1 << 16 ? layers : null;

  plan.positionFreeLayers = readPositionFree(r, modelType, n);
  if (r.has(['attention_chunk_size']))
    plan.chunkSize = r.count('chunkSize', ['attention_chunk_size'], 'tokens per chunk') ?? null;

  const window = readWindowSize(r, modelType);
  plan.slidingWindow = window;

  const typesPath = ['layer_types'];
  if (r.has(typesPath)) {
    plan.layerTypes = readLayerTypes(r, n);
    if (plan.layerTypes === null) return dropWindow(plan);
  } else if (plan.chunkSize !== null && n !== null) {
    // The Llama-4-style class: layers with the rotary code are chunked, the others full.
    const free = new Set(plan.positionFreeLayers ?? []);
    if (
      !hasList(r, ['no_rope_layers']) &&
      familyOf(modelType)?.noRopeEvery === undefined &&
      !r.has(['no_rope_layer_interval'])
    ) {
      r.report(
        'key-ignored',
        ['attention_chunk_size'],
        `${r.key(['attention_chunk_size'])} states a chunk, but neither layer_types nor no_rope_layers says which layers are chunked; every layer is read as chunked — state layer_types`,
      );
    }
    plan.layerTypes = Array.from({ length: n }, (_, i): LayerAttention =>
      free.has(i) ? 'full' : 'chunked',
    );
    r.locate(
      'layerTypes',
      hasList(r, ['no_rope_layers']) ? ['no_rope_layers'] : ['attention_chunk_size'],
    );
  }

  if (plan.layerTypes !== null) {
    const types = plan.layerTypes;
    if (types.includes('sliding') && window === null) {
      if (!r.reported(['sliding_window']))
        r.missing(
          ['sliding_window'],
          `the window in tokens: ${r.key(typesPath)} lists sliding_attention layers`,
        );
      plan.slidingWindow = NaN;
    }
    if (!types.includes('sliding') && window !== null) {
      r.report(
        'key-ignored',
        ['sliding_window'],
        `${r.key(['sliding_window'])} has no effect: no entry of ${r.key(typesPath)} is "sliding_attention"`,
      );
      plan.slidingWindow = null;
    }
    if (types.includes('chunked') && plan.chunkSize === null) {
      plan.chunkSize = r.missing(
        ['attention_chunk_size'],
        `tokens per chunk: ${r.key(typesPath)} lists chunked_attention layers`,
      );
    }
    if (!types.includes('chunked') && plan.chunkSize !== null) {
      r.report(
        'key-ignored',
        ['attention_chunk_size'],
        `${r.key(['attention_chunk_size'])} has no effect: no layer is chunked`,
      );
      plan.chunkSize = null;
    }
    plan.windowLayers = types.filter((t) => t === 'sliding').length || null;
    if (plan.windowLayers !== null && r.locations.layerTypes)
      r.locations.windowLayers = r.locations.layerTypes;
    readLocalBase(r, plan);
    return plan;
  }

  if (window === null) {
    readLocalBase(r, plan);
    return plan;
  }
  const patternPath = ['sliding_window_pattern'];
  const family = familyOf(modelType)?.globalEvery;
  if (r.has(patternPath) || family !== undefined) {
    let every: number | undefined = family;
    const letters = r.get(patternPath);
    if (typeof letters === 'string') {
      const kinds = readLetterPattern(r, letters, n);
      if (kinds === undefined) return dropWindow(plan);
      if (kinds === null) return plan;
      return patternPlan(r, plan, kinds, `the pattern ${r.quote(patternPath)}`);
    }
    if (r.has(patternPath)) {
      const stated = r.count('layerTypes', patternPath, 'every Nth layer is global');
      if (stated === undefined || Number.isNaN(stated)) return dropWindow(plan);
      if (!isCount(stated)) {
        r.report(
          'value-invalid',
          patternPath,
          `${r.key(patternPath)} is ${r.quote(patternPath)}; expected a whole number of at least 1 (every Nth layer is global)`,
        );
        return dropWindow(plan);
      }
      every = stated;
    } else r.locate('layerTypes', ['model_type']);
    if (n === null) return plan;
    const kinds = Array.from({ length: n }, (_, i): LayerAttention =>
      (i + 1) % (every as number) !== 0 ? 'sliding' : 'full',
    );
    return patternPlan(r, plan, kinds, `every ${every === 1 ? '' : `${every}th `}layer global`);
  }
  if (r.has(['max_window_layers'])) {
    const first = r.count('windowLayers', ['max_window_layers'], 'layer index');
    if (first === undefined || Number.isNaN(first) || !isCount(layers)) {
      plan.windowLayers = first === undefined ? null : NaN;
      return plan;
    }
    const windowed = layers - Math.max(0, first);
    if (windowed <= 0) {
      r.report(
        'key-ignored',
        ['sliding_window'],
        `${r.key(['sliding_window'])} has no effect: layers from index ${r.key(['max_window_layers'])} (${first}) on use the window, and there are ${layers} layers; lower max_window_layers to below ${layers}, or remove sliding_window`,
      );
      delete r.locations.windowLayers;
      return dropWindow(plan);
    }
    plan.windowLayers = windowed;
  }
  readLocalBase(r, plan);
  return plan;
}

/** The plan with `kinds` from a repeating pattern; the window is dropped (reported) when no layer slides. */
function patternPlan(
  r: FieldReader,
  plan: LayerPlanDraft,
  kinds: LayerAttention[],
  pattern: string,
): LayerPlanDraft {
  plan.layerTypes = kinds;
  plan.windowLayers = kinds.filter((t) => t === 'sliding').length || null;
  if (plan.windowLayers === null) {
    r.report(
      'key-ignored',
      ['sliding_window'],
      `${r.key(['sliding_window'])} has no effect: with ${pattern}, no layer slides`,
    );
    dropWindow(plan);
  }
  readLocalBase(r, plan);
  return plan;
}

/**
 * `sliding_window_pattern` written as letters (EXAONE-4-style configs): "L" a local (sliding)
 * layer, "G" a global one, repeated from layer 0, and the last layer always global (the
 * Exaone4Config documentation: "The final layer always uses global attention regardless of the
 * pattern"). Undefined (reported) when a letter is neither; null when the layer count is unusable.
 */
function readLetterPattern(
  r: FieldReader,
  letters: string,
  n: number | null,
): LayerAttention[] | null | undefined {
  const path = ['sliding_window_pattern'];
  r.locate('layerTypes', path);
  if (!/^[LG]+$/.test(letters)) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} is ${r.quote(path)}; expected a whole number (every Nth layer is global) or a pattern of the letters L (local) and G (global), such as "LLLG"`,
    );
    return undefined;
  }
  if (n === null) return null;
  return Array.from({ length: n }, (_, i): LayerAttention =>
    i === n - 1 || letters[i % letters.length] === 'G' ? 'full' : 'sliding',
  );
}

/** Whether `path` holds a list with at least one entry. */
function hasList(r: FieldReader, path: string[]): boolean {
  const v = r.get(path);
  return Array.isArray(v) && v.length > 0;
}

function dropWindow(plan: LayerPlanDraft): LayerPlanDraft {
  plan.slidingWindow = null;
  plan.windowLayers = null;
  plan.layerTypes = null;
  return plan;
}

/** The window size, or null when there is none or it is turned off. */
function readWindowSize(r: FieldReader, modelType: string | null): number | null {
  if (!r.has(['sliding_window'])) return null;
  const use = r.flag(null, ['use_sliding_window']);
  if (use === false) return null;
  if (
    use === undefined &&
    !r.has(['use_sliding_window']) &&
    familyOf(modelType)?.windowOff === true
  ) {
    r.report(
      'key-ignored',
      ['sliding_window'],
      `${r.key(['sliding_window'])} has no effect: use_sliding_window is not stated, and model_type "${modelType}" turns the window off unless it is true; add "use_sliding_window": true, or remove sliding_window`,
    );
    return null;
  }
  return r.count('slidingWindow', ['sliding_window'], 'tokens') ?? null;
}

/** `layer_types` as a list of kinds; null (reported) when it is not one entry per layer of known kinds. */
function readLayerTypes(r: FieldReader, n: number | null): LayerAttention[] | null {
  const path = ['layer_types'];
  const value = r.get(path);
  r.locate('layerTypes', path);
  if (!Array.isArray(value)) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} ${r.is(path)}; expected a list with one entry per layer (${Object.keys(LAYER_TYPE_NAMES).join(', ')})`,
    );
    return null;
  }
  if (n !== null && value.length !== n) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} has ${value.length} entries, but there are ${n} layers; expected one entry per layer`,
    );
    return null;
  }
  const types: LayerAttention[] = [];
  for (const [i, entry] of value.entries()) {
    const kind = typeof entry === 'string' ? LAYER_TYPE_NAMES[entry] : undefined;
    if (kind === undefined) {
      r.report(
        'key-ignored',
        [...path, i],
        `${r.key([...path, i])} is ${r.quote([...path, i])}, not a layer kind the reader models (${Object.keys(LAYER_TYPE_NAMES).join(', ')}); the layer pattern is not read, and every layer is taken as full attention, so the cache may be overstated — describe the model in the context-reach format`,
      );
      return null;
    }
    types.push(kind);
  }
  return types;
}

/** Layers without a position code, from `no_rope_layers` (1 = rotary, 0 = none) or the family interval. */
function readPositionFree(
  r: FieldReader,
  modelType: string | null,
  n: number | null,
): number[] | null {
  const listPath = ['no_rope_layers'];
  // An empty list is "not stated": the Llama-4-style class then fills in its interval default.
  const stated = r.get(listPath);
  if (r.has(listPath) && !(Array.isArray(stated) && stated.length === 0)) {
    const list = r.get(listPath);
    r.locate('positionFreeLayers', listPath);
    // The list wins over an interval (the SmolLM3- and Llama-4-style classes expand the interval
    // only when no list is given).
    r.get(['no_rope_layer_interval']);
    if (
      !Array.isArray(list) ||
      list.some((x) => x !== 0 && x !== 1) ||
      (n !== null && list.length < n)
    ) {
      r.report(
        'value-invalid',
        listPath,
        `${r.key(listPath)} ${Array.isArray(list) ? `has ${list.length} entries` : r.is(listPath)}; expected a list of 0 and 1 with one entry per layer${n !== null ? ` (${n})` : ''}, 1 where the layer has the rotary code`,
      );
      return null;
    }
    const free = (list as number[])
      .slice(0, n ?? list.length)
      .flatMap((x, i) => (x === 0 ? [i] : []));
    return free.length > 0 ? free : null;
  }
  const intervalPath = ['no_rope_layer_interval'];
  const familyInterval = familyOf(modelType)?.noRopeEvery;
  if (!r.has(intervalPath) && familyInterval === undefined) return null;
  let every = familyInterval;
  if (r.has(intervalPath)) {
    const stated = r.count(
      'positionFreeLayers',
      intervalPath,
      'every Nth layer has no position code',
    );
    if (stated === undefined || !isCount(stated)) {
      if (stated !== undefined && !Number.isNaN(stated))
        r.report(
          'value-invalid',
          intervalPath,
          `${r.key(intervalPath)} is ${r.quote(intervalPath)}; expected a whole number of at least 1`,
        );
      return null;
    }
    every = stated;
  } else r.locate('positionFreeLayers', ['model_type']);
  if (n === null || every === undefined) return null;
  const free = Array.from({ length: n }, (_, i) => i).filter((i) => (i + 1) % every === 0);
  return free.length > 0 ? free : null;
}

/** The local layers' rotary base; reported as having no effect when no layer is local. */
function readLocalBase(r: FieldReader, plan: LayerPlanDraft): void {
  const nested = r.get(['rope_parameters', 'sliding_attention']);
  const path = r.has(['rope_local_base_freq'])
    ? ['rope_local_base_freq']
    : isMapping(nested) && r.has(['rope_parameters', 'sliding_attention', 'rope_theta'])
      ? ['rope_parameters', 'sliding_attention', 'rope_theta']
      : null;
  if (path === null) return;
  const base = r.real('localBase', path, 'rotary base', {
    test: (x) => x > 1,
    expected: 'a rotary base above 1 (commonly 10000)',
  });
  const local =
    (plan.layerTypes ?? []).some((t) => t !== 'full') ||
    (plan.layerTypes === null && plan.slidingWindow !== null);
  if (!local) {
    r.report(
      'key-ignored',
      path,
      `${r.key(path)} has no effect: no layer is local (sliding or chunked), so every layer uses the model's rotary base`,
    );
    return;
  }
  if (isMapping(nested)) {
    const type = nested['rope_type'];
    if (typeof type === 'string' && type !== 'default') {
      r.report(
        'key-ignored',
        ['rope_parameters', 'sliding_attention', 'rope_type'],
        `${r.key(['rope_parameters', 'sliding_attention', 'rope_type'])} is "${type}": a scaled code on the local layers is not modelled; they are read unscaled at base ${base}`,
      );
    }
  }
  plan.localBase = base ?? null;
}
