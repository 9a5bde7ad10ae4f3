/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix in Dec.
 *
 * Method: cyclic Jacobi rotations (C. G. J. Jacobi, 1846; rotation formulas
 * as in W. H. Press et al., "Numerical Recipes", 3rd ed., §11.1), which
 * converge unconditionally and quadratically and need no special care for
 * repeated or close eigenvalues. A 2×2 matrix is solved in closed form
 * (eigenvalues m ± √(δ² + b²) with one Dec square root; the vectors'
 * normalization by Newton steps from a float64 start). Wider ones are first diagonalized in float64
 * (symmetricEigenFloat.ts); the float eigenvectors are re-orthonormalized in
 * Dec (modified Gram–Schmidt, the normalization by the series of 1/√(1+x)),
 * the matrix is transformed to that basis in Dec, a = QᵀHQ, and since its
 * off-diagonal elements are then ~1e-16 of the norm, one second-order
 * perturbation step finishes: values a_ii + Σ_j a_ij²/(a_ii − a_jj), vectors
 * q_i + Σ_j a_ij/(a_ii − a_jj)·q_j renormalized. The step is taken only when
 * every |a_ij| ≤ 1e-14·|a_ii − a_jj| (well-separated eigenvalues); otherwise
 * (repeated or close eigenvalues) Dec Jacobi continues from a. The float
 * stage only chooses a starting basis: the transformation is a similarity
 * to Dec precision, so it does not limit the result.
 *
 * Exact: no. Jacobi stops once every off-diagonal element is below 1e-30 of
 * the Frobenius norm ‖H‖: eigenvalue error ~1e-60·‖H‖²/gap, eigenvector
 * error ~1e-30·‖H‖/gap. The perturbation step leaves third-order terms:
 * eigenvalue error ≲ 1e-28·max|a_ij| ≈ 1e-44·‖H‖, eigenvector error
 * ≲ 1e-28 (in practice ~1e-32). Both keep the trace to Dec precision.
 *
 * Worked example: [[2, 1], [1, 2]] → values [1, 3], vectors
 * [1, −1]/√2 and [1, 1]/√2 (up to sign).
 */
import { Dec, ONE, ZERO } from "../decimal.js";
import { symmetricEigenFloat } from "./symmetricEigenFloat.js";

export interface SymmetricEigen {
  /** Eigenvalues, ascending. */
  values: Dec[];
  /** vectors[k] is the normalized eigenvector of values[k] (components in the input basis). */
  vectors: Dec[][];
}

const STOP = new Dec("1e-30");
const SMALL = new Dec("1e-6");
const MAX_SWEEPS = 60;
/** Below this |x|, 1/√(1+x) comes from its series instead of a Dec square root. */
const TINY = new Dec("1e-10");
const TWO = new Dec("2");
const HALF = new Dec("0.5");
const THREE_HALVES = new Dec("1.5");
/** Largest |a_ij|/|a_ii − a_jj| for the perturbation step: errors ~(ratio)²·|a_ij| in values. */
const PERTURBATIVE = 1e-14;
const C = (t: string) => new Dec(t);
// Taylor coefficients of √(1+x) and 1/√(1+x); with |x| < 1e-12 six terms leave < 1e-72
const SQRT_SERIES = [C("0.5"), C("-0.125"), C("0.0625"), C("-0.0390625"), C("0.02734375")];
const INVSQRT_SERIES = [C("-0.5"), C("0.375"), C("-0.3125"), C("0.2734375"), C("-0.24609375")];

function series(x: Dec, coefficients: Dec[]): Dec {
  // 1 + c1·x + c2·x² + ... by Horner
  let acc = ZERO;
  for (let i = coefficients.length - 1; i >= 0; i--) acc = acc.plus(coefficients[i]!).mul(x);
  return acc.plus(ONE);
}

