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
});
