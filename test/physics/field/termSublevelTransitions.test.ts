/**
 * Sublevel transitions of a level solved with its listed fine-structure
 * partners (termSublevelTransitions.ts). Check values: the 50-digit mpmath
 * whole-term diagonalization of 87Rb 5p ²P° at 0.37 T
 * (test/fixtures/field/calculator-mpmath.json, scripts/fixtures/calculator_mpmath.py),
 * hand arithmetic on D. A. Steck's 87Rb constants, and df/dB = 0 at each
 * field-insensitive point checked by central differences of the solver's
 * own energies; a term of one J must give the single-J list
 * (sublevelTransitions.ts, checked against Steck's 3.2289 G point there).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { sublevelTransitions } from "../../../src/physics/field/sublevelTransitions.js";
import { prepareTerm, termHyperfineZeemanSolver, type TermProblem } from "../../../src/physics/field/termHyperfineZeeman.js";
import { termSublevelTransitions } from "../../../src/physics/field/termSublevelTransitions.js";
import type { HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { ROOT } from "../../support/runBuild.js";
import { RB87_5S } from "./levels.js";

interface FixtureLevel {
  level: string;
  gI: string;
  term: { S2: number; L: number; gL: string; gS: string; levels: { level: string; J2: number; energy_Hz: string; gJ: string; A: string; B: string }[] };
  at: { B_T: string; states: { F: string; mF: string; E_Hz: string }[] }[];
}
// scripts/fixtures/calculator_mpmath.py: 87Rb 5p ²P° as a whole term in |mL mS mI⟩ (mpmath, 50 digits)
const FIXTURE = JSON.parse(readFileSync(join(ROOT, "test/fixtures/field/calculator-mpmath.json"), "utf8")) as { muB_h: string; levels: FixtureLevel[] };
const P32 = FIXTURE.levels.find((l) => l.level === "5p-P3/2")!;

/** The fixture's term as the solver's problem (its gJ in use, energies, A, B; gL, gS, gI, μB/h). */
const problem: TermProblem = {
  S2: P32.term.S2,
  L: P32.term.L,
  I2: 3,
  gL: dec(P32.term.gL),
  gS: dec(P32.term.gS),
  gI: dec(P32.gI),
  muB_h: dec(FIXTURE.muB_h),
  levels: P32.term.levels.map((l) => ({ J2: l.J2, energy: dec(l.energy_Hz), gJ: dec(l.gJ), A: dec(l.A), B: dec(l.B) })),
};
const index = problem.levels.findIndex((l) => l.J2 === 3);
const own = problem.levels[index]!;
const single: HyperfineZeemanLevel = { J2: 3, I2: 3, gJ: own.gJ, gI: problem.gI, A: own.A, B: own.B, muB_h: problem.muB_h };
const prepared = prepareTerm(problem);
const solve = termHyperfineZeemanSolver(prepared);
const fields = [dec("0.0001"), dec("0.37")];
const transitions = termSublevelTransitions(prepared, index, single, fields, fields.map((b) => solve(b)[index]!));
const clock = transitions.find((t) => t.lower.F2 === 4 && t.lower.mF2 === 0 && t.upper.F2 === 6 && t.upper.mF2 === 0)!;

