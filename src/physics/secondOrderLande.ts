/**
 * The second-order effective Landé factor G of a dipole line: the quantity
 * that, with g_eff, carries a line's Zeeman pattern into the weak-field
 * linear polarization (Stokes Q and U ∝ G·Δλ_B²·∂²I/∂λ², where Stokes V
 * ∝ g_eff·Δλ_B·∂I/∂λ).
 *
 * Formula (E. Landi Degl'Innocenti and M. Landolfi, "Polarization in
 * Spectral Lines" (2004), §3.4, eq. 3.47 or near; from memory):
 *
 *     G = ḡ² − δ,   δ = (g_u − g_l)² (16s − 7d² − 4)/80,
 *     s = J_u(J_u+1) + J_l(J_l+1),   d = J_u(J_u+1) − J_l(J_l+1),
 *
 * with ḡ = g_eff = (g_u + g_l)/2 + (g_u − g_l)d/4 (linePattern.ts). It is
 * the second moment of the pattern: with the strength-weighted mean of the
 * squared Lorentz-unit shift within each group of components, ⟨Δ²⟩_q,
 * G = (⟨Δ²⟩_{+1} + ⟨Δ²⟩_{−1})/2 − ⟨Δ²⟩_0; checked against that direct sum
 * for fourteen (J_u, J_l) pairs with symbolic g values (sympy,
 * test/fixtures/angular-sympy.json). A J = 0 level has g = 0, and then
 * δ = 0: G = g_eff² (textbook).
 *
 * Selection rules: dipole lines (E1, M1: rank 1) only; G has no standard
 * meaning for a line of higher rank (callers give null and
 * G_NOT_DEFINED_NOTE). Exact: yes with the exact LS g values
 * (secondOrderLandeExact); with measured g values it is a decimal.
 *
 * Worked examples (textbook; the two solar magnetograph lines): Fe I
 * 525.02 nm (z ⁷D°1, g = 3 → a ⁵D0): G = 9; Fe I 630.25 nm (z ⁵P°1,
 * g = 5/2 → e ⁵D0): G = 25/4. Na D2 (²P3/2, g = 4/3 → ²S1/2, g = 2):
 * g_eff = 7/6, δ = (4/9)(16·9/2 − 7·9 − 4)/80 = 1/36, G = 49/36 − 1/36 = 4/3.
 */
import { Dec } from "./decimal.js";
import { Rational } from "./rational.js";

/** Why a line of rank above 1 has no G (shown where the number would be). */
export const G_NOT_DEFINED_NOTE =
  "not defined for this multipole: G is the second moment of the σ and π components of a dipole (E1 or M1) line";

function jj1(J2: number): Rational {
  return Rational.of(J2 * (J2 + 2), 4);
}

/** G with exact g values (null g: a J = 0 level, g = 0). */
export function secondOrderLandeExact(upper: { J2: number; g: Rational | null }, lower: { J2: number; g: Rational | null }): Rational {
  const gu = upper.g ?? Rational.ZERO;
  const gl = lower.g ?? Rational.ZERO;
  const s = jj1(upper.J2).add(jj1(lower.J2));
  const d = jj1(upper.J2).sub(jj1(lower.J2));
  const diff = gu.sub(gl);
  const gBar = gu.add(gl).div(Rational.of(2)).add(diff.mul(d).div(Rational.of(4)));
  const delta = diff.mul(diff).mul(Rational.of(16).mul(s).sub(Rational.of(7).mul(d).mul(d)).sub(Rational.of(4))).div(Rational.of(80));
  return gBar.mul(gBar).sub(delta);
}

/** G with the g values in use (measured where given; null g: a J = 0 level, g = 0). Not exact when g is measured. */
export function secondOrderLande(upper: { J2: number; g: Dec | null }, lower: { J2: number; g: Dec | null }): Dec {
  const gu = upper.g ?? new Dec(0);
  const gl = lower.g ?? new Dec(0);
  const s = jj1(upper.J2).add(jj1(lower.J2)).toDecimal();
  const d = jj1(upper.J2).sub(jj1(lower.J2)).toDecimal();
  const diff = gu.sub(gl);
  const gBar = gu.add(gl).div(2).add(diff.mul(d).div(4));
  const delta = diff.mul(diff).mul(s.mul(16).sub(d.mul(d).mul(7)).sub(4)).div(80);
  return gBar.mul(gBar).sub(delta);
}

/**
 * The partial derivatives of G with respect to the two g values, for the
 * first-order propagation of their uncertainties (GUM §5.1; the sensitivity
 * coefficients of physics/uncertain.ts). From G = ḡ² − δ above:
 *
 *     ∂ḡ/∂g_u = 1/2 + d/4,   ∂ḡ/∂g_l = 1/2 − d/4,   K = 16s − 7d² − 4,
 *     ∂G/∂g_u = 2ḡ(1/2 + d/4) − (g_u − g_l)·K/40,
 *     ∂G/∂g_l = 2ḡ(1/2 − d/4) + (g_u − g_l)·K/40,
 *
 * so u(G)² = (∂G/∂g_u·u(g_u))² + (∂G/∂g_l·u(g_l))² + 2·(∂G/∂g_u)(∂G/∂g_l)·u(g_u, g_l)
 * (the covariance from shared inputs is kept by the caller's chain rule).
 * A J = 0 level (g null) has g = 0 exactly; its slope is still returned.
 *
 * Selection rules: as secondOrderLande (dipole lines only). Exact in the
 * working precision: G is a quadratic form in g_u and g_l.
 *
 * Worked examples (by hand from the formula above): Na D2 (J_u = 3/2,
 * g_u = 4/3; J_l = 1/2, g_l = 2): d = 3, s = 9/2, K = 5, ḡ = 7/6, so
 * ∂G/∂g_u = (7/3)(5/4) + (2/3)(5/40) = 3 and ∂G/∂g_l = (7/3)(−1/4) − (2/3)(5/40) = −2/3.
 * A line with a J = 0 lower level (Fe I 525.02 nm, J_u = 1, g_u = 3): K = 0
 * and ḡ = g_u, so ∂G/∂g_u = 2g_u = 6, ∂G/∂g_l = 0, and u(G) = 2·g_u·u(g_u).
 */
export function secondOrderLandeSlopes(upper: { J2: number; g: Dec | null }, lower: { J2: number; g: Dec | null }): { dGdgu: Dec; dGdgl: Dec } {
  const gu = upper.g ?? new Dec(0);
  const gl = lower.g ?? new Dec(0);
  const s = jj1(upper.J2).add(jj1(lower.J2)).toDecimal();
  const d = jj1(upper.J2).sub(jj1(lower.J2)).toDecimal();
  const diff = gu.sub(gl);
  const gBar = gu.add(gl).div(2).add(diff.mul(d).div(4));
  const K = s.mul(16).sub(d.mul(d).mul(7)).sub(4);
  const cross = diff.mul(K).div(40);
  const half = new Dec(1).div(2);
  return {
    dGdgu: gBar.mul(2).mul(half.add(d.div(4))).sub(cross),
    dGdgl: gBar.mul(2).mul(half.sub(d.div(4))).add(cross),
  };
}