/** Jacobi rotation (c, s) that zeroes a[p][q]. */
function rotation(app: Dec, aqq: Dec, apq: Dec): [Dec, Dec] {
  const diff = aqq.minus(app);
  let t: Dec;
  if (!diff.isZero() && apq.abs().lt(diff.abs().mul(SMALL))) {
    // small angle: u = 1/θ, t = u/(1 + √(1+u²)) with the root as a series (no Dec square root)
    const u = apq.mul(2).div(diff);
    t = u.div(series(u.mul(u), SQRT_SERIES).plus(ONE));
    const c = series(t.mul(t), INVSQRT_SERIES);
    return [c, t.mul(c)];
  }
  const theta = diff.div(apq.mul(2));
  // t = sgn(θ)/(|θ| + √(θ²+1)): the smaller rotation angle, stable for large θ
  t = ONE.div(theta.abs().plus(theta.mul(theta).plus(ONE).sqrt()));
  if (theta.isNegative()) t = t.neg();
  const c = ONE.div(t.mul(t).plus(ONE).sqrt());
  return [c, t.mul(c)];
}

function jacobiDec(a: Dec[][], v: Dec[][], threshold2: Dec): void {
  const n = a.length;
  for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
    let rotated = false;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p]![q]!;
        if (apq.mul(apq).lte(threshold2)) continue;
        rotated = true;
        const app = a[p]![p]!;
        const aqq = a[q]![q]!;
        const [c, s] = rotation(app, aqq, apq);
        // exact 2×2 update of the pivot block: a'pp = app − t·apq, a'qq = aqq + t·apq with t = s/c
        const h = s.div(c).mul(apq);
        a[p]![p] = app.minus(h);
        a[q]![q] = aqq.plus(h);
        a[p]![q] = ZERO;
        a[q]![p] = ZERO;
        for (let r = 0; r < n; r++) {
          if (r !== p && r !== q) {
            const g = a[r]![p]!;
            const k = a[r]![q]!;
            const np = c.mul(g).minus(s.mul(k));
            const nq = s.mul(g).plus(c.mul(k));
            a[r]![p] = np;
            a[p]![r] = np;
            a[r]![q] = nq;
            a[q]![r] = nq;
          }
          const g = v[r]![p]!;
          const k = v[r]![q]!;
          v[r]![p] = c.mul(g).minus(s.mul(k));
          v[r]![q] = s.mul(g).plus(c.mul(k));
        }
      }
    }
    if (!rotated) return;
  }
  throw new Error("Jacobi iteration did not converge");
}

/** 1/√(1+x) for |x| < 1e-10 by its series (error < 1e-60), else by a Dec square root. */
function invSqrtOnePlus(x: Dec): Dec {
  if (x.isZero()) return ONE;
  if (!x.abs().lt(TINY)) return ONE.div(ONE.plus(x).sqrt());
  // only as many terms as |x|^(terms+1) < 1e-60 needs (a seed good to 1e-16 needs three)
  const e = x.e;
  const terms = e < -31 ? 1 : e < -20 ? 2 : e < -15 ? 3 : 5;
  return series(x, INVSQRT_SERIES.slice(0, terms));
}

/** Columns of a float matrix, orthonormalized in Dec by modified Gram–Schmidt. */
function orthonormalColumns(vectors: readonly (readonly number[])[]): Dec[][] {
  // the float digits only pick a starting basis; any 17-digit text of them will do
  const cols: Dec[][] = [];
  for (const vec of vectors) {
    let col = vec.map((x) => new Dec(x.toPrecision(17)));
    for (const prev of cols) {
      let dot = ZERO;
      for (let i = 0; i < col.length; i++) dot = dot.plus(prev[i]!.mul(col[i]!));
      if (!dot.isZero()) col = col.map((x, i) => x.minus(dot.mul(prev[i]!)));
    }
    let norm2 = ZERO;
    for (const x of col) norm2 = norm2.plus(x.mul(x));
    const inv = invSqrtOnePlus(norm2.minus(ONE));
    cols.push(col.map((x) => x.mul(inv)));
  }
  return cols;
}

