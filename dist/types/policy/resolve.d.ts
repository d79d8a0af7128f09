import type { DesignFormat } from '../topology/model.js';
import { DEFAULT_POLICY_PATH } from './defaults.js';
import type { FilePolicy, Policy } from './types.js';
export { DEFAULT_POLICY_PATH };
/** Reads a repository file; null when it does not exist (at the revision in question). */
export type ReadFile = (path: string) => string | null;
/** The built-in policy (communication backbones), as if it were the repository's policy file. */
export declare function builtinPolicy(): Policy;
/** Load a policy file and the files it inherits. Throws PolicyError. */
export declare function loadPolicy(entry: string, read: ReadFile): Policy;
/** Whether any of the globs matches the repository path (every policy glob goes through here). */
export declare function globsMatch(globs: readonly string[], given: string): boolean;
/** Whether the policy treats this repository path as a design file. */
export declare function isDesignPath(policy: Policy, path: string): boolean;
/**
 * Whether the policy selects this path only by the built-in CSV glob (`**\/*.csv`, in an entry
 * that forces no format): such a file is a design only if its header says so
 * (`isDesignText`). A CSV that any other glob selects is judged whatever it holds.
 */
export declare function designNeedsHeader(policy: Policy, path: string): boolean;
/** Whether a file with this text (null: absent or unreadable) at this path is a design the policy judges. */
export declare function isDesignText(policy: Policy, path: string, text: string | null): boolean;
/** The format the policy forces on this path (a `designs` entry's `format`), if any. */
export declare function designFormat(policy: Policy, path: string): DesignFormat | undefined;
/** The rules for one design file: the policy with its matching scopes applied. Throws PolicyError. */
export declare function policyForFile(policy: Policy, path: string): FilePolicy;
