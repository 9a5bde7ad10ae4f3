/**
 * From a validated species to its computed results, with one constants
 * edition. Pure: no file system, no clock.
 */
import { Dec } from "../physics/decimal.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { fValues, gF, hyperfineShift } from "../physics/hyperfine.js";
import { landeExact, landeLS, orbitalG, spinG } from "../physics/lande.js";
import { effectiveLande, gEffNote, lineComponents, multipoleRank, patternNotation, patternSummary } from "../physics/linePattern.js";
import { mValues } from "../physics/quantum.js";
import { Rational } from "../physics/rational.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import { lorentzWavelengthPerTesla } from "../physics/airWavelength.js";
import { linearShiftPerTesla } from "../physics/zeeman.js";
import type { LevelInput, NucleusInput, SpeciesInput } from "../data/model.js";
import type { LevelResult, LineResult, SpeciesResult } from "./types.js";

/**
 * gI from the nuclear moment: gI = −(μ/I)(μN/μB), with μN/μB = m_e/m_p
 * (atomic sign convention: a positive moment gives a negative gI).
 */
export function nuclearG(nucleus: NucleusInput, c: ConstantsEdition): Dec {
  if (nucleus.gI) return nucleus.gI.value;
  if (!nucleus.moment || nucleus.I2 === 0) return new Dec(0);
  return nucleus.moment.value.div(Rational.half(nucleus.I2).toDecimal()).mul(val(c.m_e_m_p)).neg();
}

function computeLevel(level: LevelInput, gL: Dec, gS: Dec, I2: number, gI: Dec | null, muB_h: Dec): LevelResult {
  const { S2, L, J2 } = level.term;
  const gJLS = landeLS(S2, L, J2, gL, gS);
  const gJExact = landeExact(S2, L, J2);
  const gJ = J2 === 0 ? null : level.gJ ? level.gJ.value : gJLS;
  const gJFrom = J2 === 0 ? "none" : level.gJ ? "measured" : "LS";
  const sublevels = mValues(J2).map((m2) => ({ m2, shiftHzPerT: linearShiftPerTesla(gJ, m2, muB_h) }));
  const hyperfine =
    I2 > 0 && gI !== null
      ? fValues(I2, J2).map((F2) => {
          const g = gF(gJ ?? new Dec(0), gI, I2, J2, F2);
          const A = level.hyperfine?.A.si ?? new Dec(0);
          const B = level.hyperfine?.B?.si ?? new Dec(0);
          return {
            F2,
            gF: g,
            zeroFieldHz: hyperfineShift(A, B, I2, J2, F2),
            sublevels: mValues(F2).map((m2) => ({ m2, shiftHzPerT: linearShiftPerTesla(g, m2, muB_h) })),
          };
        })
      : [];
  return { input: level, J2, gJ, gJFrom, gJLS, gJExact, sublevels, hyperfine };
}

export function computeSpecies(species: SpeciesInput, c: ConstantsEdition): SpeciesResult {
  const muB_h = val(c.muB_h);
  const gL = orbitalG(species.mass?.si ?? null, val(c.m_e_u));
  const gS = spinG(val(c.g_e));
  const I2 = species.nucleus?.I2 ?? 0;
  const gI = species.nucleus ? nuclearG(species.nucleus, c) : null;
  const levels = species.levels.map((l) => computeLevel(l, gL, gS, I2, gI, muB_h));
  const byId = new Map(levels.map((l) => [l.input.id, l]));
  const lines: LineResult[] = species.lines.map((line) => {
    const upper = byId.get(line.upper)!;
    const lower = byId.get(line.lower)!;
    const k = multipoleRank(line.multipole);
    const components = lineComponents(
      { J2: upper.J2, g: upper.gJ, gExact: upper.gJExact },
      { J2: lower.J2, g: lower.gJ, gExact: lower.gJExact },
      k,
      muB_h,
    );
    return {
      input: line,
      upper,
      lower,
      k,
      // the dipole formula has no standard meaning for a line of rank 2 or 3
      gEff: k === 1 ? effectiveLande({ J2: upper.J2, g: upper.gJ }, { J2: lower.J2, g: lower.gJ }) : null,
      gEffNote: gEffNote(line.multipole),
      pattern: patternNotation(components, k),
      summary: patternSummary(components, k),
      components,
      frequencyHz: line.wavelength ? SPEED_OF_LIGHT.div(line.wavelength.si) : null,
      lorentzDlambdaPerT: line.wavelength ? lorentzWavelengthPerTesla(line.wavelength.si, val(c.muB_hc)) : null,
    };
  });
  return {
    input: species,
    gL,
    gS,
    gI,
    gIFrom: species.nucleus ? (species.nucleus.gI ? "gI" : "moment") : null,
    I2,
    levels,
    lines,
  };
}
