import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { ElementKind } from '../graph/element.js';
/** Every challenge the engine runs, by name (registry.ts holds one per name). */
export type ChallengeName = 'random-nodes' | 'random-links' | 'degree' | 'degree-adaptive' | 'betweenness' | 'betweenness-adaptive' | 'eigenvector' | 'closeness' | 'link-betweenness' | 'link-betweenness-adaptive' | 'risk-groups' | 'risk-groups-worst' | 'regional' | 'n-1' | 'n-2';
export interface ChallengeParams {
    challenge: ChallengeName;
    /** Upper end of the x axis: a fraction in (0, 1] for removal challenges, km for `regional`. */
    until?: number;
    /** Grid points on the x axis, 0 included. */
    points?: number;
    realizations?: number;
    /** Quantiles of the band, e.g. [0.1, 0.9]. */
    band?: [number, number];
    seed?: number;
    /** Length of the worst-case search (0 = none). */
    worstCase?: number;
    /** Beam width of the worst-case search beyond exact enumeration (1 = greedy, the default). */
    beam?: number;
    /** For n-1 / n-2: which kind of element. */
    element?: 'node' | 'link';
    /** x values that must be grid points (policy thresholds), merged into the grid. */
    at?: number[];
}
interface ChallengeInfo {
    readonly name: ChallengeName;
    /** One line for `netbrace envelope --help` and the README. */
    readonly summary: string;
}
export interface BandPlan {
    kind: ElementKind;
    xUnit: 'fraction' | 'km';
    /** The x grid, ascending, 0 first. */
    x: number[];
    /** Number of realizations (random orders, or epicentres). */
    realizations: number;
    /** Room `realize` needs in `order`. */
    maxUnits: number;
    /**
     * Writes realization r's removal order (unit indices) into `order` and, for each grid point j,
     * the number of units removed there into `steps[j]` (non-decreasing). A count may be real (a
     * fraction x of N units is x·N, units.ts countAt): the engine then reads R between the two
     * neighbouring whole counts, which the order must both hold. Returns the order length.
     */
    realize(r: number, order: Int32Array, steps: Float64Array): number;
    /** What one realization stands for when reported, e.g. the epicentre's id. */
    label?(r: number): string;
}
export interface BandChallenge extends ChallengeInfo {
    readonly type: 'band';
    plan(g: CompactGraph, params: ResolvedParams): BandPlan;
}
export interface AttackContext {
    /** R of the design under a mask (for challenges that choose by R, like worst-first groups). */
    rvalue: (mask: Mask) => number;
}
export interface AttackChallenge extends ChallengeInfo {
    readonly type: 'attack';
    readonly kind: ElementKind;
    /** The removal sequence (unit indices), at most `steps` long; hardened units never appear. */
    sequence(g: CompactGraph, steps: number, ctx: AttackContext): Int32Array;
}
export interface ContingencyChallenge extends ChallengeInfo {
    readonly type: 'contingency';
    /** 1 for N−1, 2 for N−2. */
    readonly order: 1 | 2;
}
export type Challenge = BandChallenge | AttackChallenge | ContingencyChallenge;
/** ChallengeParams with every default filled in (see registry.ts, resolveParams). */
export interface ResolvedParams {
    challenge: ChallengeName;
    until: number;
    points: number;
    realizations: number;
    band: [number, number];
    seed: number;
    worstCase: number;
    element: 'node' | 'link';
    at: number[];
    beam: number;
    /** Regional only: evaluate at most this many epicentres (set by work budgets). */
    epicentres?: number;
}
export {};
