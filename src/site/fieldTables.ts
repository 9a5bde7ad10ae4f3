/**
 * Tables and pictures of the field-dependent numbers: energies at the bias
 * fields, how far the linear numbers hold, sublevel transitions with
 * field-insensitive points, fine-structure terms, hyperfine groups of a line
 * and each line at each bias field. Laid out from src/results/computeFields.ts.
 */
import { Dec, exportText } from "../physics/decimal.js";
import { formatDoubled } from "../physics/quantum.js";
import { isMagneticMultipole } from "../physics/linePattern.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import type { ConfiguredField, FieldRow, LevelFieldResult, LineAtFieldResult, LineComponentAtField, LineFieldResult, TermFieldResult } from "../results/fieldTypes.js";
import type { HyperfineLineGroup } from "../physics/hyperfineLines.js";
import type { SublevelTransition } from "../physics/field/sublevelTransitions.js";
import type { FineStructureState } from "../physics/field/fineStructure.js";
import type { LevelResult, LineResult } from "../results/types.js";
import {
  componentAtFieldAnchor,
  fieldStateAnchor,
  hyperfineComponentAnchor,
  hyperfineGroupAnchor,
  termAnchor,
  termKey,
  termStateAnchor,
  transitionAnchor,
} from "./anchors.js";
import { formatNumber, formatUncertain, polarizationSymbol, termText, transitionKindLabel } from "./format.js";
import { lockKey, rss } from "../results/fieldUncertainty.js";
import { fieldPlotSvg } from "./plots/fieldPlot.js";
import { stickPlotSvg } from "./plots/stickPlot.js";
import { csvName, safeFile, type TableHome } from "./linearTables.js";
import { fractionCell, numberCell, quantumCell, textCell, uncertainCell, type Table } from "./table.js";
import { makeTable } from "./tableSpec.js";
import { airWavelengthOfCell, frequencyCell, wavelengthCell } from "./lockTables.js";
import { absoluteFrequency } from "../physics/lockPoints.js";

const MHZ = new Dec("1e6");
const GAUSS = new Dec("1e-4");

/** A field for reading: gauss below 0.1 T, tesla from there on. */
export function fieldText(tesla: Dec | null, sig = 5): string {
  if (tesla === null) return "beyond the searched range";
  if (tesla.isZero()) return "0 G";
  if (tesla.lt("0.1")) return `${formatNumber(tesla.div(GAUSS), sig)} G`;
  return `${formatNumber(tesla, sig)} T`;
}

const stateText = (F2: number, mF2: number) => `${formatDoubled(F2)}, ${formatDoubled(mF2).replace(/^-/, "−")}`;

/**
 * Exact energies of every sublevel of a level at the configured fields. The
 * full form (level page) adds the high-field labels and the quadratic
 * coefficient; the short form (overview) has the energies only. Both rows
 * carry the same anchors, on different pages.
 */
export function energiesTable(l: LevelResult, f: LevelFieldResult, fields: ConfiguredField[], home: TableHome, full: boolean): Table {
  const lid = l.input.id;
  const hasHf = f.validity !== null;
  return makeTable<FieldRow>(
    {
      id: full ? `field-full:${lid}` : `field:${lid}`,
      caption: `${lid} ${termText(l.input.term)}: exact sublevel energies at the bias fields, from the level centre`,
      csvPath: csvName(home, lid, full ? "field-energies-full" : "field-energies"),
      exportUrl: home.exportUrl,
      anchor: (r) => fieldStateAnchor(lid, r.F2, r.mF2),
      columns: [
        { key: "F", label: hasHf ? "F" : "J", kind: "quantum", cell: (r) => quantumCell(r.F2) },
        { key: "mF", label: hasHf ? "mF" : "mJ", kind: "quantum", cell: (r) => quantumCell(r.mF2, true) },
        { key: "hf_mJ", label: "high-field mJ", kind: "quantum", when: full && hasHf, cell: (r) => quantumCell(r.highField.mJ2, true) },
        { key: "hf_mI", label: "high-field mI", kind: "quantum", when: full && hasHf, cell: (r) => quantumCell(r.highField.mI2, true) },
        {
          // levels without nuclear spin have no full table: their coefficient goes into the short one
          key: "quad", label: `quadratic${QUAD_SCOPE[f.quadratic.scope]}`, unit: "Hz/G²", kind: "number", when: full === hasHf,
          cell: (r) => uncertainCell(r.quadraticPerTesla2 === null ? null : r.quadraticPerTesla2.mul("1e-8"), r.quadraticU ? r.quadraticU.mul("1e-8") : null, 7),
        },
        ...fields.map((b, i) => ({
          key: `E${i}`, label: `E at ${b.text}`, unit: "MHz", kind: "number" as const,
          cell: (r: FieldRow) => uncertainCell(r.energies[i]!.div(MHZ), r.energiesU?.[i]?.div(MHZ) ?? null, 12),
        })),
      ],
    },
    f.rows,
  );
}

