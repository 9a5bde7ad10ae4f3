import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { sixJ, threeJ, type SignedRoot } from "../../src/physics/wigner.js";
import { Rational } from "../../src/physics/rational.js";
import { coupledValues, mValues, triangle } from "../../src/physics/quantum.js";

interface FixtureRow {
  args: [number, number, number, number, number, number];
  sign: -1 | 0 | 1;
  squared: string;
}

// Source: sympy 1.14 sympy.physics.wigner (exact), written by scripts/fixtures/wigner_sympy.py.
const fixture = JSON.parse(readFileSync(new URL("../fixtures/wigner-sympy.json", import.meta.url), "utf-8")) as {
  threeJ: FixtureRow[];
  sixJ: FixtureRow[];
};

const MAX2 = 6; // doubled j up to 3

function isqrt(n: bigint): bigint {
  if (n < 2n) return n;
  let x = BigInt(Math.floor(Math.sqrt(Number(n))));
  while (x * x > n) x--;
  while ((x + 1n) * (x + 1n) <= n) x++;
  return x;
}

/** The symbol itself, when its square is the square of a rational (true of many sum rules' terms). */
function rationalValue(s: SignedRoot): Rational {
  const rn = isqrt(s.squared.num);
  const rd = isqrt(s.squared.den);
  if (rn * rn !== s.squared.num || rd * rd !== s.squared.den) throw new Error(`not rational: sqrt(${s.squared})`);
  return Rational.of(BigInt(s.sign) * rn, rd);
}

/** Largest square dividing n, as [root of square, square-free rest]. */
function squarePart(n: bigint): [bigint, bigint] {
  let root = 1n;
  let rest = 1n;
  for (let p = 2n; p * p <= n; p++) {
    let e = 0;
    while (n % p === 0n) {
      n /= p;
      e++;
    }
    root *= p ** BigInt(Math.floor(e / 2));
    if (e % 2 === 1) rest *= p;
  }
  return [root, rest * n];
}

/**
 * Exact sum of products of two signed roots: Σ c·sqrt(k) kept per square-free k.
 * Square roots of distinct square-free integers are linearly independent over
 * the rationals, so the sum is a rational number only if every k ≠ 1 part is zero.
 */
class SurdSum {
  private parts = new Map<bigint, Rational>();
  addProduct(weight: Rational, a: SignedRoot, b: SignedRoot): void {
    if (a.sign === 0 || b.sign === 0) return;
    const sq = a.squared.mul(b.squared); // sqrt(p/q) = sqrt(p·q)/q
    const [root, kernel] = squarePart(sq.num * sq.den);
    const term = weight.mul(Rational.of(BigInt(a.sign * b.sign) * root, sq.den));
    this.parts.set(kernel, (this.parts.get(kernel) ?? Rational.ZERO).add(term));
  }
  /** The sum, which must be rational. */
  value(): Rational {
    for (const [k, c] of this.parts) if (k !== 1n && !c.isZero()) throw new Error(`irrational part ${c}·sqrt(${k})`);
    return this.parts.get(1n) ?? Rational.ZERO;
  }
}

const parity = (k: number) => (k % 2 === 0 ? 1 : -1); // (-1)^k for an ordinary integer k

