// `netbrace check`: the robustness check on the command line. Finds the design files that changed between
// two revisions (or takes the given paths), evaluates both sides under the policy, prints the
// verdict and writes the report files. The same runGate the GitHub Action calls.

import { mkdir, readFile, readdir, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { UsageError } from '../../errors.js';
import { threadedGate } from '../../parallel/pool.js';
import { renderHtml } from '../../report/html.js';
import { renderSummary } from '../../report/markdown.js';
import { serializeReport, type Report } from '../../report/report.js';
import { renderSarif } from '../../report/sarif.js';
import { renderTerminal } from '../../report/terminal.js';
import { runGate, type GateDeps, type GateRequest } from '../../run-gate.js';
import { colorEnabled, terminalWidth } from '../color.js';
import { gitDeps, mergeBase, repoRoot, resolveCommit, revParse } from '../git.js';
import type { Command, CommandIO } from '../io.js';
import { readInside } from '../workspace.js';
import { choice, parseCommandArgs, sharedOption } from '../args.js';
import { MODE, PART, SEED, THREADS } from '../common-options.js';
import { upgradeReport } from '../../gate/join.js';
import { joinInput } from '../../gate/split.js';

const HELP = `Usage: netbrace check [options] [PATH...]

Judge network designs against the policy: every design file that changed between two
revisions (or the PATHs given), at the head and at the base, with the same rules the
GitHub Action applies. A design deleted and added again under another file (a change of
format, say) is judged as renamed: paired by its network name, else by its base name in the
same directory. A PATH that exists at neither side is a usage error.

Revisions:
  --base REF             compare with REF (default: HEAD for --worktree, else the head's
                         parent); with a branch, from where the head's history left it
  --head REF             judge the commit REF
  --worktree             judge the files on disk (the default when --head is not given)

Policy:
  --policy FILE          the policy file (default .netbrace.yaml at the repository root;
                         without one the built-in policy applies)
  --org-policy FILE      the organisation's policy (e.g. a second checkout) that the
                         repository's policy must inherit and may only tighten
  --policy-source SIDE   base (default): read the policy at the base, so a change cannot
                         loosen the rules that judge it; head: the policy of the head

Evaluation:
  --seed S               seed of the random challenges (default: the policy's)
  --threads N            worker threads (results do not depend on N)
  --mode MODE            block (default): exit 1 when the check fails; inform: exit 0
  --part K/N             judge only slice K of N of the designs (by path hash); a large
                         design is split by realizations across all N parts instead
  --join REPORT          join part reports (files or folders of *.json; repeat the option)
                         into the report of one run: give the options the parts ran with

Output:
  --format FORMAT        text (default), markdown or json, on standard output
  --json FILE            write the JSON report
  --summary FILE         write the Markdown summary
  --html FILE            write the HTML report
  --sarif FILE           write SARIF 2.1.0 for code scanning

Examples:
  netbrace check                          designs changed in the working tree since HEAD
  netbrace check --base main              what this branch changes, as a pull request would
  netbrace check --head HEAD --json r.json   the last commit, report to r.json
  netbrace check networks/core.net.yaml   one design, against HEAD

netbrace informs engineering judgement; it does not replace engineering studies.

Exit codes:
  0  pass (or nothing to judge, or --mode inform)
  1  the check failed: a design weakened or fell short of a floor, or could not be read
  2  usage or configuration error (bad option, broken policy); nothing was evaluated;
     or a report file (--json, --summary, --html, --sarif) could not be written, after
     the verdict was printed
`;

const OPTIONS = {
  base: { type: 'string' },
  head: { type: 'string' },
  worktree: { type: 'boolean' },
  policy: { type: 'string' },
  'org-policy': { type: 'string' },
  'policy-source': { type: 'string' },
  seed: { type: 'string' },
  threads: { type: 'string' },
  mode: { type: 'string' },
  part: { type: 'string' },
  join: { type: 'string', multiple: true },
  format: { type: 'string' },
  json: { type: 'string' },
  summary: { type: 'string' },
  html: { type: 'string' },
  sarif: { type: 'string' },
} as const;

type Values = ReturnType<typeof parse>['values'];

function parse(args: string[]) {
  return parseCommandArgs('check', args, OPTIONS);
}

/** A path the user typed (relative to where they are) as a repository path. */
function repoPath(root: string, cwd: string, p: string): string {
  const rel = path.relative(root, path.resolve(cwd, p));
  if (rel === '' || rel.startsWith('..') || path.isAbsolute(rel))
    throw new UsageError(`${p} is not inside the repository`);
  return rel.split(path.sep).join('/');
}

/** The part reports named by --join (files, or the *.json files of folders), checked as reports. */
async function readReports(given: string[], io: CommandIO): Promise<Report[]> {
  const files: string[] = [];
  for (const g of given) {
    const full = path.resolve(io.cwd, g);
    let isDir: boolean;
    try {
      isDir = (await stat(full)).isDirectory();
    } catch {
      throw new UsageError(
        `${g}: no such part report`,
        'give the JSON reports the parts wrote (--json), or their folder',
      );
    }
    if (!isDir) files.push(g);
    else
      for (const name of (await readdir(full)).filter((n) => n.endsWith('.json')).sort())
        files.push(path.join(g, name));
  }
  const reports: Report[] = [];
  for (const f of files) {
    let value: unknown;
    try {
      value = JSON.parse(await readFile(path.resolve(io.cwd, f), 'utf8'));
    } catch {
      throw new UsageError(`${f}: not a JSON report`, 'give the JSON reports the parts wrote (--json)');
    }
    reports.push(upgradeReport(value, f));
  }
  return reports;
}

/** Readers for designs outside any git repository: the files on disk, no base. */
function plainDeps(cwd: string): Pick<GateDeps, 'listChanged' | 'readAt' | 'listAll'> {
  return {
    listChanged: () => [],
    listAll: () => [],
    // Inside the directory netbrace runs in, links included (workspace.ts), as in a repository.
    readAt: (_rev, file) => readInside(cwd, file),
  };
}

async function buildRequest(
  v: Values,
  positionals: string[],
  io: CommandIO,
): Promise<{ request: GateRequest; deps: GateDeps }> {
  if (v.head !== undefined && v.worktree)
    throw new UsageError('--head and --worktree exclude each other', 'judge a commit or the files on disk');
  const threads = sharedOption('--threads', v.threads, THREADS);
  const request: GateRequest = {
    policySource: choice('--policy-source', v['policy-source'], ['base', 'head'] as const, 'base'),
    mode: sharedOption('--mode', v.mode, MODE) ?? 'block',
    eventKind: 'local',
  };
  const seed = sharedOption('--seed', v.seed, SEED);
  if (seed !== undefined) request.seed = seed;
  if (threads !== undefined) request.threads = threads;
  const part = sharedOption('--part', v.part, PART, 'e.g. --part 2/4');
  if (part) request.part = part;
  if (v.join !== undefined) {
    if (part)
      throw new UsageError('--part and --join exclude each other', 'join in a job of its own, after every part');
    request.join = joinInput(await readReports(v.join, io));
  }
  const threaded = threadedGate(threads);

  const root = await repoRoot(io.cwd);
  if (root === null) {
    if (positionals.length === 0)
      throw new UsageError('this is not a git repository', 'give the design files to judge as paths');
    if (v.base !== undefined || v.head !== undefined) throw new UsageError('--base and --head need a git repository');
    request.worktree = true;
    request.paths = positionals.map((p) => path.relative(io.cwd, path.resolve(io.cwd, p)).split(path.sep).join('/'));
    if (v.policy !== undefined)
      request.policyPath = path.relative(io.cwd, path.resolve(io.cwd, v.policy)).split(path.sep).join('/');
    return { request, deps: { ...plainDeps(io.cwd), ...threaded } };
  }

  const worktree = v.head === undefined;
  let head: string | undefined;
  if (worktree) request.worktree = true;
  else request.head = head = await resolveCommit(root, v.head!);
  if (v.base !== undefined) {
    const b = await resolveCommit(root, v.base);
    const from = head ?? (await revParse(root, 'HEAD'));
    // What the head changes since its history left the base, as a pull request shows it.
    request.base = (from && (await mergeBase(root, b, from))) ?? b;
  } else {
    const b = worktree ? await revParse(root, 'HEAD') : await revParse(root, `${head}^`);
    if (b) request.base = b;
  }
  if (positionals.length > 0) request.paths = positionals.map((p) => repoPath(root, io.cwd, p));
  if (v.policy !== undefined) request.policyPath = repoPath(root, io.cwd, v.policy);
  if (v['org-policy'] !== undefined) request.orgPolicyPath = repoPath(root, io.cwd, v['org-policy']);
  return { request, deps: { ...gitDeps(root), ...threaded } };
}

/**
 * Create the missing directories of `dir` one level at a time. Not mkdir's `recursive`: under
 * a pseudo file system such as /proc it retries ENOENT for ever instead of failing.
 */
async function ensureDirectory(dir: string): Promise<void> {
  const missing: string[] = [];
  for (let d = dir; ; d = path.dirname(d)) {
    try {
      if (!(await stat(d)).isDirectory())
        throw Object.assign(new Error(`${d} is not a directory`), { code: 'ENOTDIR' });
      break;
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'ENOENT' || path.dirname(d) === d) throw e;
      missing.push(d);
    }
  }
  for (const d of missing.reverse()) {
    try {
      await mkdir(d);
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw e;
    }
  }
}

