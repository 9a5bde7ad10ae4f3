/**
 * Transitions between the hyperfine–Zeeman sublevels of one level
 * (radio-frequency and microwave lines), with their field dependence.
 *
 * Which pairs: magnetic-dipole lines ΔF = 0, ±1 with ΔmF = 0, ±1, except
 * ΔF = 0 with ΔmF = 0 (no transition); and two-photon lines ΔmF = ±2 with
 * |ΔF| ≤ 2, ΔF = 0 included (two magnetic-dipole steps, each |ΔF| ≤ 1 and
 * |ΔmF| = 1). Reference for the
 * selection rules: A. Corney, "Atomic and Laser Spectroscopy" (Oxford, 1977),
 * ch. 4 and 16.
 *
 * Orientation: `upper` is the sublevel higher at zero field; for pairs
 * degenerate at zero field (ΔF = 0) it is the one with the larger first-order
 * slope gF·mF (then larger mF). All frequencies are upper minus lower, so
 * zero-field frequencies are ≥ 0; at high field a frequency may change sign
 * where the two sublevels cross.
 *
 * For each line: zero-field frequency (exact, hyperfine.ts); first-order
 * sensitivity (μB/h)(gF′mF′ − gF·mF) (exact); second-order sensitivity
 * β′ − β (quadraticZeeman.ts, plus the caller's `quadraticExtra` such as
 * the fine-structure partners' part; null when perturbation theory fails);
 * the exact frequency at each requested field (hyperfineZeeman.ts, exact
 * Dec solve); and each field-insensitive point df/dB = 0: B = 0 itself when
 * the first-order sensitivity vanishes exactly (mF = 0 ↔ mF = 0 clock lines,
 * and any pair with gF′mF′ = gF·mF), then every root in (fromTesla, toTesla),
 * default (1e-8 T, 1 T).
 *
 * Method for the field-insensitive points: df/dB is the difference of the
 * Hellmann–Feynman slopes. It is sampled on a geometric grid (default 20
 * points per decade) with the float64 twin of the solver
 * (hyperfineZeemanFloat.ts); each sign change is narrowed in float64 by
 * safeguarded Newton steps (analytic second derivative from perturbation
 * theory, bisection as the fallback) to float resolution, ~1e-13 relative.
 * From there Dec takes over: Newton steps whose df/dB is computed in Dec
 * (floatSeededSublevel.ts: the two sublevels' energies and slopes from the
 * Dec Hamiltonian, refined from the float eigenvectors) and whose second
 * derivative, needed only roughly, is the float one; it stops when a step
 * is below 1e-25 relative in B (usually after two Dec evaluations). If that
 * does not converge, Illinois regula falsi on the full Dec solve finishes
 * the bracket. Sign changes of df/dB smaller than 1e-12·(μB/h)·max|gJ·mJ +
 * gI·mI| at both grid ends are taken as float noise and skipped. Two roots
 * closer than one grid step, or a double root (df/dB touching zero), would
 * be missed. Not exact: the point's field is exact-decimal to ~1e-25
 * relative (Dec-refined; float64 only locates it), and its frequency is the
 * Dec frequency at the last Dec evaluation corrected by f′·Δ/2, good to
 * ~1e-30 relative. Grid and bracketing are float-derived, so a root whose
 * df/dB changes sign only below float64 resolution would be missed.
 *
 * Worked example: 87Rb 5²S1/2 (A = 3417.341305452145 MHz, gJ = 2.00233113,
 * gI = −0.0009951414, μB/h = 13996244917.1 Hz/T): the two-photon line
 * |F=1, mF=−1⟩ ↔ |F=2, mF=1⟩ has zero-field frequency 2A = 6834.68261090429 MHz,
 * first-order sensitivity (μB/h)(gF(2) + gF(1)) = (μB/h)·2gI = −2785.6485523… Hz/G,
 * and a field-insensitive point at 3.228917 G.
 */
import { Dec, ZERO } from "../decimal.js";
import { fValues, gF, hyperfineShift } from "../hyperfine.js";
import { prepareHyperfineZeeman, solverForPrepared, type FieldState, type HyperfineZeemanLevel, type PreparedBlock, type PreparedLevel } from "./hyperfineZeeman.js";
import { curvatureFloat, hyperfineZeemanFloatSolver, solveBlockFloat, type FloatBlockSolution } from "./hyperfineZeemanFloat.js";
import { refineSublevel, type RefinedSublevel } from "./floatSeededSublevel.js";
import { quadraticZeemanCoefficient } from "./quadraticZeeman.js";

export interface SublevelLabel {
  F2: number;
  mF2: number;
}

