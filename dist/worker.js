import { createRequire as __nbCreateRequire } from 'node:module';
const require = __nbCreateRequire(import.meta.url);

// src/parallel/worker.ts
import { parentPort } from "node:worker_threads";

// src/graph/mask.ts
function createMask(g) {
  return { node: new Uint8Array(g.n), link: new Uint8Array(g.m) };
}
function copyMask(from, to) {
  to.node.set(from.node);
  to.link.set(from.link);
}

// src/challenges/rank.ts
var QUANTUM = 2 ** 32;
function quantizeScores(score, eligible) {
  let max = 0;
  for (let i = 0; i < score.length; i++) if (eligible[i] && score[i] > max) max = score[i];
  const q = new Float64Array(score.length);
  if (max > 0) for (let i = 0; i < score.length; i++) q[i] = Math.round(score[i] / max * QUANTUM);
  return q;
}
function rankDescending(score, eligible, steps) {
  const idx = [];
  for (let i = 0; i < eligible.length; i++) if (eligible[i]) idx.push(i);
  idx.sort((a, b) => score[b] - score[a] || a - b);
  return Int32Array.from(idx.slice(0, Math.max(0, steps)));
}
function rankScores(score, eligible, steps) {
  return rankDescending(quantizeScores(score, eligible), eligible, steps);
}
function argmaxTied(score, candidate) {
  let max = -Infinity;
  let first = -1;
  for (let i = 0; i < score.length; i++) {
    if (!candidate[i]) continue;
    if (first < 0) first = i;
    if (score[i] > max) max = score[i];
  }
  if (first < 0 || !(max > 0)) return first;
  for (let i = first; i < score.length; i++) {
    if (candidate[i] && Math.round(score[i] / max * QUANTUM) === QUANTUM) return i;
  }
  return first;
}

// src/challenges/units.ts
function unitCount(g, kind) {
  return kind === "node" ? g.n : kind === "link" ? g.m : g.groupIds.length;
}
function unitIds(g, kind) {
  return kind === "node" ? g.nodeIds : kind === "link" ? g.linkIds : g.groupIds;
}
function unitKeys(g, kind) {
  return kind === "node" ? g.nodeIds : kind === "link" ? g.linkKeys : g.groupIds;
}
function eligibleUnits(g, kind) {
  const count = unitCount(g, kind);
  const out = new Uint8Array(count);
  for (let u = 0; u < count; u++) out[u] = isEligible(g, kind, u) ? 1 : 0;
  return out;
}
function isEligible(g, kind, u) {
  if (kind === "node") return g.nodeHardened[u] === 0;
  if (kind === "link") return g.linkHardened[u] === 0;
  for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++)
    if (g.linkHardened[g.groupLinks[p]] === 0) return true;
  return false;
}
function removeUnit(g, mask, kind, u) {
  if (kind === "node") mask.node[u] = 1;
  else if (kind === "link") mask.link[u] = 1;
  else {
    for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
      const e = g.groupLinks[p];
      if (g.linkHardened[e] === 0) mask.link[e] = 1;
    }
  }
}
function countAt(x, count, eligible) {
  const c = Math.min(x * count, eligible);
  const whole = Math.round(c);
  return Math.abs(c - whole) <= 1e-9 * Math.max(1, whole) ? whole : c;
}
function stepsAt(x, count, eligible) {
  return Math.ceil(countAt(x, count, eligible));
}
function lerp(a, b, w) {
  return w === 0 || a === b ? a : a + w * (b - a);
}
function countOnes(a) {
  let c = 0;
  for (let i = 0; i < a.length; i++) c += a[i];
  return c;
}

// src/challenges/brandes.ts
function createBrandesWorkspace(g) {
  return {
    dist: new Int32Array(g.n).fill(-1),
    sigma: new Float64Array(g.n),
    delta: new Float64Array(g.n),
    order: new Int32Array(g.n)
  };
}
function accumulateBetweenness(g, mask, sources, nodeScore, linkScore, ws = createBrandesWorkspace(g)) {
  const { dist, sigma, delta, order } = ws;
  const { offsets, neighbors, linkOf } = g;
  const nodeGone = mask.node;
  const linkGone = mask.link;
  for (let si = 0; si < sources.length; si++) {
    const s = sources[si];
    if (nodeGone[s]) continue;
    let head = 0;
    let tail = 0;
    order[tail++] = s;
    dist[s] = 0;
    sigma[s] = 1;
    while (head < tail) {
      const v = order[head++];
      const dv = dist[v] + 1;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (nodeGone[w] || linkGone[linkOf[p]]) continue;
        if (dist[w] < 0) {
          dist[w] = dv;
          sigma[w] = 0;
          order[tail++] = w;
        }
        if (dist[w] === dv) sigma[w] += sigma[v];
      }
    }
    for (let i = 0; i < tail; i++) delta[order[i]] = 0;
    for (let i = tail - 1; i > 0; i--) {
      const w = order[i];
      const dw = dist[w] - 1;
      const coeff = (1 + delta[w]) / sigma[w];
      for (let p = offsets[w]; p < offsets[w + 1]; p++) {
        const v = neighbors[p];
        if (dist[v] !== dw || nodeGone[v] || linkGone[linkOf[p]]) continue;
        const c = sigma[v] * coeff;
        delta[v] += c;
        if (linkScore !== null) linkScore[linkOf[p]] += c;
      }
      if (nodeScore !== null) nodeScore[w] += delta[w];
    }
    for (let i = 0; i < tail; i++) dist[order[i]] = -1;
  }
}
function componentOf(g, mask, start, seen, out) {
  let head = 0;
  let tail = 0;
  out[tail++] = start;
  seen[start] = 1;
  while (head < tail) {
    const v = out[head++];
    for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
      const w = g.neighbors[p];
      if (seen[w] || mask.node[w] || mask.link[g.linkOf[p]]) continue;
      seen[w] = 1;
      out[tail++] = w;
    }
  }
  for (let i = 0; i < tail; i++) seen[out[i]] = 0;
  return tail;
}
function allNodes(g) {
  const a = new Int32Array(g.n);
  for (let v = 0; v < g.n; v++) a[v] = v;
  return a;
}
function adaptiveBetweenness(g, kind, steps) {
  const mask = createMask(g);
  const ws = createBrandesWorkspace(g);
  const nodes = kind === "node";
  const score = new Float64Array(nodes ? g.n : g.m);
  accumulateBetweenness(g, mask, allNodes(g), nodes ? score : null, nodes ? null : score, ws);
  const candidate = eligibleUnits(g, kind);
  const seen = new Uint8Array(g.n);
  const comp = new Int32Array(g.n);
  const out = [];
  while (out.length < steps) {
    const u = argmaxTied(score, candidate);
    if (u < 0) break;
    out.push(u);
    candidate[u] = 0;
    const size = componentOf(g, mask, nodes ? u : g.linkSource[u], seen, comp);
    if (nodes) {
      mask.node[u] = 1;
      score[u] = 0;
      for (let i = 0; i < size; i++) score[comp[i]] = 0;
      if (size <= 3) continue;
    } else {
      mask.link[u] = 1;
      for (let i = 0; i < size; i++) {
        const v = comp[i];
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) score[g.linkOf[p]] = 0;
      }
    }
    accumulateBetweenness(g, mask, comp.subarray(0, size), nodes ? score : null, nodes ? null : score, ws);
  }
  return Int32Array.from(out);
}

// src/challenges/betweenness.ts
function nodeBetweenness(g) {
  const score = new Float64Array(g.n);
  accumulateBetweenness(g, createMask(g), allNodes(g), score, null);
  return score;
}
function staticBetweennessOrder(g, steps) {
  return rankScores(nodeBetweenness(g), eligibleUnits(g, "node"), steps);
}
function adaptiveBetweennessOrder(g, steps) {
  return adaptiveBetweenness(g, "node", steps);
}
var betweenness = {
  name: "betweenness",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by shortest-path betweenness on the intact design, highest first",
  sequence: (g, steps) => staticBetweennessOrder(g, steps)
};
var betweennessAdaptive = {
  name: "betweenness-adaptive",
  type: "attack",
  kind: "node",
  summary: "targeted attack: the node with the highest current betweenness, recomputed after every removal",
  sequence: (g, steps) => adaptiveBetweennessOrder(g, steps)
};

// src/challenges/closeness.ts
function closenessCentrality(g) {
  const n = g.n;
  const dist = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  const out = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    dist[s] = 0;
    let total = 0;
    while (head < tail) {
      const v = queue[head++];
      total += dist[v];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (dist[w] < 0) {
          dist[w] = dist[v] + 1;
          queue[tail++] = w;
        }
      }
    }
    out[s] = total > 0 && n > 1 ? (tail - 1) / total * ((tail - 1) / (n - 1)) : 0;
    for (let i = 0; i < tail; i++) dist[queue[i]] = -1;
  }
  return out;
}
var closeness = {
  name: "closeness",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by closeness centrality on the intact design, highest first",
  sequence: (g, steps) => rankScores(closenessCentrality(g), eligibleUnits(g, "node"), steps)
};

// src/challenges/contingency.ts
var nMinus1 = {
  name: "n-1",
  type: "contingency",
  order: 1,
  summary: "N−1: every single node (or link, with element: link) removed in turn; worst cases reported"
};
var nMinus2 = {
  name: "n-2",
  type: "contingency",
  order: 2,
  summary: "N−2: every pair of nodes (or links) removed, exhaustively within the work budget"
};

// src/challenges/degree.ts
function nodeDegrees(g) {
  const deg = new Int32Array(g.n);
  for (let v = 0; v < g.n; v++) deg[v] = g.offsets[v + 1] - g.offsets[v];
  return deg;
}
function staticDegreeOrder(g, steps) {
  return rankDescending(nodeDegrees(g), eligibleUnits(g, "node"), steps);
}
function adaptiveDegreeOrder(g, steps) {
  const deg = nodeDegrees(g);
  const eligible = eligibleUnits(g, "node");
  const removed = new Uint8Array(g.n);
  let maxDeg = 0;
  for (let v = 0; v < g.n; v++) if (eligible[v] && deg[v] > maxDeg) maxDeg = deg[v];
  const buckets = Array.from({ length: maxDeg + 1 }, () => []);
  for (let v = 0; v < g.n; v++) if (eligible[v]) buckets[deg[v]].push(v);
  const out = [];
  let top = maxDeg;
  while (out.length < steps && top >= 0) {
    const heap = buckets[top];
    if (heap.length === 0) {
      top--;
      continue;
    }
    const v = heapPop(heap);
    if (removed[v] || deg[v] !== top) continue;
    removed[v] = 1;
    out.push(v);
    for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
      const w = g.neighbors[p];
      if (removed[w]) continue;
      deg[w]--;
      if (eligible[w]) heapPush(buckets[deg[w]], w);
    }
  }
  return Int32Array.from(out);
}
function heapPush(h, v) {
  let i = h.length;
  h.push(v);
  while (i > 0) {
    const parent = i - 1 >> 1;
    if (h[parent] <= v) break;
    h[i] = h[parent];
    i = parent;
  }
  h[i] = v;
}
function heapPop(h) {
  const top = h[0];
  const last = h.pop();
  if (h.length > 0) {
    let i = 0;
    for (; ; ) {
      const l = 2 * i + 1;
      if (l >= h.length) break;
      const r = l + 1;
      const c = r < h.length && h[r] < h[l] ? r : l;
      if (h[c] >= last) break;
      h[i] = h[c];
      i = c;
    }
    h[i] = last;
  }
  return top;
}
var degree = {
  name: "degree",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by degree on the intact design, highest first",
  sequence: (g, steps) => staticDegreeOrder(g, steps)
};
var degreeAdaptive = {
  name: "degree-adaptive",
  type: "attack",
  kind: "node",
  summary: "targeted attack: the node with the highest current degree, re-ranked after every removal",
  sequence: (g, steps) => adaptiveDegreeOrder(g, steps)
};

// src/challenges/eigenvector.ts
function eigenvectorCentrality(g, tolerance = 1e-13, maxRounds = 1e5) {
  const n = g.n;
  let x = new Float64Array(n).fill(n > 0 ? 1 / Math.sqrt(n) : 0);
  let y = new Float64Array(n);
  for (let round = 0; round < maxRounds; round++) {
    let norm2 = 0;
    for (let v = 0; v < n; v++) {
      let s = x[v];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) s += x[g.neighbors[p]];
      y[v] = s;
      norm2 += s * s;
    }
    norm2 = Math.sqrt(norm2);
    if (norm2 === 0) break;
    let change = 0;
    for (let v = 0; v < n; v++) {
      y[v] /= norm2;
      const d = Math.abs(y[v] - x[v]);
      if (d > change) change = d;
    }
    const t = x;
    x = y;
    y = t;
    if (change < tolerance) break;
  }
  return x;
}
var eigenvector = {
  name: "eigenvector",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by eigenvector centrality on the intact design, highest first",
  sequence: (g, steps) => rankScores(eigenvectorCentrality(g), eligibleUnits(g, "node"), steps)
};

// src/challenges/link-betweenness.ts
function linkBetweenness(g) {
  const score = new Float64Array(g.m);
  accumulateBetweenness(g, createMask(g), allNodes(g), null, score);
  return score;
}
function staticLinkBetweennessOrder(g, steps) {
  return rankScores(linkBetweenness(g), eligibleUnits(g, "link"), steps);
}
function adaptiveLinkBetweennessOrder(g, steps) {
  return adaptiveBetweenness(g, "link", steps);
}
var linkBetweennessStatic = {
  name: "link-betweenness",
  type: "attack",
  kind: "link",
  summary: "targeted attack: links by link betweenness on the intact design, highest first",
  sequence: (g, steps) => staticLinkBetweennessOrder(g, steps)
};
var linkBetweennessAdaptive = {
  name: "link-betweenness-adaptive",
  type: "attack",
  kind: "link",
  summary: "targeted attack: the link with the highest current link betweenness, recomputed after every cut",
  sequence: (g, steps) => adaptiveLinkBetweennessOrder(g, steps)
};

// src/random.ts
function mix32(h) {
  h ^= h >>> 16;
  h = Math.imul(h, 2246822507);
  h ^= h >>> 13;
  h = Math.imul(h, 3266489909);
  h ^= h >>> 16;
  return h >>> 0;
}
function hash32(a, b) {
  return mix32(Math.imul(a ^ 2654435769, 2246822507) ^ Math.imul(b + 1663821227, 3266489909));
}
function fnv1a32CodeUnits(text) {
  let h = 2166136261;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 16777619);
  }
  return h | 0;
}
function hashString(s, seed) {
  let h = seed >>> 0;
  for (let i = 0; i < s.length; i++) {
    let k = Math.imul(s.charCodeAt(i), 3432918353);
    k = k << 15 | k >>> 17;
    h ^= Math.imul(k, 461845907);
    h = h << 13 | h >>> 19;
    h = Math.imul(h, 5) + 3864292196 | 0;
  }
  return mix32(h ^ s.length);
}
function seedWord(seed) {
  if (!Number.isSafeInteger(seed) || seed < 0) throw new RangeError(`seed must be a non-negative integer, got ${seed}`);
  const lo = seed >>> 0;
  const hi = Math.floor(seed / 4294967296) >>> 0;
  return mix32(lo ^ mix32(hi ^ 2654435769));
}
function hashIds(ids) {
  const out = new Uint32Array(ids.length);
  for (let i = 0; i < ids.length; i++) out[i] = hashString(ids[i], 1851945571);
  return out;
}
function realizationWord(seedW, realization) {
  return mix32((Math.imul(realization + 1, 2654435769) ^ seedW) >>> 0);
}
function keyOf(r, idHash) {
  return mix32((idHash ^ r) + Math.imul(r, 668265261) + 374761393);
}
function createOrderWorkspace(capacity) {
  return {
    keys: new Uint32Array(capacity),
    keys2: new Uint32Array(capacity),
    idx2: new Int32Array(capacity),
    counts: new Uint32Array(2048)
  };
}
function randomOrder(idHash, eligible, seedW, realization, out, ws = createOrderWorkspace(idHash.length)) {
  const n = idHash.length;
  let { keys, keys2, idx2 } = ws;
  const counts = ws.counts;
  let idx = out;
  let count = 0;
  const r = realizationWord(seedW, realization);
  for (let i = 0; i < n; i++) {
    if (eligible !== null && eligible[i] === 0) continue;
    keys[count] = keyOf(r, idHash[i]);
    idx[count++] = i;
  }
  for (let shift = 0; shift < 32; shift += 11) {
    const bits = shift === 22 ? 10 : 11;
    const mask = (1 << bits) - 1;
    counts.fill(0, 0, mask + 1);
    for (let j = 0; j < count; j++) counts[keys[j] >>> shift & mask]++;
    let sum = 0;
    for (let b = 0; b <= mask; b++) {
      const c = counts[b];
      counts[b] = sum;
      sum += c;
    }
    for (let j = 0; j < count; j++) {
      const pos = counts[keys[j] >>> shift & mask]++;
      keys2[pos] = keys[j];
      idx2[pos] = idx[j];
    }
    [keys, keys2] = [keys2, keys];
    [idx, idx2] = [idx2, idx];
  }
  if (idx !== out) out.set(idx.subarray(0, count));
  return count;
}

// src/challenges/grid.ts
function makeGrid(until, points, at = []) {
  if (!(until >= 0) || !Number.isFinite(until)) throw new RangeError(`until must be a finite number ≥ 0, got ${until}`);
  if (!Number.isInteger(points) || points < 2) throw new RangeError(`points must be an integer ≥ 2, got ${points}`);
  const values = /* @__PURE__ */ new Set();
  for (let j = 0; j < points; j++) values.add(round12(until * j / (points - 1)));
  for (const x of at) {
    if (!(x >= 0) || !Number.isFinite(x)) throw new RangeError(`grid point must be a finite number ≥ 0, got ${x}`);
    values.add(round12(x));
  }
  return [...values].sort((a, b) => a - b);
}
function round12(x) {
  return Number(x.toFixed(12));
}

