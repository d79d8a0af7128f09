// Neutralising user-controlled text (element ids, file paths, messages that quote them) for
// every place a view puts it: GitHub-flavoured Markdown, HTML, workflow commands and hidden
// markers. A design file is untrusted input (a pull request from anyone can contain it), so
// every view routes such text through one of these functions, never through string
// concatenation alone. Pure.

/**
 * Characters that can reorder or hide text when displayed (bidirectional overrides and
 * isolates, zero-width characters, BOM): removed so that what a reviewer sees is what the
 * file says ("Trojan Source", CVE-2021-42574).
 */
const INVISIBLE = /[\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g;
/** C0 and C1 control characters except TAB, LF and CR (those are handled per target). */
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/g;

/** Plain text with controls and invisible reordering characters removed; length capped. */
export function plainText(text: string, maxLength = 2000): string {
  const cleaned = String(text).replace(CONTROL, '').replace(INVISIBLE, '');
  return cleaned.length > maxLength ? `${cleaned.slice(0, maxLength - 1)}\u2026` : cleaned;
}

/** One line of plain text: line breaks and tabs become spaces. */
export function oneLine(text: string, maxLength = 2000): string {
  return plainText(String(text).replace(/\r\n|[\r\n\t\u2028\u2029]/g, ' '), maxLength);
}

/** Text for an HTML element's content or a quoted attribute value. */
export function escapeHtml(text: string): string {
  return plainText(text, Number.MAX_SAFE_INTEGER)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/**
 * Inline Markdown text (a table cell, a list item, a heading) that renders literally: no
 * emphasis, links, images, HTML, autolinks, table breaks, headings, or @-mentions that would
 * notify people. HTML-special characters become entities (GitHub renders them as the
 * characters); Markdown punctuation that can start emphasis, links, code, strikethrough, math
 * ($), emoji short codes and URL autolinks (`:`, `www.`) is backslash-escaped, as is a leading
 * list or heading marker; `@` gets a word joiner after it so
 * that "@team" is shown but notifies nobody; line breaks become spaces.
 */
export function escapeMarkdown(text: string, maxLength = 2000): string {
  return oneLine(text, maxLength)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/[\\`*_{}[\]()#!|~:$]/g, (c) => `\\${c}`)
    .replace(/(www)\./gi, '$1\\.')
    .replace(/^([-+=>])/, '\\$1')
    .replace(/^(\d+)([.)])/, '$1\\$2')
    .replace(/@/g, '@\u2060');
}

/**
 * Running Markdown prose in the middle of a line (never at its start: callers begin lines
 * with our own words), escaped only as far as it must be so that the raw text stays readable:
 * `<` and `&` become entities where they could start a tag or an entity (`"`, `>` and
 * `< 0.001` stay: harmless in the middle of a line outside attributes);
 * emphasis, code, link and image brackets, strikethrough, math and table bars are
 * backslash-escaped; emoji short codes and URL autolinks are broken at their colon or dot;
 * `@` gets a word joiner so that nobody is notified; line breaks become spaces.
 */
export function escapeProse(text: string, maxLength = 2000): string {
  return oneLine(text, maxLength)
    .replace(/&(?=[A-Za-z#])/g, '&amp;')
    .replace(/<(?=[A-Za-z/!?])/g, '&lt;')
    .replace(/[\\`*_[\]|~$]/g, (c) => `\\${c}`)
    .replace(/:(?=\/\/|[A-Za-z0-9_+-]+:)/g, '\\:')
    .replace(/(www)\./gi, '$1\\.')
    .replace(/@/g, '@\u2060');
}

/**
 * Text inside a Markdown inline code span: shown verbatim, in monospace. The span is fenced
 * with more backticks than the text contains; in a table `|` is escaped because GitHub ends
 * a cell at it even inside code; HTML is not interpreted inside code, so nothing else is needed.
 */
export function markdownCode(text: string, maxLength = 400, inTable = false): string {
  const line = oneLine(text, maxLength);
  const value = inTable ? line.replace(/\|/g, '\\|') : line;
  let longest = 0;
  for (const run of value.match(/`+/g) ?? []) longest = Math.max(longest, run.length);
  const fence = '`'.repeat(longest + 1);
  const pad = value.startsWith('`') || value.endsWith('`') || value === '' ? ' ' : '';
  return `${fence}${pad}${value}${pad}${fence}`;
}

/**
 * A value that goes into an HTML comment (the hidden marker of the PR comment): only
 * `[A-Za-z0-9._/-]` survive, everything else is percent-encoded, so the comment can never be
 * closed early (`-->`) nor hide a second marker. `--` is encoded as well (invalid in comments).
 */
export function markerValue(text: string): string {
  const encoded = Array.from(String(text), (c) =>
    /[A-Za-z0-9._/]/.test(c) || c === '-'
      ? c
      : Array.from(new TextEncoder().encode(c), (b) => `%${b.toString(16).toUpperCase().padStart(2, '0')}`).join(''),
  ).join('');
  return encoded.replace(/--/g, '-%2D');
}

/**
 * The data part of a workflow command (`::error file=…::DATA`), escaped as the Actions toolkit
 * does (`%` → %25, CR → %0D, LF → %0A): a value can then never end the line and start a new
 * command. @actions/core applies exactly this itself; the shell uses these functions only
 * where it writes a command line on its own, and tests compare them with the toolkit.
 */
export function escapeCommandData(text: string): string {
  return plainText(text, Number.MAX_SAFE_INTEGER).replace(/%/g, '%25').replace(/\r/g, '%0D').replace(/\n/g, '%0A');
}

/** A property value of a workflow command (`title=…`): also `:` → %3A and `,` → %2C. */
export function escapeCommandProperty(text: string): string {
  return escapeCommandData(text).replace(/:/g, '%3A').replace(/,/g, '%2C');
}

/**
 * Text that will be passed to @actions/core (annotation message or title) or printed to a
 * log: controls and invisible characters removed, a `::` at the start of any line defused
 * (GitHub reads workflow commands at line starts in logs), length capped. The toolkit then
 * applies its own percent-escaping.
 */
export function logText(text: string, maxLength = 4000): string {
  return plainText(text, maxLength).replace(/(^|[\r\n])(\s*)::/g, '$1$2:\u200A:');
}
