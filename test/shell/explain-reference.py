#!/usr/bin/python3
"""Reference values for `netbrace explain` on the demo base design.

Removes every site (except hardened ones), every link and every shared-risk group (all its
links) on its own and computes, with networkx, the two metrics of the built-in policy's R:
- pair connectivity: sum over components C of C(|C|, 2), divided by C(N0, 2);
- global efficiency with the ORIGINAL node count: sum over ordered pairs of 1/d, divided by
  N0 (N0 - 1) (Latora & Marchiori, PRL 87:198701, 2001; N0 as in docs/METHODS.md §2.2).
R is their mean (weights 1 and 1). The design is read with PyYAML as plain data.

Run from the repository root with Debian's python3-networkx and python3-yaml:
    /usr/bin/python3 test/shell/explain-reference.py > test/shell/explain-reference.json
"""
import json
import os
import platform

import networkx as nx
import yaml

REPO = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
DESIGN = os.path.join(REPO, "fixtures", "demo", "base", "designs", "lunmere-backbone.net.yaml")


def metrics(G, n0):
    pairs = sum(len(c) * (len(c) - 1) / 2 for c in nx.connected_components(G))
    inv = 0.0
    for _, dist in nx.all_pairs_shortest_path_length(G):
        inv += sum(1.0 / d for d in dist.values() if d > 0)
    pc = pairs / (n0 * (n0 - 1) / 2)
    eff = inv / (n0 * (n0 - 1))
    return pc, eff


def main():
    with open(DESIGN, encoding="utf-8") as f:
        d = yaml.safe_load(f)
    n0 = len(d["nodes"])
    G = nx.MultiGraph()
    G.add_nodes_from(str(n["id"]) for n in d["nodes"])
    links = []
    for link in d["links"]:
        a, b = (str(x) for x in link["between"])
        key = G.add_edge(a, b)
        links.append((str(link["id"]), a, b, key, link.get("risk_groups", [])))
    rows = []

    def record(kind, ident, H):
        pc, eff = metrics(nx.Graph(H), n0)
        rows.append({"kind": kind, "id": ident, "pair_connectivity": pc, "efficiency": eff, "r": (pc + eff) / 2})

    record("intact", "", G)
    for n in d["nodes"]:
        if n.get("hardened"):
            continue
        H = G.copy()
        H.remove_node(str(n["id"]))
        record("node", str(n["id"]), H)
    for ident, a, b, key, _ in links:
        H = G.copy()
        H.remove_edge(a, b, key)
        record("link", ident, H)
    for group in d.get("risk_groups", []):
        H = G.copy()
        for ident, a, b, key, groups in links:
            if group["id"] in groups:
                H.remove_edge(a, b, key)
        record("group", str(group["id"]), H)
    print(json.dumps({
        "library": f"networkx {nx.__version__}, PyYAML {yaml.__version__}",
        "python": platform.python_version(),
        "command": "/usr/bin/python3 test/shell/explain-reference.py > test/shell/explain-reference.json",
        "design": "fixtures/demo/base/designs/lunmere-backbone.net.yaml",
        "r": "mean of pair_connectivity and efficiency (N0 denominators)",
        "rows": rows,
    }, indent=1))


main()
