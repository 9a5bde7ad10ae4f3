/**
 * Standard uncertainties of the field-dependent results (energies at the
 * configured fields, second-order coefficients, sublevel transitions and
 * their field-insensitive points, line components at the fields), by
 * first-order propagation (physics/uncertain.ts, GUM §5.1) from the
 * species' inputs (results/inputUncertainties.ts). Pure.
 *
 * The derivatives are physics/field/sensitivity.ts: Hellmann–Feynman on the
 * solvers' eigenvectors for energies, analytic ones for the Breit–Rabi form,
 * the first-order slopes and the within-J second-order coefficients, the
 * implicit-function theorem for field-insensitive points. Every number is
 * kept as an `Uncertain` (contributions by input key) until it is reduced to
 * its standard uncertainty, so a transition frequency (a difference of two
 * energies) or a line component's shift adds the contributions of the same
 * A, gJ, μB/h before squaring: correlations from shared inputs are kept.
 *
 * The fine-structure partners' part of a second-order coefficient
 * (partnerQuadratic.ts) is propagated from μB/h, gS, gL and from the level
 * energies and hyperfine constants A, B of the level and its partners
 * (partnerPartU).
 *
 * Worked example: 87Rb 5²S1/2 with the demo's gJ = 2.00233113(20) and
 * gI = −0.0009951414(10): the field-insensitive point of |1,−1⟩ ↔ |2,1⟩
 * at 3.2289 G carries u ≈ 3.3 µG (3.3e−10 T), almost all from gI (test/results/
 * fieldUncertainty.test.ts compares it with a Monte Carlo propagation).
 */
import { Dec, ZERO } from "../physics/decimal.js";
import { Rational } from "../physics/rational.js";
import { derived, exact, linear, minus, standardUncertainty, times, type Uncertain } from "../physics/uncertain.js";
import { combine, linearSlopeSensitivity, NO_SENSITIVITY, type LevelSensitivity, type TermSensitivity } from "../physics/field/sensitivity.js";
import type { HyperfineZeemanLevel } from "../physics/field/hyperfineZeeman.js";
import type { PartnerSlope } from "../physics/field/partnerQuadratic.js";
import type { SublevelLabel, SublevelTransition } from "../physics/field/sublevelTransitions.js";
import { gF as hyperfineGOf, hyperfineCoefficients } from "../physics/hyperfine.js";
import type { TransitionUncertainty } from "./fieldTypes.js";
import { gJInUse, type SpeciesInputs } from "./inputUncertainties.js";
import { couplingLande } from "./computeSpecies.js";
import type { LevelResult } from "./types.js";

/** The single-J parameters of one level as uncertain numbers (what sensitivity.ts differentiates by). */
export interface LevelParamsU {
  A: Uncertain;
  B: Uncertain;
  gJ: Uncertain;
  gI: Uncertain;
  muB_h: Uncertain;
}

/** gJ in use of a level as an uncertain number (measured, or its coupling formula's value from gL and gS); exact 0 for J = 0. */
export function levelGJ(l: LevelResult, inputs: SpeciesInputs): Uncertain {
  return gJInUse(inputs.level(l.input.id), inputs.gL, inputs.gS, (gL, gS) => couplingLande(l.input.term, gL, gS).g) ?? exact(ZERO);
}

/**
 * The level's solver parameters (computeFields.solverLevel) as uncertain
 * numbers: A and B only with nuclear spin (`hyperfine` true), gI exact 0
 * without a nucleus.
 */
export function levelParamsU(l: LevelResult, inputs: SpeciesInputs, hyperfine: boolean): LevelParamsU {
  const li = inputs.level(l.input.id);
  return {
    A: hyperfine ? li.A : exact(ZERO),
    B: hyperfine ? li.B : exact(ZERO),
    gJ: levelGJ(l, inputs),
    gI: inputs.gI ?? exact(ZERO),
    muB_h: inputs.muB_h,
  };
}

/** A number with value `value` and single-J sensitivities `s`, as an uncertain number (the chain rule). */
export function fromLevelSensitivity(value: Dec, s: LevelSensitivity, p: LevelParamsU): Uncertain {
  return derived(value, [
    [s.A, p.A],
    [s.B, p.B],
    [s.gJ, p.gJ],
    [s.gI, p.gI],
    [s.muB_h, p.muB_h],
  ]);
}

