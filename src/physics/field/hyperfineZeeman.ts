/**
 * Hyperfine structure of one fine-structure level in a static magnetic
 * field, at any field strength: the general (Breit–Rabi-like) problem for
 * any J and I, with the magnetic-dipole and electric-quadrupole couplings.
 *
 * Hamiltonian (frequency units, Hz; field B along z in tesla):
 *   H/h = A·I·J + B·[3(I·J)² + (3/2)(I·J) − I(I+1)J(J+1)] / [2I(2I−1)J(2J−1)]
 *         + (μB/h)·B·(gJ·Jz + gI·Iz),
 * with I·J = Iz·Jz + (I+J− + I−J+)/2 and the quadrupole term absent when
 * I < 1 or J < 1. Atomic sign convention for gI (87Rb: gI = −0.0009951414).
 * Reference: D. A. Steck, "Rubidium 87 D Line Data", eqs. (15)–(16) and (29);
 * A. Corney, "Atomic and Laser Spectroscopy" (Oxford, 1977), ch. 16.
 *
 * Method: in the uncoupled basis |mJ mI⟩ the Hamiltonian conserves
 * M = mJ + mI, so it splits into blocks of at most 2·min(I, J) + 1 states.
 * Matrix elements are exact rationals or square roots of exact rationals
 * (one Dec square root each, computed once per (I, J)); each block is
 * diagonalized in Dec by symmetricEigen.ts (2×2 blocks by an exact Jacobi
 * rotation; wider blocks from a float64 start finished in Dec). Everything
 * this module returns is exact-decimal in that sense; float64 only chooses
 * the starting basis. Exact: no; eigenvalues agree with a 50-digit mpmath
 * diagonalization of the full matrix to better than 1e-25 of the largest |E|
 * (test/physics/field/hyperfineZeeman.test.ts; the method's own error is
 * about 1e-45 of the block's norm). At B = 0 the eigenvalues are the F
 * levels of hyperfine.ts, degenerate in mF (exactly to Dec precision for
 * 2×2 blocks, to ~1e-45 relative for wider ones).
 *
 * Labelling rule (no crossings inside one M block, since all its states
 * share the same symmetry):
 *  - F: within each M block the k-th lowest eigenvalue belongs to the k-th
 *    lowest zero-field F level among those with F ≥ |M| (ordered by
 *    zero-field energy, not by F, so inverted structure A < 0 is labelled
 *    correctly; exact zero-field ties are ordered by F). mF = M.
 *  - high-field state: within each M block the uncoupled states |mJ mI⟩ are
 *    ordered by their high-field energy (μB/h)·B·(gJ·mJ + gI·mI) + A·mJ·mI
 *    + quadrupole diagonal as B → ∞ (first by the coefficient of B, ties by
 *    the constant term, then by mJ), and the k-th lowest eigenvalue is
 *    matched to the k-th of them.
 * A level without nuclear spin (I2 = 0) needs no special case: every block
 * is one state, F = J, mF = mJ and E = (μB/h)·gJ·mJ·B. Nor does a level
 * with nuclear spin and A = B = 0 (no hyperfine constants listed): for
 * J = 0 it has the single F = I, E = (μB/h)·gI·mI·B; for J > 0 its F levels
 * coincide at B = 0, every field eigenstate is an uncoupled |mJ mI⟩, and the
 * F labels follow the tie rule above (ascending F within each M block).
 *
 * Worked example: 87Rb 5²S1/2 (I = 3/2, gJ = 2.00233113, gI = −0.0009951414,
 * A = 3417.341305452145 MHz, μB/h = 13996244917.1 Hz/T) at B = 0 gives
 * F = 1 at −4271.67663181518125 MHz (three states) and F = 2 at
 * +2563.00597908910875 MHz (five states); the stretched state |F=2, mF=2⟩ at
 * 0.1 T lies at 3A/4 + (μB/h)(gJ/2 + 3gI/2)·B = 2563.00597908910875 MHz +
 * 1399.166608616448099459 MHz, exactly linear in B.
 */
import { Dec, ONE, ZERO } from "../decimal.js";
import { Rational } from "../rational.js";
import { fValues, hyperfineShift } from "../hyperfine.js";
import { symmetricEigen } from "./symmetricEigen.js";

