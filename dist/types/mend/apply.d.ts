import { type CompactGraph } from '../graph/compact.js';
import type { ReportElement } from '../graph/element.js';
import { type DesignFormat, type Topology } from '../topology/model.js';
import type { MendLink } from './types.js';
export interface Change {
    links: readonly MendLink[];
    harden: readonly ReportElement[];
}
/** The compact graph with extra links appended (structure only: no lengths, ids or lines for them). */
export declare function withExtraLinks(g: CompactGraph, extra: readonly (readonly [number, number])[]): CompactGraph;
/** The design with the change applied, as parsing the edited file would give it. */
export declare function applyToTopology(t: Topology, change: Change): Topology;
/** The entry a new link gets in our design format. */
export declare function linkEntry(l: MendLink): Record<string, unknown>;
/**
 * The text of a design in our format (YAML or JSON) with the change applied; comments and
 * layout of YAML files are kept. `t` is the parsed design: it says which list item a link
 * is, even when the file names it only by its ends. Other formats: a UsageError (those are
 * edited by hand, as the suggestion lists the links).
 */
export declare function applyToText(text: string, format: DesignFormat, t: Topology, change: Change): string;
