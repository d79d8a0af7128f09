import { describe, expect, it } from 'vitest';
import {
  COMMENT_BUDGET_CHARS,
  SUMMARY_BUDGET_BYTES,
  commentDigest,
  commentMarker,
  renderComment,
  renderSummary,
  reportDigest,
  sampleIndices,
  sparkline,
} from '../../src/report/markdown.js';
import { emptyReport, hugeReport, sampleReport } from './sample-report.js';

const bytes = (s: string) => Buffer.byteLength(s, 'utf8');

/** The text with inline code spans (any fence length) removed. */
function withoutCodeSpans(md: string): string {
  return md.replace(/(`+)(?!`)[\s\S]*?[^`]\1(?!`)/g, '');
}

function mermaidBlocks(md: string): string[] {
  return [...md.matchAll(/```mermaid\n([\s\S]*?)```/g)].map((m) => m[1]);
}

describe('job summary', () => {
  it('states the verdict and lists designs worst first', () => {
    const md = renderSummary(sampleReport());
    expect(md.split('\n')[0]).toBe('## \u274C netbrace: the gate failed');
    const headings = [...md.matchAll(/^### .*?`([^`]+)`/gm)].map((m) => m[1]);
    expect(headings).toEqual([
      'backbone/core.net.yaml',
      'edge/west.net.yaml',
      'metro/north.graphml',
      'legacy/ring-old.net.yaml',
      'dc/fabric.gml',
    ]);
    // Within a design, failures before notices.
    const core = md.slice(md.indexOf('### \u274C `backbone/core.net.yaml`'), md.indexOf('### \u274C `edge/west.net.yaml`'));
    expect(core.indexOf('**new bridge** (line 42)')).toBeLessThan(core.indexOf('**weakest sequence**'));
  });

  it('has a requirement table with base, head, delta \u00b1 error and status', () => {
    const md = renderSummary(sampleReport());
    expect(md).toContain('| requirement | base | head | \u0394 \u00b1 error | status |');
    expect(md).toMatch(/\| 0\.742 \| 0\.680 \| \u22120\.062 \u00b1 0\.004 \| \u274C weakened \|/);
    expect(md).toContain('inside the error');
    expect(md).toContain('never a failure');
  });

  it('draws head against base as a Mermaid xychart with a sparkline table', () => {
    const md = renderSummary(sampleReport());
    const charts = mermaidBlocks(md);
    expect(charts.length).toBe(3);
    expect(charts[0]).toMatch(/^xychart-beta\n/);
    expect(charts[0].match(/^ {2}line \[/gm)?.length).toBe(4);
    expect(md).toContain('| head median | \u2588\u2588\u2587\u2587\u2586\u2586\u2585\u2585\u2584\u2584\u2583 |');
    expect(md).toContain('`kaskeld` (line 12) \u2192 `ostmark` (line 15) \u2192 `brenna` (line 9)');
  });

  it('caps chart points and keeps Mermaid sources small', () => {
    const r = sampleReport();
    const env = r.files[1].head!.envelopes[0];
    const n = 401;
    env.x = Array.from({ length: n }, (_, i) => i / (n - 1));
    env.median = env.x.map((x) => 1 - x);
    env.quantiles['0.1'].value = env.x.map((x) => 0.9 - x);
    env.quantiles['0.9'].value = env.x.map((x) => 1 - x / 2);
    const md = renderSummary(r, { chartPoints: 21 });
    const chart = mermaidBlocks(md)[0];
    for (const line of chart.split('\n').filter((l) => l.trim().startsWith('line ['))) {
      expect(line.split(',').length).toBeLessThanOrEqual(21);
    }
    expect(chart.length).toBeLessThan(50_000);
    expect(chart).toContain('"1"'); // the last grid point is kept
  });

  it('says so when no design changed', () => {
    const md = renderSummary(emptyReport());
    expect(md).toContain('no design file changed');
    expect(md).toContain('nothing to judge');
  });

  it('inform mode says it would fail without blocking', () => {
    const r = sampleReport();
    r.mode = 'inform';
    expect(renderSummary(r).split('\n')[0]).toContain('would fail (inform mode, not blocking)');
  });

  it('reports a changed policy as proposed and carries the caution', () => {
    const r = sampleReport();
    r.policy.changed = true;
    const md = renderSummary(r);
    expect(md).toContain('This change modifies the policy file');
    expect(md).toContain('informs engineering judgement');
  });

  it('shows the gate\u2019s note on the policy, the scope and joined parts', () => {
    const r = sampleReport();
    r.policy.changed = true;
    r.policy.note = 'this change modifies the policy; the version at the base judges it (it applies once merged)';
    r.scope = 'all';
    r.parts = { total: 3, joined: [1, 2, 3] };
    const md = renderSummary(r);
    expect(md).toContain('This change modifies the policy file. this change modifies the policy; the version at the base judges it \\(it applies once merged\\).');
    expect(md).toContain('every design, thresholds only');
    expect(md).toContain('joined parts 1, 2, 3 of 3');
  });

  it('stays within ~900 KiB on a huge report and says what was cut', () => {
    const r = hugeReport(600, 60);
    const md = renderSummary(r);
    expect(bytes(md)).toBeLessThanOrEqual(SUMMARY_BUDGET_BYTES);
    expect(md).toMatch(/\d+ more designs \(the least severe\) did not fit/);
    expect(md.trimEnd().endsWith('</sub>')).toBe(true);
  });

  it('honours a small budget exactly', () => {
    const md = renderSummary(hugeReport(50, 30), { budget: 20_000 });
    expect(bytes(md)).toBeLessThanOrEqual(20_000);
    expect(md).toContain('did not fit');
  });
});

describe('PR comment', () => {
  it('starts with the hidden marker of its key and records a digest', () => {
    const md = renderComment(sampleReport(), { key: 'backbone' });
    expect(md.startsWith(`${commentMarker('backbone')}\n`)).toBe(true);
    expect(commentMarker('backbone')).toBe('<!-- netbrace:comment key=backbone -->');
    expect(commentDigest(md)).toBe(reportDigest(sampleReport()));
  });

  it('a hostile key cannot close the marker early', () => {
    const marker = commentMarker('x --><script>alert(1)</script><!-- netbrace:comment key=other');
    expect(marker.match(/-->/g)?.length).toBe(1);
    expect(marker.endsWith(' -->')).toBe(true);
    expect(marker).not.toContain('key=other');
  });

  it('the digest ignores commit ids but follows the findings', () => {
    const a = sampleReport();
    const b = sampleReport();
    b.head = '0'.repeat(40);
    expect(reportDigest(b)).toBe(reportDigest(a));
    b.files[1].findings[0].message += ' (changed)';
    expect(reportDigest(b)).not.toBe(reportDigest(a));
  });

  it('stays under 65,536 characters with the worst findings first', () => {
    const r = hugeReport(300, 40);
    const md = renderComment(r, { key: 'k' });
    expect(md.length).toBeLessThanOrEqual(COMMENT_BUDGET_CHARS);
    expect(md.length).toBeLessThan(65_536);
    const firstFinding = /^- (\S+) \*\*/m.exec(md.slice(md.indexOf('**Findings**')));
    expect(firstFinding?.[1]).toBe('\u274C');
    expect(md).toContain('did not fit');
    expect(md).toContain('more in the JSON report and the SARIF file');
  });

  it('renders hostile ids and paths literally', () => {
    const r = sampleReport();
    const f = r.files[1];
    f.path = 'evil/<img src=x onerror=alert(1)>|`x`.net.yaml';
    f.findings[0].message = 'link @org/admins [x](javascript:alert(1)) <details open> **bold** \n## heading';
    f.findings[2].elements[0].id = '</details><script>alert(1)</script>';
    f.head!.envelopes[0].weakest[0].elements[0] = '</details><script>alert(1)</script>';
    const all = renderSummary(r) + renderComment(r, { key: 'k' });
    // Inside code spans text is shown verbatim and never interpreted; everywhere else no
    // hostile markup may survive.
    expect(all).toContain('`</details><script>alert(1)</script>`');
    const md = withoutCodeSpans(all);
    expect(md).not.toMatch(/<img|<script|<details open/);
    expect(md).not.toContain('](javascript');
    expect(md).not.toContain('@org');
    expect(md).not.toMatch(/^## heading/m);
    // Only our own <details> blocks, balanced.
    expect(md.match(/<details>/g)?.length).toBe(md.match(/<\/details>/g)?.length);
  });
});

describe('chart helpers', () => {
  it('sparkline uses a fixed 0..1 scale', () => {
    expect(sparkline([0, 0.5, 1])).toBe('\u2581\u2585\u2588');
  });
  it('sampleIndices keeps the ends and caps the count', () => {
    const idx = sampleIndices(401, 21);
    expect(idx.length).toBe(21);
    expect(idx[0]).toBe(0);
    expect(idx[20]).toBe(400);
    expect(sampleIndices(5, 21)).toEqual([0, 1, 2, 3, 4]);
  });
});
