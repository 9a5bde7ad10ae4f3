import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { Rational } from "../../src/physics/rational.js";
import { Dec } from "../../src/physics/decimal.js";
import { landeExact, landeJJ, landeJJExact, landeJK, landeJKExact, type JJLevel, type JKLevel } from "../../src/physics/lande.js";

// Parent term ²P°3/2 and ²P°1/2 of a p⁵ core (doubled S and j1).
const P32 = { coreS2: 1, coreL: 1, coreJ2: 3 };
const P12 = { coreS2: 1, coreL: 1, coreJ2: 1 };
const jk = (core: typeof P32, l: number, K2: number, J2: number): JKLevel => ({ ...core, l, K2, J2 });
const jj = (l1: number, j1_2: number, l2: number, j2_2: number, J2: number): JJLevel => ({ l1, j1_2, l2, j2_2, J2 });
const frac = (r: { toString(): string } | null) => (r === null ? null : r.toString());

describe("landeJKExact", () => {
  it("gives 3/2 for the noble-gas metastable np⁵(n+1)s 2[3/2]°2 level", () => {
    // textbook: the 1s5 level of Ne, Ar, Kr has g = 3/2 in jK coupling with gS = 2
    // (H. E. White, "Introduction to Atomic Spectra" (1934), ch. XIII).
    expect(frac(landeJKExact(jk(P32, 0, 3, 4)))).toBe("3/2");
  });

  it("repeats its worked example: np⁵(n+1)p 2[5/2]3 has g = 4/3", () => {
    // Worked by hand: g_K = (4/3)(3/5) + 2/5 = 6/5, g_J = (6/5)(5/6) + 2(1/6) = 4/3.
    expect(frac(landeJKExact(jk(P32, 1, 5, 6)))).toBe("4/3");
  });

  it("gives the stretched level the same g as the LS term it equals", () => {
    // textbook: the level of largest J of a configuration is one state in every coupling
    // scheme; p⁵p J = 3 is ³D3 (g = 4/3), p⁵d J = 4 is ³F4 (g = 5/4).
    expect(frac(landeJKExact(jk(P32, 1, 5, 6)))).toBe(frac(landeExact(2, 2, 6)));
    expect(frac(landeJKExact(jk(P32, 2, 7, 8)))).toBe(frac(landeExact(2, 3, 8)));
  });

  it("keeps the g sum of the J = 1 levels of p⁵s equal to the LS sum (³P1 + ¹P1 = 5/2)", () => {
    // textbook: the g-sum rule (Condon and Shortley 1935, §11.6) — for one configuration and
    // one J the sum of g over the levels does not depend on the coupling.
    // Hand values: [3/2]1 = (4/3)(5/4) − 2(1/4) = 7/6, [1/2]1 = (2/3)(1/2) + 2(1/2) = 4/3.
    expect(frac(landeJKExact(jk(P32, 0, 3, 2)))).toBe("7/6");
    expect(frac(landeJKExact(jk(P12, 0, 1, 2)))).toBe("4/3");
    expect(landeJKExact(jk(P32, 0, 3, 2))!.add(landeJKExact(jk(P12, 0, 1, 2))!).toString()).toBe("5/2");
  });

  it("gives a J = 0 level no g", () => {
    // common practice: J = 0 has no magnetic moment.
    expect(landeJKExact(jk(P12, 0, 1, 0))).toBeNull();
    expect(landeJK(jk(P12, 0, 1, 0), new Dec(1), new Dec(2))).toBeNull();
  });
});

describe("landeJK", () => {
  it("gives the metastable 2[3/2]2 level (gL + gS)/2 with the CODATA 2022 gS", () => {
    // Worked by hand: cL = (2/3)(3/4) = 1/2, cS = (1/3)(3/4) + 1/4 = 1/2;
    // gS = −g_e = 2.00231930436092 (CODATA 2022), so g = 1.50115965218046.
    const g = landeJK(jk(P32, 0, 3, 4), new Dec(1), new Dec("2.00231930436092"))!;
    expect(g.toString()).toBe("1.50115965218046");
  });

  it("lies near the measured g of the Ar 3p⁵4s 2[3/2]°2 level, 1.506", () => {
    // from memory: NIST Atomic Spectra Database, Ar I levels, Landé g of 1s5 listed as 1.506.
    const g = landeJK(jk(P32, 0, 3, 4), new Dec(1), new Dec("2.00231930436092"))!;
    expect(g.sub(new Dec("1.506")).abs().lt(new Dec("0.01"))).toBe(true);
  });
});

