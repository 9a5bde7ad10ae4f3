import { describe, expect, it } from "vitest";
import { dec, ZERO } from "../../../src/physics/decimal.js";
import { linearValidity, paschenBackField } from "../../../src/physics/field/validity.js";
import { solveHyperfineZeeman } from "../../../src/physics/field/hyperfineZeeman.js";
import { gF } from "../../../src/physics/hyperfine.js";
import { CS133_6S, RB87_5S } from "./levels.js";

describe("linearValidity", () => {
  it("gives the 87Rb Paschen–Back field 2A/((μB/h)gJ) = 0.2438770 T (doc example)", () => {
    // 6834.68261090429 MHz / (13996244917.1 Hz/T × 2.00233113), hand arithmetic
    expect(paschenBackField(RB87_5S)!.toSignificantDigits(7).toString()).toBe("0.243877");
  });

  it("finds the 1 kHz limit of 87Rb where the clock states' quadratic shift reaches 1 kHz", () => {
    const v = linearValidity(RB87_5S);
    // |F=1 or 2, mF=0⟩ shift ±287.573 Hz/G² (half of Steck's 575.15 Hz/G²): 1 kHz at √(1000/287.573) G ≈ 1.865 G
    expect(v.absolute.sublevel!.mF2).toBe(0);
    expect(Math.abs(v.absolute.tesla!.toNumber() - 1.8648e-4)).toBeLessThan(0.002e-4);
    // relative 1 %: set by a state with linear shift ≈ 0.7 MHz/G and quadratic ≈ 215 Hz/G² → ~32 G (order of magnitude check)
    expect(v.relative.tesla!.toNumber()).toBeGreaterThan(1e-3);
    expect(v.relative.tesla!.toNumber()).toBeLessThan(1e-2);
  });

  it("gives 0 T and no Paschen–Back scale for a level whose F levels coincide (A = B = 0; issue 10, defect 1)", () => {
    // Without hyperfine coupling the field eigenstates are |mJ mI⟩ at every B > 0 (degenerate
    // perturbation theory, common practice), so gF·mF of the zero-field F states holds at no field.
    // Before the degenerate case was handled, this search did not end.
    const v = linearValidity({ ...RB87_5S, J2: 3, gJ: dec("1.3341"), A: ZERO });
    expect(v.relative.tesla!.isZero()).toBe(true);
    expect(v.paschenBackTesla).toBeNull();
    // a J = 0 level with nuclear spin and A = 0 has one F = I: exactly linear, never broken
    const j0 = linearValidity({ ...RB87_5S, J2: 0, gJ: ZERO, A: ZERO });
    expect(j0.relative.tesla).toBeNull();
    expect(j0.absolute.tesla).toBeNull();
  });

  it("reports beyond range when the tolerance is never broken", () => {
    const v = linearValidity(RB87_5S, { absoluteHz: dec("1e30"), relative: dec("1e30"), maxTesla: dec("0.001") });
    expect(v.absolute.tesla).toBeNull();
    expect(v.relative.tesla).toBeNull();
  });

  it("reports the float-derived 1 kHz field where the exact Dec deviation crosses 1 kHz, to 1e-6 relative", () => {
    for (const level of [RB87_5S, CS133_6S]) {
      const v = linearValidity(level);
      const { F2, mF2 } = v.absolute.sublevel!;
      const deviation = (t: string) => {
        const b = v.absolute.tesla!.mul(dec(t));
        const s = solveHyperfineZeeman(level, b).find((x) => x.F2 === F2 && x.mF2 === mF2)!;
        const s0 = solveHyperfineZeeman(level, dec("0")).find((x) => x.F2 === F2 && x.mF2 === mF2)!;
        const g = gF(level.gJ, level.gI, level.I2, level.J2, F2) ?? dec("0");
        const linear = level.muB_h.mul(g).mul(mF2).div(2).mul(b);
        return linear.minus(s.energy.minus(s0.energy)).abs();
      };
      // the criterion's own definition: |linear − exact| ≤ 1000 Hz (module comment)
      expect(deviation("0.999999").lte(dec("1000"))).toBe(true);
      expect(deviation("1.000001").gt(dec("1000"))).toBe(true);
    }
  });
});
