#!/usr/bin/python3
"""Peer timings for test/bench/metrics.bench.ts: the same graphs, the same metrics, computed
with networkx and with python-igraph (C core) or SciPy/NumPy where igraph has no routine.

Usage: /usr/bin/python3 test/bench/metrics_peer.py GRAPHS.json  (prints one JSON object)

GRAPHS.json: {"graphs": {name: {"n", "edges", "weights"?, "demands"?, "budget"?}},
              "jobs": [[metric, graph], ...]}. Each job is timed as the best per-call time
over batches of calls (each about 2 ms, repeated for about 0.3 s; very slow calls run
once); a measurement still running after CAP_SECONDS is stopped and reported
as a lower bound. The graph objects are built before timing, as netbrace's compact graph is.
What each peer runs is listed in PEERS below (and printed in the bench's table legend).
"""

import json
import math
import multiprocessing
import sys
import time
import warnings

import igraph
import networkx as nx
import numpy as np
import scipy
import scipy.sparse.linalg as sla


def best_time(fn, budget=0.3):
    """Best per-call time: calls grouped in batches of about 2 ms, batches repeated ~0.3 s."""
    t = time.perf_counter()
    fn()  # also warms up
    first = time.perf_counter() - t
    batch = max(1, min(20000, math.ceil(0.002 / max(first, 1e-7))))
    best = math.inf
    start = time.perf_counter()
    for _ in range(200):
        t = time.perf_counter()
        for _ in range(batch):
            fn()
        best = min(best, (time.perf_counter() - t) / batch)
        if time.perf_counter() - start > budget:
            break
    return best


CAP_SECONDS = 15


def capped(measure):
    """Run measure() in a forked child; a child still running after CAP_SECONDS is stopped
    and its time reported as a lower bound (C routines cannot be interrupted otherwise)."""
    reader, writer = multiprocessing.Pipe(duplex=False)

    def child():
        writer.send(measure())

    proc = multiprocessing.get_context("fork").Process(target=child)
    proc.start()
    if reader.poll(CAP_SECONDS):
        value = reader.recv()
        proc.join()
        return value, False
    proc.terminate()
    proc.join()
    return float(CAP_SECONDS), True


def once(fn):
    t = time.perf_counter()
    fn()
    return time.perf_counter() - t


def build(spec):
    n = spec["n"]
    g = nx.Graph()
    g.add_nodes_from(range(n))
    w = spec.get("weights")
    for k, (a, b) in enumerate(spec["edges"]):
        if w:
            g.add_edge(a, b, w=w[k])
        else:
            g.add_edge(a, b)
    ig = igraph.Graph(n=n, edges=spec["edges"])
    if w:
        ig.es["w"] = w
    lap = nx.laplacian_matrix(g, weight=None).astype(float).tocsr()
    adj = nx.adjacency_matrix(g, weight=None).astype(float).tocsr()
    return g, ig, lap, adj


def nx_weighted_eff(g):
    total = 0.0
    for s, dist in nx.all_pairs_dijkstra_path_length(g, weight="w"):
        total += sum(1 / d for t, d in dist.items() if t != s)
    return total


def ig_eff(ig, weights=None):
    d = np.array(ig.distances(weights=weights), dtype=float)
    np.fill_diagonal(d, np.inf)
    return float(np.sum(1 / d))


def nx_demand(g, demands, budget, intact):
    served = 0.0
    by_source = {}
    for k, (s, t, v) in enumerate(demands):
        by_source.setdefault(s, []).append((k, t, v))
    for s, items in by_source.items():
        dist = nx.single_source_dijkstra_path_length(g, s, weight="w")
        for k, t, v in items:
            if t in dist and dist[t] <= intact[k] * budget:
                served += v
    return served


def ig_demand(ig, demands, budget, intact, sources, targets):
    d = ig.distances(source=sources, target=targets, weights="w")
    si = {s: i for i, s in enumerate(sources)}
    ti = {t: i for i, t in enumerate(targets)}
    served = 0.0
    for k, (s, t, v) in enumerate(demands):
        x = d[si[s]][ti[t]]
        if x <= intact[k] * budget:
            served += v
    return served


def natural(eigs):
    top = max(eigs)
    return top + math.log(sum(math.exp(x - top) for x in eigs) / len(eigs))


