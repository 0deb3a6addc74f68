import type { Citation } from './citation.js';

/**
 * The sources of the reference values, one named constant each. Bibliographic details that were
 * not checked against the printed source while writing are marked "from memory" in `note`; the
 * mathematical statements they support are verified independently in test/reference-values/.
 */

const FROM_MEMORY = 'bibliographic details (pages, DOI) from memory';

export const WIGNER_1955: Citation = {
  authors: 'E. P. Wigner',
  year: 1955,
  title: 'Characteristic vectors of bordered matrices with infinite dimensions',
  venue: 'Annals of Mathematics 62(3), 548–564',
  doi: '10.2307/1970079',
  note: FROM_MEMORY,
};

export const WIGNER_1958: Citation = {
  authors: 'E. P. Wigner',
  year: 1958,
  title: 'On the distribution of the roots of certain symmetric matrices',
  venue: 'Annals of Mathematics 67(2), 325–327',
  doi: '10.2307/1970008',
  note: FROM_MEMORY,
};

export const OEIS_A000108: Citation = {
  authors: 'N. J. A. Sloane (ed.)',
  year: 2024,
  title: 'Catalan numbers: C(n) = binomial(2n,n)/(n+1) = (2n)!/(n!(n+1)!)',
  venue: 'The On-Line Encyclopedia of Integer Sequences',
  locator: 'sequence A000108',
  note: 'year is that of consultation; terms quoted in tests are re-derived there from the binomial formula',
};

export const ANDERSON_GUIONNET_ZEITOUNI_2010: Citation = {
  authors: 'G. W. Anderson, A. Guionnet and O. Zeitouni',
  year: 2010,
  title: 'An Introduction to Random Matrices',
  venue: 'Cambridge Studies in Advanced Mathematics 118, Cambridge University Press',
  locator: 'Theorem 2.1.1 (semicircle law, Catalan moments), Section 2.4 (Stieltjes transform)',
  doi: '10.1017/CBO9780511801334',
  note: 'theorem and section numbers from memory',
};

export const HARER_ZAGIER_1986: Citation = {
  authors: 'J. Harer and D. Zagier',
  year: 1986,
  title: 'The Euler characteristic of the moduli space of curves',
  venue: 'Inventiones Mathematicae 85(3), 457–485',
  locator: 'recursion for the Gaussian unitary moments',
  doi: '10.1007/BF01390325',
  note: FROM_MEMORY,
};

export const LEDOUX_2009: Citation = {
  authors: 'M. Ledoux',
  year: 2009,
  title: 'A recursion formula for the moments of the Gaussian orthogonal ensemble',
  venue: 'Annales de l\u2019Institut Henri Poincaré, Probabilités et Statistiques 45(3), 754–769',
  doi: '10.1214/08-AIHP184',
  note: FROM_MEMORY,
};

export const GOULDEN_JACKSON_1997: Citation = {
  authors: 'I. P. Goulden and D. M. Jackson',
  year: 1997,
  title: 'Maps in locally orientable surfaces and integrals over real symmetric matrices',
  venue: 'Canadian Journal of Mathematics 49(5), 865–882',
  note: 'details from memory; DOI not recorded',
};

export const ISSERLIS_1918: Citation = {
  authors: 'L. Isserlis',
  year: 1918,
  title:
    'On a formula for the product-moment coefficient of any order of a normal frequency distribution in any number of variables',
  venue: 'Biometrika 12(1/2), 134–139',
  doi: '10.1093/biomet/12.1-2.134',
  note: FROM_MEMORY,
};

export const BAI_YAO_2005: Citation = {
  authors: 'Z. D. Bai and J. Yao',
  year: 2005,
  title: 'On the convergence of the spectral empirical process of Wigner matrices',
  venue: 'Bernoulli 11(6), 1059–1092',
  locator: 'Theorem 1.1 (mean and covariance of the limiting Gaussian process)',
  doi: '10.3150/bj/1137421640',
  note: 'theorem number, pages and DOI from memory',
};

export const BAI_SILVERSTEIN_2010: Citation = {
  authors: 'Z. D. Bai and J. W. Silverstein',
  year: 2010,
  title: 'Spectral Analysis of Large Dimensional Random Matrices, 2nd edition',
  venue: 'Springer Series in Statistics, Springer, New York',
  locator: 'Chapter 9 (CLT for linear spectral statistics)',
  doi: '10.1007/978-1-4419-0661-8',
  note: FROM_MEMORY,
};

export const JOHANSSON_1998: Citation = {
  authors: 'K. Johansson',
  year: 1998,
  title: 'On fluctuations of eigenvalues of random Hermitian matrices',
  venue: 'Duke Mathematical Journal 91(1), 151–204',
  doi: '10.1215/S0012-7094-98-09108-6',
  note: FROM_MEMORY,
};

export const LYTOVA_PASTUR_2009: Citation = {
  authors: 'A. Lytova and L. Pastur',
  year: 2009,
  title: 'Central limit theorem for linear eigenvalue statistics of random matrices with independent entries',
  venue: 'Annals of Probability 37(5), 1778–1840',
  doi: '10.1214/09-AOP452',
  note: FROM_MEMORY,
};

