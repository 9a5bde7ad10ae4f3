/**
 * The part of a sublevel's second-order (quadratic) Zeeman coefficient that
 * comes from the fine-structure partners of its level: the other J levels of
 * the same LS term, coupled to it by the Zeeman operator.
 *
 * Model: unperturbed states |(LS)J, I; F mF⟩ with energies E_J + e_F(J),
 * E_J the listed level energy and e_F(J) the level's own hyperfine shift
 * (hyperfine.ts; hyperfine matrix elements between different J are not
 * included). The Zeeman operator (μB/h)·B·(gL·Lz + gS·Sz + gI·Iz) equals
 * (μB/h)·B·[gL·Jz + (gS − gL)·Sz + gI·Iz]; Jz and Iz do not connect
 * different J, so between J and J′ only (gS − gL)·Sz acts, and
 *   β_partners(J, F, mF) = (μB/h)²(gS − gL)² Σ_{J′ ≠ J} Σ_{F′}
 *       |⟨J′ F′ mF|Sz|J F mF⟩|² / ([E_J + e_F(J)] − [E_J′ + e_F′(J′)]),
 *   |⟨J′ F′ m|Sz|J F m⟩|² = (F′ 1 F; −m 0 m)²·(2F+1)(2F′+1)·{J′ F′ I; F J 1}²·|⟨J′‖S‖J⟩|²,
 *   |⟨(LS)J′‖S‖(LS)J⟩|² = (2J+1)(2J′+1)·{S J′ L; J S 1}²·S(S+1)(2S+1).
 * The 6j and 3j symbols leave only J′ = J ± 1 and F′ = F, F ± 1. Without
 * nuclear spin (I = 0) F = J, F′ = J′ and the sum is the familiar
 * Σ_{J′} (μB/h)²(gS − gL)²|⟨J′ mJ|Sz|J mJ⟩|²/(E_J − E_J′).
 * The whole second-order coefficient of the model is this plus the
 * within-J part of quadraticZeeman.ts (hyperfine partners F′ of the same J).
 * A measured gJ does not enter here: the coupling between J levels is the
 * LS one, through gS − gL.
 *
 * References: A. R. Edmonds, "Angular Momentum in Quantum Mechanics"
 * (Princeton, 1957), eqs. (5.4.1), (7.1.7) and (7.1.8) (Wigner–Eckart theorem
 * and reduced elements of a part of a coupled system); E. U. Condon and
 * G. H. Shortley, "The Theory of Atomic Spectra" (1935), §16.3 (second-order
 * Zeeman effect between fine-structure levels). Exact: the squared matrix
 * elements are exact rationals (wigner.ts); the sum is Dec (one division per
 * term). Null when an energy denominator is exactly zero (perturbation theory
 * does not apply).
 *
 * Worked example: 88Sr 5s5p ³P₀ (I = 0) with ³P₁ listed 186.827 cm⁻¹ above
 * (NIST) and ³P₂: only ³P₁ couples; |⟨³P₁ 0|Sz|³P₀ 0⟩|² = 2/3, so
 * β = −(2/3)(gS − gL)²(μB/h)²/(E(³P₁) − E(³P₀)); with gS = 2.00231930436092,
 * gL = 1 − m_e/M(88Sr) (M = 87.9056125 u) and μB/h = 13996244917.1 Hz/T
 * this is −2.34255…e7 Hz/T² = −0.234255 Hz/G² (published: about
 * −0.233 Hz/G², Sr lattice-clock literature).
 */
import { Dec, ZERO } from "../decimal.js";
import { Rational } from "../rational.js";
import { fValues, hyperfineShift } from "../hyperfine.js";
import { sixJ, threeJ } from "../wigner.js";

/** One J level of the term as the sum needs it. */
export interface PartnerLevel {
  /** Doubled J. */
  J2: number;
  /** Level energy E/h, Hz (any common zero). */
  energy: Dec;
  /** Hyperfine constants A/h and B/h, Hz (0 without nuclear spin or when not listed). */
  A: Dec;
  B: Dec;
}

