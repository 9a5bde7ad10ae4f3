/**
 * Term symbols as lab files write them: LS terms, multiplicity 2S+1, the L
 * letter, an optional parity mark (o or °) and J, e.g. "2S1/2", "2Po3/2",
 * "3P°2"; jK (pair) coupling, (2s+1)[K]J of the outer electron, e.g.
 * "2[3/2]o2"; jj coupling, (j1,j2)J, e.g. "(3/2,1/2)1". A jK or jj term
 * needs the level's coupling (the parent term and the electrons' l) for its
 * g factor, and is checked against it.
 */
import { formatDoubled, parseDoubled, triangle } from "../physics/quantum.js";
import type { JJTerm, JKTerm, LSTerm, TermSymbol } from "./model.js";
import { bad, ok, type Parsed } from "./parsed.js";

/**
 * L letters in spectroscopic order: S P D F, then alphabetical from G with J
 * left out (and S, P already used) — common practice.
 */
export const L_LETTERS = "SPDFGHIKLMNOQRTUV";

const SHAPE = /^(\d+)([A-Za-z])([o°])?([+-]?\d+(?:\/\d+)?)$/;
const FORMAT_HINT = "write <2S+1><L letter>[o or °]<J>, e.g. 2S1/2, 2Po3/2 or 3D2 (or a jK or jj term with the level's coupling: 2[3/2]o2, (3/2,1/2)1)";

/** What a level's `coupling` gives beside a jK or jj term (shape already checked by the loader). */
export type CouplingInput = { scheme: "jK"; core: LSTerm; l: number } | { scheme: "jj"; l: [number, number] };

const JK_SHAPE = /^(\d+)\[([^\]]*)\]([o°])?([+-]?\d+(?:\/\d+)?)$/;
const JJ_SHAPE = /^\(([^,()]*),([^,()]*)\)([o°])?([+-]?\d+(?:\/\d+)?)$/;
const JK_EXAMPLE = 'coupling: { scheme: jK, core: "2Po3/2", l: 0 }';
const JJ_EXAMPLE = "coupling: { scheme: jj, l: [1, 1] }";

/**
 * Parse a term symbol, checking that J can arise from L and S (LS), from K
 * and the outer electron's spin (jK), or from j1 and j2 (jj), with the
 * level's coupling for jK and jj terms (null for an LS term).
 */
export function parseTermSymbol(text: string, coupling: CouplingInput | null = null): Parsed<TermSymbol> {
  const t = text.trim();
  if (t.startsWith("(") || t.includes("[")) {
    const jk = JK_SHAPE.exec(t);
    if (jk) return jkTerm(t, jk, coupling);
    const jj = JJ_SHAPE.exec(t);
    if (jj) return jjTerm(t, jj, coupling);
    if (t.includes("["))
      return bad(`term "${t}" is not a jK term symbol`, 'write <2s+1>[<K>][o or °]<J>, e.g. 2[3/2]o2, with the level\'s coupling');
    return bad(`term "${t}" is not a jj term symbol`, "write (<j1>,<j2>)[o or °]<J>, e.g. (3/2,1/2)1, with the level's coupling");
  }
  const ls = parseLS(t);
  if (ls.ok && coupling)
    return bad(`term "${t}" is an LS term, but the level gives coupling (scheme ${coupling.scheme})`, `leave coupling out for an LS term, or write the term in ${coupling.scheme} notation, e.g. ${coupling.scheme === "jK" ? "2[3/2]o2" : "(3/2,1/2)1"}`);
  return ls;
}

function doubled(text: string): number | null {
  try {
    const v = parseDoubled(text.trim());
    return v < 0 ? null : v;
  } catch {
    return null;
  }
}

