/**
 * Transitions between the sublevels of one level that belongs to a term
 * whose fine-structure partners are listed: the same list, orientation and
 * zero-field, first- and second-order numbers as sublevelTransitions.ts,
 * with the frequencies at the fields and the field-insensitive points taken
 * from the term solver (termHyperfineZeeman.ts: |J mJ mI⟩ over the listed J,
 * hyperfine within each J, Zeeman coupling between the J levels from the LS
 * structure; hyperfine matrix elements between different J not included).
 *
 * Formula: f(B) = E_up(B) − E_lo(B), both eigenvalues of the term
 * Hamiltonian (see termHyperfineZeeman.ts), from the level's listed energy;
 * df/dB the difference of the Hellmann–Feynman slopes. At B = 0 the term
 * Hamiltonian is the level's own hyperfine structure, so the zero-field
 * frequency and the first-order sensitivity (μB/h)(gF′mF′ − gF·mF) are those
 * of the level alone (exact, hyperfine.ts); the second-order one is the
 * level's own part (quadraticZeeman.ts) plus the caller's `quadraticExtra`
 * (the partners' part, partnerQuadratic.ts), the same perturbation theory
 * the term solver's curvature at B = 0 follows.
 * Selection rules: as sublevelTransitions.ts (sublevelTransitionPairs):
 * magnetic-dipole ΔF = 0, ±1, ΔmF = 0, ±1 (not ΔF = ΔmF = 0) and two-photon
 * ΔmF = ±2, |ΔF| ≤ 2. Reference: A. Corney, "Atomic and Laser Spectroscopy"
 * (Oxford, 1977), ch. 4 and 16.
 *
 * Field-insensitive points: B = 0 when the first-order sensitivity vanishes,
 * then every sign change of df/dB on a geometric grid (20 points per decade
 * by default, from 1e-8 T to `toTesla`) of the float64 twin
 * (termHyperfineZeemanFloat.ts), narrowed in float64 by bisection to float
 * resolution and finished in Dec by Newton steps on df/dB, each sublevel's
 * slope refined in Dec from its block's float64 eigenpairs (first-order
 * eigenvector correction, as floatSeededSublevel.ts does for one J), with
 * d²f/dB² from second-order perturbation theory in float64, until a step is
 * below 1e-25 of B; Illinois regula falsi on the full Dec solve of the two
 * sublevels' M blocks (solveTermBlock) over the grid bracket if the Newton
 * steps do not settle. As in sublevelTransitions.ts,
 * sign changes smaller than 1e-12·(μB/h)·(largest Zeeman matrix element)
 * are float noise and skipped, and two roots within one grid step would be
 * missed.
 * Exact: no. Frequencies at the fields are the term solver's (Dec, ~1e-44 of
 * the block's norm); a point's field is good to about 1e-25 relative, its
 * frequency to the Dec solve there.
 *
 * Worked example: 87Rb 5²P3/2 (I = 3/2, A = 84.7185 MHz, B = 12.4965 MHz,
 * gJ = 1.3362) with 5²P1/2 (A = 408.328 MHz) listed 7.1230 THz below it:
 * the line |F=2, mF=0⟩ ↔ |F=3, mF=0⟩ has zero-field frequency 3A + B =
 * 266.652 MHz and no first-order sensitivity (gF·0 on both sides), so B = 0
 * is its first field-insensitive point, and the second lies at 121.7245 G
 * (121.7242 G with 5²P3/2 alone); at 0.37 T it is at 6754.7196 MHz, 0.84 MHz
 * below the single-J value, as a 50-digit whole-term diagonalization gives
 * (test/fixtures/field/calculator-mpmath.json).
 */
import { Dec, ZERO } from "../decimal.js";
import type { HyperfineZeemanLevel } from "./hyperfineZeeman.js";
import { quadraticZeemanCoefficient } from "./quadraticZeeman.js";
import { sublevelTransitionPairs, type FieldInsensitivePoint, type SublevelTransition } from "./sublevelTransitions.js";
import { solveTermBlock, termBlockFloatEigen, type PreparedTerm, type TermBlock, type TermFieldState } from "./termHyperfineZeeman.js";
import { termHyperfineZeemanFloatSolver } from "./termHyperfineZeemanFloat.js";

export interface TermTransitionOptions {
  fromTesla?: Dec;
  toTesla?: Dec;
  pointsPerDecade?: number;
  /** Second-order coefficient (Hz/T²) from the listed partners per sublevel; null where it fails; absent means 0. */
  quadraticExtra?: (F2: number, mF2: number) => Dec | null;
}

const GAUSS = new Dec("1e-4");
const GAUSS2 = new Dec("1e-8");
const REL_TOL = new Dec("1e-25");
const MAX_NEWTON = 8;

