import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec, dec, ZERO } from "../../../src/physics/decimal.js";
import { solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { prepareTerm, solveTermBlock, spinZElement, termBlockFloatEigen, termHyperfineZeemanSolver, type TermProblem } from "../../../src/physics/field/termHyperfineZeeman.js";
import { termBlockFloatSolver, termHyperfineZeemanFloatSolver } from "../../../src/physics/field/termHyperfineZeemanFloat.js";
import { landeLS } from "../../../src/physics/lande.js";
import { CS133_6S, K40_4S, muB_h, RB87_5P32, RB87_5S } from "./levels.js";

const CM = new Dec("29979245800"); // Hz per cm⁻¹ (c exact, SI)

interface FixtureCase {
  name: string;
  S2: number;
  L: number;
  I2: number;
  gL: string;
  gS: string;
  gI_used: string;
  levels: { J2: number; energy: string; A: string; B: string; gJ?: string }[];
  blocks: { M2: number; fields: { tesla: string; energies: string[] }[] }[];
}
// scripts/fixtures/term_zeeman.py: whole-term Hamiltonian in |mL mS mI⟩ at 50 digits (mpmath), no 3j/6j/CG tables
const FIXTURE = JSON.parse(readFileSync(new URL("../../fixtures/field/term-mpmath.json", import.meta.url), "utf8")) as { cases: FixtureCase[] };
const hz = (t: string) => (t.endsWith(" cm-1") ? dec(t.slice(0, -5)).mul(CM) : dec(t));

/** The fixture's term as the solver's problem, with the LS gJ within each J (what the fixture's gL·Lz + gS·Sz implies) or the fixture's given one. */
function problemOf(c: FixtureCase): TermProblem {
  const gL = dec(c.gL);
  const gS = dec(c.gS);
  return {
    S2: c.S2, L: c.L, I2: c.I2, gL, gS, gI: dec(c.gI_used), muB_h,
    levels: c.levels.map((l) => ({ J2: l.J2, energy: hz(l.energy), gJ: l.gJ ? dec(l.gJ) : landeLS(c.S2, c.L, l.J2, gL, gS) ?? ZERO, A: dec(l.A), B: dec(l.B) })),
  };
}

describe("termHyperfineZeemanSolver", () => {
  it("matches the 50-digit whole-term diagonalization: 6Li 2P at 0, 27 G, 300 G, 832 G and 0.1 T; 88Sr and 87Sr 5s5p ³P up to 1 T; 40Ca⁺ 3d ²D with a measured gJ up to 1 T", () => {
    for (const c of FIXTURE.cases) {
      const p = problemOf(c);
      const solve = termHyperfineZeemanSolver(p);
      const fields = c.blocks[0]!.fields.map((f) => f.tesla);
      if (c.name === "6Li 2P") expect(fields).toEqual(["0", "0.0027", "0.03", "0.0832", "0.1"]);
      fields.forEach((t, fi) => {
        const states = solve(dec(t));
        for (const b of c.blocks) {
          const mine = states
            .flatMap((lv, i) => lv.filter((s) => s.mF2 === b.M2).map((s) => s.energy.plus(p.levels[i]!.energy)))
            .sort((x, y) => x.cmp(y));
          const want = b.fields[fi]!.energies.map(dec);
          expect(mine).toHaveLength(want.length);
          // the fixture keeps 40 digits of ~4e14 Hz (5e-26 Hz); we agree to that, so 1e-20 Hz leaves room
          mine.forEach((e, k) => expect(e.minus(want[k]!).abs().toNumber(), `${c.name} B=${t} M=${b.M2}/2 #${k}`).toBeLessThan(1e-20));
        }
      });
    }
  });

  it("labels each state with the zero-field level it connects to and keeps every state normalized", () => {
    const li = problemOf(FIXTURE.cases.find((c) => c.name === "6Li 2P")!);
    const s0 = termHyperfineZeemanSolver(li)(ZERO);
    // 2P1/2 (I = 1): F = 1/2, 3/2; 2P3/2: F = 1/2, 3/2, 5/2 (common practice: |I − J| … I + J)
    expect(s0.map((lv) => [...new Set(lv.map((s) => s.F2))])).toEqual([[1, 3], [1, 3, 5]]);
    const s = termHyperfineZeemanSolver(li)(dec("0.0832"));
    for (const lv of s) {
      for (const st of lv) {
        const n = st.amplitudes.reduce((a, x) => a.plus(x.amplitude.mul(x.amplitude)), ZERO);
        expect(n.minus(1).abs().toNumber()).toBeLessThan(1e-40);
      }
    }
    // at 832 G the fine-structure mixing is small but not zero: every M = 1/2 state has amplitude on both J
    const mixed = s[0]!.find((st) => st.F2 === 1 && st.mF2 === 1)!;
    expect(mixed.amplitudes.some((a) => a.J2 === 3 && !a.amplitude.isZero())).toBe(true);
  });

  it("repeats its worked example: the 6Li 2P3/2 stretched state at 832 G is 3A/2 + B/4 + (μB/h)·B·(3gJ/2 + gI)", () => {
    const li = problemOf(FIXTURE.cases.find((c) => c.name === "6Li 2P")!);
    const B = dec("0.0832");
    const top = termHyperfineZeemanSolver(li)(B)[1]!.find((st) => st.mF2 === 5)!;
    const p32 = li.levels[1]!;
    // I·J = mJ·mI = 3/2 and Q = 1/4 in the stretched state (hand arithmetic from the operators)
    const want = p32.A.mul(3).div(2).plus(p32.B.div(4)).plus(muB_h.mul(B).mul(p32.gJ.mul(3).div(2).plus(li.gI)));
    expect(top.energy.minus(want).abs().toNumber()).toBeLessThan(1e-30);
  });

  it("equals the single-J solver for a level without partners, to 1e-12 relative (in fact to Dec precision)", () => {
    const cases: [HyperfineZeemanLevel, number, number][] = [[RB87_5S, 1, 0], [RB87_5P32, 1, 1], [CS133_6S, 1, 0], [K40_4S, 1, 0]];
    for (const [lv, S2, L] of cases) {
      const solve = termHyperfineZeemanSolver({
        S2, L, I2: lv.I2, gL: dec("1"), gS: dec("2"), gI: lv.gI, muB_h: lv.muB_h,
        levels: [{ J2: lv.J2, energy: dec("1.234e14"), gJ: lv.gJ, A: lv.A, B: lv.B }],
      });
      for (const t of ["0", "0.0001", "0.01", "0.3", "2.5"]) {
        const mine = solve(dec(t))[0]!;
        const ref = solveHyperfineZeeman(lv, dec(t));
        expect(mine.map((s) => [s.F2, s.mF2, s.highField])).toEqual(ref.map((s) => [s.F2, s.mF2, s.highField]));
        mine.forEach((s, i) => {
          const scale = ref[i]!.energy.abs().plus(1);
          expect(s.energy.minus(ref[i]!.energy).abs().div(scale).toNumber()).toBeLessThan(1e-12);
          expect(s.slope.minus(ref[i]!.slope).abs().div(ref[i]!.slope.abs().plus(1)).toNumber()).toBeLessThan(1e-12);
        });
      }
    }
  });

  it("gives |⟨³P₁ 0|Sz|³P₀ 0⟩|² = 2/3 from its Clebsch–Gordan sum", () => {
    // LS coupling, Clebsch–Gordan tables (common practice)
    const e = spinZElement(2, 1, 2, 0, 0);
    expect(e.mul(e).minus(dec("2").div(3)).abs().toNumber()).toBeLessThan(1e-55);
  });

  it("has a float64 twin that repeats the worked example (6Li 2P3/2 stretched state at 832 G)", () => {
    const li = problemOf(FIXTURE.cases.find((c) => c.name === "6Li 2P")!);
    const top = termHyperfineZeemanFloatSolver(li)(0.0832)[1]!.find((st) => st.mF2 === 5)!;
    const p32 = li.levels[1]!;
    // 3A/2 + B/4 + (μB/h)·B·(3gJ/2 + gI), hand arithmetic as in the Dec test
    const want = p32.A.mul(3).div(2).plus(p32.B.div(4)).plus(muB_h.mul("0.0832").mul(p32.gJ.mul(3).div(2).plus(li.gI))).toNumber();
    expect(Math.abs(top.energy - want)).toBeLessThan(1e-3);
  });

  it("has a float64 twin with the same labels, energies within 1e-9 relative or 1 Hz and slopes within 1e-9 relative or 1 Hz/T", () => {
    for (const c of FIXTURE.cases) {
      const prepared = prepareTerm(problemOf(c));
      const exact = termHyperfineZeemanSolver(prepared);
      const float = termHyperfineZeemanFloatSolver(prepared);
      for (const t of ["0", "0.0027", "0.0832", "1"]) {
        const a = exact(dec(t));
        const b = float(Number(t));
        a.forEach((lv, i) =>
          lv.forEach((st, k) => {
            const f = b[i]![k]!;
            expect([f.J2, f.F2, f.mF2]).toEqual([st.J2, st.F2, st.mF2]);
            // the float promise of a field calculator: 1e-9 relative or 1 Hz, whichever is larger (the Dec solver is the reference)
            expect(Math.abs(f.energy - st.energy.toNumber())).toBeLessThan(Math.max(1, 1e-9 * Math.abs(st.energy.toNumber())));
            expect(Math.abs(f.slope - st.slope.toNumber())).toBeLessThan(Math.max(1, 1e-9 * Math.abs(st.slope.toNumber())));
          }),
        );
      }
    }
  });

  it("solves one M block alone as the whole-term solver does (solveTermBlock; the 6Li M = 5/2 block is the stretched state)", () => {
    const li = problemOf(FIXTURE.cases.find((c) => c.name === "6Li 2P")!);
    const prepared = prepareTerm(li);
    const B = dec("0.0832");
    const whole = termHyperfineZeemanSolver(prepared)(B);
    for (const b of prepared.blocks) {
      for (const { level, state } of solveTermBlock(prepared, b, B)) {
        const same = whole[level]!.find((x) => x.F2 === state.F2 && x.mF2 === state.mF2)!;
        expect(state.energy.eq(same.energy)).toBe(true);
      }
    }
    const top = prepared.blocks.find((b) => b.M2 === 5)!;
    const [only] = solveTermBlock(prepared, top, B);
    const p32 = li.levels[1]!;
    // 3A/2 + B/4 + (μB/h)·B·(3gJ/2 + gI), hand arithmetic as above
    const want = p32.A.mul(3).div(2).plus(p32.B.div(4)).plus(muB_h.mul(B).mul(p32.gJ.mul(3).div(2).plus(li.gI)));
    expect(only!.state.energy.minus(want).abs().toNumber()).toBeLessThan(1e-30);
    // the float64 eigenpairs of the same block, from its own level's energy (termBlockFloatEigen, termBlockFloatSolver)
    expect(Math.abs(termBlockFloatEigen(top, muB_h.mul(B).toNumber()).values[0]! - want.toNumber())).toBeLessThan(1e-6);
    expect(Math.abs(termBlockFloatSolver(prepared)(top, 0.0832)[0]!.state.energy - want.toNumber())).toBeLessThan(1e-6);
  });

  it("keeps float64 resolution of each level's own scale across a THz fine-structure interval (87Sr ³P at 1 T: 1e-6 Hz)", () => {
    // the fixture's 87Sr ³P spans 581 cm⁻¹ (17 THz): one float64 matrix would resolve 2e-3 Hz only
    const sr = FIXTURE.cases.find((c) => c.name === "87Sr 5s5p 3P")!;
    const p = problemOf(sr);
    const prepared = prepareTerm(p);
    const exact = termHyperfineZeemanSolver(prepared)(dec("1"));
    const float = termHyperfineZeemanFloatSolver(prepared)(1);
    exact.forEach((lv, i) => lv.forEach((st, k) => expect(Math.abs(float[i]![k]!.energy - st.energy.toNumber()), `${i} ${k}`).toBeLessThan(1e-6 * Math.max(1, Math.abs(st.energy.toNumber()) * 1e-9))));
  });
});

