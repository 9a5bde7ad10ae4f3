/**
 * Which regime a level is in at a field, and which states a line's
 * components are taken from: the one rule shared by the exact build
 * (computeFields.ts, 60-digit Dec) and the float64 field calculator
 * (src/engine/), so that both pick the same model for every line at every
 * field. Pure; no physics values of its own.
 *
 * Rule (a convention of this project, stated on the Methods page):
 *  - a level is in the "zero field" regime at B = 0; in "linear Zeeman" up to
 *    and including the field where its linear shifts stop being within 1 %
 *    (validity.ts for hyperfine levels, linearPatternLimit for fine-structure
 *    terms; no limit means linear at every field); in "Paschen–Back" from
 *    PASCHEN_BACK_FACTOR times its Paschen–Back scale on; "intermediate" between.
 *  - a line is in the stronger regime of its two levels (hyperfine and fine
 *    structure both counted). The regime is information only: it never
 *    chooses the physics.
 *  - the model depends on the levels, not on the field: when either level
 *    belongs to a term whose partners are listed (computeFields'
 *    fineStructureTerms), the components come from the term solver's
 *    eigenstates of that level (|J mJ mI⟩ over the listed J,
 *    termHyperfineZeeman.ts) and the single-J solver's of the other, at
 *    every field ("term hyperfine–Zeeman eigenstates" with nuclear spin,
 *    "term Zeeman eigenstates" without); else from the hyperfine–Zeeman
 *    eigenstates when both levels have hyperfine structure; else from the
 *    J-resolved linear pattern (no nuclear spin, no partners: the exact
 *    answer, linear in B).
 *  - with the term states, the reduced elements between the J of the terms
 *    are the LS ones (lsReducedElement) when both levels have the same spin
 *    and the line is electric (E1, E2, E3: operators on the orbital
 *    coordinates); otherwise, and for the magnetic multipoles M1 and M2,
 *    whose spin part is not modelled, the line's own J pair only
 *    (ownPairReducedElement).
 */
import type { Dec } from "../physics/decimal.js";
import type { ReducedElementKind } from "../physics/field/lineAtField.js";
import { isMagneticMultipole, type Multipole } from "../physics/linePattern.js";
import type { LineAtFieldResult, Regime } from "./fieldTypes.js";

/** A level counts as Paschen–Back from this multiple of its Paschen–Back scale on. */
export const PASCHEN_BACK_FACTOR = 10;

export type LineModel = LineAtFieldResult["model"];

const RANK: Regime[] = ["zero field", "linear Zeeman", "intermediate", "Paschen–Back"];

/** The regime from where the field lies against the level's limits (see the module comment). */
function regimeFrom(zero: boolean, withinLinear: boolean, pastPaschenBack: boolean): Regime {
  if (zero) return "zero field";
  if (withinLinear) return "linear Zeeman";
  if (pastPaschenBack) return "Paschen–Back";
  return "intermediate";
}

/** Regime of one level at one field (Dec), from the limits computed for it; null limits: none. */
export function levelRegime(tesla: Dec, linearUpTo: Dec | null, paschenBack: Dec | null): Regime {
  return regimeFrom(
    tesla.isZero(),
    linearUpTo === null || tesla.lte(linearUpTo),
    paschenBack !== null && tesla.gte(paschenBack.mul(PASCHEN_BACK_FACTOR)),
  );
}

/** levelRegime for a float64 field and float64 limits (the field calculator). */
export function levelRegimeFloat(tesla: number, linearUpTo: number | null, paschenBack: number | null): Regime {
  return regimeFrom(
    tesla === 0,
    linearUpTo === null || tesla <= linearUpTo,
    paschenBack !== null && tesla >= paschenBack * PASCHEN_BACK_FACTOR,
  );
}

/** The stronger of two regimes (zero field < linear Zeeman < intermediate < Paschen–Back). */
export function strongerRegime(a: Regime, b: Regime): Regime {
  return RANK.indexOf(a) >= RANK.indexOf(b) ? a : b;
}

/** One level of a line as the choice needs it: its two regimes and whether it belongs to a treated fine-structure term. */
export interface LineSide {
  hf: Regime;
  fs: Regime;
  inTerm: boolean;
}

export interface LineFacts {
  /** Upper and lower level have the same total spin S. */
  sameSpin: boolean;
  multipole: Multipole;
  /** Both levels have hyperfine structure (computeFields' hyperfineConstants is not null for either). */
  hyperfineBoth: boolean;
}

/**
 * Regime of a line at a field, the model its components come from and the
 * reduced elements they use (see the module comment). Exact: yes
 * (comparisons only). Worked example (demo data): 87Rb D2 at 1 G (5²P3/2
 * listed with 5²P1/2; 5²P3/2 already past its 1 % limit, far below its
 * Paschen–Back scale) → regime "intermediate", model "term hyperfine–Zeeman
 * eigenstates", LS reduced elements; 40Ca⁺ 729 nm (no nuclear spin; 3d ²D5/2
 * listed with ²D3/2) at 1 T → regime "linear Zeeman", model "term Zeeman
 * eigenstates"; 40Ca⁺ 397 nm at 1 T (4p ²P1/2 listed with ²P3/2) → "linear
 * Zeeman", "term Zeeman eigenstates", and at 10 T, past its 4p term's 1 %
 * limit (about 7.1 T) but below 10× its Paschen–Back scale → "intermediate",
 * the same model.
 */
export function chooseLineModel(upper: LineSide, lower: LineSide, line: LineFacts): { regime: Regime; model: LineModel; reduced: ReducedElementKind } {
  const regime = strongerRegime(strongerRegime(upper.hf, lower.hf), strongerRegime(upper.fs, lower.fs));
  if (upper.inTerm || lower.inTerm) {
    return {
      regime,
      model: line.hyperfineBoth ? "term hyperfine–Zeeman eigenstates" : "term Zeeman eigenstates",
      reduced: line.sameSpin && !isMagneticMultipole(line.multipole) ? "LS" : "own J pair",
    };
  }
  if (line.hyperfineBoth) return { regime, model: "hyperfine–Zeeman eigenstates", reduced: "own J pair" };
  return { regime, model: "J-resolved linear pattern", reduced: "own J pair" };
}

/**
 * Whether builds before the term solver labelled this line's components at
 * this field by fine-structure states ("J=3/2, mJ=1/2"): the rule they used
 * (fine-structure regime of either level beyond linear, one level in a
 * listed term, the same spin, not M1). Kept only so that the pages can
 * carry those labels as aliases of the rows that replace them, and links
 * saved from such builds still land (src/site/anchors.ts). Exact: yes.
 * Worked example: 23Na D2 at 1 T (3p term listed; its fine structure past
 * its 1 % limit) → true; at 0.1 T → false.
 */
export function hadFineStructureLabels(upper: LineSide, lower: LineSide, line: LineFacts): boolean {
  const beyondLinear = (r: Regime) => r === "intermediate" || r === "Paschen–Back";
  // those builds knew E1, M1 and E2 only, so no later multipole needs the aliases
  return (beyondLinear(upper.fs) || beyondLinear(lower.fs)) && (upper.inTerm || lower.inTerm) && line.sameSpin && (line.multipole === "E1" || line.multipole === "E2");
}
