/**
 * Linear (first-order) Zeeman shifts and the bench units they are read in.
 *
 * H/h = (μB/h)·B·g·m for a sublevel m of a level with g-factor g (gJ for
 * fine-structure sublevels mJ, gF for hyperfine sublevels mF). Energies are
 * frequencies in Hz throughout the project.
 */
import { Dec } from "./decimal.js";
import { Rational } from "./rational.js";

/**
 * Shift per tesla of sublevel m (doubled m2) of a level with factor g:
 * ΔE/(hB) = (μB/h)·g·m, in Hz/T. Exact: no (μB/h is measured).
 * Selection: any m of the level; g = null (J = 0 or F = 0) gives 0.
 *
 * Worked example: g = 1, m = 1 with μB/h = 13 996 244 917.1 Hz/T (CODATA 2022)
 * gives 13 996 244 917.1 Hz/T = 1.39962449171 MHz/G, the "1.4 MHz/G per unit
 * g·m" rule of the bench.
 */
export function linearShiftPerTesla(g: Dec | null, m2: number, muB_h: Dec): Dec {
  if (g === null || m2 === 0) return new Dec(0);
  return muB_h.mul(g).mul(Rational.half(m2).toDecimal());
}

/** Hz/T → MHz/G: 1 G = 1e-4 T, 1 MHz = 1e6 Hz, so the factor is exactly 1e-10. */
export function hzPerTeslaToMHzPerGauss(x: Dec): Dec {
  return x.mul(new Dec("1e-10"));
}

/** Hz/T → GHz/T, exactly 1e-9. */
export function hzPerTeslaToGHzPerTesla(x: Dec): Dec {
  return x.mul(new Dec("1e-9"));
}

/** Hz/T → cm⁻¹/T: divide by 100·c with c = 299 792 458 m/s exact. */
export function hzPerTeslaToWavenumberPerTesla(x: Dec): Dec {
  return x.div(new Dec("29979245800"));
}
