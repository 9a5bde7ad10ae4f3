/**
 * Tables of the linear (weak-field) numbers of a species: levels, sublevel
 * shifts per mJ, hyperfine levels F and sublevels (F, mF), the at-a-glance
 * table, lines with their patterns, and each line's J-resolved components.
 * Each is a makeTable spec (tableSpec.ts) over rows of the results.
 */
import { levelCouplingNote, lineCouplingNote } from "./couplingNote.js";
import { Dec, exportText } from "../physics/decimal.js";
import { hzPerTeslaToGHzPerTesla, hzPerTeslaToMHzPerGauss, hzPerTeslaToWavenumberPerTesla } from "../physics/zeeman.js";
import { formatDoubled } from "../physics/quantum.js";
import type { LineInput, Quantity } from "../data/model.js";
import { pageSlug } from "../data/ids.js";
import type { HyperfineLevelResult, LevelResult, LineResult, SpeciesResult, SublevelShift } from "../results/types.js";
import { componentAnchor, hyperfineAnchor, levelAnchor, levelShiftsAnchor, lineAnchor, mFAnchor, mJAnchor } from "./anchors.js";
import { formatQuantum, polarizationSymbol, termText, writtenDigits } from "./format.js";
import { levelPagePath, linePagePath } from "./pageUrls.js";
import { fractionCell, measuredCell, numberCell, quantumCell, termCell, textCell, uncertainCell, type Cell, type Table } from "./table.js";
import { makeTable, type ColumnSpec } from "./tableSpec.js";

/** Significant digits shown for shifts and g values on pages. */
export const SHOWN_DIGITS = 9;

const MHZ = new Dec("1e6");

/** Where a species' tables keep their CSV files and which export holds the same rows. */
export interface TableHome {
  speciesId: string;
  csvBase: string;
  exportUrl: string;
}

/**
 * The CSV file of a table, named so a reader knows it in a downloads folder:
 * species id, then the level or line id as a page name (pageSlug: "/" → "_"),
 * then what the table holds; "rb87-5p-P3_2-field-energies.csv".
 */
export function csvName(home: TableHome, ...parts: string[]): string {
  return `${home.csvBase}/${[home.speciesId, ...parts.map(pageSlug)].join("-")}.csv`;
}

/** A standard uncertainty in another unit by a linear conversion (null stays null). */
const uIn = (u: Dec | null | undefined, f: (x: Dec) => Dec): Dec | null => (u === null || u === undefined ? null : f(u).abs());

/**
 * The three shift columns (MHz/G switchable by the reader, GHz/T, cm⁻¹/T) of a row's shift in Hz/T,
 * each with the shift's standard uncertainty in the concise form when `uHzPerT` gives one.
 */
export function shiftColumns<R>(hzPerT: (r: R) => Dec, uHzPerT: (r: R) => Dec | null | undefined = () => null): ColumnSpec<R>[] {
  return [
    {
      key: "shift", label: "shift", unit: "MHz/G", kind: "number", switchable: true,
      cell: (r) => uncertainCell(hzPerTeslaToMHzPerGauss(hzPerT(r)), uIn(uHzPerT(r), hzPerTeslaToMHzPerGauss), SHOWN_DIGITS, { hzPerT: exportText(hzPerT(r), 30) }, uHzPerT(r) ?? undefined),
    },
    { key: "shift_GHz_T", label: "shift", unit: "GHz/T", kind: "number", cell: (r) => uncertainCell(hzPerTeslaToGHzPerTesla(hzPerT(r)), uIn(uHzPerT(r), hzPerTeslaToGHzPerTesla), SHOWN_DIGITS) },
    { key: "shift_cm_T", label: "shift", unit: "cm⁻¹/T", kind: "number", cell: (r) => uncertainCell(hzPerTeslaToWavenumberPerTesla(hzPerT(r)), uIn(uHzPerT(r), hzPerTeslaToWavenumberPerTesla), SHOWN_DIGITS) },
  ];
}

