// An element of a compiled design as the report names it: id, kind, line and, for sites that
// have one, the label the design gives them. Every place that turns an index (or an id) into
// a ReportElement goes through here, so labels and lines are never forgotten in one view.

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
export function reportElement(g: CompactGraph, kind: ElementKind, i: number): ReportElement {
  if (kind === 'node') {
    const label = g.nodeLabels[i];
    const el: ReportElement = { id: g.nodeIds[i], kind, line: g.nodeLine[i] };
    if (label !== undefined && label !== '' && label !== el.id) el.label = label;
    return el;
  }
  if (kind === 'link') return { id: g.linkIds[i], kind, line: g.linkLine[i] };
  return { id: g.groupIds[i], kind, line: g.groupLine[i] };
}

/** Index of an element by its display id (links: the first with that id), or -1. */
export function indexOfElement(g: CompactGraph, kind: ElementKind, id: string): number {
  if (kind === 'node') return g.nodeIndex.get(id) ?? -1;
  if (kind === 'link') return g.linkIndex.get(id) ?? -1;
  return g.groupIds.indexOf(id);
}

/** The element with this id in the first design that has it, else the bare id at line 0. */
export function locateElement(
  el: { id: string; kind: ElementKind },
  ...graphs: (CompactGraph | undefined)[]
): ReportElement {
  for (const g of graphs) {
    if (!g) continue;
    const i = indexOfElement(g, el.kind, el.id);
    if (i >= 0) return reportElement(g, el.kind, i);
  }
  return { id: el.id, kind: el.kind, line: 0 };
}