// src/challenges/random-nodes.ts
function randomOrderPlan(g, kind, params) {
  const x = makeGrid(params.until, params.points, params.at);
  const count = unitCount(g, kind);
  const eligible = eligibleUnits(g, kind);
  const available = countOnes(eligible);
  const stepTable = Float64Array.from(x, (xi) => countAt(xi, count, available));
  const maxUnits = stepTable.length ? Math.ceil(stepTable[stepTable.length - 1]) : 0;
  const idHash = hashIds(unitKeys(g, kind));
  const seedW = seedWord(params.seed);
  const full = new Int32Array(count);
  const ws = createOrderWorkspace(count);
  return {
    kind,
    xUnit: "fraction",
    x,
    realizations: params.realizations,
    maxUnits,
    realize(r, order, steps) {
      randomOrder(idHash, eligible, seedW, r, full, ws);
      order.set(full.subarray(0, maxUnits));
      steps.set(stepTable);
      return maxUnits;
    }
  };
}
var randomNodes = {
  name: "random-nodes",
  type: "band",
  summary: "random node failures: nodes fail in a seeded random order; band over realizations",
  plan: (g, params) => randomOrderPlan(g, "node", params)
};

// src/challenges/random-links.ts
var randomLinks = {
  name: "random-links",
  type: "band",
  summary: "random link failures: links fail in a seeded random order; band over realizations",
  plan: (g, params) => randomOrderPlan(g, "link", params)
};

// src/topology/geodesy.ts
var EARTH_RADIUS_KM = 6371.0088;
function greatCircleKm(lat1, lon1, lat2, lon2) {
  const rad = Math.PI / 180;
  const dLat = (lat2 - lat1) * rad;
  const dLon = (lon2 - lon1) * rad;
  const a = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(a)));
}

// src/challenges/regional.ts
function sitesWithCoordinates(g) {
  const sites = [];
  if (g.lat === null || g.lon === null) return sites;
  for (let v = 0; v < g.n; v++) if (Number.isFinite(g.lat[v]) && Number.isFinite(g.lon[v])) sites.push(v);
  return sites;
}
var regional = {
  name: "regional",
  type: "band",
  summary: "regional disasters: all sites within radius x km of an epicentre fail; band over epicentres at every site",
  plan(g, params) {
    const x = makeGrid(params.until, params.points, params.at);
    const all = sitesWithCoordinates(g);
    const cap = params.epicentres ?? all.length;
    const sites = cap >= all.length ? all : Array.from({ length: cap }, (_, r) => all[Math.floor(r * all.length / cap)]);
    const removable = all.filter((v) => g.nodeHardened[v] === 0);
    const dist = new Float64Array(removable.length);
    const idx = removable.map((_, i) => i);
    return {
      kind: "node",
      xUnit: "km",
      x,
      realizations: sites.length,
      maxUnits: removable.length,
      label: (r) => g.nodeIds[sites[r]],
      realize(r, order, steps) {
        const c = sites[r];
        for (let i = 0; i < removable.length; i++) {
          dist[i] = greatCircleKm(g.lat[c], g.lon[c], g.lat[removable[i]], g.lon[removable[i]]);
        }
        idx.sort((a, b) => dist[a] - dist[b] || a - b);
        let k = 0;
        for (let j = 0; j < x.length; j++) {
          while (k < idx.length && dist[idx[k]] < x[j]) k++;
          steps[j] = k;
        }
        const len = steps[x.length - 1];
        for (let i = 0; i < len; i++) order[i] = removable[idx[i]];
        return len;
      }
    };
  }
};

// src/challenges/risk-groups.ts
var riskGroups = {
  name: "risk-groups",
  type: "band",
  summary: "shared-risk link groups fail together, groups in seeded random order; band over realizations",
  plan: (g, params) => randomOrderPlan(g, "group", params)
};
var riskGroupsWorst = {
  name: "risk-groups-worst",
  type: "attack",
  kind: "group",
  summary: "shared-risk link groups, worst first: each step takes the group whose loss leaves the lowest R",
  sequence(g, steps, ctx) {
    const candidate = eligibleUnits(g, "group");
    const mask = createMask(g);
    const trial = createMask(g);
    const out = [];
    while (out.length < steps) {
      let best = -1;
      let bestR = Infinity;
      for (let u = 0; u < candidate.length; u++) {
        if (!candidate[u]) continue;
        copyMask(mask, trial);
        removeUnit(g, trial, "group", u);
        const r = ctx.rvalue(trial);
        if (r < bestR) {
          bestR = r;
          best = u;
        }
      }
      if (best < 0) break;
      out.push(best);
      candidate[best] = 0;
      removeUnit(g, mask, "group", best);
    }
    return Int32Array.from(out);
  }
};

// src/challenges/registry.ts
var challenges = [
  randomNodes,
  randomLinks,
  degree,
  degreeAdaptive,
  betweenness,
  betweennessAdaptive,
  eigenvector,
  closeness,
  linkBetweennessStatic,
  linkBetweennessAdaptive,
  riskGroups,
  riskGroupsWorst,
  regional,
  nMinus1,
  nMinus2
];
var byName = new Map(challenges.map((c) => [c.name, c]));
function getChallenge(name) {
  const c = byName.get(name);
  if (!c) throw new RangeError(`unknown challenge "${name}"`);
  return c;
}

// src/errors.ts
var NetbraceError = class extends Error {
  name = "NetbraceError";
  kind;
  file;
  line;
  column;
  hint;
  /** Further locations that belong to the same problem (e.g. the floor a scope loosens). */
  related;
  constructor(kind, message, where = {}, hint = "", related = []) {
    super(message);
    this.kind = kind;
    this.file = where.file ?? "";
    this.line = where.line ?? 0;
    this.column = where.column ?? 0;
    this.hint = hint;
    this.related = related;
  }
  /** `file:line:col: message — hint`, the one format every shell prints. */
  format() {
    return formatDiagnostic(this);
  }
};
var UsageError = class extends NetbraceError {
  name = "UsageError";
  constructor(message, hint = "") {
    super("usage", message, {}, hint);
  }
};
function formatDiagnostic(d) {
  const where = d.file ? `${d.file}:${d.line || 1}:${d.column || 1}: ` : "";
  let text = `${where}${d.message}${d.hint ? ` — ${d.hint}` : ""}`;
  for (const r of d.related ?? []) text += `
  ${r.file}:${r.line || 1}:${r.column || 1}: ${r.message}`;
  return text;
}

// src/metrics/kernels/operators.ts
function maxDegree(g) {
  let dmax = 0;
  for (let i = 0; i < g.n; i++) dmax = Math.max(dmax, g.offsets[i + 1] - g.offsets[i]);
  return dmax;
}
function createLaplacianOperator() {
  let g = null;
  const op = {
    n: 0,
    normBound: 0,
    bind(graph) {
      g = graph;
      op.n = graph.n;
      op.normBound = 2 * maxDegree(graph);
    },
    apply(x, y) {
      const { offsets, neighbors, n } = g;
      for (let i = 0; i < n; i++) {
        const a = offsets[i];
        const b = offsets[i + 1];
        let s = (b - a) * x[i];
        for (let p = a; p < b; p++) s -= x[neighbors[p]];
        y[i] = s;
      }
    }
  };
  return op;
}
function createAdjacencyOperator() {
  let g = null;
  const op = {
    n: 0,
    normBound: 0,
    bind(graph) {
      g = graph;
      op.n = graph.n;
      op.normBound = maxDegree(graph);
    },
    apply(x, y) {
      const { offsets, neighbors, n } = g;
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let p = offsets[i]; p < offsets[i + 1]; p++) s += x[neighbors[p]];
        y[i] = s;
      }
    }
  };
  return op;
}
function denseMatrix(g, laplacian, out) {
  const n = g.n;
  out.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) {
    const a = g.offsets[i];
    const b = g.offsets[i + 1];
    if (laplacian) out[i * n + i] = b - a;
    for (let p = a; p < b; p++) out[i * n + g.neighbors[p]] = laplacian ? -1 : 1;
  }
}

// src/metrics/kernels/symmetric-eigen.ts
var EPS = 2 ** -52;
function symmetricEigenvalues(a, n, d, e) {
  if (n === 0) return;
  householderValues(a, n, d, e);
  implicitQL(d, e, n, null, 0);
  sortAscending(d, n, null, 0);
}
function symmetricEigen(a, n, d, e) {
  if (n === 0) return;
  householder(a, n, d, e, true);
  implicitQL(d, e, n, a, n);
  sortAscending(d, n, a, n);
}
function tridiagonalEigen(diag, off, k, d, e, z, firstRowOnly = false) {
  for (let i = 0; i < k; i++) {
    d[i] = diag[i];
    e[i] = i > 0 ? off[i - 1] : 0;
  }
  const rows = firstRowOnly ? 1 : k;
  if (z) {
    z.fill(0, 0, rows * k);
    for (let i = 0; i < rows; i++) z[i * k + i] = 1;
  }
  implicitQL(d, e, k, z, k, rows);
  sortAscending(d, k, z, k, rows);
}
function householder(V, n, d, e, vectors) {
  for (let j = 0; j < n; j++) d[j] = V[(n - 1) * n + j];
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]);
    if (scale === 0) {
      e[i] = d[i - 1];
      for (let j = 0; j < i; j++) {
        d[j] = V[(i - 1) * n + j];
        V[i * n + j] = 0;
        V[j * n + i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k] /= scale;
        h += d[k] * d[k];
      }
      let f = d[i - 1];
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j];
        V[j * n + i] = f;
        g = e[j] + V[j * n + j] * f;
        for (let k = j + 1; k <= i - 1; k++) {
          const vkj = V[k * n + j];
          g += vkj * d[k];
          e[k] += vkj * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j] /= h;
        f += e[j] * d[j];
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j] -= hh * d[j];
      for (let j = 0; j < i; j++) {
        f = d[j];
        g = e[j];
        for (let k = j; k <= i - 1; k++) V[k * n + j] -= f * e[k] + g * d[k];
        d[j] = V[(i - 1) * n + j];
        V[i * n + j] = 0;
      }
    }
    d[i] = h;
  }
  if (!vectors) {
    for (let i = 0; i < n; i++) d[i] = V[i * n + i];
    e[0] = 0;
    return;
  }
  for (let i = 0; i < n - 1; i++) {
    V[(n - 1) * n + i] = V[i * n + i];
    V[i * n + i] = 1;
    const h = d[i + 1];
    if (h !== 0) {
      for (let k = 0; k <= i; k++) d[k] = V[k * n + i + 1] / h;
      for (let j = 0; j <= i; j++) {
        let g = 0;
        for (let k = 0; k <= i; k++) g += V[k * n + i + 1] * V[k * n + j];
        for (let k = 0; k <= i; k++) V[k * n + j] -= g * d[k];
      }
    }
    for (let k = 0; k <= i; k++) V[k * n + i + 1] = 0;
  }
  for (let j = 0; j < n; j++) {
    d[j] = V[(n - 1) * n + j];
    V[(n - 1) * n + j] = 0;
  }
  V[(n - 1) * n + n - 1] = 1;
  e[0] = 0;
}
function householderValues(V, n, d, e) {
  for (let j = 0; j < n; j++) d[j] = V[j * n + n - 1];
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]);
    if (scale === 0) {
      e[i] = d[i - 1];
      for (let j = 0; j < i; j++) {
        d[j] = V[j * n + i - 1];
        V[j * n + i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k] /= scale;
        h += d[k] * d[k];
      }
      let f = d[i - 1];
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j];
        const row = j * n;
        g = e[j] + V[row + j] * f;
        for (let k = j + 1; k <= i - 1; k++) {
          const vkj = V[row + k];
          g += vkj * d[k];
          e[k] += vkj * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j] /= h;
        f += e[j] * d[j];
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j] -= hh * d[j];
      for (let j = 0; j < i; j++) {
        f = d[j];
        g = e[j];
        const row = j * n;
        for (let k = j; k <= i - 1; k++) V[row + k] -= f * e[k] + g * d[k];
        d[j] = V[row + i - 1];
      }
    }
    d[i] = h;
  }
  for (let i = 0; i < n; i++) d[i] = V[i * n + i];
  e[0] = 0;
}
function implicitQL(d, e, n, z, stride, rows = n) {
  for (let i = 1; i < n; i++) e[i - 1] = e[i];
  e[n - 1] = 0;
  let f = 0;
  let tst1 = 0;
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]) + Math.abs(e[l]));
    let m = l;
    while (m < n) {
      if (Math.abs(e[m]) <= EPS * tst1) break;
      m++;
    }
    if (m > l) {
      let iter = 0;
      do {
        if (++iter > 60) throw new Error("symmetric eigen-solver did not converge");
        let g = d[l];
        let p = (d[l + 1] - g) / (2 * e[l]);
        let r = Math.hypot(p, 1);
        if (p < 0) r = -r;
        d[l] = e[l] / (p + r);
        d[l + 1] = e[l] * (p + r);
        const dl1 = d[l + 1];
        let h = g - d[l];
        for (let i = l + 2; i < n; i++) d[i] -= h;
        f += h;
        p = d[m];
        let c = 1;
        let c2 = c;
        let c3 = c;
        const el1 = e[l + 1];
        let s = 0;
        let s2 = 0;
        for (let i = m - 1; i >= l; i--) {
          c3 = c2;
          c2 = c;
          s2 = s;
          g = c * e[i];
          h = c * p;
          r = Math.hypot(p, e[i]);
          e[i + 1] = s * r;
          s = e[i] / r;
          c = p / r;
          p = c * d[i] - s * g;
          d[i + 1] = h + s * (c * g + s * d[i]);
          if (z) {
            for (let k = 0; k < rows; k++) {
              const zk = k * stride;
              const hh = z[zk + i + 1];
              z[zk + i + 1] = s * z[zk + i] + c * hh;
              z[zk + i] = c * z[zk + i] - s * hh;
            }
          }
        }
        p = -s * s2 * c3 * el1 * e[l] / dl1;
        e[l] = s * p;
        d[l] = c * p;
      } while (Math.abs(e[l]) > EPS * tst1);
    }
    d[l] += f;
    e[l] = 0;
  }
}
function sortAscending(d, n, z, stride, rows = n) {
  for (let i = 0; i < n - 1; i++) {
    let k = i;
    let p = d[i];
    for (let j = i + 1; j < n; j++) {
      if (d[j] < p) {
        k = j;
        p = d[j];
      }
    }
    if (k !== i) {
      d[k] = d[i];
      d[i] = p;
      if (z) {
        for (let r = 0; r < rows; r++) {
          const t = z[r * stride + i];
          z[r * stride + i] = z[r * stride + k];
          z[r * stride + k] = t;
        }
      }
    }
  }
}

// src/metrics/kernels/dense-spectrum.ts
function createDenseSpectrum(limit) {
  const size = Math.max(1, limit);
  const a = new Float64Array(size * size);
  const d = new Float64Array(size);
  const e = new Float64Array(size);
  const run = (g, laplacian) => {
    if (g.n > size) throw new RangeError(`dense spectrum limited to ${size} nodes, got ${g.n}`);
    denseMatrix(g, laplacian, a);
    symmetricEigenvalues(a, g.n, d, e);
    return d;
  };
  return {
    /** Laplacian eigenvalues, ascending, in the first g.n entries (shared buffer). */
    laplacian: (g) => run(g, true),
    /** Adjacency eigenvalues, ascending, in the first g.n entries (shared buffer). */
    adjacency: (g) => run(g, false)
  };
}

// src/metrics/kernels/hash-noise.ts
function noise(a, b) {
  return hash32(a, b) / 2147483648 - 1;
}
function sign(a, b) {
  return hash32(a, b) & 1 ? 1 : -1;
}

