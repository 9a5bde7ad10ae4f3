/**
 * Issue 10, defect 1: a level of a species with nuclear spin but without a
 * `hyperfine:` key (every J = 0 clock state) keeps its nuclear sublevels,
 * their Zeeman shifts, the nuclear-spin transitions between them, and the
 * hyperfine groups of its lines: hyperfine constants absent mean A = B = 0.
 */
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { computeFrom } from "./speciesFrom.js";

// Input only (not check values): 87Sr with the nuclear moment and the 5s5p 3P1
// hyperfine constants as recalled from memory of nuclear-moment tables and of
// Heider and Brink, Phys. Rev. A 16, 1371 (1977).
const SR87 = `id: sr87
label: "87Sr"
mass: "86.9088775 u"
nucleus:
  spin: 9/2
  moment: "-1.0936030 muN"
levels:
  - id: 5s2-1S0
    config: 5s2
    term: 1S0
    source: "test input"
  - id: 5s5p-3P1
    config: 5s5p
    term: 3Po1
    hyperfine: { A: "-260.084 MHz", B: "-35.658 MHz" }
    source: "test input"
lines:
  - id: "689"
    upper: 5s5p-3P1
    lower: 5s2-1S0
    wavelength: "689.449 nm"
`;

const GAUSS = new Dec("1e-4");

describe("a J = 0 level of a species with nuclear spin and no hyperfine constants", () => {
  const { result, fields } = computeFrom(SR87, ["0 G", "1 G", "10 G"]);
  const ground = fields.levels.get("5s2-1S0")!;

  it("has its ten mI states in the field table, shifting by about 185 Hz/G per unit mF", () => {
    expect(ground.rows.map((r) => r.mF2)).toEqual([-9, -7, -5, -3, -1, 1, 3, 5, 7, 9]);
    for (const r of ground.rows) {
      expect(r.F2).toBe(9);
      expect(r.energies[0]!.isZero()).toBe(true);
      // 87Sr 1S0: |Δν| ≈ 185 Hz/G per unit mF (from memory: clock literature on 87Sr)
      const perGaussPerM = r.energies[2]!.div(10).div(r.mF2 / 2).abs();
      expect(perGaussPerM.toNumber()).toBeGreaterThan(184);
      expect(perGaussPerM.toNumber()).toBeLessThan(186);
    }
  });

  it("says that A = B = 0 was used (for the pages), and not for a level that lists its constants", () => {
    expect(ground.hyperfineListed).toBe(false);
    expect(fields.levels.get("5s5p-3P1")!.hyperfineListed).toBe(true);
  });

  it("agrees with its own linear table (gF = gI)", () => {
    const hf = result.levels.find((l) => l.input.id === "5s2-1S0")!.hyperfine;
    expect(hf).toHaveLength(1);
    const perT = hf[0]!.sublevels.find((m) => m.m2 === 9)!.shiftHzPerT;
    const row = ground.rows.find((r) => r.mF2 === 9)!;
    expect(row.energies[1]!.sub(perT.mul(GAUSS)).abs().toNumber()).toBeLessThan(1e-20);
  });

  it("lists the nuclear-spin transitions ΔmF = ±1 between neighbouring mI states", () => {
    const dipole = ground.transitions.filter((t) => t.kind === "magnetic-dipole");
    expect(dipole).toHaveLength(9);
    for (const t of dipole) {
      expect(Math.abs(t.upper.mF2 - t.lower.mF2)).toBe(2);
      expect(t.zeroFieldHz.isZero()).toBe(true);
      // one unit of mF: about 185 Hz/G (from memory: clock literature on 87Sr)
      expect(t.firstOrder.hzPerGauss.abs().toNumber()).toBeGreaterThan(184);
      expect(t.firstOrder.hzPerGauss.abs().toNumber()).toBeLessThan(186);
    }
  });

  it("gives the 689 nm line its hyperfine groups F′ = 7/2, 9/2, 11/2 → F = 9/2 in the ratio 8 : 10 : 12", () => {
    const groups = fields.lines.get("689")!.hyperfine;
    expect(groups).not.toBeNull();
    // a J = 0 lower level: group strengths go as 2F′ + 1 (common practice: statistical weights)
    const byF = new Map(groups!.map((g) => [g.Fu2, g.strength.toString()]));
    expect(byF).toEqual(new Map([[11, "2/5"], [9, "1/3"], [7, "4/15"]]));
  });

  it("computes the line at each field from hyperfine–Zeeman eigenstates of both levels", () => {
    const at = fields.lines.get("689")!.atFields;
    expect(at.map((a) => a.model)).toEqual(["hyperfine–Zeeman eigenstates", "hyperfine–Zeeman eigenstates", "hyperfine–Zeeman eigenstates"]);
    expect(at[1]!.components.some((c) => c.lowerLabel === "F=9/2, mF=-9/2")).toBe(true);
  });
});

describe("a J > 0 level of a species with nuclear spin and no hyperfine constants", () => {
  const yaml = SR87.replace('    hyperfine: { A: "-260.084 MHz", B: "-35.658 MHz" }\n', "");
  const { result, fields } = computeFrom(yaml, ["0 G", "10 G"]);
  const level = fields.levels.get("5s5p-3P1")!;
  const s = result;

  it("has (2I+1)(2J+1) states that are |mJ mI⟩ at any field, at (μB/h)(gJ·mJ + gI·mI)·B", () => {
    // with A = B = 0 the Hamiltonian is (μB/h)B(gJ·Jz + gI·Iz), diagonal in |mJ mI⟩ (common practice)
    expect(level.rows).toHaveLength(30);
    const gJ = s.levels.find((l) => l.input.id === "5s5p-3P1")!.gJ!;
    const muB = new Dec("13996244917.1"); // μB/h, CODATA 2022
    const B = new Dec("1e-3");
    const want: Dec[] = [];
    for (let mJ2 = -2; mJ2 <= 2; mJ2 += 2) for (let mI2 = -9; mI2 <= 9; mI2 += 2) want.push(muB.mul(B).mul(gJ.mul(mJ2).add(s.gI!.mul(mI2))).div(2));
    const got = level.rows.map((r) => r.energies[1]!).sort((a, b) => a.cmp(b));
    want.sort((a, b) => a.cmp(b));
    got.forEach((e, i) => expect(e.sub(want[i]!).abs().toNumber()).toBeLessThan(1e-12));
  });

  it("says the weak-field F description holds at no field and gives no Paschen–Back scale", () => {
    expect(level.validity!.relative.tesla!.isZero()).toBe(true);
    expect(level.validity!.paschenBackTesla).toBeNull();
  });
});
