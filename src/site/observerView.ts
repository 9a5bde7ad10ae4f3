/**
 * The line page's section "What the observer sees": G, the angular factor of
 * each Δm with its polarization seen along and across the field, and the
 * observer stick plot, drawn for θ = 0 and θ = 90° (the printed views) and
 * once more for the θ control (src/browser/observer.ts), which redraws it.
 */
import { angularFormulaText, circularSense } from "../physics/angularFactor.js";
import { lineSecondOrder, viewFactors } from "../results/observation.js";
import type { LineResult } from "../results/types.js";
import { formatUncertain } from "./format.js";
import { csvName, safeFile, type TableHome } from "./linearTables.js";
import { observerPlotSvg, type ObserverStick } from "./plots/observerPlot.js";
import { textCell, type Table } from "./table.js";
import { makeTable } from "./tableSpec.js";

/** Superscript digits, so the page writes d² and not a caret power. */
const superscript = (n: number) => String(n).replace(/\d/g, (d) => "⁰¹²³⁴⁵⁶⁷⁸⁹"[Number(d)]!);

export const lineObserverAnchor = (lineId: string) => `line:${lineId}-observer`;

export interface ObserverView {
  anchor: string;
  /** G in words (or why it is not defined). */
  gText: string;
  /** The circular polarization of σ± seen along the field, with the convention. */
  senseText: string;
  factors: Table;
  /** Pre-rendered views for print and for pages read without scripts. */
  plotAlong: string;
  plotAcross: string;
  /** The plot the θ control redraws (drawn at 90°). */
  plotLive: string;
  /** Ids of the θ control's inputs. */
  controlId: string;
  /** Multipole rank of the line (the control's angular factors). */
  k: number;
}

function polarizationName(q: number): string {
  return q === 0 ? "π" : q === 1 ? "σ+" : q === -1 ? "σ−" : `Δm = ${q > 0 ? "+" : "−"}${Math.abs(q)}`;
}

/** Polarization of a component seen across the field (θ = 90°): linear; its direction for dipoles. */
function acrossText(multipole: string, k: number, q: number): string {
  if (viewFactors(k, q).across.isZero()) return "not seen";
  if (k !== 1) return "linear";
  const electric = multipole.startsWith("E");
  const parallel = (q === 0) === electric;
  return `linear, E ${parallel ? "∥" : "⊥"} B`;
}

function alongText(k: number, q: number): string {
  if (viewFactors(k, q).along.isZero()) return "not seen";
  return q === 1 ? "circular, counter-clockwise (IAU right, V > 0)" : "circular, clockwise (IAU left, V < 0)";
}

export function observerView(ln: LineResult, home: TableHome): ObserverView {
  const id = ln.input.id;
  const k = ln.k;
  const g = lineSecondOrder(ln);
  const gText =
    g.G === null
      ? `Second-order effective Landé factor G: ${g.GNote}.`
      : `Second-order effective Landé factor G = ${formatUncertain(g.G, g.GU, 9)} from the g values in use (exact LS value ${g.GExact!.toString()}); ` +
        `with g_eff it gives the weak-field polarization of the line: Stokes V ∝ g_eff·B, Q and U ∝ G·B² (Landi Degl'Innocenti and Landolfi 2004). ` +
        `G = g_eff² − (g_u − g_l)²(16s − 7d² − 4)/80, s = J_u(J_u+1) + J_l(J_l+1), d = J_u(J_u+1) − J_l(J_l+1); G = g_eff² when one level has J = 0.`;
  const qs = [...new Set(ln.components.map((c) => c.deltaM))].sort((a, b) => b - a);
  const factors = makeTable<number>(
    {
      id: `observer:${id}`,
      caption: `${id}: relative intensity of a component seen at θ to the field = strength × F(θ)`,
      csvPath: csvName(home, id, "angular-factors"),
      exportUrl: home.exportUrl,
      anchor: (q) => `${lineObserverAnchor(id)}:dm=${q}`,
      columns: [
        { key: "dm", label: "Δm", kind: "text", cell: (q) => textCell(q > 0 ? `+${q}` : q < 0 ? `−${-q}` : "0") },
        { key: "pol", label: "component", kind: "text", cell: (q) => textCell(polarizationName(q)) },
        { key: "F", label: "F(θ)", kind: "text", cell: (q) => textCell(angularFormulaText(k, q)) },
        { key: "F0", label: "F along the field (θ = 0)", kind: "text", cell: (q) => textCell(viewFactors(k, q).along.toString()) },
        { key: "F90", label: "F across the field (θ = 90°)", kind: "text", cell: (q) => textCell(viewFactors(k, q).across.toString()) },
        { key: "pol0", label: "seen along the field", kind: "text", cell: (q) => textCell(alongText(k, q)) },
        { key: "pol90", label: "seen across the field", kind: "text", cell: (q) => textCell(acrossText(ln.input.multipole, k, q)) },
      ],
    },
    qs,
  );
  const senseText =
    `Seen along the field (θ = 0, the field pointing toward the observer), σ+ (Δm = m_upper − m_lower = +1) is ${circularSense(1)}; ` +
    `σ− is ${circularSense(-1)}. Seen against the field (θ = 180°) both reverse. ` +
    `F(θ) = Σ over λ = ±1 of |d${superscript(k)}(Δm, λ; θ)|² = 8π/${2 * k + 1}·|X(${k}, Δm; θ)|² (d the Wigner small-d matrix of rank ${k}, X the vector spherical harmonic; the same for electric and magnetic multipoles of rank ${k}), ` +
    `so F averages to 2/${2 * k + 1} over all directions for every Δm and the strengths keep their meaning for light collected from every direction.`;
  const sticks: ObserverStick[] = ln.components.map((c) => ({
    q: c.deltaM,
    strength: Number(c.strength.num) / Number(c.strength.den),
    lorentz: c.shiftLorentz.toNumber(),
  }));
  const safe = safeFile(id);
  return {
    anchor: lineObserverAnchor(id),
    gText,
    senseText,
    factors,
    plotAlong: observerPlotSvg(`obs-${safe}-0`, id, k, sticks, 0),
    plotAcross: observerPlotSvg(`obs-${safe}-90`, id, k, sticks, 90),
    plotLive: observerPlotSvg(`obs-${safe}-live`, id, k, sticks, 90),
    controlId: `theta-${safe}`,
    k,
  };
}