// src/metrics/kernels/extremal-lanczos.ts
function dot(a, ao, b, n) {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[ao + i] * b[i];
  return s;
}
function project(w, d, n) {
  if (!d) return;
  const c = dot(d, 0, w, n);
  for (let i = 0; i < n; i++) w[i] -= c * d[i];
}
function couple(op, sgn, v, u, w, betaPrev, n) {
  op.apply(v, w);
  let alpha = 0;
  for (let i = 0; i < n; i++) {
    const x = sgn * w[i] - betaPrev * u[i];
    w[i] = x;
    alpha += x * v[i];
  }
  return alpha;
}
function orthogonalNorm(w, v, alpha, d, n, out) {
  let q = 0;
  let c = 0;
  if (d)
    for (let i = 0; i < n; i++) {
      const x = w[i] - alpha * v[i];
      w[i] = x;
      q += x * x;
      c += x * d[i];
    }
  else
    for (let i = 0; i < n; i++) {
      const x = w[i] - alpha * v[i];
      w[i] = x;
      q += x * x;
    }
  out[0] = c;
  return Math.max(0, q - c * c);
}
function nextVector(v, w, c, d, inv, n) {
  if (d) for (let i = 0; i < n; i++) v[i] = (w[i] - c * d[i]) * inv;
  else for (let i = 0; i < n; i++) v[i] = w[i] * inv;
}
function countBelow(a, b, k, x) {
  let c = 0;
  let q = a[0] - x;
  for (let i = 0; ; i++) {
    if (q < 0) c++;
    if (i + 1 === k) return c;
    if (q === 0) q = 1e-300;
    q = a[i + 1] - x - b[i] * b[i] / q;
  }
}
function createExtremalLanczos(capacity) {
  const stride = Math.max(1, capacity);
  let v = new Float64Array(stride);
  let u = new Float64Array(stride);
  const w = new Float64Array(stride);
  const vector = new Float64Array(stride);
  let cap = 256;
  let a = new Float64Array(cap);
  let b = new Float64Array(cap);
  let piv = new Float64Array(cap);
  let z = new Float64Array(cap);
  const out = new Float64Array(1);
  const result = { value: 0, vector, applications: 0, steps: 0, converged: false };
  function grow() {
    cap *= 2;
    const na = new Float64Array(cap);
    na.set(a);
    a = na;
    const nb = new Float64Array(cap);
    nb.set(b);
    b = nb;
    piv = new Float64Array(cap);
    z = new Float64Array(cap);
  }
  function smallestRitz(k, upper) {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < k; i++) {
      const r = (i > 0 ? Math.abs(b[i - 1]) : 0) + (i + 1 < k ? Math.abs(b[i]) : 0);
      lo = Math.min(lo, a[i] - r);
      hi = Math.max(hi, a[i] + r);
    }
    hi = Math.min(hi, upper);
    lo -= 1e-14 * Math.max(1, Math.abs(lo));
    for (; ; ) {
      const mid = 0.5 * (lo + hi);
      if (mid <= lo || mid >= hi) break;
      if (countBelow(a, b, k, mid) > 0) hi = mid;
      else lo = mid;
    }
    const tiny = 1e-300;
    piv[0] = a[0] - lo || tiny;
    for (let i = 1; i < k; i++) piv[i] = a[i] - lo - b[i - 1] * b[i - 1] / piv[i - 1] || tiny;
    z.fill(1, 0, k);
    for (let it = 0; it < 2; it++) {
      for (let i = 1; i < k; i++) z[i] -= b[i - 1] / piv[i - 1] * z[i - 1];
      for (let i = 0; i < k; i++) z[i] /= piv[i];
      for (let i = k - 2; i >= 0; i--) z[i] -= b[i] / piv[i] * z[i + 1];
      let s = 0;
      for (let i = 0; i < k; i++) s = Math.max(s, Math.abs(z[i]));
      for (let i = 0; i < k; i++) z[i] /= s;
      let nz = 0;
      for (let i = 0; i < k; i++) nz += z[i] * z[i];
      nz = Math.sqrt(nz);
      for (let i = 0; i < k; i++) z[i] /= nz;
    }
    return { theta: 0.5 * (lo + hi), last: z[k - 1] };
  }
  function startVector(op, req, salt) {
    const n = op.n;
    const keys = req.keys ?? null;
    for (let i = 0; i < n; i++) v[i] = noise(keys ? keys[i] : i, 24301 + salt);
    if (req.start && salt === 0) {
      let sv = 0;
      let ss = 0;
      for (let i = 0; i < n; i++) {
        sv += v[i] * v[i];
        ss += req.start[i] * req.start[i];
      }
      const c = 1e-3 * Math.sqrt(ss / Math.max(sv, 1e-300));
      for (let i = 0; i < n; i++) v[i] = req.start[i] + c * v[i];
    }
    project(v, req.deflate, n);
    let s = 0;
    for (let i = 0; i < n; i++) s += v[i] * v[i];
    return Math.sqrt(s);
  }
  return {
    result,
    solve(op, req) {
      const n = op.n;
      const d = req.deflate;
      const sgn = req.which === "largest" ? -1 : 1;
      const tol = req.tol ?? 1e-10;
      const floor = 1e-14 * Math.max(op.normBound, 1e-300);
      const maxApps = req.maxApplications ?? Math.max(2e3, 60 * n);
      result.applications = 0;
      result.steps = 0;
      result.converged = false;
      result.value = 0;
      if (n - (d ? 1 : 0) <= 0) return result;
      let salt = 0;
      let norm0 = startVector(op, req, salt);
      while (!(norm0 > 1e-8) && salt < 4) norm0 = startVector(op, req, ++salt);
      for (let i = 0; i < n; i++) v[i] = v[i] / norm0;
      u.fill(0, 0, n);
      let betaPrev = 0;
      let k = 0;
      let nextCheck = 8;
      let upper = Infinity;
      let theta;
      for (; ; ) {
        if (k === cap) grow();
        const alpha = couple(op, sgn, v, u, w, betaPrev, n);
        a[k] = alpha;
        const beta = Math.sqrt(orthogonalNorm(w, v, alpha, d, n, out));
        b[k] = beta;
        k++;
        result.applications++;
        const breakdown = beta <= floor;
        if (breakdown || k >= nextCheck || result.applications >= maxApps) {
          const r = smallestRitz(k, upper);
          theta = r.theta;
          upper = theta + 1e-12 * Math.max(Math.abs(theta), op.normBound, 1);
          const converged = breakdown || beta * Math.abs(r.last) <= Math.max(tol * Math.abs(theta), floor);
          if (converged || result.applications >= maxApps) {
            result.converged = converged;
            break;
          }
          nextCheck = k + Math.max(8, k >> 4);
        }
        const t = u;
        u = v;
        v = t;
        nextVector(v, w, out[0], d, 1 / beta, n);
        betaPrev = beta;
      }
      result.value = sgn * theta;
      result.steps = k;
      if (req.wantVector) {
        startVector(op, req, salt);
        for (let i = 0; i < n; i++) v[i] = v[i] / norm0;
        u.fill(0, 0, n);
        for (let i = 0; i < n; i++) vector[i] = z[0] * v[i];
        betaPrev = 0;
        for (let j = 1; j < k; j++) {
          const alpha = couple(op, sgn, v, u, w, betaPrev, n);
          orthogonalNorm(w, v, alpha, d, n, out);
          const beta = b[j - 1];
          const t = u;
          u = v;
          v = t;
          nextVector(v, w, out[0], d, 1 / beta, n);
          const c = z[j];
          for (let i = 0; i < n; i++) vector[i] += c * v[i];
          betaPrev = beta;
        }
        project(vector, d, n);
        let s = 0;
        for (let i = 0; i < n; i++) s += vector[i] * vector[i];
        s = Math.sqrt(s);
        for (let i = 0; i < n; i++) vector[i] /= s;
      }
      return result;
    }
  };
}

// src/metrics/kernels/lanczos.ts
function dot2(a, ao, b, bo, n) {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[ao + i] * b[bo + i];
  return s;
}
function axpy(w, c, V, off, n) {
  for (let i = 0; i < n; i++) w[i] -= c * V[off + i];
}
function norm(w, n) {
  return Math.sqrt(dot2(w, 0, w, 0, n));
}
function orthogonalize(w, V, stride, n, upTo, defl, dc, coeff, ref = norm(w, n)) {
  for (let pass = 0; pass < 2; pass++) {
    if (pass === 1 && norm(w, n) > 0.7071 * ref) break;
    for (let k = 0; k < dc; k++) {
      const c = dot2(defl, k * n, w, 0, n);
      axpy(w, c, defl, k * n, n);
    }
    let l = 0;
    for (; l + 4 <= upTo; l += 4) {
      const o0 = l * stride;
      const o1 = o0 + stride;
      const o2 = o1 + stride;
      const o3 = o2 + stride;
      let c0 = 0;
      let c1 = 0;
      let c2 = 0;
      let c3 = 0;
      for (let i = 0; i < n; i++) {
        const x = w[i];
        c0 += V[o0 + i] * x;
        c1 += V[o1 + i] * x;
        c2 += V[o2 + i] * x;
        c3 += V[o3 + i] * x;
      }
      for (let i = 0; i < n; i++) w[i] -= c0 * V[o0 + i] + c1 * V[o1 + i] + c2 * V[o2 + i] + c3 * V[o3 + i];
      if (coeff) {
        coeff[l] += c0;
        coeff[l + 1] += c1;
        coeff[l + 2] += c2;
        coeff[l + 3] += c3;
      }
    }
    for (; l < upTo; l++) {
      const c = dot2(V, l * stride, w, 0, n);
      if (coeff) coeff[l] += c;
      axpy(w, c, V, l * stride, n);
    }
  }
}
function createLanczos(capacity, maxCount, basis = 24) {
  const m0 = Math.max(basis, 2 * maxCount + 8);
  const stride = Math.max(1, capacity);
  const V = new Float64Array(m0 * stride);
  const w = new Float64Array(stride);
  const tmp = new Float64Array(m0 * stride);
  const H = new Float64Array(m0 * m0);
  const Y = new Float64Array(m0 * m0);
  const theta = new Float64Array(m0);
  const scratch = new Float64Array(m0);
  const h = new Float64Array(m0);
  const views = Array.from({ length: m0 }, (_, i) => V.subarray(i * stride, (i + 1) * stride));
  const result = {
    values: new Float64Array(maxCount),
    vectors: new Float64Array(maxCount * stride),
    stride,
    found: 0,
    applications: 0,
    converged: false
  };
  return {
    result,
    solve(op, req) {
      const n = op.n;
      const dc = req.deflationCount ?? 0;
      const defl = req.deflation;
      const space = n - dc;
      const count = Math.min(req.count, Math.max(0, space), maxCount);
      const tol = req.tol ?? 1e-10;
      const floor = 1e-14 * Math.max(op.normBound, 1e-300);
      const maxApps = req.maxApplications ?? Math.max(2e3, 60 * n);
      result.found = 0;
      result.applications = 0;
      result.converged = true;
      if (count <= 0) return result;
      const m = Math.min(m0, space);
      const keep = Math.min(m - 1, Math.max(count + 2, m >> 1));
      const largest = req.which === "largest";
      let salt = 1;
      const keys = req.keys ?? null;
      if (req.start) for (let i = 0; i < n; i++) w[i] = req.start[i];
      else for (let i = 0; i < n; i++) w[i] = noise(keys ? keys[i] : i, 24301);
      orthogonalize(w, V, stride, n, 0, defl, dc, null);
      let beta = norm(w, n);
      if (!(beta > 1e-8)) {
        for (let i = 0; i < n; i++) w[i] = noise(keys ? keys[i] : i, 24301 + salt++);
        orthogonalize(w, V, stride, n, 0, defl, dc, null);
        beta = norm(w, n);
      }
      for (let i = 0; i < n; i++) V[i] = w[i] / beta;
      H.fill(0, 0, m * m);
      let j = 0;
      let apps = 0;
      let betaPrev = 0;
      for (; ; ) {
        let residual = 0;
        for (let i = j; i < m; i++) {
          op.apply(views[i], w);
          apps++;
          h.fill(0, 0, i + 1);
          if (i === j && j > 0) {
            for (let k = 0; k < j; k++) {
              const c = H[k * m + j];
              h[k] = c;
              if (c !== 0) axpy(w, c, V, k * stride, n);
            }
          } else if (i > 0 && betaPrev !== 0) {
            h[i - 1] = betaPrev;
            axpy(w, betaPrev, V, (i - 1) * stride, n);
          }
          const alpha = dot2(V, i * stride, w, 0, n);
          h[i] += alpha;
          axpy(w, alpha, V, i * stride, n);
          orthogonalize(w, V, stride, n, i + 1, defl, dc, h);
          for (let l = 0; l <= i; l++) {
            H[l * m + i] = h[l];
            H[i * m + l] = h[l];
          }
          beta = norm(w, n);
          residual = beta;
          betaPrev = beta;
          if (i + 1 < m) {
            if (beta <= 1e-10 * Math.max(op.normBound, 1)) {
              for (let t = 0; t < n; t++) w[t] = noise(keys ? keys[t] : t, 24301 + salt++);
              orthogonalize(w, V, stride, n, i + 1, defl, dc, null);
              beta = norm(w, n);
              betaPrev = 0;
              H[(i + 1) * m + i] = 0;
              H[i * m + i + 1] = 0;
            }
            const off2 = (i + 1) * stride;
            const inv = 1 / beta;
            for (let t = 0; t < n; t++) V[off2 + t] = w[t] * inv;
          }
        }
        Y.set(H.subarray(0, m * m));
        symmetricEigen(Y, m, theta, scratch);
        const exact = m === space;
        let allConverged = true;
        for (let k = 0; k < count; k++) {
          const col = largest ? m - 1 - k : k;
          const bound = Math.max(tol * Math.abs(theta[col]), floor);
          if (!exact && residual * Math.abs(Y[(m - 1) * m + col]) > bound) allConverged = false;
        }
        if (allConverged || apps >= maxApps) {
          result.converged = allConverged;
          for (let k = 0; k < count; k++) {
            const col = largest ? m - 1 - k : k;
            result.values[k] = theta[col];
            const out = k * stride;
            result.vectors.fill(0, out, out + n);
            for (let l = 0; l < m; l++) {
              const y = Y[l * m + col];
              const off2 = l * stride;
              for (let t = 0; t < n; t++) result.vectors[out + t] += y * V[off2 + t];
            }
          }
          result.found = count;
          result.applications = apps;
          return result;
        }
        for (let k = 0; k < keep; k++) {
          const col = largest ? m - 1 - k : k;
          const out = k * stride;
          tmp.fill(0, out, out + n);
          for (let l = 0; l < m; l++) {
            const y = Y[l * m + col];
            if (y === 0) continue;
            const off2 = l * stride;
            for (let t = 0; t < n; t++) tmp[out + t] += y * V[off2 + t];
          }
        }
        V.set(tmp.subarray(0, keep * stride));
        H.fill(0, 0, m * m);
        for (let k = 0; k < keep; k++) {
          const col = largest ? m - 1 - k : k;
          H[k * m + k] = theta[col];
          const c = residual * Y[(m - 1) * m + col];
          H[k * m + keep] = c;
          H[keep * m + k] = c;
        }
        orthogonalize(w, V, stride, n, keep, defl, dc, null);
        beta = norm(w, n);
        if (!(beta > 1e-300)) {
          for (let t = 0; t < n; t++) w[t] = noise(keys ? keys[t] : t, 24301 + salt++);
          orthogonalize(w, V, stride, n, keep, defl, dc, null);
          beta = norm(w, n);
        }
        const off = keep * stride;
        for (let t = 0; t < n; t++) V[off + t] = w[t] / beta;
        j = keep;
      }
    }
  };
}

// src/metrics/kernels/extremal-eigen.ts
function createExtremalSolver(g, kind, denseLimit, warmStart) {
  const limit = Math.min(g.n, denseLimit);
  const fiedler = kind === "fiedler";
  const dense = createDenseSpectrum(limit);
  const lanczos = createLanczos(fiedler ? 0 : g.n, 1);
  const plain = createExtremalLanczos(fiedler ? g.n : 0);
  const op = fiedler ? createLaplacianOperator() : createAdjacencyOperator();
  const one = new Float64Array(fiedler ? g.n : 0);
  const previous = new Float64Array(warmStart && !fiedler ? g.n : 0);
  const start = new Float64Array(warmStart && !fiedler ? g.n : 0);
  let hasPrevious = false;
  return (part, keys) => {
    const n = part.n;
    if (n <= limit) {
      const d = fiedler ? dense.laplacian(part) : dense.adjacency(part);
      return fiedler ? d[1] : d[n - 1];
    }
    op.bind(part);
    if (fiedler) {
      one.fill(1 / Math.sqrt(n), 0, n);
      return plain.solve(op, { which: "smallest", deflate: one, keys }).value;
    }
    const warm = warmStart && hasPrevious;
    if (warm) for (let i = 0; i < n; i++) start[i] = previous[part.toOriginal[i]];
    const r = lanczos.solve(op, { which: "largest", count: 1, start: warm ? start : null, keys });
    if (warmStart) {
      previous.fill(0);
      for (let i = 0; i < n; i++) previous[part.toOriginal[i]] = r.vectors[i];
      hasPrevious = true;
    }
    return r.values[0];
  };
}

// src/metrics/kernels/work-count.ts
var kernelWork = { visits: 0, wordVisits: 0 };

// src/metrics/kernels/subgraph.ts
function allocateLocalGraph(nodeCapacity, entryCapacity) {
  return {
    n: 0,
    entries: 0,
    offsets: new Int32Array(nodeCapacity + 1),
    neighbors: new Int32Array(entryCapacity),
    linkOf: new Int32Array(entryCapacity),
    toOriginal: new Int32Array(nodeCapacity),
    toLocal: new Int32Array(nodeCapacity).fill(-1)
  };
}
function createSurvivorBuilder(g, simple) {
  const out = allocateLocalGraph(g.n, 2 * g.m);
  const stamp = new Int32Array(g.n).fill(-1);
  const { offsets, neighbors, linkOf } = g;
  return (mask) => {
    const node = mask.node;
    const link = mask.link;
    const toLocal = out.toLocal;
    let n = 0;
    for (let v = 0; v < g.n; v++) {
      if (node[v]) {
        toLocal[v] = -1;
      } else {
        toLocal[v] = n;
        out.toOriginal[n++] = v;
      }
    }
    stamp.fill(-1);
    let k = 0;
    for (let i = 0; i < n; i++) {
      const v = out.toOriginal[i];
      out.offsets[i] = k;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (w === v || node[w] || link[linkOf[p]]) continue;
        if (simple) {
          if (stamp[w] === v) continue;
          stamp[w] = v;
        }
        out.neighbors[k] = toLocal[w];
        out.linkOf[k++] = linkOf[p];
      }
    }
    out.offsets[n] = k;
    out.n = n;
    out.entries = k;
    kernelWork.visits += g.n + offsets[g.n];
    return out;
  };
}
function inducedSubgraph(src, nodes, from, count, out) {
  const position = out.toLocal;
  for (let i = 0; i < out.n; i++) position[out.toOriginal[i]] = -1;
  for (let i = 0; i < count; i++) {
    const original = src.toOriginal[nodes[from + i]];
    out.toOriginal[i] = original;
    position[original] = i;
  }
  let k = 0;
  for (let i = 0; i < count; i++) {
    const v = nodes[from + i];
    out.offsets[i] = k;
    for (let p = src.offsets[v]; p < src.offsets[v + 1]; p++) {
      const local = position[src.toOriginal[src.neighbors[p]]];
      if (local < 0) continue;
      out.neighbors[k] = local;
      out.linkOf[k++] = src.linkOf[p];
    }
  }
  out.offsets[count] = k;
  out.n = count;
  out.entries = k;
  return out;
}

