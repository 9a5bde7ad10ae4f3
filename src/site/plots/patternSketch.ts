/**
 * A small picture of a line's linear Zeeman pattern for the overview row:
 * each component a stick at its shift in Lorentz units, π above the axis and
 * σ (and |Δm| = 2) below it, as the pattern is usually drawn (common
 * practice), height proportional to strength. Styles as in the full stick
 * plot (stickPlot.ts): π solid, σ+ dashed, σ− dotted, |Δm| = 2 dash-dot; no
 * colour is needed to tell them apart. The scale is symmetric about 0 and
 * labelled with its half-width in Lorentz units.
 */
import type { Dec } from "../../physics/decimal.js";
import type { Polarization } from "../../physics/linePattern.js";
import { label, px, svgOpen } from "./svgParts.js";

export interface SketchStick {
  /** Shift in Lorentz units. */
  lorentz: Dec;
  strength: Dec;
  polarization: Polarization;
}

const W = 168;
const H = 52;
const PAD = 8;
const MID = H / 2;
const REACH = MID - 6;

const DASH: Record<string, string> = { "sigma+": "3 2", "sigma-": "1 2", pi: "", null: "4 2 1 2" };

export function patternSketchSvg(id: string, lineId: string, sticks: SketchStick[]): string {
  const half = Math.max(1e-9, ...sticks.map((s) => Math.abs(s.lorentz.toNumber())));
  const top = Math.max(1e-30, ...sticks.map((s) => s.strength.toNumber()));
  const x = (l: number) => PAD + ((l + half) / (2 * half)) * (W - 2 * PAD);
  const parts = [
    svgOpen(id, W, H, `${lineId}: linear Zeeman pattern`, `Components of ${lineId} at their shifts in Lorentz units from −${label(half)} to +${label(half)}; π above the axis, σ below, height by strength.`),
    `<line x1="${PAD}" y1="${MID}" x2="${W - PAD}" y2="${MID}" stroke="#000" stroke-width="0.6"/>`,
  ];
  for (const s of sticks) {
    const xs = px(x(s.lorentz.toNumber()));
    const h = (s.strength.toNumber() / top) * REACH;
    const y = s.polarization === "pi" ? MID - h : MID + h;
    const dash = DASH[String(s.polarization)];
    parts.push(`<line x1="${xs}" y1="${MID}" x2="${xs}" y2="${px(y)}" stroke="#000" stroke-width="1.6"${dash ? ` stroke-dasharray="${dash}"` : ""}/>`);
  }
  parts.push(`<text x="${W - PAD}" y="${H - 1}" text-anchor="end" font-size="9">±${label(half)}</text>`, "</svg>");
  return parts.join("");
}
