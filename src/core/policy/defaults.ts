import { nullRecord } from '../null-record.js';
import type { Policy } from './types.js';

/** Where a repository keeps its policy (default: `.github/context-reach.yml`). */
export const DEFAULT_POLICY_PATH = '.github/context-reach.yml';

/**
 * Model-config globs when a policy has no `files`: checkpoint configs (`config.json`), files
 * named for a model, and the context-reach model format's `.reach` files.
 */
export const DEFAULT_FILES: readonly string[] = Object.freeze([
  '**/config.json',
  '**/*model*.{json,yaml,yml}',
  '**/*.reach.{yaml,yml,json}',
]);

/**
 * Never judged when a policy has no `exclude`: dependencies, workflow files, tokenizers, npm
 * manifests, and sharded-weight indexes (`model.safetensors.index.json` matches `*model*`).
 */
export const DEFAULT_EXCLUDE: readonly string[] = Object.freeze([
  'node_modules/**',
  '**/node_modules/**',
  '.github/**',
  '**/tokenizer*.json',
  '**/package*.json',
  '**/*.index.json',
]);

/** Largest policy file accepted, in UTF-16 code units of the decoded text (default: `1 MiB`). */
export const MAX_POLICY_CHARS = 1024 * 1024;

/** The policy of a repository without a policy file: built-in rules, no numeric limits. */
export const DEFAULT_POLICY: Policy = Object.freeze({
  path: null,
  files: DEFAULT_FILES,
  exclude: DEFAULT_EXCLUDE,
  serving: Object.freeze({}),
  limits: Object.freeze(nullRecord<Policy['limits'][string]>()),
  rules: Object.freeze(nullRecord<Policy['rules'][string]>()),
  overrides: Object.freeze([]),
  standing: 'report',
  waiverLabel: null,
  locations: Object.freeze(nullRecord<Policy['locations'][string]>()),
});
