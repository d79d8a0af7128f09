import { describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { envelopeChart } from '../../src/report/chart.js';
import { CAUTION } from '../../src/report/report.js';
import { CAUTION_LINE, designStories, plainSentence, requirementLine, verdictStory } from '../../src/report/story.js';
import { escapeHtml } from '../../src/report/escape.js';
import { demoReport } from './demo-report.fixture.js';

const report = demoReport();
const html = renderHtml(report);

const sections = () => html.split('<section ').slice(1);
/** The designs in the order the page shows them: worst first (story.ts). */
const shown = designStories(report).map((d) => d.file);
/** Text with tags removed and entities decoded, for comparing sentences. */
const text = (h: string) =>
  h
    .replace(/<[^>]+>/g, '')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&');

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

  it('opens with the verdict sentence and the caution in one line, with no badge', () => {
    const body = html.slice(html.indexOf('<body'));
    const h1 = /<h1 class="verdict blocks" id="verdict" role="status" data-tone="blocks">([\s\S]*?)<\/h1>/.exec(body)!;
    expect(text(h1[1])).toBe('\u25A0netbrace blocks this merge: 1 design weakened, 1 design could not be read');
    expect(plainSentence(verdictStory(report).sentence)).toBe(
      'netbrace blocks this merge: 1 design weakened, 1 design could not be read',
    );
    // the caution line comes right after the verdict; the full caution closes the page
    const after = body.slice(body.indexOf('</h1>'));
    expect(after.indexOf('class="caution-line"')).toBeGreaterThan(0);
    expect(after.indexOf('class="caution-line"')).toBeLessThan(after.indexOf('<dl class="meta">'));
    expect(text(/<p class="caution-line"[^>]*>([\s\S]*?)<\/p>/.exec(body)![1])).toBe(CAUTION_LINE);
    expect(body.lastIndexOf(escapeHtml(CAUTION))).toBeGreaterThan(body.lastIndexOf('<section '));
    // no bordered badge, no "gate", no traffic-light emoji
    expect(html).not.toMatch(/Gate (passed|failed)|gate (passed|failed)/i);
    expect(html).not.toMatch(/\bgate\b/i);
    expect(html).not.toMatch(/[\u2705\u274C\u26A0\u{1F534}\u{1F7E2}\u{1F7E1}]/u);
    expect(html).not.toContain('class="verdict fail"');
    expect(html).not.toMatch(/\.verdict[^{]*\{[^}]*border/);
  });

  it('has one section per design, worst first, each with its status and outcome', () => {
    const s = sections();
    expect(s).toHaveLength(report.files.length);
    shown.forEach((f, i) => {
      expect(s[i]).toContain(`data-path="${escapeHtml(f.path)}"`);
      expect(s[i]).toContain(`data-status="${f.status}"`);
    });
    expect(s.map((x) => /data-outcome="(\w+)"/.exec(x)![1])).toEqual(['fails', 'fails', 'holds']);
    expect(s[1]).toContain('could not be read');
  });

  it('tells each design in the order: what weakened, how much, then the charts', () => {
    for (const s of sections()) {
      const at = (needle: string) => s.indexOf(needle);
      expect(at('data-part="consequences"')).toBeGreaterThan(0);
      if (s.includes('data-part="numbers"'))
        expect(at('data-part="numbers"')).toBeGreaterThan(at('data-part="consequences"'));
      if (s.includes('<figure class="chart"')) {
        expect(at('<figure class="chart"')).toBeGreaterThan(at('data-part="detail"'));
        expect(at('data-part="detail"')).toBeGreaterThan(at('data-part="numbers"'));
      }
    }
  });

  it('says what weakened in sentences, worst first, each element with id and line', () => {
    const s = sections()[0];
    const part = s.slice(s.indexOf('data-part="consequences"'), s.indexOf('data-part="numbers"'));
    const items = [...part.matchAll(/<li class="sev-(\w+)" data-rule="([^"]+)"[^>]*>([\s\S]*?)<\/li>/g)].map((m) => ({
      sev: m[1],
      rule: m[2],
      text: text(m[3]),
    }));
    const story = designStories(report)[0];
    expect(items.map((x) => x.rule)).toEqual(story.weakened.map((x) => x.rule));
    items.forEach((x, i) => expect(x.text).toContain(plainSentence(story.weakened[i].sentence)));
    expect(items[0].sev).toBe('fail');
    expect(items.find((x) => x.rule === 'new-cut-node')!.text).toContain('Site kaskeld (line 31) is a new cut node');
    // notices are context: folded into the detail, not among the consequences
    expect(part).not.toContain('data-rule="weakest-sequence"');
  });

  it('draws one chart per envelope, each with the series the chart model gives', () => {
    shown.forEach((f, i) => {
      const svgs = sections()[i].match(/<svg[^>]*class="nb-chart"[^>]*>/g) ?? [];
      expect(svgs).toHaveLength(f.head?.envelopes.length ?? 0);
      f.head?.envelopes.forEach((env, j) => {
        const expected = envelopeChart(env, f.head!, f.base).series.length;
        expect(svgs[j]).toContain(`data-series-count="${expected}"`);
      });
    });
  });

  it('gives each requirement one line with the numbers of the JSON report', () => {
    const f = shown[0];
    const r = f.requirements[0];
    const row = html.slice(html.indexOf(`data-requirement="${r.id}"`)).split('</li>')[0];
    expect(row).toContain(`data-base="${r.base}" data-head="${r.head}" data-delta="${r.delta}" data-se="${r.se}"`);
    expect(text(row.slice(row.indexOf('>') + 1))).toBe(
      `\u25A0${plainSentence(requirementLine(r, f.findings).sentence)}`,
    );
    // spot-checked against the raw numbers, not our own formatter
    expect(text(row)).toContain('short \u00b7 ');
    expect(text(row)).toContain('0.498 \u2192 0.421 (\u22120.077 \u00b1 0.006), floor 0.45');
  });

  it('defines R and \u00b1 beside the numbers that use them, pointing to the README', () => {
    const s = sections()[0];
    const numbers = s.slice(s.indexOf('data-part="numbers"'), s.indexOf('data-part="detail"'));
    expect(text(numbers)).toContain('R: the weighted mean of efficiency 0.4, largest_component 0.3, demand_served 0.3');
    expect(numbers).toContain('data-term="\u00b1"');
    const link = /<a href="#([^"]+)" class="more">/.exec(numbers)![1];
    expect(s).toContain(`id="${link}"`);
    expect(text(s.slice(s.indexOf(`id="${link}"`)))).toMatch(
      /README, section \u201cReading the report\u201d \(README\.md#reading-the-report\)/,
    );
  });

  it('escapes every string from the report', () => {
    expect(html).toContain('designs/metro/&lt;west&gt; &amp; &quot;ring&quot;.net.yaml');
    expect(html).not.toContain('<west>');
    // our own markup is never escaped a second time (the N\u22121 worst case named its site as text)
    expect(html).not.toMatch(/&lt;\/?span/);
    const evil = demoReport();
    evil.files[0].findings[0].message = '</li><img src=x onerror=alert(1)>';
    const out = renderHtml(evil);
    expect(out).not.toContain('<img');
    expect(out).toContain('&lt;/li&gt;&lt;img src=x onerror=alert(1)&gt;');
  });

  it('is readable with a screen reader: language, landmarks, captions, scoped headers, chart titles', () => {
    expect(html).toContain('<html lang="en">');
    expect(html).toContain('<main>');
    expect(html).toMatch(/<aside class="caution" id="caution" role="note"/);
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
    expect(s).toMatch(
      /lunmere-kaskeld<\/span> <span class="line">\(line 197\)<\/span> <strong class="sev-fail">new<\/strong>/,
    );
    expect(s).not.toMatch(/wendlequist-yarlsquay<\/span> <span class="line">\(line 268\)<\/span> <strong/);
  });

  it('carries the caution and a print stylesheet', () => {
    expect(html).toContain(CAUTION);
    expect(html).toContain('@media print');
  });

  it('links the definitions to netbrace\u2019s README when its address is known', () => {
    const withLink = renderHtml(report, { readmeUrl: 'https://github.com/acme/netbrace/blob/v1/README.md' });
    const s = withLink.split('<section ')[1];
    expect(s).toContain(
      '<a href="https://github.com/acme/netbrace/blob/v1/README.md#reading-the-report" class="more">More in the README</a>',
    );
    expect(s).not.toContain('-about-reading-the-report');
    // anything but an http(s) address is not a link
    expect(renderHtml(report, { readmeUrl: 'javascript:alert(1)' })).not.toContain('javascript:');
  });

  it('shows what reading a design warned of, at its line, in the detail', () => {
    const r = demoReport();
    r.files[0].warnings = [
      {
        message: 'self-loop on node "kaskeld" dropped',
        line: 40,
        column: 5,
        hint: 'a link from a node to itself adds no connectivity',
      },
    ];
    const s = renderHtml(r).split('<section ')[1];
    const at = s.indexOf('class="facts design-warnings"');
    expect(at).toBeGreaterThan(s.indexOf('data-part="detail"'));
    expect(s).toContain(
      '<code>designs/lunmere-backbone.net.yaml:40:5</code> self-loop on node &quot;kaskeld&quot; dropped \u2014 a link from a node to itself adds no connectivity',
    );
  });

  it('shows a passing design with notices as passing, and folds its notices into the detail', () => {
    const s = sections()[2];
    expect(s).toContain('data-outcome="holds"');
    expect(text(/<p class="outcome holds">([\s\S]*?)<\/p>/.exec(s)![1])).toBe(
      '\u25A1new design \u2014 every requirement holds',
    );
    expect(s).toContain('<p class="facts">Nothing weakened.</p>');
    expect(s).toMatch(
      /<details class="notices"><summary>1 notice \(context, within allowances\)<\/summary><ul class="weakened"><li class="sev-notice" data-rule="degraded"/,
    );
    expect(s.indexOf('<details class="notices">')).toBeGreaterThan(s.indexOf('data-part="detail"'));
  });
});
