/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix in Dec.
 *
 * Method: cyclic Jacobi rotations (C. G. J. Jacobi, 1846; rotation formulas
 * as in W. H. Press et al., "Numerical Recipes", 3rd ed., §11.1), which
 * converge unconditionally and quadratically and need no special care for
 * repeated or close eigenvalues. To keep the Dec work small, matrices wider
 * than 2 are first diagonalized by the same Jacobi method in float64; the
 * float eigenvectors are re-orthonormalized in Dec (Gram–Schmidt), the
 * matrix is transformed to that basis in Dec, and Dec Jacobi finishes the
 * job from off-diagonal elements of about 1e-16 of the norm. The float
 * stage only chooses a starting basis: the transformation is an exact
 * similarity to Dec precision, so it does not limit the result.
 *
 * Exact: no. Rotations stop once every off-diagonal element is below 1e-30
 * of the Frobenius norm ‖H‖, so eigenvalues carry an error of about
 * 1e-60·‖H‖²/gap (plus Dec rounding, ~1e-58·‖H‖) and eigenvectors about
 * 1e-30·‖H‖/gap, where gap is the distance to the nearest other eigenvalue.
 *
 * Worked example: [[2, 1], [1, 2]] → values [1, 3], vectors
 * [1, −1]/√2 and [1, 1]/√2 (up to sign).
 */
import { Dec, ONE, ZERO } from "../decimal.js";

export interface SymmetricEigen {
  /** Eigenvalues, ascending. */
  values: Dec[];
  /** vectors[k] is the normalized eigenvector of values[k] (components in the input basis). */
  vectors: Dec[][];
}

const STOP = new Dec("1e-30");
const SMALL = new Dec("1e-6");
const MAX_SWEEPS = 60;
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

/** Float64 cyclic Jacobi; returns the eigenvector matrix (columns). */
function jacobiFloat(m: number[][]): number[][] {
  const n = m.length;
  const a = m.map((r) => r.slice());
  const v: number[][] = a.map((_, i) => a.map((__, j) => (i === j ? 1 : 0)));
  for (let sweep = 0; sweep < 100; sweep++) {
    let off = 0;
    let norm = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
      const x = a[i]![j]! * a[i]![j]!;
      norm += x;
      if (i !== j) off += x;
    }
    if (off <= 1e-34 * norm || off === 0) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p]![q]!;
        if (apq === 0) continue;
        const theta = (a[q]![q]! - a[p]![p]!) / (2 * apq);
        const t = (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        a[p]![p] = a[p]![p]! - t * apq;
        a[q]![q] = a[q]![q]! + t * apq;
        a[p]![q] = 0;
        a[q]![p] = 0;
        for (let r = 0; r < n; r++) {
          if (r !== p && r !== q) {
            const g = a[r]![p]!;
            const k = a[r]![q]!;
            a[r]![p] = a[p]![r] = c * g - s * k;
            a[r]![q] = a[q]![r] = s * g + c * k;
          }
          const g = v[r]![p]!;
          const k = v[r]![q]!;
          v[r]![p] = c * g - s * k;
          v[r]![q] = s * g + c * k;
        }
      }
    }
  }
  return v;
}

/** Columns of a float matrix, orthonormalized in Dec by modified Gram–Schmidt. */
function orthonormalColumns(v: number[][]): Dec[][] {
  const n = v.length;
  // the float digits only pick a starting basis; any 17-digit text of them will do
  const cols: Dec[][] = [];
  for (let j = 0; j < n; j++) {
    let col = v.map((row) => new Dec(row[j]!.toPrecision(17)));
    for (const prev of cols) {
      let dot = ZERO;
      for (let i = 0; i < n; i++) dot = dot.plus(prev[i]!.mul(col[i]!));
      col = col.map((x, i) => x.minus(dot.mul(prev[i]!)));
    }
    let norm2 = ZERO;
    for (const x of col) norm2 = norm2.plus(x.mul(x));
    const inv = ONE.div(norm2.sqrt());
    cols.push(col.map((x) => x.mul(inv)));
  }
  return cols;
}

export function symmetricEigen(matrix: readonly (readonly Dec[])[]): SymmetricEigen {
  const n = matrix.length;
  let norm2 = ZERO;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) norm2 = norm2.plus(matrix[i]![j]!.mul(matrix[i]![j]!));
  const threshold2 = norm2.mul(STOP).mul(STOP);
  let a: Dec[][];
  let v: Dec[][];
  if (n <= 2) {
    a = matrix.map((row) => row.slice());
    v = a.map((_, i) => a.map((__, j) => (i === j ? ONE : ZERO)));
  } else {
    const cols = orthonormalColumns(jacobiFloat(matrix.map((row) => row.map((x) => x.toNumber()))));
    // a = Qᵀ·H·Q with Q's columns `cols`
    const hq = cols.map((col) => matrix.map((row) => {
      let s = ZERO;
      for (let k = 0; k < n; k++) if (!row[k]!.isZero()) s = s.plus(row[k]!.mul(col[k]!));
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
    v = cols[0]!.map((_, r) => cols.map((col) => col[r]!));
  }
  jacobiDec(a, v, threshold2);
  const order = [...Array(n).keys()].sort((i, j) => a[i]![i]!.cmp(a[j]![j]!) || i - j);
  return {
    values: order.map((i) => a[i]![i]!),
    vectors: order.map((i) => v.map((row) => row[i]!)),
  };
}