function gUsedCell(l: LevelResult): Cell {
  if (l.gJ === null) return { text: "—", sort: "" };
  if (l.gJFrom === "measured" && l.input.gJ) return measuredCell(l.input.gJ, l.gJ);
  return uncertainCell(l.gJ, l.gJU ?? null, SHOWN_DIGITS);
}

/**
 * A measured quantity in the column's unit: as written when the data file
 * used that unit, else converted and shown with the written number of
 * significant digits (no digits invented by the conversion).
 */
export function quantityCell(q: Quantity | null | undefined, unit: string, siPerUnit: string): Cell {
  if (!q) return numberCell(null);
  const numberText = q.text.trim().slice(0, q.text.trim().length - q.unit.length).trim();
  const value = q.si.div(siPerUnit);
  if (q.unit === unit) return measuredCell(q, value, numberText);
  return numberCell(value, writtenDigits(numberText));
}

/**
 * A line's wavelength in nm in one medium: the given one as written
 * (quantityCell); the converted one with the given one's uncertainty
 * carried over (data/speciesFile.ts) in the concise form when it has one.
 */
export function lineWavelengthCell(input: Pick<LineInput, "wavelength" | "airWavelength"> & Partial<Pick<LineInput, "medium">>, medium: LineInput["medium"]): Cell {
  const q = medium === "air" ? input.airWavelength : input.wavelength;
  if (!q || (input.medium ?? "vacuum") === medium || q.siUncertainty === null) return quantityCell(q, "nm", "1e-9");
  return uncertainCell(q.si.div("1e-9"), q.siUncertainty.div("1e-9"), writtenDigits(q.text.trim().slice(0, q.text.trim().length - q.unit.length)));
}

/** A line's wavelength in standard air (given or converted), or the words saying the air formula does not reach it. */
export function airWavelengthCell(input: Pick<LineInput, "wavelength" | "airWavelength"> & Partial<Pick<LineInput, "medium">>): Cell {
  if (input.wavelength && !input.airWavelength) return textCell("outside the range of the air formula");
  return lineWavelengthCell(input, "air");
}

/**
 * Standard uncertainty (Hz/T) of the shift per unit m, g·μB/h: that of the
 * stretched sublevel's shift g·(J or F)·μB/h (results/linearUncertainties.ts,
 * same inputs) divided by J or F, an exact scaling. Null when exact.
 */
export function perUnitMU(sublevels: SublevelShift[], top2: number): Dec | null {
  const u = sublevels.find((x) => x.m2 === top2)?.shiftHzPerTU;
  return u ? u.mul(2).div(top2) : null;
}

/** Levels of a species; the id links to the level's own page where it has one, else to its shifts. */
export function levelsTable(s: SpeciesResult, home: TableHome, hasPage: (l: LevelResult) => boolean): Table {
  return makeTable<LevelResult>(
    {
      id: "levels",
      caption: "Levels",
      csvPath: csvName(home, "levels"),
      exportUrl: home.exportUrl,
      anchor: (l) => levelAnchor(l.input.id),
      columns: [
        {
          key: "id", label: "level", kind: "text",
          cell: (l) => textCell(l.input.id, hasPage(l) ? `/${levelPagePath(home.speciesId, l.input.id)}` : `#${levelShiftsAnchor(l.input.id)}`),
        },
        { key: "config", label: "configuration", kind: "text", cell: (l) => textCell(l.input.config) },
        { key: "term", label: "term", kind: "term", cell: (l) => termCell(l.input.term) },
        { key: "J", label: "J", kind: "quantum", cell: (l) => quantumCell(l.J2) },
        { key: "gJ_exact", label: "gJ exact (gL = 1, gS = 2)", kind: "fraction", cell: (l) => fractionCell(l.gJExact) },
        { key: "gJ", label: "gJ in use", kind: "number", cell: gUsedCell },
        { key: "gJ_from", label: "gJ from", kind: "text", cell: (l) => textCell(l.gJFrom === "measured" ? levelCouplingNote(l) ?? "measured" : l.gJFrom === "none" ? "J = 0" : `${l.gJFrom}, gL and gS`) },
        { key: "A", label: "A", unit: "MHz", kind: "number", cell: (l) => quantityCell(l.input.hyperfine?.A, "MHz", "1e6") },
        { key: "B", label: "B", unit: "MHz", kind: "number", cell: (l) => quantityCell(l.input.hyperfine?.B, "MHz", "1e6") },
        { key: "source", label: "source", kind: "note", cell: (l) => textCell(l.input.source) },
      ],
    },
    s.levels,
  );
}

