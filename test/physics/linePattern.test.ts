import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { landeExact } from "../../src/physics/lande.js";
import {
  effectiveLande,
  gEffNote,
  lineComponents,
  multipoleChangesParity,
  multipoleName,
  multipoleRank,
  patternNotation,
  patternSummary,
  type PatternLevel,
} from "../../src/physics/linePattern.js";
import { Rational } from "../../src/physics/rational.js";

const MUB_H = new Dec("13996244917.1"); // CODATA 2022, Hz/T

/** A level from its LS term, g in use = exact LS value. */
function lsLevel(S2: number, L: number, J2: number): PatternLevel {
  const gExact = landeExact(S2, L, J2);
  return { J2, gExact, g: gExact ? gExact.toDecimal() : null };
}

const S1_2 = lsLevel(1, 0, 1);
const P1_2 = lsLevel(1, 1, 1);
const P3_2 = lsLevel(1, 1, 3);

function strengthOf(cs: ReturnType<typeof lineComponents>, mu2: number, ml2: number): string | undefined {
  return cs.find((c) => c.mu2 === mu2 && c.ml2 === ml2)?.strength.toString();
}

describe("lineComponents", () => {
  it("repeats its worked example: Na D2 strengths are 3:1:2:2:1:3", () => {
    // Spectroscopy textbooks (Condon and Shortley ch. XVI; Foot, "Atomic
    // Physics", §5.2): D2 σ+ (3/2,1/2):(1/2,−1/2) = 3:1, π 2:2, σ− 1:3.
    const cs = lineComponents(P3_2, S1_2, 1, MUB_H);
    expect(cs).toHaveLength(6);
    expect(strengthOf(cs, 3, 1)).toBe("1/4");
    expect(strengthOf(cs, 1, -1)).toBe("1/12");
    expect(strengthOf(cs, 1, 1)).toBe("1/6");
    expect(strengthOf(cs, -1, -1)).toBe("1/6");
    expect(strengthOf(cs, -1, 1)).toBe("1/12");
    expect(strengthOf(cs, -3, -1)).toBe("1/4");
    const twelfths = [[3, 1], [1, -1], [1, 1], [-1, -1], [-1, 1], [-3, -1]].map(
      ([u, l]) => cs.find((c) => c.mu2 === u && c.ml2 === l)!.strength.mul(Rational.of(12)).toString(),
    );
    expect(twelfths).toEqual(["3", "1", "2", "2", "1", "3"]);
  });

  it("labels polarizations by Δm = mu − ml", () => {
    const cs = lineComponents(P3_2, S1_2, 1, MUB_H);
    expect(cs.find((c) => c.mu2 === 3)!.polarization).toBe("sigma+");
    expect(cs.find((c) => c.mu2 === 1 && c.ml2 === 1)!.polarization).toBe("pi");
    expect(cs.find((c) => c.mu2 === -3)!.polarization).toBe("sigma-");
  });

  it("has strengths summing to exactly 1 for dipole and quadrupole lines", () => {
    // Orthogonality of 3j symbols (Edmonds 1957, eq. 3.7.8): Σ (2Jl+1)... = 1 over all m, q.
    const D5_2 = lsLevel(1, 2, 5);
    for (const [u, l, k] of [[P3_2, S1_2, 1], [P1_2, S1_2, 1], [D5_2, S1_2, 2], [lsLevel(2, 1, 4), lsLevel(2, 0, 2), 1]] as const) {
      const total = lineComponents(u, l, k, MUB_H).reduce((s, c) => s.add(c.strength), Rational.ZERO);
      expect(total.toString()).toBe("1");
    }
  });

  it("leaves out components of zero strength, such as m = 0 → 0 in a ΔJ = 0 dipole line", () => {
    // common practice: (J 1 J; 0 0 0) = 0 for integer J, so π 0→0 is absent when ΔJ = 0.
    const cs = lineComponents(lsLevel(2, 1, 2), lsLevel(2, 2, 2), 1, MUB_H);
    expect(cs.find((c) => c.mu2 === 0 && c.ml2 === 0)).toBeUndefined();
  });

  it("gives a quadrupole S1/2 → D5/2 line components with |Δm| up to 2", () => {
    // 40Ca+ 729 nm: ten components in the 4S1/2 ↔ 3D5/2 E2 line (common practice in ion-trap labs).
    const cs = lineComponents(lsLevel(1, 2, 5), S1_2, multipoleRank("E2"), MUB_H);
    expect(cs).toHaveLength(10);
    expect(cs.filter((c) => c.polarization === null)).toHaveLength(4);
  });
});

