import type { Policy } from './policy/types.js';
import { type ChangedFile, type GateDeps, type GateRequest, type GateResult, type Revision } from './gate-request.js';
export type { ChangedFile, GateDeps, GateRequest, GateResult, Revision };
export { joinReports } from './gate/join.js';
/** Whether a path belongs to part `index` (1-based) of `total`. */
export declare function inPart(path: string, part: {
    index: number;
    total: number;
}): boolean;
interface LoadedPolicy {
    policy: Policy;
    texts: Map<string, string | null>;
}
/** Load a policy through an async reader: the loader is pure and synchronous, so files are fetched on demand and the load retried. */
export declare function loadPolicyAt(entry: string, read: (path: string) => Promise<string | null>): Promise<LoadedPolicy>;
export declare function runGate(request: GateRequest, deps: GateDeps): Promise<GateResult>;
