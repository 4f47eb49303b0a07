import type { Severity } from '../model.js';

export interface RuleInfo {
  /** Default severity; a policy's `rules` block can change it or turn it off. */
  severity: Severity;
  /** One line, for reports and SARIF rule metadata. */
  title: string;
  /** What to do about it, for SARIF `help`. */
  help: string;
  /** Where it is decided: a file on its own, or a change between base and head. */
  scope: 'file' | 'change' | 'limit' | 'read';
}

/** Every rule id context-reach raises. Ids are stable: policies refer to them. */
export const RULES = {
  'config-unreadable': {
    severity: 'block',
    scope: 'read',
    title: 'The model config cannot be read or parsed',
    help: "Fix the syntax error, or exclude the file from the policy's `files` globs if it is not a model config.",
  },
  'base-unreadable': {
    severity: 'block',
    scope: 'read',
    title:
      'The base version of a changed model config cannot be read or parsed, or is not a regular file, so the change cannot be judged against it',
    help: "The rules that compare base and head (a grown span, changed frequencies, a changed shape or cache, a limit's max-increase-pct) cannot be checked, so this blocks. A pull request that repairs the base can be merged deliberately with the policy's waiver label, or the rule can be set to warn in the base branch's policy.",
  },
  'value-invalid': {
    severity: 'block',
    scope: 'file',
    title: 'A value has the wrong type or is outside what the schema allows',
    help: 'Give the key a value of the documented type.',
  },
  'size-invalid': {
    severity: 'block',
    scope: 'file',
    title: 'A size is zero, negative, fractional or not finite',
    help: 'Sizes (layers, widths, heads, spans, vocabulary) must be positive whole numbers.',
  },
  'kv-heads-indivisible': {
    severity: 'block',
    scope: 'file',
    title: 'Key/value heads do not divide the attention heads',
    help: 'Grouped-query attention shares each key/value head among heads/kvHeads query heads; pick a divisor of heads.',
  },
  'rotary-width-odd': {
    severity: 'block',
    scope: 'file',
    title: 'The rotary width is not an even whole number',
    help: 'Rotary codes rotate pairs of channels: head size times rotary fraction must be an even integer.',
  },
  'scaling-factor-below-one': {
    severity: 'block',
    scope: 'file',
    title: 'A context scaling factor below 1',
    help: 'Scaling factors stretch the trained span; a factor below 1 shrinks it. Use 1 or more, or remove the scaling block.',
  },
  'original-span-above-declared': {
    severity: 'block',
    scope: 'file',
    title: "The scaling block's original span exceeds the declared span",
    help: 'The original (trained) span of a scaled code should not exceed the maximum positions the config declares.',
  },
  'scaling-kind-unknown': {
    severity: 'block',
    scope: 'file',
    title: 'An unknown context scaling kind',
    help: 'Use one of the known kinds, or describe the model in the context-reach model format.',
  },
  'position-code-assumed': {
    severity: 'warn',
    scope: 'file',
    title: 'The config states no position code the reader can use, so one was assumed',
    help: 'State the position code (rope_theta, position_embedding_type or alibi), or describe the model in the context-reach model format.',
  },
  'key-ignored': {
    severity: 'warn',
    scope: 'file',
    title: 'A key is stated but has no effect on the model as read',
    help: 'Remove the key, or change the keys it depends on so that it takes effect.',
  },
  'quantization-unknown': {
    severity: 'warn',
    scope: 'file',
    title:
      'A weight quantization the reader does not count, so the weights are counted unquantized',
    help: 'The weight bytes are an upper bound: describe the model in the context-reach format with weights int4, int8 or fp8 and a weight-group-size, or state the format in the policy.',
  },
  'layout-unshardable': {
    severity: 'block',
    scope: 'file',
    title: 'The tensor- or pipeline-parallel degree cannot split this model',
    help: 'The tensor degree must divide the attention heads, and it and the key/value heads must divide one another; the pipeline degree must be at most the layers. Use one of the degrees the message names.',
  },
  'key-unread': {
    severity: 'info',
    scope: 'file',
    title:
      'A key of the model block is not read, and is not on the list of keys that change no metric',
    help: "If the key changes the model's shape, position code or memory, describe the model in the context-reach model format; otherwise ignore it (or turn the rule off in the policy).",
  },
  'family-default-taken': {
    severity: 'info',
    scope: 'file',
    title: "A value the config leaves out was taken from its family's published defaults",
    help: 'State the value in the config if it differs from the family default.',
  },
  'span-not-stated': {
    severity: 'info',
    scope: 'file',
    title:
      'An ALiBi config states no maximum positions: no hard limit, metrics at a served span only',
    help: "Give a served span (--served-span, or the policy's serving block) to compute the positional and cache metrics.",
  },
  'vision-not-counted': {
    severity: 'info',
    scope: 'file',
    title: 'The vision tower of a multimodal config is not counted',
    help: 'Its config does not give the ViT-style sizes (hidden_size, num_hidden_layers, intermediate_size, patch_size, image_size) the count needs; parameters and memory cover the language model only.',
  },
  'span-past-reach': {
    severity: 'block',
    scope: 'file',
    title: 'The evaluated span goes past what the position code supports',
    help: 'Raise the scaling factor, use a learned table as large as the span, or serve a shorter span.',
  },
  'span-beyond-scaling-cover': {
    severity: 'info',
    scope: 'file',
    title:
      'The reach is taken from the declared span on assumption: the scaling alone accounts for less, and no tuned span is stated',
    help: 'If the scaled model was trained or tuned at the declared span (as long-context checkpoints commonly are), state it as the trained span (it is then the tuned span, never multiplied again); otherwise raise the scaling factor.',
  },
  'positions-collide': {
    severity: 'block',
    scope: 'file',
    title: 'Neighbouring positions round to the same value in the position dtype',
    help: 'Compute positions in a wider format (fp32 holds every integer up to 16,777,216), or serve a shorter span.',
  },
  'pairs-blurred': {
    severity: 'warn',
    scope: 'file',
    title: 'Some frequency pairs give neighbouring positions the same rounded angle',
    help: 'Compute angles in a wider format, or accept that those pairs cannot tell neighbours apart.',
  },
  'scan-incomplete': {
    severity: 'warn',
    scope: 'file',
    title: 'A positional scan stopped at its documented bound, so some metrics are not computed',
    help: 'The scans cover at most 2^31 tokens and a fixed amount of work; review the span by hand, or serve a shorter one. A policy limit on a metric left uncomputed counts as crossed.',
  },
  'memory-over-budget': {
    severity: 'block',
    scope: 'file',
    title: 'Weights plus key/value cache at the span do not fit the device budget',
    help: 'Hold fewer concurrent sequences, store the cache in a narrower dtype, use fewer key/value heads, serve a shorter span, spread the replica over more devices (tensor- or pipeline-parallel), or store the weights quantized.',
  },
  'span-grew-code-unchanged': {
    severity: 'block',
    scope: 'change',
    title: 'The declared span grew while the position code stayed the same',
    help: 'A longer span needs a position code that reaches it: add or raise context scaling, or retrain at the longer span and state it.',
  },
  'frequencies-changed': {
    severity: 'warn',
    scope: 'change',
    title: 'The rotary base or the position frequencies changed',
    help: 'Changing the frequencies after training is a retraining-level change: make sure the checkpoint was trained or tuned for them.',
  },
  'checkpoint-shape-changed': {
    severity: 'warn',
    scope: 'change',
    title: 'A checkpoint config changed the shape of its network',
    help: 'Layers, width, heads, key/value heads, head size, feed-forward size, vocabulary and experts fix the shapes of the stored weights: changing them needs new weights (retraining, or converting and tuning the checkpoint). Describe a planned design in the context-reach model format instead.',
  },
  'cache-per-token-changed': {
    severity: 'info',
    scope: 'change',
    title: 'Key/value cache per token changed',
    help: 'Key/value heads, head size or cache dtype changed the memory each token holds.',
  },
  'limit-crossed': {
    severity: 'block',
    scope: 'limit',
    title: "A metric crossed a limit of the team's policy",
    help: 'Change the config so the metric is within the limit, or change the limit in the policy on the base branch.',
  },
} as const satisfies Record<string, RuleInfo>;

export type RuleId = keyof typeof RULES;

export function isRuleId(id: string): id is RuleId {
  return Object.prototype.hasOwnProperty.call(RULES, id);
}
