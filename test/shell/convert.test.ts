import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { parseDesign } from '../../src/topology/parse.js';
import { repoRoot } from '../topology/helpers.js';
import { recordIO } from './helpers-io.js';

const dir = mkdtempSync(path.join(tmpdir(), 'netbrace-convert-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function run(...argv: string[]) {
  const io = recordIO(dir);
  const code = await main(['convert', ...argv], io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

const ring = path.join(repoRoot, 'fixtures', 'designs', 'ring.net.yaml');
const abilene = path.join(repoRoot, 'fixtures', 'topology-zoo', 'gml', 'Abilene.gml');

describe('netbrace convert', () => {
  it('writes to standard output, and says on stderr what the format could not hold', async () => {
    const { code, out, err } = await run(ring, '--to', 'gml');
    expect(code).toBe(0);
    const t = parseDesign(out, 'ring.gml');
    expect(t.nodes.map((n) => [n.id, n.label, n.lat])).toEqual([
      ['north', undefined, 47.1],
      ['east', undefined, 47],
      ['south', undefined, 46.85],
      ['west', 'West exchange', 47],
    ]);
    expect(err).toBe(
      'not kept by GML: demands (1 demand); risk group descriptions (1 group); the latency budget (1.5)\n',
    );
  });

  it('--out writes the file (the format from its extension), estimates missing lengths and says so', async () => {
    const { code, out, err } = await run(abilene, '--out', 'abilene.net.yaml');
    expect([code, err]).toEqual([0, '']);
    expect(out).toBe(
      'wrote abilene.net.yaml (netbrace design (YAML)): 11 nodes, 14 links\n' +
        "14 link lengths estimated from the sites' coordinates (great-circle distance, a lower bound of the route; marked length_estimated: true)\n",
    );
    const t = parseDesign(readFileSync(path.join(dir, 'abilene.net.yaml'), 'utf8'), 'abilene.net.yaml');
    expect(t.links.every((l) => l.length! > 0 && l.attrs.length_estimated === true)).toBe(true);
    // New York (40.71427 N, 74.00597 W) to Chicago (41.85003 N, 87.65005 W), the zoo's first link:
    // about 1,145 km by great circle (the published city-to-city distance is about 1,145 km, from memory).
    expect(t.links[0].length).toBeCloseTo(1145.8, 0);
  });

  it('never overwrites a file without --force', async () => {
    writeFileSync(path.join(dir, 'kept.graphml'), 'mine');
    const refused = await run(ring, '--out', 'kept.graphml');
    expect(refused.code).toBe(2);
    expect(refused.err).toBe(
      'kept.graphml exists already; convert never overwrites a file — give another --out FILE, or add --force\n',
    );
    expect(readFileSync(path.join(dir, 'kept.graphml'), 'utf8')).toBe('mine');
    expect((await run(ring, '--out', 'kept.graphml', '--force')).code).toBe(0);
    expect(parseDesign(readFileSync(path.join(dir, 'kept.graphml'), 'utf8'), 'kept.graphml').links).toHaveLength(5);
  });

  it('refuses GeoJSON for a design without coordinates, at the first node without them', async () => {
    writeFileSync(path.join(dir, 'plain.csv'), 'source,target\na,b\nb,c\n');
    const { code, out, err } = await run('plain.csv', '--to', 'geojson');
    expect([code, out]).toEqual([1, '']);
    expect(err).toBe(
      'plain.csv:2:1: cannot write GeoJSON: 3 of 3 nodes have no coordinates ("a", "b", "c") — GeoJSON places every site on the map: give each node a site (lat, lon; Latitude/Longitude in GraphML and GML), or convert to another format\n',
    );
  });

  it('usage errors: no --to, an extension of another format, a design that cannot be read', async () => {
    expect(await run(ring)).toMatchObject({
      code: 2,
      err: 'convert needs --to FORMAT — give --to (yaml, json, graphml, gml, csv, geojson)\n',
    });
    expect(await run(ring, '--to', 'gml', '--out', 'x.graphml')).toMatchObject({
      code: 2,
      err: '--out x.graphml would be read as GraphML, not GML — give the file the extension of its format (.net.yaml, .net.json, .graphml, .gml, .csv, .geojson)\n',
    });
    expect(await run(ring, '--to', 'dot')).toMatchObject({ code: 2 });
    const missing = await run('nope.gml', '--to', 'yaml');
    expect(missing.code).toBe(1);
    expect(missing.err).toBe(
      'nope.gml:1:1: no such file — check the path (it is read relative to the working directory)\n',
    );
  });

  it('--no-estimate leaves missing lengths missing', async () => {
    const { code, out, err } = await run(abilene, '--to', 'json', '--no-estimate');
    expect([code, err]).toEqual([0, '']);
    expect(parseDesign(out, 'a.net.json').links.every((l) => l.length === undefined)).toBe(true);
  });
});
