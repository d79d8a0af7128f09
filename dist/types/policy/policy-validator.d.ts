import { type ValidateFunction } from 'ajv';
/** ajv's options for the policy schema; .ci/validators.mjs compiles with the same (test/policy/validators.test.ts). */
export declare const POLICY_AJV_OPTIONS: {
    readonly allErrors: true;
    readonly verbose: true;
    readonly discriminator: true;
    readonly strict: false;
};
export declare function policyValidator(): ValidateFunction;
