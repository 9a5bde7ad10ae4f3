/**
 * Stick pattern of one line at one field, as an inline SVG string built at
 * build time: each component a vertical stick at its frequency offset (bottom
 * axis) and wavelength offset (top axis), height proportional to strength.
 * Polarizations differ by line style and end marker, never by colour alone:
 * π solid with a flat bar, σ+ dashed with an up-pointing triangle, σ− dotted
 * with a down-pointing triangle, |Δm| = 2 dash-dot with a diamond. A legend
 * repeats the four styles.
 *
 * Wavelength offset: Δλ = −λ0²·Δν/c to first order in Δν/ν0 (λ0 vacuum
 * wavelength of the line centre); the top axis is drawn only when λ0 is given.
 */
import type { Dec } from "../../physics/decimal.js";
import type { Polarization } from "../../physics/linePattern.js";
import { esc, frequencyUnit, label, linearTicks, px, svgOpen, toNumber } from "./svgParts.js";

export interface Stick {
  /** Frequency offset from the zero-field line centre, Hz. */
  shift: Dec;
  /** Relative strength (any common scale; the tallest stick fills the plot). */
  strength: Dec;
  polarization: Polarization;
}

export interface StickPlotInput {
  id: string;
  title: string;
  description: string;
  sticks: Stick[];
  /** Vacuum wavelength of the line centre, m; null to omit the wavelength axis. */
  wavelength: Dec | null;
  /** Speed of light, m/s (from the constants edition). */
  speedOfLight: Dec;
}

const W = 720;
const H = 380;
const LEFT = 64;
const RIGHT = 24;
const TOP = 64;
const BOTTOM = 56;

const STYLE: Record<"pi" | "sigma+" | "sigma-" | "none", { dash: string; name: string }> = {
  pi: { dash: "", name: "π (Δm = 0)" },
  "sigma+": { dash: "6 3", name: "σ+ (Δm = +1)" },
  "sigma-": { dash: "2 2", name: "σ− (Δm = −1)" },
  none: { dash: "8 3 2 3", name: "|Δm| = 2" },
};

function key(p: Polarization): keyof typeof STYLE {
  return p === null ? "none" : p;
}

function endMarker(k: keyof typeof STYLE, x: number, y: number): string {
  const s = 4.5;
  if (k === "pi") return `<path d="M${px(x - s)} ${px(y)}L${px(x + s)} ${px(y)}" stroke="#000" stroke-width="2"/>`;
  if (k === "sigma+") return `<path d="M${px(x)} ${px(y - s - 1)}L${px(x + s)} ${px(y + s - 1)}L${px(x - s)} ${px(y + s - 1)}Z" fill="#000"/>`;
  if (k === "sigma-") return `<path d="M${px(x)} ${px(y + s)}L${px(x + s)} ${px(y - s)}L${px(x - s)} ${px(y - s)}Z" fill="#fff" stroke="#000"/>`;
  return `<path d="M${px(x)} ${px(y - s)}L${px(x + s)} ${px(y)}L${px(x)} ${px(y + s)}L${px(x - s)} ${px(y)}Z" fill="#000"/>`;
}

/**
 * The stick plot as an SVG string. Each component is one `<line class="stick">`
 * with its end marker; the legend lists the polarizations present.
 */
