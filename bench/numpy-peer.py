"""Peer for bench/eigen-bench.ts: times numpy.linalg.eigvalsh and eigh on dense real symmetric
matrices and prints one JSON object on stdout.

Usage: python3 numpy-peer.py --sizes 200,500 --reps 5,5 [--pair-reps 3,3]

The matrices are uniform on [-1/2, 1/2) and symmetrised, like the TypeScript side's (timings do
not depend on the particular draw). Each routine is run once untimed, then `reps` times; the best
(minimum) and median wall-clock times are reported. The BLAS in use is reported through
threadpoolctl when it is installed, else numpy.show_config().
"""
import argparse
import io
import json
import sys
import time
from contextlib import redirect_stdout


def blas_description(np):
    try:
        from threadpoolctl import threadpool_info  # optional

        return [
            {k: info.get(k) for k in ("internal_api", "version", "threading_layer", "architecture", "num_threads")}
            for info in threadpool_info()
        ]
    except ImportError:
        buf = io.StringIO()
        with redirect_stdout(buf):
            np.show_config()
        lines = [ln.strip() for ln in buf.getvalue().splitlines()]
        wanted = [ln for ln in lines if ln.startswith(("name:", "openblas configuration:", "version:"))]
        return {"show_config": list(dict.fromkeys(wanted)), "note": "threadpoolctl not installed"}


def timed(fn, reps):
    fn()  # warm-up, untimed
    times = []
    for _ in range(reps):
        t0 = time.perf_counter()
        fn()
        times.append(time.perf_counter() - t0)
    times.sort()
    return {"best": times[0], "median": times[len(times) // 2]}


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--sizes", required=True)
    parser.add_argument("--reps", required=True)
    parser.add_argument("--pair-reps", required=True)
    args = parser.parse_args()
    try:
        import numpy as np
    except ImportError:
        print(json.dumps({"error": "numpy is not installed for " + sys.executable}))
        return
    sizes = [int(s) for s in args.sizes.split(",")]
    reps = [int(s) for s in args.reps.split(",")]
    pair_reps = [int(s) for s in args.pair_reps.split(",")]
    rng = np.random.default_rng(20240601)
    results = []
    for n, r, pr in zip(sizes, reps, pair_reps):
        a = rng.random((n, n)) - 0.5
        a = np.tril(a) + np.tril(a, -1).T
        results.append({"routine": "eigenvalues", "n": n, **timed(lambda: np.linalg.eigvalsh(a), r)})
        results.append({"routine": "eigenpairs", "n": n, **timed(lambda: np.linalg.eigh(a), pr)})
    print(json.dumps({"numpy": np.__version__, "python": sys.version.split()[0], "blas": blas_description(np), "results": results}))


if __name__ == "__main__":
    main()
