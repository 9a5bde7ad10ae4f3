/**
 * Rows of one species page: levels, sublevel shifts, hyperfine sublevels,
 * lines and their Zeeman components, as Table models (table.ts).
 */
import { Dec } from "../physics/decimal.js";
import { hzPerTeslaToGHzPerTesla, hzPerTeslaToMHzPerGauss, hzPerTeslaToWavenumberPerTesla } from "../physics/zeeman.js";
import { exportText } from "../physics/decimal.js";
import type { LevelResult, LineResult, SpeciesResult } from "../results/types.js";
import { componentAnchor, hyperfineAnchor, levelAnchor, lineAnchor, mFAnchor, mJAnchor } from "./anchors.js";
import type { Quantity } from "../data/model.js";
import {
  alignTable as alignRows,
  type Cell,
  type Column,
  fractionCell,
  measuredCell,
  numberCell,
  quantumCell,
  type Table,
  termCell,
  termParts,
  type TermParts,
  textCell,
} from "./table.js";
import { formatNumber, partsText, polarizationSymbol, writtenDigits, writtenParts } from "./format.js";

const partsTextOf = (text: string): string => { const p = writtenParts(text); return p ? partsText(p) : text; };

/** Significant digits shown for shifts and g values on pages. */
export const SHOWN_DIGITS = 9;

const SHIFT_COLUMNS: Column[] = [
  { key: "shift", label: "shift", unit: "MHz/G", kind: "number", switchable: true },
  { key: "shift_GHz_T", label: "shift", unit: "GHz/T", kind: "number" },
  { key: "shift_cm_T", label: "shift", unit: "cm⁻¹/T", kind: "number" },
];

function shiftCells(hzPerT: Dec): Cell[] {
  return [
    numberCell(hzPerTeslaToMHzPerGauss(hzPerT), SHOWN_DIGITS, { hzPerT: exportText(hzPerT, 30) }),
    numberCell(hzPerTeslaToGHzPerTesla(hzPerT), SHOWN_DIGITS),
    numberCell(hzPerTeslaToWavenumberPerTesla(hzPerT), SHOWN_DIGITS),
  ];
}

export interface LevelSection {
  level: LevelResult;
  termParts: TermParts;
  anchor: string;
  title: string;
  sublevels: Table;
  hyperfine: Table | null;
  hyperfineSublevels: Table | null;
}

export interface LineSection {
  line: LineResult;
  anchor: string;
  title: string;
  components: Table;
}

export interface SpeciesPage {
  gIText: string;
  gLText: string;
  gSText: string;
  levels: Table;
  levelSections: LevelSection[];
  lines: Table;
  lineSections: LineSection[];
}

