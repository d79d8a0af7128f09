import type { ElementKind } from '../envelope/types.js';
import type { ReportElement } from '../report/report.js';
import type { CompactGraph } from './compact.js';
/** Element `i` of the given kind (node, link or shared-risk group index). */
export declare function reportElement(g: CompactGraph, kind: ElementKind, i: number): ReportElement;
/** Index of an element by its display id (links: the first with that id), or -1. */
export declare function indexOfElement(g: CompactGraph, kind: ElementKind, id: string): number;
/** The element with this id in the first design that has it, else the bare id at line 0. */
export declare function locateElement(el: {
    id: string;
    kind: ElementKind;
}, ...graphs: (CompactGraph | undefined)[]): ReportElement;
