import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { toSI } from "../../../src/physics/units.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { orbitalG } from "../../../src/physics/lande.js";
import {
  fineStructureSolver,
  fitSpinOrbit,
  linearPatternLimit,
  solveFineStructure,
  type FineStructureTerm,
} from "../../../src/physics/field/fineStructure.js";
import { symmetricEigen } from "../../../src/physics/field/fineStructureEigen.js";

const fixture = JSON.parse(readFileSync(new URL("../../fixtures/fs/na3p_paschen_back.json", import.meta.url), "utf8"));

const muB_h = val(CODATA_2022.muB_h);
const gS = val(CODATA_2022.g_e).neg();
// Na 3p 2P1/2 and 2P3/2 level energies: NIST ASD (Juncar et al. 1981), from memory.
const E12 = toSI(dec("16956.1702"), "cm-1");
const E32 = toSI(dec("16973.3661"), "cm-1");
// 23Na atomic mass 22.9897692820 u: AME2020, from memory.
const gL = orbitalG(dec("22.9897692820"), val(CODATA_2022.m_e_u));

const na3p: FineStructureTerm = {
  S2: 1,
  L: 1,
  partners: [
    { J2: 1, energy: E12 },
    { J2: 3, energy: E32 },
  ],
  gL,
  gS,
  muB_h,
};

function close(a: Dec, b: Dec, rel: string) {
  const scale = Dec.max(a.abs(), b.abs(), new Dec(1));
  expect(a.sub(b).abs().div(scale).lte(new Dec(rel)), `${a} vs ${b}`).toBe(true);
}

describe("symmetricEigen", () => {
  it("finds ±1 for the 2×2 exchange matrix", () => {
    // worked example of the doc comment: eigenvalues of [[0,1],[1,0]] are −1 and 1 (common practice)
    const pairs = symmetricEigen([
      [dec("0"), dec("1")],
      [dec("1"), dec("0")],
    ]);
    close(pairs[0]!.value, dec("-1"), "1e-50");
    close(pairs[1]!.value, dec("1"), "1e-50");
    close(pairs[1]!.vector[0]!.abs(), dec("0.5").sqrt(), "1e-50");
  });
});

describe("fitSpinOrbit", () => {
  it("takes ζ of Na 3p as two thirds of the fine-structure interval, with no residual", () => {
    const fit = fitSpinOrbit(na3p);
    // mpmath fixture (scripts/fixtures/fs_paschen_back.py): ζ = (E3/2 − E1/2)/(3/2)
    close(fit.zeta!, dec(fixture.zeta_Hz), "1e-40");
    close(fit.centre, dec(fixture.centre_Hz), "1e-40");
    expect(fit.rms.abs().lt(new Dec("1e-40"))).toBe(true);
  });

  it("reports the departure from the interval rule for a three-level term", () => {
    // O I 2p4 3P2, 3P1, 3P0 at 0, 158.265, 226.977 cm⁻¹ (NIST ASD, from memory): an inverted triplet
    // whose 3P2–3P1 : 3P1–3P0 intervals are 158.3 : 68.7 instead of the interval-rule 2 : 1.
    const oxygen: FineStructureTerm = {
      S2: 2,
      L: 1,
      partners: [
        { J2: 4, energy: toSI(dec("0"), "cm-1") },
        { J2: 2, energy: toSI(dec("158.265"), "cm-1") },
        { J2: 0, energy: toSI(dec("226.977"), "cm-1") },
      ],
      gL: dec("1"),
      gS,
      muB_h,
    };
    const fit = fitSpinOrbit(oxygen);
    expect(fit.zeta!.isNeg()).toBe(true); // inverted term: ζ < 0 (common practice)
    expect(fit.rms.gt(toSI(dec("1"), "cm-1"))).toBe(true);
    const sumResiduals = fit.residuals.reduce((s, r) => s.add(r.residual), new Dec(0));
    expect(sumResiduals.abs().lt(new Dec("1e-40"))).toBe(true); // least squares with intercept: residuals sum to 0 (common practice)
  });

  it("refuses a term with a missing partner", () => {
    expect(() => fitSpinOrbit({ ...na3p, partners: [{ J2: 3, energy: E32 }] })).toThrow(RangeError);
  });
});

