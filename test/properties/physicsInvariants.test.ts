/**
 * Physics invariants on random valid species parts (fast-check). Each
 * property is an identity of angular-momentum algebra, stated with its
 * derivation, so it holds for every input, not only for tabulated ones.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { Dec, decInt } from "../../src/physics/decimal.js";
import { val } from "../../src/physics/constants/constant.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { fValues, gF } from "../../src/physics/hyperfine.js";
import { lineComponents } from "../../src/physics/linePattern.js";
import { Rational } from "../../src/physics/rational.js";
import { triangle } from "../../src/physics/quantum.js";
import { highFieldEnergy, solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../src/physics/field/hyperfineZeeman.js";
import { field, gIValue, gValue, hyperfineConstant, I2, J2, J2orZero, RUNS, close } from "./arbitraries.js";

const muB_h = val(CODATA_2022.muB_h);
const casimir4 = (x2: number): number => x2 * (x2 + 2); // 4·x(x+1) for doubled x

/** Ju, Jl, k with a non-empty line (triangle rule, and not 0 → 0). */
const lineShape = fc
  .record({ Ju2: J2orZero, Jl2: J2orZero, k: fc.integer({ min: 1, max: 2 }) })
  .filter(({ Ju2, Jl2, k }) => triangle(Ju2, 2 * k, Jl2) && !(Ju2 === 0 && Jl2 === 0));

const levelInput = (J2v: number, g: Dec) => ({ J2: J2v, g: J2v === 0 ? null : g, gExact: J2v === 0 ? null : Rational.of(1) });

describe("line patterns of random levels", () => {
  it("have strengths that sum to exactly 1", () => {
    // Orthogonality of 3j symbols (Edmonds 3.7.8): Σ_{m1 m2} (j1 j2 j3; m1 m2 m3)² = 1/(2j3+1); summed over m3 it is 1.
    fc.assert(
      fc.property(lineShape, gValue(), gValue(), ({ Ju2, Jl2, k }, gu, gl) => {
        const comps = lineComponents(levelInput(Ju2, gu), levelInput(Jl2, gl), k, muB_h);
        const sum = comps.reduce((s, c) => s.add(c.strength), Rational.ZERO);
        expect(sum.toString()).toBe("1");
      }),
      { numRuns: RUNS },
    );
  });

  it("are symmetric about zero: (mu, ml) and (−mu, −ml) have equal strength and opposite shifts", () => {
    // Reflection m → −m: (j1 j2 j3; −m1 −m2 −m3) = (−1)^(j1+j2+j3) (j1 j2 j3; m1 m2 m3) (Edmonds 3.7.6), equal squares; the shift g·m is odd in m.
    fc.assert(
      fc.property(lineShape, gValue(), gValue(), ({ Ju2, Jl2, k }, gu, gl) => {
        const comps = lineComponents(levelInput(Ju2, gu), levelInput(Jl2, gl), k, muB_h);
        const byM = new Map(comps.map((c) => [`${c.mu2},${c.ml2}`, c]));
        for (const c of comps) {
          const m = byM.get(`${-c.mu2},${-c.ml2}`);
          expect(m, `mirror of (${c.mu2}/2, ${c.ml2}/2)`).toBeDefined();
          expect(m!.strength.equals(c.strength)).toBe(true);
          expect(m!.shiftLorentz.plus(c.shiftLorentz).isZero()).toBe(true);
          expect(m!.shiftHzPerT.plus(c.shiftHzPerT).isZero()).toBe(true);
          expect(m!.shiftLorentzExact.add(c.shiftLorentzExact).toString()).toBe("0");
          expect(m!.deltaM + c.deltaM).toBe(0);
        }
      }),
      { numRuns: RUNS },
    );
  });
});

describe("hyperfine g-factors of random levels", () => {
  it("obey the trace sum rule Σ_F (2F+1)·F(F+1)·gF = (2I+1)(2J+1)·[gJ·J(J+1) + gI·I(I+1)]", () => {
    // Derivation: take the trace of (gJ·Jz + gI·Iz)·Fz over the (2I+1)(2J+1) states.
    //  Coupled basis |F mF⟩: Fz is diagonal, so only diagonal elements count, and
    //  ⟨F mF|gJ·Jz + gI·Iz|F mF⟩ = gF·mF (projection theorem, the definition of gF);
    //  the trace is Σ_F gF Σ_mF mF² = Σ_F gF·F(F+1)(2F+1)/3.
    //  Uncoupled basis |mJ mI⟩ with Fz = Jz + Iz: Tr(Jz²) = (2I+1)·J(J+1)(2J+1)/3,
    //  Tr(Iz²) = (2J+1)·I(I+1)(2I+1)/3, Tr(Jz·Iz) = (Σ mJ)(Σ mI) = 0; so the trace is
    //  (2I+1)(2J+1)/3·[gJ·J(J+1) + gI·I(I+1)]. Equate and multiply by 3.
    // F = 0 contributes nothing (F(F+1) = 0), matching gF = null there.
    fc.assert(
      fc.property(I2.filter((i) => i > 0), J2, gValue(), gIValue, (i2, j2, gJ, gI) => {
        let lhs = new Dec(0);
        for (const F2 of fValues(i2, j2)) {
          const g = gF(gJ, gI, i2, j2, F2);
          if (g === null) continue;
          lhs = lhs.plus(g.mul(decInt((F2 + 1) * casimir4(F2))).div(4));
        }
        const rhs = decInt((i2 + 1) * (j2 + 1)).mul(gJ.mul(decInt(casimir4(j2))).plus(gI.mul(decInt(casimir4(i2)))).div(4));
        expect(close(lhs, rhs, "1e-40"), `${lhs} vs ${rhs}`).toBe(true);
      }),
      { numRuns: RUNS },
    );
  });
});

