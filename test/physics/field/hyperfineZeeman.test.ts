import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { EigenvalueDecomposition, Matrix } from "ml-matrix";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { blockMatrix, prepareHyperfineZeeman, solveHyperfineZeeman, type HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import { CS133_6S, K40_4S, RB87_5P32, RB87_5S, muB_h } from "./levels.js";

interface FixtureLevel {
  name: string; J2: number; I2: number; gJ: string; gI: string; A: string; B: string;
  fields: { tesla: string; energies: string[] }[];
}
const fixture = JSON.parse(readFileSync(new URL("../../fixtures/field/eigen-mpmath.json", import.meta.url), "utf8")) as {
  muB_h: string; levels: FixtureLevel[];
};

const sortedEnergies = (level: HyperfineZeemanLevel, tesla: Dec) =>
  solveHyperfineZeeman(level, tesla).map((s) => s.energy).sort((a, b) => a.cmp(b));

describe("solveHyperfineZeeman", () => {
  it("uses the CODATA 2022 Bohr magneton that the fixture was made with", () => {
    expect(fixture.muB_h).toBe(muB_h.toString()); // CODATA 2022
  });

  for (const lv of fixture.levels) {
    it(`matches the 50-digit mpmath eigenvalues of ${lv.name} to 25 digits of the largest |E|`, () => {
      // fixture: scripts/fixtures/field_eigen.py (mpmath.eigsy on the full spin-matrix Hamiltonian)
      const level: HyperfineZeemanLevel = {
        J2: lv.J2, I2: lv.I2, gJ: dec(lv.gJ), gI: dec(lv.gI), A: dec(lv.A), B: dec(lv.B), muB_h: dec(fixture.muB_h),
      };
      for (const f of lv.fields) {
        const ours = sortedEnergies(level, dec(f.tesla));
        const ref = f.energies.map(dec);
        expect(ours.length).toBe(ref.length);
        const scale = ref.reduce((m, x) => (x.abs().gt(m) ? x.abs() : m), dec("0"));
        ours.forEach((e, i) => expect(e.minus(ref[i]!).abs().div(scale).lt(dec("1e-25"))).toBe(true));
      }
    });
  }

  it("agrees with a float64 ml-matrix diagonalization to 1e-9 relative", () => {
    for (const level of [RB87_5P32, CS133_6S, K40_4S]) {
      for (const t of ["0.0005", "0.2", "5"]) {
        const ours = sortedEnergies(level, dec(t));
        const m = floatHamiltonian(level, Number(t));
        const ev = new EigenvalueDecomposition(m, { assumeSymmetric: true }).realEigenvalues.slice().sort((a, b) => a - b);
        const scale = Math.max(...ev.map(Math.abs));
        ours.forEach((e, i) => expect(Math.abs(e.toNumber() - ev[i]!) / scale).toBeLessThan(1e-9));
      }
    }
  });

  it("gives the exact F levels at zero field, degenerate in mF (doc example)", () => {
    const s = solveHyperfineZeeman(RB87_5S, dec("0"));
    for (const st of s) {
      const expected = st.F2 === 2 ? dec("-4271676631.81518125") : dec("2563005979.08910875"); // −5A/4, 3A/4 (Steck A)
      expect(st.energy.minus(expected).abs().lt(dec("1e-45"))).toBe(true);
    }
    expect(s.filter((x) => x.F2 === 2).length).toBe(3);
    expect(s.filter((x) => x.F2 === 4).length).toBe(5);
  });

  it("moves the stretched state exactly linearly (doc example)", () => {
    const st = solveHyperfineZeeman(RB87_5S, dec("0.1")).find((x) => x.F2 === 4 && x.mF2 === 4)!;
    // 3A/4 + (μB/h)(gJ/2 + 3gI/2)·0.1 T; closed form, common practice
    expect(st.energy.minus(dec("2563005979.08910875")).minus(dec("1399166608.616448099459")).abs().lt(dec("1e-40"))).toBe(true);
    expect(st.highField).toEqual({ mJ2: 1, mI2: 3 });
  });

  it("keeps the trace of every M block equal to the sum of its diagonal (field-independent hyperfine part)", () => {
    const lv = RB87_5P32;
    for (const t of ["0", "0.003", "1.7"]) {
      const states = solveHyperfineZeeman(lv, dec(t));
      for (const M2 of new Set(states.map((s) => s.mF2))) {
        const block = states.filter((s) => s.mF2 === M2);
        const trace = block.reduce((a, s) => a.plus(s.energy), dec("0"));
        let diag = dec("0");
        for (const { mJ2, mI2 } of block[0]!.basis) diag = diag.plus(diagonalElement(lv, mJ2, mI2, dec(t)));
        expect(trace.minus(diag).abs().lt(dec("1e-40"))).toBe(true);
      }
    }
  });

  it("tends to the uncoupled energies at high field with a residual falling like 1/B", () => {
    const lv = RB87_5P32;
    const residual = (t: string) => {
      let worst = dec("0");
      for (const s of solveHyperfineZeeman(lv, dec(t))) {
        const r = s.energy.minus(diagonalElement(lv, s.highField.mJ2, s.highField.mI2, dec(t))).abs();
        if (r.gt(worst)) worst = r;
      }
      return worst;
    };
    const r100 = residual("100");
    const r200 = residual("200");
    // second order: |coupling|²/Zeeman gap ~ (A·I·J)²/((μB/h)·gJ·B) ≈ 1e4 Hz at 100 T
    const bound = lv.A.mul(lv.A).mul(dec("10")).div(muB_h.mul(lv.gJ).mul(dec("100")));
    expect(r100.lt(bound)).toBe(true);
    const ratio = r100.div(r200).toNumber();
    expect(ratio).toBeGreaterThan(1.9);
    expect(ratio).toBeLessThan(2.1);
  });

  it("labels the inverted 40K ground state: F = 9/2 lies below F = 7/2 and labels follow at low field", () => {
    const s = solveHyperfineZeeman(K40_4S, dec("1e-5"));
    const top92 = s.filter((x) => x.F2 === 9).reduce((m, x) => (x.energy.gt(m) ? x.energy : m), dec("-1e20"));
    const bottom72 = s.filter((x) => x.F2 === 7).reduce((m, x) => (x.energy.lt(m) ? x.energy : m), dec("1e20"));
    expect(top92.lt(bottom72)).toBe(true); // A < 0: F = 9/2 is the lower level (Arimondo et al. 1977)
    // |9/2, −7/2⟩ goes to mJ = −1/2, mI = −3 at high field (common practice)
    expect(s.find((x) => x.F2 === 9 && x.mF2 === -7)!.highField).toEqual({ mJ2: -1, mI2: -6 });
    expect(s.find((x) => x.F2 === 7 && x.mF2 === -7)!.highField).toEqual({ mJ2: 1, mI2: -8 });
    // gF(9/2) = (gJ + 8gI)/9 ≈ +0.2226 > 0 even though the level is the lower one (common practice)
    const a = s.find((x) => x.F2 === 9 && x.mF2 === 9)!;
    expect(a.slope.gt(0)).toBe(true);
  });

  it("treats a level without nuclear spin as F = J with E = (μB/h)gJ mJ B", () => {
    const lv: HyperfineZeemanLevel = { ...RB87_5P32, I2: 0, A: dec("0"), B: dec("0") };
    const s = solveHyperfineZeeman(lv, dec("0.5"));
    expect(s.map((x) => x.mF2)).toEqual([-3, -1, 1, 3]);
    for (const x of s) {
      expect(x.F2).toBe(3);
      expect(x.energy.minus(muB_h.mul(lv.gJ).mul(x.mF2).div(2).mul(dec("0.5"))).abs().lt(dec("1e-45"))).toBe(true);
    }
  });

  it("returns normalized eigenvectors whose largest component is positive", () => {
    for (const s of solveHyperfineZeeman(RB87_5P32, dec("0.01"))) {
      const n = s.vector.reduce((a, x) => a.plus(x.mul(x)), dec("0"));
      expect(n.minus(1).abs().lt(dec("1e-40"))).toBe(true);
      const big = s.vector.reduce((m, x) => (x.abs().gt(m.abs()) ? x : m), dec("0"));
      expect(big.gt(0)).toBe(true);
    }
  });
});

/** ⟨mJ mI|H|mJ mI⟩ built here from the formulas, for the sum-rule and high-field tests. */
function diagonalElement(lv: HyperfineZeemanLevel, mJ2: number, mI2: number, tesla: Dec): Dec {
  const half = (k: number) => dec(String(k)).div(2);
  const mJ = half(mJ2), mI = half(mI2), J = half(lv.J2), I = half(lv.I2);
  const jj = J.mul(J.plus(1)), ii = I.mul(I.plus(1));
  const d = mJ.mul(mI);
  // (I·J)²_diag = (mJ mI)² + ¼[(J−mJ)(J+mJ+1)(I+mI)(I−mI+1)] + ¼[(J+mJ)(J−mJ+1)(I−mI)(I+mI+1)]
  const up = J.minus(mJ).mul(J.plus(mJ).plus(1)).mul(I.plus(mI)).mul(I.minus(mI).plus(1)).div(4);
  const dn = J.plus(mJ).mul(J.minus(mJ).plus(1)).mul(I.minus(mI)).mul(I.plus(mI).plus(1)).div(4);
  let e = lv.A.mul(d).plus(lv.muB_h.mul(tesla).mul(lv.gJ.mul(mJ).plus(lv.gI.mul(mI))));
  if (lv.I2 >= 2 && lv.J2 >= 2) {
    const q = d.mul(d).plus(up).plus(dn).mul(3).plus(d.mul(dec("1.5"))).minus(ii.mul(jj));
    e = e.plus(lv.B.mul(q).div(I.mul(2).mul(I.mul(2).minus(1)).mul(J).mul(J.mul(2).minus(1))));
  }
  return e;
}

/** Full float64 matrix from spin matrices (independent of the solver's M blocks). */
function floatHamiltonian(lv: HyperfineZeemanLevel, tesla: number): Matrix {
  const J = lv.J2 / 2, I = lv.I2 / 2;
  const mj = [...Array(lv.J2 + 1).keys()].map((k) => -J + k);
  const mi = [...Array(lv.I2 + 1).keys()].map((k) => -I + k);
  const basis = mj.flatMap((a) => mi.map((b) => [a, b] as const));
  const n = basis.length;
  const A = lv.A.toNumber(), B = lv.B.toNumber(), mu = lv.muB_h.toNumber(), gJ = lv.gJ.toNumber(), gI = lv.gI.toNumber();
  const ij = Matrix.zeros(n, n);
  basis.forEach(([a, b], c) => {
    basis.forEach(([a2, b2], r) => {
      if (a2 === a && b2 === b) ij.set(r, c, a * b);
      if (a2 === a + 1 && b2 === b - 1) ij.set(r, c, 0.5 * Math.sqrt((J - a) * (J + a + 1) * (I + b) * (I - b + 1)));
      if (a2 === a - 1 && b2 === b + 1) ij.set(r, c, 0.5 * Math.sqrt((J + a) * (J - a + 1) * (I - b) * (I + b + 1)));
    });
  });
  let h = ij.clone().mul(A);
  if (lv.I2 >= 2 && lv.J2 >= 2) {
    const q = ij.mmul(ij).mul(3).add(ij.clone().mul(1.5)).sub(Matrix.eye(n).mul(I * (I + 1) * J * (J + 1)));
    h = h.add(q.mul(B / (2 * I * (2 * I - 1) * J * (2 * J - 1))));
  }
  basis.forEach(([a, b], c) => h.set(c, c, h.get(c, c) + mu * tesla * (gJ * a + gI * b)));
  return h;
}

describe("blockMatrix", () => {
  it("gives the 87Rb M = 2 block as [[3A/4 + (μB/h)B(gJ/2 + 3gI/2)]] (doc example)", () => {
    const block = prepareHyperfineZeeman(RB87_5S).blocks.find((b) => b.M2 === 4)!;
    const scale = muB_h.mul(dec("0.1"));
    const m = blockMatrix(block, scale);
    // 3A/4 (Steck A) + 1399.166608616448099459 MHz at 0.1 T, closed form as in the stretched-state test
    expect(m[0]![0]!.minus(dec("2563005979.08910875")).minus(dec("1399166608.616448099459")).abs().lt(dec("1e-40"))).toBe(true);
  });
});