/** The term solver's parameters as uncertain numbers, levels in TermProblem order. */
export interface TermParamsU {
  energy: Uncertain[];
  A: Uncertain[];
  B: Uncertain[];
  gJ: Uncertain[];
  gI: Uncertain;
  gS: Uncertain;
  gL: Uncertain;
  muB_h: Uncertain;
}

export function termParamsU(levels: LevelResult[], inputs: SpeciesInputs, hyperfine: boolean): TermParamsU {
  const each = levels.map((l) => levelParamsU(l, inputs, hyperfine));
  return {
    energy: levels.map((l) => inputs.level(l.input.id).energy ?? exact(ZERO)),
    A: each.map((x) => x.A),
    B: each.map((x) => x.B),
    gJ: each.map((x) => x.gJ),
    gI: inputs.gI ?? exact(ZERO),
    gS: inputs.gS,
    gL: inputs.gL,
    muB_h: inputs.muB_h,
  };
}

export function fromTermSensitivity(value: Dec, s: TermSensitivity, p: TermParamsU): Uncertain {
  const slopes: [Dec, Uncertain][] = [];
  s.energy.forEach((d, i) => slopes.push([d, p.energy[i]!], [s.A[i]!, p.A[i]!], [s.B[i]!, p.B[i]!], [s.gJ[i]!, p.gJ[i]!]));
  slopes.push([s.gI, p.gI], [s.gS, p.gS], [s.gL, p.gL], [s.muB_h, p.muB_h]);
  return derived(value, slopes);
}

/**
 * The fine-structure partners' part β_p of a second-order coefficient as an
 * uncertain number: β_p ∝ (μB/h)²(gS − gL)², so ∂β_p/∂(μB/h) = 2β_p/(μB/h),
 * ∂β_p/∂gS = −∂β_p/∂gL = 2β_p/(gS − gL) (exact); and, given `slopes`
 * (partnerQuadratic.ts partnerQuadraticSlopes: each term ∝ 1/ΔE, so
 * ∂/∂ΔE = −term/ΔE), through the level energies and hyperfine constants A, B
 * of the level (`levelId`) and of each included partner (`partnerIds`, the
 * slopes' order).
 */
export function partnerPartU(
  value: Dec, inputs: SpeciesInputs,
  slopes?: { at: { level: PartnerSlope; partners: PartnerSlope[] }; levelId: string; partnerIds: readonly string[] },
): Uncertain {
  if (value.isZero()) return exact(ZERO);
  const dg = inputs.gS.value.minus(inputs.gL.value);
  const levelSlopes = (id: string, s: PartnerSlope): [Dec, Uncertain][] => {
    const li = inputs.level(id);
    return [[s.energy, li.energy ?? exact(ZERO)], [s.A, li.A], [s.B, li.B]];
  };
  return derived(value, [
    [value.mul(2).div(inputs.muB_h.value), inputs.muB_h],
    [value.mul(2).div(dg), inputs.gS],
    [value.mul(-2).div(dg), inputs.gL],
    ...(slopes ? [...levelSlopes(slopes.levelId, slopes.at.level), ...slopes.at.partners.flatMap((s, i) => levelSlopes(slopes.partnerIds[i]!, s))] : []),
  ]);
}

/** Standard uncertainty, or null when the number is exact. */
export const uOf = (x: Uncertain | null): Dec | null => (x === null ? null : standardUncertainty(x));

const ratDec = (r: Rational): Dec => (r.isZero() ? ZERO : new Dec(r.num.toString()).div(new Dec(r.den.toString())));

/** ∂E_F/∂A and ∂E_F/∂B of a zero-field level (E_F = a·A + b·B, hyperfine.ts; exact). */
function zeroFieldSensitivity(level: HyperfineZeemanLevel, F2: number): LevelSensitivity {
  const { a, b } = hyperfineCoefficients(level.I2, level.J2, F2);
  return { ...NO_SENSITIVITY, A: ratDec(a), B: ratDec(b) };
}

