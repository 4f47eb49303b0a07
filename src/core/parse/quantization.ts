/**
 * `quantization_config` of checkpoint-style configs (docs/metrics.md, "Quantized weights"), as the
 * published checkpoints write it. Counted methods, by `quant_method`:
 * - `gptq` (Frantar et al. 2022): `bits`, `group_size` (default 128; -1 one scale per output row),
 *   a 16-bit scale per group and a packed zero point of `bits` bits per group (the GPTQ checkpoint
 *   format stores its zero points whether or not `sym` is set; from memory); `lm_head: true`
 *   quantizes the output matrix too.
 * - `awq`: `bits` or `w_bit`, `group_size` or `q_group_size` (default 128), `zero_point`
 *   (default true), 16-bit scales.
 * - `fp8`: 8-bit weights with one 32-bit scale per `weight_block_size` block (e.g. [128, 128]);
 *   without it one scale per matrix, which is not counted (a few KiB at most).
 * - `bitsandbytes`: `load_in_4bit`, 4-bit weights in blocks of 64 with a 32-bit absolute maximum
 *   per block, or with `bnb_4bit_use_double_quant` an 8-bit one plus a 32-bit scale per 256 of
 *   them (8.125 bits per block); `load_in_8bit`, 8-bit weights with a 32-bit scale per row
 *   (rows taken as the model width). Block sizes and scale widths from memory (common practice).
 * - `mxfp4` (OCP Microscaling Formats v1.0, 2023: MXFP4 is FP4 E2M1 elements in blocks of 32
 *   sharing one 8-bit E8M0 scale, 4.25 bits per weight): the routed experts' matrices only, as
 *   MXFP4 checkpoints of mixtures of experts store them (gpt-oss); attention, router, embeddings
 *   and output stay unquantized, which is what their `modules_to_not_convert` lists.
 * Modules listed in `modules_to_not_convert` / `llm_int8_skip_modules` other than `lm_head` are not
 * modelled (a `key-ignored` finding); any other method is a `quantization-unknown` finding and the
 * weights are counted unquantized, an upper bound, never a silent figure.
 */
import type { WeightQuantization } from '../model.js';
import type { FieldReader } from './fields.js';
import type { PathSegment } from './quote.js';
import { isCount } from '../metrics/sizes.js';

const AT: PathSegment[] = ['quantization_config'];

/** Methods counted, for messages. */
export const COUNTED_METHODS: readonly string[] = ['gptq', 'awq', 'fp8', 'bitsandbytes', 'mxfp4'];

/** Weights per scale when a gptq or awq config states none (default: `128`). */
const DEFAULT_METHOD_GROUP = 128;
/** MXFP4 (OCP Microscaling Formats v1.0, 2023): 4-bit elements, blocks of 32, one 8-bit scale each. */
const MXFP4_BITS = 4;
const MXFP4_BLOCK = 32;
const MXFP4_SCALE_BITS = 8;
/** bitsandbytes 4-bit block size (from memory: 64) and its scale bits, plain and double-quantized. */
const BNB4_BLOCK = 64;
const BNB4_SCALE_BITS = 32;
const BNB4_DOUBLE_SCALE_BITS = 8 + 32 / 256;

/**
 * The weight quantization `quantization_config` states, or null when there is none (or it cannot
 * be counted: then a finding says so). `hidden` is the model width, the row width of a
 * one-scale-per-row format; `hasExperts`, whether the model has routed experts (what MXFP4
 * quantizes).
 */
