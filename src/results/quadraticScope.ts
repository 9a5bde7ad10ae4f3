/**
 * Which fine-structure partners feed a level's second-order Zeeman
 * coefficients, and their contribution (physics/field/partnerQuadratic.ts).
 * Pure.
 *
 * Partners are the other levels of the same LS term (same configuration,
 * multiplicity, L and parity mark) listed with an energy. Only J′ = J ± 1
 * couple to J through the Zeeman operator. The result says how complete the
 * sum is, so that no page or export shows a second-order coefficient
 * without saying what it contains:
 *  - "term": every J′ = J ± 1 the term allows is listed with an energy (or
 *    the term has none: S = 0 or L = 0), and all are included;
 *  - "term-partial": some are included, some are not listed (or have no energy);
 *  - "J-only": none is included (within this J only), also when the level
 *    itself has no energy.
 */
import { ZERO, type Dec } from "../physics/decimal.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { partnerQuadraticCoefficient, partnerQuadraticSlopes, type PartnerLevel, type PartnerSlope, type PartnerTerm } from "../physics/field/partnerQuadratic.js";
import type { LevelResult, SpeciesResult } from "./types.js";
import { lsTerm } from "../data/model.js";

const NO_SLOPES = { level: { energy: ZERO, A: ZERO, B: ZERO }, partners: [] };

export type QuadraticScope = "term" | "term-partial" | "J-only";

export interface QuadraticPartners {
  scope: QuadraticScope;
  /** Level ids whose coupling is included, in file order. */
  included: string[];
  /** Doubled J′ = J ± 1 of the term that couple but are not included (not listed, or without energy). */
  missingJ2: number[];
  /** The coupling scheme of a level outside LS coupling (its partners are not treated), else null. */
  notLS: "jK" | "jj" | null;
  /** β_partners(F, mF) in Hz/T² (0 when nothing is included); null where perturbation theory fails. */
  coefficient: (F2: number, mF2: number) => Dec | null;
  /** Its slopes in the level's and each included partner's energy, A and B (order of `included`); null where the coefficient is. */
  slopes: (F2: number, mF2: number) => { level: PartnerSlope; partners: PartnerSlope[] } | null;
}

/** Key of the LS term a level belongs to (configuration, multiplicity, L, parity mark). */
export function termKeyOf(l: LevelResult): string {
  const t = l.input.term;
  if (t.scheme !== "LS") return `${l.input.config} ${t.text}`; // a jK or jj level is no LS term's partner
  return `${l.input.config} ${t.multiplicity}${t.letter}${t.parity ? "°" : ""}`;
}

/** The partners of level `l` in species `s` and their second-order contribution. */
export function quadraticPartners(s: SpeciesResult, l: LevelResult, c: ConstantsEdition, hyperfine: (l: LevelResult) => { A: Dec; B: Dec } | null): QuadraticPartners {
  const ls = lsTerm(l.input.term);
  // the partner sum uses the LS structure of the term; a jK or jj level keeps its own J
  if (!ls) return { scope: "J-only", included: [], missingJ2: [], notLS: l.input.term.scheme === "jj" ? "jj" : "jK", coefficient: () => ZERO, slopes: () => NO_SLOPES };
  const { S2, L } = ls;
  const key = termKeyOf(l);
  const coupling: number[] = [];
  for (const Jp2 of [l.J2 - 2, l.J2 + 2]) if (Jp2 >= Math.abs(2 * L - S2) && Jp2 <= 2 * L + S2) coupling.push(Jp2);
  const listed = s.levels.filter((p) => p !== l && p.input.energy !== null && termKeyOf(p) === key && coupling.includes(p.J2));
  const included = l.input.energy === null ? [] : listed;
  const missingJ2 = coupling.filter((j) => !included.some((p) => p.J2 === j));
  const scope: QuadraticScope = missingJ2.length === 0 ? "term" : included.length === 0 ? "J-only" : "term-partial";
  if (included.length === 0) return { scope, included: [], missingJ2, notLS: null, coefficient: () => ZERO, slopes: () => NO_SLOPES };
  const asPartner = (p: LevelResult): PartnerLevel => {
    const hf = hyperfine(p);
    return { J2: p.J2, energy: p.input.energy!.si, A: hf?.A ?? ZERO, B: hf?.B ?? ZERO };
  };
  const term: PartnerTerm = { S2, L, I2: hyperfine(l) ? s.I2 : 0, gL: s.gL, gS: s.gS, muB_h: val(c.muB_h) };
  const self = asPartner(l);
  const others = included.map(asPartner);
  return {
    scope,
    included: included.map((p) => p.input.id),
    missingJ2,
    notLS: null,
    coefficient: (F2, mF2) => partnerQuadraticCoefficient(term, self, others, F2, mF2),
    slopes: (F2, mF2) => partnerQuadraticSlopes(term, self, others, F2, mF2),
  };
}
