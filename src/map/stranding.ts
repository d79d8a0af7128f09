// Shared-risk groups whose loss strands sites: all links of the group fail at once (as the
// risk-group challenges remove them; hardened links stay), and the sites this cuts off from
// the largest part are counted against the intact design. A duct whose loss splits the
// network is the shared-risk counterpart of a bridge; the map draws it. O(G·(N + L)).

import type { CompactGraph } from '../graph/compact.js';
import { createMask } from '../graph/mask.js';
import { findComponents } from '../graph/structure.js';
import { removeUnit, unitCount } from '../challenges/units.js';

/** Sites outside the largest part. */
function offMain(g: CompactGraph, mask = createMask(g)): number {
  const c = findComponents(g, mask);
  return c.largest < 0 ? 0 : g.n - c.sizes[c.largest];
}

/** Group id → sites its loss cuts off (only groups that cut any off). */
export function strandingGroups(g: CompactGraph): Map<string, number> {
  const out = new Map<string, number>();
  const intact = offMain(g);
  const mask = createMask(g);
  for (let u = 0; u < unitCount(g, 'group'); u++) {
    mask.link.fill(0);
    removeUnit(g, mask, 'group', u);
    const strands = offMain(g, mask) - intact;
    if (strands > 0) out.set(g.groupIds[u], strands);
  }
  return out;
}
