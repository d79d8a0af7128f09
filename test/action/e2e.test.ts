// The bundled Action, run as the runner runs it (see harness.ts), with the inputs of the
// README's workflows, in temporary git repositories with real base and head commits, against
// a loopback stand-in for the REST API. One scenario per behaviour the issue names: pass, fail,
// inform, fork, shallow clone, API down, rate limit, API hanging, parts joined, push, schedule,
// nothing changed.

import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, existsSync, writeFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { parse as parseYaml } from 'yaml';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { commentMarker } from '../../src/report/markdown.js';
import { workflowText } from '../../src/policy/workflow-template.js';
import type { Report } from '../../src/report/report.js';
import { inPart } from '../../src/run-gate.js';
import { startFakeApi, type FakeApi } from './fake-api.js';
import { execFileSync } from 'node:child_process';
import {
  actionDefaults,
  actionNode,
  buildBundle,
  commands,
  commit,
  git,
  netbraceInputs,
  readmeWorkflow,
  repoRoot,
  runAction,
  type RunResult,
} from './harness.js';

// ---------------------------------------------------------------------------------------------
// Invented designs: a ring of eight sites (every site has two ways out), the same ring with one
// span retired (a chain: every link a bridge, every inner site a cut node), and the ring with
// a chord added. The policy is small so that each run takes well under a second.

const SITES = ['harbour', 'mill', 'quarry', 'ridge', 'weir', 'orchard', 'moor', 'ferry'];

function ring(extra: [string, string][] = [], drop?: [string, string]): string {
  const links: [string, string][] = SITES.map((s, i) => [s, SITES[(i + 1) % SITES.length]]);
  const kept = links.filter(([a, b]) => !(drop && a === drop[0] && b === drop[1]));
  return [
    '# Invented eight-site ring for the Action tests.',
    'network:',
    '  name: Test ring',
    'nodes:',
    ...SITES.map((s) => `  - id: ${s}`),
    'links:',
    ...[...kept, ...extra].map(([a, b]) => `  - between: [${a}, ${b}]`),
    '',
  ].join('\n');
}

const POLICY = `# Policy of the Action tests (invented): random node failures, no new single points of failure.
seed: 1
r-value:
  metrics:
    pair_connectivity: 1
    efficiency: 1
challenges:
  node-failures:
    remove: nodes
    until: 0.5
    points: 6
    realizations: 40
requirements:
  - kind: no-new-spof
  - kind: area-floor
    challenge: node-failures
weakening:
  allowed-drop: 0.05
  error-multiple: 2
`;

const TOKEN = 'ghs_test_token';
const DESIGN = 'nets/ring.net.yaml';
/** Line of the ferry-harbour link in ring(): header 4 lines + 8 nodes + "links:" + 8th link. */
const CHAIN_DROP: [string, string] = ['ferry', 'harbour'];

interface Scenario {
  root: string;
  origin: string;
  base: string;
  fail: string;
  pass: string;
  readme: string;
  parts: string;
}

let scenario: Scenario;
let api: FakeApi;
let work: string;

const SARIF_SCHEMA = (() => {
  const require = createRequire(import.meta.url);
  return require.resolve('@microsoft/jest-sarif/lib/schemas/sarif-2.1.0-rtm.5.json');
})();

async function sarifValidator() {
  const require = createRequire(import.meta.url);
  const Ajv = require('ajv-draft-04').default as typeof import('ajv-draft-04').default;
  const ajv = new Ajv({ allErrors: true, strict: false, unicodeRegExp: false, validateFormats: false });
  return ajv.compile(JSON.parse(await readFile(SARIF_SCHEMA, 'utf8')));
}

let bundleFile = '';

