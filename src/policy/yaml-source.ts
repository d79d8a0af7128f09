// A parsed YAML file that remembers where every value was written, so that schema and
// semantic errors can say `file:line:col`. Uses eemeli/yaml's document model (source
// ranges on every node) and caps alias expansion so a hostile file cannot blow up.

import { isAlias, isMap, isScalar, isSeq, LineCounter, parseDocument, type Document, type Node } from 'yaml';
import { PolicyError } from '../errors.js';
import { MAX_NESTING, positionOf, yamlNestingExceeded } from '../topology/nesting.js';
import type { Where } from './types.js';

export type Segment = string | number;

/** Aliases expanded at most this often while converting to plain data. */
const MAX_ALIAS_COUNT = 100;

export class YamlSource {
  readonly file: string;
  readonly data: unknown;
  private readonly doc: Document;
  private readonly lines: LineCounter;

  constructor(text: string, file: string) {
    this.file = file;
    this.lines = new LineCounter();
    // Measured before parsing: the yaml package recurses once per level (see nesting.ts).
    const deep = yamlNestingExceeded(text);
    if (deep >= 0) {
      throw new PolicyError(
        `the policy nests deeper than ${MAX_NESTING} levels`,
        { file, ...positionOf(text, deep) },
        'a policy needs a few levels of nesting; flatten this structure',
      );
    }
    this.doc = parseDocument(text, { lineCounter: this.lines, prettyErrors: false, uniqueKeys: true });
    const problem = this.doc.errors[0];
    if (problem) {
      const where = this.offset(problem.pos[0]);
      const duplicate = problem.code === 'DUPLICATE_KEY';
      throw new PolicyError(
        duplicate ? 'a key appears twice in the same mapping' : `the policy is not valid YAML: ${problem.message}`,
        where,
        duplicate ? 'keep one of them' : 'check the indentation and quoting on this line',
      );
    }
    try {
      this.data = this.doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
    } catch (error) {
      throw new PolicyError(
        `the policy could not be read: ${error instanceof Error ? error.message : String(error)}`,
        { file, line: 1, column: 1 },
        'use fewer YAML aliases',
      );
    }
  }

  /** Location of a byte offset. */
  offset(pos: number): Where {
    const { line, col } = this.lines.linePos(pos);
    return { file: this.file, line, column: col };
  }

  /** Location of the value at `path`, or of its key when `key` is set; the nearest existing ancestor otherwise. */
  where(path: readonly Segment[], key = false): Where {
    let node: Node | null | undefined = this.doc.contents as Node | null;
    let last: Where = { file: this.file, line: 1, column: 1 };
    if (node?.range) last = this.offset(node.range[0]);
    for (let i = 0; i < path.length; i++) {
      if (node && isAlias(node)) node = node.resolve(this.doc) as Node | undefined;
      const seg = path[i];
      if (node && isMap(node)) {
        const pair = node.items.find((p) => isScalar(p.key) && String(p.key.value) === String(seg));
        if (!pair) return last;
        const keyNode = pair.key as Node;
        const isLast = i === path.length - 1;
        if (isLast && key && keyNode.range) return this.offset(keyNode.range[0]);
        node = pair.value as Node | null;
        if (node?.range) last = this.offset(node.range[0]);
        else if (keyNode.range) last = this.offset(keyNode.range[0]);
      } else if (node && isSeq(node)) {
        node = node.items[Number(seg)] as Node | undefined;
        if (node?.range) last = this.offset(node.range[0]);
        else return last;
      } else {
        return last;
      }
    }
    return last;
  }
}

/** Split a JSON pointer ("/a/0/b~1c") into segments. */
export function pointerSegments(pointer: string): Segment[] {
  if (pointer === '') return [];
  return pointer
    .slice(1)
    .split('/')
    .map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'))
    .map((s) => (/^(0|[1-9][0-9]*)$/.test(s) ? Number(s) : s));
}
