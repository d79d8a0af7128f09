// The HTML report in a real browser: Debian's chromium, headless, driven by playwright-core.
// Opens the report from file://, refuses every request that is not the file itself (the
// report must be self-contained), checks the DOM against the JSON report it was built from,
// and saves a screenshot under test/artifacts/ (gitignored; CI keeps it as an artifact).
// Without chromium the test fails with a clear message in CI, and is skipped elsewhere.

import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { renderHtml } from '../../src/report/html.js';
import { envelopeChart } from '../../src/report/chart.js';
import { formatRequirementDelta, formatRequirementValue, REQUIREMENT_STATUS_WORD } from '../../src/report/labels.js';
import type { Report } from '../../src/report/report.js';
import { demoReport } from '../report/demo-report.fixture.js';
import { repoRoot } from '../topology/helpers.js';

const CHROMIUM = '/usr/bin/chromium';
const ARTIFACTS = path.join(repoRoot, 'test', 'artifacts');
const inCI = Boolean(process.env.CI) && process.env.CI !== 'false' && process.env.CI !== '0';
const haveChromium = existsSync(CHROMIUM);

if (!haveChromium && inCI) {
  describe('HTML report in chromium', () => {
    it('needs chromium', () => {
      throw new Error(`chromium is missing at ${CHROMIUM}: install Debian's package (apt-get install chromium); the browser test cannot run without it`);
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
    expect(sections.map((s) => s.path)).toEqual(report.files.map((f) => f.path));
    report.files.forEach((f, i) => {
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

  it('shows the requirement numbers of the JSON report', async () => {
    const rows = await page.$$eval('section.design', (els) =>
      els.map((s) =>
        [...s.querySelectorAll('table.requirements tbody tr')].map((tr) => {
          const cell = (f: string) => tr.querySelector(`[data-field="${f}"]`);
          return {
            id: tr.getAttribute('data-requirement'),
            base: [cell('base')?.getAttribute('data-value'), cell('base')?.textContent],
            head: [cell('head')?.getAttribute('data-value'), cell('head')?.textContent],
            delta: [cell('delta')?.getAttribute('data-value'), cell('delta')?.firstChild?.textContent?.trim()],
            status: cell('status')?.textContent,
          };
        }),
      ),
    );
    report.files.forEach((f, i) => {
      expect(rows[i].map((r) => r.id)).toEqual(f.requirements.map((r) => r.id));
      f.requirements.forEach((r, j) => {
        const shown = rows[i][j];
        const json = (v: number | null) => (v === null ? '' : String(v));
        expect(shown.base).toEqual([json(r.base), formatRequirementValue(r, r.base)]);
        expect(shown.head).toEqual([json(r.head), formatRequirementValue(r, r.head)]);
        expect(shown.delta).toEqual([json(r.delta), formatRequirementDelta(r)]);
        expect(shown.status).toBe(REQUIREMENT_STATUS_WORD[r.status]);
      });
    });
    // and spot-check against the raw JSON, not our own formatter
    expect(rows[0][0].head).toEqual(['0.421', '0.421']);
    expect(rows[0][0].delta).toEqual(['-0.077', '\u22120.077']);
  });

  it('states the verdict and the caution in text', async () => {
    expect(await page.textContent('[role="status"]')).toBe('Gate failed: 2 of 3 designs failing');
    expect(await page.textContent('aside.caution')).toContain(report.caution);
    expect(await page.title()).toBe('netbrace report \u2014 gate failed');
  });

  it('exposes each chart to assistive technology as an image with a name and description', async () => {
    const charts = await page.$$eval('svg.nb-chart', (svgs) =>
      svgs.map((svg) => {
        const [t, d] = (svg.getAttribute('aria-labelledby') ?? '').split(' ');
        return { role: svg.getAttribute('role'), title: svg.ownerDocument.getElementById(t)?.textContent, desc: svg.ownerDocument.getElementById(d)?.textContent };
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