/** A random hyperfine level for the field solver; small spins keep the Dec diagonalization quick. */
const fieldLevel: fc.Arbitrary<HyperfineZeemanLevel> = fc
  .record({ I2: fc.integer({ min: 0, max: 7 }), J2: fc.integer({ min: 1, max: 5 }), gJ: gValue(0.5, 2.5), gI: gIValue, A: hyperfineConstant, B: hyperfineConstant })
  .map((r) => ({ ...r, B: r.B.div(10), muB_h }));

const FIELD_RUNS = Math.max(10, Math.round(RUNS / 5));

describe("the hyperfine–Zeeman solver on random levels", () => {
  it("keeps the trace of each M block minus its Zeeman diagonal independent of the field", () => {
    // The trace of a block is basis-independent: Σ eigenvalues = Σ diagonal elements in |mJ mI⟩.
    // The field enters the diagonal only, as (μB/h)·B·(gJ·mJ + gI·mI) (H_Z is diagonal there),
    // so Σ_block E(B) − (μB/h)·B·Σ_block (gJ·mJ + gI·mI) equals Σ_block E(0).
    fc.assert(
      fc.property(fieldLevel, field, (level, B) => {
        const at0 = solveHyperfineZeeman(level, new Dec(0));
        const atB = solveHyperfineZeeman(level, B);
        const sums = (states: typeof at0, withZeeman: boolean) => {
          const m = new Map<number, Dec>();
          for (const s of states) m.set(s.mF2, (m.get(s.mF2) ?? new Dec(0)).plus(s.energy));
          if (withZeeman) {
            for (const [M2, sum] of m) {
              const basis = states.find((s) => s.mF2 === M2)!.basis;
              const zeeman = basis.reduce((z, b) => z.plus(level.gJ.mul(b.mJ2).plus(level.gI.mul(b.mI2)).div(2)), new Dec(0));
              m.set(M2, sum.minus(zeeman.mul(muB_h).mul(B)));
            }
          }
          return m;
        };
        const s0 = sums(at0, false);
        const sB = sums(atB, true);
        const scale = level.A.abs().plus(level.B.abs()).plus(muB_h.mul(B).mul(3)).mul(16);
        for (const [M2, t0] of s0) {
          const tB = sB.get(M2)!;
          expect(tB.minus(t0).abs().lte(scale.mul("1e-35")), `M=${M2}/2: ${t0} vs ${tB}`).toBe(true);
        }
        // The whole Hamiltonian is traceless (I·J, the quadrupole operator and Jz, Iz all are): the centroid stays at 0.
        const total = atB.reduce((t, s) => t.plus(s.energy), new Dec(0));
        expect(total.abs().lte(scale.mul("1e-35")), `total ${total}`).toBe(true);
      }),
      { numRuns: FIELD_RUNS },
    );
  });

  it("tends at high field to the uncoupled energies (μB/h)·B·(gJ·mJ + gI·mI) + A·mJ·mI + quadrupole diagonal", () => {
    // Second-order perturbation theory in the hyperfine coupling: the off-diagonal elements are at most
    // (|A| + |B|)·(I+1)(J+1) and the Zeeman gaps at least (|gJ| − |gI|)·(μB/h)·B, so the error is below
    // 2·(2I+1)·[(|A| + |B|)(I+1)(J+1)]² / ((|gJ| − |gI|)·(μB/h)·B).
    const Bhigh = new Dec(10_000);
    fc.assert(
      fc.property(fieldLevel, (level) => {
        const states = solveHyperfineZeeman(level, Bhigh);
        const I = (level.I2 + 2) / 2;
        const J = (level.J2 + 2) / 2;
        const coupling = level.A.abs().plus(level.B.abs()).mul(decInt(Math.round(I * J * 4))).div(4);
        const bound = coupling.pow(2).mul(2 * (level.I2 + 1)).div(level.gJ.abs().minus(level.gI.abs()).mul(muB_h).mul(Bhigh));
        for (const s of states) {
          const e = highFieldEnergy(level, s.highField, Bhigh);
          expect(s.energy.minus(e).abs().lte(bound), `mJ=${s.highField.mJ2}/2 mI=${s.highField.mI2}/2: ${s.energy} vs ${e}, bound ${bound}`).toBe(true);
        }
      }),
      { numRuns: FIELD_RUNS },
    );
  });
});
