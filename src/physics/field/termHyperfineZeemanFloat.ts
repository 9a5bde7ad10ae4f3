/**
 * Float64 twin of the term solver (termHyperfineZeeman.ts): the same
 * prepared blocks, labels and per-level (F, mF) order, diagonalized in
 * float64 (symmetricEigenFloat.ts). For callers that need many solves and
 * float answers (a field calculator, plots, scans); its numbers are never
 * exported as results of the build.
 *
 * Exact: no. Each state is taken from its block shifted by its own level's
 * offset (termBlockFloatEigen), so energies are good to about 1e-16 of the
 * level's own hyperfine and Zeeman scale (not of the fine-structure
 * interval); amplitudes to about 1e-16·‖H − E_J‖/gap. Labels follow the Dec solver's rule,
 * so they agree wherever a block's eigenvalues are further apart than
 * float64 resolves.
 *
 * Worked example: 6Li 2P at 832 G gives the 2P3/2 stretched state at
 * 3A/2 + B/4 + (μB/h)·B·(3gJ/2 + gI) from E(2P3/2), as the Dec solver does.
 */
import { prepareTerm, termBlockFloatEigen, type PreparedTerm, type TermBlock, type TermProblem } from "./termHyperfineZeeman.js";
import type { UncoupledState } from "./hyperfineZeeman.js";

/** One eigenstate in float64. */
export interface TermFloatState {
  J2: number;
  F2: number;
  mF2: number;
  /** Energy from the listed energy of its own level, Hz. */
  energy: number;
  /** dE/dB, Hz/T (Hellmann–Feynman). */
  slope: number;
  /** Amplitudes on the block basis (J ascending, then mJ); sign as in the Dec solver. */
  amplitudes: { J2: number; mJ2: number; mI2: number; amplitude: number }[];
  /** Hyperfine Paschen–Back label of the same (J, F, M), as the Dec solver gives it. */
  highField: UncoupledState;
}

/** Prepare once (or take a prepared term) and return the float64 solver: per listed level, states sorted by F then mF. */
export function termHyperfineZeemanFloatSolver(problem: TermProblem | PreparedTerm): (tesla: number) => TermFloatState[][] {
  const prepared = "blocks" in problem ? problem : prepareTerm(problem);
  const p = prepared.problem;
  const solveBlock = termBlockFloatSolver(prepared);
  return (tesla: number) => {
    if (!(tesla >= 0)) throw new RangeError("field must be ≥ 0 T");
    const out: TermFloatState[][] = p.levels.map(() => []);
    for (const b of prepared.blocks) for (const st of solveBlock(b, tesla)) out[st.level]!.push(st.state);
    for (const states of out) states.sort((x, y) => x.F2 - y.F2 || x.mF2 - y.mF2);
    return out;
  };
}

/**
 * The float64 states of one M block of a prepared term, in ascending energy
 * (rank order), each with its level index: the twin of solveTermBlock, for
 * scans that need only the blocks of two sublevels. Same accuracy as the
 * whole-term float solver; worked example there.
 */
export function termBlockFloatSolver(prepared: PreparedTerm): (b: TermBlock, tesla: number) => { level: number; state: TermFloatState }[] {
  const p = prepared.problem;
  const mu = p.muB_h.toNumber();
  return (b: TermBlock, tesla: number) => {
    const n = b.basis.length;
    // each state from the block shifted by its own level's offset: its energy is then from its own level
    const eig = termBlockFloatEigen(b, mu * tesla);
    const out: { level: number; state: TermFloatState }[] = [];
    for (let k = 0; k < n; k++) {
      const { level, F2, high } = b.ranks[k]!;
      const J2 = p.levels[level]!.J2;
      let v = eig.vectors[k]!;
      let lead = 0;
      for (let i = 0; i < n; i++) if (b.basis[i]!.J2 === J2 && Math.abs(v[i]!) > Math.abs(lead)) lead = v[i]!;
      if (lead < 0) v = v.map((x) => -x);
      let slope = 0;
      for (let r = 0; r < n; r++) for (let c = 0; c < n; c++) slope += v[r]! * b.floatZeeman[r]![c]! * v[c]!;
      out.push({
        level,
        state: {
          J2,
          F2,
          mF2: b.M2,
          energy: eig.values[k]!,
          slope: mu * slope,
          amplitudes: b.basis.map((s, i) => ({ J2: s.J2, mJ2: s.mJ2, mI2: s.mI2, amplitude: v[i]! })),
          highField: high,
        },
      });
    }
    return out;
  };
}
