/**
 * The JSON export of one species: a contract that other tools and lab
 * scripts read (documented in README.md, schema in schema/export.schema.json).
 * Numbers are decimal strings at up to EXPORT_DIGITS significant digits;
 * exact fractions are strings like "4/3"; ids are the data file's ids.
 */
import { lineCouplingNote } from "./couplingNote.js";
import type { Dec } from "../physics/decimal.js";
import { exportText } from "../physics/decimal.js";
import { formatDoubled } from "../physics/quantum.js";
import { lockKey, rss } from "../results/fieldUncertainty.js";
import type { SpeciesResult } from "../results/types.js";
import type { SpeciesFieldResult } from "../results/computeFields.js";
import type { ConfiguredField, LevelFieldResult, LineFieldResult } from "../results/fieldTypes.js";
import { absoluteFrequency, lockPoints, vacuumWavelength } from "../physics/lockPoints.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import { PM, sigmaCentroidSeparation } from "./wavelengthSplitting.js";
import { angularCoefficientTexts, lineSecondOrder, viewFactors } from "../results/observation.js";
import { sigmaSeparationU } from "../results/linearUncertainties.js";

export const EXPORT_DIGITS = 30;
export const EXPORT_FORMAT = "sublevel-atlas/export@1";

const num = (x: Dec | null): string | null => (x === null ? null : exportText(x, EXPORT_DIGITS));

/**
 * A decimal key and its standard uncertainty as the sibling key `<key>_u`
 * (same unit; README "Uncertainties"): `withU("gF", x, u)` →
 * { gF: "…", gF_u: "…" }. The `_u` key is always written: null when the
 * number is exact or none of its inputs carries an uncertainty (and when
 * the number itself is null). Every key ending in `_u` matches the schema's
 * `uncertainty` definition (patternProperties "_u$").
 */
export function withU<K extends string>(key: K, x: Dec | null, u: Dec | null | undefined): Record<K | `${K}_u`, string | null> {
  return { [key]: num(x), [`${key}_u`]: x === null ? null : num(u ?? null) } as Record<K | `${K}_u`, string | null>;
}

export interface ExportContext {
  constantsEdition: string;
  dataVersion: string;
}

const fieldText = (t: Dec) => exportText(t, EXPORT_DIGITS);

/** `G` with its `G_u`, and `G_exact`, of a line (null above rank 1). */
function secondOrderExport(s: ReturnType<typeof lineSecondOrder>) {
  return { ...withU("G", s.G, s.GU), G_exact: s.GExact === null ? null : s.GExact.toString() };
}

/** A component's angular factors seen along (θ = 0) and across (θ = 90°) the field, exact fractions. */
function viewExport(k: number, q: number) {
  const v = viewFactors(k, q);
  return { angular_0deg: v.along.toString(), angular_90deg: v.across.toString() };
}

/** `field_table` and the other field-dependent keys of one level. */
function levelFieldExport(f: LevelFieldResult, fields: ConfiguredField[]) {
  return {
    field_table: fields.map((b, i) => ({
      B_T: fieldText(b.tesla),
      B_text: b.text,
      states: f.rows.map((r) => ({
        F: formatDoubled(r.F2),
        mF: formatDoubled(r.mF2),
        ...withU("E_Hz", r.energies[i]!, r.energiesU?.[i]),
        high_field: { mJ: formatDoubled(r.highField.mJ2), mI: formatDoubled(r.highField.mI2) },
      })),
    })),
    quadratic: f.rows.map((r) => ({
      F: formatDoubled(r.F2),
      mF: formatDoubled(r.mF2),
      ...withU("Hz_per_T2", r.quadraticPerTesla2, r.quadraticU),
      ...withU("Hz_per_G2", r.quadraticPerTesla2 === null ? null : r.quadraticPerTesla2.mul("1e-8"), r.quadraticU ? r.quadraticU.mul("1e-8") : null),
      scope: f.quadratic.scope,
    })),
    quadratic_partners: f.quadratic.included,
    // the limits of the linear regime are not propagated (README "Uncertainties"): their _u keys are null and say so;
    // searched_up_to_T is a setting, not a derived number
    linear_validity: f.validity
      ? {
          ...withU("within_1_percent_up_to_T", f.validity.relative.tesla, null),
          ...withU("within_1_kHz_up_to_T", f.validity.absolute.tesla, null),
          searched_up_to_T: num(f.validity.maxTesla),
          ...withU("paschen_back_scale_T", f.validity.paschenBackTesla, null),
          uncertainty: "not propagated",
        }
      : null,
    sublevel_transitions: f.transitions.map((t, k) => {
      const u = f.transitionsU?.[k];
      return {
        lower: { F: formatDoubled(t.lower.F2), mF: formatDoubled(t.lower.mF2) },
        upper: { F: formatDoubled(t.upper.F2), mF: formatDoubled(t.upper.mF2) },
        kind: t.kind,
        ...withU("zero_field_Hz", t.zeroFieldHz, u?.zeroFieldHz),
        ...withU("first_order_Hz_per_T", t.firstOrder.hzPerTesla, u?.firstOrderHzPerTesla),
        ...withU("second_order_Hz_per_T2", t.secondOrder ? t.secondOrder.hzPerTesla2 : null, u?.secondOrderHzPerTesla2),
        at_fields: t.atFields.map((a, i) => ({ B_T: fieldText(a.tesla), ...withU("Hz", a.hz, u?.atFields[i]) })),
        field_insensitive: t.fieldInsensitive.map((p, i) => {
          const pu = u?.fieldInsensitive[i];
          // an accidental B = 0 (first-order slopes cancelling for these inputs only) has no propagated uncertainty
          return { ...withU("B_T", p.tesla, pu?.tesla), ...withU("Hz", p.hz, pu?.hz), ...(pu && !pu.propagated ? { uncertainty: "not propagated" } : {}) };
        }),
      };
    }),
    field_insensitive_searched_up_to_T: num(f.insensitiveSearchTesla),
  };
}

