/**
 * Exact Wigner 3j and 6j symbols.
 *
 * Both are algebraic numbers of the form sign·sqrt(r) with r rational, so
 * they are returned as { sign, squared } with `squared` an exact Rational.
 * Arguments are doubled integers (see quantum.ts).
 *
 * Reference: G. Racah, Phys. Rev. 62, 438 (1942); the same sums as
 * A. R. Edmonds, "Angular Momentum in Quantum Mechanics" (Princeton, 1957),
 * eqs. (3.7.3) and (6.3.7). Exact: yes.
 */
import { Rational } from "./rational.js";
import { triangle } from "./quantum.js";

export interface SignedRoot {
  /** Sign of the symbol: -1, 0 (symbol vanishes) or +1. */
  sign: -1 | 0 | 1;
  /** Square of the symbol, exact. */
  squared: Rational;
}

const factorials: bigint[] = [1n];
function fact(n: number): bigint {
  if (n < 0) throw new RangeError("negative factorial");
  for (let k = factorials.length; k <= n; k++) factorials.push(factorials[k - 1]! * BigInt(k));
  return factorials[n]!;
}

const VANISHES: SignedRoot = Object.freeze({ sign: 0, squared: Rational.ZERO });

/** Δ(abc) = (a+b-c)!(a-b+c)!(-a+b+c)!/(a+b+c+1)! for doubled a, b, c. */
function triangleCoefficient(a: number, b: number, c: number): Rational {
  return Rational.of(
    fact((a + b - c) / 2) * fact((a - b + c) / 2) * fact((-a + b + c) / 2),
    fact((a + b + c) / 2 + 1),
  );
}

/**
 * Wigner 3j symbol (j1 j2 j3; m1 m2 m3), doubled arguments.
 *
 * Formula (Racah): (-1)^(j1-j2-m3) sqrt(Δ(j1 j2 j3) Π(j±m)!) Σ_k (-1)^k /
 * [k!(j3-j2+k+m1)!(j3-j1+k-m2)!(j1+j2-j3-k)!(j1-k-m1)!(j2-k+m2)!].
 * Selection rules: m1+m2+m3 = 0, triangle(j1 j2 j3), |mi| ≤ ji, ji+mi integer;
 * otherwise the symbol is 0.
 *
 * Worked example: (1 1 0; 1 -1 0) = 1/sqrt(3), so
 * threeJ(2, 2, 0, 2, -2, 0) → { sign: +1, squared: 1/3 }.
 */
export function threeJ(j1: number, j2: number, j3: number, m1: number, m2: number, m3: number): SignedRoot {
  if (m1 + m2 + m3 !== 0) return VANISHES;
  if (!triangle(j1, j2, j3)) return VANISHES;
  for (const [j, m] of [[j1, m1], [j2, m2], [j3, m3]] as const) {
    if (Math.abs(m) > j || (j + m) % 2 !== 0) return VANISHES;
  }
  const h = (x: number) => x / 2; // doubled → ordinary integer (all combinations below are integers)
  const kMin = Math.max(0, h(j2 - j3 - m1), h(j1 - j3 + m2));
  const kMax = Math.min(h(j1 + j2 - j3), h(j1 - m1), h(j2 + m2));
  let sum = Rational.ZERO;
  for (let k = kMin; k <= kMax; k++) {
    const denom =
      fact(k) *
      fact(h(j3 - j2 + m1) + k) *
      fact(h(j3 - j1 - m2) + k) *
      fact(h(j1 + j2 - j3) - k) *
      fact(h(j1 - m1) - k) *
      fact(h(j2 + m2) - k);
    const term = Rational.of(k % 2 === 0 ? 1n : -1n, denom);
    sum = sum.add(term);
  }
  if (sum.isZero()) return VANISHES;
  const prefactor = triangleCoefficient(j1, j2, j3).mul(
    Rational.of(
      fact(h(j1 + m1)) * fact(h(j1 - m1)) * fact(h(j2 + m2)) * fact(h(j2 - m2)) * fact(h(j3 + m3)) * fact(h(j3 - m3)),
    ),
  );
  const phase = h(j1 - j2 - m3);
  const sign = ((Math.abs(phase) % 2 === 0 ? 1 : -1) * sum.sign()) as -1 | 1;
  return { sign, squared: prefactor.mul(sum.mul(sum)) };
}

/**
 * Wigner 6j symbol {j1 j2 j3; j4 j5 j6}, doubled arguments.
 *
 * Formula (Racah): sqrt(Δ(j1j2j3)Δ(j1j5j6)Δ(j4j2j6)Δ(j4j5j3)) Σ_t (-1)^t (t+1)! /
 * [(t-a1)!(t-a2)!(t-a3)!(t-a4)!(b1-t)!(b2-t)!(b3-t)!], with a the four triad
 * sums and b the three sums of opposite pairs of columns.
 * Selection rules: each of the triads (j1 j2 j3), (j1 j5 j6), (j4 j2 j6),
 * (j4 j5 j3) obeys the triangle rule with an integer sum; otherwise 0.
 *
 * Worked example: {1/2 1/2 1; 1/2 1/2 0} = 1/2, so
 * sixJ(1, 1, 2, 1, 1, 0) → { sign: +1, squared: 1/4 }.
 */
export function sixJ(j1: number, j2: number, j3: number, j4: number, j5: number, j6: number): SignedRoot {
  const triads: [number, number, number][] = [
    [j1, j2, j3],
    [j1, j5, j6],
    [j4, j2, j6],
    [j4, j5, j3],
  ];
  if (!triads.every(([a, b, c]) => triangle(a, b, c))) return VANISHES;
  const a = triads.map(([x, y, z]) => (x + y + z) / 2);
  const b = [(j1 + j2 + j4 + j5) / 2, (j2 + j3 + j5 + j6) / 2, (j3 + j1 + j6 + j4) / 2];
  const tMin = Math.max(...a);
  const tMax = Math.min(...b);
  let sum = Rational.ZERO;
  for (let t = tMin; t <= tMax; t++) {
    let denom = 1n;
    for (const ai of a) denom *= fact(t - ai);
    for (const bi of b) denom *= fact(bi - t);
    sum = sum.add(Rational.of((t % 2 === 0 ? 1n : -1n) * fact(t + 1), denom));
  }
  if (sum.isZero()) return VANISHES;
  let prefactor = Rational.ONE;
  for (const [x, y, z] of triads) prefactor = prefactor.mul(triangleCoefficient(x, y, z));
  return { sign: sum.sign() as -1 | 1, squared: prefactor.mul(sum.mul(sum)) };
}
