import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { linearValidity, paschenBackField } from "../../../src/physics/field/validity.js";
import { RB87_5S } from "./levels.js";

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

  it("reports beyond range when the tolerance is never broken", () => {
    const v = linearValidity(RB87_5S, { absoluteHz: dec("1e30"), relative: dec("1e30"), maxTesla: dec("0.001") });
    expect(v.absolute.tesla).toBeNull();
    expect(v.relative.tesla).toBeNull();
  });
});
