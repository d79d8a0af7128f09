// The design schema's validator (design.schema.json), compiled by ajv when first asked for.
// The bundles swap this module for ajv's standalone code of the same schema and options
// (.ci/validators.mjs), so a bundled run does not spend its start compiling the schema.

import AjvModule, { type ValidateFunction } from 'ajv';
import schema from './design.schema.json' with { type: 'json' };

// ajv is published as CommonJS with a `default` property; under NodeNext the default import
// is the module object, so pick the class from whichever shape arrives.
const Ajv = ((AjvModule as unknown as { default?: typeof AjvModule }).default ?? AjvModule) as unknown as new (
  opts: Record<string, unknown>,
) => { compile(s: object): ValidateFunction };

/** ajv's options for the design schema; .ci/validators.mjs compiles with the same (test/policy/validators.test.ts). */
export const DESIGN_AJV_OPTIONS = { allErrors: true, verbose: true, strict: true, allowUnionTypes: true } as const;

let validator: ValidateFunction | undefined;

export function designValidator(): ValidateFunction {
  return (validator ??= new Ajv({ ...DESIGN_AJV_OPTIONS }).compile(schema));
}
