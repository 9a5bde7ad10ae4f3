/**
 * One species file → SpeciesInput. Every problem goes to the file's sink;
 * the species is returned only when the file has none.
 */
import { isMap, isScalar, type Node, type YAMLMap, type YAMLSeq } from "yaml";
import { formatDoubled, parseDoubled } from "../physics/quantum.js";
import { didYouMean, nearest } from "./didYouMean.js";
import { ITEM_ID, ITEM_ID_HINT, SPECIES_ID, SPECIES_ID_HINT, pageSlug, suggestSpeciesId } from "./ids.js";
import type { Place } from "./inputError.js";
import { MULTIPOLES, multipoleRuleBreak } from "./lineRules.js";
import type { HyperfineInput, LevelInput, LineInput, Measured, Multipole, NucleusInput, Quantity, SpeciesInput } from "./model.js";
import { airToVacuum, inAirFormulaRange, vacuumToAir } from "../physics/airWavelength.js";
import type { Dec } from "../physics/decimal.js";
import { MOMENT_UNITS, parseMeasured, parseQuantity, type UnitTable } from "./numberText.js";
import type { Parsed } from "./parsed.js";
import { parseLS, parseTermSymbol, type CouplingInput } from "./termSymbol.js";
import type { UnitKind } from "../physics/units.js";
import { describe, MapReader, scalarText, type TextAt, type YamlSource } from "./yamlExact.js";

export const SPECIES_KEYS = ["id", "label", "mass", "nucleus", "notes", "levels", "lines"] as const;
export const NUCLEUS_KEYS = ["spin", "gI", "moment", "source"] as const;
export const LEVEL_KEYS = ["id", "config", "term", "coupling", "gJ", "hyperfine", "energy", "source", "notes"] as const;
export const COUPLING_KEYS = ["scheme", "core", "l"] as const;
export const COUPLING_SCHEMES = ["jK", "jj"] as const;
export const HYPERFINE_KEYS = ["A", "B"] as const;
export const LINE_KEYS = ["id", "upper", "lower", "wavelength", "medium", "multipole", "source", "notes"] as const;
export const MEDIA = ["vacuum", "air"] as const;

/** What a species file yields: the species if valid, and its id (for cross-file checks) if readable. */
export interface SpeciesRead {
  species: SpeciesInput | null;
  id: TextAt | null;
}

type NucleusState = { kind: "absent" } | { kind: "invalid" } | { kind: "ok"; nucleus: NucleusInput };

class SpeciesReader {
  /** Every level id written, valid or not, so a line naming a broken level is not reported twice. */
  private readonly writtenLevelIds = new Set<string>();
  /** Where each valid level's term is written, for problems about its J. */
  private readonly termAt = new Map<string, Place>();
  /** Whether the species' J values are integer (2J even); null until the levels are read or when they disagree evenly. */
  private jIntegral: boolean | null = null;

  constructor(
    private readonly src: YamlSource,
    /** Display path, used in SourcePos. */
    private readonly shownFile: string,
  ) {}

  private add(at: Place, message: string, hint = ""): void {
    this.src.sink.add(at, message, hint);
  }

  private report<T>(r: Parsed<T>, at: Place, prefix: string): T | null {
    if (r.ok) return r.value;
    this.add(at, `${prefix}: ${r.message}`, r.hint);
    return null;
  }

  measured(t: TextAt | null, what: string): Measured | null {
    return t ? this.report(parseMeasured(t.text), t.at, what) : null;
  }

  quantity(t: TextAt | null, kind: UnitKind | UnitTable, what: string): Quantity | null {
    return t ? this.report(parseQuantity(t.text, kind, what), t.at, what) : null;
  }

  positive(q: Quantity | null, t: TextAt | null, what: string, hint: string): Quantity | null {
    if (q && t && (q.value.isZero() || q.value.isNegative())) {
      this.add(t.at, `${what} ${t.text} is not positive`, hint);
      return null;
    }
    return q;
  }

