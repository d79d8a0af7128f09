#!/usr/bin/python3
"""Reference values for the envelope engine, computed with networkx (Debian's python3-networkx
2.8.8) and numpy. Regenerate with:

    /usr/bin/python3 test/reference/envelope.py > test/reference/envelope.json

For each graph (Zachary's karate club as networkx ships it, weights dropped, and seeded random
graphs from networkx's own generators) it records the edge list, the removal sequence and the
curve of every targeted attack, and brute-force worst removal sets. Conventions are netbrace's:
- R values use the ORIGINAL node count N0 (largest component / N0; connected pairs / C(N0, 2);
  efficiency = sum over ordered pairs of 1/d divided by N0(N0 - 1)).
- Ties go to the lowest node (or link) index; links are indexed in netbrace's canonical order,
  by (smaller end, larger end). Floating-point scores are compared after
  rounding to 2**-32 of the largest score among the candidates: q = floor(s / max * 2**32 + 0.5).
- Adaptive attacks recompute the score on the whole surviving graph after every removal
  (netbrace recomputes only the component that held the removed element; this checks it).
- Betweenness is the unnormalised shortest-path count (networkx normalized=False); closeness
  is networkx's default (Wasserman-Faust improved); eigenvector centrality is the principal
  eigenvector of the adjacency matrix from numpy.linalg.eigh.
"""
import itertools
import json
import sys

import networkx as nx
import numpy as np

Q = 2 ** 32


def quantize(scores, candidates):
    top = max((scores[c] for c in candidates), default=0.0)
    if top <= 0:
        return {c: 0 for c in candidates}
    return {c: int(np.floor(scores[c] / top * Q + 0.5)) for c in candidates}


def static_order(scores, candidates):
    q = quantize(scores, candidates)
    return sorted(candidates, key=lambda c: (-q[c], c))


def argmax(scores, candidates):
    q = quantize(scores, candidates)
    return min(candidates, key=lambda c: (-q[c], c))


def lcc(G, n0):
    return max((len(c) for c in nx.connected_components(G)), default=0) / n0


def pairs(G, n0):
    total = n0 * (n0 - 1) / 2
    return sum(len(c) * (len(c) - 1) / 2 for c in nx.connected_components(G)) / total if total else 0.0


def efficiency(G, n0):
    n = G.number_of_nodes()
    if n0 < 2 or n < 2:
        return 0.0
    # networkx divides by n(n-1) of the survivors; netbrace by N0(N0-1).
    return nx.global_efficiency(G) * n * (n - 1) / (n0 * (n0 - 1))


def node_attack(G, name):
    H = G.copy()
    seq = []
    if name == 'degree':
        seq = static_order(dict(G.degree()), list(G.nodes()))
    elif name == 'betweenness':
        seq = static_order(nx.betweenness_centrality(G, normalized=False), list(G.nodes()))
    elif name == 'closeness':
        seq = static_order(nx.closeness_centrality(G), list(G.nodes()))
    elif name == 'eigenvector':
        A = nx.to_numpy_array(G, nodelist=sorted(G.nodes()), weight=None)
        w, v = np.linalg.eigh(A)
        vec = np.abs(v[:, np.argmax(w)])
        seq = static_order({i: float(vec[i]) for i in range(len(vec))}, list(G.nodes()))
    else:
        while H.number_of_nodes() > 0:
            if name == 'degree-adaptive':
                s = dict(H.degree())
            else:
                s = nx.betweenness_centrality(H, normalized=False)
            v = argmax(s, list(H.nodes()))
            seq.append(v)
            H.remove_node(v)
    return seq


def link_attack(G, index, name):
    links = list(range(len(index)))
    H = G.copy()
    seq = []
    if name == 'link-betweenness':
        eb = nx.edge_betweenness_centrality(G, normalized=False)
        s = {index[frozenset(e)]: val for e, val in eb.items()}
        seq = static_order(s, links)
    else:
        alive = set(links)
        ends = {i: tuple(e) for e, i in index.items()}
        while alive:
            eb = nx.edge_betweenness_centrality(H, normalized=False)
            s = {index[frozenset(e)]: val for e, val in eb.items()}
            e = argmax(s, sorted(alive))
            seq.append(e)
            alive.discard(e)
            H.remove_edge(*ends[e])
    return seq


