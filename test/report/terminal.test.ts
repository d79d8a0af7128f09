import { describe, expect, it } from 'vitest';
import { renderTerminal } from '../../src/report/terminal.js';
import { CAUTION } from '../../src/report/report.js';
import { CAUTION_LINE, designStories, plainSentence } from '../../src/report/story.js';
import { demoReport } from './demo-report.fixture.js';

const ANSI = /\u001b\[[0-9;]*m/;
// Element names keep their line with no-break spaces; compare with plain spaces.
const plain = (width = 100) => renderTerminal(demoReport(), { color: false, width }).replace(/\u00a0/g, ' ');

describe('renderTerminal', () => {
  it('opens with the verdict sentence and the caution in one line, and ends with the full caution', () => {
    const lines = plain().split('\n');
    expect(lines[0]).toBe('\u25A0 netbrace blocks this merge: 1 design weakened, 1 design could not be read');
    expect(
      lines
        .slice(1, 3)
        .map((l) => l.trim())
        .join(' '),
    ).toBe(CAUTION_LINE);
    expect(plain()).not.toMatch(/\bgate\b|Verdict: |PASS|FAIL/);
  });

  it('tells each design worst first, in the order: what weakened, how much, detail', () => {
    const text = plain(140);
    const order = designStories(demoReport()).map((d) => d.file.path);
    const starts = order.map((p) => text.indexOf(` ${p} \u2014 `));
    expect(starts.every((x) => x > 0)).toBe(true);
    expect([...starts].sort((a, b) => a - b)).toEqual(starts);
    expect(text).toContain(
      '\u25A0 designs/lunmere-backbone.net.yaml \u2014 weakened \u00b7 1 new bridge, 1 new cut node; 3 requirements weakened or short',
    );
    expect(text).toContain(
      '\u25A1 designs/metro/<west> & "ring".net.yaml \u2014 new design \u00b7 every requirement holds',
    );
    expect(text).toContain('\u25A0 designs/lab.graphml \u2014 could not be read');
    expect(text).toContain('\u25A0 could not be read: designs/lab.graphml:41:5: link e7 refers to node n99');
    const first = text.slice(starts[0], starts[1]);
    const at = (s: string) => first.indexOf(s);
    expect(at('  What weakened')).toBeGreaterThan(0);
    expect(at('  How much')).toBeGreaterThan(at('  What weakened'));
    expect(at('  Detail')).toBeGreaterThan(at('  How much'));
    expect(at('R under random site failures')).toBeGreaterThan(at('  Detail'));
  });

  it('says what weakened in sentences, worst first, each element with its line', () => {
    const text = plain(160);
    const story = designStories(demoReport())[0];
    const part = text.slice(text.indexOf('  What weakened'), text.indexOf('  How much'));
    let last = -1;
    for (const x of story.weakened) {
      const at = part.indexOf(plainSentence(x.sentence));
      expect(at).toBeGreaterThan(last);
      last = at;
    }
    expect(part).toContain(
      '\u25A0 new cut node (line 31): Site kaskeld (line 31) is a new cut node; losing it splits the design.',
    );
  });

  it('gives each requirement one line: status, what, base \u2192 head (\u0394 \u00b1 error), floor', () => {
    const text = plain(140);
    const lines = text.split('\n');
    expect(lines).toContain(
      '    \u25A0 short \u00b7 10 % quantile of R at 20 % sites removed \u2265 0.45 0.498 \u2192 0.421 (\u22120.077 \u00b1 0.006), floor 0.45',
    );
    // deterministic values carry no error term; counts are whole numbers
    expect(lines).toContain(
      '    \u25A1 holds \u00b7 no single site loss leaves R below 0.60 0.702 \u2192 0.655 (\u22120.047), floor 0.6',
    );
    expect(lines).toContain('    \u25A0 short \u00b7 no new bridges or cut nodes 1 \u2192 3 (+2), tracked (no floor)');
    // and the words those lines use, defined once under them
    const numbers = text.slice(text.indexOf('  How much'), text.indexOf('  Detail'));
    expect(numbers).toContain('R: the weighted mean of efficiency 0.4, largest_component 0.3, demand_served 0.3');
    expect(numbers).toContain('\u00b1: one standard error of the change');
    expect(numbers).toContain('(README: "Reading the report")');
  });

  it('names the weakest sequences by element and line in the detail', () => {
    const text = plain(160);
    const detail = text.slice(text.indexOf('  Detail')).replace(/\s+/g, ' ');
    expect(detail).toContain(
      'Worst case found under random site failures (exact search, 3 sites): kaskeld (line 31) \u2192 lunmere (line 12) \u2192 tessaway (line 19) \u00b7 R 0.655 \u2192 0.561 \u2192 0.468',
    );
    expect(text.indexOf('weakest removal sequences:')).toBeGreaterThan(text.indexOf('  How much'));
  });

  it('draws a chart with band, median, attacks, worst case and base median, and a legend', () => {
    const lines = plain().split('\n');
    const top = lines.findIndex((l) => l.includes('R under random site failures'));
    const grid = lines.slice(top + 1, top + 11).join('\n');
    for (const ch of ['\u2591', '\u25cf', '1', '2', '\u00d7', '\u00b7']) expect(grid).toContain(ch);
    expect(lines[top + 1]).toMatch(/^\s+1\.0 \u2022/);
    expect(lines[top + 10]).toMatch(/^\s+0\.0 \u2022/);
    const legend = lines.slice(top + 13, top + 16).join(' ');
    expect(legend).toContain('\u2591 10\u201390 % band');
    expect(legend).toContain('1 degree attack');
    expect(legend).toContain('2 adaptive betweenness attack');
    expect(legend).toContain('\u00d7 worst case found (exact, 3 sites)');
    expect(legend).toContain('\u00b7 base median');
  });

  it('puts the median where the data says: top row band for R in [0.8, 0.9)', () => {
    const lines = plain().split('\n');
    const top = lines.findIndex((l) => l.includes('R under random site failures'));
    // head median at x = 0 is 0.794, which lies in the row for [0.7, 0.8): the third grid row.
    const third = lines[top + 3];
    const firstCell = third.slice(third.indexOf('\u254e') + 1, third.indexOf('\u254e') + 2);
    expect(firstCell).toBe('\u25cf');
  });

  it('says what the change added and removed, with lines', () => {
    expect(plain(160)).toContain(
      'changed: \u22122 links (kaskeld-fenwhistle, base line 214; ibberlin-tarnquist, base line 205)',
    );
  });

  it('ends with the caution', () => {
    const lines = plain(100).trimEnd().split('\n');
    const start = lines.findIndex((l) => l.startsWith('Caution: '));
    expect(lines.slice(start).join(' ')).toBe(`Caution: ${CAUTION}`);
  });

  it('uses colour only when asked', () => {
    expect(plain()).not.toMatch(ANSI);
    const coloured = renderTerminal(demoReport(), { color: true, width: 100 });
    expect(coloured).toMatch(ANSI);
    expect(coloured.replace(/\u001b\[[0-9;]*m/g, '').replace(/\u00a0/g, ' ')).toBe(plain());
  });

  it('keeps lines within the width', () => {
    for (const width of [80, 100, 120]) {
      const long = plain(width)
        .split('\n')
        .filter((l) => l.length > width);
      expect(long).toEqual([]);
    }
  });

  it('says when the built-in policy applied, and when there was nothing to judge', () => {
    const r = demoReport();
    r.policy = { source: 'builtin' };
    r.files = [];
    r.verdict = 'pass';
    r.counts = { holds: 0, weakened: 0, 'below-floor': 0, new: 0, removed: 0, renamed: 0, unreadable: 0 };
    const text = renderTerminal(r, { color: false, width: 100 });
    expect(text).toContain('the built-in defaults for communication backbones were applied');
    expect(text).toContain('No design files changed: nothing to judge.');
    expect(text.split('\n')[0]).toBe('\u25A1 netbrace: no design file changed, nothing to judge');
  });

  it('strips control characters from report text, so a crafted id cannot drive the terminal', () => {
    const r = demoReport();
    r.files[0].path = 'designs/\u001b[2J\u001b[31mevil\u202e.net.yaml';
    r.files[0].findings[0].message = 'bridge \u001b]0;title\u0007 here';
    const text = renderTerminal(r, { color: false, width: 100 });
    expect(text).not.toMatch(/[\u0007\u001b\u202e]/);
    expect(text).toContain('designs/[2J[31mevil.net.yaml');
  });

  it('lists failures before warnings, and keeps notices to one line in the detail', () => {
    const r = demoReport();
    const f = r.files[0];
    const one = (id: string, line: number) => ({
      rule: 'new-bridge' as const,
      severity: 'warn' as const,
      message: `link ${id} is a new bridge`,
      elements: [{ id, kind: 'link' as const, line }],
      line,
    });
    f.findings = [
      one('a-b', 10),
      one('b-c', 12),
      { ...one('c-d', 14), severity: 'fail' },
      {
        rule: 'regression',
        severity: 'notice',
        message: 'x '.repeat(200),
        elements: [{ id: 'n', kind: 'node', line: 3 }],
        line: 3,
      },
    ];
    const lines = renderTerminal(r, { color: false, width: 100 })
      .replace(/\u00a0/g, ' ')
      .split('\n');
    const i = lines.indexOf('  What weakened');
    expect(lines[i + 1]).toBe(
      '    \u25A0 new bridge (line 14): Link c-d (line 14) is a new bridge; losing it splits the design.',
    );
    expect(lines[i + 2]).toBe(
      '    \u25B2 new bridge (line 10): Link a-b (line 10) is a new bridge; losing it splits the design.',
    );
    expect(lines[i + 3]).toBe(
      '    \u25B2 new bridge (line 12): Link b-c (line 12) is a new bridge; losing it splits the design.',
    );
    const n = lines.findIndex((l) => /^ {4}\u00b7 robustness changed \(line 3\): [xX] x /.test(l));
    expect(n).toBeGreaterThan(lines.indexOf('  Detail'));
    expect(lines[n]).toMatch(/\u2026$/);
    expect(lines[n].length).toBeLessThanOrEqual(100);
  });

  it('shortens full commit ids in the line of facts under the verdict', () => {
    const r = demoReport();
    r.base = '3e5b5ee6078607f2ca16d1ad923901916b181f57';
    r.head = 'feature/x';
    const lines = renderTerminal(r, { color: false, width: 140 }).split('\n');
    expect(lines.find((l) => l.startsWith('netbrace 0.1.0'))).toBe(
      'netbrace 0.1.0 \u00b7 base 3e5b5ee60786 \u2192 head feature/x \u00b7 seed 7 \u00b7 3 designs (1 weakened, 1 new design, 1 could not be read)',
    );
  });

  it('shows what reading a design warned of, at its line', () => {
    const r = demoReport();
    r.files[0].warnings = [
      { message: 'self-loop at kaskeld dropped', line: 40, column: 5, hint: 'a link needs two different ends' },
    ];
    const text = renderTerminal(r, { color: false, width: 140 });
    const detail = text.slice(text.indexOf('  Detail'));
    expect(detail).toContain(
      '\u25B2 design warning: designs/lunmere-backbone.net.yaml:40:5: self-loop at kaskeld dropped \u2014 a link needs two different ends',
    );
  });
});
