import { describe, expect, it } from 'vitest';
import { renderTerminal } from '../../src/report/terminal.js';
import { CAUTION } from '../../src/report/report.js';
import { demoReport } from './demo-report.fixture.js';

const ANSI = /\u001b\[[0-9;]*m/;
// Element names keep their line with no-break spaces; compare with plain spaces.
const plain = (width = 100) => renderTerminal(demoReport(), { color: false, width }).replace(/\u00a0/g, ' ');

describe('renderTerminal', () => {
  it('gives a verdict per design and overall', () => {
    const text = plain();
    expect(text).toMatch(/\u2717 designs\/lunmere-backbone\.net\.yaml \u2014 FAIL \u00b7 weakened/);
    expect(text).toMatch(/\u2713 designs\/metro\/<west> & "ring"\.net\.yaml \u2014 PASS \u00b7 new design/);
    expect(text).toMatch(/\u2717 designs\/lab\.graphml \u2014 FAIL \u00b7 could not be read/);
    expect(text).toContain('designs/lab.graphml:41:5: link e7 refers to node n99');
    expect(text).toMatch(/Verdict: FAIL \u2014 3 designs \(1 weakened, 1 new design, 1 could not be read\), 2 failing/);
  });

  it('shows each requirement as base \u2192 head with the delta and its error', () => {
    const text = plain(140);
    const row = text.split('\n').find((l) => l.includes('10 % quantile of R at 20 % sites removed \u2265 0.45') && l.includes('\u2192'))!;
    expect(row).toMatch(/0\.498 \u2192\s+0\.421\s+\u22120\.077 \u00b1 0\.006\s+\u2717 short of its floor/);
    // deterministic values carry no error term; counts are whole numbers
    const n1 = text.split('\n').find((l) => l.includes('no single site loss'))!;
    expect(n1).toMatch(/0\.702 \u2192\s+0\.655\s+\u22120\.047\s+\u2713 holds/);
    const spof = text.split('\n').find((l) => l.includes('no new bridges or cut nodes'))!;
    expect(spof).toMatch(/\s1 \u2192\s+3\s+\+2\s+\u2717 short of its floor/);
    expect(text).toContain('inside the error: the value dropped by less than its Monte Carlo error');
  });

  it('names the weakest sequences by element and line, and the new bridges with their lines', () => {
    const text = plain(160);
    expect(text).toContain(
      'Worst case found under random site failures (exact search, 3 sites): kaskeld (line 31) \u2192 lunmere (line 12) \u2192 tessaway (line 19) \u00b7 R 0.655 \u2192 0.561 \u2192 0.468',
    );
    expect(text).toContain('at lunmere-kaskeld (line 197), kaskeld-ibberlin (line 201)');
    expect(text).toMatch(/fail\s+new-bridge\s+line 197/);
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
    expect(plain(160)).toContain('changed: \u22122 links (kaskeld-fenwhistle, base line 214; ibberlin-tarnquist, base line 205)');
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
    expect(text).toContain('\u2713 Verdict: PASS \u2014 0 designs');
  });

  it('strips control characters from report text, so a crafted id cannot drive the terminal', () => {
    const r = demoReport();
    r.files[0].path = 'designs/\u001b[2J\u001b[31mevil\u202e.net.yaml';
    r.files[0].findings[0].message = 'bridge \u001b]0;title\u0007 here';
    const text = renderTerminal(r, { color: false, width: 100 });
    expect(text).not.toMatch(/[\u0007\u001b\u202e]/);
    expect(text).toContain('designs/[2J[31mevil.net.yaml');
  });

  it('lists new bridges of one severity together, and keeps notices to one line', () => {
    const r = demoReport();
    const f = r.files[0];
    const one = (id: string, line: number) => ({
      rule: 'new-bridge' as const,
      severity: 'warn' as const,
      message: `link ${id} is a new bridge`,
      elements: [{ id, kind: 'link' as const, line }],
      line,
    });
    f.findings = [one('a-b', 10), one('b-c', 12), { ...one('c-d', 14), severity: 'fail' }, { rule: 'regression', severity: 'notice', message: 'x '.repeat(200), elements: [{ id: 'n', kind: 'node', line: 3 }], line: 3 }];
    const lines = renderTerminal(r, { color: false, width: 100 }).replace(/\u00a0/g, ' ').split('\n');
    const i = lines.findIndex((l) => l.includes('link c-d is a new bridge'));
    // failures first, then warnings, then notices
    expect(lines[i]).toMatch(/\u2717 fail\s+new-bridge\s+line 14\s+link c-d is a new bridge$/);
    expect(lines[i + 1]).toMatch(/\u25b2 warn\s+new-bridge\s+line 10\s+2 new bridges \(links whose loss alone splits the design\):$/);
    expect(lines[i + 2].trim()).toBe('a-b (line 10), b-c (line 12)');
    expect(lines[i + 3]).toMatch(/i notice regression\s+line 3\s+x x .*\u2026$/);
    expect(lines[i + 3].length).toBeLessThanOrEqual(100);
    expect(lines[i + 4]).toBe('');
  });

  it('shortens full commit ids in the header', () => {
    const r = demoReport();
    r.base = '3e5b5ee6078607f2ca16d1ad923901916b181f57';
    r.head = 'feature/x';
    expect(renderTerminal(r, { color: false, width: 100 }).split('\n')[0]).toBe('netbrace 0.1.0 \u00b7 base 3e5b5ee60786 \u2192 head feature/x \u00b7 seed 7');
  });
});
