/**
 * The float64 twins the field calculator uses (solveHyperfineZeemanFloat,
 * fineStructureFloatEigen, statesFrom…Float, lineComponentsFloat) and the
 * shared transition list (sublevelTransitionPairs): their worked examples,
 * and agreement with the outside world (mpmath fixtures, textbook strengths)
 * and with their Dec counterparts.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { toSI } from "../../../src/physics/units.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { orbitalG } from "../../../src/physics/lande.js";
import { prepareHyperfineZeeman, solveHyperfineZeeman } from "../../../src/physics/field/hyperfineZeeman.js";
import { solveHyperfineZeemanFloat } from "../../../src/physics/field/hyperfineZeemanFloat.js";
import { solveFineStructure, type FineStructureTerm } from "../../../src/physics/field/fineStructure.js";
import { fineStructureFloatEigen } from "../../../src/physics/field/fineStructureFloat.js";
import {
  lineComponentsAtField,
  lineReducedElement,
  lsReducedElement,
  singleReducedElement,
  statesFromFineStructure,
  statesFromHyperfine,
  statesFromTerm,
} from "../../../src/physics/field/lineAtField.js";
import {
  lineComponentsFloat,
  statesFromFineStructureFloat,
  statesFromHyperfineFloat,
  statesFromTermFloat,
} from "../../../src/physics/field/lineAtFieldFloat.js";
import { prepareTerm, termHyperfineZeemanSolver, type TermProblem } from "../../../src/physics/field/termHyperfineZeeman.js";
import { termHyperfineZeemanFloatSolver } from "../../../src/physics/field/termHyperfineZeemanFloat.js";
import { sublevelTransitionPairs, sublevelTransitions } from "../../../src/physics/field/sublevelTransitions.js";
import { CS133_6S, RB87_5P32, RB87_5S, muB_h } from "./levels.js";

const eigen = JSON.parse(readFileSync(new URL("../../fixtures/field/eigen-mpmath.json", import.meta.url), "utf8")) as {
  levels: { name: string; fields: { tesla: string; energies: string[] }[] }[];
};
const fsFixture = JSON.parse(readFileSync(new URL("../../fixtures/fs/na3p_paschen_back.json", import.meta.url), "utf8")) as {
  levels: { tesla: string; energies_Hz: string[] }[];
};

const relClose = (a: number, b: number, rel: number) => Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b), 1);

const gS = val(CODATA_2022.g_e).neg();
// Na 3p 2P1/2 and 2P3/2 level energies: NIST ASD (Juncar et al. 1981), from memory.
const E12 = toSI(dec("16956.1702"), "cm-1");
const E32 = toSI(dec("16973.3661"), "cm-1");
// 23Na atomic mass 22.9897692820 u: AME2020, from memory.
const gL = orbitalG(dec("22.9897692820"), val(CODATA_2022.m_e_u));
const na3p: FineStructureTerm = { S2: 1, L: 1, partners: [{ J2: 1, energy: E12 }, { J2: 3, energy: E32 }], gL, gS, muB_h };
const na3s: FineStructureTerm = { S2: 1, L: 0, partners: [{ J2: 1, energy: dec("0") }], gL, gS, muB_h };

describe("solveHyperfineZeemanFloat", () => {
  it("repeats its worked example: 87Rb 5²S1/2 at 0 T", () => {
    const states = solveHyperfineZeemanFloat(prepareHyperfineZeeman(RB87_5S), 0);
    const A = 3417.341305452145e6; // Steck, Rubidium 87 D Line Data
    expect(states.map((s) => [s.F2, s.mF2])).toEqual([[2, -2], [2, 0], [2, 2], [4, -4], [4, -2], [4, 0], [4, 2], [4, 4]]);
    for (const s of states) expect(relClose(s.energy, s.F2 === 2 ? (-5 * A) / 4 : (3 * A) / 4, 1e-15)).toBe(true);
    const last = states[7]!;
    expect(last.highField).toEqual({ mJ2: 1, mI2: 3 });
    expect(last.vector.map(Math.abs)).toEqual([1]);
  });

  it("gives the 50-digit mpmath eigenvalues (eigen-mpmath.json) to 1e-15 of the largest", () => {
    const levels = { "87Rb 5S1/2": RB87_5S, "87Rb 5P3/2": RB87_5P32, "133Cs 6S1/2": CS133_6S } as const;
    for (const [name, level] of Object.entries(levels)) {
      const fx = eigen.levels.find((l) => l.name === name)!;
      const prepared = prepareHyperfineZeeman(level);
      for (const f of fx.fields) {
        const got = solveHyperfineZeemanFloat(prepared, Number(f.tesla)).map((s) => s.energy).sort((a, b) => a - b);
        const want = f.energies.map(Number);
        const scale = Math.max(...want.map(Math.abs));
        got.forEach((e, i) => expect(Math.abs(e - want[i]!), `${name} at ${f.tesla} T`).toBeLessThan(1e-15 * scale * 8));
      }
    }
  });

  it("labels and orders states as the Dec solver, with the same eigenvectors up to sign", () => {
    for (const level of [RB87_5S, RB87_5P32, CS133_6S]) {
      const prepared = prepareHyperfineZeeman(level);
      for (const B of ["0", "0.00047", "0.05", "0.37", "3"]) {
        const d = solveHyperfineZeeman(level, dec(B));
        const f = solveHyperfineZeemanFloat(prepared, Number(B));
        expect(f.map((s) => [s.F2, s.mF2, s.highField])).toEqual(d.map((s) => [s.F2, s.mF2, s.highField]));
        f.forEach((s, i) => {
          const v = d[i]!.vector.map((x) => x.toNumber());
          const dot = s.vector.reduce((acc, x, k) => acc + x * v[k]!, 0);
          expect(Math.abs(Math.abs(dot) - 1)).toBeLessThan(1e-12);
        });
      }
    }
  });

  it("refuses negative fields", () => {
    expect(() => solveHyperfineZeemanFloat(prepareHyperfineZeeman(RB87_5S), -1)).toThrow(RangeError);
  });
});

describe("fineStructureFloatEigen", () => {
  it("repeats its worked example: Na 3p at 0 T, pure states 17.1959 cm⁻¹ apart", () => {
    const fs = fineStructureFloatEigen(na3p);
    const states = fs.solve(0);
    expect(states.map((s) => [s.J2, s.mJ2])).toEqual([[1, -1], [1, 1], [3, -3], [3, -1], [3, 1], [3, 3]]);
    const interval = 17.1959 * 29979245800; // cm⁻¹ → Hz (c exact)
    expect(relClose(fs.offsets.get(3)!, interval, 1e-15)).toBe(true);
    for (const s of states) {
      expect(relClose(s.energy, s.J2 === 1 ? 0 : interval, 1e-12)).toBe(true);
      expect(s.coupled.find((c) => c.J2 === s.J2)!.amplitude).toBeCloseTo(1, 14);
    }
  });

  it("gives the 50-digit mpmath energies of Na 3p (na3p_paschen_back.json) to 1e-15 of the interval", () => {
    const fs = fineStructureFloatEigen(na3p);
    for (const level of fsFixture.levels) {
      const got = fs.solve(Number(level.tesla)).map((s) => s.energy).sort((a, b) => a - b);
      const scale = Math.max(fs.offsets.get(3)!, muB_h.toNumber() * Number(level.tesla));
      // fixture energies are absolute; subtract E(2P1/2) in Dec before rounding
      level.energies_Hz.forEach((e, i) => expect(Math.abs(got[i]! - dec(e).sub(E12).toNumber()), `${level.tesla} T`).toBeLessThan(4e-15 * scale));
    }
  });

  it("gives the Dec solver's states and amplitudes at 1 T", () => {
    const d = solveFineStructure(na3p, dec("1"));
    const f = fineStructureFloatEigen(na3p).solve(1);
    expect(f.map((s) => [s.J2, s.mJ2])).toEqual(d.map((s) => [s.J2, s.mJ2]));
    f.forEach((s, i) => {
      expect(Math.abs(s.energy - d[i]!.energy.sub(E12).toNumber())).toBeLessThan(1e-3);
      s.coupled.forEach((c, k) => expect(Math.abs(c.amplitude - d[i]!.coupled[k]!.amplitude.toNumber())).toBeLessThan(1e-14));
    });
  });
});

describe("line components in float64", () => {
  it("repeats the worked example: textbook Na D2 strengths 1/4, 1/12, 1/6 far below the Paschen–Back region", () => {
    const fs = fineStructureFloatEigen(na3p);
    const up = statesFromFineStructureFloat(fs.solve(1e-9), fs.offsets.get(3)!).filter((s) => s.label.startsWith("J=3/2"));
    const low = statesFromFineStructureFloat(fineStructureFloatEigen(na3s).solve(1e-9), 0);
    const comps = lineComponentsFloat(1, lsReducedElement(1, 0, 1, 1))(up, low).filter((c) => c.strength > 1e-12);
    expect(comps).toHaveLength(6);
    // squared 3j strengths of 2P3/2 → 2S1/2: 1/4, 1/12, 1/6 (Condon and Shortley ch. XVI)
    const want: Record<string, number> = { "3,1": 1 / 4, "1,-1": 1 / 12, "1,1": 1 / 6, "-1,-1": 1 / 6, "-1,1": 1 / 12, "-3,-1": 1 / 4 };
    for (const c of comps) expect(relClose(c.strength, want[`${up[c.upper]!.M2},${low[c.lower]!.M2}`]!, 1e-9)).toBe(true);
  });

  it("labels states as the Dec versions (statesFromFineStructureFloat, statesFromHyperfineFloat)", () => {
    const fs = fineStructureFloatEigen(na3p);
    const f = statesFromFineStructureFloat(fs.solve(1), fs.offsets.get(3)!);
    const d = statesFromFineStructure(solveFineStructure(na3p, dec("1")), E32);
    expect(f.map((s) => [s.label, s.M2])).toEqual(d.map((s) => [s.label, s.M2]));
    f.forEach((s, i) => expect(Math.abs(s.energy - d[i]!.energy.toNumber())).toBeLessThan(1e-3));
    const hf = statesFromHyperfineFloat(1, solveHyperfineZeemanFloat(prepareHyperfineZeeman(RB87_5S), 0.01));
    expect(hf.map((s) => s.label)).toEqual(["F=1, mF=-1", "F=1, mF=0", "F=1, mF=1", "F=2, mF=-2", "F=2, mF=-1", "F=2, mF=0", "F=2, mF=1", "F=2, mF=2"]);
    expect(hf.map((s) => s.label)).toEqual(statesFromHyperfine(1, solveHyperfineZeeman(RB87_5S, dec("0.01"))).map((s) => s.label));
  });

  it("equals lineComponentsAtField for 87Rb D2 in the hyperfine–Zeeman eigenstates, pair by pair", () => {
    for (const B of ["0", "0.00047", "0.37"]) {
      const upD = statesFromHyperfine(3, solveHyperfineZeeman(RB87_5P32, dec(B)));
      const lowD = statesFromHyperfine(1, solveHyperfineZeeman(RB87_5S, dec(B)));
      const upF = statesFromHyperfineFloat(3, solveHyperfineZeemanFloat(prepareHyperfineZeeman(RB87_5P32), Number(B)));
      const lowF = statesFromHyperfineFloat(1, solveHyperfineZeemanFloat(prepareHyperfineZeeman(RB87_5S), Number(B)));
      const d = lineComponentsAtField(upD, lowD, 1, singleReducedElement);
      const f = lineComponentsFloat(1, singleReducedElement)(upF, lowF);
      expect(f.map((c) => [c.upper, c.lower, c.q, c.polarization])).toEqual(d.map((c) => [c.upper, c.lower, c.q, c.polarization]));
      f.forEach((c, i) => {
        expect(Math.abs(c.strength - d[i]!.strength.toNumber()), `${B} T`).toBeLessThan(1e-14);
        expect(Math.abs(c.shift - d[i]!.shift.toNumber())).toBeLessThan(1e-4);
      });
      // strengths sum to 1 (normalization) and each q to 1/3 (a trace; common practice)
      expect(f.reduce((s, c) => s + c.strength, 0)).toBeCloseTo(1, 14);
      for (const q of [-1, 0, 1]) expect(f.filter((c) => c.q === q).reduce((s, c) => s + c.strength, 0)).toBeCloseTo(1 / 3, 14);
    }
  });
});

describe("line components from term states in float64 (statesFromTermFloat with lineComponentsFloat)", () => {
  it("equal the Dec ones for 87Rb D2 with 5²P3/2 solved in its 5p term, pair by pair, with the labels of statesFromTerm", () => {
    // D. A. Steck, "Rubidium 87 D Line Data" (from memory): 5²P1/2 A = 408.328 MHz; 5²P3/2 as RB87_5P32; D-line wave numbers
    const term: TermProblem = {
      S2: 1, L: 1, I2: 3, gL: dec("1"), gS: val(CODATA_2022.g_e).neg(), gI: RB87_5P32.gI, muB_h,
      levels: [
        { J2: 1, energy: toSI(dec("12578.951"), "cm-1"), gJ: dec("2").div(3), A: dec("408328000"), B: dec("0") },
        { J2: 3, energy: toSI(dec("12816.549"), "cm-1"), gJ: RB87_5P32.gJ, A: RB87_5P32.A, B: RB87_5P32.B },
      ],
    };
    const prepared = prepareTerm(term);
    const reduced = lineReducedElement("LS", 1, 0, 1, 1, 3, 1);
    for (const B of ["0", "0.00047", "0.37"]) {
      const upD = statesFromTerm(3, termHyperfineZeemanSolver(prepared)(dec(B))[1]!);
      const lowD = statesFromHyperfine(1, solveHyperfineZeeman(RB87_5S, dec(B)));
      const upF = statesFromTermFloat(3, termHyperfineZeemanFloatSolver(prepared)(Number(B))[1]!);
      const lowF = statesFromHyperfineFloat(1, solveHyperfineZeemanFloat(prepareHyperfineZeeman(RB87_5S), Number(B)));
      expect(upF.map((s) => [s.label, s.M2])).toEqual(upD.map((s) => [s.label, s.M2]));
      const d = lineComponentsAtField(upD, lowD, 1, reduced);
      const f = lineComponentsFloat(1, reduced)(upF, lowF);
      expect(f.map((c) => [c.upper, c.lower, c.q])).toEqual(d.map((c) => [c.upper, c.lower, c.q]));
      f.forEach((c, i) => {
        expect(Math.abs(c.strength - d[i]!.strength.toNumber()), `${B} T`).toBeLessThan(1e-14);
        expect(Math.abs(c.shift - d[i]!.shift.toNumber())).toBeLessThan(1e-4);
      });
    }
  });
});

describe("sublevelTransitionPairs", () => {
  it("repeats its worked example: 87Rb 5²S1/2 has 23 lines, 15 magnetic-dipole and 8 two-photon", () => {
    const { labels, pairs } = sublevelTransitionPairs(RB87_5S);
    // ΔF = 0, ±1 with ΔmF = 0, ±1 except ΔF = ΔmF = 0; ΔmF = ±2 with |ΔF| ≤ 2, i.e. two magnetic-dipole steps (Corney ch. 4 and 16):
    // 4 between F = 1 and 2, 3 within F = 2 and 1 within F = 1 (issue 10, defect 5)
    expect(pairs.filter((p) => p.kind === "magnetic-dipole")).toHaveLength(15);
    expect(pairs.filter((p) => p.kind === "two-photon")).toHaveLength(8);
    const first = pairs[0]!;
    // gF(F=1) < 0 for 87Rb, so |1, −1⟩ has the larger slope and is the upper end (orientation rule)
    expect([labels[first.lo], labels[first.up]]).toEqual([{ F2: 2, mF2: 0 }, { F2: 2, mF2: -2 }]);
  });

  it("lists the lines sublevelTransitions lists, in its order", () => {
    for (const level of [RB87_5S, RB87_5P32, CS133_6S]) {
      const { labels, pairs } = sublevelTransitionPairs(level);
      const full = sublevelTransitions(level, [dec("0.001")], { toTesla: new Dec("1e-6") });
      expect(pairs.map((p) => [labels[p.lo], labels[p.up], p.kind])).toEqual(full.map((t) => [t.lower, t.upper, t.kind]));
    }
  });
});
