// The HTML report in a real browser: Debian's chromium, headless, driven by playwright-core.
// Opens the report from file://, refuses every request that is not the file itself (the
// report must be self-contained), checks the DOM against the JSON report it was built from,
// checks the order a reader meets (the verdict sentence, then per design what weakened, how
// much, and the charts, by position in the rendered page), and saves a screenshot under
// test/artifacts/ (gitignored; CI keeps it as an artifact).
// Without chromium the test fails with a clear message in CI, and is skipped elsewhere.

import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { renderHtml } from '../../src/report/html.js';
import { envelopeChart } from '../../src/report/chart.js';
import type { Report } from '../../src/report/report.js';
import { CAUTION_LINE, designStories, plainSentence, requirementLine, verdictStory } from '../../src/report/story.js';
import { demoReport } from '../report/demo-report.fixture.js';
import { repoRoot } from '../topology/helpers.js';

const CHROMIUM = '/usr/bin/chromium';
const ARTIFACTS = path.join(repoRoot, 'test', 'artifacts');
const inCI = Boolean(process.env.CI) && process.env.CI !== 'false' && process.env.CI !== '0';
const haveChromium = existsSync(CHROMIUM);

if (!haveChromium && inCI) {
  describe('HTML report in chromium', () => {
    it('needs chromium', () => {
      throw new Error(
        `chromium is missing at ${CHROMIUM}: install Debian's package (apt-get install chromium); the browser test cannot run without it`,
      );
    });
  });
}

