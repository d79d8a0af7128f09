#!/usr/bin/python3
"""Peer timings for test/bench/envelope.bench.ts: the same three jobs done with networkx and
python-igraph (Debian packages). Reads the graphs the TypeScript side wrote (edge lists in
JSON), prints one JSON object with seconds per job and the peak resident memory.

Each peer does what a hand-written script with that library would do: remove the chosen
elements, then call the library's own function (igraph: harmonic_centrality for efficiency,
connected_components; networkx: global_efficiency, connected_components), at every grid point.
Where networkx would take minutes, it runs a stated subset of the realizations and the time is
extrapolated linearly ("extrapolated": true, with the factor).

usage: envelope_peer.py DIR [--skip-networkx]
"""
import json
import random
import resource
import sys
import time

import igraph as ig
import networkx as nx


def load(path):
    with open(path) as f:
        d = json.load(f)
    return d['n'], [tuple(e) for e in d['edges']], d


def grid(until, points):
    return [until * j / (points - 1) for j in range(points)]


# (a) random link failures, efficiency with N0 in the denominator
def a_igraph(n, edges, job, realizations):
    rng = random.Random(1)
    m = len(edges)
    out = []
    for _ in range(realizations):
        order = list(range(m))
        rng.shuffle(order)
        for x in grid(job['until'], job['points']):
            k = round(x * m)
            keep = set(order[k:])
            g = ig.Graph(n=n, edges=[edges[i] for i in range(m) if i in keep])
            h = g.harmonic_centrality()  # mean of 1/d over the n - 1 other nodes (n = N0 here)
            out.append(sum(h) / n)
    return out


def a_networkx(n, edges, job, realizations):
    rng = random.Random(1)
    m = len(edges)
    out = []
    for _ in range(realizations):
        order = list(range(m))
        rng.shuffle(order)
        for x in grid(job['until'], job['points']):
            k = round(x * m)
            G = nx.Graph()
            G.add_nodes_from(range(n))
            G.add_edges_from(edges[i] for i in order[k:])
            out.append(nx.global_efficiency(G))
    return out


# (b) random node failures, largest component / N0
def b_igraph(n, edges, job, realizations):
    rng = random.Random(2)
    g = ig.Graph(n=n, edges=edges)
    out = []
    for _ in range(realizations):
        order = list(range(n))
        rng.shuffle(order)
        for x in grid(job['until'], job['points']):
            k = round(x * n)
            sub = g.induced_subgraph(order[k:])
            cc = sub.connected_components()
            out.append(max(cc.sizes(), default=0) / n)
    return out


def b_networkx(n, edges, job, realizations):
    rng = random.Random(2)
    G = nx.Graph()
    G.add_nodes_from(range(n))
    G.add_edges_from(edges)
    out = []
    for _ in range(realizations):
        order = list(range(n))
        rng.shuffle(order)
        for x in grid(job['until'], job['points']):
            k = round(x * n)
            H = G.subgraph(order[k:])
            out.append(max((len(c) for c in nx.connected_components(H)), default=0) / n)
    return out


# (c) adaptive degree attack (highest current degree, lowest index on ties), LCC after every step
def c_igraph(n, edges, job):
    g = ig.Graph(n=n, edges=edges)
    g.vs['orig'] = list(range(n))
    steps = round(job['until'] * n)
    seq, curve = [], []
    for _ in range(steps):
        deg = g.degree()
        best = max(range(g.vcount()), key=lambda i: (deg[i], -g.vs[i]['orig']))
        seq.append(g.vs[best]['orig'])
        g.delete_vertices(best)
        curve.append(max(g.connected_components().sizes(), default=0) / n)
    return seq, curve


def c_networkx(n, edges, job):
    G = nx.Graph()
    G.add_nodes_from(range(n))
    G.add_edges_from(edges)
    steps = round(job['until'] * n)
    seq, curve = [], []
    for _ in range(steps):
        best = max(G.degree(), key=lambda t: (t[1], -t[0]))[0]
        seq.append(best)
        G.remove_node(best)
        curve.append(max((len(c) for c in nx.connected_components(G)), default=0) / n)
    return seq, curve


def timed(fn, *args):
    t = time.perf_counter()
    r = fn(*args)
    return time.perf_counter() - t, r


def main():
    d = sys.argv[1]
    skip_nx = '--skip-networkx' in sys.argv
    res = {'igraph': {'version': ig.__version__}, 'networkx': {'version': nx.__version__}}
    na, ea, ja = load(f'{d}/a.json')
    nb, eb, jb = load(f'{d}/b.json')
    nc, ec, jc = load(f'{d}/c.json')

    s, vals = timed(a_igraph, na, ea, ja, ja['realizations'])
    res['igraph']['a'] = {'seconds': s, 'evaluations': len(vals), 'extrapolated': False}
    s, _ = timed(b_igraph, nb, eb, jb, jb['realizations'])
    res['igraph']['b'] = {'seconds': s, 'extrapolated': False}
    s, (seq, _) = timed(c_igraph, nc, ec, jc)
    res['igraph']['c'] = {'seconds': s, 'extrapolated': False, 'sequence': seq}

    if not skip_nx:
        sub = ja['networkx_realizations']
        s, _ = timed(a_networkx, na, ea, ja, sub)
        f = ja['realizations'] / sub
        res['networkx']['a'] = {'seconds': s * f, 'measured': s, 'extrapolated': True, 'factor': f}
        sub = jb['networkx_realizations']
        s, _ = timed(b_networkx, nb, eb, jb, sub)
        f = jb['realizations'] / sub
        res['networkx']['b'] = {'seconds': s * f, 'measured': s, 'extrapolated': f != 1, 'factor': f}
        s, (seq, _) = timed(c_networkx, nc, ec, jc)
        res['networkx']['c'] = {'seconds': s, 'extrapolated': False, 'sequence': seq}

    # ru_maxrss is in kilobytes on Linux.
    res['peak_rss_mb'] = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024
    json.dump(res, sys.stdout)


if __name__ == '__main__':
    main()
