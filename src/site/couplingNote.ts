/**
 * What the pages and the export say when a measured gJ is more than 1 %
 * from the value of its level's coupling formula (intermediate coupling,
 * e.g. Hg 6s6p ³P1, or a jK level mixed with its neighbour of the same J):
 * the measured value serves the linear numbers, but the exact pattern
 * notation still comes from the coupling formula, so it describes that
 * coupling limit and not the atom.
 */
import type { LevelResult, LineResult } from "../results/types.js";

/** The relative difference of the measured gJ from the coupling formula's value, in per cent, to two significant digits. */
export function couplingDifferencePercent(l: LevelResult): string | null {
  if (!l.gJDiffers || l.gJ === null || l.gJLS === null) return null;
  return l.gJ.sub(l.gJLS).abs().div(l.gJLS.abs()).mul(100).toPrecision(2);
}

const schemeName = (l: LevelResult) => l.input.term.scheme;

/** The level row's words: "measured, 1.0 % from LS (intermediate coupling)", or null when the level is not marked. */
export function levelCouplingNote(l: LevelResult): string | null {
  const pct = couplingDifferencePercent(l);
  if (pct === null) return null;
  return `measured, ${pct} % from ${schemeName(l)} (intermediate coupling; the ${schemeName(l)} pattern describes the ${schemeName(l)} limit, not the atom)`;
}

/** The line's sentence beside its pattern notation, or null when neither level is marked. */
export function lineCouplingNote(ln: LineResult): string | null {
  const parts = [ln.upper, ln.lower]
    .filter((l) => l.gJDiffers)
    .map((l) => `the measured gJ of ${l.input.id} is ${couplingDifferencePercent(l)} % from its ${schemeName(l)} value`);
  if (parts.length === 0) return null;
  const schemes = [...new Set([ln.upper, ln.lower].filter((l) => l.gJDiffers).map(schemeName))].join(" and ");
  return `Intermediate coupling: ${parts.join(", and ")}. The shifts and g_eff use the measured value; the pattern notation, from the exact ${schemes} factors, describes the ${schemes} limit, not the atom.`;
}

/**
 * The short tag a bench sheet puts after a line's pattern, e.g. "LS limit
 * (upper g 1.0 % off)", or null: short, because a sheet's pattern column
 * does not wrap; the level pages say which level and why.
 */
export function patternLimitTag(ln: LineResult): string | null {
  const marked = [ln.upper, ln.lower].filter((l) => l.gJDiffers);
  if (marked.length === 0) return null;
  const schemes = [...new Set(marked.map(schemeName))].join(" and ");
  const which = (l: LevelResult) => `${l === ln.upper ? "upper" : "lower"} g ${couplingDifferencePercent(l)} % off`;
  return `${schemes} limit (${marked.map(which).join(", ")})`;
}
