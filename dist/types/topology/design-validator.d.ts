import { type ValidateFunction } from 'ajv';
/** ajv's options for the design schema; .ci/validators.mjs compiles with the same (test/policy/validators.test.ts). */
export declare const DESIGN_AJV_OPTIONS: {
    readonly allErrors: true;
    readonly verbose: true;
    readonly strict: true;
    readonly allowUnionTypes: true;
};
export declare function designValidator(): ValidateFunction;
