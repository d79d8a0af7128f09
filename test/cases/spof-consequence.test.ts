// What the single-point-of-failure cases put into the report beyond their verdicts: what each
// weak point and each sequence costs, labels and lines on every element, renames and hardened
// flags in the change list; and that the views say it. The expected costs are worked out by
// hand from the fixture designs (each says why next to it).
import { Ajv } from 'ajv';
import { afterAll, describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { renderSummary } from '../../src/report/markdown.js';
import type { FileReport, Report } from '../../src/report/report.js';
import schema from '../../src/report/report.schema.json' with { type: 'json' };
import { cleanupCases, runCase } from './harness.js';

afterAll(cleanupCases);

const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

function fileOf(report: Report | null): FileReport {
  expect(report).not.toBeNull();
  expect(validate(report), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
  return report!.files[0];
}

describe('single points of failure: costs, labels, renames, hardening', () => {
  it('a duct that strands half a ring: which sites, which demands, and every sequence located', async () => {
    const run = await runCase('spof-shared-duct');
    const f = fileOf(run.report);
    const duct = f.findings.find((x) => x.rule === 'new-stranding-group')!;
    expect(duct.elements).toEqual([{ id: 'towpath', kind: 'group', line: 31 }]);
    // Losing harbour–mill and ridge–weir splits the six-site ring 3 | 3; the tie goes to the
    // part holding the first site of the file (harbour), so mill, quarry and ridge are cut
    // off, and of the three demands only harbour→quarry (volume 10) crosses the cut.
    expect(duct.consequence).toEqual({
      stranded: [
        { id: 'mill', kind: 'node', line: 7, label: 'Old Mill' },
        { id: 'quarry', kind: 'node', line: 9, label: 'Quarry Hill' },
        { id: 'ridge', kind: 'node', line: 11, label: 'Ridgeway' },
      ],
      strandedCount: 3,
      demandsLost: 1,
      demandsTotal: 3,
      volumeLost: 10,
      volumeTotal: 17,
    });
    // Every element of every sequence carries its line, and every sequence what it costs.
    const sequences = f.head!.envelopes.flatMap((e) => [...e.weakest, ...(e.worstCase ? [e.worstCase] : [])]);
    expect(sequences.length).toBeGreaterThan(3);
    for (const s of sequences) {
      expect(s.located?.map((e) => e.id)).toEqual(s.elements);
      expect(s.located!.every((e) => e.line > 0)).toBe(true);
      expect(s.consequence).toBeDefined();
    }
    // The exact worst pair of link losses is the duct's two links: the same cost as the duct.
    const worst = f.head!.envelopes.find((e) => e.challenge === 'random-links')!.worstCase!;
    expect([...worst.elements].sort()).toEqual(['harbour\u2014mill', 'ridge\u2014weir']);
    expect(worst.consequence).toEqual(duct.consequence);
    expect(f.changes?.added).toEqual([{ id: 'towpath', kind: 'group', line: 31 }]);
    // Every view says it in one sentence.
    const told =
      'cuts off Old Mill (mill, line 7), Quarry Hill (quarry, line 9) and Ridgeway (ridge, line 11) from the largest part; 1 of 3 demands (volume 10 of 17) loses every path.';
    expect(run.out.replace(/\s+/g, ' ').replace(/\u00a0/g, ' ')).toContain(`losing it ${told}`);
    const md = renderSummary(run.report!);
    // The summary words it from the consequence: labels as text, ids in code spans.
    expect(md).toContain(
      'losing it cuts off Old Mill (`mill`, line 7), Quarry Hill (`quarry`, line 9) and Ridgeway (`ridge`, line 11) from the largest part; 1 of 3 demands (volume 10 of 17) loses every path.',
    );
    expect(md).toContain('These removals cut off Old Mill (`mill`, line 7)');
    expect(renderHtml(run.report!)).toContain('losing it cuts off Old Mill (<code>mill</code>, line 7)');
  });

  it('a renamed cut node is listed as a rename, with its label, and nothing is added or removed', async () => {
    const run = await runCase('spof-renamed-cut-node');
    const f = fileOf(run.report);
    expect(f.changes).toEqual({
      added: [],
      removed: [],
      renamed: [
        {
          from: { id: 'weir', kind: 'node', line: 9, label: 'Weir Lane' },
          to: { id: 'weir-lane', kind: 'node', line: 9, label: 'Weir Lane' },
        },
      ],
    });
    // Bridges and cut nodes in rows of their own: 4 weak points on each side, none new.
    const spof = f.requirements.filter((r) => r.id.startsWith('no-new-spof/'));
    expect(spof.map((r) => r.id)).toEqual(['no-new-spof/bridges', 'no-new-spof/cut-nodes', 'no-new-spof/risk-groups']);
    expect(spof.reduce((n, r) => n + (r.base ?? 0), 0)).toBe(4);
    for (const r of spof) expect(r).toMatchObject({ delta: 0, status: 'holds' });
    expect(spof.map((r) => r.base)).toEqual(spof.map((r) => r.head));
  });

  it('a hardened chain: the flags are a change, each hidden weak point is named with its cost', async () => {
    const run = await runCase('spof-hardened-chain');
    const f = fileOf(run.report);
    const hardened = f.changes?.hardened ?? [];
    expect(hardened.map((e) => e.id)).toEqual([
      'harbour',
      'mill',
      'quarry',
      'ridge',
      'weir',
      'orchard',
      'harbour\u2014mill',
      'mill\u2014quarry',
      'quarry\u2014ridge',
      'ridge\u2014weir',
      'weir\u2014orchard',
    ]);
    expect(hardened.every((e) => e.hardened)).toBe(true);
    const hidden = f.findings.filter((x) => x.rule === 'hardened-weak-point');
    // A path of six sites: five links are bridges and the four inner sites cut nodes (textbook fact).
    expect(hidden.map((x) => x.elements[0].id)).toEqual([
      'harbour\u2014mill',
      'mill\u2014quarry',
      'quarry\u2014ridge',
      'ridge\u2014weir',
      'weir\u2014orchard',
      'mill',
      'quarry',
      'ridge',
      'weir',
    ]);
    expect(hidden.every((x) => x.severity === 'warn')).toBe(true);
    // Losing the middle link quarry–ridge leaves 3 | 3: ridge, weir and orchard are cut off.
    // Listed in id order (the graph's numbering), whatever order the file lists them in.
    expect(hidden[2].consequence?.stranded.map((e) => e.id)).toEqual(['orchard', 'ridge', 'weir']);
    expect(f.requirements.find((r) => r.id === 'no-new-spof/bridges')?.status).toBe('unsettled');
    expect(f.requirements.find((r) => r.id === 'no-new-spof/cut-nodes')?.status).toBe('unsettled');
  });

  it('labels from GraphML name every site a finding strands', async () => {
    const run = await runCase('spof-graphml-labels');
    const f = fileOf(run.report);
    const cut = f.findings.find((x) => x.rule === 'new-cut-node' && x.elements[0].id === '1')!;
    expect(cut.elements[0]).toEqual({ id: '1', kind: 'node', line: 7, label: 'Fennick Bay' });
    // The chain 0–1–2–3–4: losing site 1 cuts site 0 (Saltmere) off.
    expect(cut.consequence?.stranded).toEqual([{ id: '0', kind: 'node', line: 6, label: 'Saltmere' }]);
    expect(cut.consequence?.demandsLost).toBeUndefined();
  });
});