beforeAll(() => {
  bundleFile = buildBundle();
  expect(readdirSync(path.dirname(bundleFile))).toEqual(expect.arrayContaining(['index.js', 'worker.js']));
  const root = mkdtempSync(path.join(tmpdir(), 'nb-e2e-'));
  const author = path.join(root, 'author');
  const origin = path.join(root, 'origin.git');
  git(root, 'init', '-q', '--bare', origin);
  // Let a shallow clone fetch one commit by id, as GitHub does.
  git(origin, 'config', 'uploadpack.allowAnySHA1InWant', 'true');
  git(root, 'init', '-q', '-b', 'main', author);
  const base = commit(author, 'base: ring and policy', {
    '.netbrace.yaml': POLICY,
    [DESIGN]: ring(),
    'nets/metro-a.net.yaml': ring([['harbour', 'weir']]),
    'nets/metro-b.net.yaml': ring([['mill', 'orchard']]),
    'nets/metro-c.net.yaml': ring([['quarry', 'moor']]),
    'README.md': 'designs\n',
  });
  git(author, 'push', '-q', origin, 'main');
  git(author, 'checkout', '-q', '-b', 'retire-span');
  const fail = commit(author, 'retire the ferry-harbour span', { [DESIGN]: ring([], CHAIN_DROP) });
  git(author, 'checkout', '-q', '--detach', base);
  const pass = commit(author, 'add a chord', { [DESIGN]: ring([['harbour', 'ridge']]) });
  git(author, 'checkout', '-q', '--detach', base);
  const readme = commit(author, 'docs only', { 'README.md': 'designs, documented\n' });
  git(author, 'checkout', '-q', '--detach', base);
  const parts = commit(author, 'retire one span in every design', {
    [DESIGN]: ring([], CHAIN_DROP),
    'nets/metro-a.net.yaml': ring([
      ['harbour', 'weir'],
      ['mill', 'moor'],
    ]),
    'nets/metro-b.net.yaml': ring([
      ['mill', 'orchard'],
      ['quarry', 'ferry'],
    ]),
    'nets/metro-c.net.yaml': ring([['quarry', 'moor']], CHAIN_DROP),
  });
  for (const [name, sha] of Object.entries({ fail, pass, readme, parts }))
    git(author, 'push', '-q', origin, `${sha}:refs/heads/${name}`);
  scenario = { root, origin, base, fail, pass, readme, parts };
}, 120_000);

afterAll(() => {
  if (scenario) rmSync(scenario.root, { recursive: true, force: true });
  if (bundleFile) rmSync(path.dirname(path.dirname(bundleFile)), { recursive: true, force: true });
});

beforeEach(async () => {
  api = await startFakeApi();
  work = mkdtempSync(path.join(scenario.root, 'job-'));
});
afterEach(async () => {
  await api.close();
});

/** A workspace as actions/checkout leaves it: a clone of the origin at `sha` (shallow by default, like checkout). */
function checkout(sha: string, opts: { shallow?: boolean; branch?: string } = {}): string {
  const ws = path.join(work, 'workspace');
  const branch = opts.branch ?? Object.entries(scenario).find(([, v]) => v === sha)?.[0] ?? 'main';
  const ref = branch === 'base' ? 'main' : branch;
  if (opts.shallow === false) git(work, 'clone', '-q', `file://${scenario.origin}`, ws);
  else git(work, 'clone', '-q', '--depth=1', '--branch', ref, `file://${scenario.origin}`, ws);
  git(ws, 'checkout', '-q', '--detach', sha);
  return ws;
}

function prEvent(base: string, head: string, fork = false) {
  return {
    number: 7,
    pull_request: {
      number: 7,
      base: { sha: base, ref: 'main', repo: { full_name: 'acme/backbone' } },
      head: { sha: head, ref: 'topic', repo: { full_name: fork ? 'outsider/backbone' : 'acme/backbone', fork } },
    },
    repository: { full_name: 'acme/backbone' },
  };
}

/** The inputs of the README's pull-request workflow, on top of action.yml's defaults. */
function prInputs(over: Record<string, string> = {}): Record<string, string> {
  return { ...actionDefaults(TOKEN), ...netbraceInputs('pull-request', 'netbrace'), ...over };
}

function run(
  ws: string,
  eventName: string,
  event: unknown,
  inputs: Record<string, string>,
  sha?: string,
): Promise<RunResult> {
  return runAction({
    workspace: ws,
    runnerTemp: path.join(work, 'runner-temp'),
    eventName,
    event,
    inputs,
    apiUrl: api.url,
    ...(sha ? { sha } : {}),
  });
}

function actionOutputs(): Record<string, unknown> {
  return (parseYaml(readFileSync(path.join(repoRoot, 'action.yml'), 'utf8')) as { outputs: Record<string, unknown> })
    .outputs;
}

function failedMessages(r: RunResult): string[] {
  // core.setFailed writes one ::error:: without properties.
  return commands(r.stdout, 'error')
    .filter((c) => Object.keys(c.props).length === 0)
    .map((c) => c.message);
}

describe('the runtime', () => {
  it('the bundle runs under the Node.js action.yml declares when CI provides it, else under this process\u2019s', () => {
    const declared = (parseYaml(readFileSync(path.join(repoRoot, 'action.yml'), 'utf8')) as { runs: { using: string } })
      .runs.using;
    const version = execFileSync(actionNode(), ['--version'], { encoding: 'utf8' }).trim();
    if (process.env.NETBRACE_ACTION_NODE) expect(`node${version.replace(/^v(\d+).*$/, '$1')}`).toBe(declared);
    else expect(version).toBe(process.version);
  });
});

