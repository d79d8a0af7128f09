// What the writers of every format share: which link ids a reader derives by itself (so they
// need not be written), the kind of an attribute value, and the record of what a format could
// not hold, said once per kind with a count rather than once per element.

import type { Topology } from './model.js';

/** What a writer produced: the file's text and what the format could not hold. */
export interface Written {
  text: string;
  /** One sentence per kind of loss, e.g. `47 demands`; empty when nothing was lost. */
  lost: string[];
  /** What else a reader of the file should know (e.g. lines drawn straight). */
  notes?: string[];
}

/** Counts losses by description, in the order they were first met. */
export class Losses {
  private readonly counts = new Map<string, { n: number; unit: string }>();

  /** `what` is counted `n` times; `unit` names one of what is counted (for the sentence). */
  add(what: string, unit = '', n = 1): void {
    if (n <= 0) return;
    const c = this.counts.get(what);
    if (c) c.n += n;
    else this.counts.set(what, { n, unit });
  }

  list(): string[] {
    return [...this.counts].map(([what, { n, unit }]) => (unit ? `${what} (${n} ${unit}${n === 1 ? '' : 's'})` : what));
  }
}

/** The design-level things only our own format holds, as losses for a format without them. */
export function designLosses(
  t: Topology,
  losses: Losses,
  has: { demands?: boolean; groups?: boolean; budget?: boolean; metadata?: boolean; name?: boolean } = {},
): void {
  if (!has.demands && t.demands.length > 0) losses.add('demands', 'demand', t.demands.length);
  if (!has.groups) {
    const described = t.riskGroups.filter((g) => g.description !== undefined).length;
    losses.add('risk group descriptions', 'group', described);
  }
  if (!has.budget && t.latencyBudget !== undefined) losses.add(`the latency budget (${t.latencyBudget})`);
  if (!has.metadata && Object.keys(t.metadata).length > 0)
    losses.add('the design\u2019s metadata', 'key', Object.keys(t.metadata).length);
  if (!has.name && t.name !== undefined) losses.add(`the network\u2019s name ("${t.name}")`);
  if (!has.name && t.description !== undefined) losses.add('the network\u2019s description');
}

/**
 * For each link, whether its id is the one a reader derives when the file gives none (the two
 * ends, `#k` for the k-th parallel link): such ids need not be written.
 */
export function derivedIds(t: Topology): boolean[] {
  const seen = new Map<string, number>();
  return t.links.map((l) => {
    const pair = l.source <= l.target ? `${l.source}\u0000${l.target}` : `${l.target}\u0000${l.source}`;
    const k = (seen.get(pair) ?? 0) + 1;
    seen.set(pair, k);
    const base = `${l.source}\u2014${l.target}`;
    return l.id === (k > 1 ? `${base}#${k}` : base);
  });
}

export type ValueKind = 'boolean' | 'integer' | 'number' | 'string' | 'other';

export function valueKind(v: unknown): ValueKind {
  if (typeof v === 'boolean') return 'boolean';
  if (typeof v === 'number') return Number.isSafeInteger(v) ? 'integer' : 'number';
  if (typeof v === 'string') return 'string';
  return 'other';
}

/** An attribute's columns or keys in order of first appearance, with the kinds of its values. */
export function attributeColumns(rows: readonly Readonly<Record<string, unknown>>[]): Map<string, Set<ValueKind>> {
  const columns = new Map<string, Set<ValueKind>>();
  for (const r of rows) {
    for (const [k, v] of Object.entries(r)) {
      const kinds = columns.get(k) ?? new Set<ValueKind>();
      kinds.add(valueKind(v));
      columns.set(k, kinds);
    }
  }
  return columns;
}

/** A number as text that every reader of ours reads back to the same double. */
export function numberText(n: number): string {
  return Object.is(n, -0) ? '0' : String(n);
}
