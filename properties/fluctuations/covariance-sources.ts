/** The sources of the covariance references, as the verdicts quote them. */
export const TRACIAL_SOURCE =
  'lim Cov(Tr G(z1), Tr G(z2)) = m1′m2′[(2/β)/(1 − m1m2)² + (σ_d² − 2/β) + 2κ4 m1m2] (Khorunzhy, Khoruzhenko and Pastur 1996, J. Math. Phys. 37; Bai and Silverstein 2010, ch. 9); m on the branch Im m·Im z > 0';

export const CHAIN_SOURCE =
  'identity chains reduce to one-resolvent statistics through G(z1)G(z2) = (G(z1) − G(z2))/(z1 − z2) (derivatives where points coincide), so their covariance is the divided difference of the tracial covariance of Khorunzhy, Khoruzhenko and Pastur 1996 (J. Math. Phys. 37)';

export const WEIGHTED_SOURCE =
  'lim Cov(Tr G(z1)A1, Tr G(z2)A2) = ⟨A1⟩⟨A2⟩·(tracial) + S m1²m2²/(1 − m1m2) + [(σ_d² − 2/β)m1²m2² + κ4 m1³m2³]⟨d(Å1)d(Å2)⟩, S = ⟨Å1Å2⟩ (β = 2) or ⟨Å1Å2⟩ + ⟨Å1Å2ᵀ⟩ (β = 1) (tracial part: Khorunzhy, Khoruzhenko and Pastur 1996; traceless part by cumulant expansion, Bai and Silverstein 2010 ch. 9 method, THEORY.md)';

export const LINEAR_SOURCE =
  'lim Var Tr f(H) = (1/(2β))Σ k c_k² + (σ_d² − 2/β)c_1²/4 + κ4 c_2²/2, c_k the Chebyshev coefficients of f on [−2, 2] (Johansson 1998, Duke Math. J. 91; Bai and Yao 2005, Bernoulli 11; Lytova and Pastur 2009, Ann. Probab. 37), polarised for a covariance';

export const EXACT_POWER_SOURCE =
  'exact finite-N variance by Wick enumeration: GOE Var Tr H³ = 24 + 54/N + 42/N², Var Tr H⁴ = 72 + 304/N + 664/N² + 496/N³; GUE Var Tr H³ = 12 + 3/N², Var Tr H⁴ = 36 + 60/N² (THEORY.md; Isserlis 1918, Biometrika 12)';

export const MEAN_SOURCE =
  'E Tr f(H) − N∫fρ_sc → [β = 1]((f(2) + f(−2))/4 − τ_0(f)/2) + (σ_d² − 2/β)τ_2(f) + κ4 τ_4(f) (Bai and Yao 2005, Bernoulli 11)';

export const RESOLVENT_MEAN_SOURCE =
  'E Tr G(z) − N m(z) → m³/(1 − m²)² + (σ_d² − 2)m³/(1 − m²) + κ4 m⁵/(1 − m²) (real) or (σ_d² − 1)m³/(1 − m²) + κ4 m⁵/(1 − m²) (complex): the resolvent form of Bai and Yao 2005 (Bernoulli 11)';

export const WICK_SOURCE =
  'Wick/Isserlis rule: jointly Gaussian centred variables have no joint cumulant of order ≥ 3, so odd moments vanish and E[X1X2X3X4] is the sum over the three pairings of covariances (Isserlis 1918, Biometrika 12); the trace statistics are asymptotically jointly Gaussian (Khorunzhy, Khoruzhenko and Pastur 1996; Lytova and Pastur 2009)';