export interface FieldInsensitivePoint {
  tesla: Dec;
  /** Frequency there, Hz. */
  hz: Dec;
}

export interface SublevelTransition {
  lower: SublevelLabel;
  upper: SublevelLabel;
  kind: "magnetic-dipole" | "two-photon";
  /** Doubled mF(upper) − mF(lower). */
  deltaMF2: number;
  /** Frequency at B = 0, Hz (≥ 0). */
  zeroFieldHz: Dec;
  /** df/dB at B = 0. */
  firstOrder: { hzPerTesla: Dec; hzPerGauss: Dec };
  /** Coefficient of B² in f; null when perturbation theory fails. */
  secondOrder: { hzPerTesla2: Dec; hzPerGauss2: Dec } | null;
  /** Exact frequency at each requested field, in the order given. */
  atFields: { tesla: Dec; hz: Dec }[];
  /** Field-insensitive points df/dB = 0, ascending field. */
  fieldInsensitive: FieldInsensitivePoint[];
}

export interface TransitionOptions {
  fromTesla?: Dec;
  toTesla?: Dec;
  pointsPerDecade?: number;
  /**
   * The caller's own hyperfineZeemanSolver(level) results at each of `fields`,
   * same order, to be used instead of solving again (the exact solves are
   * most of the cost when a caller tabulates energies at the same fields).
   */
  statesAtFields?: readonly (readonly FieldState[])[];
  /**
   * A further second-order coefficient (Hz/T²) per sublevel, added to the
   * within-level one of quadraticZeeman.ts: the fine-structure partners'
   * part (partnerQuadratic.ts). Null where it fails; absent means 0.
   */
  quadraticExtra?: (F2: number, mF2: number) => Dec | null;
}

const GAUSS = new Dec("1e-4");
const GAUSS2 = new Dec("1e-8");
const REL_TOL = new Dec("1e-25");

interface Slot {
  block: PreparedBlock;
  rank: number;
}

interface Pair {
  lo: number;
  up: number;
  kind: SublevelTransition["kind"];
}

/** The transition list of a level: sublevel labels in the solvers' (F, mF) order, and the pairs. */
export interface TransitionPairs {
  /** Every sublevel, sorted by F then mF (doubled values ascending): the order of both solvers' output. */
  labels: SublevelLabel[];
  /** Zero-field energy of each label, Hz (exact, hyperfine.ts). */
  zeroField: Dec[];
  /** First-order slope (μB/h)·gF·mF of each label, Hz/T (exact). */
  linear: Dec[];
  /** Each line: indices of its lower and upper sublevel into `labels`, and its kind. */
  pairs: { lo: number; up: number; kind: SublevelTransition["kind"] }[];
}

/**
 * Which sublevel pairs of a level are transitions, and which end is the upper
 * one (selection rules and orientation in the module comment). Shared by
 * sublevelTransitions and by the field calculator (src/engine/), so both list
 * the same lines in the same order. Exact (Rational/Dec comparisons).
 *
 * Worked example: 87Rb 5²S1/2 (F = 1, 2) has 23 lines: 15 magnetic-dipole
 * (4 within F = 2, 2 within F = 1, 9 between F = 1 and 2 with ΔmF = 0, ±1)
 * and 8 two-photon ones (ΔmF = ±2: 4 between F = 1 and 2, 3 within F = 2,
 * 1 within F = 1); the first listed
 * has lower |F=1, mF=0⟩ and upper |F=1, mF=−1⟩ (gF(1) < 0).
 */
export function sublevelTransitionPairs(level: HyperfineZeemanLevel): TransitionPairs {
  const { I2, J2 } = level;
  const Bq = I2 >= 2 && J2 >= 2 ? level.B : ZERO;
  const labels: SublevelLabel[] = [];
  for (const F2 of fValues(I2, J2)) for (let mF2 = -F2; mF2 <= F2; mF2 += 2) labels.push({ F2, mF2 });
  const e0 = labels.map((s) => hyperfineShift(level.A, Bq, I2, J2, s.F2));
  const lin = labels.map((s) => {
    const g = gF(level.gJ, level.gI, I2, J2, s.F2);
    return g === null ? ZERO : level.muB_h.mul(g).mul(s.mF2).div(2);
  });
  const higher = (i: number, j: number) => e0[i]!.cmp(e0[j]!) || lin[i]!.cmp(lin[j]!) || labels[i]!.mF2 - labels[j]!.mF2;
  const pairs: Pair[] = [];
  for (let i = 0; i < labels.length; i++) {
    for (let j = i + 1; j < labels.length; j++) {
      const a = labels[i]!;
      const b = labels[j]!;
      const dF = Math.abs(a.F2 - b.F2);
      const dM = Math.abs(a.mF2 - b.mF2);
      let kind: Pair["kind"] | null = null;
      if (dF <= 2 && dM <= 2 && !(dF === 0 && dM === 0)) kind = "magnetic-dipole";
      if (dM === 4 && dF <= 4) kind = "two-photon";
      if (!kind) continue;
      const [lo, up] = higher(i, j) > 0 ? [j, i] : [i, j];
      pairs.push({ lo, up, kind });
    }
  }
  return { labels, zeroField: e0, linear: lin, pairs };
}