/**
 * Second-order perturbation step on a = QᵀHQ whose off-diagonal elements are
 * tiny against the gaps of its diagonal: values a_ii + Σ_j a_ij²/(a_ii − a_jj),
 * vectors q_i + Σ_j a_ij/(a_ii − a_jj)·q_j, renormalized. The small
 * vector corrections are computed in float64 from the Dec elements (they need
 * only ~16 digits of their own, being ≲1e-16 of the result) and enter as Dec
 * text; the value corrections are computed in Dec; each of them is added to one diagonal and taken from the other,
 * so the trace stays that of a to Dec precision. Returns null when some
 * |a_ij| exceeds PERTURBATIVE·|a_ii − a_jj|; Jacobi then does the job.
 */
function perturbationStep(a: Dec[][], cols: Dec[][], seed: readonly (readonly number[])[]): SymmetricEigen | null {
  const n = a.length;
  const coef: number[][] = a.map(() => a.map(() => 0));
  const values = a.map((row, i) => row[i]!);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const aij = a[i]![j]!;
      if (aij.isZero()) continue;
      const x = aij.toNumber();
      const gapDec = a[i]![i]!.minus(a[j]![j]!);
      const gap = gapDec.toNumber();
      if (!(Math.abs(x) <= PERTURBATIVE * Math.abs(gap))) return null;
      coef[i]![j] = x / gap;
      coef[j]![i] = -x / gap;
      // a_ij²/gap to full Dec precision: one Newton step on the float reciprocal (cheaper than a Dec division)
      const r0 = new Dec((1 / gap).toPrecision(17));
      const r = r0.mul(TWO.minus(gapDec.mul(r0)));
      const t = aij.mul(aij).mul(r);
      values[i] = values[i]!.plus(t);
      values[j] = values[j]!.minus(t);
    }
  }
  const vectors = cols.map((col, i) => {
    const out = col.map((x, r) => {
      let c = 0;
      for (let j = 0; j < n; j++) if (j !== i) c += coef[i]![j]! * seed[j]![r]!;
      return c === 0 ? x : x.plus(new Dec(c.toPrecision(17)));
    });
    let norm2 = ZERO;
    for (const x of out) norm2 = norm2.plus(x.mul(x));
    const inv = invSqrtOnePlus(norm2.minus(ONE));
    return inv.eq(ONE) ? out : out.map((x) => x.mul(inv));
  });
  const order = [...Array(n).keys()].sort((i, j) => values[i]!.cmp(values[j]!) || i - j);
  return { values: order.map((i) => values[i]!), vectors: order.map((i) => vectors[i]!) };
}

/** 1/√x for x > 0: float64 start and two Newton steps y ← y(3 − x·y²)/2, each squaring the relative error (1e-16 → 1e-64). */
function invSqrt(x: Dec): Dec {
  let y = new Dec((1 / Math.sqrt(x.toNumber())).toPrecision(17));
  for (let k = 0; k < 2; k++) y = y.mul(THREE_HALVES.minus(HALF.mul(x).mul(y).mul(y)));
  return y;
}

/**
 * [[a, b], [b, d]] in closed form: values m ∓ R with m = (a + d)/2,
 * R = √(δ² + b²), δ = (a − d)/2; the upper vector is (R + |δ|, b) (δ ≥ 0) or
 * (b, R + |δ|) (δ < 0), of squared length 2R(R + |δ|), which avoids
 * cancellation; the lower one is it turned by 90°. R by a Dec square root,
 * the normalization by invSqrt.
 */
