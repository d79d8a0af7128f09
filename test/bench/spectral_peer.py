#!/usr/bin/python3
"""Peer of test/bench/spectral.bench.ts. For each graph (edge lists in JSON):
- algebraic connectivity with SciPy's ARPACK wrapper, eigsh(L, k=2, which='SM', tol=1e-10):
  what a user without a factorisation at hand writes, at the accuracy netbrace uses (Ritz
  residual <= 1e-10 |theta|); the second-smallest value is the Fiedler value;
- natural connectivity exactly from NumPy's eigvalsh of the dense adjacency (LAPACK), where
  the graph is small enough ('dense': true).
Each call is timed once (these take seconds). Prints one JSON object.

usage: spectral_peer.py GRAPHS.json
"""
import json
import sys
import time

import numpy as np
import scipy
import scipy.sparse as sp
import scipy.sparse.linalg as sla


def main():
    with open(sys.argv[1]) as f:
        spec = json.load(f)
    out = {'scipy': scipy.__version__, 'numpy': np.__version__, 'graphs': {}}
    for name, g in spec.items():
        n = g['n']
        e = np.array(g['edges'], dtype=np.int64)
        A = sp.coo_matrix((np.ones(len(e)), (e[:, 0], e[:, 1])), shape=(n, n))
        A = ((A + A.T) > 0).astype(float).tocsr()
        r = {}
        if g.get('fiedler'):
            L = (sp.diags(np.asarray(A.sum(axis=1)).ravel()) - A).tocsr()
            t = time.perf_counter()
            vals = sla.eigsh(L, k=2, which='SM', tol=1e-10, return_eigenvectors=False)
            r['fiedler_seconds'] = time.perf_counter() - t
            r['fiedler'] = float(sorted(vals)[1])
        if g.get('dense'):
            t = time.perf_counter()
            lam = np.linalg.eigvalsh(A.toarray())
            top = lam.max()
            r['natural'] = float(top + np.log(np.exp(lam - top).sum()) - np.log(n))
            r['natural_seconds'] = time.perf_counter() - t
        out['graphs'][name] = r
    json.dump(out, sys.stdout)


if __name__ == '__main__':
    main()
