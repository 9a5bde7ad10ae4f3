/**
 * The finder: from what a reader types to the rows of the site that answer
 * it, each with a link to its row, a label, and where the answer is one
 * number, the answer itself. Pure (no document): the page script
 * (finder.ts) and the tests call it alike.
 *
 * A query is read into free words and structure (searchNormalize.ts and
 * the word tables of searchWords.ts):
 *   F=2 mF=1, mJ=1/2, J=3/2      a sublevel, hyperfine level or level; two (F, mF) name a transition
 *   mu=3/2 ml=1/2, π, σ+, Δm=1   Zeeman components of a line
 *   1 T, 3.228 G, 0.5mT          a field: the energies there (configured fields) or the field calculator
 *   clock, magic, rf, …          sublevel transitions (TRANSITION_WORDS)
 * The free words find species, levels, lines and constants through
 * MiniSearch (exact keys rank first: a word that names the entry itself,
 * such as a term symbol or an id, before one that only names its species);
 * the structure then expands each into the rows it names, with the anchors
 * of src/site/anchors.ts.
 */
import MiniSearch from "minisearch";
import { formatDoubled, mValues } from "../physics/quantum.js";
import { polarizationOf } from "../physics/polarization.js";
import { UNITS } from "../physics/unitTable.js";
import { componentAnchor, fieldStateAnchor, hyperfineAnchor, levelAnchor, lineAnchor, mFAnchor, mJAnchor, transitionAnchor } from "../site/anchors.js";
import { compareDecimal, decimalKey, parseDecimal, type DecimalKey } from "../site/decimalText.js";
import { formatM, formatQuantum, partsText, polarizationSymbol, transitionKindLabel } from "../site/plainFormat.js";
import type { ConstantDoc, LevelDoc, LineDoc, SearchData } from "../site/searchIndex.js";
import { unpackInts } from "../site/searchCodec.js";
import { searchTokens } from "../site/searchNormalize.js";
import { convertShift, convertShiftUncertain, DEFAULT_SHIFT_UNIT } from "../site/shiftUnits.js";
import { FIELD_UNITS, KIND_WORDS, POLARIZATION_WORDS, TRANSITION_WORDS, type TransitionWord } from "../site/searchWords.js";

export interface FinderRow {
  /** What the row is: "species", "level", "hyperfine sublevel", "sublevel transition", … */
  kind: string;
  /** Page and anchor from the site root: "species/rb87/index.html#level:5s-S1/2:F=2:mF=1". */
  href: string;
  label: string;
  /** The answer itself where it is one number or one short text (gF and shift, a line's pattern, a field-insensitive field, a value). */
  answer?: string;
  /** Key of the table column that holds the answer (the <th data-key>), so landing can bring it into view. */
  column?: string;
}

export interface SearchResult {
  rows: FinderRow[];
  total: number;
  /** True when counting stopped at the cap (there are more). */
  capped: boolean;
}

export interface SearchOptions {
  /** Shift unit of the answers (one of SHIFT_UNITS); default MHz/G. */
  unit?: string;
}

/** A sublevel named in a query: doubled F, mF, mJ, or m (mF or mJ). */
export interface QueryState {
  f?: number;
  mf?: number;
  mj?: number;
  m?: number;
}

export interface Query {
  /** Words for the full-text part. */
  words: string[];
  /** Sublevels in the order typed; a repeated key starts the next. */
  states: QueryState[];
  /** Doubled J of the level. */
  j?: number;
  /** Doubled m of a component's upper and lower level. */
  comp: { mu?: number; ml?: number };
  /** Δm values of components asked for (ordinary integers), or null. */
  dm: number[] | null;
  /** A field with a unit: as typed ("1 T") and in tesla (decimal text, exact). */
  field: { text: string; compact: string; tesla: string } | null;
  transitions: TransitionWord[];
  /** Kinds of entry the query keeps to (KIND_WORDS: "line", "level", "constant"); empty for all. */
  kinds: string[];
}

