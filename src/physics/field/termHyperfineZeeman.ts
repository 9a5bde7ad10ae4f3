/**
 * Hyperfine structure and Zeeman effect of the listed fine-structure levels
 * of one LS term together, at any field: one solver from weak field through
 * the hyperfine and the fine-structure Paschen–Back regimes, without a
 * regime threshold.
 *
 * Basis: |J mJ mI⟩ over every listed J of the term (doubled quantum numbers),
 * block-diagonal in M = mJ + mI. Hamiltonian (E/h in Hz, field B along z):
 *   H = Σ_J [E_J + A_J·I·J + B_J·Q_J] ⊕ (within each J)
 *       + (μB/h)·B·[gJ·Jz + gI·Iz] (within each J)
 *       + (μB/h)·B·(gS − gL)·Sz (between J and J′ = J ± 1),
 * with E_J the listed level energy, A_J, B_J its hyperfine constants (the
 * quadrupole operator Q_J as in hyperfineZeeman.ts), and
 *   ⟨J′ mJ|Sz|J mJ⟩ = Σ_{mL, mS} ⟨L mL S mS|J′ mJ⟩⟨L mL S mS|J mJ⟩·mS
 * (Clebsch–Gordan coefficients in the order L, S: Condon–Shortley phases,
 * the convention of fineStructure.ts and of the LS reduced elements of
 * lineAtField.ts). In LS coupling gL·Lz + gS·Sz = gL·Jz + (gS − gL)·Sz, so
 * within J this is gJ(LS)·Jz; the solver takes the caller's gJ there (a
 * measured value replaces the LS one within its own J), while the coupling
 * between J levels stays the LS one, (gS − gL)·Sz.
 *
 * Left out, said plainly: hyperfine matrix elements between different J
 * (the off-diagonal A and B terms that mix, e.g., 87Sr ³P₀ with ³P₁); the
 * hyperfine interaction acts within each J only. Levels of the term that
 * are not listed (or have no energy) are not in the basis.
 *
 * With a single listed J the basis and Hamiltonian are exactly those of
 * hyperfineZeeman.ts (same blocks, same matrix elements), so the results
 * agree with it to Dec precision; with I = 0 they are those of the
 * fine-structure solver (fineStructure.ts) written in |J mJ⟩ instead of
 * |mL mS⟩, with the caller's gJ within each J.
 *
 * Labels: within one M block no two states cross (one symmetry class), so
 * the k-th lowest eigenvalue is the k-th lowest zero-field level (J, F)
 * with F ≥ |M|, ordered by E_J + e_F(J) (hyperfine.ts), ties by J then F.
 * The high-field label (mJ, mI) is the one the single-J solver gives the
 * same (J, F, M) (hyperfine Paschen–Back of that J).
 *
 * Method: each block is diagonalized by symmetricEigen.ts (float64 start,
 * finished in Dec). Energies are returned from the listed energy of each
 * state's own level, so at B = 0 they are the hyperfine shifts e_F(J).
 * Exact: no; eigenvalues agree with a 50-digit mpmath diagonalization of
 * the whole term in the uncoupled basis |mL mS mI⟩
 * (test/fixtures/field/term-mpmath.json) to about 5e-26 Hz, the rounding of
 * the fixture's 40 printed digits (6Li 2P, 88Sr and 87Sr 5s5p ³P, up to 1 T).
 *
 * References: E. U. Condon and G. H. Shortley, "The Theory of Atomic
 * Spectra" (1935), §16.3; A. R. Edmonds, "Angular Momentum in Quantum
 * Mechanics" (1957), eqs. (3.7.3) and (7.1.8); A. Corney, "Atomic and Laser
 * Spectroscopy" (1977), ch. 16.
 *
 * Worked example: 6Li 2P (I = 1; 2P1/2 A = 17.386 MHz, 2P3/2 A = −1.155 MHz,
 * B = −0.10 MHz, interval 10.043 GHz) at 832 G: the 18 states of the term in
 * blocks M = −5/2 … 5/2 of 1, 3, 5, 5, 3, 1 states; the stretched state
 * |J = 3/2, mJ = 3/2, mI = 1⟩, alone in M = 5/2, lies at
 * 3A/2 + B/4 + (μB/h)·B·(3gJ/2 + gI) from E(2P3/2) (I·J = 3/2, Q = 1/4),
 * exactly linear in B; every other state is mixed across J.
 */
