/**
 * The site-wide search data, made at build time and shipped as a classic
 * script (assets/search-index.js) that sets one global, so the finder works
 * from file:// and under any path prefix without a fetch.
 *
 * It is compact by design. Species, levels, lines and constants are listed
 * once with their normalized search keys (searchNormalize.ts and the word
 * tables of searchWords.ts). What there are many of is not listed as
 * documents but as the numbers that name it, and the finder
 * (src/browser/finderCore.ts) expands them into rows with the anchors of
 * src/site/anchors.ts:
 *  - sublevels (mJ, F, (F, mF)) and the rows of the energies tables from J and the F values;
 *  - Zeeman components from their (mu, ml) pairs;
 *  - sublevel transitions from flat (F, mF, F′, mF′, kind) tuples, with their field-insensitive points.
 * The long lists of small integers are packed one character a value (searchCodec.ts).
 * The answers a result line shows are here too: gJ and gF as the tables
 * show them, the shift per unit m in Hz/T (the finder multiplies by m and
 * converts it exactly into the reader's unit), each line's pattern, each
 * field-insensitive field, each constant's value.
 *
 * Each species' part is made while that species is built (speciesBuild.ts)
 * and the parts are merged by the build (build.ts). The test
 * test/site/searchIndex.test.ts checks that every expanded anchor is a row
 * id of the built pages and every row id of those kinds is reachable.
 */
import { exportText, type Dec } from "../physics/decimal.js";
import { mValues } from "../physics/quantum.js";
import { componentAnchor, fieldStateAnchor, hyperfineAnchor, mFAnchor, mJAnchor, transitionAnchor } from "./anchors.js";
import { formatUncertain, partsText, termText, writtenParts } from "./format.js";
import { perUnitMU } from "./linearTables.js";
import type { SublevelShift } from "../results/types.js";
import type { TermLike } from "./plainFormat.js";
import { htmlFile, levelPagePath, linePagePath, speciesPath } from "./pageUrls.js";
import { packInts } from "./searchCodec.js";
import { searchTokens, termKeys } from "./searchNormalize.js";
import { ELEMENT_NAMES, GROUND_WORDS, elementOf } from "./searchWords.js";
import type { Table } from "./table.js";

/** Significant digits of gJ and gF in result lines (as the sublevel tables show them). */
const G_DIGITS = 9;
/** Significant digits of the shift per unit m carried for the finder: far beyond the 9 shown, so its rounding is the table's. */
const PER_M_DIGITS = 25;

/** A sublevel transition as the search needs it. */
export interface SearchTransition {
  lower: { F2: number; mF2: number };
  upper: { F2: number; mF2: number };
  kind: "magnetic-dipole" | "two-photon";
  /** Field-insensitive points: field in tesla and as the table writes it ("3.228 917 G"). */
  fieldInsensitive: { tesla: Dec; text: string }[];
}

/** The parts of one species the search reads (made from its results in speciesBuild.ts). */
export interface SearchSpecies {
  id: string;
  label: string;
  /** μB/h in Hz/T of the constants edition, for the shift per unit m. */
  muB_h: Dec;
  levels: {
    input: { id: string; term: TermLike & { text: string }; energy?: { si: Dec } | null; gJ?: { text: string } | null };
    J2: number;
    gJ: Dec | null;
    /** A measured gJ is shown as written (its own digits and uncertainty), as the levels table shows it. */
    gJFrom?: "measured" | "LS" | "jK" | "jj" | "none";
    /** Standard uncertainty of gJ in use (null or absent: exact); results/linearUncertainties.ts. */
    gJU?: Dec | null;
    /** Linear shifts with their uncertainties, for the uncertainty of the shift per unit m (linearTables.ts perUnitMU). */
    sublevels?: SublevelShift[];
    hyperfine: { F2: number; gF: Dec | null; gFU?: Dec | null; sublevels?: SublevelShift[] }[];
  }[];
  lines: {
    input: { id: string; upper: string; lower: string; wavelength: { si: Dec } | null; airWavelength?: { si: Dec } | null; multipole: string };
    components: { mu2: number; ml2: number }[];
    pattern: string | null;
  }[];
  /** The sublevel transitions of each level that has them (field-insensitive points written as the transitions table writes them). */
  transitions?: Map<string, SearchTransition[]>;
  /**
   * The page (from the site root) that holds a row id, as the build wrote
   * the pages: the overview where a row is there too, else the level or line
   * page. Without it (tests of the index alone) the pages of pageUrls.ts are assumed.
   */
  pageOf?: (rowId: string) => string | null;
}