/** The LS term and the constants shared by its levels. */
export interface PartnerTerm {
  /** Doubled S. */
  S2: number;
  /** L (ordinary integer). */
  L: number;
  /** Doubled nuclear spin (0 without). */
  I2: number;
  gL: Dec;
  /** Spin g-factor, atomic sign convention (≈ +2.0023). */
  gS: Dec;
  muB_h: Dec;
}

function ratDec(r: Rational): Dec {
  return new Dec(r.num.toString()).div(new Dec(r.den.toString()));
}

/** |⟨(LS)J′‖S‖(LS)J⟩|², exact. Doubled J values. */
export function spinReducedSquared(S2: number, L: number, J2: number, Jp2: number): Rational {
  const w = sixJ(S2, Jp2, 2 * L, J2, S2, 2);
  if (w.sign === 0) return Rational.ZERO;
  const sss = Rational.of(BigInt(S2) * BigInt(S2 + 2) * BigInt(S2 + 1), 4n); // S(S+1)(2S+1) = (S2/2)(S2/2+1)(S2+1)
  return w.squared.mul(Rational.of((J2 + 1) * (Jp2 + 1))).mul(sss);
}

/**
 * |⟨(J′I)F′ m|Sz|(JI)F m⟩|² for LS levels J, J′ of one term, exact (see the
 * module comment). Doubled arguments.
 *
 * Worked example: 88Sr ³P₀ → ³P₁ (S = 1, L = 1, I = 0, m = 0) gives 2/3.
 */
export function spinZSquaredElement(S2: number, L: number, I2: number, J2: number, F2: number, Jp2: number, Fp2: number, m2: number): Rational {
  const three = threeJ(Fp2, 2, F2, -m2, 0, m2);
  if (three.sign === 0) return Rational.ZERO;
  const six = sixJ(Jp2, Fp2, I2, F2, J2, 2);
  if (six.sign === 0) return Rational.ZERO;
  const reduced = spinReducedSquared(S2, L, J2, Jp2);
  if (reduced.isZero()) return Rational.ZERO;
  return three.squared.mul(six.squared).mul(Rational.of((F2 + 1) * (Fp2 + 1))).mul(reduced);
}

/**
 * β_partners(F, mF) of `level` in Hz/T² from `partners` (the other listed J
 * levels of its term; any whose J differs by more than 1 contributes 0), or
 * null when a denominator vanishes. See the module comment for formula,
 * reference and exactness; worked example there (88Sr ³P₀).
 */
/** One term e²/Δ of the sum: the partner (its index in `partners`), its F′, the exact e² and the gap Δ (Hz). */
interface PartnerSumTerm {
  index: number;
  Fp2: number;
  e2: Rational;
  gap: Dec;
}

/**
 * The non-zero terms of the second-order sum of (F, mF) of `level`, or null
 * when a gap vanishes: the one loop the coefficient and its slopes share.
 */
function partnerSumTerms(term: PartnerTerm, level: PartnerLevel, partners: readonly PartnerLevel[], F2: number, mF2: number): PartnerSumTerm[] | null {
  const { S2, L, I2 } = term;
  if (!fValues(I2, level.J2).includes(F2) || Math.abs(mF2) > F2 || (F2 - mF2) % 2 !== 0) throw new RangeError(`no sublevel F=${F2}/2, mF=${mF2}/2`);
  const own = level.energy.plus(hyperfineShift(level.A, level.B, I2, level.J2, F2));
  const out: PartnerSumTerm[] = [];
  partners.forEach((p, index) => {
    if (p.J2 === level.J2 || Math.abs(p.J2 - level.J2) > 2) return;
    for (const Fp2 of fValues(I2, p.J2)) {
      if (Math.abs(Fp2 - F2) > 2 || Math.abs(mF2) > Fp2) continue;
      const e2 = spinZSquaredElement(S2, L, I2, level.J2, F2, p.J2, Fp2, mF2);
      if (e2.isZero()) continue;
      out.push({ index, Fp2, e2, gap: own.minus(p.energy.plus(hyperfineShift(p.A, p.B, I2, p.J2, Fp2))) });
    }
  });
  return out.some((t) => t.gap.isZero()) ? null : out;
}

