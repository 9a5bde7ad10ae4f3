/**
 * Second-order (quadratic) Zeeman coefficients of the hyperfine sublevels
 * |F mF⟩ of one level, from non-degenerate perturbation theory in the
 * Zeeman operator Hz = (μB/h)·B·(gJ·Jz + gI·Iz):
 *   E(F, mF) ≈ E_F + (μB/h)·gF·mF·B + β(F, mF)·B²,
 *   β(F, mF) = Σ_{F′ ≠ F} |⟨F′ mF|(μB/h)(gJ·Jz + gI·Iz)|F mF⟩|² / (E_F − E_F′).
 * Because Jz + Iz = Fz is diagonal in F, the off-diagonal element is
 * (gJ − gI)·⟨F′ mF|Jz|F mF⟩, and by the Wigner–Eckart theorem
 *   |⟨F′ m|Jz|F m⟩|² = (F′ 1 F; −m 0 m)²·(2F+1)(2F′+1)·{J F′ I; F J 1}²·J(J+1)(2J+1),
 * non-zero only for F′ = F ± 1. Reference: A. R. Edmonds, "Angular Momentum
 * in Quantum Mechanics" (Princeton, 1957), eqs. (5.4.1) and (7.1.7);
 * D. A. Steck, "Rubidium 87 D Line Data", §2.4. Exact: yes — the squared
 * matrix elements are exact rationals (wigner.ts); the E_F are those of
 * hyperfine.ts. The coefficient is null when a coupled F′ level is exactly
 * degenerate with F (perturbation theory does not apply).
 * Zero-field level order does not matter: the sign of E_F − E_F′ carries it.
 *
 * Worked example: 87Rb 5²S1/2 (I = 3/2, gJ = 2.00233113, gI = −0.0009951414,
 * A = 3417.341305452145 MHz, μB/h = 13996244917.1 Hz/T):
 * |⟨1 0|Jz|2 0⟩|² = 1/4, so β(2, 0) = −β(1, 0) = (gJ − gI)²(μB/h)²/(4·2A),
 * and the clock transition |1, 0⟩ ↔ |2, 0⟩ shifts by
 * (gJ − gI)²(μB/h)²/(2·2A)·B² = 575.146… Hz/G²
 * (published: 575.15 Hz/G², D. A. Steck, "Rubidium 87 D Line Data", Table 4).
 */
import { Dec, ZERO, decInt } from "../decimal.js";
import { Rational } from "../rational.js";
import { sixJ, threeJ } from "../wigner.js";
import { fValues, hyperfineShift } from "../hyperfine.js";
import type { HyperfineZeemanLevel } from "./hyperfineZeeman.js";

/** 1 G = 1e-4 T exactly, so Hz/T² × 1e-8 = Hz/G². */
const PER_GAUSS2 = new Dec("1e-8");

/** |⟨F′ m|Jz|F m⟩|² for the coupling (J I)F, exact. Doubled arguments. */
export function jzSquaredElement(J2: number, I2: number, F2: number, Fp2: number, m2: number): Rational {
  const three = threeJ(Fp2, 2, F2, -m2, 0, m2);
  const six = sixJ(J2, Fp2, I2, F2, J2, 2);
  if (three.sign === 0 || six.sign === 0) return Rational.ZERO;
  const jj = Rational.of(BigInt(J2) * BigInt(J2 + 2) * BigInt(J2 + 1), 4n); // J(J+1)(2J+1)
  return three.squared.mul(six.squared).mul(Rational.of((F2 + 1) * (Fp2 + 1))).mul(jj);
}

export interface QuadraticZeemanCoefficient {
  F2: number;
  mF2: number;
  /** β in Hz/T²; null when perturbation theory fails (degenerate F levels). */
  perTesla2: Dec | null;
  /** β in Hz/G². */
  perGauss2: Dec | null;
}

/** β(F, mF) in Hz/T² (see the module comment), or null. */
export function quadraticZeemanCoefficient(level: HyperfineZeemanLevel, F2: number, mF2: number): Dec | null {
  const { I2, J2, gJ, gI, A, muB_h } = level;
  const B = I2 >= 2 && J2 >= 2 ? level.B : ZERO;
  const fs = fValues(I2, J2);
  if (!fs.includes(F2) || Math.abs(mF2) > F2 || (F2 - mF2) % 2 !== 0) throw new RangeError(`no sublevel F=${F2}/2, mF=${mF2}/2`);
  const eF = hyperfineShift(A, B, I2, J2, F2);
  const dg = gJ.minus(gI).mul(muB_h);
  const scale = dg.mul(dg);
  let sum = ZERO;
  for (const Fp2 of [F2 - 2, F2 + 2]) {
    if (!fs.includes(Fp2) || Math.abs(mF2) > Fp2) continue;
    const r = jzSquaredElement(J2, I2, F2, Fp2, mF2);
    if (r.isZero()) continue;
    const gap = eF.minus(hyperfineShift(A, B, I2, J2, Fp2));
    if (gap.isZero()) return null;
    sum = sum.plus(decInt(r.num).div(decInt(r.den)).div(gap));
  }
  return sum.mul(scale);
}

/** β for every sublevel of the level, sorted by F then mF. */
export function quadraticZeemanCoefficients(level: HyperfineZeemanLevel): QuadraticZeemanCoefficient[] {
  const out: QuadraticZeemanCoefficient[] = [];
  for (const F2 of fValues(level.I2, level.J2)) {
    for (let mF2 = -F2; mF2 <= F2; mF2 += 2) {
      const b = quadraticZeemanCoefficient(level, F2, mF2);
      out.push({ F2, mF2, perTesla2: b, perGauss2: b === null ? null : b.mul(PER_GAUSS2) });
    }
  }
  return out;
}