/** One fine-structure level with its hyperfine constants, as the solver needs it. */
export interface HyperfineZeemanLevel {
  /** Doubled J. */
  J2: number;
  /** Doubled nuclear spin I (0 for no nuclear spin). */
  I2: number;
  gJ: Dec;
  /** Nuclear g-factor in Bohr magnetons, atomic sign convention. */
  gI: Dec;
  /** Magnetic-dipole constant A/h, Hz. */
  A: Dec;
  /** Electric-quadrupole constant B/h, Hz (ignored when I < 1 or J < 1). */
  B: Dec;
  /** Bohr magneton μB/h in Hz/T, from the constants edition. */
  muB_h: Dec;
}

export interface UncoupledState {
  mJ2: number;
  mI2: number;
}

/** One hyperfine–Zeeman sublevel at a given field. */
export interface FieldState {
  /** Doubled F of the zero-field level the state connects to. */
  F2: number;
  /** Doubled mF = mJ + mI (conserved). */
  mF2: number;
  /** Energy E/h in Hz relative to the hyperfine-free level centre. */
  energy: Dec;
  /** Uncoupled basis of the state's M block, ascending mJ. */
  basis: UncoupledState[];
  /** Normalized eigenvector on `basis`; sign fixed so the largest component is positive. */
  vector: Dec[];
  /** The uncoupled state it tends to at high field. */
  highField: UncoupledState;
  /** dE/dB in Hz/T at this field (Hellmann–Feynman: ⟨ψ|(μB/h)(gJ·Jz + gI·Iz)|ψ⟩). */
  slope: Dec;
}

interface BlockStructure {
  M2: number;
  basis: UncoupledState[];
  /** I·J in the block. */
  dipole: Dec[][];
  /** Quadrupole operator without its constant B (already divided by 2I(2I−1)J(2J−1)); null if absent. */
  quadrupole: Dec[][] | null;
  mJ: Dec[];
  mI: Dec[];
}

const structureCache = new Map<string, BlockStructure[]>();

function ratDec(r: Rational): Dec {
  return r.isZero() ? ZERO : new Dec(r.num.toString()).div(new Dec(r.den.toString()));
}

/** √r·q in Dec for exact rationals r ≥ 0 and q. */
function rootTimes(r: Rational, q: Rational): Dec {
  if (r.isZero() || q.isZero()) return ZERO;
  return ratDec(r).sqrt().mul(ratDec(q));
}

