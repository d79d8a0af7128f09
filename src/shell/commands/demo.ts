// `netbrace demo [--out DIR]`: the whole check on the invented scenario in fixtures/demo/.
// Builds a scratch git repository, commits the base design and the policy, commits each
// proposed change on its own branch, runs `netbrace check` on each exactly as a user would
// (the same command through the same runCommand), prints the terminal report, and writes the
// JSON report, summary markdown, SARIF and HTML of each change into one folder.

import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { devNull, tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs } from '../args.js';
import { runCommand } from '../run-command.js';
import { checkCommand } from './check.js';
import { UsageError } from '../../errors.js';
import type { Report } from '../../report/report.js';

export interface DemoChange {
  /** Branch and file stem: "1-retire-east-chord". */
  id: string;
  title: string;
  /** The patch in fixtures/demo/changes/. */
  patch: string;
  /** What the gate should say: fail; pass; pass with a warning. */
  expect: 'fail' | 'pass' | 'warn';
}

export const DEMO_CHANGES: readonly DemoChange[] = [
  {
    id: '1-retire-east-chord',
    title: 'Cost saving: retire the Kaskeld\u2013Fenwhistle chord and the leased Ibberlin\u2013Tarnquist span',
    patch: '1-retire-east-chord.patch',
    expect: 'fail',
  },
  {
    id: '2-close-west-ring',
    title: 'New link Culvenbrae\u2013Pellorin closes the west chain into a ring',
    patch: '2-close-west-ring.patch',
    expect: 'pass',
  },
  {
    id: '3-saltmarrow-spur',
    title: 'New harbour site Saltmarrow on a spur from Gantrevel (two fibres, one duct)',
    patch: '3-saltmarrow-spur.patch',
    expect: 'warn',
  },
];

export const DEMO_DESIGN = 'designs/lunmere-backbone.net.yaml';

/** The fixtures folder, found upwards from this module (src/shell/commands/ or dist/). */
export function findDemoFixtures(from = path.dirname(fileURLToPath(import.meta.url))): string {
  let dir = from;
  for (let i = 0; i < 6; i++) {
    const candidate = path.join(dir, 'fixtures', 'demo');
    if (existsSync(path.join(candidate, 'base', DEMO_DESIGN))) return candidate;
    const up = path.dirname(dir);
    if (up === dir) break;
    dir = up;
  }
  throw new UsageError(
    'the demo scenario (fixtures/demo/) is not where netbrace expects it',
    'run the demo from a netbrace checkout or an installed package',
  );
}

export interface DemoOutcome {
  change: DemoChange;
  exitCode: number;
  verdict: Report['verdict'] | 'error';
  warnings: number;
  files: { json: string; markdown: string; sarif: string; html: string; text: string };
  asExpected: boolean;
}

/** Git with a fixed identity and dates (same commits, same ids, every run) and no user config. */
function gitRunner(repo: string, env: CommandIO['env']) {
  const gitEnv: NodeJS.ProcessEnv = {};
  for (const [k, v] of Object.entries(env)) if (v !== undefined && !k.startsWith('GIT_')) gitEnv[k] = v;
  Object.assign(gitEnv, {
    GIT_CONFIG_NOSYSTEM: '1',
    GIT_CONFIG_GLOBAL: devNull,
    GIT_AUTHOR_NAME: 'Tidewater Lantern planning',
    GIT_AUTHOR_EMAIL: 'planning@tidewater-lantern.invalid',
    GIT_COMMITTER_NAME: 'Tidewater Lantern planning',
    GIT_COMMITTER_EMAIL: 'planning@tidewater-lantern.invalid',
    GIT_AUTHOR_DATE: '2026-03-02T09:00:00+00:00',
    GIT_COMMITTER_DATE: '2026-03-02T09:00:00+00:00',
  });
  return (...args: string[]) =>
    execFileSync('git', args, { cwd: repo, env: gitEnv, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] }).trim();
}

function judge(report: Report): { verdict: Report['verdict']; warnings: number } {
  const warnings = report.files.reduce((n, f) => n + f.findings.filter((x) => x.severity === 'warn').length, 0);
  return { verdict: report.verdict, warnings };
}

