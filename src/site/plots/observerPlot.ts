/**
 * The observer stick plot of a line: its J-resolved Zeeman components at
 * their shifts in Lorentz units (g values in use), each stick as high as
 * the component looks from the angle θ between the field and the line of
 * sight (observerGeometry.ts). Drawn at build time for θ = 0 and 90° (the
 * printed views) and for the page's θ control, which redraws the same SVG in
 * the browser: each stick is a `<g class="obs-stick">` with its Δm and
 * strength as data attributes, a `<line>` whose y2 is the top, and an end
 * marker moved by a transform. Styles as in the other stick plots: π solid
 * with a flat bar, σ+ dashed with an up-pointing triangle, σ− dotted with a
 * down-pointing triangle, |Δm| ≥ 2 dash-dot with a diamond.
 */
import { esc, label, linearTicks, px, svgOpen } from "./svgParts.js";
import { observedHeights, OBS_H, OBS_LEFT, OBS_RIGHT, OBS_W, OBS_Y0, OBS_Y1, stickTopY, thetaText, type ObservedStick } from "./observerGeometry.js";

export interface ObserverStick extends ObservedStick {
  /** Shift in Lorentz units (g values in use). */
  lorentz: number;
}

function style(q: number): { dash: string; name: string; key: string } {
  if (q === 0) return { dash: "", name: "π (Δm = 0)", key: "pi" };
  if (q === 1) return { dash: "6 3", name: "σ+ (Δm = +1)", key: "sigma+" };
  if (q === -1) return { dash: "2 2", name: "σ− (Δm = −1)", key: "sigma-" };
  return { dash: "8 3 2 3", name: `|Δm| = ${Math.abs(q)}`, key: `dm${Math.abs(q)}` };
}

/** The end marker of a stick, drawn at y = 0 (moved to the top by a transform). */
function marker(q: number, x: number): string {
  const s = 4.5;
  if (q === 0) return `<path d="M${px(x - s)} 0L${px(x + s)} 0" stroke="#000" stroke-width="2"/>`;
  if (q === 1) return `<path d="M${px(x)} ${px(-s - 1)}L${px(x + s)} ${px(s - 1)}L${px(x - s)} ${px(s - 1)}Z" fill="#000"/>`;
  if (q === -1) return `<path d="M${px(x)} ${px(s)}L${px(x + s)} ${px(-s)}L${px(x - s)} ${px(-s)}Z" fill="#fff" stroke="#000"/>`;
  return `<path d="M${px(x)} ${px(-s)}L${px(x + s)} 0L${px(x)} ${px(s)}L${px(x - s)} 0Z" fill="#000"/>`;
}

/**
 * The plot as an SVG string, for a line of multipole rank k seen at θ
 * (degrees). `id` must be unique on the page.
 */
export function observerPlotSvg(id: string, lineId: string, k: number, sticks: readonly ObserverStick[], thetaDeg: number): string {
  if (sticks.length === 0) throw new RangeError("no components to plot");
  const reach = Math.max(...sticks.map((s) => Math.abs(s.lorentz))) || 1;
  const ticks = linearTicks(-reach * 1.1, reach * 1.1, 8);
  const lo = Math.min(-reach * 1.1, ticks[0]!);
  const hi = Math.max(reach * 1.1, ticks[ticks.length - 1]!);
  const x0 = OBS_LEFT;
  const x1 = OBS_W - OBS_RIGHT;
  const X = (u: number) => x0 + ((u - lo) / (hi - lo)) * (x1 - x0);
  const heights = observedHeights(sticks, k, thetaDeg);
  const parts: string[] = [
    svgOpen(
      id,
      OBS_W,
      OBS_H,
      `${lineId} seen at θ = ${thetaText(thetaDeg)} to the field`,
      `Zeeman components of ${lineId} at their shifts in Lorentz units; each stick as high as the component looks from an angle θ to the magnetic field: its strength times the angular factor of its Δm.`,
    ),
  ];
  parts.push(`<rect x="${x0}" y="${OBS_Y1 - 10}" width="${x1 - x0}" height="${OBS_Y0 - OBS_Y1 + 10}" fill="#fff" stroke="#000"/>`);
  for (const t of ticks) {
    const x = X(t);
    parts.push(`<line class="tick" x1="${px(x)}" y1="${OBS_Y0}" x2="${px(x)}" y2="${OBS_Y0 + 5}" stroke="#000"/>`);
    parts.push(`<text class="tick-label" x="${px(x)}" y="${OBS_Y0 + 19}" text-anchor="middle">${label(t)}</text>`);
  }
  parts.push(`<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${OBS_H - 14}" text-anchor="middle">Shift (Lorentz units, μB·B/h)</text>`);
  const mid = (OBS_Y0 + OBS_Y1) / 2;
  parts.push(`<text class="axis-label" x="18" y="${px(mid)}" text-anchor="middle" transform="rotate(-90 18 ${px(mid)})">Intensity seen at θ</text>`);
  parts.push(`<text class="obs-theta" x="${x0}" y="${OBS_Y1 - 16}">θ = ${esc(thetaText(thetaDeg))}</text>`);
  parts.push(`<line x1="${px(X(0))}" y1="${OBS_Y0}" x2="${px(X(0))}" y2="${OBS_Y1 - 10}" stroke="#000" stroke-opacity="0.25"/>`);
  sticks.forEach((s, i) => {
    const st = style(s.q);
    const x = X(s.lorentz);
    const y = stickTopY(heights[i]!);
    parts.push(
      `<g class="obs-stick" data-q="${s.q}" data-strength="${s.strength}" data-polarization="${st.key}"${heights[i]! > 0 ? "" : ' opacity="0.3"'}>` +
        `<line x1="${px(x)}" y1="${OBS_Y0}" x2="${px(x)}" y2="${px(y)}" stroke="#000" stroke-width="2"${st.dash ? ` stroke-dasharray="${st.dash}"` : ""}/>` +
        `<g class="obs-marker" transform="translate(0 ${px(y)})">${marker(s.q, x)}</g></g>`,
    );
  });
  const shown = [...new Set(sticks.map((s) => s.q))].sort((a, b) => Math.abs(a) - Math.abs(b) || b - a);
  let lx = x1 - 8;
  const ly = OBS_Y1 - 16;
  const legend: string[] = [];
  for (const q of shown.reverse()) {
    const st = style(q);
    const w = 40 + st.name.length * 6.2;
    lx -= w;
    legend.push(
      `<line x1="${px(lx)}" y1="${ly - 4}" x2="${px(lx + 22)}" y2="${ly - 4}" stroke="#000" stroke-width="2"${st.dash ? ` stroke-dasharray="${st.dash}"` : ""}/>` +
        `<g transform="translate(0 ${ly - 4})">${marker(q, lx + 28)}</g><text x="${px(lx + 36)}" y="${ly}" font-size="11">${esc(st.name)}</text>`,
    );
  }
  parts.push(`<g class="legend">${legend.join("")}</g>`);
  parts.push("</svg>");
  return parts.join("");
}
