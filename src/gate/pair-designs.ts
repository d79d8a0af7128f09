// Designs that a change deletes and adds again under another file: one design, moved. A
// design that changes format (ring.net.yaml → ring.graphml) is never similar enough in text
// for git's rename detection, and judged as a removal plus an addition it would pass whatever
// the new file lost. After git's own renames, a deleted and an added design are paired
//   1. by the network's name (our format's network.name, GraphML's graph name / label / id,
//      GML's label or name), when exactly one deleted and one added design carry it;
//   2. else by the file's base name without its extension, in the same directory, when
//      exactly one deleted and one added design share it.
// Anything ambiguous (two deletions with one name, say) stays unpaired: guessing which of
// two designs a new file replaces would judge it against the wrong base. Pure.

export interface UnpairedDesign {
  path: string;
  /** The network's name, when the file could be read and names one. */
  name?: string;
}

export interface DesignPair {
  /** The deleted file (the base side). */
  previousPath: string;
  /** The added file (the head side). */
  path: string;
  by: 'network name' | 'base name';
}

/** Extensions of design files, longest first, so that ring.net.yaml has the stem "ring". */
const EXTENSIONS = ['.net.yaml', '.net.yml', '.net.json', '.graphml', '.yaml', '.yml', '.json', '.gml', '.csv'];

/** A path without its design extension (or its last extension): "networks/ring". */
export function designStem(path: string): string {
  const lower = path.toLowerCase();
  const ext = EXTENSIONS.find((e) => lower.endsWith(e));
  if (ext) return path.slice(0, -ext.length);
  const slash = path.lastIndexOf('/');
  const dot = path.lastIndexOf('.');
  return dot > slash + 1 ? path.slice(0, dot) : path;
}

/** Pairs by the key; only keys that exactly one deleted and one added design share. */
function pairBy(
  deleted: UnpairedDesign[],
  added: UnpairedDesign[],
  key: (d: UnpairedDesign) => string | undefined,
  by: DesignPair['by'],
  out: DesignPair[],
): void {
  const group = (list: UnpairedDesign[]) => {
    const m = new Map<string, UnpairedDesign[]>();
    for (const d of list) {
      const k = key(d);
      if (k === undefined || k === '') continue;
      m.set(k, [...(m.get(k) ?? []), d]);
    }
    return m;
  };
  const gone = group(deleted);
  const fresh = group(added);
  for (const [k, before] of gone) {
    const after = fresh.get(k);
    if (before.length === 1 && after?.length === 1) out.push({ previousPath: before[0].path, path: after[0].path, by });
  }
}

/** The deleted and added designs that are one design moved (see the file comment), in path order. */
export function pairDesigns(deleted: readonly UnpairedDesign[], added: readonly UnpairedDesign[]): DesignPair[] {
  const pairs: DesignPair[] = [];
  pairBy([...deleted], [...added], (d) => d.name?.trim(), 'network name', pairs);
  const used = new Set(pairs.flatMap((p) => [p.previousPath, p.path]));
  pairBy(
    deleted.filter((d) => !used.has(d.path)),
    added.filter((d) => !used.has(d.path)),
    (d) => designStem(d.path),
    'base name',
    pairs,
  );
  return pairs.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
}