import { Dec, ZERO } from "../decimal.js";
import { Rational } from "../rational.js";
import { threeJ } from "../wigner.js";
import { hyperfineShift } from "../hyperfine.js";
import { prepareHyperfineZeeman, type PreparedBlock, type UncoupledState } from "./hyperfineZeeman.js";
import { symmetricEigen } from "./symmetricEigen.js";
import { symmetricEigenFloat } from "./symmetricEigenFloat.js";

/** One listed level of the term. */
export interface TermLevel {
  /** Doubled J. */
  J2: number;
  /** Listed level energy E/h, Hz (any common zero). */
  energy: Dec;
  /** g in use within this J (measured or LS); 0 for J = 0. */
  gJ: Dec;
  /** Hyperfine constants A/h and B/h, Hz (0 when not listed). */
  A: Dec;
  B: Dec;
}

export interface TermProblem {
  /** Doubled S. */
  S2: number;
  /** L (ordinary integer). */
  L: number;
  /** Doubled nuclear spin (0 without). */
  I2: number;
  gL: Dec;
  /** Spin g-factor, atomic sign convention (≈ +2.0023). */
  gS: Dec;
  /** Nuclear g-factor in Bohr magnetons, atomic sign convention. */
  gI: Dec;
  /** μB/h, Hz/T. */
  muB_h: Dec;
  /** The listed levels, each J at most once. */
  levels: TermLevel[];
}

export interface TermAmplitude {
  J2: number;
  mJ2: number;
  mI2: number;
  amplitude: Dec;
}

/** One eigenstate of the term at one field. */
export interface TermFieldState {
  /** Doubled J, F of the zero-field level it connects to; mF = M. */
  J2: number;
  F2: number;
  mF2: number;
  /** Energy, Hz, from the listed energy of its own level J. */
  energy: Dec;
  /** Amplitudes on the block basis |J mJ mI⟩ (J ascending, then mJ); sign: largest own-J component positive. */
  amplitudes: TermAmplitude[];
  /** Hyperfine Paschen–Back label of the same (J, F, M) in the single-J solver. */
  highField: UncoupledState;
  /** dE/dB, Hz/T (Hellmann–Feynman). */
  slope: Dec;
}

/** The states at one field: per listed level (input order), sorted by F then mF. */
export type TermSolution = TermFieldState[][];

/** One M block of the prepared term (shared with the float64 twin, termHyperfineZeemanFloat.ts). */
export interface TermBlock {
  M2: number;
  /** Basis |J mJ mI⟩, J ascending then mJ ascending; `level` indexes TermProblem.levels. */
  basis: { J2: number; mJ2: number; mI2: number; level: number }[];
  /** Field-free part: E_J − E_ref + hyperfine of J. */
  fixed: Dec[][];
  /** Zeeman part per unit (μB/h)·B: gJ·mJ + gI·mI on the diagonal, (gS − gL)·⟨J′|Sz|J⟩ off it. */
  zeeman: Dec[][];
  floatFixed: number[][];
  floatZeeman: number[][];
  /**
   * The field-free part shifted by each listed level's offset, E_J − E_ref,
   * rounded to float64 after the shift (for the levels with states in this
   * block): the float64 eigenvectors of the states of level J are taken
   * from the matrix shifted by its own offset, where its entries are small
   * and float64 keeps their differences (termBlockFloatEigen).
   */
  floatFixedFrom: { level: number; matrix: number[][] }[];
  /** Level index, F and high-field label of the block's k-th lowest zero-field level. */
  ranks: { level: number; F2: number; high: UncoupledState }[];
}

