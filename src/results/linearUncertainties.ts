/**
 * Standard uncertainties of the linear (field-independent) numbers of a
 * species, propagated to first order from every input that carries one
 * (GUM, JCGM 100:2008, §5.1; physics/uncertain.ts keeps the signed
 * contribution of each input, so two numbers made from the same input stay
 * correlated). Inputs and their keys: results/inputUncertainties.ts.
 * Exact numbers (fractions, LS g factors with gS = 2) have none, and a
 * number whose inputs are all exact gets null.
 *
 * Every derivative here is a closed form, each the partial derivative of
 * the formula the value is computed with (the values themselves are
 * computed in computeSpecies.ts and are not touched; a test checks that the
 * value carried here is the same number):
 *
 *   gJ (coupling formula, any scheme)   gJ = cL·gL + cS·gS                ∂gJ/∂gL = cL, ∂gJ/∂gS = cS
 *   gL = 1 − m_e/M                                                         ∂gL/∂m_e = −1/M, ∂gL/∂M = m_e/M²
 *   gF = wJ·gJ + wI·gI (Steck eq. 22)                                      ∂gF/∂gJ = wJ, ∂gF/∂gI = wI
 *   gI = −(μ/I)(m_e/m_p)                                                   ∂gI/∂μ = −(m_e/m_p)/I, ∂gI/∂(m_e/m_p) = −μ/I
 *   E_F = a_F·A + b_F·B (hyperfine.ts)                                     ∂E_F/∂A = a_F, ∂E_F/∂B = b_F
 *   shift = g·m·μB/h                                                       ∂/∂g = m·μB/h, ∂/∂(μB/h) = g·m
 *   component (Lorentz units) = gu·mu − gl·ml                              ∂/∂gu = mu, ∂/∂gl = −ml
 *   component (Hz/T) = (gu·mu − gl·ml)·μB/h                                product rule
 *   g_eff = (gu + gl)/2 + (gu − gl)[Ju(Ju+1) − Jl(Jl+1)]/4                 ∂/∂gu = 1/2 + d/4, ∂/∂gl = 1/2 − d/4
 *   ν = c/λ (c exact)                                                      ∂ν/∂λ = −c/λ², so u(ν) = c·u(λ)/λ²
 *   Δλ per Lorentz unit per tesla = λ²·μB/(hc)                             ∂/∂λ = 2λ·μB/(hc), ∂/∂(μB/(hc)) = λ²
 *   G = ḡ² − δ (physics/secondOrderLande.ts, dipole lines)                 ∂G/∂gu, ∂G/∂gl from secondOrderLandeSlopes
 *
 * A wavelength given in air is converted to vacuum with its relative
 * uncertainty kept (data/speciesFile.ts); the dispersion of air changes
 * that by less than 3·10⁻⁴ of itself, which is not modelled.
 */
import { Dec } from "../physics/decimal.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { effectiveLande } from "../physics/linePattern.js";
import { secondOrderLande, secondOrderLandeSlopes } from "../physics/secondOrderLande.js";
import { gF as hyperfineG, hyperfineShift } from "../physics/hyperfine.js";
import { Rational } from "../physics/rational.js";
import { SPEED_OF_LIGHT } from "../physics/units.js";
import { derived, exact, linear, scaled, standardUncertainty, times, type Uncertain } from "../physics/uncertain.js";
import type { LevelInput } from "../data/model.js";
import { gJInUse, speciesInputs, type SpeciesInputs } from "./inputUncertainties.js";
import type { LevelResult, LineResult, SpeciesResult } from "./types.js";

/** The coupling formula computeLevel uses for a level: g from gL and gS (null for J = 0). */
export type LevelLande = (level: LevelInput, gL: Dec, gS: Dec) => Dec | null;

const ZERO = new Dec(0);
const ONE = new Dec(1);
const half = (k2: number): Dec => Rational.half(k2).toDecimal();

export interface HyperfineUncertain {
  F2: number;
  gF: Uncertain | null;
  zeroFieldHz: Uncertain;
  /** Linear shifts (Hz/T) in the order of HyperfineLevelResult.sublevels. */
  sublevels: Uncertain[];
}

export interface LevelUncertain {
  /** gJ in use. */
  gJ: Uncertain | null;
  /** The coupling formula's value with the physical gL and gS. */
  gJLS: Uncertain | null;
  /** Linear shifts (Hz/T) in the order of LevelResult.sublevels. */
  sublevels: Uncertain[];
  hyperfine: HyperfineUncertain[];
}