  read(relFile: string): SpeciesRead {
    const { src } = this;
    const root = src.root;
    if (root === null || root === undefined) {
      this.add({ line: 1, column: 1 }, "file is empty", "a species file is a map with at least id, label and levels");
      return { species: null, id: null };
    }
    if (!isMap(root)) {
      this.add(src.place(root), `a species file must be a map (key: value lines), not ${describe(root)}`, "start the file with lines such as 'id: rb87' and 'label: \"87Rb\"'");
      return { species: null, id: null };
    }
    const before = src.sink.count;
    const top = new MapReader(src, root, "species file", SPECIES_KEYS);
    const idText = top.text("id", true, "add 'id: <lower-case id>', e.g. id: rb87");
    let idOk: TextAt | null = null;
    if (idText) {
      if (SPECIES_ID.test(idText.text)) idOk = idText;
      else this.add(idText.at, `species id "${idText.text}" has characters that are not allowed`, `${SPECIES_ID_HINT}; perhaps "${suggestSpeciesId(idText.text)}"`);
    }
    const label = top.nonEmpty("label", true, 'add a display name, e.g. label: "87Rb"');
    const notes = top.nonEmpty("notes", false);
    const massText = top.text("mass", false, 'e.g. mass: "86.909180531 u"');
    const mass = this.positive(this.quantity(massText, "mass", "mass"), massText, "mass", "an atomic mass is positive, e.g. 86.909180531 u");
    const nucleus = this.nucleus(top);
    const levels = this.levels(top, nucleus);
    const lines = this.lines(top, levels);
    if (src.sink.count > before || !idOk || !label || !levels) return { species: null, id: idOk };
    return {
      id: idOk,
      species: {
        id: idOk.text,
        label: label.text,
        mass,
        nucleus: nucleus.kind === "ok" ? nucleus.nucleus : null,
        levels: [...levels.values()],
        lines,
        notes: notes?.text ?? null,
        file: relFile,
      },
    };
  }

  nucleus(top: MapReader): NucleusState {
    const node = top.map_("nucleus", false, "nucleus is a map with spin and gI (or moment), e.g. nucleus: { spin: 3/2, gI: \"-0.0009951414(10)\" }");
    if (!node) return top.has("nucleus") ? { kind: "invalid" } : { kind: "absent" };
    const before = this.src.sink.count;
    const r = new MapReader(this.src, node, "nucleus", NUCLEUS_KEYS);
    const spinText = r.text("spin", true, "add the nuclear spin I, e.g. spin: 3/2");
    let I2: number | null = null;
    if (spinText) {
      try {
        I2 = parseDoubled(spinText.text);
      } catch {
        const half = /^\d+\.5$/.test(spinText.text) ? ` (here ${Number(spinText.text.split(".")[0]) * 2 + 1}/2)` : "";
        this.add(spinText.at, `nuclear spin "${spinText.text}" is not an integer or half-integer`, `write it as 0, 1, 2, ... or 1/2, 3/2, ...${half}`);
      }
      if (I2 !== null && I2 < 0) {
        this.add(spinText.at, `nuclear spin ${spinText.text} is negative`, "a spin is 0 or positive, e.g. 3/2");
        I2 = null;
      }
    }
    const gIText = r.text("gI", false, 'e.g. gI: "-0.0009951414(10)"');
    const momentText = r.text("moment", false, 'e.g. moment: "+2.751818 muN"');
    const gI = this.measured(gIText, "gI");
    const momentQ = this.quantity(momentText, MOMENT_UNITS, "moment");
    const moment: Measured | null = momentQ ? { value: momentQ.value, uncertainty: momentQ.uncertainty, text: momentQ.text } : null;
    if (gIText && momentText) {
      this.add(momentText.at, "nucleus gives both gI and moment", "give exactly one of them: gI (Bohr magnetons) or moment (nuclear magnetons)");
    } else if (!gIText && !momentText && I2 !== null && I2 > 0) {
      this.add(r.at, "nucleus with non-zero spin has neither gI nor moment", 'add gI (Bohr magnetons, e.g. gI: "-0.0009951414(10)") or moment (e.g. moment: "+2.751818 muN")');
    }
    const source = r.nonEmpty("source", false);
    if (this.src.sink.count > before || I2 === null) return { kind: "invalid" };
    return { kind: "ok", nucleus: { I2, gI, moment, source: source?.text ?? null } };
  }

