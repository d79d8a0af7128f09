// The policy schema's validator (policy.schema.json), compiled by ajv when first asked for.
// The bundles swap this module for ajv's standalone code of the same schema and options
// (.ci/validators.mjs), so a bundled run does not spend its start compiling the schema.

import { Ajv, type ValidateFunction } from 'ajv';
import schema from './policy.schema.json' with { type: 'json' };

/** ajv's options for the policy schema; .ci/validators.mjs compiles with the same (test/policy/validators.test.ts). */
export const POLICY_AJV_OPTIONS = { allErrors: true, verbose: true, discriminator: true, strict: false } as const;

let validator: ValidateFunction | undefined;

export function policyValidator(): ValidateFunction {
  return (validator ??= new Ajv({ ...POLICY_AJV_OPTIONS }).compile(schema));
}
