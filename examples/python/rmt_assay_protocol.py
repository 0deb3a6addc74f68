"""The rmt-assay process protocol, ready to serve your functions.

Copy this file next to your code and leave it as it is. Your entry point calls ``serve`` with the
functions you have; rmt-assay then starts your program with ``--exec "python3 your_entry.py"`` and
talks to it over stdin/stdout, one JSON-RPC 2.0 message per line (adapters/process/PROTOCOL.md).

    from rmt_assay_protocol import serve, EnsembleNotOffered

    def eigenvalues(H):                          # H: N×N array, real symmetric or complex Hermitian
        return numpy.linalg.eigvalsh(H)          # N real numbers, ascending

    serve(name="my-lab", version="1.0", eigenvalues=eigenvalues)

The functions you may pass (each optional; the ones you pass are announced as capabilities):

    eigenvalues(H)                       -> N reals, ascending
    resolvent_trace(H, points, weight)   -> one complex per point: Tr((H - z)^-1 A)/N, A = weight,
                                            or the identity when weight is None
    chain_trace(H, points, weights)      -> complex: Tr(G(z1) A1 G(z2) A2 ... G(zk) Ak)/N
    sample(ensemble, size, seed, count)  -> count N×N matrices; raise EnsembleNotOffered(ensemble)
                                            for an ensemble you do not sample
    covariance(ensemble, left, right)    -> complex: the limiting covariance you claim for the
                                            statistics of two chains, each (points, weights)
    sample_statistics(ensemble, size, seed, count, chains)
                                         -> count rows, each one complex per chain (points, weights):
                                            <G(z1) A1 ... G(zk) Ak> of that sample (1 for an empty chain)

Any of them may raise NotAvailable("why") for a request it cannot answer: those checks are skipped.

Matrices arrive as numpy arrays (float64 or complex128) when numpy is installed, otherwise as lists
of rows of float or complex. Results may be numpy arrays, lists, or Python numbers. Standard library
only (json, base64, struct, sys); numpy is used when present.

What this loop takes care of: reading and writing the wire format; turning NaN and infinities into
the strings "NaN", "Infinity", "-Infinity" (JSON has no such numbers); turning exceptions into
JSON-RPC errors (their text goes into the report; the traceback goes to stderr, which rmt-assay
keeps in its log); and keeping stdout for the protocol: while serving, print() writes to stderr.
"""

import base64
import json
import math
import struct
import sys
import traceback

try:
    import numpy as _np
except ImportError:  # the protocol works without numpy; matrices are then lists of rows
    _np = None

# JSON-RPC 2.0 error codes (JSON-RPC 2.0 Specification, 2010, section 5.1), and the protocol's own.
PARSE_ERROR = -32700
INVALID_REQUEST = -32600
METHOD_NOT_FOUND = -32601
INVALID_PARAMS = -32602
COMPUTATION_FAILED = -32000
ENSEMBLE_NOT_OFFERED = 1001
NOT_AVAILABLE = 1002


class EnsembleNotOffered(Exception):
    """Raise from ``sample`` for an ensemble you do not sample: rmt-assay skips those checks."""

    def __init__(self, ensemble):
        super().__init__("ensemble not offered: %s" % json.dumps(ensemble, sort_keys=True))


class NotAvailable(Exception):
    """Raise from any function for a request you cannot answer (say, complex matrices in a real-only
    code): rmt-assay skips the checks that need it, with your message as the reason."""


class _ProtocolError(Exception):
    def __init__(self, code, message):
        super().__init__(message)
        self.code = code


# ---- matrices ---------------------------------------------------------------------------------

def decode_matrix(wire):
    """{"size", "field", "data"} -> N×N matrix (little-endian float64, row-major, complex as re, im)."""
    try:
        size = wire["size"]
        field = wire["field"]
        raw = base64.b64decode(wire["data"], validate=True)
    except (KeyError, TypeError, ValueError) as error:
        raise _ProtocolError(INVALID_PARAMS, "malformed matrix: %s" % error)
    if not isinstance(size, int) or size < 1 or field not in ("real", "complex"):
        raise _ProtocolError(INVALID_PARAMS, "malformed matrix: size %r, field %r" % (size, field))
    per_entry = 2 if field == "complex" else 1
    if len(raw) != 8 * per_entry * size * size:
        raise _ProtocolError(INVALID_PARAMS, "matrix data holds %d bytes, expected %d" % (len(raw), 8 * per_entry * size * size))
    if _np is not None:
        wire_type = "<c16" if field == "complex" else "<f8"
        native = _np.complex128 if field == "complex" else _np.float64
        return _np.frombuffer(raw, dtype=wire_type).astype(native).reshape(size, size)
    numbers = struct.unpack("<%dd" % (per_entry * size * size), raw)
    if field == "complex":
        numbers = [complex(numbers[2 * k], numbers[2 * k + 1]) for k in range(size * size)]
    return [list(numbers[i * size:(i + 1) * size]) for i in range(size)]