  levels(top: MapReader, nucleus: NucleusState): Map<string, LevelInput> | null {
    const seq = top.seq("levels", true, "levels is a list; each level starts with '- id: ...'");
    if (!seq) return null;
    if (seq.items.length === 0) {
      this.add(this.src.place(seq), "levels is empty", "list at least one level, each starting with '- id: ...'");
      return null;
    }
    const levels = this.uniqueItems(seq, "level", "id, config, term, source, ...", (item) => this.level(item, nucleus));
    this.checkJKinds(levels);
    return new Map(levels.map((l) => [l.id, l]));
  }

  /**
   * One atom or ion has only integer J (even number of electrons) or only
   * half-integer J (odd number). The kind most levels have is taken as the
   * species' own (the first level's on a tie); every level of the other
   * kind is reported at its term.
   */
  private checkJKinds(levels: LevelInput[]): void {
    if (levels.length === 0) return;
    const integral = (l: LevelInput) => l.term.J2 % 2 === 0;
    const nInt = levels.filter(integral).length;
    const nHalf = levels.length - nInt;
    const kind = nInt === nHalf ? integral(levels[0]!) : nInt > nHalf;
    this.jIntegral = kind;
    const first = levels.find((l) => integral(l) === kind)!;
    for (const l of levels) {
      if (integral(l) === kind) continue;
      this.add(
        this.termAt.get(l.id) ?? l.pos,
        `level "${l.id}" has ${jKind(l.term.J2)} J = ${formatDoubled(l.term.J2)}, but the other levels of this species have ${kind ? "integer" : "half-integer"} J (first: "${first.id}", line ${first.pos.line})`,
        "one atom or ion has only integer or only half-integer J (even or odd number of electrons); check the term, or move the level to the file of its own species (e.g. the ion)",
      );
    }
  }

  /**
   * The items of a levels or lines list, each read with `read`, in file
   * order. An item that is not a map, or whose id an earlier item already
   * has, is reported and left out.
   */
  private uniqueItems<T extends { id: string; pos: Place }>(seq: YAMLSeq, kind: "level" | "line", keys: string, read: (item: YAMLMap) => T | null): T[] {
    const out: T[] = [];
    const firstAt = new Map<string, Place>();
    const slugOwner = new Map<string, { id: string; at: Place }>();
    for (const item of seq.items as (Node | null)[]) {
      if (!isMap(item)) {
        this.add(this.src.place(item ?? seq), `each ${kind} must be a map (${keys}), not ${describe(item)}`, `start each ${kind} with '- id: ...' and indent its other keys under it`);
        continue;
      }
      const x = read(item);
      if (!x) continue;
      const prev = firstAt.get(x.id);
      if (prev) {
        this.add({ line: x.pos.line, column: x.pos.column }, `${kind} id "${x.id}" is used twice`, `the first is on line ${prev.line}; give each ${kind} its own id`);
        continue;
      }
      const other = slugOwner.get(pageSlug(x.id));
      if (other) {
        this.add({ line: x.pos.line, column: x.pos.column }, `${kind} ids "${other.id}" and "${x.id}" give the same page name "${pageSlug(x.id)}"`, `"/" and "_" both become "_" in page names; the other is on line ${other.at.line}; rename one of them`);
        continue;
      }
      firstAt.set(x.id, { line: x.pos.line, column: x.pos.column });
      slugOwner.set(pageSlug(x.id), { id: x.id, at: { line: x.pos.line, column: x.pos.column } });
      out.push(x);
    }
    return out;
  }

  level(node: YAMLMap, nucleus: NucleusState): LevelInput | null {
    const before = this.src.sink.count;
    const r = new MapReader(this.src, node, "level", LEVEL_KEYS);
    const id = r.text("id", true, "add an id, e.g. id: 5s-S1/2");
    if (id) this.writtenLevelIds.add(id.text);
    if (id && !ITEM_ID.test(id.text)) this.add(id.at, `level id "${id.text}" has characters that are not allowed`, ITEM_ID_HINT);
    const config = r.nonEmpty("config", true, "add the electron configuration, e.g. config: 5s");
    const termText = r.text("term", true, "add the LS term, e.g. term: 2S1/2 (or a jK or jj term with the level's coupling: 2[3/2]o2, (3/2,1/2)1)");
    const coupling = this.coupling(r);
    const term = termText && coupling !== "invalid" ? this.report(parseTermSymbol(termText.text, coupling), termText.at, "term") : null;
    const gJ = this.measured(r.text("gJ", false), "gJ");
    const energy = this.quantity(r.text("energy", false), "frequency", "energy");
    const source = r.nonEmpty("source", true, 'name where the values come from, e.g. source: "handbook table 3"');
    const notes = r.nonEmpty("notes", false);
    const hyperfine = this.hyperfine(r, nucleus, term?.J2 ?? null);
    if (this.src.sink.count > before || !id || !config || !term || !source) return null;
    if (termText) this.termAt.set(id.text, termText.at);
    const at = id ? id.at : r.at;
    return {
      id: id.text,
      config: config.text,
      term,
      gJ,
      hyperfine,
      energy,
      source: source.text,
      notes: notes?.text ?? null,
      pos: { file: this.shownFile, line: at.line, column: at.column },
    };
  }

