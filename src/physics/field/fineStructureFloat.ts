/**
 * Float64 twin of the fine-structure solver (fineStructure.ts), for searches
 * that need many solves but return only a threshold: the 1 % field of
 * linearPatternLimit. Nothing it returns is a tabulated energy; the energies
 * at configured fields stay with the Dec solver.
 *
 * Same Hamiltonian, basis and labels as solveFineStructure: block mJ of
 * H = Σ_J E_J P_J + (μB/h)B(gL mL + gS mS) in |mL mS⟩ (mS ascending),
 * ⟨mL mS|P_J|mL' mS'⟩ = CG·CG, the n-th lowest eigenvalue of a block labelled
 * with the n-th lowest E_J (ties by J) among J ≥ |mJ|. The partner energies
 * are taken relative to the lowest partner (subtracted in Dec, then rounded
 * to float64), so the matrix entries are of the size of the fine-structure
 * intervals and the Zeeman energy, not of the absolute term energy.
 * Everything that does not depend on the field (basis, Clebsch–Gordan
 * products, the zero-field matrix, the Zeeman diagonal) is prepared once.
 * Blocks are diagonalized by symmetricEigenFloat.ts (Jacobi).
 * Exact: no; shifts to a few units of 1e-16 of the largest |H| entry.
 * Reference: Condon and Shortley (1935) §16.3.
 *
 * Worked example: Na 3p (2P1/2, 2P3/2) at 1 T gives the six shifts of
 * solveFineStructure to float64 rounding, e.g. (J, mJ) = (1/2, −1/2) shifted
 * by about −(μB/h)·B·(1/3)·(1 + small mixing) (the test compares all six).
 */
import { ZERO } from "../decimal.js";
import { Rational } from "../rational.js";
import { mValues } from "../quantum.js";
import { threeJ } from "../wigner.js";
import { symmetricEigenFloat } from "./symmetricEigenFloat.js";
import type { FineStructureTerm } from "./fineStructure.js";

/** One eigenstate of the term at one field, float64. */
export interface FineStructureFloatState {
  /** Doubled J of the zero-field level the state connects to. */
  J2: number;
  /** Doubled mJ. */
  mJ2: number;
  /** Energy − E_J (the sublevel shift), Hz, float64. */
  shift: number;
  /** Number of |mL mS⟩ states in the block (1: a stretched state, exactly linear). */
  blockSize: number;
}

interface PreparedBlock {
  M2: number;
  /** Zero-field matrix Σ_J (E_J − E_min) P_J, row-major rows. */
  zero: number[][];
  /** (gL mL + gS mS) per basis state. */
  zeeman: number[];
  /** J labels by rank and their energies relative to E_min. */
  js: number[];
  ej: number[];
  /** Clebsch–Gordan ⟨L mL S mS|J mJ⟩ per rank (rows) and basis state (columns). */
  cg: number[][];
}

/** Clebsch–Gordan ⟨L mL S mS | J M⟩ = (−1)^(L−S+M) √(2J+1) (L S J; mL mS −M), float64. */
function clebschFloat(L: number, S2: number, J2: number, mL2: number, mS2: number, M2: number): number {
  const w = threeJ(2 * L, S2, J2, mL2, mS2, -M2);
  if (w.sign === 0) return 0;
  const phase = (2 * L - S2 + M2) / 2;
  const sign = (Math.abs(phase) % 2 === 0 ? 1 : -1) * w.sign;
  return sign * Math.sqrt(w.squared.mul(Rational.of(J2 + 1)).toDecimal().toNumber());
}

/** Field-independent float64 parts of a term: its blocks, and each partner's energy above the lowest. */
function prepareTerm(term: FineStructureTerm): { blocks: PreparedBlock[]; rel: Map<number, number>; muB: number } {
  const partners = [...term.partners].sort((a, b) => a.energy.cmp(b.energy) || a.J2 - b.J2);
  const eMin = partners[0]?.energy ?? ZERO;
  const rel = new Map(partners.map((p) => [p.J2, p.energy.sub(eMin).toNumber()]));
  const jMax = Math.max(...partners.map((p) => p.J2));
  const gL = term.gL.toNumber();
  const gS = term.gS.toNumber();
  const blocks: PreparedBlock[] = mValues(jMax).map((M2) => {
    const basis = mValues(term.S2)
      .map((mS2) => ({ mL2: M2 - mS2, mS2 }))
      .filter((s) => Math.abs(s.mL2) <= 2 * term.L);
    const ranked = partners.filter((p) => p.J2 >= Math.abs(M2));
    const cg = ranked.map((p) => basis.map((b) => clebschFloat(term.L, term.S2, p.J2, b.mL2, b.mS2, M2)));
    const zero = basis.map((_, r) =>
      basis.map((__, c) => ranked.reduce((s, p, n) => s + rel.get(p.J2)! * cg[n]![r]! * cg[n]![c]!, 0)),
    );
    return {
      M2,
      zero,
      zeeman: basis.map((b) => (gL * b.mL2 + gS * b.mS2) / 2),
      js: ranked.map((p) => p.J2),
      ej: ranked.map((p) => rel.get(p.J2)!),
      cg,
    };
  });
  return { blocks, rel, muB: term.muB_h.toNumber() };
}