// src/metrics/kernels/spectral-survivors.ts
var EXTREMAL_DENSE_LIMIT = 48;
var TRACE_DENSE_LIMIT = 300;
function createSpectralSurvivors(g) {
  const build = createSurvivorBuilder(g, true);
  const order = new Int32Array(g.n);
  const start = new Int32Array(g.n + 1);
  const seen = new Uint8Array(g.n);
  const list = { count: 0, order, start };
  const part = allocateLocalGraph(g.n, 2 * g.m);
  const idKey = new Int32Array(g.n);
  for (let i = 0; i < g.n; i++) idKey[i] = fnv1a32CodeUnits(g.nodeIds[i] ?? String(i));
  const keys = new Int32Array(g.n);
  return {
    survivors(mask) {
      return build(mask);
    },
    /** Components of a local graph by breadth-first search. */
    components(local) {
      const n = local.n;
      seen.fill(0, 0, n);
      let tail = 0;
      let c = 0;
      for (let s = 0; s < n; s++) {
        if (seen[s]) continue;
        start[c++] = tail;
        seen[s] = 1;
        let head = tail;
        order[tail++] = s;
        while (head < tail) {
          const v = order[head++];
          for (let p = local.offsets[v]; p < local.offsets[v + 1]; p++) {
            const w = local.neighbors[p];
            if (!seen[w]) {
              seen[w] = 1;
              order[tail++] = w;
            }
          }
        }
      }
      start[c] = tail;
      list.count = c;
      return list;
    },
    /** Per-node keys of a local graph for start and probe vectors (shared buffer). */
    keysOf(graph) {
      for (let i = 0; i < graph.n; i++) keys[i] = idKey[graph.toOriginal[i]];
      return keys;
    },
    /** Component c of `local` as its own local graph (valid until the next call). */
    component(local, comps, c) {
      if (comps.count === 1) return local;
      return inducedSubgraph(local, comps.order, comps.start[c], comps.start[c + 1] - comps.start[c], part);
    }
  };
}

// src/metrics/algebraic-connectivity.ts
var algebraicConnectivity = {
  id: "algebraic_connectivity",
  description: "Fiedler value: second-smallest Laplacian eigenvalue of the surviving graph (0 if disconnected).",
  normalization: "a / N0 (a = N only for the complete graph); 0 when the survivors are disconnected.",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const spectral = createSpectralSurvivors(g);
    const solve = createExtremalSolver(
      g,
      "fiedler",
      options.denseLimit ?? EXTREMAL_DENSE_LIMIT,
      options.warmStart ?? false
    );
    return (mask) => {
      const local = spectral.survivors(mask);
      if (local.n < 2 || spectral.components(local).count > 1) return { raw: 0, normalized: 0 };
      const a = Math.max(0, solve(local, spectral.keysOf(local)));
      return { raw: a, normalized: Math.min(1, a / g.n) };
    };
  }
};

// src/metrics/kernels/bit-bfs.ts
function popcount32(x) {
  x -= x >>> 1 & 1431655765;
  x = (x & 858993459) + (x >>> 2 & 858993459);
  x = x + (x >>> 4) & 252645135;
  return Math.imul(x, 16843009) >>> 24;
}
var LONG_GRAPH_ECCENTRICITY = 12;
var THIN_LEVEL = 12;
var PLANES = 24;
function createHopHistogram(capacity, longEccentricity = LONG_GRAPH_ECCENTRICITY) {
  const cap = Math.max(1, capacity);
  const k = new BfsScratch(cap, longEccentricity);
  return { run: (graph, sources, count, perSource) => k.run(graph, sources, count, perSource) };
}
var BfsScratch = class {
  constructor(cap, longEccentricity) {
    this.longEccentricity = longEccentricity;
    this.newOf = new Int32Array(cap);
    this.order = new Int32Array(cap);
    this.compStart = new Int32Array(cap + 1);
    this.compOf = new Int32Array(cap);
    this.ro = new Int32Array(cap + 1);
    this.rn = new Int32Array(16);
    this.srcSorted = new Int32Array(cap);
    this.srcIndex = new Int32Array(cap);
    this.compSrcStart = new Int32Array(cap + 1);
    this.seen = new Uint32Array(8 * cap);
    this.frontier = new Uint32Array(8 * cap);
    this.next = new Uint32Array(8 * cap);
    this.done = new Uint8Array(cap);
    this.listed = new Uint8Array(cap);
    this.active = new Int32Array(cap);
    this.nextActive = new Int32Array(cap);
    this.dist = new Int32Array(cap).fill(-1);
    this.queue = new Int32Array(cap);
    this.result = { hist: new Float64Array(cap + 1), maxDistance: 0 };
  }
  longEccentricity;
  // Renumbered graph (breadth-first, component by component).
  newOf;
  order;
  compStart;
  compOf;
  ro;
  rn;
  // Sources grouped by component.
  srcSorted;
  srcIndex;
  compSrcStart;
  // Two words per node.
  seen;
  frontier;
  next;
  done;
  listed;
  active;
  nextActive;
  dist;
  queue;
  planes = new Uint32Array(8 * PLANES);
  full = new Uint32Array(8);
  result;
  run(graph, sources, count, perSource) {
    const result = this.result;
    result.hist.fill(0, 0, result.maxDistance + 1);
    result.maxDistance = 0;
    if (perSource) perSource.fill(0, 0, count);
    if (count === 0 || graph.n === 0) return result;
    const comps = this.renumber(graph);
    this.groupSources(sources, count, comps);
    for (let c = 0; c < comps; c++) {
      const s0 = this.compSrcStart[c];
      const s1 = this.compSrcStart[c + 1];
      if (s0 === s1) continue;
      const lo = this.compStart[c];
      const hi = this.compStart[c + 1];
      if (hi - lo < 2) continue;
      const ecc = this.single(this.srcSorted[s0], perSource, this.srcIndex[s0]);
      if (ecc >= this.longEccentricity && hi - lo < THIN_LEVEL * (ecc + 1)) {
        for (let i = s0 + 1; i < s1; i++) this.single(this.srcSorted[i], perSource, this.srcIndex[i]);
        continue;
      }
      for (let b = s0 + 1; b < s1; ) {
        const left = s1 - b;
        if (left > 64) {
          const width = Math.min(256, left);
          this.batch8(b, width, lo, hi, perSource);
          b += width;
        } else {
          this.batch(b, left, lo, hi, perSource);
          b += left;
        }
      }
    }
    return result;
  }
  /** Breadth-first renumbering, component by component; returns the component count. */
  renumber(g) {
    const n = g.n;
    const { offsets, neighbors } = g;
    const newOf = this.newOf;
    const order = this.order;
    newOf.fill(-1, 0, n);
    let tail = 0;
    let c = 0;
    for (let s = 0; s < n; s++) {
      if (newOf[s] >= 0) continue;
      this.compStart[c] = tail;
      newOf[s] = tail;
      order[tail++] = s;
      for (let head = this.compStart[c]; head < tail; head++) {
        const v = order[head];
        for (let p = offsets[v]; p < offsets[v + 1]; p++) {
          const w = neighbors[p];
          if (newOf[w] < 0) {
            newOf[w] = tail;
            order[tail++] = w;
          }
        }
      }
      for (let i = this.compStart[c]; i < tail; i++) this.compOf[i] = c;
      c++;
    }
    this.compStart[c] = tail;
    const entries = offsets[n];
    if (this.rn.length < entries) this.rn = new Int32Array(Math.max(entries, 2 * this.rn.length));
    const rn = this.rn;
    const ro = this.ro;
    let k = 0;
    for (let i = 0; i < n; i++) {
      ro[i] = k;
      const v = order[i];
      for (let p = offsets[v]; p < offsets[v + 1]; p++) rn[k++] = newOf[neighbors[p]];
    }
    ro[n] = k;
    kernelWork.visits += n + k;
    return c;
  }
  /** Sources by component (counting sort), renumbered, each with its position in the input. */
  groupSources(sources, count, comps) {
    const start = this.compSrcStart;
    start.fill(0, 0, comps + 1);
    for (let i = 0; i < count; i++) start[this.compOf[this.newOf[sources[i]]] + 1]++;
    for (let c = 0; c < comps; c++) start[c + 1] += start[c];
    const cursor = this.queue;
    for (let c = 0; c < comps; c++) cursor[c] = start[c];
    for (let i = 0; i < count; i++) {
      const v = this.newOf[sources[i]];
      const at = cursor[this.compOf[v]]++;
      this.srcSorted[at] = v;
      this.srcIndex[at] = i;
    }
  }
  /** Plain BFS from s (renumbered), adding its distances; returns the eccentricity. */
  single(s, perSource, index) {
    const ro = this.ro;
    const rn = this.rn;
    const dist = this.dist;
    const queue = this.queue;
    const hist = this.result.hist;
    dist[s] = 0;
    queue[0] = s;
    let head = 0;
    let tail = 1;
    let ecc = 0;
    let inv = 0;
    let scanned = 0;
    while (head < tail) {
      const v = queue[head++];
      const dv = dist[v] + 1;
      scanned += ro[v + 1] - ro[v];
      for (let p = ro[v]; p < ro[v + 1]; p++) {
        const w = rn[p];
        if (dist[w] >= 0) continue;
        dist[w] = dv;
        queue[tail++] = w;
        hist[dv]++;
        inv += 1 / dv;
        if (dv > ecc) ecc = dv;
      }
    }
    for (let i = 0; i < tail; i++) dist[queue[i]] = -1;
    kernelWork.visits += tail + scanned;
    if (perSource) perSource[index] = inv;
    if (ecc > this.result.maxDistance) this.result.maxDistance = ecc;
    return ecc;
  }
  /** One batch of up to 64 sources (srcSorted[from .. from+width)) in the node range [lo, hi). */
  batch(from, width, lo, hi, perSource) {
    const ro = this.ro;
    const rn = this.rn;
    const seen = this.seen;
    const done = this.done;
    const listed = this.listed;
    const hist = this.result.hist;
    const planes = this.planes;
    let frontier = this.frontier;
    let next = this.next;
    let active = this.active;
    let nextActive = this.nextActive;
    const f0 = width >= 32 ? 4294967295 : (1 << width) - 1 >>> 0;
    const f1 = width >= 64 ? 4294967295 : width <= 32 ? 0 : (1 << width - 32) - 1 >>> 0;
    seen.fill(0, 2 * lo, 2 * hi);
    frontier.fill(0, 2 * lo, 2 * hi);
    next.fill(0, 2 * lo, 2 * hi);
    done.fill(0, lo, hi);
    let activeCount = 0;
    for (let i = 0; i < width; i++) {
      const s = this.srcSorted[from + i];
      const at = 2 * s + (i >>> 5);
      const bit = 1 << (i & 31);
      seen[at] |= bit;
      frontier[at] |= bit;
      if (!listed[s]) {
        listed[s] = 1;
        active[activeCount++] = s;
      }
    }
    for (let i = 0; i < activeCount; i++) listed[active[i]] = 0;
    const sweepWork = hi - lo + (ro[hi] - ro[lo]);
    const counting = perSource !== void 0;
    for (let d = 1; activeCount > 0; d++) {
      let frontierWork = 0;
      for (let i = 0; i < activeCount; i++) frontierWork += ro[active[i] + 1] - ro[active[i]];
      let reached = 0;
      let nextCount = 0;
      if (counting) planes.fill(0);
      kernelWork.wordVisits += 2 * (4 * frontierWork < sweepWork ? activeCount + frontierWork : sweepWork);
      if (4 * frontierWork < sweepWork) {
        for (let i = 0; i < activeCount; i++) {
          const v = active[i];
          const a0 = frontier[2 * v];
          const a1 = frontier[2 * v + 1];
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = rn[p];
            if (done[u]) continue;
            const x0 = a0 & ~seen[2 * u];
            const x1 = a1 & ~seen[2 * u + 1];
            if ((x0 | x1) === 0) continue;
            next[2 * u] |= x0;
            next[2 * u + 1] |= x1;
            if (!listed[u]) {
              listed[u] = 1;
              nextActive[nextCount++] = u;
            }
          }
        }
        for (let i = 0; i < nextCount; i++) {
          const u = nextActive[i];
          listed[u] = 0;
          const x0 = next[2 * u];
          const x1 = next[2 * u + 1];
          reached += popcount32(x0) + popcount32(x1);
          if (counting) addBits(planes, x0, x1);
          const t0 = (seen[2 * u] | x0) >>> 0;
          const t1 = (seen[2 * u + 1] | x1) >>> 0;
          seen[2 * u] = t0;
          seen[2 * u + 1] = t1;
          if (t0 === f0 && t1 === f1) done[u] = 1;
        }
      } else {
        for (let v = lo; v < hi; v++) {
          if (done[v]) continue;
          let a0 = 0;
          let a1 = 0;
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = 2 * rn[p];
            a0 |= frontier[u];
            a1 |= frontier[u + 1];
          }
          const s0 = seen[2 * v];
          const s1 = seen[2 * v + 1];
          const x0 = a0 & ~s0;
          const x1 = a1 & ~s1;
          next[2 * v] = x0;
          next[2 * v + 1] = x1;
          if ((x0 | x1) === 0) continue;
          const t0 = (s0 | x0) >>> 0;
          const t1 = (s1 | x1) >>> 0;
          seen[2 * v] = t0;
          seen[2 * v + 1] = t1;
          reached += popcount32(x0) + popcount32(x1);
          if (counting) addBits(planes, x0, x1);
          nextActive[nextCount++] = v;
          if (t0 === f0 && t1 === f1) done[v] = 1;
        }
      }
      if (reached > 0) {
        hist[d] += reached;
        if (d > this.result.maxDistance) this.result.maxDistance = d;
        if (counting) this.drainPlanes(perSource, from, width, 1 / d, 2);
      }
      for (let i = 0; i < activeCount; i++) {
        const v = active[i];
        frontier[2 * v] = 0;
        frontier[2 * v + 1] = 0;
      }
      const f = frontier;
      frontier = next;
      next = f;
      const a = active;
      active = nextActive;
      nextActive = a;
      activeCount = nextCount;
    }
    this.frontier = frontier;
    this.next = next;
    this.active = active;
    this.nextActive = nextActive;
  }
  /** One batch of up to 256 sources, eight words per node, unrolled (see batch()). */
  batch8(from, width, lo, hi, perSource) {
    const ro = this.ro;
    const rn = this.rn;
    const seen = this.seen;
    const done = this.done;
    const listed = this.listed;
    const hist = this.result.hist;
    const planes = this.planes;
    const full = this.full;
    let frontier = this.frontier;
    let next = this.next;
    let active = this.active;
    let nextActive = this.nextActive;
    for (let w = 0; w < 8; w++) {
      const bits = width - 32 * w;
      full[w] = bits >= 32 ? 4294967295 : bits <= 0 ? 0 : (1 << bits) - 1 >>> 0;
    }
    const f0 = full[0], f1 = full[1], f2 = full[2], f3 = full[3], f4 = full[4], f5 = full[5], f6 = full[6], f7 = full[7];
    seen.fill(0, 8 * lo, 8 * hi);
    frontier.fill(0, 8 * lo, 8 * hi);
    next.fill(0, 8 * lo, 8 * hi);
    done.fill(0, lo, hi);
    let activeCount = 0;
    for (let i = 0; i < width; i++) {
      const s = this.srcSorted[from + i];
      const at = 8 * s + (i >>> 5);
      const bit = 1 << (i & 31);
      seen[at] |= bit;
      frontier[at] |= bit;
      if (!listed[s]) {
        listed[s] = 1;
        active[activeCount++] = s;
      }
    }
    for (let i = 0; i < activeCount; i++) listed[active[i]] = 0;
    const sweepWork = hi - lo + (ro[hi] - ro[lo]);
    const counting = perSource !== void 0;
    for (let d = 1; activeCount > 0; d++) {
      let frontierWork = 0;
      for (let i = 0; i < activeCount; i++) frontierWork += ro[active[i] + 1] - ro[active[i]];
      let reached = 0;
      let nextCount = 0;
      if (counting) planes.fill(0);
      kernelWork.wordVisits += 8 * (4 * frontierWork < sweepWork ? activeCount + frontierWork : sweepWork);
      if (4 * frontierWork < sweepWork) {
        for (let i = 0; i < activeCount; i++) {
          const v = active[i];
          const vb = 8 * v;
          const a0 = frontier[vb + 0];
          const a1 = frontier[vb + 1];
          const a2 = frontier[vb + 2];
          const a3 = frontier[vb + 3];
          const a4 = frontier[vb + 4];
          const a5 = frontier[vb + 5];
          const a6 = frontier[vb + 6];
          const a7 = frontier[vb + 7];
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = rn[p];
            if (done[u]) continue;
            const ub = 8 * u;
            const x0 = a0 & ~seen[ub + 0];
            const x1 = a1 & ~seen[ub + 1];
            const x2 = a2 & ~seen[ub + 2];
            const x3 = a3 & ~seen[ub + 3];
            const x4 = a4 & ~seen[ub + 4];
            const x5 = a5 & ~seen[ub + 5];
            const x6 = a6 & ~seen[ub + 6];
            const x7 = a7 & ~seen[ub + 7];
            if ((x0 | x1 | x2 | x3 | x4 | x5 | x6 | x7) === 0) continue;
            next[ub + 0] |= x0;
            next[ub + 1] |= x1;
            next[ub + 2] |= x2;
            next[ub + 3] |= x3;
            next[ub + 4] |= x4;
            next[ub + 5] |= x5;
            next[ub + 6] |= x6;
            next[ub + 7] |= x7;
            if (!listed[u]) {
              listed[u] = 1;
              nextActive[nextCount++] = u;
            }
          }
        }
        for (let i = 0; i < nextCount; i++) {
          const u = nextActive[i];
          listed[u] = 0;
          const ub = 8 * u;
          let complete2 = true;
          for (let w = 0; w < 8; w++) {
            const x = next[ub + w];
            if (x === 0) {
              if (seen[ub + w] !== full[w]) complete2 = false;
              continue;
            }
            reached += popcount32(x);
            const t = (seen[ub + w] | x) >>> 0;
            seen[ub + w] = t;
            if (t !== full[w]) complete2 = false;
          }
          if (counting) addBits8(planes, next, ub);
          if (complete2) done[u] = 1;
        }
      } else {
        for (let v = lo; v < hi; v++) {
          if (done[v]) continue;
          let a0 = 0, a1 = 0, a2 = 0, a3 = 0, a4 = 0, a5 = 0, a6 = 0, a7 = 0;
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = 8 * rn[p];
            a0 |= frontier[u + 0];
            a1 |= frontier[u + 1];
            a2 |= frontier[u + 2];
            a3 |= frontier[u + 3];
            a4 |= frontier[u + 4];
            a5 |= frontier[u + 5];
            a6 |= frontier[u + 6];
            a7 |= frontier[u + 7];
          }
          const vb = 8 * v;
          const x0 = a0 & ~seen[vb + 0];
          const x1 = a1 & ~seen[vb + 1];
          const x2 = a2 & ~seen[vb + 2];
          const x3 = a3 & ~seen[vb + 3];
          const x4 = a4 & ~seen[vb + 4];
          const x5 = a5 & ~seen[vb + 5];
          const x6 = a6 & ~seen[vb + 6];
          const x7 = a7 & ~seen[vb + 7];
          next[vb + 0] = x0;
          next[vb + 1] = x1;
          next[vb + 2] = x2;
          next[vb + 3] = x3;
          next[vb + 4] = x4;
          next[vb + 5] = x5;
          next[vb + 6] = x6;
          next[vb + 7] = x7;
          if ((x0 | x1 | x2 | x3 | x4 | x5 | x6 | x7) === 0) continue;
          const t0 = (seen[vb + 0] | x0) >>> 0;
          const t1 = (seen[vb + 1] | x1) >>> 0;
          const t2 = (seen[vb + 2] | x2) >>> 0;
          const t3 = (seen[vb + 3] | x3) >>> 0;
          const t4 = (seen[vb + 4] | x4) >>> 0;
          const t5 = (seen[vb + 5] | x5) >>> 0;
          const t6 = (seen[vb + 6] | x6) >>> 0;
          const t7 = (seen[vb + 7] | x7) >>> 0;
          seen[vb + 0] = t0;
          seen[vb + 1] = t1;
          seen[vb + 2] = t2;
          seen[vb + 3] = t3;
          seen[vb + 4] = t4;
          seen[vb + 5] = t5;
          seen[vb + 6] = t6;
          seen[vb + 7] = t7;
          reached += popcount32(x0) + popcount32(x1) + popcount32(x2) + popcount32(x3) + popcount32(x4) + popcount32(x5) + popcount32(x6) + popcount32(x7);
          if (counting) addBits8(planes, next, vb);
          nextActive[nextCount++] = v;
          if (t0 === f0 && t1 === f1 && t2 === f2 && t3 === f3 && t4 === f4 && t5 === f5 && t6 === f6 && t7 === f7)
            done[v] = 1;
        }
      }
      if (reached > 0) {
        hist[d] += reached;
        if (d > this.result.maxDistance) this.result.maxDistance = d;
        if (counting) this.drainPlanes(perSource, from, width, 1 / d, 8);
      }
      for (let i = 0; i < activeCount; i++) {
        const vb = 8 * active[i];
        for (let w = 0; w < 8; w++) frontier[vb + w] = 0;
      }
      const f = frontier;
      frontier = next;
      next = f;
      const a = active;
      active = nextActive;
      nextActive = a;
      activeCount = nextCount;
    }
    this.frontier = frontier;
    this.next = next;
    this.active = active;
    this.nextActive = nextActive;
  }
  /** Per-source counts of this level (bit-sliced) → perSource += count / d. */
  drainPlanes(perSource, from, width, inv, words) {
    const planes = this.planes;
    for (let i = 0; i < width; i++) {
      const word = i >>> 5;
      const bit = i & 31;
      let c = 0;
      for (let p = 0; p < PLANES; p++) c += (planes[words * p + word] >>> bit & 1) * (1 << p);
      if (c > 0) perSource[this.srcIndex[from + i]] += c * inv;
    }
  }
};
function addBits8(planes, next, at) {
  for (let w = 0; w < 8; w++) {
    let c = next[at + w];
    for (let p = 0; p < PLANES && c !== 0; p++) {
      const q = planes[8 * p + w];
      planes[8 * p + w] = q ^ c;
      c &= q;
    }
  }
}
function addBits(planes, x0, x1) {
  let c0 = x0;
  let c1 = x1;
  for (let p = 0; p < PLANES && (c0 | c1) !== 0; p++) {
    const q0 = planes[2 * p];
    const q1 = planes[2 * p + 1];
    planes[2 * p] = q0 ^ c0;
    planes[2 * p + 1] = q1 ^ c1;
    c0 &= q0;
    c1 &= q1;
  }
}

