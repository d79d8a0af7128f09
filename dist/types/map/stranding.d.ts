import type { CompactGraph } from '../graph/compact.js';
/** Group id → sites its loss cuts off (only groups that cut any off). */
export declare function strandingGroups(g: CompactGraph): Map<string, number>;
