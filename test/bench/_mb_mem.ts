import { readFileSync } from 'node:fs';
import { readFastYaml } from '../../src/topology/fast-yaml.js';
const text = readFileSync(process.argv[2], 'utf8');
const m = () => `heap ${(process.memoryUsage().heapUsed / 2 ** 20).toFixed(0)} MB rss ${(process.memoryUsage().rss / 2 ** 20).toFixed(0)}`;
console.log('start', m());
let t = performance.now();
const r = readFastYaml(text);
console.log('fast read', (performance.now() - t).toFixed(0), 'ms', m());
(globalThis as any).gc?.(); console.log('after gc', m(), !!r);
