import type { SourcePos } from './model.js';
import type { LinkInput, NodeInput, TopologyBuilder } from './builder.js';
/** What the attributes say about a node: every NodeInput field but its id and position. */
export type MappedNode = Omit<NodeInput, 'id' | 'pos' | 'attrs'> & {
    attrs: Record<string, unknown>;
};
/** What the attributes say about a link: its measured quantities, risk groups and flag. */
export type MappedLink = Pick<LinkInput, 'length' | 'latency' | 'capacity' | 'weight' | 'riskGroups' | 'hardened'> & {
    attrs: Record<string, unknown>;
};
/** A finite number from a number or numeric string, else undefined. */
export declare function toNumber(v: unknown): number | undefined;
export declare function toFlag(v: unknown): boolean | undefined;
/**
 * Map one node's raw attributes. `posOf(name)` gives where an attribute is written (for
 * warnings); coordinates out of range are dropped with a warning rather than refused,
 * since interchange files often carry drawing positions in x/y.
 */
export declare function mapNodeAttributes(raw: Readonly<Record<string, unknown>>, b: TopologyBuilder, posOf: (name: string) => SourcePos): MappedNode;
/** Map one link's raw attributes; numeric fields must be non-negative numbers. */
export declare function mapLinkAttributes(raw: Readonly<Record<string, unknown>>, b: TopologyBuilder, posOf: (name: string) => SourcePos): MappedLink;
