/**
 * Hyperfine-resolved line patterns in the weak-field regime: the F_u → F_l
 * groups of a line between two fine-structure levels with hyperfine
 * structure, their (mF_u, mF_l) Zeeman components, linear shifts and the
 * closed cycling transitions.
 *
 * Normalization (exact, chosen so that the whole line sums to 1):
 *   S(F_u, F_l) = (2F_u+1)(2F_l+1){J_u F_u I; F_l J_l k}² / (2I+1).
 * The 6j orthogonality Σ_Fu (2F_u+1){…}² = 1/(2J_l+1) gives Σ_Fu S = (2F_l+1)/((2I+1)(2J_l+1)),
 * the statistical weight of F_l in the lower level, and Σ over all groups = 1.
 * A component (mF_u, mF_l) of a group carries S(F_u, F_l)·(F_u k F_l; −mF_u q mF_l)²,
 * q = mF_u − mF_l; the squared 3j symbols of a group sum to 1 over m, m', q, so
 * each group's components sum to the group strength exactly.
 *
 * References: I. I. Sobelman, "Atomic Spectra and Radiative Transitions"
 * (Springer, 1979), §9.3 (hyperfine line strengths via 6j symbols); A. R.
 * Edmonds (1957) eq. (7.1.8); D. A. Steck, "Rubidium 87 D Line Data",
 * relative strength factors S_FF′ (our `shareOfLower`).
 */
import { Dec, ZERO } from "./decimal.js";
import { Rational } from "./rational.js";
import { coupledValues, mValues } from "./quantum.js";
import { sixJ, threeJ } from "./wigner.js";
import { gF, hyperfineShift } from "./hyperfine.js";
import { polarizationOf, type Polarization } from "./linePattern.js";

/** One component (mF_u → mF_l) of a hyperfine group, exact part only. */
export interface HyperfineComponentStrength {
  mFu2: number;
  mFl2: number;
  /** q = mF_u − mF_l (ordinary integer). */
  q: number;
  polarization: Polarization;
  /** Share of the whole line, exact. */
  strength: Rational;
  /**
   * True for the closed cycling transitions: rank 1, J_u = J_l + 1,
   * F_u = F_l + 1 = I + J_u, mF_u = ±F_u, mF_l = ±F_l (same sign). The upper
   * stretched state |mJ = ±J_u⟩|mI = ±I⟩ can reach by rank 1 only lower states
   * with |M| ≥ I + J_u − 1 = I + J_l, and only the lower stretched state has it,
   * so it decays back to where it came from. Real leaks (off-resonant excitation
   * of other F_u, imperfect polarization, other decay channels of the upper
   * level) are outside this angular statement.
   */
  cycling: boolean;
}

/** One F_u → F_l group, exact part only. */
export interface HyperfineGroupStrength {
  Fu2: number;
  Fl2: number;
  /** S(F_u, F_l) as defined above: share of the whole line; all groups sum to 1. Exact. */
  strength: Rational;
  /** Share among the groups from the same lower F_l (Steck's S_FF′; sums to 1 per F_l). Exact. */
  shareOfLower: Rational;
  /** Share among the groups from the same upper F_u (sums to 1 per F_u; the decay branching ratios for rank 1). Exact. */
  shareOfUpper: Rational;
  components: HyperfineComponentStrength[];
}

/**
 * Exact group and component strengths of a hyperfine-resolved line.
 *
 * Formula: see the module comment. Selection rules: triangle(F_u, k, F_l)
 * and triangle(J_u, k, J_l) (via the 6j); |ΔmF| ≤ k (via the 3j); groups and
 * components of zero strength are left out. Exact: yes.
 * Order: groups by F_l descending, then F_u descending; components by mF_l, then mF_u.
 *
 * Worked example (87Rb D2, I = 3/2, J_u = 3/2, J_l = 1/2, E1): from F = 2 the
 * shares to F′ = 3, 2, 1 are 7/10, 1/4, 1/20; from F = 1 to F′ = 2, 1, 0 they
 * are 5/12, 5/12, 1/6 (Steck); the group F = 2 → F′ = 3 is 7/16 of the line.
 * Rank 3 (171Yb⁺ 467 nm, E3, I = 1/2, ²S1/2 → ²F°7/2): the clock group
 * F = 0 → F′ = 3 is 1/4 of the line, 1/28 in each of its seven components.
 */