/** The linear shift of every mJ of a level. */
export function mJTable(l: LevelResult, home: TableHome): Table {
  const lid = l.input.id;
  return makeTable(
    {
      id: `mj:${lid}`,
      caption: `${lid} ${termText(l.input.term)}: sublevels mJ, linear shift`,
      csvPath: csvName(home, lid, "mJ-shifts"),
      exportUrl: home.exportUrl,
      anchor: (m) => mJAnchor(lid, m.m2),
      columns: [
        { key: "mJ", label: "mJ", kind: "quantum", cell: (m) => quantumCell(m.m2, true) },
        { key: "gm", label: "gJ·mJ", kind: "number", cell: (m) => uncertainCell(l.gJ === null ? new Dec(0) : l.gJ.mul(m.m2).div(2), l.gJU ? l.gJU.mul(Math.abs(m.m2)).div(2) : null, SHOWN_DIGITS) },
        ...shiftColumns<(typeof l.sublevels)[number]>((m) => m.shiftHzPerT, (m) => m.shiftHzPerTU),
      ],
    },
    l.sublevels,
  );
}

/** The hyperfine levels F of a level: gF and zero-field position. */
export function hyperfineTable(l: LevelResult, home: TableHome): Table {
  const lid = l.input.id;
  return makeTable<HyperfineLevelResult>(
    {
      id: `hf:${lid}`,
      caption: `${lid} ${termText(l.input.term)}: hyperfine levels F`,
      csvPath: csvName(home, lid, "hyperfine-levels"),
      exportUrl: home.exportUrl,
      anchor: (h) => hyperfineAnchor(lid, h.F2),
      columns: [
        { key: "F", label: "F", kind: "quantum", cell: (h) => quantumCell(h.F2) },
        { key: "gF", label: "gF", kind: "number", cell: (h) => uncertainCell(h.gF, h.gFU ?? null, 12) },
        { key: "E0", label: "zero-field energy", unit: "MHz", kind: "number", cell: (h) => uncertainCell(h.zeroFieldHz.div(MHZ), uIn(h.zeroFieldHzU, (x) => x.div(MHZ)), 12) },
      ],
    },
    l.hyperfine,
  );
}

/** Every sublevel (F, mF) of a level with its linear shift. */
export function hyperfineSublevelsTable(l: LevelResult, home: TableHome): Table {
  const lid = l.input.id;
  const rows = l.hyperfine.flatMap((h) => h.sublevels.map((m) => ({ h, m })));
  return makeTable<(typeof rows)[number]>(
    {
      id: `mf:${lid}`,
      caption: `${lid} ${termText(l.input.term)}: sublevels (F, mF), linear shift`,
      csvPath: csvName(home, lid, "mF-shifts"),
      exportUrl: home.exportUrl,
      anchor: ({ h, m }) => mFAnchor(lid, h.F2, m.m2),
      columns: [
        { key: "F", label: "F", kind: "quantum", cell: ({ h }) => quantumCell(h.F2) },
        { key: "mF", label: "mF", kind: "quantum", cell: ({ m }) => quantumCell(m.m2, true) },
        { key: "gF", label: "gF", kind: "number", cell: ({ h }) => uncertainCell(h.gF, h.gFU ?? null, SHOWN_DIGITS) },
        ...shiftColumns<(typeof rows)[number]>(({ m }) => m.shiftHzPerT, ({ m }) => m.shiftHzPerTU),
      ],
    },
    rows,
  );
}