/** What transitionUncertainties needs of one level's results. */
export interface TransitionInputs {
  level: HyperfineZeemanLevel;
  params: LevelParamsU;
  /** Row index of a sublevel in `energies`. */
  rowOf: (s: SublevelLabel) => number;
  /** Uncertain energies, per configured field, per row. */
  energies: Uncertain[][];
  /** The whole second-order coefficient of a sublevel as an uncertain number, null where there is none. */
  quadratic: (s: SublevelLabel) => Uncertain | null;
  /** A field-insensitive point B* > 0 (with its frequency) as uncertain numbers. */
  point: (upper: SublevelLabel, lower: SublevelLabel, tesla: Dec, hz: Dec) => { tesla: Uncertain; hz: Uncertain };
}

/**
 * Standard uncertainties of every transition of a level: zero-field
 * frequency (linear in A, B), first-order sensitivity (analytic, linear in
 * gJ, gI times μB/h), second-order coefficient (difference of the two
 * sublevels' uncertain coefficients), frequency at each field (difference of
 * the uncertain energies, so shared inputs cancel where they should) and
 * field-insensitive points (implicit-function theorem, `point`). B* = 0 is
 * exact when the first-order sensitivity vanishes for every value of the
 * inputs (mF = 0 ↔ mF = 0); an accidental B* = 0 is marked not propagated.
 */
export function transitionUncertainties(x: TransitionInputs, transitions: SublevelTransition[]): TransitionUncertainty[] {
  return transitions.map((t) => {
    const up = x.rowOf(t.upper);
    const lo = x.rowOf(t.lower);
    const zero = fromLevelSensitivity(t.zeroFieldHz, combine(zeroFieldSensitivity(x.level, t.upper.F2), zeroFieldSensitivity(x.level, t.lower.F2), new Dec(-1)), x.params);
    const firstS = combine(linearSlopeSensitivity(x.level, t.upper.F2, t.upper.mF2), linearSlopeSensitivity(x.level, t.lower.F2, t.lower.mF2), new Dec(-1));
    const first = fromLevelSensitivity(t.firstOrder.hzPerTesla, firstS, x.params);
    const qu = x.quadratic(t.upper);
    const ql = x.quadratic(t.lower);
    const second = t.secondOrder && qu && ql ? minus(qu, ql) : null;
    const identicallyFlat = t.upper.mF2 === 0 && t.lower.mF2 === 0;
    return {
      zeroFieldHz: uOf(zero),
      firstOrderHzPerTesla: uOf(first),
      secondOrderHzPerTesla2: second ? uOf(second) : null,
      atFields: x.energies.map((row) => uOf(minus(row[up]!, row[lo]!))),
      fieldInsensitive: t.fieldInsensitive.map((p) => {
        if (p.tesla.isZero()) return identicallyFlat ? { tesla: null, hz: uOf(zero), propagated: true } : { tesla: null, hz: uOf(zero), propagated: false };
        const r = x.point(t.upper, t.lower, p.tesla, p.hz);
        return { tesla: uOf(r.tesla), hz: uOf(r.hz), propagated: true };
      }),
    };
  });
}

/** Key of a hyperfine group or lock point by its doubled F values: "Fl,…|Fu,…". */
export const lockKey = (Fl2: readonly number[], Fu2: readonly number[]): string => `${Fl2.join(",")}|${Fu2.join(",")}`;

/**
 * Uncertainty of every zero-field hyperfine group offset E_Fu − E_Fl (linear
 * in A and B of both levels, hyperfine.ts) and of every crossover, the mean
 * of its two groups' offsets (kept as uncertain numbers, so a shared A
 * counts once), by lockKey. Exact coefficients; worked example: the 87Rb D2
 * group F = 2 → F′ = 3 has offset 9A′/4 + B′/4 − 3A/4, so its u is
 * √((9u(A′)/4)² + (u(B′)/4)² + (3u(A)/4)²). A crossover's pair spacing
 * (the difference of its two groups, where a shared level's constants
 * cancel) is under "spacing " + lockKey.
 */