/** [id, label, overview page from the site root, search keys] */
export type SpeciesDoc = [string, string, string, string];
/**
 * [species index, id, term typeset, id keys, term keys, doubled J, doubled F values,
 *  gJ shown, gJ·μB/h (Hz/T) or "", gF shown per F, gF·μB/h per F (Hz/T) or "",
 *  pages of its rows [mJ, F, (F, mF), energies at the fields, transitions] ("" for the species overview),
 *  transitions as flat (F2, mF2, F2′, mF2′, kind) with kind 0 = M1, 1 = two-photon (packed, searchCodec.ts),
 *  field-insensitive points as [transition index, tesla, text],
 *  for transitions spread over several pages: each one's page as an index into RowPages[4] (packed), else ""]
 */
export type LevelDoc = [number, string, string, string, string, number, number[], string, string, string[], string[], RowPages, string | number[], [number, string, string][], string | number[], string, string[]];
/**
 * Pages of a level's rows: [mJ, F, (F, mF), energies at the fields, transitions]; "" is the species
 * overview. The transitions may be on several pages (one per lower F when a level has very many):
 * then the last holds them all, separated by spaces (ids and page names have none).
 */
export type RowPages = [string, string, string, string, string];
/** [species index, id, upper level index, lower level index, vacuum λ in nm or "", multipole, id keys, flat (mu2, ml2) pairs (packed), page of the components from the site root, pattern or ""] */
export type LineDoc = [number, string, number, number, string, string, string, string | number[], string, string];
/** [constants page and anchor from the site root, symbol, name, value as shown, unit as shown] */
export type ConstantDoc = [string, string, string, string, string];

export interface SearchData {
  /** Format version; the finder refuses others. */
  v: 2;
  /** The configured bias fields [text, tesla]; field i is the column "E{i}" of the energies tables. */
  fields: [string, string][];
  species: SpeciesDoc[];
  levels: LevelDoc[];
  lines: LineDoc[];
  constants: ConstantDoc[];
}

/** The page of the constants, from the site root. */
export const CONSTANTS_PAGE = "constants/index.html";

const unique = (xs: string[]) => [...new Set(xs.filter(Boolean))].join(" ");

/** Keys of an id: the whole id and its hyphen-separated parts ("5s-S1/2" → "5s-s1/2 5s s1/2"). */
function idKeys(id: string): string {
  const whole = searchTokens(id);
  return unique([...whole, ...whole.flatMap((t) => (t.includes("-") ? t.split("-") : []))]);
}

/**
 * Keys of a species: its id and label, the label with the mass number
 * moved ("87Rb" → "rb87", "rb-87", "rb"; "40Ca+" → "ca40+", "ca+"), and the
 * element's names with and without the mass number ("rubidium",
 * "rubidium-87"; "caesium", "cesium").
 */
function speciesKeys(id: string, label: string): string {
  const l = searchTokens(label);
  const moved = l.map((t) => t.replace(/^(\d+)([a-z]+)(.*)$/, "$2$1$3"));
  const dashed = l.map((t) => t.replace(/^(\d+)([a-z]+)(.*)$/, "$2-$1$3"));
  const bare = l.map((t) => t.replace(/^\d+/, ""));
  const element = elementOf(label);
  const mass = /\d+/.exec(label)?.[0];
  const names = element ? ELEMENT_NAMES[element]!.flatMap((n) => [n, ...(mass ? [`${n}-${mass}`, `${n}${mass}`] : [])]) : [];
  const ion = /\+|\bII\b|ion\b/.test(label) || /-ion$/.test(id) ? ["ion"] : [];
  return unique([...idKeys(id).split(" "), ...l, ...moved, ...dashed, ...bare, ...names, ...ion]);
}

