/**
 * The components of one spectral line at a given magnetic field, with the
 * states of both levels taken from a field solver (any regime: weak field,
 * intermediate, Paschen–Back).
 *
 * A state is a real superposition over an uncoupled basis |J, mJ, mI⟩; all
 * field eigenstates have a definite total projection M = mJ + mI. The
 * multipole operator T^k acts on the electrons only, so
 *
 *   ⟨J mJ mI| T^k_q |J' mJ' mI'⟩ = δ(mI, mI')·(−1)^(J−mJ) (J k J'; −mJ q mJ')·⟨J‖T^k‖J'⟩
 *
 * (Wigner–Eckart theorem, Edmonds 1957 eq. 5.4.1), and a component u → l has
 * relative strength |⟨u|T^k_q|l⟩|² with q = M_u − M_l, normalized so that all
 * components of the given state sets sum to 1.
 *
 * Reduced elements between fine-structure partners of one LS term (needed as
 * soon as the field mixes J) follow from the orbital reduced element by
 * Edmonds eq. (7.1.7):
 *   ⟨(LS)J‖T^k(L)‖(L'S)J'⟩ = (−1)^(L+S+J'+k) √((2J+1)(2J'+1)) {L J S; J' L' k} ⟨L‖T^k‖L'⟩;
 * ⟨L‖T^k‖L'⟩ is common to the whole multiplet and drops out of the relative
 * strengths. This holds for the electric multipoles E1, E2 and E3 (operators
 * on orbital coordinates); for the magnetic ones (M1, M2) the spin part of
 * the operator is not covered (the caller gives its own reduced elements then).
 */
import { Dec, ONE, ZERO } from "../decimal.js";
import { Rational } from "../rational.js";
import { threeJ, sixJ, type SignedRoot } from "../wigner.js";
import { polarizationOf, type Polarization } from "../linePattern.js";
import type { FieldState } from "./hyperfineZeeman.js";
import type { FineStructureState } from "./fineStructure.js";
import type { TermFieldState } from "./termHyperfineZeeman.js";

/** One amplitude of a state on the uncoupled basis |J mJ mI⟩ (doubled quantum numbers). */
export interface BasisAmplitude {
  J2: number;
  mJ2: number;
  mI2: number;
  amplitude: Dec;
}

/** A field eigenstate as the line calculation needs it. */
export interface LineState {
  /** Short label for display, e.g. "F=2, mF=1" or "J=3/2, mJ=1/2". */
  label: string;
  /** Doubled total projection M = mJ + mI. */
  M2: number;
  /** Energy, Hz, relative to this level's zero-field reference (so u − l is the shift from the line centre). */
  energy: Dec;
  amplitudes: BasisAmplitude[];
}

/** Reduced matrix element ⟨Ju‖T^k‖Jl⟩ (up to a common factor) for doubled Ju, Jl. */
export type ReducedElement = (Ju2: number, Jl2: number) => Dec;

/** One component of the line at the field. */
export interface FieldLineComponent {
  /** Index into the upper and lower state lists. */
  upper: number;
  lower: number;
  /** q = M_u − M_l (an ordinary integer). */
  q: number;
  /** σ+ for q = +1, π for 0, σ− for −1, null for |q| = 2. */
  polarization: Polarization;
  /** |⟨u|T^k_q|l⟩|², normalized over all components returned; Dec, not exact. */
  strength: Dec;
  /** E_u − E_l, Hz: the frequency shift from the zero-field line centre. */
  shift: Dec;
}

function signedRootToDec(r: SignedRoot): Dec {
  if (r.sign === 0) return ZERO;
  const m = r.squared.toDecimal().sqrt();
  return r.sign < 0 ? m.neg() : m;
}

/** Reduced element for a single pair of levels: 1 (it cancels in the normalization). */
export const singleReducedElement: ReducedElement = () => new Dec(1);

