/**
 * Rows and pictures of the field-dependent part of a species page: energies
 * at the bias fields, how far the linear numbers hold, sublevel transitions
 * with field-insensitive points, fine-structure terms, and each line at each
 * bias field. Everything here is laid out from src/results/computeFields.ts.
 */
import { Dec } from "../physics/decimal.js";
import { exportText } from "../physics/decimal.js";
import { formatDoubled } from "../physics/quantum.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import type { SpeciesFieldResult } from "../results/computeFields.js";
import type { ConfiguredField, LevelFieldResult, LineFieldResult, TermFieldResult } from "../results/fieldTypes.js";
import type { LevelResult, LineResult, SpeciesResult } from "../results/types.js";
import { fieldStateAnchor, transitionAnchor } from "./anchors.js";
import { formatNumber, polarizationSymbol } from "./format.js";
import { fieldPlotSvg } from "./plots/fieldPlot.js";
import { stickPlotSvg } from "./plots/stickPlot.js";
import { safeFile } from "./speciesPage.js";
import { alignTable, type Cell, fractionCell, numberCell, quantumCell, type Table, textCell } from "./table.js";

const MHZ = new Dec("1e6");
const GAUSS = new Dec("1e-4");

/** A field for reading: gauss below 0.1 T, tesla from there on. */
export function fieldText(tesla: Dec | null, sig = 5): string {
  if (tesla === null) return "beyond the searched range";
  if (tesla.isZero()) return "0 G";
  if (tesla.lt("0.1")) return `${formatNumber(tesla.div(GAUSS), sig)} G`;
  return `${formatNumber(tesla, sig)} T`;
}

function fieldHeader(f: ConfiguredField): string {
  return f.text;
}


export interface LevelFieldSection {
  levelId: string;
  anchor: string;
  energies: Table;
  /** Sentences on where the linear numbers stop holding. */
  validity: string[];
  plots: { linear: string; log: string } | null;
  transitions: Table | null;
}

export interface TermSection {
  key: string;
  anchor: string;
  facts: string[];
  energies: Table;
}

export interface LineFieldSection {
  lineId: string;
  anchor: string;
  atFields: { anchor: string; heading: string; regime: string; model: string; plot: string; components: Table }[];
  hyperfine: Table | null;
  hyperfineComponents: Table | null;
}

export interface FieldSections {
  levels: LevelFieldSection[];
  terms: TermSection[];
  lines: LineFieldSection[];
}