describe('the README workflow is what the Action accepts', () => {
  it('every input the README uses is declared in action.yml, and permissions are minimal', () => {
    const declared = new Set(Object.keys(actionDefaults(TOKEN)));
    for (const [wf, job, values] of [
      ['pull-request', 'netbrace', {}],
      ['fork-comment', 'comment', { 'steps.pr.outputs.number': '7' }],
      ['parts', 'part', { 'matrix.part': '1' }],
      ['parts', 'decide', {}],
    ] as const) {
      for (const name of Object.keys(netbraceInputs(wf, job, values)))
        expect(declared.has(name), `${wf}/${job}: ${name}`).toBe(true);
    }
    expect(readmeWorkflow('pull-request').permissions).toEqual({
      contents: 'read',
      'pull-requests': 'write',
      'security-events': 'write',
    });
    expect(readmeWorkflow('fork-comment').permissions).toEqual({ actions: 'read', 'pull-requests': 'write' });
  });
});

describe('pull requests', () => {
  it('the workflow "netbrace init --workflow" writes blocks a weakening pull request', async () => {
    const wf = parseYaml(
      workflowText({ action: `acme/netbrace@${'b'.repeat(40)}`, version: 'v0', policyPath: '.netbrace.yaml' }),
    ) as {
      jobs: { netbrace: { steps: { uses?: string; with?: Record<string, unknown> }[] } };
    };
    const step = wf.jobs.netbrace.steps.find((s) => s.uses?.includes('/netbrace@'))!;
    const inputs = {
      ...actionDefaults(TOKEN),
      ...Object.fromEntries(Object.entries(step.with ?? {}).map(([k, v]) => [k, String(v)])),
    };
    const ws = checkout(scenario.fail, { shallow: false }); // the workflow's fetch-depth: 0
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), inputs);
    expect(r.code, r.stdout + r.stderr).toBe(1);
    expect(r.outputs.verdict).toBe('fail');
  });

  it('fail: annotations on the design\u2019s lines, summary, outputs, SARIF, comment created then updated', async () => {
    const ws = checkout(scenario.fail, { shallow: false });
    const r1 = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), prInputs());
    expect(r1.code, r1.stdout + r1.stderr).toBe(1);
    expect(failedMessages(r1)).toEqual([
      expect.stringMatching(/^netbrace blocks this merge: 1 design (weakened|below a floor)/),
    ]);
    // Annotations: errors on the design file, at lines of the ring's elements.
    const errors = commands(r1.stdout, 'error').filter((c) => c.props.file);
    expect(errors.length).toBeGreaterThan(0);
    // GitHub keeps 10 error annotations per step, the failure message included.
    expect(commands(r1.stdout, 'error').length).toBeLessThanOrEqual(10);
    const lines = readFileSync(path.join(ws, DESIGN), 'utf8').split('\n');
    for (const e of errors) {
      expect(e.props.file).toBe(DESIGN);
      expect(e.props.title).toMatch(/^netbrace: /);
      const line = Number(e.props.line);
      expect(line).toBeGreaterThanOrEqual(1);
      expect(lines[line - 1]).toMatch(/^ {2}- (id|between): /);
    }
    expect(errors.some((e) => /^netbrace: new (bridge|cut node)$/.test(e.props.title))).toBe(true);
    // Outputs.
    expect(r1.outputs).toMatchObject({
      verdict: 'fail',
      designs: '1',
      report: '.netbrace-out/netbrace-report.json',
      sarif: '.netbrace-out/netbrace.sarif',
      html: '.netbrace-out/netbrace-report.html',
    });
    expect(Number(r1.outputs['count-weakened']) + Number(r1.outputs['count-below-floor'])).toBe(1);
    expect(Object.keys(r1.outputs).sort()).toEqual(Object.keys(actionOutputs()).sort());
    // Summary.
    expect(r1.summary).toMatch(/^## \u25A0 netbrace blocks this merge: 1 design/);
    expect(r1.summary).toMatch(/```text\nhead 90 % quantile +[▁-█]+/);
    expect(r1.summary).toContain('`nets/ring.net.yaml`');
    // Files.
    const report = JSON.parse(readFileSync(path.join(ws, r1.outputs.report), 'utf8'));
    expect(report.verdict).toBe('fail');
    expect(report.base).toBe(scenario.base);
    expect(report.head).toBe(scenario.fail);
    const sarif = JSON.parse(readFileSync(path.join(ws, r1.outputs.sarif), 'utf8'));
    const validate = await sarifValidator();
    expect(validate(sarif), JSON.stringify(validate.errors)).toBe(true);
    expect(sarif.runs[0].automationDetails.id).toBe(`netbrace-backbone/${scenario.fail}`);
    expect(readFileSync(path.join(ws, r1.outputs.html), 'utf8')).toMatch(/^<!doctype html>/i);
    // Comment created.
    expect(api.comments).toHaveLength(1);
    expect(api.comments[0].body.startsWith(commentMarker('backbone'))).toBe(true);
    expect(r1.outputs['comment-url']).toContain(`/comment/${api.comments[0].id}`);
    const created = api.comments[0].id;

    // The author fixes it (a new head): the same comment is updated, not duplicated.
    const ws2 = path.join(work, 'ws2');
    git(work, 'clone', '-q', `file://${scenario.origin}`, ws2);
    git(ws2, 'checkout', '-q', '--detach', scenario.pass);
    const r2 = await runAction({
      workspace: ws2,
      runnerTemp: path.join(work, 'rt2'),
      eventName: 'pull_request',
      event: prEvent(scenario.base, scenario.pass),
      inputs: prInputs(),
      apiUrl: api.url,
    });
    expect(r2.code, r2.stdout + r2.stderr).toBe(0);
    expect(r2.outputs.verdict).toBe('pass');
    expect(api.comments).toHaveLength(1);
    expect(api.comments[0].id).toBe(created);
    expect(api.comments[0].body).toMatch(/netbrace: no design (weakened|fails its policy)/);
    expect(api.requests.filter((q) => q.method === 'POST')).toHaveLength(1);
    expect(api.requests.filter((q) => q.method === 'PATCH')).toHaveLength(1);
    expect(api.requests.every((q) => q.authorization === `token ${TOKEN}`)).toBe(true);
  }, 60_000);

  it('inform: the same findings, the step passes', async () => {
    const ws = checkout(scenario.fail, { shallow: false });
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), prInputs({ mode: 'inform' }));
    expect(r.code, r.stdout + r.stderr).toBe(0);
    expect(r.outputs.verdict).toBe('fail');
    expect(failedMessages(r)).toEqual([]);
    expect(commands(r.stdout, 'error').filter((c) => c.props.file).length).toBeGreaterThan(0);
    expect(commands(r.stdout, 'warning').some((c) => /inform mode/.test(c.message))).toBe(true);
    expect(r.summary).toContain('inform mode, so the merge is not blocked');
  }, 30_000);

  it('fork: the read-only token\u2019s 403 is a warning; summary, annotations and verdict stand', async () => {
    api.writes = 'forbidden';
    const ws = checkout(scenario.fail, { shallow: false });
    const r = await run(
      ws,
      'pull_request',
      prEvent(scenario.base, scenario.fail, true),
      prInputs({ comment: 'every-run' }),
    );
    expect(r.code).toBe(1);
    expect(r.outputs.verdict).toBe('fail');
    expect(failedMessages(r)).toHaveLength(1);
    const warnings = commands(r.stdout, 'warning').map((c) => c.message);
    expect(warnings.some((w) => /cannot write the pull-request comment/.test(w) && /fork/.test(w))).toBe(true);
    expect(r.summary).toContain('could not be written');
    expect(api.comments).toHaveLength(0);
  }, 30_000);

  it('fork, two workflows: the pull_request run uploads the report, the workflow_run run posts it', async () => {
    const ws = checkout(scenario.fail, { shallow: false });
    const first = await run(
      ws,
      'pull_request',
      prEvent(scenario.base, scenario.fail, true),
      prInputs({ comment: 'off' }),
    );
    expect(first.code).toBe(1);
    expect(api.requests).toEqual([]);
    // upload-artifact / download-artifact: the .netbrace-out folder, plus the pr-number file.
    const { cpSync, writeFileSync } = await import('node:fs');
    const second = path.join(work, 'comment-ws');
    cpSync(path.join(ws, '.netbrace-out'), path.join(second, 'netbrace-untrusted'), { recursive: true });
    writeFileSync(path.join(second, 'netbrace-untrusted', 'pr-number'), '7\n');
    const number = readFileSync(path.join(second, 'netbrace-untrusted', 'pr-number'), 'utf8')
      .slice(0, 16)
      .replace(/[^0-9]/g, '');
    api.prHeadSha = scenario.fail;
    const inputs = {
      ...actionDefaults(TOKEN),
      ...netbraceInputs('fork-comment', 'comment', { 'steps.pr.outputs.number': number }),
    };
    const event = { workflow_run: { id: 99, event: 'pull_request', head_sha: scenario.fail } };
    const r = await runAction({
      workspace: second,
      runnerTemp: path.join(work, 'rt-comment'),
      eventName: 'workflow_run',
      event,
      inputs,
      apiUrl: api.url,
    });
    expect(r.code, r.stdout + r.stderr).toBe(0); // inform: the first run decided
    expect(api.comments).toHaveLength(1);
    expect(api.comments[0].body).toMatch(/netbrace blocks this merge|inform mode, so the merge is not blocked/);
    expect(api.requests.some((q) => q.method === 'GET' && q.path === '/repos/acme/backbone/pulls/7')).toBe(true);
    // A report about another commit is not posted.
    api.comments.length = 0;
    api.prHeadSha = scenario.pass;
    const r2 = await runAction({
      workspace: second,
      runnerTemp: path.join(work, 'rt-comment2'),
      eventName: 'workflow_run',
      event,
      inputs,
      apiUrl: api.url,
    });
    expect(r2.code).toBe(0);
    expect(api.comments).toHaveLength(0);
    expect(commands(r2.stdout, 'warning').some((c) => /no comment: pull request #7 is at/.test(c.message))).toBe(true);
  }, 30_000);

  it('shallow clone: the base commit is fetched, then compared', async () => {
    const ws = checkout(scenario.fail); // --depth=1: only the head commit
    expect(() => git(ws, 'cat-file', '-e', `${scenario.base}^{commit}`)).toThrow();
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), prInputs());
    expect(r.code, r.stdout + r.stderr).toBe(1);
    expect(r.stdout).toContain('is not in the clone (shallow checkout); fetching that one commit');
    expect(r.outputs.verdict).toBe('fail');
    expect(git(ws, 'cat-file', '-t', scenario.base)).toBe('commit');
  }, 30_000);

  it('shallow clone whose base cannot be fetched: stops and says what to add to the checkout step', async () => {
    const ws = checkout(scenario.fail);
    git(ws, 'remote', 'set-url', 'origin', path.join(work, 'no-such-remote.git'));
    api.prFiles.push({ filename: DESIGN, status: 'modified' });
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), prInputs());
    expect(r.code).toBe(1);
    const failed = failedMessages(r);
    expect(failed).toHaveLength(1);
    expect(failed[0]).toContain('add `fetch-depth: 0` to the actions/checkout step');
    expect(api.requests.some((q) => q.path === '/repos/acme/backbone/pulls/7/files')).toBe(true);
  }, 30_000);

  it('no design changed (even with the base unfetchable, from the API\u2019s file list): a pass that says so', async () => {
    const ws = checkout(scenario.readme);
    git(ws, 'remote', 'set-url', 'origin', path.join(work, 'no-such-remote.git'));
    api.prFiles.push({ filename: 'README.md', status: 'modified' });
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.readme), prInputs());
    expect(r.code, r.stdout + r.stderr).toBe(0);
    expect(r.outputs).toMatchObject({ verdict: 'pass', designs: '0' });
    expect(r.summary).toContain('no design file changed');
    // when-changed: nothing to say, so no comment is created.
    expect(api.comments).toHaveLength(0);
  }, 30_000);
});