/** An absolute frequency ν0 + offset (Hz), or null when the line has no wavelength (lockPoints.ts). */
const absolute = (nu0: Dec | null, offset: Dec) => (nu0 === null ? null : absoluteFrequency(nu0, offset));

/** vacuum_wavelength_m = c/ν of a group and its _u = λ·u(ν)/ν (∂λ/∂ν = −c/ν², c exact); null without a wavelength. */
function groupWavelength(nu0: Dec | null, offset: Dec, uHz: Dec | null) {
  if (nu0 === null) return withU("vacuum_wavelength_m", null, null);
  const nu = absoluteFrequency(nu0, offset);
  const lambda = vacuumWavelength(nu, SPEED_OF_LIGHT);
  return withU("vacuum_wavelength_m", lambda, uHz === null ? null : lambda.mul(uHz).div(nu));
}

/** F values of a lock point: the shared level as a string, the pair as a two-element array. */
const lockLevels = (F2: number[]) => (F2.length === 1 ? formatDoubled(F2[0]!) : F2.map(formatDoubled));

function lineFieldExport(f: LineFieldResult, nu0: Dec | null, nu0U: Dec | null) {
  // ν0 (from the wavelength) and the offsets share no input, so their uncertainties add in quadrature
  const offU = (Fl2: number[], Fu2: number[]) => f.hyperfineOffsetU?.get(lockKey(Fl2, Fu2)) ?? null;
  return {
    at_fields: f.atFields.map((a) => ({
      B_T: fieldText(a.field.tesla),
      B_text: a.field.text,
      regime: a.regime,
      model: a.model,
      components: a.components.map((c) => ({
        upper: c.upperLabel,
        lower: c.lowerLabel,
        delta_m: c.q,
        polarization: c.polarization,
        // the strength at a field follows the eigenvectors: its uncertainty is not propagated (README "Uncertainties")
        relative_strength: exportText(c.strength, 20),
        relative_strength_u: null,
        relative_strength_u_note: "not propagated",
        ...withU("shift_Hz", c.shiftHz, c.shiftHzU),
        ...withU("frequency_Hz", absolute(nu0, c.shiftHz), rss(c.shiftHzU, nu0U)),
      })),
    })),
    hyperfine_groups: f.hyperfine
      ? f.hyperfine.map((g, gi) => ({
          F_upper: formatDoubled(g.Fu2),
          F_lower: formatDoubled(g.Fl2),
          strength: g.strength.toString(),
          ...withU("offset_Hz", g.offset, offU([g.Fl2], [g.Fu2])),
          ...withU("frequency_Hz", absolute(nu0, g.offset), rss(offU([g.Fl2], [g.Fu2]), nu0U)),
          ...groupWavelength(nu0, g.offset, rss(offU([g.Fl2], [g.Fu2]), nu0U)),
          components: g.components.map((c, ci) => ({
            mF_upper: formatDoubled(c.mFu2),
            mF_lower: formatDoubled(c.mFl2),
            polarization: c.polarization,
            strength: c.strength.toString(),
            cycling: c.cycling,
            ...withU("shift_Hz_per_T", c.shiftHzPerT, f.hyperfineU?.[gi]?.shiftHzPerT[ci]),
          })),
        }))
      : [],
    lock_points: f.hyperfine
      ? lockPoints(f.hyperfine, nu0).map((p) => ({
          kind: p.kind,
          F_lower: lockLevels(p.Fl2),
          F_upper: lockLevels(p.Fu2),
          ...withU("frequency_Hz", p.frequencyHz, rss(offU(p.Fl2, p.Fu2), nu0U)),
          ...withU("offset_Hz", p.offset, offU(p.Fl2, p.Fu2)),
        }))
      : [],
  };
}