describe("landeJJExact", () => {
  it("repeats its worked example: p² (3/2,1/2)1 has g = 3/2", () => {
    // textbook formula (jj coupling, White 1934 ch. XIII), worked by hand:
    // g(p3/2) = 4/3, g(p1/2) = 2/3; J(J+1) = 2, j1(j1+1) = 15/4, j2(j2+1) = 3/4;
    // g = (4/3)(2 + 15/4 − 3/4)/4 + (2/3)(2 + 3/4 − 15/4)/4 = 5/3 − 1/6 = 3/2.
    expect(frac(landeJJExact(jj(1, 3, 1, 1, 2)))).toBe("3/2");
  });

  it("gives p² (3/2,1/2)2 the hand-worked 7/6", () => {
    // textbook formula, by hand: J(J+1) = 6; (4/3)(6 + 3)/12 + (2/3)(6 − 3)/12 = 1 + 1/6 = 7/6.
    expect(frac(landeJJExact(jj(1, 3, 1, 1, 4)))).toBe("7/6");
  });

  it("keeps the g sum of the J = 1 levels of ps equal to the LS sum (³P1 + ¹P1 = 5/2)", () => {
    // textbook: g-sum rule (Condon and Shortley 1935, §11.6); by hand (3/2,1/2)1 = 7/6, (1/2,1/2)1 = 4/3.
    const a = landeJJExact(jj(1, 3, 0, 1, 2))!;
    const b = landeJJExact(jj(1, 1, 0, 1, 2))!;
    expect([a.toString(), b.toString(), a.add(b).toString()]).toEqual(["7/6", "4/3", "5/2"]);
  });

  it("gives the stretched ps (3/2,1/2)2 level the LS ³P2 value 3/2", () => {
    // textbook: the largest J of a configuration is one state in every coupling scheme.
    expect(frac(landeJJExact(jj(1, 3, 0, 1, 4)))).toBe(frac(landeExact(2, 1, 4)));
  });
});

describe("landeJJ", () => {
  it("agrees with the exact fraction when gL = 1 and gS = 2", () => {
    const t = jj(1, 3, 1, 1, 2);
    expect(landeJJ(t, new Dec(1), new Dec(2))!.toSignificantDigits(40).eq(landeJJExact(t)!.toDecimal().toSignificantDigits(40))).toBe(true);
  });

  it("gives a J = 0 level no g", () => {
    // common practice: J = 0 has no magnetic moment.
    expect(landeJJ(jj(1, 1, 1, 1, 0), new Dec(1), new Dec(2))).toBeNull();
  });
});

// sympy.physics.quantum.cg: each level's stretched state built from Clebsch–Gordan
// coefficients in the uncoupled basis, g = cL·gL + cS·gS read off exactly
// (scripts/fixtures/lande_coupling_sympy.py), independent of the projection rule.
type FixtureCase =
  | ({ scheme: "jK"; cL: string; cS: string } & JKLevel)
  | ({ scheme: "jj"; cL: string; cS: string } & JJLevel);
const fixture = JSON.parse(readFileSync(join(import.meta.dirname, "..", "fixtures", "lande-coupling-sympy.json"), "utf8")) as { cases: FixtureCase[] };

describe("jK and jj Landé factors against sympy's explicit states", () => {
  it("covers both schemes with many levels", () => {
    expect(fixture.cases.filter((c) => c.scheme === "jK").length).toBeGreaterThan(50);
    expect(fixture.cases.filter((c) => c.scheme === "jj").length).toBeGreaterThan(50);
  });

  it("gives every level's gL and gS coefficients and its exact value as sympy does", () => {
    const one = new Dec(1);
    const zero = new Dec(0);
    for (const c of fixture.cases) {
      const g = (gL: Dec, gS: Dec) => (c.scheme === "jK" ? landeJK(c, gL, gS) : landeJJ(c, gL, gS))!;
      const exact = c.scheme === "jK" ? landeJKExact(c) : landeJJExact(c);
      const cL = Rational.parse(c.cL);
      const cS = Rational.parse(c.cS);
      const what = JSON.stringify(c);
      expect(g(one, zero).toSignificantDigits(40).eq(cL.toDecimal().toSignificantDigits(40)), what).toBe(true);
      expect(g(zero, one).toSignificantDigits(40).eq(cS.toDecimal().toSignificantDigits(40)), what).toBe(true);
      expect(exact!.toString(), what).toBe(cL.add(cS.mul(Rational.of(2))).toString());
    }
  });
});
