import { describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { envelopeChart } from '../../src/report/chart.js';
import { CAUTION } from '../../src/report/report.js';
import { demoReport } from './demo-report.fixture.js';

const report = demoReport();
const html = renderHtml(report);

const sections = () => html.split('<section ').slice(1);

describe('renderHtml', () => {
  it('is one self-contained document: no scripts, no external fetches, a CSP that forbids them', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/<link\b/i);
    expect(html).not.toMatch(/@import|@font-face|url\(/i);
    expect(html).not.toMatch(/\bsrc=/i);
    // the only absolute URL is the SVG namespace, which is an identifier, not a fetch
    const urls = html.match(/https?:\/\/[^\s"'<>]+/g) ?? [];
    expect(new Set(urls)).toEqual(new Set(['http://www.w3.org/2000/svg']));
    expect(html).toContain(`content="default-src 'none'; style-src 'unsafe-inline'; img-src data:"`);
  });

  it('has one section per design, with its status', () => {
    const s = sections();
    expect(s).toHaveLength(report.files.length);
    report.files.forEach((f, i) => expect(s[i]).toContain(`data-status="${f.status}"`));
    expect(s[0]).toContain('data-tone="fail"');
    expect(s[1]).toContain('data-tone="pass"');
    expect(s[2]).toContain('Could not be read');
  });

  it('draws one chart per envelope, each with the series the chart model gives', () => {
    report.files.forEach((f, i) => {
      const svgs = sections()[i].match(/<svg[^>]*>/g) ?? [];
      expect(svgs).toHaveLength(f.head?.envelopes.length ?? 0);
      f.head?.envelopes.forEach((env, j) => {
        const expected = envelopeChart(env, f.head!, f.base).series.length;
        expect(svgs[j]).toContain(`data-series-count="${expected}"`);
      });
    });
  });

  it('shows requirement numbers that match the JSON report', () => {
    const r = report.files[0].requirements[0];
    const row = html.slice(html.indexOf(`data-requirement="${r.id}"`)).split('</tr>')[0];
    expect(row).toContain(`data-field="base" data-value="${r.base}">0.498<`);
    expect(row).toContain(`data-field="head" data-value="${r.head}">0.421<`);
    expect(row).toContain(`data-field="delta" data-value="${r.delta}">\u22120.077`);
    expect(row).toContain(`data-value="${r.se}">\u00b1 0.006<`);
    expect(row).toContain('data-field="status">short of its floor<');
  });

  it('escapes every string from the report', () => {
    expect(html).toContain('designs/metro/&lt;west&gt; &amp; &quot;ring&quot;.net.yaml');
    expect(html).not.toContain('<west>');
    const evil = demoReport();
    evil.files[0].findings[0].message = '</li><img src=x onerror=alert(1)>';
    const out = renderHtml(evil);
    expect(out).not.toContain('<img');
    expect(out).toContain('&lt;/li&gt;&lt;img src=x onerror=alert(1)&gt;');
  });

  it('is readable with a screen reader: language, landmarks, captions, scoped headers, chart titles', () => {
    expect(html).toContain('<html lang="en">');
    expect(html).toContain('<main>');
    expect(html).toMatch(/<aside class="caution" role="note"/);
    const tables = html.match(/<table/g)!.length;
    expect(html.match(/<caption>/g)!.length).toBe(tables);
    expect(html).not.toMatch(/<th>/); // every header cell has a scope
    for (const svg of html.match(/<svg[\s\S]*?<\/svg>/g)!) {
      const id = /aria-labelledby="([^ ]+) ([^"]+)"/.exec(svg)!;
      expect(svg).toContain(`<title id="${id[1]}">`);
      expect(svg).toContain(`<desc id="${id[2]}">`);
    }
    // ids are unique on the page
    const ids = [...html.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('names the weakest sequence by element and line, and marks new single points of failure', () => {
    const s = sections()[0];
    expect(s).toContain('Worst case found under random site failures (exact search, 3 sites)');
    expect(s).toMatch(/<span class="el">kaskeld<\/span> <span class="line">\(line 31\)<\/span> \u2014 R 0\.655/);
    expect(s).toMatch(/lunmere-kaskeld<\/span> <span class="line">\(line 197\)<\/span> <strong class="sev-fail">new<\/strong>/);
    expect(s).not.toMatch(/wendlequist-yarlsquay<\/span> <span class="line">\(line 268\)<\/span> <strong/);
  });

  it('carries the caution and a print stylesheet', () => {
    expect(html).toContain(CAUTION);
    expect(html).toContain('@media print');
  });

  it('lists failures before warnings, and folds notices away', () => {
    const s = sections();
    const rules = [...s[0].matchAll(/<li class="(fail|warn|notice)" data-rule="([^"]+)"/g)].map((m) => m[1]);
    expect(rules).toEqual([...rules].sort((a, b) => ['fail', 'warn', 'notice'].indexOf(a) - ['fail', 'warn', 'notice'].indexOf(b)));
    expect(s[1]).toMatch(/<details class="notices"><summary>1 notice \(within allowances, or context\)<\/summary><ul class="findings"><li class="notice" data-rule="degraded"/);
  });
});
