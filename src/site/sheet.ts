/**
 * Bench sheets: one printed page per species (and one for all species) to
 * pin next to the apparatus. Rows are Table models (table.ts) so numbers
 * align on their points like every other table; no downloads or row links.
 *
 * Per level: gJ (as written when measured, with the exact LS fraction), and
 * the shift per unit m in MHz/G; per hyperfine level F: gF and the shift per
 * unit mF. Linear shifts are odd in m (ΔE = g m μB B), so the per-m list
 * gives m > 0 only; the sheet says so. Per line: λ, g_eff and the pattern.
 */
import { patternLimitTag } from "./couplingNote.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { Dec } from "../physics/decimal.js";
import { hzPerTeslaToMHzPerGauss } from "../physics/zeeman.js";
import { formatDoubled } from "../physics/quantum.js";
import type { HyperfineLevelResult, LevelResult, LineResult, SpeciesResult, SublevelShift } from "../results/types.js";
import { formatFraction, formatM, formatNumber, formatQuantum, formatUncertain, partsText, uncertainParts, writtenParts } from "./format.js";
import type { SpeciesFieldResult } from "../results/computeFields.js";
import { levelAnchor, lineAnchor } from "./anchors.js";
import { fractionCell, measuredCell, numberCell, type Cell, type Table, termCell, textCell, uncertainCell } from "./table.js";
import { lineWavelengthCell, perUnitMU } from "./linearTables.js";
import { makeTable } from "./tableSpec.js";

/** Significant digits of a per-unit-m shift on a sheet; list values get fewer. */
export const SHEET_DIGITS = 6;
export const SHEET_LIST_DIGITS = 4;

const blank = (): Cell => ({ text: "", sort: "" });

/** Most significant digits a value may need to carry its concise uncertainty on a sheet. */
export const SHEET_CONCISE_DIGITS = 9;

/**
 * A computed number on a sheet: with its standard uncertainty in the concise
 * form ("0.499 836 426(50)") when that needs at most SHEET_CONCISE_DIGITS
 * significant digits; otherwise (an uncertainty far below the sixth digit,
 * as for an LS gJ whose only uncertain inputs are g_e and the mass) the
 * value at SHEET_DIGITS, every digit of which is then good, so the sheet
 * stays on one page. The sheet's rule says so (sheet-parts.njk).
 */
export function sheetNumberCell(x: Dec | null, u: Dec | null | undefined): Cell {
  if (x === null || u === null || u === undefined || u.isZero()) return numberCell(x, SHEET_DIGITS);
  const p = uncertainParts(x, u);
  const digits = (p.int + p.frac).replace(/\D/g, "").replace(/^0+/, "").length;
  return digits <= SHEET_CONCISE_DIGITS ? uncertainCell(x, u, SHEET_DIGITS) : numberCell(x, SHEET_DIGITS);
}

/**
 * The shift per unit m (MHz/G) of a set of sublevels, from the sublevel of
 * smallest positive m; null when every shift is zero or no m > 0 exists.
 */
export function shiftPerM(sublevels: SublevelShift[]): Dec | null {
  const first = sublevels.filter((m) => m.m2 > 0).sort((a, b) => a.m2 - b.m2)[0];
  if (!first || first.shiftHzPerT.isZero()) return null;
  return hzPerTeslaToMHzPerGauss(first.shiftHzPerT).mul(2).div(first.m2);
}

/**
 * The shifts in MHz/G as "m shift" pairs. When the shifts are odd in m (the
 * linear case), only m > 0 is listed; otherwise every m. Example for gF = 1/2:
 * "+1 0.7 · +2 1.4".
 */
export function shiftList(sublevels: SublevelShift[], digits = SHEET_LIST_DIGITS): { text: string; oddInM: boolean } {
  const byM = new Map(sublevels.map((m) => [m.m2, m.shiftHzPerT]));
  const oddInM = sublevels.every((m) => {
    const mirror = byM.get(-m.m2);
    return mirror !== undefined && mirror.neg().eq(m.shiftHzPerT);
  });
  const shown = [...sublevels].filter((m) => !oddInM || m.m2 > 0).sort((a, b) => a.m2 - b.m2);
  const text = shown.map((m) => `${formatM(m.m2)}\u00a0${formatNumber(hzPerTeslaToMHzPerGauss(m.shiftHzPerT), digits)}`).join(" · ");
  return { text, oddInM };
}