export interface LineUncertain {
  gEff: Uncertain | null;
  /** Second-order effective Landé factor G (rank 1 only; null above). */
  G: Uncertain | null;
  frequencyHz: Uncertain | null;
  lorentzDlambdaPerT: Uncertain | null;
  /** Per component (order of LineResult.components): gu·mu − gl·ml and the same in Hz/T. */
  components: { shiftLorentz: Uncertain; shiftHzPerT: Uncertain }[];
}

/** Every linear number of a species as an Uncertain, by level and line id. */
export interface SpeciesUncertain {
  inputs: SpeciesInputs;
  gL: Uncertain;
  gS: Uncertain;
  gI: Uncertain | null;
  levels: Map<string, LevelUncertain>;
  lines: Map<string, LineUncertain>;
}

/** g·m·μB/h (physics/zeeman.ts linearShiftPerTesla): 0 for J = 0 or m = 0. */
function shift(g: Uncertain | null, m2: number, muB_h: Uncertain): Uncertain {
  if (g === null || m2 === 0) return exact(ZERO);
  return scaled(times(muB_h, g), half(m2));
}

function levelUncertain(l: LevelResult, s: SpeciesInputs, I2: number, lande: LevelLande): LevelUncertain {
  const inputs = s.level(l.input.id);
  const f = (gL: Dec, gS: Dec) => lande(l.input, gL, gS);
  const gJ = gJInUse(inputs, s.gL, s.gS, f);
  const gJLS = gJInUse({ ...inputs, gJMeasured: null }, s.gL, s.gS, f);
  const hyperfine: HyperfineUncertain[] =
    I2 > 0 && s.gI !== null
      ? l.hyperfine.map((h) => {
          const g = gJ ?? exact(ZERO);
          const wJ = hyperfineG(ONE, ZERO, I2, l.J2, h.F2);
          const wI = hyperfineG(ZERO, ONE, I2, l.J2, h.F2);
          const gFu =
            wJ === null || wI === null
              ? null
              : linear([
                  [wJ, g],
                  [wI, s.gI!],
                ]);
          const zeroFieldHz = linear([
            [hyperfineShift(ONE, ZERO, I2, l.J2, h.F2), inputs.A],
            [hyperfineShift(ZERO, ONE, I2, l.J2, h.F2), inputs.B],
          ]);
          return { F2: h.F2, gF: gFu, zeroFieldHz, sublevels: h.sublevels.map((sl) => shift(gFu, sl.m2, s.muB_h)) };
        })
      : [];
  return { gJ, gJLS, sublevels: l.sublevels.map((sl) => shift(gJ, sl.m2, s.muB_h)), hyperfine };
}

function lineUncertain(ln: LineResult, s: SpeciesInputs, levels: Map<string, LevelUncertain>): LineUncertain {
  const gu = levels.get(ln.upper.input.id)!.gJ ?? exact(ZERO);
  const gl = levels.get(ln.lower.input.id)!.gJ ?? exact(ZERO);
  let gEff: Uncertain | null = null;
  if (ln.gEff !== null) {
    const cu = effectiveLande({ J2: ln.upper.J2, g: ONE }, { J2: ln.lower.J2, g: ZERO });
    const cl = effectiveLande({ J2: ln.upper.J2, g: ZERO }, { J2: ln.lower.J2, g: ONE });
    gEff = linear([
      [cu, gu],
      [cl, gl],
    ]);
  }
  let G: Uncertain | null = null;
  if (ln.k === 1) {
    // gu and gl keep their shared inputs (g_e, the mass), so their covariance enters u(G)
    const up = { J2: ln.upper.J2, g: ln.upper.J2 === 0 ? null : gu.value };
    const lo = { J2: ln.lower.J2, g: ln.lower.J2 === 0 ? null : gl.value };
    const { dGdgu, dGdgl } = secondOrderLandeSlopes(up, lo);
    G = derived(secondOrderLande(up, lo), [
      [dGdgu, gu],
      [dGdgl, gl],
    ]);
  }
  const lambda = s.wavelength(ln.input.id);
  const frequencyHz = lambda === null ? null : derived(SPEED_OF_LIGHT.div(lambda.value), [[SPEED_OF_LIGHT.div(lambda.value.pow(2)).neg(), lambda]]);
  const lorentzDlambdaPerT =
    lambda === null
      ? null
      : derived(lambda.value.pow(2).mul(s.muB_hc.value), [
          [lambda.value.mul(2).mul(s.muB_hc.value), lambda],
          [lambda.value.pow(2), s.muB_hc],
        ]);
  const components = ln.components.map((c) => {
    const shiftLorentz = linear([
      [half(c.mu2), gu],
      [half(c.ml2).neg(), gl],
    ]);
    return { shiftLorentz, shiftHzPerT: times(shiftLorentz, s.muB_h) };
  });
  return { gEff, G, frequencyHz, lorentzDlambdaPerT, components };
}

