/**
 * Shared pieces of the build-time SVG plots: escaping, compact deterministic
 * number text, tick choice and unit choice. Plot coordinates are screen
 * pixels, so JavaScript numbers are fine here (the physics values arrive as
 * Dec and are converted once, for drawing only).
 */
import type { Dec } from "../../physics/decimal.js";

export function esc(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

/** A pixel coordinate: at most two decimals, no trailing zeros, never "-0". */
export function px(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError("non-finite coordinate");
  const r = Math.round(x * 100) / 100;
  return Object.is(r, -0) || r === 0 ? "0" : String(r);
}

/** A tick or axis value for humans: up to 6 significant digits, a true minus sign. */
export function label(x: number): string {
  if (x === 0 || Math.abs(x) < 1e-12) return "0";
  const s = String(Number(x.toPrecision(6)));
  return s.startsWith("-") ? "−" + s.slice(1) : s;
}

/** Plot coordinates are float64; plot-only energies may already be float64 (the float solver). */
export function toNumber(x: Dec | number): number {
  return typeof x === "number" ? x : x.toNumber();
}

/** "Nice" linear ticks (steps 1, 2, 5 × 10^n) covering [lo, hi], about `count` of them. */
export function linearTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 5, 10].map((f) => f * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let i = Math.ceil(lo / step - 1e-9); i * step <= hi + step * 1e-9; i++) out.push(Number((i * step).toPrecision(12)));
  return out;
}

/** Powers of ten inside [lo, hi] (lo > 0). */
export function decadeTicks(lo: number, hi: number): number[] {
  const out: number[] = [];
  for (let e = Math.ceil(Math.log10(lo) - 1e-9); e <= Math.floor(Math.log10(hi) + 1e-9); e++) out.push(e);
  return out;
}

export interface ScaledUnit {
  unit: string;
  factor: number;
}

/** The frequency unit in which `maxAbsHz` reads between 1 and 1000 (Hz … THz). */
export function frequencyUnit(maxAbsHz: number): ScaledUnit {
  const units: ScaledUnit[] = [
    { unit: "THz", factor: 1e12 },
    { unit: "GHz", factor: 1e9 },
    { unit: "MHz", factor: 1e6 },
    { unit: "kHz", factor: 1e3 },
  ];
  return units.find((u) => maxAbsHz >= u.factor) ?? { unit: "Hz", factor: 1 };
}

/** The field unit in which `maxTesla` reads between 1 and 1000 (µT, mT, T). */
export function fieldUnit(maxTesla: number): ScaledUnit {
  if (maxTesla >= 1) return { unit: "T", factor: 1 };
  if (maxTesla >= 1e-3) return { unit: "mT", factor: 1e-3 };
  return { unit: "µT", factor: 1e-6 };
}

/** Opening of an accessible inline SVG: role="img", a <title> and <desc> it is labelled by. */
export function svgOpen(id: string, width: number, height: number, title: string, description: string): string {
  const safe = id.replace(/[^A-Za-z0-9_-]/g, "-");
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" ` +
    `role="img" aria-labelledby="${safe}-title ${safe}-desc" font-family="sans-serif" font-size="12">` +
    `<title id="${safe}-title">${esc(title)}</title><desc id="${safe}-desc">${esc(description)}</desc>`
  );
}

/** Spread label positions (sorted by wish) so that neighbours are at least `gap` apart, inside [lo, hi]. */
export function spreadLabels(wish: number[], gap: number, lo: number, hi: number): number[] {
  const order = wish.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y || a.i - b.i);
  const placed = order.map((o) => o.y);
  for (let i = 0; i < placed.length; i++) {
    placed[i] = Math.max(placed[i]!, lo, i > 0 ? placed[i - 1]! + gap : lo);
  }
  for (let i = placed.length - 1; i >= 0; i--) {
    placed[i] = Math.min(placed[i]!, hi - (placed.length - 1 - i) * gap, i < placed.length - 1 ? placed[i + 1]! - gap : hi);
  }
  const out = new Array<number>(wish.length);
  order.forEach((o, k) => (out[o.i] = placed[k]!));
  return out;
}
