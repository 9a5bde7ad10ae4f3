/**
 * How far the linear (weak-field) Zeeman description of a hyperfine level
 * can be trusted, and the field scale of the hyperfine Paschen–Back regime.
 *
 * Linear shift of |F mF⟩: (μB/h)·gF·mF·B (hyperfine.ts gF, 0 for F = 0).
 * Exact shift: E(B) − E(0) from hyperfineZeeman.ts. The validity field of a
 * criterion is the lowest field at which some sublevel first breaks it:
 *  - relative: |linear − exact| ≤ tolerance·|exact| (default 1 %). Sublevels
 *    whose linear shift is zero (mF = 0 or gF = 0) are left out: their whole
 *    shift is non-linear, so a relative test of a linear shift means nothing
 *    for them; the absolute criterion covers them.
 *  - absolute: |linear − exact| ≤ tolerance (default 1 kHz), every sublevel.
 * Method: sample the fields 1, 1.5, 2, 3, 5, 7 × 10^k T from 1e-9 T up to
 * maxTesla (default 10 T), take the first sample that breaks the criterion,
 * and bisect between it and the sample before (or 0) to 1e-9 relative.
 * A violation that starts and ends between two samples would be missed;
 * the deviations grow smoothly (∝ B² at first), so this is not expected.
 * Exact: no, and float-derived. The energies of this search come from the
 * float64 twin of the solver (hyperfineZeemanFloat.ts), not from the Dec
 * solver: a validity field is a threshold, not a tabulated value, and
 * float64 resolves E(B) − E(0) to ~1e-15 of the level's largest |E|
 * (deviations below 1e-13 of it are not counted as breaking a criterion).
 * The returned field is the float bisection result rounded to 7 significant
 * digits (a sample field is returned as given); trust about 6. The tolerances
 * are used as float64 numbers. `null` means "beyond range": never broken up
 * to maxTesla. paschenBackTesla is exact-decimal. A level whose F levels
 * are degenerate at zero field (A = B = 0, as for a level of a species with
 * nuclear spin that lists no hyperfine constants) is mixed at first order
 * by any field, so gF·mF fails from the start: its limits are 0 T as soon
 * as the first sample breaks the criterion.
 *
 * Paschen–Back field: B_PB = ΔE_max / ((μB/h)·|gJ|), with ΔE_max the largest
 * zero-field splitting between F levels adjacent in energy. For J = 1/2 this
 * is A(I + 1/2)/((μB/h)·gJ), the field at which the electron's Zeeman energy
 * per unit mJ equals the hyperfine splitting. null without at least two F
 * levels, with gJ = 0, or when all F levels coincide (A = B = 0).
 * Reference: A. Corney, "Atomic and Laser Spectroscopy" (Oxford, 1977), ch. 16.
 *
 * Worked example: 87Rb 5²S1/2 (A = 3417.341305452145 MHz, gJ = 2.00233113,
 * μB/h = 13996244917.1 Hz/T): B_PB = 6834.68261090429 MHz / (13996244917.1 Hz/T
 * × 2.00233113) = 0.2438770… T.
 */
import { Dec, ZERO } from "../decimal.js";
import { fValues, gF, hyperfineShift } from "../hyperfine.js";
import { prepareHyperfineZeeman, type HyperfineZeemanLevel, type PreparedLevel } from "./hyperfineZeeman.js";
import { hyperfineZeemanFloatSolver } from "./hyperfineZeemanFloat.js";

export interface ValidityOptions {
  /** Relative tolerance, default 0.01. */
  relative?: Dec;
  /** Absolute tolerance in Hz, default 1000. */
  absoluteHz?: Dec;
  /** Upper end of the search in tesla, default 10. */
  maxTesla?: Dec;
}

export interface ValidityLimit {
  /** Field (T) where the criterion is first broken; null = beyond range. */
  tesla: Dec | null;
  /** The sublevel that breaks it first. */
  sublevel: { F2: number; mF2: number } | null;
}

export interface LinearValidity {
  relative: ValidityLimit;
  absolute: ValidityLimit;
  maxTesla: Dec;
  /** Paschen–Back field scale B_PB in tesla, or null. */
  paschenBackTesla: Dec | null;
}

/** B_PB = ΔE_max/((μB/h)|gJ|) (see the module comment). */
export function paschenBackField(level: HyperfineZeemanLevel): Dec | null {
  const B = level.I2 >= 2 && level.J2 >= 2 ? level.B : ZERO;
  const e = fValues(level.I2, level.J2).map((F2) => hyperfineShift(level.A, B, level.I2, level.J2, F2));
  if (e.length < 2 || level.gJ.isZero()) return null;
  e.sort((x, y) => x.cmp(y));
  let max = ZERO;
  for (let k = 1; k < e.length; k++) if (e[k]!.minus(e[k - 1]!).gt(max)) max = e[k]!.minus(e[k - 1]!);
  return max.isZero() ? null : max.div(level.muB_h.mul(level.gJ.abs()));
}

