import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  createClient,
  findComment,
  httpSettingsFromEnv,
  isPermissionError,
  listPullRequestFiles,
  upsertComment,
} from '../../src/shell/github.js';
import { startFakeApi, type FakeApi } from '../action/fake-api.js';

const ref = { owner: 'acme', repo: 'net', issueNumber: 7 };
const marker = '<!-- netbrace:comment key=k -->';
let api: FakeApi;
const logs: string[] = [];

const client = (over: Partial<Parameters<typeof createClient>[0]> = {}) =>
  createClient({
    token: 't0k',
    baseUrl: api.url,
    retries: 2,
    backoffMs: 10,
    timeoutMs: 300,
    log: (m) => logs.push(m),
    ...over,
  });

beforeEach(async () => {
  api = await startFakeApi();
  logs.length = 0;
});
afterEach(async () => {
  await api.close();
});

describe('the living comment', () => {
  it('is created once, then updated in place, found past the first page', async () => {
    for (let i = 0; i < 150; i++) api.comments.push({ id: i + 1, body: `chatter ${i}`, user: { login: 'someone' } });
    const c = client();
    const first = await upsertComment(c, ref, marker, `${marker}\nfirst`);
    expect(first.action).toBe('created');
    // Another job's comment, with a different key, must not be taken for ours.
    api.comments.push({ id: 5000, body: '<!-- netbrace:comment key=other -->\nx', user: { login: 'bot' } });
    for (let i = 0; i < 120; i++) api.comments.push({ id: 6000 + i, body: `later ${i}`, user: { login: 'someone' } });
    const second = await upsertComment(c, ref, marker, `${marker}\nsecond`);
    expect(second).toMatchObject({ action: 'updated', id: first.id });
    const ours = api.comments.filter((x) => x.body.includes(marker));
    expect(ours.length).toBe(1);
    expect(ours[0].body).toBe(`${marker}\nsecond`);
    expect(api.comments.find((x) => x.id === 5000)!.body).toContain('key=other');
    const pages = api.requests.filter((r) => r.method === 'GET').map((r) => r.query.page ?? '1');
    expect(pages).toContain('2');
    expect(api.requests.every((r) => r.authorization === 'token t0k')).toBe(true);
    const third = await upsertComment(c, ref, marker, `${marker}\nsecond`);
    expect(third.action).toBe('unchanged');
  }, 20_000);

  it('adopts only a comment written by the identity the token acts as, never a pasted copy of the marker', async () => {
    api.comments.push({ id: 1, body: `${marker}\nfake, pasted by someone`, user: { login: 'someone', type: 'User' } });
    api.comments.push({ id: 2, body: `${marker}\nanother bot's`, user: { login: 'other-app[bot]', type: 'Bot' } });
    api.comments.push({ id: 3, body: `${marker}\nreal`, user: { login: 'github-actions[bot]', type: 'Bot' } });
    expect((await findComment(client(), ref, marker))?.id).toBe(3);
  });

  it('never edits a person\u2019s comment that quotes the marker: creates its own instead', async () => {
    api.comments.push({ id: 1, body: `> ${marker}\nquoted by a reviewer`, user: { login: 'reviewer', type: 'User' } });
    const r = await upsertComment(client(), ref, marker, `${marker}\nours`);
    expect(r.action).toBe('created');
    expect(api.comments.find((c) => c.id === 1)?.body).toBe(`> ${marker}\nquoted by a reviewer`);
    expect(api.requests.some((x) => x.method === 'PATCH')).toBe(false);
  });

  it('with a personal token, adopts the comment of the user GET /user names', async () => {
    api.tokenUser = 'planner-bot';
    api.comments.push({
      id: 1,
      body: `${marker}\nby the workflow token`,
      user: { login: 'github-actions[bot]', type: 'Bot' },
    });
    api.comments.push({ id: 2, body: `${marker}\nours`, user: { login: 'planner-bot', type: 'User' } });
    expect((await findComment(client(), ref, marker))?.id).toBe(2);
  });

  it('lets the caller skip the write', async () => {
    const r = await upsertComment(client(), ref, marker, `${marker}\nx`, () => false);
    expect(r.action).toBe('skipped');
    expect(api.requests.some((x) => x.method === 'POST')).toBe(false);
  });

  it('reports a read-only token (fork) as a permission error', async () => {
    api.writes = 'forbidden';
    const err = await upsertComment(client(), ref, marker, `${marker}\nx`).catch((e: unknown) => e);
    expect(isPermissionError(err)).toBe(true);
    expect(api.requests.filter((r) => r.method === 'POST').length).toBe(1); // 403 is not retried
  });
});

