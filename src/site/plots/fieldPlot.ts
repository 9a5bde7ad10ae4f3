/**
 * Sublevel energies against magnetic field, as an inline SVG string built at
 * build time. Every curve has its own line style and marker shape and a
 * direct label at its right end, so the plot reads in black and white and
 * without colour vision; configured fields appear as labelled vertical rules.
 * Two versions from the same input: linear field axis and logarithmic field
 * axis (the log version drops non-positive fields).
 */
import type { Dec } from "../../physics/decimal.js";
import {
  decadeTicks,
  esc,
  fieldUnit,
  frequencyUnit,
  label,
  linearTicks,
  px,
  spreadLabels,
  svgOpen,
  toNumber,
} from "./svgParts.js";

export interface FieldCurve {
  /** Direct label, e.g. "F=2, mF=1". */
  label: string;
  /** Energy E/h in Hz at each field of `fields` (same length); plot-only values may be float64. */
  energies: readonly (Dec | number)[];
}

export interface FieldRule {
  tesla: Dec;
  /** e.g. "lab magnet 0.3 T". */
  label: string;
}

export interface FieldPlotInput {
  /** Unique id on the page (used for the title/desc ids). */
  id: string;
  title: string;
  /** One or two sentences saying what the plot shows, for screen readers. */
  description: string;
  /** Fields in tesla, ascending. */
  fields: Dec[];
  curves: FieldCurve[];
  rules?: FieldRule[];
}

export type FieldAxis = "linear" | "log";

const W = 720;
const H = 460;
const LEFT = 78;
const RIGHT = 140;
const TOP = 40;
const BOTTOM = 56;

/** Dash patterns and marker shapes, combined so that neighbours differ in both. */
const DASHES = ["", "6 3", "2 3", "8 3 2 3", "12 4", "2 6"];
const MARKERS = ["circle", "square", "triangle", "diamond", "cross", "triangle-down", "circle-open", "square-open"];

function marker(kind: string, x: number, y: number): string {
  const s = 3.5;
  switch (kind) {
    case "circle":
      return `<circle cx="${px(x)}" cy="${px(y)}" r="${px(s)}" fill="#000"/>`;
    case "circle-open":
      return `<circle cx="${px(x)}" cy="${px(y)}" r="${px(s)}" fill="#fff" stroke="#000"/>`;
    case "square":
      return `<rect x="${px(x - s)}" y="${px(y - s)}" width="${px(2 * s)}" height="${px(2 * s)}" fill="#000"/>`;
    case "square-open":
      return `<rect x="${px(x - s)}" y="${px(y - s)}" width="${px(2 * s)}" height="${px(2 * s)}" fill="#fff" stroke="#000"/>`;
    case "triangle":
      return `<path d="M${px(x)} ${px(y - s - 1)}L${px(x + s + 1)} ${px(y + s)}L${px(x - s - 1)} ${px(y + s)}Z" fill="#000"/>`;
    case "triangle-down":
      return `<path d="M${px(x)} ${px(y + s + 1)}L${px(x + s + 1)} ${px(y - s)}L${px(x - s - 1)} ${px(y - s)}Z" fill="#fff" stroke="#000"/>`;
    case "diamond":
      return `<path d="M${px(x)} ${px(y - s - 1)}L${px(x + s + 1)} ${px(y)}L${px(x)} ${px(y + s + 1)}L${px(x - s - 1)} ${px(y)}Z" fill="#000"/>`;
    default:
      return `<path d="M${px(x - s)} ${px(y - s)}L${px(x + s)} ${px(y + s)}M${px(x - s)} ${px(y + s)}L${px(x + s)} ${px(y - s)}" stroke="#000" stroke-width="1.5"/>`;
  }
}

/**
 * The plot as an SVG string (no script, no external references, deterministic).
 * Each curve is one `<path class="curve">` plus markers on every few points and
 * a `<text class="curve-label">`; each rule is one `<line class="rule">` with a label.
 */