function matches(expect: DemoChange['expect'], verdict: DemoOutcome['verdict'], warnings: number): boolean {
  if (expect === 'fail') return verdict === 'fail';
  if (expect === 'pass') return verdict === 'pass' && warnings === 0;
  return verdict === 'pass' && warnings > 0;
}

const EXPECT_WORD = { fail: 'FAIL', pass: 'PASS', warn: 'PASS with a warning' } as const;

export interface DemoOptions {
  out: string;
  keep: boolean;
  fixtures?: string;
}

export async function runDemo(
  io: CommandIO,
  options: DemoOptions,
): Promise<{ outcomes: DemoOutcome[]; repo: string; out: string }> {
  const fixtures = options.fixtures ?? findDemoFixtures();
  const out = path.resolve(io.cwd, options.out);
  mkdirSync(out, { recursive: true });
  const repo = mkdtempSync(path.join(tmpdir(), 'netbrace-demo-'));
  const outcomes: DemoOutcome[] = [];
  try {
    const git = gitRunner(repo, io.env);
    git('init', '-q');
    git('symbolic-ref', 'HEAD', 'refs/heads/main');
    mkdirSync(path.join(repo, 'designs'), { recursive: true });
    copyFileSync(path.join(fixtures, 'base', DEMO_DESIGN), path.join(repo, DEMO_DESIGN));
    copyFileSync(path.join(fixtures, 'policy.yaml'), path.join(repo, '.netbrace.yaml'));
    writeFileSync(
      path.join(repo, 'README.md'),
      '# Lunmere Basin backbone (invented)\n\nScratch repository written by `netbrace demo`. Every name and number is made up.\n',
    );
    git('add', '-A');
    git('commit', '-q', '-m', 'Lunmere Basin backbone as built, with the robustness policy');
    io.stdout(`netbrace demo: scratch repository ${repo}\n`);
    io.stdout(`  main: ${git('log', '-1', '--format=%h %s')}\n`);

    for (const [i, change] of DEMO_CHANGES.entries()) {
      const branch = `change/${change.id}`;
      git('checkout', '-q', '-b', branch, 'main');
      git('apply', '--whitespace=nowarn', path.join(fixtures, 'changes', change.patch));
      git('commit', '-q', '-a', '-m', change.title);
      const files = {
        json: path.join(out, `${change.id}.report.json`),
        markdown: path.join(out, `${change.id}.summary.md`),
        sarif: path.join(out, `${change.id}.sarif`),
        html: path.join(out, `${change.id}.html`),
        text: path.join(out, `${change.id}.txt`),
      };
      const args = [
        '--base',
        'main',
        '--head',
        branch,
        '--json',
        files.json,
        '--summary',
        files.markdown,
        '--sarif',
        files.sarif,
        '--html',
        files.html,
      ];
      io.stdout(`\n\u2500\u2500 Change ${i + 1} of ${DEMO_CHANGES.length}: ${change.title}\n`);
      io.stdout(`   ${branch}: ${git('log', '-1', '--format=%h')} \u00b7 expected: ${EXPECT_WORD[change.expect]}\n`);
      const rel = (a: string) => {
        const r = path.relative(io.cwd, a);
        return r && !r.startsWith('..') && !path.isAbsolute(r) ? r : a;
      };
      const shown = args.map((a) => (a.startsWith(out) ? rel(a) : a));
      io.stdout(`$ netbrace check ${shown.join(' ')}\n\n`);
      const printed: string[] = [];
      const childIO: CommandIO = {
        ...io,
        cwd: repo,
        stdout: (t) => {
          printed.push(t);
          io.stdout(t);
        },
      };
      const exitCode = await runCommand(checkCommand, args, childIO);
      writeFileSync(files.text, printed.join('').replace(/\u001b\[[0-9;]*m/g, ''));
      let verdict: DemoOutcome['verdict'] = 'error';
      let warnings = 0;
      if (existsSync(files.json))
        ({ verdict, warnings } = judge(JSON.parse(readFileSync(files.json, 'utf8')) as Report));
      git('checkout', '-q', 'main');
      outcomes.push({
        change,
        exitCode,
        verdict,
        warnings,
        files,
        asExpected: exitCode !== 2 && matches(change.expect, verdict, warnings),
      });
    }
  } finally {
    if (!options.keep) rmSync(repo, { recursive: true, force: true });
  }
  return { outcomes, repo, out };
}

function summaryLines(outcomes: DemoOutcome[]): string[] {
  return outcomes.map((o, i) => {
    const said =
      o.verdict === 'error'
        ? 'no report'
        : o.verdict === 'fail'
          ? 'FAIL'
          : o.warnings > 0
            ? `PASS with ${o.warnings} warning${o.warnings === 1 ? '' : 's'}`
            : 'PASS';
    const mark = o.asExpected ? '\u2713' : '\u2717';
    return `  ${mark} ${i + 1}. ${o.change.id.padEnd(22)} ${said.padEnd(22)} (expected ${EXPECT_WORD[o.change.expect]}, exit ${o.exitCode})`;
  });
}

const HELP = `Usage: netbrace demo [--out DIR] [--keep]

Runs the whole check on an invented example: the Lunmere Basin backbone of Tidewater
Lantern Networks (50 sites, 82 links, 8 shared ducts, 47 traffic demands; every name and
number is made up). The demo builds a scratch git repository, commits the base design and
the policy (.netbrace.yaml), commits three proposed changes on their own branches, and runs
"netbrace check --base main --head <branch>" on each, exactly as you would:

  1. cost saving: retire a chord and a leased span; the east loop becomes two chains  -> FAIL
  2. a new link closes the west chain into a ring                                      -> PASS
  3. a new site on a spur whose two fibres share one duct: a new cut node              -> PASS, warning

It prints each terminal report and writes, per change, the JSON report, the summary
markdown, SARIF, the HTML report and the terminal text into one folder.

Options:
  --out DIR   where the reports go (default .netbrace-out/demo in the working directory)
  --keep      keep the scratch repository (its path is printed) to try more commands in it

Examples:
  netbrace demo
  netbrace demo --out /tmp/netbrace-demo --keep
  npm run demo

Exit codes:
  0  the three changes were judged as the scenario intends
  1  a change was judged otherwise (the summary says which)
  2  usage error, or the scenario could not be set up (git missing, fixtures not found)
`;

export const demoCommand: Command = {
  name: 'demo',
  summary: 'run the check on an invented backbone and three proposed changes; write all reports',
  help: HELP,
  async run(args: string[], io: CommandIO): Promise<number> {
    const parsed = parseCommandArgs('demo', args, { out: { type: 'string' }, keep: { type: 'boolean' } }, false);
    const out = parsed.values.out ?? path.join('.netbrace-out', 'demo');
    let result;
    try {
      result = await runDemo(io, { out, keep: parsed.values.keep ?? false });
    } catch (e) {
      const err = e as NodeJS.ErrnoException & { stderr?: string };
      if (err.code === 'ENOENT' && /git/.test(String(err.path ?? err.message))) {
        throw new UsageError('the demo needs git on the PATH', 'install git and run it again');
      }
      if (err.stderr !== undefined)
        throw new UsageError(`git failed while setting up the demo: ${String(err.stderr).trim()}`);
      throw e;
    }
    const { outcomes, repo, out: dir } = result;
    io.stdout(`\nDemo summary\n${summaryLines(outcomes).join('\n')}\n`);
    io.stdout(`\nReports written to ${dir}\n`);
    for (const o of outcomes)
      io.stdout(
        `  ${path.basename(o.files.html)}  ${path.basename(o.files.json)}  ${path.basename(o.files.markdown)}  ${path.basename(o.files.sarif)}\n`,
      );
    if (parsed.values.keep) io.stdout(`Scratch repository kept at ${repo}\n`);
    if (outcomes.some((o) => o.exitCode === 2)) return 2;
    return outcomes.every((o) => o.asExpected) ? 0 : 1;
  },
};
