import { type CompactGraph } from '../graph/compact.js';
import type { Finding, RequirementResult } from '../report/report.js';
import type { SpofRequirement } from '../policy/types.js';
import type { DesignSide } from './measure.js';
import type { Matching } from './rename.js';
/** Weak points of one design, by index. */
export interface WeakPoints {
    bridges: Set<number>;
    cutNodes: Set<number>;
    groups: Set<number>;
}
/** Bridges, cut nodes and stranding groups; honouring hardening leaves hardened ones out. */
export declare function weakPoints(g: CompactGraph, honourHardening: boolean): WeakPoints;
export declare function judgeSpof(r: SpofRequirement, description: string, head: DesignSide, base: DesignSide | undefined, matching: Matching | undefined): {
    rows: RequirementResult[];
    findings: Finding[];
};