/** The field-independent parts of a term problem. */
export interface PreparedTerm {
  problem: TermProblem;
  /** Energy subtracted from the diagonal (the lowest listed E_J), Hz. */
  ref: Dec;
  blocks: TermBlock[];
}

const C = (n: number | bigint) => new Dec(n.toString());

function ratDec(r: Rational): Dec {
  return r.isZero() ? ZERO : C(r.num).div(C(r.den));
}

/** ⟨L mL S mS|J M⟩ (Condon–Shortley), doubled arguments except L. */
function clebsch(L: number, S2: number, J2: number, mL2: number, mS2: number, M2: number): Dec {
  const w = threeJ(2 * L, S2, J2, mL2, mS2, -M2);
  if (w.sign === 0) return ZERO;
  const phase = (2 * L - S2 + M2) / 2;
  const sign = (Math.abs(phase) % 2 === 0 ? 1 : -1) * w.sign;
  const mag = ratDec(w.squared.mul(Rational.of(J2 + 1))).sqrt();
  return sign < 0 ? mag.neg() : mag;
}

/**
 * ⟨(LS)J′ m|Sz|(LS)J m⟩ as a Dec, from Clebsch–Gordan sums (see the module
 * comment). Exact: no (Dec square roots). Worked example: |⟨³P₁ 0|Sz|³P₀ 0⟩|² = 2/3
 * (as spinZSquaredElement of partnerQuadratic.ts gives it).
 */
export function spinZElement(S2: number, L: number, Jp2: number, J2: number, m2: number): Dec {
  let sum = ZERO;
  for (let mS2 = -S2; mS2 <= S2; mS2 += 2) {
    const mL2 = m2 - mS2;
    if (Math.abs(mL2) > 2 * L) continue;
    const a = clebsch(L, S2, Jp2, mL2, mS2, m2);
    if (a.isZero()) continue;
    const b = clebsch(L, S2, J2, mL2, mS2, m2);
    if (b.isZero()) continue;
    sum = sum.plus(a.mul(b).mul(mS2).div(2));
  }
  return sum;
}

function validate(p: TermProblem): void {
  const seen = new Set<number>();
  for (const l of p.levels) {
    if (seen.has(l.J2)) throw new RangeError(`J=${l.J2}/2 listed twice`);
    if (l.J2 < Math.abs(2 * p.L - p.S2) || l.J2 > 2 * p.L + p.S2 || (l.J2 + p.S2) % 2 !== 0) throw new RangeError(`J=${l.J2}/2 is not a level of the term`);
    seen.add(l.J2);
  }
  if (p.levels.length === 0) throw new RangeError("no levels");
}

/**
 * The field-independent parts of the problem (blocks, couplings, labels),
 * in Dec and float64. Exact like the inputs (Dec products; one Dec square
 * root per Clebsch–Gordan coefficient). Worked example: 6Li 2P (I = 1) has
 * blocks M = −5/2 … 5/2 of 1, 3, 5, 5, 3, 1 states.
 */
