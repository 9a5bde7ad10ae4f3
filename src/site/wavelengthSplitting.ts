/**
 * Zeeman splittings of a line in wavelength units, for the line page and the
 * export: one Lorentz unit per tesla (LineResult.lorentzDlambdaPerT) and the
 * separation of the σ+ and σ− centroids at a field.
 */
import { exportText, type Dec } from "../physics/decimal.js";
import type { LineInput } from "../data/model.js";
import type { ConfiguredField } from "../results/fieldTypes.js";
import type { LineResult } from "../results/types.js";
import { lineDlambdaAnchor } from "./anchors.js";
import { csvName, type TableHome } from "./linearTables.js";
import { textCell, uncertainCell, type Table } from "./table.js";
import { makeTable } from "./tableSpec.js";
import { formatUncertain } from "./format.js";
import { sigmaSeparationU } from "../results/linearUncertainties.js";

/** pm per m; 1 pm/T is also 1 mÅ/kG. */
export const PM = "1e12";

/**
 * Separation (m) of the strength-weighted centroids of the σ+ and σ−
 * components at a field B (T): each centroid sits g_eff Lorentz units from
 * the line centre (g_eff is their first moment), so the separation is
 * 2·|g_eff|·λ²·μB/(hc)·B. Linear Zeeman pattern of the J-resolved line
 * (weak field, hyperfine structure not resolved). Null without a
 * wavelength, and for lines of rank 2 or 3 (E2, M2, E3: no g_eff).
 */
export function sigmaCentroidSeparation(ln: Pick<LineResult, "gEff" | "lorentzDlambdaPerT">, tesla: Dec): Dec | null {
  if (ln.gEff === null || ln.lorentzDlambdaPerT === null) return null;
  return ln.gEff.abs().mul(2).mul(ln.lorentzDlambdaPerT).mul(tesla);
}

/**
 * A wavelength in words: the given one as its data file writes it (with its
 * own concise uncertainty, if any); the converted one with the given one's
 * uncertainty carried over (data/speciesFile.ts) in the concise form, or its
 * text when the given wavelength is exact.
 */
function shownWavelength(q: NonNullable<LineInput["wavelength"]>, asGiven: boolean): string {
  if (asGiven || q.uncertainty === null) return q.text;
  return `${formatUncertain(q.value, q.uncertainty)} ${q.unit}`;
}

/** Vacuum and air wavelengths of a line in words, for the line page under its heading; null without a wavelength. */
export function wavelengthsText(input: LineInput): string | null {
  const vac = input.wavelength;
  if (!vac) return null;
  const given = (m: LineInput["medium"]) => (input.medium === m ? " (as given)" : "");
  const vacText = `${shownWavelength(vac, input.medium === "vacuum")} in vacuum${given("vacuum")}`;
  const air = input.airWavelength;
  return air
    ? `λ = ${vacText}, ${shownWavelength(air, input.medium === "air")} in standard air${given("air")}`
    : `λ = ${vacText}; in air: outside the range of the air formula (200 nm to 2 µm)`;
}

/**
 * The Zeeman splitting of a line in wavelength at each configured field
 * (above zero): one Lorentz unit and the σ centroid separation, in pm
 * and mÅ. Null without a wavelength.
 */
export function wavelengthSplitTable(ln: LineResult, fields: ConfiguredField[], home: TableHome): Table | null {
  const perT = ln.lorentzDlambdaPerT;
  if (perT === null) return null;
  const rows = fields.filter((f) => f.tesla.gt(0));
  const pm = (x: Dec | null | undefined) => (x === null || x === undefined ? null : x.mul(PM));
  const sigma = (f: ConfiguredField) => pm(sigmaCentroidSeparation(ln, f.tesla));
  const sigmaU = (f: ConfiguredField) => pm(sigmaSeparationU(ln, f.tesla));
  return makeTable<ConfiguredField>(
    {
      id: `dlambda:${ln.input.id}`,
      caption: `${ln.input.id}: Zeeman splitting in wavelength at the bias fields`,
      csvPath: csvName(home, ln.input.id, "wavelength-splitting"),
      exportUrl: home.exportUrl,
      anchor: (f) => lineDlambdaAnchor(ln.input.id, exportText(f.tesla, 30)),
      columns: [
        { key: "B", label: "field", kind: "text", cell: (f) => textCell(f.text) },
        { key: "lorentz", label: "one Lorentz unit", unit: "pm", kind: "number", cell: (f) => uncertainCell(pm(perT.mul(f.tesla)), pm(ln.lorentzDlambdaPerTU?.mul(f.tesla)), 6) },
        { key: "sigma", label: "σ+ to σ− centroids", unit: "pm", kind: "number", cell: (f) => uncertainCell(sigma(f), sigmaU(f), 6) },
        { key: "sigmaA", label: "σ+ to σ− centroids", unit: "mÅ", kind: "number", cell: (f) => uncertainCell(sigma(f)?.mul(10) ?? null, sigmaU(f)?.mul(10) ?? null, 6) },
      ],
    },
    rows,
  );
}

/** One Lorentz unit in wavelength per field, in words, for the line page; null without a wavelength. */
export function lorentzWavelengthText(ln: LineResult): string | null {
  const perT = ln.lorentzDlambdaPerT;
  if (perT === null) return null;
  const v = formatUncertain(perT.mul(PM), ln.lorentzDlambdaPerTU?.mul(PM) ?? null, 6);
  const sigma =
    ln.gEff === null
      ? ""
      : ` The σ+ and σ− components' strength-weighted centroids lie 2·|g_eff| = ${formatUncertain(ln.gEff.abs().mul(2), ln.gEffU?.mul(2) ?? null, 6)} Lorentz units apart (linear pattern, hyperfine structure not resolved).`;
  return `A shift of one Lorentz unit (μB·B/h) moves the line by ${v} pm/T = ${v} mÅ/kG in wavelength (λ²·μB/(hc) with the vacuum wavelength; in air smaller by the factor n, 3 × 10⁻⁴); toward shorter wavelength for a positive shift.${sigma}`;
}
