// Conversion between the formats netbrace reads: a parsed Topology, lengths estimated where
// they are missing, written by the target format's writer, with what that format could not
// hold. Pure: the shell (src/shell/commands/convert.ts) reads and writes the files.

import { greatCircleKm } from './geodesy.js';
import type { DesignFormat, Topology } from './model.js';
import { writeCsv } from './write-csv.js';
import { writeGeojson } from './write-geojson.js';
import { writeGml } from './write-gml.js';
import { writeGraphml } from './write-graphml.js';
import { writeNativeJson, writeNativeYaml } from './write-native.js';
import type { Written } from './write-shared.js';

/** The attribute that marks a length computed from the sites' coordinates. */
export const LENGTH_ESTIMATED = 'length_estimated';

export interface ConvertOptions {
  /** Give links without a length the great-circle distance between their sites (default true). */
  estimateLengths?: boolean;
}

export interface Converted extends Written {
  /** Links that were given an estimated length. */
  estimated: number;
  /** Links left without a length because a site has no coordinates. */
  unestimated: number;
  /** Estimated links that had a weight: the weighted metrics use a length before a weight. */
  overWeight: number;
}

/**
 * The design with every link that has no length given the great-circle distance between its
 * sites (rounded to the metre), marked `length_estimated: true`. The great circle is the
 * shortest possible path: a real route is longer, so an estimated length is a lower bound.
 */
export function estimateLengths(t: Topology): {
  topology: Topology;
  estimated: number;
  unestimated: number;
  overWeight: number;
} {
  const at = new Map(t.nodes.map((n) => [n.id, n]));
  let estimated = 0;
  let unestimated = 0;
  let overWeight = 0;
  const links = t.links.map((l) => {
    if (l.length !== undefined) return l;
    const [a, b] = [at.get(l.source)!, at.get(l.target)!];
    if (a.lat === undefined || a.lon === undefined || b.lat === undefined || b.lon === undefined) {
      unestimated++;
      return l;
    }
    estimated++;
    if (l.weight !== undefined) overWeight++;
    const km = Math.round(greatCircleKm(a.lat, a.lon, b.lat, b.lon) * 1000) / 1000;
    return { ...l, length: km, attrs: { ...l.attrs, [LENGTH_ESTIMATED]: true } };
  });
  return { topology: { ...t, links }, estimated, unestimated, overWeight };
}

/** The text of `t` in `format`. */
export function writeDesign(t: Topology, format: DesignFormat): Written {
  switch (format) {
    case 'native-yaml':
      return { text: writeNativeYaml(t, `netbrace design, converted from ${t.file}`), lost: [] };
    case 'native-json':
      return { text: writeNativeJson(t), lost: [] };
    case 'graphml':
      return writeGraphml(t);
    case 'gml':
      return writeGml(t);
    case 'csv':
      return writeCsv(t);
    case 'geojson':
      return writeGeojson(t);
  }
}

/** Convert a parsed design to `format`. Throws DesignError when the format cannot hold it at all. */
export function convertDesign(t: Topology, format: DesignFormat, options: ConvertOptions = {}): Converted {
  const { topology, ...counts } =
    options.estimateLengths === false
      ? { topology: t, estimated: 0, unestimated: 0, overWeight: 0 }
      : estimateLengths(t);
  return { ...writeDesign(topology, format), ...counts };
}
