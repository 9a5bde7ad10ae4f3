/**
 * Float64 twin of lineAtField.ts: the components of one spectral line at a
 * given field from float64 field eigenstates, for the field calculator
 * (src/engine/), which answers at any field in the browser. The build's
 * tables keep the Dec version.
 *
 * Same formula, selection rules and normalization as lineComponentsAtField:
 *
 *   ⟨u|T^k_q|l⟩ = Σ c_u c_l δ(mI_u, mI_l)(−1)^(Ju−mJu)(Ju k Jl; −mJu q mJl)·R(Ju, Jl),
 *
 * strength |⟨u|T^k_q|l⟩|² / Σ(all pairs), shift E_u − E_l; every pair with
 * |M_u − M_l| ≤ k is returned (Wigner–Eckart theorem, Edmonds 1957
 * eq. 5.4.1; R from Edmonds eq. 7.1.7 for fine-structure partners, see
 * lineAtField.ts). The 3j symbols and reduced elements are exact (wigner.ts),
 * rounded once to float64 and cached in the prepared function; only the sums
 * over eigenvector amplitudes are float64.
 * Exact: no; a strength is good to about 1e-16 of the largest strength plus
 * the eigenvectors' own error (about 1e-16·‖H‖/gap); a shift to 1e-16 of the
 * levels' largest energies.
 */
import { threeJ } from "../wigner.js";
import { polarizationOf, type Polarization } from "../linePattern.js";
import type { ReducedElement } from "./lineAtField.js";
import type { FloatFieldState } from "./hyperfineZeemanFloat.js";
import type { FineStructureFloatEigenstate } from "./fineStructureFloat.js";
import type { TermFloatState } from "./termHyperfineZeemanFloat.js";

/** One amplitude of a float64 state on the uncoupled basis |J mJ mI⟩ (doubled quantum numbers). */
export interface FloatBasisAmplitude {
  J2: number;
  mJ2: number;
  mI2: number;
  amplitude: number;
}

/** A float64 field eigenstate as the line calculation needs it (twin of LineState). */
export interface FloatLineState {
  /** e.g. "F=2, mF=1" or "J=3/2, mJ=1/2", as in lineAtField.ts. */
  label: string;
  /** Doubled M = mJ + mI. */
  M2: number;
  /** Energy, Hz, from this level's zero-field reference. */
  energy: number;
  amplitudes: FloatBasisAmplitude[];
}

/** One component at the field (twin of FieldLineComponent). */
export interface FloatLineComponent {
  upper: number;
  lower: number;
  q: number;
  polarization: Polarization;
  strength: number;
  shift: number;
}

function half(x2: number): string {
  return x2 % 2 === 0 ? String(x2 / 2) : `${x2}/2`;
}

/** The twin of sublevelLabel (lineAtField.ts): "F=2, mF=1" with nuclear spin, "mJ=1/2" without. */
function label(I2: number, F2: number, mF2: number): string {
  return I2 > 0 ? `F=${half(F2)}, mF=${half(mF2)}` : `mJ=${half(mF2)}`;
}

/**
 * Line states from float64 hyperfine–Zeeman states (solveHyperfineZeemanFloat),
 * labelled as statesFromHyperfine labels the Dec ones (I2 = 0: "mJ=…").
 * Exact: copies only.
 * Worked example: 87Rb 5²S1/2 at 0.01 T gives eight states "F=1, mF=-1" …
 * "F=2, mF=2" with their mJ, mI amplitudes.
 */
export function statesFromHyperfineFloat(J2: number, states: readonly FloatFieldState[], I2 = 1): FloatLineState[] {
  return states.map((s) => ({
    label: label(I2, s.F2, s.mF2),
    M2: s.mF2,
    energy: s.energy,
    amplitudes: s.basis.map((b, i) => ({ J2, mJ2: b.mJ2, mI2: b.mI2, amplitude: s.vector[i]! })),
  }));
}

/**
 * Line states of one level from the float64 term solver
 * (termHyperfineZeemanFloat.ts), as statesFromTerm makes them from the Dec
 * one: amplitudes on every listed J, energy from the level's own listed
 * energy, labels "F=…, mF=…" (or "mJ=…" without nuclear spin). Exact: copies
 * only. Worked example: 6Li 2P3/2 at 832 G gives twelve states, as the Dec
 * version.
 */
export function statesFromTermFloat(I2: number, states: readonly TermFloatState[]): FloatLineState[] {
  return states.map((s) => ({ label: label(I2, s.F2, s.mF2), M2: s.mF2, energy: s.energy, amplitudes: s.amplitudes }));
}

/**
 * Line states from float64 fine-structure eigenstates (fineStructureFloatEigen),
 * with energies from `reference` (Hz above the term's lowest partner, e.g.
 * the offset of the level whose line is meant). Labels as
 * statesFromFineStructure. Exact: one subtraction per state.
 * Worked example: Na 3p at 1 T with the reference of 2P3/2 gives six states;
 * the two labelled "J=1/2, …" lie about 515.5 GHz below zero.
 */
