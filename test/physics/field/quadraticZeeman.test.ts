import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { jzSquaredElement, quadraticZeemanCoefficient, quadraticZeemanCoefficients } from "../../../src/physics/field/quadraticZeeman.js";
import { solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { CS133_6S, K40_4S, RB87_5P32, RB87_5S } from "./levels.js";

const clock = (lv: HyperfineZeemanLevel, lower: number, upper: number) =>
  quadraticZeemanCoefficient(lv, upper, 0)!.minus(quadraticZeemanCoefficient(lv, lower, 0)!).mul(dec("1e-8"));

describe("quadratic Zeeman coefficients", () => {
  it("gives |⟨1 0|Jz|2 0⟩|² = 1/4 for I = 3/2, J = 1/2 (doc example)", () => {
    expect(jzSquaredElement(1, 3, 4, 2, 0).toString()).toBe("1/4"); // common practice (Clebsch–Gordan, 50/50 mixture)
  });

  it("reproduces the 87Rb clock-transition coefficient 575.15 Hz/G²", () => {
    // D. A. Steck, "Rubidium 87 D Line Data", Table 4: 575.15 Hz/G²; we get 575.14599
    expect(Math.abs(clock(RB87_5S, 2, 4).toNumber() - 575.15)).toBeLessThan(0.01);
  });

  it("reproduces the 133Cs clock-transition coefficient 427.45 Hz/G²", () => {
    // D. A. Steck, "Cesium D Line Data", Table 4: 427.45 Hz/G²; we get 427.45335
    expect(Math.abs(clock(CS133_6S, 6, 8).toNumber() - 427.45)).toBeLessThan(0.01);
  });

  it("matches a finite difference of the exact energies for every sublevel", () => {
    for (const lv of [RB87_5S, RB87_5P32, K40_4S]) {
      const h = dec("1e-6"); // T; the cubic term is ~ (μB B/ΔE) smaller than the quadratic one
      const e0 = solveHyperfineZeeman(lv, dec("0"));
      const ep = solveHyperfineZeeman(lv, h);
      for (const c of quadraticZeemanCoefficients(lv)) {
        const i = e0.findIndex((s) => s.F2 === c.F2 && s.mF2 === c.mF2);
        const j = e0.findIndex((s) => s.F2 === c.F2 && s.mF2 === -c.mF2);
        // E(m, B) + E(−m, B) − 2E(0) = 2βB² + O(B⁴) when β(m) = β(−m), which holds for this Hamiltonian
        const fd: Dec = ep[i]!.energy.plus(ep[j]!.energy).minus(e0[i]!.energy.mul(2)).div(h.mul(h).mul(2));
        expect(fd.minus(c.perTesla2!).abs().div(c.perTesla2!.abs().plus(1)).lt(dec("1e-4"))).toBe(true);
      }
    }
  });
});