/** Every line of the level (see the module comment), with frequencies at `fields` (tesla, ≥ 0). */
export function sublevelTransitions(level: HyperfineZeemanLevel, fields: readonly Dec[], options: TransitionOptions = {}): SublevelTransition[] {
  const prepared = prepareHyperfineZeeman(level);
  const solve = solverForPrepared(prepared);
  // block and rank of each sublevel, indexed like `labels`
  const where: Slot[] = new Array(prepared.size);
  for (const b of prepared.blocks) b.outIndex.forEach((pos, rank) => (where[pos] = { block: b, rank }));
  const { labels, zeroField: e0, linear: lin, pairs } = sublevelTransitionPairs(level);
  const quad = labels.map((s) => {
    const own = quadraticZeemanCoefficient(level, s.F2, s.mF2);
    const extra = options.quadraticExtra ? options.quadraticExtra(s.F2, s.mF2) : ZERO;
    return own === null || extra === null ? null : own.plus(extra);
  });
  // states come back from the solvers in the same (F, mF) order as `labels`
  const given = options.statesAtFields;
  if (given && (given.length !== fields.length || given.some((st) => st.length !== prepared.size))) {
    throw new RangeError("statesAtFields must hold one full solve per field");
  }
  const atFields = fields.map((b, i) => ({ tesla: b, states: given?.[i] ?? solve(b) }));

  // field-insensitive points: float64 grid scan shared by all lines, float bracketing, Dec refinement per root
  const from = options.fromTesla ?? new Dec("1e-8");
  const to = options.toTesla ?? new Dec("1");
  const perDecade = options.pointsPerDecade ?? 20;
  const fromF = from.toNumber();
  const steps = Math.floor(Math.log10(to.toNumber() / fromF) * perDecade + 1e-9);
  const gridB = Array.from({ length: steps + 1 }, (_, g) => fromF * 10 ** (g / perDecade));
  const fsolve = hyperfineZeemanFloatSolver(prepared);
  const grid = gridB.map((b) => {
    const st = fsolve(b);
    return pairs.map((p) => st.slope[p.up]! - st.slope[p.lo]!);
  });
  // sign changes smaller than float64 can tell from zero are noise, not roots
  let gMax = 0;
  for (const b of prepared.blocks) for (const zf of b.floatZeeman) gMax = Math.max(gMax, Math.abs(zf));
  const noise = 1e-12 * prepared.floatMuB_h * gMax;
  const roots: FieldInsensitivePoint[][] = pairs.map((p, k) => {
    const found: FieldInsensitivePoint[] = [];
    for (let g = 1; g < grid.length; g++) {
      const d0 = grid[g - 1]![k]!;
      const d1 = grid[g]![k]!;
      if (d0 === 0 || d1 === 0 || d0 < 0 === d1 < 0 || Math.max(Math.abs(d0), Math.abs(d1)) <= noise) continue;
      found.push(refineRoot(prepared, where[p.up]!, where[p.lo]!, gridB[g - 1]!, d0, gridB[g]!, d1, (x) => solve(x), p));
    }
    return found;
  });

  return pairs.map((p, k) => {
    const first = lin[p.up]!.minus(lin[p.lo]!);
    const qu = quad[p.up]!;
    const ql = quad[p.lo]!;
    const second = qu === null || ql === null ? null : qu.minus(ql);
    return {
      lower: labels[p.lo]!,
      upper: labels[p.up]!,
      kind: p.kind,
      deltaMF2: labels[p.up]!.mF2 - labels[p.lo]!.mF2,
      zeroFieldHz: e0[p.up]!.minus(e0[p.lo]!),
      firstOrder: { hzPerTesla: first, hzPerGauss: first.mul(GAUSS) },
      secondOrder: second === null ? null : { hzPerTesla2: second, hzPerGauss2: second.mul(GAUSS2) },
      atFields: atFields.map(({ tesla, states }) => ({ tesla, hz: freq(states, p) })),
      // df/dB at B = 0 is the first-order sensitivity: when it vanishes, B = 0 is a field-insensitive point
      fieldInsensitive: first.isZero() ? [{ tesla: ZERO, hz: e0[p.up]!.minus(e0[p.lo]!) }, ...roots[k]!] : roots[k]!,
    };
  });
}

