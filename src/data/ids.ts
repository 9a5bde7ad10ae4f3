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