const QUAD_SCOPE = { term: "", "term-partial": " (listed partners only)", "J-only": " (within this J only)" } as const;

/** What a level's second-order coefficients include. */
export function quadraticFact(f: LevelFieldResult): string {
  const q = f.quadratic;
  const missing = q.missingJ2.map((j) => `J = ${formatDoubled(j)}`).join(" and ");
  if (q.notLS) return `Quadratic coefficients within this J only: the level is written in ${q.notLS} coupling, and the fine-structure partner sum is made for LS terms only.`;
  if (q.scope === "J-only") return `Quadratic coefficients within this J only: the fine-structure partners (${missing}) are not listed with energies.`;
  const partners = q.included.length ? `include the fine-structure partner${q.included.length > 1 ? "s" : ""} ${q.included.join(", ")} (second order through the Zeeman coupling between J levels of the term)` : "are complete: the term has no other J the field couples to";
  return `Quadratic coefficients ${partners}${q.scope === "term-partial" ? `; ${missing} of the term not listed with an energy, so not included` : ""}.`;
}

const jList = (J2s: number[]) => J2s.map(formatDoubled).join(", ");
const gJText = (l: LevelResult) =>
  l.gJFrom === "measured" ? `its measured gJ = ${l.input.gJ!.text}` : l.gJFrom === "none" ? "no gJ (J = 0)" : `its ${l.gJFrom} gJ`;

/**
 * Which solver gave a level's energies, transitions, plots and line states,
 * its basis, what it leaves out, and how the level's gJ enters (level pages
 * and the overview's energies at the bias fields).
 */
export function solverFact(l: LevelResult, f: LevelFieldResult): string {
  const lid = l.input.id;
  const nuclear = f.hyperfineListed !== null;
  const sv = f.solver;
  if (sv.kind === "single-J") {
    return nuclear
      ? `Solved within its own J (no fine-structure partners listed with energies): hyperfine + Zeeman diagonalized in |mJ, mI⟩, block by block in M = mJ + mI, with ${gJText(l)}.`
      : `Solved within its own J (no fine-structure partners listed with energies): its states |J, mJ⟩ shift linearly, (μB/h)·gJ·mJ·B, with ${gJText(l)}.`;
  }
  const others = sv.partners.join(", ");
  const basis = nuclear ? "|J, mJ, mI⟩" : "|J, mJ⟩";
  const m = nuclear ? "M = mJ + mI" : "mJ";
  return [
    `Solved together with its fine-structure partner${sv.partners.length > 1 ? "s" : ""} ${others} as one term (${sv.term}), at every field: the term Hamiltonian in ${basis} over J = ${jList(sv.J2s)}, block by block in ${m}, diagonalized in 60-digit decimal arithmetic.`,
    nuclear
      ? "The listed level energies give the fine structure; each level's A and B its hyperfine structure within its own J; hyperfine matrix elements between different J are not included."
      : "The listed level energies give the fine structure.",
    `The field couples the J levels through the LS structure, (gS − gL)·Sz; within its own J this level's Zeeman term is gJ·Jz${nuclear ? " + gI·Iz" : ""} with ${gJText(l)}, the same value its lines use.`,
  ].join(" ");
}