const STEPS = ["1", "1.5", "2", "3", "5", "7"];

/** Field samples 1e-9 T … max (inclusive), ascending. */
export function validitySamples(max: Dec): Dec[] {
  const out: Dec[] = [];
  for (let k = -9; ; k++) {
    for (const s of STEPS) {
      const b = new Dec(`${s}e${k}`);
      if (b.gte(max)) {
        out.push(max);
        return out;
      }
      out.push(b);
    }
  }
}

/** Doubled (F, mF) of every sublevel in the solvers' output order. */
function sublevelLabels(prepared: PreparedLevel): { F2: number; mF2: number }[] {
  const labels: { F2: number; mF2: number }[] = new Array(prepared.size);
  for (const b of prepared.blocks) b.outIndex.forEach((pos, k) => (labels[pos] = { F2: b.fByRank[k]!, mF2: b.M2 }));
  return labels;
}

/** Float64 round-off allowance on E(B) − E(0): deviations below it are not counted as breaking a criterion. */
const FLOAT_FLOOR = 1e-13;

/** Linear-shift validity fields and Paschen–Back scale of a level. */
export function linearValidity(level: HyperfineZeemanLevel, options: ValidityOptions = {}): LinearValidity {
  const rel = (options.relative ?? new Dec("0.01")).toNumber();
  const absHz = (options.absoluteHz ?? new Dec("1000")).toNumber();
  const maxTesla = options.maxTesla ?? new Dec("10");
  const prepared = prepareHyperfineZeeman(level);
  const solve = hyperfineZeemanFloatSolver(prepared);
  const labels = sublevelLabels(prepared);
  const zero = solve(0);
  const slopes = labels.map((s) => {
    const g = gF(level.gJ, level.gI, level.I2, level.J2, s.F2);
    return g === null ? 0 : level.muB_h.mul(g).mul(s.mF2).div(2).toNumber();
  });
  let zeroMax = 0;
  for (const e of zero.energy) zeroMax = Math.max(zeroMax, Math.abs(e));
  // index of the first sublevel breaking each criterion at field b, or -1
  const check = (b: number): [number, number] => {
    const { energy } = solve(b);
    let big = zeroMax;
    for (const e of energy) big = Math.max(big, Math.abs(e));
    const floor = FLOAT_FLOOR * big;
    let r = -1;
    let a = -1;
    for (let i = 0; i < energy.length && (r < 0 || a < 0); i++) {
      const exact = energy[i]! - zero.energy[i]!;
      const err = Math.abs(slopes[i]! * b - exact) - floor;
      if (a < 0 && err > absHz) a = i;
      if (r < 0 && slopes[i] !== 0 && err > rel * Math.abs(exact)) r = i;
    }
    return [r, a];
  };
  const samples = validitySamples(maxTesla);
  // F levels degenerate at zero field (A = B = 0 with J, I > 0): any field mixes them at first order,
  // so gF·mF describes nothing beyond B = 0 unless it happens to match.
  const degenerate = hasDegenerateF(level);
  const limit = (which: 0 | 1): ValidityLimit => {
    let lo = 0;
    for (const sample of samples) {
      const b = sample.toNumber();
      if (check(b)[which] >= 0) {
        if (degenerate && lo === 0) {
          const s = labels[check(b)[which]]!;
          return { tesla: ZERO, sublevel: { F2: s.F2, mF2: s.mF2 } };
        }
        let hi = b;
        while (hi - lo > hi * 1e-9) {
          const mid = (lo + hi) / 2;
          if (!(mid > lo && mid < hi)) break;
          if (check(mid)[which] >= 0) hi = mid;
          else lo = mid;
        }
        const s = labels[check(hi)[which]]!;
        const tesla = hi === b ? sample : new Dec(hi.toPrecision(REPORTED_DIGITS));
        return { tesla, sublevel: { F2: s.F2, mF2: s.mF2 } };
      }
      lo = b;
    }
    return { tesla: null, sublevel: null };
  };
  return { relative: limit(0), absolute: limit(1), maxTesla, paschenBackTesla: paschenBackField(level) };
}

/** True when two different F levels of the level share one zero-field energy exactly. */
function hasDegenerateF(level: HyperfineZeemanLevel): boolean {
  const B = level.I2 >= 2 && level.J2 >= 2 ? level.B : ZERO;
  const e = fValues(level.I2, level.J2).map((F2) => hyperfineShift(level.A, B, level.I2, level.J2, F2));
  return e.some((x, i) => e.some((y, j) => j > i && x.eq(y)));
}

/** Significant digits kept of a float64-bisected validity field (good to about 6). */
const REPORTED_DIGITS = 7;