/** One row of the at-a-glance table: a level (J) or one of its hyperfine levels (F). */
interface GlanceRow {
  level: LevelResult;
  hf: HyperfineLevelResult | null;
}

/**
 * At a glance: every level with its gJ and, per hyperfine level, gF, the
 * linear shift per unit m (in the reader's chosen unit) and the zero-field
 * position. The shift per unit m is g·μB/h, the shift of the m = 1 sublevel.
 */
export function glanceTable(s: SpeciesResult, home: TableHome, muB_h: Dec): Table {
  const rows: GlanceRow[] = s.levels.flatMap((level) => [{ level, hf: null }, ...level.hyperfine.map((hf) => ({ level, hf }))]);
  const g = (r: GlanceRow): Dec | null => (r.hf ? r.hf.gF : r.level.gJ);
  return makeTable<GlanceRow>(
    {
      id: "glance",
      caption: "At a glance: g factors and linear shift per unit m",
      csvPath: csvName(home, "at-a-glance"),
      exportUrl: home.exportUrl,
      anchor: (r) => `glance:${r.hf ? hyperfineAnchor(r.level.input.id, r.hf.F2) : levelAnchor(r.level.input.id)}`,
      columns: [
        { key: "level", label: "level", kind: "text", cell: (r) => (r.hf ? textCell("") : textCell(r.level.input.id, `#${levelAnchor(r.level.input.id)}`)) },
        { key: "term", label: "term", kind: "term", cell: (r) => (r.hf ? textCell("") : termCell(r.level.input.term)) },
        { key: "which", label: "J or F", kind: "text", cell: (r) => textCell(r.hf ? `F = ${formatQuantum(r.hf.F2)}` : `J = ${formatQuantum(r.level.J2)}`) },
        { key: "g", label: "gJ or gF", kind: "number", cell: (r) => (g(r) === null ? textCell("—") : r.hf ? uncertainCell(r.hf.gF, r.hf.gFU ?? null, SHOWN_DIGITS) : gUsedCell(r.level)) },
        {
          key: "per_m", label: "shift per unit m", unit: "MHz/G", kind: "number", switchable: true,
          cell: (r) => {
            const gv = g(r);
            if (gv === null) return numberCell(null);
            const hzPerT = gv.mul(muB_h);
            const u = r.hf ? perUnitMU(r.hf.sublevels, r.hf.F2) : perUnitMU(r.level.sublevels, r.level.J2);
            return uncertainCell(hzPerTeslaToMHzPerGauss(hzPerT), uIn(u, hzPerTeslaToMHzPerGauss), SHOWN_DIGITS, { hzPerT: exportText(hzPerT, 30) }, u ?? undefined);
          },
        },
        { key: "E0", label: "zero-field position", unit: "MHz", kind: "number", cell: (r) => uncertainCell(r.hf ? r.hf.zeroFieldHz.div(MHZ) : null, uIn(r.hf?.zeroFieldHzU, (x) => x.div(MHZ)), 12) },
      ],
    },
    rows,
  );
}

