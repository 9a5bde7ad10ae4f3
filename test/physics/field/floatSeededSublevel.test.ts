import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { prepareHyperfineZeeman, solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { solveBlockFloat } from "../../../src/physics/field/hyperfineZeemanFloat.js";
import { refineSublevel } from "../../../src/physics/field/floatSeededSublevel.js";
import { CS133_6S, RB87_5P32, RB87_5S } from "./levels.js";

interface FixtureLevel {
  name: string; J2: number; I2: number; gJ: string; gI: string; A: string; B: string;
  fields: { tesla: string; energies: string[] }[];
}
const fixture = JSON.parse(readFileSync(new URL("../../fixtures/field/eigen-mpmath.json", import.meta.url), "utf8")) as {
  muB_h: string; levels: FixtureLevel[];
};

/** Every sublevel refined from float, in the solver's (F, mF) order. */
function refinedAll(level: HyperfineZeemanLevel, tesla: string) {
  const prepared = prepareHyperfineZeeman(level);
  const scale = prepared.muB_h.mul(dec(tesla));
  const out: { energy: Dec; slope: Dec }[] = new Array(prepared.size);
  for (const block of prepared.blocks) {
    const sol = solveBlockFloat(prepared, block, Number(tesla));
    block.outIndex.forEach((pos, k) => (out[pos] = refineSublevel(prepared, block, scale, sol, k)));
  }
  return out;
}

describe("refineSublevel", () => {
  for (const lv of fixture.levels) {
    it(`matches the 50-digit mpmath eigenvalues of ${lv.name} to 1e-28 of the largest |E| at non-zero fields`, () => {
      // fixture: scripts/fixtures/field_eigen.py (mpmath.eigsy on the full spin-matrix Hamiltonian)
      const level: HyperfineZeemanLevel = {
        J2: lv.J2, I2: lv.I2, gJ: dec(lv.gJ), gI: dec(lv.gI), A: dec(lv.A), B: dec(lv.B), muB_h: dec(fixture.muB_h),
      };
      for (const f of lv.fields.filter((x) => x.tesla !== "0")) {
        const ours = refinedAll(level, f.tesla).map((s) => s.energy).sort((a, b) => a.cmp(b));
        const ref = f.energies.map(dec);
        const scale = ref.reduce((m, x) => (x.abs().gt(m) ? x.abs() : m), dec("0"));
        ours.forEach((e, i) => expect(e.minus(ref[i]!).abs().div(scale).lt(dec("1e-28"))).toBe(true));
      }
    });
  }

  it("gives the Dec solver's slopes to 1e-28 relative (two methods compared)", () => {
    for (const level of [RB87_5S, RB87_5P32, CS133_6S]) {
      for (const t of ["0.0001", "0.05", "0.7"]) {
        const exact = solveHyperfineZeeman(level, dec(t));
        const ours = refinedAll(level, t);
        exact.forEach((s, i) => {
          const scale = level.muB_h.mul(level.gJ.abs());
          expect(ours[i]!.slope.minus(s.slope).abs().div(scale).lt(dec("1e-28"))).toBe(true);
        });
      }
    }
  });
});
