// The map and the mend part in the views: the HTML report's figure and table, the
// pull-request summary's Mermaid neighbourhood graph (at most 40 elements, new weak points
// marked, a sentence instead when the change is larger), and the text `netbrace mend` prints.
import { beforeAll, describe, expect, it } from 'vitest';
import type { DesignMap } from '../../src/map/types.js';
import { renderHtml } from '../../src/report/html.js';
import { renderComment, renderSummary } from '../../src/report/markdown.js';
import { renderMendText } from '../../src/report/mend-text.js';
import { MAX_ELEMENTS, mermaidLabel, neighbourhoodMermaid } from '../../src/report/mermaid-map.js';
import type { FileReport, Report } from '../../src/report/report.js';
import { runGate } from '../../src/run-gate.js';
import { memoryDeps, pairRepo } from '../gate/memory-repo.js';

let report: Report;
let file: FileReport;

beforeAll(async () => {
  report = (
    await runGate(
      { base: 'base', head: 'head', policySource: 'base', mode: 'block' },
      memoryDeps(pairRepo('ring-to-chain')),
    )
  ).report;
  file = report.files[0];
});

function mermaidBlock(md: string, after: string): string {
  const at = md.indexOf(after);
  expect(at).toBeGreaterThanOrEqual(0);
  const start = md.indexOf('```mermaid', at);
  return md.slice(start, md.indexOf('```', start + 3) + 3);
}

describe('the HTML report', () => {
  it('shows the map of the design and what would mend it, without scripts', () => {
    const html = renderHtml(report);
    expect(html).toContain('<figure class="map" data-layout="force" data-nodes="6" data-links="6">');
    expect(html).toContain('<svg xmlns="http://www.w3.org/2000/svg" class="nb-map"');
    expect(html).toContain('<h3 id="design-0-mend">What would mend it</h3>');
    expect(html).toMatch(/<tr data-suggestion="1" data-kind="links" data-holds="true">/);
    expect(html).toContain('harbour');
    expect(html).not.toMatch(/<script|\son[a-z]+=/i);
    expect(html).toContain(`content="default-src 'none'; style-src 'unsafe-inline'; img-src data:"`);
    // The map is detail: after the requirement lines; the mend part closes the section.
    expect(html.indexOf('class="map"')).toBeGreaterThan(html.indexOf('class="how-much"'));
    expect(html.indexOf('class="map"')).toBeGreaterThan(html.indexOf('data-part="detail"'));
    expect(html.indexOf('What would mend it')).toBeGreaterThan(html.indexOf('<h3>Structure</h3>'));
  });
});

describe('the Mermaid neighbourhood of the change', () => {
  it('draws the chain with its new bridges and cut sites marked, within the limit', () => {
    const md = renderSummary(report);
    const block = mermaidBlock(md, '**Where the change is**');
    expect(block).toContain('graph LR');
    expect(block.match(/===\|new bridge\|/g)).toHaveLength(5);
    expect(block.match(/-\.-\|removed\|/g)).toHaveLength(1);
    expect(block.match(/\{\{"/g)).toHaveLength(4); // four new cut sites as hexagons
    expect(block).toMatch(/\n {2}class n\d+,n\d+,n\d+,n\d+ weak\n/); // the four new cut sites
    const nodes = block.split('\n').filter((l) => /^ {2}n\d+[({[]/.test(l)).length;
    const links = block.split('\n').filter((l) => /^ {2}n\d+ (---|-\.-|===)/.test(l)).length;
    expect(nodes + links).toBeLessThanOrEqual(MAX_ELEMENTS);
    expect(nodes).toBe(6);
    // The comment stays short: it gives what would mend it and leaves the drawing to the summary.
    const comment = renderComment(report, { key: 'k' });
    expect(comment).not.toContain('**Where the change is**');
    expect(comment).toContain('**What would mend it**');
  });

  it('names the first suggestion and the hardening alternative below the graph', () => {
    const md = renderSummary(report);
    const line = md.split('\n').find((l) => l.startsWith('**What would mend it**'))!;
    expect(line).toBeDefined();
    expect(line).toMatch(
      /add `[^`]+` \(`(harbour–orchard|orchard–harbour)`\): holds, R̄ \d\.\d{3} → \d\.\d{3}; or harden 9 elements/,
    );
    expect(line).toContain('not a route survey');
  });

  it('gives a sentence pointing to the HTML report when the change is too large to draw', () => {
    const n = 30;
    const map: DesignMap = {
      layout: 'force',
      width: 100,
      height: 100,
      method: 'm',
      strandingGroups: [],
      nodes: Array.from({ length: n }, (_, i) => ({ id: `s${i}`, x: i, y: i, line: i + 1, side: 'head' as const })),
      links: Array.from({ length: n - 1 }, (_, i) => ({
        id: `l${i}`,
        source: `s${i}`,
        target: `s${i + 1}`,
        line: 1,
        side: 'head' as const,
      })),
    };
    const text = neighbourhoodMermaid({ path: 'x', status: 'new', findings: [], requirements: [], map });
    expect(text).not.toContain('```mermaid');
    expect(text).toContain(
      'The change touches 30 sites and 29 links: too many to draw legibly here. The HTML report has the map',
    );
    expect(neighbourhoodMermaid({ ...file, map: { omitted: 'too big' } })).toBe('');
  });

  it('lets no id become Mermaid syntax', () => {
    for (const hostile of [
      'a"] --> b["x',
      'x\n%%{init: {}}%%',
      'click n0 "https://evil.example"',
      '<img src=x>',
      'a|b;c{d}',
    ]) {
      const label = mermaidLabel(hostile);
      expect(label).toMatch(/^[\p{L}\p{N} ._-]+$/u);
    }
    expect(mermaidLabel('Kaskeld shore 2')).toBe('Kaskeld shore 2');
    expect(mermaidLabel('\u202Eevil')).toBe('_evil');
  });
});

describe('the text of netbrace mend', () => {
  it('lists the targets, the bound, each suggestion with what it fixes, its length and R̄ before and after, and the caution', () => {
    const text = renderMendText(file);
    expect(text).toContain('What would mend networks/site.net.yaml');
    expect(text).toContain('5 new bridges');
    expect(text).toContain(
      'Bound: at least 1 link to remove the new bridges (their bridge tree has 2 leaves; Eswaran & Tarjan 1976)',
    );
    expect(text).toMatch(/1\. add 1 link — holds; R̄ \d\.\d{3} → \d\.\d{3}/);
    expect(text).toMatch(/fixes (\d+) of \1 targets/);
    expect(text).toContain('in the design file, under links:');
    expect(text).toContain('Caution: Suggestions are topology-level');
  });
});