def curve_nodes(G, seq, metric):
    n0 = G.number_of_nodes()
    H = G.copy()
    out = [metric(H, n0)]
    for v in seq:
        H.remove_node(v)
        out.append(metric(H, n0))
    return out


def curve_links(G, seq, edges, metric):
    n0 = G.number_of_nodes()
    H = G.copy()
    out = [metric(H, n0)]
    for e in seq:
        H.remove_edge(*edges[e])
        out.append(metric(H, n0))
    return out


def worst_sets(G, metric, k):
    n0 = G.number_of_nodes()
    best = None
    for subset in itertools.combinations(sorted(G.nodes()), k):
        H = G.copy()
        H.remove_nodes_from(subset)
        val = metric(H, n0)
        if best is None or val < best[1]:
            best = (list(subset), val)
    return {'set': best[0], 'value': best[1]}


def describe(name, source, G, with_efficiency):
    G = nx.convert_node_labels_to_integers(G, ordering='sorted')
    H = nx.Graph()
    H.add_nodes_from(range(G.number_of_nodes()))
    H.add_edges_from(G.edges())
    G = H
    # Links numbered as netbrace numbers them (src/graph/canonical.ts): by smaller end, then larger.
    edges = sorted(sorted(e) for e in G.edges())
    index = {frozenset(e): i for i, e in enumerate(edges)}
    entry = {'name': name, 'source': source, 'n': G.number_of_nodes(), 'edges': edges, 'attacks': {}}
    names = ['degree', 'degree-adaptive', 'betweenness', 'betweenness-adaptive', 'closeness']
    if nx.is_connected(G):
        names.append('eigenvector')
    for a in names:
        seq = node_attack(G, a)
        rec = {'sequence': seq, 'largest_component': curve_nodes(G, seq, lcc), 'pair_connectivity': curve_nodes(G, seq, pairs)}
        if with_efficiency:
            rec['efficiency'] = curve_nodes(G, seq, efficiency)
        entry['attacks'][a] = rec
    for a in ['link-betweenness', 'link-betweenness-adaptive']:
        seq = link_attack(G, index, a)
        entry['attacks'][a] = {'sequence': seq, 'largest_component': curve_links(G, seq, edges, lcc)}
    entry['worst'] = {}
    metrics = [('largest_component', lcc), ('pair_connectivity', pairs)] + ([('efficiency', efficiency)] if with_efficiency else [])
    for mname, metric in metrics:
        entry['worst'][mname] = {'1': worst_sets(G, metric, 1), '2': worst_sets(G, metric, 2)}
    return entry


def main():
    karate = nx.karate_club_graph()
    graphs = [
        describe('karate', "Zachary's karate club (networkx.karate_club_graph, weights dropped)", karate, True),
        describe('gnm-40-80-s1', 'networkx.gnm_random_graph(40, 80, seed=1)', nx.gnm_random_graph(40, 80, seed=1), True),
        describe('gnm-60-90-s7', 'networkx.gnm_random_graph(60, 90, seed=7)', nx.gnm_random_graph(60, 90, seed=7), False),
        describe('ba-50-2-s3', 'networkx.barabasi_albert_graph(50, 2, seed=3)', nx.barabasi_albert_graph(50, 2, seed=3), True),
    ]
    out = {
        'generator': 'test/reference/envelope.py',
        'command': '/usr/bin/python3 test/reference/envelope.py > test/reference/envelope.json',
        'networkx': nx.__version__,
        'numpy': np.__version__,
        'graphs': graphs,
    }
    json.dump(out, sys.stdout, indent=None, separators=(',', ':'))
    sys.stdout.write('\n')


if __name__ == '__main__':
    main()
