import { describe, expect, it } from "vitest";
import { Dec, dec, ZERO } from "../../../src/physics/decimal.js";
import { prepareHyperfineZeeman, solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { breitRabiEnergy } from "../../../src/physics/field/breitRabi.js";
import { quadraticZeemanCoefficient } from "../../../src/physics/field/quadraticZeeman.js";
import { sublevelTransitions } from "../../../src/physics/field/sublevelTransitions.js";
import { termHyperfineZeemanSolver, prepareTerm, type TermProblem } from "../../../src/physics/field/termHyperfineZeeman.js";
import { termSublevelTransitions } from "../../../src/physics/field/termSublevelTransitions.js";
import {
  breitRabiSensitivity,
  insensitivePointSensitivity,
  linearSlopeSensitivity,
  termInsensitivePointSensitivity,
  quadraticSensitivity,
  stateSensitivity,
  termStateSensitivity,
  type LevelSensitivity,
  type TermSensitivity,
} from "../../../src/physics/field/sensitivity.js";
import { landeLS } from "../../../src/physics/lande.js";
import { CS133_6S, H1_2P32, K40_4S, muB_h, RB87_5P32, RB87_5S } from "./levels.js";

const PARAMS = ["A", "B", "gJ", "gI", "muB_h"] as const;
type Param = (typeof PARAMS)[number];

/** Relative step of the central differences: at 60 digits truncation (~1e-40) and rounding (~1e-25) are both negligible. */
const REL = new Dec("1e-20");
const stepOf = (x: Dec, scale: Dec) => (x.isZero() ? scale.mul(REL) : x.abs().mul(REL));

/** Central difference of f with respect to level parameter p (an independent route: no eigenvectors used). */
function centralDiff(level: HyperfineZeemanLevel, p: Param, f: (l: HyperfineZeemanLevel) => Dec, scale: Dec): Dec {
  const h = stepOf(level[p], scale);
  const up = f({ ...level, [p]: level[p].plus(h) });
  const down = f({ ...level, [p]: level[p].minus(h) });
  return up.minus(down).div(h.mul(2));
}

/** |a − b| ≤ tol·max(|b|, floor). */
const close = (a: Dec, b: Dec, tol: string, floor: Dec) => a.minus(b).abs().lte(Dec.max(b.abs(), floor).mul(tol));

const scaleOf = (p: Param, level: HyperfineZeemanLevel) => (p === "A" || p === "B" ? level.A.abs() : p === "muB_h" ? level.muB_h : new Dec(1));
const floorOf = (p: Param, level: HyperfineZeemanLevel, tesla: Dec): Dec =>
  p === "A" || p === "B" ? new Dec(1) : p === "muB_h" ? Dec.max(tesla, new Dec("1e-9")) : Dec.max(level.muB_h.mul(tesla), new Dec(1));

describe("stateSensitivity (Hellmann–Feynman)", () => {
  it("equals a central difference of the diagonalized energy at 60 digits for every state and input of 87Rb 5S1/2, 87Rb 5P3/2 and 133Cs 6S1/2", () => {
    for (const level of [RB87_5S, RB87_5P32, CS133_6S]) {
      for (const t of ["0", "0.000323", "0.05", "0.3"]) {
        const tesla = dec(t);
        const states = solveHyperfineZeeman(level, tesla);
        states.forEach((s, i) => {
          const hf = stateSensitivity(level, s, tesla);
          for (const p of PARAMS) {
            if (p === "B" && level.B.isZero()) continue;
            const fd = centralDiff(level, p, (l) => solveHyperfineZeeman(l, tesla)[i]!.energy, scaleOf(p, level));
            expect(close(hf[p], fd, "1e-15", floorOf(p, level, tesla)), `${p} of state ${i} at ${t} T: ${hf[p]} vs ${fd}`).toBe(true);
          }
        });
      }
    }
  });

  it("gives ∂E/∂A = 3/4, ∂E/∂gJ = (μB/h)B/2 and ∂E/∂gI = 3(μB/h)B/2 for the stretched |F=2, mF=2⟩ of 87Rb at 0.1 T (textbook: E = 3A/4 + (μB/h)B(gJ/2 + 3gI/2))", () => {
    const tesla = dec("0.1");
    const s = solveHyperfineZeeman(RB87_5S, tesla).find((x) => x.F2 === 4 && x.mF2 === 4)!;
    const hf = stateSensitivity(RB87_5S, s, tesla);
    expect(hf.A.minus("0.75").abs().lt("1e-50")).toBe(true);
    expect(hf.gJ.minus(muB_h.mul(tesla).div(2)).abs().lt("1e-40")).toBe(true);
    expect(hf.gI.minus(muB_h.mul(tesla).mul(3).div(2)).abs().lt("1e-40")).toBe(true);
  });

  it("gives the zero-field derivative −5/4 with respect to A for |F=1, mF=0⟩ of 87Rb at B = 0 (textbook: E_F=1 = −5A/4), and no field derivatives", () => {
    const s = solveHyperfineZeeman(RB87_5S, ZERO).find((x) => x.F2 === 2 && x.mF2 === 0)!;
    const hf = stateSensitivity(RB87_5S, s, ZERO);
    expect(hf.A.plus("1.25").abs().lt("1e-45")).toBe(true);
    expect(hf.gJ.isZero() && hf.gI.isZero() && hf.muB_h.isZero()).toBe(true);
  });
});

describe("breitRabiSensitivity (analytic)", () => {
  it("equals a central difference of the Breit–Rabi energy, for J = 1/2 (87Rb, inverted 40K) and I = 1/2 (1H 2P3/2), stretched states included", () => {
    for (const level of [RB87_5S, K40_4S, H1_2P32]) {
      for (const t of ["0", "0.000323", "0.2438", "3"]) {
        const tesla = dec(t);
        for (const s of solveHyperfineZeeman(level, tesla)) {
          const br = breitRabiSensitivity(level, s.F2, s.mF2, tesla);
          for (const p of PARAMS) {
            const fd = centralDiff(level, p, (l) => breitRabiEnergy(l, s.F2, s.mF2, tesla), scaleOf(p, level));
            expect(close(br[p], fd, "1e-15", floorOf(p, level, tesla)), `${p} F2=${s.F2} mF2=${s.mF2} at ${t} T`).toBe(true);
          }
        }
      }
    }
  });

  it("agrees with the Hellmann–Feynman sensitivities of the diagonalized 87Rb ground state to 30 digits", () => {
    const tesla = dec("0.0123");
    for (const s of solveHyperfineZeeman(RB87_5S, tesla)) {
      const br = breitRabiSensitivity(RB87_5S, s.F2, s.mF2, tesla);
      const hf = stateSensitivity(RB87_5S, s, tesla);
      for (const p of PARAMS) expect(close(br[p], hf[p], "1e-30", floorOf(p, RB87_5S, tesla))).toBe(true);
    }
  });
});

describe("linearSlopeSensitivity", () => {
  it("gives (μB/h)/4 for gJ and 3(μB/h)/4 for gI for 87Rb F = 2, mF = 1 (gF = gJ/4 + 3gI/4, Steck eq. (22))", () => {
    const s = linearSlopeSensitivity(RB87_5S, 4, 2);
    expect(s.gJ.minus(muB_h.div(4)).abs().lt("1e-45")).toBe(true);
    expect(s.gI.minus(muB_h.mul(3).div(4)).abs().lt("1e-45")).toBe(true);
    expect(s.A.isZero()).toBe(true);
  });
});

describe("quadraticSensitivity (analytic)", () => {
  it("equals a central difference of the second-order coefficient for 87Rb 5S1/2, 87Rb 5P3/2 (with B) and 133Cs 6S1/2", () => {
    for (const level of [RB87_5S, RB87_5P32, CS133_6S]) {
      for (const s of solveHyperfineZeeman(level, ZERO)) {
        const an = quadraticSensitivity(level, s.F2, s.mF2)!;
        const beta = quadraticZeemanCoefficient(level, s.F2, s.mF2)!;
        for (const p of PARAMS) {
          if (p === "B" && level.B.isZero()) continue;
          const fd = centralDiff(level, p, (l) => quadraticZeemanCoefficient(l, s.F2, s.mF2)!, scaleOf(p, level));
          const floor = beta.abs().div(scaleOf(p, level)).mul("1e-10").plus("1e-30");
          expect(close(an[p], fd, "1e-15", floor), `${p} F2=${s.F2} mF2=${s.mF2}`).toBe(true);
        }
      }
    }
  });

  it("gives ∂β/∂A = −β/A for the 87Rb clock states (β = (gJ − gI)²(μB/h)²/(8A), Steck §2.4)", () => {
    const an = quadraticSensitivity(RB87_5S, 4, 0)!;
    const beta = quadraticZeemanCoefficient(RB87_5S, 4, 0)!;
    expect(an.A.plus(beta.div(RB87_5S.A)).abs().lt(beta.div(RB87_5S.A).abs().mul("1e-40"))).toBe(true);
  });
});

describe("insensitivePointSensitivity (implicit-function theorem)", () => {
  const up = { F2: 4, mF2: 2 };
  const lo = { F2: 2, mF2: -2 };
  const point = (l: HyperfineZeemanLevel) => {
    const t = sublevelTransitions(l, [], { toTesla: dec("0.01") }).find(
      (x) => x.upper.F2 === up.F2 && x.upper.mF2 === up.mF2 && x.lower.F2 === lo.F2 && x.lower.mF2 === lo.mF2,
    )!;
    return t.fieldInsensitive.find((p) => p.tesla.gt(0))!;
  };

  it("equals a central difference of the located point (field and frequency) of 87Rb |1,−1⟩ ↔ |2,1⟩ near 3.23 G for A, gJ, gI and μB/h", () => {
    const at = point(RB87_5S);
    expect(Math.abs(at.tesla.toNumber() - 3.2289e-4)).toBeLessThan(0.001e-4); // from the module's worked example (3.228917 G)
    const s = insensitivePointSensitivity(prepareHyperfineZeeman(RB87_5S), RB87_5S, up, lo, at.tesla);
    for (const p of ["A", "gJ", "gI", "muB_h"] as const) {
      // relative step 1e-8: the located point is good to ~1e-25, so the difference is good to ~1e-15 (truncation ~1e-16)
      const h = RB87_5S[p].abs().mul("1e-8");
      const a = point({ ...RB87_5S, [p]: RB87_5S[p].plus(h) });
      const b = point({ ...RB87_5S, [p]: RB87_5S[p].minus(h) });
      const dB = a.tesla.minus(b.tesla).div(h.mul(2));
      const dHz = a.hz.minus(b.hz).div(h.mul(2));
      expect(close(s.tesla[p], dB, "1e-6", new Dec(0)), `dB*/d${p}: ${s.tesla[p]} vs ${dB}`).toBe(true);
      expect(close(s.hz[p], dHz, "1e-6", new Dec("1e-3")), `df*/d${p}: ${s.hz[p]} vs ${dHz}`).toBe(true);
    }
  });
});

/** The 87Rb 5p ²P term of both term tests. */
const CM = new Dec("29979245800"); // Hz per cm⁻¹ (c exact, SI)
const gL = dec("0.99999368"); // 1 − m_e/M(87Rb), rounded (only compares two routes)
const gS = dec("2.00231930436092"); // CODATA 2022 −g_e
// 87Rb 5p ²P: Steck (A, B, gJ of P3/2; D1/D2 wave numbers); P1/2 gJ the LS value
const problem = (): TermProblem => ({
  S2: 1, L: 1, I2: 3, gL, gS, gI: dec("-0.0009951414"), muB_h,
  levels: [
    { J2: 1, energy: dec("12578.951").mul(CM), gJ: landeLS(1, 1, 1, gL, gS)!, A: dec("408.328e6"), B: ZERO },
    { J2: 3, energy: dec("12816.549").mul(CM), gJ: dec("1.3362"), A: dec("84.7185e6"), B: dec("12.4965e6") },
  ],
});

/** One input of a term problem: its value, the problem with it replaced, and its slope in a TermSensitivity. */
type Knob = { name: string; x: Dec; set: (x: Dec) => TermProblem; pick: (t: TermSensitivity) => Dec };

/** Every input of the two-level ²P term: energy, A, gJ of each level, B of P3/2 (P1/2 has none), gI, gS, gL, μB/h. */
function termKnobs(base: TermProblem): Knob[] {
  const perLevel = (k: "energy" | "A" | "B" | "gJ", li: number): Knob => ({
    name: `${k}[${li}]`, x: base.levels[li]![k],
    set: (x) => ({ ...base, levels: base.levels.map((l, i) => (i === li ? { ...l, [k]: x } : l)) }),
    pick: (t) => t[k][li]!,
  });
  const global = (k: "gI" | "gS" | "gL" | "muB_h"): Knob => ({ name: k, x: base[k], set: (x) => ({ ...base, [k]: x }), pick: (t) => t[k] });
  return [...[0, 1].flatMap((li) => (["energy", "A", "gJ"] as const).map((k) => perLevel(k, li))), perLevel("B", 1), global("gI"), global("gS"), global("gL"), global("muB_h")];
}

describe("termStateSensitivity (Hellmann–Feynman on the term solver)", () => {

  it("equals central differences of the term solver's energies for every level energy, A, B, gJ, gI, gS, gL and μB/h (87Rb 5p ²P at 0.05 T and 3 T)", () => {
    const base = problem();
    const knobs = termKnobs(base);
    for (const t of ["0.05", "3"]) {
      const tesla = dec(t);
      const prepared = prepareTerm(base);
      const states = termHyperfineZeemanSolver(prepared)(tesla);
      for (let li = 0; li < 2; li++) {
        // a few states per level keep the test short: the first, a middle and the last
        const picks = [0, Math.floor(states[li]!.length / 2), states[li]!.length - 1];
        for (const si of picks) {
          const hf = termStateSensitivity(prepared, states[li]![si]!, tesla);
          for (const k of knobs) {
            const h = k.x.abs().mul(REL);
            const e = (p: TermProblem) => termHyperfineZeemanSolver(p)(tesla)[li]![si]!.energy;
            const fd = e(k.set(k.x.plus(h))).minus(e(k.set(k.x.minus(h)))).div(h.mul(2));
            expect(close(k.pick(hf), fd, "1e-12", new Dec("1e-6")), `${k.name} level ${li} state ${si} at ${t} T: ${k.pick(hf)} vs ${fd}`).toBe(true);
          }
        }
      }
    }
  });
});

describe("termInsensitivePointSensitivity (implicit-function theorem on the term solver)", () => {
  const up = { F2: 4, mF2: 2 };
  const lo = { F2: 2, mF2: -2 };
  // the field-insensitive point of 5²P1/2 |1,−1⟩ ↔ |2,1⟩ located afresh by the term solver's own search for a problem p
  const point = (p: TermProblem) => {
    const l0 = p.levels[0]!;
    const level: HyperfineZeemanLevel = { J2: l0.J2, I2: p.I2, gJ: l0.gJ, gI: p.gI, A: l0.A, B: l0.B, muB_h: p.muB_h };
    const t = termSublevelTransitions(prepareTerm(p), 0, level, [], [], { toTesla: dec("0.01") }).find(
      (x) => x.upper.F2 === up.F2 && x.upper.mF2 === up.mF2 && x.lower.F2 === lo.F2 && x.lower.mF2 === lo.mF2,
    )!;
    return t.fieldInsensitive.find((q) => q.tesla.gt(0))!;
  };

  it("equals a central difference of the re-solved point (field and frequency) of 87Rb 5²P1/2 |1,−1⟩ ↔ |2,1⟩ for every energy, A, B, gJ, gI, gS, gL and μB/h", () => {
    const base = problem();
    const at = point(base);
    // B* ≈ 3.23 G·(A(P1/2)/A(S1/2))·(gJ(S)/gJ(P1/2))² ≈ 3.5 G (scaling of the Breit–Rabi point x* ∝ gI/gJ, textbook)
    expect(at.tesla.toNumber()).toBeGreaterThan(3e-4);
    expect(at.tesla.toNumber()).toBeLessThan(4e-4);
    const s = termInsensitivePointSensitivity(prepareTerm(base), 0, up, lo, at.tesla);
    for (const k of termKnobs(base)) {
      // relative step 1e-8, as for the single-J point: the located point is good to ~1e-25
      const h = k.x.abs().mul("1e-8");
      const a = point(k.set(k.x.plus(h)));
      const b = point(k.set(k.x.minus(h)));
      const dB = a.tesla.minus(b.tesla).div(h.mul(2));
      const dHz = a.hz.minus(b.hz).div(h.mul(2));
      expect(close(k.pick(s.tesla), dB, "1e-5", new Dec("1e-30")), `dB*/d${k.name}: ${k.pick(s.tesla)} vs ${dB}`).toBe(true);
      expect(close(k.pick(s.hz), dHz, "1e-5", new Dec("1e-6")), `df*/d${k.name}: ${k.pick(s.hz)} vs ${dHz}`).toBe(true);
    }
    // the partner 5²P3/2 moves the point: B* depends on its energy (the single-J solver would give 0 here)
    expect(s.tesla.energy[1]!.isZero()).toBe(false);
  });
});

export type { LevelSensitivity };
