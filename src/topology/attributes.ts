// How the attributes of interchange formats (GraphML, GML, CSV) map onto the design model.
// Names are matched case-insensitively; whatever is not mapped stays in `attrs` for reports.
// The spellings come from the files we read: the Internet Topology Zoo (Knight et al., IEEE
// JSAC 2011) uses Latitude/Longitude, label, type, LinkLabel, LinkSpeed/LinkSpeedUnits/
// LinkSpeedRaw (bit/s); other tools write lat/lon, x/y, weight, length, latency or delay.

import type { SourcePos } from './model.js';
import type { LinkInput, NodeInput, TopologyBuilder } from './builder.js';

const NODE_FIELDS: Readonly<Record<string, 'label' | 'kind' | 'lat' | 'lon' | 'x' | 'y' | 'hardened'>> = {
  label: 'label',
  name: 'label',
  type: 'kind',
  kind: 'kind',
  latitude: 'lat',
  lat: 'lat',
  longitude: 'lon',
  lon: 'lon',
  lng: 'lon',
  long: 'lon',
  x: 'x',
  y: 'y',
  hardened: 'hardened',
};

const LINK_FIELDS: Readonly<Record<string, 'length' | 'latency' | 'capacity' | 'weight' | 'bitrate' | 'riskGroups' | 'hardened'>> = {
  weight: 'weight',
  cost: 'weight',
  length: 'length',
  length_km: 'length',
  distance: 'length',
  linklength: 'length',
  latency: 'latency',
  latency_ms: 'latency',
  delay: 'latency',
  linklatency: 'latency',
  linkdelay: 'latency',
  capacity: 'capacity',
  capacity_gbps: 'capacity',
  bandwidth: 'capacity',
  // The zoo's raw link speed is in bit/s; capacity is kept in Gbit/s.
  linkspeedraw: 'bitrate',
  risk_groups: 'riskGroups',
  srlg: 'riskGroups',
  srlgs: 'riskGroups',
  hardened: 'hardened',
};

/** What the attributes say about a node: every NodeInput field but its id and position. */
export type MappedNode = Omit<NodeInput, 'id' | 'pos' | 'attrs'> & { attrs: Record<string, unknown> };

/** What the attributes say about a link: its measured quantities, risk groups and flag. */
export type MappedLink = Pick<LinkInput, 'length' | 'latency' | 'capacity' | 'weight' | 'riskGroups' | 'hardened'> & {
  attrs: Record<string, unknown>;
};

/** A finite number from a number or numeric string, else undefined. */
export function toNumber(v: unknown): number | undefined {
  if (typeof v === 'number') return Number.isFinite(v) ? v : undefined;
  if (typeof v !== 'string') return undefined;
  const s = v.trim();
  if (s === '' || !/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s)) return undefined;
  // "1e999" is well formed but overflows to Infinity: not a length anyone measured.
  const n = Number(s);
  return Number.isFinite(n) ? n : undefined;
}

export function toFlag(v: unknown): boolean | undefined {
  if (typeof v === 'boolean') return v;
  if (typeof v === 'number') return v !== 0;
  if (typeof v !== 'string') return undefined;
  const s = v.trim().toLowerCase();
  if (['1', 'true', 'yes', 'y'].includes(s)) return true;
  if (['0', 'false', 'no', 'n', ''].includes(s)) return false;
  return undefined;
}

const text = (v: unknown): string => (typeof v === 'string' ? v : String(v));

/**
 * Map one node's raw attributes. `posOf(name)` gives where an attribute is written (for
 * warnings); coordinates out of range are dropped with a warning rather than refused,
 * since interchange files often carry drawing positions in x/y.
 */
export function mapNodeAttributes(
  raw: Readonly<Record<string, unknown>>,
  b: TopologyBuilder,
  posOf: (name: string) => SourcePos,
): MappedNode {
  const out: MappedNode = { attrs: {} };
  let x: [number, string] | undefined;
  let y: [number, string] | undefined;
  let lat: [number, string] | undefined;
  let lon: [number, string] | undefined;
  for (const [name, value] of Object.entries(raw)) {
    const field = NODE_FIELDS[name.toLowerCase()];
    if (field === 'label') out.label = text(value);
    else if (field === 'kind') out.kind = text(value);
    else if (field === 'hardened') {
      const f = toFlag(value);
      if (f === undefined) throw b.error(`"${name}" must be true/false or 1/0, not "${text(value)}"`, posOf(name));
      out.hardened = f;
    } else if (field === 'lat' || field === 'lon' || field === 'x' || field === 'y') {
      const n = toNumber(value);
      if (n === undefined) {
        b.warn(`node coordinate "${name}" is not a number ("${text(value)}"); ignored`, posOf(name));
        out.attrs[name] = value;
        continue;
      }
      if (field === 'lat') lat = [n, name];
      else if (field === 'lon') lon = [n, name];
      else if (field === 'x') x = [n, name];
      else y = [n, name];
      out.attrs[name] = value;
    } else {
      out.attrs[name] = value;
    }
  }
  // x/y are read as longitude/latitude only when the file has no latitude/longitude.
  if (lat === undefined && lon === undefined && x !== undefined && y !== undefined) {
    lat = y;
    lon = x;
  }
  if (lat !== undefined && lon !== undefined) {
    for (const name of [lat[1], lon[1]]) delete out.attrs[name];
    if (Math.abs(lat[0]) <= 90 && Math.abs(lon[0]) <= 180) {
      out.lat = lat[0];
      out.lon = lon[0];
    } else {
      b.warn(`coordinates ${lat[1]}=${lat[0]}, ${lon[1]}=${lon[0]} are not a latitude/longitude; ignored`, posOf(lat[1]));
      out.attrs[lat[1]] = lat[0];
      out.attrs[lon[1]] = lon[0];
    }
  } else if ((lat === undefined) !== (lon === undefined)) {
    const only = (lat ?? lon)!;
    b.warn(`node has "${only[1]}" but not the other coordinate; no site recorded`, posOf(only[1]));
  }
  return out;
}

/** Map one link's raw attributes; numeric fields must be non-negative numbers. */
export function mapLinkAttributes(
  raw: Readonly<Record<string, unknown>>,
  b: TopologyBuilder,
  posOf: (name: string) => SourcePos,
): MappedLink {
  const out: MappedLink = { attrs: {} };
  for (const [name, value] of Object.entries(raw)) {
    const field = LINK_FIELDS[name.toLowerCase()];
    if (field === undefined) {
      out.attrs[name] = value;
      continue;
    }
    if (field === 'riskGroups') {
      out.riskGroups = text(value)
        .split(';')
        .map((s) => s.trim())
        .filter((s) => s !== '');
      continue;
    }
    if (field === 'hardened') {
      const f = toFlag(value);
      if (f === undefined) throw b.error(`"${name}" must be true/false or 1/0, not "${text(value)}"`, posOf(name));
      out.hardened = f;
      continue;
    }
    if (typeof value === 'string' && value.trim() === '') continue; // an empty cell: unknown
    const n = toNumber(value);
    if (field === 'bitrate') {
      // Informational; a malformed speed is kept as written rather than refused.
      if (n !== undefined && n >= 0) out.capacity ??= n / 1e9;
      out.attrs[name] = value;
      continue;
    }
    if (n === undefined) throw b.error(`link ${name} must be a number, not "${text(value)}"`, posOf(name), 'write a plain decimal number');
    if (n < 0) throw b.error(`link ${name} must not be negative (${n})`, posOf(name));
    if (field === 'capacity') out.capacity = n;
    else out[field] = n;
  }
  return out;
}