def peers(metric, g, ig, lap, adj, spec):
    """(networkx callable, igraph/SciPy callable, label of the second peer)."""
    n = spec["n"]
    if metric == "efficiency":
        return (lambda: nx.global_efficiency(g)), (lambda: ig_eff(ig)), "igraph distances()+NumPy"
    if metric == "weighted_efficiency":
        return (lambda: nx_weighted_eff(g)), (lambda: ig_eff(ig, "w")), "igraph distances(weights)+NumPy"
    if metric == "largest_component":
        return (lambda: len(max(nx.connected_components(g), key=len))), (lambda: max(ig.connected_components().sizes())), "igraph components"
    if metric == "pair_connectivity":
        return (lambda: sum(len(c) * (len(c) - 1) / 2 for c in nx.connected_components(g))), (
            lambda: sum(s * (s - 1) / 2 for s in ig.connected_components().sizes())), "igraph components"
    if metric == "average_hop":
        return (lambda: nx.average_shortest_path_length(g.subgraph(max(nx.connected_components(g), key=len)))), (
            lambda: ig.connected_components().giant().average_path_length()), "igraph giant().average_path_length()"
    if metric == "diameter":
        return (lambda: nx.diameter(g.subgraph(max(nx.connected_components(g), key=len)))), (
            lambda: ig.connected_components().giant().diameter()), "igraph giant().diameter()"
    if metric == "algebraic_connectivity":
        return (lambda: nx.algebraic_connectivity(g, weight=None)), (
            lambda: sla.eigsh(lap, k=2, which="SM", return_eigenvectors=False)), "SciPy eigsh(L, k=2, 'SM')"
    if metric == "effective_resistance":
        def nx_r():
            mu = np.sort(nx.laplacian_spectrum(g, weight=None))
            return n * float(np.sum(1 / mu[1:]))
        def np_r():
            mu = np.linalg.eigvalsh(np.array(ig.laplacian(), dtype=float))
            return n * float(np.sum(1 / mu[1:]))
        return nx_r, np_r, "NumPy eigvalsh(igraph laplacian())"
    if metric == "natural_connectivity":
        return (lambda: natural(np.real(nx.adjacency_spectrum(g, weight=None)))), (
            lambda: natural(np.linalg.eigvalsh(np.array(ig.get_adjacency().data, dtype=float)))), "NumPy eigvalsh(igraph adjacency)"
    if metric == "spectral_radius":
        return (lambda: max(np.real(nx.adjacency_spectrum(g, weight=None)))), (
            lambda: sla.eigsh(adj, k=1, which="LA", return_eigenvectors=False)), "SciPy eigsh(A, k=1, 'LA')"
    if metric == "node_connectivity":
        return (lambda: nx.node_connectivity(g)), (lambda: ig.vertex_connectivity()), "igraph vertex_connectivity()"
    if metric == "link_connectivity":
        return (lambda: nx.edge_connectivity(g)), (lambda: ig.edge_connectivity()), "igraph edge_connectivity()"
    if metric == "bridges":
        return (lambda: len(list(nx.bridges(g)))), (lambda: len(ig.bridges())), "igraph bridges()"
    if metric == "cut_nodes":
        return (lambda: len(list(nx.articulation_points(g)))), (lambda: len(ig.articulation_points())), "igraph articulation_points()"
    if metric == "demand_served":
        demands = spec["demands"]
        budget = spec["budget"]
        intact = [nx.shortest_path_length(g, s, t, weight="w") if nx.has_path(g, s, t) else math.inf for s, t, _ in demands]
        sources = sorted({s for s, _, _ in demands})
        targets = sorted({t for _, t, _ in demands})
        return (lambda: nx_demand(g, demands, budget, intact)), (
            lambda: ig_demand(ig, demands, budget, intact, sources, targets)), "igraph distances(sources, targets, weights)"
    raise ValueError(metric)


# networkx calls that take seconds on the larger graphs run once instead of repeatedly.
SLOW = {"efficiency", "weighted_efficiency", "average_hop", "diameter", "node_connectivity", "link_connectivity", "algebraic_connectivity",
        "effective_resistance", "natural_connectivity"}


def main():
    warnings.simplefilter("ignore", FutureWarning)
    spec = json.load(open(sys.argv[1]))
    built = {name: build(s) for name, s in spec["graphs"].items()}
    results = []
    for metric, name in spec["jobs"]:
        g, ig, lap, adj = built[name]
        s = spec["graphs"][name]
        f_nx, f_ig, label = peers(metric, g, ig, lap, adj, s)
        big = s["n"] >= 400
        t_nx, nx_capped = capped(lambda: once(f_nx) if (metric in SLOW and big) else best_time(f_nx))
        t_ig, ig_capped = capped(lambda: best_time(f_ig))
        results.append({"metric": metric, "graph": name, "networkx": t_nx, "networkxCapped": nx_capped, "peer": t_ig,
                        "peerCapped": ig_capped, "peerLabel": label})
        a = f"> {t_nx:.0f} s (stopped)" if nx_capped else f"{t_nx:.4f} s"
        b = f"> {t_ig:.0f} s (stopped)" if ig_capped else f"{t_ig:.5f} s"
        print(f"  peer {metric} on {name}: networkx {a}, {label} {b}", file=sys.stderr, flush=True)
    json.dump({"versions": {"networkx": nx.__version__, "python-igraph": igraph.__version__, "numpy": np.__version__,
                            "scipy": scipy.__version__}, "results": results}, sys.stdout)


if __name__ == "__main__":
    main()
