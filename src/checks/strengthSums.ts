/**
 * The relative strengths of the components of each line sum to exactly 1
 * (orthogonality of 3j symbols, Edmonds (3.7.8): for each m3,
 * Σ_{m1,m2} (j1 j2 j3; m1 m2 m3)² = 1/(2j3+1); summed over the 2j3+1 values
 * of m3 that is 1, and the components of a line are exactly these terms). Summed in
 * exact rational arithmetic on the exported fraction strings, so a rounding
 * or a dropped component cannot hide. Where a line has hyperfine groups,
 * their strengths sum to exactly 1 and each group's components to exactly
 * the group's strength (the same orthogonality, applied to F and then mF).
 * At a field (`at_fields`) strengths are decimals from eigenvectors; their
 * sum must be 1 to within AT_FIELD_TOLERANCE (rounding only).
 */
import { Dec, dec } from "../physics/decimal.js";
import { Rational } from "../physics/rational.js";
import { arrayAt, isObject, nameOf } from "./exportShape.js";

const FRACTION = /^-?(0|[1-9][0-9]*)(\/[1-9][0-9]*)?$/;
const DECIMAL = /^-?(0|[1-9][0-9]*)(\.[0-9]+)?([eE][+-]?[0-9]+)?$/;
export const AT_FIELD_TOLERANCE = "1e-12";

/** Σ of the exact `key` strengths of `items`, or a problem text. */
function exactSum(items: unknown[], key: string, what: string): Rational | string {
  let sum = Rational.ZERO;
  for (const [j, c] of items.entries()) {
    const s = isObject(c) ? c[key] : undefined;
    if (typeof s !== "string" || !FRACTION.test(s)) return `${what} #${j} has ${key} ${JSON.stringify(s)}, not an exact fraction`;
    sum = sum.add(Rational.parse(s));
  }
  return sum;
}

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

    const groups = arrayAt(line, "hyperfine_groups");
    if (groups.length > 0) {
      const total = exactSum(groups, "strength", "hyperfine group");
      if (typeof total === "string") problems.push(`${file}: line ${nameOf(line, i)} ${total}`);
      else if (!total.equals(Rational.ONE)) problems.push(`${file}: line ${nameOf(line, i)} hyperfine group strengths sum to ${total.toString()}, not 1`);
      groups.forEach((g, k) => {
        const own = isObject(g) && typeof g.strength === "string" && FRACTION.test(g.strength) ? Rational.parse(g.strength) : null;
        const inner = exactSum(arrayAt(g, "components"), "strength", "component");
        if (typeof inner === "string") problems.push(`${file}: line ${nameOf(line, i)} hyperfine group #${k} ${inner}`);
        else if (own && !inner.equals(own)) problems.push(`${file}: line ${nameOf(line, i)} hyperfine group #${k} components sum to ${inner.toString()}, not its strength ${own.toString()}`);
      });
    }

    arrayAt(line, "at_fields").forEach((f, k) => {
      let t = new Dec(0);
      for (const c of arrayAt(f, "components")) {
        const s = isObject(c) ? c.relative_strength : undefined;
        if (typeof s !== "string" || !DECIMAL.test(s)) return; // the finite-number check reports it
        t = t.plus(dec(s));
      }
      const at = isObject(f) && typeof f.B_text === "string" ? f.B_text : `#${k}`;
      if (arrayAt(f, "components").length > 0 && t.minus(1).abs().gt(AT_FIELD_TOLERANCE)) {
        problems.push(`${file}: line ${nameOf(line, i)} at ${at}: relative strengths sum to ${t.toSignificantDigits(25).toString()}, not 1`);
      }
    });
  });
  return problems;
}