/**
 * Every transition of level number `index` of the prepared term (see the
 * module comment). `level` is that level's single-J description (J, I, gJ,
 * gI, A, B, μB/h: the same inputs the term was prepared with), which gives
 * the list of pairs and the zero-field and perturbative numbers;
 * `statesAtFields` the term solver's states of this level at each of
 * `fields` (same order), sorted by F then mF as the solver returns them.
 * Worked example: in the module comment.
 */
export function termSublevelTransitions(
  prepared: PreparedTerm,
  index: number,
  level: HyperfineZeemanLevel,
  fields: readonly Dec[],
  statesAtFields: readonly (readonly TermFieldState[])[],
  options: TermTransitionOptions = {},
): SublevelTransition[] {
  const { labels, zeroField: e0, linear: lin, pairs } = sublevelTransitionPairs(level);
  if (statesAtFields.length !== fields.length || statesAtFields.some((st) => st.length !== labels.length)) {
    throw new RangeError("statesAtFields must hold the level's full solve at each field");
  }
  const quad = labels.map((s) => {
    const own = quadraticZeemanCoefficient(level, s.F2, s.mF2);
    const extra = options.quadraticExtra ? options.quadraticExtra(s.F2, s.mF2) : ZERO;
    return own === null || extra === null ? null : own.plus(extra);
  });

  // the M block and rank of each of the level's sublevels, indexed like `labels`
  const slot = new Map<string, { block: TermBlock; rank: number }>();
  for (const b of prepared.blocks) b.ranks.forEach((r, k) => r.level === index && slot.set(`${r.F2},${b.M2}`, { block: b, rank: k }));
  const where = labels.map((s) => slot.get(`${s.F2},${s.mF2}`)!);

  const from = options.fromTesla ?? new Dec("1e-8");
  const to = options.toTesla ?? new Dec("1");
  const perDecade = options.pointsPerDecade ?? 20;
  const fromF = from.toNumber();
  const steps = Math.floor(Math.log10(to.toNumber() / fromF) * perDecade + 1e-9);
  const gridB = Array.from({ length: steps + 1 }, (_, g) => fromF * 10 ** (g / perDecade));
  const floatSolve = termHyperfineZeemanFloatSolver(prepared);
  const grid = gridB.map((b) => {
    const st = floatSolve(b)[index]!;
    return pairs.map((p) => st[p.up]!.slope - st[p.lo]!.slope);
  });
  let gMax = 0;
  for (const b of prepared.blocks) for (const row of b.floatZeeman) for (const z of row) gMax = Math.max(gMax, Math.abs(z));
  const noise = 1e-12 * prepared.problem.muB_h.toNumber() * gMax;

  // df/dB of a pair at a Dec field: each sublevel refined from its block's float64 eigenpairs (refineTermSublevel),
  // with the float64 curvature for the Newton step; the full Dec block solve only in the fallback
  const mu = prepared.problem.muB_h;
  const muF = mu.toNumber();
  const refinedAt = (up: number, lo: number, b: Dec) => {
    const wu = where[up]!;
    const wl = where[lo]!;
    const scale = mu.mul(b);
    const fu = termBlockFloatEigen(wu.block, scale.toNumber());
    const fl = wl.block === wu.block ? fu : termBlockFloatEigen(wl.block, scale.toNumber());
    const u = refineTermSublevel(prepared, wu.block, scale, fu, wu.rank);
    const l = refineTermSublevel(prepared, wl.block, scale, fl, wl.rank);
    return {
      d: u.slope.minus(l.slope),
      hz: u.energy.minus(l.energy),
      curvature: () => new Dec((floatCurvature(prepared, wu.block, fu, wu.rank, muF) - floatCurvature(prepared, wl.block, fl, wl.rank, muF)).toPrecision(17)),
    };
  };
  const fullAt = (up: number, lo: number, b: Dec) => {
    const wu = where[up]!;
    const wl = where[lo]!;
    const bu = solveTermBlock(prepared, wu.block, b);
    const bl = wl.block === wu.block ? bu : solveTermBlock(prepared, wl.block, b);
    return { d: bu[wu.rank]!.state.slope.minus(bl[wl.rank]!.state.slope), hz: bu[wu.rank]!.state.energy.minus(bl[wl.rank]!.state.energy) };
  };
  const floatD = (up: number, lo: number, b: number) => {
    const wu = where[up]!;
    const wl = where[lo]!;
    const fu = termBlockFloatEigen(wu.block, muF * b);
    const fl = wl.block === wu.block ? fu : termBlockFloatEigen(wl.block, muF * b);
    return floatSlope(wu.block, fu, wu.rank, muF) - floatSlope(wl.block, fl, wl.rank, muF);
  };

  const roots: FieldInsensitivePoint[][] = pairs.map((p, k) => {
    const found: FieldInsensitivePoint[] = [];
    for (let g = 1; g < grid.length; g++) {
      const d0 = grid[g - 1]![k]!;
      const d1 = grid[g]![k]!;
      if (d0 === 0 || d1 === 0 || d0 < 0 === d1 < 0 || Math.max(Math.abs(d0), Math.abs(d1)) <= noise) continue;
      found.push(refineRoot((b) => floatD(p.up, p.lo, b), (b) => refinedAt(p.up, p.lo, b), (b) => fullAt(p.up, p.lo, b), gridB[g - 1]!, d0, gridB[g]!));
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
      atFields: fields.map((tesla, i) => ({ tesla, hz: statesAtFields[i]![p.up]!.energy.minus(statesAtFields[i]![p.lo]!.energy) })),
      fieldInsensitive: first.isZero() ? [{ tesla: ZERO, hz: e0[p.up]!.minus(e0[p.lo]!) }, ...roots[k]!] : roots[k]!,
    };
  });
}

