/**
 * Zero-field hyperfine structure of one fine-structure level: the energies
 * of the F levels, the hyperfine Landé factors gF and the allowed F.
 *
 * Conventions: energies are frequencies E/h in Hz, measured from the
 * hyperfine-free level centre (the (2F+1)-weighted mean of the F levels is
 * zero). Quantum numbers are doubled integers (quantum.ts). g-factors use
 * the atomic sign convention H/h = (μB/h)·B·(gJ·mJ + gI·mI), so a positive
 * nuclear moment gives a negative gI.
 */
import { Dec, ZERO } from "./decimal.js";
import { Rational } from "./rational.js";
import { coupledValues, triangle } from "./quantum.js";

/** X(X+1) for doubled X, exact: (X2/2)(X2/2 + 1) = X2(X2+2)/4. */
function casimir(x2: number): Rational {
  return Rational.of(BigInt(x2) * BigInt(x2 + 2), 4n);
}

function mulRational(x: Dec, r: Rational): Dec {
  if (r.isZero()) return ZERO;
  return x.mul(new Dec(r.num.toString())).div(new Dec(r.den.toString()));
}

/** K = F(F+1) − I(I+1) − J(J+1), exact (twice ⟨I·J⟩ in the state |(IJ)F⟩). */
export function casimirK(I2: number, J2: number, F2: number): Rational {
  return casimir(F2).sub(casimir(I2)).sub(casimir(J2));
}

/**
 * Coefficients (a, b) with E_F = a·A + b·B, exact rationals.
 * a = K/2; b = [(3/2)K(K+1) − 2I(I+1)J(J+1)] / [4I(2I−1)J(2J−1)], or 0 when I < 1 or J < 1.
 */
export function hyperfineCoefficients(I2: number, J2: number, F2: number): { a: Rational; b: Rational } {
  if (!triangle(I2, J2, F2)) throw new RangeError(`F=${F2}/2 is not allowed for I=${I2}/2, J=${J2}/2`);
  const K = casimirK(I2, J2, F2);
  const a = K.div(Rational.of(2));
  if (I2 < 2 || J2 < 2) return { a, b: Rational.ZERO };
  const num = Rational.of(3, 2).mul(K).mul(K.add(Rational.ONE)).sub(Rational.of(2).mul(casimir(I2)).mul(casimir(J2)));
  // 4·I(2I−1)·J(2J−1) with I = I2/2: 4·(I2/2)(I2−1)·(J2/2)(J2−1) = I2(I2−1)J2(J2−1)
  const den = Rational.of(BigInt(I2) * BigInt(I2 - 1) * BigInt(J2) * BigInt(J2 - 1));
  return { a, b: num.div(den) };
}

/**
 * Zero-field hyperfine shift of the level F (Hz, from the level centre).
 *
 * Formula: E_F = A·K/2 + B·[(3/2)K(K+1) − 2I(I+1)J(J+1)] / [4I(2I−1)J(2J−1)],
 * K = F(F+1) − I(I+1) − J(J+1); the B term is absent when I < 1 or J < 1.
 * Reference: A. Corney, "Atomic and Laser Spectroscopy" (Oxford, 1977), ch. 16;
 * D. A. Steck, "Rubidium 87 D Line Data", eq. (16). Exact: yes (the coefficients
 * are exact rationals; the only rounding is the final multiplication in Dec).
 * Selection rule: F must satisfy the triangle rule with I and J (RangeError otherwise).
 *
 * Worked example: 87Rb 5²S1/2 (I = 3/2, J = 1/2), A = 3417.341305452145 MHz:
 * F = 2 lies at +3A/4 = 2563.00597908910875 MHz, F = 1 at −5A/4 = −4271.67663181518125 MHz,
 * so hyperfineShift(A, 0, 3, 1, 4) − hyperfineShift(A, 0, 3, 1, 2) = 2A = 6834.68261090429 MHz.
 */
export function hyperfineShift(A: Dec, B: Dec, I2: number, J2: number, F2: number): Dec {
  const { a, b } = hyperfineCoefficients(I2, J2, F2);
  return mulRational(A, a).plus(mulRational(B, b));
}

/**
 * Hyperfine Landé factor gF of the level F.
 *
 * Formula: gF = gJ·[F(F+1) − I(I+1) + J(J+1)] / [2F(F+1)] + gI·[F(F+1) + I(I+1) − J(J+1)] / [2F(F+1)].
 * Reference: D. A. Steck, "Rubidium 87 D Line Data", eq. (22) (without the
 * usual approximation that drops gI). Exact: yes (rational weights).
 * Returns null for F = 0, where gF is undefined (the state does not shift to first order).
 *
 * Worked example: 87Rb 5²S1/2 F = 2 with gJ = 2.00233113, gI = −0.0009951414:
 * gF = gJ/4 + 3gI/4 = 0.49983642645; F = 1: gF = −gJ/4 + 5gI/4 = −0.50182670925.
 */
export function gF(gJ: Dec, gI: Dec, I2: number, J2: number, F2: number): Dec | null {
  if (!triangle(I2, J2, F2)) throw new RangeError(`F=${F2}/2 is not allowed for I=${I2}/2, J=${J2}/2`);
  if (F2 === 0) return null;
  const f = casimir(F2);
  const two = f.mul(Rational.of(2));
  const wJ = f.sub(casimir(I2)).add(casimir(J2)).div(two);
  const wI = f.add(casimir(I2)).sub(casimir(J2)).div(two);
  return mulRational(gJ, wJ).plus(mulRational(gI, wI));
}

/**
 * The doubled F values |I−J|, ..., I+J of a level with doubled nuclear spin I2
 * and doubled electronic angular momentum J2, ascending. Exact.
 *
 * Worked example: fValues(3, 1) → [2, 4] (F = 1, 2 of 87Rb 5²S1/2).
 */
export function fValues(I2: number, J2: number): number[] {
  return coupledValues(I2, J2);
}
