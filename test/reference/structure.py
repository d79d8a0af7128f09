#!/usr/bin/python3
"""Reference values for netbrace's structure checks (components, bridges, cut nodes).

Reads the Internet Topology Zoo's GML files with networkx's own GML reader, plus a few
seeded generated graphs, and prints JSON that test/reference/structure.test.ts compares
with netbrace's findComponents / findCutElements exactly.

Run from the repository root with Debian's python3-networkx:
    /usr/bin/python3 test/reference/structure.py > test/reference/structure.json

Conventions, chosen to match what netbrace means by a design:
- Graphs are read as MultiGraphs so that parallel links count: the zoo's GML files do not say
  `multigraph 1`, so the reader is given that line; nothing else in the text is changed.
- Nodes are named by their GML `id` (label="id"), as netbrace names them.
- Self-loops are dropped (netbrace drops them with a warning).
- networkx's `bridges` is not implemented for multigraphs; a link is counted as a bridge
  when it is a bridge of the simple graph *and* has no parallel twin (a link with a twin
  is redundancy, never a bridge). Articulation points do not depend on multiplicity.

Dataset: S. Knight, H. X. Nguyen, N. Falkner, R. Bowden, M. Roughan, "The Internet Topology
Zoo", IEEE JSAC 29(9):1765-1775, 2011; CC BY 4.0.
"""
import json
import os
import platform
import random
import re
import sys

import networkx as nx

REPO = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
ZOO = os.path.join(REPO, "fixtures", "topology-zoo", "gml")


def structure(G):
    """Components, bridges (as sorted [u, v] id pairs) and cut nodes of a MultiGraph."""
    G = G.copy()
    G.remove_edges_from(list(nx.selfloop_edges(G)))
    H = nx.Graph(G)
    bridges = sorted(
        sorted([str(u), str(v)]) for u, v in nx.bridges(H) if G.number_of_edges(u, v) == 1
    )
    return {
        "nodes": G.number_of_nodes(),
        "links": G.number_of_edges(),
        "components": nx.number_connected_components(G),
        "bridges": bridges,
        "cut_nodes": sorted(str(v) for v in nx.articulation_points(H)),
        "isolated": sorted(str(v) for v in nx.isolates(G)),
    }


def read_zoo(path):
    with open(path, encoding="utf-8") as f:
        lines = f.read().split("\n")
    out = []
    for line in lines:
        out.append(line)
        if re.match(r"^\s*graph\s*\[\s*$", line):
            out.append("  multigraph 1")
    return nx.parse_gml(out, label="id")


def zoo_networks():
    rows, failures = [], []
    for name in sorted(os.listdir(ZOO)):
        if not name.endswith(".gml"):
            continue
        try:
            G = read_zoo(os.path.join(ZOO, name))
        except Exception as e:  # report, do not hide: the test lists these
            failures.append({"file": name, "error": f"{type(e).__name__}: {e}"})
            continue
        rows.append({"file": name, **structure(G)})
    return rows, failures


def generated():
    graphs = []

    def add(name, generator, G):
        edges = [[int(u), int(v)] for u, v in G.edges()]
        graphs.append({"name": name, "generator": generator, "n": G.number_of_nodes(), "edges": edges, **structure(G)})

    add("gnm-80-90", "nx.gnm_random_graph(80, 90, seed=11)", nx.MultiGraph(nx.gnm_random_graph(80, 90, seed=11)))
    add("gnm-200-210", "nx.gnm_random_graph(200, 210, seed=12)", nx.MultiGraph(nx.gnm_random_graph(200, 210, seed=12)))
    add("ba-150-1", "nx.barabasi_albert_graph(150, 1, seed=13)", nx.MultiGraph(nx.barabasi_albert_graph(150, 1, seed=13)))
    add("regular-3-50", "nx.random_regular_graph(3, 50, seed=14)", nx.MultiGraph(nx.random_regular_graph(3, 50, seed=14)))
    add("gnm-50-30", "nx.gnm_random_graph(50, 30, seed=16)", nx.MultiGraph(nx.gnm_random_graph(50, 30, seed=16)))
    # A multigraph: a sparse random graph with 30 of its edges doubled (random.Random(15)).
    G = nx.MultiGraph(nx.gnm_random_graph(100, 120, seed=15))
    rng = random.Random(15)
    for u, v in rng.sample(sorted(G.edges()), 30):
        G.add_edge(u, v)
    add("gnm-100-120-doubled", "nx.gnm_random_graph(100, 120, seed=15) + 30 edges doubled by random.Random(15).sample", G)
    # A tree of paths (caterpillar): every link a bridge, all spine nodes cut nodes.
    add("caterpillar-20", "spine path 0..19, one leaf per spine node", nx.MultiGraph(
        [(i, i + 1) for i in range(19)] + [(i, 20 + i) for i in range(20)]))
    return graphs


def main():
    zoo, failures = zoo_networks()
    doc = {
        "library": f"networkx {nx.__version__}",
        "python": platform.python_version(),
        "command": "/usr/bin/python3 test/reference/structure.py > test/reference/structure.json",
        "conventions": "MultiGraph; nodes named by GML id; self-loops dropped; a bridge of the simple graph counts only if it has no parallel twin",
        "dataset": "Internet Topology Zoo (Knight et al., IEEE JSAC 29(9):1765-1775, 2011; CC BY 4.0), gml/ directory",
        "zoo": zoo,
        "zoo_unreadable_by_networkx": failures,
        "generated": generated(),
    }
    # One network per line keeps the file readable and its diffs small.
    compact = lambda v: json.dumps(v, separators=(",", ":"))
    out = ["{"]
    items = list(doc.items())
    for i, (key, value) in enumerate(items):
        comma = "," if i < len(items) - 1 else ""
        if isinstance(value, list):
            rows = [f"  {compact(v)}" for v in value]
            body = ",\n".join(rows)
            out.append(f'{json.dumps(key)}: [\n{body}\n]{comma}' if rows else f"{json.dumps(key)}: []{comma}")
        else:
            out.append(f"{json.dumps(key)}: {json.dumps(value)}{comma}")
    out.append("}")
    sys.stdout.write("\n".join(out) + "\n")


if __name__ == "__main__":
    main()
