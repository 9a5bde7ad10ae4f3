/**
 * The JSON export of one species: a contract that other tools and lab
 * scripts read (documented in README.md, schema in schema/export.schema.json).
 * Numbers are decimal strings at up to EXPORT_DIGITS significant digits;
 * exact fractions are strings like "4/3"; ids are the data file's ids.
 */
import type { Dec } from "../physics/decimal.js";
import { exportText } from "../physics/decimal.js";
import { formatDoubled } from "../physics/quantum.js";
import type { SpeciesResult } from "../results/types.js";

export const EXPORT_DIGITS = 30;
export const EXPORT_FORMAT = "sublevel-atlas/export@1";

const num = (x: Dec | null): string | null => (x === null ? null : exportText(x, EXPORT_DIGITS));

export interface ExportContext {
  constantsEdition: string;
  dataVersion: string;
}

/** Plain object of the export; `JSON.stringify(…, null, 2)` gives the file. */
export function speciesExport(s: SpeciesResult, ctx: ExportContext, extra: (levelId: string) => Record<string, unknown> = () => ({})) {
  return {
    format: EXPORT_FORMAT,
    id: s.input.id,
    label: s.input.label,
    constants: ctx.constantsEdition,
    data_version: ctx.dataVersion,
    nucleus: s.input.nucleus
      ? { I: formatDoubled(s.I2), gI: num(s.gI), gI_from: s.gIFrom }
      : null,
    gL: num(s.gL),
    gS: num(s.gS),
    levels: s.levels.map((l) => ({
      id: l.input.id,
      config: l.input.config,
      term: l.input.term.text,
      J: formatDoubled(l.J2),
      gJ: num(l.gJ),
      gJ_from: l.gJFrom,
      gJ_uncertainty: l.gJFrom === "measured" ? num(l.input.gJ!.uncertainty) : null,
      gJ_LS: num(l.gJLS),
      gJ_exact: l.gJExact ? l.gJExact.toString() : null,
      sublevels: l.sublevels.map((m) => ({ mJ: formatDoubled(m.m2), shift_Hz_per_T: num(m.shiftHzPerT) })),
      hyperfine: l.hyperfine.map((h) => ({
        F: formatDoubled(h.F2),
        gF: num(h.gF),
        zero_field_Hz: num(h.zeroFieldHz),
        sublevels: h.sublevels.map((m) => ({ mF: formatDoubled(m.m2), shift_Hz_per_T: num(m.shiftHzPerT) })),
      })),
      ...extra(l.input.id),
    })),
    lines: s.lines.map((ln) => ({
      id: ln.input.id,
      upper: ln.upper.input.id,
      lower: ln.lower.input.id,
      multipole: ln.input.multipole,
      wavelength_m: ln.input.wavelength ? num(ln.input.wavelength.si) : null,
      frequency_Hz: num(ln.frequencyHz),
      g_eff: num(ln.gEff),
      pattern: ln.pattern,
      summary: ln.summary,
      components: ln.components.map((c) => ({
        mu: formatDoubled(c.mu2),
        ml: formatDoubled(c.ml2),
        delta_m: c.deltaM,
        polarization: c.polarization,
        shift_lorentz: num(c.shiftLorentz),
        shift_lorentz_exact: c.shiftLorentzExact.toString(),
        shift_Hz_per_T: num(c.shiftHzPerT),
        strength: c.strength.toString(),
      })),
    })),
  };
}
