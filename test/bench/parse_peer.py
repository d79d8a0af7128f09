#!/usr/bin/python3
"""Peer of test/bench/parse.bench.ts: the same design file read with PyYAML's C loader
(libyaml, yaml.CSafeLoader), the fastest YAML reader a python user has at hand; it keeps no
source positions. Prints one JSON object with the seconds and the element count.

usage: parse_peer.py FILE.net.yaml
"""
import json
import sys
import time

import yaml


def main():
    t = time.perf_counter()
    with open(sys.argv[1], encoding='utf-8') as f:
        d = yaml.load(f, Loader=yaml.CSafeLoader)
    s = time.perf_counter() - t
    json.dump({'version': yaml.__version__, 'seconds': s, 'elements': len(d['nodes']) + len(d.get('links') or [])}, sys.stdout)


if __name__ == '__main__':
    main()
