import { decimalCell } from '../high-precision/decimal-cell.js';
import { decimalDoubleDouble } from '../high-precision/decimal-double-double.js';
import { type DoubleDouble, dd } from '../high-precision/double-double.js';
import { cumulantSummary, tracyWidomRawMoments, tracyWidomValues } from '../high-precision/tracy-widom-double-double.js';
import type { Cell, ReferenceTableContent } from '../reference-table.js';
import { BORNEMANN_2010_FREDHOLM, BORNEMANN_2010_REVIEW, FERRARI_SPOHN_2005, TRACY_WIDOM_1994, TRACY_WIDOM_1996 } from '../sources.js';
import { runGeneratorIfMain } from './run-generator.js';
import { tableColumns } from './table-columns.js';

/** Nyström nodes and moment-quadrature nodes per panel: the table's discretisation, and a finer one to certify it. */
export const TRACY_WIDOM_DISCRETISATIONS = { table: { nodes: 64, quadrature: 20 }, check: { nodes: 80, quadrature: 28 } } as const;
/** Significant digits certified; the generator refuses to write unless the two discretisations agree to 2 more. */
export const TRACY_WIDOM_CERTIFIED_DIGITS = 18;
const PRINTED_DIGITS = 20;
/** s = −6, −5.75, …, 6. */
export const TRACY_WIDOM_GRID = Array.from({ length: 49 }, (_, i) => -6 + i / 4);

const SOURCES = [TRACY_WIDOM_1994, TRACY_WIDOM_1996, FERRARI_SPOHN_2005, BORNEMANN_2010_FREDHOLM, BORNEMANN_2010_REVIEW];

const ARITHMETIC = 'double-double (about 32 significant digits) from IEEE double operations only; constants from decimal.js at 50 digits';

const conventions = {
  normalisation:
    'Tracy and Widom\u2019s: F_β(s) = lim P(N^{2/3}(λ_max − 2) ≤ s) for GOE (β = 1) and GUE (β = 2) scaled to the semicircle on [−2, 2] (THEORY.md, "Edge"); F4 in Tracy and Widom\u2019s 1996 normalisation (mean ≈ −2.3069), whose relation to a GSE sample depends on how its quaternion entries are scaled',
  beta: [1, 2, 4],
  notes:
    'F1(s) = det(I − B_s), F2(s) = det(I − B_s)·det(I + B_s), F4(s) = (det(I − B_{√2 s}) + det(I + B_{√2 s}))/2, B_t(u, v) = Ai(t + u + v) on L²(0, ∞)',
};

function production(what: string) {
  return {
    generator: 'tracy-widom.generate.ts',
    method: `${what}: Nyström discretisation of the Fredholm determinants with ${TRACY_WIDOM_DISCRETISATIONS.table.nodes}-point Gauss–Legendre quadrature on L²(0, max(4, 16 − t)) (Bornemann 2010, Math. Comp. 79), LDLᵀ in double-double; Ai from its Maclaurin series and asymptotic expansion through a Taylor table`,
    arithmetic: ARITHMETIC,
    precision: `printed to ${PRINTED_DIGITS} significant digits; recomputed with ${TRACY_WIDOM_DISCRETISATIONS.check.nodes} Nyström nodes (and ${TRACY_WIDOM_DISCRETISATIONS.check.quadrature} quadrature nodes per panel for the moments), every value agrees to at least ${TRACY_WIDOM_CERTIFIED_DIGITS + 2} significant digits`,
    tool: 'rmt-assay reference-values/high-precision (double-double arithmetic, Airy function, Gauss–Legendre rule, LDLᵀ)',
  };
}

const certification = `two discretisations agree to at least ${TRACY_WIDOM_CERTIFIED_DIGITS + 2} significant digits (checked on every regeneration); certified to ${TRACY_WIDOM_CERTIFIED_DIGITS}, leaving two digits for the Airy function's error (≤ 1e-24 absolute) and the operator cut (≤ 1e-35). test/reference-values checks the moments against the published digits (Bornemann 2010; THEORY.md) and F2 against an independent 30-digit evaluation of det(I − K_Ai) with mpmath where present`;

const toText = (x: DoubleDouble): string => decimalCell(decimalDoubleDouble.toDecimal(x), PRINTED_DIGITS);