export function hyperfineGroupStrengths(I2: number, Ju2: number, Jl2: number, k: number): HyperfineGroupStrength[] {
  const raw: { Fu2: number; Fl2: number; s: Rational }[] = [];
  const lowerFs = coupledValues(I2, Jl2).reverse();
  const upperFs = coupledValues(I2, Ju2).reverse();
  for (const Fl2 of lowerFs) {
    for (const Fu2 of upperFs) {
      const w = sixJ(Ju2, Fu2, I2, Fl2, Jl2, 2 * k);
      if (w.sign === 0) continue;
      raw.push({ Fu2, Fl2, s: w.squared.mul(Rational.of((Fu2 + 1) * (Fl2 + 1), I2 + 1)) });
    }
  }
  const sumBy = (pick: (r: (typeof raw)[number]) => number, v: number) =>
    raw.filter((r) => pick(r) === v).reduce((s, r) => s.add(r.s), Rational.ZERO);
  const Fumax = I2 + Ju2;
  const stretchedPair = k === 1 && Ju2 === Jl2 + 2;
  return raw.map((r) => {
    const components: HyperfineComponentStrength[] = [];
    for (const mFl2 of mValues(r.Fl2)) {
      for (const mFu2 of mValues(r.Fu2)) {
        const q2 = mFu2 - mFl2;
        const w = threeJ(r.Fu2, 2 * k, r.Fl2, -mFu2, q2, mFl2);
        if (w.sign === 0) continue;
        const cycling =
          stretchedPair && r.Fu2 === Fumax && r.Fl2 === r.Fu2 - 2 && Math.abs(mFu2) === r.Fu2 && mFl2 * mFu2 > 0 && Math.abs(mFl2) === r.Fl2;
        components.push({ mFu2, mFl2, q: q2 / 2, polarization: polarizationOf(q2 / 2), strength: r.s.mul(w.squared), cycling });
      }
    }
    return {
      Fu2: r.Fu2,
      Fl2: r.Fl2,
      strength: r.s,
      shareOfLower: r.s.div(sumBy((x) => x.Fl2, r.Fl2)),
      shareOfUpper: r.s.div(sumBy((x) => x.Fu2, r.Fu2)),
      components,
    };
  });
}

/** One level of the line with what the shifts need. */
export interface HyperfineLineLevel {
  J2: number;
  gJ: Dec;
  /** A/h and B/h, Hz (B = 0 when absent). */
  A: Dec;
  B: Dec;
}

export interface HyperfineLineInput {
  /** Doubled nuclear spin. */
  I2: number;
  /** Nuclear g in Bohr magnetons, atomic sign convention. */
  gI: Dec;
  upper: HyperfineLineLevel;
  lower: HyperfineLineLevel;
  /** Multipole rank: 1 (E1, M1), 2 (E2, M2) or 3 (E3). */
  k: number;
  /** μB/h, Hz/T, from the constants edition. */
  muB_h: Dec;
}

export interface HyperfineLineComponent extends HyperfineComponentStrength {
  /** gF_u·mF_u − gF_l·mF_l (Lorentz units); an F = 0 state contributes 0. */
  shiftLorentz: Dec;
  /** shiftLorentz·μB/h, Hz/T. */
  shiftHzPerT: Dec;
}

export interface HyperfineLineGroup extends Omit<HyperfineGroupStrength, "components"> {
  /** Zero-field frequency of the group from the hyperfine-free line centre: E_Fu − E_Fl, Hz. */
  offset: Dec;
  gFu: Dec | null;
  gFl: Dec | null;
  components: HyperfineLineComponent[];
}

/**
 * The hyperfine-resolved weak-field pattern of a line: exact strengths
 * (hyperfineGroupStrengths), zero-field group offsets E_Fu − E_Fl from
 * hyperfineShift, and linear Zeeman shifts gF_u mF_u − gF_l mF_l from gF.
 * Valid while the Zeeman energies are small against the hyperfine intervals
 * (otherwise use hyperfineZeeman.ts with lineAtField.ts).
 * Exact: strengths yes; offsets and shifts no (measured constants).
 *
 * Worked example: 87Rb D2 (Steck constants) cycling line F = 2, mF = 2 →
 * F′ = 3, mF′ = 3 (σ+): offset E(F′=3) − E(F=2) = (9A′/4 + B′/4) − 3A/4
 * = 193.74075 MHz − 2563.00598 MHz = −2369.26523 MHz; shift 3·gF′ − 2·gF =
 * (3/2)gJ′ − (1/2)gJ = 1.003134435 Lorentz units ≈ 14.0401 GHz/T (stretched
 * states: gI cancels).
 */
export function hyperfineLinePattern(input: HyperfineLineInput): HyperfineLineGroup[] {
  const { I2, gI, upper, lower, k, muB_h } = input;
  return hyperfineGroupStrengths(I2, upper.J2, lower.J2, k).map((g) => {
    const gFu = gF(upper.gJ, gI, I2, upper.J2, g.Fu2);
    const gFl = gF(lower.gJ, gI, I2, lower.J2, g.Fl2);
    const part = (gf: Dec | null, m2: number) => (gf === null ? ZERO : gf.mul(m2).div(2));
    const offset = hyperfineShift(upper.A, upper.B, I2, upper.J2, g.Fu2).sub(hyperfineShift(lower.A, lower.B, I2, lower.J2, g.Fl2));
    return {
      ...g,
      offset,
      gFu,
      gFl,
      components: g.components.map((c) => {
        const shiftLorentz = part(gFu, c.mFu2).sub(part(gFl, c.mFl2));
        return { ...c, shiftLorentz, shiftHzPerT: shiftLorentz.mul(muB_h) };
      }),
    };
  });
}
