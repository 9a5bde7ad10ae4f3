/**
 * The field calculator's input for one species, made by the build from its
 * exact results: the solvers' inputs (the same Dec values computeFields
 * solves with, written as decimal strings), the regime limits computeFields
 * found (so the engine picks the same model per line and field), and the
 * J-resolved linear pattern of each line. Pure; no file system.
 */
import type { Dec } from "../physics/decimal.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { hyperfineConstants, solverLevel, type SpeciesFieldResult } from "../results/computeFields.js";
import type { ConfiguredField } from "../results/fieldTypes.js";
import type { SpeciesResult } from "../results/types.js";
import { lsTerm } from "../data/model.js";
import { sublevelTransitionPairs } from "../physics/field/sublevelTransitions.js";
import { termText } from "../site/format.js";
import { speciesInputs } from "../results/inputUncertainties.js";
import { levelGJ } from "../results/fieldUncertainty.js";
import type { Uncertain } from "../physics/uncertain.js";
import { ENGINE_FORMAT, type EngineData, type Parts } from "./types.js";

/** The non-zero signed contributions of an uncertain input, or undefined (kept out of the file) when it has none. */
function parts(x: Uncertain | null | undefined): Parts | undefined {
  if (!x) return undefined;
  const out: Parts = {};
  for (const [k, c] of x.parts) if (!c.isZero()) out[k] = c.toString();
  return Object.keys(out).length ? out : undefined;
}

/** An object without its undefined entries, or undefined when none is left (keeps the engine data small). */
function some<T extends object>(o: T): T | undefined {
  const kept = Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
  return Object.keys(kept).length ? kept : undefined;
}

const str = (x: Dec): string => x.toString();
const strOrNull = (x: Dec | null | undefined): string | null => (x === null || x === undefined ? null : x.toString());

/**
 * Engine data of one species. `fields` is computeFields(s, constants,
 * configured); `configured` the build's bias fields (kept for the page's
 * field presets). Every value is copied from the results, none recomputed
 * (except the solver inputs, which computeFields' own solverLevel gives).
 */
export function engineData(
  s: SpeciesResult,
  fields: SpeciesFieldResult,
  constants: ConstantsEdition,
  configured: readonly ConfiguredField[],
): EngineData {
  const byId = new Map(s.levels.map((l) => [l.input.id, l]));
  const inputs = speciesInputs(s.input, constants);
  return {
    format: ENGINE_FORMAT,
    id: s.input.id,
    label: s.input.label,
    constants: constants.edition,
    muB_h: str(val(constants.muB_h)),
    ...(parts(inputs.muB_h) ? { muB_h_u: parts(inputs.muB_h) } : {}),
    fields: configured.map((f) => ({ text: f.text, tesla: str(f.tesla) })),
    levels: s.levels.map((l) => {
      const lv = solverLevel(s, l, constants);
      const v = fields.levels.get(l.input.id)?.validity ?? null;
      return {
        id: l.input.id,
        J2: lv.J2,
        I2: lv.I2,
        gJ: str(lv.gJ),
        gI: str(lv.gI),
        A: str(lv.A),
        B: str(lv.B),
        linearUpToT: strOrNull(v?.relative.tesla),
        paschenBackT: strOrNull(v?.paschenBackTesla),
        term: termText(l.input.term),
        fineStructureTerm: fields.termOf.get(l.input.id)?.key ?? null,
        // null outside LS coupling: such a level takes no LS reduced elements
        S2: lsTerm(l.input.term)?.S2 ?? null,
        L: lsTerm(l.input.term)?.L ?? null,
        // the list computeFields' sublevelTransitions makes (levels with hyperfine structure only)
        transitions: lv.I2 > 0 ? sublevelTransitionPairs(lv).pairs.map(({ lo, up, kind }) => ({ lo, up, kind })) : [],
        ...withU(
          some({
            // the same inputs as solverLevel: gJ in use (J = 0: exact 0), gI, A and B only with hyperfine structure
            gJ: l.J2 > 0 ? parts(levelGJ(l, inputs)) : undefined,
            gI: lv.I2 > 0 ? parts(inputs.gI) : undefined,
            A: lv.I2 > 0 ? parts(inputs.level(l.input.id).A) : undefined,
            B: lv.I2 > 0 ? parts(inputs.level(l.input.id).B) : undefined,
            energy: parts(inputs.level(l.input.id).energy),
          }),
        ),
      };
    }),
    terms: fields.terms.map((t) => ({
      key: t.key,
      S2: t.S2,
      L: t.L,
      partners: t.levelIds.map((id) => {
        const l = byId.get(id)!;
        return { level: id, J2: l.J2, energy: str(l.input.energy!.si) };
      }),
      gL: str(s.gL),
      gS: str(s.gS),
      limitT: strOrNull(t.limit?.tesla),
      paschenBackT: strOrNull(t.paschenBackTesla),
      ...withU(some({ gL: parts(inputs.gL), gS: parts(inputs.gS) })),
    })),
    lines: s.lines.map((ln) => ({
      id: ln.input.id,
      upper: ln.upper.input.id,
      lower: ln.lower.input.id,
      multipole: ln.input.multipole,
      k: ln.k,
      hyperfineBoth: hyperfineConstants(s, ln.upper) !== null && hyperfineConstants(s, ln.lower) !== null,
      frequencyHz: strOrNull(ln.frequencyHz),
      // ν = c/λ depends on the line's wavelength only: its one contribution is u(ν)
      ...withU(some({ frequencyHz: ln.frequencyHzU && !ln.frequencyHzU.isZero() ? { [`line:${ln.input.id}:wavelength`]: ln.frequencyHzU.toString() } : undefined })),
      linear: ln.components.map((x) => ({
        mu2: x.mu2,
        ml2: x.ml2,
        deltaM: x.deltaM,
        polarization: x.polarization,
        strength: x.strength.toString(),
        shiftHzPerT: str(x.shiftHzPerT),
      })),
    })),
  };
}

const withU = <T extends object>(u: T | undefined): { u?: T } => (u ? { u } : {});

/**
 * A classic script that registers the data on the page:
 * `(window.SublevelAtlasData ||= {})["rb87"] = {…};`. It goes in its own
 * file (species/<id>/engine-data.js): the pages allow no inline scripts.
 */
export function engineDataScript(data: EngineData): string {
  return (
    `/* Sublevel Atlas field calculator data for ${data.id.replace(/\*\//g, "")}, generated by the build (src/engine/engineData.ts). */\n` +
    `(window.SublevelAtlasData ||= {})[${JSON.stringify(data.id)}] = ${JSON.stringify(data)};\n`
  );
}
