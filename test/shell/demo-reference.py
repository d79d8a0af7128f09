#!/usr/bin/python3
"""Reference structure of the demo scenario: bridges and cut nodes of the base design and of
each proposed change (the patch applied with `git apply`), computed with networkx.

Run from the repository root with Debian's python3-networkx, python3-yaml and git:
    /usr/bin/python3 test/shell/demo-reference.py > test/shell/demo-reference.json

Conventions as in test/reference/structure.py: a MultiGraph; a bridge of the simple graph
counts only when it has no parallel twin (two fibres between the same sites are redundancy).
"""
import json
import os
import platform
import shutil
import subprocess
import tempfile

import networkx as nx
import yaml

REPO = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
DEMO = os.path.join(REPO, "fixtures", "demo")
DESIGN = "designs/lunmere-backbone.net.yaml"
CHANGES = ["1-retire-east-chord", "2-close-west-ring", "3-saltmarrow-spur"]


def facts(path):
    with open(path, encoding="utf-8") as f:
        d = yaml.safe_load(f)
    G = nx.MultiGraph()
    G.add_nodes_from(str(n["id"]) for n in d["nodes"])
    ids = {}
    for link in d["links"]:
        a, b = (str(x) for x in link["between"])
        G.add_edge(a, b)
        ids.setdefault(frozenset((a, b)), []).append(str(link["id"]))
    H = nx.Graph(G)
    bridges = sorted(ids[frozenset((u, v))][0] for u, v in nx.bridges(H) if G.number_of_edges(u, v) == 1)
    return {"nodes": G.number_of_nodes(), "links": G.number_of_edges(), "bridges": bridges,
            "cut_nodes": sorted(nx.articulation_points(H))}


def main():
    out = {"library": f"networkx {nx.__version__}, PyYAML {yaml.__version__}", "python": platform.python_version(),
           "command": "/usr/bin/python3 test/shell/demo-reference.py > test/shell/demo-reference.json",
           "base": facts(os.path.join(DEMO, "base", DESIGN)), "changes": {}}
    for name in CHANGES:
        tmp = tempfile.mkdtemp()
        try:
            shutil.copytree(os.path.join(DEMO, "base", "designs"), os.path.join(tmp, "designs"))
            subprocess.run(["git", "apply", os.path.join(DEMO, "changes", name + ".patch")], cwd=tmp, check=True)
            out["changes"][name] = facts(os.path.join(tmp, DESIGN))
        finally:
            shutil.rmtree(tmp)
    print(json.dumps(out, indent=1))


main()