// src/metrics/kernels/union-find.ts
function findRoot(parent, i) {
  while (parent[i] !== i) {
    const up = parent[parent[i]];
    parent[i] = up;
    i = up;
  }
  return i;
}
function unite(parent, size, a, b) {
  let ra = findRoot(parent, a);
  let rb = findRoot(parent, b);
  if (ra === rb) return false;
  if (size[ra] < size[rb]) {
    const t = ra;
    ra = rb;
    rb = t;
  }
  parent[rb] = ra;
  size[ra] += size[rb];
  return true;
}
function createComponentCounter(g) {
  const parent = new Int32Array(g.n);
  const size = new Int32Array(g.n);
  const uf = { parent, size, find: (i) => findRoot(parent, i) };
  const summary = { alive: 0, count: 0, largest: 0, largestRoot: -1, connectedPairs: 0 };
  const { linkSource, linkTarget } = g;
  return {
    uf,
    summary,
    run(mask) {
      const node = mask.node;
      const link = mask.link;
      const n = g.n;
      let alive = 0;
      for (let v = 0; v < n; v++) {
        parent[v] = v;
        size[v] = 1;
        alive += node[v] ^ 1;
      }
      let count = alive;
      for (let e = 0; e < g.m; e++) {
        if (link[e]) continue;
        const a = linkSource[e];
        const b = linkTarget[e];
        if (node[a] || node[b]) continue;
        if (unite(parent, size, a, b)) count--;
      }
      let largest = 0;
      let largestRoot = -1;
      let pairs = 0;
      for (let v = 0; v < n; v++) {
        if (node[v] || parent[v] !== v) continue;
        const s = size[v];
        pairs += s * (s - 1) / 2;
        if (s > largest) {
          largest = s;
          largestRoot = v;
        }
      }
      summary.alive = alive;
      summary.count = count;
      summary.largest = largest;
      summary.largestRoot = largestRoot;
      summary.connectedPairs = pairs;
      kernelWork.visits += 2 * n + g.m;
      return summary;
    }
  };
}

// src/metrics/kernels/lcc-sources.ts
function createLargestComponentSources(g) {
  const counter = createComponentCounter(g);
  const sources = new Int32Array(g.n);
  const out = { sources, count: 0 };
  return (mask, local) => {
    const s = counter.run(mask);
    out.count = 0;
    if (s.largestRoot < 0) return out;
    const root = s.largestRoot;
    const parent = counter.uf.parent;
    for (let i = 0; i < local.n; i++) if (findRoot(parent, local.toOriginal[i]) === root) sources[out.count++] = i;
    return out;
  };
}
function createLargestComponentHops(g) {
  const survivors = createSurvivorBuilder(g, true);
  const lcc = createLargestComponentSources(g);
  const bfs = createHopHistogram(g.n);
  const out = { hops: { hist: new Float64Array(1), maxDistance: 0 }, count: 0 };
  return (mask) => {
    const local = survivors(mask);
    const { sources, count } = lcc(mask, local);
    out.count = count;
    if (count >= 2) out.hops = bfs.run(local, sources, count);
    return out;
  };
}

// src/metrics/average-hop.ts
var averageHop = {
  id: "average_hop",
  description: "Mean hop count between the node pairs of the largest component.",
  normalization: "1 / H (1 for a complete graph); taken on the largest component; 0 when it has under two nodes.",
  cost: "all-pairs",
  appliesTo: () => true,
  create(g) {
    const hops = createLargestComponentHops(g);
    return (mask) => {
      const { hops: h, count } = hops(mask);
      if (count < 2) return { raw: Number.NaN, normalized: 0 };
      let sum = 0;
      for (let d = 1; d <= h.maxDistance; d++) sum += h.hist[d] * d;
      const mean = sum / (count * (count - 1));
      return { raw: mean, normalized: 1 / mean };
    };
  }
};

// src/metrics/kernels/cut-elements.ts
function createCutFinder(nodeCapacity) {
  const disc = new Int32Array(nodeCapacity);
  const low = new Int32Array(nodeCapacity);
  const parentLink = new Int32Array(nodeCapacity);
  const cursor = new Int32Array(nodeCapacity);
  const stack = new Int32Array(nodeCapacity);
  const blockStack = new Int32Array(nodeCapacity);
  const edgeStack = new Int32Array(nodeCapacity);
  const isCut = new Uint8Array(nodeCapacity);
  const out = { bridges: 0, cutNodes: 0, blockPairs: 0, twoEdgePairs: 0 };
  return (g) => {
    const n = g.n;
    const { offsets, neighbors, linkOf } = g;
    disc.fill(-1, 0, n);
    isCut.fill(0, 0, n);
    let time = 0;
    let bridges2 = 0;
    let blockPairs = 0;
    let twoEdgePairs = 0;
    for (let root = 0; root < n; root++) {
      if (disc[root] !== -1) continue;
      let top = 0;
      let bTop = 0;
      let eTop = 0;
      stack[top++] = root;
      blockStack[bTop++] = root;
      edgeStack[eTop++] = root;
      parentLink[root] = -1;
      disc[root] = low[root] = time++;
      cursor[root] = offsets[root];
      let rootChildren = 0;
      while (top > 0) {
        const v = stack[top - 1];
        if (cursor[v] < offsets[v + 1]) {
          const p = cursor[v]++;
          const e = linkOf[p];
          if (e === parentLink[v]) continue;
          const w = neighbors[p];
          if (disc[w] === -1) {
            parentLink[w] = e;
            disc[w] = low[w] = time++;
            cursor[w] = offsets[w];
            stack[top++] = w;
            blockStack[bTop++] = w;
            edgeStack[eTop++] = w;
            if (v === root) rootChildren++;
          } else if (disc[w] < low[v]) {
            low[v] = disc[w];
          }
        } else {
          top--;
          if (top === 0) break;
          const parent = stack[top - 1];
          if (low[v] < low[parent]) low[parent] = low[v];
          if (low[v] >= disc[parent]) {
            let size = 1;
            while (blockStack[--bTop] !== v) size++;
            size++;
            blockPairs += size * (size - 1) / 2;
            if (parent !== root) isCut[parent] = 1;
          }
          if (low[v] > disc[parent]) {
            bridges2++;
            let size = 1;
            while (edgeStack[--eTop] !== v) size++;
            twoEdgePairs += size * (size - 1) / 2;
          }
        }
      }
      if (rootChildren > 1) isCut[root] = 1;
      twoEdgePairs += eTop * (eTop - 1) / 2;
    }
    let cutNodes2 = 0;
    for (let v = 0; v < n; v++) cutNodes2 += isCut[v];
    out.bridges = bridges2;
    out.cutNodes = cutNodes2;
    out.blockPairs = blockPairs;
    out.twoEdgePairs = twoEdgePairs;
    return out;
  };
}

// src/metrics/kernels/cut-metric.ts
function cutMetric(id, description, normalization, pick) {
  return {
    id,
    description,
    normalization,
    cost: "linear",
    appliesTo: () => true,
    create(g) {
      const survivors = createSurvivorBuilder(g, false);
      const find = createCutFinder(g.n);
      const allPairs = g.n * (g.n - 1) / 2;
      return (mask) => {
        const { count, protectedPairs } = pick(find(survivors(mask)));
        return { raw: count, normalized: allPairs > 0 ? protectedPairs / allPairs : 0 };
      };
    }
  };
}

// src/metrics/bridges.ts
var bridges = cutMetric(
  "bridges",
  "Bridges: links whose single failure disconnects the surviving graph.",
  "Share of the original node pairs still connected after any single link failure (Σ C(|C|,2) over 2-link-connected pieces / C(N0,2)).",
  (s) => ({ count: s.bridges, protectedPairs: s.twoEdgePairs })
);

// src/metrics/cut-nodes.ts
var cutNodes = cutMetric(
  "cut_nodes",
  "Cut nodes: nodes whose single failure disconnects the surviving graph.",
  "Share of the original node pairs that no single third-node failure separates (Σ C(|B|,2) over blocks / C(N0,2)).",
  (s) => ({ count: s.cutNodes, protectedPairs: s.blockPairs })
);

// src/metrics/kernels/dijkstra.ts
function siftUp(heap, pos, dist, i) {
  const v = heap[i];
  const d = dist[v];
  while (i > 0) {
    const parent = i - 1 >> 1;
    const u = heap[parent];
    if (dist[u] <= d) break;
    heap[i] = u;
    pos[u] = i;
    i = parent;
  }
  heap[i] = v;
  pos[v] = i;
}
function siftDown(heap, pos, dist, size, i) {
  const v = heap[i];
  const d = dist[v];
  for (; ; ) {
    let child = 2 * i + 1;
    if (child >= size) break;
    if (child + 1 < size && dist[heap[child + 1]] < dist[heap[child]]) child++;
    const u = heap[child];
    if (dist[u] >= d) break;
    heap[i] = u;
    pos[u] = i;
    i = child;
  }
  heap[i] = v;
  pos[v] = i;
}
function shortestPaths(g, cost, source, dist, heap, pos, visit) {
  const n = g.n;
  const { offsets, neighbors, linkOf } = g;
  dist.fill(Infinity, 0, n);
  pos.fill(-1, 0, n);
  let size = 0;
  dist[source] = 0;
  heap[size++] = source;
  pos[source] = 0;
  while (size > 0) {
    const v = heap[0];
    const dv = dist[v];
    pos[v] = -2;
    const last = heap[--size];
    if (size > 0) {
      heap[0] = last;
      pos[last] = 0;
      siftDown(heap, pos, dist, size, 0);
    }
    if (visit !== void 0 && visit(v, dv)) return;
    for (let p = offsets[v]; p < offsets[v + 1]; p++) {
      const w = neighbors[p];
      const at = pos[w];
      if (at === -2) continue;
      const nd = dv + cost[linkOf[p]];
      if (nd < dist[w]) {
        dist[w] = nd;
        if (at === -1) {
          heap[size] = w;
          pos[w] = size++;
          siftUp(heap, pos, dist, size - 1);
        } else {
          siftUp(heap, pos, dist, at);
        }
      }
    }
  }
}
function createDijkstra(capacity) {
  const dist = new Float64Array(capacity);
  const heap = new Int32Array(capacity);
  const pos = new Int32Array(capacity);
  return {
    dist,
    /** See shortestPaths; results in `dist`. */
    run(g, cost, source, visit) {
      shortestPaths(g, cost, source, dist, heap, pos, visit);
    }
  };
}

// src/metrics/kernels/link-cost.ts
function complete(values) {
  if (!values || values.length === 0) return false;
  for (let e = 0; e < values.length; e++) if (!(values[e] > 0 && Number.isFinite(values[e]))) return false;
  return true;
}
function chooseLinkCost(g) {
  const pick = (kind, unit, values) => {
    if (!complete(values)) return null;
    let min = Infinity;
    for (let e = 0; e < values.length; e++) min = Math.min(min, values[e]);
    return { kind, unit, values, min };
  };
  return pick("latency", "ms", g.latency) ?? pick("length", "km", g.length) ?? pick("weight", "", g.weight);
}
var FIBRE_MS_PER_KM = 49e-4;

