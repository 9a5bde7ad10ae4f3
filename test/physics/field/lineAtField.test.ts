import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { toSI } from "../../../src/physics/units.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { fitSpinOrbit, solveFineStructure, type FineStructureTerm } from "../../../src/physics/field/fineStructure.js";
import { solveHyperfineZeeman } from "../../../src/physics/field/hyperfineZeeman.js";
import {
  lineComponentsAtField,
  lineReducedElement,
  lsReducedElement,
  ownPairReducedElement,
  statesFromFineStructure,
  statesFromHyperfine,
  statesFromTerm,
  sublevelLabel,
  type FieldLineComponent,
  type LineState,
} from "../../../src/physics/field/lineAtField.js";
import { termHyperfineZeemanSolver, type TermProblem } from "../../../src/physics/field/termHyperfineZeeman.js";

const muB_h = val(CODATA_2022.muB_h);
const gS = val(CODATA_2022.g_e).neg();
const gL = dec("1");
// Na 3p 2P1/2 and 2P3/2: NIST ASD (Juncar et al. 1981), from memory; 3s 2S1/2 is the ground level.
const E12 = toSI(dec("16956.1702"), "cm-1");
const E32 = toSI(dec("16973.3661"), "cm-1");
const na3p: FineStructureTerm = { S2: 1, L: 1, partners: [{ J2: 1, energy: E12 }, { J2: 3, energy: E32 }], gL, gS, muB_h };
const na3s: FineStructureTerm = { S2: 1, L: 0, partners: [{ J2: 1, energy: dec("0") }], gL, gS, muB_h };
const dLines = lsReducedElement(1, 0, 1, 1);

function close(a: Dec, b: Dec, tol: string) {
  expect(a.sub(b).abs().lte(new Dec(tol)), `${a} vs ${b}`).toBe(true);
}

function sodium(B: string, reference: Dec = E32): { up: LineState[]; low: LineState[]; comps: FieldLineComponent[] } {
  const up = statesFromFineStructure(solveFineStructure(na3p, dec(B)), reference);
  const low = statesFromFineStructure(solveFineStructure(na3s, dec(B)), dec("0"));
  return { up, low, comps: lineComponentsAtField(up, low, 1, dLines) };
}

describe("lsReducedElement", () => {
  it("gives the alkali D2 : D1 strength ratio 2 : 1", () => {
    const r32 = dLines(3, 1).pow(2);
    const r12 = dLines(1, 1).pow(2);
    // D2 : D1 line-strength ratio 2 : 1 for alkali 2P → 2S (common practice)
    close(r32.div(r12), dec("2"), "1e-50");
  });
});

