/**
 * The Breit–Rabi formula: closed-form energies of a level in which one of
 * the two coupled angular momenta is 1/2 — J = 1/2 with any nuclear spin I
 * (alkali ground states), or I = 1/2 with any J (the same formula with the
 * roles of J and I exchanged).
 *
 * Formula, with S the spin-1/2 partner (g-factor gS) and K the other one
 * (g-factor gK), ΔE = A(K + 1/2) the zero-field splitting,
 * y = (gS − gK)(μB/h)B:
 *   E(F = K ± 1/2, mF) = −ΔE/[2(2K+1)] + gK(μB/h)·mF·B
 *                        ± (1/2)·sgn(ΔE)·√(ΔE² + 4·mF·ΔE·y/(2K+1) + y²),
 * which is the textbook form ±(ΔE/2)√(1 + 4mF·x/(2K+1) + x²), x = y/ΔE,
 * written without the division so that A = 0 and A < 0 (inverted structure:
 * the + branch is still the level F = K + 1/2) need no special case.
 * The stretched states mF = ±(K + 1/2) exist only for F = K + 1/2 and are
 * exactly linear: E = A·K/2 ± (μB/h)·B·(gS/2 + gK·K) — the square root
 * would give |ΔE ± y| and flip sign where y passes ΔE, so they are taken
 * from the uncoupled state directly.
 * Reference: G. Breit and I. I. Rabi, Phys. Rev. 38, 2082 (1931);
 * D. A. Steck, "Rubidium 87 D Line Data", eq. (30). Exact: yes, up to one
 * Dec square root (60 digits). Energies are relative to the hyperfine-free
 * level centre, as in hyperfineZeeman.ts.
 *
 * Worked example: 87Rb 5²S1/2 (I = 3/2, A = 3417.341305452145 MHz,
 * gJ = 2.00233113, gI = −0.0009951414, μB/h = 13996244917.1 Hz/T) at B = 0:
 * F = 2 at +2563.00597908910875 MHz; |F=2, mF=2⟩ at 0.1 T:
 * 2563.00597908910875 + 1399.166608616448099459 MHz.
 */
import { Dec, ONE, decInt } from "../decimal.js";
import type { HyperfineZeemanLevel } from "./hyperfineZeeman.js";

/** True when the Breit–Rabi formula applies (J = 1/2 or I = 1/2). */
export function breitRabiApplies(level: Pick<HyperfineZeemanLevel, "J2" | "I2">): boolean {
  return level.J2 === 1 || level.I2 === 1;
}

/**
 * The two-state form of a Breit–Rabi level: the spin-1/2 partner's g (gS
 * here: gJ when J = 1/2, else gI), the other angular momentum K (I or J,
 * doubled) and its g (gK), and whether F = K + 1/2 (upper). Throws
 * RangeError when neither J nor I is 1/2 or (F2, mF2) does not exist.
 * Shared by the energy and its derivatives (sensitivity.ts).
 */
export function breitRabiCase(level: HyperfineZeemanLevel, F2: number, mF2: number): { K2: number; gS: Dec; gK: Dec; upper: boolean } {
  if (!breitRabiApplies(level)) throw new RangeError("Breit–Rabi needs J = 1/2 or I = 1/2");
  const jIsHalf = level.J2 === 1;
  const K2 = jIsHalf ? level.I2 : level.J2;
  const gS = jIsHalf ? level.gJ : level.gI;
  const gK = jIsHalf ? level.gI : level.gJ;
  const upper = F2 === K2 + 1;
  if (!upper && !(F2 === K2 - 1 && K2 >= 1)) throw new RangeError(`F = ${F2}/2 does not exist`);
  if (Math.abs(mF2) > F2 || (F2 - mF2) % 2 !== 0) throw new RangeError(`mF = ${mF2}/2 does not exist for F = ${F2}/2`);
  return { K2, gS, gK, upper };
}

/**
 * Energy (Hz, from the level centre) of the sublevel (F2, mF2) of a J = 1/2
 * or I = 1/2 level at `tesla` ≥ 0. Throws RangeError when neither J nor I is
 * 1/2 or (F2, mF2) does not exist.
 */
export function breitRabiEnergy(level: HyperfineZeemanLevel, F2: number, mF2: number, tesla: Dec): Dec {
  const { K2, gS, gK, upper } = breitRabiCase(level, F2, mF2);
  const { A, muB_h } = level;
  const zeeman = muB_h.mul(tesla);
  if (Math.abs(mF2) === K2 + 1) {
    // stretched: E = A·K/2 ± (μB/h)B(gS/2 + gK·K)
    const lin = gS.plus(gK.mul(decInt(K2))).div(2).mul(zeeman);
    const hf = A.mul(decInt(K2)).div(4);
    return mF2 > 0 ? hf.plus(lin) : hf.minus(lin);
  }
  const twoKPlus1 = decInt(K2 + 1);
  const dE = A.mul(twoKPlus1).div(2);
  const y = gS.minus(gK).mul(zeeman);
  const mF = decInt(mF2).div(2);
  const root = dE.mul(dE).plus(mF.mul(4).mul(dE).mul(y).div(twoKPlus1)).plus(y.mul(y)).sqrt().div(2);
  const sgn = dE.isNegative() ? ONE.neg() : ONE;
  const base = dE.neg().div(twoKPlus1.mul(2)).plus(gK.mul(mF).mul(zeeman));
  return upper ? base.plus(sgn.mul(root)) : base.minus(sgn.mul(root));
}

