// Element ids are written by whoever opens the pull request. Here they carry Markdown, HTML,
// ANSI escape sequences, workflow-command syntax (`::`), percent-encoded and real newlines,
// bidirectional overrides and comment terminators, and the real gate runs on the design; then
// every output is checked: the terminal view, the job summary and the PR comment (as the
// Action posts it to a loopback stand-in for the REST API), the workflow commands the Action
// prints for annotations (captured from stdout, as the runner reads them), SARIF and HTML.
// The JSON report keeps the ids exactly (it is data); every view neutralises them.

import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { stringify as yamlStringify } from 'yaml';
import { joinReports } from '../../src/gate/join.js';
import { renderHtml } from '../../src/report/html.js';
import { renderComment, renderSummary } from '../../src/report/markdown.js';
import type { Report } from '../../src/report/report.js';
import { renderSarif } from '../../src/report/sarif.js';
import { renderTerminal } from '../../src/report/terminal.js';
import { runGate } from '../../src/run-gate.js';
import { coreOutput } from '../../src/shell/action-outputs.js';
import { run } from '../../src/shell/action-run.js';
import { createClient } from '../../src/shell/github.js';
import { startFakeApi, type FakeApi } from '../action/fake-api.js';
import { memoryDeps, type MemoryRepo } from '../gate/memory-repo.js';
import { reportCount } from './support.js';

/** Hostile ids, one per trick; each is a valid id (unique, at most 256 characters). */
const IDS = {
  script: '<script>alert(1)</script>',
  img: '<img src=x onerror=alert(1)>',
  markdown: '**bold** _em_ [link](https://evil.example) ![i](https://evil.example/x.png)',
  pipes: 'a|b||c',
  code: '``` fence `tick`',
  mention: '@everyone @acme/owners',
  ansi: '\u001b[2J\u001b[31mRED\u001b]8;;https://evil.example\u0007link\u001b]8;;\u0007\u001b[0m',
  command: '::error file=x,line=1::injected-command',
  setOutput: '::set-output name=verdict::pass',
  percent: '%0A::warning::percent-injected%0D%0A',
  crlf: 'line1\r\n::error::crlf-injected\r\n# Heading-injected',
  newline: 'x\n| forged | row |\n::add-mask::secret',
  bidi: 'safe\u202Eevil\u202C\u200B',
  comment: '--> </details> <!-- netbrace:comment default -->',
  expr: '${{ secrets.GITHUB_TOKEN }}',
} as const;
const ALL = Object.values(IDS);

/** Sites named by the hostile ids, in a chain between two plain ends; the base closes it into a
 *  ring and has one more site. So at head every hostile site is a new cut node, every link a new
 *  bridge (named by a hostile id), and the extra site is removed by the change. */
const SITES = [
  IDS.script,
  IDS.img,
  IDS.markdown,
  IDS.pipes,
  IDS.code,
  IDS.mention,
  IDS.ansi,
  IDS.command,
  IDS.bidi,
  IDS.comment,
];
const LINKS = [
  IDS.setOutput,
  IDS.percent,
  IDS.crlf,
  IDS.newline,
  IDS.expr,
  `${IDS.script} l`,
  `${IDS.ansi} l`,
  `${IDS.command} l`,
  `${IDS.bidi} l`,
  `${IDS.comment} l`,
  `${IDS.markdown} l`,
];
const REMOVED = `${IDS.newline} site`;
/** The design's file name is the pull request's too: table pipes, a line break and a command in it. */
const PATH = `designs/${IDS.pipes}\r\n::error::path-injected ${IDS.script}.net.yaml`;

function repo(): MemoryRepo {
  const chain = ['end-a', ...SITES, 'end-b'];
  const links = chain.slice(1).map((b, i) => ({ id: LINKS[i], between: [chain[i], b] }));
  const design = (base: boolean) =>
    yamlStringify({
      network: { name: IDS.markdown, description: IDS.ansi },
      // Labels are the pull request's too, and views now name sites by them: one trick each.
      nodes: [...chain.map((id, i) => ({ id, label: ALL[(i + 1) % ALL.length] })), ...(base ? [{ id: REMOVED }] : [])],
      links: [...links, ...(base ? [{ between: ['end-b', REMOVED] }, { between: [REMOVED, 'end-a'] }] : [])],
    });
  const policy = 'designs:\n  - paths: ["**/*.net.yaml"]\n';
  const file = PATH;
  return {
    base: { '.netbrace.yaml': policy, [file]: design(true) },
    head: { '.netbrace.yaml': policy, [file]: design(false) },
  };
}

