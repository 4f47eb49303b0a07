/**
 * ajv options shared by the two shipped schemas (policy and model description). Compiling is
 * start-up cost paid on every run, so: shared definitions compiled once rather than inlined at
 * each use (the policy schema refers to its definitions about 70 times); no meta-schema check at
 * run time of schemas the tests check (test/policy/schema.test.ts, test/parse/own-dialect.test.ts);
 * no optimising pass over code that runs a few hundred times. The errors are the same: instance
 * paths, keywords, params, data and parent schemas do not depend on these options.
 */
export const SCHEMA_COMPILE_OPTIONS = {
  inlineRefs: false,
  validateSchema: false,
  code: { optimize: false },
} as const;
