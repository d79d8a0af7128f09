#!/usr/bin/python3
"""Reference values for netbrace's metric library, from general-purpose libraries.

Run from the repository root with Debian's Python (networkx 2.8.8, python-igraph 0.10.2,
NumPy 1.24.2):

    /usr/bin/python3 test/reference/metrics.py > test/reference/metrics.json

It writes, for every graph, its exact simple edge list (so the TypeScript check rebuilds the
very same graph without going through netbrace's parsers) and the value of every metric
under netbrace's definitions (README "Metrics"), each computed here by the named library:

- networkx: global_efficiency, connected_components, average_shortest_path_length and
  diameter (on the largest component), node_connectivity, edge_connectivity, bridges,
  articulation_points, biconnected_components, dijkstra path lengths;
- python-igraph (C core): component sizes, vertex/edge connectivity, bridges,
  articulation points, diameter — asserted equal to networkx here, so one JSON value
  stands for both libraries;
- NumPy (LAPACK eigvalsh, pinv): Laplacian and adjacency spectra for the algebraic
  connectivity, effective graph resistance (also asserted against N·tr(L⁺) by pinv),
  natural connectivity and spectral radius.

Graphs: the karate club, Les Misérables and Florentine families graphs shipped with
networkx (weights stripped: docs/METHODS.md §10.1's pitfall), networks of the Internet Topology Zoo
(S. Knight et al., IEEE JSAC 29(9):1765, 2011, CC BY 4.0) read from
fixtures/topology-zoo/gml (copied from the dataset, CC BY 4.0) and collapsed to simple graphs (parallel links merged,
self-loops dropped: netbrace's spectral and hop metrics use the simple graph), and seeded
Erdős–Rényi, Barabási–Albert, Watts–Strogatz and random geometric graphs.
"""

import json
import warnings
import math
import os
import random
import sys

import igraph
import networkx as nx
import numpy as np

ROOT = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
ZOO = os.path.join(ROOT, "fixtures", "topology-zoo", "gml")
EARTH_KM = 6371.0088
FIBRE_MS_PER_KM = 0.0049


def haversine(a, b):
    (lat1, lon1), (lat2, lon2) = a, b
    r = math.pi / 180
    h = math.sin((lat2 - lat1) * r / 2) ** 2 + math.cos(lat1 * r) * math.cos(lat2 * r) * math.sin((lon2 - lon1) * r / 2) ** 2
    return 2 * EARTH_KM * math.asin(min(1.0, math.sqrt(h)))


def simple(g):
    """Integer-labelled simple undirected graph, nodes in their original order."""
    h = nx.Graph()
    order = list(g.nodes())
    index = {v: i for i, v in enumerate(order)}
    h.add_nodes_from(range(len(order)))
    for a, b in g.edges():
        if a != b:
            h.add_edge(index[a], index[b])
    return h, order


def pairs(k):
    return k * (k - 1) / 2


def logsumexp(x):
    top = max(x)
    return top + math.log(sum(math.exp(v - top) for v in x))


def natural_of_complete(n):
    return 0.0 if n <= 1 else n - 1 + math.log1p((n - 1) * math.exp(-n)) - math.log(n)


def to_igraph(g):
    return igraph.Graph(n=g.number_of_nodes(), edges=list(g.edges()))