export function partnerQuadraticCoefficient(term: PartnerTerm, level: PartnerLevel, partners: readonly PartnerLevel[], F2: number, mF2: number): Dec | null {
  const terms = partnerSumTerms(term, level, partners, F2, mF2);
  if (terms === null) return null;
  const sum = terms.reduce((acc, t) => acc.plus(ratDec(t.e2).div(t.gap)), ZERO);
  const dg = term.gS.minus(term.gL).mul(term.muB_h);
  return sum.mul(dg).mul(dg);
}

/** ∂β/∂E, ∂β/∂A, ∂β/∂B of one J level (Hz/T² per Hz). */
export interface PartnerSlope {
  energy: Dec;
  A: Dec;
  B: Dec;
}

/**
 * The partial derivatives of β_partners(F, mF) (partnerQuadraticCoefficient)
 * with respect to the level energies and hyperfine constants of `level` and
 * of each partner (in the order of `partners`), or null where the
 * coefficient is null. Each term of the sum is t = K·e²/Δ with
 * K = (μB/h)²(gS − gL)², e² exact and Δ = [E_J + a_F·A + b_F·B] − [E_J′ +
 * a_F′·A′ + b_F′·B′] (a_F, b_F the exact hyperfine coefficients of
 * hyperfine.ts), so ∂t/∂Δ = −t/Δ and
 *   ∂β/∂E_J = −Σ t/Δ,  ∂β/∂A = −Σ a_F·t/Δ,  ∂β/∂B = −Σ b_F·t/Δ,
 *   ∂β/∂E_J′ = +Σ_{J′} t/Δ, ∂β/∂A′ = +Σ_{J′} a_F′·t/Δ, ∂β/∂B′ = +Σ_{J′} b_F′·t/Δ
 * (the chain rule; Condon and Shortley §16.3 for the sum itself). Exact
 * up to the Dec division, like the coefficient. (The μB/h, gS and gL slopes,
 * 2β/(μB/h) and ±2β/(gS − gL), follow from β ∝ K alone.)
 *
 * Worked example: 88Sr ³P₀ with only ³P₁ (I = 0): β = (2/3)K/Δ with
 * Δ = E(³P₀) − E(³P₁) = −186.827 cm⁻¹·c (NIST), so ∂β/∂E(³P₁) = β/Δ and
 * ∂β/∂E(³P₀) = −β/Δ: with β = −2.34255…e7 Hz/T² (module comment) and
 * Δ = −5.60093…e12 Hz, ∂β/∂E(³P₁) = +4.1824…e−6 (Hz/T²)/Hz (raising ³P₁
 * makes β smaller in size). A test repeats it and checks every slope
 * against a central difference of partnerQuadraticCoefficient.
 */
export function partnerQuadraticSlopes(
  term: PartnerTerm, level: PartnerLevel, partners: readonly PartnerLevel[], F2: number, mF2: number,
): { level: PartnerSlope; partners: PartnerSlope[] } | null {
  const terms = partnerSumTerms(term, level, partners, F2, mF2);
  if (terms === null) return null;
  const { I2 } = term;
  const dg = term.gS.minus(term.gL).mul(term.muB_h);
  const K = dg.mul(dg);
  const ONE = new Dec(1);
  const aOf = (J2: number, F: number) => hyperfineShift(ONE, ZERO, I2, J2, F);
  const bOf = (J2: number, F: number) => hyperfineShift(ZERO, ONE, I2, J2, F);
  const self: PartnerSlope = { energy: ZERO, A: ZERO, B: ZERO };
  const others: PartnerSlope[] = partners.map(() => ({ energy: ZERO, A: ZERO, B: ZERO }));
  for (const { index, Fp2, e2, gap } of terms) {
    const p = partners[index]!;
    const slope = others[index]!;
    // ∂t/∂Δ = −K·e²/Δ²
    const d = K.mul(ratDec(e2)).div(gap.mul(gap)).neg();
    self.energy = self.energy.plus(d);
    self.A = self.A.plus(d.mul(aOf(level.J2, F2)));
    self.B = self.B.plus(d.mul(bOf(level.J2, F2)));
    slope.energy = slope.energy.minus(d);
    slope.A = slope.A.minus(d.mul(aOf(p.J2, Fp2)));
    slope.B = slope.B.minus(d.mul(bOf(p.J2, Fp2)));
  }
  return { level: self, partners: others };
}
