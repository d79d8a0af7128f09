import type { CompactGraph } from '../graph/compact.js';
import type { ElementKind } from '../graph/element.js';
import type { BandChallenge, BandPlan, ResolvedParams } from './types.js';
/** The plan shared by every "units in random key order" challenge. */
export declare function randomOrderPlan(g: CompactGraph, kind: ElementKind, params: ResolvedParams): BandPlan;
export declare const randomNodes: BandChallenge;