// src/metrics/demand-served.ts
function totalVolume(g) {
  let total = 0;
  for (let k = 0; k < g.demandVolume.length; k++) {
    if (g.demandSource[k] >= 0 && g.demandTarget[k] >= 0 && g.demandVolume[k] > 0) total += g.demandVolume[k];
  }
  return total;
}
var demandServed = {
  id: "demand_served",
  description: "Share of traffic demand volume whose ends are still connected (within the latency budget, if one is set).",
  normalization: "served volume / total demand volume; raw = served volume.",
  cost: "linear",
  appliesTo: (g) => totalVolume(g) > 0,
  needs: {
    what: "demands",
    hint: "declare demands (a volume > 0 between two sites) in the design, or take demand_served out of the r-value"
  },
  create(g, options = {}) {
    const total = totalVolume(g);
    const budget = options.latencyBudget ?? g.latencyBudget;
    const k = g.demandVolume.length;
    const { demandSource: src, demandTarget: dst, demandVolume: vol } = g;
    if (budget === void 0) {
      const counter = createComponentCounter(g);
      return (mask) => {
        if (total <= 0) return { raw: 0, normalized: 0 };
        counter.run(mask);
        const parent = counter.uf.parent;
        let served = 0;
        for (let d = 0; d < k; d++) {
          const s = src[d];
          const t = dst[d];
          if (s < 0 || t < 0 || !(vol[d] > 0) || mask.node[s] || mask.node[t]) continue;
          if (s === t || findRoot(parent, s) === findRoot(parent, t)) served += vol[d];
        }
        return { raw: served, normalized: served / total };
      };
    }
    if (!(budget > 0)) throw new RangeError(`latency budget must be positive, got ${budget}`);
    const chosen = chooseLinkCost(g);
    const cost = chosen ? chosen.values : new Float64Array(g.m).fill(1);
    const first = new Int32Array(g.n + 1);
    for (let d = 0; d < k; d++) if (src[d] >= 0 && dst[d] >= 0 && vol[d] > 0) first[src[d] + 1]++;
    for (let v = 0; v < g.n; v++) first[v + 1] += first[v];
    const bySource = new Int32Array(first[g.n]);
    const fill = first.slice(0, g.n);
    for (let d = 0; d < k; d++) if (src[d] >= 0 && dst[d] >= 0 && vol[d] > 0) bySource[fill[src[d]]++] = d;
    const survivors = createSurvivorBuilder(g, false);
    const dijkstra = createDijkstra(g.n);
    const allowed = new Float64Array(k).fill(-1);
    {
      const local = survivors(createMask(g));
      for (let s = 0; s < g.n; s++) {
        if (first[s] === first[s + 1]) continue;
        dijkstra.run(local, cost, s);
        for (let i = first[s]; i < first[s + 1]; i++) {
          const d = bySource[i];
          const c = dijkstra.dist[dst[d]];
          if (c < Infinity) allowed[d] = c * budget * (1 + 1e-12);
        }
      }
    }
    let reach = 0;
    const stopWhenBeyond = (_v, dist) => dist > reach;
    return (mask) => {
      if (total <= 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      let served = 0;
      for (let s = 0; s < g.n; s++) {
        if (first[s] === first[s + 1] || mask.node[s]) continue;
        reach = 0;
        for (let i = first[s]; i < first[s + 1]; i++) reach = Math.max(reach, allowed[bySource[i]]);
        if (reach < 0) continue;
        dijkstra.run(local, cost, local.toLocal[s], stopWhenBeyond);
        for (let i = first[s]; i < first[s + 1]; i++) {
          const d = bySource[i];
          const t = dst[d];
          if (allowed[d] < 0 || mask.node[t]) continue;
          if (dijkstra.dist[local.toLocal[t]] <= allowed[d]) served += vol[d];
        }
      }
      return { raw: served, normalized: served / total };
    };
  }
};

// src/metrics/diameter.ts
var diameter = {
  id: "diameter",
  description: "Longest shortest path (hops) within the largest component.",
  normalization: "1 / D (1 for a complete graph); taken on the largest component; 0 when it has under two nodes.",
  cost: "all-pairs",
  appliesTo: () => true,
  create(g) {
    const hops = createLargestComponentHops(g);
    return (mask) => {
      const { hops: h, count } = hops(mask);
      if (count < 2) return { raw: Number.NaN, normalized: 0 };
      return { raw: h.maxDistance, normalized: 1 / h.maxDistance };
    };
  }
};

// src/metrics/kernels/banded-resistance.ts
function createBandedResistance(capacity) {
  const perm = new Int32Array(capacity);
  const place = new Int32Array(capacity);
  const queue = new Int32Array(capacity);
  const seen = new Uint8Array(capacity);
  const order = new Int32Array(capacity);
  const d = new Float64Array(capacity);
  const x = new Float64Array(capacity);
  let band = new Float64Array(0);
  let inverse2 = new Float64Array(0);
  function cuthillMcKee(g, start) {
    seen.fill(0, 0, g.n);
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    seen[start] = 1;
    let lastLevelStart = start;
    let levelEnd = 1;
    while (head < tail) {
      if (head === levelEnd) {
        lastLevelStart = queue[head];
        levelEnd = tail;
      }
      const v = queue[head++];
      const from = tail;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (seen[w]) continue;
        seen[w] = 1;
        const dw = g.offsets[w + 1] - g.offsets[w];
        let k = tail++;
        while (k > from && g.offsets[queue[k - 1] + 1] - g.offsets[queue[k - 1]] > dw) {
          queue[k] = queue[k - 1];
          k--;
        }
        queue[k] = w;
      }
    }
    return lastLevelStart;
  }
  return {
    /**
     * The band width the ordering gives for `g` (connected, n ≥ 2), leaving the ordering in
     * place for `resistance`. The ground is the last node of the ordering.
     */
    prepare(g) {
      const n = g.n;
      let start = 0;
      for (let v = 1; v < n; v++)
        if (g.offsets[v + 1] - g.offsets[v] < g.offsets[start + 1] - g.offsets[start]) start = v;
      start = cuthillMcKee(g, start);
      cuthillMcKee(g, start);
      for (let i = 0; i < n; i++) order[i] = queue[n - 1 - i];
      for (let i = 0; i < n; i++) {
        perm[i] = order[i];
        place[order[i]] = i;
      }
      let b = 0;
      for (let v = 0; v < n; v++) {
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
          const gap = Math.abs(place[v] - place[g.neighbors[p]]);
          if (gap > b) b = gap;
        }
      }
      return b;
    },
    /** R_G of the connected graph `g` after `prepare(g)` returned `b`. */
    resistance(g, b) {
      const n = g.n;
      const m = n - 1;
      const w = b + 1;
      if (band.length < m * w) {
        band = new Float64Array(m * w);
        inverse2 = new Float64Array(m * w);
      }
      band.fill(0, 0, m * w);
      for (let i = 0; i < m; i++) {
        const v = perm[i];
        band[i * w] = g.offsets[v + 1] - g.offsets[v];
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
          const j = place[g.neighbors[p]];
          if (j < i) band[i * w + (i - j)] -= 1;
        }
      }
      for (let i = 0; i < m; i++) {
        const lo = Math.max(0, i - b);
        const ri = i * w;
        for (let j = lo; j < i; j++) {
          const rj = j * w;
          let s2 = band[ri + (i - j)];
          const k0 = Math.max(lo, j - b);
          for (let k = k0; k < j; k++) s2 -= band[ri + (i - k)] * d[k] * band[rj + (j - k)];
          band[ri + (i - j)] = s2 / d[j];
        }
        let s = band[ri];
        for (let k = lo; k < i; k++) {
          const l = band[ri + (i - k)];
          s -= l * l * d[k];
        }
        d[i] = s;
      }
      let trace = 0;
      for (let i = m - 1; i >= 0; i--) {
        const hi = Math.min(m - 1, i + b);
        for (let j = hi; j > i; j--) {
          let s2 = 0;
          for (let k = i + 1; k <= hi; k++) {
            const lki = band[k * w + (k - i)];
            if (lki === 0) continue;
            s2 -= lki * (k <= j ? inverse2[j * w + (j - k)] : inverse2[k * w + (k - j)]);
          }
          inverse2[j * w + (j - i)] = s2;
        }
        let s = 1 / d[i];
        for (let k = i + 1; k <= hi; k++) s -= band[k * w + (k - i)] * inverse2[k * w + (k - i)];
        inverse2[i * w] = s;
        trace += s;
      }
      for (let i = 0; i < m; i++) {
        let s = 1;
        for (let k = Math.max(0, i - b); k < i; k++) s -= band[i * w + (i - k)] * x[k];
        x[i] = s;
      }
      for (let i = 0; i < m; i++) x[i] /= d[i];
      for (let i = m - 1; i >= 0; i--) {
        let s = x[i];
        for (let k = i + 1; k <= Math.min(m - 1, i + b); k++) s -= band[k * w + (k - i)] * x[k];
        x[i] = s;
      }
      let total = 0;
      for (let i = 0; i < m; i++) total += x[i];
      return n * trace - total;
    }
  };
}

// src/metrics/kernels/slq.ts
function createTraceEstimator(capacity, maxSteps) {
  const stride = Math.max(1, capacity);
  const q = new Float64Array(stride);
  const qPrev = new Float64Array(stride);
  const w = new Float64Array(stride);
  const diag = new Float64Array(maxSteps);
  const off = new Float64Array(maxSteps);
  const d = new Float64Array(maxSteps);
  const e = new Float64Array(maxSteps);
  const z = new Float64Array(maxSteps);
  function deflate(v, n, defl, dc) {
    for (let k = 0; k < dc; k++) {
      let c = 0;
      const o = k * n;
      for (let i = 0; i < n; i++) c += defl[o + i] * v[i];
      for (let i = 0; i < n; i++) v[i] -= c * defl[o + i];
    }
  }
  function quadrature(k, f) {
    tridiagonalEigen(diag, off, k, d, e, z, true);
    let s = 0;
    for (let j = 0; j < k; j++) s += z[j] * z[j] * f(d[j]);
    return s;
  }
  return {
    /**
     * Estimate Σ f(λ) over the eigenvalues of `op` whose eigenvectors are orthogonal to
     * the `dc` orthonormal vectors in `defl` (packed with stride op.n).
     */
    estimate(op, f, keys, defl, dc, opts) {
      return this.estimateWithError(op, f, keys, defl, dc, opts).mean;
    },
    /**
     * The estimate and its standard error: the probes' sample standard deviation over √probes
     * (each probe is an unbiased Hutchinson sample of the trace, up to the quadrature's error,
     * which `tol` keeps far below it).
     */
    estimateWithError(op, f, keys, defl, dc, opts) {
      const n = op.n;
      if (n - dc <= 0) return { mean: 0, se: 0, probes: 0 };
      const steps = Math.min(opts.steps, maxSteps, n - dc);
      const most = opts.targetSe !== void 0 ? Math.max(opts.probes, opts.maxProbes ?? opts.probes) : opts.probes;
      let total = 0;
      let squares = 0;
      let p = 0;
      for (; p < most; p++) {
        if (opts.targetSe !== void 0 && p >= opts.probes && p % opts.probes === 0) {
          const mean2 = total / p;
          const se2 = Math.sqrt(Math.max(0, squares / p - mean2 * mean2) / (p - 1));
          if (se2 <= opts.targetSe(mean2)) break;
        }
        for (let i = 0; i < n; i++) q[i] = sign(keys[i], 20903 + p);
        deflate(q, n, defl, dc);
        let nz2 = 0;
        for (let i = 0; i < n; i++) nz2 += q[i] * q[i];
        if (nz2 === 0) continue;
        const inv = 1 / Math.sqrt(nz2);
        for (let i = 0; i < n; i++) {
          q[i] *= inv;
          qPrev[i] = 0;
        }
        let betaPrev = 0;
        let estimate = 0;
        let last = Number.NaN;
        for (let j = 0; j < steps; j++) {
          op.apply(q, w);
          deflate(w, n, defl, dc);
          let alpha = 0;
          for (let i = 0; i < n; i++) alpha += q[i] * w[i];
          let beta2 = 0;
          for (let i = 0; i < n; i++) {
            const v = w[i] - alpha * q[i] - betaPrev * qPrev[i];
            w[i] = v;
            beta2 += v * v;
          }
          const beta = Math.sqrt(beta2);
          diag[j] = alpha;
          off[j] = beta;
          const k = j + 1;
          const breakdown = beta <= 1e-12 * Math.max(op.normBound, 1);
          if (k === steps || breakdown || k % 4 === 0) {
            estimate = quadrature(k, f);
            if (breakdown || Math.abs(estimate - last) <= opts.tol * Math.abs(estimate)) break;
            last = estimate;
          }
          const invBeta = 1 / beta;
          for (let i = 0; i < n; i++) {
            qPrev[i] = q[i];
            q[i] = w[i] * invBeta;
          }
          betaPrev = beta;
        }
        total += nz2 * estimate;
        squares += (nz2 * estimate) ** 2;
      }
      const mean = total / p;
      const se = p > 1 ? Math.sqrt(Math.max(0, squares / p - mean * mean) * p / (p - 1) / p) : Number.POSITIVE_INFINITY;
      return { mean, se, probes: p };
    }
  };
}

// src/metrics/effective-resistance.ts
var DEFAULT_EXACT_WORK = 5e7;
var PROBES = 32;
var STEPS = 120;
var inverse = (x) => 1 / x;
var effectiveResistance = {
  id: "effective_resistance",
  description: "Effective graph resistance (Kirchhoff index) of the surviving graph; ∞ if disconnected.",
  normalization: "(N' − 1) / R_G over the N' survivors (1 only for the complete graph); 0 when disconnected.",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const limit = options.denseLimit ?? TRACE_DENSE_LIMIT;
    const maxWork = options.exactWork ?? DEFAULT_EXACT_WORK;
    const spectral = createSpectralSurvivors(g);
    const banded = createBandedResistance(g.n);
    let slq = null;
    const op = createLaplacianOperator();
    const deflation = new Float64Array(g.n);
    return (mask) => {
      const local = spectral.survivors(mask);
      const n = local.n;
      if (n < 2) return { raw: 0, normalized: 0 };
      if (spectral.components(local).count > 1) return { raw: Infinity, normalized: 0 };
      const b = banded.prepare(local);
      let resistance;
      if (n <= limit || n * b * b <= maxWork) {
        resistance = banded.resistance(local, b);
      } else {
        op.bind(local);
        deflation.fill(1 / Math.sqrt(n), 0, n);
        slq ??= createTraceEstimator(g.n, STEPS);
        const trace = slq.estimate(op, inverse, spectral.keysOf(local), deflation, 1, {
          probes: PROBES,
          steps: STEPS,
          tol: 1e-9
        });
        resistance = n * trace;
      }
      return { raw: resistance, normalized: Math.min(1, (n - 1) / resistance) };
    };
  }
};

// src/graph/canonical.ts
var WHOLE = /^[0-9]+$/;
function compareIds(a, b) {
  if (a === b) return 0;
  return compareParsed(a, WHOLE.test(a) ? stripZeros(a) : null, b, WHOLE.test(b) ? stripZeros(b) : null);
}
function compareParsed(a, da, b, db) {
  if (da !== null && db !== null) {
    if (da.length !== db.length) return da.length - db.length;
    if (da !== db) return da < db ? -1 : 1;
  } else if (da !== null || db !== null) return da !== null ? -1 : 1;
  return compareCodePoints(a, b);
}
function stripZeros(s) {
  let i = 0;
  while (i < s.length - 1 && s.charCodeAt(i) === 48) i++;
  return s.slice(i);
}
function compareCodePoints(a, b) {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) {
    const x = a.charCodeAt(i);
    const y = b.charCodeAt(i);
    if (x !== y) return unitRank(x) - unitRank(y);
  }
  return a.length - b.length;
}
function unitRank(u) {
  if (u >= 55296 && u <= 57343) return u + 8192;
  if (u >= 57344) return u - 2048;
  return u;
}

// src/metrics/kernels/source-sample.ts
function sourceHash(id, seed) {
  let h = mix32((Math.floor(seed / 4294967296) ^ 1936684402) >>> 0) ^ seed >>> 0;
  for (let i = 0; i < id.length; i++) {
    let k = Math.imul(id.charCodeAt(i), 3432918353);
    k = k << 15 | k >>> 17;
    h ^= Math.imul(k, 461845907);
    h = h << 13 | h >>> 19;
    h = Math.imul(h, 5) + 3864292196 | 0;
  }
  return mix32(h ^ id.length);
}
function sampleSources(ids, choice, seed) {
  if (choice === void 0 || choice === "all") return null;
  if (!Number.isInteger(choice) || choice < 1)
    throw new RangeError(`sources must be a whole number of at least 1 or 'all', got ${String(choice)}`);
  if (choice >= ids.length) return null;
  const keys = new Uint32Array(ids.length);
  for (let i = 0; i < ids.length; i++) keys[i] = sourceHash(ids[i], seed);
  const order = Array.from({ length: ids.length }, (_, i) => i);
  order.sort((a, b) => keys[a] - keys[b] || compareIds(ids[a], ids[b]));
  return Int32Array.from(order.slice(0, choice)).sort();
}
function sampleMean(y, k, population) {
  let sum = 0;
  for (let i = 0; i < k; i++) sum += y[i];
  const mean = sum / k;
  if (k < 2) return { mean, se: Number.POSITIVE_INFINITY };
  let ss = 0;
  for (let i = 0; i < k; i++) ss += (y[i] - mean) * (y[i] - mean);
  const variance = ss / (k - 1);
  return { mean, se: Math.sqrt(Math.max(0, 1 - k / population) * (variance / k)) };
}

