/** Which side of the change an element is on. */
export type MapSide = 'both' | 'head' | 'base';
export interface MapNode {
    id: string;
    /** The design's display name, when it has one. */
    label?: string;
    x: number;
    y: number;
    /** 1-based line in the design file: head's, or base's for a removed site. */
    line: number;
    side: MapSide;
    hardened?: boolean;
    /** True for a site without coordinates on a geographic map (placed beside its neighbours). */
    placed?: boolean;
}
export interface MapLink {
    id: string;
    source: string;
    target: string;
    line: number;
    side: MapSide;
    hardened?: boolean;
    /** Shared-risk groups the link belongs to. */
    groups?: string[];
}
/** A shared-risk group whose loss alone (all its links at once) cuts sites off. */
export interface StrandingGroup {
    id: string;
    line: number;
    /** Sites cut off from the largest part when the group fails. */
    strands: number;
    /** The group does not strand anything at base (or is not there). */
    isNew: boolean;
}
export interface DesignMap {
    /** geographic: sites at their coordinates (equirectangular, fitted to the extent); force: a seeded ForceAtlas2 layout. */
    layout: 'geographic' | 'force';
    width: number;
    height: number;
    nodes: MapNode[];
    links: MapLink[];
    strandingGroups: StrandingGroup[];
    /** How the positions were made, in words. */
    method: string;
}
/** In place of a map: why there is none. */
export interface OmittedMap {
    omitted: string;
}
