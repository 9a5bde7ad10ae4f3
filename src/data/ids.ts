/** Identifier rules shared by the file readers. */

/** Species ids appear in URLs and export file names. */
export const SPECIES_ID = /^[a-z0-9-]+$/;
/** Level and line ids: letters, digits and - _ . / + ( ) °. */
export const ITEM_ID = /^[\p{L}\p{N}\-_./+()°]+$/u;

export const SPECIES_ID_HINT = "a species id uses only lower-case letters a-z, digits and '-', e.g. rb87 or ca40-ion";
export const ITEM_ID_HINT = "ids use letters, digits and - _ . / + ( ) °, without spaces, e.g. 5p-P3/2";

/** A suggestion that obeys the rule, for hints. */
export function suggestSpeciesId(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9-]+/g, "-").replace(/^-+|-+$/g, "") || "species";
}

/**
 * The page (folder) name of a level or line id: ASCII letters, digits, "-",
 * "." and "_" stay, "/" becomes "_" (so 5p-P3/2 reads 5p-P3_2), and any
 * other character becomes "~" and its UTF-8 bytes in hex ("+" → "~2b").
 * Only "/" and "_" can meet; the species reader refuses two ids of one kind
 * that give the same name, so within a species the name is unique.
 */
export function pageSlug(id: string): string {
  let out = "";
  for (const ch of id) {
    if (/[A-Za-z0-9._-]/.test(ch)) out += ch;
    else if (ch === "/") out += "_";
    else for (const b of new TextEncoder().encode(ch)) out += "~" + b.toString(16).padStart(2, "0");
  }
  return out;
}