describe("threeJ", () => {
  it("repeats its doc-comment worked example (1 1 0; 1 -1 0) = 1/sqrt(3)", () => {
    // Source: doc comment of threeJ; Edmonds (3.7.9) (j j 0; m -m 0) = (-1)^(j-m)/sqrt(2j+1).
    const v = threeJ(2, 2, 0, 2, -2, 0);
    expect(v.sign).toBe(1);
    expect(v.squared.toString()).toBe("1/3");
  });

  it.each(fixture.threeJ.map((r) => [r.args.join(" "), r] as const))("matches sympy for doubled (%s)", (_, r) => {
    // Source: sympy.physics.wigner.wigner_3j via the fixture.
    const v = threeJ(...r.args);
    expect(v.sign).toBe(r.sign);
    expect(v.squared.toString()).toBe(r.squared);
  });

  it("has (j j 0; m -m 0) = (-1)^(j-m)/sqrt(2j+1) for every j up to 3", () => {
    // Source: A. R. Edmonds, Angular Momentum in Quantum Mechanics, eq. (3.7.9).
    for (let j = 0; j <= MAX2; j++) {
      for (const m of mValues(j)) {
        const v = threeJ(j, j, 0, m, -m, 0);
        expect(v.sign).toBe(parity((j - m) / 2));
        expect(v.squared.equals(Rational.of(1, j + 1))).toBe(true);
      }
    }
  });

  it("vanishes when a selection rule fails", () => {
    // Source: selection rules of the 3j symbol (Edmonds §3.7; common practice).
    expect(threeJ(2, 2, 2, 2, 0, 0).sign).toBe(0); // m1 + m2 + m3 ≠ 0
    expect(threeJ(2, 2, 6, 0, 0, 0).sign).toBe(0); // triangle broken
    expect(threeJ(1, 1, 4, 1, -1, 0).sign).toBe(0); // triangle broken, half-integers
    expect(threeJ(2, 2, 2, 4, -2, -2).sign).toBe(0); // |m1| > j1
    expect(threeJ(2, 1, 1, 1, -1, 0).sign).toBe(0); // j1 + m1 not an integer
    expect(threeJ(1, 1, 1, 1, -1, 0).sign).toBe(0); // j1 + j2 + j3 not an integer
    expect(threeJ(2, 2, 2, 4, -2, -2).squared.isZero()).toBe(true);
  });

  it("vanishes for all m = 0 when j1 + j2 + j3 is odd", () => {
    // Source: Edmonds (3.7.6), sign change of all m gives (-1)^(j1+j2+j3).
    for (let a = 0; a <= MAX2; a += 2)
      for (let b = 0; b <= MAX2; b += 2)
        for (const c of coupledValues(a, b)) {
          const v = threeJ(a, b, c, 0, 0, 0);
          if (((a + b + c) / 2) % 2 === 1) expect(v.sign).toBe(0);
          else expect(v.sign).not.toBe(0);
        }
  });

  it("picks up (-1)^(j1+j2+j3) under an odd column permutation and under m → -m", () => {
    // Source: Edmonds (3.7.5) and (3.7.6).
    for (const r of fixture.threeJ) {
      const [j1, j2, j3, m1, m2, m3] = r.args;
      if (!triangle(j1, j2, j3) || r.sign === 0) continue;
      const phase = parity((j1 + j2 + j3) / 2);
      const base = threeJ(j1, j2, j3, m1, m2, m3);
      for (const v of [threeJ(j2, j1, j3, m2, m1, m3), threeJ(j1, j3, j2, m1, m3, m2), threeJ(j1, j2, j3, -m1, -m2, -m3)]) {
        expect(v.sign).toBe(base.sign * phase);
        expect(v.squared.equals(base.squared)).toBe(true);
      }
      const cyclic = threeJ(j2, j3, j1, m2, m3, m1);
      expect(cyclic.sign).toBe(base.sign);
    }
  });

  it("obeys the orthogonality Σ_{m1,m2} (2j3+1)(j1 j2 j3; m1 m2 m3)(j1 j2 j3'; m1 m2 m3') = δ(j3,j3') δ(m3,m3'), exactly", () => {
    // Source: Edmonds (3.7.8).
    let checked = 0;
    for (let j1 = 0; j1 <= MAX2; j1++)
      for (let j2 = 0; j2 <= MAX2; j2++)
        for (const j3 of coupledValues(j1, j2))
          for (const j3p of coupledValues(j1, j2))
            for (const m3 of mValues(j3))
              for (const m3p of mValues(j3p)) {
                const sum = new SurdSum();
                for (const m1 of mValues(j1))
                  for (const m2 of mValues(j2))
                    sum.addProduct(Rational.of(j3 + 1), threeJ(j1, j2, j3, m1, m2, m3), threeJ(j1, j2, j3p, m1, m2, m3p));
                const expected = j3 === j3p && m3 === m3p ? Rational.ONE : Rational.ZERO;
                expect(sum.value().equals(expected)).toBe(true);
                checked++;
              }
    expect(checked).toBeGreaterThan(1000);
  });

  it("obeys the completeness Σ_{j3,m3} (2j3+1)(j1 j2 j3; m1 m2 m3)(j1 j2 j3; m1' m2' m3) = δ(m1,m1') δ(m2,m2'), exactly", () => {
    // Source: Edmonds (3.7.7).
    for (let j1 = 0; j1 <= 4; j1++)
      for (let j2 = 0; j2 <= 4; j2++)
        for (const m1 of mValues(j1))
          for (const m2 of mValues(j2))
            for (const m1p of mValues(j1))
              for (const m2p of mValues(j2)) {
                const sum = new SurdSum();
                for (const j3 of coupledValues(j1, j2))
                  for (const m3 of mValues(j3))
                    sum.addProduct(Rational.of(j3 + 1), threeJ(j1, j2, j3, m1, m2, m3), threeJ(j1, j2, j3, m1p, m2p, m3));
                const expected = m1 === m1p && m2 === m2p ? Rational.ONE : Rational.ZERO;
                expect(sum.value().equals(expected)).toBe(true);
              }
  });
});