export function statesFromFineStructureFloat(states: readonly FineStructureFloatEigenstate[], reference: number): FloatLineState[] {
  return states.map((s) => ({
    label: `J=${half(s.J2)}, mJ=${half(s.mJ2)}`,
    M2: s.mJ2,
    energy: s.energy - reference,
    amplitudes: s.coupled.map((c) => ({ J2: c.J2, mJ2: s.mJ2, mI2: 0, amplitude: c.amplitude })),
  }));
}

/** Components of one line between given float64 state sets. */
export type FloatLineComponents = (upper: readonly FloatLineState[], lower: readonly FloatLineState[]) => FloatLineComponent[];

/**
 * Prepare the component calculation of a rank-k line once (the 3j·R factors
 * are computed exactly on first use and kept), and return a function of the
 * two state sets: the float64 twin of lineComponentsAtField, same formula,
 * selection rules, order (upper, then lower) and normalization.
 *
 * Worked example: Na D2 (2P3/2 → 2S1/2, E1) at a field far below the
 * Paschen–Back region gives the textbook strengths 1/4, 1/12, 1/6, 1/6,
 * 1/12, 1/4 (to float64 rounding), as the Dec version.
 */
export function lineComponentsFloat(k: number, reduced: ReducedElement): FloatLineComponents {
  const reducedCache = new Map<number, number>();
  const red = (a: number, b: number) => {
    const key = a * 1024 + b;
    let v = reducedCache.get(key);
    if (v === undefined) reducedCache.set(key, (v = reduced(a, b).toNumber()));
    return v;
  };
  // (−1)^(Ju−mJu)·(Ju k Jl; −mJu q mJl)·R(Ju, Jl), exact then rounded once
  const factorCache = new Map<number, number>();
  const factor = (Ju2: number, Jl2: number, mu2: number, q2: number): number => {
    const key = (((Ju2 * 64 + Jl2) * 128 + (mu2 + 64)) * 16 + (q2 + 8));
    let v = factorCache.get(key);
    if (v === undefined) {
      const ml2 = mu2 - q2;
      const w = threeJ(Ju2, 2 * k, Jl2, -mu2, q2, ml2);
      if (w.sign === 0) v = 0;
      else {
        const r = red(Ju2, Jl2);
        v = r === 0 ? 0 : w.sign * Math.sqrt(w.squared.toDecimal().toNumber()) * r;
        if (Math.abs((Ju2 - mu2) / 2) % 2 === 1) v = -v;
      }
      factorCache.set(key, v);
    }
    return v;
  };
  return (upper, lower) => {
    const key3 = (a: number, b: number, c: number) => ((a + 512) * 1024 + (b + 512)) * 1024 + (c + 512);
    const lowerIndex = new Map<number, number>();
    const lowerJs = new Set<number>();
    for (const l of lower) {
      for (const b of l.amplitudes) {
        const key = key3(b.J2, b.mJ2, b.mI2);
        if (!lowerIndex.has(key)) lowerIndex.set(key, lowerIndex.size);
        lowerJs.add(b.J2);
      }
    }
    const nLower = lowerIndex.size;
    const qs = 2 * k + 1;
    const lowerSlots = lower.map((l) => l.amplitudes.map((b) => lowerIndex.get(key3(b.J2, b.mJ2, b.mI2))!));
    const raw: { upper: number; lower: number; q: number; element: number }[] = [];
    const f = new Float64Array(qs * nLower);
    upper.forEach((u, iu) => {
      // f[q][b] = Σ_a c_a·factor over the amplitudes a of u that reach lower basis state b with this q
      f.fill(0);
      for (const a of u.amplitudes) {
        if (a.amplitude === 0) continue;
        for (let q2 = -2 * k; q2 <= 2 * k; q2 += 2) {
          const ml2 = a.mJ2 - q2;
          for (const Jl2 of lowerJs) {
            const slot = lowerIndex.get(key3(Jl2, ml2, a.mI2));
            if (slot === undefined) continue;
            const w = factor(a.J2, Jl2, a.mJ2, q2);
            if (w !== 0) f[((q2 + 2 * k) / 2) * nLower + slot]! += w * a.amplitude;
          }
        }
      }
      lower.forEach((l, il) => {
        const q2 = u.M2 - l.M2;
        if (Math.abs(q2) > 2 * k) return;
        const row = ((q2 + 2 * k) / 2) * nLower;
        const slots = lowerSlots[il]!;
        let element = 0;
        l.amplitudes.forEach((b, i) => (element += f[row + slots[i]!]! * b.amplitude));
        raw.push({ upper: iu, lower: il, q: q2 / 2, element });
      });
    });
    let total = 0;
    const squares = raw.map((r) => {
      const s = r.element * r.element;
      total += s;
      return s;
    });
    if (total === 0) throw new RangeError("no allowed component between these states");
    return raw.map((r, i) => ({
      upper: r.upper,
      lower: r.lower,
      q: r.q,
      polarization: polarizationOf(r.q),
      strength: squares[i]! / total,
      shift: upper[r.upper]!.energy - lower[r.lower]!.energy,
    }));
  };
}
