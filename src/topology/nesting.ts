// How deeply a YAML (or JSON) text nests, bounded from above, in one linear pass without
// recursion. The yaml package composes documents recursively: a few hundred levels of `[[[…`
// exhaust the stack, and near that limit V8 can end the whole process instead of throwing.
// So designs and policies are measured with yaml's own lexer (which knows quotes, comments
// and block scalars) before they are parsed, and refused past MAX_NESTING with a location.
// The bound counts the block indentation levels open, the block indicators (`-`, `?`, `:`)
// on the current line, and the flow brackets open; it may overcount, never undercount.

import { Lexer } from 'yaml';

/** Deepest nesting a design or policy file may have (real files stay below 15). */
export const MAX_NESTING = 100;

const DOCUMENT = '\x02';
const FLOW_END = '\x18';
const SCALAR = '\x1f';

/** Offset of the first token nested deeper than `max`, or -1 when the text stays within it. */
export function yamlNestingExceeded(text: string, max = MAX_NESTING): number {
  const indents: number[] = [];
  let offset = 0;
  let flow = 0;
  let onLine = 0;
  let lineStart = true;
  let indent = 0;
  let scalarNext = false;
  for (const tok of new Lexer().lex(text)) {
    if (tok === DOCUMENT || tok === FLOW_END) continue;
    if (tok === SCALAR) {
      scalarNext = true;
      continue;
    }
    const start = offset;
    offset += tok.length;
    const content = scalarNext;
    scalarNext = false;
    if (!content) {
      if (tok === '\n' || tok === '\r\n' || tok === '') {
        lineStart = true;
        indent = 0;
        onLine = 0;
        continue;
      }
      if (lineStart && /^[ \t]+$/.test(tok)) {
        indent = tok.length;
        continue;
      }
      if (tok[0] === '#') continue;
    }
    if (lineStart) {
      lineStart = false;
      if (flow === 0) {
        while (indents.length > 0 && indents[indents.length - 1] >= indent) indents.pop();
        indents.push(indent);
      }
    }
    if (content) {
      // Scalar text (a plain scalar, or a block scalar's whole body): never structure.
      if (tok.endsWith('\n')) {
        lineStart = true;
        indent = 0;
        onLine = 0;
      }
      continue;
    }
    if (tok === '[' || tok === '{') flow++;
    else if (tok === ']' || tok === '}') flow = Math.max(0, flow - 1);
    else if ((tok === '-' || tok === '?' || tok === ':') && flow === 0) onLine++;
    else continue;
    if (indents.length + onLine + flow > max) return start;
  }
  return -1;
}

/** 1-based line and column of a string offset. */
export function positionOf(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < offset; i = text.indexOf('\n', i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: Math.max(0, offset - start) + 1 };
}
