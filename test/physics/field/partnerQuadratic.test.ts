import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec, dec, ZERO } from "../../../src/physics/decimal.js";
import { partnerQuadraticCoefficient, partnerQuadraticSlopes, spinZSquaredElement, type PartnerLevel, type PartnerTerm } from "../../../src/physics/field/partnerQuadratic.js";
import { quadraticZeemanCoefficient } from "../../../src/physics/field/quadraticZeeman.js";
import { fValues, hyperfineShift } from "../../../src/physics/hyperfine.js";
import { landeLS } from "../../../src/physics/lande.js";
import { muB_h } from "./levels.js";

const CM = new Dec("29979245800"); // Hz per cm⁻¹ (c exact, SI)

interface FixtureCase {
  name: string;
  S2: number;
  L: number;
  I2: number;
  gL: string;
  gS: string;
  gI_used: string;
  levels: { J2: number; energy: string; A: string; B: string }[];
  fields: string[];
  blocks: { M2: number; fields: { tesla: string; energies: string[] }[]; beta_Hz_per_T2: string[] }[];
}
// scripts/fixtures/term_zeeman.py: whole-term Hamiltonian in |mL mS mI⟩ at 50 digits (mpmath)
const FIXTURE = JSON.parse(readFileSync(new URL("../../fixtures/field/term-mpmath.json", import.meta.url), "utf8")) as { cases: FixtureCase[] };
const fixtureCase = (name: string) => FIXTURE.cases.find((c) => c.name === name)!;
const hz = (t: string) => (t.endsWith(" cm-1") ? dec(t.slice(0, -5)).mul(CM) : dec(t));

function termOf(c: FixtureCase): { term: PartnerTerm; levels: PartnerLevel[] } {
  return {
    term: { S2: c.S2, L: c.L, I2: c.I2, gL: dec(c.gL), gS: dec(c.gS), muB_h },
    levels: c.levels.map((l) => ({ J2: l.J2, energy: hz(l.energy), A: dec(l.A), B: dec(l.B) })),
  };
}

/** β of every (J, F, mF) in the model: within-J part (quadraticZeeman.ts, LS gJ) plus the partners' part. */
function modelBetas(c: FixtureCase) {
  const { term, levels } = termOf(c);
  const out: { J2: number; F2: number; mF2: number; zero: Dec; beta: Dec }[] = [];
  for (const lv of levels) {
    const others = levels.filter((p) => p !== lv);
    const gJ = landeLS(c.S2, c.L, lv.J2, term.gL, term.gS) ?? ZERO;
    for (const F2 of fValues(c.I2, lv.J2)) {
      for (let mF2 = -F2; mF2 <= F2; mF2 += 2) {
        const own = quadraticZeemanCoefficient({ J2: lv.J2, I2: c.I2, gJ, gI: dec(c.gI_used), A: lv.A, B: lv.B, muB_h }, F2, mF2)!;
        const partners = partnerQuadraticCoefficient(term, lv, others, F2, mF2)!;
        out.push({ J2: lv.J2, F2, mF2, zero: lv.energy.plus(hyperfineShift(lv.A, lv.B, c.I2, lv.J2, F2)), beta: own.plus(partners) });
      }
    }
  }
  return out;
}

describe("partnerQuadraticCoefficient", () => {
  const sr88 = termOf(fixtureCase("88Sr 5s5p 3P"));
  const [p0, p1, p2] = sr88.levels as [PartnerLevel, PartnerLevel, PartnerLevel];

  it("gives |⟨³P₁ 0|Sz|³P₀ 0⟩|² = 2/3 (doc example)", () => {
    // LS coupling: |³P₀⟩ = (|1,−1⟩|1,1⟩ − |1,0⟩|1,0⟩ + |1,1⟩|1,−1⟩)/√3 in |mL⟩|mS⟩, so Sz|³P₀⟩ has norm² 2/3,
    // all of it in ³P₁ mJ = 0 (common practice, Clebsch–Gordan tables)
    expect(spinZSquaredElement(2, 1, 0, 0, 0, 2, 2, 0).toString()).toBe("2/3");
  });

  it("gives Sr 5s5p ³P₀ about −0.233 Hz/G² from ³P₁ (doc example; issue 10, defect 4)", () => {
    const beta = partnerQuadraticCoefficient(sr88.term, p0, [p1, p2], 0, 0)!;
    // Sr lattice clock: second-order Zeeman shift of ³P₀ about −0.233 Hz/G² (from memory: Sr lattice-clock literature)
    expect(Math.abs(beta.mul("1e-8").toNumber() / -0.233 - 1)).toBeLessThan(0.01);
    // the doc's closed form −(2/3)(gS − gL)²(μB/h)²/(E(³P₁) − E(³P₀)), hand arithmetic from the same inputs
    const dg = sr88.term.gS.minus(sr88.term.gL).mul(muB_h);
    const closed = dg.mul(dg).mul(2).div(3).div(p1.energy.minus(p0.energy)).neg();
    expect(beta.minus(closed).abs().div(closed.abs()).toNumber()).toBeLessThan(1e-50);
    expect(beta.mul("1e-8").toSignificantDigits(6).toString()).toBe("-0.234255");
  });

  it("matches the whole-term mpmath diagonalization for every sublevel of the Sr 5s5p ³P term, with and without nuclear spin", () => {
    for (const name of ["88Sr 5s5p 3P", "87Sr 5s5p 3P"]) {
      const c = fixtureCase(name);
      const model = modelBetas(c);
      let compared = 0;
      for (const b of c.blocks) {
        // in one M block no two states cross at low field: the k-th lowest eigenvalue is the k-th lowest zero-field level
        const states = model.filter((s) => s.mF2 === b.M2).sort((x, y) => x.zero.cmp(y.zero));
        expect(states).toHaveLength(b.beta_Hz_per_T2.length);
        states.forEach((s, k) => {
          expect(s.zero.minus(dec(b.fields[0]!.energies[k]!)).abs().toNumber()).toBeLessThan(1e-3);
          const want = dec(b.beta_Hz_per_T2[k]!);
          // finite-difference error of the fixture is ~1e-12 relative; 1e-8 leaves room
          expect(s.beta.minus(want).abs().div(want.abs().plus(1)).toNumber(), `${name} J=${s.J2}/2 F=${s.F2}/2 mF=${s.mF2}/2`).toBeLessThan(1e-8);
          compared++;
        });
      }
      expect(compared).toBe(name.startsWith("88") ? 9 : 90);
    }
  });

  it("is zero without listed partners, and null when a partner's level coincides", () => {
    expect(partnerQuadraticCoefficient(sr88.term, p0, [], 0, 0)!.isZero()).toBe(true);
    expect(partnerQuadraticCoefficient(sr88.term, p0, [{ ...p1, energy: p0.energy }], 0, 0)).toBeNull();
  });
});

