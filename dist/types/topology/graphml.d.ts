import type { DesignFormat, Topology } from './model.js';
import { type BuilderOptions } from './builder.js';
export declare function parseGraphml(text: string, file: string, options?: BuilderOptions, format?: DesignFormat): Topology;
