#!/usr/bin/python3
"""Reference values for netbrace's mend search (src/mend/cover.ts, bridge-tree.ts).

For small graphs (paths, stars, trees, cycles with pendants, two triangles joined by a bridge,
and seeded random trees), every set of 1, 2 or 3 candidate links (all pairs of nodes not yet
joined, each with a length) is tried by exhaustive search with networkx: the fewest links after
which the graph has no bridge, and among those the smallest total length. The Eswaran-Tarjan
bound ceil(leaves / 2) of the bridge tree is computed here independently (networkx bridges,
then the components left when they are cut). test/reference/mend.test.ts gives netbrace the
same graphs and candidates and compares the number of links and the total length.

Run from the repository root:
    python3 test/reference/mend.py > test/reference/mend.json

Lengths are the Euclidean distances between seeded random points, rounded to 0.001, so that
the cheapest set is unique. No data set is involved: the graphs are generated here.
Eswaran & Tarjan, "Augmentation problems", SIAM J. Comput. 5(4):653-665, 1976.
"""
import itertools
import json
import math
import platform
import random

import networkx as nx


def named_graphs():
    out = []
    out.append(("path-6", nx.path_graph(6)))
    out.append(("star-4", nx.star_graph(4)))
    out.append(("star-5", nx.star_graph(5)))
    g = nx.Graph([(0, 1), (1, 2), (2, 0), (3, 4), (4, 5), (5, 3), (2, 3)])
    out.append(("two-triangles-bridge", g))
    g = nx.cycle_graph(5)
    g.add_edges_from([(0, 5), (1, 6), (3, 7)])
    out.append(("cycle-5-with-3-pendants", g))
    g = nx.Graph([(0, 1), (1, 2), (0, 3), (3, 4), (0, 5), (5, 6)])
    out.append(("spider-3-legs", g))
    g = nx.Graph([(0, 1), (1, 2), (2, 3), (1, 4), (2, 5), (2, 6)])
    out.append(("caterpillar", g))
    for seed in (3, 11, 29):
        rng = random.Random(seed)
        n = 8
        prufer = [rng.randrange(n) for _ in range(n - 2)]
        out.append((f"random-tree-{seed}", nx.from_prufer_sequence(prufer)))
    return out


def lengths(n, seed):
    rng = random.Random(1000 + seed)
    pts = [(rng.random() * 100, rng.random() * 100) for _ in range(n)]
    return lambda a, b: round(math.dist(pts[a], pts[b]), 3)


def eswaran_tarjan(g):
    bridges = list(nx.bridges(g))
    h = g.copy()
    h.remove_edges_from(bridges)
    piece = {}
    for i, comp in enumerate(nx.connected_components(h)):
        for v in comp:
            piece[v] = i
    degree = {}
    for u, v in bridges:
        degree[piece[u]] = degree.get(piece[u], 0) + 1
        degree[piece[v]] = degree.get(piece[v], 0) + 1
    leaves = sum(1 for d in degree.values() if d == 1)
    return leaves, math.ceil(leaves / 2)


def exhaustive(g, cands):
    for k in (1, 2, 3):
        best = None
        for subset in itertools.combinations(range(len(cands)), k):
            h = g.copy()
            h.add_edges_from((cands[i][0], cands[i][1]) for i in subset)
            if nx.has_bridges(h):
                continue
            total = round(sum(cands[i][2] for i in subset), 6)
            if best is None or total < best[0]:
                best = (total, list(subset))
        if best is not None:
            return {"links": k, "total": best[0], "set": best[1]}
    return None


def main():
    rows = []
    for seed, (name, g) in enumerate(named_graphs()):
        g = nx.convert_node_labels_to_integers(g, ordering="sorted")
        n = g.number_of_nodes()
        length = lengths(n, seed)
        cands = [(a, b, length(a, b)) for a, b in itertools.combinations(range(n), 2) if not g.has_edge(a, b)]
        leaves, bound = eswaran_tarjan(g)
        rows.append({
            "name": name,
            "n": n,
            "edges": sorted([min(u, v), max(u, v)] for u, v in g.edges()),
            "candidates": [[a, b, w] for a, b, w in cands],
            "leaves": leaves,
            "bound": bound,
            "best": exhaustive(g, cands),
        })
    print(json.dumps({
        "library": f"networkx {nx.__version__}, Python {platform.python_version()}",
        "command": "python3 test/reference/mend.py > test/reference/mend.json",
        "graphs": rows,
    }, indent=1))


if __name__ == "__main__":
    main()
