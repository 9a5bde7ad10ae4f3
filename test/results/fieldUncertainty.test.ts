/**
 * Issue 11 §1: uncertainties of the field-dependent numbers, against a Monte
 * Carlo propagation of the same inputs (scripts/fixtures/uncertainty_mc.py →
 * test/fixtures/field/uncertainty-mc.json: numpy, 200 000 Gaussian draws,
 * Breit–Rabi written independently) and against hand formulas.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { linear, standardUncertainty } from "../../src/physics/uncertain.js";
import { speciesInputs } from "../../src/results/inputUncertainties.js";
import { levelGJ } from "../../src/results/fieldUncertainty.js";
import { computeFrom } from "./speciesFrom.js";

interface Stat { std: number; mean_deviation: number }
const MC = JSON.parse(readFileSync(new URL("../fixtures/field/uncertainty-mc.json", import.meta.url), "utf8")) as Record<string, Stat & Record<string, unknown>>;

// The demo's 87Rb ground state (data/species/rb87.yaml): D. A. Steck, "Rubidium 87 D Line Data" (u(A) from memory)
const RB = `id: rb87
label: "87Rb"
mass: "86.909180531 u"
nucleus: { spin: 3/2, gI: "-0.0009951414(10)" }
levels:
  - id: 5s
    config: 5s
    term: 2S1/2
    gJ: "2.00233113(20)"
    hyperfine: { A: "3417.341305452145(45) MHz" }
    source: "test input"
`;

const within2Percent = (u: Dec | null, std: number) => {
  expect(u).not.toBeNull();
  const rel = Math.abs(u!.toNumber() - std) / std;
  expect(rel, `propagated ${u} vs Monte Carlo ${std}`).toBeLessThan(0.02);
};

describe("field-dependent uncertainties against the Monte Carlo fixture (87Rb 5²S1/2)", () => {
  const { fields, result } = computeFrom(RB, ["3.23 G"]);
  const level = fields.levels.get("5s")!;
  const find = (up: [number, number], lo: [number, number]) => {
    const i = level.transitions.findIndex((t) => t.upper.F2 === up[0] && t.upper.mF2 === up[1] && t.lower.F2 === lo[0] && t.lower.mF2 === lo[1]);
    expect(i).toBeGreaterThanOrEqual(0);
    return { t: level.transitions[i]!, u: level.transitionsU![i]! };
  };

  it("fixture sanity: the Monte Carlo's nominal two-photon frequency at 3.23 G is the atlas's to 1e-5 Hz (float64 of the script)", () => {
    const { t } = find([4, 2], [2, -2]);
    expect(Math.abs(t.atFields[0]!.hz.toNumber() - (MC.two_photon_at_B!.nominal_Hz as number))).toBeLessThan(1e-5);
  });

  it("gives the two-photon line |1,−1⟩ ↔ |2,1⟩ at 3.23 G the Monte Carlo's standard deviation to 2 %", () => {
    within2Percent(find([4, 2], [2, -2]).u.atFields[0]!, MC.two_photon_at_B!.std);
  });

  it("gives the clock line |1,0⟩ ↔ |2,0⟩ at 3.23 G the Monte Carlo's standard deviation to 2 %", () => {
    within2Percent(find([4, 0], [2, 0]).u.atFields[0]!, MC.clock_at_B!.std);
  });

  it("gives the field-insensitive field of |1,−1⟩ ↔ |2,1⟩ (3.2289 G) and its frequency the Monte Carlo's standard deviations to 2 %", () => {
    const { t, u } = find([4, 2], [2, -2]);
    const k = t.fieldInsensitive.findIndex((p) => p.tesla.gt(0));
    expect(Math.abs(t.fieldInsensitive[k]!.tesla.toNumber() - (MC.insensitive_field!.nominal_T as number))).toBeLessThan(1e-15);
    within2Percent(u.fieldInsensitive[k]!.tesla, MC.insensitive_field!.std);
    within2Percent(u.fieldInsensitive[k]!.hz, MC.insensitive_frequency!.std);
  });

  it("gives gF of F = 2 and F = 1 the Monte Carlo's standard deviation to 2 % and the hand formula √((u_gJ/4)² + (3·u_gI/4)²) exactly", () => {
    const inputs = speciesInputs(result.input, CODATA_2022);
    const gJ = levelGJ(result.levels[0]!, inputs);
    const gF2 = linear([[new Dec("0.25"), gJ], [new Dec("0.75"), inputs.gI!]]);
    const gF1 = linear([[new Dec("-0.25"), gJ], [new Dec("1.25"), inputs.gI!]]);
    within2Percent(standardUncertainty(gF2), MC.gF_F2!.std);
    within2Percent(standardUncertainty(gF1), MC.gF_F1!.std);
    // hand formula (D. A. Steck, "Rubidium 87 D Line Data", eq. (22)): u = √((0.00000020/4)² + (3·0.0000000010/4)²)
    const hand = new Dec("0.00000005").pow(2).plus(new Dec("0.00000000075").pow(2)).sqrt();
    expect(standardUncertainty(gF2)!.minus(hand).abs().lt("1e-55")).toBe(true);
  });

  it("keeps the correlation of a frequency's two energies: u(f) is not the root-sum-square of the energies' u", () => {
    const { u } = find([4, 2], [2, -2]);
    const rows = level.rows;
    const up = rows.find((r) => r.F2 === 4 && r.mF2 === 2)!;
    const lo = rows.find((r) => r.F2 === 2 && r.mF2 === -2)!;
    const rss = Math.hypot(up.energiesU![0]!.toNumber(), lo.energiesU![0]!.toNumber());
    // both energies move with gJ almost alike (|mJ| = 1/2 mostly): the difference cancels most of it
    expect(u.atFields[0]!.toNumber()).toBeLessThan(rss / 10);
  });

  it("makes the first-order sensitivity of |1,−1⟩ ↔ |2,1⟩, (μB/h)·2gI, carry u = 2·√((μB/h·u_gI)² + (gI·u_μB)²) (hand formula, CODATA 2022 u(μB/h) = 4.4 Hz/T)", () => {
    const { u } = find([4, 2], [2, -2]);
    const hand = Math.hypot(13996244917.1 * 1e-9, 0.0009951414 * 4.4) * 2;
    expect(Math.abs(u.firstOrderHzPerTesla!.toNumber() - hand) / hand).toBeLessThan(1e-12);
  });

  it("marks B = 0 of the clock line as an exact field-insensitive point (its first-order sensitivity is 0 for every gJ, gI) whose frequency 2A carries u = 2·u(A)", () => {
    const { t, u } = find([4, 0], [2, 0]);
    expect(t.fieldInsensitive[0]!.tesla.isZero()).toBe(true);
    expect(u.fieldInsensitive[0]!.tesla).toBeNull();
    expect(u.fieldInsensitive[0]!.propagated).toBe(true);
    // hand formula: the zero-field splitting of I = 3/2, J = 1/2 is A(I + 1/2) = 2A (textbook), u(A) = 45 µHz (Steck, from memory)
    expect(u.fieldInsensitive[0]!.hz!.toString()).toBe("0.00009");
  });
});

describe("the fine-structure partners' part of a second-order coefficient", () => {
  // Sr 5s5p ³P₀ and ³P₁ (NIST ASD energies, from memory) with an uncertainty of 0.001 cm⁻¹ given here as test input
  const sr = (u: string) => `id: sr88
label: "88Sr"
mass: "87.9056125 u"
levels:
  - id: 3P0
    config: 5s5p
    term: 3Po0
    energy: "14317.507${u} cm-1"
    source: "test input"
  - id: 3P1
    config: 5s5p
    term: 3Po1
    energy: "14504.334${u} cm-1"
    source: "test input"
`;
  const beta = (u: string) => computeFrom(sr(u), ["0 G", "1 G"]).fields.levels.get("3P0")!.rows[0]!;

  it("carries the level energies' uncertainty: u² grows by (β/ΔE)²·(u(E₀)² + u(E₁)²) (chain rule on β ∝ 1/ΔE, by hand)", () => {
    const exactE = beta("");
    const withU = beta("(1)");
    expect(withU.quadraticPerTesla2!.eq(exactE.quadraticPerTesla2!)).toBe(true);
    // u(E) = 0.001 cm⁻¹ × c = 29 979 245.8 Hz (c exact, SI); ΔE = 186.827 cm⁻¹ × c
    const uE = new Dec("29979245.8");
    const dE = new Dec("186.827").mul("29979245800");
    const grow = exactE.quadraticPerTesla2!.div(dE).pow(2).mul(uE.pow(2).mul(2));
    const got = withU.quadraticU!.pow(2).minus(exactE.quadraticU!.pow(2));
    expect(got.div(grow).minus(1).abs().toNumber()).toBeLessThan(1e-20);
    // the energies dominate here: 0.001 cm⁻¹ in 186.827 cm⁻¹ is 5e-6 relative per level, far above the constants' ~1e-9
    expect(withU.quadraticU!.div(exactE.quadraticU!).toNumber()).toBeGreaterThan(100);
  });
});