/**
 * The ground levels of a species, for the word "ground": a level listed with
 * energy 0; else, when some levels have energies (measured from the ground
 * level), those without one that are the upper level of no line.
 */
function groundLevels(s: SearchSpecies): Set<string> {
  const zero = s.levels.filter((l) => l.input.energy?.si.isZero());
  if (zero.length) return new Set(zero.map((l) => l.input.id));
  if (!s.levels.some((l) => l.input.energy)) return new Set();
  const uppers = new Set(s.lines.map((ln) => ln.input.upper));
  return new Set(s.levels.filter((l) => !l.input.energy && !uppers.has(l.input.id)).map((l) => l.input.id));
}

/** g as the tables show it: with its standard uncertainty in the concise form when it has one. */
const shown = (g: Dec | null, u: Dec | null = null) => (g === null ? "" : formatUncertain(g, u, G_DIGITS));
function gJShown(l: SearchSpecies["levels"][number]): string {
  const written = l.gJFrom === "measured" && l.input.gJ ? writtenParts(l.input.gJ.text) : null;
  return written ? partsText(written) : shown(l.gJ, l.gJU ?? null);
}
const perM = (g: Dec | null, muB_h: Dec) => (g === null ? "" : exportText(muB_h.mul(g), PER_M_DIGITS));
/** Standard uncertainty (Hz/T) of the shift per unit m, "" when exact or not known. */
const perMU = (sublevels: SublevelShift[] | undefined, top2: number) => {
  const u = sublevels ? perUnitMU(sublevels, top2) : null;
  return u === null ? "" : exportText(u, PER_M_DIGITS);
};