describe('reliability', () => {
  it('retries a 5xx and succeeds', async () => {
    api.reads = 'error500';
    api.failFirst = 2;
    expect(await findComment(client(), ref, marker)).toBeUndefined();
    expect(api.requests.length).toBe(3);
  });

  it('gives up on an API that stays down, after the bounded retries', async () => {
    api.reads = 'error500';
    const t0 = Date.now();
    const err = await findComment(client(), ref, marker).catch((e: unknown) => e);
    expect((err as { status?: number }).status).toBe(500);
    expect(api.requests.length).toBe(3); // 1 + 2 retries
    expect(Date.now() - t0).toBeLessThan(5000);
  });

  it('waits for a rate-limit reset and retries', async () => {
    api.reads = 'rateLimit';
    api.failFirst = 1;
    expect(await findComment(client(), ref, marker)).toBeUndefined();
    expect(api.requests.length).toBe(2);
    expect(logs.some((l) => /rate limit/.test(l))).toBe(true);
  });

  it('does not wait for a reset that is too far away', async () => {
    api.reads = 'rateLimit';
    const err = await findComment(client({ maxRateLimitWaitS: 0 }), ref, marker).catch((e: unknown) => e);
    expect((err as { status?: number }).status).toBe(403);
    expect(isPermissionError(err)).toBe(false);
    expect(api.requests.length).toBe(1);
  });

  it('times out on an API that hangs', async () => {
    api.reads = 'hang';
    const t0 = Date.now();
    const err = await findComment(client({ retries: 1, timeoutMs: 200 }), ref, marker).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Error);
    expect(String((err as Error).message)).toMatch(/no answer within 200 ms/);
    expect(api.requests.length).toBe(2);
    expect(Date.now() - t0).toBeLessThan(3000);
  });

  it('reads its test knobs from the environment', () => {
    expect(
      httpSettingsFromEnv({
        NETBRACE_HTTP_RETRIES: '1',
        NETBRACE_HTTP_BACKOFF_MS: '5',
        NETBRACE_HTTP_TIMEOUT_MS: '250',
      }),
    ).toEqual({ retries: 1, backoffMs: 5, timeoutMs: 250 });
    expect(httpSettingsFromEnv({ NETBRACE_HTTP_RETRIES: 'lots' })).toEqual({});
  });
});

describe('pull-request files', () => {
  it('reads every page and maps statuses and renames', async () => {
    for (let i = 0; i < 250; i++) api.prFiles.push({ filename: `d/${i}.gml`, status: 'modified' });
    api.prFiles.push({ filename: 'new/name.net.yaml', status: 'renamed', previous_filename: 'old/name.net.yaml' });
    api.prFiles.push({ filename: 'gone.gml', status: 'removed' });
    const { files, truncated } = await listPullRequestFiles(client(), ref);
    expect(files.length).toBe(252);
    expect(truncated).toBe(false);
    expect(files[250]).toEqual({ path: 'new/name.net.yaml', status: 'R', previousPath: 'old/name.net.yaml' });
    expect(files[251].status).toBe('D');
    expect(api.requests.filter((r) => r.path.endsWith('/files')).length).toBe(3);
  });
});