/** Lines with their pattern; the id links to the line's own page. */
export function linesTable(s: SpeciesResult, home: TableHome): Table {
  return makeTable<LineResult>(
    {
      id: "lines",
      caption: "Lines",
      csvPath: csvName(home, "lines"),
      exportUrl: home.exportUrl,
      anchor: (ln) => lineAnchor(ln.input.id),
      columns: [
        { key: "id", label: "line", kind: "text", cell: (ln) => textCell(ln.input.id, `/${linePagePath(home.speciesId, ln.input.id)}`) },
        { key: "upper", label: "upper", kind: "text", cell: (ln) => textCell(ln.upper.input.id, `#${levelAnchor(ln.upper.input.id)}`) },
        { key: "lower", label: "lower", kind: "text", cell: (ln) => textCell(ln.lower.input.id, `#${levelAnchor(ln.lower.input.id)}`) },
        { key: "multipole", label: "multipole", kind: "text", cell: (ln) => textCell(ln.input.multipole) },
        { key: "wavelength", label: "λ (vacuum)", unit: "nm", kind: "number", cell: (ln) => lineWavelengthCell(ln.input, "vacuum") },
        { key: "air_wavelength", label: "λ (air)", unit: "nm", kind: "number", when: s.lines.some((ln) => ln.input.wavelength), cell: (ln) => airWavelengthCell(ln.input) },
        { key: "g_eff", label: "g_eff", kind: "number", cell: (ln) => uncertainCell(ln.gEff, ln.gEffU ?? null, SHOWN_DIGITS) },
        { key: "pattern", label: "pattern", kind: "text", cell: (ln) => textCell(ln.pattern ?? "—") },
        { key: "summary", label: "reading", kind: "note", cell: (ln) => textCell([ln.summary, lineCouplingNote(ln)].filter(Boolean).join(" ")) },
      ],
    },
    s.lines,
  );
}

/** The J-resolved Zeeman components of a line, with exact strengths and shifts. */
export function componentsTable(ln: LineResult, home: TableHome): Table {
  const id = ln.input.id;
  return makeTable<(typeof ln.components)[number]>(
    {
      id: `cmp:${id}`,
      caption: `${id} (${termText(ln.upper.input.term)} → ${termText(ln.lower.input.term)}): Zeeman components`,
      csvPath: csvName(home, id, "components"),
      exportUrl: home.exportUrl,
      anchor: (c) => componentAnchor(id, c.mu2, c.ml2),
      columns: [
        { key: "mu", label: "m upper", kind: "quantum", cell: (c) => quantumCell(c.mu2, true) },
        { key: "ml", label: "m lower", kind: "quantum", cell: (c) => quantumCell(c.ml2, true) },
        { key: "dm", label: "Δm", kind: "quantum", cell: (c) => quantumCell(c.deltaM * 2, true) },
        { key: "pol", label: "polarization", kind: "text", cell: (c) => textCell(polarizationSymbol(c.polarization, c.deltaM)) },
        { key: "strength", label: "strength", kind: "fraction", cell: (c) => fractionCell(c.strength) },
        { key: "lorentz_exact", label: "shift, LS exact", unit: "Lorentz units", kind: "fraction", cell: (c) => fractionCell(c.shiftLorentzExact) },
        { key: "lorentz", label: "shift", unit: "Lorentz units", kind: "number", cell: (c) => uncertainCell(c.shiftLorentz, c.shiftLorentzU ?? null, SHOWN_DIGITS) },
        ...shiftColumns<(typeof ln.components)[number]>((c) => c.shiftHzPerT, (c) => c.shiftHzPerTU),
      ],
    },
    ln.components,
  );
}

/** Zero-field hyperfine intervals of a level, "F = 1 ↔ 2: 6 834.682 610 9 MHz", adjacent F only. */
export function hyperfineIntervals(l: LevelResult): { F: string; Fp: string; mhz: Cell }[] {
  const byF = [...l.hyperfine].sort((a, b) => a.F2 - b.F2);
  const out: { F: string; Fp: string; mhz: Cell }[] = [];
  for (let i = 1; i < byF.length; i++) {
    out.push({ F: formatDoubled(byF[i - 1]!.F2), Fp: formatDoubled(byF[i]!.F2), mhz: numberCell(byF[i]!.zeroFieldHz.sub(byF[i - 1]!.zeroFieldHz).div(MHZ), 12) });
  }
  return out;
}

/** A file-name-safe form of an id; injective (every non-[A-Za-z0-9-] byte is hex-escaped with "_"). */
export function safeFile(id: string): string {
  return [...new TextEncoder().encode(id)]
    .map((b) => {
      const ch = String.fromCharCode(b);
      return /[A-Za-z0-9-]/.test(ch) ? ch : "_" + b.toString(16).padStart(2, "0");
    })
    .join("");
}