function levelSection(l: LevelResult, f: LevelFieldResult, fields: ConfiguredField[], csvBase: string): LevelFieldSection {
  const lid = l.input.id;
  const base = `${csvBase}/field-${safeFile(lid)}`;
  const hasHf = f.validity !== null;
  const energies: Table = {
    id: `field:${lid}`,
    caption: `${l.input.term.text} (${lid}): exact sublevel energies at the bias fields, from the level centre`,
    csvPath: `${base}-energies.csv`,
    columns: [
      { key: "F", label: hasHf ? "F" : "J", kind: "quantum" },
      { key: "mF", label: hasHf ? "mF" : "mJ", kind: "quantum" },
      ...(hasHf
        ? [
            { key: "hf_mJ", label: "high-field mJ", kind: "quantum" as const },
            { key: "hf_mI", label: "high-field mI", kind: "quantum" as const },
            { key: "quad", label: "quadratic", unit: "Hz/G²", kind: "number" as const },
          ]
        : []),
      ...fields.map((b, i) => ({ key: `E${i}`, label: `E at ${fieldHeader(b)}`, unit: "MHz", kind: "number" as const })),
    ],
    rows: f.rows.map((r) => ({
      anchor: fieldStateAnchor(lid, r.F2, r.mF2),
      cells: [
        quantumCell(r.F2),
        quantumCell(r.mF2, true),
        ...(hasHf
          ? [
              quantumCell(r.highField.mJ2, true),
              quantumCell(r.highField.mI2, true),
              numberCell(r.quadraticPerTesla2 === null ? null : r.quadraticPerTesla2.mul("1e-8"), 7),
            ]
          : []),
        ...r.energies.map((e) => numberCell(e.div(MHZ), 12)),
      ],
    })),
  };
  const validity: string[] = [];
  if (f.validity) {
    const v = f.validity;
    validity.push(`Linear shifts within 1 % of the exact ones up to ${fieldText(v.relative.tesla)}${v.relative.sublevel ? ` (first to leave: F = ${formatDoubled(v.relative.sublevel.F2)}, mF = ${formatDoubled(v.relative.sublevel.mF2)})` : ""}.`);
    validity.push(`Linear shifts within 1 kHz of the exact ones up to ${fieldText(v.absolute.tesla)}${v.absolute.sublevel ? ` (first to leave: F = ${formatDoubled(v.absolute.sublevel.F2)}, mF = ${formatDoubled(v.absolute.sublevel.mF2)})` : ""}.`);
    if (v.paschenBackTesla) validity.push(`Hyperfine Paschen–Back scale (largest hyperfine interval over μB·|gJ|/h): ${fieldText(v.paschenBackTesla)}; well above it the states are |mJ, mI⟩.`);
  } else {
    validity.push("No hyperfine structure: in this model the shifts are exactly linear; see the fine-structure section where partners are listed.");
  }
  let plots: LevelFieldSection["plots"] = null;
  if (f.plot) {
    const curves = (energies: readonly (readonly number[])[]) =>
      f.rows.map((r, i) => ({ label: `F=${formatDoubled(r.F2)}, mF=${formatDoubled(r.mF2).replace(/^-/, "−")}`, energies: energies[i]! }));
    const rules = fields.filter((b) => b.tesla.gt(0)).map((b) => ({ tesla: b.tesla, label: b.text }));
    const common = {
      title: `${l.input.term.text} (${lid}): sublevel energies against field`,
      description: `Energy of each (F, mF) sublevel of ${lid} from the level centre as the field grows; vertical rules mark the bias fields.`,
      rules,
    };
    plots = {
      linear: fieldPlotSvg({ ...common, id: `plot-lin-${safeFile(lid)}`, fields: f.plot.linear.fields, curves: curves(f.plot.linear.energies) }, "linear"),
      log: fieldPlotSvg({ ...common, id: `plot-log-${safeFile(lid)}`, fields: f.plot.log.fields, curves: curves(f.plot.log.energies) }, "log"),
    };
  }
  const transitions: Table | null =
    f.transitions.length === 0
      ? null
      : {
          id: `rf:${lid}`,
          caption: `${l.input.term.text} (${lid}): transitions between sublevels (microwave and radio frequency)`,
          csvPath: `${base}-transitions.csv`,
          columns: [
            { key: "lower", label: "lower (F, mF)", kind: "text" },
            { key: "upper", label: "upper (F, mF)", kind: "text" },
            { key: "kind", label: "kind", kind: "text" },
            { key: "f0", label: "f at 0 G", unit: "MHz", kind: "number" },
            { key: "d1", label: "df/dB", unit: "kHz/G", kind: "number" },
            { key: "d2", label: "d²f/dB² ÷ 2", unit: "Hz/G²", kind: "number" },
            ...fields.filter((b) => b.tesla.gt(0)).map((b, i) => ({ key: `f${i}`, label: `f at ${b.text}`, unit: "MHz", kind: "number" as const })),
            { key: "insensitive", label: "field-insensitive at", kind: "text" },
          ],
          rows: f.transitions.map((t) => ({
            anchor: transitionAnchor(lid, t.lower, t.upper),
            cells: [
              textCell(`${formatDoubled(t.lower.F2)}, ${formatDoubled(t.lower.mF2).replace(/^-/, "−")}`),
              textCell(`${formatDoubled(t.upper.F2)}, ${formatDoubled(t.upper.mF2).replace(/^-/, "−")}`),
              textCell(t.kind === "two-photon" ? "two-photon" : "magnetic dipole"),
              numberCell(t.zeroFieldHz.div(MHZ), 12),
              numberCell(t.firstOrder.hzPerGauss.div("1e3"), 9),
              numberCell(t.secondOrder ? t.secondOrder.hzPerGauss2 : null, 7),
              ...t.atFields.filter((a) => a.tesla.gt(0)).map((a) => numberCell(a.hz.div(MHZ), 12)),
              textCell(
                t.fieldInsensitive.length === 0
                  ? "none below 1 T"
                  : t.fieldInsensitive.map((p) => `${fieldText(p.tesla, 7)} (${formatNumber(p.hz.div(MHZ), 12)} MHz)`).join("; "),
              ),
            ],
          })),
        };
  return { levelId: lid, anchor: `field:${lid}-section`, energies, validity, plots, transitions };
}