describe('errors', () => {
  it('a broken policy: one failure message with its line, an annotation on the policy, in inform mode too', async () => {
    const author = path.join(work, 'broken-policy');
    git(work, 'clone', '-q', `file://${scenario.origin}`, author);
    const base = commit(author, 'typo in the policy', {
      '.netbrace.yaml': POLICY.replace('realizations: 40', 'realisations: 40'),
    });
    const head = commit(author, 'chain', { [DESIGN]: ring([], CHAIN_DROP) });
    const r = await run(author, 'pull_request', prEvent(base, head), prInputs({ mode: 'inform' }));
    expect(r.code).toBe(1);
    const failed = failedMessages(r);
    expect(failed).toHaveLength(1);
    expect(failed[0]).toMatch(/^netbrace: \.netbrace\.yaml:\d+:\d+: /);
    const onPolicy = commands(r.stdout, 'error').filter((c) => c.props.file === '.netbrace.yaml');
    expect(onPolicy).toHaveLength(1);
    expect(Number(onPolicy[0].props.line)).toBe(POLICY.split('\n').findIndex((l) => l.includes('realizations')) + 1);
    expect(r.stderr).not.toMatch(/at .*\.js:\d+/); // no stack trace
  }, 30_000);
});

describe('a pull request that edits the workflow running netbrace', () => {
  const WORKFLOW = '.github/workflows/netbrace.yml';
  const workflow = (settings: string) =>
    `name: netbrace\non: [pull_request]\npermissions:\n  contents: read\n  pull-requests: write\njobs:\n  netbrace:\n    name: netbrace\n    runs-on: ubuntu-latest\n    steps:\n      - uses: actions/checkout@v5\n        with:\n          fetch-depth: 0\n      - uses: acme/netbrace@${'c'.repeat(40)}\n        with:\n${settings}`;

  it('taking the policy from the head in inform mode is reported on the workflow file and, the base being in block mode, fails', async () => {
    const author = path.join(work, 'author');
    git(work, 'clone', '-q', `file://${scenario.origin}`, author);
    const base = commit(author, 'the gate in block mode', { [WORKFLOW]: workflow('          mode: block\n') });
    // The change weakens the design and, to get away with it, the workflow and the policy.
    const head = commit(author, 'chain, and a friendlier gate', {
      [DESIGN]: ring([], CHAIN_DROP),
      '.netbrace.yaml': 'requirements: []\n',
      [WORKFLOW]: workflow('          mode: inform\n          policy-source: head\n'),
    });
    // The runner hands the Action the head's inputs: what the edited workflow says.
    const inputs = prInputs({ mode: 'inform', 'policy-source': 'head' });
    const r = await runAction({
      workspace: author,
      runnerTemp: path.join(work, 'runner-temp'),
      eventName: 'pull_request',
      event: prEvent(base, head),
      inputs,
      apiUrl: api.url,
      sha: head,
      extraEnv: { GITHUB_WORKFLOW_REF: `acme/backbone/${WORKFLOW}@refs/pull/7/merge`, GITHUB_JOB: 'netbrace' },
    });
    expect(r.code, r.stdout + r.stderr).toBe(1);
    expect(r.outputs.verdict).toBe('fail');
    expect(failedMessages(r)[0]).toContain(`the change weakens netbrace\u2019s own settings in ${WORKFLOW}`);
    const onWorkflow = commands(r.stdout, 'error').filter((c) => c.props.file === WORKFLOW);
    expect(onWorkflow.map((c) => c.message).join('\n')).toMatch(/mode block → inform/);
    expect(onWorkflow.map((c) => c.message).join('\n')).toMatch(/policy-source base → head/);
    const report = JSON.parse(readFileSync(path.join(author, r.outputs.report), 'utf8')) as Report;
    expect(report.configuration?.workflow).toBe(WORKFLOW);
    expect(
      report.configuration?.changes
        .filter((c) => c.weakens)
        .map((c) => c.setting)
        .sort(),
    ).toEqual(['mode', 'policy-source']);
    // The base's settings stayed in force: the base's policy judged the change, the head's
    // (`requirements: []`) is only reported.
    expect(report.policy.revision).toBe(base);
    expect(report.policy.changed).toBe(true);
    expect(report.mode).toBe('block');
    expect(r.summary).toContain('this change edits the workflow that runs netbrace');
  }, 30_000);
});

