import type { SourcePos } from './model.js';
import type { LinkInput, NodeInput, TopologyBuilder } from './builder.js';
/** Whether an attribute name is one the node mapping reads (not only keeps in attrs). */
export declare function isNodeField(name: string): boolean;
/** Whether an attribute name is one the link mapping reads. */
export declare function isLinkField(name: string): boolean;
/** What the attributes say about a node: every NodeInput field but its id and position. */
export type MappedNode = Omit<NodeInput, 'id' | 'pos' | 'attrs'> & {
    attrs: Record<string, unknown>;
};
/** What the attributes say about a link: its measured quantities, risk groups and flag. */
export type MappedLink = Pick<LinkInput, 'length' | 'latency' | 'capacity' | 'weight' | 'riskGroups' | 'hardened'> & {
    attrs: Record<string, unknown>;
};
/**
 * The number a value is written as: a number, or a string that is a plain decimal numeral
 * (however large or small: "1e999" is Infinity, which quantities.ts then refuses), else undefined.
 */
export declare function numeral(v: unknown): number | undefined;
/** A finite number from a number or numeric string, else undefined. */
export declare function toNumber(v: unknown): number | undefined;
export declare function toFlag(v: unknown): boolean | undefined;
/**
 * Where an attribute is written and how: `pos` for messages, `text` the value as written when
 * the reader has it (GML keeps `007` apart from `7`; a typed GraphML value its source text), so
 * labels and risk group ids stay strings as written.
 */
export interface AttributeSource {
    pos: (name: string) => SourcePos;
    text?: (name: string) => string | undefined;
}
/**
 * Map one node's raw attributes. `where` gives where (and how) an attribute is written;
 * coordinates out of range are dropped with a warning rather than refused, since interchange
 * files often carry drawing positions in x/y, but a coordinate no computation can use (NaN,
 * infinite, subnormal) is refused. A `label` names the node; `name` does when there is no label.
 */
export declare function mapNodeAttributes(raw: Readonly<Record<string, unknown>>, b: TopologyBuilder, where: AttributeSource | ((name: string) => SourcePos)): MappedNode;
/** Map one link's raw attributes; numeric fields must be numbers in their range (quantities.ts). */
export declare function mapLinkAttributes(raw: Readonly<Record<string, unknown>>, b: TopologyBuilder, where: AttributeSource | ((name: string) => SourcePos)): MappedLink;