  /**
   * A level's coupling (for jK and jj terms): null when absent, "invalid"
   * when written but wrong (already reported).
   */
  coupling(level: MapReader): CouplingInput | null | "invalid" {
    const node = level.map_("coupling", false, 'coupling is a map, e.g. coupling: { scheme: jK, core: "2Po3/2", l: 0 } or { scheme: jj, l: [1, 1] }');
    if (!node) return level.has("coupling") ? "invalid" : null;
    const before = this.src.sink.count;
    const r = new MapReader(this.src, node, "coupling", COUPLING_KEYS);
    const schemeText = r.text("scheme", true, "add scheme: jK (pair coupling) or scheme: jj");
    const scheme = schemeText ? COUPLING_SCHEMES.find((x) => x === schemeText.text) : undefined;
    if (schemeText && !scheme) {
      const guess = didYouMean(schemeText.text, COUPLING_SCHEMES);
      this.add(schemeText.at, `unknown coupling scheme "${schemeText.text}"`, `${guess ? `did you mean ${guess}? ` : ""}scheme is jK (pair coupling) or jj; an LS term takes no coupling`);
    }
    const orbital = (t: TextAt): number | null => {
      if (/^\d{1,2}$/.test(t.text)) return Number(t.text);
      this.add(t.at, `l = "${t.text}" in coupling is not an orbital quantum number`, "l is 0 (s), 1 (p), 2 (d), 3 (f), ...");
      return null;
    };
    if (scheme === "jK") {
      const coreText = r.text("core", true, 'add the parent term of the core, e.g. core: "2Po3/2"');
      const core = coreText ? this.report(parseLS(coreText.text.trim()), coreText.at, "coupling core") : null;
      const lText = r.text("l", true, "add the outer electron's l, e.g. l: 0 for an s electron");
      const l = lText ? orbital(lText) : null;
      if (this.src.sink.count > before || !core || l === null) return "invalid";
      return { scheme, core, l };
    }
    if (scheme === "jj") {
      const coreText = r.text("core", false);
      if (coreText) this.add(coreText.at, "coupling with scheme jj has a core", "a jj term (j1,j2)J couples two electrons; give their l as l: [l1, l2] and leave core out");
      const seq = r.seq("l", true, "add the two electrons' l, e.g. l: [1, 1]");
      const ls: number[] = [];
      if (seq) {
        if (seq.items.length !== 2) this.add(this.src.place(seq), `l in a jj coupling lists ${seq.items.length} values`, "list the two electrons' l, e.g. l: [1, 1]");
        for (const item of seq.items as (Node | null)[]) {
          const text = isScalar(item) ? scalarText(item) : null;
          if (text === null) this.add(this.src.place(item ?? seq), `l in coupling must list numbers, not ${describe(item)}`, "e.g. l: [1, 1]");
          else {
            const v = orbital({ text, at: this.src.place(item) });
            if (v !== null) ls.push(v);
          }
        }
      }
      if (this.src.sink.count > before || ls.length !== 2) return "invalid";
      return { scheme, l: [ls[0]!, ls[1]!] };
    }
    return "invalid";
  }

