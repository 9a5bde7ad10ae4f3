/**
 * Float64 twin of the hyperfine–Zeeman solver (hyperfineZeeman.ts): the same
 * M blocks, labels and (F, mF) output order, diagonalized in float64
 * (symmetricEigenFloat.ts), returning energies E/h (Hz) and Hellmann–Feynman
 * slopes dE/dB = (μB/h)·⟨ψ|gJ·Jz + gI·Iz|ψ⟩ (Hz/T) as JavaScript numbers.
 *
 * It exists for speed: validity.ts samples and bisects with it, and
 * sublevelTransitions.ts scans for and brackets the field-insensitive points
 * with it before refining them in Dec. Its numbers are never exported as
 * results. Exact: no; energies to about 1e-15 of the largest |E| of a block,
 * slopes to about 1e-15·(μB/h)·‖H‖/gap. Labels follow the same rule as the
 * Dec solver (k-th lowest eigenvalue of a block ↔ k-th lowest F), so they
 * agree wherever the block's eigenvalues are further apart than float64 can
 * resolve.
 *
 * Worked example: 87Rb 5²S1/2 (A = 3417.341305452145 MHz) at 0 T gives
 * F = 1 at −5A/4 = −4271.676631815… MHz and F = 2 at 3A/4 = 2563.005979089… MHz,
 * and the stretched state |2, 2⟩ has slope (μB/h)(gJ/2 + 3gI/2) at any field.
 */
import { blockMatrixFloat, prepareHyperfineZeeman, type HyperfineZeemanLevel, type PreparedBlock, type PreparedLevel } from "./hyperfineZeeman.js";
import { symmetricEigenFloat } from "./symmetricEigenFloat.js";

/** One M block diagonalized in float64 at one field. */
export interface FloatBlockSolution {
  /** Eigenvalues E/h in Hz, ascending (rank k ↔ block.fByRank[k]). */
  values: number[];
  /** vectors[k]: normalized eigenvector of values[k] on the block basis. */
  vectors: number[][];
  /** dE/dB in Hz/T per rank. */
  slopes: number[];
}

/** Energies and slopes of all sublevels, in the Dec solver's (F, mF) order. */
export interface FloatFieldStates {
  energy: Float64Array;
  slope: Float64Array;
}

/** Diagonalize one prepared block at `tesla` in float64 (see the module comment and its example). */
export function solveBlockFloat(prepared: PreparedLevel, block: PreparedBlock, tesla: number): FloatBlockSolution {
  const mu = prepared.floatMuB_h;
  const z = block.floatZeeman;
  const { values, vectors } = symmetricEigenFloat(blockMatrixFloat(block, mu * tesla));
  const slopes = vectors.map((v) => {
    let s = 0;
    for (let i = 0; i < v.length; i++) s += v[i]! * v[i]! * z[i]!;
    return mu * s;
  });
  return { values, vectors, slopes };
}

/**
 * d²E/dB² (Hz/T²) of the block's rank-k state from second-order perturbation
 * theory in the Zeeman operator: 2·Σ_{j≠k} (μB/h)²⟨k|Z|j⟩²/(E_k − E_j),
 * Z = gJ·Jz + gI·Iz. Float64; used to aim Newton steps, not as a result.
 * Worked example: for the 87Rb clock pair |2, 0⟩, |1, 0⟩ at weak field the
 * difference of the two is 2 × 575.15 Hz/G² (twice the quadratic coefficient).
 */
export function curvatureFloat(prepared: PreparedLevel, block: PreparedBlock, sol: FloatBlockSolution, k: number): number {
  const mu = prepared.floatMuB_h;
  const z = block.floatZeeman;
  const vk = sol.vectors[k]!;
  let sum = 0;
  for (let j = 0; j < vk.length; j++) {
    if (j === k) continue;
    const vj = sol.vectors[j]!;
    let m = 0;
    for (let i = 0; i < vk.length; i++) m += vk[i]! * z[i]! * vj[i]!;
    sum += (m * m) / (sol.values[k]! - sol.values[j]!);
  }
  return 2 * mu * mu * sum;
}

/** A float64 solver for one level: energies and slopes at `tesla` (a float, ≥ 0). */
export type HyperfineZeemanFloatSolver = (tesla: number) => FloatFieldStates;

/** Prepare a level once and return its float64 solver (see the module comment). */
export function hyperfineZeemanFloatSolver(level: HyperfineZeemanLevel | PreparedLevel): HyperfineZeemanFloatSolver {
  const prepared = "blocks" in level ? level : prepareHyperfineZeeman(level);
  return (tesla: number): FloatFieldStates => {
    if (!(tesla >= 0)) throw new RangeError("field must be ≥ 0 T (the direction defines the quantization axis)");
    const energy = new Float64Array(prepared.size);
    const slope = new Float64Array(prepared.size);
    for (const block of prepared.blocks) {
      const sol = solveBlockFloat(prepared, block, tesla);
      block.outIndex.forEach((pos, k) => {
        energy[pos] = sol.values[k]!;
        slope[pos] = sol.slopes[k]!;
      });
    }
    return { energy, slope };
  };
}

/** One hyperfine–Zeeman sublevel at one field, float64: the float twin of FieldState (no slope). */
export interface FloatFieldState {
  /** Doubled F of the zero-field level the state connects to. */
  F2: number;
  /** Doubled mF = mJ + mI. */
  mF2: number;
  /** Energy E/h in Hz from the hyperfine-free level centre. */
  energy: number;
  /** Uncoupled basis of the state's M block, ascending mJ (shared with the prepared block). */
  basis: PreparedBlock["basis"];
  /** Normalized eigenvector on `basis` (overall sign arbitrary). */
  vector: number[];
  /** The uncoupled state it tends to at high field. */
  highField: PreparedBlock["basis"][number];
}

/**
 * Every sublevel of a prepared level at `tesla` (a float, ≥ 0) with its
 * eigenvector, in the Dec solver's (F, mF) order and with its labels (same
 * prepared blocks, same k-th-lowest rule): the float64 twin of
 * solverForPrepared, for the field calculator (src/engine/), which needs
 * eigenvectors for line components at any field.
 *
 * Formula and labels: as the module comment and hyperfineZeeman.ts. Exact:
 * no; energies to about 1e-15 of the block's largest |E|, vector components
 * to about 1e-16·‖H‖/gap; the eigenvector's overall sign is not fixed (line
 * strengths are squares and do not depend on it). Selection rules: none
 * (every sublevel is returned).
 *
 * Worked example: 87Rb 5²S1/2 at 0 T gives eight states, three F = 1 at
 * −5A/4 = −4271.676631815… MHz and five F = 2 at 3A/4 = 2563.005979089… MHz;
 * the last, |F=2, mF=2⟩, is the pure |mJ = 1/2, mI = 3/2⟩ (vector ±[1]).
 */
export function solveHyperfineZeemanFloat(prepared: PreparedLevel, tesla: number): FloatFieldState[] {
  if (!(tesla >= 0)) throw new RangeError("field must be ≥ 0 T (the direction defines the quantization axis)");
  const out: FloatFieldState[] = new Array(prepared.size);
  for (const block of prepared.blocks) {
    const sol = solveBlockFloat(prepared, block, tesla);
    block.outIndex.forEach((pos, k) => {
      out[pos] = {
        F2: block.fByRank[k]!,
        mF2: block.M2,
        energy: sol.values[k]!,
        basis: block.basis,
        vector: sol.vectors[k]!,
        highField: block.basis[block.highByRank[k]!]!,
      };
    });
  }
  return out;
}
