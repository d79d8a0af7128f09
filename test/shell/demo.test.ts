// `netbrace demo` end to end: the scratch repository, `netbrace check` on each of the three
// proposed changes through the real command line, and the reports it writes. The scenario's
// structure (which links are bridges, which sites cut nodes, before and after each change)
// is checked against networkx 2.8.8 (Debian python3-networkx) via demo-reference.json, made by
// test/shell/demo-reference.py (command recorded in the file).
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { DEMO_CHANGES } from '../../src/shell/commands/demo.js';
import type { Report } from '../../src/report/report.js';
import { CAUTION } from '../../src/report/report.js';
import { renderComment } from '../../src/report/markdown.js';
import { repoRoot } from '../topology/helpers.js';
import { recordIO } from './helpers-io.js';

interface Facts {
  nodes: number;
  links: number;
  bridges: string[];
  cut_nodes: string[];
}
const ref = JSON.parse(readFileSync(path.join(repoRoot, 'test', 'shell', 'demo-reference.json'), 'utf8')) as {
  library: string;
  base: Facts;
  changes: Record<string, Facts>;
};

describe('netbrace demo', () => {
  let out: string;
  let code: number;
  let stdout: string;
  const reports = new Map<string, Report>();

  beforeAll(async () => {
    out = mkdtempSync(path.join(tmpdir(), 'nb-demo-test-'));
    const io = recordIO(repoRoot, { PATH: process.env.PATH, CI: 'true' });
    code = await main(['demo', '--out', out], io);
    stdout = io.out.join('');
    for (const c of DEMO_CHANGES) {
      const file = path.join(out, `${c.id}.report.json`);
      if (existsSync(file)) reports.set(c.id, JSON.parse(readFileSync(file, 'utf8')) as Report);
    }
  }, 240_000);

  afterAll(() => rmSync(out, { recursive: true, force: true }));

  it('judges the three changes as the scenario intends, and exits 0', () => {
    expect(code).toBe(0);
    const verdicts = DEMO_CHANGES.map((c) => {
      const r = reports.get(c.id)!;
      const warns = r.files.flatMap((f) => f.findings).filter((x) => x.severity === 'warn').length;
      return [c.id, r.verdict, warns > 0];
    });
    expect(verdicts).toEqual([
      ['1-retire-east-chord', 'fail', true],
      ['2-close-west-ring', 'pass', false],
      ['3-saltmarrow-spur', 'pass', true],
    ]);
    expect(stdout).toMatch(/\u2713 1\. 1-retire-east-chord\s+FAIL/);
    expect(stdout).toMatch(/\u2713 2\. 2-close-west-ring\s+PASS\s/);
    expect(stdout).toMatch(/\u2713 3\. 3-saltmarrow-spur\s+PASS with 1 warning/);
    expect(stdout).toContain(`Reports written to ${out}`);
  });

  it(`has the structure the story claims, as networkx computes it (${ref.library})`, () => {
    for (const c of DEMO_CHANGES) {
      const f = reports.get(c.id)!.files[0];
      const want = ref.changes[c.id];
      expect(f.head!.structure.nodes, c.id).toBe(want.nodes);
      expect(f.head!.structure.links, c.id).toBe(want.links);
      expect(f.head!.structure.bridges.map((e) => e.id).sort(), c.id).toEqual(want.bridges);
      expect(f.head!.structure.cutNodes.map((e) => e.id).sort(), c.id).toEqual(want.cut_nodes);
      expect(f.base!.structure.bridges.map((e) => e.id).sort(), c.id).toEqual(ref.base.bridges);
    }
  });

  it('change 1 fails, names the new bridges with their lines and the weakest removal sequence', () => {
    const f = reports.get('1-retire-east-chord')!.files[0];
    expect(f.path).toBe('designs/lunmere-backbone.net.yaml');
    const bridges = f.findings.filter((x) => x.rule === 'new-bridge').flatMap((x) => x.elements);
    expect(bridges.map((e) => e.id).sort()).toEqual([
      'fenwhistle-orrowin',
      'kaskeld-ibberlin',
      'tarnquist-fenwhistle',
      'tessaway-kaskeld',
    ]);
    // The demo policy blocks new bridges (fail) and only flags new cut sites (warn).
    expect(new Set(f.findings.filter((x) => x.rule === 'new-bridge').map((x) => x.severity))).toEqual(
      new Set(['fail']),
    );
    const head = headText('1-retire-east-chord').split('\n');
    for (const e of bridges) expect(head[e.line - 1], e.id).toBe(`  - id: ${e.id}`);
    expect(f.findings.some((x) => x.severity === 'fail')).toBe(true);
    expect(f.head!.envelopes.some((e) => e.worstCase && e.worstCase.elements.length > 0)).toBe(true);
    // the terminal report printed for change 1
    const one = stdout.slice(stdout.indexOf('Change 1 of 3'), stdout.indexOf('Change 2 of 3'));
    expect(one).toContain('$ netbrace check --base main --head change/1-retire-east-chord --json');
    expect(one).toContain('\u25A0 netbrace blocks this merge: 1 design weakened');
    expect(one).toMatch(
      /\u25A0 designs\/lunmere-backbone\.net\.yaml \u2014 weakened \u00b7 4 new bridges, 4 new cut nodes/,
    );
    expect(one).toContain('\u25A0 new bridge (line 298): Link tessaway-kaskeld (line 298) is a new bridge');
    expect(one).toContain('weakest removal sequences:');
    expect(one.replace(/\s+/g, ' ')).toContain(`Caution: ${CAUTION}`);
  });

  it('change 2 passes with a positive delta and no bridge left', () => {
    const f = reports.get('2-close-west-ring')!.files[0];
    expect(f.status).toBe('holds');
    const deltas = f.requirements
      .filter((r) => !r.id.startsWith('no-new-spof') && r.delta !== null)
      .map((r) => r.delta!);
    expect(deltas.length).toBeGreaterThan(0);
    expect(deltas.some((d) => d > 0)).toBe(true);
    expect(f.head!.structure.bridges).toEqual([]);
  });

  it('change 3 passes with a warning for the new cut node Gantrevel', () => {
    const f = reports.get('3-saltmarrow-spur')!.files[0];
    const warns = f.findings.filter((x) => x.severity === 'warn');
    expect(warns.map((x) => [x.rule, x.elements.map((e) => e.id)])).toEqual([['new-cut-node', ['gantrevel']]]);
    expect(f.findings.filter((x) => x.rule === 'new-bridge')).toEqual([]);
  });

  it('prints for change 1 exactly the terminal lines the README shows', () => {
    const readme = readFileSync(path.join(repoRoot, 'README.md'), 'utf8');
    const start = readme.indexOf("here for the demo's first change");
    const open = readme.indexOf('```text\n', start) + '```text\n'.length;
    const shown = readme
      .slice(open, readme.indexOf('  ```', open))
      .split('\n')
      .map((l) => l.replace(/^ {2}/, ''));
    const text = readFileSync(path.join(out, '1-retire-east-chord.txt'), 'utf8');
    // The README leaves parts out with a line "…": each run of lines between them is printed as it stands.
    const runs = shown
      .join('\n')
      .split(/\n\s*\u2026\n/)
      .map((r) => r.replace(/\n+$/, ''));
    expect(runs.length).toBeGreaterThan(2);
    expect(text.startsWith(runs[0])).toBe(true);
    for (const r of runs) expect(text).toContain(r);
  });

  it('the PR comment of each change stays under 6,000 characters, verdict first and consequences before numbers', () => {
    // The bound is our own (a comment a reviewer reads in one screenful or two); the options
    // are those the Action passes (run link, artifact names, README link).
    const options = {
      key: 'default',
      runUrl: 'https://github.com/acme/lunmere/actions/runs/1',
      artifacts: ['netbrace-report.json', 'netbrace.sarif', 'netbrace-report.html'],
      readmeUrl: 'https://github.com/acme/netbrace/blob/v1/README.md',
    };
    for (const c of DEMO_CHANGES) {
      const md = renderComment(reports.get(c.id)!, options);
      expect(md.length, c.id).toBeLessThan(6000);
      const lines = md.split('\n');
      expect(lines[2], c.id).toMatch(/^## . netbrace(: no design| blocks this merge: 1 design weakened)/);
    }
    const first = renderComment(reports.get('1-retire-east-chord')!, options);
    expect(first.split('\n')[2]).toBe('## \u25A0 netbrace blocks this merge: 1 design weakened');
    const at = (t: string) => first.indexOf(t);
    expect(at('**What weakened**')).toBeGreaterThan(0);
    expect(at('Link `tessaway-kaskeld` (line 298) is a new bridge')).toBeGreaterThan(at('**What weakened**'));
    expect(at('**How much**')).toBeGreaterThan(at('Link `tessaway-kaskeld` (line 298) is a new bridge'));
    expect(first).toContain(
      '- \u25A0 weakened \u00b7 R at 10 % sites removed (q10) 0.464 \u2192 0.450 (\u22120.013 \u00b1 0.005), floor 0.42, allowed drop 0.010\n',
    );
    expect(at('<details>')).toBeGreaterThan(at('**How much**'));
  });

  it('writes the JSON report, summary markdown, SARIF, HTML and terminal text for each change', () => {
    for (const c of DEMO_CHANGES) {
      const md = readFileSync(path.join(out, `${c.id}.summary.md`), 'utf8');
      expect(md.length).toBeGreaterThan(200);
      const sarif = JSON.parse(readFileSync(path.join(out, `${c.id}.sarif`), 'utf8')) as {
        version: string;
        runs: unknown[];
      };
      expect(sarif.version).toBe('2.1.0');
      const html = readFileSync(path.join(out, `${c.id}.html`), 'utf8');
      expect(html).toContain('<svg');
      expect(html).not.toMatch(/<script/i);
      const text = readFileSync(path.join(out, `${c.id}.txt`), 'utf8');
      expect(text).toMatch(/^(\u25A0 netbrace blocks this merge: |\u25A1 netbrace: no design )/);
      expect(text).not.toMatch(/\u001b\[/);
    }
  });
});

/** The head design of a change: the base with the change's patch applied by git. */
function headText(change: string): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'nb-demo-head-'));
  try {
    mkdirSync(path.join(dir, 'designs'));
    copyFileSync(
      path.join(repoRoot, 'fixtures', 'demo', 'base', 'designs', 'lunmere-backbone.net.yaml'),
      path.join(dir, 'designs', 'lunmere-backbone.net.yaml'),
    );
    execFileSync('git', ['apply', path.join(repoRoot, 'fixtures', 'demo', 'changes', `${change}.patch`)], { cwd: dir });
    return readFileSync(path.join(dir, 'designs', 'lunmere-backbone.net.yaml'), 'utf8');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