describe("partnerQuadraticSlopes", () => {
  const sr88 = termOf(fixtureCase("88Sr 5s5p 3P"));
  const [p0, p1, p2] = sr88.levels as [PartnerLevel, PartnerLevel, PartnerLevel];

  it("gives Sr ³P₀ ∂β/∂E(³P₁) = β/(E(³P₀) − E(³P₁)) ≈ +4.1824e−6 (Hz/T²)/Hz (−2.34255e7 Hz/T² over −186.827 cm⁻¹·c, by hand) and ∂β/∂E(³P₀) its negative (doc example)", () => {
    const beta = partnerQuadraticCoefficient(sr88.term, p0, [p1, p2], 0, 0)!;
    const s = partnerQuadraticSlopes(sr88.term, p0, [p1, p2], 0, 0)!;
    // chain rule on β = (2/3)K/Δ by hand: ∂β/∂E(³P₁) = β/Δ with Δ = E(³P₀) − E(³P₁) (textbook calculus)
    const hand = beta.div(p0.energy.minus(p1.energy));
    expect(s.partners[0]!.energy.minus(hand).abs().div(hand).toNumber()).toBeLessThan(1e-50);
    expect(s.level.energy.plus(hand).abs().div(hand).toNumber()).toBeLessThan(1e-50);
    expect(s.partners[0]!.energy.toSignificantDigits(5).toString()).toBe("0.0000041824");
    // ³P₂ does not couple to ³P₀ (|ΔJ| = 2)
    expect(s.partners[1]!.energy.isZero()).toBe(true);
  });

  it("agrees with central differences of the coefficient in every energy, A and B (87Sr ³P₁, F = 9/2, mF = 5/2; an independent route)", () => {
    const c = fixtureCase("87Sr 5s5p 3P");
    const { term, levels } = termOf(c);
    const lv = levels.find((l) => l.J2 === 2)!;
    const others = levels.filter((l) => l !== lv);
    const F2 = 9;
    const mF2 = 5;
    const s = partnerQuadraticSlopes(term, lv, others, F2, mF2)!;
    const beta = (self: PartnerLevel, ps: PartnerLevel[]) => partnerQuadraticCoefficient(term, self, ps, F2, mF2)!;
    const h = new Dec("1e-6"); // Hz; the 60-digit arithmetic leaves a central difference's h² error far below the check
    const diff = (bump: (d: Dec) => [PartnerLevel, PartnerLevel[]]) => {
      const [a1, a2] = bump(h);
      const [b1, b2] = bump(h.neg());
      return beta(a1, a2).minus(beta(b1, b2)).div(h.mul(2));
    };
    const close = (got: Dec, want: Dec, what: string) => {
      const scale = want.abs().plus("1e-30");
      expect(got.minus(want).abs().div(scale).toNumber(), what).toBeLessThan(1e-9);
    };
    for (const key of ["energy", "A", "B"] as const) {
      close(s.level[key], diff((d) => [{ ...lv, [key]: lv[key].plus(d) }, others]), `level ${key}`);
      others.forEach((p, i) => {
        close(s.partners[i]![key], diff((d) => [lv, others.map((q) => (q === p ? { ...q, [key]: q[key].plus(d) } : q))]), `partner J=${p.J2}/2 ${key}`);
      });
    }
    // the slopes are not all zero: A of 87Sr ³P₁ enters through the hyperfine shift of F = 9/2
    expect(s.level.A.isZero()).toBe(false);
  });
});
