// CSV edge list: a header with `source` and `target` columns, then one link per row.
// Quoting follows RFC 4180 (fields in double quotes may hold commas, line breaks and
// doubled quotes). Optional columns: id, length, latency, capacity, weight, risk_groups
// (ids separated by ";"), hardened; any other column is kept as a link attribute.
// Nodes are created in order of first appearance.

import type { DesignFormat, SourcePos, Topology } from './model.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { mapLinkAttributes } from './attributes.js';

interface Cell {
  text: string;
  pos: SourcePos;
}

interface Row {
  cells: Cell[];
  /** Where the row ends (for "missing column" errors). */
  end: SourcePos;
}

/**
 * The rows one at a time, so that a file with millions of rows is never held as rows: the
 * builder's element limit stops the read where it is crossed.
 */
export function* csvRows(text: string, b: TopologyBuilder): Generator<Row> {
  let i = 0;
  let line = 1;
  let lineStart = 0;
  if (text.charCodeAt(0) === 0xfeff) i = lineStart = 1;
  const n = text.length;
  while (i < n) {
    const cells: Cell[] = [];
    for (;;) {
      const pos = { line, column: i - lineStart + 1 };
      let value = '';
      if (text[i] === '"') {
        i++;
        for (;;) {
          if (i >= n)
            throw b.error(
              'unterminated quoted field',
              pos,
              'close the field with a double quote (write "" for a quote inside it)',
            );
          const c = text[i];
          if (c === '"') {
            if (text[i + 1] === '"') {
              value += '"';
              i += 2;
              continue;
            }
            i++;
            break;
          }
          if (c === '\n') {
            line++;
            lineStart = i + 1;
          }
          value += c;
          i++;
        }
        if (i < n && text[i] !== ',' && text[i] !== '\n' && text[i] !== '\r') {
          throw b.error(
            'text after a closing quote',
            { line, column: i - lineStart + 1 },
            'a quoted field must end at a comma or the end of the line',
          );
        }
      } else {
        const start = i;
        while (i < n && text[i] !== ',' && text[i] !== '\n' && text[i] !== '\r') i++;
        value = text.slice(start, i);
        if (value.includes('"'))
          throw b.error(
            'a double quote inside an unquoted field',
            pos,
            'quote the whole field and double the quote: "a ""b"""',
          );
      }
      cells.push({ text: value, pos });
      if (i < n && text[i] === ',') {
        i++;
        continue;
      }
      break;
    }
    const end = { line, column: i - lineStart + 1 };
    if (text[i] === '\r') i++;
    if (text[i] === '\n') i++;
    line++;
    lineStart = i;
    if (cells.length === 1 && cells[0].text.trim() === '') continue;
    yield { cells, end };
  }
}

/**
 * Whether a CSV text is an edge list: its first row (the header) names a `source` and a
 * `target` column (ignoring case and spaces around names), as parseEdgeList requires. A text
 * whose first row cannot be read as CSV is not one. Reads the first row only.
 */
export function csvHasEdgeHeader(text: string): boolean {
  try {
    const first = csvRows(text, new TopologyBuilder('', 'csv')).next();
    if (first.done) return false;
    const names = first.value.cells.map((c) => c.text.trim().toLowerCase());
    return names.includes('source') && names.includes('target');
  } catch {
    return false; // an unterminated quote on the first line: not a header of ours
  }
}

export function parseEdgeList(
  text: string,
  file: string,
  options: BuilderOptions = {},
  format: DesignFormat = 'csv',
): Topology {
  const b = new TopologyBuilder(file, format, options);
  const rows = csvRows(text, b);
  const first = rows.next();
  if (first.done)
    throw b.error(
      'the CSV file is empty',
      { line: 1, column: 1 },
      'the first line must be a header with source,target',
    );
  const headerCells = first.value.cells;
  const header = headerCells.map((c) => c.text.trim());
  const lower = header.map((h) => h.toLowerCase());
  for (const need of ['source', 'target']) {
    if (!lower.includes(need)) {
      throw b.error(
        `the CSV header has no "${need}" column`,
        headerCells[0].pos,
        'the first line must name the columns, e.g. source,target,length',
      );
    }
  }
  const seen = new Map<string, number>();
  lower.forEach((h, k) => {
    if (h === '') throw b.error(`column ${k + 1} of the header has no name`, headerCells[k].pos);
    const earlier = seen.get(h);
    if (earlier !== undefined)
      throw b.error(
        `column "${header[k]}" appears twice in the header`,
        headerCells[k].pos,
        `first as column ${earlier + 1}`,
      );
    seen.set(h, k);
  });
  const src = lower.indexOf('source');
  const dst = lower.indexOf('target');
  const idCol = lower.indexOf('id');

  let r = 0;
  for (const { cells, end } of rows) {
    r++;
    if (cells.length < header.length) {
      const missing = header
        .slice(cells.length)
        .map((h) => `"${h}"`)
        .join(', ');
      throw b.error(
        `row has ${cells.length} of the header's ${header.length} columns (missing ${missing})`,
        end,
        'add the missing values (an empty value is written as nothing between two commas)',
      );
    }
    if (cells.length > header.length) {
      throw b.error(
        `row has ${cells.length} columns but the header has ${header.length}`,
        cells[header.length].pos,
        'quote values that contain commas',
      );
    }
    const pos = cells[0].pos;
    const ends = [cells[src], cells[dst]];
    for (const c of ends) {
      const id = c.text.trim();
      if (id === '')
        throw b.error(`empty ${c === cells[src] ? 'source' : 'target'}`, c.pos, 'every row needs both link ends');
      if (!b.hasNode(id)) b.addNode({ id, pos: c.pos });
    }
    const raw: Record<string, unknown> = {};
    const where = new Map<string, SourcePos>();
    header.forEach((h, k) => {
      if (k === src || k === dst || k === idCol) return;
      raw[h] = cells[k].text;
      where.set(h, cells[k].pos);
    });
    const mapped = mapLinkAttributes(raw, b, (k) => where.get(k) ?? pos);
    const id = idCol >= 0 ? cells[idCol].text.trim() : '';
    b.addLink({
      what: `row ${r + 1}`,
      ...(id !== '' ? { id } : {}),
      source: ends[0].text.trim(),
      target: ends[1].text.trim(),
      pos,
      sourcePos: ends[0].pos,
      targetPos: ends[1].pos,
      ...mapped,
    });
  }
  return b.finish();
}
