/**
 * One sublevel's energy and slope in Dec at one field, refined from the
 * float64 eigen-decomposition of its M block (hyperfineZeemanFloat.ts)
 * without diagonalizing the block in Dec. Used by sublevelTransitions.ts to
 * evaluate df/dB cheaply while it homes in on a field-insensitive point.
 *
 * Method (first-order eigenvector correction, second-order energy): with x
 * the float eigenvector of rank k read exactly into Dec, σ its float
 * eigenvalue and r = (H − σ)x computed in Dec (H the Dec block matrix), the
 * other float eigenpairs (q_j, λ_j) give the correction
 * c = −Σ_{j≠k} q_j·(q_jᵀr)/(λ_j − σ), and
 *   E = σ + [xᵀr + φ]/‖x + c‖²,  φ = −Σ_{j≠k} (q_jᵀr)²/(λ_j − σ),
 *   dE/dB = (μB/h)·(x + c)ᵀZ(x + c)/‖x + c‖²,  Z = diag(gJ·mJ + gI·mI),
 * the Rayleigh quotient and Hellmann–Feynman slope of x + c. The parts of
 * size ~1e-16 (c, φ, the normalization) need only float64's 16 digits of
 * their own; the O(1) parts σ + xᵀr and xᵀZx are Dec sums. Exact: no;
 * about 1e-31 relative in the slope and 1e-31·‖H‖ in the energy for a block
 * whose float eigenvectors are good to 1e-16 (the neglected terms are
 * second order in the float error). Not used for tabulated energies, which
 * come from the full Dec solve (hyperfineZeeman.ts).
 *
 * Worked example: for 87Rb 5²S1/2 at 1e-4 T it gives the energy of
 * |F=2, mF=0⟩ of hyperfineZeemanSolver to better than 1e-25 relative.
 */
import { Dec, ZERO } from "../decimal.js";
import type { PreparedBlock, PreparedLevel } from "./hyperfineZeeman.js";
import type { FloatBlockSolution } from "./hyperfineZeemanFloat.js";

export interface RefinedSublevel {
  /** E/h in Hz. */
  energy: Dec;
  /** dE/dB in Hz/T. */
  slope: Dec;
}

const text = (x: number) => new Dec(x.toPrecision(17));

/**
 * Refine the rank-k state of `block` at Zeeman scale `scale` = (μB/h)·B (Dec),
 * given the block's float64 solution `sol` at the same field.
 */
export function refineSublevel(prepared: PreparedLevel, block: PreparedBlock, scale: Dec, sol: FloatBlockSolution, k: number): RefinedSublevel {
  const n = block.basis.length;
  const q = sol.vectors[k]!;
  const x = q.map(text);
  const sigma = text(sol.values[k]!);
  // xx_i = x_i² exactly (34 digits); N = xᵀx, X = xᵀZx
  const xx = x.map((v) => v.mul(v));
  let N = ZERO;
  let X = ZERO;
  for (let i = 0; i < n; i++) {
    N = N.plus(xx[i]!);
    X = X.plus(xx[i]!.mul(block.zeeman[i]!));
  }
  // r = (H − σ)x and μ = xᵀr
  const r: Dec[] = new Array(n);
  let mu = ZERO;
  for (let i = 0; i < n; i++) {
    const row = block.hyperfine[i]!;
    let y = row[i]!.plus(scale.mul(block.zeeman[i]!)).minus(sigma).mul(x[i]!);
    for (const c of block.nonZero[i]!) if (c !== i) y = y.plus(row[c]!.mul(x[c]!));
    r[i] = y;
    mu = mu.plus(x[i]!.mul(y));
  }
  const rf = r.map((v) => v.toNumber());
  const sigmaF = sol.values[k]!;
  const z = block.floatZeeman;
  const cvec = new Array<number>(n).fill(0);
  let phi = 0;
  for (let j = 0; j < n; j++) {
    if (j === k) continue;
    const qj = sol.vectors[j]!;
    let p = 0;
    for (let i = 0; i < n; i++) p += qj[i]! * rf[i]!;
    const gap = sol.values[j]! - sigmaF;
    const alpha = p / gap;
    phi -= p * alpha;
    for (let i = 0; i < n; i++) cvec[i] = cvec[i]! - alpha * qj[i]!;
  }
  // ν = ‖x + c‖² − 1 and δ = 2cᵀZx + cᵀZc, both small: float64
  let cx = 0;
  let cc = 0;
  let czx = 0;
  let czc = 0;
  for (let i = 0; i < n; i++) {
    cx += cvec[i]! * q[i]!;
    cc += cvec[i]! * cvec[i]!;
    czx += cvec[i]! * z[i]! * q[i]!;
    czc += cvec[i]! * z[i]! * cvec[i]!;
  }
  const nu = N.minus(1).toNumber() + 2 * cx + cc;
  const muF = mu.toNumber();
  const Xf = X.toNumber();
  const delta = 2 * czx + czc;
  // 1/(1 + ν) = 1 − ν + ν²; ν ~ 1e-16, so ν² terms are kept only where they multiply O(1)
  const energy = sigma.plus(mu).plus(text(phi - muF * nu + muF * nu * nu));
  const slope = prepared.muB_h.mul(X.plus(text(delta - Xf * nu + Xf * nu * nu - delta * nu)));
  return { energy, slope };
}
