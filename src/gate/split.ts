// One large design split across the parts of a run (`part: k/n`): each part runs the band
// realizations of the batch it owns (batch b < n of BATCH realizations belongs to part b + 1)
// and ships their R values exactly (little-endian float64, base64) in its report's `split`.
// The join rebuilds the design's evaluation from the union of those samples and runs the same
// code a single run does (the stopping rule of docs/METHODS.md §7.6 included), so it stops at
// the batch a single run stops at and writes the same bytes. A realization's values depend on
// its index alone (engine.ts cuts band tasks at every multiple of BATCH), never on the part.
// A long degree attack's pieces (engine.ts attackPieces) are shared out the same way (piece i to
// part i mod n + 1), so the join does not run the attacks alone.

import { UsageError } from '../errors.js';
import { BATCH } from '../envelope/engine.js';
import type { Report, SplitDesign } from '../report/report.js';

/**
 * The part (1-based) that runs the realizations from `from` on (a task never crosses a batch):
 * batch b < n belongs to part b + 1; later batches to none. Parts cannot stop early (none sees
 * the others' samples), so they run the first n batches side by side, and a join whose decisions
 * are still open after them runs the next batches itself, by the same rule as one run.
 */
export function batchOwner(from: number, total: number): number | undefined {
  const batch = Math.floor(from / BATCH);
  return batch < total ? batch + 1 : undefined;
}

/** The part (1-based) that runs piece `index` of a long attack (engine.ts attackPieces). */
export function pieceOwner(index: number, total: number): number {
  return (index % total) + 1;
}

export function encodeValues(values: readonly Float64Array[]): string {
  const points = values.length ? values[0].length : 0;
  const bytes = new Uint8Array(values.length * points * 8);
  const view = new DataView(bytes.buffer);
  values.forEach((row, r) => row.forEach((v, j) => view.setFloat64((r * points + j) * 8, v, true)));
  let text = '';
  for (let i = 0; i < bytes.length; i += 0x8000) text += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return btoa(text);
}

export function decodeValues(text: string, rows: number, points: number, name: string): Float64Array[] {
  let binary: string;
  try {
    binary = atob(text);
  } catch {
    throw new UsageError(`${name} holds samples that are not base64`, 'pass the part reports as netbrace wrote them');
  }
  if (binary.length !== rows * points * 8)
    throw new UsageError(
      `${name} holds ${binary.length / 8} sample values where ${rows * points} belong`,
      'pass the part reports as netbrace wrote them',
    );
  const view = new DataView(Uint8Array.from(binary, (c) => c.charCodeAt(0)).buffer);
  return Array.from({ length: rows }, (_, r) =>
    Float64Array.from({ length: points }, (_, j) => view.getFloat64((r * points + j) * 8, true)),
  );
}

export function sampleKey(path: string, side: 'head' | 'base', challenge: string, from: number, to: number): string {
  return `${path}\u0000${side}\u0000${challenge}\u0000${from}\u0000${to}`;
}

/** What a join is given: the files the parts judged whole, and the samples of the split designs. */
export interface JoinInput {
  total: number;
  files: Map<string, Report['files'][number]>;
  split: Set<string>;
  samples: Map<string, { values: string; points: number; part: number }>;
  reports: readonly Report[];
}

/** The part reports as a join input; a missing or repeated part is a UsageError naming it. */
export function joinInput(reports: readonly Report[]): JoinInput {
  if (reports.length === 0)
    throw new UsageError('there are no part reports to join', 'pass the JSON report of every part');
  const totals = new Set<number>();
  const seen = new Map<number, number>();
  reports.forEach((r, i) => {
    if (!r.part)
      throw new UsageError(
        `report ${i + 1} is not a part report (it has no part k/n)`,
        'join only the reports of "netbrace check --part K/N"',
      );
    totals.add(r.part.total);
    if (seen.has(r.part.index))
      throw new UsageError(
        `part ${r.part.index}/${r.part.total} is given twice (reports ${seen.get(r.part.index)! + 1} and ${i + 1})`,
        'pass each part once',
      );
    seen.set(r.part.index, i);
  });
  if (totals.size > 1)
    throw new UsageError(
      `the part reports are of different splits (${[...totals].sort((a, b) => a - b).join(', ')} parts)`,
      'join the parts of one run',
    );
  const total = [...totals][0];
  const missing = Array.from({ length: total }, (_, k) => k + 1).filter((k) => !seen.has(k));
  if (missing.length) {
    throw new UsageError(
      `part ${missing.map((k) => `${k}/${total}`).join(', ')} ${missing.length === 1 ? 'is' : 'are'} missing`,
      'pass the report of every part: each judges designs no other part judges',
    );
  }
  const files = new Map<string, Report['files'][number]>();
  const split = new Set<string>();
  const samples = new Map<string, { values: string; points: number; part: number }>();
  for (const r of reports) {
    for (const f of r.files) if (!files.has(f.path)) files.set(f.path, f);
    for (const d of r.split ?? []) {
      split.add(d.path);
      for (const s of d.samples)
        samples.set(sampleKey(d.path, s.side, s.challenge, s.from, s.to), {
          values: s.values,
          points: s.points,
          part: r.part!.index,
        });
    }
  }
  return { total, files, split, samples, reports };
}

/** Realization ranges as people count them (1-based, inclusive): "1–32, 65–96". */
export function rangesText(d: Pick<SplitDesign, 'samples'>): string {
  const spans = [
    ...new Set(d.samples.filter((s) => s.side === 'head' && s.piece === undefined).map((s) => `${s.from}:${s.to}`)),
  ]
    .map((s) => s.split(':').map(Number) as [number, number])
    .sort((a, b) => a[0] - b[0]);
  const merged: [number, number][] = [];
  for (const [a, b] of spans) {
    const last = merged[merged.length - 1];
    if (last && last[1] === a) last[1] = b;
    else merged.push([a, b]);
  }
  return merged.map(([a, b]) => `${a + 1}\u2013${b}`).join(', ');
}
