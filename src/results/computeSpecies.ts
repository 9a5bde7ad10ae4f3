/**
 * From a validated species to its computed results, with one constants
 * edition. Pure: no file system, no clock.
 */
import { Dec } from "../physics/decimal.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { fValues, gF, hyperfineShift } from "../physics/hyperfine.js";
import { landeExact, landeJJ, landeJJExact, landeJK, landeJKExact, landeLS, orbitalG, spinG } from "../physics/lande.js";
import { effectiveLande, gEffNote, lineComponents, multipoleRank, patternNotation, patternSummary } from "../physics/linePattern.js";
import { mValues } from "../physics/quantum.js";
import { Rational } from "../physics/rational.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import { lorentzWavelengthPerTesla } from "../physics/airWavelength.js";
import { linearShiftPerTesla } from "../physics/zeeman.js";
import type { LevelInput, NucleusInput, SpeciesInput, TermSymbol } from "../data/model.js";
import type { LevelResult, LineResult, SpeciesResult } from "./types.js";
import { attachLinearUncertainties, type LevelLande } from "./linearUncertainties.js";

/**
 * gI from the nuclear moment: gI = −(μ/I)(μN/μB), with μN/μB = m_e/m_p
 * (atomic sign convention: a positive moment gives a negative gI).
 */
export function nuclearG(nucleus: NucleusInput, c: ConstantsEdition): Dec {
  if (nucleus.gI) return nucleus.gI.value;
  if (!nucleus.moment || nucleus.I2 === 0) return new Dec(0);
  return nucleus.moment.value.div(Rational.half(nucleus.I2).toDecimal()).mul(val(c.m_e_m_p)).neg();
}

/**
 * The Landé factor of a term from its own coupling scheme's formula: with
 * the physical gL and gS, and exact with gL = 1, gS = 2 (physics/lande.ts).
 */
export function couplingLande(t: TermSymbol, gL: Dec, gS: Dec): { g: Dec | null; exact: Rational | null } {
  if (t.scheme === "LS") return { g: landeLS(t.S2, t.L, t.J2, gL, gS), exact: landeExact(t.S2, t.L, t.J2) };
  if (t.scheme === "jK") {
    const jk = { coreS2: t.core.S2, coreL: t.core.L, coreJ2: t.core.J2, l: t.l, K2: t.K2, J2: t.J2 };
    return { g: landeJK(jk, gL, gS), exact: landeJKExact(jk) };
  }
  const jj = { l1: t.l[0], j1_2: t.j2s[0], l2: t.l[1], j2_2: t.j2s[1], J2: t.J2 };
  return { g: landeJJ(jj, gL, gS), exact: landeJJExact(jj) };
}

/** Relative difference above which a measured gJ is said to differ from its coupling formula's value (intermediate coupling). */
export const COUPLING_DIFFERS_ABOVE = new Dec("0.01");

function computeLevel(level: LevelInput, gL: Dec, gS: Dec, I2: number, gI: Dec | null, muB_h: Dec): LevelResult {
  const J2 = level.term.J2;
  const { g: gJLS, exact: gJExact } = couplingLande(level.term, gL, gS);
  const gJ = J2 === 0 ? null : level.gJ ? level.gJ.value : gJLS;
  const gJFrom = J2 === 0 ? "none" : level.gJ ? "measured" : level.term.scheme;
  const gJDiffers = gJFrom === "measured" && gJLS !== null && !gJLS.isZero() && level.gJ!.value.sub(gJLS).abs().div(gJLS.abs()).gt(COUPLING_DIFFERS_ABOVE);
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
  return { input: level, J2, gJ, gJFrom, gJLS, gJExact, gJDiffers, sublevels, hyperfine };
}

/** The coupling formula computeLevel uses, as linearUncertainties.ts takes it: a level's g from gL and gS. */
export const levelLande: LevelLande = (level, gL, gS) => couplingLande(level.term, gL, gS).g;

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
  // standard uncertainties beside the values, with the same coupling formula as computeLevel (results/linearUncertainties.ts)
  return attachLinearUncertainties({
    input: species,
    gL,
    gS,
    gI,
    gIFrom: species.nucleus ? (species.nucleus.gI ? "gI" : "moment") : null,
    I2,
    levels,
    lines,
  }, c, levelLande);
}