export function hyperfineOffsetsU(
  I2: number, upper: { J2: number; p: LevelParamsU }, lower: { J2: number; p: LevelParamsU }, points: readonly { Fl2: number[]; Fu2: number[] }[],
): Map<string, Dec | null> {
  const shift = (lv: { J2: number; p: LevelParamsU }, F2: number, sign: number): [Dec, Uncertain][] => {
    const { a, b } = hyperfineCoefficients(I2, lv.J2, F2);
    return [[ratDec(a).mul(sign), lv.p.A], [ratDec(b).mul(sign), lv.p.B]];
  };
  const group = (Fl2: number, Fu2: number) => linear([...shift(upper, Fu2, 1), ...shift(lower, Fl2, -1)]);
  const out = new Map<string, Dec | null>();
  for (const pt of points) {
    const combos = pt.Fl2.flatMap((l) => pt.Fu2.map((u) => group(l, u)));
    const mean = linear(combos.map((g) => [new Dec(1).div(combos.length), g] as [Dec, Uncertain]));
    out.set(lockKey(pt.Fl2, pt.Fu2), uOf(mean));
    // a crossover's pair spacing |a − b| of its two groups (the sign does not change u), under the key with a "spacing" prefix
    if (combos.length === 2) out.set(`spacing ${lockKey(pt.Fl2, pt.Fu2)}`, uOf(minus(combos[0]!, combos[1]!)));
  }
  return out;
}

/** Standard uncertainties of one hyperfine group's gF values and of its components' linear shifts. */
export interface HyperfineGroupU {
  gFu: Dec | null;
  gFl: Dec | null;
  /** u of shiftHzPerT, in the order of the group's components. */
  shiftHzPerT: (Dec | null)[];
}

/**
 * Uncertainties of the weak-field hyperfine pattern (hyperfineLines.ts):
 * gF = wJ·gJ + wI·gI of both levels (Steck eq. 22; weights exact) and each
 * component's shift (gF′·mF′ − gF·mF)·μB/h, built as uncertain numbers from
 * the same gI and μB/h for both levels, so in a stretched component, where
 * gI cancels from the shift, its contribution cancels too. Worked example: the 87Rb D2 cycling
 * component (F = 2, mF = 2 → F′ = 3, mF′ = 3) has shift ((3/2)gJ′ − (1/2)gJ)·μB/h,
 * so its u is μB/h·√((3u(gJ′)/2)² + (u(gJ)/2)²) to first order beside the
 * μB/h part.
 */
export function hyperfineGroupsU(
  I2: number, gI: Uncertain, upper: { J2: number; gJ: Uncertain }, lower: { J2: number; gJ: Uncertain }, muB_h: Uncertain,
  groups: readonly { Fu2: number; Fl2: number; components: readonly { mFu2: number; mFl2: number }[] }[],
): HyperfineGroupU[] {
  const ONE = new Dec(1);
  const gFOf = (lv: { J2: number; gJ: Uncertain }, F2: number): Uncertain | null => {
    const wJ = hyperfineGOf(ONE, ZERO, I2, lv.J2, F2);
    const wI = hyperfineGOf(ZERO, ONE, I2, lv.J2, F2);
    return wJ === null || wI === null ? null : linear([[wJ, lv.gJ], [wI, gI]]);
  };
  return groups.map((g) => {
    const gu = gFOf(upper, g.Fu2);
    const gl = gFOf(lower, g.Fl2);
    const part = (gf: Uncertain | null, m2: number): [Dec, Uncertain][] => (gf === null || m2 === 0 ? [] : [[new Dec(m2).div(2), gf]]);
    return {
      gFu: uOf(gu),
      gFl: uOf(gl),
      shiftHzPerT: g.components.map((c) => {
        const lorentz = linear([...part(gu, c.mFu2), ...part(gl, c.mFl2).map(([k, x]) => [k.neg(), x] as [Dec, Uncertain])]);
        return uOf(times(lorentz, muB_h));
      }),
    };
  });
}

/** √(a² + b²) of two independent standard uncertainties (null: exact). */
export function rss(a: Dec | null | undefined, b: Dec | null | undefined): Dec | null {
  if (!a && !b) return null;
  return (a ?? ZERO).pow(2).plus((b ?? ZERO).pow(2)).sqrt();
}