describe.skipIf(!haveChromium)('HTML report in chromium', () => {
  let context: BrowserContext;
  let page: Page;
  let dir: string;
  let report: Report;
  const blocked: string[] = [];

  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'nb-browser-'));
    report = demoReport();
    writeFileSync(path.join(dir, 'report.json'), JSON.stringify(report));
    const file = path.join(dir, 'report.html');
    writeFileSync(file, renderHtml(report));
    context = await chromium.launchPersistentContext(path.join(dir, 'profile'), {
      executablePath: CHROMIUM,
      headless: true,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
      viewport: { width: 1200, height: 900 },
      deviceScaleFactor: 1,
    });
    const reportUrl = pathToFileURL(file).href;
    await context.route('**/*', (route) => {
      const url = route.request().url();
      if (url === reportUrl) return route.continue();
      blocked.push(url);
      return route.abort();
    });
    page = await context.newPage();
    await page.goto(reportUrl, { waitUntil: 'load' });
  });

  afterAll(async () => {
    await context?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('loads nothing but the file itself', () => {
    expect(blocked).toEqual([]);
  });

  it('has one section per design with a chart per envelope and the expected number of series', async () => {
    const sections = await page.$$eval('section.design', (els) =>
      els.map((s) => ({
        path: s.getAttribute('data-path'),
        charts: [...s.querySelectorAll('figure.chart svg')].map((svg) => ({
          series: svg.querySelectorAll('[data-series]').length,
          roles: [...svg.querySelectorAll('[data-series]')].map((e) => e.getAttribute('data-series')),
          title: svg.querySelector('title')?.textContent ?? '',
          width: svg.getBoundingClientRect().width,
          height: svg.getBoundingClientRect().height,
        })),
      })),
    );
    const shown = designStories(report).map((d) => d.file);
    expect(sections.map((s) => s.path)).toEqual(shown.map((f) => f.path));
    shown.forEach((f, i) => {
      const envs = f.head?.envelopes ?? [];
      expect(sections[i].charts).toHaveLength(envs.length);
      envs.forEach((env, j) => {
        const expected = envelopeChart(env, f.head!, f.base);
        const chart = sections[i].charts[j];
        expect(chart.series).toBe(expected.series.length);
        expect([...chart.roles].sort()).toEqual(expected.series.map((s) => s.role).sort());
        expect(chart.title).toBe(expected.title);
        expect(chart.width).toBeGreaterThan(300);
        expect(chart.height).toBeGreaterThan(200);
      });
    });
    // The weakened design's first chart: band, median, 2 node attacks, worst case, base median.
    expect(sections[0].charts[0].series).toBe(6);
  });

  it('shows one line per requirement with the numbers of the JSON report', async () => {
    const rows = await page.$$eval('section.design', (els) =>
      els.map((s) =>
        [...s.querySelectorAll('ul.how-much li')].map((li) => ({
          id: li.getAttribute('data-requirement'),
          base: li.getAttribute('data-base'),
          head: li.getAttribute('data-head'),
          delta: li.getAttribute('data-delta'),
          status: li.getAttribute('data-status'),
          text: (li as unknown as { innerText: string }).innerText,
        })),
      ),
    );
    designStories(report).forEach((d, i) => {
      const f = d.file;
      expect(rows[i].map((r) => r.id)).toEqual(f.requirements.map((r) => r.id));
      f.requirements.forEach((r, j) => {
        const json = (v: number | null) => (v === null ? '' : String(v));
        const line = requirementLine(r, f.findings);
        expect(rows[i][j]).toMatchObject({
          base: json(r.base),
          head: json(r.head),
          delta: json(r.delta),
          status: r.status,
        });
        expect(rows[i][j].text).toBe(`${line.mark}${plainSentence(line.sentence)}`);
      });
    });
    // and spot-checked against the raw JSON, not our own formatter
    expect(rows[0][0]).toMatchObject({ head: '0.421', delta: '-0.077' });
    expect(rows[0][0].text).toContain('0.498 \u2192 0.421 (\u22120.077 \u00b1 0.006), floor 0.45');
  });

  it('reads in order: verdict, then per design what weakened, how much, and the charts', async () => {
    // Positions in the rendered page (top of each block's box), not in the source text.
    const layout = await page.$eval('body', (body) => {
      const document = body.ownerDocument;
      const scrollY = document.defaultView!.scrollY;
      const top = (e: { getBoundingClientRect(): { top: number } } | null) =>
        e ? e.getBoundingClientRect().top + scrollY : null;
      return {
        verdict: top(document.querySelector('#verdict')),
        cautionLine: top(document.querySelector('#caution-line')),
        cautionFull: top(document.querySelector('aside#caution')),
        designs: [...document.querySelectorAll('section.design')].map((s) => ({
          start: top(s),
          consequences: top(s.querySelector('[data-part="consequences"]')),
          numbers: top(s.querySelector('[data-part="numbers"]')),
          firstChart: top(s.querySelector('figure.chart')),
          end: s.getBoundingClientRect().bottom + scrollY,
        })),
      };
    });
    expect(layout.verdict).not.toBeNull();
    expect(layout.cautionLine!).toBeGreaterThan(layout.verdict!);
    expect(layout.designs.length).toBe(report.files.length);
    expect(layout.designs[0].start!).toBeGreaterThan(layout.cautionLine!);
    for (const d of layout.designs) {
      expect(d.consequences!).toBeGreaterThan(d.start!);
      if (d.numbers !== null) expect(d.numbers).toBeGreaterThan(d.consequences!);
      if (d.firstChart !== null) expect(d.firstChart).toBeGreaterThan(d.numbers ?? d.consequences!);
    }
    // the first design has all three, so the order is checked there for certain
    expect(layout.designs[0].numbers).not.toBeNull();
    expect(layout.designs[0].firstChart).not.toBeNull();
    // the full caution closes the page, after every design
    expect(layout.cautionFull!).toBeGreaterThan(Math.max(...layout.designs.map((d) => d.end)));
  });

  it('states the verdict as a plain sentence, not a badge, with the caution in one line under it', async () => {
    const sentence = plainSentence(verdictStory(report).sentence);
    expect(sentence).toBe('netbrace blocks this merge: 1 design weakened, 1 design could not be read');
    expect(await page.innerText('#verdict')).toBe(`\u25A0${sentence}`);
    expect(await page.innerText('#caution-line')).toBe(CAUTION_LINE);
    expect(await page.textContent('aside#caution')).toContain(report.caution);
    expect(await page.title()).toBe(`netbrace report \u2014 ${sentence}`);
    // no border around it, and not pushed into a corner: it starts at the left edge of the page's content
    const box = await page.$eval('#verdict', (h) => {
      const cs = h.ownerDocument.defaultView!.getComputedStyle(h);
      const r = h.getBoundingClientRect();
      const main = h.ownerDocument.querySelector('main')!.getBoundingClientRect();
      return {
        border: [cs.borderTopWidth, cs.borderRightWidth, cs.borderBottomWidth, cs.borderLeftWidth],
        left: r.left,
        mainLeft: main.left,
      };
    });
    expect(box.border).toEqual(['0px', '0px', '0px', '0px']);
    expect(Math.abs(box.left - box.mainLeft)).toBeLessThan(2);
    expect(await page.locator('text=/gate (passed|failed)/i').count()).toBe(0);
  });

  it('names every line of every chart in the chart\u2019s own legend', async () => {
    const charts = await page.$$eval('svg.nb-chart', (svgs) =>
      svgs.map((svg) => ({
        drawn: [...svg.querySelectorAll('[data-series]')].map((e) => [
          e.getAttribute('data-id'),
          e.getAttribute('aria-label'),
        ]),
        legend: [...svg.querySelectorAll('.nb-legend [data-legend]')].map((g) => [
          g.getAttribute('data-legend'),
          g.querySelector('text')?.textContent ?? '',
        ]),
        visible: [...svg.querySelectorAll('.nb-legend [data-legend] text')].every(
          (t) => (t as unknown as { getBBox(): { width: number } }).getBBox().width > 10,
        ),
      })),
    );
    expect(charts.length).toBeGreaterThan(0);
    for (const c of charts) {
      expect([...c.legend].sort()).toEqual([...c.drawn].sort());
      expect(c.visible).toBe(true);
    }
  });

  it('exposes each chart to assistive technology as an image with a name and description', async () => {
    const charts = await page.$$eval('svg.nb-chart', (svgs) =>
      svgs.map((svg) => {
        const [t, d] = (svg.getAttribute('aria-labelledby') ?? '').split(' ');
        return {
          role: svg.getAttribute('role'),
          title: svg.ownerDocument.getElementById(t)?.textContent,
          desc: svg.ownerDocument.getElementById(d)?.textContent,
        };
      }),
    );
    expect(charts.length).toBeGreaterThan(0);
    for (const c of charts) {
      expect(c.role).toBe('img');
      expect(c.title).toMatch(/^R under /);
      expect(c.desc).toMatch(/Median R falls from \d\.\d{3} to \d\.\d{3}/);
    }
  });

  it('hides navigation when printed, and saves a screenshot', async () => {
    await page.emulateMedia({ media: 'print' });
    expect(await page.isVisible('nav')).toBe(false);
    await page.emulateMedia({ media: 'screen' });
    expect(await page.isVisible('nav')).toBe(true);
    mkdirSync(ARTIFACTS, { recursive: true });
    const shot = path.join(ARTIFACTS, 'html-report.png');
    await page.screenshot({ path: shot, fullPage: true });
    expect(existsSync(shot)).toBe(true);
  });
});
