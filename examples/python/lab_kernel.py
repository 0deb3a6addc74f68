#!/usr/bin/env python3
"""Lab-style random-matrix functions with numpy, served to rmt-assay.

    rmt-assay check --exec "python3 examples/python/lab_kernel.py"

This is what wrapping a research codebase looks like: a few functions that take numpy arrays and
return numbers, and one call to ``serve`` (rmt_assay_protocol.py, copied unchanged beside it).

Conventions (shared/THEORY.md, "Conventions"): H = H* is N×N with off-diagonal entries of variance
1/N; G(z) = (H - z)^-1; <X> = Tr X / N.
"""

import math
import os
import sys

import numpy as np

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from rmt_assay_protocol import EnsembleNotOffered, answer_recording, serve  # noqa: E402


def eigenvalues(H):
    """The spectrum of a Hermitian matrix, ascending (LAPACK's syevd/heevd through numpy)."""
    return np.linalg.eigvalsh(H)


def resolvent_trace(H, points, weight=None):
    """<G(z) A> for each z, from one eigendecomposition H = U diag(lam) U*:
    Tr((H - z)^-1 A) = sum_i (U* A U)_ii / (lam_i - z)."""
    n = H.shape[0]
    lam, U = np.linalg.eigh(H)
    if weight is None:
        diagonal = np.ones(n)
    else:
        diagonal = np.einsum("ij,jk,ki->i", U.conj().T, weight, U)
    return [np.sum(diagonal / (lam - z)) / n for z in points]


def chain_trace(H, points, weights):
    """<G(z1) A1 G(z2) A2 ... G(zk) Ak>, each factor G(z) A by a linear solve (H - z) X = A."""
    n = H.shape[0]
    identity = np.eye(n)
    product = identity.astype(complex)
    for z, A in zip(points, weights):
        product = product @ np.linalg.solve(H - z * identity, A)
    return np.trace(product) / n


def sample_statistics(ensemble, size, seed, count, chains):
    """For each sampled matrix, every chain's normalised trace, from one eigendecomposition
    H = U diag(lam) U*: with B_j = U* A_j U and D_j = diag(1/(lam - z_j)),
    <G(z1)A1 ... G(zk)Ak> = Tr(D1 B1 ... Dk Bk)/N. Identity weights need only the spectrum, one
    weight needs only the diagonal of B, and each distinct weight is transformed once per sample.
    What a pipeline that never hands over its matrices would answer."""
    identity = np.eye(size)
    is_identity = {}
    rows = []
    for H in sample(ensemble, size, seed, count):
        lam, U = np.linalg.eigh(H)
        transformed = {}

        def in_eigenbasis(A):
            key = (A.dtype.str, A.tobytes())
            if key not in transformed:
                transformed[key] = U.conj().T @ A @ U
            return transformed[key]

        row = []
        for points, weights in chains:
            flags = []
            for A in weights:
                key = (A.dtype.str, A.tobytes())
                if key not in is_identity:
                    is_identity[key] = A.shape == identity.shape and np.array_equal(A, identity)
                flags.append(is_identity[key])
            if all(flags):
                row.append(np.sum(np.prod([1.0 / (lam - z) for z in points], axis=0)) / size if points else 1.0)
            elif len(points) == 1:
                row.append(np.sum(np.diag(in_eigenbasis(weights[0])) / (lam - points[0])) / size)
            else:
                product = np.eye(size, dtype=complex)
                for z, A, plain in zip(points, weights, flags):
                    product = product / (lam - z)[np.newaxis, :]
                    if not plain:
                        product = product @ in_eigenbasis(A)
                row.append(np.trace(product) / size)
        rows.append(row)
    return rows


