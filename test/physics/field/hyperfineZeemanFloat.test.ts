import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { prepareHyperfineZeeman, solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { curvatureFloat, hyperfineZeemanFloatSolver, solveBlockFloat } from "../../../src/physics/field/hyperfineZeemanFloat.js";
import { RB87_5P32, RB87_5S, muB_h } from "./levels.js";

interface FixtureLevel {
  name: string; J2: number; I2: number; gJ: string; gI: string; A: string; B: string;
  fields: { tesla: string; energies: string[] }[];
}
const fixture = JSON.parse(readFileSync(new URL("../../fixtures/field/eigen-mpmath.json", import.meta.url), "utf8")) as {
  muB_h: string; levels: FixtureLevel[];
};

describe("hyperfineZeemanFloatSolver", () => {
  for (const lv of fixture.levels) {
    it(`matches the 50-digit mpmath eigenvalues of ${lv.name} to 1e-13 of the largest |E|`, () => {
      // fixture: scripts/fixtures/field_eigen.py (mpmath.eigsy on the full spin-matrix Hamiltonian)
      const level: HyperfineZeemanLevel = {
        J2: lv.J2, I2: lv.I2, gJ: dec(lv.gJ), gI: dec(lv.gI), A: dec(lv.A), B: dec(lv.B), muB_h: dec(fixture.muB_h),
      };
      const solve = hyperfineZeemanFloatSolver(level);
      for (const f of lv.fields) {
        const ours = [...solve(Number(f.tesla)).energy].sort((a, b) => a - b);
        const ref = f.energies.map(Number);
        const scale = Math.max(...ref.map(Math.abs));
        ours.forEach((e, i) => expect(Math.abs(e - ref[i]!) / scale).toBeLessThan(1e-13));
      }
    });
  }

  it("puts the 87Rb F levels at −5A/4 and 3A/4 and moves |2, 2⟩ with slope (μB/h)(gJ/2 + 3gI/2) (doc example)", () => {
    const zero = hyperfineZeemanFloatSolver(RB87_5S)(0);
    // energies come in (F, mF) order: three F = 1 states, then five F = 2 states
    for (let i = 0; i < 3; i++) expect(Math.abs(zero.energy[i]! / -4271676631.81518125 - 1)).toBeLessThan(1e-14); // −5A/4, Steck A
    for (let i = 3; i < 8; i++) expect(Math.abs(zero.energy[i]! / 2563005979.08910875 - 1)).toBeLessThan(1e-14); // 3A/4
    const s = hyperfineZeemanFloatSolver(RB87_5S)(0.3).slope[7]!;
    const expected = muB_h.mul(RB87_5S.gJ.div(2).plus(RB87_5S.gI.mul(dec("1.5")))).toNumber(); // closed form, common practice
    expect(Math.abs(s / expected - 1)).toBeLessThan(1e-14);
  });

  it("keeps the Dec solver's (F, mF) order and labels", () => {
    const dec0 = solveHyperfineZeeman(RB87_5P32, dec("0.02"));
    const fl = hyperfineZeemanFloatSolver(RB87_5P32)(0.02);
    dec0.forEach((s, i) => {
      expect(Math.abs(fl.energy[i]! - s.energy.toNumber())).toBeLessThan(1e-5); // Hz, on energies ~1e8 Hz
      expect(Math.abs(fl.slope[i]! - s.slope.toNumber())).toBeLessThan(1e-9 * muB_h.toNumber());
    });
  });

  it("gives the 87Rb clock-line curvature 2 × 575.15 Hz/G² at weak field", () => {
    const prepared = prepareHyperfineZeeman(RB87_5S);
    const block = prepared.blocks.find((b) => b.M2 === 0)!;
    const sol = solveBlockFloat(prepared, block, 1e-7);
    // rank 1 is F = 2 (upper), rank 0 is F = 1; f = E(2,0) − E(1,0) = f0 + 575.15 Hz/G²·B² (Steck, Table 4)
    const f2 = (curvatureFloat(prepared, block, sol, 1) - curvatureFloat(prepared, block, sol, 0)) * 1e-8;
    expect(Math.abs(f2 / 2 - 575.15)).toBeLessThan(0.01);
  });
});

describe("prepareHyperfineZeeman", () => {
  it("splits 87Rb 5²S1/2 into M blocks of 1, 2, 2, 2, 1 states with |1/2, 3/2⟩ last in (F, mF) order (doc example)", () => {
    const p = prepareHyperfineZeeman(RB87_5S);
    // M = mJ + mI is conserved: block sizes count the (mJ, mI) pairs with that sum (common practice)
    expect(p.blocks.map((b) => b.basis.length)).toEqual([1, 2, 2, 2, 1]);
    const top = p.blocks.find((b) => b.M2 === 4)!;
    expect(top.basis).toEqual([{ mJ2: 1, mI2: 3 }]);
    expect(top.outIndex).toEqual([7]);
    expect(p.size).toBe(8);
  });
});
