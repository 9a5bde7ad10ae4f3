/**
 * What a laser bench reads off a line page: absolute frequencies (THz, to
 * 1 kHz) and the lock-point table of a hyperfine-resolved line, with the
 * offset of every resonance from a reference the reader picks (the
 * strongest transition until then). Laid out from lockPoints.ts; the
 * reference choice runs in src/browser/lockReference.ts.
 */
import { Dec, exportText } from "../physics/decimal.js";
import type { HyperfineLineGroup } from "../physics/hyperfineLines.js";
import { lockPoints, strongestTransition, vacuumWavelength, type LockPoint } from "../physics/lockPoints.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import { inAirFormulaRange, vacuumToAir } from "../physics/airWavelength.js";
import type { LineResult } from "../results/types.js";
import { lockKey, rss } from "../results/fieldUncertainty.js";
import { lineLockAnchor, lockPointAnchor } from "./anchors.js";
import { EXPORT_DIGITS } from "./exportJson.js";
import { formatQuantum } from "./format.js";
import { csvName, type TableHome } from "./linearTables.js";
import { offsetFrom } from "./lockOffsets.js";
import { partsText } from "./plainFormat.js";
import { fractionCell, numberCell, textCell, uncertainCell, type Cell, type Table } from "./table.js";
import { makeTable } from "./tableSpec.js";

const THZ = new Dec("1e12");
const NM = new Dec("1e-9");
const MHZ = new Dec("1e6");

/**
 * Significant digits that show a frequency in THz to 1 kHz (three integer
 * digits and nine decimals near 384 THz): enough to resolve Zeeman shifts
 * of a few kHz, which is also about as far as a wavelength given to 12
 * digits carries. The calculator uses the same rule (kHzDigits).
 */
export function absoluteDigits(hz: Dec): number {
  const thz = hz.abs().div(THZ);
  const intDigits = thz.gte(1) ? thz.floor().toString().length : 1;
  return intDigits + 9;
}

/** An absolute frequency in THz, to 1 kHz, with its standard uncertainty `u` (Hz) in the concise form when given. */
export const frequencyCell = (hz: Dec | null, u: Dec | null = null): Cell =>
  uncertainCell(hz === null ? null : hz.div(THZ), u === null ? null : u.div(THZ), hz === null ? 1 : absoluteDigits(hz));

/**
 * The standard-air wavelength of c/ν in nm (physics/airWavelength.ts), to 9
 * significant digits: the air formula holds to about 1e-8 in n, so more
 * digits would claim what it does not give.
 */
export function airWavelengthOfCell(hz: Dec | null): Cell {
  if (hz === null) return numberCell(null);
  const vac = vacuumWavelength(hz, SPEED_OF_LIGHT);
  return inAirFormulaRange(vac) ? numberCell(vacuumToAir(vac).div(NM), 9) : textCell("outside the range of the air formula");
}

/**
 * A vacuum wavelength c/ν in nm, with as many significant digits as the
 * frequency beside it, and its uncertainty λ·u(ν)/ν (∂λ/∂ν = −c/ν², c
 * exact) when u(ν) (Hz) is given.
 */
export function wavelengthCell(hz: Dec | null, uHz: Dec | null = null): Cell {
  if (hz === null) return numberCell(null);
  const nm = vacuumWavelength(hz, SPEED_OF_LIGHT).div(NM);
  return uncertainCell(nm, uHz === null ? null : nm.mul(uHz).div(hz.abs()), absoluteDigits(hz));
}

/**
 * A frequency in Hz shown in MHz to 1 kHz, as the offset-from-reference
 * column (lockOffsets.ts); with a standard uncertainty `u` (Hz) in the
 * concise form instead, the value then to the place of its uncertainty.
 */
function mhzCell(hz: Dec | null, u: Dec | null = null): Cell {
  if (hz === null) return numberCell(null);
  if (u !== null && !u.isZero()) return uncertainCell(hz.div(MHZ), u.div(MHZ), 10);
  const o = offsetFrom(exportText(hz, EXPORT_DIGITS), "0")!;
  return { text: partsText(o.parts), sort: o.sort, parts: o.parts };
}

const levels = (F2: number[]) => F2.map(formatQuantum).join(" and ");

