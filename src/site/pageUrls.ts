/**
 * Where each page of a species lives, relative to the site root. One place,
 * so links, the search index, the forwarding maps and the writer agree.
 *
 *   species/rb87/                          overview
 *   species/rb87/level/5s-S1_2/            a level with hyperfine structure
 *   species/rb87/line/D2/                  a line
 *   species/rb87/line/D2/B-0.0001T/        a line at one field (only when the line page would be too large)
 *   species/rb87/sheet/                    bench sheet
 */
import { pageSlug } from "../data/ids.js";

export const speciesPath = (speciesId: string) => `species/${speciesId}/`;
export const levelPagePath = (speciesId: string, levelId: string) => `species/${speciesId}/level/${pageSlug(levelId)}/`;
export const linePagePath = (speciesId: string, lineId: string) => `species/${speciesId}/line/${pageSlug(lineId)}/`;
export const lineFieldPagePath = (speciesId: string, lineId: string, tesla: string) => `${linePagePath(speciesId, lineId)}B-${tesla}T/`;
/** A fine-structure term's page ("5p 2P°" → term/5p-2Po/), used when a large species' overview leaves its tables to it. */
export const termPagePath = (speciesId: string, termKey: string) => `species/${speciesId}/term/${pageSlug(termKey.replace(/\s+/g, "-").replace(/°/g, "o"))}/`;
export const sheetPath = (speciesId: string) => `species/${speciesId}/sheet/`;
export const exportPath = (speciesId: string) => `export/${speciesId}.json`;
/** The HTML file of a page path. */
export const htmlFile = (path: string) => `${path}index.html`;
