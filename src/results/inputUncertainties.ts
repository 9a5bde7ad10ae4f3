/**
 * Every input of one species that can carry a standard uncertainty, as an
 * `Uncertain` (physics/uncertain.ts) under one stable key, so that a derived
 * number anywhere in the results shares its inputs' contributions with every
 * other number made from the same inputs (the correlations of GUM §5.2 come
 * out of the shared keys).
 *
 * Keys (also shown in the export's methods note):
 *   const:<key>            a CODATA constant of the edition in use (muB_h, g_e, m_e_u, m_e_m_p, muB_hc)
 *   species:mass           the atomic mass
 *   nucleus:gI             gI as given, or nucleus:moment when gI comes from the moment
 *   level:<id>:gJ          a measured gJ (an LS gJ is derived from gL and gS instead)
 *   level:<id>:A, :B       hyperfine constants
 *   level:<id>:energy      level energy
 *   line:<id>:wavelength   the line's wavelength as given (air or vacuum)
 *
 * Correlations between CODATA constants (the edition publishes a few, e.g.
 * between μB/h and m_e) are not modelled: each constant is taken as an
 * independent input. Their relative uncertainties (≤ 3·10⁻¹⁰) are far below
 * those of the atomic inputs of every demo species.
 */
import { Dec } from "../physics/decimal.js";
import type { Constant, ConstantsEdition } from "../physics/constants/constant.js";
import { derived, exact, measured, scaled, divided, linear, type Uncertain } from "../physics/uncertain.js";
import { Rational } from "../physics/rational.js";
import type { LevelInput, LineInput, SpeciesInput } from "../data/model.js";

export const constantInput = (c: Constant): Uncertain => measured(`const:${c.key}`, new Dec(c.value), c.exact ? null : new Dec(c.uncertainty));

export interface LevelInputs {
  /** The measured gJ when given; null otherwise (the LS value is derived, see `gJInUse`). */
  gJMeasured: Uncertain | null;
  /** Hyperfine A and B in Hz; exact zero when absent. */
  A: Uncertain;
  B: Uncertain;
  /** Level energy in Hz, null when not given. */
  energy: Uncertain | null;
}

export interface SpeciesInputs {
  muB_h: Uncertain;
  muB_hc: Uncertain;
  g_e: Uncertain;
  /** gL = 1 − m_e/M (1 exactly without a mass). */
  gL: Uncertain;
  /** gS = −g_e. */
  gS: Uncertain;
  /** gI in use (atomic sign convention), null without a nucleus. */
  gI: Uncertain | null;
  level(id: string): LevelInputs;
  /** Vacuum wavelength (m), null without one; from an air wavelength its contribution is still keyed to the given wavelength. */
  wavelength(lineId: string): Uncertain | null;
}

const levelInputs = (l: LevelInput): LevelInputs => ({
  gJMeasured: l.gJ ? measured(`level:${l.id}:gJ`, l.gJ.value, l.gJ.uncertainty) : null,
  A: l.hyperfine ? measured(`level:${l.id}:A`, l.hyperfine.A.si, l.hyperfine.A.siUncertainty) : exact(new Dec(0)),
  B: l.hyperfine?.B ? measured(`level:${l.id}:B`, l.hyperfine.B.si, l.hyperfine.B.siUncertainty) : exact(new Dec(0)),
  energy: l.energy ? measured(`level:${l.id}:energy`, l.energy.si, l.energy.siUncertainty) : null,
});

const lineWavelength = (l: LineInput): Uncertain | null =>
  l.wavelength ? measured(`line:${l.id}:wavelength`, l.wavelength.si, l.wavelength.siUncertainty) : null;

/**
 * The species' inputs as uncertain numbers. gI from a moment follows
 * gI = −(μ/I)(m_e/m_p), the same formula as results/computeSpecies.ts.
 */
export function speciesInputs(species: SpeciesInput, c: ConstantsEdition): SpeciesInputs {
  const m_e_u = constantInput(c.m_e_u);
  const g_e = constantInput(c.g_e);
  const mass = species.mass ? measured("species:mass", species.mass.si, species.mass.siUncertainty) : null;
  const one = exact(new Dec(1));
  const gL = mass ? linear([[new Dec(1), one], [new Dec(-1), divided(m_e_u, mass)]]) : one;
  const gS = scaled(g_e, new Dec(-1));
  const n = species.nucleus;
  let gI: Uncertain | null = null;
  if (n?.gI) gI = measured("nucleus:gI", n.gI.value, n.gI.uncertainty);
  else if (n?.moment && n.I2 > 0) {
    const mu = measured("nucleus:moment", n.moment.value, n.moment.uncertainty);
    const ratio = constantInput(c.m_e_m_p);
    const I = Rational.half(n.I2).toDecimal();
    const value = mu.value.mul(ratio.value).div(I).neg();
    gI = derived(value, [
      [ratio.value.div(I).neg(), mu],
      [mu.value.div(I).neg(), ratio],
    ]);
  } else if (n) gI = exact(new Dec(0));
  const levels = new Map(species.levels.map((l) => [l.id, levelInputs(l)]));
  const lines = new Map(species.lines.map((l) => [l.id, lineWavelength(l)]));
  return {
    muB_h: constantInput(c.muB_h),
    muB_hc: constantInput(c.muB_hc),
    g_e,
    gL,
    gS,
    gI,
    level: (id) => {
      const l = levels.get(id);
      if (!l) throw new RangeError(`no level ${id}`);
      return l;
    },
    wavelength: (id) => lines.get(id) ?? null,
  };
}

/**
 * The gJ in use as an uncertain number: the measured one when given, else
 * the coupling formula's value, which is linear in gL and gS for LS, jK and
 * jj coupling alike: gJ = cL·gL + cS·gS. `lande(gL, gS)` is that formula
 * (null for J = 0); its slopes are lande(1, 0) and lande(0, 1).
 */
export function gJInUse(inputs: LevelInputs, gL: Uncertain, gS: Uncertain, lande: (gL: Dec, gS: Dec) => Dec | null): Uncertain | null {
  const value = lande(gL.value, gS.value);
  if (value === null) return null;
  if (inputs.gJMeasured) return inputs.gJMeasured;
  const cL = lande(new Dec(1), new Dec(0))!;
  const cS = lande(new Dec(0), new Dec(1))!;
  return derived(value, [
    [cL, gL],
    [cS, gS],
  ]);
}
