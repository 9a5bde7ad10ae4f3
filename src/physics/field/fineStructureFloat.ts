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
}

/** Clebsch–Gordan ⟨L mL S mS | J M⟩ = (−1)^(L−S+M) √(2J+1) (L S J; mL mS −M), float64. */
function clebschFloat(L: number, S2: number, J2: number, mL2: number, mS2: number, M2: number): number {
  const w = threeJ(2 * L, S2, J2, mL2, mS2, -M2);
  if (w.sign === 0) return 0;
  const phase = (2 * L - S2 + M2) / 2;
  const sign = (Math.abs(phase) % 2 === 0 ? 1 : -1) * w.sign;
  return sign * Math.sqrt(w.squared.mul(Rational.of(J2 + 1)).toDecimal().toNumber());
}

/**
 * Prepare the term once; the returned function gives every state at `tesla`
 * (a float64 field, negative allowed), in block order (mJ ascending, then
 * rank). The term must be valid (every J once); solveFineStructure and
 * linearPatternLimit check that before calling.
 */
export function fineStructureFloatSolver(term: FineStructureTerm): (tesla: number) => FineStructureFloatState[] {
  const partners = [...term.partners].sort((a, b) => a.energy.cmp(b.energy) || a.J2 - b.J2);
  const eMin = partners[0]?.energy ?? ZERO;
  const rel = new Map(partners.map((p) => [p.J2, p.energy.sub(eMin).toNumber()]));
  const jMax = Math.max(...partners.map((p) => p.J2));
  const gL = term.gL.toNumber();
  const gS = term.gS.toNumber();
  const muB = term.muB_h.toNumber();
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
    };
  });
  return (tesla: number) => {
    const z = muB * tesla;
    const out: FineStructureFloatState[] = [];
    for (const b of blocks) {
      const n = b.js.length;
      if (n === 1) {
        out.push({ J2: b.js[0]!, mJ2: b.M2, shift: b.zero[0]![0]! - b.ej[0]! + z * b.zeeman[0]!, blockSize: 1 });
        continue;
      }
      const h = b.zero.map((row, r) => row.map((x, c) => (r === c ? x + z * b.zeeman[r]! : x)));
      const { values } = symmetricEigenFloat(h);
      values.forEach((e, k) => out.push({ J2: b.js[k]!, mJ2: b.M2, shift: e - b.ej[k]!, blockSize: n }));
    }
    return out;
  };
}