/**
 * Reduced elements of an orbital rank-k operator between the fine-structure
 * partners of two LS terms with the same spin, Edmonds eq. (7.1.7), with
 * ⟨L_u‖T^k‖L_l⟩ = 1.
 * Exact: the value is sign·√(rational), rounded once to Dec.
 * Selection rules: triangle(L_u, k, L_l) and triangle(J_u, k, J_l) via the 6j.
 *
 * Worked example: 2P → 2S, k = 1: ⟨2P3/2‖‖2S1/2⟩² : ⟨2P1/2‖‖2S1/2⟩² = 2 : 1
 * (the D2 : D1 strength ratio 2 : 1 of the alkali atoms, common practice),
 * from 4·{1 3/2 1/2; 1/2 0 1}² = 4·(1/6) and 2·{1 1/2 1/2; 1/2 0 1}² = 2·(1/6).
 */
export function lsReducedElement(Lu: number, Ll: number, S2: number, k: number): ReducedElement {
  return (Ju2, Jl2) => {
    const w = sixJ(2 * Lu, Ju2, S2, Jl2, 2 * Ll, 2 * k);
    if (w.sign === 0) return ZERO;
    const phase = (2 * Lu + S2 + Jl2 + 2 * k) / 2;
    const sign = ((Math.abs(phase) % 2 === 0 ? 1 : -1) * w.sign) as -1 | 1;
    return signedRootToDec({ sign, squared: w.squared.mul(Rational.of((Ju2 + 1) * (Jl2 + 1))) });
  };
}

/**
 * Reduced elements for a line whose transition operator is known between
 * its own two levels only: 1 between (Ju, Jl) of the line, 0 between any
 * other J of the levels' terms. Used where the LS relation above does not
 * apply (a change of spin, or an M1 line, whose spin part it does not
 * cover): amplitudes of a mixed state on other J then add no transition
 * strength of their own. Exact. Selection rules: none beyond the line's pair.
 * Worked example: ownPairReducedElement(3, 1) gives 1 for (3/2, 1/2) and 0
 * for (1/2, 1/2).
 */
export function ownPairReducedElement(Ju2: number, Jl2: number): ReducedElement {
  return (a, b) => (a === Ju2 && b === Jl2 ? new Dec(1) : ZERO);
}

/** Which reduced elements a line's components at a field use (src/results/lineModel.ts decides). */
export type ReducedElementKind = "LS" | "own J pair";

/**
 * The reduced elements of a line between the J of its levels' terms: the LS
 * ones (lsReducedElement, Edmonds eq. 7.1.7) when `kind` is "LS" and they
 * do not vanish for the line's own pair (Ju, Jl); otherwise the line's own
 * pair (ownPairReducedElement), so that a line listed between levels that
 * LS coupling would not connect still has its components. Exact as the two
 * functions. Worked example: Na D2 (2P3/2 → 2S1/2, E1, "LS") gives the LS
 * elements, ⟨3/2‖‖1/2⟩² : ⟨1/2‖‖1/2⟩² = 2 : 1.
 */
export function lineReducedElement(kind: ReducedElementKind, Lu: number, Ll: number, S2: number, k: number, Ju2: number, Jl2: number): ReducedElement {
  if (kind === "LS") {
    const ls = lsReducedElement(Lu, Ll, S2, k);
    if (!ls(Ju2, Jl2).isZero()) return ls;
  }
  return ownPairReducedElement(Ju2, Jl2);
}

/**
 * Every component of a line between the given upper and lower field states,
 * for a multipole of rank k.
 *
 * Formula: ⟨u|T^k_q|l⟩ = Σ c_u c_l δ(mI_u, mI_l)(−1)^(Ju−mJu)(Ju k Jl; −mJu q mJl)·R(Ju, Jl);
 * strength |⟨u|T^k_q|l⟩|² / Σ(all pairs); shift E_u − E_l.
 * Selection rules: |M_u − M_l| ≤ k (all such pairs are returned, including ones
 * that vanish or nearly vanish, so that "forbidden at zero field, allowed at
 * field" components stay visible); δ(mI) because T^k does not act on the nucleus.
 * Exact: no (Dec sums of products of eigenvector components).
 * Method: for each upper state and q the 3j·R-weighted sums of its
 * amplitudes are formed once per lower basis state |Jl mJl mI⟩, so a pair of
 * states costs one product per lower amplitude.
 * Sum rules (tested): with complete state sets of both levels, the strengths
 * of each q sum to 1/(2k+1) at every field, and the strength-weighted mean
 * shift of each q is linear in B (both are traces, independent of the basis).
 *
 * Worked example: Na D2 (2P3/2 → 2S1/2, E1) at a field far below the
 * Paschen–Back region gives the textbook strengths 1/4, 1/12, 1/6, 1/6, 1/12, 1/4.
 */
