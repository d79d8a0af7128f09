// Which elements are currently removed. One mask per evaluation thread; challenges flip
// bits, metrics read them, nothing ever copies the graph.

import type { CompactGraph } from './compact.js';

export interface Mask {
  /** 1 = node removed (its links are then dead too). */
  readonly node: Uint8Array;
  /** 1 = link removed. */
  readonly link: Uint8Array;
}

export function createMask(g: CompactGraph): Mask {
  return { node: new Uint8Array(g.n), link: new Uint8Array(g.m) };
}

export function copyMask(from: Mask, to: Mask): void {
  to.node.set(from.node);
  to.link.set(from.link);
}

/** A link carries traffic iff it and both of its ends are present. */
export function isLinkAlive(g: CompactGraph, mask: Mask, e: number): boolean {
  return mask.link[e] === 0 && mask.node[g.linkSource[e]] === 0 && mask.node[g.linkTarget[e]] === 0;
}
