/**
 * LS term symbols as lab files write them: multiplicity 2S+1, the L letter,
 * an optional parity mark (o or °) and J, e.g. "2S1/2", "2Po3/2", "3P°2".
 */
import { formatDoubled, parseDoubled, triangle } from "../physics/quantum.js";
import type { TermSymbol } from "./model.js";
import { bad, ok, type Parsed } from "./parsed.js";

/**
 * L letters in spectroscopic order: S P D F, then alphabetical from G with J
 * left out (and S, P already used) — common practice.
 */
export const L_LETTERS = "SPDFGHIKLMNOQRTUV";

const SHAPE = /^(\d+)([A-Za-z])([o°])?([+-]?\d+(?:\/\d+)?)$/;
const FORMAT_HINT = 'write <2S+1><L letter>[o or °]<J>, e.g. 2S1/2, 2Po3/2 or 3D2';

/** Parse a term symbol, checking that J can arise from L and S. */
export function parseTermSymbol(text: string): Parsed<TermSymbol> {
  const t = text.trim();
  const m = SHAPE.exec(t);
  if (!m) {
    if (/_\{?[^}]*\}?$/.test(t) || /[[\]{}]/.test(t))
      return bad(`term "${t}" uses markup`, `put J directly after the letter; ${FORMAT_HINT}`);
    if (/^[A-Za-z]/.test(t)) return bad(`term "${t}" does not start with the multiplicity 2S+1`, FORMAT_HINT);
    return bad(`term "${t}" is not a term symbol`, FORMAT_HINT);
  }
  const [, multText = "", letterText = "", mark, jText = ""] = m;
  const multiplicity = Number(multText);
  if (!Number.isSafeInteger(multiplicity) || multiplicity > 99)
    return bad(`multiplicity ${multText} in term "${t}" is too large`, "2S+1 is a small positive integer such as 1, 2, 3");
  if (multiplicity < 1) return bad(`multiplicity ${multText} in term "${t}" is less than 1`, "2S+1 is at least 1 (S = 0 gives a singlet, 1)");
  const letter = letterText.toUpperCase();
  if (letter !== letterText) return bad(`L letter "${letterText}" in term "${t}" is lower case`, `write it in upper case: ${multText}${letter}${mark ?? ""}${jText}`);
  const L = L_LETTERS.indexOf(letter);
  if (L < 0) {
    const why = letter === "J" ? "J is skipped in spectroscopic notation" : `"${letter}" is not an L letter`;
    return bad(`${why} (term "${t}")`, `L letters are ${L_LETTERS.split("").join(" ")} for L = 0, 1, 2, ...`);
  }
  let J2: number;
  try {
    J2 = parseDoubled(jText);
  } catch {
    return bad(`J = ${jText} in term "${t}" is not an integer or half-integer`, "write J as 0, 1, 2, ... or 1/2, 3/2, ...");
  }
  if (J2 < 0) return bad(`J = ${jText} in term "${t}" is negative`, "J is 0 or positive");
  const S2 = multiplicity - 1;
  if (J2 % 2 !== S2 % 2) {
    const want = S2 % 2 === 0 ? "an integer" : "a half-integer";
    return bad(
      `J = ${jText} in term "${t}" does not fit multiplicity ${multiplicity}`,
      `S = ${formatDoubled(S2)} makes J ${want}: J runs from |L−S| to L+S, here ${range(2 * L, S2)}`,
    );
  }
  if (!triangle(2 * L, S2, J2)) {
    return bad(
      `J = ${jText} cannot arise from L = ${L} and S = ${formatDoubled(S2)} (term "${t}")`,
      `J runs from |L−S| to L+S, here ${range(2 * L, S2)}`,
    );
  }
  return ok({ text: t, multiplicity, S2, L, letter, J2, parity: mark ? "odd" : null });
}

function range(L2: number, S2: number): string {
  const out: string[] = [];
  for (let j = Math.abs(L2 - S2); j <= L2 + S2; j += 2) out.push(formatDoubled(j));
  return out.join(", ");
}
