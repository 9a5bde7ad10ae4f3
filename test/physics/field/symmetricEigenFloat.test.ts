import { describe, expect, it } from "vitest";
import { symmetricEigenFloat } from "../../../src/physics/field/symmetricEigenFloat.js";

describe("symmetricEigenFloat", () => {
  it("diagonalizes [[2, 1], [1, 2]] into 1 and 3 with vectors (1, ∓1)/√2 (doc example)", () => {
    const r = symmetricEigenFloat([[2, 1], [1, 2]]);
    expect(r.values[0]).toBeCloseTo(1, 14); // common practice
    expect(r.values[1]).toBeCloseTo(3, 14);
    expect(Math.abs(r.vectors[1]![0]!)).toBeCloseTo(Math.SQRT1_2, 14);
    expect(r.vectors[0]![0]! * r.vectors[0]![1]!).toBeLessThan(0);
  });

  it("handles a repeated eigenvalue and returns orthonormal vectors", () => {
    // [[2,1,1],[1,2,1],[1,1,2]] has eigenvalues 1, 1, 4 (common practice: J + I with J all-ones)
    const m = [[2, 1, 1], [1, 2, 1], [1, 1, 2]];
    const r = symmetricEigenFloat(m);
    [1, 1, 4].forEach((v, i) => expect(Math.abs(r.values[i]! - v)).toBeLessThan(1e-14));
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        const dot = r.vectors[i]!.reduce((s, x, k) => s + x * r.vectors[j]![k]!, 0);
        expect(Math.abs(dot - (i === j ? 1 : 0))).toBeLessThan(1e-14);
      }
    }
  });

  it("stops on a matrix whose off-diagonal rounding noise never reaches zero by itself", () => {
    // widely spread diagonal with couplings: eigenvalues satisfy Hv = λv to float precision
    const m = [[1e8, 3e7, 1e6, 0], [3e7, -2e7, 4e7, 2e5], [1e6, 4e7, 5e7, 1e7], [0, 2e5, 1e7, -9e7]];
    const r = symmetricEigenFloat(m);
    r.values.forEach((lambda, k) => {
      const v = r.vectors[k]!;
      for (let i = 0; i < 4; i++) {
        const hv = m[i]!.reduce((s, x, j) => s + x * v[j]!, 0);
        expect(Math.abs(hv - lambda * v[i]!)).toBeLessThan(1e-6); // 1e-14 of ‖H‖ ≈ 1.2e8 (common practice)
      }
    });
  });
});
