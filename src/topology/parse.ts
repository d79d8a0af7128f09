// The one entry every caller uses to turn a design file's text into a Topology.
// Pure: the shell reads the file (src/shell/read-design.ts) and hands us the text.

import { DesignError, LimitError } from '../errors.js';
import { utf8Length } from '../decode.js';
import {
  DEFAULT_MAX_BYTES,
  DEFAULT_MAX_ELEMENTS,
  type DesignFormat,
  type ParseOptions,
  type Topology,
} from './model.js';
import { detectFormat, FORMAT_CHOICES } from './detect.js';
import { parseNative } from './native.js';
import { parseGml } from './gml.js';
import { parseGraphml } from './graphml.js';
import { parseEdgeList } from './edgelist.js';
import { parseGeojson } from './geojson.js';

// UTF-8 byte length without allocating an encoded copy: one definition for readers and views.
export { utf8Length };

/** Refuses text over the byte limit (cheap bounds first: each UTF-16 unit is 1–3 bytes). */
export function checkSize(text: string, file: string, maxBytes = DEFAULT_MAX_BYTES): void {
  if (text.length * 3 <= maxBytes) return;
  const bytes = utf8Length(text);
  if (bytes > maxBytes) throw sizeError(file, bytes, maxBytes);
}

export function sizeError(file: string, bytes: number, maxBytes: number): LimitError {
  return new LimitError(
    `the design file is larger than the limit (${bytes} bytes > ${maxBytes})`,
    { file },
    'raise the limit (for the CLI: --max-bytes) if a file this large is intended',
  );
}

/**
 * Parse a design. The format comes from `options.format`, else from the file's extension.
 * Throws DesignError (located: file, line, column, hint) for anything the user must fix,
 * LimitError for files or designs over the limits.
 */
export function parseDesign(text: string, file: string, options: ParseOptions = {}): Topology {
  const format: DesignFormat | undefined = options.format ?? detectFormat(file);
  if (format === undefined) {
    throw new DesignError(
      'cannot tell the design format from the file name',
      { file },
      `use an extension .net.yaml, .net.json, .graphml, .gml, .csv or .geojson, or force one (${FORMAT_CHOICES})`,
    );
  }
  checkSize(text, file, options.maxBytes ?? DEFAULT_MAX_BYTES);
  // A byte-order mark is not content (and is invisible, so columns on line 1 still match).
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  const builderOptions = { maxElements: options.maxElements ?? DEFAULT_MAX_ELEMENTS };
  switch (format) {
    case 'native-yaml':
    case 'native-json':
      return parseNative(text, file, builderOptions, format);
    case 'gml':
      return parseGml(text, file, builderOptions);
    case 'graphml':
      return parseGraphml(text, file, builderOptions);
    case 'csv':
      return parseEdgeList(text, file, builderOptions);
    case 'geojson':
      return parseGeojson(text, file, builderOptions);
  }
}