export function stickPlotSvg(input: StickPlotInput): string {
  if (input.sticks.length === 0) throw new RangeError("no components to plot");
  const shifts = input.sticks.map((s) => toNumber(s.shift));
  const heights = input.sticks.map((s) => toNumber(s.strength));
  const hMax = Math.max(...heights);
  if (!(hMax > 0)) throw new RangeError("all strengths are zero");
  const reach = Math.max(...shifts.map(Math.abs)) || 1;
  const fu = frequencyUnit(reach);
  const ticks = linearTicks((-reach * 1.1) / fu.factor, (reach * 1.1) / fu.factor, 8);
  const lo = Math.min(-reach * 1.1, ticks[0]! * fu.factor);
  const hi = Math.max(reach * 1.1, ticks[ticks.length - 1]! * fu.factor);
  const x0 = LEFT;
  const x1 = W - RIGHT;
  const y0 = H - BOTTOM;
  const y1 = TOP;
  const X = (f: number) => x0 + ((f - lo) / (hi - lo)) * (x1 - x0);
  // The legend goes in the first top corner (right, left, middle) that no stick reaches into; where
  // every corner is taken, the sticks are scaled down under a band kept free for it.
  const order: (keyof typeof STYLE)[] = ["pi", "sigma+", "sigma-", "none"];
  const shown = order.filter((k) => input.sticks.some((st) => key(st.polarization) === k));
  const legendH = shown.length * 18 + 6;
  const LEGEND_W = 134;
  const fullY = (h: number) => y0 - (h / hMax) * (y0 - y1 - 14);
  const covers = (left: number) =>
    input.sticks.some((_, i) => {
      const x = X(shifts[i]!);
      return x >= left - 8 && x <= left + LEGEND_W + 8 && fullY(heights[i]!) <= y1 + 4 + legendH + 6;
    });
  const corners = [x1 - 138, x0 + 8, (x0 + x1) / 2 - LEGEND_W / 2];
  const free = corners.find((left) => !covers(left));
  const legendLeft = free ?? x1 - 138;
  const reserve = free === undefined ? legendH + 10 : 0;
  const Y = (h: number) => y0 - (h / hMax) * (y0 - y1 - 14 - reserve);

  const parts: string[] = [svgOpen(input.id, W, H, input.title, input.description)];
  parts.push(`<rect x="${x0}" y="${y1}" width="${x1 - x0}" height="${y0 - y1}" fill="#fff" stroke="#000"/>`);
  for (const t of ticks) {
    const x = X(t * fu.factor);
    parts.push(`<line class="tick" x1="${px(x)}" y1="${y0}" x2="${px(x)}" y2="${y0 + 5}" stroke="#000"/>`);
    parts.push(`<text class="tick-label" x="${px(x)}" y="${y0 + 19}" text-anchor="middle">${label(t)}</text>`);
  }
  parts.push(`<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${H - 14}" text-anchor="middle">${esc(`Frequency offset Δν (${fu.unit})`)}</text>`);
  if (input.wavelength !== null) {
    const lam = toNumber(input.wavelength);
    const c = toNumber(input.speedOfLight);
    const toPm = (f: number) => (-lam * lam * f) / c / 1e-12;
    const pmTicks = linearTicks(Math.min(toPm(lo), toPm(hi)), Math.max(toPm(lo), toPm(hi)), 8);
    for (const t of pmTicks) {
      const f = (-t * 1e-12 * c) / (lam * lam);
      if (f < lo || f > hi) continue;
      const x = X(f);
      parts.push(`<line class="tick" x1="${px(x)}" y1="${y1}" x2="${px(x)}" y2="${y1 - 5}" stroke="#000"/>`);
      parts.push(`<text class="tick-label" x="${px(x)}" y="${y1 - 9}" text-anchor="middle">${label(t)}</text>`);
    }
    parts.push(`<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${y1 - 28}" text-anchor="middle">Wavelength offset Δλ (pm)</text>`);
  }
  parts.push(
    `<text class="axis-label" x="18" y="${px((y0 + y1) / 2)}" text-anchor="middle" transform="rotate(-90 18 ${px((y0 + y1) / 2)})">Relative strength</text>`,
  );
  parts.push(`<line x1="${px(X(0))}" y1="${y0}" x2="${px(X(0))}" y2="${y1}" stroke="#000" stroke-opacity="0.25"/>`);
  input.sticks.forEach((s, i) => {
    const k = key(s.polarization);
    const x = X(shifts[i]!);
    const y = Y(heights[i]!);
    const dash = STYLE[k].dash;
    parts.push(
      `<line class="stick" data-polarization="${k}" x1="${px(x)}" y1="${y0}" x2="${px(x)}" y2="${px(y)}" stroke="#000" stroke-width="2"${dash ? ` stroke-dasharray="${dash}"` : ""}/>`,
    );
    parts.push(endMarker(k, x, y));
  });
  const lx = legendLeft + 6;
  let ly = y1 + 8;
  parts.push(`<g class="legend"><rect x="${lx - 6}" y="${ly - 4}" width="134" height="${shown.length * 18 + 6}" fill="#fff" stroke="#000" stroke-width="0.6"/>`);
  for (const k of shown) {
    const dash = STYLE[k].dash;
    parts.push(`<line x1="${lx}" y1="${ly + 7}" x2="${lx + 26}" y2="${ly + 7}" stroke="#000" stroke-width="2"${dash ? ` stroke-dasharray="${dash}"` : ""}/>`);
    parts.push(endMarker(k, lx + 32, ly + 7));
    parts.push(`<text x="${lx + 42}" y="${ly + 11}" font-size="11">${esc(STYLE[k].name)}</text>`);
    ly += 18;
  }
  parts.push("</g></svg>");
  return parts.join("");
}