describe("lineComponentsAtField", () => {
  it("gives the textbook Na D2 strengths 3:1:2:2:1:3 / 12 far below the Paschen–Back region", () => {
    const { up, low } = sodium("1e-9");
    const d2 = up.filter((s) => s.label.startsWith("J=3/2"));
    const comps = lineComponentsAtField(d2, low, 1).filter((c) => c.strength.gt("1e-12"));
    expect(comps).toHaveLength(6);
    // squared 3j strengths of 2P3/2 → 2S1/2: 1/4, 1/12, 1/6 (Condon and Shortley ch. XVI)
    const want: Record<string, string> = { "3,1": "1/4", "1,-1": "1/12", "1,1": "1/6", "-1,-1": "1/6", "-1,1": "1/12", "-3,-1": "1/4" };
    for (const c of comps) {
      const key = `${d2[c.upper]!.M2},${low[c.lower]!.M2}`;
      const [n, d] = want[key]!.split("/");
      close(c.strength, dec(n!).div(dec(d!)), "1e-9");
    }
  });

  it("normalizes the strengths to 1 and gives each polarization 1/3 at every field", () => {
    for (const B of ["0.01", "0.7", "20"]) {
      const { comps } = sodium(B);
      close(comps.reduce((s, c) => s.add(c.strength), new Dec(0)), dec("1"), "1e-45");
      for (const q of [-1, 0, 1]) {
        // Σ_ul |⟨u|T_q|l⟩|² is a trace, the same in every basis: 1/(2k+1) of the total (common practice)
        const sum = comps.filter((c) => c.q === q).reduce((s, c) => s.add(c.strength), new Dec(0));
        close(sum, dec("1").div(3), "1e-45");
      }
    }
  });

  it("moves the strength-weighted centre of each polarization linearly with the field", () => {
    const centre = (B: string, q: number) =>
      sodium(B)
        .comps.filter((c) => c.q === q)
        .reduce((s, c) => s.add(c.strength.mul(c.shift)), new Dec(0));
    for (const q of [-1, 0, 1]) {
      // Σ strength·(E_u − E_l) = Tr(H_u A) − Tr(H_l A'): linear in H, hence in B (common practice)
      const c1 = centre("0.5", q);
      const c2 = centre("2", q);
      const c3 = centre("8", q);
      const slope1 = c2.sub(c1).div("1.5");
      const slope2 = c3.sub(c2).div("6");
      close(slope1, slope2, "1e-30");
      if (q === 0) expect(slope1.abs().lt("1e-30")).toBe(true); // π centre is even in B (reflection symmetry, next test) and linear, so constant (common practice)
    }
  });

  it("maps the pattern at −B onto the pattern at +B with σ+ and σ− exchanged", () => {
    const plus = sodium("1.5").comps;
    const minus = sodium("-1.5").comps;
    // reflection in a plane containing the field: M → −M and B → −B (common practice)
    const key = (c: FieldLineComponent) => `${c.shift.toSignificantDigits(30).toString()}|${c.strength.toSignificantDigits(30).toString()}`;
    const a = plus.map((c) => `${c.q}|${key(c)}`).sort();
    const b = minus.map((c) => `${-c.q}|${key(c)}`).sort();
    expect(b).toEqual(a);
  });

  it("approaches the Paschen–Back pattern of ΔmS = 0 lines at (μB/h)B·gL·ΔmL + ζ mL mS at very high field", () => {
    const fit = fitSpinOrbit(na3p);
    const B = "1e5"; // a mathematical limit, far beyond any laboratory field
    const { up, low, comps } = sodium(B, fit.centre);
    const states = solveFineStructure(na3p, dec(B));
    const lowStates = solveFineStructure(na3s, dec(B));
    for (const c of comps) {
      const u = states[c.upper]!;
      const l = lowStates[c.lower]!;
      expect(up[c.upper]!.M2).toBe(u.mJ2);
      if (u.mS2 !== l.mS2) {
        expect(c.strength.lt("1e-6")).toBe(true); // E1 does not act on spin: ΔmS = 0 (common practice)
        continue;
      }
      // three mL × two mS lines, each 1/6 of the total (Condon and Shortley §16.3)
      close(c.strength, dec("1").div(6), "2e-3");
      const pb = muB_h.mul(B).mul(gL).mul(u.mL2).div(2).add(fit.zeta!.mul(u.mL2 * u.mS2).div(4));
      close(c.shift, pb, "1e9"); // within ζ²/((μB/h)B) ≈ 0.1 GHz of the limit
    }
  });
});

describe("statesFromHyperfine", () => {
  it("reproduces Steck's 87Rb D2 F = 2 → F' = 3, 2, 1 shares 7/10, 1/4, 1/20 at a vanishing field", () => {
    // 87Rb constants: D. A. Steck, "Rubidium 87 D Line Data" (from memory):
    // 5S1/2 A = 3417.341305452145 MHz, gJ = 2.00233113; 5P3/2 A = 84.7185 MHz, B = 12.4965 MHz, gJ = 1.3362; gI = −0.0009951414
    const gI = dec("-0.0009951414");
    const ground = { J2: 1, I2: 3, gJ: dec("2.00233113"), gI, A: dec("3417341305.452145"), B: dec("0"), muB_h };
    const excited = { J2: 3, I2: 3, gJ: dec("1.3362"), gI, A: dec("84718500"), B: dec("12496500"), muB_h };
    const B = dec("1e-9");
    const upF = solveHyperfineZeeman(excited, B);
    const lowF = solveHyperfineZeeman(ground, B);
    const comps = lineComponentsAtField(statesFromHyperfine(3, upF), statesFromHyperfine(1, lowF), 1);
    const share = (Fu2: number) =>
      comps.filter((c) => lowF[c.lower]!.F2 === 4 && upF[c.upper]!.F2 === Fu2).reduce((s, c) => s.add(c.strength), new Dec(0));
    const fromF2 = share(6).add(share(4)).add(share(2));
    // Steck, table of relative hyperfine transition strength factors S_FF'
    close(share(6).div(fromF2), dec("0.7"), "1e-6");
    close(share(4).div(fromF2), dec("0.25"), "1e-6");
    close(share(2).div(fromF2), dec("0.05"), "1e-6");
  });
});

