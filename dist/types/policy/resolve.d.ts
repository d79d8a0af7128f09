import { DEFAULT_POLICY_PATH } from './defaults.js';
import type { FilePolicy, Policy } from './types.js';
export { DEFAULT_POLICY_PATH };
/** Reads a repository file; null when it does not exist (at the revision in question). */
export type ReadFile = (path: string) => string | null;
/** The built-in policy (communication backbones), as if it were the repository's policy file. */
export declare function builtinPolicy(): Policy;
/** Load a policy file and the files it inherits. Throws PolicyError. */
export declare function loadPolicy(entry: string, read: ReadFile): Policy;
/** Whether the policy treats this repository path as a design file. */
export declare function isDesignPath(policy: Policy, path: string): boolean;
/** The rules for one design file: the policy with its matching scopes applied. Throws PolicyError. */
export declare function policyForFile(policy: Policy, path: string): FilePolicy;
