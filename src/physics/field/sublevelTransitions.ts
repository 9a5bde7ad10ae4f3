/**
 * Transitions between the hyperfine–Zeeman sublevels of one level
 * (radio-frequency and microwave lines), with their field dependence.
 *
 * Which pairs: magnetic-dipole lines ΔF = 0, ±1 with ΔmF = 0, ±1, except
 * ΔF = 0 with ΔmF = 0 (no transition); and two-photon lines ΔmF = ±2 between
 * different F with |ΔF| ≤ 2 (two magnetic-dipole steps). Reference for the
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
 * β′ − β (quadraticZeeman.ts, exact, null when perturbation theory fails);
 * the exact frequency at each requested field (hyperfineZeeman.ts); and each
 * field-insensitive point df/dB = 0 in (fromTesla, toTesla), default
 * (1e-8 T, 1 T). Method: df/dB from the Hellmann–Feynman slopes of the
 * exact eigenstates, sampled on a geometric grid (default 20 points per
 * decade); each sign change is refined by the Illinois variant of regula
 * falsi to 1e-25 relative in B. Two roots closer than one grid step, or a
 * double root (df/dB touching zero), would be missed. Not exact: the point
 * is found to ~25 digits of the exact Hamiltonian's value.
 *
 * Worked example: 87Rb 5²S1/2 (A = 3417.341305452145 MHz, gJ = 2.00233113,
 * gI = −0.0009951414, μB/h = 13996244917.1 Hz/T): the two-photon line
 * |F=1, mF=−1⟩ ↔ |F=2, mF=1⟩ has zero-field frequency 2A = 6834.68261090429 MHz,
 * first-order sensitivity (μB/h)(gF(2) + gF(1)) = (μB/h)·2gI = −2785.6485523… Hz/G,
 * and a field-insensitive point at 3.228917 G.
 */
import { Dec, ZERO } from "../decimal.js";
import { fValues, gF, hyperfineShift } from "../hyperfine.js";
import { hyperfineZeemanSolver, type FieldState, type HyperfineZeemanLevel } from "./hyperfineZeeman.js";
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
}

const GAUSS = new Dec("1e-4");
const GAUSS2 = new Dec("1e-8");
const REL_TOL = new Dec("1e-25");

interface Pair {
  lo: number;
  up: number;
  kind: SublevelTransition["kind"];
}

/** Every line of the level (see the module comment), with frequencies at `fields` (tesla, ≥ 0). */
export function sublevelTransitions(level: HyperfineZeemanLevel, fields: readonly Dec[], options: TransitionOptions = {}): SublevelTransition[] {
  const { I2, J2 } = level;
  const Bq = I2 >= 2 && J2 >= 2 ? level.B : ZERO;
  const solve = hyperfineZeemanSolver(level);
  const labels: SublevelLabel[] = [];
  for (const F2 of fValues(I2, J2)) for (let mF2 = -F2; mF2 <= F2; mF2 += 2) labels.push({ F2, mF2 });
  const e0 = labels.map((s) => hyperfineShift(level.A, Bq, I2, J2, s.F2));
  const lin = labels.map((s) => {
    const g = gF(level.gJ, level.gI, I2, J2, s.F2);
    return g === null ? ZERO : level.muB_h.mul(g).mul(s.mF2).div(2);
  });
  const quad = labels.map((s) => quadraticZeemanCoefficient(level, s.F2, s.mF2));
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
      if (dM === 4 && dF >= 2 && dF <= 4) kind = "two-photon";
      if (!kind) continue;
      const [lo, up] = higher(i, j) > 0 ? [j, i] : [i, j];
      pairs.push({ lo, up, kind });
    }
  }
  // states come back from the solver in the same (F, mF) order as `labels`
  const freq = (s: FieldState[], p: Pair) => s[p.up]!.energy.minus(s[p.lo]!.energy);
  const deriv = (s: FieldState[], p: Pair) => s[p.up]!.slope.minus(s[p.lo]!.slope);
  const atFields = fields.map((b) => ({ tesla: b, states: solve(b) }));

  // field-insensitive points: grid scan shared by all lines, then refinement per bracket
  const from = options.fromTesla ?? new Dec("1e-8");
  const to = options.toTesla ?? new Dec("1");
  const perDecade = options.pointsPerDecade ?? 20;
  const ratio = new Dec(10).pow(new Dec(1).div(perDecade));
  const grid: { b: Dec; d: Dec[] }[] = [];
  for (let b = from; b.lte(to); b = b.mul(ratio)) {
    const s = solve(b);
    grid.push({ b, d: pairs.map((p) => deriv(s, p)) });
  }
  const roots: FieldInsensitivePoint[][] = pairs.map((p, k) => {
    const found: FieldInsensitivePoint[] = [];
    for (let g = 1; g < grid.length; g++) {
      const d0 = grid[g - 1]!.d[k]!;
      const d1 = grid[g]!.d[k]!;
      if (d0.isZero() || d0.isNegative() === d1.isNegative() || d1.isZero()) continue;
      const b = illinois((x) => deriv(solve(x), p), grid[g - 1]!.b, d0, grid[g]!.b, d1);
      found.push({ tesla: b, hz: freq(solve(b), p) });
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
      fieldInsensitive: roots[k]!,
    };
  });
}

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