def encode_matrix(matrix):
    """N×N matrix (numpy array or list of rows) -> wire form; complex if any entry is complex."""
    if _np is not None:
        array = _np.asarray(matrix)
        if array.ndim != 2 or array.shape[0] != array.shape[1]:
            raise ValueError("a sampled matrix must be square, not of shape %s" % (array.shape,))
        is_complex = _np.iscomplexobj(array)
        data = _np.ascontiguousarray(array, dtype="<c16" if is_complex else "<f8").tobytes()
        return {"size": int(array.shape[0]), "field": "complex" if is_complex else "real",
                "data": base64.b64encode(data).decode("ascii")}
    rows = [list(row) for row in matrix]
    size = len(rows)
    if any(len(row) != size for row in rows):
        raise ValueError("a sampled matrix must be square")
    is_complex = any(isinstance(x, complex) for row in rows for x in row)
    numbers = []
    for row in rows:
        for x in row:
            numbers.extend((complex(x).real, complex(x).imag) if is_complex else (float(x),))
    data = struct.pack("<%dd" % len(numbers), *numbers)
    return {"size": size, "field": "complex" if is_complex else "real", "data": base64.b64encode(data).decode("ascii")}


# ---- numbers ----------------------------------------------------------------------------------

def _real(x):
    x = float(x)
    if math.isnan(x):
        return "NaN"
    if math.isinf(x):
        return "Infinity" if x > 0 else "-Infinity"
    return x


def _complex_out(z):
    z = complex(z)
    return [_real(z.real), _real(z.imag)]


def _complex_in(pair):
    try:
        re, im = pair
        return complex(float(re), float(im))
    except (TypeError, ValueError):
        raise _ProtocolError(INVALID_PARAMS, "a point must be [re, im], not %r" % (pair,))


# ---- methods ----------------------------------------------------------------------------------

def _param(params, name):
    if name not in params:
        raise _ProtocolError(INVALID_PARAMS, "missing parameter %r" % name)
    return params[name]


def _eigenvalues(f):
    def call(p):
        H = decode_matrix(_param(p, "matrix"))
        return {"values": [_real(x) for x in f(H)]}
    return call


def _resolvent_trace(f):
    def call(p):
        H = decode_matrix(_param(p, "matrix"))
        points = [_complex_in(z) for z in _param(p, "points")]
        weight = decode_matrix(p["weight"]) if p.get("weight") is not None else None
        return {"values": [_complex_out(v) for v in f(H, points, weight)]}
    return call


def _chain_trace(f):
    def call(p):
        H = decode_matrix(_param(p, "matrix"))
        points = [_complex_in(z) for z in _param(p, "points")]
        weights = [decode_matrix(w) for w in _param(p, "weights")]
        return {"value": _complex_out(f(H, points, weights))}
    return call


def _sample(f):
    def call(p):
        args = [_param(p, "ensemble")] + [int(_param(p, name)) for name in ("size", "seed", "count")]
        return {"matrices": [encode_matrix(m) for m in f(*args)]}
    return call


def _chain_in(chain):
    points = [_complex_in(z) for z in _param(chain, "points")]
    weights = [decode_matrix(w) for w in _param(chain, "weights")]
    if len(points) != len(weights):
        raise _ProtocolError(INVALID_PARAMS, "a chain needs as many weights as points")
    return points, weights


def _covariance(f):
    def call(p):
        return {"value": _complex_out(f(_param(p, "ensemble"), _chain_in(_param(p, "left")), _chain_in(_param(p, "right"))))}
    return call


def _sample_statistics(f):
    def call(p):
        args = [_param(p, "ensemble")] + [int(_param(p, name)) for name in ("size", "seed", "count")]
        chains = [_chain_in(c) for c in _param(p, "statistics")]
        return {"values": [[_complex_out(v) for v in row] for row in f(*args, chains)]}
    return call


# Wire params -> your function -> wire result, for each method.
_ADAPTERS = {"eigenvalues": _eigenvalues, "resolvent_trace": _resolvent_trace,
             "chain_trace": _chain_trace, "sample": _sample,
             "covariance": _covariance, "sample_statistics": _sample_statistics}


def _dispatchers(functions):
    return {method: _ADAPTERS[method](f) for method, f in functions.items() if f is not None}