function termSection(t: TermFieldResult, fields: ConfiguredField[], csvBase: string): TermSection {
  // Term keys read "5p 2P°"; ids and URLs want neither spaces nor the degree sign.
  const key = t.key.replace(/\s+/g, "-").replace(/°/g, "o");
  const facts = [
    `Fine-structure partners: ${t.levelIds.join(", ")}.`,
    t.fit.zeta ? `Spin–orbit constant ζ/h = ${formatNumber(t.fit.zeta.div("1e9"), 9)} GHz from the listed energies${t.levelIds.length > 2 ? ` (interval-rule residual, rms: ${formatNumber(t.fit.rms.div("1e9"), 4)} GHz)` : ""}.` : "Spin–orbit constant: not defined for this term.",
    `The J-resolved linear pattern is off by more than 1 % from ${t.limit ? fieldText(t.limit.tesla) : "no field below the searched range"}${t.limit ? ` (first: J = ${formatDoubled(t.limit.J2)}, mJ = ${formatDoubled(t.limit.mJ2)})` : ""}.`,
    t.paschenBackTesla ? `Fine-structure Paschen–Back scale (largest interval over μB/h): ${fieldText(t.paschenBackTesla)}.` : "",
    "Hyperfine structure is left out of this treatment: it matters only where its splitting is comparable to the fine-structure mixing, far below these fields for the usual alkali and alkaline-earth terms.",
  ].filter(Boolean);
  const first = t.atFields[0] ?? [];
  const energies: Table = {
    id: `term:${key}`,
    caption: `${t.key}: fine-structure states at the bias fields (spin–orbit + Zeeman in |mL mS⟩)`,
    csvPath: `${csvBase}/term-${safeFile(t.key)}.csv`,
    columns: [
      { key: "J", label: "J", kind: "quantum" },
      { key: "mJ", label: "mJ", kind: "quantum" },
      { key: "mL", label: "high-field mL", kind: "quantum" },
      { key: "mS", label: "high-field mS", kind: "quantum" },
      ...fields.map((b, i) => ({ key: `E${i}`, label: `shift at ${b.text}`, unit: "MHz", kind: "number" as const })),
    ],
    rows: first.map((st, i) => ({
      anchor: `term:${key}:J=${formatDoubled(st.J2)}:mJ=${formatDoubled(st.mJ2)}`,
      cells: [
        quantumCell(st.J2),
        quantumCell(st.mJ2, true),
        quantumCell(st.mL2, true),
        quantumCell(st.mS2, true),
        ...t.atFields.map((states) => numberCell(states[i]!.shift.div(MHZ), 12)),
      ],
    })),
  };
  return { key: t.key, anchor: `term:${key}`, facts, energies };
}

