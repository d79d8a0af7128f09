// How the attributes of interchange formats (GraphML, GML, CSV) map onto the design model.
// Names are matched case-insensitively; whatever is not mapped stays in `attrs` for reports.
// The spellings come from the files we read: the Internet Topology Zoo (Knight et al., IEEE
// JSAC 2011) uses Latitude/Longitude, label, type, LinkLabel, LinkSpeed/LinkSpeedUnits/
// LinkSpeedRaw (bit/s); other tools write lat/lon, x/y, weight, length, latency or delay.

import type { SourcePos } from './model.js';
import { nonNormal, quantityProblem } from './quantities.js';
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

const LINK_FIELDS: Readonly<
  Record<string, 'length' | 'latency' | 'capacity' | 'weight' | 'bitrate' | 'riskGroups' | 'hardened'>
> = {
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

/** Whether an attribute name is one the node mapping reads (not only keeps in attrs). */
export function isNodeField(name: string): boolean {
  return Object.hasOwn(NODE_FIELDS, name.toLowerCase());
}

/** Whether an attribute name is one the link mapping reads. */
export function isLinkField(name: string): boolean {
  return Object.hasOwn(LINK_FIELDS, name.toLowerCase());
}

/** What the attributes say about a node: every NodeInput field but its id and position. */
export type MappedNode = Omit<NodeInput, 'id' | 'pos' | 'attrs'> & { attrs: Record<string, unknown> };

/** What the attributes say about a link: its measured quantities, risk groups and flag. */
export type MappedLink = Pick<LinkInput, 'length' | 'latency' | 'capacity' | 'weight' | 'riskGroups' | 'hardened'> & {
  attrs: Record<string, unknown>;
};

const NUMERAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * The number a value is written as: a number, or a string that is a plain decimal numeral
 * (however large or small: "1e999" is Infinity, which quantities.ts then refuses), else undefined.
 */
export function numeral(v: unknown): number | undefined {
  if (typeof v === 'number') return v;
  if (typeof v !== 'string') return undefined;
  const s = v.trim();
  return s !== '' && NUMERAL.test(s) ? Number(s) : undefined;
}

/** A finite number from a number or numeric string, else undefined. */
export function toNumber(v: unknown): number | undefined {
  const n = numeral(v);
  // "1e999" is well formed but overflows to Infinity: not a length anyone measured.
  return n !== undefined && Number.isFinite(n) ? n : undefined;
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
 * Where an attribute is written and how: `pos` for messages, `text` the value as written when
 * the reader has it (GML keeps `007` apart from `7`; a typed GraphML value its source text), so
 * labels and risk group ids stay strings as written.
 */
export interface AttributeSource {
  pos: (name: string) => SourcePos;
  text?: (name: string) => string | undefined;
}

function sourceOf(where: AttributeSource | ((name: string) => SourcePos)): Required<AttributeSource> {
  if (typeof where === 'function') return { pos: where, text: () => undefined };
  return { pos: where.pos, text: where.text ?? (() => undefined) };
}

/**
 * Map one node's raw attributes. `where` gives where (and how) an attribute is written;
 * coordinates out of range are dropped with a warning rather than refused, since interchange
 * files often carry drawing positions in x/y, but a coordinate no computation can use (NaN,
 * infinite, subnormal) is refused. A `label` names the node; `name` does when there is no label.
 */
export function mapNodeAttributes(
  raw: Readonly<Record<string, unknown>>,
  b: TopologyBuilder,
  where: AttributeSource | ((name: string) => SourcePos),
): MappedNode {
  const src = sourceOf(where);
  const posOf = src.pos;
  const written = (name: string, value: unknown) => src.text(name) ?? text(value);
  const out: MappedNode = { attrs: {} };
  // A `label` attribute names the node even when a `name` is there too (kept in attrs then).
  const hasLabel = Object.keys(raw).some((k) => k.toLowerCase() === 'label');
  let x: [number, string] | undefined;
  let y: [number, string] | undefined;
  let lat: [number, string] | undefined;
  let lon: [number, string] | undefined;
  for (const [name, value] of Object.entries(raw)) {
    const field = NODE_FIELDS[name.toLowerCase()];
    if (field === 'label') {
      if (hasLabel && name.toLowerCase() !== 'label') out.attrs[name] = value;
      else out.label = written(name, value);
    } else if (field === 'kind') out.kind = written(name, value);
    else if (field === 'hardened') {
      const f = toFlag(value);
      if (f === undefined) throw b.error(`"${name}" must be true/false or 1/0, not "${text(value)}"`, posOf(name));
      out.hardened = f;
    } else if (field === 'lat' || field === 'lon' || field === 'x' || field === 'y') {
      const n = numeral(value);
      const bad = n === undefined ? undefined : nonNormal(n);
      if (bad)
        throw b.error(
          `node coordinate "${name}" ${bad} ("${written(name, value)}")`,
          posOf(name),
          'write a plain decimal number of degrees',
        );
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
      b.warn(
        `coordinates ${lat[1]}=${lat[0]}, ${lon[1]}=${lon[0]} are not a latitude/longitude; ignored`,
        posOf(lat[1]),
      );
      out.attrs[lat[1]] = lat[0];
      out.attrs[lon[1]] = lon[0];
    }
  } else if ((lat === undefined) !== (lon === undefined)) {
    const only = (lat ?? lon)!;
    b.warn(`node has "${only[1]}" but not the other coordinate; no site recorded`, posOf(only[1]));
  }
  return out;
}

/** Map one link's raw attributes; numeric fields must be numbers in their range (quantities.ts). */
export function mapLinkAttributes(
  raw: Readonly<Record<string, unknown>>,
  b: TopologyBuilder,
  where: AttributeSource | ((name: string) => SourcePos),
): MappedLink {
  const src = sourceOf(where);
  const posOf = src.pos;
  const out: MappedLink = { attrs: {} };
  for (const [name, value] of Object.entries(raw)) {
    const field = LINK_FIELDS[name.toLowerCase()];
    if (field === undefined) {
      out.attrs[name] = value;
      continue;
    }
    if (field === 'riskGroups') {
      out.riskGroups = (src.text(name) ?? text(value))
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
    const n = numeral(value);
    const as = src.text(name) ?? text(value);
    if (field === 'bitrate') {
      // Informational; a malformed or out-of-range speed is kept as written rather than refused.
      const gbps = n === undefined ? undefined : n / 1e9;
      if (gbps !== undefined && quantityProblem('capacity', gbps) === undefined) out.capacity ??= gbps;
      else
        b.warn(
          `link ${name} "${as}" is not a speed in bit/s that netbrace accepts; not read as the capacity`,
          posOf(name),
        );
      out.attrs[name] = value;
      continue;
    }
    if (n === undefined)
      throw b.error(`link ${name} must be a number, not "${as}"`, posOf(name), 'write a plain decimal number');
    const problem = quantityProblem(field, n, as);
    if (problem) throw b.error(`link ${name} ${problem.message}`, posOf(name), problem.hint);
    if (field === 'capacity') out.capacity = n;
    else out[field] = n;
  }
  return out;
}