describe("patternNotation", () => {
  it("writes Na D1 as (2) 4 / 3 and Na D2 as (1) 3, 5 / 3", () => {
    // Condon and Shortley (1935), ch. XVI; White (1934), fig. 10.9.
    expect(patternNotation(lineComponents(P1_2, S1_2, 1, MUB_H), 1)).toBe("(2) 4 / 3");
    expect(patternNotation(lineComponents(P3_2, S1_2, 1, MUB_H), 1)).toBe("(1) 3, 5 / 3");
  });

  it("writes a normal triplet as (0) 1 / 1", () => {
    // common practice: a singlet line 1P1 → 1S0 (e.g. Cd I 643.8 nm, Sr I 460.9 nm).
    expect(patternNotation(lineComponents(lsLevel(0, 1, 2), lsLevel(0, 0, 0), 1, MUB_H), 1)).toBe("(0) 1 / 1");
  });

  it("shares one pair of parentheses among several π shifts: Hg 546.1 nm is (0, 1) 2, 3, 4 / 2", () => {
    // Hg I 546.1 nm, 7s 3S1 → 6p 3P2: White (1934), ch. X; Condon and Shortley, ch. XVI.
    expect(patternNotation(lineComponents(lsLevel(2, 0, 2), lsLevel(2, 1, 4), 1, MUB_H), 1)).toBe("(0, 1) 2, 3, 4 / 2");
  });

  it("writes quadrupole lines with the |Δm| = 1 and then the |Δm| = 2 shifts after the π group (issue 10, defect 6)", () => {
    // 40Ca+ 729 nm, 3d ²D5/2 → 4s ²S1/2 (E2), LS g = 6/5 and 2 (common practice). By hand, gu·mu − gl·ml:
    // Δm = 0: ±2/5; Δm = ±1: ±4/5, ±8/5; Δm = ±2: ±2, ±14/5 → over 5: (2) 4, 8; 10, 14 / 5
    expect(patternNotation(lineComponents(lsLevel(1, 2, 5), S1_2, 2, MUB_H), 2)).toBe("(2) 4, 8; 10, 14 / 5");
    // [O I] 557.7 nm, ¹S0 → ¹D2 (E2), g(¹D2) = 1: shifts −ml for Δm = −ml, a quintuplet 0, ±1, ±2 (by hand)
    expect(patternNotation(lineComponents(lsLevel(0, 0, 0), lsLevel(0, 2, 4), 2, MUB_H), 2)).toBe("(0) 1; 2 / 1");
  });
});

describe("patternSummary", () => {
  it("calls a singlet line a normal triplet and Na D2 anomalous", () => {
    expect(patternSummary(lineComponents(lsLevel(0, 1, 2), lsLevel(0, 0, 0), 1, MUB_H))).toBe("normal triplet");
    expect(patternSummary(lineComponents(P3_2, S1_2, 1, MUB_H))).toBe("anomalous: 2 π and 4 σ components");
  });

  it("calls Fe I 525.02 nm a triplet with σ at ±3", () => {
    // 7D1 → 5D0: pure Zeeman triplet with g_eff = 3 (Solanki 1993).
    expect(patternSummary(lineComponents(lsLevel(6, 2, 2), lsLevel(4, 2, 0), 1, MUB_H))).toBe("triplet, σ at ±3 Lorentz units");
  });

  it("describes quadrupole patterns in their own words (issue 10, defect 6)", () => {
    // [O I] 557.7 nm: Δm = 0, ±1, ±2 at 0, ±1, ±2 Lorentz units (by hand, g(¹D2) = 1)
    expect(patternSummary(lineComponents(lsLevel(0, 0, 0), lsLevel(0, 2, 4), 2, MUB_H), 2)).toBe("normal quadrupole quintuplet");
    // 40Ca+ 729 nm: 2 + 4 + 4 components (ten in all, common practice), widest at ±14/5 (by hand, as above)
    expect(patternSummary(lineComponents(lsLevel(1, 2, 5), S1_2, 2, MUB_H), 2)).toBe(
      "quadrupole pattern: 2 components with Δm = 0, 4 with Δm = ±1, 4 with Δm = ±2, spread over ±14/5 Lorentz units",
    );
    // a J = 0 upper level over a ³P2 level (LS g = 3/2): a quintuplet with spacing 3/2 (by hand)
    expect(patternSummary(lineComponents(lsLevel(0, 0, 0), lsLevel(2, 1, 4), 2, MUB_H), 2)).toBe("quadrupole quintuplet, spacing 3/2 Lorentz units");
  });

  it("says no splitting when every shift vanishes", () => {
    // 4D1/2 has g = 0 (White 1934): 4D1/2 → 4D1/2-like g = 0 levels give no splitting.
    const g0 = lsLevel(3, 2, 1);
    expect(patternSummary(lineComponents(g0, g0, 1, MUB_H))).toBe("no splitting");
  });
});