def values(g):
    """Every metric of the intact simple graph g under netbrace's definitions."""
    n = g.number_of_nodes()
    ig = to_igraph(g)
    out = {}
    comps = [len(c) for c in nx.connected_components(g)]
    ig_sizes = sorted(ig.connected_components().sizes())
    assert sorted(comps) == ig_sizes, "networkx and igraph disagree on components"
    largest = max(comps) if comps else 0
    out["largest_component"] = (largest, largest / n if n else 0.0)
    connected = sum(pairs(c) for c in comps)
    out["pair_connectivity"] = (connected, connected / pairs(n) if n > 1 else 0.0)
    e = nx.global_efficiency(g)
    out["efficiency"] = (e, e)

    lcc = g.subgraph(max(nx.connected_components(g), key=len)).copy() if n else g
    if lcc.number_of_nodes() >= 2:
        h = nx.average_shortest_path_length(lcc)
        d = nx.diameter(lcc)
        assert d == to_igraph(nx.convert_node_labels_to_integers(lcc)).diameter()
        out["average_hop"] = (h, 1 / h)
        out["diameter"] = (d, 1 / d)

    connected_graph = len(comps) == 1
    lap = nx.laplacian_matrix(g, weight=None).toarray().astype(float)
    mu = np.linalg.eigvalsh(lap)
    a = float(mu[1]) if connected_graph and n >= 2 else 0.0
    out["algebraic_connectivity"] = (a, min(1.0, a / n) if n else 0.0)
    if n >= 2 and connected_graph:
        r = n * float(np.sum(1 / mu[1:]))
        r_pinv = n * float(np.trace(np.linalg.pinv(lap)))
        assert abs(r - r_pinv) <= 1e-8 * r, (r, r_pinv)
        out["effective_resistance"] = (r, min(1.0, (n - 1) / r))
    elif n >= 2:
        out["effective_resistance"] = (None, 0.0)  # infinite
    adj = nx.to_numpy_array(g, weight=None)
    lam = np.linalg.eigvalsh(adj)
    nat = max(0.0, logsumexp([float(x) for x in lam]) - math.log(n))
    best = natural_of_complete(n)
    out["natural_connectivity"] = (nat, min(1.0, nat / best) if best > 0 else 0.0)
    rho = float(lam[-1]) if n else 0.0
    out["spectral_radius"] = (rho, min(1.0, rho / (n - 1)) if n > 1 else 0.0)

    if n >= 2 and connected_graph:
        kappa = nx.node_connectivity(g)
        lam_e = nx.edge_connectivity(g)
        assert kappa == ig.vertex_connectivity() and lam_e == ig.edge_connectivity()
    else:
        kappa = lam_e = 0
    out["node_connectivity"] = (kappa, min(1.0, kappa / (n - 1)) if n > 1 else 0.0)
    out["link_connectivity"] = (lam_e, min(1.0, lam_e / (n - 1)) if n > 1 else 0.0)

    br = list(nx.bridges(g))
    assert len(br) == len(ig.bridges())
    rest = g.copy()
    rest.remove_edges_from(br)
    two_edge = sum(pairs(len(c)) for c in nx.connected_components(rest))
    out["bridges"] = (len(br), two_edge / pairs(n) if n > 1 else 0.0)
    cut = list(nx.articulation_points(g))
    assert len(cut) == len(ig.articulation_points())
    blocks = sum(pairs(len(b)) for b in nx.biconnected_components(g))
    out["cut_nodes"] = (len(cut), blocks / pairs(n) if n > 1 else 0.0)
    return out


def weighted_efficiency(g, weights, coords, kind):
    """E_w and netbrace's normalisation E_w / E_ideal (README "Metrics")."""
    n = g.number_of_nodes()
    h = nx.Graph()
    h.add_nodes_from(g.nodes())
    for (a, b), w in zip(g.edges(), weights):
        h.add_edge(a, b, w=w)
    total = 0.0
    for s, dist in nx.all_pairs_dijkstra_path_length(h, weight="w"):
        total += sum(1 / d for t, d in dist.items() if t != s)
    l_min = min(weights)
    ideal = 0.0
    factor = FIBRE_MS_PER_KM if kind == "latency" else 1.0
    for i in range(n):
        for j in range(i + 1, n):
            delta = l_min
            if coords is not None:
                delta = max(l_min, haversine(coords[i], coords[j]) * factor)
            ideal += 2 / delta
    return total / (n * (n - 1)), min(1.0, total / ideal)


def demand_case(g, weights, rng, count, removed_links, budget):
    """Random demands, a seeded link removal, and the served volume by networkx Dijkstra."""
    n = g.number_of_nodes()
    edges = list(g.edges())
    demands = []
    for _ in range(count):
        s, t = rng.randrange(n), rng.randrange(n)
        demands.append((s, t, rng.randint(1, 10)))
    gone = sorted(rng.sample(range(len(edges)), removed_links))

    def graph(skip):
        h = nx.Graph()
        h.add_nodes_from(range(n))
        for k, (a, b) in enumerate(edges):
            if k not in skip:
                h.add_edge(a, b, w=1.0 if weights is None else weights[k])
        return h

    intact, survivor = graph(set()), graph(set(gone))
    total = sum(v for _, _, v in demands)
    connected = within = 0.0
    for s, t, v in demands:
        try:
            base = nx.shortest_path_length(intact, s, t, weight="w")
        except nx.NetworkXNoPath:
            continue
        try:
            now = nx.shortest_path_length(survivor, s, t, weight="w")
        except nx.NetworkXNoPath:
            continue
        connected += v
        if now <= base * budget * (1 + 1e-12):
            within += v
    return {
        "demands": [list(d) for d in demands],
        "removedLinks": gone,
        "latencyBudget": budget,
        "served": {"value": connected, "normalized": connected / total},
        "servedWithinBudget": {"value": within, "normalized": within / total},
    }


def record(name, source, g, weights=None, coords=None, kind=None, demands=None):
    entry = {
        "name": name,
        "source": source,
        "n": g.number_of_nodes(),
        "edges": [list(e) for e in g.edges()],
        "values": {k: {"value": v[0], "normalized": v[1]} for k, v in values(g).items()},
    }
    if weights is not None:
        entry["weights"] = weights
        entry["weightKind"] = kind
        if coords is not None:
            entry["coords"] = coords
        raw, norm = weighted_efficiency(g, weights, coords, kind)
        entry["values"]["weighted_efficiency"] = {"value": raw, "normalized": norm}
    if demands is not None:
        entry["demandCase"] = demands
    return entry


