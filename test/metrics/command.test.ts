import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import type { CommandIO } from '../../src/shell/io.js';

const root = path.resolve(__dirname, '..', '..');

async function run(args: string[]) {
  let out = '';
  let err = '';
  const io: CommandIO = {
    stdout: (t) => (out += t),
    stderr: (t) => (err += t),
    cwd: root,
    env: {},
    stdoutIsTTY: false,
    stderrIsTTY: false,
  };
  const code = await main(args, io);
  return { code, out, err };
}

describe('netbrace metrics', () => {
  it('--json prints exactly {nodes, links, metrics: {id: {value, normalized}}} for every applicable metric', async () => {
    const r = await run(['metrics', 'fixtures/designs/ring.net.yaml', '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(Object.keys(j)).toEqual(['nodes', 'links', 'metrics']);
    expect(j.nodes).toBe(4);
    expect(j.links).toBe(5);
    // The ring has lengths on every link and one demand: all fifteen metrics apply.
    expect(Object.keys(j.metrics)).toHaveLength(15);
    for (const v of Object.values(j.metrics) as { value: number; normalized: number }[]) {
      expect(Object.keys(v)).toEqual(['value', 'normalized']);
      expect(v.normalized).toBeGreaterThanOrEqual(0);
      expect(v.normalized).toBeLessThanOrEqual(1);
    }
    // A 4-cycle plus a parallel link; by hops it is C4: each node sees two nodes at 1 hop and
    // one at 2, so E = (1 + 1 + 1/2)/3 = 5/6 (docs/METHODS.md §9.2, C_N even form).
    expect(j.metrics.efficiency.value).toBeCloseTo(5 / 6, 12);
    expect(j.metrics.bridges.value).toBe(0);
    expect(j.metrics.demand_served.normalized).toBe(1);
  });

  it('--only restricts the set, keeps the order given, and says on stderr what does not apply', async () => {
    const r = await run([
      'metrics',
      'fixtures/designs/ring.csv',
      '--json',
      '--only',
      'diameter,efficiency,demand_served',
    ]);
    expect(r.code).toBe(0);
    expect(Object.keys(JSON.parse(r.out).metrics)).toEqual(['diameter', 'efficiency']);
    expect(r.err).toMatch(/demand_served does not apply/);
  });

  it('prints a table with the caution note by default', async () => {
    const r = await run(['metrics', 'fixtures/designs/ring.gml']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/algebraic_connectivity\s+2\s+0\.5000/);
    expect(r.out).toMatch(/engineering\s+judgement/);
  });

  it('rejects an unknown metric id and a missing file with the right exit codes', async () => {
    const bad = await run(['metrics', 'fixtures/designs/ring.csv', '--only', 'robustness']);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/unknown metric "robustness"/);
    const none = await run(['metrics', 'fixtures/designs/nope.csv']);
    expect(none.code).toBe(1);
    expect((await run(['metrics'])).code).toBe(2);
  });
});