/** One species' part of the search data. Pure: the same species gives the same data. */
export function searchData(s: SearchSpecies, fields: { text: string; tesla: string }[]): SearchData {
  const levels: LevelDoc[] = [];
  const lines: LineDoc[] = [];
  const levelIndex = new Map<string, number>();
  const ground = groundLevels(s);
  const overview = htmlFile(speciesPath(s.id));
  // Where a row is: on the page the build put it, "" for the overview.
  const where = (rowId: string, fallback: string) => {
    const page = s.pageOf ? (s.pageOf(rowId) ?? fallback) : fallback;
    return page === overview ? "" : page;
  };
  for (const l of s.levels) {
    levelIndex.set(l.input.id, levels.length);
    const id = l.input.id;
    const transitions = s.transitions?.get(id) ?? [];
    const flat: number[] = [];
    const points: [number, string, string][] = [];
    transitions.forEach((t, k) => {
      flat.push(t.lower.F2, t.lower.mF2, t.upper.F2, t.upper.mF2, t.kind === "two-photon" ? 1 : 0);
      for (const p of t.fieldInsensitive) points.push([k, exportText(p.tesla, 12), p.text]);
    });
    const levelPage = htmlFile(levelPagePath(s.id, id));
    const onPage = transitions.map((t) => where(transitionAnchor(id, t.lower, t.upper), levelPage));
    const transitionPages = [...new Set(onPage)];
    const h = l.hyperfine[0];
    const fieldF2 = h ? h.F2 : l.J2;
    const pages: RowPages = [
      where(mJAnchor(id, mValues(l.J2)[0]!), overview),
      h ? where(hyperfineAnchor(id, h.F2), overview) : "",
      h ? where(mFAnchor(id, h.F2, mValues(h.F2)[0]!), overview) : "",
      where(fieldStateAnchor(id, fieldF2, mValues(fieldF2)[0]!), overview),
      transitionPages.join(" "),
    ];
    levels.push([
      0,
      id,
      termText(l.input.term),
      ground.has(id) ? unique([...idKeys(id).split(" "), ...GROUND_WORDS]) : idKeys(id),
      unique(termKeys(l.input.term.text)),
      l.J2,
      l.hyperfine.map((hf) => hf.F2),
      gJShown(l),
      perM(l.gJ, s.muB_h),
      l.hyperfine.map((hf) => shown(hf.gF, hf.gFU ?? null)),
      l.hyperfine.map((hf) => perM(hf.gF, s.muB_h)),
      pages,
      packInts(flat),
      points,
      transitionPages.length > 1 ? packInts(onPage.map((p) => transitionPages.indexOf(p))) : "",
      perMU(l.sublevels, l.J2),
      l.hyperfine.map((hf) => perMU(hf.sublevels, hf.F2)),
    ]);
  }
  for (const ln of s.lines) {
    const linePage = htmlFile(linePagePath(s.id, ln.input.id));
    const wl = ln.input.wavelength ? ln.input.wavelength.si.mul("1e9").toSignificantDigits(12).toFixed() : "";
    lines.push([
      0,
      ln.input.id,
      levelIndex.get(ln.input.upper) ?? -1,
      levelIndex.get(ln.input.lower) ?? -1,
      wl,
      ln.input.multipole,
      // The air wavelength too, as spectroscopists name lines by it (630.2494 for Fe I 630.25).
      [idKeys(ln.input.id), ln.input.airWavelength ? ln.input.airWavelength.si.mul("1e9").toSignificantDigits(12).toFixed() : ""].filter(Boolean).join(" "),
      packInts(ln.components.flatMap((c) => [c.mu2, c.ml2])),
      ln.components[0] ? where(componentAnchor(ln.input.id, ln.components[0].mu2, ln.components[0].ml2), linePage) || overview : linePage,
      ln.pattern ?? "",
    ]);
  }
  return {
    v: 2,
    fields: fields.map((f) => [f.text, f.tesla]),
    species: [[s.id, s.label, htmlFile(speciesPath(s.id)), speciesKeys(s.id, s.label)]],
    levels,
    lines,
    constants: [],
  };
}

/** The constants of the constants page's table (siteSummary.ts), for the finder. */
export function constantsSearch(table: Table): ConstantDoc[] {
  const col = (key: string) => table.columns.findIndex((c) => c.key === key);
  const [symbol, name, value, unit] = [col("symbol"), col("name"), col("value"), col("unit")];
  const text = (cells: Table["rows"][number]["cells"], i: number) => (i >= 0 ? (cells[i]?.text ?? "") : "");
  return table.rows.map((r) => [`${CONSTANTS_PAGE}#${r.anchor}`, text(r.cells, symbol), text(r.cells, name), text(r.cells, value), text(r.cells, unit)]);
}

/**
 * The search data of several species built one at a time, as one: species
 * and level indices of each part shifted past the parts before it; the
 * fields of the first part (every part has the build's fields); constants added.
 */
export function mergeSearchData(parts: Iterable<SearchData>, constants: ConstantDoc[] = []): SearchData {
  const out: SearchData = { v: 2, fields: [], species: [], levels: [], lines: [], constants };
  for (const p of parts) {
    if (out.species.length === 0) out.fields = p.fields;
    const si = out.species.length;
    const li = out.levels.length;
    out.species.push(...p.species);
    for (const l of p.levels) out.levels.push([l[0] + si, ...l.slice(1)] as LevelDoc);
    for (const n of p.lines) out.lines.push([n[0] + si, n[1], n[2] < 0 ? -1 : n[2] + li, n[3] < 0 ? -1 : n[3] + li, ...n.slice(4)] as LineDoc);
  }
  return out;
}

/** The classic script that carries the data: one global, `AtlasSearchData`. */
export function searchIndexScript(data: SearchData): string {
  return `/* Sublevel Atlas search data, generated by the build (src/site/searchIndex.ts). */\nvar AtlasSearchData = ${JSON.stringify(data)};\n`;
}
