// Faults the gate must survive without changing its verdict or hiding what went wrong. The
// REST API (a loopback stand-in, test/action/fake-api.ts, plus a server here that answers
// malformed JSON or a proxy's HTML page) answers 500, a rate limit with reset headers, never
// (a timeout), garbage, or is not there at all: the verdict and exit code are those of a
// healthy run, and the step says what could not be posted. git fails: a base that cannot be
// fetched, a corrupt object, a missing object, no git at all: a clear message, exit 2, no
// stack trace — and never a pass that a damaged clone made up.

import { chmodSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { joinReports } from '../../src/gate/join.js';
import type { Report } from '../../src/report/report.js';
import { runGate } from '../../src/run-gate.js';
import type { ActionDeps, RunOutcome } from '../../src/shell/action-deps.js';
import { run } from '../../src/shell/action-run.js';
import { gitDeps, runGit } from '../../src/shell/git.js';
import { createClient } from '../../src/shell/github.js';
import { startFakeApi, type FakeApi } from '../action/fake-api.js';
import { emptyReport, sampleReport } from '../report/sample-report.js';
import { cli, commitFiles, fakeGit, fixtureText, git, reportCount, scratchRepo } from './support.js';

const BASE = 'a'.repeat(40);
const HEAD = 'b'.repeat(40);
/** Hang guard for a whole Action run against a failing API (retries are bounded and fast here). */
const RUN_MS = 15_000;

let tmp: string;
beforeAll(() => {
  tmp = mkdtempSync(path.join(tmpdir(), 'nb-faults-'));
});
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

interface Rec {
  failed: string[];
  warnings: string[];
  infos: string[];
  summary: string;
  outputs: Record<string, string>;
}

function stubDeps(report: Report, ws: string): { d: ActionDeps; rec: Rec } {
  const rec: Rec = { failed: [], warnings: [], infos: [], summary: '', outputs: {} };
  const d: ActionDeps = {
    gate: async (request) => {
      const r = structuredClone(report);
      r.mode = request.mode;
      return { report: r, exitCode: r.verdict === 'fail' ? 1 : 0 };
    },
    join: joinReports,
    git: async (args) => fakeGit(ws)(args),
    github: (o) => createClient(o),
    out: {
      annotate: () => {},
      info: (m) => rec.infos.push(m),
      warning: (m) => rec.warnings.push(m),
      setOutput: (k, v) => void (rec.outputs[k] = v),
      setFailed: (m) => rec.failed.push(m),
      appendSummary: (m) => void (rec.summary += m),
    },
  };
  return { d, rec };
}

function env(ws: string, apiUrl: string, over: Record<string, string> = {}): Record<string, string> {
  const event = path.join(ws, '..', `event-${path.basename(ws)}.json`);
  writeFileSync(
    event,
    JSON.stringify({
      number: 9,
      pull_request: {
        number: 9,
        base: { sha: BASE, repo: { full_name: 'acme/net' } },
        head: { sha: HEAD, repo: { full_name: 'acme/net', fork: false } },
      },
    }),
  );
  return {
    GITHUB_WORKSPACE: ws,
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_EVENT_PATH: event,
    GITHUB_REPOSITORY: 'acme/net',
    GITHUB_API_URL: apiUrl,
    INPUT_TOKEN: 'tok',
    INPUT_COMMENT: 'every-run',
    NETBRACE_HTTP_RETRIES: '1',
    NETBRACE_HTTP_BACKOFF_MS: '5',
    NETBRACE_HTTP_TIMEOUT_MS: '400',
    ...over,
  };
}

/** A server that answers every request with `status`, `body` and `type` (malformed JSON, an HTML error page). */
async function rawServer(
  status: number,
  body: string,
  type: string,
): Promise<{ url: string; hits: () => number; close(): Promise<void> }> {
  let hits = 0;
  const server: Server = createServer((req, res) => {
    hits++;
    req.resume();
    res.writeHead(status, { 'content-type': type });
    res.end(body);
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    hits: () => hits,
    close: () => new Promise<void>((r) => server.close(() => r())),
  };
}

let injected = 0;
const produced: string[] = [];

describe('REST API faults: the verdict is that of a healthy run; the step says what was not posted', () => {
  let api: FakeApi;
  let ws: string;
  beforeEach(async () => {
    api = await startFakeApi();
    ws = mkdtempSync(path.join(tmp, 'ws-'));
  });
  afterEach(() => api.close());

  async function runWith(
    report: Report,
    url: string,
    over: Record<string, string> = {},
  ): Promise<{ out: RunOutcome; rec: Rec; ms: number }> {
    const { d, rec } = stubDeps(report, ws);
    const t0 = performance.now();
    const out = await run(env(ws, url, over), d);
    return { out, rec, ms: performance.now() - t0 };
  }

  /** The same report without any API call (comment: off), to compare against. */
  async function healthy(report: Report) {
    const h = await runWith(report, api.url, { INPUT_COMMENT: 'off' });
    expect(h.rec.warnings).toEqual([]);
    expect(api.requests).toEqual([]);
    return h;
  }

  const faults: [string, (a: FakeApi) => void][] = [
    ['500 on every request', (a) => ((a.reads = 'error500'), (a.writes = 'error500'))],
    ['500 on writes only', (a) => (a.writes = 'error500')],
    [
      'a rate limit that does not lift (403, x-ratelimit-remaining 0, reset header)',
      (a) => ((a.reads = 'rateLimit'), (a.writes = 'rateLimit')),
    ],
    ['no answer at all (timeouts)', (a) => ((a.reads = 'hang'), (a.writes = 'hang'))],
    ['a read-only token (403, a fork)', (a) => (a.writes = 'forbidden')],
  ];
  // Every fault on a failing report; the first on a passing one too. (Few writes: the client
  // spaces comment writes seconds apart, which is right for GitHub and slow for tests.)
  for (const [k, [what, inject]] of faults.entries()) {
    for (const [name, report] of (
      [
        ['failing', sampleReport()],
        ['passing', emptyReport()],
      ] as const
    ).slice(0, k === 0 ? 2 : 1)) {
      it(
        `${what}, ${name} report`,
        async () => {
          injected++;
          const ok = await healthy(report);
          inject(api);
          const bad = await runWith(report, api.url);
          expect(bad.ms, 'hang guard').toBeLessThan(RUN_MS);
          expect(bad.out.exitCode).toBe(ok.out.exitCode);
          expect(bad.out.verdict).toBe(ok.out.verdict);
          expect(bad.rec.failed).toEqual(ok.rec.failed);
          expect(bad.rec.outputs.verdict).toBe(ok.rec.outputs.verdict);
          expect(bad.out.comment).toBe('failed');
          expect(bad.rec.warnings).toHaveLength(1);
          expect(bad.rec.warnings[0]).toMatch(
            /^netbrace: (could not write the pull-request comment \(.+\); the verdict is unaffected|the token cannot write the pull-request comment)/,
          );
          expect(bad.rec.summary).toContain('The pull-request comment could not be written');
          expect(bad.rec.failed.join('')).not.toMatch(/\n\s+at /);
          produced.push(`${what} (${name}): exit ${bad.out.exitCode}, ${bad.rec.warnings[0].slice(0, 90)}…`);
        },
        RUN_MS + 5_000,
      );
    }
  }

  it(
    'a rate limit that lifts at its reset time: the client waits, then the comment is written',
    async () => {
      injected++;
      api.writes = 'rateLimit';
      api.failFirst = 1;
      const r = await runWith(sampleReport(), api.url);
      expect(r.out).toMatchObject({ exitCode: 1, verdict: 'fail' });
      expect(r.out.comment).toMatchObject({ action: 'created' });
      expect(r.rec.infos.some((m) => /rate limit .* retrying in \d+ s/.test(m))).toBe(true);
      expect(r.rec.warnings).toEqual([]);
      produced.push(`rate limit that lifts: comment ${(r.out.comment as { action: string }).action} after waiting`);
    },
    RUN_MS,
  );

  for (const [what, status, body, type] of [
    [
      'malformed JSON (200, a body cut short)',
      200,
      '{"id": 1, "body": "<!-- netbrace:comment',
      'application/json; charset=utf-8',
    ],
    ["a proxy's HTML error page (502)", 502, '<html><body><h1>502 Bad Gateway</h1></body></html>', 'text/html'],
  ] as const) {
    it(
      `${what}: the verdict stands, the step says the comment was not written`,
      async () => {
        injected++;
        const server = await rawServer(status, body, type);
        try {
          const r = await runWith(sampleReport(), server.url);
          expect(r.out).toMatchObject({ exitCode: 1, verdict: 'fail', comment: 'failed' });
          expect(r.rec.failed).toEqual([
            'netbrace blocks this merge: 1 design weakened, 1 design could not be read (see the annotations and the job summary)',
          ]);
          expect(r.rec.warnings[0]).toMatch(/could not write the pull-request comment/);
          expect(server.hits()).toBeGreaterThan(0);
          produced.push(`${what}: exit 1, ${r.rec.warnings[0].slice(0, 90)}…`);
        } finally {
          await server.close();
        }
      },
      RUN_MS,
    );
  }

  it(
    'no server at all (connection refused)',
    async () => {
      injected++;
      const server = await rawServer(200, '[]', 'application/json');
      const url = server.url;
      await server.close();
      const r = await runWith(sampleReport(), url);
      expect(r.out).toMatchObject({ exitCode: 1, verdict: 'fail', comment: 'failed' });
      expect(r.rec.warnings[0]).toMatch(/could not write the pull-request comment/);
      produced.push(`connection refused: exit 1, ${r.rec.warnings[0].slice(0, 90)}…`);
    },
    RUN_MS,
  );

  it(
    'the REST fallback for a missing base, with the API down: stop with the fix, never guess a pass',
    async () => {
      injected++;
      api.reads = 'error500';
      api.prFiles.push({ filename: 'README.md', status: 'modified' });
      const { d, rec } = stubDeps(emptyReport(), ws);
      const missingBase = fakeGit(ws, BASE);
      d.git = async (args) => missingBase(args);
      const out = await run(env(ws, api.url), d);
      expect(out.exitCode).toBe(2);
      expect(rec.failed).toHaveLength(1);
      expect(rec.failed[0]).toMatch(
        /the base commit a{40} is not in the clone and could not be fetched \(git fetch: fatal: remote error: upload-pack: not our ref\)\. To fix it, add `fetch-depth: 0`/,
      );
      expect(rec.warnings.some((w) => /could not list the pull request/.test(w))).toBe(true);
      produced.push('base missing + API down: exit 2 with the checkout fix');
    },
    RUN_MS,
  );
});

// ---------------------------------------------------------------------------------------------
// git

describe('git failures end with one clear message', () => {
  const design = fixtureText('designs', 'ring.net.yaml');
  const changed = design
    .replace('north', 'nord')
    .replace(/\[north,/g, '[nord,')
    .replace(/, north\]/g, ', nord]');

  function noTrace(text: string): void {
    expect(text).not.toMatch(/\n\s+at |internal error/);
  }

  it('a base commit that is not in the clone and cannot be fetched (no remote): exit 2, what to do', async () => {
    injected++;
    const repo = scratchRepo(tmp, { 'designs/ring.net.yaml': design });
    const r = await cli(repo, 'check', '--base', 'c'.repeat(40));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(
      new RegExp(
        `^commit c{40} is not in this clone and could not be fetched from origin \\(.+\\) — fetch the history: with actions/checkout set "fetch-depth: 0"`,
      ),
    );
    noTrace(r.err);
    produced.push(`check --base <absent commit>: exit 2, ${r.err.split('\n')[0].slice(0, 100)}…`);
  });

  it('a shallow clone in the Action: the one missing base commit is fetched when origin has it, else the fix is named', async () => {
    injected += 2;
    const origin = scratchRepo(tmp, { 'designs/ring.net.yaml': design });
    git(origin, 'config', 'uploadpack.allowAnySHA1InWant', 'true');
    const base = git(origin, 'rev-parse', 'HEAD');
    const head = commitFiles(origin, { 'designs/ring.net.yaml': changed }, 'head');
    const clone = mkdtempSync(path.join(tmp, 'clone-'));
    git(tmp, 'clone', '-q', '--depth', '1', `file://${origin}`, clone);
    expect(() => git(clone, 'cat-file', '-e', `${base}^{commit}`)).toThrow();
    const event = path.join(tmp, 'shallow-event.json');
    writeFileSync(
      event,
      JSON.stringify({
        number: 1,
        pull_request: {
          number: 1,
          base: { sha: base, repo: { full_name: 'acme/net' } },
          head: { sha: head, repo: { full_name: 'acme/net', fork: false } },
        },
      }),
    );
    const realDeps = (): { d: ActionDeps; rec: Rec } => {
      const { d, rec } = stubDeps(emptyReport(), clone);
      d.gate = (request, root) => runGate(request, gitDeps(root));
      d.git = (args, cwd) => runGit(cwd, args);
      return { d, rec };
    };
    const e = {
      GITHUB_WORKSPACE: clone,
      GITHUB_EVENT_NAME: 'pull_request',
      GITHUB_EVENT_PATH: event,
      GITHUB_REPOSITORY: 'acme/net',
      INPUT_COMMENT: 'off',
    };
    const fetched = realDeps();
    const ok = await run(e, fetched.d);
    expect(fetched.rec.failed).toEqual([]);
    expect(ok).toMatchObject({ exitCode: 0, verdict: 'pass' });
    expect(
      fetched.rec.infos.some((m) =>
        /base commit .* is not in the clone \(shallow checkout\); fetching that one commit/.test(m),
      ),
    ).toBe(true);
    produced.push('shallow clone, base fetchable: fetched, verdict pass');
    // Now origin is gone: the fetch fails, and the message says what to add to the checkout step.
    const clone2 = mkdtempSync(path.join(tmp, 'clone-'));
    git(tmp, 'clone', '-q', '--depth', '1', `file://${origin}`, clone2);
    git(clone2, 'remote', 'set-url', 'origin', path.join(tmp, 'no-such-remote'));
    const failing = realDeps();
    const out = await run({ ...e, GITHUB_WORKSPACE: clone2 }, failing.d);
    expect(out.exitCode).toBe(2);
    expect(failing.rec.failed).toHaveLength(1);
    expect(failing.rec.failed[0]).toMatch(
      /the base commit [0-9a-f]{40} is not in the clone and could not be fetched .* add `fetch-depth: 0` to the actions\/checkout step/,
    );
    noTrace(failing.rec.failed[0]);
    produced.push(`shallow clone, origin gone: exit 2, ${failing.rec.failed[0].slice(0, 100)}…`);
  }, 30_000);

  function damaged(kind: 'corrupt' | 'missing'): { repo: string; base: string; head: string } {
    const repo = scratchRepo(tmp, { 'designs/ring.net.yaml': design });
    const base = git(repo, 'rev-parse', 'HEAD');
    const head = commitFiles(repo, { 'designs/ring.net.yaml': changed }, 'head');
    const blob = git(repo, 'rev-parse', `${head}:designs/ring.net.yaml`);
    const file = path.join(repo, '.git', 'objects', blob.slice(0, 2), blob.slice(2));
    chmodSync(file, 0o644);
    if (kind === 'corrupt') writeFileSync(file, 'not a zlib stream');
    else rmSync(file);
    return { repo, base, head };
  }

  it('a corrupt object: exit 2, the file and "damaged" named, no stack trace', async () => {
    injected++;
    const { repo, base, head } = damaged('corrupt');
    const r = await cli(repo, 'check', '--base', base, '--head', head);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(
      /^git show [0-9a-f]{40}:designs\/ring\.net\.yaml: fatal: loose object [0-9a-f]{40} .* is corrupt — the clone is damaged \(a git object cannot be read\): run "git fsck", or clone the repository again\n$/,
    );
    noTrace(r.err);
    produced.push(`corrupt object: exit 2, ${r.err.slice(0, 100)}…`);
  });

  it('a missing object: exit 2 — never "the design was deleted", which would pass', async () => {
    injected++;
    const { repo, base, head } = damaged('missing');
    const r = await cli(repo, 'check', '--base', base, '--head', head, '--format', 'json');
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(
      /^git show [0-9a-f]{40}:designs\/ring\.net\.yaml: fatal: bad object .* — the clone is damaged/,
    );
    noTrace(r.err);
    produced.push(`missing object: exit 2, ${r.err.slice(0, 100)}…`);
  });

  it('no git on PATH: exit 2, "git is not installed or not on PATH"', async () => {
    injected++;
    const repo = scratchRepo(tmp, { 'designs/ring.net.yaml': design });
    const saved = process.env.PATH;
    process.env.PATH = path.join(tmp, 'empty-bin');
    let r;
    try {
      r = await cli(repo, 'check');
    } finally {
      process.env.PATH = saved;
    }
    expect(r.code).toBe(2);
    expect(r.err).toBe('git is not installed or not on PATH\n');
    produced.push('no git: exit 2, git is not installed or not on PATH');
  });

  it('a design over what git show can buffer (64 MiB): exit 2 naming the file, not the buffer', async () => {
    injected++;
    const repo = scratchRepo(tmp, { 'README.md': 'x\n' });
    const big = path.join(repo, 'designs', 'huge.csv');
    commitFiles(repo, { 'designs/.keep': '' }, 'dir');
    const line = 'a,b\n'.repeat(1 << 18); // 1 MiB
    writeFileSync(big, 'source,target\n');
    for (let i = 0; i < 66; i++) writeFileSync(big, line, { flag: 'a' });
    const head = commitFiles(repo, {}, 'huge');
    const policy = 'designs:\n  - paths: ["designs/**"]\n';
    commitFiles(repo, { '.netbrace.yaml': policy }, 'policy');
    const r = await cli(repo, 'check', '--head', 'HEAD', '--base', `${head}~1`, '--policy-source', 'head');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(
      /^designs\/huge\.csv:1:1: the file at [0-9a-f]{12} is larger than netbrace reads \(more than 67108864 bytes\) — design and policy files are limited to 20971520 bytes\n$/,
    );
    expect(readFileSync(big).length).toBeGreaterThan(64 * 2 ** 20);
    produced.push(`66 MiB design in a commit: exit 2, ${r.err.slice(0, 100)}…`);
  }, 30_000);
});

afterAll(() => {
  reportCount('faults', 'injected', injected);
  for (const p of produced) console.log(`  ${p}`);
});