export interface SpeciesSheet {
  id: string;
  label: string;
  nuclearSpin: string | null;
  gIText: string | null;
  /** One table: a row per level, then a row per F of that level. */
  sublevels: Table;
  lines: Table;
  /** False when some list had to give negative m too (never for linear shifts). */
  allOdd: boolean;
  /** Short sentences for the bench (per-species sheet only; empty on the all-species sheet). */
  notes: {
    /** Zero-field hyperfine splittings, one per level with two or more F. */
    splittings: string[];
    /** Field-insensitive sublevel transitions: states, field, frequency there, second-order coefficient at B = 0. */
    insensitive: string[];
    /** Where each level's linear shifts stop holding to 1 %. */
    validity: string[];
  };
}

export interface SheetOptions {
  /**
   * Per-species sheet (true): the shift of each m > 0, and each line's levels
   * and reading. All-species sheet (false): only the per-m rule, and lines by
   * id, λ, g_eff and pattern, so nine species share one page.
   */
  mList: boolean;
}

/** One row of a sheet's level table: a level (J) or one of its hyperfine levels (F). */
interface SheetLevelRow {
  level: LevelResult;
  hf: HyperfineLevelResult | null;
}

/** Lorentz shifts and strengths of a line's J-resolved components, grouped by polarization: "π 0 (2/3) · σ± ±4/3 (1/6)". */
export function componentList(ln: LineResult): string {
  const groups = new Map<string, Map<string, string>>();
  for (const c of ln.components) {
    const label = c.polarization === null ? `Δm ±${Math.abs(c.deltaM)}` : c.polarization === "pi" ? "π" : "σ±";
    const shift = c.shiftLorentzExact ? formatFraction(c.shiftLorentzExact.abs()) : formatNumber(c.shiftLorentz.abs(), 4);
    const key = `${c.polarization === "pi" || shift === "0" ? "" : "±"}${shift}`;
    const g = groups.get(label) ?? new Map<string, string>();
    if (!g.has(key)) g.set(key, `${key} (${formatFraction(c.strength)})`);
    groups.set(label, g);
  }
  return [...groups].map(([label, g]) => `${label} ${[...g.values()].join(", ")}`).join(" · ");
}

/**
 * A number in a bench note: in the concise form with its standard
 * uncertainty when that needs at most `max` significant digits, else at
 * `sig` digits, each of which the uncertainty then leaves good (an
 * uncertainty far below the last digit shown, as for the 87Rb ground-state
 * splitting), so the notes stay short enough for one printed page.
 */
export function noteNumber(x: Dec, u: Dec | null | undefined, sig: number, max = sig + 2): string {
  if (u === null || u === undefined || u.isZero()) return formatNumber(x, sig);
  const p = uncertainParts(x, u);
  const digits = (p.int + p.frac).replace(/\D/g, "").replace(/^0+/, "").length;
  return digits <= max ? formatUncertain(x, u) : formatNumber(x, sig);
}

/** Field-insensitive transitions listed on a sheet, at most; the level pages list them all. */
export const SHEET_INSENSITIVE = 6;

/**
 * The bench notes of a species from its field results (see SpeciesSheet.notes).
 * Field-insensitive transitions: only those between different F (the
 * microwave clock and qubit transitions) with their point at or below the
 * largest configured field, lowest fields first, SHEET_INSENSITIVE at most.
 */