def _answer(table, describe, request):
    if not isinstance(request, dict) or request.get("jsonrpc") != "2.0" or not isinstance(request.get("method"), str):
        raise _ProtocolError(INVALID_REQUEST, "not a JSON-RPC 2.0 request")
    method = request["method"]
    if method == "describe":
        return describe
    if method not in table:
        raise _ProtocolError(METHOD_NOT_FOUND, "method not found: %s" % method)
    params = request.get("params")
    if not isinstance(params, dict):
        raise _ProtocolError(INVALID_PARAMS, "%s needs params as an object" % method)
    return table[method](params)


def serve(name, version, eigenvalues=None, resolvent_trace=None, chain_trace=None, sample=None,
          covariance=None, sample_statistics=None):
    """Answers requests on stdin until it closes. Never returns before that."""
    functions = {"eigenvalues": eigenvalues, "resolvent_trace": resolvent_trace,
                 "chain_trace": chain_trace, "sample": sample,
                 "covariance": covariance, "sample_statistics": sample_statistics}
    table = _dispatchers(functions)
    describe = {"name": str(name), "version": str(version), "capabilities": sorted(table)}
    out = sys.stdout
    # Anything your code prints goes to stderr, which rmt-assay logs; stdout carries only answers.
    sys.stdout = sys.stderr

    def send(message):
        out.write(json.dumps(message, allow_nan=False, separators=(",", ":")) + "\n")
        out.flush()

    for line in iter(sys.stdin.buffer.readline, b""):
        if not line.strip():
            continue
        try:
            request = json.loads(line)
        except ValueError as error:
            send({"jsonrpc": "2.0", "id": None, "error": {"code": PARSE_ERROR, "message": "parse error: %s" % error}})
            continue
        request_id = request.get("id") if isinstance(request, dict) else None
        try:
            send({"jsonrpc": "2.0", "id": request_id, "result": _answer(table, describe, request)})
        except EnsembleNotOffered as error:
            send({"jsonrpc": "2.0", "id": request_id, "error": {"code": ENSEMBLE_NOT_OFFERED, "message": str(error)}})
        except NotAvailable as error:
            send({"jsonrpc": "2.0", "id": request_id, "error": {"code": NOT_AVAILABLE, "message": str(error)}})
        except _ProtocolError as error:
            send({"jsonrpc": "2.0", "id": request_id, "error": {"code": error.code, "message": str(error)}})
        except Exception as error:  # the user's computation failed: report it, keep serving
            traceback.print_exc(file=sys.stderr)
            send({"jsonrpc": "2.0", "id": request_id,
                  "error": {"code": COMPUTATION_FAILED, "message": "%s: %s" % (type(error).__name__, error)}})


# ---- answering a recording offline ------------------------------------------------------------

def _resolve_refs(value, matrices):
    if isinstance(value, dict) and set(value) == {"ref"}:
        return matrices[value["ref"]]
    if isinstance(value, list):
        return [_resolve_refs(v, matrices) for v in value]
    return value


def answer_recording(template_path, output_path, name, version, eigenvalues=None, resolvent_trace=None,
                     chain_trace=None, sample=None, covariance=None, sample_statistics=None):
    """Answers every call of a recording with your functions, for results computed away from rmt-assay.

    Make the template with rmt-assay (``rmt-assay check --offer ... --record-to template.json``),
    run this where your code runs (a cluster job), then check the answers with
    ``rmt-assay check --recorded answered.json`` and the same options. A call your functions do not
    cover is answered "not available", so its checks are skipped (adapters/recorded/RECORDING.md).
    """
    functions = {"eigenvalues": eigenvalues, "resolvent_trace": resolvent_trace,
                 "chain_trace": chain_trace, "sample": sample,
                 "covariance": covariance, "sample_statistics": sample_statistics}
    table = _dispatchers(functions)
    with open(template_path) as source:
        template = json.load(source)
    matrices = template.get("matrices", [])
    calls = []
    for call in template["calls"]:
        method = call["method"]
        params = {key: _resolve_refs(value, matrices) for key, value in call["params"].items()}
        answered = {"method": method, "params": call["params"]}
        try:
            if method not in table:
                raise NotAvailable("%s is not offered by %s" % (method, name))
            answered["result"] = table[method](params)
        except EnsembleNotOffered as error:
            answered["error"] = {"code": ENSEMBLE_NOT_OFFERED, "message": str(error)}
        except NotAvailable as error:
            answered["error"] = {"code": NOT_AVAILABLE, "message": str(error)}
        except Exception as error:  # the computation failed: recorded as such, the others go on
            traceback.print_exc(file=sys.stderr)
            answered["error"] = {"code": COMPUTATION_FAILED, "message": "%s: %s" % (type(error).__name__, error)}
        calls.append(answered)
    answered_recording = dict(template, implementation={"name": str(name), "version": str(version)},
                              capabilities=sorted(set(template["capabilities"]) & set(table)), calls=calls)
    with open(output_path, "w") as target:
        json.dump(answered_recording, target, allow_nan=False, separators=(",", ":"))