export function lineComponentsAtField(
  upper: LineState[],
  lower: LineState[],
  k: number,
  reduced: ReducedElement = singleReducedElement,
): FieldLineComponent[] {
  // Integer keys instead of strings: these lookups run once per amplitude.
  const key3 = (a: number, b: number, c: number) => ((a + 512) * 1024 + (b + 512)) * 1024 + (c + 512);
  const reducedCache = new Map<number, Dec>();
  const red = (a: number, b: number) => {
    const key = a * 1024 + b;
    let v = reducedCache.get(key);
    if (v === undefined) reducedCache.set(key, (v = reduced(a, b)));
    return v;
  };
  // (−1)^(Ju−mJu)·(Ju k Jl; −mJu q mJl)·R(Ju, Jl) for one pair of basis states: a few distinct values recur.
  const factorCache = new Map<string, Dec>();
  const factor = (Ju2: number, Jl2: number, mu2: number, q2: number, ml2: number): Dec => {
    const key = `${Ju2},${Jl2},${mu2},${q2},${ml2}`;
    let v = factorCache.get(key);
    if (v === undefined) {
      const w = signedRootToDec(threeJ(Ju2, 2 * k, Jl2, -mu2, q2, ml2));
      const r = w.isZero() ? ZERO : red(Ju2, Jl2);
      v = w.isZero() || r.isZero() ? ZERO : w.mul(r);
      if (Math.abs((Ju2 - mu2) / 2) % 2 === 1) v = v.neg();
      factorCache.set(key, v);
    }
    return v;
  };
  // Index of the lower basis states (J, mJ, mI) that occur, and the lower J values.
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
  // Each lower amplitude's basis index, once.
  const lowerSlots = lower.map((l) => l.amplitudes.map((b) => lowerIndex.get(key3(b.J2, b.mJ2, b.mI2))!));
  const raw: { upper: number; lower: number; q: number; element: Dec }[] = [];
  upper.forEach((u, iu) => {
    // f[q][b] = Σ over the amplitudes a of u with mI_a = mI_b and mJ_a − mJ_b = q of
    // c_a·(−1)^(Ju−mJu)(Ju k Jl; −mJu q mJl)·R(Ju, Jl): then ⟨u|T^k_q|l⟩ = Σ_b c_b f[q][b],
    // one product per lower amplitude instead of one per pair of amplitudes.
    const f: (Dec | undefined)[] = new Array(qs * nLower);
    for (const a of u.amplitudes) {
      for (let q2 = -2 * k; q2 <= 2 * k; q2 += 2) {
        const ml2 = a.mJ2 - q2;
        for (const Jl2 of lowerJs) {
          const slot = lowerIndex.get(key3(Jl2, ml2, a.mI2));
          if (slot === undefined) continue;
          const w = factor(a.J2, Jl2, a.mJ2, q2, ml2);
          if (w.isZero()) continue;
          const at = ((q2 + 2 * k) / 2) * nLower + slot;
          const term = w.mul(a.amplitude);
          const prev = f[at];
          f[at] = prev === undefined ? term : prev.add(term);
        }
      }
    }
    lower.forEach((l, il) => {
      const q2 = u.M2 - l.M2;
      if (Math.abs(q2) > 2 * k) return;
      const row = ((q2 + 2 * k) / 2) * nLower;
      const slots = lowerSlots[il]!;
      let element = ZERO;
      l.amplitudes.forEach((b, i) => {
        const c = f[row + slots[i]!];
        if (c !== undefined) element = element.add(c.mul(b.amplitude));
      });
      raw.push({ upper: iu, lower: il, q: q2 / 2, element });
    });
  });
  const squares = raw.map((r) => r.element.mul(r.element));
  const total = squares.reduce((s, x) => s.add(x), ZERO);
  if (total.isZero()) throw new RangeError("no allowed component between these states");
  // one division, then products: a Dec division costs several multiplications
  const inverse = ONE.div(total);
  return raw.map((r, i) => ({
    upper: r.upper,
    lower: r.lower,
    q: r.q,
    polarization: polarizationOf(r.q),
    strength: squares[i]!.mul(inverse),
    shift: upper[r.upper]!.energy.sub(lower[r.lower]!.energy),
  }));
}