const ASSIGN = /^(mf|mj|mu|ml|m|f|j|dm)=(-?\d+(?:\/2)?)$/;
const NUMBER = /^(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/;
const GLUED_FIELD = /^((?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)([a-zµμ]+)$/;

/** "3/2" → 3, "-1" → -2. */
function doubled(v: string): number {
  const neg = v.startsWith("-");
  const a = neg ? v.slice(1) : v;
  const k = a.includes("/") ? parseInt(a, 10) : 2 * parseInt(a, 10);
  return neg ? -k : k;
}

/** A number and a field unit as tesla (exact decimal text), or null when the unit is not a field unit. */
function fieldOf(number: string, unitWord: string): Query["field"] {
  const unit = FIELD_UNITS[unitWord];
  if (!unit) return null;
  const v = parseDecimal(number);
  const f = parseDecimal(UNITS[unit]!.factor);
  if (!v || !f) return null;
  const tesla = `${v.n * f.n}e${v.e + f.e}`;
  return { text: `${number} ${unit}`, compact: `${number}${unit}`, tesla };
}

/** A query read into words and structure (see the file comment). */
export function parseQuery(text: string): Query {
  const q: Query = { words: [], states: [], comp: {}, dm: null, field: null, transitions: [], kinds: [] };
  const tokens = searchTokens(text);
  let cur: QueryState | null = null;
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i]!;
    const a = ASSIGN.exec(t);
    if (a) {
      const key = a[1]!;
      const v = doubled(a[2]!);
      if (key === "j") q.j = v;
      else if (key === "mu" || key === "ml") q.comp[key] = v;
      else if (key === "dm") q.dm = [...(q.dm ?? []), v / 2];
      else {
        const k = key as keyof QueryState;
        // A second F (or a second m) names the next sublevel: "F=1 mF=0 F=2 mF=0".
        if (!cur || cur[k] !== undefined || (k === "f" && (cur.mf !== undefined || cur.m !== undefined))) {
          cur = {};
          q.states.push(cur);
        }
        cur[k] = v;
      }
      continue;
    }
    const pol = POLARIZATION_WORDS[t];
    if (pol) {
      q.dm = [...(q.dm ?? []), ...pol];
      continue;
    }
    const kind = KIND_WORDS[t];
    if (kind && tokens.length > 1) {
      if (!q.kinds.includes(kind)) q.kinds.push(kind);
      continue;
    }
    const tr = TRANSITION_WORDS[t];
    if (tr) {
      if (!q.transitions.includes(tr)) q.transitions.push(tr);
      continue;
    }
    const b = /^b=(.+)$/.exec(t);
    const glued = GLUED_FIELD.exec(b ? b[1]! : t);
    if (glued) {
      const f = fieldOf(glued[1]!, glued[2]!);
      if (f) {
        q.field = f;
        continue;
      }
    }
    if (NUMBER.test(t) && i + 1 < tokens.length && FIELD_UNITS[tokens[i + 1]!]) {
      const f = fieldOf(t, tokens[i + 1]!);
      if (f) {
        q.field = f;
        i++;
        continue;
      }
    }
    q.words.push(t);
  }
  return q;
}

const MINUS = "\u2212";
const stateText = (F2: number, mF2: number) => `F=${formatDoubled(F2)}, mF=${formatDoubled(mF2).replace(/^-/, MINUS)}`;
/** A point's number as typed: "3.228 917 G" → "3.228917". */
const pointKey = (text: string) => text.replace(/[\u2009\s]/g, "").replace(/[a-zµμ]+$/i, "").toLowerCase();

interface Doc {
  id: number;
  kind: "species" | "level" | "line" | "constant";
  /** Index in its list of the search data. */
  i: number;
  name: string;
  term: string;
  species: string;
  num: string;
  rel: string;
  points: string;
  sets: { own: Set<string>; other: Set<string> };
}

const keySet = (...texts: string[]) => new Set(texts.join(" ").split(" ").filter(Boolean));

/**
 * Multiply a decimal text by m (doubled m2, so by m2/2), exactly: the shift
 * of sublevel m from the shift per unit m.
 */