export function prepareTerm(p: TermProblem): PreparedTerm {
  validate(p);
  const { I2, S2, L } = p;
  const ref = p.levels.reduce((m, l) => (l.energy.lt(m) ? l.energy : m), p.levels[0]!.energy);
  // the single-J preparation of each level gives its hyperfine blocks, Zeeman diagonal and labels
  const prepared = p.levels.map((l) => prepareHyperfineZeeman({ J2: l.J2, I2, gJ: l.gJ, gI: p.gI, A: l.A, B: l.B, muB_h: p.muB_h }));
  const byM = prepared.map((pl) => new Map<number, PreparedBlock>(pl.blocks.map((b) => [b.M2, b])));
  const order = p.levels.map((_, i) => i).sort((a, b) => p.levels[a]!.J2 - p.levels[b]!.J2);
  const zeroField = (i: number, F2: number) => p.levels[i]!.energy.plus(hyperfineShift(p.levels[i]!.A, p.levels[i]!.B, I2, p.levels[i]!.J2, F2));
  const dg = p.gS.minus(p.gL);
  const Mmax = Math.max(...p.levels.map((l) => l.J2)) + I2;
  const blocks: TermBlock[] = [];
  for (let M2 = -Mmax; M2 <= Mmax; M2 += 2) {
    const parts = order.map((i) => ({ i, block: byM[i]!.get(M2) })).filter((x) => x.block !== undefined) as { i: number; block: PreparedBlock }[];
    if (parts.length === 0) continue;
    const basis = parts.flatMap(({ i, block }) => block.basis.map((b) => ({ J2: p.levels[i]!.J2, mJ2: b.mJ2, mI2: b.mI2, level: i })));
    const n = basis.length;
    const fixed = basis.map(() => basis.map(() => ZERO));
    const zeeman = basis.map(() => basis.map(() => ZERO));
    let at = 0;
    for (const { i, block } of parts) {
      const shift = p.levels[i]!.energy.minus(ref);
      block.basis.forEach((_, r) => {
        block.basis.forEach((__, c) => {
          fixed[at + r]![at + c] = r === c ? block.hyperfine[r]![c]!.plus(shift) : block.hyperfine[r]![c]!;
        });
        zeeman[at + r]![at + r] = block.zeeman[r]!;
      });
      at += block.basis.length;
    }
    // (gS − gL)·Sz between J and J ± 1, diagonal in mJ and mI
    const szCache = new Map<string, Dec>();
    for (let r = 0; r < n; r++) {
      for (let c = r + 1; c < n; c++) {
        const a = basis[r]!;
        const b = basis[c]!;
        if (a.J2 === b.J2 || Math.abs(a.J2 - b.J2) !== 2 || a.mJ2 !== b.mJ2 || a.mI2 !== b.mI2) continue;
        const key = `${a.J2},${b.J2},${a.mJ2}`;
        let sz = szCache.get(key);
        if (sz === undefined) szCache.set(key, (sz = spinZElement(S2, L, a.J2, b.J2, a.mJ2)));
        const v = dg.mul(sz);
        zeeman[r]![c] = v;
        zeeman[c]![r] = v;
      }
    }
    const ranks = parts
      .flatMap(({ i, block }) => block.fByRank.map((F2, k) => ({ level: i, F2, high: block.basis[block.highByRank[k]!]!, e: zeroField(i, F2) })))
      .sort((x, y) => x.e.cmp(y.e) || p.levels[x.level]!.J2 - p.levels[y.level]!.J2 || x.F2 - y.F2)
      .map(({ level, F2, high }) => ({ level, F2, high }));
    if (ranks.length !== n) throw new Error("internal: block size does not match the number of (J, F) levels");
    const floatFixedFrom = parts.map(({ i }) => {
      const offset = p.levels[i]!.energy.minus(ref);
      return { level: i, matrix: fixed.map((row, r) => row.map((x, c) => (r === c ? x.minus(offset) : x).toNumber())) };
    });
    blocks.push({
      M2, basis, fixed, zeeman, ranks, floatFixedFrom,
      floatFixed: fixed.map((r) => r.map((x) => x.toNumber())),
      floatZeeman: zeeman.map((r) => r.map((x) => x.toNumber())),
    });
  }
  return { problem: p, ref, blocks };
}

/**
 * Prepare the term once (prepareTerm) and return the solver as a function of
 * the field in tesla (B ≥ 0). See the module comment for model, labels and
 * accuracy; worked example there.
 */
export function termHyperfineZeemanSolver(problem: TermProblem | PreparedTerm): (tesla: Dec) => TermSolution {
  const prepared = "blocks" in problem ? problem : prepareTerm(problem);
  const p = prepared.problem;
  return (tesla: Dec) => {
    if (tesla.isNegative()) throw new RangeError("field must be ≥ 0 T");
    const out: TermFieldState[][] = p.levels.map(() => []);
    for (const b of prepared.blocks) for (const st of solveTermBlock(prepared, b, tesla)) out[st.level]!.push(st.state);
    for (const states of out) states.sort((x, y) => x.F2 - y.F2 || x.mF2 - y.mF2);
    return out;
  };
}