  hyperfine(level: MapReader, nucleus: NucleusState, J2: number | null): HyperfineInput | null {
    const node = level.map_("hyperfine", false, 'hyperfine is a map, e.g. hyperfine: { A: "3417.341305452145 MHz", B: "0 MHz" }');
    if (!node) return null;
    const r = new MapReader(this.src, node, "hyperfine", HYPERFINE_KEYS);
    const A = this.quantity(r.text("A", true, 'add the magnetic-dipole constant, e.g. A: "84.7185 MHz"'), "frequency", "hyperfine A");
    const BText = r.text("B", false);
    const B = this.quantity(BText, "frequency", "hyperfine B");
    if (nucleus.kind === "absent") {
      this.add(r.at, "level has hyperfine constants but the species has no nucleus", "add 'nucleus:' with spin and gI, or remove hyperfine");
    } else if (nucleus.kind === "ok" && nucleus.nucleus.I2 === 0) {
      this.add(r.at, "level has hyperfine constants but the nuclear spin is 0", "a spin-0 nucleus gives no hyperfine structure; remove hyperfine or correct the spin");
    } else if (nucleus.kind === "ok" && B && BText && !B.value.isZero()) {
      const I2 = nucleus.nucleus.I2;
      if (I2 < 2) this.add(BText.at, `hyperfine B is not zero but the nuclear spin is ${I2}/2`, "an electric-quadrupole constant needs I ≥ 1; set B to 0 or remove it");
      else if (J2 !== null && J2 < 2) this.add(BText.at, `hyperfine B is not zero but the level has J = ${J2 === 0 ? "0" : "1/2"}`, "an electric-quadrupole constant needs J ≥ 1; set B to 0 or remove it");
    }
    return A ? { A, B } : null;
  }

  lines(top: MapReader, levels: Map<string, LevelInput> | null): LineInput[] {
    const seq = top.seq("lines", false, "lines is a list; each line starts with '- id: ...'");
    if (!seq) return [];
    return this.uniqueItems(seq, "line", "id, upper, lower, ...", (item) => this.line(item, levels));
  }

  levelRef(t: TextAt | null, levels: Map<string, LevelInput> | null, role: string): LevelInput | null {
    if (!t || !levels) return null;
    const level = levels.get(t.text);
    if (level) return level;
    // A level that exists but failed validation was already reported; do not add noise.
    if (this.writtenLevelIds.has(t.text)) return null;
    const ids = [...this.writtenLevelIds];
    this.add(t.at, `${role} level "${t.text}" is not a level of this species`, `level ids nearby: ${nearest(t.text, ids).join(", ")}`);
    return null;
  }