/** Sentences on where a level's linear numbers stop holding. */
export function validityFacts(f: LevelFieldResult): string[] {
  const v = f.validity;
  if (!v && f.solver.kind === "term") return ["No hyperfine structure: the shifts depart from linear only through the fine-structure partners (see the energies and the fine-structure section).", quadraticFact(f)];
  if (!v) return ["No hyperfine structure: in this model the shifts are exactly linear; see the fine-structure section where partners are listed.", quadraticFact(f)];
  const first = (s: { F2: number; mF2: number } | null) => (s ? ` (first to leave: F = ${formatDoubled(s.F2)}, mF = ${formatDoubled(s.mF2)})` : "");
  // the limits are searched within this J alone: the regime is information, the tables use the term solver
  const within = f.solver.kind === "term" ? " of this J alone (without its partners)" : "";
  return [
    ...(f.hyperfineListed === false ? ["No hyperfine constants are listed for this level: A = B = 0 is used, so its states are the nuclear sublevels mI of each mJ, shifting by (gJ·mJ + gI·mI)·μB·B/h."] : []),
    quadraticFact(f),
    `Linear shifts within 1 % of the exact ones${within} up to ${fieldText(v.relative.tesla)}${first(v.relative.sublevel)}.`,
    `Linear shifts within 1 kHz of the exact ones${within} up to ${fieldText(v.absolute.tesla)}${first(v.absolute.sublevel)}.`,
    ...(v.paschenBackTesla ? [`Hyperfine Paschen–Back scale (largest hyperfine interval over μB·|gJ|/h): ${fieldText(v.paschenBackTesla)}; well above it the states are |mJ, mI⟩.`] : []),
    "These limits of the linear regime are given without uncertainties (not propagated).",
  ];
}

/** Energy-against-field plots of a level (linear and logarithmic field axis), or null. */
export function levelPlots(l: LevelResult, f: LevelFieldResult, fields: ConfiguredField[]): { linear: string; log: string } | null {
  if (!f.plot) return null;
  const lid = l.input.id;
  const curves = (energies: readonly (readonly number[])[]) =>
    f.rows.map((r, i) => ({ label: `F=${formatDoubled(r.F2)}, mF=${formatDoubled(r.mF2).replace(/^-/, "−")}`, energies: energies[i]! }));
  const common = {
    title: `${lid} ${termText(l.input.term)}: sublevel energies against field`,
    description: `Energy of each (F, mF) sublevel of ${lid} from the level centre as the field grows; vertical rules mark the bias fields.`,
    rules: fields.filter((b) => b.tesla.gt(0)).map((b) => ({ tesla: b.tesla, label: b.text })),
  };
  return {
    linear: fieldPlotSvg({ ...common, id: `plot-lin-${safeFile(lid)}`, fields: f.plot.linear.fields, curves: curves(f.plot.linear.energies) }, "linear"),
    log: fieldPlotSvg({ ...common, id: `plot-log-${safeFile(lid)}`, fields: f.plot.log.fields, curves: curves(f.plot.log.energies) }, "log"),
  };
}

