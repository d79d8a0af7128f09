import { graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { naturalConnectivity } from '../../src/metrics/natural-connectivity.js';
import { randomEdges } from '../metrics/families.js';
for (const n of [500, 1000, 2000]) {
  const g = graphFromEdges(n, randomEdges(n, 2 * n, n));
  const mask = createMask(g);
  for (const lim of [300, Infinity]) {
    const ev = naturalConnectivity.create(g, { denseLimit: lim });
    let t = performance.now(); const v = ev(mask); const ms = performance.now() - t;
    t = performance.now(); ev(mask); const ms2 = performance.now() - t;
    console.log(n, lim, v.raw, ms.toFixed(0), ms2.toFixed(0));
  }
}