# ---- sampling ---------------------------------------------------------------------------------
# Entry laws of harness/numeric/ensemble.ts, scaled to unit variance before the 1/sqrt(N):
# gaussian N(0, 1); rademacher +-1; uniform on [-sqrt 3, sqrt 3]; sparse-bernoulli +-1/sqrt(p)
# with probability p = min(1, d/N), else 0. A complex entry is (a + ib)/sqrt 2 with a, b independent
# of the real law, except sparse-bernoulli: e^{i theta}/sqrt(p) with probability p, theta uniform.

OFF_DIAGONAL_LAWS = {"gaussian", "rademacher", "uniform", "sparse-bernoulli"}
DIAGONAL_LAWS = {"gaussian", "rademacher", "uniform", "zero"}
GOE = {"field": "real", "offDiagonal": "gaussian", "diagonal": "gaussian", "diagonalVariance": 2.0}
GUE = {"field": "complex", "offDiagonal": "gaussian", "diagonal": "gaussian", "diagonalVariance": 1.0}


def _unit_real(rng, law, count, p):
    if law == "gaussian":
        return rng.standard_normal(count)
    if law == "rademacher":
        return rng.choice([-1.0, 1.0], size=count)
    if law == "uniform":
        return rng.uniform(-math.sqrt(3.0), math.sqrt(3.0), count)
    if law == "sparse-bernoulli":
        signs = rng.choice([-1.0, 1.0], size=count)
        return np.where(rng.random(count) < p, signs / math.sqrt(p), 0.0)
    raise ValueError(law)


def _off_diagonal(rng, field, law, count, p):
    if field == "real":
        return _unit_real(rng, law, count, p)
    if law == "sparse-bernoulli":
        phases = np.exp(1j * rng.uniform(0.0, 2.0 * math.pi, count))
        return np.where(rng.random(count) < p, phases / math.sqrt(p), 0.0)
    return (_unit_real(rng, law, count, p) + 1j * _unit_real(rng, law, count, p)) / math.sqrt(2.0)


def _diagonal(rng, law, count, variance):
    if law == "zero":
        return np.zeros(count)
    return math.sqrt(variance) * _unit_real(rng, law, count, None)


def wigner_matrix(rng, n, spec):
    """One N×N Wigner matrix: independent upper triangle, H = H*, entries scaled by 1/sqrt(N)."""
    field = spec["field"]
    p = min(1.0, spec["meanDegree"] / n) if spec["offDiagonal"] == "sparse-bernoulli" else None
    H = np.zeros((n, n), dtype=complex if field == "complex" else float)
    upper = np.triu_indices(n, 1)
    H[upper] = _off_diagonal(rng, field, spec["offDiagonal"], len(upper[0]), p) / math.sqrt(n)
    H = H + H.conj().T
    H[np.diag_indices(n)] = _diagonal(rng, spec["diagonal"], n, spec.get("diagonalVariance", 0.0)) / math.sqrt(n)
    return H


def sample(ensemble, size, seed, count):
    """count matrices from numpy's default generator (PCG64) seeded with seed."""
    kind = ensemble.get("kind")
    spec = GOE if kind == "goe" else GUE if kind == "gue" else ensemble if kind == "wigner" else None
    if spec is None or spec["offDiagonal"] not in OFF_DIAGONAL_LAWS or spec["diagonal"] not in DIAGONAL_LAWS:
        raise EnsembleNotOffered(ensemble)
    rng = np.random.default_rng(seed)
    return [wigner_matrix(rng, size, spec) for _ in range(count)]


if __name__ == "__main__":
    functions = dict(eigenvalues=eigenvalues, resolvent_trace=resolvent_trace, chain_trace=chain_trace, sample=sample,
                     sample_statistics=sample_statistics)
    if len(sys.argv) == 4 and sys.argv[1] == "--answer-recording":
        # Offline: python3 lab_kernel.py --answer-recording template.json answered.json
        answer_recording(sys.argv[2], sys.argv[3], name="lab-kernel (numpy)", version=np.__version__, **functions)
    else:
        serve(name="lab-kernel (numpy)", version=np.__version__, **functions)