function lineSection(ln: LineResult, f: LineFieldResult, csvBase: string): LineFieldSection {
  const id = ln.input.id;
  const atFields = f.atFields
    .filter((a) => a.field.tesla.gt(0))
    .map((a) => {
      const anchor = `line:${id}:B=${exportText(a.field.tesla, 30)}T`;
      const table: Table = {
        id: `atB:${id}:${exportText(a.field.tesla, 30)}T`,
        caption: `${id} at ${a.field.text}: components (${a.model})`,
        csvPath: `${csvBase}/line-${safeFile(id)}-B-${safeFile(a.field.text)}.csv`,
        columns: [
          { key: "upper", label: "upper state", kind: "text" },
          { key: "lower", label: "lower state", kind: "text" },
          { key: "pol", label: "polarization", kind: "text" },
          { key: "strength", label: "relative strength", kind: "number" },
          { key: "shift", label: "shift from line centre", unit: "MHz", kind: "number" },
          { key: "dl", label: "wavelength shift", unit: "pm", kind: "number" },
        ],
        rows: a.components.map((c, k) => ({
          // Components at a field are labelled by their states; index breaks ties of identical labels.
          anchor: `${anchor}:${c.upperLabel}-to-${c.lowerLabel}`.replace(/\s+/g, "") + (k > 0 && a.components[k - 1]!.upperLabel === c.upperLabel && a.components[k - 1]!.lowerLabel === c.lowerLabel ? `:n${k}` : ""),
          cells: [
            textCell(c.upperLabel.replace(/-/g, "−")),
            textCell(c.lowerLabel.replace(/-/g, "−")),
            textCell(polarizationSymbol(c.polarization)),
            numberCell(c.strength, 6),
            numberCell(c.shiftHz.div(MHZ), 10),
            numberCell(ln.input.wavelength && ln.frequencyHz ? c.shiftHz.neg().mul(ln.input.wavelength.si).div(ln.frequencyHz).mul("1e12") : null, 6),
          ] as Cell[],
        })),
      };
      const plot = stickPlotSvg({
        id: `sticks-${safeFile(id)}-${safeFile(a.field.text)}`,
        title: `${id} at ${a.field.text}`,
        description: `Zeeman components of ${id} at ${a.field.text}: position from the zero-field line centre and relative strength; π solid, σ dashed.`,
        sticks: a.components.map((c) => ({ shift: c.shiftHz, strength: c.strength, polarization: c.polarization })),
        wavelength: ln.input.wavelength?.si ?? null,
        speedOfLight: SPEED_OF_LIGHT,
      });
      return { anchor, heading: `at ${a.field.text}`, regime: a.regime, model: a.model, plot, components: table };
    });
  let hyperfine: Table | null = null;
  let hyperfineComponents: Table | null = null;
  if (f.hyperfine) {
    hyperfine = {
      id: `hfl:${id}`,
      caption: `${id}: hyperfine lines F → F′ at low field`,
      csvPath: `${csvBase}/line-${safeFile(id)}-hyperfine.csv`,
      columns: [
        { key: "Fu", label: "F upper", kind: "quantum" },
        { key: "Fl", label: "F lower", kind: "quantum" },
        { key: "S", label: "strength (of line)", kind: "fraction" },
        { key: "Sl", label: "share of lower F", kind: "fraction" },
        { key: "off", label: "offset from line centre", unit: "MHz", kind: "number" },
        { key: "gFu", label: "gF upper", kind: "number" },
        { key: "gFl", label: "gF lower", kind: "number" },
      ],
      rows: f.hyperfine.map((g) => ({
        anchor: `hfl:${id}:F=${formatDoubled(g.Fu2)}-to-F=${formatDoubled(g.Fl2)}`,
        cells: [
          quantumCell(g.Fu2),
          quantumCell(g.Fl2),
          fractionCell(g.strength),
          fractionCell(g.shareOfLower),
          numberCell(g.offset.div(MHZ), 10),
          numberCell(g.gFu, 9),
          numberCell(g.gFl, 9),
        ],
      })),
    };
    hyperfineComponents = {
      id: `hfc:${id}`,
      caption: `${id}: hyperfine Zeeman components at low field (cycling lines marked)`,
      csvPath: `${csvBase}/line-${safeFile(id)}-hyperfine-components.csv`,
      columns: [
        { key: "Fu", label: "F upper", kind: "quantum" },
        { key: "mFu", label: "mF upper", kind: "quantum" },
        { key: "Fl", label: "F lower", kind: "quantum" },
        { key: "mFl", label: "mF lower", kind: "quantum" },
        { key: "pol", label: "polarization", kind: "text" },
        { key: "S", label: "strength (of line)", kind: "fraction" },
        { key: "shift", label: "shift", unit: "MHz/G", kind: "number" },
        { key: "cyc", label: "cycling", kind: "text" },
      ],
      rows: f.hyperfine.flatMap((g) =>
        g.components.map((c) => ({
          anchor: `hfc:${id}:F=${formatDoubled(g.Fu2)},mF=${formatDoubled(c.mFu2)}-to-F=${formatDoubled(g.Fl2)},mF=${formatDoubled(c.mFl2)}`,
          cells: [
            quantumCell(g.Fu2),
            quantumCell(c.mFu2, true),
            quantumCell(g.Fl2),
            quantumCell(c.mFl2, true),
            textCell(polarizationSymbol(c.polarization)),
            fractionCell(c.strength),
            numberCell(c.shiftHzPerT.mul("1e-10"), 9),
            textCell(c.cycling ? "cycling" : ""),
          ],
        })),
      ),
    };
  }
  return { lineId: id, anchor: `line:${id}-fields`, atFields, hyperfine, hyperfineComponents };
}

export function fieldSections(
  s: SpeciesResult,
  f: SpeciesFieldResult,
  fields: ConfiguredField[],
  csvBase: string,
  exportUrl = `export/${s.input.id}.json`,
): FieldSections {
  // Every table gets the decimal-point alignment and the JSON download link of the species tables.
  const finish = (t: Table): Table => alignTable({ ...t, exportUrl });
  const finishOrNull = (t: Table | null) => (t ? finish(t) : null);
  return {
    levels: s.levels.map((l) => {
      const sec = levelSection(l, f.levels.get(l.input.id)!, fields, csvBase);
      return { ...sec, energies: finish(sec.energies), transitions: finishOrNull(sec.transitions) };
    }),
    terms: f.terms.map((t) => {
      const sec = termSection(t, fields, csvBase);
      return { ...sec, energies: finish(sec.energies) };
    }),
    lines: s.lines.map((ln) => {
      const sec = lineSection(ln, f.lines.get(ln.input.id)!, csvBase);
      return {
        ...sec,
        atFields: sec.atFields.map((a) => ({ ...a, components: finish(a.components) })),
        hyperfine: finishOrNull(sec.hyperfine),
        hyperfineComponents: finishOrNull(sec.hyperfineComponents),
      };
    }),
  };
}

/** Every table of the field sections (for CSV files and the search index). */
export function fieldTables(sec: FieldSections): Table[] {
  return [
    ...sec.levels.flatMap((l) => [l.energies, ...(l.transitions ? [l.transitions] : [])]),
    ...sec.terms.map((t) => t.energies),
    ...sec.lines.flatMap((l) => [...l.atFields.filter((a) => a.model !== "J-resolved linear pattern").map((a) => a.components), ...(l.hyperfine ? [l.hyperfine] : []), ...(l.hyperfineComponents ? [l.hyperfineComponents] : [])]),
  ];
}
