/** The team policy file: parse, check, and resolve per model config. */
export {
  DEFAULT_EXCLUDE,
  DEFAULT_FILES,
  DEFAULT_POLICY,
  DEFAULT_POLICY_PATH,
  MAX_POLICY_CHARS,
} from './defaults.js';
export { PolicyError, parsePolicy, servingPatchOf } from './parse.js';
export { isModelConfig, matchingOverrides, resolvePolicy, ruleLevel } from './resolve.js';
export { POLICY_SCHEMA } from './schema.js';
export type {
  FilePolicy,
  LimitSetting,
  LimitTable,
  Policy,
  PolicyOverride,
  PolicyProblem,
  PolicyServingBlock,
  RuleLevel,
  RuleTable,
  Standing,
} from './types.js';