/** The block's matrix at Zeeman scale z = (μB/h)·B, float64. */
function blockAt(b: PreparedBlock, z: number): number[][] {
  return b.zero.map((row, r) => row.map((x, c) => (r === c ? x + z * b.zeeman[r]! : x)));
}

/**
 * Prepare the term once; the returned function gives every state at `tesla`
 * (a float64 field, negative allowed), in block order (mJ ascending, then
 * rank). The term must be valid (every J once); solveFineStructure and
 * linearPatternLimit check that before calling.
 */
export function fineStructureFloatSolver(term: FineStructureTerm): (tesla: number) => FineStructureFloatState[] {
  const { blocks, muB } = prepareTerm(term);
  return (tesla: number) => {
    const z = muB * tesla;
    const out: FineStructureFloatState[] = [];
    for (const b of blocks) {
      const n = b.js.length;
      if (n === 1) {
        out.push({ J2: b.js[0]!, mJ2: b.M2, shift: b.zero[0]![0]! - b.ej[0]! + z * b.zeeman[0]!, blockSize: 1 });
        continue;
      }
      const { values } = symmetricEigenFloat(blockAt(b, z));
      values.forEach((e, k) => out.push({ J2: b.js[k]!, mJ2: b.M2, shift: e - b.ej[k]!, blockSize: n }));
    }
    return out;
  };
}

/** One eigenstate of the term at one field, float64, with its amplitudes on |J mJ⟩. */
export interface FineStructureFloatEigenstate {
  /** Doubled J of the zero-field level the state connects to. */
  J2: number;
  /** Doubled mJ. */
  mJ2: number;
  /** Energy in Hz above the lowest partner of the term. */
  energy: number;
  /** Amplitudes on |J mJ⟩ of the same mJ, ascending J; the own-J amplitude is made positive. */
  coupled: { J2: number; amplitude: number }[];
}

/** A prepared term: partner energies above the lowest partner (Hz, per doubled J), and the solver. */
export interface FineStructureFloatEigen {
  offsets: ReadonlyMap<number, number>;
  solve(tesla: number): FineStructureFloatEigenstate[];
}

/**
 * Eigenstates of the term with their |J mJ⟩ amplitudes, float64: the twin of
 * fineStructureSolver (fineStructure.ts) for the field calculator
 * (src/engine/), which takes line components from them at any field.
 *
 * Formula: block mJ of H = Σ_J (E_J − E_min) P_J + (μB/h)B(gL mL + gS mS) in
 * |mL mS⟩, diagonalized by Jacobi rotations (symmetricEigenFloat.ts); the
 * amplitude on |J mJ⟩ is Σ CG(J; mL mS)·v(mL mS). Labels as the Dec solver:
 * the n-th lowest state of a block connects to the n-th lowest E_J (ties by
 * J) with J ≥ |mJ|. Energies are measured from the lowest partner; add
 * E_min − E_J(level), i.e. subtract `offsets.get(J2)`, for the energy from a
 * level's own zero-field position. Result sorted by J, then mJ, like
 * solveFineStructure. Exact: no; energies to a few units of 1e-16 of the
 * largest |H| entry (the fine-structure interval or the Zeeman energy),
 * amplitudes to about 1e-16·‖H‖/gap. Selection rules: none (every state of
 * the term). Reference: Condon and Shortley (1935) §16.3.
 *
 * Worked example: Na 3p (2P1/2, 2P3/2) at 0 T gives two states of J = 1/2 at
 * energy 0 and four of J = 3/2 at ΔE = 17.1959 cm⁻¹ ≈ 515.52 GHz above, each
 * pure (own amplitude 1); at 1 T the energies equal solveFineStructure's
 * minus E(2P1/2) to float64 rounding (the test compares all six).
 */
export function fineStructureFloatEigen(term: FineStructureTerm): FineStructureFloatEigen {
  const { blocks, rel, muB } = prepareTerm(term);
  return {
    offsets: rel,
    solve(tesla: number): FineStructureFloatEigenstate[] {
      const z = muB * tesla;
      const out: FineStructureFloatEigenstate[] = [];
      for (const b of blocks) {
        const { values, vectors } = symmetricEigenFloat(blockAt(b, z));
        values.forEach((e, n) => {
          const v = vectors[n]!;
          let coupled = b.js.map((J2, jn) => {
            let a = 0;
            for (let i = 0; i < v.length; i++) a += b.cg[jn]![i]! * v[i]!;
            return { J2, amplitude: a };
          });
          if (coupled[n]!.amplitude < 0) coupled = coupled.map((c) => ({ J2: c.J2, amplitude: -c.amplitude }));
          coupled.sort((x, y) => x.J2 - y.J2);
          out.push({ J2: b.js[n]!, mJ2: b.M2, energy: e, coupled });
        });
      }
      return out.sort((x, y) => x.J2 - y.J2 || x.mJ2 - y.mJ2);
    },
  };
}