function blockStructures(I2: number, J2: number): BlockStructure[] {
  const key = `${I2},${J2}`;
  const cached = structureCache.get(key);
  if (cached) return cached;
  const withQuadrupole = I2 >= 2 && J2 >= 2;
  // I(I+1)J(J+1) and the denominator 2I(2I−1)J(2J−1) = I2(I2−1)J2(J2−1)/2
  const iijj = Rational.of(BigInt(I2) * BigInt(I2 + 2) * BigInt(J2) * BigInt(J2 + 2), 16n);
  const qDen = withQuadrupole ? Rational.of(BigInt(I2) * BigInt(I2 - 1) * BigInt(J2) * BigInt(J2 - 1), 2n) : Rational.ONE;
  const blocks: BlockStructure[] = [];
  for (let M2 = -(I2 + J2); M2 <= I2 + J2; M2 += 2) {
    const basis: UncoupledState[] = [];
    for (let mJ2 = -J2; mJ2 <= J2; mJ2 += 2) {
      const mI2 = M2 - mJ2;
      if (Math.abs(mI2) <= I2) basis.push({ mJ2, mI2 });
    }
    const n = basis.length;
    // d_k = mJ·mI; s2_k = |⟨k+1|(I−J+)/2|k⟩|², the square of the (k, k+1) element of I·J
    const d = basis.map(({ mJ2, mI2 }) => Rational.of(mJ2 * mI2, 4));
    const s2: Rational[] = [];
    for (let k = 0; k + 1 < n; k++) {
      const { mJ2, mI2 } = basis[k]!;
      const prod = BigInt(J2 - mJ2) * BigInt(J2 + mJ2 + 2) * BigInt(I2 + mI2) * BigInt(I2 - mI2 + 2);
      s2.push(Rational.of(prod, 64n));
    }
    const zeros = () => basis.map(() => basis.map(() => ZERO));
    const dipole = zeros();
    for (let k = 0; k < n; k++) dipole[k]![k] = ratDec(d[k]!);
    for (let k = 0; k + 1 < n; k++) {
      const e = ratDec(s2[k]!).sqrt();
      dipole[k]![k + 1] = e;
      dipole[k + 1]![k] = e;
    }
    let quadrupole: Dec[][] | null = null;
    if (withQuadrupole) {
      quadrupole = zeros();
      const three = Rational.of(3);
      for (let k = 0; k < n; k++) {
        // (I·J)²_kk = d_k² + s2_{k−1} + s2_k
        let sq = d[k]!.mul(d[k]!);
        if (k > 0) sq = sq.add(s2[k - 1]!);
        if (k + 1 < n) sq = sq.add(s2[k]!);
        const diag = three.mul(sq).add(Rational.of(3, 2).mul(d[k]!)).sub(iijj).div(qDen);
        quadrupole[k]![k] = ratDec(diag);
      }
      for (let k = 0; k + 1 < n; k++) {
        // (I·J)²_{k,k+1} = s_k(d_k + d_{k+1}); plus (3/2)·s_k from the linear term
        const coef = three.mul(d[k]!.add(d[k + 1]!)).add(Rational.of(3, 2)).div(qDen);
        const e = rootTimes(s2[k]!, coef);
        quadrupole[k]![k + 1] = e;
        quadrupole[k + 1]![k] = e;
      }
      for (let k = 0; k + 2 < n; k++) {
        // (I·J)²_{k,k+2} = s_k·s_{k+1} = √(s2_k·s2_{k+1})
        const e = rootTimes(s2[k]!.mul(s2[k + 1]!), three.div(qDen));
        quadrupole[k]![k + 2] = e;
        quadrupole[k + 2]![k] = e;
      }
    }
    blocks.push({
      M2,
      basis,
      dipole,
      quadrupole,
      mJ: basis.map(({ mJ2 }) => ratDec(Rational.of(mJ2, 2))),
      mI: basis.map(({ mI2 }) => ratDec(Rational.of(mI2, 2))),
    });
  }
  structureCache.set(key, blocks);
  return blocks;
}

/**
 * The operators of one M block of a level (I, J) in the uncoupled basis
 * |mJ mI⟩, ascending mJ: I·J, the quadrupole operator without its constant
 * B (null when I < 1 or J < 1), and the diagonals mJ and mI. They are the
 * derivatives of the block matrix with respect to A, B, and (per unit
 * (μB/h)·B) gJ and gI, which is what the Hellmann–Feynman sensitivities of
 * field/sensitivity.ts need. Exact like blockMatrix (Dec square roots of
 * rationals). Worked example: 87Rb 5²S1/2, M = 2: I·J = [[3/4]], mJ = [1/2],
 * mI = [3/2], quadrupole null.
 */
export function blockOperators(I2: number, J2: number, M2: number): { basis: UncoupledState[]; dipole: Dec[][]; quadrupole: Dec[][] | null; mJ: Dec[]; mI: Dec[] } {
  const b = blockStructures(I2, J2).find((x) => x.M2 === M2);
  if (!b) throw new RangeError(`no block M = ${M2}/2 for I = ${I2}/2, J = ${J2}/2`);
  return b;
}

/**
 * Field-independent data of one M block, in Dec and in float64 (the float
 * copy feeds the float twin, hyperfineZeemanFloat.ts, and seeds the Dec
 * eigen-solver). Shared by the field modules; not a result.
 */
export interface PreparedBlock {
  M2: number;
  basis: UncoupledState[];
  /** Field-free part A·I·J + B·Q. */
  hyperfine: Dec[][];
  /** gJ·mJ + gI·mI per basis state. */
  zeeman: Dec[];
  /** Doubled F values of the block in ascending zero-field energy. */
  fByRank: number[];
  /** Basis indices in ascending high-field energy. */
  highByRank: number[];
  /** Position of the block's k-th lowest state in the solver's (F, mF) output order. */
  outIndex: number[];
  /** Non-zero columns of each row of `hyperfine` (the matrix is banded). */
  nonZero: number[][];
  floatHyperfine: number[][];
  floatZeeman: number[];
}

