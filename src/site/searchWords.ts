/**
 * The words the finder understands, in one place for the build (which
 * writes the search index, src/site/searchIndex.ts) and the page script
 * (src/browser/finderCore.ts): element names and their spellings,
 * polarization words, words for sublevel transitions, phrases written in
 * two words, script digits of term symbols, and field units. No imports
 * beyond the unit table, so the page script bundles it.
 */
import { UNITS } from "../physics/unitTable.js";

/**
 * Element symbols (lower case) and their English names, with the common
 * second spellings (common practice: IUPAC names, and the American
 * "cesium", "aluminum", the British "sulphur", the older "wolfram").
 */
export const ELEMENT_NAMES: Readonly<Record<string, readonly string[]>> = {
  h: ["hydrogen"], he: ["helium"], li: ["lithium"], be: ["beryllium"], b: ["boron"], c: ["carbon"], n: ["nitrogen"], o: ["oxygen"],
  f: ["fluorine"], ne: ["neon"], na: ["sodium"], mg: ["magnesium"], al: ["aluminium", "aluminum"], si: ["silicon"], p: ["phosphorus"],
  s: ["sulfur", "sulphur"], cl: ["chlorine"], ar: ["argon"], k: ["potassium"], ca: ["calcium"], sc: ["scandium"], ti: ["titanium"],
  v: ["vanadium"], cr: ["chromium"], mn: ["manganese"], fe: ["iron"], co: ["cobalt"], ni: ["nickel"], cu: ["copper"], zn: ["zinc"],
  ga: ["gallium"], ge: ["germanium"], as: ["arsenic"], se: ["selenium"], br: ["bromine"], kr: ["krypton"], rb: ["rubidium"],
  sr: ["strontium"], y: ["yttrium"], zr: ["zirconium"], nb: ["niobium"], mo: ["molybdenum"], tc: ["technetium"], ru: ["ruthenium"],
  rh: ["rhodium"], pd: ["palladium"], ag: ["silver"], cd: ["cadmium"], in: ["indium"], sn: ["tin"], sb: ["antimony"], te: ["tellurium"],
  i: ["iodine"], xe: ["xenon"], cs: ["caesium", "cesium"], ba: ["barium"], la: ["lanthanum"], ce: ["cerium"], pr: ["praseodymium"],
  nd: ["neodymium"], pm: ["promethium"], sm: ["samarium"], eu: ["europium"], gd: ["gadolinium"], tb: ["terbium"], dy: ["dysprosium"],
  ho: ["holmium"], er: ["erbium"], tm: ["thulium"], yb: ["ytterbium"], lu: ["lutetium"], hf: ["hafnium"], ta: ["tantalum"],
  w: ["tungsten", "wolfram"], re: ["rhenium"], os: ["osmium"], ir: ["iridium"], pt: ["platinum"], au: ["gold"], hg: ["mercury"],
  tl: ["thallium"], pb: ["lead"], bi: ["bismuth"], po: ["polonium"], at: ["astatine"], rn: ["radon"], fr: ["francium"], ra: ["radium"],
  ac: ["actinium"], th: ["thorium"], pa: ["protactinium"], u: ["uranium"], np: ["neptunium"], pu: ["plutonium"], am: ["americium"],
  cm: ["curium"], bk: ["berkelium"], cf: ["californium"], es: ["einsteinium"], fm: ["fermium"], md: ["mendelevium"], no: ["nobelium"],
  lr: ["lawrencium"], rf: ["rutherfordium"], db: ["dubnium"], sg: ["seaborgium"], bh: ["bohrium"], hs: ["hassium"], mt: ["meitnerium"],
  ds: ["darmstadtium"], rg: ["roentgenium"], cn: ["copernicium"], nh: ["nihonium"], fl: ["flerovium"], mc: ["moscovium"],
  lv: ["livermorium"], ts: ["tennessine"], og: ["oganesson"],
};

/**
 * Phrases a reader writes in two words (or with a dash), joined into the
 * one token the finder knows; matched on the lower-cased query, whole words only.
 */