export function sheetNotes(s: SpeciesResult, fields: SpeciesFieldResult, maxTesla: Dec): SpeciesSheet["notes"] {
  const MHZ = new Dec("1e6");
  const splittings: string[] = [];
  const insensitive: { tesla: Dec; text: string }[] = [];
  const validity: string[] = [];
  for (const l of s.levels) {
    const f = fields.levels.get(l.input.id);
    const byF = [...l.hyperfine].sort((a, b) => a.F2 - b.F2);
    if (byF.length > 1) {
      // a splitting is the zero-field frequency of any sublevel transition between the two F: its uncertainty (A and B shared) is that one's
      const splitU = (lo: number, up: number) => {
        const k = f ? f.transitions.findIndex((t) => t.lower.F2 === lo && t.upper.F2 === up) : -1;
        return k < 0 ? null : f!.transitionsU?.[k]?.zeroFieldHz ?? null;
      };
      const steps = byF.slice(1).map((h, i) => {
        const lo = byF[i]!;
        const u = splitU(lo.F2, h.F2);
        return `${formatQuantum(lo.F2)}↔${formatQuantum(h.F2)} ${noteNumber(h.zeroFieldHz.sub(lo.zeroFieldHz).div(MHZ), u ? u.div(MHZ) : null, 9)}`;
      });
      splittings.push(`${l.input.id}: ${steps.join(", ")} MHz`);
    }
    if (!f) continue;
    f.transitions.forEach((t, k) => {
      if (t.lower.F2 === t.upper.F2) return;
      const tu = f.transitionsU?.[k];
      t.fieldInsensitive.forEach((p, i) => {
        if (p.tesla.gt(maxTesla)) return;
        const pu = tu?.fieldInsensitive[i];
        const state = (x: { F2: number; mF2: number }) => `|${formatQuantum(x.F2)}, ${formatM(x.mF2)}⟩`;
        const quadU = tu?.secondOrderHzPerTesla2 ? tu.secondOrderHzPerTesla2.mul("1e-8") : null;
        const quad = t.secondOrder ? `, ${noteNumber(t.secondOrder.hzPerGauss2, quadU, 5)} Hz/G² at 0 G` : "";
        const hz = noteNumber(p.hz.div(MHZ), pu?.hz ? pu.hz.div(MHZ) : null, 10);
        insensitive.push({ tesla: p.tesla, text: `${l.input.id} ${state(t.lower)}↔${state(t.upper)}: ${fieldLabel(p.tesla, pu?.tesla ?? null)}, ${hz} MHz${quad}` });
      });
    });
    if (f.validity?.relative.tesla) validity.push(`${l.input.id} ${fieldLabel(f.validity.relative.tesla)}`);
  }
  const shown = insensitive.sort((a, b) => a.tesla.cmp(b.tesla)).slice(0, SHEET_INSENSITIVE).map((x) => x.text);
  return { splittings, insensitive: shown, validity };
}

/** A field for a sheet: gauss below 0.1 T, tesla from there on, 5 digits (with its uncertainty `u` in T, when given, as noteNumber writes it). */
function fieldLabel(tesla: Dec, u: Dec | null = null): string {
  if (tesla.isZero()) return "0 G";
  // a field-insensitive point is often known to a few 1e-6 relative: up to 9 digits keep its uncertainty
  return tesla.lt("0.1") ? `${noteNumber(tesla.mul("1e4"), u ? u.mul("1e4") : null, 5, 9)} G` : `${noteNumber(tesla, u, 5, 9)} T`;
}

