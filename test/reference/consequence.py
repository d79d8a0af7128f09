#!/usr/bin/env python3
"""Reference values for netbrace's weak-point costs (src/graph/consequence.ts) and stranding
shared-risk groups (findStrandingGroups in src/graph/structure.ts), computed with networkx's
connected components and bridges on seeded generated graphs.

Run from the repository root with a Python that has networkx:
    python3 test/reference/consequence.py > test/reference/consequence.json

Definitions (netbrace's, written out independently here):
- Links are numbered in file order; a graph is a MultiGraph whose edge keys are those numbers.
- A bridge is a bridge of the simple graph with no parallel twin (as in structure.py).
- A group strands sites when removing its links that are not bridges increases the number of
  connected components.
- After a removal (nodes and links), the largest part is the largest component, ties to the
  one holding the lowest node number; a site is cut off when it survives, is outside the
  largest part and was in the same intact component as the largest part.
- A demand (s, t) is lost when s and t were connected before and are not after (an end
  removed, or different components).
"""
import json
import platform
import random
import sys

import networkx as nx


def multigraph(n, edges):
    G = nx.MultiGraph()
    G.add_nodes_from(range(n))
    for i, (u, v) in enumerate(edges):
        G.add_edge(u, v, key=i)
    return G


def bridge_indices(n, edges):
    G = multigraph(n, edges)
    H = nx.Graph(G)
    pairs = {frozenset((u, v)) for u, v in nx.bridges(H) if G.number_of_edges(u, v) == 1}
    return {i for i, (u, v) in enumerate(edges) if frozenset((u, v)) in pairs}


def stranding_groups(n, edges, groups):
    bridges = bridge_indices(n, edges)
    intact = nx.number_connected_components(multigraph(n, edges))
    out = []
    for k, members in enumerate(groups):
        G = multigraph(n, edges)
        for i in members:
            if i not in bridges:
                u, v = edges[i]
                G.remove_edge(u, v, key=i)
        if nx.number_connected_components(G) > intact:
            out.append(k)
    return out


def component_of(G):
    label = {}
    for c, comp in enumerate(nx.connected_components(G)):
        for v in comp:
            label[v] = c
    return label


def cost(n, edges, demands, nodes_out, links_out):
    G0 = multigraph(n, edges)
    before = component_of(G0)
    G = multigraph(n, edges)
    for i in links_out:
        u, v = edges[i]
        if G.has_edge(u, v, key=i):
            G.remove_edge(u, v, key=i)
    G.remove_nodes_from(nodes_out)
    comps = list(nx.connected_components(G))
    stranded = []
    if comps:
        largest = max(comps, key=lambda c: (len(c), -min(c)))
        home = before[min(largest)]
        stranded = sorted(v for v in G.nodes if v not in largest and before[v] == home)
    after = component_of(G)
    lost = []
    for d, (s, t) in enumerate(demands):
        if before[s] != before[t]:
            continue
        if s in nodes_out or t in nodes_out or after[s] != after[t]:
            lost.append(d)
    return {"nodes": sorted(nodes_out), "links": sorted(links_out), "stranded": stranded, "demands_lost": lost}


def case(name, generator, n, edges, seed):
    rng = random.Random(seed)
    m = len(edges)
    groups = []
    for _ in range(40):
        size = rng.randint(2, 4)
        groups.append(sorted(rng.sample(range(m), size)))
    # Parallel twins in one group: the classic shared duct.
    twins = {}
    for i, (u, v) in enumerate(edges):
        twins.setdefault(frozenset((u, v)), []).append(i)
    for pair in [p for p in twins.values() if len(p) > 1][:5]:
        groups.append(sorted(pair))
    demands = []
    while len(demands) < 25:
        s, t = rng.randrange(n), rng.randrange(n)
        if s != t:
            demands.append([s, t])
    removals = []
    for _ in range(30):
        nodes_out = set(rng.sample(range(n), rng.randint(0, 4)))
        links_out = set(rng.sample(range(m), rng.randint(0, 6)))
        removals.append(cost(n, edges, demands, nodes_out, links_out))
    return {
        "name": name,
        "generator": generator,
        "n": n,
        "edges": edges,
        "groups": groups,
        "stranding_groups": stranding_groups(n, edges, groups),
        "demands": demands,
        "removals": removals,
    }


def main():
    cases = []
    g = nx.gnm_random_graph(60, 75, seed=21)
    edges = [[int(u), int(v)] for u, v in g.edges()]
    rng = random.Random(21)
    bridges = sorted(sorted(e) for e in nx.bridges(g))
    edges += [list(e) for e in rng.sample(bridges, 6)] + [list(e) for e in rng.sample(edges, 4)]
    cases.append(case(
        "gnm-60-75-doubled",
        "nx.gnm_random_graph(60, 75, seed=21) + 6 of its bridges and 4 edges doubled by random.Random(21).sample",
        60, edges, 121))
    g = nx.watts_strogatz_graph(40, 2, 0.2, seed=25)
    cases.append(case("ring-40-rewired", "nx.watts_strogatz_graph(40, 2, 0.2, seed=25) (a ring, a fifth of it rewired)", 40, [[int(u), int(v)] for u, v in g.edges()], 125))
    g = nx.random_regular_graph(3, 40, seed=22)
    cases.append(case("regular-3-40", "nx.random_regular_graph(3, 40, seed=22)", 40, [[int(u), int(v)] for u, v in g.edges()], 122))
    g = nx.watts_strogatz_graph(50, 4, 0.1, seed=23)
    cases.append(case("ws-50-4", "nx.watts_strogatz_graph(50, 4, 0.1, seed=23)", 50, [[int(u), int(v)] for u, v in g.edges()], 123))
    g = nx.gnm_random_graph(70, 60, seed=24)
    cases.append(case("gnm-70-60", "nx.gnm_random_graph(70, 60, seed=24) (disconnected)", 70, [[int(u), int(v)] for u, v in g.edges()], 124))
    doc = {
        "library": f"networkx {nx.__version__}",
        "python": platform.python_version(),
        "command": "python3 test/reference/consequence.py > test/reference/consequence.json",
        "cases": cases,
    }
    compact = lambda v: json.dumps(v, separators=(",", ":"))
    rows = ",\n".join(f"  {compact(c)}" for c in cases)
    head = ",\n".join(f"{json.dumps(k)}: {json.dumps(v)}" for k, v in doc.items() if k != "cases")
    sys.stdout.write("{\n" + head + ',\n"cases": [\n' + rows + "\n]\n}\n")


if __name__ == "__main__":
    main()