export function readQuantization(
  r: FieldReader,
  hidden: number,
  hasExperts = true,
): WeightQuantization | null {
  if (!r.has(AT)) return null;
  const block = r.get(AT);
  if (block === null || typeof block !== 'object' || Array.isArray(block)) {
    r.report('value-invalid', AT, `${r.key(AT)} ${r.is(AT)}; expected a mapping with quant_method`);
    return null;
  }
  r.locate('quantization', AT);
  const methodPath = [...AT, 'quant_method'];
  let method = r.text(null, methodPath, 'a quantization method')?.toLowerCase();
  if (method === undefined && (r.has([...AT, 'load_in_4bit']) || r.has([...AT, 'load_in_8bit'])))
    method = 'bitsandbytes';
  if (method === undefined) {
    if (!r.reported(methodPath)) unknown(r, AT, `${r.key(AT)} states no quant_method`);
    return null;
  }
  const per = (path: PathSegment[]) => [...AT, ...path];
  switch (method) {
    case 'gptq': {
      const bits = readBits(r, [per(['bits'])]);
      const group = readGroup(r, [per(['group_size'])], hidden);
      if (bits === null || group === undefined) return null;
      for (const key of ['dynamic', 'modules_in_block_to_quantize']) {
        if (r.has(per([key])))
          r.report(
            'key-ignored',
            per([key]),
            `${r.key(per([key]))} is not modelled: every matrix of the layers is counted at ${bits} bits in groups of ${group ?? 'a row'}`,
          );
      }
      skipped(r, [per(['modules_to_not_convert'])]);
      return {
        method,
        bits,
        groupSize: group,
        scaleBits: 16,
        zeroPoint: true,
        output: r.flag(null, per(['lm_head'])) === true,
      };
    }
    case 'awq': {
      const bits = readBits(r, [per(['bits']), per(['w_bit'])]);
      const group = readGroup(r, [per(['group_size']), per(['q_group_size'])], hidden);
      if (bits === null || group === undefined) return null;
      skipped(r, [per(['modules_to_not_convert'])]);
      return {
        method,
        bits,
        groupSize: group,
        scaleBits: 16,
        zeroPoint: r.flag(null, per(['zero_point'])) !== false,
        output: false,
      };
    }
    case 'fp8': {
      const sizePath = per(['weight_block_size']);
      let groupSize: number | null = null;
      if (r.has(sizePath)) {
        const size = r.get(sizePath);
        if (
          !Array.isArray(size) ||
          size.length === 0 ||
          size.length > 2 ||
          !size.every((n) => isCount(n as number))
        ) {
          r.report(
            'value-invalid',
            sizePath,
            `${r.key(sizePath)} ${r.is(sizePath)}; expected one or two whole numbers, the block of weights sharing one scale, e.g. [128, 128]`,
          );
          return null;
        }
        groupSize = (size as number[]).reduce((a, b) => a * b, 1);
      }
      skipped(r, [per(['modules_to_not_convert']), per(['ignored_layers'])]);
      return { method, bits: 8, groupSize, scaleBits: 32, zeroPoint: false, output: false };
    }
    case 'bitsandbytes': {
      skipped(r, [per(['llm_int8_skip_modules']), per(['modules_to_not_convert'])]);
      if (r.flag(null, per(['load_in_4bit'])) === true) {
        const double = r.flag(null, per(['bnb_4bit_use_double_quant'])) === true;
        return {
          method,
          bits: 4,
          groupSize: BNB4_BLOCK,
          scaleBits: double ? BNB4_DOUBLE_SCALE_BITS : BNB4_SCALE_BITS,
          zeroPoint: false,
          output: false,
        };
      }
      if (r.flag(null, per(['load_in_8bit'])) === true) {
        return {
          method,
          bits: 8,
          groupSize: isCount(hidden) ? hidden : null,
          scaleBits: 32,
          zeroPoint: false,
          output: false,
        };
      }
      r.report(
        'key-ignored',
        AT,
        `${r.key(AT)} names bitsandbytes but neither load_in_4bit nor load_in_8bit is true, so the weights are counted unquantized`,
      );
      return null;
    }
    case 'mxfp4': {
      if (!hasExperts) {
        unknown(
          r,
          methodPath,
          `${r.key(methodPath)} is "mxfp4", which the reader counts on the routed experts' matrices only, and this model has no experts`,
        );
        return null;
      }
      const skipPath = per(['modules_to_not_convert']);
      const list = r.get(skipPath);
      if (list !== undefined && !Array.isArray(list)) {
        r.report(
          'value-invalid',
          skipPath,
          `${r.key(skipPath)} ${r.is(skipPath)}; expected a list of module names`,
        );
      } else if (
        Array.isArray(list) &&
        list.some((name) => typeof name === 'string' && /expert/i.test(name))
      ) {
        r.report(
          'key-ignored',
          skipPath,
          `${r.key(skipPath)} keeps expert modules unquantized, which is not modelled: every routed expert's matrices are counted at MXFP4's 4.25 bits (an under-count of what those modules hold)`,
        );
      }
      return {
        method,
        bits: MXFP4_BITS,
        groupSize: MXFP4_BLOCK,
        scaleBits: MXFP4_SCALE_BITS,
        zeroPoint: false,
        output: false,
        scope: 'experts',
      };
    }
    default:
      unknown(
        r,
        methodPath,
        `${r.key(methodPath)} is ${r.quote(methodPath)}, not a method the reader counts (${COUNTED_METHODS.join(', ')})`,
      );
      return null;
  }
}