describe('the organisation policy from a second checkout', () => {
  // The organisation's policy: the tests' policy plus an N−1 floor of its own.
  const ORG_TEXT = POLICY.replace(
    '    challenge: node-failures\n',
    '    challenge: node-failures\n  - kind: n-1\n    element: link\n    min: 0.2\n',
  );
  function withOrg(ws: string): void {
    mkdirSync(path.join(ws, 'org-policy'), { recursive: true });
    writeFileSync(path.join(ws, 'org-policy', 'org.yaml'), ORG_TEXT);
  }

  it('a team policy that does not inherit it fails the step, naming both files', async () => {
    const ws = checkout(scenario.fail, { shallow: false });
    withOrg(ws);
    const r = await run(
      ws,
      'pull_request',
      prEvent(scenario.base, scenario.fail),
      prInputs({ 'org-policy': 'org-policy/org.yaml' }),
    );
    expect(r.code).not.toBe(0);
    expect(failedMessages(r)[0]).toContain(
      '.netbrace.yaml does not inherit the organisation policy org-policy/org.yaml',
    );
  });

  it('a team policy that inherits it is judged under the organisation\u2019s floor too', async () => {
    const author = path.join(work, 'author');
    git(work, 'clone', '-q', `file://${scenario.origin}`, author);
    const base = commit(author, 'inherit the organisation policy', {
      '.netbrace.yaml': 'inherits: org-policy/org.yaml\nrequirements:\n  - kind: no-new-spof\n',
    });
    const head = commit(author, 'chain', { [DESIGN]: ring([], CHAIN_DROP) });
    withOrg(author);
    const r = await run(author, 'pull_request', prEvent(base, head), prInputs({ 'org-policy': 'org-policy/org.yaml' }));
    expect(r.code, r.stdout + r.stderr).not.toBe(2);
    expect(r.outputs.report, r.stdout + r.stderr).toBeTruthy();
    const report = JSON.parse(readFileSync(path.join(author, r.outputs.report), 'utf8')) as {
      policy: { files: string[] };
      files: { requirements: { id: string; threshold: number | null }[] }[];
    };
    expect(report.policy.files).toEqual(['.netbrace.yaml', 'org-policy/org.yaml']);
    expect(report.files[0].requirements.some((q) => q.id.startsWith('n-1') && q.threshold === 0.2)).toBe(true);
  }, 30_000);
});

