/**
 * One spelling for what a reader types and what the search index holds, so
 * that "2P3/2", "2P_{3/2}", "²P₃/₂", "2P°3/2" and "2Po3/2" all become the
 * token "2p3/2", "mF = −1" becomes "mf=-1", "Δm = +1" becomes "dm=1" and
 * "sigma plus" becomes "σ+". The build (search index) and the finder
 * script (src/browser/finderCore.ts, bundled) both call this module; the
 * word tables are in searchWords.ts.
 */
import { PHRASES, SCRIPT_DIGITS } from "./searchWords.js";

// Orbital letters of term symbols (J is skipped by convention), lower case.
const TERM = /^(\d*)([spdfghiklmnoqrtuvwxyz])o?(\d+(?:\/2)?)$/;
// Quantum-number assignments a reader may type; "m" alone means mJ or mF; "dm" is Δm of a component.
const ASSIGN = /^(mf|mj|mu|ml|m|f|j|dm)=([+-]?)(\d+(?:\/2|\.5|\.0)?)$/;

function halves(text: string): string {
  if (text.endsWith(".5")) return `${Number(text.slice(0, -2)) * 2 + 1}/2`;
  if (text.endsWith(".0")) return text.slice(0, -2);
  return text;
}

function token(t: string): string {
  const a = ASSIGN.exec(t);
  if (a) {
    const v = halves(a[3]!);
    return `${a[1]}=${a[2] === "-" && v !== "0" ? "-" : ""}${v}`;
  }
  // Parity marks are dropped inside any hyphen-separated part ("5p-p°3/2" -> "5p-p3/2").
  return t
    .split("-")
    .map((part) => {
      const m = TERM.exec(part);
      return m ? m[1]! + m[2]! + m[3]! : part;
    })
    .join("-");
}

/**
 * Search tokens of a text: script digits folded, TeX braces dropped, lower
 * case, two-word phrases joined, split on spaces, commas and semicolons,
 * each token canonical.
 * Example: searchTokens("²P°_{3/2}  F = 2, mF=+1") → ["2p3/2", "f=2", "mf=1"].
 */
export function searchTokens(text: string): string[] {
  const folded = [...text].map((ch) => SCRIPT_DIGITS[ch] ?? ch).join("");
  let s = folded.replace(/[_{}^]/g, "").toLowerCase();
  for (const [re, to] of PHRASES) s = s.replace(re, to);
  // terms outside LS coupling, parity mark dropped: jK "2[3/2]o2" → "2[3/2]2"; jj "(3/2, 1/2)1" → "(3/2+1/2)1", one token
  s = s
    .replace(/(\d*)\[\s*(\d+(?:\/2)?)\s*\]\s*o?\s*(\d+(?:\/2)?)/g, "$1[$2]$3")
    .replace(/\(\s*(\d+\/2)\s*,\s*(\d+\/2)\s*\)\s*o?\s*(\d+(?:\/2)?)/g, "($1+$2)$3");
  return s
    .replace(/(\d)[\u2009\u202f](?=\d)/g, "$1")
    .replace(/\s*=\s*/g, "=")
    .split(/[\s,;]+/)
    .filter(Boolean)
    .map(token);
}

/**
 * Index keys of a term symbol: with and without multiplicity, so that a
 * reader who types only "P3/2" finds it too. Example: "2Po3/2" → ["2p3/2", "p3/2"];
 * jK "2[3/2]o2" → ["2[3/2]2", "[3/2]2"]; jj "(3/2,1/2)1" → ["(3/2+1/2)1"].
 */
export function termKeys(termText: string): string[] {
  const [full] = searchTokens(termText);
  if (!full) return [];
  const bare = full.replace(/^\d+/, "");
  return bare === full ? [full] : [full, bare];
}
