/**
 * The policy file's JSON Schema (shipped as `schema/policy.schema.json` for editor completion)
 * and its compiled validator.
 */
import { Ajv } from 'ajv';
import type { ErrorObject, ValidateFunction } from 'ajv';
import { SCHEMA_COMPILE_OPTIONS } from '../schema-options.js';
import policySchema from '../../../schema/policy.schema.json' with { type: 'json' };

export const POLICY_SCHEMA: Readonly<Record<string, unknown>> = policySchema;

let compiled: ValidateFunction | null = null;

/** Validates a plain value against the policy schema; errors carry `parentSchema` and `data`. */
export function validatePolicyValue(value: unknown): ErrorObject[] {
  if (compiled === null) {
    // allowUnionTypes: limits admit `null` to remove a bound in an override.
    const ajv = new Ajv({
      allErrors: true,
      verbose: true,
      strict: true,
      allowUnionTypes: true,
      ...SCHEMA_COMPILE_OPTIONS,
    });
    compiled = ajv.compile(policySchema);
  }
  return compiled(value) ? [] : [...(compiled.errors ?? [])];
}