function half(x2: number): string {
  return x2 % 2 === 0 ? String(x2 / 2) : `${x2}/2`;
}

/**
 * The label of a sublevel in a line's components: "F=2, mF=1" with nuclear
 * spin (I2 > 0), "mJ=1/2" without (F = J, mF = mJ; the form the J-resolved
 * linear pattern uses). Exact: text only.
 */
export function sublevelLabel(I2: number, F2: number, mF2: number): string {
  return I2 > 0 ? `F=${half(F2)}, mF=${half(mF2)}` : `mJ=${half(mF2)}`;
}

/**
 * Line states from the hyperfine–Zeeman solver (one J level, with nuclear
 * spin or, I2 = 0, without). Energies stay relative to the hyperfine-free
 * level centre, which is the zero-field line centre of the J-resolved line.
 * Labels as sublevelLabel. Exact: copies only.
 *
 * Worked example: 87Rb 5²S1/2 at 0.01 T gives eight states labelled
 * "F=2, mF=2" … "F=1, mF=−1", each with its mJ, mI amplitudes.
 */
export function statesFromHyperfine(J2: number, states: FieldState[], I2 = 1): LineState[] {
  return states.map((s) => ({
    label: sublevelLabel(I2, s.F2, s.mF2),
    M2: s.mF2,
    energy: s.energy,
    amplitudes: s.basis.map((b, i) => ({ J2, mJ2: b.mJ2, mI2: b.mI2, amplitude: s.vector[i]! })),
  }));
}

/**
 * Line states of one level from the term solver (termHyperfineZeeman.ts):
 * each state with its amplitudes on every listed J of the term, its energy
 * from the level's own listed energy (so E_u − E_l is the shift from the
 * line's zero-field, hyperfine-free centre), labelled as sublevelLabel (the
 * level's own F, mF, or mJ without nuclear spin). Exact: copies only.
 *
 * Worked example: 6Li 2P3/2 (I = 1) at 832 G gives twelve states
 * "F=1/2, mF=−1/2" … "F=5/2, mF=5/2", each but the two stretched ones with
 * amplitudes on J = 1/2 as well as on J = 3/2.
 */
export function statesFromTerm(I2: number, states: readonly TermFieldState[]): LineState[] {
  return states.map((s) => ({
    label: sublevelLabel(I2, s.F2, s.mF2),
    M2: s.mF2,
    energy: s.energy,
    amplitudes: s.amplitudes,
  }));
}

/**
 * Line states from the fine-structure solver (several J, no nuclear spin),
 * with energies measured from `reference` (e.g. the zero-field energy of the
 * J level whose line is meant, so that shifts are from that line's centre).
 * Exact: one subtraction per state.
 *
 * Worked example: Na 3p at 1 T with reference E(2P3/2) gives six states;
 * the two labelled "J=1/2, …" lie about 515.5 GHz below zero.
 */
export function statesFromFineStructure(states: FineStructureState[], reference: Dec): LineState[] {
  return states.map((s) => ({
    label: `J=${half(s.J2)}, mJ=${half(s.mJ2)}`,
    M2: s.mJ2,
    energy: s.energy.sub(reference),
    amplitudes: s.coupled.map((c) => ({ J2: c.J2, mJ2: s.mJ2, mI2: 0, amplitude: c.amplitude })),
  }));
}
