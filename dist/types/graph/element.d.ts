import type { CompactGraph } from './compact.js';
/** The three kinds of element a challenge removes and a report names. */
export type ElementKind = 'node' | 'link' | 'group';
/** An element as the report names it. */
export interface ReportElement {
    id: string;
    kind: ElementKind;
    /** 1-based line in the design file (head side unless the element only exists at base). */
    line: number;
    /** The site's name in the design (GraphML/GML `label` or `name`, our `label`), when it has one. */
    label?: string;
}
/** Element `i` of the given kind (node, link or shared-risk group index). */
export declare function reportElement(g: CompactGraph, kind: ElementKind, i: number): ReportElement;
/** Index of an element by its display id (links: the first with that id), or -1. */
export declare function indexOfElement(g: CompactGraph, kind: ElementKind, id: string): number;
/** The element with this id in the first design that has it, else the bare id at line 0. */
export declare function locateElement(el: {
    id: string;
    kind: ElementKind;
}, ...graphs: (CompactGraph | undefined)[]): ReportElement;