/**
 * The states of one M block of a prepared term at field `tesla` (≥ 0), in
 * ascending energy (the block's rank order), each with the index of its
 * level in TermProblem.levels. The whole-term solver is this, block by
 * block; a caller that needs two sublevels only (a field-insensitive point
 * of a transition, termSublevelTransitions.ts) solves their blocks alone.
 * Same model, labels and accuracy as termHyperfineZeemanSolver; worked
 * example there (the 6Li 2P3/2 stretched state is the one state of block
 * M = 5/2).
 */
export function solveTermBlock(prepared: PreparedTerm, b: TermBlock, tesla: Dec): { level: number; state: TermFieldState }[] {
  const { problem: p, ref } = prepared;
  const scale = p.muB_h.mul(tesla);
  const n = b.basis.length;
  const h = b.fixed.map((row, r) => row.map((x, c) => (b.zeeman[r]![c]!.isZero() ? x : x.plus(scale.mul(b.zeeman[r]![c]!)))));
  const eig = symmetricEigen(h, undefined, n > 2 ? termBlockFloatEigen(b, scale.toNumber()).vectors : undefined);
  const out: { level: number; state: TermFieldState }[] = [];
  for (let k = 0; k < n; k++) {
    const { level, F2, high } = b.ranks[k]!;
    const J2 = p.levels[level]!.J2;
    let v = eig.vectors[k]!;
    // sign: the largest component on the state's own J positive
    let lead = ZERO;
    for (let i = 0; i < n; i++) if (b.basis[i]!.J2 === J2 && v[i]!.abs().gt(lead.abs())) lead = v[i]!;
    if (lead.isNegative()) v = v.map((x) => x.neg());
    let slope = ZERO;
    for (let r = 0; r < n; r++) {
      if (v[r]!.isZero()) continue;
      for (let c = 0; c < n; c++) {
        const z = b.zeeman[r]![c]!;
        if (!z.isZero() && !v[c]!.isZero()) slope = slope.plus(v[r]!.mul(z).mul(v[c]!));
      }
    }
    out.push({
      level,
      state: {
        J2,
        F2,
        mF2: b.M2,
        energy: eig.values[k]!.plus(ref).minus(p.levels[level]!.energy),
        amplitudes: b.basis.map((s, i) => ({ J2: s.J2, mJ2: s.mJ2, mI2: s.mI2, amplitude: v[i]! })),
        highField: high,
        slope: slope.mul(p.muB_h),
      },
    });
  }
  return out;
}

/**
 * Float64 eigenpairs of one block at Zeeman scale `floatScale` = (μB/h)·B,
 * in rank order: the vector and energy of each state come from the block
 * matrix shifted by its own level's offset (TermBlock.floatFixedFrom), so
 * its energy is measured from its own level's listed energy and keeps
 * float64 resolution of that, not of the fine-structure interval (1e-3 Hz
 * for a 17 THz interval in one float64 matrix, 1e-7 Hz this way); the
 * shift changes no eigenvector. Seeds the Dec solver and is the float64
 * twin's answer (termHyperfineZeemanFloat.ts). Exact: no; float64.
 * Worked example: the 1×1 block M = 5/2 of 6Li 2P gives its one state at
 * 3A/2 + B/4 + (μB/h)·B·(3gJ/2 + gI) from E(2P3/2).
 */
export function termBlockFloatEigen(b: TermBlock, floatScale: number): { values: number[]; vectors: number[][] } {
  const n = b.basis.length;
  const values: number[] = new Array(n);
  const vectors: number[][] = new Array(n);
  for (const { level, matrix } of b.floatFixedFrom) {
    const eig = symmetricEigenFloat(matrix.map((row, r) => row.map((x, c) => x + floatScale * b.floatZeeman[r]![c]!)));
    for (let k = 0; k < n; k++) {
      if (b.ranks[k]!.level !== level) continue;
      values[k] = eig.values[k]!;
      vectors[k] = eig.vectors[k]!;
    }
  }
  return { values, vectors };
}
