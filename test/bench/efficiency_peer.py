#!/usr/bin/python3
"""Peer of test/bench/startup.bench.ts: the efficiency envelope job done with python-igraph
(C core) as a hand-written script would, in a fresh process: read the edge list, then for
each of M realizations remove a seeded random share x of the links at every grid point and
compute global efficiency from igraph's harmonic_centrality (mean of 1/d over the other
nodes; with N0 nodes that is efficiency with N0 in the denominator). Prints one JSON object
(the compute time, the version); the caller times the whole process.

usage: efficiency_peer.py EDGES.json
"""
import json
import random
import sys
import time

import igraph as ig


def main():
    with open(sys.argv[1]) as f:
        d = json.load(f)
    n, edges = d['n'], [tuple(e) for e in d['edges']]
    m = len(edges)
    grid = [d['until'] * j / (d['points'] - 1) for j in range(d['points'])]
    rng = random.Random(1)
    t = time.perf_counter()
    values = []
    for _ in range(d['realizations']):
        order = list(range(m))
        rng.shuffle(order)
        for x in grid:
            keep = order[round(x * m):]
            g = ig.Graph(n=n, edges=[edges[i] for i in keep])
            values.append(sum(g.harmonic_centrality()) / n)
    json.dump({'version': ig.__version__, 'compute_seconds': time.perf_counter() - t, 'evaluations': len(values)}, sys.stdout)


if __name__ == '__main__':
    main()
