import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { symmetricEigen } from "../../../src/physics/field/symmetricEigen.js";

describe("symmetricEigen", () => {
  it("diagonalizes [[2, 1], [1, 2]] into 1 and 3 with vectors (1, ∓1)/√2 (doc example)", () => {
    const r = symmetricEigen([[dec("2"), dec("1")], [dec("1"), dec("2")]]);
    expect(r.values.map((v) => v.toSignificantDigits(50).toString())).toEqual(["1", "3"]); // common practice
    const root = dec("0.5").sqrt();
    expect(r.vectors[1]![0]!.abs().minus(root).abs().lt(dec("1e-50"))).toBe(true);
    expect(r.vectors[0]![0]!.mul(r.vectors[0]![1]!).isNegative()).toBe(true);
  });

  it("handles a 3×3 matrix with a repeated eigenvalue", () => {
    // [[2,1,1],[1,2,1],[1,1,2]] has eigenvalues 1, 1, 4 (common practice: J − I with J all-ones)
    const m = [[2, 1, 1], [1, 2, 1], [1, 1, 2]].map((r) => r.map((x) => dec(String(x))));
    const r = symmetricEigen(m);
    expect(r.values.map((v) => v.toSignificantDigits(50).toString())).toEqual(["1", "1", "4"]);
  });

  it("starts from the caller's seed vectors when given, with the same result", () => {
    // a graded matrix: a 1e13 diagonal offset next to entries of order 1 (the shape of a fine-structure term);
    // its eigenvalues are 1e13 ± 1 and 3 exactly: [[a, 1], [1, a]] has a ± 1 (common practice)
    const big = dec("1e13");
    const m = [[big, dec("1"), dec("0")], [dec("1"), big, dec("0")], [dec("0"), dec("0"), dec("3")]];
    const s = Math.SQRT1_2;
    const r = symmetricEigen(m, undefined, [[0, 0, 1], [s, -s, 0], [s, s, 0]]);
    expect(r.values.map((v) => v.toString())).toEqual(["3", "9999999999999", "10000000000001"]);
    expect(r.vectors[1]![0]!.mul(r.vectors[1]![1]!).isNegative()).toBe(true);
  });
});

