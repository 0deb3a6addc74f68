import type { Adapter } from '../../../adapters/adapter.js';
import { conj, type Complex } from '../../../harness/numeric/complex.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { mutantAdapter, reference } from '../../support/mutant-adapter.js';

function scaledTraces(traces: Complex[], factor: number): Complex[] {
  return traces.map((t) => ({ re: t.re * factor, im: t.im * factor }));
}

/** Aᵀ without conjugation (a real matrix's adjoint, a complex matrix's wrong one). */
function transpose(a: SquareMatrix): SquareMatrix {
  const n = a.size;
  const stride = a.field === 'complex' ? 2 : 1;
  const data = new Float64Array(a.data.length);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      for (let p = 0; p < stride; p++) data[stride * (j * n + i) + p] = a.data[stride * (i * n + j) + p];
    }
  }
  return { ...a, data };
}

/** The matrix stored in single precision and read back. */
function single(m: SquareMatrix): SquareMatrix {
  return { ...m, data: Float64Array.from(Float32Array.from(m.data)) };
}

function singlePoint(z: Complex): Complex {
  return { re: Math.fround(z.re), im: Math.fround(z.im) };
}

/** The identities suite's mutants: each must fail it, with a failing check whose id matches `broken`. */
export const IDENTITIES_MUTANTS: ReadonlyArray<{ readonly name: string; readonly adapter: Adapter; readonly broken: RegExp }> = [
  {
    // G(z̄) in place of G(z): the sign of Im⟨G⟩ flips.
    name: 'conjugated spectral parameter',
    adapter: mutantAdapter('conjugated-z', {
      resolventTrace: (m, points, w) => reference.resolventTrace(m, points.map(conj), w),
      chainTrace: (m, points, ws) => reference.chainTrace(m, points.map(conj), ws),
    }),
    broken: /herglotz-sign/,
  },
  {
    name: 'Tr instead of Tr/N',
    adapter: mutantAdapter('unnormalised trace', {
      resolventTrace: async (m, points, w) => scaledTraces(await reference.resolventTrace(m, points, w), m.size),
    }),
    broken: /agreement\/resolvent-trace|spectral-sum|resolvent-identity/,
  },
  {
    name: 'chain normalised by N − 1',
    adapter: mutantAdapter('N − 1 chain', {
      chainTrace: async (m, points, ws) => {
        const t = await reference.chainTrace(m, points, ws);
        return { re: (t.re * m.size) / (m.size - 1), im: (t.im * m.size) / (m.size - 1) };
      },
    }),
    broken: /ward-identity|resolvent-identity|agreement\/chain-trace/,
  },
  {
    name: 'weight ignored',
    adapter: mutantAdapter('weightless', { resolventTrace: (m, points) => reference.resolventTrace(m, points) }),
    broken: /weight-linearity/,
  },
  {
    // Invisible for real symmetric H with one resolvent (Tr(GAᵀ) = Tr(AG) when Gᵀ = G); complex H shows it.
    name: 'weight transposed',
    adapter: mutantAdapter('transposed weight', {
      resolventTrace: (m, points, w) => reference.resolventTrace(m, points, w === undefined ? undefined : transpose(w)),
    }),
    broken: /agreement\/resolvent-trace|conjugation-symmetry/,
  },
  {
    // Cyclicity and the two-link identities cannot see it (a reversed two-link chain is a rotation); k ≥ 3 can.
    name: 'chain in reversed order',
    adapter: mutantAdapter('reversed chain', {
      chainTrace: (m, points, ws) => reference.chainTrace(m, [...points].reverse(), [...ws].reverse()),
    }),
    broken: /agreement\/chain-trace/,
  },
  {
    name: 'one eigenvalue dropped',
    adapter: mutantAdapter('dropped eigenvalue', { eigenvalues: async (m) => (await reference.eigenvalues(m)).slice(1) }),
    broken: /eigenvalues\/count/,
  },
  {
    // Count and order stay right: the largest eigenvalue is replaced by a copy of the next one.
    name: 'one eigenvalue duplicated',
    adapter: mutantAdapter('duplicated eigenvalue', {
      eigenvalues: async (m) => {
        const values = await reference.eigenvalues(m);
        values[values.length - 1] = values[values.length - 2];
        return values;
      },
    }),
    broken: /eigenvalues\/trace|eigenvalues\/sum-of-squares/,
  },
  {
    name: 'eigenvalues unsorted',
    adapter: mutantAdapter('descending eigenvalues', { eigenvalues: async (m) => (await reference.eigenvalues(m)).reverse() }),
    broken: /eigenvalues\/ascending/,
  },
  {
    // Inputs and outputs rounded through single precision: right to 7 digits, not 16.
    name: 'float32 passed off as float64',
    adapter: mutantAdapter('single precision', {
      eigenvalues: async (m) => Float64Array.from(Float32Array.from(await reference.eigenvalues(single(m)))),
      resolventTrace: async (m, points, w) =>
        (await reference.resolventTrace(single(m), points.map(singlePoint), w === undefined ? undefined : single(w))).map(singlePoint),
      chainTrace: async (m, points, ws) => singlePoint(await reference.chainTrace(single(m), points.map(singlePoint), ws.map(single))),
    }),
    broken: /agreement\/eigenvalues/,
  },
];