// src/metrics/efficiency.ts
var efficiency = {
  id: "efficiency",
  description: "Global efficiency: mean inverse hop distance over all pairs of original nodes.",
  normalization: "Already in [0, 1] with N0 in the denominator; 1 only for a complete graph.",
  cost: "all-pairs",
  appliesTo: () => true,
  create(g, options = {}) {
    const survivors = createSurvivorBuilder(g, true);
    const bfs = createHopHistogram(g.n);
    const pairs = g.n * (g.n - 1);
    const sample = sampleSources(g.nodeIds, options.sources, options.sourceSeed ?? 0);
    if (sample) {
      const k = sample.length;
      const local = new Int32Array(k);
      const at = new Int32Array(k);
      const sums = new Float64Array(k);
      const y = new Float64Array(k);
      return (mask) => {
        const graph = survivors(mask);
        let alive = 0;
        for (let i = 0; i < k; i++) {
          const v = graph.toLocal[sample[i]];
          if (v >= 0) {
            local[alive] = v;
            at[alive++] = i;
          }
        }
        y.fill(0);
        bfs.run(graph, local, alive, sums);
        for (let i = 0; i < alive; i++) y[at[i]] = sums[i] / (g.n - 1);
        const { mean, se } = sampleMean(y, k, g.n);
        return { raw: mean, normalized: Math.min(1, Math.max(0, mean)), se };
      };
    }
    const sources = new Int32Array(g.n);
    for (let i = 0; i < g.n; i++) sources[i] = i;
    return (mask) => {
      if (pairs === 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      const { hist, maxDistance } = bfs.run(local, sources, local.n);
      let sum = 0;
      for (let d = 1; d <= maxDistance; d++) sum += hist[d] / d;
      const e = sum / pairs;
      return { raw: e, normalized: e };
    };
  }
};

// src/metrics/largest-component.ts
var largestComponent = {
  id: "largest_component",
  description: "Share of the original nodes in the largest connected component.",
  normalization: "|largest component| / N0 (original node count); raw = nodes in the largest component.",
  cost: "linear",
  appliesTo: () => true,
  create(g) {
    const counter = createComponentCounter(g);
    return (mask) => {
      const s = counter.run(mask);
      return { raw: s.largest, normalized: g.n > 0 ? s.largest / g.n : 0 };
    };
  }
};

// src/metrics/kernels/max-flow.ts
function createFlowNetwork(nodeCapacity, entryCapacity) {
  const maxNodes = 2 * nodeCapacity;
  const maxArcs = 2 * entryCapacity + 2 * nodeCapacity;
  const start = new Int32Array(maxNodes + 1);
  const head = new Int32Array(maxArcs);
  const rev = new Int32Array(maxArcs);
  const cap0 = new Int8Array(maxArcs);
  const cap = new Int8Array(maxArcs);
  const fill = new Int32Array(maxNodes);
  const parentArc = new Int32Array(maxNodes);
  const queue = new Int32Array(maxNodes);
  let nodes = 0;
  let arcs = 0;
  let isSplit = false;
  function addPair(a, b, capAB, capBA) {
    const x = fill[a]++;
    const y = fill[b]++;
    head[x] = b;
    cap0[x] = capAB;
    rev[x] = y;
    head[y] = a;
    cap0[y] = capBA;
    rev[y] = x;
  }
  return {
    build(graph, split) {
      isSplit = split;
      const n = graph.n;
      nodes = split ? 2 * n : n;
      start.fill(0, 0, nodes + 1);
      for (let v = 0; v < n; v++) {
        const deg = graph.offsets[v + 1] - graph.offsets[v];
        if (split) {
          start[2 * v + 1] += 1 + deg;
          start[2 * v + 2] += 1 + deg;
        } else {
          start[v + 1] += deg;
        }
      }
      for (let i = 0; i < nodes; i++) start[i + 1] += start[i];
      arcs = start[nodes];
      for (let i = 0; i < nodes; i++) fill[i] = start[i];
      for (let v = 0; v < n; v++) {
        if (split) addPair(2 * v, 2 * v + 1, 1, 0);
        for (let p = graph.offsets[v]; p < graph.offsets[v + 1]; p++) {
          const w = graph.neighbors[p];
          if (split)
            addPair(2 * v + 1, 2 * w, 1, 0);
          else if (v < w) addPair(v, w, 1, 1);
        }
      }
    },
    flow(s, t, limit) {
      const source = isSplit ? 2 * s + 1 : s;
      const sink = isSplit ? 2 * t : t;
      if (source === sink) return limit;
      for (let a = 0; a < arcs; a++) cap[a] = cap0[a];
      let total = 0;
      while (total < limit) {
        parentArc.fill(-1, 0, nodes);
        let qh = 0;
        let qt = 0;
        queue[qt++] = source;
        parentArc[source] = -2;
        let found = false;
        while (qh < qt && !found) {
          const u = queue[qh++];
          for (let a = start[u]; a < fill[u]; a++) {
            if (cap[a] <= 0) continue;
            const v = head[a];
            if (parentArc[v] !== -1) continue;
            parentArc[v] = a;
            if (v === sink) {
              found = true;
              break;
            }
            queue[qt++] = v;
          }
        }
        if (!found) break;
        for (let v = sink; v !== source; ) {
          const a = parentArc[v];
          cap[a]--;
          cap[rev[a]]++;
          v = head[rev[a]];
        }
        total++;
      }
      return total;
    }
  };
}

// src/metrics/kernels/connectivity-counts.ts
function createConnectivityCounter(nodeCapacity, entryCapacity) {
  const network = createFlowNetwork(nodeCapacity, entryCapacity);
  const mark = new Int32Array(nodeCapacity).fill(-1);
  let stampCounter = 0;
  const domNodes = new Int32Array(nodeCapacity);
  const dominated = new Uint8Array(nodeCapacity);
  const dominating = { nodes: domNodes, count: 0 };
  function dominatingSet(g) {
    dominated.fill(0, 0, g.n);
    dominating.count = 0;
    for (let v = 0; v < g.n; v++) {
      if (dominated[v]) continue;
      domNodes[dominating.count++] = v;
      dominated[v] = 1;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) dominated[g.neighbors[p]] = 1;
    }
    return dominating;
  }
  function nextStamp() {
    if (stampCounter >= 1073741823) {
      mark.fill(-1);
      stampCounter = 0;
    }
    return ++stampCounter;
  }
  function hasParallel(g) {
    for (let v = 0; v < g.n; v++) {
      const stamp = nextStamp();
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (mark[w] === stamp) return true;
        mark[w] = stamp;
      }
    }
    return false;
  }
  function minDegree(g) {
    let node = 0;
    let degree2 = Infinity;
    for (let v = 0; v < g.n; v++) {
      const d = g.offsets[v + 1] - g.offsets[v];
      if (d < degree2) {
        degree2 = d;
        node = v;
      }
    }
    return { node, degree: degree2 };
  }
  return {
    /** λ of a connected multigraph (parallel links count) with at least two nodes. */
    linkConnectivity(g) {
      const { degree: degree2 } = minDegree(g);
      let best = degree2;
      network.build(g, false);
      const dominating2 = hasParallel(g) ? null : dominatingSet(g);
      const targets = dominating2 ? dominating2.count : g.n;
      const s = dominating2 ? dominating2.nodes[0] : 0;
      for (let k = 0; k < targets && best > 0; k++) {
        const t = dominating2 ? dominating2.nodes[k] : k;
        if (t === s) continue;
        const f = network.flow(s, t, best);
        if (f < best) best = f;
      }
      return best;
    },
    /** κ of a connected simple graph with at least two nodes. */
    nodeConnectivity(g) {
      const n = g.n;
      if (g.entries === n * (n - 1)) return n - 1;
      const { node: v, degree: degree2 } = minDegree(g);
      let best = degree2;
      network.build(g, true);
      const stamp = nextStamp();
      mark[v] = stamp;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) mark[g.neighbors[p]] = stamp;
      for (let w = 0; w < n && best > 0; w++) {
        if (mark[w] === stamp) continue;
        const f = network.flow(v, w, best);
        if (f < best) best = f;
      }
      for (let p = g.offsets[v]; p < g.offsets[v + 1] && best > 0; p++) {
        const x = g.neighbors[p];
        const sx = nextStamp();
        for (let r = g.offsets[x]; r < g.offsets[x + 1]; r++) mark[g.neighbors[r]] = sx;
        for (let q = p + 1; q < g.offsets[v + 1] && best > 0; q++) {
          const y = g.neighbors[q];
          if (mark[y] === sx || y === x) continue;
          const f = network.flow(x, y, best);
          if (f < best) best = f;
        }
      }
      return best;
    }
  };
}

// src/metrics/link-connectivity.ts
var linkConnectivity = {
  id: "link_connectivity",
  description: "Link connectivity λ: fewest link failures that disconnect the surviving graph (parallel links count).",
  normalization: "min(1, λ / (N0 − 1)); 0 when disconnected.",
  cost: "flow",
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, false);
    const components = createComponentCounter(g);
    const counter = createConnectivityCounter(g.n, 2 * g.m);
    return (mask) => {
      const s = components.run(mask);
      if (s.alive < 2 || s.count > 1) return { raw: 0, normalized: 0 };
      const l = counter.linkConnectivity(survivors(mask));
      return { raw: l, normalized: Math.min(1, l / (g.n - 1)) };
    };
  }
};

// src/metrics/natural-connectivity.ts
var DEFLATE = 8;
var PROBES2 = 32;
var MAX_PROBES = 256;
var NATURAL_DENSE_LIMIT = 2e3;
var STEPS2 = 40;
var STATED_ERROR = 1e-3;
function naturalConnectivityOfComplete(n) {
  if (n <= 1) return 0;
  return n - 1 + Math.log1p((n - 1) * Math.exp(-n)) - Math.log(n);
}
function logAdd(a, b) {
  if (a === -Infinity) return b;
  if (b === -Infinity) return a;
  const hi = Math.max(a, b);
  return hi + Math.log1p(Math.exp(Math.min(a, b) - hi));
}
var naturalConnectivity = {
  id: "natural_connectivity",
  description: "Natural connectivity: log of the mean of e^λ over the adjacency spectrum of the surviving graph.",
  normalization: "λ̄ / λ̄(K_N0), the value of the complete graph on the original node count.",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const limit = Math.min(g.n, options.denseLimit ?? NATURAL_DENSE_LIMIT);
    const spectral = createSpectralSurvivors(g);
    const dense = createDenseSpectrum(limit);
    const big = g.n > limit;
    const lanczos = big ? createLanczos(g.n, DEFLATE) : null;
    const slq = big ? createTraceEstimator(g.n, STEPS2) : null;
    const op = createAdjacencyOperator();
    const deflation = big ? new Float64Array(DEFLATE * g.n) : new Float64Array(0);
    const best = naturalConnectivityOfComplete(g.n);
    const relSe = new Float64Array(big ? g.n : 0);
    const logOf = new Float64Array(big ? g.n : 0);
    return (mask) => {
      const local = spectral.survivors(mask);
      if (local.n === 0) return { raw: 0, normalized: 0 };
      const comps = spectral.components(local);
      let logTotal = -Infinity;
      let isolated = 0;
      let estimated = 0;
      for (let c = 0; c < comps.count; c++) {
        const size = comps.start[c + 1] - comps.start[c];
        if (size === 1) {
          isolated++;
          continue;
        }
        const part = spectral.component(local, comps, c);
        let logPart;
        if (size <= limit) {
          const d = dense.adjacency(part);
          const top = d[size - 1];
          let s = 0;
          for (let i = 0; i < size; i++) s += Math.exp(d[i] - top);
          logPart = top + Math.log(s);
        } else {
          op.bind(part);
          const k = Math.min(DEFLATE, size);
          const r = lanczos.solve(op, { which: "largest", count: k, keys: spectral.keysOf(part) });
          const top = r.values[0];
          let s = 0;
          for (let j = 0; j < r.found; j++) {
            s += Math.exp(r.values[j] - top);
            deflation.set(r.vectors.subarray(j * r.stride, j * r.stride + size), j * size);
          }
          const exact = s;
          const est = slq.estimateWithError(op, (x) => Math.exp(x - top), spectral.keysOf(part), deflation, r.found, {
            probes: PROBES2,
            maxProbes: MAX_PROBES,
            steps: STEPS2,
            tol: 1e-10,
            targetSe: (mean) => {
              const sum = exact + mean;
              const guess = Math.max(1e-6, top + Math.log(sum) - Math.log(local.n));
              return STATED_ERROR / 2 * guess * sum;
            }
          });
          s += est.mean;
          logPart = top + Math.log(s);
          relSe[estimated] = est.se / s;
          logOf[estimated++] = logPart;
        }
        logTotal = logAdd(logTotal, logPart);
      }
      if (isolated > 0) logTotal = logAdd(logTotal, Math.log(isolated));
      const lambda = Math.max(0, logTotal - Math.log(local.n));
      const normalized = best > 0 ? Math.min(1, lambda / best) : 0;
      if (estimated === 0) return { raw: lambda, normalized };
      let v = 0;
      for (let i = 0; i < estimated; i++) v += (Math.exp(logOf[i] - logTotal) * relSe[i]) ** 2;
      return { raw: lambda, normalized, se: Math.sqrt(v) };
    };
  }
};

// src/metrics/node-connectivity.ts
var nodeConnectivity = {
  id: "node_connectivity",
  description: "Node connectivity κ: fewest node failures that disconnect the surviving graph.",
  normalization: "κ / (N0 − 1) (1 only for the complete graph); 0 when disconnected.",
  cost: "flow",
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, true);
    const components = createComponentCounter(g);
    const counter = createConnectivityCounter(g.n, 2 * g.m);
    return (mask) => {
      const s = components.run(mask);
      if (s.alive < 2 || s.count > 1) return { raw: 0, normalized: 0 };
      const k = counter.nodeConnectivity(survivors(mask));
      return { raw: k, normalized: Math.min(1, k / (g.n - 1)) };
    };
  }
};

// src/metrics/pair-connectivity.ts
var pairConnectivity = {
  id: "pair_connectivity",
  description: "Fraction of the original node pairs that are still connected.",
  normalization: "connected pairs / C(N0, 2); raw = number of connected pairs.",
  cost: "linear",
  appliesTo: () => true,
  create(g) {
    const counter = createComponentCounter(g);
    const allPairs = g.n * (g.n - 1) / 2;
    return (mask) => {
      const s = counter.run(mask);
      return { raw: s.connectedPairs, normalized: allPairs > 0 ? s.connectedPairs / allPairs : 0 };
    };
  }
};

// src/metrics/spectral-radius.ts
var spectralRadius = {
  id: "spectral_radius",
  description: "Largest adjacency eigenvalue of the surviving graph.",
  normalization: "λ1 / (N0 − 1) (1 only for the complete graph).",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const spectral = createSpectralSurvivors(g);
    const solve = createExtremalSolver(
      g,
      "radius",
      options.denseLimit ?? EXTREMAL_DENSE_LIMIT,
      options.warmStart ?? false
    );
    return (mask) => {
      const local = spectral.survivors(mask);
      const comps = spectral.components(local);
      let best = 0;
      for (let c = 0; c < comps.count; c++) {
        const size = comps.start[c + 1] - comps.start[c];
        if (size < 2 || size - 1 <= best) continue;
        const part = spectral.component(local, comps, c);
        if (maxDegree(part) <= best) continue;
        const rho = size === 2 ? 1 : solve(part, spectral.keysOf(part));
        if (rho > best) best = rho;
      }
      return { raw: best, normalized: g.n > 1 ? Math.min(1, best / (g.n - 1)) : 0 };
    };
  }
};

// src/metrics/weighted-efficiency.ts
function idealInverseSum(g, kind, lMin) {
  const n = g.n;
  const { lat, lon } = g;
  if (!lat || !lon || kind === "weight") return n * (n - 1) / lMin;
  const factor = kind === "latency" ? FIBRE_MS_PER_KM : 1;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      let delta = lMin;
      if (Number.isFinite(lat[i]) && Number.isFinite(lon[i]) && Number.isFinite(lat[j]) && Number.isFinite(lon[j])) {
        delta = Math.max(lMin, greatCircleKm(lat[i], lon[i], lat[j], lon[j]) * factor);
      }
      sum += 2 / delta;
    }
  }
  return sum;
}
var weightedEfficiency = {
  id: "weighted_efficiency",
  description: "Global efficiency by latency (else length, else weight): mean inverse cheapest-path cost over original pairs.",
  normalization: "E_w / E_ideal, ideal = every pair joined directly (great-circle distance, at least the cheapest link).",
  cost: "all-pairs",
  appliesTo: (g) => chooseLinkCost(g) !== null,
  needs: {
    what: "a latency, length or weight > 0 on every link",
    hint: "give every link latency_ms or length_km, or take weighted_efficiency out of the r-value"
  },
  create(g) {
    const cost = chooseLinkCost(g);
    if (!cost) throw new RangeError("weighted_efficiency needs latency, length or weight on every link");
    const survivors = createSurvivorBuilder(g, false);
    const dijkstra = createDijkstra(g.n);
    const pairs = g.n * (g.n - 1);
    const ideal = pairs > 0 ? idealInverseSum(g, cost.kind, cost.min) : 0;
    return (mask) => {
      if (pairs === 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      const dist = dijkstra.dist;
      let sum = 0;
      for (let s = 0; s < local.n; s++) {
        dijkstra.run(local, cost.values, s);
        let row = 0;
        for (let t = 0; t < local.n; t++) {
          const d = dist[t];
          if (t !== s && d < Infinity) row += 1 / d;
        }
        sum += row;
      }
      return { raw: sum / pairs, normalized: Math.min(1, sum / ideal) };
    };
  }
};

// src/metrics/registry.ts
var metrics = [
  efficiency,
  weightedEfficiency,
  largestComponent,
  pairConnectivity,
  averageHop,
  diameter,
  algebraicConnectivity,
  effectiveResistance,
  naturalConnectivity,
  spectralRadius,
  nodeConnectivity,
  linkConnectivity,
  bridges,
  cutNodes,
  demandServed
];
var byId = new Map(metrics.map((m) => [m.id, m]));
function getMetric(id) {
  const m = byId.get(id);
  if (!m) throw new UsageError(`unknown metric "${id}"`, `known metrics: ${metrics.map((x) => x.id).join(", ")}`);
  return m;
}

// src/envelope/r-value.ts
function validateRSpec(spec) {
  if (spec.metrics.length === 0) throw new RangeError("the R-value needs at least one metric");
  for (const m of spec.metrics) {
    if (!(m.weight > 0) || !Number.isFinite(m.weight))
      throw new RangeError(`metric ${m.id}: weight must be > 0, got ${m.weight}`);
  }
  if (spec.combine !== "mean" && spec.combine !== "min") throw new RangeError(`combine must be "mean" or "min"`);
}
function combineR(spec, values) {
  if (spec.combine === "min") {
    let r = Infinity;
    for (let i = 0; i < values.length; i++) if (values[i] < r) r = values[i];
    return r;
  }
  let sum = 0;
  let weight = 0;
  for (let i = 0; i < values.length; i++) {
    sum += spec.metrics[i].weight * values[i];
    weight += spec.metrics[i].weight;
  }
  return sum / weight;
}
function unsupportedMetric(g, spec) {
  for (const m of spec.metrics) {
    const metric = getMetric(m.id);
    if (metric.appliesTo(g)) continue;
    const needs = metric.needs ?? { what: "data this design does not have", hint: `take ${m.id} out of the r-value` };
    return { id: m.id, message: `metric ${m.id} needs ${needs.what}`, hint: needs.hint };
  }
  return void 0;
}
var UnsupportedMetricError = class extends RangeError {
  constructor(problem) {
    super(`${problem.message} — ${problem.hint}`);
    this.problem = problem;
  }
  problem;
};
function createRValue(g, spec, options) {
  validateRSpec(spec);
  const problem = unsupportedMetric(g, spec);
  if (problem) throw new UnsupportedMetricError(problem);
  const evaluators = spec.metrics.map((m) => getMetric(m.id).create(g, metricOptions(spec, options)));
  const values = new Float64Array(evaluators.length);
  return (mask) => {
    for (let i = 0; i < evaluators.length; i++) values[i] = evaluators[i](mask).normalized;
    return combineR(spec, values);
  };
}
function metricOptions(spec, options) {
  if (spec.sources === void 0) return options;
  return { sources: spec.sources, sourceSeed: spec.sourceSeed ?? 0, ...options };
}
var UNION_FIND_METRICS = /* @__PURE__ */ new Set(["largest_component", "pair_connectivity"]);
function unionFindR(g, spec) {
  if (!spec.metrics.every((m) => UNION_FIND_METRICS.has(m.id))) return null;
  const n = g.n;
  const allPairs = n * (n - 1) / 2;
  const values = new Float64Array(spec.metrics.length);
  const ids = spec.metrics.map((m) => m.id);
  return (curve, k) => {
    for (let i = 0; i < ids.length; i++) {
      values[i] = ids[i] === "largest_component" ? n > 0 ? curve.lcc[k] / n : 0 : allPairs > 0 ? curve.pairs[k] / allPairs : 0;
    }
    return combineR(spec, values);
  };
}

// src/envelope/union-find.ts
function createUnionFindWorkspace(g) {
  return {
    parent: new Int32Array(g.n),
    size: new Int32Array(g.n),
    nodeOn: new Uint8Array(g.n),
    linkOn: new Uint8Array(g.m),
    firstGroup: new Int32Array(g.m)
  };
}
function connectivityCurve(g, kind, order, count, ws = createUnionFindWorkspace(g), out = { lcc: new Float64Array(count + 1), pairs: new Float64Array(count + 1) }) {
  const { nodeOn, linkOn, firstGroup } = ws;
  nodeOn.fill(1);
  linkOn.fill(1);
  if (kind === "node") for (let i = 0; i < count; i++) nodeOn[order[i]] = 0;
  else if (kind === "link") for (let i = 0; i < count; i++) linkOn[order[i]] = 0;
  else {
    firstGroup.fill(-1);
    for (let i = 0; i < count; i++) {
      const u = order[i];
      for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
        const e = g.groupLinks[p];
        if (g.linkHardened[e] === 0 && linkOn[e] === 1) {
          linkOn[e] = 0;
          firstGroup[e] = i;
        }
      }
    }
  }
  const { parent, size } = ws;
  const st = { lcc: 0, pairs: 0 };
  const { offsets, neighbors, linkOf, linkSource, linkTarget } = g;
  const addNode = (v) => {
    nodeOn[v] = 1;
    if (st.lcc < 1) st.lcc = 1;
    for (let p = offsets[v]; p < offsets[v + 1]; p++) {
      const w = neighbors[p];
      if (nodeOn[w] === 1 && linkOn[linkOf[p]] === 1) join(st, parent, size, v, w);
    }
  };
  const addLink = (e) => {
    linkOn[e] = 1;
    const a = linkSource[e];
    const b = linkTarget[e];
    if (nodeOn[a] === 1 && nodeOn[b] === 1) join(st, parent, size, a, b);
  };
  for (let v = 0; v < g.n; v++) {
    parent[v] = v;
    size[v] = 1;
  }
  for (let v = 0; v < g.n; v++) if (nodeOn[v] === 1) st.lcc = 1;
  for (let e = 0; e < g.m; e++) {
    const a = linkSource[e];
    const b = linkTarget[e];
    if (linkOn[e] === 1 && nodeOn[a] === 1 && nodeOn[b] === 1) join(st, parent, size, a, b);
  }
  out.lcc[count] = st.lcc;
  out.pairs[count] = st.pairs;
  for (let i = count - 1; i >= 0; i--) {
    const u = order[i];
    if (kind === "node") addNode(u);
    else if (kind === "link") addLink(u);
    else {
      for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
        const e = g.groupLinks[p];
        if (firstGroup[e] === i) addLink(e);
      }
    }
    out.lcc[i] = st.lcc;
    out.pairs[i] = st.pairs;
  }
  kernelWork.visits += 2 * g.n + g.m + count;
  return out;
}
function join(st, parent, size, a, b) {
  a = findRoot(parent, a);
  b = findRoot(parent, b);
  if (a === b) return;
  const sa = size[a];
  const sb = size[b];
  const s = sa + sb;
  st.pairs += sa * sb;
  if (sa < sb) {
    parent[a] = b;
    size[b] = s;
  } else {
    parent[b] = a;
    size[a] = s;
  }
  if (s > st.lcc) st.lcc = s;
}