describe('hostile element ids', () => {
  it('cannot forge workflow commands, markup or mentions in any view', async () => {
    const ids = ['::warning::forged', '<img src=x onerror=alert(1)>', '@acme/admins', 'pct%0A::error::x', '</details>'];
    const design = (closed: boolean) =>
      [
        'network:',
        '  name: hostile',
        'nodes:',
        ...ids.map((id) => `  - id: ${JSON.stringify(id)}`),
        'links:',
        ...ids
          .slice(0, closed ? ids.length : -1)
          .map((id, i) => `  - between: [${JSON.stringify(id)}, ${JSON.stringify(ids[(i + 1) % ids.length])}]`),
        '',
      ].join('\n');
    const author = path.join(work, 'hostile');
    git(work, 'clone', '-q', `file://${scenario.origin}`, author);
    const base = commit(author, 'hostile ring', { 'nets/hostile.net.yaml': design(true) });
    const head = commit(author, 'hostile chain', { 'nets/hostile.net.yaml': design(false) });
    const r = await run(author, 'pull_request', prEvent(base, head), prInputs({ comment: 'every-run' }));
    expect(r.code, r.stdout + r.stderr).toBe(1);
    for (const line of r.stdout.split('\n')) {
      expect(line).not.toMatch(/^::(warning|error)::(forged|x)/);
      if (line.startsWith('::')) expect(line).toMatch(/^::(error|warning|notice|debug|group|endgroup)[ :]/);
    }
    const errors = commands(r.stdout, 'error').filter((c) => c.props.file);
    expect(errors.some((e) => e.message.includes('::warning::forged'))).toBe(true); // shown, as text
    const strip = (md: string) => md.replace(/(`+)(?!`)[\s\S]*?[^`]\1(?!`)/g, '');
    for (const md of [r.summary, api.comments[0].body]) {
      expect(strip(md)).not.toMatch(/<img|@acme/);
      expect(strip(md).match(/<details>/g)?.length ?? 0).toBe(strip(md).match(/<\/details>/g)?.length ?? 0);
    }
    const validate = await sarifValidator();
    expect(validate(JSON.parse(readFileSync(path.join(author, r.outputs.sarif), 'utf8')))).toBe(true);
  }, 30_000);
});

