// A small stand-in for the GitHub REST API on 127.0.0.1, for tests only: issue comments
// (list with pagination and Link headers, create, update) and pull-request files. It records
// every request and can be told to fail: answer 500, answer 403 as a rate limit (with
// x-ratelimit-remaining: 0 and x-ratelimit-reset), answer 403 as a read-only token does on
// a fork's pull request, or hang without answering.

import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';

export type Failure = 'none' | 'error500' | 'rateLimit' | 'forbidden' | 'hang';

export interface RecordedRequest {
  method: string;
  path: string;
  query: Record<string, string>;
  body?: unknown;
  authorization?: string;
}

export interface FakeComment {
  id: number;
  body: string;
  user: { login: string; type?: string };
}

export interface FakeApi {
  url: string;
  requests: RecordedRequest[];
  comments: FakeComment[];
  prFiles: { filename: string; status: string; previous_filename?: string }[];
  /** What GET /repos/:o/:r/pulls/:n answers as head.sha. */
  prHeadSha: string;
  /** What reads (GET) and writes (POST/PATCH) answer; `failFirst` failures, then normal. */
  reads: Failure;
  writes: Failure;
  failFirst: number;
  /** The login GET /user answers (a personal token); unset: 403, as for the workflow token. */
  tokenUser?: string;
  close(): Promise<void>;
}

const PAGE_MAX = 100;

export async function startFakeApi(): Promise<FakeApi> {
  const hanging = new Set<ServerResponse>();
  let failures = 0;
  let nextId = 1000;
  const api: FakeApi = {
    url: '',
    requests: [],
    comments: [],
    prFiles: [],
    prHeadSha: '',
    reads: 'none',
    writes: 'none',
    failFirst: Number.POSITIVE_INFINITY,
    close: async () => {
      for (const res of hanging) res.destroy();
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections(); // keep-alive sockets would hold close() for seconds
      await closed;
    },
  };

  const send = (res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}) => {
    res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', ...headers });
    res.end(JSON.stringify(body));
  };

  const fail = (res: ServerResponse, kind: Failure): boolean => {
    if (kind === 'none' || failures >= api.failFirst) return false;
    failures++;
    if (kind === 'hang') {
      hanging.add(res);
      return true;
    }
    if (kind === 'error500') send(res, 500, { message: 'Server Error' });
    else if (kind === 'rateLimit') {
      const reset = Math.floor(Date.now() / 1000) + 1;
      send(
        res,
        403,
        { message: 'API rate limit exceeded for installation.' },
        { 'x-ratelimit-remaining': '0', 'x-ratelimit-limit': '1000', 'x-ratelimit-reset': String(reset) },
      );
    } else if (kind === 'forbidden') send(res, 403, { message: 'Resource not accessible by integration' });
    return true;
  };

  const paginate = <T>(req: IncomingMessage, res: ServerResponse, items: T[], query: Record<string, string>) => {
    const perPage = Math.min(PAGE_MAX, Number(query.per_page ?? 30));
    const page = Number(query.page ?? 1);
    const slice = items.slice((page - 1) * perPage, page * perPage);
    const headers: Record<string, string> = {};
    if (page * perPage < items.length) {
      const base = `${api.url}${(req.url ?? '').split('?')[0]}`;
      headers.link = `<${base}?per_page=${perPage}&page=${page + 1}>; rel="next", <${base}?per_page=${perPage}&page=${Math.ceil(items.length / perPage)}>; rel="last"`;
    }
    send(res, 200, slice, headers);
  };

  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const u = new URL(req.url ?? '/', 'http://127.0.0.1');
      const query = Object.fromEntries(u.searchParams.entries());
      const text = Buffer.concat(chunks).toString('utf8');
      const body = text ? (JSON.parse(text) as unknown) : undefined;
      api.requests.push({
        method: req.method ?? '',
        path: u.pathname,
        query,
        body,
        authorization: req.headers.authorization,
      });
      const write = req.method === 'POST' || req.method === 'PATCH';
      if (fail(res, write ? api.writes : api.reads)) return;
      let m: RegExpMatchArray | null;
      if (u.pathname === '/user' && req.method === 'GET') {
        if (api.tokenUser === undefined) return send(res, 403, { message: 'Resource not accessible by integration' });
        return send(res, 200, { login: api.tokenUser, type: 'User' });
      }
      if ((m = u.pathname.match(/^\/repos\/[^/]+\/[^/]+\/issues\/(\d+)\/comments$/))) {
        if (req.method === 'GET') return paginate(req, res, api.comments, query);
        if (req.method === 'POST') {
          const c = {
            id: nextId++,
            body: String((body as { body: string }).body),
            user:
              api.tokenUser !== undefined
                ? { login: api.tokenUser, type: 'User' }
                : { login: 'github-actions[bot]', type: 'Bot' },
          };
          api.comments.push(c);
          return send(res, 201, { ...c, html_url: `${api.url}/comment/${c.id}` });
        }
      }
      if ((m = u.pathname.match(/^\/repos\/[^/]+\/[^/]+\/issues\/comments\/(\d+)$/)) && req.method === 'PATCH') {
        const c = api.comments.find((x) => x.id === Number(m![1]));
        if (!c) return send(res, 404, { message: 'Not Found' });
        c.body = String((body as { body: string }).body);
        return send(res, 200, { ...c, html_url: `${api.url}/comment/${c.id}` });
      }
      if ((m = u.pathname.match(/^\/repos\/[^/]+\/[^/]+\/pulls\/(\d+)$/)) && req.method === 'GET') {
        return send(res, 200, { number: Number(m[1]), head: { sha: api.prHeadSha } });
      }
      if (u.pathname.match(/^\/repos\/[^/]+\/[^/]+\/pulls\/(\d+)\/files$/) && req.method === 'GET') {
        return paginate(req, res, api.prFiles, query);
      }
      send(res, 404, { message: 'Not Found' });
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  api.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return api;
}