describe("lineComponentsAtField for an octupole (E3) line", () => {
  // Input only (values near those of 171Yb+, 4f13 6s2 2F°7/2 → 6s 2S1/2 at 467 nm): I = 1/2, gI from μ = +0.4937 μN.
  const gI = dec("-0.0005377");
  const ground = { J2: 1, I2: 1, gJ: dec("2.0026"), gI, A: dec("12642812118.466"), B: dec("0"), muB_h };
  const upper = { J2: 7, I2: 1, gJ: dec("1.145"), gI, A: dec("-3.6e9"), B: dec("0"), muB_h };
  const at = (B: string) => {
    const up = solveHyperfineZeeman(upper, dec(B));
    const low = solveHyperfineZeeman(ground, dec(B));
    return { up, low, comps: lineComponentsAtField(statesFromHyperfine(7, up), statesFromHyperfine(1, low), 3) };
  };

  it("gives each Δm = q of −3 … 3 one seventh of the strength at every field", () => {
    for (const B of ["1e-9", "0.01", "1"]) {
      const { comps } = at(B);
      expect(new Set(comps.map((c) => c.q))).toEqual(new Set([-3, -2, -1, 0, 1, 2, 3]));
      close(comps.reduce((s, c) => s.add(c.strength), new Dec(0)), dec("1"), "1e-45");
      for (let q = -3; q <= 3; q++) {
        // Σ_ul |⟨u|T_q|l⟩|² is a trace, the same in every basis: 1/(2k+1) of the total (common practice)
        close(comps.filter((c) => c.q === q).reduce((s, c) => s.add(c.strength), new Dec(0)), dec("1").div(7), "1e-45");
      }
    }
  });

  it("gives the clock component F = 0, mF = 0 → F′ = 3, mF′ = 0 1/28 of the line at a vanishing field, as the weak-field pattern", () => {
    // 1/4 (group F = 0 → F′ = 3) × 1/7 (its Δm = 0 share): sympy fixture, test/physics/hyperfineLines.test.ts
    const { up, low, comps } = at("1e-9");
    const clock = comps.find((c) => low[c.lower]!.F2 === 0 && up[c.upper]!.F2 === 6 && up[c.upper]!.mF2 === 0)!;
    close(clock.strength, dec("1").div(28), "1e-12");
  });
});

