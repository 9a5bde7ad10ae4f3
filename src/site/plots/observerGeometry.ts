/**
 * Geometry of the observer stick plot (observerPlot.ts), shared by the build
 * and by the line page's θ control (src/browser/observer.ts), so the page
 * redraws the sticks exactly as the build draws them. No decimal.js.
 *
 * A stick's height is its relative intensity seen at θ, strength·F_kq(θ),
 * over the largest strength of the line: F ≤ 1 (the helicity ±1 part of a
 * row of the unitary d-matrix), so heights stay within the plot at every
 * angle, and one scale serves all angles (turning the view changes the
 * heights, not the scale).
 */
import { angularFactor } from "../../physics/angularFactor.js";

export const OBS_W = 720;
export const OBS_H = 300;
export const OBS_LEFT = 64;
export const OBS_RIGHT = 24;
export const OBS_TOP = 36;
export const OBS_BOTTOM = 56;
/** Baseline and the y of a stick of height 1. */
export const OBS_Y0 = OBS_H - OBS_BOTTOM;
export const OBS_Y1 = OBS_TOP + 10;

export interface ObservedStick {
  /** Δm = m_upper − m_lower. */
  q: number;
  /** Strength (share of the line's total emission), any common scale. */
  strength: number;
}

/** Heights in [0, 1]: strength·F_kq(θ) over the largest strength; θ in degrees. */
export function observedHeights(sticks: readonly ObservedStick[], k: number, thetaDeg: number): number[] {
  const top = Math.max(0, ...sticks.map((s) => s.strength));
  if (!(top > 0)) return sticks.map(() => 0);
  return sticks.map((s) => (s.strength / top) * angularFactor(k, s.q, thetaDeg));
}

/** The y coordinate of the top of a stick of height h. */
export function stickTopY(h: number): number {
  return OBS_Y0 - h * (OBS_Y0 - OBS_Y1);
}

/** An angle as the pages write it: "90°", "37.5°" (up to 2 decimals). */
export function thetaText(thetaDeg: number): string {
  const r = Math.round(thetaDeg * 100) / 100;
  return `${Object.is(r, -0) ? 0 : r}°`;
}
