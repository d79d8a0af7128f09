import { afterEach, describe, expect, it, vi } from 'vitest';
import * as core from '@actions/core';
import {
  escapeCommandData,
  escapeCommandProperty,
  escapeHtml,
  escapeMarkdown,
  logText,
  markdownCode,
  markerValue,
  oneLine,
  plainText,
} from '../../src/report/escape.js';
import { stableHash } from '../../src/random.js';

describe('stableHash (FNV-1a 64)', () => {
  it('matches the FNV reference test vectors', () => {
    // Vectors of the FNV reference suite (Noll); recomputed here with an independent
    // Python implementation before being written down.
    expect(stableHash('')).toBe('cbf29ce484222325');
    expect(stableHash('a')).toBe('af63dc4c8601ec8c');
    expect(stableHash('foobar')).toBe('85944171f73967e8');
  });
});

describe('workflow command escaping', () => {
  const writes: string[] = [];
  afterEach(() => {
    vi.restoreAllMocks();
    writes.length = 0;
  });

  it('is the toolkit\u2019s own escaping (compared with @actions/core output)', () => {
    vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
      writes.push(String(chunk));
      return true;
    });
    const message = 'line one\r\nline two 100% ::error::forged';
    const title = 'a:b,c 50%\nnext';
    core.error(message, { title });
    expect(writes.join('')).toBe(`::error title=${escapeCommandProperty(title)}::${escapeCommandData(message)}\n`);
  });

  it('never leaves a line break that could start a second command', () => {
    const hostile = 'x\n::add-mask::secret\r::stop-commands::tok';
    expect(escapeCommandData(hostile)).not.toMatch(/[\r\n]/);
    expect(escapeCommandProperty('a,b:c')).toBe('a%2Cb%3Ac');
  });

  it('logText defuses a command at the start of any line', () => {
    const out = logText('ok\n::error file=x::forged\n  ::warning::two');
    expect(out.split('\n').some((l) => /^\s*::/.test(l))).toBe(false);
    expect(out).toContain('forged');
  });
});

describe('markdown and HTML escaping', () => {
  it('renders HTML, links, images and emphasis literally', () => {
    const out = escapeMarkdown(
      '<img src=x onerror=alert(1)> [click](javascript:alert(1)) ![i](http://x/y.png) **b** _i_ `c` | cell',
    );
    expect(out).not.toMatch(/<img/);
    expect(out).not.toContain('](');
    expect(out).not.toContain('**');
    expect(out).not.toMatch(/(^|[^\\])\|/);
    expect(out).not.toMatch(/(^|[^\\])`/);
    expect(out).toContain('&lt;img');
  });

  it('notifies nobody and autolinks nothing', () => {
    const out = escapeMarkdown('ping @org/admins see www.example.com or http://example.com');
    expect(out).not.toContain('@org');
    expect(out).toContain('@\u2060org');
    expect(out).not.toContain('www.example');
    expect(out).not.toContain('http://');
  });

  it('keeps one line and drops invisible reordering characters', () => {
    expect(oneLine('a\nb\r\nc\u2028d')).toBe('a b c d');
    expect(plainText('safe\u202Eevil\u2066x\u0007')).toBe('safeevilx');
    expect(escapeMarkdown('- item')).toBe('\\- item');
    expect(escapeMarkdown('# not a heading')).toBe('\\# not a heading');
  });

  it('escapes HTML', () => {
    expect(escapeHtml(`<a href="x" onclick='y'>&</a>`)).toBe(
      '&lt;a href=&quot;x&quot; onclick=&#39;y&#39;&gt;&amp;&lt;/a&gt;',
    );
  });

  it('fences code spans longer than any backtick run', () => {
    expect(markdownCode('plain')).toBe('`plain`');
    expect(markdownCode('a``b')).toBe('```a``b```');
    expect(markdownCode('`edge`')).toBe('`` `edge` ``');
    expect(markdownCode('a|b', 100, true)).toBe('`a\\|b`');
    expect(markdownCode('a\nb')).toBe('`a b`');
  });

  it('marker values cannot close the HTML comment', () => {
    const v = markerValue('key --> <b>x</b> -- end');
    expect(v).not.toContain('--');
    expect(v).not.toMatch(/[<> ]/);
    expect(markerValue('backbone/core-v2.1_x')).toBe('backbone/core-v2.1_x');
  });
});