describe("effectiveLande", () => {
  it("repeats its worked example: Fe I 525.02 nm has g_eff = 3 and 630.25 nm has 5/2", () => {
    // Solanki, Space Sci. Rev. 63, 1 (1993), table of magnetically sensitive lines.
    expect(effectiveLande(lsLevel(6, 2, 2), lsLevel(4, 2, 0)).toString()).toBe("3");
    expect(effectiveLande(lsLevel(4, 2, 0), lsLevel(4, 1, 2)).toString()).toBe("2.5");
  });

  it("gives Na D1 4/3 and D2 7/6", () => {
    // del Toro Iniesta (2003), eq. 3.44 applied to 2P → 2S1/2 (worked by hand).
    expect(effectiveLande(P1_2, S1_2).toSignificantDigits(30).eq(new Dec(4).div(3).toSignificantDigits(30))).toBe(true);
    expect(effectiveLande(P3_2, S1_2).toSignificantDigits(30).eq(new Dec(7).div(6).toSignificantDigits(30))).toBe(true);
  });
});

// Source: sympy 1.14 sympy.physics.wigner (exact), written by scripts/fixtures/wigner_sympy.py.
interface MultipoleLineCase {
  name: string;
  k: number;
  Ju2: number;
  Jl2: number;
  I2: number | null;
  components: [number, number, string][];
}
const MULTIPOLE_LINES = (JSON.parse(readFileSync(new URL("../fixtures/wigner-sympy.json", import.meta.url), "utf-8")) as { multipoleLines: MultipoleLineCase[] }).multipoleLines;

