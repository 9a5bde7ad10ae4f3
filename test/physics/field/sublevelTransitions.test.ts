import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { sublevelTransitions } from "../../../src/physics/field/sublevelTransitions.js";
import { hyperfineZeemanSolver, solveHyperfineZeeman } from "../../../src/physics/field/hyperfineZeeman.js";
import { RB87_5S } from "./levels.js";

describe("sublevelTransitions", () => {
  const lines = sublevelTransitions(RB87_5S, [dec("0"), dec("0.0001")]);
  const find = (lo: [number, number], up: [number, number]) =>
    lines.find((l) => l.lower.F2 === lo[0] && l.lower.mF2 === lo[1] && l.upper.F2 === up[0] && l.upper.mF2 === up[1])!;

  it("finds the 87Rb two-photon line |1,−1⟩ ↔ |2,1⟩ field-insensitive near 3.23 G", () => {
    const l = find([2, -2], [4, 2]);
    expect(l.kind).toBe("two-photon");
    expect(l.zeroFieldHz.toString()).toBe("6834682610.90429"); // 2A, Steck
    // first order (μB/h)·2gI = −2785.6485523 Hz/G (hand arithmetic)
    expect(l.firstOrder.hzPerGauss.toSignificantDigits(8).toString()).toBe("-2785.6486");
    expect(l.fieldInsensitive.length).toBe(1);
    // 3.23 G from memory (magic field of the trapped-clock pair); we compute 3.2289170 G
    expect(Math.abs(l.fieldInsensitive[0]!.tesla.toNumber() - 3.23e-4)).toBeLessThan(0.01e-4);
  });

  it("has the clock line with zero first-order and 575.15 Hz/G² second-order sensitivity", () => {
    const l = find([2, 0], [4, 0]);
    expect(l.firstOrder.hzPerTesla.abs().lt(dec("1e-40"))).toBe(true);
    expect(Math.abs(l.secondOrder!.hzPerGauss2.toNumber() - 575.15)).toBeLessThan(0.01); // Steck, Table 4
    expect(l.atFields[0]!.hz.toString()).toBe("6834682610.90429");
  });

  it("reports B = 0 as the clock line's field-insensitive point, at 2A (issue 10, defect 5)", () => {
    const l = find([2, 0], [4, 0]);
    // mF = 0 ↔ mF = 0: df/dB = 0 at B = 0 (common practice: first-order field-insensitive clock transition);
    // frequency there 6834.682610904290 MHz (D. A. Steck, "Rubidium 87 D Line Data")
    expect(l.fieldInsensitive[0]!.tesla.isZero()).toBe(true);
    expect(l.fieldInsensitive[0]!.hz.toString()).toBe("6834682610.90429");
    // a line with first-order sensitivity gets no B = 0 point
    expect(find([2, -2], [4, 2]).fieldInsensitive.every((p) => p.tesla.gt(0))).toBe(true);
  });

  it("lists the two-photon lines ΔF = 0, ΔmF = ±2 (issue 10, defect 5)", () => {
    const z = find([4, -2], [4, 2]);
    expect(z.kind).toBe("two-photon");
    expect(z.zeroFieldHz.isZero()).toBe(true);
    // two units of mF in F = 2 with gF ≈ 1/2: about 1.40 MHz/G (common practice: 0.70 MHz/G per unit mF, Steck)
    expect(Math.abs(z.firstOrder.hzPerGauss.toNumber() / 1.3996e6 - 1)).toBeLessThan(0.001);
    // in F = 1 (gF < 0) mF = −1 has the larger slope, so it is the upper end
    expect(find([2, 2], [2, -2]).kind).toBe("two-photon");
  });

  it("lists ΔF = 0 Zeeman lines and excludes ΔF = 0, ΔmF = 0", () => {
    expect(lines.some((l) => l.lower.F2 === l.upper.F2 && l.lower.mF2 === l.upper.mF2)).toBe(false);
    const z = find([4, 0], [4, 2]);
    expect(z.zeroFieldHz.isZero()).toBe(true);
    expect(z.firstOrder.hzPerTesla.gt(0)).toBe(true);
    // all zero-field frequencies are non-negative by construction of upper/lower
    expect(lines.every((l) => !l.zeroFieldHz.isNegative())).toBe(true);
  });

  it("puts the 87Rb point where the exact Dec slopes of |1,−1⟩ and |2,1⟩ become equal, to 1e-25 in B", () => {
    const l = find([2, -2], [4, 2]);
    const p = l.fieldInsensitive[0]!;
    // df/dB from the full Dec solve just below and just above the reported field (definition of the point)
    const dfdb = (t: typeof p.tesla) => {
      const s = solveHyperfineZeeman(RB87_5S, t);
      const up = s.find((x) => x.F2 === 4 && x.mF2 === 2)!;
      const lo = s.find((x) => x.F2 === 2 && x.mF2 === -2)!;
      return { d: up.slope.minus(lo.slope), f: up.energy.minus(lo.energy) };
    };
    const below = dfdb(p.tesla.mul(dec("0.9999999999999999999999999"))); // 1 − 1e-25
    const above = dfdb(p.tesla.mul(dec("1.0000000000000000000000001")));
    expect(below.d.isNegative()).not.toBe(above.d.isNegative());
    // the reported frequency is the exact frequency there (stationary, so 1e-25 in B is far below 1e-30 in f)
    expect(dfdb(p.tesla).f.minus(p.hz).abs().div(p.hz).lt(dec("1e-30"))).toBe(true);
    // doc example 3.228917 G: our own computation (the outside check is the 3.23 G from memory in the first test)
    expect(p.tesla.toSignificantDigits(7).toString()).toBe("0.0003228917");
  });

  it("uses the caller's solves at the fields when given, with identical frequencies", () => {
    const fields = [dec("0"), dec("0.0001")];
    const solve = hyperfineZeemanSolver(RB87_5S);
    const reused = sublevelTransitions(RB87_5S, fields, { statesAtFields: fields.map((b) => solve(b)) });
    reused.forEach((l, i) => l.atFields.forEach((a, j) => expect(a.hz.eq(lines[i]!.atFields[j]!.hz)).toBe(true)));
    expect(() => sublevelTransitions(RB87_5S, fields, { statesAtFields: [solve(dec("0"))] })).toThrow(RangeError);
  });
});
