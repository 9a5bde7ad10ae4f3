import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { landeExact } from "../../src/physics/lande.js";
import {
  effectiveLande,
  lineComponents,
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