/** Transitions between the sublevels of a level, with their field-insensitive points; null when there are none. */
export function transitionsTable(
  l: LevelResult,
  f: LevelFieldResult,
  fields: ConfiguredField[],
  home: TableHome,
  /** Only the transitions from this lower F (doubled), for a page per lower F. */
  lowerF2?: number,
): Table | null {
  const rows = lowerF2 === undefined ? f.transitions : f.transitions.filter((t) => t.lower.F2 === lowerF2);
  if (rows.length === 0) return null;
  const lid = l.input.id;
  const positive = fields.filter((b) => b.tesla.gt(0));
  // standard uncertainties (results/fieldUncertainty.ts), by transition
  const uOf = new Map(f.transitions.map((t, k) => [t, f.transitionsU?.[k]]));
  const scaled = (x: Dec | null | undefined, k: string | Dec) => (x ? x.mul(k) : null);
  const pointText = (t: SublevelTransition, k: number) => {
    const p = t.fieldInsensitive[k]!;
    const pu = uOf.get(t)?.fieldInsensitive[k];
    const hz = `${formatUncertain(p.hz.div(MHZ), scaled(pu?.hz, new Dec(1).div(MHZ)), 12)} MHz`;
    // gauss below 0.1 T, tesla from there on (as fieldText), each with its uncertainty
    const where = p.tesla.isZero()
      ? fieldText(p.tesla, 7)
      : p.tesla.lt("0.1")
        ? `${formatUncertain(p.tesla.div(GAUSS), scaled(pu?.tesla, new Dec(1).div(GAUSS)), 7)} G`
        : `${formatUncertain(p.tesla, pu?.tesla ?? null, 7)} T`;
    return `${where} (${hz})${pu && !pu.propagated ? " (uncertainty not propagated)" : ""}`;
  };
  return makeTable<SublevelTransition>(
    {
      id: lowerF2 === undefined ? `rf:${lid}` : `rf:${lid}:F=${formatDoubled(lowerF2)}`,
      caption: `${lid} ${termText(l.input.term)}: transitions between sublevels (microwave and radio frequency)${lowerF2 === undefined ? "" : `, from F = ${formatDoubled(lowerF2)}`}`,
      csvPath: lowerF2 === undefined ? csvName(home, lid, "transitions") : csvName(home, lid, "transitions-from-F", formatDoubled(lowerF2)),
      exportUrl: home.exportUrl,
      anchor: (t) => transitionAnchor(lid, t.lower, t.upper),
      columns: [
        { key: "lower", label: "lower (F, mF)", kind: "text", cell: (t) => textCell(stateText(t.lower.F2, t.lower.mF2)) },
        { key: "upper", label: "upper (F, mF)", kind: "text", cell: (t) => textCell(stateText(t.upper.F2, t.upper.mF2)) },
        { key: "f0", label: "f at 0 G", unit: "MHz", kind: "number", cell: (t) => uncertainCell(t.zeroFieldHz.div(MHZ), scaled(uOf.get(t)?.zeroFieldHz, new Dec(1).div(MHZ)), 12) },
        {
          key: "insensitive", label: "field-insensitive at", kind: "text",
          // the concise uncertainties inside the text are hideable by the page's switch (Cell.prose)
          cell: (t) => ({
            ...textCell(
              t.fieldInsensitive.length === 0
                ? `none below ${fieldText(f.insensitiveSearchTesla)}`
                : t.fieldInsensitive.map((_, k) => pointText(t, k)).join("; "),
            ),
            prose: true,
          }),
        },
        { key: "kind", label: "kind", kind: "text", cell: (t) => textCell(transitionKindLabel(t.kind)) },
        { key: "d1", label: "df/dB", unit: "kHz/G", kind: "number", cell: (t) => uncertainCell(t.firstOrder.hzPerGauss.div("1e3"), scaled(uOf.get(t)?.firstOrderHzPerTesla, "1e-7"), 9) },
        { key: "d2", label: "d²f/dB² ÷ 2", unit: "Hz/G²", kind: "number", cell: (t) => uncertainCell(t.secondOrder ? t.secondOrder.hzPerGauss2 : null, scaled(uOf.get(t)?.secondOrderHzPerTesla2, "1e-8"), 7) },
        ...positive.map((b, i) => ({
          key: `f${i}`, label: `f at ${b.text}`, unit: "MHz", kind: "number" as const,
          cell: (t: SublevelTransition) => {
            const at = t.atFields.findIndex((a) => a === t.atFields.filter((x) => x.tesla.gt(0))[i]);
            return uncertainCell(t.atFields[at]!.hz.div(MHZ), scaled(uOf.get(t)?.atFields[at], new Dec(1).div(MHZ)), 12);
          },
        })),
      ],
    },
    rows,
  );
}

/**
 * A component's wavelength shift in pm, Δλ = −Δν·λ/ν = −Δν·λ²/c, with its
 * standard uncertainty: Δν and λ share no input, so
 * u(Δλ)² = (λ/ν·u(Δν))² + (2Δν/ν·u(λ))² (∂Δλ/∂λ = −2Δν·λ/c = −2Δν/ν).
 */
function wavelengthShiftCell(shiftHz: Dec, shiftU: Dec | null, lambda: Dec, lambdaU: Dec | null, nu: Dec) {
  const pm = new Dec("1e12");
  const value = shiftHz.neg().mul(lambda).div(nu).mul(pm);
  const fromShift = shiftU ? shiftU.mul(lambda).div(nu).mul(pm) : null;
  const fromLambda = lambdaU && !shiftHz.isZero() ? shiftHz.abs().mul(2).mul(lambdaU).div(nu).mul(pm) : null;
  return uncertainCell(value, rss(fromShift, fromLambda), 6);
}