describe('an unreliable API never changes the verdict', () => {
  it('API down (500 on every call): bounded retries, a warning, the verdict stands', async () => {
    api.reads = 'error500';
    api.writes = 'error500';
    const ws = checkout(scenario.fail, { shallow: false });
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), prInputs({ comment: 'every-run' }));
    expect(r.code).toBe(1);
    expect(r.outputs.verdict).toBe('fail');
    expect(failedMessages(r)).toHaveLength(1);
    expect(commands(r.stdout, 'warning').some((c) => /could not write the pull-request comment/.test(c.message))).toBe(
      true,
    );
    expect(api.requests.length).toBe(3); // one listing, retried twice (NETBRACE_HTTP_RETRIES=2)
    expect(r.ms).toBeLessThan(15_000);
  }, 30_000);

  it('rate limited (403, x-ratelimit-remaining: 0): waits for the reset, then writes', async () => {
    api.reads = 'rateLimit';
    api.failFirst = 1;
    const ws = checkout(scenario.fail, { shallow: false });
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.fail), prInputs({ comment: 'every-run' }));
    expect(r.code).toBe(1);
    expect(api.comments).toHaveLength(1);
    expect(r.stdout).toMatch(/rate limit .*retrying/);
  }, 30_000);

  it('API hanging: each call times out, the step ends in seconds', async () => {
    api.reads = 'hang';
    const ws = checkout(scenario.pass, { shallow: false });
    const r = await run(ws, 'pull_request', prEvent(scenario.base, scenario.pass), prInputs({ comment: 'every-run' }));
    expect(r.code, r.stdout + r.stderr).toBe(0);
    expect(r.outputs.verdict).toBe('pass');
    expect(commands(r.stdout, 'warning').some((c) => /no answer within 500 ms/.test(c.message))).toBe(true);
    expect(r.ms).toBeLessThan(15_000);
  }, 30_000);
});

