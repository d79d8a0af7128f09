// Which parser reads a file: from its extension, unless the caller forces a format.

import { UsageError } from '../errors.js';
import type { DesignFormat } from './model.js';

const BY_EXTENSION: readonly (readonly [string, DesignFormat])[] = [
  ['.net.yaml', 'native-yaml'],
  ['.net.yml', 'native-yaml'],
  ['.net.json', 'native-json'],
  ['.geojson', 'geojson'],
  ['.geo.json', 'geojson'],
  ['.yaml', 'native-yaml'],
  ['.yml', 'native-yaml'],
  ['.json', 'native-json'],
  ['.graphml', 'graphml'],
  ['.gml', 'gml'],
  ['.csv', 'csv'],
];

/** The format a file name implies, or undefined when the extension is not one we read. */
export function detectFormat(file: string): DesignFormat | undefined {
  const lower = file.toLowerCase();
  for (const [ext, format] of BY_EXTENSION) if (lower.endsWith(ext)) return format;
  return undefined;
}

/** Names accepted by `--format` (and the `format` option of callers that take user input). */
const FORMAT_NAMES: Readonly<Record<string, DesignFormat>> = {
  yaml: 'native-yaml',
  yml: 'native-yaml',
  'native-yaml': 'native-yaml',
  native: 'native-yaml',
  json: 'native-json',
  'native-json': 'native-json',
  graphml: 'graphml',
  gml: 'gml',
  csv: 'csv',
  geojson: 'geojson',
};

export const FORMAT_CHOICES = 'yaml, json, graphml, gml, csv, geojson';

/** Read a user-given format name; throws a UsageError for an unknown one. */
export function parseFormatName(name: string): DesignFormat {
  const f = FORMAT_NAMES[name.toLowerCase()];
  if (f === undefined) throw new UsageError(`unknown design format "${name}"`, `use one of ${FORMAT_CHOICES}`);
  return f;
}
