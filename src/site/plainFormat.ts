/**
 * The typographic rules of shown numbers that need no decimal arithmetic:
 * the special spaces, the true minus, digit grouping, superscript
 * exponents, quantum numbers, and lining up a column on its decimal point.
 * No imports beyond quantum.ts, so the browser scripts (src/browser/) can
 * bundle it without decimal.js; format.ts and table.ts build on it, so the
 * server's pages and the page scripts write numbers one way.
 */
import { formatDoubled } from "../physics/quantum.js";

export const THIN_SPACE = "\u2009";
export const MINUS = "\u2212";
export const FIGURE_SPACE = "\u2007";
/** U+2008, as wide as the decimal point: pads a number that has none. */
export const PUNCTUATION_SPACE = "\u2008";

/**
 * Digits in groups of three with thin spaces, counted from the decimal point.
 * Four digits stay together (common practice) unless `force` is set, which a
 * column uses when any of its numbers needs grouping, so a column is grouped
 * one way throughout.
 */
export function groupDigits(digits: string, fromLeft: boolean, force = false): string {
  if (digits.length <= (force ? 3 : 4)) return digits;
  const parts: string[] = [];
  if (fromLeft) {
    for (let i = 0; i < digits.length; i += 3) parts.push(digits.slice(i, i + 3));
  } else {
    for (let i = digits.length; i > 0; i -= 3) parts.unshift(digits.slice(Math.max(0, i - 3), i));
  }
  return parts.join(THIN_SPACE);
}

export const SUPERSCRIPT: Readonly<Record<string, string>> = {
  "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻",
};

/** "×10⁻⁵" for the exponent −5. */
export function timesTenTo(exponent: number): string {
  return "×10" + [...String(exponent)].map((ch) => SUPERSCRIPT[ch] ?? ch).join("");
}

/** Parts of a shown number, so templates can align on the decimal point. */
export interface NumberParts {
  sign: string;
  int: string;
  /** Decimal point and fraction digits, grouped; "" for an integer. */
  frac: string;
  /** Concise uncertainty "(20)" or " ± 0.1", as written in the data; "" if none. */
  unc?: string;
  exp: string;
  /** Figure, punctuation and thin spaces after the number that line its decimal point up with the column (see alignParts). */
  pad?: string;
}

/** One display string of number parts (without padding). */
export function partsText(p: NumberParts): string {
  return p.sign + p.int + p.frac + (p.unc ?? "") + p.exp;
}

/** A doubled quantum number for display: "3/2", "−1/2". */
export function formatQuantum(k: number): string {
  return formatDoubled(k).replace(/^-/, MINUS);
}

/** A doubled m with explicit sign for non-zero values: "+3/2", "−1/2", "0". */
export function formatM(k: number): string {
  return k > 0 ? "+" + formatDoubled(k) : formatQuantum(k);
}

const DIGIT = /[0-9]/;

/** How wide the part right of the decimal point is, counted per kind of character. */
function rightWidth(p: NumberParts): { fig: number; punct: number; thin: number } {
  let fig = 0;
  let punct = 0;
  let thin = 0;
  for (const ch of p.frac + (p.unc ?? "") + p.exp) {
    if (DIGIT.test(ch)) fig++;
    else if (ch === THIN_SPACE) thin++;
    else if (ch === " ") thin++; // around "±"; drawn as thin spaces in padding
    else if (ch === "×" || ch === "±") fig++;
    else punct++; // point, parentheses, superscripts: about the width of a point
  }
  return { fig, punct, thin };
}

const ungroup = (s: string) => s.split(THIN_SPACE).join("");

/**
 * One column's numbers grouped alike and padded so that their decimal
 * points line up: when any number has five or more digits on one side of
 * the point, four-digit runs on that side are grouped too; then each gets
 * trailing figure spaces (digit width), punctuation spaces (point width)
 * and thin spaces so that all have as many of each right of the point.
 * Returns new parts in the same order.
 */
