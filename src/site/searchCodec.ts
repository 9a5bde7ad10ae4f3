/**
 * Small integers of the search index (doubled quantum numbers, kinds) as a
 * string of one character each, so that the index script holds a few long
 * strings rather than hundreds of thousands of number literals: the
 * browser reads a string in a fraction of the time, and the finder decodes
 * a level's list only when a query needs it. Values −32 … 31 are written
 * with the 64 characters below (none needs escaping in JSON); a list with
 * any other value stays a plain array of numbers. Shared by the build
 * (searchIndex.ts) and the finder (src/browser/finderCore.ts).
 */
const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz+*";
const OFFSET = 32;

/** A list of small integers as a string where every value fits, else the list itself. */
export function packInts(values: readonly number[]): string | number[] {
  let out = "";
  for (const v of values) {
    if (!Number.isInteger(v) || v < -OFFSET || v >= ALPHABET.length - OFFSET) return [...values];
    out += ALPHABET[v + OFFSET];
  }
  return out;
}

/** Value of each character code of the alphabet. */
const VALUE = new Int8Array(128);
for (let i = 0; i < ALPHABET.length; i++) VALUE[ALPHABET.charCodeAt(i)] = i - OFFSET;

/** The list back from packInts. */
export function unpackInts(packed: string | readonly number[]): number[] {
  if (typeof packed !== "string") return [...packed];
  const out: number[] = new Array(packed.length);
  for (let i = 0; i < packed.length; i++) out[i] = VALUE[packed.charCodeAt(i)]!;
  return out;
}