  line(node: YAMLMap, levels: Map<string, LevelInput> | null): LineInput | null {
    const before = this.src.sink.count;
    const r = new MapReader(this.src, node, "line", LINE_KEYS);
    const id = r.text("id", true, "add an id, e.g. id: D2");
    if (id && !ITEM_ID.test(id.text)) this.add(id.at, `line id "${id.text}" has characters that are not allowed`, ITEM_ID_HINT);
    const upperText = r.text("upper", true, "add the id of the upper level, e.g. upper: 5p-P3/2");
    const lowerText = r.text("lower", true, "add the id of the lower level, e.g. lower: 5s-S1/2");
    const wlText = r.text("wavelength", false);
    const given = this.positive(this.quantity(wlText, "length", "wavelength"), wlText, "wavelength", "a wavelength is positive, e.g. 780.241209686 nm");
    const mediumText = r.text("medium", false);
    let medium: LineInput["medium"] = "vacuum";
    if (mediumText) {
      const m = MEDIA.find((x) => x === mediumText.text);
      if (m) medium = m;
      else {
        const guess = didYouMean(mediumText.text, MEDIA);
        this.add(mediumText.at, `unknown medium "${mediumText.text}"`, `${guess ? `did you mean ${guess}? ` : ""}medium is vacuum (when left out) or air (standard air, 15 °C, 101 325 Pa)`);
      }
      if (!wlText) this.add(mediumText.at, `medium: ${mediumText.text} without a wavelength`, "give the wavelength, e.g. wavelength: \"630.2494 nm\", or leave medium out");
    }
    if (given && wlText && medium === "air" && !inAirFormulaRange(given.si)) {
      this.add(wlText.at, `air wavelength ${wlText.text} is outside the range of the air formula (200 nm to 2 µm)`, "give the vacuum wavelength and leave medium out (or write medium: vacuum)");
    }
    const { wavelength, airWavelength } = bothMedia(given, medium);
    const mpText = r.text("multipole", false);
    let multipole: Multipole = "E1";
    if (mpText) {
      const m = MULTIPOLES.find((x) => x === mpText.text);
      if (m) multipole = m;
      else {
        const guess = didYouMean(mpText.text, MULTIPOLES);
        this.add(mpText.at, `unknown multipole "${mpText.text}"`, `${guess ? `did you mean ${guess}? ` : ""}multipole is one of ${MULTIPOLES.join(", ")} (E1 when left out)`);
      }
    }
    const source = r.nonEmpty("source", false);
    const notes = r.nonEmpty("notes", false);
    if (upperText && lowerText && upperText.text === lowerText.text) {
      this.add(lowerText.at, `line connects level "${upperText.text}" to itself`, "upper and lower must be two different levels");
    } else {
      const upper = this.levelRef(upperText, levels, "upper");
      const lower = this.levelRef(lowerText, levels, "lower");
      if (upper && lower && this.src.sink.count === before && (upper.term.J2 - lower.term.J2) % 2 !== 0) {
        // the level of the species' minority kind is the one to look at; on an even split, the upper
        const odd = this.jIntegral === null || (upper.term.J2 % 2 === 0) !== this.jIntegral ? upperText! : lowerText!;
        this.add(
          odd.at,
          `line${id ? ` ${id.text}` : ""}: upper level "${upper.id}" has ${jKind(upper.term.J2)} J = ${formatDoubled(upper.term.J2)} and lower level "${lower.id}" ${jKind(lower.term.J2)} J = ${formatDoubled(lower.term.J2)}`,
          "no photon joins integer and half-integer J: both levels of a line belong to one atom or ion; check the upper and lower ids and the terms",
        );
      } else if (upper && lower && this.src.sink.count === before) {
        const broken = multipoleRuleBreak(multipole, upper.term, lower.term);
        if (broken) this.add(mpText?.at ?? (id ? id.at : r.at), `line ${id?.text ?? ""}: ${broken.message}`, broken.hint);
      }
    }
    if (this.src.sink.count > before || !id || !upperText || !lowerText) return null;
    return {
      id: id.text,
      upper: upperText.text,
      lower: lowerText.text,
      wavelength,
      medium,
      airWavelength,
      multipole,
      source: source?.text ?? null,
      notes: notes?.text ?? null,
      pos: { file: this.shownFile, line: id.at.line, column: id.at.column },
    };
  }
}

/**
 * The vacuum and the standard-air wavelength of a line from the one given
 * (physics/airWavelength.ts). The converted one is written in the given
 * unit to as many significant digits as the given one (at most 10; the air
 * formula itself holds to about 1e-8 in n); its si value keeps every digit.
 * No air wavelength outside the formula's range.
 */
function bothMedia(given: Quantity | null, medium: LineInput["medium"]): { wavelength: Quantity | null; airWavelength: Quantity | null } {
  if (!given) return { wavelength: null, airWavelength: null };
  if (medium === "air") {
    if (!inAirFormulaRange(given.si)) return { wavelength: null, airWavelength: null };
    return { wavelength: converted(given, airToVacuum(given.si)), airWavelength: given };
  }
  return { wavelength: given, airWavelength: inAirFormulaRange(given.si) ? converted(given, vacuumToAir(given.si)) : null };
}

function converted(given: Quantity, si: Dec): Quantity {
  const mantissa = (/^[+-]?([\d.]+)/.exec(given.text.trim())?.[1] ?? "").replace(".", "").replace(/^0+/, "");
  const digits = Math.min(10, Math.max(1, mantissa.length));
  const value = si.mul(given.value).div(given.si);
  const shown = value.toSignificantDigits(digits);
  const uncertainty = given.uncertainty === null ? null : given.uncertainty.mul(value).div(given.value);
  const siUncertainty = given.siUncertainty === null ? null : given.siUncertainty.mul(si).div(given.si);
  return { value, uncertainty, text: `${shown.toFixed(Math.max(0, digits - 1 - shown.e))} ${given.unit}`, unit: given.unit, si, siUncertainty };
}

function jKind(J2: number): string {
  return J2 % 2 === 0 ? "integer" : "half-integer";
}

/**
 * Validate a parsed species file. `relFile` is its path relative to the data
 * folder (kept in SpeciesInput.file); positions use the sink's display path.
 */
export function readSpeciesFile(src: YamlSource, relFile: string): SpeciesRead {
  return new SpeciesReader(src, src.sink.file).read(relFile);
}