/** What is said about a fine-structure term treated in the Paschen–Back solver. */
export function termFacts(t: TermFieldResult): string[] {
  return [
    `Fine-structure partners: ${t.levelIds.join(", ")}.`,
    t.fit.zeta
      ? `Spin–orbit constant ζ/h = ${formatUncertain(t.fit.zeta.div("1e9"), t.zetaU ? t.zetaU.div("1e9") : null, 9)} GHz from the listed energies${t.levelIds.length > 2 ? ` (interval-rule residual, rms: ${formatNumber(t.fit.rms.div("1e9"), 4)} GHz)` : ""}.`
      : "Spin–orbit constant: not defined for this term.",
    `The J-resolved linear pattern is off by more than 1 % from ${t.limit ? fieldText(t.limit.tesla) : "no field below the searched range"}${t.limit ? ` (first: J = ${formatDoubled(t.limit.J2)}, mJ = ${formatDoubled(t.limit.mJ2)})` : ""}.`,
    ...(t.paschenBackTesla ? [`Fine-structure Paschen–Back scale (largest interval over μB/h): ${fieldText(t.paschenBackTesla)}.`] : []),
    "This table leaves hyperfine structure out (spin–orbit + Zeeman in |mL mS⟩, with the LS g-factors): it shows the fine-structure mixing alone. The levels' energies, transitions and line components use the term solver, with hyperfine structure within each J and each level's gJ in use (see each level).",
  ];
}

/** The states of a fine-structure term at every bias field. */
export function termTable(t: TermFieldResult, fields: ConfiguredField[], home: TableHome): Table {
  const first = t.atFields[0] ?? [];
  return makeTable<FineStructureState>(
    {
      id: `term:${termKey(t.key)}`,
      caption: `${t.key}: fine-structure states at the bias fields (spin–orbit + Zeeman in |mL mS⟩)`,
      csvPath: csvName(home, "term", termKey(t.key)),
      exportUrl: home.exportUrl,
      anchor: (st) => termStateAnchor(t.key, st.J2, st.mJ2),
      columns: [
        { key: "J", label: "J", kind: "quantum", cell: (st) => quantumCell(st.J2) },
        { key: "mJ", label: "mJ", kind: "quantum", cell: (st) => quantumCell(st.mJ2, true) },
        { key: "mL", label: "high-field mL", kind: "quantum", cell: (st) => quantumCell(st.mL2, true) },
        { key: "mS", label: "high-field mS", kind: "quantum", cell: (st) => quantumCell(st.mS2, true) },
        ...fields.map((b, i) => ({
          key: `E${i}`, label: `shift at ${b.text}`, unit: "MHz", kind: "number" as const,
          cell: (_st: FineStructureState, k: number) => uncertainCell(t.atFields[i]![k]!.shift.div(MHZ), t.atFieldsU?.[i]?.[k]?.div(MHZ) ?? null, 12),
        })),
      ],
    },
    first,
  );
}

export { termAnchor };

/** The uncertainties of a line's weak-field hyperfine pattern (computeFields; fieldUncertainty.ts), when known. */
export type HyperfinePatternU = Pick<LineFieldResult, "hyperfineOffsetU" | "hyperfineU">;

/** Hyperfine lines F → F′ of a line at low field, with the uncertainties of offsets, frequencies and gF in the concise form. */
export function hyperfineGroupsTable(ln: LineResult, groups: HyperfineLineGroup[], home: TableHome, un: HyperfinePatternU = {}): Table {
  const id = ln.input.id;
  const nu0 = ln.frequencyHz;
  const offU = (g: HyperfineLineGroup) => un.hyperfineOffsetU?.get(lockKey([g.Fl2], [g.Fu2])) ?? null;
  const gU = (g: HyperfineLineGroup) => un.hyperfineU?.[groups.indexOf(g)];
  return makeTable<HyperfineLineGroup>(
    {
      id: `hfl:${id}`,
      caption: `${id}: hyperfine lines F → F′ at low field`,
      csvPath: csvName(home, id, "hyperfine-groups"),
      exportUrl: home.exportUrl,
      anchor: (g) => hyperfineGroupAnchor(id, g.Fu2, g.Fl2),
      columns: [
        { key: "Fu", label: "F upper", kind: "quantum", cell: (g) => quantumCell(g.Fu2) },
        { key: "Fl", label: "F lower", kind: "quantum", cell: (g) => quantumCell(g.Fl2) },
        { key: "S", label: "strength (of line)", kind: "fraction", cell: (g) => fractionCell(g.strength) },
        { key: "Sl", label: "share of lower F", kind: "fraction", cell: (g) => fractionCell(g.shareOfLower) },
        { key: "off", label: "offset from line centre", unit: "MHz", kind: "number", cell: (g) => uncertainCell(g.offset.div(MHZ), offU(g)?.div(MHZ) ?? null, 10) },
        { key: "nu", label: "frequency", unit: "THz", kind: "number", when: nu0 !== null, cell: (g) => frequencyCell(absoluteFrequency(nu0!, g.offset), rss(offU(g), ln.frequencyHzU)) },
        { key: "lambda", label: "vacuum wavelength", unit: "nm", kind: "number", when: nu0 !== null, cell: (g) => wavelengthCell(absoluteFrequency(nu0!, g.offset), rss(offU(g), ln.frequencyHzU)) },
        { key: "lambda_air", label: "air wavelength", unit: "nm", kind: "number", when: nu0 !== null, cell: (g) => airWavelengthOfCell(absoluteFrequency(nu0!, g.offset)) },
        { key: "gFu", label: "gF upper", kind: "number", cell: (g) => uncertainCell(g.gFu, gU(g)?.gFu ?? null, 9) },
        { key: "gFl", label: "gF lower", kind: "number", cell: (g) => uncertainCell(g.gFl, gU(g)?.gFl ?? null, 9) },
      ],
    },
    groups,
  );
}

