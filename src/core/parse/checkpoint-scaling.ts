/**
 * Long-context rotary scalings of checkpoint configs beyond one factor: per-pair factors
 * (`longrope`, formerly `su`: LongRoPE, Ding et al. 2024, as shipped by Phi-3) and multimodal
 * rotary sections (`mrope`, Qwen2-VL). Called from the checkpoint reader's scaling block.
 */
import type { FieldReader } from './fields.js';
import type { PathSegment } from './quote.js';
import type { ScalingDraft } from './spec-defaults.js';
import { rotaryWidth } from '../metrics/frequencies.js';
import { isCount } from '../metrics/sizes.js';

/** What the scaling readers need from the rest of the config. */
export interface RotaryContext {
  /** Rotary pairs `r/2`, or NaN when the head width or fraction is unusable. */
  pairs: number;
  /** The declared span, NaN when unusable. */
  declaredSpan: number;
}

/** Rotary pairs `r/2` of a head of `headDim` channels rotating `fraction` of them (NaN when unusable). */
export function rotaryPairs(headDim: number, fraction: number | undefined): number {
  const r = rotaryWidth(headDim, fraction ?? 1);
  return r === null ? NaN : r / 2;
}

/**
 * A list of positive factors, one per rotary pair; undefined (reported) when absent, not a list of
 * positive numbers, or of the wrong length.
 */
function factorList(r: FieldReader, path: PathSegment[], ctx: RotaryContext): number[] | undefined {
  const v = r.get(path);
  if (v === undefined) {
    r.missing(
      path,
      `a list of ${Number.isNaN(ctx.pairs) ? 'per-pair' : ctx.pairs} factors, one per rotary pair`,
    );
    return undefined;
  }
  if (!Array.isArray(v) || !v.every((x) => typeof x === 'number' && Number.isFinite(x) && x > 0)) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} ${r.is(path)}; expected a list of factors above 0, one per rotary pair`,
    );
    return undefined;
  }
  const list = v as number[];
  if (!Number.isNaN(ctx.pairs) && list.length !== ctx.pairs) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} has ${list.length} factors, but the rotary code has ${ctx.pairs} pairs (head width × rotary share / 2); expected one factor per pair, ${ctx.pairs} in all`,
    );
    return undefined;
  }
  return list;
}

/**
 * `longrope` / `su`: per-pair factors `θ'_i = θ_i / factor_i`, the long list once the span exceeds
 * the original span, the short one otherwise (the published implementation). The factor `s` is
 * the stated `factor`, else the declared span over the original span (as Phi-3 configs imply it).
 * The attention factor is read when stated; otherwise the published default applies in the metrics.
 */
export function readPairwise(
  r: FieldReader,
  at: PathSegment[],
  ctx: RotaryContext,
  originalSpan: number | null | undefined,
): ScalingDraft {
  const short = factorList(r, [...at, 'short_factor'], ctx);
  const long = factorList(r, [...at, 'long_factor'], ctx);
  // PhiMoE-style blocks state the factor past the original span as long_mscale (short_mscale
  // within it, where the short factors apply); attentionScale is the long-range one.
  const attentionPath = r.first([
    [...at, 'attention_factor'],
    [...at, 'long_mscale'],
  ]);
  r.get([...at, 'short_mscale']);
  const attention =
    attentionPath === null
      ? undefined
      : r.real('position.scaling.attentionFactor', attentionPath, 'attention factor', {
          test: (n) => n > 0,
          expected: 'an attention factor above 0',
        });
  let factor = r.real('position.scaling.factor', [...at, 'factor'], 'scaling factor');
  if (factor === undefined) {
    if (isCount(originalSpan ?? NaN) && isCount(ctx.declaredSpan))
      factor = ctx.declaredSpan / (originalSpan as number);
    else if (originalSpan === undefined || originalSpan === null) {
      factor = r.missing(
        [...at, 'original_max_position_embeddings'],
        'the span the model was trained at before scaling (original_max_position_embeddings, in the block or at the top level), or a factor in the block',
      );
    } else factor = NaN;
  }
  return {
    kind: 'pairwise',
    factor: short === undefined || long === undefined ? NaN : factor,
    shortFactors: short ?? null,
    longFactors: long ?? null,
    attentionFactor: attention ?? null,
  };
}

/**
 * `dual_chunk_attention_config` (Qwen2.5-1M, dual chunk attention): relative positions are
 * remapped so that no query-key offset exceeds `chunk_size`, within the span the model was trained
 * at (`original_max_position_embeddings`). Not modelled: reported (`key-ignored`) with the numbers
 * it changes. Its keys are consulted so none is reported again as unread.
 */
export function reportDualChunk(r: FieldReader, declaredSpan: number): void {
  const path = ['dual_chunk_attention_config'];
  const block = r.get(path);
  if (block === undefined || block === null) return;
  const chunk = r.get([...path, 'chunk_size']);
  const original = r.get([...path, 'original_max_position_embeddings']);
  r.get([...path, 'local_size']);
  const show = (v: unknown) => (typeof v === 'number' ? v.toLocaleString('en-US') : 'not stated');
  r.report(
    'key-ignored',
    path,
    `${r.key(path)} (dual chunk attention) is not modelled: it keeps every query-key offset below chunk_size (${show(chunk)}) within the span the model was trained at (original_max_position_embeddings ${show(original)}), but trainedSpan and reach are read as the declared span (${show(Number.isFinite(declaredSpan) ? declaredSpan : undefined)}) and the positional scans run over offsets up to the span, which this attention never produces: those figures are not the model's — describe it in the context-reach format with trained-span ${show(original)} and read the scans as pessimistic`,
  );
}

/**
 * `mrope_section` (Qwen2-VL's multimodal rotary code): the rotary pairs split into sections for
 * time, height and width position ids. For text every section gets the same position id, so the
 * spectrum is the plain rotary one and nothing changes a metric; the sections must add up to the
 * rotary pairs (reported otherwise).
 */
export function checkSections(r: FieldReader, path: PathSegment[], ctx: RotaryContext): void {
  const v = r.get(path);
  if (v === undefined) return;
  if (
    !Array.isArray(v) ||
    !v.every((x) => typeof x === 'number' && Number.isInteger(x) && x >= 0)
  ) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} ${r.is(path)}; expected a list of whole numbers of rotary pairs, one per position axis`,
    );
    return;
  }
  const sum = (v as number[]).reduce((a, b) => a + b, 0);
  if (!Number.isNaN(ctx.pairs) && sum !== ctx.pairs) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} adds up to ${sum} pairs, but the rotary code has ${ctx.pairs} pairs (head width × rotary share / 2); expected sections that add up to ${ctx.pairs}`,
    );
  }
}
