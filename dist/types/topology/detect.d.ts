import type { DesignFormat } from './model.js';
/** The format a file name implies, or undefined when the extension is not one we read. */
export declare function detectFormat(file: string): DesignFormat | undefined;
export declare const FORMAT_CHOICES = "yaml, json, graphml, gml, csv, geojson";
/** Read a user-given format name; throws a UsageError for an unknown one. */
export declare function parseFormatName(name: string): DesignFormat;