describe("termSublevelTransitions", () => {
  it("repeats its worked example: 87Rb 5²P3/2 |2, 0⟩ ↔ |3, 0⟩ starts at 3A + B with B = 0 a field-insensitive point", () => {
    // E(F = 3) − E(F = 2) = 3A + B for I = J = 3/2 (hand arithmetic from the hyperfine formula; Steck's A and B)
    const want = own.A.mul(3).plus(own.B);
    expect(want.eq(dec("266.652e6"))).toBe(true);
    expect(clock.zeroFieldHz.eq(want)).toBe(true);
    expect(clock.firstOrder.hzPerTesla.isZero()).toBe(true);
    expect(clock.fieldInsensitive[0]).toEqual({ tesla: dec("0"), hz: want });
    // the second point near 121.72 G, a little above the one of 5²P3/2 alone (the partner's second-order push)
    const p = clock.fieldInsensitive[1]!;
    expect(p.tesla.mul(1e4).toNumber()).toBeCloseTo(121.7245, 3);
    const alone = sublevelTransitions(single, []).find((t) => t.lower.F2 === 4 && t.lower.mF2 === 0 && t.upper.F2 === 6 && t.upper.mF2 === 0)!;
    expect(alone.fieldInsensitive[1]!.tesla.mul(1e4).toNumber()).toBeCloseTo(121.7242, 3);
    expect(p.tesla.gt(alone.fieldInsensitive[1]!.tesla)).toBe(true);
  });

  it("gives the frequency at 0.37 T of a 50-digit whole-term diagonalization (6754.7196 MHz, 0.84 MHz below 5²P3/2 alone)", () => {
    const at = P32.at.find((a) => a.B_T === "0.37")!;
    const E = (F: string, mF: string) => dec(at.states.find((s) => s.F === F && s.mF === mF)!.E_Hz);
    const want = E("3", "0").minus(E("2", "0"));
    expect(clock.atFields[1]!.hz.minus(want).abs().toNumber()).toBeLessThan(1e-20);
    expect(want.div(1e6).toNumber()).toBeCloseTo(6754.7196, 4);
    const alone = sublevelTransitions(single, [dec("0.37")]).find((t) => t.lower.F2 === 4 && t.lower.mF2 === 0 && t.upper.F2 === 6 && t.upper.mF2 === 0)!;
    expect(alone.atFields[0]!.hz.minus(want).div(1e6).toNumber()).toBeCloseTo(0.84, 2);
  });

  it("puts every field-insensitive point where df/dB = 0: the term solver's Hellmann–Feynman slopes there, to 1e-20 of B", () => {
    let checked = 0;
    for (const t of transitions) {
      for (const p of t.fieldInsensitive) {
        if (p.tesla.isZero() || checked >= 12) continue;
        checked++;
        const at = (b: Dec) => {
          const st = solve(b)[index]!;
          const u = st.find((s) => s.F2 === t.upper.F2 && s.mF2 === t.upper.mF2)!;
          const l = st.find((s) => s.F2 === t.lower.F2 && s.mF2 === t.lower.mF2)!;
          return { d: u.slope.minus(l.slope), f: u.energy.minus(l.energy) };
        };
        const h = p.tesla.mul("1e-8");
        const a = at(p.tesla);
        const b = at(p.tesla.plus(h));
        // Newton's distance to the root of df/dB, with d²f/dB² by a forward difference of the slopes
        const distance = a.d.div(b.d.minus(a.d).div(h));
        expect(distance.div(p.tesla).abs().toNumber(), `${t.lower.F2},${t.lower.mF2} → ${t.upper.F2},${t.upper.mF2} at ${p.tesla}`).toBeLessThan(1e-20);
        expect(a.f.minus(p.hz).abs().div(a.f.abs()).toNumber()).toBeLessThan(1e-30);
      }
    }
    expect(checked).toBeGreaterThan(5);
  });

  it("equals sublevelTransitions for a term of one J (87Rb 5²S1/2 alone): the same lines, numbers and points", () => {
    const one: TermProblem = {
      S2: 1, L: 0, I2: 3, gL: dec("1"), gS: dec("2.00231930436092"), gI: RB87_5S.gI, muB_h: RB87_5S.muB_h,
      levels: [{ J2: 1, energy: dec("0"), gJ: RB87_5S.gJ, A: RB87_5S.A, B: RB87_5S.B }],
    };
    const p = prepareTerm(one);
    const s = termHyperfineZeemanSolver(p);
    const bs = [dec("0.0001"), dec("0.1")];
    const mine = termSublevelTransitions(p, 0, RB87_5S, bs, bs.map((b) => s(b)[0]!));
    const ref = sublevelTransitions(RB87_5S, bs);
    expect(mine.map((t) => [t.lower, t.upper, t.kind])).toEqual(ref.map((t) => [t.lower, t.upper, t.kind]));
    mine.forEach((t, i) => {
      const r = ref[i]!;
      expect([t.zeroFieldHz.eq(r.zeroFieldHz), t.firstOrder.hzPerTesla.eq(r.firstOrder.hzPerTesla)]).toEqual([true, true]);
      t.atFields.forEach((a, k) => expect(a.hz.minus(r.atFields[k]!.hz).abs().div(r.atFields[k]!.hz.abs().plus(1)).toNumber()).toBeLessThan(1e-30));
      expect(t.fieldInsensitive.length).toBe(r.fieldInsensitive.length);
      t.fieldInsensitive.forEach((q, k) => {
        const rq = r.fieldInsensitive[k]!;
        expect(q.tesla.minus(rq.tesla).abs().toNumber()).toBeLessThanOrEqual(rq.tesla.toNumber() * 1e-22);
        expect(q.hz.minus(rq.hz).abs().div(rq.hz.abs()).toNumber()).toBeLessThan(1e-25);
      });
    });
    // Steck's magic field of the |1, −1⟩ ↔ |2, 1⟩ two-photon line, 3.22892 G (D. A. Steck, Rubidium 87 D Line Data; common practice)
    const magic = mine.find((t) => t.lower.F2 === 2 && t.lower.mF2 === -2 && t.upper.F2 === 4 && t.upper.mF2 === 2)!;
    expect(magic.fieldInsensitive[0]!.tesla.mul(1e4).toNumber()).toBeCloseTo(3.2289, 3);
  });
});
