/**
 * Issue 10, defect 4: second-order Zeeman coefficients include the listed
 * fine-structure partners, and say so; without partners they say "within
 * this J only" instead of a silent 0.
 */
import { describe, expect, it } from "vitest";
import { computeFrom } from "./speciesFrom.js";

// Input only: Sr I level energies as in the NIST Atomic Spectra Database (from memory).
const SR = (extra: string, levels: string[]) => `id: sr
label: "Sr"
mass: "87.9056125 u"
${extra}levels:
  - id: 1S0
    config: 5s2
    term: 1S0
    source: "test input"
${levels.join("")}`;
const P0 = `  - id: 3P0
    config: 5s5p
    term: 3Po0
    energy: "14317.507 cm-1"
    source: "test input"
`;
const P1 = `  - id: 3P1
    config: 5s5p
    term: 3Po1
    energy: "14504.334 cm-1"
    source: "test input"
`;
const P2 = `  - id: 3P2
    config: 5s5p
    term: 3Po2
    energy: "14898.545 cm-1"
    source: "test input"
`;
const P1P = `  - id: 1P1
    config: 5s5p
    term: 1Po1
    energy: "21698.452 cm-1"
    source: "test input"
`;
const perGauss2 = (x: { mul: (s: string) => { toNumber: () => number } } | null) => x!.mul("1e-8").toNumber();

describe("second-order coefficients with fine-structure partners", () => {
  it("gives Sr 5s5p ³P₀ about −0.233 Hz/G² once ³P₁ and ³P₂ are listed with energies, scope term", () => {
    const { fields } = computeFrom(SR("", [P0, P1, P2, P1P]));
    const f = fields.levels.get("3P0")!;
    // Sr lattice clock: about −0.233 Hz/G² (from memory: Sr lattice-clock literature)
    expect(Math.abs(perGauss2(f.rows[0]!.quadraticPerTesla2) / -0.233 - 1)).toBeLessThan(0.01);
    expect(f.quadratic).toEqual({ scope: "term", included: ["3P1"], missingJ2: [] });
    expect(fields.levels.get("3P1")!.quadratic).toEqual({ scope: "term", included: ["3P0", "3P2"], missingJ2: [] });
    // a singlet has no fine-structure partners: its (zero) coefficient is complete within its term
    expect(fields.levels.get("1P1")!.quadratic.scope).toBe("term");
    expect(fields.levels.get("1S0")!.quadratic.scope).toBe("term");
  });

  it("gives the same for each mF of 87Sr ³P₀ with nuclear spin (hyperfine of ³P₁ in the denominators)", () => {
    const nucleus = `nucleus:\n  spin: 9/2\n  moment: "-1.0936030 muN"\n`;
    const p1 = P1.replace("    energy:", '    hyperfine: { A: "-260.084 MHz", B: "-35.658 MHz" }\n    energy:');
    const { fields } = computeFrom(SR(nucleus, [P0, p1]));
    const f = fields.levels.get("3P0")!;
    expect(f.rows).toHaveLength(10);
    for (const r of f.rows) {
      // 87Sr clock: second-order Zeeman shift about −0.233 Hz/G² (from memory: Sr lattice-clock literature)
      expect(Math.abs(perGauss2(r.quadraticPerTesla2) / -0.233 - 1)).toBeLessThan(0.01);
    }
    expect(f.quadratic.scope).toBe("term");
    // ³P₁ couples to ³P₀ and ³P₂; ³P₂ is not listed here
    expect(fields.levels.get("3P1")!.quadratic).toEqual({ scope: "term-partial", included: ["3P0"], missingJ2: [4] });
  });

  it("says J-only when no partner is listed with an energy, instead of a silent 0", () => {
    const { fields } = computeFrom(SR("", [P0, P1.replace('    energy: "14504.334 cm-1"\n', "")]));
    const f = fields.levels.get("3P0")!;
    expect(f.quadratic).toEqual({ scope: "J-only", included: [], missingJ2: [2] });
    expect(f.rows[0]!.quadraticPerTesla2!.isZero()).toBe(true);
  });
});
