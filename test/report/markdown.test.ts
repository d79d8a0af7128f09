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
import { CAUTION } from '../../src/report/report.js';
import { emptyReport, hugeReport, sampleReport } from './sample-report.js';

const bytes = (s: string) => Buffer.byteLength(s, 'utf8');

/** The text with inline code spans (any fence length) removed. */
function withoutCodeSpans(md: string): string {
  return md.replace(/(`+)(?!`)[\s\S]*?[^`]\1(?!`)/g, '');
}

function textBlocks(md: string): string[] {
  return [...md.matchAll(/```text\n([\s\S]*?)```/g)].map((m) => m[1]);
}

describe('job summary', () => {
  it('states the verdict first, then per design what weakened before how much, worst designs first', () => {
    const md = renderSummary(sampleReport());
    expect(md.split('\n')[0]).toBe(
      '## \u25A0 netbrace blocks this merge: 1 design weakened, 1 design could not be read',
    );
    // The caution as one line right under the verdict, and in full at the very end.
    expect(md.split('\n')[2]).toContain('does not replace engineering studies');
    expect(md.trimEnd().endsWith(CAUTION)).toBe(true);
    const headings = [...md.matchAll(/^### .*?`([^`]+)`/gm)].map((m) => m[1]);
    expect(headings).toEqual([
      'backbone/core.net.yaml',
      'edge/west.net.yaml',
      'metro/north.graphml',
      'legacy/ring-old.net.yaml',
      'dc/fabric.gml',
    ]);
    // Within a design: consequences, then numbers, then the folded detail.
    const core = md.slice(
      md.indexOf('### \u25A0 weakened \u00b7 `backbone/core.net.yaml`'),
      md.indexOf('`edge/west.net.yaml`'),
    );
    const order = [
      '**What weakened**',
      'Link `l-kas-ost` (line 42) is a new bridge',
      '**How much**',
      '<details>',
      'weakest removal sequence',
    ].map((t) => core.indexOf(t));
    expect(order.every((i) => i >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  it('gives each requirement one line: status, what, base \u2192 head (\u0394 \u00b1 error), floor', () => {
    const md = renderSummary(sampleReport());
    expect(md).toContain(
      '- \u25A0 weakened \u00b7 area of the random site failure envelope may drop by at most 0.020 0.742 \u2192 0.680 (\u22120.062 \u00b1 0.004), floor 0.722\n',
    );
    expect(md).toContain(
      '- \u25CC inside-error \u00b7 median R at 30 % sites removed \u2265 0.60 0.556 \u2192 0.548 (\u22120.008 \u00b1 0.006), floor 0.6\n',
    );
    expect(md).toContain(
      'inside-error: the value dropped by less than its Monte Carlo error, which is never a failure.',
    );
    // No requirement table and no per-design table of worst findings.
    expect(md).not.toMatch(/\| requirement \|/);
    expect(md).not.toMatch(/worst finding/);
  });

  it('defines R, area, spread and \u00b1 in one line each, linked to the README when its address is known', () => {
    const md = renderSummary(sampleReport(), { readmeUrl: 'https://example.org/netbrace/README.md' });
    expect(md).toContain(
      '\u00b7 R: the weighted mean of `efficiency` 1, each metric scaled to 0\u20131 with 1 the intact design. [more](https://example.org/netbrace/README.md#reading-the-report)',
    );
    expect(renderSummary(sampleReport())).toContain('The README\u2019s \u201cReading the report\u201d says more.');
  });

  it('draws head against base as text rows, each line named where it is drawn', () => {
    const md = renderSummary(sampleReport());
    const charts = textBlocks(md);
    expect(charts.length).toBe(3);
    const rows = charts[0].trimEnd().split('\n');
    expect(rows.map((r) => r.split(/\s{2,}/)[0])).toEqual([
      'head 90 % quantile',
      'head median',
      'base median',
      'head 10 % quantile',
    ]);
    expect(md).toContain(
      'head median         \u2588\u2588\u2587\u2587\u2586\u2586\u2585\u2585\u2584\u2584\u2583  1.000 \u2192 0.325',
    );
    expect(md).not.toContain('drawing order');
    expect(md).toContain('site `kaskeld` (line 12) \u2192 site `ostmark` (line 15) \u2192 site `brenna` (line 9)');
  });

  it('caps chart points and keeps the last grid point', () => {
    const r = sampleReport();
    const env = r.files[1].head!.envelopes[0];
    const n = 401;
    env.x = Array.from({ length: n }, (_, i) => i / (n - 1));
    env.median = env.x.map((x) => 1 - x);
    env.quantiles['0.1'].value = env.x.map((x) => 0.9 - x);
    env.quantiles['0.9'].value = env.x.map((x) => 1 - x / 2);
    const md = renderSummary(r, { chartPoints: 21 });
    const chart = textBlocks(md)[0];
    for (const row of chart.trimEnd().split('\n')) expect(row.split(/\s{2,}/)[1].length).toBeLessThanOrEqual(21);
    expect(md).toContain('0 to 100 % sites removed');
    expect(chart).toContain('head median         \u2588');
    expect(chart).toMatch(/head median .*1\.000 \u2192 0\.000/);
  });

  it('says so when no design changed', () => {
    const md = renderSummary(emptyReport());
    expect(md.split('\n')[0]).toBe('## \u25A1 netbrace: no design file changed, nothing to judge');
    expect(md).toContain('nothing to judge');
  });

  it('inform mode says what weakened without saying the merge is blocked', () => {
    const r = sampleReport();
    r.mode = 'inform';
    const first = renderSummary(r).split('\n')[0];
    expect(first).toContain('inform mode, so the merge is not blocked');
    expect(first).not.toContain('blocks this merge');
  });

  it('reports a changed policy in one sentence and carries the caution', () => {
    const r = sampleReport();
    r.policy.changed = true;
    const md = renderSummary(r);
    expect(md).toContain(
      '\u25B2 This change edits the policy; the base\u2019s version judges this change, and the head\u2019s applies once merged.\n',
    );
    expect(md).toContain('informs engineering judgement');
  });

  it('shows the gate\u2019s note on the policy, the scope and joined parts', () => {
    const r = sampleReport();
    r.policy.changed = true;
    r.policy.note = 'this change modifies the policy; the version at the base judges it (it applies once merged)';
    r.scope = 'all';
    r.parts = { total: 3, joined: [1, 2, 3] };
    const md = renderSummary(r);
    expect(md).toContain(
      'Policy: this change modifies the policy; the version at the base judges it (it applies once merged).',
    );
    expect(md).toContain('every design, thresholds only');
    expect(md).toContain('joined parts 1, 2, 3 of 3');
  });

  it('stays within ~900 KiB on a huge report and says what was cut', () => {
    const r = hugeReport(600, 60);
    const md = renderSummary(r);
    expect(bytes(md)).toBeLessThanOrEqual(SUMMARY_BUDGET_BYTES);
    expect(md).toMatch(/\d+ more designs \(the least severe\) did not fit/);
    expect(md.trimEnd().endsWith(CAUTION)).toBe(true);
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
    const firstItem = /^- (\S+) (\w+):/m.exec(md.slice(md.indexOf('**What weakened**')));
    expect(firstItem?.slice(1)).toEqual(['\u25A0', 'fails']);
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

describe('our own look and words', () => {
  const TRAFFIC_LIGHTS = /[\u2705\u274C\u26A0\u2139\u2754\u2796\u3030\u{1F534}\u{1F7E2}\u{1F7E1}]/u;

  it('uses our marks beside words, never traffic-light emoji, and no version footer', () => {
    for (const md of [renderSummary(sampleReport()), renderComment(sampleReport(), { key: 'k' })]) {
      expect(md).not.toMatch(TRAFFIC_LIGHTS);
      expect(md).not.toContain('<sub>');
      expect(md).not.toMatch(/the gate/);
      // Every mark at the start of a list item is followed by a word.
      for (const m of md.matchAll(/^- ([\u25A0\u25B2\u25A1\u25CC\u00B7]) (\S+)/gm)) expect(m[2]).toMatch(/^[a-z]/);
    }
  });

  it('puts ids in code spans: no backslash escapes or &quot; in the raw text of a sentence about them', () => {
    const r = sampleReport();
    r.files[1].findings[0].elements[0] = { id: 'l_kas*ost"1', kind: 'link', line: 42, label: 'Kaskeld "east" span' };
    const md = renderComment(r, { key: 'k' });
    const line = md.split('\n').find((l) => l.includes('is a new bridge'))!;
    expect(line).toBe(
      '- \u25A0 fails: Kaskeld "east" span (`l_kas*ost"1`, line 42) is a new bridge; losing it splits the design.',
    );
    expect(md).not.toContain('&quot;');
  });

  it('keeps a hostile label with backticks in a code span of its own, never touching the id\u2019s', () => {
    const r = sampleReport();
    r.files[1].findings[0].elements[0] = { id: '`x`', kind: 'link', line: 42, label: '``` `y' };
    const line = renderSummary(r)
      .split('\n')
      .find((l) => l.includes('is a new bridge'))!;
    expect(line).toBe(
      '- \u25A0 fails: ```` ``` `y ```` (`` `x` ``, line 42) is a new bridge; losing it splits the design.',
    );
  });

  it('a passing design with notices shows as passing', () => {
    const r = sampleReport();
    const fabric = r.files[0];
    fabric.findings = [
      {
        rule: 'degraded',
        severity: 'notice',
        message: 'head evaluation reduced: realizations reduced from 400 to 200',
        elements: [],
        line: 0,
      },
    ];
    r.files = [fabric];
    r.verdict = 'pass';
    const md = renderSummary(r);
    expect(md.split('\n')[0]).toBe('## \u25A1 netbrace: no design weakened');
    expect(md).toContain('### \u25A1 holds \u00b7 `dc/fabric.gml`');
    expect(md).toContain('**What weakened**: nothing; every requirement holds.');
    // The notice is kept, folded.
    expect(md.indexOf('- \u00b7 head evaluation reduced')).toBeGreaterThan(md.indexOf('<details>'));
  });

  it('a part\u2019s summary does not say the merge is blocked and leaves the detail to the joined summary', () => {
    const r = sampleReport();
    r.part = { index: 1, total: 2 };
    const md = renderSummary(r);
    expect(md.split('\n')[0]).toBe(
      '## \u25B2 netbrace, part 1 of 2: 1 design weakened, 1 design could not be read in this part; the joined report decides the merge',
    );
    expect(md).not.toContain('blocks this merge');
    expect(md).toContain(
      '- \u25A0 weakened \u00b7 `backbone/core.net.yaml`: 1 new bridge; 2 requirements weakened or short',
    );
    expect(md).toContain('the joined summary tells what weakened and how much');
    expect(md).not.toContain('**How much**');
    // The joined report tells it once, in full.
    const joined = sampleReport();
    joined.parts = { total: 2, joined: [1, 2] };
    expect(renderSummary(joined).split('**How much**').length - 1).toBe(3);
  });

  it('says in one sentence which floors and rules the head\u2019s policy would loosen or tighten', () => {
    const r = sampleReport();
    r.policy.changed = true;
    r.policy.changes = [
      {
        subject: 'threshold:random-nodes@0.2:q0.1',
        key: 'min',
        effect: 'loosens',
        base: 0.5,
        head: 0.45,
        file: 'netbrace.policy.yaml',
        line: 9,
      },
      {
        subject: 'weakening',
        key: 'allowed-drop',
        effect: 'tightens',
        base: 0.02,
        head: 0.01,
        file: 'netbrace.policy.yaml',
        line: 14,
      },
    ];
    const md = renderSummary(r);
    expect(md).toContain(
      '\u25B2 This change edits the policy: the head\u2019s version would loosen the floor of `threshold:random-nodes@0.2:q0.1` from 0.5 to 0.45, and tighten the allowed drop from 0.02 to 0.01; the base\u2019s version judges this change, and the head\u2019s applies once merged.\n',
    );
  });
});