/** The prepared problem of one level: its blocks and μB/h in both number types. */
export interface PreparedLevel {
  blocks: PreparedBlock[];
  /** Number of sublevels, (2I+1)(2J+1). */
  size: number;
  muB_h: Dec;
  floatMuB_h: number;
}

/**
 * Build the field-independent parts of the problem of one level (matrix
 * structure, labels, output order). Used by hyperfineZeemanSolver and by the
 * float twin; exact like the solver's inputs (Dec products of the constants).
 *
 * Worked example: 87Rb 5²S1/2 (J = 1/2, I = 3/2) has blocks M = −2 … 2 of
 * 1, 2, 2, 2, 1 states; the M = 2 state |mJ = 1/2, mI = 3/2⟩ is the last of
 * the (F, mF) order (outIndex 7).
 */
export function prepareHyperfineZeeman(level: HyperfineZeemanLevel): PreparedLevel {
  const { I2, J2, gJ, gI, A, muB_h } = level;
  if (!Number.isInteger(I2) || !Number.isInteger(J2) || I2 < 0 || J2 < 0) throw new RangeError("I2 and J2 must be doubled non-negative integers");
  const B = I2 >= 2 && J2 >= 2 ? level.B : ZERO;
  const zeroField = new Map<number, Dec>();
  for (const F2 of fValues(I2, J2)) zeroField.set(F2, hyperfineShift(A, B, I2, J2, F2));
  const fOrder = [...zeroField.keys()].sort((f, g) => zeroField.get(f)!.cmp(zeroField.get(g)!) || f - g);
  const blocks: PreparedBlock[] = blockStructures(I2, J2).map((structure) => {
    const n = structure.basis.length;
    const hyperfine = structure.dipole.map((row, i) =>
      row.map((x, j) => {
        let h = x.isZero() ? ZERO : A.mul(x);
        const q = structure.quadrupole?.[i]?.[j];
        if (q && !q.isZero()) h = h.plus(B.mul(q));
        return h;
      }),
    );
    const zeeman = structure.mJ.map((mJ, k) => gJ.mul(mJ).plus(gI.mul(structure.mI[k]!)));
    const highByRank = [...Array(n).keys()].sort(
      (i, j) => zeeman[i]!.cmp(zeeman[j]!) || hyperfine[i]![i]!.cmp(hyperfine[j]![j]!) || structure.basis[i]!.mJ2 - structure.basis[j]!.mJ2,
    );
    const fByRank = fOrder.filter((F2) => F2 >= Math.abs(structure.M2));
    if (fByRank.length !== n) throw new Error("internal: block size does not match the number of F levels");
    return {
      M2: structure.M2,
      basis: structure.basis,
      hyperfine,
      zeeman,
      fByRank,
      highByRank,
      outIndex: [],
      nonZero: hyperfine.map((row) => [...row.keys()].filter((k) => !row[k]!.isZero())),
      floatHyperfine: hyperfine.map((row) => row.map((x) => x.toNumber())),
      floatZeeman: zeeman.map((x) => x.toNumber()),
    };
  });
  // output order: F, then mF (doubled values ascending)
  const slots = blocks.flatMap((b, bi) => b.fByRank.map((F2, k) => ({ bi, k, F2, M2: b.M2 })));
  slots.sort((x, y) => x.F2 - y.F2 || x.M2 - y.M2);
  slots.forEach(({ bi, k }, pos) => (blocks[bi]!.outIndex[k] = pos));
  return { blocks, size: slots.length, muB_h, floatMuB_h: muB_h.toNumber() };
}

/**
 * The block's Hamiltonian A·I·J + B·Q + (μB/h)·B·(gJ·Jz + gI·Iz) at Zeeman
 * scale `scale` = (μB/h)·B, in Dec (exact products). Worked example: the 1×1
 * block M = 2 of 87Rb 5²S1/2 is [[3A/4 + scale·(gJ/2 + 3gI/2)]].
 */
export function blockMatrix(block: PreparedBlock, scale: Dec): Dec[][] {
  return block.hyperfine.map((row, i) => {
    const r = row.slice();
    r[i] = row[i]!.plus(scale.mul(block.zeeman[i]!));
    return r;
  });
}

