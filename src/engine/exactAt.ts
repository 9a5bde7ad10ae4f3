/**
 * The exact counterpart of the field calculator: a species' numbers at one
 * field from the 60-digit build path (computeSpecies, then computeFields with
 * that single field), in the calculator's answer shape with decimal strings
 * formatted as the JSON export formats them (EXPORT_DIGITS = 30 significant
 * digits; relative strengths at 20, as the export's at_fields). Used by
 * `npm run at` and by the tests as the reference for the float64 engine.
 * Pure.
 */
import { exportText, type Dec } from "../physics/decimal.js";
import { formatDoubled } from "../physics/quantum.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import type { SpeciesInput } from "../data/model.js";
import { computeSpecies } from "../results/computeSpecies.js";
import { computeFields, type SpeciesFieldResult } from "../results/computeFields.js";
import type { ConfiguredField } from "../results/fieldTypes.js";
import type { SpeciesResult } from "../results/types.js";
import { EXPORT_DIGITS } from "../site/exportJson.js";
import { absoluteFrequency } from "../physics/lockPoints.js";
import type { AtResult } from "./types.js";
import { rss } from "../results/fieldUncertainty.js";

const num = (x: Dec): string => exportText(x, EXPORT_DIGITS);
/** A standard uncertainty as the export's _u keys write it: null when exact. */
const numU = (x: Dec | null | undefined): string | null => (x ? num(x) : null);

/** The answer at configured field number `index` of results already computed. */
export function atFromResults(s: SpeciesResult, f: SpeciesFieldResult, field: ConfiguredField, index: number): AtResult<string> {
  return {
    B_T: num(field.tesla),
    levels: s.levels.map((l) => ({
      id: l.input.id,
      states: f.levels.get(l.input.id)!.rows.map((r) => ({
        F: formatDoubled(r.F2),
        mF: formatDoubled(r.mF2),
        E_Hz: num(r.energies[index]!),
        E_Hz_u: numU(r.energiesU?.[index]),
        high_field: { mJ: formatDoubled(r.highField.mJ2), mI: formatDoubled(r.highField.mI2) },
      })),
    })),
    transitions: s.levels.flatMap((l) =>
      f.levels.get(l.input.id)!.transitions.map((t, k) => ({
        level: l.input.id,
        lower: { F: formatDoubled(t.lower.F2), mF: formatDoubled(t.lower.mF2) },
        upper: { F: formatDoubled(t.upper.F2), mF: formatDoubled(t.upper.mF2) },
        kind: t.kind,
        Hz: num(t.atFields[index]!.hz),
        Hz_u: numU(f.levels.get(l.input.id)!.transitionsU?.[k]?.atFields[index]),
      })),
    ),
    lines: s.lines.map((ln) => {
      const a = f.lines.get(ln.input.id)!.atFields[index]!;
      return {
        id: ln.input.id,
        model: a.model,
        regime: a.regime,
        components: a.components.map((c) => ({
          upper: c.upperLabel,
          lower: c.lowerLabel,
          delta_m: c.q,
          polarization: c.polarization,
          relative_strength: exportText(c.strength, 20),
          // as in the export: the strength at a field follows the eigenvectors, its uncertainty is not propagated
          relative_strength_u: null,
          relative_strength_u_note: "not propagated",
          shift_Hz: num(c.shiftHz),
          shift_Hz_u: numU(c.shiftHzU),
          frequency_Hz: ln.frequencyHz === null ? null : num(absoluteFrequency(ln.frequencyHz, c.shiftHz)),
          frequency_Hz_u: ln.frequencyHz === null ? null : numU(rss(c.shiftHzU, ln.frequencyHzU)),
        })),
      };
    }),
  };
}

/** A species' numbers at one field, exactly (the whole 60-digit path for that one field). */
export function exactAt(input: SpeciesInput, constants: ConstantsEdition, field: ConfiguredField): AtResult<string> {
  const s = computeSpecies(input, constants);
  const f = computeFields(s, constants, [field]);
  return atFromResults(s, f, field, 0);
}