describe("sixJ", () => {
  it("repeats its doc-comment worked example {1/2 1/2 1; 1/2 1/2 0} = 1/2", () => {
    // Source: doc comment of sixJ; Edmonds (6.3.2) gives 1/sqrt((2·1/2+1)(2·1/2+1)) with sign (-1)^(1/2+1/2+1).
    const v = sixJ(1, 1, 2, 1, 1, 0);
    expect(v.sign).toBe(1);
    expect(v.squared.toString()).toBe("1/4");
  });

  it.each(fixture.sixJ.map((r) => [r.args.join(" "), r] as const))("matches sympy for doubled {%s}", (_, r) => {
    // Source: sympy.physics.wigner.wigner_6j via the fixture.
    const v = sixJ(...r.args);
    expect(v.sign).toBe(r.sign);
    expect(v.squared.toString()).toBe(r.squared);
  });

  it("has {a b c; 0 c b} = (-1)^(a+b+c)/sqrt((2b+1)(2c+1))", () => {
    // Source: Edmonds (6.3.2).
    for (let a = 0; a <= MAX2; a++)
      for (let b = 0; b <= MAX2; b++)
        for (const c of coupledValues(a, b)) {
          const v = sixJ(a, b, c, 0, c, b);
          expect(v.sign).toBe(parity((a + b + c) / 2));
          expect(v.squared.equals(Rational.of(1, (b + 1) * (c + 1)))).toBe(true);
        }
  });

  it("vanishes when a triad breaks the triangle rule or has a half-integer sum", () => {
    // Source: selection rules of the 6j symbol (Edmonds §6.2; common practice).
    expect(sixJ(2, 2, 6, 2, 2, 2).sign).toBe(0); // (j1 j2 j3) = (1 1 3) broken
    expect(sixJ(2, 2, 2, 2, 2, 1).sign).toBe(0); // (j1 j5 j6) = (1 1 1/2): half-integer sum
    expect(sixJ(1, 1, 2, 1, 1, 4).sign).toBe(0); // (j1 j5 j6) = (1/2 1/2 2) broken
    expect(sixJ(2, 2, 2, 6, 2, 2).sign).toBe(0); // (j4 j2 j6) = (3 1 1) broken
  });

  it("is unchanged by column permutations and by swapping upper and lower entries in two columns", () => {
    // Source: Edmonds (6.2.4)-(6.2.5), the 24 symmetries of the 6j symbol.
    for (const r of fixture.sixJ) {
      const [a, b, c, d, e, f] = r.args;
      const base = sixJ(a, b, c, d, e, f);
      for (const v of [sixJ(b, a, c, e, d, f), sixJ(c, b, a, f, e, d), sixJ(b, c, a, e, f, d), sixJ(d, e, c, a, b, f), sixJ(a, e, f, d, b, c)]) {
        expect(v.sign).toBe(base.sign);
        expect(v.squared.equals(base.squared)).toBe(true);
      }
    }
  });

  it("obeys Σ_x (2x+1) {a b x; a b f} = (-1)^(2(a+b))", () => {
    // Source: D. A. Varshalovich, A. N. Moskalev, V. K. Khersonskii, Quantum Theory of Angular
    // Momentum (World Scientific, 1988), §9.8 sum rules (equation number from memory: 9.8(4)).
    let checked = 0;
    for (let a = 0; a <= MAX2; a++)
      for (let b = 0; b <= MAX2; b++)
        for (const f of coupledValues(a, b)) {
          let sum = Rational.ZERO;
          for (const x of coupledValues(a, b)) sum = sum.add(Rational.of(x + 1).mul(rationalValue(sixJ(a, b, x, a, b, f))));
          expect(sum.equals(Rational.of(parity(a + b)))).toBe(true);
          checked++;
        }
    expect(checked).toBeGreaterThan(50);
  });

  it("obeys the orthogonality Σ_x (2x+1)(2f+1) {a b x; c d f}{c d x; a b f'} = δ(f,f'), exactly", () => {
    // Source: Edmonds (6.2.9).
    let checked = 0;
    for (let a = 0; a <= 4; a++)
      for (let b = 0; b <= 4; b++)
        for (let c = 0; c <= 4; c++)
          for (let d = 0; d <= 4; d++)
            for (let f = 0; f <= 8; f++)
              for (let fp = 0; fp <= 8; fp++) {
                // f and f' must couple (a, d) and (c, b) for the identity to apply.
                if (!triangle(a, d, f) || !triangle(c, b, f) || !triangle(a, d, fp) || !triangle(c, b, fp)) continue;
                const sum = new SurdSum();
                for (const x of coupledValues(a, b)) {
                  if (!triangle(c, d, x)) continue;
                  sum.addProduct(Rational.of((x + 1) * (f + 1)), sixJ(a, b, x, c, d, f), sixJ(c, d, x, a, b, fp));
                }
                expect(sum.value().equals(f === fp ? Rational.ONE : Rational.ZERO)).toBe(true);
                checked++;
              }
    expect(checked).toBeGreaterThan(500);
  });
});
