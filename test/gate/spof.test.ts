// New single points of failure through the gate: shared-risk groups that strand sites, and
// weak points hidden behind hardened flags, on small invented rings with known answers (a ring
// loses connectivity only when two of its links go, common practice).
import { describe, expect, it } from 'vitest';
import { runGate, type GateRequest } from '../../src/run-gate.js';
import { memoryDeps } from './memory-repo.js';

const FILE = 'networks/ring.net.yaml';
const POLICY = 'requirements:\n  - kind: no-new-spof\n';
const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block' };

/** A four-site ring a–b–c–d; `extra[i]` is appended to link i (a–b, b–c, c–d, d–a). */
function ring(extra: Record<number, string> = {}): string {
  const ends = [
    ['a', 'b'],
    ['b', 'c'],
    ['c', 'd'],
    ['d', 'a'],
  ];
  return (
    [
      'nodes: [{id: a}, {id: b}, {id: c}, {id: d}]',
      'links:',
      ...ends.map(([x, y], i) => `  - {between: [${x}, ${y}]${extra[i] ? `, ${extra[i]}` : ''}}`),
    ].join('\n') + '\n'
  );
}

async function findings(base: string, head: string, policy = POLICY) {
  const { report } = await runGate(
    request,
    memoryDeps({ base: { '.netbrace.yaml': policy, [FILE]: base }, head: { '.netbrace.yaml': policy, [FILE]: head } }),
  );
  return report.files[0].findings.map((x) => `${x.rule}:${x.severity}:${x.elements.map((e) => e.id).join(',')}`);
}

describe('no-new-spof and shared-risk groups', () => {
  it('two opposite links of a ring in one group: a new stranding group', async () => {
    expect(await findings(ring(), ring({ 0: 'risk_groups: [duct]', 2: 'risk_groups: [duct]' }))).toEqual([
      'new-stranding-group:fail:duct',
    ]);
  });

  it('a group of one link, or of links that leave a path around, strands nothing', async () => {
    expect(await findings(ring(), ring({ 0: 'risk_groups: [duct]' }))).toEqual([]);
  });

  it('with risk groups left out of the rule, the group is not judged', async () => {
    const policy = 'requirements:\n  - kind: no-new-spof\n    elements: [bridges, cut-nodes]\n';
    expect(await findings(ring(), ring({ 0: 'risk_groups: [duct]', 2: 'risk_groups: [duct]' }), policy)).toEqual([]);
  });

  it('a group hidden by a newly hardened member is a warning; one hardened at base already is not', async () => {
    const grouped = (hard: boolean) =>
      ring({ 0: `risk_groups: [duct]${hard ? ', hardened: true' : ''}`, 2: 'risk_groups: [duct]' });
    expect(await findings(ring(), grouped(true))).toEqual(['hardened-weak-point:warn:duct']);
    expect(await findings(ring({ 0: 'hardened: true' }), grouped(true))).toEqual([]);
  });

  it('hardened-weak-points: ignore drops the finding; fail makes it fail', async () => {
    const head = ring({ 0: 'risk_groups: [duct], hardened: true', 2: 'risk_groups: [duct]' });
    expect(await findings(ring(), head, `${POLICY}    hardened-weak-points: ignore\n`)).toEqual([]);
    expect(await findings(ring(), head, `${POLICY}    hardened-weak-points: fail\n`)).toEqual([
      'hardened-weak-point:fail:duct',
    ]);
  });
});

describe('what weak points cost, on a large change', () => {
  it('a long ring turned into a chain: the first weak points carry their cost, a notice says the rest do not', async () => {
    const n = 400;
    const ids = Array.from({ length: n }, (_, i) => `s${i}`);
    const design = (closed: boolean) =>
      `nodes:\n${ids.map((id) => `  - {id: ${id}}`).join('\n')}\nlinks:\n${ids
        .slice(0, closed ? n : n - 1)
        .map((id, i) => `  - {between: [${id}, ${ids[(i + 1) % n]}]}`)
        .join('\n')}\n`;
    const policy =
      'challenges:\n  few:\n    remove: nodes\n    until: 0.01\n    points: 2\n    realizations: 2\nrequirements:\n  - kind: no-new-spof\n';
    const { report } = await runGate(
      request,
      memoryDeps({
        base: { '.netbrace.yaml': policy, [FILE]: design(true) },
        head: { '.netbrace.yaml': policy, [FILE]: design(false) },
      }),
    );
    const f = report.files[0];
    const weak = f.findings.filter((x) => x.rule === 'new-bridge' || x.rule === 'new-cut-node');
    // A path of 400 sites: 399 bridges and 398 cut nodes (textbook fact).
    expect(weak.length).toBe(399 + 398);
    expect(weak.filter((x) => x.consequence).length).toBe(500);
    // Losing the first link of the path cuts its first site off.
    expect(weak[0].consequence?.stranded.map((e) => e.id)).toEqual(['s0']);
    expect(f.findings.some((x) => x.rule === 'degraded' && x.message.includes('first 500 of 797'))).toBe(true);
  });
});
