/**
 * The policy file's JSON Schema (shipped as `schema/policy.schema.json` for editor completion)
 * and its validator, compiled from that file at build time (scripts/generate-validators.mjs).
 */
import type { ErrorObject, ValidateFunction } from 'ajv';
import policySchema from '../../../schema/policy.schema.json' with { type: 'json' };
import { validate } from './policy-validator.generated.js';

export const POLICY_SCHEMA: Readonly<Record<string, unknown>> = policySchema;

const compiled = validate as ValidateFunction;

/** Validates a plain value against the policy schema; errors carry `parentSchema` and `data`. */
export function validatePolicyValue(value: unknown): ErrorObject[] {
  return compiled(value) ? [] : [...(compiled.errors ?? [])];
}
