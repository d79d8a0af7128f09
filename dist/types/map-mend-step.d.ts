import { type CompareInput } from './gate/compare.js';
import type { FileReport } from './report/report.js';
import { type GateDeps, type GateRequest, type Revision } from './gate-request.js';
/** Default most evaluations of mended designs, and the share of the design's budget they may use together. */
export declare const MEND_MAX_EVALUATIONS = 10;
export declare const MEND_BUDGET_FACTOR = 1;
export declare const MEND_MIN_EVALUATIONS = 2;
export interface StepContext {
    request: GateRequest;
    deps: GateDeps;
    head: Revision;
    base?: Revision;
    seed: number;
}
/** Fill `report.map` and, for a failing design (or always, when asked), `report.mend`. */
export declare function addMapAndMend(report: FileReport, input: CompareInput, ctx: StepContext): Promise<void>;