describe('other events', () => {
  it('push: compares the commit before the push with the pushed head', async () => {
    const ws = checkout(scenario.pass, { shallow: false });
    const r = await run(
      ws,
      'push',
      { before: scenario.base, after: scenario.pass, ref: 'refs/heads/main' },
      prInputs(),
      scenario.pass,
    );
    expect(r.code, r.stdout + r.stderr).toBe(0);
    const report = JSON.parse(readFileSync(path.join(ws, r.outputs.report), 'utf8'));
    expect(report).toMatchObject({ base: scenario.base, head: scenario.pass, verdict: 'pass' });
    expect(api.requests).toEqual([]); // no pull request, no comment
  }, 30_000);

  it('push of a new branch (all-zero before): compared with the head\u2019s parent', async () => {
    const ws = checkout(scenario.fail);
    const r = await run(
      ws,
      'push',
      { before: '0'.repeat(40), after: scenario.fail, created: true },
      prInputs(),
      scenario.fail,
    );
    expect(r.code, r.stdout + r.stderr).toBe(1);
    const report = JSON.parse(readFileSync(path.join(ws, r.outputs.report), 'utf8'));
    expect(report.base).toBe(scenario.base);
  }, 30_000);

  it('schedule: every design against the thresholds only', async () => {
    const ws = checkout(scenario.base, { shallow: false, branch: 'main' });
    const r = await run(ws, 'schedule', { schedule: '23 5 * * 1' }, prInputs(), scenario.base);
    expect(r.code, r.stdout + r.stderr).toBe(0);
    expect(r.outputs.designs).toBe('4');
    const report = JSON.parse(readFileSync(path.join(ws, r.outputs.report), 'utf8'));
    expect(report.base).toBeUndefined();
    expect(report.scope).toBe('all');
  }, 30_000);
});

describe('parts', () => {
  it('two matrix legs, then the join job: one summary, one comment, one verdict', async () => {
    const legs = (readmeWorkflow('parts').jobs.part.strategy?.matrix?.part ?? []).map(String);
    expect(legs).toEqual(['1', '2']);
    const partFolder = path.join(work, 'decide-ws', '.netbrace-parts');
    const perPart: string[][] = [];
    for (const k of legs) {
      const ws = path.join(work, `leg-${k}`);
      git(work, 'clone', '-q', '--depth=1', '--branch', 'parts', `file://${scenario.origin}`, ws);
      const inputs = { ...actionDefaults(TOKEN), ...netbraceInputs('parts', 'part', { 'matrix.part': k }) };
      const r = await runAction({
        workspace: ws,
        runnerTemp: path.join(work, `rt-${k}`),
        eventName: 'pull_request',
        event: prEvent(scenario.base, scenario.parts),
        inputs,
        apiUrl: api.url,
      });
      expect(r.code, r.stdout + r.stderr).toBe(0); // part legs never decide
      expect(commands(r.stdout, 'error')).toEqual([]);
      const file = path.join(ws, r.outputs.report);
      expect(r.outputs.report).toBe(`.netbrace-out/part-${k}.json`);
      const part = JSON.parse(readFileSync(file, 'utf8'));
      expect(part.part).toEqual({ index: Number(k), total: 2 });
      perPart.push(part.files.map((f: { path: string }) => f.path));
      // "upload-artifact" then "download-artifact" with merge-multiple: one folder of reports.
      git(work, 'init', '-q', path.join(work, 'decide-ws'));
      const { mkdirSync, copyFileSync } = await import('node:fs');
      mkdirSync(partFolder, { recursive: true });
      copyFileSync(file, path.join(partFolder, path.basename(file)));
    }
    const all = ['nets/metro-a.net.yaml', 'nets/metro-b.net.yaml', 'nets/metro-c.net.yaml', DESIGN];
    expect([...perPart.flat()].sort()).toEqual(all);
    for (const [i, files] of perPart.entries())
      for (const f of files) expect(inPart(f, { index: i + 1, total: 2 })).toBe(true);
    expect(api.requests).toEqual([]); // legs write no comment

    const decide = path.join(work, 'decide-ws');
    const inputs = { ...actionDefaults(TOKEN), ...netbraceInputs('parts', 'decide') };
    const r = await runAction({
      workspace: decide,
      runnerTemp: path.join(work, 'rt-decide'),
      eventName: 'pull_request',
      event: prEvent(scenario.base, scenario.parts),
      inputs,
      apiUrl: api.url,
    });
    expect(r.code, r.stdout + r.stderr).toBe(1);
    expect(r.outputs).toMatchObject({ verdict: 'fail', designs: '4' });
    expect(r.summary).toContain('joined parts 1, 2 of 2');
    for (const f of all) expect(r.summary).toContain(`\`${f}\``);
    expect(api.comments).toHaveLength(1);
    expect(commands(r.stdout, 'error').filter((c) => c.props.file).length).toBeGreaterThan(0);
    expect(existsSync(path.join(decide, '.netbrace-out', 'netbrace.sarif'))).toBe(true);
    expect(readdirSync(partFolder).sort()).toEqual(['part-1.json', 'part-2.json']);
  }, 60_000);
});
