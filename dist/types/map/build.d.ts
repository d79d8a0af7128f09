import type { CompactGraph } from '../graph/compact.js';
import type { DesignMap, OmittedMap } from './types.js';
/** Beyond this many sites (or links), base and head together, a map is not drawn: it would not be legible. */
export declare const MAP_MAX_NODES = 1000;
export declare const MAP_MAX_LINKS = 4000;
export interface MapSideInput {
    graph: CompactGraph;
    /** Display names by node id. */
    labels?: ReadonlyMap<string, string>;
}
export declare function buildDesignMap(head: MapSideInput, base?: MapSideInput): DesignMap | OmittedMap;
