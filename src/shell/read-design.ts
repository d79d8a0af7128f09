// Reads a design file from disk and parses it. The size is checked with stat() before a
// single byte is read, so an oversized file is refused without loading it into memory.

import { readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { decodeText } from '../decode.js';
import { DesignError } from '../errors.js';
import { DEFAULT_MAX_BYTES, type ParseOptions, type Topology } from '../topology/model.js';
import { parseDesign, sizeError } from '../topology/parse.js';

export interface ReadDesignOptions extends ParseOptions {
  /** Directory a relative path is resolved against (default: the process's working directory). */
  cwd?: string;
  /** Name used in the Topology and in messages (default: the path as given). */
  displayName?: string;
}

/** Read and parse one design file; throws DesignError / LimitError with the file's name. */
export function readDesign(file: string, options: ReadDesignOptions = {}): Topology {
  const { cwd, displayName, ...parse } = options;
  const shown = displayName ?? file;
  const full = path.resolve(cwd ?? process.cwd(), file);
  const maxBytes = parse.maxBytes ?? DEFAULT_MAX_BYTES;
  let text: string;
  try {
    const stat = statSync(full);
    if (stat.isDirectory())
      throw new DesignError('is a directory, not a design file', { file: shown }, 'name a design file inside it');
    if (stat.size > maxBytes) throw sizeError(shown, stat.size, maxBytes);
    text = decodeText(readFileSync(full), shown);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT')
      throw new DesignError(
        'no such file',
        { file: shown },
        'check the path (it is read relative to the working directory)',
      );
    if (code === 'EACCES' || code === 'EPERM')
      throw new DesignError('permission denied reading the file', { file: shown });
    if (code !== undefined) throw new DesignError(`cannot read the file (${code})`, { file: shown });
    throw e;
  }
  return parseDesign(text, shown, parse);
}