def strip(g):
    h = nx.Graph()
    h.add_nodes_from(g.nodes())
    h.add_edges_from(g.edges())
    return h


def main():
    warnings.simplefilter("ignore", FutureWarning)
    out = []
    rng = random.Random(20240601)

    karate, _ = simple(strip(nx.karate_club_graph()))
    out.append(record("karate", "networkx karate_club_graph (Zachary 1977), weights stripped", karate,
                      demands=demand_case(karate, None, rng, 25, 8, 1.5)))
    lesmis, _ = simple(strip(nx.les_miserables_graph()))
    out.append(record("les_miserables", "networkx les_miserables_graph (Knuth, Stanford GraphBase), weights stripped", lesmis))
    flor, _ = simple(nx.florentine_families_graph())
    out.append(record("florentine", "networkx florentine_families_graph (Padgett & Ansell 1993)", flor))

    # Zoo networks of 6 to 200 nodes that networkx reads, 48 of them spread evenly over the
    # alphabetical list (a few zoo files are not valid GML for networkx; the parsers' own
    # tests cover those).
    candidates = []
    for f in sorted(f for f in os.listdir(ZOO) if f.endswith(".gml")):
        try:
            raw = nx.read_gml(os.path.join(ZOO, f), label="id")
        except Exception:
            continue
        g, order = simple(nx.Graph(raw.to_undirected()))
        if 6 <= g.number_of_nodes() <= 200:
            candidates.append((f, raw, g, order))
    picked = [candidates[round(i * (len(candidates) - 1) / 47)] for i in range(48)]
    taken = 0
    with_demands = 0
    for f, raw, g, order in picked:
        coords = None
        try:
            coords = [[float(raw.nodes[v]["Latitude"]), float(raw.nodes[v]["Longitude"])] for v in order]
        except KeyError:
            coords = None
        weights = None
        if coords is not None:
            weights = [haversine(coords[a], coords[b]) for a, b in g.edges()]
            if min(weights, default=0) <= 1e-6:
                weights = None  # co-located sites: a zero-length link, weighted_efficiency does not apply
        # Every other zoo graph checks lengths in km, the rest latencies in ms over the same routes.
        kind = "length" if taken % 2 == 0 else "latency"
        if weights is not None and kind == "latency":
            weights = [w * FIBRE_MS_PER_KM for w in weights]
        demands = None
        if weights is not None and with_demands < 4 and g.number_of_edges() >= 10:
            demands = demand_case(g, weights, rng, 30, 3, 1.25)
            with_demands += 1
        out.append(record("zoo:" + f[:-4], "Internet Topology Zoo (Knight et al., IEEE JSAC 2011, CC BY 4.0), simple graph",
                          g, weights, coords if weights is not None else None, kind if weights is not None else None, demands))
        taken += 1

    gens = [
        ("er_60_90", nx.gnm_random_graph(60, 90, seed=1), "networkx gnm_random_graph(60, 90, seed=1)"),
        ("er_200_500", nx.gnm_random_graph(200, 500, seed=2), "networkx gnm_random_graph(200, 500, seed=2)"),
        ("ba_150_2", nx.barabasi_albert_graph(150, 2, seed=3), "networkx barabasi_albert_graph(150, 2, seed=3)"),
        ("ba_400_3", nx.barabasi_albert_graph(400, 3, seed=4), "networkx barabasi_albert_graph(400, 3, seed=4)"),
        ("ws_100_4", nx.watts_strogatz_graph(100, 4, 0.1, seed=5), "networkx watts_strogatz_graph(100, 4, 0.1, seed=5)"),
        ("ws_250_6", nx.watts_strogatz_graph(250, 6, 0.05, seed=6), "networkx watts_strogatz_graph(250, 6, 0.05, seed=6)"),
    ]
    for name, g0, src in gens:
        g, _ = simple(g0)
        out.append(record(name, src, g))
    geo = nx.random_geometric_graph(120, 0.15, seed=7)
    g, order = simple(geo)
    pos = [geo.nodes[v]["pos"] for v in order]
    weights = [math.dist(pos[a], pos[b]) for a, b in g.edges()]
    out.append(record("rgg_120", "networkx random_geometric_graph(120, 0.15, seed=7), Euclidean link weights", g,
                      weights, None, "weight", demand_case(g, weights, rng, 30, 10, 1.5)))

    doc = {
        "generator": "test/reference/metrics.py",
        "command": "/usr/bin/python3 test/reference/metrics.py > test/reference/metrics.json",
        "libraries": {
            "networkx": nx.__version__,
            "python-igraph": igraph.__version__,
            "numpy": np.__version__,
            "python": sys.version.split()[0],
        },
        "graphs": out,
    }
    json.dump(doc, sys.stdout, indent=None, separators=(",", ":"))
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