export const KHORUNZHY_KHORUZHENKO_PASTUR_1996: Citation = {
  authors: 'A. M. Khorunzhy, B. A. Khoruzhenko and L. A. Pastur',
  year: 1996,
  title: 'Asymptotic properties of large random matrices with independent entries',
  venue: 'Journal of Mathematical Physics 37(10), 5033–5060',
  doi: '10.1063/1.531589',
  note: FROM_MEMORY,
};

export const GOTZE_TIKHOMIROV_2016: Citation = {
  authors: 'F. Götze and A. Tikhomirov',
  year: 2016,
  title: 'Optimal bounds for convergence of expected spectral distributions to the semi-circular law',
  venue: 'Probability Theory and Related Fields 165, 163–233',
  locator: 'main theorem: sup_x |E F_N(x) − F_sc(x)| = O(N^{-1}) under a fourth-moment and truncation condition',
  note: 'statement checked against the arXiv abstract (arXiv:1405.7820); pages and DOI not recorded (from memory)',
};

export const GOTZE_TIKHOMIROV_EMPIRICAL: Citation = {
  authors: 'F. Götze and A. Tikhomirov',
  year: 2014,
  title: 'Rate of convergence of the empirical spectral distribution function to the semi-circular law',
  venue: 'arXiv:1407.2780 [math.PR]',
  locator: 'abstract: sup_x |F_N(x) − F_sc(x)| = O(N^{-1} log^5 N) with high probability, eight moments',
  note: 'preprint version; the journal version was not checked',
};

export const ERDOS_YAU_YIN_2012: Citation = {
  authors: 'L. Erdős, H.-T. Yau and J. Yin',
  year: 2012,
  title: 'Rigidity of eigenvalues of generalized Wigner matrices',
  venue: 'Advances in Mathematics 229(3), 1435–1515',
  locator: 'rigidity theorem: eigenvalues within N^{-2/3} (edge) to N^{-1} (bulk) of their classical locations, up to (log N)^{O(log log N)}',
  doi: '10.1016/j.aim.2011.12.010',
  note: FROM_MEMORY,
};

export const ABRAMOWITZ_STEGUN_1964: Citation = {
  authors: 'M. Abramowitz and I. A. Stegun (eds.)',
  year: 1964,
  title: 'Handbook of Mathematical Functions with Formulas, Graphs, and Mathematical Tables',
  venue: 'National Bureau of Standards, Applied Mathematics Series 55',
  locator: 'eq. 9.6.10 (power series of I_ν), eq. 9.6.34 (generating function e^{z cos θ})',
  note: 'equation 9.6.34 number from memory',
};

export const TREFETHEN_WEIDEMAN_2014: Citation = {
  authors: 'L. N. Trefethen and J. A. C. Weideman',
  year: 2014,
  title: 'The exponentially convergent trapezoidal rule',
  venue: 'SIAM Review 56(3), 385–458',
  doi: '10.1137/130932132',
  note: FROM_MEMORY,
};

export const TREFETHEN_2013: Citation = {
  authors: 'L. N. Trefethen',
  year: 2013,
  title: 'Approximation Theory and Approximation Practice',
  venue: 'SIAM, Philadelphia',
  locator: 'Chapters 3 (Chebyshev coefficients) and 8 (convergence for analytic functions)',
  note: 'chapter numbers from memory',
};

export const KAHAN_1987: Citation = {
  authors: 'W. Kahan',
  year: 1987,
  title: 'Branch cuts for complex elementary functions, or much ado about nothing\u2019s sign bit',
  venue: 'The State of the Art in Numerical Analysis (A. Iserles and M. J. D. Powell, eds.), Clarendon Press, 165–211',
  note: FROM_MEMORY,
};

export const STEIN_1981: Citation = {
  authors: 'C. M. Stein',
  year: 1981,
  title: 'Estimation of the mean of a multivariate normal distribution',
  venue: 'Annals of Statistics 9(6), 1135–1151',
  locator: 'Lemma 1 (Gaussian integration by parts)',
  doi: '10.1214/aos/1176345632',
  note: FROM_MEMORY,
};

export const DUMITRIU_EDELMAN_2002: Citation = {
  authors: 'I. Dumitriu and A. Edelman',
  year: 2002,
  title: 'Matrix models for beta ensembles',
  venue: 'Journal of Mathematical Physics 43(11), 5830–5847',
  locator: 'the tridiagonal model: diagonal N(0, 2), off-diagonal χ_{β(n−i)}, up to a common scale',
  doi: '10.1063/1.1507823',
  note: FROM_MEMORY,
};

export const TRACY_WIDOM_1994: Citation = {
  authors: 'C. A. Tracy and H. Widom',
  year: 1994,
  title: 'Level-spacing distributions and the Airy kernel',
  venue: 'Communications in Mathematical Physics 159, 151–174',
  doi: '10.1007/BF02100489',
  note: FROM_MEMORY,
};