/**
 * The field-insensitive point of one line between grid fields a < b where
 * df/dB (float64 values da, db) changes sign. First in float64: safeguarded
 * Newton (bisection when a step leaves the bracket) with the analytic
 * curvature, to float resolution. Then in Dec: Newton steps with Dec df/dB
 * from refineSublevel and the float curvature, until a step is below
 * REL_TOL·B; converging from a float root good to ~1e-13 this takes two Dec
 * evaluations. Should that fail (no convergence in MAX_DEC_STEPS, a step
 * leaving the bracket, a float gap of zero), Illinois on the full Dec solve
 * takes over. The frequency is f at the last evaluation plus the half-step
 * Taylor correction f′·Δ/2, the value at the root to O(f″·Δ²).
 */
function refineRoot(
  prepared: PreparedLevel, up: Slot, lo: Slot, a: number, da: number, b: number, db: number,
  solve: (x: Dec) => FieldState[], p: Pair,
): FieldInsensitivePoint {
  const floatAt = (x: number) => {
    const su = solveBlockFloat(prepared, up.block, x);
    const sl = up.block === lo.block ? su : solveBlockFloat(prepared, lo.block, x);
    return { su, sl };
  };
  const curvature = (su: FloatBlockSolution, sl: FloatBlockSolution) =>
    curvatureFloat(prepared, up.block, su, up.rank) - curvatureFloat(prepared, lo.block, sl, lo.rank);
  // the grid bracket: the float stage narrows a and b to float resolution, which Dec may legitimately step past
  const lowD = new Dec(a.toPrecision(17));
  const highD = new Dec(b.toPrecision(17));
  // float stage
  let x = a - (da * (b - a)) / (db - da);
  for (let it = 0; it < 100; it++) {
    const { su, sl } = floatAt(x);
    const d = su.slopes[up.rank]! - sl.slopes[lo.rank]!;
    if (d === 0) break;
    if (d < 0 === da < 0) { a = x; da = d; } else { b = x; db = d; }
    let next = x - d / curvature(su, sl);
    if (!(next > a && next < b)) next = (a + b) / 2;
    const done = Math.abs(next - x) <= 4e-16 * x || b - a <= 4e-16 * b;
    x = next;
    if (done) break;
  }
  // Dec stage
  let B = new Dec(x.toPrecision(17));
  for (let it = 0; it < MAX_DEC_STEPS; it++) {
    const bf = B.toNumber();
    const { su, sl } = floatAt(bf);
    const scale = prepared.muB_h.mul(B);
    const u: RefinedSublevel = refineSublevel(prepared, up.block, scale, su, up.rank);
    const l: RefinedSublevel = refineSublevel(prepared, lo.block, scale, sl, lo.rank);
    const d = u.slope.minus(l.slope);
    const stepF = -d.toNumber() / curvature(su, sl);
    if (!Number.isFinite(stepF)) break;
    const step = new Dec(stepF.toPrecision(17));
    const next = B.plus(step);
    if (next.lt(lowD) || next.gt(highD)) break;
    if (step.abs().lte(next.abs().mul(REL_TOL))) {
      return { tesla: next, hz: u.energy.minus(l.energy).plus(d.mul(step).div(2)) };
    }
    B = next;
  }
  const dA = deriv(solve(lowD), p);
  const dB = deriv(solve(highD), p);
  const root = illinois((t) => deriv(solve(t), p), lowD, dA, highD, dB);
  return { tesla: root, hz: freq(solve(root), p) };
}

const freq = (s: readonly FieldState[], p: Pair) => s[p.up]!.energy.minus(s[p.lo]!.energy);
const deriv = (s: FieldState[], p: Pair) => s[p.up]!.slope.minus(s[p.lo]!.slope);
const MAX_DEC_STEPS = 6;

/** Root of f in [a, b] with f(a), f(b) of opposite sign: Illinois regula falsi to REL_TOL. */
function illinois(f: (x: Dec) => Dec, a: Dec, fa: Dec, b: Dec, fb: Dec): Dec {
  let side = 0;
  for (let it = 0; it < 200; it++) {
    const c = a.mul(fb).minus(b.mul(fa)).div(fb.minus(fa));
    if (b.minus(a).abs().lte(c.abs().mul(REL_TOL))) return c;
    const fc = f(c);
    if (fc.isZero()) return c;
    if (fc.isNegative() === fb.isNegative()) {
      b = c;
      fb = fc;
      if (side === -1) fa = fa.div(2);
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb = fb.div(2);
      side = 1;
    }
  }
  return a.plus(b).div(2);
}