function gUsedCell(l: LevelResult): Cell {
  if (l.gJ === null) return { text: "—", sort: "" };
  if (l.gJFrom === "measured" && l.input.gJ) return measuredCell(l.input.gJ, l.gJ);
  return numberCell(l.gJ, SHOWN_DIGITS);
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

export function speciesPage(s: SpeciesResult, csvBase: string, exportUrl = `export/${s.input.id}.json`): SpeciesPage {
  const alignTable = (t: Table): Table => alignRows({ ...t, exportUrl });
  const levels: Table = {
    id: "levels",
    caption: "Levels",
    csvPath: `${csvBase}/levels.csv`,
    columns: [
      { key: "id", label: "level", kind: "text" },
      { key: "config", label: "configuration", kind: "text" },
      { key: "term", label: "term", kind: "term" },
      { key: "J", label: "J", kind: "quantum" },
      { key: "gJ_exact", label: "gJ (LS, exact)", kind: "fraction" },
      { key: "gJ", label: "gJ in use", kind: "number" },
      { key: "gJ_from", label: "gJ from", kind: "text" },
      { key: "A", label: "A", unit: "MHz", kind: "number" },
      { key: "B", label: "B", unit: "MHz", kind: "number" },
      { key: "source", label: "source", kind: "text" },
    ],
    rows: s.levels.map((l) => ({
      anchor: levelAnchor(l.input.id),
      cells: [
        textCell(l.input.id, `#${levelAnchor(l.input.id)}-shifts`),
        textCell(l.input.config),
        termCell(l.input.term),
        quantumCell(l.J2),
        fractionCell(l.gJExact),
        gUsedCell(l),
        textCell(l.gJFrom === "measured" ? "measured" : l.gJFrom === "LS" ? "LS, gL and gS" : "J = 0"),
        quantityCell(l.input.hyperfine?.A, "MHz", "1e6"),
        quantityCell(l.input.hyperfine?.B, "MHz", "1e6"),
        textCell(l.input.source),
      ],
    })),
  };

  const levelSections: LevelSection[] = s.levels.map((l) => {
    const lid = l.input.id;
    const base = `${csvBase}/level-${safeFile(lid)}`;
    const sublevels: Table = {
      id: `mj:${lid}`,
      caption: `${l.input.term.text} (${lid}): sublevels mJ, linear shift`,
      csvPath: `${base}-mJ.csv`,
      columns: [{ key: "mJ", label: "mJ", kind: "quantum" }, { key: "gm", label: "gJ·mJ", kind: "number" }, ...SHIFT_COLUMNS],
      rows: l.sublevels.map((m) => ({
        anchor: mJAnchor(lid, m.m2),
        cells: [
          quantumCell(m.m2, true),
          numberCell(l.gJ === null ? new Dec(0) : l.gJ.mul(m.m2).div(2), SHOWN_DIGITS),
          ...shiftCells(m.shiftHzPerT),
        ],
      })),
    };
    const hasHf = l.hyperfine.length > 0;
    const hyperfine: Table | null = hasHf
      ? {
          id: `hf:${lid}`,
          caption: `${l.input.term.text} (${lid}): hyperfine levels F`,
          csvPath: `${base}-F.csv`,
          columns: [
            { key: "F", label: "F", kind: "quantum" },
            { key: "gF", label: "gF", kind: "number" },
            { key: "E0", label: "zero-field energy", unit: "MHz", kind: "number" },
          ],
          rows: l.hyperfine.map((h) => ({
            anchor: hyperfineAnchor(lid, h.F2),
            cells: [quantumCell(h.F2), numberCell(h.gF, 12), numberCell(h.zeroFieldHz.div("1e6"), 12)],
          })),
        }
      : null;
    const hyperfineSublevels: Table | null = hasHf
      ? {
          id: `mf:${lid}`,
          caption: `${l.input.term.text} (${lid}): sublevels (F, mF), linear shift`,
          csvPath: `${base}-mF.csv`,
          columns: [
            { key: "F", label: "F", kind: "quantum" },
            { key: "mF", label: "mF", kind: "quantum" },
            { key: "gF", label: "gF", kind: "number" },
            ...SHIFT_COLUMNS,
          ],
          rows: l.hyperfine.flatMap((h) =>
            h.sublevels.map((m) => ({
              anchor: mFAnchor(lid, h.F2, m.m2),
              cells: [quantumCell(h.F2), quantumCell(m.m2, true), numberCell(h.gF, SHOWN_DIGITS), ...shiftCells(m.shiftHzPerT)],
            })),
          ),
        }
      : null;
    return { level: l, termParts: termParts(l.input.term), anchor: `${levelAnchor(lid)}-shifts`, title: `${lid}`,
      sublevels: alignTable(sublevels),
      hyperfine: hyperfine && alignTable(hyperfine),
      hyperfineSublevels: hyperfineSublevels && alignTable(hyperfineSublevels),
    };
  });

  const lines: Table = {
    id: "lines",
    caption: "Lines",
    csvPath: `${csvBase}/lines.csv`,
    columns: [
      { key: "id", label: "line", kind: "text" },
      { key: "upper", label: "upper", kind: "text" },
      { key: "lower", label: "lower", kind: "text" },
      { key: "multipole", label: "multipole", kind: "text" },
      { key: "wavelength", label: "λ (vacuum)", unit: "nm", kind: "number" },
      { key: "g_eff", label: "g_eff", kind: "number" },
      { key: "pattern", label: "pattern", kind: "text" },
      { key: "summary", label: "reading", kind: "text" },
    ],
    rows: s.lines.map((ln) => ({
      anchor: lineAnchor(ln.input.id),
      cells: [
        textCell(ln.input.id, `#${lineAnchor(ln.input.id)}-components`),
        textCell(ln.upper.input.id, `#${levelAnchor(ln.upper.input.id)}`),
        textCell(ln.lower.input.id, `#${levelAnchor(ln.lower.input.id)}`),
        textCell(ln.input.multipole),
        quantityCell(ln.input.wavelength, "nm", "1e-9"),
        numberCell(ln.gEff, SHOWN_DIGITS),
        textCell(ln.pattern ?? "—"),
        textCell(ln.summary),
      ],
    })),
  };

  const lineSections: LineSection[] = s.lines.map((ln) => ({
    line: ln,
    anchor: `${lineAnchor(ln.input.id)}-components`,
    title: ln.input.id,
    components: alignTable({
      id: `cmp:${ln.input.id}`,
      caption: `${ln.input.id} (${ln.upper.input.term.text} → ${ln.lower.input.term.text}): Zeeman components`,
      csvPath: `${csvBase}/line-${safeFile(ln.input.id)}.csv`,
      columns: [
        { key: "mu", label: "m upper", kind: "quantum" },
        { key: "ml", label: "m lower", kind: "quantum" },
        { key: "dm", label: "Δm", kind: "quantum" },
        { key: "pol", label: "polarization", kind: "text" },
        { key: "strength", label: "strength", kind: "fraction" },
        { key: "lorentz_exact", label: "shift, LS exact", unit: "Lorentz units", kind: "fraction" },
        { key: "lorentz", label: "shift", unit: "Lorentz units", kind: "number" },
        ...SHIFT_COLUMNS,
      ],
      rows: ln.components.map((c) => ({
        anchor: componentAnchor(ln.input.id, c.mu2, c.ml2),
        cells: [
          quantumCell(c.mu2, true),
          quantumCell(c.ml2, true),
          quantumCell(c.deltaM * 2, true),
          textCell(polarizationSymbol(c.polarization)),
          fractionCell(c.strength),
          fractionCell(c.shiftLorentzExact),
          numberCell(c.shiftLorentz, SHOWN_DIGITS),
          ...shiftCells(c.shiftHzPerT),
        ],
      })),
    }),
  }));
  const nucleus = s.input.nucleus;
  return {
    gIText: nucleus?.gI ? partsTextOf(nucleus.gI.text) : formatNumber(s.gI, 12),
    gLText: formatNumber(s.gL, 12),
    gSText: formatNumber(s.gS, 15),
    levels: alignTable(levels),
    levelSections,
    lines: alignTable(lines),
    lineSections,
  };
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
