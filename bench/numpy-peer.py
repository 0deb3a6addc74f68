"""Peer for the benchmark groups under bench/: times numpy on the same work as the TypeScript side
and prints one JSON object on stdout.

Modes (--mode, default eigen):
  eigen         numpy.linalg.eigvalsh and eigh on dense real symmetric matrices, uniform on
                [-1/2, 1/2) and symmetrised like the TypeScript side's (timings do not depend on the
                particular draw). Usage: --sizes 200,500 --reps 5,5 --pair-reps 3,3
  goe-spectrum  one GOE spectrum per call: draw the dense GOE matrix (off-diagonal variance 1/N,
                diagonal 2/N, as ensemble.ts) and eigvalsh it. Usage: --sizes 1000,10000 --reps 3,1
  fluctuation   fluctuation statistics per sample: draw a GOE matrix, eigvalsh, <G(z)> = mean of
                1/(lambda - z) at each --z, and Tr H^4 = sum of lambda^4; reports seconds per sample.
                Usage: --sizes 100,200 --samples 400,200 --reps 3,3 --z 0:0.5,1.5:0.2

Each mode first runs its routines once untimed on a small problem (warm-up); the eigen mode also
runs each routine once untimed at every size, as before (the other modes do not: a second dense
eigvalsh at N = 10^4 would double a run of minutes). Then each is run `reps` times and the best
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


def timed(fn, reps, per=1, warm=False):
    """Best and median seconds of fn() over reps runs, divided by `per` (samples per run); with
    `warm`, one untimed run first at this very size."""
    if warm:
        fn()
    times = []
    for _ in range(reps):
        t0 = time.perf_counter()
        fn()
        times.append((time.perf_counter() - t0) / per)
    times.sort()
    return {"best": times[0], "median": times[len(times) // 2]}


def goe(np, rng, n):
    """Dense GOE: (G + G^T)/sqrt(2N) has off-diagonal variance 1/N and diagonal variance 2/N."""
    g = rng.standard_normal((n, n))
    return (g + g.T) / np.sqrt(2.0 * n)


def ints(text):
    return [int(s) for s in text.split(",")]


def eigen_mode(np, args):
    rng = np.random.default_rng(20240601)
    small = rng.random((64, 64)) - 0.5
    small = np.tril(small) + np.tril(small, -1).T
    np.linalg.eigvalsh(small)
    np.linalg.eigh(small)
    results = []
    for n, r, pr in zip(ints(args.sizes), ints(args.reps), ints(args.pair_reps)):
        a = rng.random((n, n)) - 0.5
        a = np.tril(a) + np.tril(a, -1).T
        results.append({"routine": "eigenvalues", "n": n, **timed(lambda: np.linalg.eigvalsh(a), r, warm=True)})
        results.append({"routine": "eigenpairs", "n": n, **timed(lambda: np.linalg.eigh(a), pr, warm=True)})
    return results


def goe_spectrum_mode(np, args):
    rng = np.random.default_rng(20240602)
    np.linalg.eigvalsh(goe(np, rng, 64))
    results = []
    for n, r in zip(ints(args.sizes), ints(args.reps)):
        results.append({"routine": "goe-spectrum", "n": n, **timed(lambda: np.linalg.eigvalsh(goe(np, rng, n)), r)})
    return results


def fluctuation_mode(np, args):
    rng = np.random.default_rng(20240603)
    zs = np.array([complex(float(re), float(im)) for re, im in (p.split(":") for p in args.z.split(","))])

    def one_sample(n):
        values = np.linalg.eigvalsh(goe(np, rng, n))
        resolvent = (1.0 / (values[:, None] - zs[None, :])).mean(axis=0)
        fourth = np.sum(values**4)
        return resolvent, fourth

    def run(n, samples):
        for _ in range(samples):
            one_sample(n)

    one_sample(64)
    results = []
    for n, s, r in zip(ints(args.sizes), ints(args.samples), ints(args.reps)):
        results.append({"routine": "fluctuation-sample", "n": n, **timed(lambda: run(n, s), r, per=s)})
    return results


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--mode", default="eigen", choices=["eigen", "goe-spectrum", "fluctuation"])
    parser.add_argument("--sizes", required=True)
    parser.add_argument("--reps", required=True)
    parser.add_argument("--pair-reps")
    parser.add_argument("--samples")
    parser.add_argument("--z")
    args = parser.parse_args()
    try:
        import numpy as np
    except ImportError:
        print(json.dumps({"error": "numpy is not installed for " + sys.executable}))
        return
    if args.mode == "eigen":
        results = eigen_mode(np, args)
    elif args.mode == "goe-spectrum":
        results = goe_spectrum_mode(np, args)
    else:
        results = fluctuation_mode(np, args)
    print(json.dumps({"numpy": np.__version__, "python": sys.version.split()[0], "blas": blas_description(np), "results": results}))


if __name__ == "__main__":
    main()