export function alignParts(list: readonly NumberParts[]): NumberParts[] {
  const forceInt = list.some((p) => ungroup(p.int).length > 4);
  const forceFrac = list.some((p) => ungroup(p.frac).length - 1 > 4);
  const grouped = list.map((p) => ({
    ...p,
    int: groupDigits(ungroup(p.int), false, forceInt),
    frac: p.frac ? "." + groupDigits(ungroup(p.frac).slice(1), true, forceFrac) : "",
  }));
  const widths = grouped.map(rightWidth);
  const max = { fig: 0, punct: 0, thin: 0 };
  for (const w of widths) {
    max.fig = Math.max(max.fig, w.fig);
    max.punct = Math.max(max.punct, w.punct);
    max.thin = Math.max(max.thin, w.thin);
  }
  return grouped.map((p, k) => {
    const w = widths[k]!;
    return { ...p, pad: FIGURE_SPACE.repeat(max.fig - w.fig) + PUNCTUATION_SPACE.repeat(max.punct - w.punct) + THIN_SPACE.repeat(max.thin - w.thin) };
  });
}

/**
 * The label of a component's polarization as shown in tables and search:
 * σ+, π, σ−, and for the |Δm| = 2 and 3 components of a quadrupole or
 * octupole line, which are neither π nor σ, "Δm = +2", "Δm = −3" and so on
 * (q = m_upper − m_lower; "Δm = ±2" when q is not given).
 */
export function polarizationSymbol(p: "sigma+" | "pi" | "sigma-" | null, q?: number): string {
  if (p === "sigma+") return "σ+";
  if (p === "sigma-") return "σ−";
  if (p === "pi") return "π";
  return q === undefined ? "Δm = ±2" : `Δm = ${q > 0 ? "+" : MINUS}${Math.abs(q)}`;
}

const SUBSCRIPT: Record<string, string> = { "0": "₀", "1": "₁", "2": "₂", "3": "₃", "4": "₄", "5": "₅", "6": "₆", "7": "₇", "8": "₈", "9": "₉", "/": "/" };

/** A term as the site writes it in any coupling scheme, without J and parity. */
export type TermLike = { parity: "odd" | null; J2: number } & (
  | { scheme?: "LS"; multiplicity: number; letter: string }
  | { scheme: "jK"; multiplicity: number; K2: number }
  | { scheme: "jj"; j2s: [number, number] }
);

/**
 * The superscript and the body of a term in each coupling scheme: ²P (LS),
 * ²[3/2] (jK: 2s+1 of the outer electron and K), (3/2,1/2) (jj: j1, j2, no superscript).
 */
export function termSymbolParts(t: TermLike): { sup: string; body: string } {
  if (t.scheme === "jK") return { sup: String(t.multiplicity), body: `[${formatDoubled(t.K2)}]` };
  if (t.scheme === "jj") return { sup: "", body: `(${formatDoubled(t.j2s[0])},${formatDoubled(t.j2s[1])})` };
  return { sup: String(t.multiplicity), body: t.letter };
}

/** A term symbol typeset in plain text for captions and titles: ²P°₃/₂, ²[3/2]°₂, (3/2,1/2)₁ (the data file may write 2Po3/2). */
export function termText(t: TermLike): string {
  const { sup: s, body } = termSymbolParts(t);
  const sup = [...s].map((ch) => SUPERSCRIPT[ch] ?? ch).join("");
  const j = [...formatDoubled(t.J2)].map((ch) => SUBSCRIPT[ch] ?? ch).join("");
  return `${sup}${body}${t.parity === "odd" ? "°" : ""}${j}`;
}

/** The short label of a sublevel transition's kind, as tables, the calculator and the finder show it. */
export function transitionKindLabel(kind: "magnetic-dipole" | "two-photon"): string {
  return kind === "two-photon" ? "2-photon" : "M1";
}