/** Hyperfine Zeeman components (F, mF) → (F′, mF′) of a line at low field, the shifts with their uncertainties. */
export function hyperfineComponentsTable(ln: LineResult, groups: HyperfineLineGroup[], home: TableHome, un: HyperfinePatternU = {}): Table {
  const id = ln.input.id;
  const rows = groups.flatMap((g, gi) => g.components.map((c, ci) => ({ g, c, u: un.hyperfineU?.[gi]?.shiftHzPerT[ci] ?? null })));
  return makeTable<(typeof rows)[number]>(
    {
      id: `hfc:${id}`,
      caption: `${id}: hyperfine Zeeman components at low field (cycling lines marked)`,
      csvPath: csvName(home, id, "hyperfine-components"),
      exportUrl: home.exportUrl,
      anchor: ({ g, c }) => hyperfineComponentAnchor(id, g.Fu2, c.mFu2, g.Fl2, c.mFl2),
      columns: [
        { key: "Fu", label: "F upper", kind: "quantum", cell: ({ g }) => quantumCell(g.Fu2) },
        { key: "mFu", label: "mF upper", kind: "quantum", cell: ({ c }) => quantumCell(c.mFu2, true) },
        { key: "Fl", label: "F lower", kind: "quantum", cell: ({ g }) => quantumCell(g.Fl2) },
        { key: "mFl", label: "mF lower", kind: "quantum", cell: ({ c }) => quantumCell(c.mFl2, true) },
        { key: "pol", label: "polarization", kind: "text", cell: ({ c }) => textCell(polarizationSymbol(c.polarization, (c.mFu2 - c.mFl2) / 2)) },
        { key: "S", label: "strength (of line)", kind: "fraction", cell: ({ c }) => fractionCell(c.strength) },
        { key: "shift", label: "shift", unit: "MHz/G", kind: "number", cell: ({ c, u }) => uncertainCell(c.shiftHzPerT.mul("1e-10"), u === null ? null : u.mul("1e-10"), 9) },
        { key: "cyc", label: "cycling", kind: "text", cell: ({ c }) => textCell(c.cycling ? "cycling" : "") },
      ],
    },
    rows,
  );
}

/** The components of a line at one bias field, with their states, strengths and shifts. */
export function atFieldTable(ln: LineResult, a: LineAtFieldResult, home: TableHome): Table {
  const id = ln.input.id;
  const tesla = exportText(a.field.tesla, 30);
  const wavelength = ln.input.wavelength;
  return makeTable<LineComponentAtField>(
    {
      id: `atB:${id}:${tesla}T`,
      caption: `${id} at ${a.field.text}: components (${a.model})`,
      csvPath: csvName(home, id, "at", a.field.text.replace(/\s+/g, "")),
      exportUrl: home.exportUrl,
      anchor: (c) => componentAtFieldAnchor(id, tesla, c.upperLabel, c.lowerLabel),
      // builds before the term solver named the strongest component of each high-field pair by fine-structure states
      aliases: (c) => (c.aliasLabels ? [componentAtFieldAnchor(id, tesla, c.aliasLabels.upper, c.aliasLabels.lower)] : []),
      columns: [
        { key: "upper", label: "upper state", kind: "text", cell: (c) => textCell(c.upperLabel.replace(/-/g, "−")) },
        { key: "lower", label: "lower state", kind: "text", cell: (c) => textCell(c.lowerLabel.replace(/-/g, "−")) },
        { key: "pol", label: "polarization", kind: "text", cell: (c) => textCell(polarizationSymbol(c.polarization, c.q)) },
        { key: "strength", label: "relative strength", kind: "number", cell: (c) => numberCell(c.strength, 6) },
        { key: "shift", label: "shift from line centre", unit: "MHz", kind: "number", cell: (c) => uncertainCell(c.shiftHz.div(MHZ), c.shiftHzU ? c.shiftHzU.div(MHZ) : null, 10) },
        { key: "nu", label: "frequency", unit: "THz", kind: "number", when: ln.frequencyHz !== null, cell: (c) => frequencyCell(absoluteFrequency(ln.frequencyHz!, c.shiftHz), rss(c.shiftHzU, ln.frequencyHzU)) },
        {
          key: "dl", label: "wavelength shift", unit: "pm", kind: "number",
          cell: (c) => (wavelength && ln.frequencyHz ? wavelengthShiftCell(c.shiftHz, c.shiftHzU ?? null, wavelength.si, wavelength.siUncertainty, ln.frequencyHz) : numberCell(null)),
        },
      ],
    },
    a.components,
  );
}