// ---------------------------------------------------------------------------------------------
// What each kind of output must not contain

const BIDI = /[\u202A-\u202E\u2066-\u2069\u200B-\u200F]/;

function controlProblems(text: string, where: string, allowSgr = false): string[] {
  const problems: string[] = [];
  const stripped = allowSgr ? text.replace(/\u001b\[[0-9;]*m/g, '') : text;
  if (stripped.includes('\u001b')) problems.push(`${where}: an ESC byte`);
  if (/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.test(stripped.replace(/\u001b/g, '')))
    problems.push(`${where}: a control character`);
  if (BIDI.test(text)) problems.push(`${where}: a bidirectional or zero-width character`);
  return problems;
}

/** Lines that a hostile id turned into a workflow command (the runner reads `::` at a line start, after spaces). */
function commandLines(text: string, where: string): string[] {
  return text
    .split(/\r\n|\r|\n/)
    .filter((line) => /^\s*::/.test(line) && /injected|set-output|add-mask/.test(line))
    .map((line) => `${where}: line starts a workflow command: ${JSON.stringify(line.slice(0, 80))}`);
}

/** Lines that a hostile id forged in Markdown (a heading, a table row) or where a payload starts a line. */
function forgedLines(text: string, where: string): string[] {
  return text
    .split(/\r\n|\r|\n/)
    .filter((line) => /^\s*(# Heading-injected|\| forged|injected-command|crlf-injected|percent-injected)/.test(line))
    .map((line) => `${where}: forged line ${JSON.stringify(line.slice(0, 80))}`);
}

/** Markdown without its code: fenced blocks and inline code spans render their content literally. */
function outsideCode(md: string): string {
  const lines: string[] = [];
  let fence: string | undefined;
  for (const line of md.split('\n')) {
    const m = /^\s*(`{3,}|~{3,})/.exec(line);
    if (fence) {
      if (m && m[1][0] === fence[0] && m[1].length >= fence.length) fence = undefined;
      continue;
    }
    if (m) {
      fence = m[1];
      continue;
    }
    lines.push(line.replace(/(`+)(?!`)([\s\S]*?[^`])\1(?!`)/g, ''));
  }
  return lines.join('\n');
}

/** Markdown that an id could break: raw HTML, links, images, mentions, table cells, comments, details. */
function markdownProblems(md: string, where: string): string[] {
  const problems = [...controlProblems(md, where), ...commandLines(md, where), ...forgedLines(md, where)];
  const prose = outsideCode(md);
  if (/<(script|img)\b/i.test(prose)) problems.push(`${where}: raw HTML from an id`);
  if (/\]\(https:\/\/evil/.test(prose)) problems.push(`${where}: a Markdown link from an id`);
  if (/(^|[^\\])!\[i\\?\]/.test(prose)) problems.push(`${where}: an image from an id`);
  if (/@(everyone|acme)/.test(prose)) problems.push(`${where}: a live @-mention`);
  const count = (re: RegExp) => (prose.match(re) ?? []).length;
  if (count(/<!--/g) !== count(/-->/g))
    problems.push(`${where}: ${count(/<!--/g)} comment openers, ${count(/-->/g)} closers`);
  if (count(/<details/g) !== count(/<\/details>/g)) problems.push(`${where}: <details> unbalanced`);
  // Tables: every row has as many cells as its header. GitHub splits cells at every unescaped
  // |, code spans included, so the raw line is what counts.
  const lines = md.split('\n');
  for (let i = 0; i < lines.length; i++) {
    if (!lines[i].startsWith('|') || !lines[i + 1]?.match(/^\|(\s*:?-+:?\s*\|)+\s*$/)) continue;
    const cells = (l: string) => l.replace(/\\\\/g, '').split(/(?<!\\)\|/).length;
    const want = cells(lines[i]);
    for (let j = i + 2; j < lines.length && lines[j].startsWith('|'); j++) {
      if (cells(lines[j]) !== want)
        problems.push(
          `${where}: table row ${j + 1} has ${cells(lines[j]) - 2} cells, the header ${want - 2}: ${lines[j].slice(0, 120)}`,
        );
    }
  }
  return problems;
}

function strings(value: unknown, out: string[] = []): string[] {
  if (typeof value === 'string') out.push(value);
  else if (Array.isArray(value)) for (const v of value) strings(v, out);
  else if (value && typeof value === 'object') for (const v of Object.values(value)) strings(v, out);
  return out;
}

// ---------------------------------------------------------------------------------------------

let report: Report;
let dir: string;
let api: FakeApi;

beforeAll(async () => {
  const { report: r } = await runGate(
    { base: 'base', head: 'head', policySource: 'base', mode: 'block' },
    memoryDeps(repo()),
  );
  report = r;
  dir = mkdtempSync(path.join(tmpdir(), 'nb-ids-'));
  api = await startFakeApi();
});
afterAll(async () => {
  await api.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('hostile ids in a real gate run', () => {
  it('reach the report as data: ids kept exactly, in findings, sequences and changes', () => {
    const f = report.files[0];
    expect(f.path).toBe(PATH);
    expect(f.findings.some((x) => x.rule === 'new-bridge')).toBe(true);
    expect(f.findings.some((x) => x.rule === 'new-cut-node')).toBe(true);
    // Every link is a new bridge and every hostile site a new cut node, with its id byte for byte.
    expect(f.head!.structure.bridges.map((b) => b.id)).toEqual(LINKS);
    expect(f.head!.structure.cutNodes.map((b) => b.id)).toEqual(SITES);
    expect(f.changes?.removed.map((e) => e.id)).toContain(REMOVED);
    expect(strings(f.findings)).toEqual(expect.arrayContaining([...SITES, ...LINKS]));
    // Labels are kept exactly too, on the elements that have them.
    expect(f.findings.flatMap((x) => x.elements).some((e) => e.label === IDS.crlf)).toBe(true);
  });

  it('terminal: no ESC, BEL, CR or bidi character from an id, with colour off or on', () => {
    for (const color of [false, true]) {
      const text = renderTerminal(report, { color, width: 100 });
      expect(controlProblems(text, `terminal (colour ${color})`, color)).toEqual([]);
      expect(commandLines(text, 'terminal')).toEqual([]);
      expect(text).toContain('RED'); // the visible part of the id is still shown
    }
  });

  it('job summary and PR comment: no HTML, links, mentions, broken tables or forged lines', async () => {
    const summary = renderSummary(report, { runUrl: 'https://github.com/acme/net/actions/runs/1' });
    const comment = renderComment(report, { key: 'default' });
    if (process.env.DUMP_MD) (await import('node:fs')).writeFileSync(process.env.DUMP_MD, summary);
    expect(markdownProblems(summary, 'summary')).toEqual([]);
    expect(markdownProblems(comment, 'comment')).toEqual([]);
    expect(summary).toContain('bold'); // shown, as text
  });

  it('SARIF: message texts free of control and bidi characters; valid JSON', () => {
    const sarif = renderSarif(report);
    const text = JSON.stringify(sarif);
    expect(JSON.parse(text)).toEqual(sarif);
    const messages = (sarif.runs[0] as { results: { message: { text: string } }[] }).results.map((r) => r.message.text);
    expect(messages.length).toBeGreaterThan(0);
    expect(
      messages.flatMap((m, i) => [
        ...controlProblems(m, `result ${i}`),
        ...commandLines(m, `result ${i}`),
        ...forgedLines(m, `result ${i}`),
      ]),
    ).toEqual([]);
  });

  it('HTML: every id escaped; no script, no element or comment from an id', () => {
    const html = renderHtml(report);
    expect(controlProblems(html, 'html')).toEqual([]);
    expect(html).not.toMatch(/<(script|img)\b/i);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect((html.match(/<!--/g) ?? []).length).toBe((html.match(/-->/g) ?? []).length);
  });
});

describe('hostile ids through the Action, as the runner sees its output', () => {
  it('workflow commands, summary, comment, outputs, SARIF, HTML and the JSON report', async () => {
    const ws = path.join(dir, 'ws');
    mkdirSync(ws);
    const event = path.join(dir, 'event.json');
    const BASE = 'a'.repeat(40);
    const HEAD = 'b'.repeat(40);
    writeFileSync(
      event,
      JSON.stringify({
        number: 5,
        pull_request: {
          number: 5,
          base: { sha: BASE, repo: { full_name: 'acme/net' } },
          head: { sha: HEAD, repo: { full_name: 'acme/net', fork: false } },
        },
      }),
    );
    const summaryFile = path.join(dir, 'summary.md');
    const outputFile = path.join(dir, 'output.txt');
    writeFileSync(summaryFile, '');
    writeFileSync(outputFile, '');
    const env = {
      GITHUB_WORKSPACE: ws,
      GITHUB_EVENT_NAME: 'pull_request',
      GITHUB_EVENT_PATH: event,
      GITHUB_REPOSITORY: 'acme/net',
      GITHUB_API_URL: api.url,
      GITHUB_STEP_SUMMARY: summaryFile,
      INPUT_TOKEN: 'tok',
      INPUT_COMMENT: 'every-run',
      INPUT_HTML: 'out/report.html',
      NETBRACE_HTTP_RETRIES: '0',
    };
    const mem = memoryDeps(repo());
    // @actions/core writes commands to stdout and outputs to the file named by the process's env.
    const written: string[] = [];
    const realWrite = process.stdout.write.bind(process.stdout);
    const savedOutput = process.env.GITHUB_OUTPUT;
    const savedExit = process.exitCode;
    process.env.GITHUB_OUTPUT = outputFile;
    (process.stdout as { write: unknown }).write = (chunk: string | Uint8Array) => {
      written.push(typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8'));
      return true;
    };
    let outcome;
    try {
      outcome = await run(env, {
        gate: (request) => runGate({ ...request, base: 'base', head: 'head' }, mem),
        join: joinReports,
        git: async (args) => ({ code: 0, stdout: args.includes('--show-toplevel') ? `${ws}\n` : '', stderr: '' }),
        github: (o) => createClient(o),
        renderHtml,
        out: coreOutput(env),
      });
    } finally {
      (process.stdout as { write: unknown }).write = realWrite;
      if (savedOutput === undefined) delete process.env.GITHUB_OUTPUT;
      else process.env.GITHUB_OUTPUT = savedOutput;
      process.exitCode = savedExit;
    }
    expect(outcome, written.filter((w) => w.startsWith('::error')).join('')).toMatchObject({
      exitCode: 1,
      verdict: 'fail',
    });
    const stdout = written.join('');
    // Every line that starts a workflow command is one of ours; payloads never start one.
    const commands = stdout.split('\n').filter((l) => l.startsWith('::'));
    expect(commands.length).toBeGreaterThan(2);
    for (const c of commands) expect(c).toMatch(/^::(error|warning|notice)( [^:]*)?::/);
    // The runner decodes a command's data (%25 → %, %0D → CR, %0A → LF) into the message it
    // shows; no line of it may start a command either, and a "%0A" in an id stays text.
    const decode = (d: string) =>
      d.replace(/%0D/g, '\r').replace(/%0A/g, '\n').replace(/%3A/g, ':').replace(/%2C/g, ',').replace(/%25/g, '%');
    for (const c of commands) {
      const [, , props = '', data] = /^::(\w+)( [^:]*)?::(.*)$/.exec(c)!;
      expect(commandLines(decode(data), 'annotation message')).toEqual([]);
      expect(props).not.toMatch(/[\r\n]/);
    }
    expect(stdout).toContain('%250A::warning::percent-injected');
    expect(stdout).not.toContain('%0A::warning::percent-injected');
    expect(controlProblems(stdout.replace(/\n/g, ''), 'stdout')).toEqual([]);
    const comment = api.comments[0]?.body ?? '';
    expect(comment).toContain('<!-- netbrace:comment');
    expect(markdownProblems(comment, 'posted comment')).toEqual([]);
    expect(markdownProblems(readFileSync(summaryFile, 'utf8'), 'GITHUB_STEP_SUMMARY')).toEqual([]);
    const outputs = readFileSync(outputFile, 'utf8');
    expect(outputs).toMatch(/^verdict<<ghadelimiter_/m);
    expect(commandLines(outputs, 'GITHUB_OUTPUT')).toEqual([]);
    const sarif = JSON.parse(readFileSync(path.join(ws, '.netbrace-out', 'netbrace.sarif'), 'utf8'));
    const texts = (sarif.runs[0].results as { message: { text: string } }[]).map((r) => r.message.text);
    expect(texts.flatMap((t) => controlProblems(t, 'sarif'))).toEqual([]);
    const html = readFileSync(path.join(ws, 'out', 'report.html'), 'utf8');
    expect(html).not.toMatch(/<(script|img)\b/i);
    const json = JSON.parse(readFileSync(path.join(ws, '.netbrace-out', 'netbrace-report.json'), 'utf8'));
    expect(strings(json)).toEqual(expect.arrayContaining([...SITES, ...LINKS]));
    reportCount(
      'hostile',
      'ids through every output',
      ALL.length,
      `${commands.length} workflow commands, ${comment.length}-character comment`,
    );
  }, 30_000);
});
