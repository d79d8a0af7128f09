// The Action's run() in process, with the gate, git and the runner protocol replaced by
// recording doubles: which commits it asks the gate to compare, what it writes, and how it
// ends. The bundled action is exercised end to end in e2e.test.ts.

import { mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { fileURLToPath } from 'node:url';
import { parse as parseYaml } from 'yaml';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Annotation } from '../../src/report/annotations.js';
import { commentMarker, renderComment } from '../../src/report/markdown.js';
import type { Report } from '../../src/report/report.js';
import { Ajv } from 'ajv';
import type { ActionDeps, GateRequestLike, GitResult } from '../../src/shell/action-deps.js';
import { shouldWriteComment } from '../../src/shell/action-comment.js';
import { readInputs } from '../../src/shell/action-inputs.js';
import { emptyReport as emptyRunReport } from '../../src/shell/action-outputs.js';
import { run } from '../../src/shell/action-run.js';
import { createClient } from '../../src/shell/github.js';
import { joinReports } from '../../src/gate/join.js';
import { startFakeApi, type FakeApi } from './fake-api.js';
import { emptyReport, sampleReport } from '../report/sample-report.js';

const BASE = 'a'.repeat(40);
const HEAD = 'b'.repeat(40);
const MERGE_SHA = 'c'.repeat(40);

interface Recorder {
  annotations: Annotation[];
  warnings: string[];
  infos: string[];
  outputs: Record<string, string>;
  failed: string[];
  summary: string;
  gateCalls: GateRequestLike[];
  gitCalls: string[][];
}

let dir: string;
let api: FakeApi;

beforeEach(async () => {
  dir = mkdtempSync(path.join(tmpdir(), 'nb-run-'));
  mkdirSync(path.join(dir, 'ws'));
  api = await startFakeApi();
});
afterEach(async () => {
  await api.close();
  rmSync(dir, { recursive: true, force: true });
});

let events = 0;
function prEvent(extra: Record<string, unknown> = {}): string {
  const file = path.join(dir, `event-${events++}.json`);
  writeFileSync(
    file,
    JSON.stringify({
      number: 12,
      pull_request: {
        number: 12,
        base: { sha: BASE, repo: { full_name: 'acme/net' } },
        head: { sha: HEAD, repo: { full_name: 'acme/net', fork: false } },
        ...extra,
      },
      repository: { full_name: 'acme/net' },
    }),
  );
  return file;
}

function env(over: Record<string, string> = {}): Record<string, string> {
  return {
    GITHUB_WORKSPACE: path.join(dir, 'ws'),
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_EVENT_PATH: prEvent(),
    GITHUB_SHA: MERGE_SHA,
    GITHUB_REPOSITORY: 'acme/net',
    GITHUB_API_URL: api.url,
    GITHUB_RUN_ID: '99',
    INPUT_TOKEN: 'tok',
    INPUT_COMMENT: 'every-run',
    NETBRACE_HTTP_RETRIES: '1',
    NETBRACE_HTTP_BACKOFF_MS: '5',
    NETBRACE_HTTP_TIMEOUT_MS: '300',
    ...over,
  };
}

function deps(
  report: Report | ((r: GateRequestLike) => Report),
  git: (args: string[]) => GitResult = () => ({ code: 0, stdout: '', stderr: '' }),
) {
  const rec: Recorder = {
    annotations: [],
    warnings: [],
    infos: [],
    outputs: {},
    failed: [],
    summary: '',
    gateCalls: [],
    gitCalls: [],
  };
  const d: ActionDeps = {
    gate: async (request) => {
      rec.gateCalls.push(request);
      const r = typeof report === 'function' ? report(request) : structuredClone(report);
      r.mode = request.mode;
      return { report: r, exitCode: r.verdict === 'fail' && request.mode === 'block' ? 1 : 0 };
    },
    join: joinReports,
    git: async (args) => {
      rec.gitCalls.push(args);
      if (args[0] === 'rev-parse' && args[1] === '--show-toplevel')
        return { code: 0, stdout: `${path.join(dir, 'ws')}\n`, stderr: '' };
      return git(args);
    },
    // Throttling is off here only for speed (it spaces writes 3 s apart); rate limits are
    // exercised in github.test.ts and e2e.test.ts.
    github: (o) => createClient({ ...o, throttle: false }),
    renderHtml: () => '<!doctype html><title>r</title>',
    out: {
      annotate: (a) => rec.annotations.push(a),
      info: (m) => rec.infos.push(m),
      warning: (m) => rec.warnings.push(m),
      setOutput: (k, v) => {
        rec.outputs[k] = v;
      },
      setFailed: (m) => rec.failed.push(m),
      appendSummary: (m) => {
        rec.summary += m;
      },
    },
  };
  return { d, rec };
}