/** The basis of a line's model at a field, for its heading. */
export function modelBasis(a: LineAtFieldResult): string {
  switch (a.model) {
    case "term hyperfine–Zeeman eigenstates":
      return "|J, mJ, mI⟩ over the listed J of a term; no hyperfine matrix elements between different J";
    case "term Zeeman eigenstates":
      return "|J, mJ⟩ over the listed J of a term";
    case "hyperfine–Zeeman eigenstates":
      return "|mJ, mI⟩ of each level's own J";
    default:
      return "|J, mJ⟩ of each level, linear shifts";
  }
}

/**
 * What a line's components at a field come from, in words: each level's
 * solver and basis, the reduced elements, what is left out, how gJ enters.
 * Empty for the J-resolved linear pattern (its own sentence says it).
 */
export function lineModelText(ln: LineResult, a: LineAtFieldResult, levelOf: (id: string) => LevelFieldResult): string {
  if (a.model === "J-resolved linear pattern") return "";
  const side = (l: LevelResult, which: string) => {
    const sv = levelOf(l.input.id).solver;
    return sv.kind === "term"
      ? `${which} level ${l.input.id}: its term ${sv.term} solved whole (J = ${jList(sv.J2s)}, with ${sv.partners.join(", ")})`
      : `${which} level ${l.input.id}: its own J alone`;
  };
  const parts = [`Components between the field eigenstates of both levels, each from its own level's solver, as in the level tables (${side(ln.upper, "upper")}; ${side(ln.lower, "lower")}).`];
  if (a.model !== "hyperfine–Zeeman eigenstates") {
    parts.push(
      a.reduced === "LS"
        ? "Transition amplitudes between the J of the terms from LS coupling (reduced elements by Edmonds eq. 7.1.7), so the amplitudes a mixed state has on its partner J count too."
        : isMagneticMultipole(ln.input.multipole)
          ? `Transition amplitudes from the line's own J pair only (an ${ln.input.multipole} line: the spin part of a magnetic multipole is not modelled, so no reduced elements between the other J of the terms are taken); a mixed state's amplitudes on its partner J add none.`
          : "Transition amplitudes from the line's own J pair only (a change of spin: LS coupling gives no reduced elements between the other J); a mixed state's amplitudes on its partner J add none.",
    );
    if (a.model === "term hyperfine–Zeeman eigenstates") parts.push("Hyperfine structure is kept within each J; hyperfine matrix elements between different J are not included.");
  }
  parts.push("Each level's gJ in use (measured where given) acts within its own J at both ends of the line; the coupling between J levels is the LS one. Shifts are from the zero-field, hyperfine-free line centre.");
  return parts.join(" ");
}

/** The stick plot of a line at one bias field. */
export function atFieldPlot(ln: LineResult, a: LineAtFieldResult): string {
  const id = ln.input.id;
  return stickPlotSvg({
    id: `sticks-${safeFile(id)}-${safeFile(a.field.text)}`,
    title: `${id} at ${a.field.text}`,
    description: `Zeeman components of ${id} at ${a.field.text}: position from the zero-field line centre and relative strength; π solid, σ dashed.`,
    sticks: a.components.map((c) => ({ shift: c.shiftHz, strength: c.strength, polarization: c.polarization })),
    wavelength: ln.input.wavelength?.si ?? null,
    speedOfLight: SPEED_OF_LIGHT,
  });
}
