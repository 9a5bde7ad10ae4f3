/**
 * Selection rules on J (and the one certain parity case) for the multipole
 * order of a line. Facts of the trade (common practice; Sobelman, "Atomic
 * Spectra and Radiative Transitions" (1979), §9.1), for a multipole of rank
 * k (1 for E1 and M1, 2 for E2 and M2, 3 for E3):
 * - |ΔJ| ≤ k and J + J' ≥ k (the triangle (J, k, J')); J = 0 ↔ J = 0 is
 *   forbidden for every one: E2 and M2 also refuse 0 ↔ 1 and 1/2 ↔ 1/2, E3
 *   also 0 ↔ 2, 1 ↔ 1 and 1/2 ↔ 3/2.
 * - Ek changes parity when k is odd, Mk when k is even: E1, M2 and E3
 *   change it; M1 and E2 keep it.
 *
 * Parity is checked only where the files make it certain: a term with the
 * mark (o or °) is odd, but an unmarked term may be even or simply written
 * without the mark. So only a parity-changing line (E1, M2, E3) between two
 * marked (both odd) terms is refused; M1/E2 between a marked and an
 * unmarked term is let through.
 */
import { formatDoubled } from "../physics/quantum.js";
import { multipoleChangesParity, multipoleRank } from "../physics/linePattern.js";
import type { Multipole, TermSymbol } from "./model.js";

export const MULTIPOLES: readonly Multipole[] = ["E1", "M1", "E2", "M2", "E3"];

/** A list in words: "a", "a or b", "a, b or c". */
const orList = (xs: string[]) => (xs.length <= 1 ? xs.join("") : `${xs.slice(0, -1).join(", ")} or ${xs.at(-1)!}`);
const andList = (xs: string[]) => (xs.length <= 1 ? xs.join("") : `${xs.slice(0, -1).join(", ")} and ${xs.at(-1)!}`);

/** The J pairs, 0 ↔ 0 left out, that a rank-k multipole cannot join although |ΔJ| ≤ k (J + J' < k), integer J first. */
function belowTriangle(k: number): string[] {
  const out: string[] = [];
  for (const start of [0, 1]) {
    for (let a = start; a + a < 2 * k; a += 2) {
      for (let b = a; a + b < 2 * k; b += 2) if (a + b > 0) out.push(`${formatDoubled(a)} ↔ ${formatDoubled(b)}`);
    }
  }
  return out;
}

export interface RuleBreak {
  message: string;
  hint: string;
}

/** Why `multipole` cannot connect terms `upper` and `lower`, or null if it can. */
export function multipoleRuleBreak(multipole: Multipole, upper: TermSymbol, lower: TermSymbol): RuleBreak | null {
  const a = upper.J2;
  const b = lower.J2;
  const k = multipoleRank(multipole);
  const dJ2 = Math.abs(a - b);
  const pair = `J = ${formatDoubled(a)} → J = ${formatDoubled(b)}`;
  if (dJ2 > 2 * k) {
    // the multipole of the next rank that allows this ΔJ, if the atlas models one
    const higher = dJ2 === 4 ? "E2 (M2 between levels of opposite parity)" : dJ2 === 6 ? "E3 between levels of opposite parity" : null;
    return {
      message: `${multipole} line ${pair} changes J by ${formatDoubled(dJ2)}`,
      hint: higher
        ? `${multipole} allows |ΔJ| ≤ ${k}; check the upper and lower levels, or set multipole: ${higher} for |ΔJ| = ${dJ2 / 2}`
        : `${multipole} allows |ΔJ| ≤ ${k}; check the upper and lower levels (no multipole above rank 3 is modelled)`,
    };
  }
  if (a === 0 && b === 0) {
    return { message: `${multipole} line ${pair} is forbidden`, hint: `J = 0 ↔ J = 0 is forbidden for every single-photon multipole` };
  }
  if (a + b < 2 * k) {
    const same = MULTIPOLES.filter((m) => multipoleRank(m) < k && multipoleChangesParity(m) === multipoleChangesParity(multipole));
    const other = MULTIPOLES.filter((m) => multipoleRank(m) < k && multipoleChangesParity(m) !== multipoleChangesParity(multipole));
    return {
      message: `${multipole} line ${pair} is forbidden`,
      hint: `${multipole} needs J + J' ≥ ${k}: ${andList(belowTriangle(k))} are forbidden; perhaps the line is ${orList([...same, ...other])}`,
    };
  }
  if (multipoleChangesParity(multipole) && upper.parity === "odd" && lower.parity === "odd") {
    return {
      message: `${multipole} line between two odd terms (${upper.text} and ${lower.text}) is forbidden by parity`,
      hint: `${multipole} connects terms of opposite parity; check the parity marks, or set multipole to M1 or E2`,
    };
  }
  return null;
}
