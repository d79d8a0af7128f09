// The design map and the "what would mend it" part of the HTML report in a real browser
// (Debian's chromium, headless, through playwright-core), on the report of the demo's first
// change as the gate writes it: the file loads nothing but itself, the map is drawn with every
// site and link of the JSON report, each with a title naming it and its line, it stays visible
// in print, and the mend table lists the report's suggestions. Saves test/artifacts/map.png.
// Without chromium: fails in CI with a clear message, skipped elsewhere.

import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import type { DesignMap } from '../../src/map/types.js';
import { renderHtml } from '../../src/report/html.js';
import type { Report } from '../../src/report/report.js';
import { runGate } from '../../src/run-gate.js';
import { memoryDeps } from '../gate/memory-repo.js';
import { repoRoot } from '../topology/helpers.js';

const CHROMIUM = '/usr/bin/chromium';
const ARTIFACTS = path.join(repoRoot, 'test', 'artifacts');
const inCI = Boolean(process.env.CI) && process.env.CI !== 'false' && process.env.CI !== '0';
const haveChromium = existsSync(CHROMIUM);
const DESIGN = 'designs/lunmere-backbone.net.yaml';

if (!haveChromium && inCI) {
  describe('map in chromium', () => {
    it('needs chromium', () => {
      throw new Error(`chromium is missing at ${CHROMIUM}: install Debian's package (apt-get install chromium)`);
    });
  });
}

/** The demo's first change as the gate judges it (the patch only removes lines). */
async function demoReport(): Promise<Report> {
  const demo = path.join(repoRoot, 'fixtures', 'demo');
  const base = readFileSync(path.join(demo, 'base', DESIGN), 'utf8');
  const patch = readFileSync(path.join(demo, 'changes', '1-retire-east-chord.patch'), 'utf8');
  let head = base;
  let block: string[] = [];
  for (const line of [...patch.split('\n'), '']) {
    if (line.startsWith('-') && !line.startsWith('---')) block.push(line.slice(1));
    else if (block.length) {
      head = head.replace(`${block.join('\n')}\n`, '');
      block = [];
    }
  }
  const policy = readFileSync(path.join(demo, 'policy.yaml'), 'utf8');
  const repo = {
    base: { '.netbrace.yaml': policy, [DESIGN]: base },
    head: { '.netbrace.yaml': policy, [DESIGN]: head },
  };
  return (await runGate({ base: 'base', head: 'head', policySource: 'base', mode: 'block' }, memoryDeps(repo))).report;
}

describe.skipIf(!haveChromium)('map in chromium', () => {
  let context: BrowserContext;
  let page: Page;
  let dir: string;
  let report: Report;
  const blocked: string[] = [];

  beforeAll(async () => {
    report = await demoReport();
    dir = mkdtempSync(path.join(tmpdir(), 'nb-map-browser-'));
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
    const url = pathToFileURL(file).href;
    await context.route('**/*', (route) => {
      if (route.request().url() === url) return route.continue();
      blocked.push(route.request().url());
      return route.abort();
    });
    page = await context.newPage();
    await page.goto(url, { waitUntil: 'load' });
  }, 120_000);

  afterAll(async () => {
    await context?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('loads nothing but the file itself', () => {
    expect(blocked).toEqual([]);
  });

  it('draws every site and link of the report, each with a title naming it and its line', async () => {
    const map = report.files[0].map as DesignMap;
    const drawn = await page.$$eval('figure.map svg [data-el]', (els) =>
      els.map((e) => ({
        el: e.getAttribute('data-el'),
        id: e.getAttribute('data-id'),
        side: e.getAttribute('data-side'),
        title: e.querySelector(':scope > title')?.textContent ?? null,
      })),
    );
    const sites = drawn.filter((d) => d.el === 'site');
    const links = drawn.filter((d) => d.el === 'link');
    expect(sites.map((s) => s.id).sort()).toEqual(map.nodes.map((n) => n.id).sort());
    expect(links.map((s) => s.id).sort()).toEqual(map.links.map((l) => l.id).sort());
    for (const d of drawn) expect(d.title, `${d.el} ${d.id}`).toBeTruthy();
    for (const n of map.nodes) {
      const title = sites.find((s) => s.id === n.id)!.title!;
      expect(title).toContain(`(${n.id})`);
      expect(title).toContain(`line ${n.line}`);
      if (n.label) expect(title).toContain(n.label);
    }
    const removed = links
      .filter((l) => l.side === 'base')
      .map((l) => l.id)
      .sort();
    expect(removed).toEqual(['ibberlin-tarnquist', 'kaskeld-fenwhistle']);
    // The new bridges and cut sites are titled as such; the weakest sequence is numbered.
    for (const f of report.files[0].findings.filter((x) => x.rule === 'new-bridge')) {
      expect(links.find((l) => l.id === f.elements[0].id)!.title).toContain('new bridge');
    }
    expect(drawn.filter((d) => d.el === 'step').length).toBeGreaterThan(0);
    expect(drawn.some((d) => d.el === 'proposed')).toBe(true);
    const svg = await page.$eval('figure.map svg', (s) => ({
      w: s.getBoundingClientRect().width,
      h: s.getBoundingClientRect().height,
      title: s.querySelector('title')?.textContent,
    }));
    expect(svg.w).toBeGreaterThan(500);
    expect(svg.h).toBeGreaterThan(400);
    expect(svg.title).toBe(`Map of ${DESIGN}`);
  });

  it('lists the suggestions of the report, and the first holds', async () => {
    const rows = await page.$$eval('table.mend tbody tr', (trs) =>
      trs.map((tr) => ({
        kind: tr.getAttribute('data-kind'),
        holds: tr.getAttribute('data-holds'),
        text: tr.textContent ?? '',
      })),
    );
    const mend = report.files[0].mend!;
    expect(rows.map((r) => r.kind)).toEqual(mend.suggestions.map((s) => s.kind));
    expect(rows[0].holds).toBe('true');
    expect(rows[0].text).toContain(mend.suggestions[0].links[0].id);
  });

  it('keeps the map in print, and saves a screenshot of it', async () => {
    await page.emulateMedia({ media: 'print' });
    expect(await page.isVisible('figure.map svg')).toBe(true);
    await page.emulateMedia({ media: 'screen' });
    mkdirSync(ARTIFACTS, { recursive: true });
    const shot = path.join(ARTIFACTS, 'map.png');
    await (await page.$('figure.map'))!.screenshot({ path: shot });
    expect(existsSync(shot)).toBe(true);
  });
});