const WRITE_PROBLEM: Record<string, string> = {
  ENOENT: 'its directory does not exist and cannot be created',
  ENOTDIR: 'a part of the path is not a directory',
  EISDIR: 'it is a directory',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EROFS: 'the file system is read-only',
  ENOSPC: 'no space left on the device',
  EIO: 'the file system refused the write',
};

/** Write one output file; a failure is a located message (the file the user named), never a stack trace. */
async function writeOut(io: CommandIO, option: string, file: string, text: string): Promise<string | undefined> {
  const full = path.resolve(io.cwd, file);
  try {
    await ensureDirectory(path.dirname(full));
    await writeFile(full, text);
    return undefined;
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code ?? '';
    const why = WRITE_PROBLEM[code] ?? (e instanceof Error ? e.message : String(e));
    // `file: message — hint`: the place to fix is the path itself, which has no line.
    return `${file}: cannot write the ${option} report: ${why}${code ? ` (${code})` : ''} \u2014 give ${option} a file in a writable directory`;
  }
}

/** Every requested report file; each one that cannot be written is one message (the others are still written). */
async function writeReports(v: Values, report: Report, io: CommandIO): Promise<string[]> {
  const outputs: [string, string | undefined, () => string][] = [
    ['--json', v.json, () => serializeReport(report)],
    ['--summary', v.summary, () => renderSummary(report)],
    ['--html', v.html, () => renderHtml(report)],
    ['--sarif', v.sarif, () => `${JSON.stringify(renderSarif(report), null, 2)}\n`],
  ];
  const problems: string[] = [];
  for (const [option, file, render] of outputs) {
    if (file === undefined) continue;
    const problem = await writeOut(io, option, file, render());
    if (problem) problems.push(problem);
  }
  return problems;
}

async function run(args: string[], io: CommandIO): Promise<number> {
  const { values, positionals } = parse(args);
  const format = choice('--format', values.format, ['text', 'markdown', 'json'] as const, 'text');
  const { request, deps } = await buildRequest(values, positionals, io);
  const { report, exitCode } = await runGate(request, deps);
  // The verdict first: a report file that cannot be written must not hide it.
  if (format === 'json') io.stdout(serializeReport(report));
  else if (format === 'markdown') io.stdout(renderSummary(report));
  else io.stdout(renderTerminal(report, { color: colorEnabled(io), width: terminalWidth(io) }));
  const problems = await writeReports(values, report, io);
  for (const p of problems) io.stderr(`${p}\n`);
  return problems.length ? 2 : exitCode;
}

export const checkCommand: Command = {
  name: 'check',
  summary: 'judge the designs a change touches against the policy',
  help: HELP,
  run,
};
