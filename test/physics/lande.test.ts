import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { landeExact, landeLS, orbitalG, spinG } from "../../src/physics/lande.js";

// Textbook Landé factors with gL = 1, gS = 2. Source: E. U. Condon and
// G. H. Shortley, "The Theory of Atomic Spectra" (1935), ch. XVI, and the
// g-value tables of H. E. White, "Introduction to Atomic Spectra" (1934),
// ch. X (values from memory; each is a one-line fraction anyone can redo).
const TEXTBOOK: [string, number, number, number, string | null][] = [
  // term, 2S, L, 2J, g
  ["2S1/2", 1, 0, 1, "2"],
  ["2P1/2", 1, 1, 1, "2/3"],
  ["2P3/2", 1, 1, 3, "4/3"],
  ["2D3/2", 1, 2, 3, "4/5"],
  ["2D5/2", 1, 2, 5, "6/5"],
  ["1P1", 0, 1, 2, "1"],
  ["3S1", 2, 0, 2, "2"],
  ["3P1", 2, 1, 2, "3/2"],
  ["3P2", 2, 1, 4, "3/2"],
  ["4D1/2", 3, 2, 1, "0"], // the classic g = 0 level
  ["6D1/2", 5, 2, 1, "10/3"],
  ["7D1", 6, 2, 2, "3"], // Fe I z 7D°1, upper level of 525.02 nm
  ["5P1", 4, 1, 2, "5/2"], // Fe I z 5P°1, lower level of 630.25 nm
  ["3P0", 2, 1, 0, null], // J = 0 has no g
];

describe("landeExact", () => {
  it.each(TEXTBOOK)("gives the textbook value for %s", (_term, S2, L, J2, g) => {
    const r = landeExact(S2, L, J2);
    expect(r === null ? null : r.toString()).toBe(g);
  });
});

describe("landeLS", () => {
  it("repeats its worked example: 2P3/2 with the CODATA 2022 gS is 1.334106434786973...", () => {
    // gS = -g_e = 2.00231930436092 (CODATA 2022); 2/3 + gS/3 worked by hand.
    const g = landeLS(1, 1, 3, new Dec(1), new Dec("2.00231930436092"))!;
    expect(g.toSignificantDigits(20).toString()).toBe("1.3341064347869733333");
  });

  it("agrees with the exact fraction when gL = 1 and gS = 2", () => {
    for (const [, S2, L, J2, g] of TEXTBOOK) {
      const d = landeLS(S2, L, J2, new Dec(1), new Dec(2));
      if (g === null) expect(d).toBeNull();
      else expect(d!.toSignificantDigits(40).eq(landeExact(S2, L, J2)!.toDecimal().toSignificantDigits(40))).toBe(true);
    }
  });

  it("reproduces the 2S1/2 free-electron value gJ = gS", () => {
    // common practice: an S = 1/2, L = 0 level has gJ = gS exactly.
    expect(landeLS(1, 0, 1, new Dec(1), new Dec("2.00231930436092"))!.toString()).toBe("2.00231930436092");
  });
});

describe("orbitalG", () => {
  it("repeats its worked example: 87Rb gives gL = 0.99999369 to 8 digits", () => {
    // D. A. Steck, "Rubidium 87 D Line Data", table 7: gL = 0.99999369.
    const gL = orbitalG(new Dec("86.909180531"), new Dec("0.0005485799090441"));
    expect(gL.toSignificantDigits(8).toString()).toBe("0.99999369");
  });

  it("is exactly 1 without a mass", () => {
    expect(orbitalG(null, new Dec("0.0005485799090441")).toString()).toBe("1");
  });
});

describe("spinG", () => {
  it("is minus the electron g factor", () => {
    // CODATA 2022: g_e = -2.002 319 304 360 92(36).
    expect(spinG(new Dec("-2.00231930436092")).toString()).toBe("2.00231930436092");
  });
});
