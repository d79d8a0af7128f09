export interface UnpairedDesign {
    path: string;
    /** The network's name, when the file could be read and names one. */
    name?: string;
}
export interface DesignPair {
    /** The deleted file (the base side). */
    previousPath: string;
    /** The added file (the head side). */
    path: string;
    by: 'network name' | 'base name';
}
/** A path without its design extension (or its last extension): "networks/ring". */
export declare function designStem(path: string): string;
/** The deleted and added designs that are one design moved (see the file comment), in path order. */
export declare function pairDesigns(deleted: readonly UnpairedDesign[], added: readonly UnpairedDesign[]): DesignPair[];