/** Plain object of the export; `JSON.stringify(…, null, 2)` gives the file. */
export function speciesExport(s: SpeciesResult, ctx: ExportContext, fields?: { result: SpeciesFieldResult; configured: ConfiguredField[] }) {
  const extra = (levelId: string) => {
    const f = fields?.result.levels.get(levelId);
    return f && fields ? levelFieldExport(f, fields.configured) : {};
  };
  const lineExtra = (lineId: string, nu0: Dec | null, nu0U: Dec | null = null) => {
    const f = fields?.result.lines.get(lineId);
    return f ? lineFieldExport(f, nu0, nu0U) : {};
  };
  return {
    format: EXPORT_FORMAT,
    id: s.input.id,
    label: s.input.label,
    constants: ctx.constantsEdition,
    data_version: ctx.dataVersion,
    nucleus: s.input.nucleus
      ? { I: formatDoubled(s.I2), ...withU("gI", s.gI, s.gIU), gI_from: s.gIFrom }
      : null,
    ...withU("gL", s.gL, s.gLU),
    ...withU("gS", s.gS, s.gSU),
    levels: s.levels.map((l) => ({
      id: l.input.id,
      config: l.input.config,
      term: l.input.term.text,
      coupling: l.input.term.scheme,
      J: formatDoubled(l.J2),
      ...withU("gJ", l.gJ, l.gJU),
      gJ_from: l.gJFrom,
      // kept from before gJ_u (same value for a measured gJ); gJ_u also covers a gJ from the coupling formula
      gJ_uncertainty: l.gJFrom === "measured" ? num(l.input.gJ!.uncertainty) : null,
      ...withU("gJ_LS", l.gJLS, l.gJLSU),
      gJ_exact: l.gJExact ? l.gJExact.toString() : null,
      gJ_LS_differs: l.gJDiffers,
      sublevels: l.sublevels.map((m) => ({ mJ: formatDoubled(m.m2), ...withU("shift_Hz_per_T", m.shiftHzPerT, m.shiftHzPerTU) })),
      hyperfine: l.hyperfine.map((h) => ({
        F: formatDoubled(h.F2),
        ...withU("gF", h.gF, h.gFU),
        ...withU("zero_field_Hz", h.zeroFieldHz, h.zeroFieldHzU),
        sublevels: h.sublevels.map((m) => ({ mF: formatDoubled(m.m2), ...withU("shift_Hz_per_T", m.shiftHzPerT, m.shiftHzPerTU) })),
      })),
      ...extra(l.input.id),
    })),
    lines: s.lines.map((ln) => ({
      id: ln.input.id,
      upper: ln.upper.input.id,
      lower: ln.lower.input.id,
      multipole: ln.input.multipole,
      ...withU("wavelength_m", ln.input.wavelength?.si ?? null, ln.input.wavelength?.siUncertainty),
      wavelength_medium: ln.input.medium,
      ...withU("air_wavelength_m", ln.input.airWavelength?.si ?? null, ln.input.airWavelength?.siUncertainty),
      ...withU("frequency_Hz", ln.frequencyHz, ln.frequencyHzU),
      ...withU("g_eff", ln.gEff, ln.gEffU),
      ...secondOrderExport(lineSecondOrder(ln)),
      angular_coefficients: angularCoefficientTexts(ln),
      pattern: ln.pattern,
      pattern_note: lineCouplingNote(ln),
      summary: ln.summary,
      components: ln.components.map((c) => ({
        mu: formatDoubled(c.mu2),
        ml: formatDoubled(c.ml2),
        delta_m: c.deltaM,
        polarization: c.polarization,
        ...withU("shift_lorentz", c.shiftLorentz, c.shiftLorentzU),
        shift_lorentz_exact: c.shiftLorentzExact.toString(),
        ...withU("shift_Hz_per_T", c.shiftHzPerT, c.shiftHzPerTU),
        strength: c.strength.toString(),
        ...viewExport(ln.k, c.deltaM),
      })),
      ...withU("lorentz_dlambda_pm_per_T", ln.lorentzDlambdaPerT?.mul(PM) ?? null, ln.lorentzDlambdaPerTU?.mul(PM)),
      sigma_separation_at_fields: (fields?.configured ?? []).map((b) => {
        const sep = sigmaCentroidSeparation(ln, b.tesla);
        return { B_T: fieldText(b.tesla), B_text: b.text, ...withU("centroid_separation_pm", sep?.mul(PM) ?? null, sigmaSeparationU(ln, b.tesla)?.mul(PM)) };
      }),
      ...lineExtra(ln.input.id, ln.frequencyHz, ln.frequencyHzU),
    })),
  };
}