// src/envelope/worst-case.ts
function subsets(e, k) {
  if (k <= 0) return 1;
  if (k === 1) return e;
  let c = 1;
  for (let i = 0; i < k; i++) c = c * (e - i) / (i + 1);
  return Math.max(0, Math.round(c));
}
function tryUnit(g, kind, mask, trial, u, rfn) {
  if (kind === "node" || kind === "link") {
    const bits = kind === "node" ? mask.node : mask.link;
    if (bits[u]) return rfn(mask);
    bits[u] = 1;
    const r = rfn(mask);
    bits[u] = 0;
    return r;
  }
  copyMask(mask, trial);
  removeUnit(g, trial, kind, u);
  return rfn(trial);
}
function searchWorstCase(g, kind, k, rfn, options) {
  const eligible = eligibleUnits(g, kind);
  const units = [];
  for (let u = 0; u < eligible.length; u++) if (eligible[u]) units.push(u);
  const steps = Math.min(k, units.length);
  const ids = unitIds(g, kind);
  const done = (seq, values, method) => ({
    kind,
    k: steps,
    method,
    elements: seq.map((u) => ids[u]),
    values
  });
  if (steps === 0) return done([], [], "exact");
  const mask = createMask(g);
  const trial = createMask(g);
  if (steps <= 2 && subsets(units.length, steps) <= options.exactLimit) {
    const single = units.map((u) => tryUnit(g, kind, mask, trial, u, rfn));
    if (steps === 1) {
      let best2 = 0;
      for (let i = 1; i < units.length; i++) if (single[i] < single[best2]) best2 = i;
      return done([units[best2]], [single[best2]], "exact");
    }
    let bestR = Infinity;
    let bi = -1;
    let bj = -1;
    for (let i = 0; i < units.length; i++) {
      removeUnit(g, mask, kind, units[i]);
      for (let j = i + 1; j < units.length; j++) {
        const r = tryUnit(g, kind, mask, trial, units[j], rfn);
        if (r < bestR) {
          bestR = r;
          bi = i;
          bj = j;
        }
      }
      mask.node.fill(0);
      mask.link.fill(0);
    }
    const [a, b] = single[bj] < single[bi] ? [bj, bi] : [bi, bj];
    return done([units[a], units[b]], [single[a], bestR], "exact");
  }
  const width = Math.max(1, Math.floor(options.beam));
  let beam = [{ seq: [], values: [], mask: createMask(g) }];
  for (let step = 0; step < steps; step++) {
    const candidates = [];
    for (const state of beam) {
      const used = new Set(state.seq);
      for (const u of units) {
        if (used.has(u)) continue;
        candidates.push({ parent: state, u, r: tryUnit(g, kind, state.mask, trial, u, rfn), key: "" });
      }
    }
    if (candidates.length === 0) break;
    for (const c of candidates) c.key = [...c.parent.seq, c.u].sort((x, y) => x - y).join(",");
    candidates.sort(
      (x, y) => x.r - y.r || compareKeys(x.key, y.key) || compareSeq([...x.parent.seq, x.u], [...y.parent.seq, y.u])
    );
    const next = [];
    const seen = /* @__PURE__ */ new Set();
    for (const c of candidates) {
      if (next.length >= width) break;
      if (seen.has(c.key)) continue;
      seen.add(c.key);
      const m = createMask(g);
      copyMask(c.parent.mask, m);
      removeUnit(g, m, kind, c.u);
      next.push({ seq: [...c.parent.seq, c.u], values: [...c.parent.values, c.r], mask: m });
    }
    beam = next;
  }
  const best = beam[0];
  return done(best.seq, best.values, width > 1 ? "beam" : "greedy");
}
function compareKeys(a, b) {
  return compareSeq(a.split(",").map(Number), b.split(",").map(Number));
}
function compareSeq(a, b) {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}

// src/envelope/contingency.ts
var WORST_KEPT = 10;
function evaluateContingency(g, kind, order, rfn, maxCases) {
  const eligible = eligibleUnits(g, kind);
  const units = [];
  for (let u = 0; u < eligible.length; u++) if (eligible[u]) units.push(u);
  const total = subsets(units.length, order);
  const mask = createMask(g);
  const bits = kind === "node" ? mask.node : mask.link;
  const worst = [];
  let evaluated = 0;
  let min = Infinity;
  const keep = (set, value) => {
    if (value < min) min = value;
    if (worst.length === WORST_KEPT && value >= worst[worst.length - 1].value) return;
    let i = worst.length;
    while (i > 0 && worst[i - 1].value > value) i--;
    worst.splice(i, 0, { set, value });
    if (worst.length > WORST_KEPT) worst.pop();
  };
  outer: for (let i = 0; i < units.length; i++) {
    bits[units[i]] = 1;
    if (order === 1) {
      if (evaluated >= maxCases) break;
      keep([units[i]], rfn(mask));
      evaluated++;
    } else {
      for (let j = i + 1; j < units.length; j++) {
        if (evaluated >= maxCases) {
          bits[units[i]] = 0;
          break outer;
        }
        bits[units[j]] = 1;
        keep([units[i], units[j]], rfn(mask));
        bits[units[j]] = 0;
        evaluated++;
      }
    }
    bits[units[i]] = 0;
  }
  const ids = unitIds(g, kind);
  return {
    challenge: order === 1 ? "n-1" : "n-2",
    kind,
    evaluated,
    total,
    worst: worst.map((w) => ({ elements: w.set.map((u) => ids[u]), value: w.value })),
    // Nothing removable: R stays at the intact value.
    min: evaluated > 0 ? min : rfn(createMask(g))
  };
}

// src/envelope/engine.ts
var planCache = /* @__PURE__ */ new WeakMap();
function bandPlan(g, params) {
  let byParams = planCache.get(g);
  if (!byParams) planCache.set(g, byParams = /* @__PURE__ */ new Map());
  const key = JSON.stringify(params);
  const hit = byParams.get(key);
  if (hit) return hit;
  const c = getChallenge(params.challenge);
  if (c.type !== "band") throw new TypeError(`${params.challenge} is not a band challenge`);
  const plan = c.plan(g, params);
  if (byParams.size > 64) byParams.clear();
  byParams.set(key, plan);
  return plan;
}
function challengeKind(g, params) {
  const c = getChallenge(params.challenge);
  if (c.type === "band") return bandPlan(g, params).kind;
  if (c.type === "attack") return c.kind;
  return params.element;
}
function attackSteps(g, kind, until) {
  return stepsAt(until, unitCount(g, kind), countOnes(eligibleUnits(g, kind)));
}
var ATTACK_EVALUATIONS = 200;
function attackStride(steps, free) {
  return free || steps <= ATTACK_EVALUATIONS ? 1 : Math.ceil(steps / ATTACK_EVALUATIONS);
}
function attackEvaluationSteps(len, every) {
  const at = [];
  for (let k = 0; k < len; k += every) at.push(k);
  at.push(len);
  return at;
}
function attackOrder(g, plan, item, rvalue = () => Number.NaN) {
  const params = plan.items[item].params;
  const c = getChallenge(params.challenge);
  if (c.type !== "attack") throw new TypeError(`${params.challenge} is not an attack`);
  const sequence = c.sequence(g, attackSteps(g, c.kind, params.until), { rvalue });
  return { sequence, every: attackStride(sequence.length, unionFindR(g, plan.r) !== null) };
}
function pieceSteps(len, every, piece) {
  const at = attackEvaluationSteps(len, every);
  const [from, to] = pieceRange(at.length, piece);
  return { steps: at.slice(from, to), from, to };
}
function pieceRange(count, piece) {
  if (!piece) return [0, count];
  return [Math.floor(piece.index * count / piece.of), Math.floor((piece.index + 1) * count / piece.of)];
}
var intactCache = /* @__PURE__ */ new WeakMap();
function sharedIntact(g, scope) {
  if (!scope) return {};
  let byGraph = intactCache.get(scope);
  if (!byGraph) intactCache.set(scope, byGraph = /* @__PURE__ */ new WeakMap());
  let slot = byGraph.get(g);
  if (!slot) byGraph.set(g, slot = {});
  return slot;
}
function historyFree(spec) {
  return spec.metrics.every((m) => getMetric(m.id).cost !== "spectral");
}
var StepEvaluator = class {
  /** `scope`: the evaluation this evaluator works for (its plan); evaluators of one scope share R of the intact design. */
  constructor(g, spec, scope) {
    this.g = g;
    this.rfn = createRValue(g, spec, { warmStart: true });
    this.ufr = unionFindR(g, spec);
    this.ws = this.ufr ? createUnionFindWorkspace(g) : null;
    this.mask = createMask(g);
    this.intact = this.ufr === null && historyFree(spec) ? sharedIntact(g, scope) : null;
  }
  g;
  rfn;
  ufr;
  ws;
  mask;
  /** R on the intact design once known (shared by `scope`), or null when R keeps history. */
  intact;
  get r() {
    return this.rfn;
  }
  /** True when every step is free (union–find curve). */
  get stepsAreFree() {
    return this.ufr !== null;
  }
  /**
   * True when R after k removals of an order is the same number however it is reached, so
   * values kept from a band task (`whole` of `at`) may stand for a recomputation.
   */
  get valuesAreReusable() {
    return this.ufr !== null || this.intact !== null;
  }
  /**
   * R after steps[j] units of `order` are removed, for each j (non-decreasing). A real count c
   * (a fraction of the units, units.ts countAt) reads R linearly between ⌊c⌋ and ⌈c⌉ removals of
   * this same order, so `order` must hold ⌈c⌉ units; a whole count is R there exactly.
   * `whole`, when given, receives R at ⌊c⌋ and ⌈c⌉ for each j (2j, 2j + 1).
   */
  at(kind, order, len, steps, out, whole) {
    if (this.ufr !== null) {
      const curve = connectivityCurve(this.g, kind, order, len, this.ws);
      for (let j = 0; j < steps.length; j++) {
        const c = steps[j];
        const lo = Math.floor(c);
        const r = this.ufr(curve, lo);
        const up = c === lo ? r : this.ufr(curve, lo + 1);
        out[j] = c === lo ? r : lerp(r, up, c - lo);
        if (whole) {
          whole[2 * j] = r;
          whole[2 * j + 1] = up;
        }
      }
      return out;
    }
    const mask = this.mask;
    mask.node.fill(0);
    mask.link.fill(0);
    const memo = this.memo;
    memo.applied = 0;
    memo.kLast = -1;
    memo.kPrev = -1;
    for (let j = 0; j < steps.length; j++) {
      const c = steps[j];
      const lo = Math.floor(c);
      const r = this.rAfter(kind, order, lo);
      const up = c === lo ? r : this.rAfter(kind, order, lo + 1);
      out[j] = c === lo ? r : lerp(r, up, c - lo);
      if (whole) {
        whole[2 * j] = r;
        whole[2 * j + 1] = up;
      }
    }
    return out;
  }
  memo = { applied: 0, kLast: -1, rLast: 0, kPrev: -1, rPrev: 0 };
  /** R after k removals of `order` on the shared mask; k never below the last two asked. */
  rAfter(kind, order, k) {
    const memo = this.memo;
    if (k === memo.kLast) return memo.rLast;
    if (k === memo.kPrev) return memo.rPrev;
    if (k < memo.applied) throw new RangeError(`removal counts must not decrease (${k} after ${memo.applied})`);
    while (memo.applied < k) removeUnit(this.g, this.mask, kind, order[memo.applied++]);
    const r = k === 0 ? this.rIntact() : this.rfn(this.mask);
    memo.kPrev = memo.kLast;
    memo.rPrev = memo.rLast;
    memo.kLast = k;
    memo.rLast = r;
    return r;
  }
  /** R on the intact design (the shared mask before any removal), once per scope when R allows. */
  rIntact() {
    if (this.intact === null) return this.rfn(this.mask);
    return this.intact.r ??= this.rfn(this.mask);
  }
  /** R after every step k = 0..len. */
  everyStep(kind, order, len) {
    const steps = new Int32Array(len + 1);
    for (let k = 0; k <= len; k++) steps[k] = k;
    return this.at(kind, order, len, steps, new Float64Array(len + 1));
  }
};
function runTask(g, plan, task) {
  const it = plan.items[task.item];
  const params = it.params;
  const ev = new StepEvaluator(g, plan.r, plan);
  switch (task.type) {
    case "band": {
      const bp = bandPlan(g, params);
      const order = new Int32Array(bp.maxUnits);
      const steps = new Float64Array(bp.x.length);
      const values = [];
      const whole = ev.valuesAreReusable && !ev.stepsAreFree ? [] : void 0;
      for (let r = task.from; r < task.to; r++) {
        const len = bp.realize(r, order, steps);
        const w = whole ? new Float64Array(2 * bp.x.length) : void 0;
        values.push(ev.at(bp.kind, order, len, steps, new Float64Array(bp.x.length), w));
        if (whole) whole.push(w);
      }
      return whole ? { type: "band", values, whole } : { type: "band", values };
    }
    case "attack": {
      const kind = challengeKind(g, params);
      const { sequence, every } = attackOrder(g, plan, task.item, ev.r);
      const { steps } = pieceSteps(sequence.length, every, task.piece);
      const values = ev.at(kind, sequence, sequence.length, steps, new Float64Array(steps.length));
      return { type: "attack", sequence, values, every };
    }
    case "contingency": {
      const c = getChallenge(params.challenge);
      if (c.type !== "contingency") throw new TypeError(`${params.challenge} is not a contingency`);
      return { type: "contingency", result: evaluateContingency(g, params.element, c.order, ev.r, it.maxCases) };
    }
    case "worst": {
      const kind = challengeKind(g, params);
      const result = searchWorstCase(g, kind, params.worstCase, ev.r, { exactLimit: it.exactLimit, beam: it.beam });
      return { type: "worst", result };
    }
  }
}

// src/parallel/worker.ts
var port = parentPort;
var current = null;
port.on("message", (msg) => {
  if (msg.type === "init") {
    current = { job: msg.job, g: msg.g, plan: msg.plan };
    return;
  }
  let reply;
  try {
    if (!current || current.job !== msg.job) throw new Error(`task for evaluation ${msg.job} arrived before its graph`);
    reply = { id: msg.id, result: runTask(current.g, current.plan, msg.task) };
  } catch (error) {
    reply = { id: msg.id, error: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
  port.postMessage(reply);
});
