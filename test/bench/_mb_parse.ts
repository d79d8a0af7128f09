import { readFileSync } from 'node:fs';
import { parseDesign } from '../../src/topology/parse.js';
const file = process.argv[2];
const text = readFileSync(file, 'utf8');
const t = performance.now();
const topo = parseDesign(text, file, {});
console.log('parse ms', (performance.now() - t).toFixed(0), topo.nodes.length, topo.links.length, 'rss MB', (process.memoryUsage().rss / 2 ** 20).toFixed(0));
(globalThis as any).gc?.();
console.log('retained heap MB (topology)', (process.memoryUsage().heapUsed / 2 ** 20).toFixed(0), topo.nodes[5], topo.links[5]);