function unknown(r: FieldReader, path: PathSegment[], what: string): void {
  r.report(
    'quantization-unknown',
    path,
    `${what}; the weights are counted unquantized at the weight dtype, an upper bound of their bytes. Describe the model in the context-reach format with weights int4, int8 or fp8 and a weight-group-size to count it`,
  );
}

/** `bits`: a whole number from 1 to 16; null (reported) otherwise or when missing. */
function readBits(r: FieldReader, candidates: PathSegment[][]): number | null {
  const path = r.first(candidates);
  if (path === null) {
    r.missing(candidates[0]!, 'the bits per quantized weight, e.g. 4');
    return null;
  }
  const bits = r.count('quantization.bits', path, 'bits per weight');
  if (bits === undefined || Number.isNaN(bits)) return null;
  if (!(Number.isInteger(bits) && bits >= 1 && bits <= 16)) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} is ${r.quote(path)}; expected the bits per quantized weight, a whole number from 1 to 16 (commonly 4 or 8)`,
    );
    return null;
  }
  return bits;
}

/**
 * Weights per scale: the stated group size, 128 when none is stated, `hidden` for -1 (one scale
 * per row); undefined (reported) for anything else.
 */
function readGroup(
  r: FieldReader,
  candidates: PathSegment[][],
  hidden: number,
): number | null | undefined {
  const path = r.first(candidates);
  if (path === null) return DEFAULT_METHOD_GROUP;
  const size = r.count('quantization.groupSize', path, 'weights per scale');
  if (size === undefined || Number.isNaN(size)) return undefined;
  if (size === -1) return isCount(hidden) ? hidden : null;
  if (!isCount(size)) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} is ${r.quote(path)}; expected the weights sharing one scale, a whole number of at least 1 (commonly 128), or -1 for one scale per row`,
    );
    return undefined;
  }
  return size;
}

/** Modules kept unquantized: `lm_head` is unquantized anyway; any other is not modelled, said in a finding. */
function skipped(r: FieldReader, candidates: PathSegment[][]): void {
  for (const path of candidates) {
    const list = r.get(path);
    if (list === undefined) continue;
    if (!Array.isArray(list)) {
      r.report(
        'value-invalid',
        path,
        `${r.key(path)} ${r.is(path)}; expected a list of module names`,
      );
      continue;
    }
    const others = list.filter((name) => name !== 'lm_head');
    if (others.length > 0) {
      r.report(
        'key-ignored',
        path,
        `${r.key(path)} keeps ${others.length} module name${others.length === 1 ? '' : 's'} besides lm_head unquantized, which is not modelled: the matrices of every layer are counted quantized (an under-count of what those modules hold)`,
      );
    }
  }
}