export function speciesSheet(s: SpeciesResult, opts: SheetOptions, fields?: { result: SpeciesFieldResult; maxTesla: Dec }): SpeciesSheet {
  let allOdd = true;
  const list = (subs: SublevelShift[]): Cell => {
    const l = shiftList(subs);
    if (!l.oddInM) allOdd = false;
    return textCell(l.text);
  };
  const levelRows: SheetLevelRow[] = s.levels.flatMap((level) => [{ level, hf: null }, ...level.hyperfine.map((hf) => ({ level, hf }))]);
  const gCell = (l: LevelResult): Cell =>
    l.gJ === null ? textCell("—") : l.gJFrom === "measured" && l.input.gJ ? measuredCell(l.input.gJ, l.gJ) : sheetNumberCell(l.gJ, l.gJU);
  // the shift per unit m with its standard uncertainty (that of the stretched sublevel's shift over J or F), in MHz/G
  const perMCell = (subs: SublevelShift[], top2: number): Cell => {
    const u = perUnitMU(subs, top2);
    return sheetNumberCell(shiftPerM(subs), u === null ? null : hzPerTeslaToMHzPerGauss(u).abs());
  };
  const sublevels = makeTable<SheetLevelRow>(
    {
      id: `sheet-levels:${s.input.id}`,
      caption: "Levels and sublevels",
      csvPath: "",
      anchor: ({ level, hf }) => `sheet:${levelAnchor(level.input.id)}${hf ? `:F=${formatDoubled(hf.F2)}` : ""}`,
      columns: [
        { key: "level", label: "level", kind: "text", cell: ({ level, hf }) => (hf ? blank() : textCell(level.input.id)) },
        { key: "term", label: "term", kind: "term", cell: ({ level, hf }) => (hf ? blank() : termCell(level.input.term)) },
        { key: "which", label: "J / F", kind: "text", cell: ({ level, hf }) => textCell(hf ? `F = ${formatQuantum(hf.F2)}` : `J = ${formatQuantum(level.J2)}`) },
        { key: "g", label: "gJ / gF", kind: "number", cell: ({ level, hf }) => (hf ? sheetNumberCell(hf.gF, hf.gFU) : gCell(level)) },
        { key: "gLS", label: "gJ, LS exact", kind: "fraction", cell: ({ level, hf }) => (hf ? blank() : fractionCell(level.gJExact)) },
        { key: "perM", label: "per unit m", unit: "MHz/G", kind: "number", cell: ({ level, hf }) => (hf ? perMCell(hf.sublevels, hf.F2) : perMCell(level.sublevels, level.J2)) },
        { key: "list", label: "shift at m > 0", unit: "MHz/G", kind: "text", when: opts.mList, cell: ({ level, hf }) => list(hf ? hf.sublevels : level.sublevels) },
      ],
    },
    levelRows,
  );
  const lines = makeTable<LineResult>(
    {
      id: `sheet-lines:${s.input.id}`,
      caption: "Lines",
      csvPath: "",
      anchor: (ln) => `sheet:${lineAnchor(ln.input.id)}`,
      columns: [
        { key: "line", label: "line", kind: "text", cell: (ln) => textCell(ln.input.id) },
        { key: "transition", label: "upper → lower", kind: "text", when: opts.mList, cell: (ln) => textCell(`${ln.upper.input.id} → ${ln.lower.input.id}`) },
        { key: "wavelength", label: "λ (vacuum)", unit: "nm", kind: "number", cell: (ln) => (ln.input.wavelength ? lineWavelengthCell(ln.input, "vacuum") : numberCell(null)) },
        {
          key: "air_wavelength", label: "λ (air)", unit: "nm", kind: "number", when: s.lines.some((ln) => ln.input.wavelength),
          cell: (ln) => (ln.input.airWavelength ? lineWavelengthCell(ln.input, "air") : ln.input.wavelength ? textCell("outside the air formula") : numberCell(null)),
        },
        { key: "g_eff", label: "g_eff", kind: "number", cell: (ln) => sheetNumberCell(ln.gEff, ln.gEffU) },
        { key: "pattern", label: "pattern", kind: "text", cell: (ln) => textCell(ln.pattern === null ? "—" : [ln.pattern, patternLimitTag(ln)].filter(Boolean).join(" — ")) },
        { key: "components", label: "components: shift in Lorentz units (strength)", kind: "text", when: opts.mList, cell: (ln) => textCell(componentList(ln)) },
      ],
    },
    s.lines,
  );
  const nucleus = s.input.nucleus;
  return {
    id: s.input.id,
    label: s.input.label,
    nuclearSpin: nucleus ? formatQuantum(nucleus.I2) : null,
    gIText: nucleus ? (nucleus.gI ? writtenText(nucleus.gI.text) : formatNumber(s.gI, SHEET_DIGITS)) : null,
    sublevels,
    lines,
    allOdd,
    notes: opts.mList && fields ? sheetNotes(s, fields.result, fields.maxTesla) : { splittings: [], insensitive: [], validity: [] },
  };
}

function writtenText(text: string): string {
  const p = writtenParts(text);
  return p ? partsText(p) : text;
}

export interface FieldRule {
  /** As configured, e.g. "3.228 G". */
  text: string;
  /** One Lorentz unit μB·B/h at this field, in MHz, shown. */
  lorentzMHz: string;
}

/**
 * The configured bias fields with the size of one Lorentz unit at each
 * (μB·B/h, the shift of a sublevel with g·m = 1), so a reader multiplies
 * a "per unit m" entry by m and by the field, or a Lorentz shift by this.
 * Example, CODATA 2022: μB/h = 13.996 244 9… GHz/T, so 10 G gives 13.996 2 MHz.
 */
export function fieldRules(fields: { text: string; tesla: string }[], constants: ConstantsEdition): FieldRule[] {
  const muB_h = val(constants.muB_h);
  return fields.map((f) => ({
    text: f.text,
    lorentzMHz: new Dec(f.tesla).isZero() ? "0" : formatNumber(muB_h.mul(new Dec(f.tesla)).div("1e6"), SHEET_DIGITS),
  }));
}

/** μB/h in MHz/G, shown: the bench rule printed on every sheet. */
export function bohrRule(constants: ConstantsEdition): string {
  return formatNumber(hzPerTeslaToMHzPerGauss(val(constants.muB_h)), 9);
}

/**
 * Where a printed sheet leads back to: the full address when site.yaml gives
 * siteUrl, else the path inside the atlas with a note.
 */
export function sheetAddress(siteUrl: string | null, path: string): { text: string; full: boolean } {
  if (!siteUrl) return { text: path, full: false };
  return { text: siteUrl.replace(/\/+$/, "") + "/" + path.replace(/^\/+/, ""), full: true };
}
