// Hostile ids through the map and mend views: site and link ids (from the design) and a
// candidate's id and note (from the planner's list) carrying markup, ANSI escapes, workflow
// commands, line breaks and bidirectional overrides, through a real gate run. The text
// `netbrace mend` prints keeps no control or bidi character; the SVG map is well-formed XML
// with no element, attribute or script an id could inject; the Mermaid labels are plain.
import { SaxesParser } from 'saxes';
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { mapHighlights, renderMapSvg } from '../../src/report/map-svg.js';
import { mendHtml, renderMendText } from '../../src/report/mend-text.js';
import { neighbourhoodMermaid } from '../../src/report/mermaid-map.js';
import type { DesignMap } from '../../src/map/types.js';
import { runGate } from '../../src/run-gate.js';
import { memoryDeps } from '../gate/memory-repo.js';
import { reportCount } from './support.js';

const HOSTILE = [
  '<script>alert(1)</script>',
  '\u001b[2J\u001b[31mRED\u001b[0m',
  '::error file=x,line=1::injected',
  'x\n| forged | row |',
  'safe\u202Eevil\u202C',
  '"] --> evil["',
  '</title><g onload="alert(1)">',
];

function repo() {
  const chain = ['end-a', ...HOSTILE, 'end-b'];
  const links = chain.slice(1).map((b, i) => ({ id: `${HOSTILE[i % HOSTILE.length]} l${i}`, between: [chain[i], b] }));
  const design = (ring: boolean) =>
    stringify({
      nodes: chain.map((id) => ({ id, label: HOSTILE[0] })),
      links: ring ? [...links, { between: ['end-b', 'end-a'] }] : links,
    });
  const policy = 'designs:\n  - paths: ["**/*.net.yaml"]\nmend:\n  candidates: plan.yaml\n';
  const plan = stringify({
    candidates: [
      { between: ['end-a', 'end-b'], cost: 5, id: HOSTILE[2], note: HOSTILE[1] },
      { between: [HOSTILE[0], 'end-b'], cost: 9, id: HOSTILE[6] },
    ],
  });
  return {
    base: { '.netbrace.yaml': policy, 'd.net.yaml': design(true) },
    head: { '.netbrace.yaml': policy, 'd.net.yaml': design(false), 'plan.yaml': plan },
  };
}

describe('hostile ids through the map and the mend views', () => {
  it('text, SVG and Mermaid stay inert', async () => {
    const { report } = await runGate(
      { base: 'base', head: 'head', policySource: 'base', mode: 'block' },
      memoryDeps(repo()),
    );
    const f = report.files[0];
    const m = f.mend!;
    expect(m.suggestions[0].links[0].id).toBe(HOSTILE[2]);
    expect(m.suggestions[0].holds).toBe(true);

    const text = renderMendText(f);
    expect(text).not.toMatch(/[\u0000-\u0008\u000B-\u001F\u007F\u202A-\u202E]/);
    expect(text.split('\n').some((l) => /^\s*::/.test(l))).toBe(false);
    expect(text.split('\n').some((l) => /^\| forged/.test(l))).toBe(false);
    expect(text).toContain('RED');

    const html = mendHtml(f, 'd');
    expect(html).not.toMatch(/<script|<g onload|[\u202A-\u202E]/);

    const map = f.map as DesignMap;
    const svg = renderMapSvg(map, mapHighlights(f));
    const names: string[] = [];
    const attrs: string[] = [];
    const parser = new SaxesParser();
    parser.on('opentag', (t) => {
      names.push(t.name);
      attrs.push(...Object.keys(t.attributes));
    });
    parser.write(svg).close();
    expect(new Set(names)).toEqual(new Set(['svg', 'title', 'desc', 'g', 'rect', 'path', 'circle', 'text']));
    expect(attrs.filter((a) => /^on/i.test(a) || /href/i.test(a))).toEqual([]);
    expect(svg).not.toMatch(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u202A-\u202E]/);

    const mermaid = neighbourhoodMermaid(f);
    const labels = [...mermaid.matchAll(/n\d+(?:\(\(|\{\{|\(\[|\[\/|\()"([^"]*)"/g)].map((x) => x[1]);
    expect(labels.length).toBeGreaterThan(5);
    for (const l of labels) expect(l).toMatch(/^[\p{L}\p{N} ._-]+$/u);
    expect(mermaid).not.toMatch(/click|%%\{|<script|javascript:/i);
    reportCount('hostile', 'ids through the map and mend views', HOSTILE.length);
  });
});