function twoByTwo(a: Dec, b: Dec, d: Dec): SymmetricEigen {
  if (b.isZero()) {
    return a.lte(d) ? { values: [a, d], vectors: [[ONE, ZERO], [ZERO, ONE]] } : { values: [d, a], vectors: [[ZERO, ONE], [ONE, ZERO]] };
  }
  const delta = a.minus(d).mul(HALF);
  const m = a.plus(d).mul(HALF);
  const x = delta.mul(delta).plus(b.mul(b));
  // R correctly rounded (Dec square root): it sets the eigenvalues, and a Newton root ±1 ulp would
  // spoil exact zero-field levels; the vector normalization below is fine with invSqrt
  const R = x.sqrt();
  const big = R.plus(delta.abs());
  const w = invSqrt(R.mul(big).mul(2));
  const upper = delta.isNegative() ? [b.mul(w), big.mul(w)] : [big.mul(w), b.mul(w)];
  return { values: [m.minus(R), m.plus(R)], vectors: [[upper[1]!.neg(), upper[0]!], upper] };
}

/**
 * Diagonalize a real symmetric Dec matrix (see the module comment).
 * `floatMatrix`, optional, is the same matrix in float64 when the caller
 * already has it (it only seeds the float stage; omitted, it is derived).
 * `seedVectors`, optional, are float64 eigenvectors the caller already has,
 * in ascending order of their eigenvalues, to start from instead of the
 * float stage (e.g. better ones than a float64 solve of the whole matrix
 * gives, when its diagonal spans many orders of magnitude: the term solver,
 * termHyperfineZeeman.ts); like the float stage they only choose the
 * starting basis.
 */
export function symmetricEigen(
  matrix: readonly (readonly Dec[])[],
  floatMatrix?: readonly (readonly number[])[],
  seedVectors?: readonly (readonly number[])[],
): SymmetricEigen {
  const n = matrix.length;
  if (n === 1) return { values: [matrix[0]![0]!], vectors: [[ONE]] };
  if (n === 2) return twoByTwo(matrix[0]![0]!, matrix[0]![1]!, matrix[1]![1]!);
  let a: Dec[][];
  let v: Dec[][];
  if (n < 2) {
    a = matrix.map((row) => row.slice());
    v = a.map((_, i) => a.map((__, j) => (i === j ? ONE : ZERO)));
  } else {
    const seed = seedVectors ?? symmetricEigenFloat(floatMatrix ?? matrix.map((row) => row.map((x) => x.toNumber()))).vectors;
    const cols = orthonormalColumns(seed);
    // a = Qᵀ·H·Q with Q's columns `cols`; H is banded here, so skip its zeros
    const nz = matrix.map((row) => [...row.keys()].filter((k) => !row[k]!.isZero()));
    const hq = cols.map((col) => matrix.map((row, r) => {
      let s = ZERO;
      for (const k of nz[r]!) s = s.plus(row[k]!.mul(col[k]!));
      return s;
    }));
    a = cols.map(() => cols.map(() => ZERO));
    for (let i = 0; i < n; i++) {
      for (let j = i; j < n; j++) {
        let s = ZERO;
        for (let k = 0; k < n; k++) s = s.plus(cols[i]![k]!.mul(hq[j]![k]!));
        a[i]![j] = s;
        a[j]![i] = s;
      }
    }
    const quick = perturbationStep(a, cols, seed);
    if (quick) return quick;
    v = cols[0]!.map((_, r) => cols.map((col) => col[r]!));
  }
  // Jacobi's stopping threshold, relative to the Frobenius norm of the input
  let norm2 = ZERO;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (!matrix[i]![j]!.isZero()) norm2 = norm2.plus(matrix[i]![j]!.mul(matrix[i]![j]!));
  jacobiDec(a, v, norm2.mul(STOP).mul(STOP));
  const order = [...Array(n).keys()].sort((i, j) => a[i]![i]!.cmp(a[j]![j]!) || i - j);
  return {
    values: order.map((i) => a[i]![i]!),
    vectors: order.map((i) => v.map((row) => row[i]!)),
  };
}
