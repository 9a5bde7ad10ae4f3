import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { breitRabiEnergy } from "../../../src/physics/field/breitRabi.js";
import { solveHyperfineZeeman } from "../../../src/physics/field/hyperfineZeeman.js";
import { CS133_6S, H1_2P32, K40_4S, RB87_5P32, RB87_5S } from "./levels.js";

describe("breitRabiEnergy", () => {
  it("agrees with the general solver to 30 significant digits, stretched states and inverted structure included", () => {
    for (const level of [RB87_5S, CS133_6S, K40_4S, H1_2P32]) {
      for (const t of ["0", "0.00003", "0.05", "0.2438", "0.7", "12"]) {
        for (const s of solveHyperfineZeeman(level, dec(t))) {
          const br = breitRabiEnergy(level, s.F2, s.mF2, dec(t));
          const scale = level.A.abs().mul(level.I2 + level.J2).plus(level.muB_h.mul(dec(t)).mul(level.gJ));
          expect(br.minus(s.energy).abs().div(scale).lt(dec("1e-30"))).toBe(true);
        }
      }
    }
  });

  it("puts |F=2, mF=2⟩ of 87Rb at 3A/4 + (μB/h)(gJ/2 + 3gI/2)B (doc example)", () => {
    const e = breitRabiEnergy(RB87_5S, 4, 4, dec("0.1"));
    expect(e.minus(dec("2563005979.08910875")).minus(dec("1399166608.616448099459")).abs().lt(dec("1e-40"))).toBe(true);
  });

  it("refuses levels where neither J nor I is 1/2", () => {
    expect(() => breitRabiEnergy(RB87_5P32, 6, 0, dec("0.1"))).toThrow(RangeError);
  });
});