function jkTerm(t: string, m: RegExpExecArray, coupling: CouplingInput | null): Parsed<JKTerm> {
  const [, multText = "", kText = "", mark, jText = ""] = m;
  if (!coupling) return bad(`term "${t}" is written in jK coupling, but the level has no coupling`, `add the parent term and the outer electron's l, e.g. ${JK_EXAMPLE}`);
  if (coupling.scheme !== "jK") return bad(`term "${t}" is written in jK coupling, but the level's coupling says scheme ${coupling.scheme}`, `write scheme: jK with core and l, e.g. ${JK_EXAMPLE}`);
  if (Number(multText) !== 2) return bad(`2s+1 = ${multText} in jK term "${t}" is not 2`, "the leading number of a jK term is 2s+1 of the one outer electron, always 2: e.g. 2[3/2]o2");
  const K2 = doubled(kText);
  if (K2 === null) return bad(`K = ${kText} in term "${t}" is not an integer or half-integer`, "write K as 1/2, 3/2, ... or 0, 1, 2, ...");
  const J2 = doubled(jText);
  if (J2 === null) return bad(`J = ${jText} in term "${t}" is not 0 or a positive integer or half-integer`, "write J as 0, 1, 2, ... or 1/2, 3/2, ...");
  const j1 = coupling.core.J2;
  if (!triangle(j1, 2 * coupling.l, K2))
    return bad(`K = ${kText} cannot arise from the core's j1 = ${formatDoubled(j1)} (${coupling.core.text}) and the outer electron's l = ${coupling.l} (term "${t}")`, `K runs from |j1−l| to j1+l, here ${range(j1, 2 * coupling.l)}; check the term, core and l`);
  if (!triangle(K2, 1, J2))
    return bad(`J = ${jText} cannot arise from K = ${kText} and the outer electron's s = 1/2 (term "${t}")`, `J = K ± 1/2, here ${range(K2, 1)}`);
  return ok({ scheme: "jK", text: t, multiplicity: 2, K2, core: coupling.core, l: coupling.l, J2, parity: mark ? "odd" : null });
}

function jjTerm(t: string, m: RegExpExecArray, coupling: CouplingInput | null): Parsed<JJTerm> {
  const [, aText = "", bText = "", mark, jText = ""] = m;
  if (!coupling) return bad(`term "${t}" is written in jj coupling, but the level has no coupling`, `add the two electrons' l, e.g. ${JJ_EXAMPLE}`);
  if (coupling.scheme !== "jj") return bad(`term "${t}" is written in jj coupling, but the level's coupling says scheme ${coupling.scheme}`, `write scheme: jj with the two electrons' l, e.g. ${JJ_EXAMPLE}`);
  const js = [doubled(aText), doubled(bText)];
  const J2 = doubled(jText);
  if (J2 === null) return bad(`J = ${jText} in term "${t}" is not 0 or a positive integer or half-integer`, "write J as 0, 1, 2, ... or 1/2, 3/2, ...");
  for (const i of [0, 1] as const) {
    const j2 = js[i] ?? null;
    const l = coupling.l[i];
    const jt = i === 0 ? aText : bText;
    if (j2 === null || j2 % 2 === 0)
      return bad(`j${i + 1} = ${jt.trim()} in term "${t}" is not a half-integer`, "each electron's j is l ± 1/2: 1/2, 3/2, 5/2, ...");
    if (Math.abs(j2 - 2 * l) !== 1)
      return bad(`j${i + 1} = ${jt.trim()} cannot arise from l${i + 1} = ${l} and s = 1/2 (term "${t}")`, `j = l ± 1/2, here ${range(2 * l, 1)}; check the term and the coupling's l`);
  }
  const [a, b] = js as [number, number];
  if (!triangle(a, b, J2))
    return bad(`J = ${jText} cannot arise from j1 = ${formatDoubled(a)} and j2 = ${formatDoubled(b)} (term "${t}")`, `J runs from |j1−j2| to j1+j2, here ${range(a, b)}`);
  return ok({ scheme: "jj", text: t, j2s: [a, b], l: [coupling.l[0], coupling.l[1]], J2, parity: mark ? "odd" : null });
}

/** Parse an LS term symbol, checking that J can arise from L and S. */
export function parseLS(t: string): Parsed<LSTerm> {
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
  return ok({ scheme: "LS", text: t, multiplicity, S2, L, letter, J2, parity: mark ? "odd" : null });
}

function range(L2: number, S2: number): string {
  const out: string[] = [];
  for (let j = Math.abs(L2 - S2); j <= L2 + S2; j += 2) out.push(formatDoubled(j));
  return out.join(", ");
}