/** "F = 2 → F′ = 3", "F = 2 → F′ = 2 and 3 (crossover)". */
export function lockPointText(p: LockPoint): string {
  return `F = ${levels(p.Fl2)} → F′ = ${levels(p.Fu2)}${p.kind === "crossover" ? " (crossover)" : ""}`;
}

export interface LockView {
  /** Section anchor (line:D2-lock-points). */
  anchor: string;
  /** HTML id of the table (the macro's "table-" + table id) that the reference choice drives. */
  tableHtmlId: string;
  /** Id of the select box. */
  selectId: string;
  /** The reference without JavaScript: the strongest transition. */
  referenceText: string;
  /** The select box's options: each lock point's row anchor and name, the strongest selected. */
  options: { value: string; text: string; selected: boolean }[];
  table: Table;
}

/**
 * The lock-point view of a line with hyperfine groups and a wavelength, or
 * null (no absolute frequencies without a wavelength; the export still
 * lists the points with their offsets from the line centre).
 */
export function lockView(ln: LineResult, groups: HyperfineLineGroup[] | null, home: TableHome, offsetU?: Map<string, Dec | null>): LockView | null {
  if (!groups || groups.length === 0 || ln.frequencyHz === null) return null;
  const id = ln.input.id;
  // ν0 (from the wavelength) and the offsets (from A, B) share no input: their uncertainties add in quadrature
  const offU = (p: LockPoint) => offsetU?.get(lockKey(p.Fl2, p.Fu2)) ?? null;
  const points = lockPoints(groups, ln.frequencyHz);
  const reference = strongestTransition(points)!;
  // offsets from the 30-digit texts the cells carry, so the page script recomputes the same digits
  const hzText = (p: LockPoint) => exportText(p.frequencyHz!, EXPORT_DIGITS);
  const refHz = hzText(reference);
  const anchor = (p: LockPoint) => lockPointAnchor(id, p.Fl2, p.Fu2);
  const table = makeTable<LockPoint>(
    {
      id: `lock:${id}`,
      caption: `${id}: lock points at zero field, saturated-absorption transitions and crossovers in rising frequency`,
      csvPath: csvName(home, id, "lock-points"),
      exportUrl: home.exportUrl,
      anchor,
      columns: [
        { key: "kind", label: "resonance", kind: "text", cell: (p) => textCell(p.kind) },
        { key: "Fl", label: "F lower", kind: "text", cell: (p) => textCell(levels(p.Fl2)) },
        { key: "Fu", label: "F′ upper", kind: "text", cell: (p) => textCell(levels(p.Fu2)) },
        { key: "nu", label: "frequency", unit: "THz", kind: "number", cell: (p) => frequencyCell(p.frequencyHz, rss(offU(p), ln.frequencyHzU)) },
        { key: "lambda", label: "vacuum wavelength", unit: "nm", kind: "number", cell: (p) => wavelengthCell(p.frequencyHz, rss(offU(p), ln.frequencyHzU)) },
        { key: "lambda_air", label: "air wavelength", unit: "nm", kind: "number", cell: (p) => airWavelengthOfCell(p.frequencyHz) },
        { key: "off", label: "offset from line centre", unit: "MHz", kind: "number", cell: (p) => mhzCell(p.offset, offU(p)) },
        { key: "S", label: "strength (of line)", kind: "fraction", cell: (p) => fractionCell(p.strength) },
        { key: "pair", label: "pair spacing", unit: "MHz", kind: "number", cell: (p) => mhzCell(p.kind === "crossover" ? p.spacing : null, p.kind === "crossover" ? offsetU?.get(`spacing ${lockKey(p.Fl2, p.Fu2)}`) ?? null : null) },
        {
          key: "ref", label: "offset from reference", unit: "MHz", kind: "number",
          cell: (p) => {
            const o = offsetFrom(hzText(p), refHz)!;
            return { text: partsText(o.parts), sort: o.sort, parts: o.parts, hz: hzText(p) };
          },
        },
      ],
    },
    points,
  );
  return {
    anchor: lineLockAnchor(id),
    tableHtmlId: `table-${table.id.replace(/ /g, "_")}`,
    selectId: `lock-reference-${id}`,
    referenceText: lockPointText(reference),
    options: points.map((p) => ({ value: anchor(p), text: lockPointText(p), selected: p === reference })),
    table,
  };
}