/** Hellmann–Feynman slope (Hz/T) of the rank-k state from its block's float64 eigenpairs. */
function floatSlope(block: TermBlock, eig: { vectors: number[][] }, k: number, mu: number): number {
  const v = eig.vectors[k]!;
  const z = block.floatZeeman;
  let s = 0;
  for (let r = 0; r < v.length; r++) for (let c = 0; c < v.length; c++) s += v[r]! * z[r]![c]! * v[c]!;
  return mu * s;
}

/** d²E/dB² (Hz/T²) of the rank-k state from its block's float64 eigenpairs: 2(μB/h)² Σ_{j≠k} (q_jᵀZq_k)²/(E_k − E_j). */
function floatCurvature(prepared: PreparedTerm, block: TermBlock, eig: { values: number[]; vectors: number[][] }, k: number, mu: number): number {
  const n = block.basis.length;
  const z = block.floatZeeman;
  const qk = eig.vectors[k]!;
  const zk = z.map((row) => row.reduce((acc, x, c) => acc + x * qk[c]!, 0));
  let sum = 0;
  for (let j = 0; j < n; j++) {
    if (j === k) continue;
    const qj = eig.vectors[j]!;
    let m = 0;
    for (let r = 0; r < n; r++) m += qj[r]! * zk[r]!;
    sum += (m * m) / gapOf(prepared, block, eig, k, j);
  }
  return 2 * mu * mu * sum;
}

/** E_k − E_j of two states of a block (float64), each energy from its own level's offset. */
function gapOf(prepared: PreparedTerm, block: TermBlock, eig: { values: number[] }, k: number, j: number): number {
  const lk = block.ranks[k]!.level;
  const lj = block.ranks[j]!.level;
  const off = lk === lj ? 0 : prepared.problem.levels[lk]!.energy.minus(prepared.problem.levels[lj]!.energy).toNumber();
  return eig.values[k]! - eig.values[j]! + off;
}

const text = (x: number) => new Dec(x.toPrecision(17));

/**
 * The energy (from its own level's listed energy) and slope of the rank-k
 * state of a term block at Zeeman scale `scale` = (μB/h)·B, refined in Dec
 * from the block's float64 eigenpairs without diagonalizing it in Dec: the
 * method of floatSeededSublevel.ts (first-order eigenvector correction,
 * second-order energy) with the term block's full Zeeman matrix. With x the
 * float eigenvector, σ its eigenvalue, r = (H − σ)x in Dec and
 * c = −Σ_{j≠k} q_j(q_jᵀr)/(λ_j − σ): E = σ + [xᵀr + φ]/‖x + c‖²,
 * φ = −Σ_{j≠k}(q_jᵀr)²/(λ_j − σ), dE/dB = (μB/h)(x + c)ᵀZ(x + c)/‖x + c‖²;
 * the O(1) parts σ + xᵀr and xᵀZx are Dec sums, the ~1e-16 ones float64.
 * Exact: no; errors second order in the float eigenvectors' (~1e-30
 * relative). Only for homing in on field-insensitive points.
 */