describe("solveFineStructure", () => {
  it("reproduces the two J levels exactly at zero field", () => {
    const states = solveFineStructure(na3p, dec("0"));
    expect(states).toHaveLength(6);
    for (const s of states) {
      close(s.energy, s.J2 === 1 ? E12 : E32, "1e-50"); // NIST ASD energies, from memory
      const own = s.coupled.find((c) => c.J2 === s.J2)!;
      close(own.amplitude, dec("1"), "1e-50");
    }
  });

  it("matches the 50-digit mpmath diagonalization at every fixture field", () => {
    for (const level of fixture.levels as { tesla: string; energies_Hz: string[] }[]) {
      const states = solveFineStructure(na3p, dec(level.tesla));
      const got = states.map((s) => s.energy).sort((a, b) => a.cmp(b));
      // mpmath fixture test/fixtures/fs/na3p_paschen_back.json
      level.energies_Hz.forEach((e, i) => close(got[i]!, dec(e), "1e-40"));
    }
  });

  it("gives the mpmath energies at every fixture field from one prepared solver reused across fields", () => {
    const solve = fineStructureSolver(na3p);
    for (const level of fixture.levels as { tesla: string; energies_Hz: string[] }[]) {
      const got = solve(dec(level.tesla)).map((s) => s.energy).sort((a, b) => a.cmp(b));
      // mpmath fixture test/fixtures/fs/na3p_paschen_back.json
      level.energies_Hz.forEach((e, i) => close(got[i]!, dec(e), "1e-40"));
    }
  });

  it("keeps the trace of each mJ block linear in the field (sum rule)", () => {
    for (const B of ["0.3", "3", "300"]) {
      const states = solveFineStructure(na3p, dec(B));
      for (const m of [-3, -1, 1, 3]) {
        const block = states.filter((s) => s.mJ2 === m);
        const trace = block.reduce((s, x) => s.add(x.energy), new Dec(0));
        // Tr H_M = Σ_{J≥|M|} E_J + (μB/h)B Σ (gL mL + gS mS): trace invariance (common practice)
        let expected = new Dec(0);
        for (const s of block) {
          expected = expected.add(s.J2 === 1 ? E12 : E32);
          expected = expected.add(muB_h.mul(dec(B)).mul(gL.mul(s.mL2).add(gS.mul(s.mS2))).div(2));
        }
        close(trace, expected, "1e-45");
      }
    }
  });

  it("tends to the Paschen–Back energies c + (μB/h)B(gL mL + gS mS) + ζ mL mS at high field", () => {
    const fit = fitSpinOrbit(na3p);
    const err = (B: string) => {
      let worst = new Dec(0);
      for (const s of solveFineStructure(na3p, dec(B))) {
        const pb = fit.centre
          .add(muB_h.mul(dec(B)).mul(gL.mul(s.mL2).add(gS.mul(s.mS2))).div(2))
          .add(fit.zeta!.mul(s.mL2 * s.mS2).div(4));
        worst = Dec.max(worst, s.energy.sub(pb).abs());
      }
      return worst;
    };
    // the remaining error is second order, ~ζ²/((μB/h)B): ten times the field, a tenth the error (common practice)
    const e1 = err("1000");
    const e2 = err("10000");
    expect(e1.lt(fit.zeta!.mul("0.05"))).toBe(true);
    const ratio = e1.div(e2);
    expect(ratio.gt(9) && ratio.lt(11)).toBe(true);
  });

  it("labels the state (J = 3/2, mJ = 1/2) with its high-field limit |mL = 0, mS = +1/2⟩", () => {
    const states = solveFineStructure(na3p, dec("1"));
    const s = states.find((x) => x.J2 === 3 && x.mJ2 === 1)!;
    const partner = states.find((x) => x.J2 === 1 && x.mJ2 === 1)!;
    // rank order in the block: 2P3/2 above 2P1/2, and gL − gS/2 < gS/2 (Condon and Shortley §16.3)
    expect([s.mL2, s.mS2]).toEqual([0, 1]);
    expect([partner.mL2, partner.mS2]).toEqual([2, -1]);
    const norm = s.coupled.reduce((t, c) => t.add(c.amplitude.pow(2)), new Dec(0));
    close(norm, dec("1"), "1e-50");
  });
});

describe("linearPatternLimit", () => {
  it("finds where the Na 3p linear pattern is first 1 % off, as the mpmath root search does", () => {
    const limit = linearPatternLimit(na3p)!;
    const roots = fixture.one_percent_limits as { J2: number; mJ2: number; tesla: string }[];
    const first = roots.reduce((a, b) => (dec(a.tesla).lt(dec(b.tesla)) ? a : b));
    // mpmath fixture: first crossing over all sublevels
    expect([limit.J2, limit.mJ2]).toEqual([first.J2, first.mJ2]);
    // float-derived search rounded to 7 significant digits (documented: trust about 6)
    close(limit.tesla, dec(first.tesla), "1e-6");
  });

  it("returns null for a term with a single J", () => {
    const s: FineStructureTerm = { S2: 1, L: 0, partners: [{ J2: 1, energy: dec("0") }], gL, gS, muB_h };
    expect(linearPatternLimit(s)).toBeNull();
  });
});
