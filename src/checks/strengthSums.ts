/**
 * The relative strengths of the components of each line sum to exactly 1
 * (orthogonality of 3j symbols, Edmonds (3.7.8): for each m3,
 * Σ_{m1,m2} (j1 j2 j3; m1 m2 m3)² = 1/(2j3+1); summed over the 2j3+1 values
 * of m3 that is 1, and the components of a line are exactly these terms). Summed in
 * exact rational arithmetic on the exported fraction strings, so a rounding
 * or a dropped component cannot hide.
 */
import { Rational } from "../physics/rational.js";
import { arrayAt, isObject, nameOf } from "./exportShape.js";

const FRACTION = /^-?(0|[1-9][0-9]*)(\/[1-9][0-9]*)?$/;

export function checkStrengthSums(value: unknown, file: string): string[] {
  const problems: string[] = [];
  arrayAt(value, "lines").forEach((line, i) => {
    const components = arrayAt(line, "components");
    let sum = Rational.ZERO;
    for (const [j, c] of components.entries()) {
      const s = isObject(c) ? c.strength : undefined;
      if (typeof s !== "string" || !FRACTION.test(s)) {
        problems.push(`${file}: line ${nameOf(line, i)} component #${j} has strength ${JSON.stringify(s)}, not an exact fraction`);
        return;
      }
      const r = Rational.parse(s);
      if (r.cmp(Rational.ZERO) <= 0) problems.push(`${file}: line ${nameOf(line, i)} component #${j} has strength ${s}, not positive`);
      sum = sum.add(r);
    }
    if (!sum.equals(Rational.ONE)) problems.push(`${file}: line ${nameOf(line, i)} strengths sum to ${sum.toString()}, not 1`);
  });
  return problems;
}