describe("lineComponents of rank 2 and 3 (M2, E3)", () => {
  it("gives every component of each fixture line the strength sympy gives, and no other component", () => {
    expect(MULTIPOLE_LINES.filter((c) => c.k === 3).length).toBeGreaterThanOrEqual(3);
    for (const c of MULTIPOLE_LINES) {
      const level = (J2: number): PatternLevel => ({ J2, g: null, gExact: null });
      const cs = lineComponents(level(c.Ju2), level(c.Jl2), c.k, MUB_H);
      const got = cs.map((x) => [x.mu2, x.ml2, x.strength.toString()]).sort((a, b) => Number(a[0]) - Number(b[0]) || Number(a[1]) - Number(b[1]));
      expect(got, c.name).toEqual(c.components); // sympy
    }
  });

  it("makes the strengths of every M2 and E3 line sum to exactly 1", () => {
    // Σ over m of (Ju k Jl; −mu q ml)² = 1 (orthogonality of 3j symbols, Edmonds 1957 eq. 3.7.8)
    for (const [Ju2, Jl2, k] of [[4, 0, 2], [6, 4, 2], [7, 1, 3], [5, 3, 3], [8, 4, 3], [9, 3, 3]] as const) {
      const cs = lineComponents({ J2: Ju2, g: null, gExact: null }, { J2: Jl2, g: null, gExact: null }, k, MUB_H);
      expect(cs.reduce((a, x) => a.add(x.strength), Rational.ZERO).equals(Rational.ONE), `${Ju2}/2 → ${Jl2}/2, k = ${k}`).toBe(true);
      expect(Math.max(...cs.map((x) => Math.abs(x.deltaM)))).toBe(k);
    }
  });

  it("gives the Sr 1S0 → 3P2 M2 line five equal components, shifted by 0, ±3/2, ±3 Lorentz units", () => {
    // J = 2 → 0: (2 2 0; −m m 0)² = 1/5 for every m (3j with a zero, Edmonds eq. 3.7.9); g(3P2) = 3/2 (LS, common practice)
    const cs = lineComponents(lsLevel(2, 1, 4), { J2: 0, g: null, gExact: null }, 2, MUB_H);
    expect(cs.map((c) => [c.deltaM, c.strength.toString(), c.shiftLorentzExact.toString()])).toEqual([
      [-2, "1/5", "-3"],
      [-1, "1/5", "-3/2"],
      [0, "1/5", "0"],
      [1, "1/5", "3/2"],
      [2, "1/5", "3"],
    ]);
    expect(cs.map((c) => c.polarization)).toEqual([null, "sigma-", "pi", "sigma+", null]);
    expect(patternNotation(cs, 2)).toBe("(0) 3; 6 / 2"); // by hand: 0, 3/2, 3 over d = 2
    expect(patternSummary(cs, 2)).toBe("quadrupole quintuplet, spacing 3/2 Lorentz units");
  });

  it("repeats the 171Yb+ 467 nm E3 worked example: 14 components, pattern (3) 5, 11; 13, 19; 21, 27 / 7", () => {
    // 2F7/2 → 2S1/2 with LS g = 8/7 and 2 (common practice); shifts (8/7)mu − 2ml worked by hand:
    // Δm = 0: ±3/7; ±1: 5/7, 11/7; ±2: 13/7, 19/7; ±3: 21/7, 27/7
    const F7_2 = lsLevel(1, 3, 7);
    expect(F7_2.gExact!.toString()).toBe("8/7"); // LS g of 2F7/2 (textbook formula, by hand)
    const cs = lineComponents(F7_2, S1_2, 3, MUB_H);
    expect(cs).toHaveLength(14);
    expect(patternNotation(cs, 3)).toBe("(3) 5, 11; 13, 19; 21, 27 / 7");
    expect(patternSummary(cs, 3)).toBe("octupole pattern: 2 components with Δm = 0, 4 with Δm = ±1, 4 with Δm = ±2, 4 with Δm = ±3, spread over ±27/7 Lorentz units");
    // the stretched component mu = 7/2 → ml = 1/2 (Δm = 3): (7/2 3 1/2; −7/2 3 1/2)² = 1/8 (sympy, fixture above)
    expect(strengthOf(cs, 7, 1)).toBe("1/8");
  });

  it("calls an octupole line with g = 1 on one level and J = 0 on the other a normal septuplet", () => {
    // J = 3 → 0 with g = 1: Δm = 0, ±1, ±2, ±3 at 0, ±1, ±2, ±3 Lorentz units (by hand)
    const one: PatternLevel = { J2: 6, g: new Dec(1), gExact: Rational.ONE };
    const cs = lineComponents(one, { J2: 0, g: null, gExact: null }, 3, MUB_H);
    expect(patternSummary(cs, 3)).toBe("normal octupole septuplet");
    expect(patternNotation(cs, 3)).toBe("(0) 1; 2; 3 / 1");
  });
});

describe("multipoles", () => {
  it("give ranks 1, 1, 2, 2, 3 to E1, M1, E2, M2, E3", () => {
    // the digit of the name is the rank (common practice)
    expect((["E1", "M1", "E2", "M2", "E3"] as const).map(multipoleRank)).toEqual([1, 1, 2, 2, 3]);
  });

  it("change parity for E1, M2 and E3 and keep it for M1 and E2", () => {
    // Ek has parity (−1)^k, Mk (−1)^(k+1) (Sobelman 1979, §9.1; common practice)
    expect((["E1", "M1", "E2", "M2", "E3"] as const).map(multipoleChangesParity)).toEqual([true, false, false, true, true]);
    expect(multipoleName("M2")).toBe("magnetic quadrupole");
    expect(multipoleName("E3")).toBe("electric octupole");
  });

  it("leave g_eff undefined for rank 2 and 3 with the reason, and defined for dipoles", () => {
    expect(gEffNote("E1")).toBeNull();
    expect(gEffNote("M1")).toBeNull();
    expect(gEffNote("M2")).toBe("not defined for a magnetic-quadrupole (M2) line: g_eff is the first moment of the σ components of a dipole line, and an M2 line also has Δm = ±2 components");
    expect(gEffNote("E3")).toMatch(/^not defined for an electric-octupole \(E3\) line: .* also has Δm = ±2 and ±3 components$/);
  });
});