function refineTermSublevel(prepared: PreparedTerm, block: TermBlock, scale: Dec, eig: { values: number[]; vectors: number[][] }, k: number): { energy: Dec; slope: Dec } {
  const n = block.basis.length;
  const q = eig.vectors[k]!;
  const x = q.map(text);
  const level = block.ranks[k]!.level;
  const offset = prepared.problem.levels[level]!.energy.minus(prepared.ref);
  const sigmaRel = text(eig.values[k]!);
  const sigma = sigmaRel.plus(offset);
  let N = ZERO;
  let X = ZERO;
  let mu = ZERO;
  const r: Dec[] = new Array(n);
  for (let i = 0; i < n; i++) {
    N = N.plus(x[i]!.mul(x[i]!));
    let zx = ZERO;
    let y = ZERO;
    for (let c = 0; c < n; c++) {
      const z = block.zeeman[i]![c]!;
      const f = block.fixed[i]![c]!;
      if (x[c]!.isZero()) continue;
      if (!z.isZero()) zx = zx.plus(z.mul(x[c]!));
      let h = z.isZero() ? f : f.plus(scale.mul(z));
      if (c === i) h = h.minus(sigma);
      if (!h.isZero()) y = y.plus(h.mul(x[c]!));
    }
    X = X.plus(x[i]!.mul(zx));
    r[i] = y;
    mu = mu.plus(x[i]!.mul(y));
  }
  const rf = r.map((v) => v.toNumber());
  const z = block.floatZeeman;
  const cvec = new Array<number>(n).fill(0);
  let phi = 0;
  for (let j = 0; j < n; j++) {
    if (j === k) continue;
    const qj = eig.vectors[j]!;
    let p = 0;
    for (let i = 0; i < n; i++) p += qj[i]! * rf[i]!;
    const alpha = p / -gapOf(prepared, block, eig, k, j);
    phi -= p * alpha;
    for (let i = 0; i < n; i++) cvec[i] = cvec[i]! - alpha * qj[i]!;
  }
  let cx = 0;
  let cc = 0;
  let czx = 0;
  let czc = 0;
  for (let i = 0; i < n; i++) {
    cx += cvec[i]! * q[i]!;
    cc += cvec[i]! * cvec[i]!;
    for (let c = 0; c < n; c++) {
      czx += cvec[i]! * z[i]![c]! * q[c]!;
      czc += cvec[i]! * z[i]![c]! * cvec[c]!;
    }
  }
  const nu = N.minus(1).toNumber() + 2 * cx + cc;
  const muF = mu.toNumber();
  const Xf = X.toNumber();
  const delta = 2 * czx + czc;
  const energy = sigmaRel.plus(mu).plus(text(phi - muF * nu + muF * nu * nu));
  const slope = prepared.problem.muB_h.mul(X.plus(text(delta - Xf * nu + Xf * nu * nu - delta * nu)));
  return { energy, slope };
}

/**
 * A root of df/dB between grid fields a < b (float df/dB of sign da at a and
 * the opposite at b): float64 bisection to float resolution, then Newton
 * steps on the refined Dec df/dB (refineTermSublevel) with the float64
 * curvature, until a step is below REL_TOL·B; the frequency is the one at
 * the last evaluation plus the half-step correction f′·Δ/2 (f′ = df/dB
 * there), the value at the root to O(f″·Δ²). Should Newton leave the
 * bracket or not settle, Illinois regula falsi on the full Dec df/dB
 * (solveTermBlock) over the bracket.
 */
function refineRoot(
  floatD: (b: number) => number,
  refinedAt: (b: Dec) => { d: Dec; hz: Dec; curvature: () => Dec },
  fullAt: (b: Dec) => { d: Dec; hz: Dec },
  a: number, da: number, b: number,
): FieldInsensitivePoint {
  const lowD = new Dec(a.toPrecision(17));
  const highD = new Dec(b.toPrecision(17));
  for (let it = 0; it < 200 && b - a > 4e-16 * b; it++) {
    const m = (a + b) / 2;
    const d = floatD(m);
    if (d === 0) {
      a = m;
      b = m;
      break;
    }
    if (d < 0 === da < 0) {
      a = m;
      da = d;
    } else b = m;
  }
  let x = new Dec(((a + b) / 2).toPrecision(17));
  for (let it = 0; it < MAX_NEWTON; it++) {
    const f = refinedAt(x);
    const slope = f.curvature();
    if (slope.isZero()) break;
    const step = f.d.div(slope).neg();
    const next = x.plus(step);
    if (next.lt(lowD) || next.gt(highD)) break;
    if (step.abs().lte(next.abs().mul(REL_TOL))) return { tesla: next, hz: f.hz.plus(f.d.mul(step).div(2)) };
    x = next;
  }
  // Illinois on the full Dec df/dB over the grid bracket
  let lo = lowD;
  let hi = highD;
  let flo = fullAt(lo).d;
  let fhi = fullAt(hi).d;
  let side = 0;
  let c = lo;
  for (let it = 0; it < 200; it++) {
    c = lo.mul(fhi).minus(hi.mul(flo)).div(fhi.minus(flo));
    if (hi.minus(lo).abs().lte(c.abs().mul(REL_TOL))) break;
    const fc = fullAt(c).d;
    if (fc.isZero()) break;
    if (fc.isNegative() === fhi.isNegative()) {
      hi = c;
      fhi = fc;
      if (side === -1) flo = flo.div(2);
      side = -1;
    } else {
      lo = c;
      flo = fc;
      if (side === 1) fhi = fhi.div(2);
      side = 1;
    }
  }
  return { tesla: c, hz: fullAt(c).hz };
}
