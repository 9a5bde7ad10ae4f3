import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  angularCoefficients,
  angularFactor,
  angularFactorAt,
  angularFormulaText,
  circularSense,
  fractionText,
  type Fraction,
} from "../../src/physics/angularFactor.js";

interface AngularRow {
  k: number;
  q: number;
  cos2_coefficients: string[];
  at_degrees: Record<string, string>;
  sphere_average: string;
}

// Source: sympy 1.14 (Ynm and the angular-momentum operator, without Wigner d-functions),
// written by scripts/fixtures/angular_sympy.py.
const fixture = JSON.parse(readFileSync(new URL("../fixtures/angular-sympy.json", import.meta.url), "utf-8")) as { angular: AngularRow[] };

const f = (n: number, d = 1): Fraction => [BigInt(n), BigInt(d)];
const deg = (d: number) => (d * Math.PI) / 180;

describe("angularCoefficients", () => {
  it("agrees with sympy's |X_kq|² for every component of ranks 1, 2 and 3", () => {
    expect(fixture.angular).toHaveLength(9);
    for (const row of fixture.angular) {
      expect(angularCoefficients(row.k, row.q).map(fractionText), `k=${row.k} q=${row.q}`).toEqual(row.cos2_coefficients);
      expect(angularCoefficients(row.k, -row.q).map(fractionText), `k=${row.k} q=${-row.q}`).toEqual(row.cos2_coefficients);
    }
  });

  it("repeats its worked example: sin²θ for π, (1 + cos²θ)/2 for σ, 3 sin²θ cos²θ for E2 q = 0", () => {
    // textbook (Jackson §9.7; the dipole factors)
    expect(angularCoefficients(1, 0).map(fractionText)).toEqual(["1", "-1"]);
    expect(angularCoefficients(1, 1).map(fractionText)).toEqual(["1/2", "1/2"]);
    expect(angularCoefficients(2, 0).map(fractionText)).toEqual(["0", "3", "-3"]);
  });

  it("refuses a component the multipole does not have", () => {
    expect(() => angularCoefficients(1, 2)).toThrow(RangeError);
    expect(() => angularCoefficients(0, 0)).toThrow(RangeError);
  });
});

describe("angularFactorAt", () => {
  it("gives sympy's exact values at 0°, 30°, 45°, 60° and 90°", () => {
    for (const row of fixture.angular) {
      for (const [d, want] of Object.entries(row.at_degrees)) {
        const c2: Fraction = { "0": f(1), "30": f(3, 4), "45": f(1, 2), "60": f(1, 4), "90": f(0) }[d]!;
        expect(fractionText(angularFactorAt(row.k, row.q, c2)), `k=${row.k} q=${row.q} θ=${d}`).toBe(want);
      }
    }
  });

  it("repeats its worked example: at 90° π 1 and σ 1/2; at 60° π 3/4 and σ 5/8", () => {
    // textbook: transverse normal triplet σ:π:σ = 1:2:1
    expect(fractionText(angularFactorAt(1, 0, f(0)))).toBe("1");
    expect(fractionText(angularFactorAt(1, 1, f(0)))).toBe("1/2");
    expect(fractionText(angularFactorAt(1, 0, f(1, 4)))).toBe("3/4");
    expect(fractionText(angularFactorAt(1, -1, f(1, 4)))).toBe("5/8");
  });

  it("shows only the σ components along the field, for every rank", () => {
    // textbook: a photon travelling along the axis carries helicity ±1, so only |Δm| = 1 reaches θ = 0
    for (const k of [1, 2, 3]) {
      for (let q = -k; q <= k; q++) expect(fractionText(angularFactorAt(k, q, f(1)))).toBe(Math.abs(q) === 1 ? "1" : "0");
    }
  });

  it("averages to 2/(2k+1) over the sphere for every component (sympy)", () => {
    // the mean of cos^(2n)θ over the sphere is 1/(2n+1) (textbook)
    for (const row of fixture.angular) {
      let mean: [bigint, bigint] = [0n, 1n];
      angularCoefficients(row.k, row.q).forEach((c, n) => {
        const num = mean[0] * c[1] * BigInt(2 * n + 1) + c[0] * mean[1];
        const den = mean[1] * c[1] * BigInt(2 * n + 1);
        mean = [num, den];
      });
      const g = (a: bigint, b: bigint): bigint => (b === 0n ? (a < 0n ? -a : a) : g(b, a % b));
      const d = g(mean[0], mean[1]);
      expect(fractionText([mean[0] / d, mean[1] / d])).toBe(row.sphere_average);
      expect(row.sphere_average).toBe(`2/${2 * row.k + 1}`); // textbook: the same for every q
    }
  });
});

describe("angularFactor", () => {
  it("follows the textbook closed forms of E1 and E2 at any angle", () => {
    // textbook (Jackson §9.8; Blatt and Weisskopf ch. XII): E1 π sin²θ, σ (1 + cos²θ)/2;
    // E2 q = 0 ∝ sin²θ cos²θ, |q| = 1 ∝ cos²θ + cos²2θ, |q| = 2 ∝ 1 − cos⁴θ
    for (const t of [0, 7.5, 23, 37, 45, 61.2, 90, 118, 180]) {
      const c = Math.cos(deg(t));
      const s = Math.sin(deg(t));
      expect(angularFactor(1, 0, t)).toBeCloseTo(s * s, 12);
      expect(angularFactor(1, 1, t)).toBeCloseTo((1 + c * c) / 2, 12);
      expect(angularFactor(1, -1, t)).toBeCloseTo((1 + c * c) / 2, 12);
      expect(angularFactor(2, 0, t)).toBeCloseTo(3 * s * s * c * c, 12);
      expect(angularFactor(2, 1, t)).toBeCloseTo((c * c + Math.cos(deg(2 * t)) ** 2) / 2, 12);
      expect(angularFactor(2, -2, t)).toBeCloseTo((1 - c ** 4) / 2, 12);
    }
  });

  it("is exactly 0 for π along the field and exactly 1 for π across it", () => {
    expect(angularFactor(1, 0, 0)).toBe(0);
    expect(angularFactor(1, 0, 90)).toBe(1);
    expect(angularFactor(1, 0, -90)).toBe(1);
  });
});

describe("angularFormulaText", () => {
  it("writes the closed forms of ranks 1 and 2 and a polynomial in cos²θ for rank 3", () => {
    expect(angularFormulaText(1, 0)).toBe("sin²θ");
    expect(angularFormulaText(1, -1)).toBe("(1 + cos²θ)/2");
    expect(angularFormulaText(2, 2)).toBe("(1 − cos⁴θ)/2");
    // coefficients as sympy gives them (fixture above)
    expect(angularFormulaText(3, 3)).toBe("15/32 − 15/32 cos²θ − 15/32 cos⁴θ + 15/32 cos⁶θ");
  });
});

describe("circularSense", () => {
  it("names σ+ seen along the field counter-clockwise, right-circular in the IAU convention", () => {
    // positive helicity: counter-clockwise seen looking toward the source (IEEE/IAU right-circular,
    // Born and Wolf left-circular; from memory)
    expect(circularSense(1)).toMatch(/^counter-clockwise.*right-circular \(IAU\/IEEE, V > 0\), left-circular in the optics/);
    expect(circularSense(-1)).toMatch(/^clockwise.*left-circular \(IAU\/IEEE, V < 0\), right-circular in the optics/);
    expect(circularSense(0)).toBeNull();
    expect(circularSense(2)).toBeNull();
  });
});
