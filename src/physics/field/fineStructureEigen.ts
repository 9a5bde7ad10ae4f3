/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix in Dec, by
 * the cyclic Jacobi method (Golub and Van Loan, "Matrix Computations",
 * 4th ed., §8.5). The fine-structure blocks are at most (2·min(L,S)+1)
 * square, so an O(n³)-per-sweep method costs nothing and keeps all 60
 * working digits: each rotation is orthogonal, so rounding does not grow
 * with the size of the entries.
 */
import { Dec, ONE, ZERO } from "../decimal.js";

export interface EigenPair {
  value: Dec;
  /** Unit eigenvector (components in the order of the matrix rows). */
  vector: Dec[];
}

const TOLERANCE = new Dec("1e-56");
const MAX_SWEEPS = 60;

function at(m: Dec[][], i: number, j: number): Dec {
  const v = m[i]?.[j];
  if (v === undefined) throw new RangeError("matrix index out of range");
  return v;
}

/**
 * All eigenpairs of the symmetric matrix `a` (only the upper triangle is
 * read), ascending by eigenvalue. Not exact: converged to about 1e-56
 * relative to the largest entry. Worked example: [[0, 1], [1, 0]] has
 * eigenvalues −1 and 1 with vectors (1, −1)/√2 and (1, 1)/√2 (up to sign).
 */
export function symmetricEigen(a: Dec[][]): EigenPair[] {
  const n = a.length;
  const m: Dec[][] = a.map((row, i) => row.map((_, j) => (j >= i ? at(a, i, j) : at(a, j, i))));
  const v: Dec[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? ONE : ZERO)));
  let scale = ZERO;
  for (const row of m) for (const x of row) if (x.abs().gt(scale)) scale = x.abs();
  const limit = scale.isZero() ? ZERO : scale.mul(TOLERANCE);
  for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
    let off = ZERO;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) if (at(m, p, q).abs().gt(off)) off = at(m, p, q).abs();
    if (off.lte(limit)) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = at(m, p, q);
        if (apq.abs().lte(limit)) continue;
        const theta = at(m, q, q).sub(at(m, p, p)).div(apq.mul(2));
        const t = (theta.isNeg() ? new Dec(-1) : ONE).div(theta.abs().add(theta.mul(theta).add(1).sqrt()));
        const c = ONE.div(t.mul(t).add(1).sqrt());
        const s = t.mul(c);
        for (let k = 0; k < n; k++) {
          const mkp = at(m, k, p);
          const mkq = at(m, k, q);
          m[k]![p] = c.mul(mkp).sub(s.mul(mkq));
          m[k]![q] = s.mul(mkp).add(c.mul(mkq));
        }
        for (let k = 0; k < n; k++) {
          const mpk = at(m, p, k);
          const mqk = at(m, q, k);
          m[p]![k] = c.mul(mpk).sub(s.mul(mqk));
          m[q]![k] = s.mul(mpk).add(c.mul(mqk));
        }
        for (let k = 0; k < n; k++) {
          const vkp = at(v, k, p);
          const vkq = at(v, k, q);
          v[k]![p] = c.mul(vkp).sub(s.mul(vkq));
          v[k]![q] = s.mul(vkp).add(c.mul(vkq));
        }
      }
    }
  }
  const pairs: EigenPair[] = [];
  for (let j = 0; j < n; j++) pairs.push({ value: at(m, j, j), vector: v.map((_, i) => at(v, i, j)) });
  return pairs.sort((x, y) => x.value.cmp(y.value));
}