function timesM(perM: string, m2: number): string | null {
  const p = parseDecimal(perM);
  if (!p) return null;
  const n = p.n * BigInt(Math.abs(m2)) * 5n;
  return `${(p.neg !== m2 < 0) && n !== 0n ? "-" : ""}${n}e${p.e - 1}`;
}

export interface Finder {
  search(text: string, limit?: number, options?: SearchOptions): SearchResult;
  /** Every row the finder can reach (for tests: each must be a row of its page). */
  all(): FinderRow[];
}

/** Positions in a level's row pages (RowPages of searchIndex.ts). */
const ROWS = { mJ: 0, F: 1, mF: 2, field: 3, rf: 4 } as const;

/** Counting stops here: a query that matches more says "more than …". */
export const CAP = 1000;

/** A finder over the search data of a site. */
export function createFinder(data: SearchData, MiniSearchClass: typeof MiniSearch = MiniSearch): Finder {
  if (!data || data.v !== 2) throw new Error("search data of an unknown format");
  const fieldKeys = data.fields.map(([, tesla]) => decimalKey(tesla));
  const speciesKeys = data.species.map((s) => s[3]);
  const docs: Doc[] = [];
  const add = (d: Omit<Doc, "id" | "sets">) => {
    const doc = { ...d, id: docs.length, sets: { own: keySet(d.name, d.term), other: keySet(d.species, d.num) } };
    docs.push(doc);
  };
  data.species.forEach((s, i) => add({ kind: "species", i, name: s[3], term: "", species: s[3], num: "", rel: "", points: "" }));
  data.levels.forEach((l, i) =>
    add({ kind: "level", i, name: l[3], term: l[4], species: speciesKeys[l[0]]!, num: "", rel: "", points: [...new Set(l[13].map((p) => pointKey(p[2])))].join(" ") }),
  );
  data.lines.forEach((n, i) => {
    const rel = [data.levels[n[2]], data.levels[n[3]]].map((l) => (l ? `${l[3]} ${l[4]}` : "")).join(" ");
    add({ kind: "line", i, name: n[6], term: "", species: speciesKeys[n[0]]!, num: `${n[4]} ${n[5].toLowerCase()}`, rel, points: "" });
  });
  // A constant by its symbol (also with "mu" for μ, as typed on a plain keyboard, and in its parts) and its name.
  data.constants.forEach((c, i) => {
    const symbol = `${c[1]} ${c[1].replace(/μ/g, "mu")}`;
    add({ kind: "constant", i, name: searchTokens(`${symbol} ${symbol.replace(/[/()·]/g, " ")} ${c[2]}`).join(" "), term: "", species: "constant constants", num: "", rel: "", points: "" });
  });

  const ms = new MiniSearchClass<Doc>({
    fields: ["name", "term", "species", "num", "rel", "points"],
    storeFields: [],
    tokenize: (s: string) => s.split(" ").filter(Boolean),
    processTerm: (t: string) => t,
  });
  ms.addAll(docs);

  // Exact hits rank first: 2 when every word is an exact key and one names the entry itself, 1 when every word is exact.
  function tier(d: Doc, words: string[]): number {
    let primary = false;
    let covered = 0;
    for (const w of words) {
      const own = d.sets.own.has(w);
      if (own) primary = true;
      if (own || d.sets.other.has(w)) covered++;
    }
    if (covered < words.length) return 0;
    return primary ? 2 : 1;
  }

  function entities(words: string[]): Doc[] {
    if (!words.length) return docs.filter((d) => d.kind === "level" || d.kind === "line");
    const hits = ms.search(words.join(" "), { prefix: true, combineWith: "AND", boost: { name: 4, term: 3, species: 1.5, num: 1, rel: 0.3, points: 1 } });
    return hits
      .map((h) => {
        const d = docs[h.id as number]!;
        return { d, t: tier(d, words), s: h.score };
      })
      .sort((a, b) => b.t - a.t || b.s - a.s || a.d.id - b.d.id)
      .map((x) => x.d);
  }

  const speciesOf = (k: number) => data.species[k]!;
  /** The page of a kind of row of a level ("" in the index is the species overview). */
  const pageOf = (l: LevelDoc, kind: number) => l[11][kind] || speciesOf(l[0])[2];
  const levelBase = (l: LevelDoc) => `${speciesOf(l[0])[1]} · ${l[1]} ${l[2]}`;

  /** The shift of sublevel m2 in the reader's unit, from the shift per unit m (Hz/T). */
  function shiftText(perM: string, m2: number, unit: string, perMU = ""): string {
    if (!perM) return "";
    const hz = timesM(perM, m2);
    // the uncertainty of m·(g·μB/h) is |m| times that of g·μB/h: m is exact
    const uHz = perMU && m2 !== 0 ? timesM(perMU, Math.abs(m2)) : null;
    const parts = hz === null ? null : uHz !== null ? convertShiftUncertain(hz, uHz, unit) : convertShift(hz, unit);
    return parts ? `${partsText(parts)} ${unit}` : "";
  }

  /** Does a row of an energies table (F2, m2; or J, mJ when the level has no hyperfine structure) fit the sublevel asked for? */
  const fitsFieldRow = (s: QueryState | undefined, hf: boolean, F2: number, m2: number): boolean => {
    if (!s) return true;
    const m = hf ? (s.mj === undefined ? (s.mf ?? s.m) : null) : (s.mf === undefined && s.f === undefined ? (s.mj ?? s.m) : null);
    if (m === null) return false;
    return (!hf || s.f === undefined || s.f === F2) && (m === undefined || m === m2);
  };

  // --- rows of a level: the level, its hyperfine levels and sublevels ---
  function levelRows(l: LevelDoc, q: Query, unit: string, out: FinderRow[]): void {
    const page = speciesOf(l[0])[2];
    const id = l[1];
    const base = levelBase(l);
    if (q.j !== undefined && q.j !== l[5]) return;
    const s = q.states[0];
    if (!s) {
      if (q.comp.mu === undefined && q.comp.ml === undefined && q.dm === null)
        out.push({ kind: "level", href: `${page}#${levelAnchor(id)}`, label: base, ...(l[7] ? { answer: `gJ = ${l[7]}`, column: "gJ" } : {}) });
      return;
    }
    const F2s = l[6];
    const mf = s.mf ?? (s.mj === undefined ? s.m : undefined);
    if (s.mf !== undefined || s.f !== undefined || (s.m !== undefined && s.mj === undefined)) {
      F2s.forEach((F2, k) => {
        if (s.f !== undefined && s.f !== F2) return;
        const gF = l[9][k] ?? "";
        if (mf === undefined) {
          const per = shiftText(l[10][k] ?? "", 2, unit, l[16]?.[k] ?? "");
          out.push({
            kind: "hyperfine level",
            href: `${pageOf(l, ROWS.F)}#${hyperfineAnchor(id, F2)}`,
            label: `${base} · F = ${formatQuantum(F2)}`,
            ...(gF ? { answer: `gF = ${gF}${per ? `; ${per} per unit mF` : ""}`, column: "gF" } : {}),
          });
          return;
        }
        if (!mValues(F2).includes(mf)) return;
        const shift = shiftText(l[10][k] ?? "", mf, unit, l[16]?.[k] ?? "");
        out.push({
          kind: "hyperfine sublevel",
          href: `${pageOf(l, ROWS.mF)}#${mFAnchor(id, F2, mf)}`,
          label: `${base} · F = ${formatQuantum(F2)}, mF = ${formatM(mf)}`,
          ...(gF ? { answer: `gF = ${gF}; shift ${shift || "0"}`, column: "shift" } : {}),
        });
      });
    }
    const mj = s.mj ?? (s.f === undefined && s.mf === undefined ? s.m : undefined);
    if (mj !== undefined && mValues(l[5]).includes(mj)) {
      const shift = shiftText(l[8], mj, unit, l[15] ?? "");
      out.push({
        kind: "sublevel",
        href: `${pageOf(l, ROWS.mJ)}#${mJAnchor(id, mj)}`,
        label: `${base} · mJ = ${formatM(mj)}`,
        ...(l[7] ? { answer: `gJ = ${l[7]}; shift ${shift || "0"}`, column: "shift" } : {}),
      });
    }
  }

  // --- rows of a level at a field: the energies tables (overview), or the field calculator ---
  const calculatorShown = new Set<number>();
  function fieldRows(l: LevelDoc, q: Query, out: FinderRow[]): void {
    const f = q.field!;
    const page = speciesOf(l[0])[2];
    const at = decimalKey(f.tesla);
    const k = at ? fieldKeys.findIndex((x) => x !== null && compareDecimal(x, at) === 0) : -1;
    if (q.j !== undefined && q.j !== l[5]) return;
    if (k < 0) {
      // Not a configured field: the species' field calculator, once per species.
      if (calculatorShown.has(l[0])) return;
      calculatorShown.add(l[0]);
      out.push({ kind: "field calculator", href: `${page}#B=${f.compact}`, label: `${speciesOf(l[0])[1]} at ${f.text}: every sublevel energy, transition and line, in the field calculator` });
      return;
    }
    const s = q.states[0];
    const hf = l[6].length > 0;
    // A level without hyperfine structure has rows F = J, mF = mJ.
    const Fs = hf ? l[6] : [l[5]];
    for (const F2 of Fs) {
      for (const m2 of mValues(F2)) {
        if (!fitsFieldRow(s, hf, F2, m2)) continue;
        out.push({
          kind: "energy at a field",
          href: `${pageOf(l, ROWS.field)}#${fieldStateAnchor(l[1], F2, m2)}`,
          label: `${levelBase(l)} · ${hf ? `F = ${formatQuantum(F2)}, mF = ${formatM(m2)}` : `mJ = ${formatM(m2)}`} · energy at ${data.fields[k]![0]}`,
          column: `E${k}`,
        });
      }
    }
  }

  // --- sublevel transitions of a level ---
  interface Transition {
    k: number;
    lower: { F2: number; mF2: number };
    upper: { F2: number; mF2: number };
    kind: "magnetic-dipole" | "two-photon";
    points: { tesla: DecimalKey; text: string }[];
  }
  const transitionsOf = new Map<number, Transition[]>();
  function transitions(li: number): Transition[] {
    let list = transitionsOf.get(li);
    if (list) return list;
    const l = data.levels[li]!;
    const flat = unpackInts(l[12]);
    list = [];
    for (let k = 0; 5 * k + 4 < flat.length; k++) {
      const o = 5 * k;
      list.push({ k, lower: { F2: flat[o]!, mF2: flat[o + 1]! }, upper: { F2: flat[o + 2]!, mF2: flat[o + 3]! }, kind: flat[o + 4] ? "two-photon" : "magnetic-dipole", points: [] });
    }
    for (const [k, tesla, text] of l[13]) list[k]?.points.push({ tesla: decimalKey(tesla)!, text });
    transitionsOf.set(li, list);
    return list;
  }
  const ZERO: DecimalKey = { sign: 0, d: "", e: 0 };
  const isClock = (t: Transition) => t.lower.mF2 === 0 && t.upper.mF2 === 0 && t.lower.F2 !== t.upper.F2;
  const magicPoints = (t: Transition) => t.points.filter((p) => compareDecimal(p.tesla, ZERO) > 0);
  const lowest = (ps: { tesla: DecimalKey }[]) => ps.reduce<DecimalKey | null>((a, p) => (a === null || compareDecimal(p.tesla, a) < 0 ? p.tesla : a), null);
  const byLowest = (ps: (t: Transition) => { tesla: DecimalKey }[]) => (a: Transition, b: Transition) => {
    const x = lowest(ps(a));
    const y = lowest(ps(b));
    if (x === null || y === null) return (x === null ? 1 : 0) - (y === null ? 1 : 0);
    return compareDecimal(x, y);
  };
  const stateMatches = (s: QueryState, st: { F2: number; mF2: number }) =>
    (s.f === undefined || s.f === st.F2) && ((s.mf ?? s.m) === undefined || (s.mf ?? s.m) === st.mF2) && s.mj === undefined;

  function transitionRows(li: number, q: Query, pointWords: string[], out: FinderRow[]): void {
    const l = data.levels[li]!;
    if (q.j !== undefined && q.j !== l[5]) return;
    let list = transitions(li);
    const [s1, s2] = q.states;
    if (s1 && s2) list = list.filter((t) => (stateMatches(s1, t.lower) && stateMatches(s2, t.upper)) || (stateMatches(s1, t.upper) && stateMatches(s2, t.lower)));
    else if (s1) list = list.filter((t) => stateMatches(s1, t.lower) || stateMatches(s1, t.upper));
    for (const w of q.transitions) {
      if (w === "clock") list = list.filter(isClock);
      else if (w === "magic") list = list.filter((t) => magicPoints(t).length > 0);
      else if (w === "insensitive") list = list.filter((t) => t.points.length > 0);
      else if (w === "two-photon") list = list.filter((t) => t.kind === "two-photon");
      else if (w === "microwave") list = list.filter((t) => t.lower.F2 !== t.upper.F2);
    }
    for (const w of pointWords) list = list.filter((t) => t.points.some((p) => pointKey(p.text).startsWith(w)));
    // Order: the magic fields from the lowest; else the clock transitions first, then the table's order.
    list = [...list];
    if (q.transitions.includes("magic")) list.sort(byLowest(magicPoints));
    else if (q.transitions.includes("insensitive")) list.sort(byLowest((t) => t.points));
    else list.sort((a, b) => Number(isClock(b)) - Number(isClock(a)));
    // One page, or several (one per lower F): then each transition says which.
    const pages = l[11][ROWS.rf].split(" ").map((p) => p || speciesOf(l[0])[2]);
    const which = l[14] ? unpackInts(l[14]) : null;
    for (const t of list) {
      const points = t.points.map((p) => p.text).join("; ");
      out.push({
        kind: "sublevel transition",
        href: `${pages[which ? which[t.k]! : 0]}#${transitionAnchor(l[1], t.lower, t.upper)}`,
        label: `${levelBase(l)} · ${stateText(t.lower.F2, t.lower.mF2)} ↔ ${stateText(t.upper.F2, t.upper.mF2)} · ${transitionKindLabel(t.kind)}${isClock(t) ? " · clock" : ""}`,
        ...(points ? { answer: `field-insensitive at ${points}`, column: "insensitive" } : {}),
      });
    }
  }

  // --- rows of a line: the line and its Zeeman components ---
  const components = new Map<LineDoc, number[]>();
  const componentsOf = (n: LineDoc): number[] => {
    let c = components.get(n);
    if (!c) components.set(n, (c = unpackInts(n[7])));
    return c;
  };
  function lineRows(n: LineDoc, q: Query, out: FinderRow[]): void {
    const sp = speciesOf(n[0]);
    const id = n[1];
    const up = data.levels[n[2]];
    const lo = data.levels[n[3]];
    const base = `${sp[1]} · ${id}`;
    if (q.states.length || q.j !== undefined || q.field || q.transitions.length) return;
    if (q.comp.mu === undefined && q.comp.ml === undefined && q.dm === null) {
      out.push({
        kind: "line",
        href: `${sp[2]}#${lineAnchor(id)}`,
        label: base + (n[4] ? ` · ${n[4]} nm` : "") + (up && lo ? ` · ${up[1]} → ${lo[1]}` : ""),
        ...(n[9] ? { answer: `pattern ${n[9]}`, column: "pattern" } : {}),
      });
      return;
    }
    const c = componentsOf(n);
    for (let k = 0; k + 1 < c.length; k += 2) {
      const mu = c[k]!;
      const ml = c[k + 1]!;
      if (q.comp.mu !== undefined && q.comp.mu !== mu) continue;
      if (q.comp.ml !== undefined && q.comp.ml !== ml) continue;
      const dm = (mu - ml) / 2;
      if (q.dm !== null && !q.dm.includes(dm)) continue;
      const pol = polarizationSymbol(polarizationOf(dm), dm);
      out.push({ kind: "Zeeman component", href: `${n[8]}#${componentAnchor(id, mu, ml)}`, label: `${base} · m ${formatM(mu)} → ${formatM(ml)}`, answer: pol, column: "pol" });
    }
  }

  function constantRow(c: ConstantDoc): FinderRow {
    return { kind: "constant", href: c[0], label: `${c[1]} · ${c[2]}`, answer: `${c[3]}${c[4] ? ` ${c[4]}` : ""}`, column: "value" };
  }

  /** Words of a query that a level matches only through its field-insensitive points. */
  function pointWordsOf(d: Doc, words: string[]): string[] {
    if (!d.points) return [];
    const keys = [...d.sets.own, ...d.sets.other];
    return words.filter((w) => NUMBER.test(w) && !keys.some((k) => k.startsWith(w)) && d.points.split(" ").some((p) => p.startsWith(w)));
  }

  function search(text: string, limit = 25, options: SearchOptions = {}): SearchResult {
    const q = parseQuery(text);
    const unit = options.unit ?? DEFAULT_SHIFT_UNIT;
    const rows: FinderRow[] = [];
    const structured = q.states.length > 0 || q.j !== undefined || q.comp.mu !== undefined || q.comp.ml !== undefined || q.dm !== null || q.field !== null || q.transitions.length > 0;
    if (!q.words.length && !structured) return { rows, total: 0, capped: false };
    calculatorShown.clear();
    for (const d of entities(q.words)) {
      if (rows.length >= CAP) break;
      if (q.kinds.length && !q.kinds.includes(d.kind)) continue;
      if (d.kind === "species") {
        if (!structured) {
          const s = data.species[d.i]!;
          rows.push({ kind: "species", href: s[2], label: `${s[1]} (${s[0]})` });
        }
      } else if (d.kind === "constant") {
        if (!structured) rows.push(constantRow(data.constants[d.i]!));
      } else if (d.kind === "level") {
        const l = data.levels[d.i]!;
        const pointWords = pointWordsOf(d, q.words);
        if (q.transitions.length || q.states.length >= 2 || pointWords.length) transitionRows(d.i, q, pointWords, rows);
        else if (q.field) fieldRows(l, q, rows);
        else levelRows(l, q, unit, rows);
      } else lineRows(data.lines[d.i]!, q, rows);
    }
    return { rows: rows.slice(0, limit), total: Math.min(rows.length, CAP), capped: rows.length >= CAP };
  }

  function all(): FinderRow[] {
    const rows: FinderRow[] = [];
    const unit = DEFAULT_SHIFT_UNIT;
    const q = (over: Partial<Query>): Query => ({ words: [], states: [], comp: {}, dm: null, field: null, transitions: [], kinds: [], ...over });
    for (const s of data.species) rows.push({ kind: "species", href: s[2], label: s[1] });
    data.levels.forEach((l, li) => {
      levelRows(l, q({}), unit, rows);
      for (const m2 of mValues(l[5])) levelRows(l, q({ states: [{ mj: m2 }] }), unit, rows);
      for (const F2 of l[6]) {
        levelRows(l, q({ states: [{ f: F2 }] }), unit, rows);
        for (const m2 of mValues(F2)) levelRows(l, q({ states: [{ f: F2, mf: m2 }] }), unit, rows);
      }
      data.fields.forEach(([text, tesla]) => {
        if (text === data.fields[0]![0]) fieldRows(l, q({ field: { text, compact: text, tesla } }), rows);
      });
      transitionRows(li, q({ transitions: ["any"] }), [], rows);
    });
    for (const n of data.lines) {
      lineRows(n, q({}), rows);
      const c = componentsOf(n);
      for (let k = 0; k + 1 < c.length; k += 2) lineRows(n, q({ comp: { mu: c[k]!, ml: c[k + 1]! } }), rows);
    }
    for (const c of data.constants) rows.push(constantRow(c));
    return rows;
  }

  return { search, all };
}