/** blockMatrix in float64 for `floatScale` = (μB/h)·B as a float; only for seeding and scanning (float-derived). */
export function blockMatrixFloat(block: PreparedBlock, floatScale: number): number[][] {
  return block.floatHyperfine.map((row, i) => {
    const r = row.slice();
    r[i] = row[i]! + floatScale * block.floatZeeman[i]!;
    return r;
  });
}

/** A prepared solver for one level: call it with fields in tesla (B ≥ 0). */
export type HyperfineZeemanSolver = (tesla: Dec) => FieldState[];

/**
 * Prepare the field-independent parts of the problem once (matrix structure,
 * labels) and return a function of the field. Same results as
 * solveHyperfineZeeman; use it when one level is solved at many fields.
 */
export function hyperfineZeemanSolver(level: HyperfineZeemanLevel): HyperfineZeemanSolver {
  return solverForPrepared(prepareHyperfineZeeman(level));
}

/**
 * hyperfineZeemanSolver for a level already prepared (shares the preparation
 * with the float twin); identical results. Worked example: as hyperfineZeemanSolver.
 */
export function solverForPrepared(prepared: PreparedLevel): HyperfineZeemanSolver {
  const { muB_h } = prepared;
  return (tesla: Dec): FieldState[] => {
    if (tesla.isNegative()) throw new RangeError("field must be ≥ 0 T (the direction defines the quantization axis)");
    const scale = muB_h.mul(tesla);
    const floatScale = prepared.floatMuB_h * tesla.toNumber();
    const out: FieldState[] = new Array(prepared.size);
    for (const block of prepared.blocks) {
      const { basis, zeeman } = block;
      const n = basis.length;
      const eig = symmetricEigen(blockMatrix(block, scale), n > 2 ? blockMatrixFloat(block, floatScale) : undefined);
      for (let k = 0; k < n; k++) {
        const vector = fixSign(eig.vectors[k]!);
        let slope = ZERO;
        for (let i = 0; i < n; i++) if (!vector[i]!.isZero()) slope = slope.plus(vector[i]!.mul(vector[i]!).mul(zeeman[i]!));
        out[block.outIndex[k]!] = {
          F2: block.fByRank[k]!,
          mF2: block.M2,
          energy: eig.values[k]!,
          basis,
          vector,
          highField: basis[block.highByRank[k]!]!,
          slope: slope.mul(muB_h),
        };
      }
    }
    return out;
  };
}

const SIGN_TIE = new Dec("1e-30");

/** Make the largest component positive; among components equal in size to 30 digits the first one decides. */
function fixSign(v: Dec[]): Dec[] {
  let max = ZERO;
  for (const x of v) if (x.abs().gt(max)) max = x.abs();
  const cut = max.mul(ONE.minus(SIGN_TIE));
  const lead = v.find((x) => x.abs().gte(cut));
  return lead && lead.isNegative() ? v.map((x) => x.neg()) : v;
}

/**
 * All (2I+1)(2J+1) sublevels of the level at field `tesla` (≥ 0), with
 * energies, eigenvectors and labels (see the module comment), sorted by F
 * then mF (doubled values ascending).
 *
 * Worked example: see the module comment (87Rb 5²S1/2).
 */
export function solveHyperfineZeeman(level: HyperfineZeemanLevel, tesla: Dec): FieldState[] {
  return hyperfineZeemanSolver(level)(tesla);
}

/** (μB/h)·B·(gJ·mJ + gI·mI) + A·mJ·mI + B_Q·⟨mJ mI|Q|mJ mI⟩: the energy of an uncoupled state to zeroth order in 1/B. */
export function highFieldEnergy(level: HyperfineZeemanLevel, state: UncoupledState, tesla: Dec): Dec {
  const blocks = blockStructures(level.I2, level.J2);
  const block = blocks.find((b) => b.M2 === state.mJ2 + state.mI2);
  const k = block?.basis.findIndex((s) => s.mJ2 === state.mJ2) ?? -1;
  if (!block || k < 0) throw new RangeError("no such uncoupled state");
  const mJ = block.mJ[k]!;
  const mI = block.mI[k]!;
  let e = level.muB_h.mul(tesla).mul(level.gJ.mul(mJ).plus(level.gI.mul(mI))).plus(level.A.mul(block.dipole[k]![k]!));
  const q = block.quadrupole?.[k]?.[k];
  if (q) e = e.plus(level.B.mul(q));
  return e;
}