/** Throws unless a agrees with b to `digits` significant digits (relative to |b|). */
function expectAgreement(label: string, a: DoubleDouble, b: DoubleDouble, digits: number): void {
  const x = decimalDoubleDouble.toDecimal(a);
  const y = decimalDoubleDouble.toDecimal(b);
  const scale = y.abs();
  if (x.minus(y).abs().gt(scale.times(`1e-${digits}`))) {
    throw new Error(`tracy-widom: ${label} is ${x.toSignificantDigits(30).toString()} with the table's discretisation but ${y.toSignificantDigits(30).toString()} with the finer one: fewer than ${digits} digits agree`);
  }
}

function momentRows(): Cell[][] {
  const { table, check } = TRACY_WIDOM_DISCRETISATIONS;
  const coarse = tracyWidomRawMoments(table.nodes, table.quadrature);
  const fine = tracyWidomRawMoments(check.nodes, check.quadrature);
  const root2 = dd.sqrt(dd.of(2));
  const laws = [
    [1, 'f1', dd.of(1)],
    [2, 'f2', dd.of(1)],
    [4, 'g', root2], // F4(s) = G(√2 s): T ~ G, X4 = T/√2
  ] as const;
  return laws.map(([beta, law, scale]) => {
    const a = cumulantSummary(coarse[law], scale);
    const b = cumulantSummary(fine[law], scale);
    const names = ['mean', 'variance', 'skewness', 'excessKurtosis'] as const;
    for (const name of names) expectAgreement(`β = ${beta} ${name}`, a[name], b[name], TRACY_WIDOM_CERTIFIED_DIGITS + 2);
    return [beta, ...names.map((name) => toText(a[name]))];
  });
}

function distributionRows(): Cell[][] {
  const { table, check } = TRACY_WIDOM_DISCRETISATIONS;
  const root2 = dd.sqrt(dd.of(2));
  return TRACY_WIDOM_GRID.map((s) => {
    const t = dd.of(s);
    const t4 = dd.mulNumber(root2, s);
    const values = [tracyWidomValues(t, table.nodes), tracyWidomValues(t4, table.nodes)];
    const checks = [tracyWidomValues(t, check.nodes), tracyWidomValues(t4, check.nodes)];
    const cells = [values[0].f1, values[0].f2, values[1].g];
    [checks[0].f1, checks[0].f2, checks[1].g].forEach((c, i) => expectAgreement(`F${[1, 2, 4][i]}(${s})`, cells[i], c, TRACY_WIDOM_CERTIFIED_DIGITS + 2));
    return [s, ...cells.map(toText)];
  });
}

export function tracyWidomMomentsTable(): ReferenceTableContent {
  return {
    name: 'tracy-widom-moments',
    title: 'Mean, variance, skewness and excess kurtosis of the Tracy–Widom distributions F1, F2, F4',
    quantity: {
      symbol: 'E X, Var X, skewness, excess kurtosis of X ~ F_β',
      definition: 'the first four cumulants (standardised) of the limit law of the rescaled largest eigenvalue',
      conventions,
    },
    sources: SOURCES,
    production: production('E X^n = n∫_0^∞ t^{n−1}(1 − F) dt − n∫_{−∞}^0 t^{n−1} F dt on panels of [−12, 22] with Gauss–Legendre rules, F from'),
    certifiedDigits: TRACY_WIDOM_CERTIFIED_DIGITS,
    certification,
    columns: tableColumns(
      { beta: ['number', 'Dyson index 1, 2 or 4'] },
      {
        mean: ['decimal', 'E X'],
        variance: ['decimal', 'Var X'],
        skewness: ['decimal', 'E(X − EX)³/Var^{3/2}'],
        excess_kurtosis: ['decimal', 'E(X − EX)⁴/Var² − 3'],
      },
    ),
    rows: momentRows(),
  };
}

export function tracyWidomDistributionsTable(): ReferenceTableContent {
  return {
    name: 'tracy-widom-distributions',
    title: 'Tracy–Widom distribution functions F1, F2, F4 on s = −6, −5.75, …, 6',
    quantity: { symbol: 'F_β(s)', definition: 'the distribution function of the limit law of the rescaled largest eigenvalue', conventions },
    sources: SOURCES,
    production: production('F_β(s) at each grid point'),
    certifiedDigits: TRACY_WIDOM_CERTIFIED_DIGITS,
    certification,
    columns: tableColumns(
      { s: ['number', 'the argument'] },
      { F1: ['decimal', 'F1(s), β = 1'], F2: ['decimal', 'F2(s), β = 2'], F4: ['decimal', 'F4(s), β = 4'] },
    ),
    rows: distributionRows(),
  };
}

runGeneratorIfMain(import.meta.url, [tracyWidomMomentsTable, tracyWidomDistributionsTable]);