/**
 * Every linear number of a computed species as an Uncertain (value and
 * signed contributions by input). `lande` must be the coupling formula
 * computeLevel uses, so the gJ slopes are that formula's.
 */
export function linearUncertain(result: SpeciesResult, c: ConstantsEdition, lande: LevelLande): SpeciesUncertain {
  const s = speciesInputs(result.input, c);
  const levels = new Map(result.levels.map((l) => [l.input.id, levelUncertain(l, s, result.I2, lande)]));
  const lines = new Map(result.lines.map((ln) => [ln.input.id, lineUncertain(ln, s, levels)]));
  return { inputs: s, gL: s.gL, gS: s.gS, gI: s.gI, levels, lines };
}

const u = (x: Uncertain | null): Dec | null => (x === null ? null : standardUncertainty(x));

/**
 * Fills the standard-uncertainty fields (…U) of a species' results, in
 * place, and returns it. Called by computeSpecies on the result it has just
 * made (nothing else holds it yet).
 */
export function attachLinearUncertainties(result: SpeciesResult, c: ConstantsEdition, lande: LevelLande): SpeciesResult {
  const all = linearUncertain(result, c, lande);
  result.gLU = u(all.gL);
  result.gSU = u(all.gS);
  result.gIU = u(all.gI);
  for (const l of result.levels) {
    const lu = all.levels.get(l.input.id)!;
    l.gJU = u(lu.gJ);
    l.gJLSU = u(lu.gJLS);
    l.sublevels.forEach((sl, i) => (sl.shiftHzPerTU = u(lu.sublevels[i]!)));
    l.hyperfine.forEach((h, k) => {
      const hu = lu.hyperfine[k]!;
      h.gFU = u(hu.gF);
      h.zeroFieldHzU = u(hu.zeroFieldHz);
      h.sublevels.forEach((sl, i) => (sl.shiftHzPerTU = u(hu.sublevels[i]!)));
    });
  }
  for (const ln of result.lines) {
    const lu = all.lines.get(ln.input.id)!;
    ln.gEffU = u(lu.gEff);
    ln.GU = u(lu.G);
    ln.frequencyHzU = u(lu.frequencyHz);
    ln.lorentzDlambdaPerTU = u(lu.lorentzDlambdaPerT);
    ln.components.forEach((cp, i) => {
      const cu = lu.components[i]!;
      cp.shiftLorentzU = u(cu.shiftLorentz);
      cp.shiftHzPerTU = u(cu.shiftHzPerT);
    });
  }
  return result;
}

/**
 * Standard uncertainty of the separation 2·|g_eff|·Δλ₁·B of the σ+ and σ−
 * centroids (site/wavelengthSplitting.ts) at an exact field B: g_eff and the
 * wavelength of one Lorentz unit share no input (level g factors against
 * the wavelength and μB/(hc)), so u = 2B·√((Δλ₁·u(g_eff))² + (g_eff·u(Δλ₁))²).
 * Null when both are exact or either is missing.
 */
export function sigmaSeparationU(ln: Pick<LineResult, "gEff" | "lorentzDlambdaPerT" | "gEffU" | "lorentzDlambdaPerTU">, tesla: Dec): Dec | null {
  if (ln.gEff === null || ln.lorentzDlambdaPerT === null) return null;
  const ug = ln.gEffU ?? null;
  const ul = ln.lorentzDlambdaPerTU ?? null;
  if (ug === null && ul === null) return null;
  const a = ug === null ? ZERO : ln.lorentzDlambdaPerT.mul(ug);
  const b = ul === null ? ZERO : ln.gEff.mul(ul);
  return a.pow(2).add(b.pow(2)).sqrt().mul(tesla.abs()).mul(2);
}