describe("lines from term states (statesFromTerm, sublevelLabel, lineReducedElement, ownPairReducedElement)", () => {
  // 6Li 2P: I = 1, gI = −0.0004476540, 2P1/2 at 446.789634 THz (A = 17.386 MHz), 2P3/2 at 446.799677 THz
  // (A = −1.155 MHz, B = −0.10 MHz): M. E. Gehm, "Properties of 6Li", from memory (as scripts/fixtures/term_zeeman.py)
  const li6: TermProblem = {
    S2: 1, L: 1, I2: 2, gL: dec("1"), gS, gI: dec("-0.0004476540"), muB_h,
    levels: [
      { J2: 1, energy: dec("446.789634e12"), gJ: dec("2").div(3), A: dec("17.386e6"), B: dec("0") },
      { J2: 3, energy: dec("446.799677e12"), gJ: dec("4").div(3), A: dec("-1.155e6"), B: dec("-0.10e6") },
    ],
  };

  it("labels sublevels F, mF with nuclear spin and mJ without", () => {
    expect(sublevelLabel(2, 3, 1)).toBe("F=3/2, mF=1/2");
    expect(sublevelLabel(0, 5, -3)).toBe("mJ=-3/2");
    const noSpin = statesFromHyperfine(1, solveHyperfineZeeman({ J2: 1, I2: 0, gJ: dec("2"), gI: dec("0"), A: dec("0"), B: dec("0"), muB_h }, dec("1")), 0);
    expect(noSpin.map((s) => s.label)).toEqual(["mJ=-1/2", "mJ=1/2"]);
  });

  it("repeats statesFromTerm's worked example: 6Li 2P3/2 at 832 G has twelve states, all but the stretched ones with amplitude on J = 1/2", () => {
    const st = statesFromTerm(2, termHyperfineZeemanSolver(li6)(dec("0.0832"))[1]!);
    expect(st).toHaveLength(12); // (2J + 1)(2I + 1) = 4 · 3
    expect(st[0]!.label).toBe("F=1/2, mF=-1/2");
    expect(st[11]!.label).toBe("F=5/2, mF=5/2");
    for (const s of st) {
      const onHalf = s.amplitudes.some((a) => a.J2 === 1 && !a.amplitude.isZero());
      expect(onHalf, s.label).toBe(Math.abs(s.M2) !== 5);
    }
  });

  it("takes the LS reduced elements between the J of the terms, or the line's own pair where LS gives none or does not apply", () => {
    const own = ownPairReducedElement(3, 1);
    expect([own(3, 1).toNumber(), own(1, 1).toNumber()]).toEqual([1, 0]);
    const ls = lineReducedElement("LS", 1, 0, 1, 1, 3, 1);
    // D2 : D1 = 2 : 1 (common practice)
    close(ls(3, 1).pow(2).div(ls(1, 1).pow(2)), dec("2"), "1e-50");
    expect(lineReducedElement("own J pair", 1, 0, 1, 1, 3, 1)(1, 1).isZero()).toBe(true);
    // an E1 line listed between a D and an S term: LS (triangle 2, 1, 0) gives nothing, so the line's own pair
    const dToS = lineReducedElement("LS", 2, 0, 1, 1, 5, 1);
    expect([dToS(5, 1).toNumber(), dToS(3, 1).toNumber()]).toEqual([1, 0]);
  });

  it("gives Steck's 87Rb D2 F = 2 → F′ = 3, 2, 1 shares 7/10, 1/4, 1/20 at a vanishing field from the 5p term states", () => {
    // D. A. Steck, "Rubidium 87 D Line Data": as in the test above; 5²P1/2 A = 408.328 MHz, energies the D-line wave numbers
    const gI = dec("-0.0009951414");
    const term: TermProblem = {
      S2: 1, L: 1, I2: 3, gL: dec("1"), gS, gI, muB_h,
      levels: [
        { J2: 1, energy: toSI(dec("12578.951"), "cm-1"), gJ: dec("2").div(3), A: dec("408328000"), B: dec("0") },
        { J2: 3, energy: toSI(dec("12816.549"), "cm-1"), gJ: dec("1.3362"), A: dec("84718500"), B: dec("12496500") },
      ],
    };
    const B = dec("1e-9");
    const up = termHyperfineZeemanSolver(term)(B)[1]!;
    const lowF = solveHyperfineZeeman({ J2: 1, I2: 3, gJ: dec("2.00233113"), gI, A: dec("3417341305.452145"), B: dec("0"), muB_h }, B);
    const comps = lineComponentsAtField(statesFromTerm(3, up), statesFromHyperfine(1, lowF), 1, lineReducedElement("LS", 1, 0, 1, 1, 3, 1));
    const share = (Fu2: number) => comps.filter((c) => lowF[c.lower]!.F2 === 4 && up[c.upper]!.F2 === Fu2).reduce((s, c) => s.add(c.strength), new Dec(0));
    const fromF2 = share(6).add(share(4)).add(share(2));
    close(share(6).div(fromF2), dec("0.7"), "1e-6");
    close(share(4).div(fromF2), dec("0.25"), "1e-6");
    close(share(2).div(fromF2), dec("0.05"), "1e-6");
  });
});
