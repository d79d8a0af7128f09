// Does the work budget bound real time? For seeded Barabási–Albert designs (2 links per new
// node; Barabási & Albert, Science 286:509, 1999) of 250 … 4,000 nodes (NETBRACE_BUDGET_SIZES to
// change), each challenge of the built-in policy is planned (its estimated work in element
// visits, evaluate.ts) and run on one thread with a fixed number of realizations; the table
// shows the estimate in seconds at the budget's fixed rate (policy/budget.ts,
// ENGINE_VISITS_PER_SECOND), the measured seconds, and their ratio. Target (in the issue): the
// estimate within 2× of real time on every benchmark design, both ways. No peer: no library has
// this budget. Engine time only (no parse, no process start), best of NETBRACE_BUDGET_RUNS (1).
import { barabasiAlbert } from './bench-util.js';
import { compileTopology } from '../../src/graph/compact.js';
import { parseDesign } from '../../src/topology/parse.js';
import { evaluateDesign, planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { ENGINE_VISITS_PER_SECOND } from '../../src/policy/budget.js';
import type { ChallengeParams } from '../../src/challenges/types.js';
import type { RValueSpec } from '../../src/envelope/types.js';

const sizes = (process.env.NETBRACE_BUDGET_SIZES ?? '250,1000,4000').split(',').map(Number);
const runs = Number(process.env.NETBRACE_BUDGET_RUNS ?? 1);
const r: RValueSpec = { metrics: [{ id: 'pair_connectivity', weight: 1 }, { id: 'efficiency', weight: 1 }], combine: 'mean' };
// The built-in policy's challenges, with 16 realizations so the largest design stays in minutes.
const challenges: ChallengeParams[] = [
  { challenge: 'random-nodes', until: 0.2, points: 5, realizations: 16, band: [0.1, 0.9] },
  { challenge: 'random-links', until: 0.2, points: 5, realizations: 16, band: [0.1, 0.9] },
  { challenge: 'degree-adaptive', until: 0.2 },
];

const csv = (_n: number, edges: readonly (readonly [number, number])[]) => ['source,target', ...edges.map(([a, b]) => `n${a},n${b}`), ''].join('\n');

console.log('design            challenge         estimate s   real s   estimate/real   within 2×');
let worst = 1;
for (const n of sizes) {
  const g = compileTopology(parseDesign(csv(n, barabasiAlbert(n, 2, 7)), `ba-${n}.csv`, {}));
  for (const c of challenges) {
    const spec: EvaluationSpec = { r, seed: 1, challenges: [c], budget: { maxWork: Infinity } };
    const estimate = planEvaluation(g, spec).work / ENGINE_VISITS_PER_SECOND;
    let best = Infinity;
    for (let i = 0; i < runs; i++) {
      const t = performance.now();
      evaluateDesign(g, spec);
      best = Math.min(best, (performance.now() - t) / 1000);
    }
    const ratio = estimate / best;
    worst = Math.max(worst, ratio, 1 / ratio);
    const ok = ratio <= 2 && ratio >= 0.5;
    console.log(`BA(${n}, 2)`.padEnd(18) + c.challenge.padEnd(18) + estimate.toFixed(2).padStart(10) + best.toFixed(2).padStart(9) + ratio.toFixed(2).padStart(16) + (ok ? '   yes' : '   NO').padStart(12));
  }
}
console.log(`target: estimate within 2× of real time; worst factor measured ${worst.toFixed(2)}× (${worst <= 2 ? 'met' : 'missed'})`);