export const TRACY_WIDOM_1996: Citation = {
  authors: 'C. A. Tracy and H. Widom',
  year: 1996,
  title: 'On orthogonal and symplectic matrix ensembles',
  venue: 'Communications in Mathematical Physics 177, 727–754',
  doi: '10.1007/BF02099545',
  note: FROM_MEMORY,
};

export const FERRARI_SPOHN_2005: Citation = {
  authors: 'P. L. Ferrari and H. Spohn',
  year: 2005,
  title: 'A determinantal formula for the GOE Tracy–Widom distribution',
  venue: 'Journal of Physics A 38(33), L557–L561',
  locator: 'F1(s) = det(I − B_s) on L²(0, ∞), B_s(x, y) = Ai(x + y + s)',
  doi: '10.1088/0305-4470/38/33/L02',
  note: FROM_MEMORY,
};

export const BORNEMANN_2010_FREDHOLM: Citation = {
  authors: 'F. Bornemann',
  year: 2010,
  title: 'On the numerical evaluation of Fredholm determinants',
  venue: 'Mathematics of Computation 79(270), 871–915',
  locator: 'Nyström discretisation with Gauss–Legendre quadrature; exponential convergence for analytic kernels',
  doi: '10.1090/S0025-5718-09-02280-7',
  note: FROM_MEMORY,
};

export const BORNEMANN_2010_REVIEW: Citation = {
  authors: 'F. Bornemann',
  year: 2010,
  title: 'On the numerical evaluation of distributions in random matrix theory: a review',
  venue: 'Markov Processes and Related Fields 16, 803–866 (arXiv:0904.1581)',
  locator: 'determinantal formulas for F1, F2, F4; table of mean, variance, skewness and excess kurtosis',
  note: 'table and equation numbers not checked (from memory); the digits quoted are those of THEORY.md and of widely reproduced copies of the table',
};

export const DLMF_2010: Citation = {
  authors: 'F. W. J. Olver, D. W. Lozier, R. F. Boisvert and C. W. Clark (eds.)',
  year: 2010,
  title: 'NIST Handbook of Mathematical Functions',
  venue: 'Cambridge University Press (online as the Digital Library of Mathematical Functions)',
  locator: '§5.11 (Stirling series), §9.4 (Maclaurin series of Ai), §9.7 (asymptotic expansion of Ai), §10.25 (series of I_ν)',
  note: 'section numbers from memory',
};

export const NIST_STRD: Citation = {
  authors: 'National Institute of Standards and Technology, Information Technology Laboratory',
  year: 1999,
  title: 'Statistical Reference Datasets (StRD)',
  venue: 'NIST, Gaithersburg, MD (web collection of datasets with certified values)',
  locator: 'the log relative error (LRE) used to score computed against certified values',
  note: 'year of release from memory',
};

export const MCCULLOUGH_1998: Citation = {
  authors: 'B. D. McCullough',
  year: 1998,
  title: 'Assessing the reliability of statistical software: Part I',
  venue: 'The American Statistician 52(4), 358–366',
  locator: 'the LRE as the number of correct significant digits, capped at the certified digits',
  doi: '10.1080/00031305.1998.10480595',
  note: FROM_MEMORY,
};

export const HE_KNOWLES_2017: Citation = {
  authors: 'Y. He and A. Knowles',
  year: 2017,
  title: 'Mesoscopic eigenvalue statistics of Wigner matrices',
  venue: 'Annals of Applied Probability 27(3), 1510–1550',
  locator: 'the limiting variance (1/(2βπ²)) ∫∫ ((f(x) − f(y))/(x − y))² dx dy of Tr f(N^γ(H − E))',
  doi: '10.1214/16-AAP1237',
  note: FROM_MEMORY,
};

export const BOUTET_DE_MONVEL_KHORUNZHY_1999: Citation = {
  authors: 'A. Boutet de Monvel and A. Khorunzhy',
  year: 1999,
  title: 'Asymptotic distribution of smoothed eigenvalue density. I. Gaussian random matrices',
  venue: 'Random Operators and Stochastic Equations 7(1), 1–22',
  note: 'details from memory; DOI not recorded',
};

export const MCCULLAGH_1987: Citation = {
  authors: 'P. McCullagh',
  year: 1987,
  title: 'Tensor Methods in Statistics',
  venue: 'Chapman and Hall, London (Monographs on Statistics and Applied Probability 29)',
  locator: 'ch. 2 (joint cumulants as sums over set partitions of products of moments), ch. 4 (k-statistics)',
  note: 'chapter numbers from memory',
};

export const COOLEY_TUKEY_1965: Citation = {
  authors: 'J. W. Cooley and J. W. Tukey',
  year: 1965,
  title: 'An algorithm for the machine calculation of complex Fourier series',
  venue: 'Mathematics of Computation 19(90), 297–301',
  doi: '10.1090/S0025-5718-1965-0178586-1',
  note: FROM_MEMORY,
};

export const DE_BOOR_2005: Citation = {
  authors: 'C. de Boor',
  year: 2005,
  title: 'Divided differences',
  venue: 'Surveys in Approximation Theory 1, 46–69',
  locator: 'the contour-integral (Hermite) representation and the Leibniz rule',
  note: FROM_MEMORY,
};
