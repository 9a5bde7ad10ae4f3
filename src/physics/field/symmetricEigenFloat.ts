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
  const a = m.map((r) => r.slice());
  const v: number[][] = a.map((_, i) => a.map((__, j) => (i === j ? 1 : 0)));
  for (let sweep = 0; sweep < 100; sweep++) {
    let off = 0;
    let norm = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const x = a[i]![j]! * a[i]![j]!;
        norm += x;
        if (i !== j) off += x;
      }
    }
    // off-diagonal below ~1e-17 of the norm: float64 cannot do better
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
  const order = [...Array(n).keys()].sort((i, j) => a[i]![i]! - a[j]![j]! || i - j);
  return { values: order.map((i) => a[i]![i]!), vectors: order.map((i) => v.map((row) => row[i]!)) };
}