export function fieldPlotSvg(input: FieldPlotInput, axis: FieldAxis): string {
  const n = input.fields.length;
  for (const c of input.curves) if (c.energies.length !== n) throw new RangeError(`curve ${c.label}: ${c.energies.length} energies for ${n} fields`);
  const keep = input.fields.map((f) => (axis === "log" ? toNumber(f) > 0 : true));
  const bs = input.fields.map(toNumber).filter((_, i) => keep[i]);
  if (bs.length < 2) throw new RangeError("need at least two fields to plot");
  const es = input.curves.map((c) => c.energies.map(toNumber).filter((_, i) => keep[i]));
  const allE = es.flat();
  const eMin = Math.min(...allE);
  const eMax = Math.max(...allE);
  const eu = frequencyUnit(Math.max(Math.abs(eMin), Math.abs(eMax)));
  const bMax = Math.max(...bs);
  const bu = fieldUnit(bMax);
  const x0 = LEFT;
  const x1 = W - RIGHT;
  const y0 = H - BOTTOM;
  const y1 = TOP;
  const bLo = Math.min(...bs);
  const X =
    axis === "log"
      ? (b: number) => x0 + ((Math.log10(b) - Math.log10(bLo)) / (Math.log10(bMax) - Math.log10(bLo) || 1)) * (x1 - x0)
      : (b: number) => x0 + ((b - bLo) / (bMax - bLo || 1)) * (x1 - x0);
  const pad = (eMax - eMin) * 0.05 || Math.abs(eMax) * 0.05 || 1;
  const yTicks = linearTicks((eMin - pad) / eu.factor, (eMax + pad) / eu.factor, 7);
  const yLo = Math.min(eMin - pad, yTicks[0]! * eu.factor);
  const yHi = Math.max(eMax + pad, yTicks[yTicks.length - 1]! * eu.factor);
  const Y = (e: number) => y0 - ((e - yLo) / (yHi - yLo)) * (y0 - y1);

  const parts: string[] = [svgOpen(input.id, W, H, input.title, input.description)];
  parts.push(`<rect x="${x0}" y="${y1}" width="${x1 - x0}" height="${y0 - y1}" fill="#fff" stroke="#000"/>`);
  // y axis
  for (const t of yTicks) {
    const y = Y(t * eu.factor);
    if (y < y1 - 0.5 || y > y0 + 0.5) continue;
    parts.push(`<line class="tick" x1="${x0 - 5}" y1="${px(y)}" x2="${x0}" y2="${px(y)}" stroke="#000"/>`);
    parts.push(`<line x1="${x0}" y1="${px(y)}" x2="${x1}" y2="${px(y)}" stroke="#000" stroke-opacity="0.12"/>`);
    parts.push(`<text class="tick-label" x="${x0 - 8}" y="${px(y + 4)}" text-anchor="end">${label(t)}</text>`);
  }
  // x axis
  if (axis === "log") {
    for (const e of decadeTicks(bLo, bMax)) {
      const x = X(Math.pow(10, e));
      parts.push(`<line class="tick" x1="${px(x)}" y1="${y0}" x2="${px(x)}" y2="${y0 + 5}" stroke="#000"/>`);
      parts.push(`<text class="tick-label" x="${px(x)}" y="${y0 + 19}" text-anchor="middle">10<tspan dy="-5" font-size="9">${label(e)}</tspan></text>`);
    }
  } else {
    for (const t of linearTicks(bLo / bu.factor, bMax / bu.factor)) {
      const x = X(t * bu.factor);
      if (x < x0 - 0.5 || x > x1 + 0.5) continue;
      parts.push(`<line class="tick" x1="${px(x)}" y1="${y0}" x2="${px(x)}" y2="${y0 + 5}" stroke="#000"/>`);
      parts.push(`<text class="tick-label" x="${px(x)}" y="${y0 + 19}" text-anchor="middle">${label(t)}</text>`);
    }
  }
  const xTitle = axis === "log" ? "Magnetic field B (T, logarithmic scale)" : `Magnetic field B (${bu.unit})`;
  parts.push(`<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${H - 14}" text-anchor="middle">${esc(xTitle)}</text>`);
  parts.push(
    `<text class="axis-label" x="18" y="${px((y0 + y1) / 2)}" text-anchor="middle" transform="rotate(-90 18 ${px((y0 + y1) / 2)})">${esc(`Energy E/h (${eu.unit})`)}</text>`,
  );
  // rules; labels that would run into the previous one in their row drop to the next row
  const rowEnds: number[] = [];
  for (const r of input.rules ?? []) {
    const b = toNumber(r.tesla);
    if (axis === "log" && b <= 0) continue;
    if (b < bLo || b > bMax) continue;
    const x = X(b);
    const width = 6 * r.label.length + 6; // about 6 px a character at font-size 10
    let row = rowEnds.findIndex((end) => end <= x);
    if (row < 0) row = rowEnds.length;
    rowEnds[row] = x + width;
    parts.push(`<line class="rule" x1="${px(x)}" y1="${y1}" x2="${px(x)}" y2="${y0}" stroke="#000" stroke-width="1" stroke-dasharray="1 2"/>`);
    parts.push(`<text class="rule-label" x="${px(x + 3)}" y="${y1 + 12 + 12 * row}" font-size="10">${esc(r.label)}</text>`);
  }
  // curves
  const ends: number[] = [];
  input.curves.forEach((c, i) => {
    const pts = bs.map((b, j) => [X(b), Y(es[i]![j]!)] as const);
    const d = pts.map(([x, y], j) => `${j === 0 ? "M" : "L"}${px(x)} ${px(y)}`).join("");
    const dash = DASHES[i % DASHES.length]!;
    parts.push(
      `<path class="curve" d="${d}" fill="none" stroke="#000" stroke-width="1.4"${dash ? ` stroke-dasharray="${dash}"` : ""}/>`,
    );
    const kind = MARKERS[i % MARKERS.length]!;
    const every = Math.max(1, Math.floor(pts.length / 6));
    const phase = i % every;
    pts.forEach(([x, y], j) => {
      if ((j - phase) % every === 0 || j === pts.length - 1) parts.push(marker(kind, x, y));
    });
    ends.push(pts[pts.length - 1]![1]);
  });
  const placed = spreadLabels(ends, 12, y1 + 6, y0 - 2);
  input.curves.forEach((c, i) => {
    const ye = ends[i]!;
    const yl = placed[i]!;
    parts.push(`<line x1="${px(x1 + 2)}" y1="${px(ye)}" x2="${px(x1 + 10)}" y2="${px(yl)}" stroke="#000" stroke-width="0.6"/>`);
    parts.push(marker(MARKERS[i % MARKERS.length]!, x1 + 16, yl));
    parts.push(`<text class="curve-label" x="${px(x1 + 24)}" y="${px(yl + 4)}" font-size="11">${esc(c.label)}</text>`);
  });
  parts.push("</svg>");
  return parts.join("");
}
