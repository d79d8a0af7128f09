import type { CompactGraph } from '../graph/compact.js';
import { type Mask } from '../graph/mask.js';
import { type Components } from '../graph/structure.js';
import type { RemovalSequence } from '../envelope/types.js';
import type { Consequence } from '../graph/consequence.js';
import type { Evaluation } from '../envelope/types.js';
/** Sites a consequence lists by name; the count says how many there are in all. */
export declare const MAX_STRANDED = 20;
/**
 * Weak points whose cost a requirement works out: each costs a pass over the design, so a
 * change that turns a large mesh into a tree would otherwise take time quadratic in its size.
 * Findings beyond it carry no consequence, and a notice says so.
 */
export declare const MAX_COSTED = 500;
/** The report's consequence of the removal `mask` (`intact`: the design's components, when known). */
export declare function consequenceOf(g: CompactGraph, mask: Mask, intact?: Components): Consequence;
/** The consequence of a removal described by `remove`, which marks a fresh mask. */
export declare function costOf(g: CompactGraph, remove: (mask: Mask) => void, intact?: Components): Consequence;
/** The mask after every element of a sequence is removed (groups lose their links that are not hardened, as in the challenges). */
export declare function sequenceMask(g: CompactGraph, seq: RemovalSequence): Mask;
/**
 * The evaluation as the report shows it: every worst case and weakest realization carries its
 * elements' lines and labels and what the whole sequence costs (N−1 worst cases their
 * elements' lines and labels). A copy; the engine's result
 * (which base and head may share) is left as it was.
 */
export declare function withSequenceDetails(ev: Evaluation, g: CompactGraph): Evaluation;
