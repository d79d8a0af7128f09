// How `netbrace check` with the built-in policy scales: seeded Barabási–Albert designs (2
// links per new node) of n = 250, 1,000, 4,000 and 10,000 nodes (100,000 with
// NETBRACE_BENCH_LARGE=1; other sizes with NETBRACE_SCALING_SIZES=250,1000), each in a
// temporary git repository whose head removes three links from the base — the gate's job on a
// small change. One thread, the whole process as a user runs it (bundled as it ships). The
// table: wall time, the realizations the envelopes used (head; "cut" when the budget reduced
// them), the verdict, peak RSS, and the log-log slope of time over n (least squares over the
// sizes that finished). A run is stopped after NETBRACE_BENCH_TIMEOUT seconds (default 300)
// and shown as "> limit"; slopes then use the finished sizes only.
// No peer: no library runs this job. Target (in the issue): 10,000 nodes decided within the
// default budget on one core; the table itself is what the README shows.
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { STARTER_POLICY } from '../../src/policy/defaults.js';
import { barabasiAlbert, bundleCli, designYaml, runProcess, tempDir } from './bench-util.js';

const sizes = process.env.NETBRACE_SCALING_SIZES
  ? process.env.NETBRACE_SCALING_SIZES.split(',').map(Number)
  : [250, 1000, 4000, 10_000, ...(process.env.NETBRACE_BENCH_LARGE ? [100_000] : [])];
const limit = Number(process.env.NETBRACE_BENCH_TIMEOUT ?? 300);
// A run on more threads, or with a larger budget than the built-in one (a policy that is the
// starter text with `budget: seconds` replaced), e.g. for 100,000 sites on a 4-core runner.
const threads = process.env.NETBRACE_SCALING_THREADS ?? '1';
const budgetSeconds = process.env.NETBRACE_SCALING_BUDGET;
const dir = tempDir();
const cli = await bundleCli(dir);
const git = (cwd: string, ...args: string[]) => execFileSync('git', args, { cwd, stdio: 'pipe' });

interface Row {
  n: number;
  seconds: number;
  timedOut: boolean;
  rss: number;
  realizations: string;
  verdict: string;
  unsettled: string;
  mend: string;
}
const rows: Row[] = [];
for (const n of sizes) {
  const repoDir = path.join(dir, `n${n}`);
  mkdirSync(repoDir);
  git(repoDir, 'init', '-q');
  git(repoDir, 'config', 'user.email', 'bench@example.invalid');
  git(repoDir, 'config', 'user.name', 'bench');
  const edges = barabasiAlbert(n, 2, n);
  writeFileSync(path.join(repoDir, 'core.net.yaml'), designYaml(n, edges, `scaling ${n}`));
  if (budgetSeconds)
    writeFileSync(
      path.join(repoDir, '.netbrace.yaml'),
      STARTER_POLICY.replace(/^ {2}seconds: 60\b.*$/m, `  seconds: ${Number(budgetSeconds)}`),
    );
  git(repoDir, 'add', '.');
  git(repoDir, 'commit', '-qm', 'base');
  // The head: three links removed, spread over the design (never the seed clique's).
  const cut = new Set([
    Math.floor(edges.length * 0.25),
    Math.floor(edges.length * 0.5),
    Math.floor(edges.length * 0.75),
  ]);
  writeFileSync(
    path.join(repoDir, 'core.net.yaml'),
    designYaml(
      n,
      edges.filter((_, i) => !cut.has(i)),
      `scaling ${n}`,
    ),
  );
  const report = path.join(repoDir, 'report.json');
  const run = runProcess(
    process.execPath,
    [cli, 'check', '--threads', threads, '--mode', 'inform', '--json', report],
    repoDir,
    limit * 1000,
  );
  let realizations = '–';
  let verdict = run.timedOut ? 'stopped' : 'error';
  let unsettled = '–';
  let mend = '–';
  if (!run.timedOut && run.status === 0) {
    const r = JSON.parse(readFileSync(report, 'utf8')) as {
      verdict?: string;
      files: {
        status?: string;
        head?: { envelopes?: { realizations: number }[]; degraded?: unknown[] };
        requirements: { status: string }[];
        mend?: { evaluations: number };
      }[];
    };
    const f = r.files[0];
    unsettled = String(f.requirements.filter((q) => q.status === 'unsettled').length);
    mend = String(f.mend?.evaluations ?? 0);
    const counts = (f.head?.envelopes ?? []).map((e) => e.realizations);
    realizations = counts.length ? `${counts.join('/')}${(f.head?.degraded ?? []).length ? ' (cut)' : ''}` : 'none';
    verdict = `${r.verdict ?? '?'}, ${f.status ?? '?'}`;
  }
  rows.push({
    n,
    seconds: run.seconds,
    timedOut: run.timedOut,
    rss: run.maxRssMb,
    realizations,
    verdict,
    unsettled,
    mend,
  });
  console.log(`n = ${n}: ${run.timedOut ? `> ${limit} s` : `${run.seconds.toFixed(1)} s`}`);
  rmSync(repoDir, { recursive: true, force: true });
}
rmSync(dir, { recursive: true, force: true });

const done = rows.filter((r) => !r.timedOut && r.verdict !== 'error');
let slope = Number.NaN;
if (done.length >= 2) {
  const xs = done.map((r) => Math.log(r.n));
  const ys = done.map((r) => Math.log(r.seconds));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  slope = xs.reduce((a, x, i) => a + (x - mx) * (ys[i] - my), 0) / xs.reduce((a, x) => a + (x - mx) ** 2, 0);
}
console.log(
  `\nthreads ${threads}, budget ${budgetSeconds ? `${budgetSeconds} s (policy)` : 'built-in (60 s)'}; mend: evaluations of mended designs included in the time`,
);
console.log('| nodes | time | realizations (head envelopes) | verdict, status | unsettled | mend | peak RSS |');
console.log('|---:|---:|---|---|---:|---:|---:|');
for (const r of rows) {
  console.log(
    `| ${r.n.toLocaleString('en')} | ${r.timedOut ? `> ${limit} s` : `${r.seconds.toFixed(1)} s`} | ${r.realizations} | ${r.verdict} | ${r.unsettled} | ${r.mend} | ${Number.isFinite(r.rss) ? `${r.rss.toFixed(0)} MB` : '–'} |`,
  );
}
console.log(
  `\nlog-log slope of time over n: ${Number.isFinite(slope) ? slope.toFixed(2) : 'n/a'} (over ${done.length} finished sizes)`,
);
const ten = rows.find((r) => r.n === 10_000);
if (ten) {
  const decided =
    !ten.timedOut && ten.verdict !== 'error' && ten.unsettled === '0' && !ten.realizations.includes('cut');
  console.log(
    `${decided ? 'met   ' : 'MISSED'}  10,000 nodes decided within the default budget on one core (no work cut, nothing unsettled): ${ten.timedOut ? `stopped after ${limit} s` : `${ten.seconds.toFixed(1)} s, ${ten.realizations}, ${ten.unsettled} unsettled`}`,
  );
}
const large = rows.find((r) => r.n === 100_000);
if (large) {
  const decided = !large.timedOut && large.verdict !== 'error' && large.unsettled === '0';
  console.log(
    `${decided && large.seconds <= 600 ? 'met   ' : 'MISSED'}  100,000 nodes within 10 minutes (${threads} threads): ${large.timedOut ? `stopped after ${limit} s` : `${large.seconds.toFixed(1)} s, ${large.realizations}, ${large.unsettled} unsettled`}`,
  );
}
