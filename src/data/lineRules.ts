/**
 * Selection rules on J (and the one certain parity case) for the multipole
 * order of a line. Facts of the trade (common practice):
 * - E1 and M1: |ΔJ| ≤ 1, and J = 0 ↔ J = 0 is forbidden.
 * - E2: |ΔJ| ≤ 2, and 0 ↔ 0, 0 ↔ 1 and 1/2 ↔ 1/2 are forbidden.
 * - E1 changes parity; M1 and E2 keep it.
 *
 * Parity is checked only where the files make it certain: a term with the
 * mark (o or °) is odd, but an unmarked term may be even or simply written
 * without the mark. So only E1 between two marked (both odd) terms is
 * refused; M1/E2 between a marked and an unmarked term is let through.
 */
import { formatDoubled } from "../physics/quantum.js";
import type { Multipole, TermSymbol } from "./model.js";

export const MULTIPOLES: readonly Multipole[] = ["E1", "M1", "E2"];

export interface RuleBreak {
  message: string;
  hint: string;
}

/** Why `multipole` cannot connect terms `upper` and `lower`, or null if it can. */
export function multipoleRuleBreak(multipole: Multipole, upper: TermSymbol, lower: TermSymbol): RuleBreak | null {
  const a = upper.J2;
  const b = lower.J2;
  const dJ2 = Math.abs(a - b);
  const pair = `J = ${formatDoubled(a)} → J = ${formatDoubled(b)}`;
  const maxDJ = multipole === "E2" ? 4 : 2;
  if (dJ2 > maxDJ) {
    return {
      message: `${multipole} line ${pair} changes J by ${formatDoubled(dJ2)}`,
      hint: multipole === "E2"
        ? "E2 allows |ΔJ| ≤ 2; check the upper and lower levels"
        : `${multipole} allows |ΔJ| ≤ 1; check the upper and lower levels, or set multipole: E2 for |ΔJ| = 2`,
    };
  }
  if (a === 0 && b === 0) {
    return { message: `${multipole} line ${pair} is forbidden`, hint: `J = 0 ↔ J = 0 is forbidden for every single-photon multipole` };
  }
  if (multipole === "E2") {
    const small = [Math.min(a, b), Math.max(a, b)];
    if ((small[0] === 0 && small[1] === 2) || (small[0] === 1 && small[1] === 1)) {
      return { message: `E2 line ${pair} is forbidden`, hint: "E2 needs J + J' ≥ 2: 0 ↔ 1 and 1/2 ↔ 1/2 are forbidden; perhaps the line is M1 or E1" };
    }
  }
  if (multipole === "E1" && upper.parity === "odd" && lower.parity === "odd") {
    return {
      message: `E1 line between two odd terms (${upper.text} and ${lower.text}) is forbidden by parity`,
      hint: "E1 connects terms of opposite parity; check the parity marks, or set multipole to M1 or E2",
    };
  }
  return null;
}