describe('inputs', () => {
  it('reads exactly the inputs action.yml declares', () => {
    const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
    const declared = Object.keys(
      (parseYaml(readFileSync(path.join(root, 'action.yml'), 'utf8')) as { inputs: object }).inputs,
    ).sort();
    const source = readFileSync(path.join(root, 'src', 'shell', 'action-inputs.ts'), 'utf8');
    const read = [
      ...new Set(
        [...source.matchAll(/(?:getInput|oneOf|relativePath|optionalInt|sharedInput)\(env, '([a-z-]+)'/g)].map(
          (m) => m[1],
        ),
      ),
    ].sort();
    expect(read).toEqual(declared);
  });

  it('reads the runner\u2019s INPUT_ names (upper case, dashes kept) and validates them', () => {
    const i = readInputs({
      'INPUT_COMMENT-KEY': 'metro',
      'INPUT_POLICY-SOURCE': 'head',
      INPUT_PART: '2/4',
      INPUT_MODE: 'inform',
    });
    expect(i).toMatchObject({
      commentKey: 'metro',
      policySource: 'head',
      part: { index: 2, total: 4 },
      mode: 'inform',
      comment: 'when-changed',
    });
    expect(() => readInputs({ INPUT_MODE: 'strict' })).toThrow(/input "mode" is "strict"; use one of: block, inform/);
    expect(() => readInputs({ INPUT_PART: '5/4' })).toThrow(/input "part"/);
    expect(() => readInputs({ 'INPUT_COMMENT-KEY': 'a b' })).toThrow(/comment-key/);
    expect(() => readInputs({ INPUT_BASE: '--upload-pack=evil' })).toThrow(/input "base"/);
    expect(() => readInputs({ INPUT_PART: '1/2', 'INPUT_JOIN-PARTS': 'parts' })).toThrow(/exclude each other/);
  });

  it('the former values of mode and comment are refused with the values to use', () => {
    for (const old of ['enforce', 'advise']) {
      expect(() => readInputs({ INPUT_MODE: old })).toThrow(`input "mode" is "${old}"; use one of: block, inform`);
    }
    for (const old of ['always', 'on-change', 'on-failure', 'never']) {
      expect(() => readInputs({ INPUT_COMMENT: old })).toThrow(
        `input "comment" is "${old}"; use one of: every-run, when-changed, when-failing, off`,
      );
    }
  });

  it('a bad input ends in exactly one setFailed and no evaluation', async () => {
    const { d, rec } = deps(sampleReport());
    const out = await run(env({ INPUT_COMMENT: 'sometimes' }), d);
    expect(out.exitCode).toBe(2);
    expect(rec.failed).toEqual([
      'netbrace: input "comment" is "sometimes"; use one of: every-run, when-changed, when-failing, off',
    ]);
    expect(rec.gateCalls.length).toBe(0);
  });

  it('refuses output paths that leave the workspace, symlinks included', async () => {
    symlinkSync(dir, path.join(dir, 'ws', 'escape'));
    for (const bad of ['../outside.json', 'escape/outside.json']) {
      const { d, rec } = deps(sampleReport());
      const out = await run(env({ INPUT_REPORT: bad }), d);
      expect(out.exitCode).toBe(2);
      expect(rec.failed.length).toBe(1);
      expect(rec.failed[0]).toMatch(/input "report" .* outside the workspace/);
    }
    expect(existsSync(path.join(dir, 'outside.json'))).toBe(false);
  });
});

describe('events', () => {
  it('pull_request: compares the payload\u2019s base and head, never GITHUB_SHA', async () => {
    const { d, rec } = deps(sampleReport());
    await run(env(), d);
    expect(rec.gateCalls[0]).toMatchObject({
      base: BASE,
      head: HEAD,
      policySource: 'base',
      mode: 'block',
      eventKind: 'pull-request',
    });
    expect(JSON.stringify(rec.gateCalls)).not.toContain(MERGE_SHA);
  });

  it('push of a new branch (all-zero before) compares with the head\u2019s parent', async () => {
    const event = path.join(dir, 'push.json');
    writeFileSync(event, JSON.stringify({ before: '0'.repeat(40), after: HEAD }));
    const parent = 'd'.repeat(40);
    const { d, rec } = deps(sampleReport(), (args) =>
      args[0] === 'rev-parse' ? { code: 0, stdout: `${parent}\n`, stderr: '' } : { code: 0, stdout: '', stderr: '' },
    );
    await run(env({ GITHUB_EVENT_NAME: 'push', GITHUB_EVENT_PATH: event }), d);
    expect(rec.gateCalls[0]).toMatchObject({ base: parent, head: HEAD, eventKind: 'push' });
  });

  it('schedule: every design against thresholds only', async () => {
    const { d, rec } = deps(sampleReport());
    await run(env({ GITHUB_EVENT_NAME: 'schedule', GITHUB_EVENT_PATH: '' }), d);
    expect(rec.gateCalls[0].base).toBeUndefined();
    expect(rec.gateCalls[0]).toMatchObject({ head: MERGE_SHA, eventKind: 'schedule' });
  });

  it('the report of a run with nothing to judge follows the published report schema', () => {
    const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
    const validate = new Ajv({ allErrors: true, strict: false }).compile(
      JSON.parse(readFileSync(path.join(root, 'src', 'report', 'report.schema.json'), 'utf8')),
    );
    for (const r of [
      emptyRunReport({ mode: 'inform', policy: '', seed: undefined }, {}),
      emptyRunReport({ mode: 'block', policy: 'p.yaml', seed: 3 }, { base: BASE, head: HEAD }),
    ]) {
      expect(validate(JSON.parse(JSON.stringify(r))), JSON.stringify(validate.errors)).toBe(true);
    }
  });

  it('a deleted branch has nothing to judge and passes saying so', async () => {
    const event = path.join(dir, 'push.json');
    writeFileSync(event, JSON.stringify({ before: HEAD, after: '0'.repeat(40), deleted: true }));
    const { d, rec } = deps(sampleReport());
    const out = await run(env({ GITHUB_EVENT_NAME: 'push', GITHUB_EVENT_PATH: event }), d);
    expect(out).toMatchObject({ exitCode: 0, verdict: 'pass' });
    expect(rec.gateCalls.length).toBe(0);
    expect(rec.summary).toContain('no design file changed');
    // Put together as a run's report is: the seed is the one the gate would have used (the
    // built-in policy's), the keys in the same order.
    const written = JSON.parse(readFileSync(path.join(dir, 'ws', '.netbrace-out', 'netbrace-report.json'), 'utf8'));
    expect(written.seed).toBe(1);
    expect(Object.keys(written)).toEqual([
      'version',
      'tool',
      'verdict',
      'mode',
      'policy',
      'seed',
      'counts',
      'files',
      'caution',
    ]);
  });

  it('a missing base that cannot be fetched stops with the checkout fix', async () => {
    api.reads = 'error500';
    const { d, rec } = deps(sampleReport(), (args) =>
      args[0] === 'cat-file' && args[2].startsWith(BASE)
        ? { code: 1, stdout: '', stderr: '' }
        : args[0] === 'fetch'
          ? { code: 128, stdout: '', stderr: 'fatal: no such commit' }
          : { code: 0, stdout: '', stderr: '' },
    );
    const out = await run(env(), d);
    expect(out.exitCode).toBe(2);
    expect(rec.failed).toHaveLength(1);
    expect(rec.failed[0]).toContain('add `fetch-depth: 0` to the actions/checkout step');
    expect(rec.gitCalls).toContainEqual(['fetch', '--no-tags', '--no-recurse-submodules', '--depth=1', 'origin', BASE]);
  });

  it('a missing base with no design among the pull request\u2019s files (REST fallback) passes', async () => {
    api.prFiles.push({ filename: 'README.md', status: 'modified' });
    const { d, rec } = deps(
      (r) => (r.paths ? emptyReport() : sampleReport()),
      (args) =>
        args[0] === 'cat-file' && args[2].startsWith(BASE)
          ? { code: 1, stdout: '', stderr: '' }
          : args[0] === 'fetch'
            ? { code: 128, stdout: '', stderr: 'fatal' }
            : { code: 0, stdout: '', stderr: '' },
    );
    const out = await run(env(), d);
    expect(out).toMatchObject({ exitCode: 0, verdict: 'pass' });
    expect(rec.gateCalls).toEqual([]);
    expect(rec.summary).toContain('no design file changed');
    expect(api.requests.some((r) => r.path.endsWith('/pulls/12/files'))).toBe(true);
    // The head's policy is read through the Action's git, like every other git command.
    expect(rec.gitCalls).toContainEqual(['show', '--no-textconv', '--end-of-options', `${HEAD}:.netbrace.yaml`]);
  });

  it('a missing base: the head policy (read through the Action\u2019s git) decides which of the pull request\u2019s files are designs', async () => {
    api.prFiles.push({ filename: 'README.md', status: 'modified' });
    const policy = 'designs:\n  - paths: ["README.md"]\n';
    const { d, rec } = deps(sampleReport(), (args) =>
      args[0] === 'cat-file' && args[2].startsWith(BASE)
        ? { code: 1, stdout: '', stderr: '' }
        : args[0] === 'fetch'
          ? { code: 128, stdout: '', stderr: 'fatal' }
          : args[0] === 'show'
            ? args[3] === `${HEAD}:.netbrace.yaml`
              ? { code: 0, stdout: policy, stderr: '' }
              : { code: 128, stdout: '', stderr: 'fatal: path does not exist' }
            : { code: 0, stdout: '', stderr: '' },
    );
    const out = await run(env(), d);
    // README.md is a design by that policy: no "nothing to judge", the base is needed.
    expect(out.exitCode).toBe(2);
    expect(rec.gateCalls).toEqual([]);
    expect(rec.failed[0]).toContain('fetch-depth: 0');
  });
});

describe('verdict and comment', () => {
  it('block + fail: one setFailed at the end, after summary, annotations and outputs', async () => {
    const { d, rec } = deps(sampleReport());
    const out = await run(env(), d);
    expect(out).toMatchObject({ exitCode: 1, verdict: 'fail' });
    expect(rec.failed).toEqual([
      'netbrace blocks this merge: 1 design weakened, 1 design could not be read (see the annotations and the job summary)',
    ]);
    expect(rec.outputs).toMatchObject({
      verdict: 'fail',
      'count-weakened': '1',
      'count-unreadable': '1',
      designs: '5',
      report: '.netbrace-out/netbrace-report.json',
      sarif: '.netbrace-out/netbrace.sarif',
    });
    expect(rec.annotations[0]).toMatchObject({ level: 'error', file: 'backbone/core.net.yaml', startLine: 42 });
    expect(rec.summary).toContain('netbrace blocks this merge: 1 design weakened, 1 design could not be read');
    const written = JSON.parse(readFileSync(path.join(dir, 'ws', '.netbrace-out', 'netbrace-report.json'), 'utf8'));
    expect(written.verdict).toBe('fail');
  });

  it('inform + fail: reports, warns, never fails the step', async () => {
    const { d, rec } = deps(sampleReport());
    const out = await run(env({ INPUT_MODE: 'inform' }), d);
    expect(out).toMatchObject({ exitCode: 0, verdict: 'fail' });
    expect(rec.failed).toEqual([]);
    expect(rec.outputs.verdict).toBe('fail');
    expect(rec.warnings.some((w) => /inform mode/.test(w))).toBe(true);
  });

  it('one living comment: created, then updated in place', async () => {
    const a = deps(sampleReport());
    await run(env(), a.d);
    const changed = sampleReport();
    changed.files[1].findings.pop();
    const b = deps(changed);
    await run(env(), b.d);
    const ours = api.comments.filter((c) => c.body.includes(commentMarker('default')));
    expect(ours).toHaveLength(1);
    expect(api.requests.filter((r) => r.method === 'POST')).toHaveLength(1);
    expect(api.requests.filter((r) => r.method === 'PATCH')).toHaveLength(1);
  }, 20_000);

  it('fork pull request: the 403 is a warning; the verdict stands', async () => {
    api.writes = 'forbidden';
    const { d, rec } = deps(sampleReport());
    const out = await run(
      env({ GITHUB_EVENT_PATH: prEvent({ head: { sha: HEAD, repo: { full_name: 'someone/net', fork: true } } }) }),
      d,
    );
    expect(out).toMatchObject({ exitCode: 1, verdict: 'fail', comment: 'failed' });
    expect(rec.warnings).toEqual([expect.stringMatching(/fork.*two-workflow/)]);
    expect(rec.failed).toHaveLength(1);
    expect(rec.summary).toContain('could not be written');
  });

  it('API down: the comment fails quickly, the verdict is unchanged', async () => {
    api.reads = 'error500';
    api.writes = 'error500';
    const { d, rec } = deps(emptyReport());
    const t0 = Date.now();
    const out = await run(env(), d);
    expect(Date.now() - t0).toBeLessThan(5000);
    expect(out).toMatchObject({ exitCode: 0, verdict: 'pass', comment: 'failed' });
    expect(rec.failed).toEqual([]);
    expect(rec.warnings.some((w) => /could not write the pull-request comment/.test(w))).toBe(true);
  });

  it('comment modes decide from the report and the existing comment', () => {
    const fail = sampleReport();
    const pass = emptyReport();
    const existing = { id: 1, body: renderComment(fail, { key: 'k' }) };
    expect(shouldWriteComment('off', fail, undefined)).toBe(false);
    expect(shouldWriteComment('every-run', pass, undefined)).toBe(true);
    expect(shouldWriteComment('when-failing', pass, undefined)).toBe(false);
    expect(shouldWriteComment('when-failing', pass, existing)).toBe(true);
    expect(shouldWriteComment('when-changed', fail, existing)).toBe(false);
    expect(shouldWriteComment('when-changed', pass, existing)).toBe(true);
    expect(shouldWriteComment('when-changed', pass, undefined)).toBe(false);
  });
});

describe('workflow_run (posting a fork\u2019s report)', () => {
  function runEvent(headSha: string): string {
    const file = path.join(dir, `run-${events++}.json`);
    writeFileSync(file, JSON.stringify({ workflow_run: { head_sha: headSha, event: 'pull_request' } }));
    return file;
  }
  function partsDir(): void {
    mkdirSync(path.join(dir, 'ws', 'in'), { recursive: true });
    writeFileSync(path.join(dir, 'ws', 'in', 'netbrace-report.json'), JSON.stringify(sampleReport()));
  }

  it('comments on the pull request whose head is the evaluated commit', async () => {
    partsDir();
    api.prHeadSha = HEAD;
    const { d, rec } = deps(sampleReport());
    const out = await run(
      env({
        GITHUB_EVENT_NAME: 'workflow_run',
        GITHUB_EVENT_PATH: runEvent(HEAD),
        'INPUT_JOIN-PARTS': 'in',
        'INPUT_PULL-REQUEST': '12',
        INPUT_MODE: 'inform',
      }),
      d,
    );
    expect(out).toMatchObject({ exitCode: 0, verdict: 'fail' });
    expect(rec.gateCalls).toEqual([]);
    expect(api.comments).toHaveLength(1);
    expect(api.requests.some((r) => r.method === 'GET' && r.path === '/repos/acme/net/pulls/12')).toBe(true);
  });

  it('refuses a pull-request number that does not match the evaluated commit', async () => {
    partsDir();
    api.prHeadSha = 'e'.repeat(40);
    const { d, rec } = deps(sampleReport());
    await run(
      env({
        GITHUB_EVENT_NAME: 'workflow_run',
        GITHUB_EVENT_PATH: runEvent(HEAD),
        'INPUT_JOIN-PARTS': 'in',
        'INPUT_PULL-REQUEST': '12',
        INPUT_MODE: 'inform',
      }),
      d,
    );
    expect(api.comments).toHaveLength(0);
    expect(rec.warnings.some((w) => /not at bbbbbbbbbbbb/.test(w))).toBe(true);
  });
});

describe('parts', () => {
  it('a part job writes its report and leaves the decision to the join job', async () => {
    const r = sampleReport();
    r.part = { index: 1, total: 2 };
    const { d, rec } = deps(r);
    const out = await run(env({ INPUT_PART: '1/2', INPUT_REPORT: 'parts/part-1.json' }), d);
    expect(out).toMatchObject({ exitCode: 0, verdict: 'fail' });
    expect(rec.gateCalls[0].part).toEqual({ index: 1, total: 2 });
    expect(rec.annotations).toEqual([]);
    expect(rec.failed).toEqual([]);
    expect(api.requests).toEqual([]);
    expect(existsSync(path.join(dir, 'ws', 'parts', 'part-1.json'))).toBe(true);
  });

  it('the join job reads the part reports as data and decides', async () => {
    const parts = path.join(dir, 'ws', 'parts');
    mkdirSync(parts);
    const r1 = sampleReport();
    r1.files = r1.files.slice(0, 2);
    const r2 = sampleReport();
    r2.files = r2.files.slice(2);
    writeFileSync(path.join(parts, 'a.json'), JSON.stringify(r1));
    writeFileSync(path.join(parts, 'b.json'), JSON.stringify(r2));
    const { d, rec } = deps(sampleReport());
    const out = await run(env({ 'INPUT_JOIN-PARTS': 'parts' }), d);
    expect(rec.gateCalls).toEqual([]);
    expect(out).toMatchObject({ exitCode: 1, verdict: 'fail' });
    expect(rec.outputs.designs).toBe('5');
    r2.part = { index: 2, total: 3 };
    writeFileSync(path.join(parts, 'b.json'), JSON.stringify(r2));
    const gap = deps(sampleReport());
    expect((await run(env({ 'INPUT_JOIN-PARTS': 'parts' }), gap.d)).exitCode).toBe(2);
    expect(gap.rec.failed[0]).toMatch(/part reports 1\/3, 3\/3 missing/);
    writeFileSync(path.join(parts, 'c.json'), '{"not":"a report"}');
    const bad = deps(sampleReport());
    const out2 = await run(env({ 'INPUT_JOIN-PARTS': 'parts' }), bad.d);
    expect(out2.exitCode).toBe(2);
    expect(bad.rec.failed[0]).toMatch(/part report c\.json: .*not a netbrace report/);
  });

  it('a design split across the parts is judged by the join job in its checkout, from the parts\u2019 samples', async () => {
    const parts = path.join(dir, 'ws', 'parts');
    mkdirSync(parts);
    const reports = [1, 2].map((k) => {
      const r = sampleReport();
      r.files = k === 1 ? r.files.slice(0, 2) : r.files.slice(2);
      r.part = { index: k, total: 2 };
      r.split = [
        {
          path: 'big.graphml',
          realizations: 64,
          samples: [{ side: 'head', challenge: 'random-nodes', from: (k - 1) * 32, to: k * 32, points: 0, values: '' }],
        },
      ];
      writeFileSync(path.join(parts, `part-${k}.json`), JSON.stringify(r));
      return r;
    });
    const { d, rec } = deps(sampleReport());
    await run(env({ 'INPUT_JOIN-PARTS': 'parts' }), d);
    expect(rec.gateCalls).toHaveLength(1);
    const join = rec.gateCalls[0].join!;
    expect(join.total).toBe(2);
    expect([...join.split]).toEqual(['big.graphml']);
    expect([...join.files.keys()].sort()).toEqual(reports.flatMap((r) => r.files.map((f) => f.path)).sort());
    expect(rec.gateCalls[0].part).toBeUndefined();
    expect(rec.summary).toContain('judged here from their samples');
    // Part 2 missing: the join names it and judges nothing.
    rmSync(path.join(parts, 'part-2.json'));
    const gap = deps(sampleReport());
    expect((await run(env({ 'INPUT_JOIN-PARTS': 'parts' }), gap.d)).exitCode).toBe(2);
    expect(gap.rec.gateCalls).toEqual([]);
    expect(gap.rec.failed.join('\n')).toContain('part 2/2 is missing');
  });
});
