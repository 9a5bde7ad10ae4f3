import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { angularCoefficientTexts, lineSecondOrder, viewFactors } from "../../src/results/observation.js";
import { computeFrom } from "./speciesFrom.js";

// The demo's Fe I file, through the real loader (levels with LS g only).
const fe = computeFrom(readFileSync(new URL("../../data/species/fe56.yaml", import.meta.url), "utf-8"), ["0 G"]).result;
const line = (id: string) => fe.lines.find((l) => l.input.id === id)!;

describe("lineSecondOrder", () => {
  it("gives G = g_eff² for the Fe I lines with a J = 0 level: 525.02 nm 9, 630.25 nm 25/4", () => {
    // textbook (Landi Degl'Innocenti and Landolfi 2004): G = g_eff² when one level has J = 0;
    // g_eff 3 and 5/2 (Solanki, Space Sci. Rev. 63, 1 (1993))
    const a = lineSecondOrder(line("525.02"));
    expect(a.GExact?.toString()).toBe("9");
    // by hand: g(⁷D1) = −gL + 2gS with gS = 2.00231930436 (CODATA 2022 g_e) and gL = 1 − m_e/M
    // (m_e/M = 0.000548579909/55.9349363): g = 3.0046484, G = g² = 9.027912
    expect(a.G?.toNumber()).toBeCloseTo(9.027912, 5);
    expect(a.GNote).toBeNull();
    const b = lineSecondOrder(line("630.25"));
    expect(b.GExact?.toString()).toBe("25/4");
    expect(b.G!.div(b.GExact!.toDecimal()).toNumber()).toBeCloseTo(1, 2);
  });

  it("gives Fe I 630.15 nm (⁵D2 → ⁵P2), with J = 2 at both ends, G = ḡ² − δ = 151/60", () => {
    // by hand: g(e⁵D2) = 3/2, g(z⁵P2) = 11/6; J = 2 at both ends: s = 12, d = 0;
    // ḡ = (3/2 + 11/6)/2 = 5/3; δ = (1/3)²(16·12 − 4)/80 = (1/9)(188/80) = 47/180;
    // G = 25/9 − 47/180 = 500/180 − 47/180 = 453/180 = 151/60
    expect(lineSecondOrder(line("630.15")).GExact?.toString()).toBe("151/60");
  });
});

describe("viewFactors", () => {
  it("gives the dipole factors along and across the field", () => {
    // textbook: π sin²θ, σ (1 + cos²θ)/2
    expect(viewFactors(1, 0).along.toString()).toBe("0");
    expect(viewFactors(1, 0).across.toString()).toBe("1");
    expect(viewFactors(1, 1).along.toString()).toBe("1");
    expect(viewFactors(1, -1).across.toString()).toBe("1/2");
  });
});

describe("angularCoefficientTexts", () => {
  it("lists the factor of each |Δm| of the line in powers of cos²θ", () => {
    // textbook: sin²θ = 1 − cos²θ; (1 + cos²θ)/2
    expect(angularCoefficientTexts(line("525.02"))).toEqual({ "0": ["1", "-1"], "1": ["1/2", "1/2"] });
  });
});
