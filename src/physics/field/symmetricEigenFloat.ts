/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix in float64
 * (JavaScript numbers), by cyclic Jacobi rotations (W. H. Press et al.,
 * "Numerical Recipes", 3rd ed., §11.1).
 *
 * This is the scanning half of the field solver: it seeds the Dec solver
 * (symmetricEigen.ts) and does the fast sampling of validity.ts and
 * sublevelTransitions.ts. Nothing it returns is exported as a result.
 * Exact: no; eigenvalues to a few units of 1e-16·‖H‖, eigenvectors to about
 * 1e-16·‖H‖/gap.
 *
 * Worked example: [[2, 1], [1, 2]] → values [1, 3], vectors
 * [1, −1]/√2 and [1, 1]/√2 (up to sign), to float64 rounding.
 */

export interface SymmetricEigenFloat {
  /** Eigenvalues, ascending. */
  values: number[];
  /** vectors[k] is the normalized eigenvector of values[k]. */
  vectors: number[][];
}

/** Diagonalize a symmetric matrix given as rows; the input is not modified. */
export function symmetricEigenFloat(m: readonly (readonly number[])[]): SymmetricEigenFloat {
  const n = m.length;
  if (n === 1) return { values: [m[0]![0]!], vectors: [[1]] };
  // flat row-major working copies: a (matrix), v (eigenvector columns)
  const a = new Float64Array(n * n);
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const row = m[i]!;
    for (let j = 0; j < n; j++) a[i * n + j] = row[j]!;
    v[i * n + i] = 1;
  }
  for (let sweep = 0; sweep < 100; sweep++) {
    let off = 0;
    let norm = 0;
    for (let i = 0; i < n * n; i++) norm += a[i]! * a[i]!;
    for (let p = 0; p < n - 1; p++) for (let q = p + 1; q < n; q++) off += 2 * a[p * n + q]! * a[p * n + q]!;
    // off-diagonal below ~1e-18 of the norm, or all dropped as noise
    if (off <= 1e-36 * norm || off === 0) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p * n + q]!;
        if (apq === 0) continue;
        const app = a[p * n + p]!;
        const aqq = a[q * n + q]!;
        // after three sweeps, an element below the rounding of both diagonals is rounding noise:
        // drop it (W. H. Press et al., §11.1), or the sweeps never end
        const g = 100 * Math.abs(apq);
        if (sweep > 2 && Math.abs(app) + g === Math.abs(app) && Math.abs(aqq) + g === Math.abs(aqq)) {
          a[p * n + q] = 0;
          a[q * n + p] = 0;
          continue;
        }
        const theta = (aqq - app) / (2 * apq);
        const t = (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        a[p * n + p] = app - t * apq;
        a[q * n + q] = aqq + t * apq;
        a[p * n + q] = 0;
        a[q * n + p] = 0;
        for (let r = 0; r < n; r++) {
          if (r !== p && r !== q) {
            const grp = a[r * n + p]!;
            const grq = a[r * n + q]!;
            const np = c * grp - s * grq;
            const nq = s * grp + c * grq;
            a[r * n + p] = np;
            a[p * n + r] = np;
            a[r * n + q] = nq;
            a[q * n + r] = nq;
          }
          const vp = v[r * n + p]!;
          const vq = v[r * n + q]!;
          v[r * n + p] = c * vp - s * vq;
          v[r * n + q] = s * vp + c * vq;
        }
      }
    }
  }
  const order = [...Array(n).keys()].sort((i, j) => a[i * n + i]! - a[j * n + j]! || i - j);
  const vectors = order.map((k) => {
    const col = new Array<number>(n);
    for (let r = 0; r < n; r++) col[r] = v[r * n + k]!;
    return col;
  });
  return { values: order.map((i) => a[i * n + i]!), vectors };
}