export const PHRASES: readonly (readonly [RegExp, string])[] = [
  [/(?<![\p{L}\d])sigma[\s-]*plus(?![\p{L}\d])/gu, "σ+"],
  [/(?<![\p{L}\d])sigma[\s-]*minus(?![\p{L}\d])/gu, "σ-"],
  [/(?<![\p{L}\d])field[\s-]+(insensitive|independent)(?![\p{L}\d])/gu, "field-$1"],
  [/(?<![\p{L}\d])two[\s-]+photon(?![\p{L}\d])/gu, "two-photon"],
  [/(?<![\p{L}\d])radio[\s-]+frequency(?![\p{L}\d])/gu, "radio-frequency"],
  [/(?<![\p{L}\d])(?:delta|δ)[\s_]*m(?![\p{L}\d])\s*=?\s*/gu, "dm="],
  [/(?<![\p{L}\d])magic[\s-]+fields?(?![\p{L}\d])/gu, "magic"],
  [/(?<![\p{L}\d])clock[\s-]+transitions?(?![\p{L}\d])/gu, "clock"],
  [/(?<![\p{L}\d])0\s*[–-]\s*0(?![\p{L}\d])/gu, "0-0"],
  // multipoles by name, to the line's multipole token (lines index theirs as "e2", "m2", "e3")
  [/(?<![\p{L}\d])electric[\s-]+quadrupole(?![\p{L}\d])/gu, "e2"],
  [/(?<![\p{L}\d])magnetic[\s-]+quadrupole(?![\p{L}\d])/gu, "m2"],
  [/(?<![\p{L}\d])(?:electric[\s-]+)?octupole(?![\p{L}\d])/gu, "e3"],
];

/**
 * Polarization words and the Δm (= m_upper − m_lower) they name; "σ" and
 * "sigma" alone name both signs (common practice: σ± for |Δm| = 1, π for
 * Δm = 0).
 */
export const POLARIZATION_WORDS: Readonly<Record<string, readonly number[]>> = {
  "π": [0], pi: [0],
  "σ+": [1], "sigma+": [1], "σ-": [-1], "sigma-": [-1],
  "σ": [1, -1], sigma: [1, -1], "σ±": [1, -1], "sigma±": [1, -1],
};

/**
 * Words for transitions between the sublevels of one level, each with what
 * it selects (common practice):
 *  - clock: the field-insensitive 0–0 transitions, mF = 0 ↔ mF = 0 between hyperfine levels;
 *  - magic: transitions that are field-insensitive at a non-zero field (the "magic" fields);
 *  - insensitive: transitions with any field-insensitive point, B = 0 included;
 *  - two-photon: the two-photon transitions (ΔmF = ±2);
 *  - microwave: transitions between different hyperfine levels F;
 *  - any: every sublevel transition ("rf" names the whole table, as its anchors do).
 */
export type TransitionWord = "clock" | "magic" | "insensitive" | "two-photon" | "microwave" | "any";

export const TRANSITION_WORDS: Readonly<Record<string, TransitionWord>> = {
  clock: "clock", "0-0": "clock",
  magic: "magic",
  "field-insensitive": "insensitive", insensitive: "insensitive", "field-independent": "insensitive",
  "two-photon": "two-photon", "2-photon": "two-photon", twophoton: "two-photon",
  microwave: "microwave", mw: "microwave",
  rf: "any", "radio-frequency": "any", radiofrequency: "any", transition: "any", transitions: "any",
};

/** Words that keep a search to one kind of entry ("Rb D line": the lines of Rb whose id starts with D). */
export const KIND_WORDS: Readonly<Record<string, "species" | "level" | "line" | "constant">> = {
  line: "line", lines: "line", level: "level", levels: "level", constant: "constant", constants: "constant",
};

/** Words naming a level as the lowest of its species. */
export const GROUND_WORDS: readonly string[] = ["ground"];

/** Script digits and marks of term symbols and signs, folded to plain text. */
export const SCRIPT_DIGITS: Readonly<Record<string, string>> = {
  "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9",
  "₀": "0", "₁": "1", "₂": "2", "₃": "3", "₄": "4", "₅": "5", "₆": "6", "₇": "7", "₈": "8", "₉": "9",
  "⁺": "+", "₊": "+", "⁻": "-", "₋": "-", "\u2212": "-", "⁄": "/", "½": "1/2", "°": "o",
};

/**
 * Field units as a reader types them, lower case, to the unit of the unit
 * table (src/physics/unitTable.ts): "t", "mt", "g", "mg", "kg", "µt", "ut".
 * "G" for gauss and "mG" for milligauss keep their meaning in lower case
 * because no other field unit is spelled alike.
 */
export const FIELD_UNITS: Readonly<Record<string, string>> = Object.fromEntries([
  ...Object.keys(UNITS)
    .filter((u) => UNITS[u]!.kind === "field")
    .map((u) => [u.toLowerCase(), u]),
  ["μt", "µT"],
  ["gauss", "G"],
  ["tesla", "T"],
]);

/** The element symbol of a species label ("87Rb" → "rb", "40Ca+" → "ca", "Fe I" → "fe"), or null. */
export function elementOf(label: string): string | null {
  for (const m of label.matchAll(/[A-Z][a-z]?/g)) {
    const s = m[0].toLowerCase();
    if (ELEMENT_NAMES[s]) return s;
  }
  return null;
}
