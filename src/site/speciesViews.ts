/**
 * The page view models of one species: an overview, one page per level with
 * hyperfine structure, one page per line, and (only for a line whose page
 * would be too large) one page per line and bias field. Each holds plain
 * rows (tables, sentences, SVG text) and links; templates read nothing else.
 *
 * What goes where: the overview answers first (at a glance, then the linear
 * tables, the line patterns and the energies at the bias fields); the level
 * and line pages hold what is large (plots, transitions, components at
 * every field). Row ids keep the form they had when everything was on one
 * page, so the overview's forwarding map (forwarding.ts) can send an old
 * link on to the page that now holds its row.
 */
import { lineCouplingNote } from "./couplingNote.js";
import { exportText, type Dec } from "../physics/decimal.js";
import { pageSlug } from "../data/ids.js";
import { formatDoubled } from "../physics/quantum.js";
import type { SpeciesFieldResult } from "../results/computeFields.js";
import type { ConfiguredField, LevelFieldResult, LineAtFieldResult } from "../results/fieldTypes.js";
import type { LevelResult, LineResult, SpeciesResult } from "../results/types.js";
import {
  levelAnchor,
  levelFieldSectionAnchor,
  levelShiftsAnchor,
  lineAnchor,
  lineAtFieldAnchor,
  lineComponentsAnchor,
  lineFieldsAnchor,
  termAnchor,
} from "./anchors.js";
import {
  atFieldPlot,
  atFieldTable,
  energiesTable,
  hyperfineComponentsTable,
  hyperfineGroupsTable,
  levelPlots,
  lineModelText,
  modelBasis,
  solverFact,
  termFacts,
  termTable,
  transitionsTable,
  validityFacts,
} from "./fieldTables.js";
import { formatNumber, partsText, writtenParts, formatUncertain } from "./format.js";
import {
  componentsTable,
  glanceTable,
  hyperfineIntervals,
  hyperfineSublevelsTable,
  hyperfineTable,
  levelsTable,
  linesTable,
  mJTable,
  safeFile,
  SHOWN_DIGITS,
  type TableHome,
} from "./linearTables.js";
import { exportPath, levelPagePath, lineFieldPagePath, linePagePath, sheetPath, speciesPath, termPagePath } from "./pageUrls.js";
import { patternSketchSvg } from "./plots/patternSketch.js";
import { lockView, type LockView } from "./lockTables.js";
import { lorentzWavelengthText, wavelengthSplitTable, wavelengthsText } from "./wavelengthSplitting.js";
import { lineDlambdaSectionAnchor } from "./anchors.js";
import { termParts, type Cell, type Table, type TermParts } from "./table.js";
import { observerView, type ObserverView } from "./observerView.js";

/** One step of the breadcrumb trail; the last has no link. */
export interface Crumb {
  text: string;
  href: string | null;
}

interface PageCommon {
  /** Page folder relative to the site root ("species/rb87/level/5s-S1_2/"). */
  path: string;
  title: string;
  crumbs: Crumb[];
  speciesId: string;
  speciesLabel: string;
}

export interface OverviewView extends PageCommon {
  kind: "overview";
  facts: { label: string; value: string }[];
  notes: string | null;
  exportUrl: string;
  sheetUrl: string;
  glance: Table;
  intervals: { levelId: string; items: { F: string; Fp: string; mhz: Cell }[] }[];
  /** couplingNote: intermediate coupling of a level of the line (the pattern then describes the coupling limit), or null. */
  patterns: { lineId: string; url: string; pattern: string; gEff: string; sketch: string; sketchShown: boolean; summary: string; couplingNote: string | null }[];
  levels: Table;
  shiftSections: { anchor: string; termParts: TermParts; title: string; levelUrl: string | null; tables: Table[] }[];
  lines: Table;
  fieldsText: string[];
  /** Energies per level; a level without a page of its own keeps its field section's anchor here. */
  /** Per level: its energies at the bias fields, and which solver gave them (fieldTables.ts solverFact). */
  energies: { levelId: string; levelUrl: string | null; sectionAnchor: string | null; solver: string; table: Table | null }[];
  /** Fine-structure terms; the states table is on the term's own page (url) when the overview is compacted (3). */
  terms: { anchor: string; key: string; facts: string[]; table: Table | null; url: string | null }[];
  lineLinks: { lineId: string; url: string; summary: string }[];
}

export interface LevelView extends PageCommon {
  kind: "level";
  levelId: string;
  termParts: TermParts;
  anchor: string;
  /**
   * Position of the level in the species (1-based). The one-page layout named the plot switch's
   * controls by it (axis-label-3); they are named by the level id now, and the overview's
   * forwarding map sends the old names on (speciesBuild.ts, axisAliases).
   */
  axisIndex: number;
  facts: string[];
  /** The linear shift tables the overview leaves to the level page: (F, mF) from OverviewCompaction 2, mJ and F from 5. */
  sublevelShifts: Table[];
  energies: Table;
  plots: { linear: string; log: string } | null;
  transitions: Table | null;
  /** Where the transitions are when they have a page of their own (the level page would be too large). */
  transitionsUrl: string | null;
}

export interface TransitionsView extends PageCommon {
  kind: "transitions";
  levelId: string;
  levelUrl: string;
  termParts: TermParts;
  /** Null when the transitions are on pages per lower F (parts). */
  transitions: Table | null;
  parts: { text: string; url: string }[];
  /** Doubled lower F of a page per lower F; null for the page of all. */
  lowerF2: number | null;
}

export interface AtFieldView {
  anchor: string;
  fieldText: string;
  heading: string;
  regime: string;
  model: string;
  /** The basis of the model, for the heading (fieldTables.ts modelBasis). */
  basis: string;
  /** Which solver each level's states come from, the reduced elements, what is left out, how gJ enters (empty for the linear pattern). */
  modelText: string;
  plot: string;
  /** Null where the components sit at their linear shifts and the line has no wavelength (the J-resolved table says it all). */
  table: Table | null;
  /** The components sit at their linear shifts (J-resolved linear pattern). */
  linear: boolean;
}

export interface LineView extends PageCommon {
  kind: "line";
  lineId: string;
  heading: string;
  pattern: string | null;
  /** Intermediate coupling of a level of the line: the pattern describes the coupling limit, not the atom (null when neither level is marked). */
  couplingNote: string | null;
  summary: string;
  components: Table;
  componentsAnchor: string;
  fieldsAnchor: string;
  hyperfine: Table | null;
  hyperfineComponents: Table | null;
  /** Saturated-absorption lock points with the reference choice; null without hyperfine groups or without a wavelength. */
  lock: LockView | null;
  /** Vacuum and air wavelengths in words (under the heading); null without a wavelength. */
  wavelengths: string | null;
  /** The Zeeman splitting in wavelength: a sentence and a table per bias field; null without a wavelength. */
  wavelengthSplit: { anchor: string; text: string; table: Table } | null;
  /** The line at each bias field, on this page; or null when they have pages of their own (fieldLinks). */
  atFields: AtFieldView[] | null;
  fieldLinks: { text: string; url: string; regime: string; model: string }[];
  /** What an observer sees at an angle θ to the field: G, angular factors, the stick plot with its θ control. */
  observer: ObserverView;
}

export interface LineFieldView extends PageCommon {
  kind: "line-field";
  lineId: string;
  lineUrl: string;
  atField: AtFieldView;
  /** When the components at this field are on pages per polarization: links to them (atField.table is then null). */
  parts: { text: string; url: string; count: number }[];
  /** The field, as exported ("0.0001"), and the polarization this page is for (null: all). */
  tesla: string;
  polarization: string | null;
}

/** The pages of one line at one field, per polarization, when the field's page would be too large. */
const POLARIZATION_PARTS: { key: string; text: string; test: (c: { polarization: string | null; q: number }) => boolean }[] = [
  { key: "pi", text: "π components", test: (c) => c.polarization === "pi" },
  { key: "sigma-plus", text: "σ+ components", test: (c) => c.polarization === "sigma+" },
  { key: "sigma-minus", text: "σ− components", test: (c) => c.polarization === "sigma-" },
  { key: "dm2", text: "Δm = ±2 components", test: (c) => Math.abs(c.q) === 2 },
  { key: "dm3", text: "Δm = ±3 components", test: (c) => Math.abs(c.q) === 3 },
];

export interface TermView extends PageCommon {
  kind: "term";
  key: string;
  anchor: string;
  facts: string[];
  table: Table;
}

export type PageView = OverviewView | LevelView | TransitionsView | LineView | LineFieldView | TermView;

/** The term pages of a species (used when the overview leaves the term tables to them, OverviewCompaction 3). */
export function termViews(v: SpeciesViewsInput): TermView[] {
  const s = v.result;
  const id = s.input.id;
  const home: TableHome = { speciesId: id, csvBase: `species/${id}/csv`, exportUrl: exportPath(id) };
  return v.fields.terms.map((t) => ({
    kind: "term",
    path: termPagePath(id, t.key),
    title: `${s.input.label} ${t.key}`,
    crumbs: [
      { text: "Species", href: "/" },
      { text: s.input.label, href: `/${speciesPath(id)}#${termAnchor(t.key)}` },
      { text: t.key, href: null },
    ],
    speciesId: id,
    speciesLabel: s.input.label,
    key: t.key,
    anchor: `${termAnchor(t.key)}-states`,
    facts: termFacts(t),
    table: termTable(t, v.configured, home),
  }));
}

export interface SpeciesViewsInput {
  result: SpeciesResult;
  fields: SpeciesFieldResult;
  configured: ConfiguredField[];
  muB_h: Dec;
}

const gIText = (s: SpeciesResult): string => {
  const written = s.input.nucleus?.gI?.text;
  const p = written ? writtenParts(written) : null;
  return p ? partsText(p) : formatUncertain(s.gI, s.gIU ?? null, 12);
};

/** Levels that get a page of their own: those with hyperfine structure (field tables, plots, transitions), and every level once the overview is compacted. */
export const hasLevelPage = (s: SpeciesFieldResult, l: LevelResult, compact: OverviewCompaction = 0): boolean =>
  s.levels.get(l.input.id)!.validity !== null || compact >= 1;

/**
 * How much of a large species the overview leaves to its level pages, so the
 * overview stays under its budget: 0 nothing; 1 the energies at the bias
 * fields of levels that have a page; 2 also their (F, mF) shift tables;
 * 3 also the fine-structure term tables (to term pages); 4 also the pattern
 * pictures (each line page has its own); 5 also the mJ and F tables of
 * levels with a page (the at-a-glance table keeps every g and shift per m). The
 * rows keep their ids on the level pages, and the overview's forwarding map
 * sends old links there.
 */
export type OverviewCompaction = 0 | 1 | 2 | 3 | 4 | 5;

export function overviewView(v: SpeciesViewsInput, compact: OverviewCompaction = 0): OverviewView {
  const s = v.result;
  const id = s.input.id;
  const home: TableHome = { speciesId: id, csvBase: `species/${id}/csv`, exportUrl: exportPath(id) };
  // A compacted overview gives every level a page of its own (a level without hyperfine structure too), so its tables have a home.
  const levelUrl = (l: LevelResult) => (hasLevelPage(v.fields, l, compact) ? `/${levelPagePath(id, l.input.id)}` : null);
  const nucleus = s.input.nucleus;
  const facts = [
    ...(nucleus ? [{ label: "nuclear spin I", value: formatDoubled(nucleus.I2) }, { label: `gI (${s.gIFrom === "moment" ? "from μ" : "given"})`, value: gIText(s) }] : []),
    ...(s.input.mass ? [{ label: "mass", value: s.input.mass.text }] : []),
    { label: "gL", value: formatUncertain(s.gL, s.gLU ?? null, 12) },
    { label: "gS", value: formatUncertain(s.gS, s.gSU ?? null, 15) },
  ];
  return {
    kind: "overview",
    path: speciesPath(id),
    title: s.input.label,
    crumbs: [{ text: "Species", href: "/" }, { text: s.input.label, href: null }],
    speciesId: id,
    speciesLabel: s.input.label,
    facts,
    notes: s.input.notes ?? null,
    exportUrl: exportPath(id),
    sheetUrl: sheetPath(id),
    glance: glanceTable(s, home, v.muB_h),
    intervals: s.levels.filter((l) => l.hyperfine.length > 1).map((l) => ({ levelId: l.input.id, items: hyperfineIntervals(l) })),
    patterns: s.lines.map((ln) => ({
      sketchShown: compact < 4,
      lineId: ln.input.id,
      url: `/${linePagePath(id, ln.input.id)}`,
      pattern: ln.pattern ?? "—",
      gEff: ln.gEff === null ? `— (${ln.gEffNote ?? "not defined"})` : formatUncertain(ln.gEff, ln.gEffU ?? null, SHOWN_DIGITS),
      summary: ln.summary,
      couplingNote: lineCouplingNote(ln),
      sketch: patternSketchSvg(`sketch-${safeFile(ln.input.id)}`, ln.input.id, ln.components.map((c) => ({ lorentz: c.shiftLorentz, strength: c.strength.toDecimal(), polarization: c.polarization }))),
    })),
    levels: levelsTable(s, home, (l) => hasLevelPage(v.fields, l, compact)),
    shiftSections: s.levels.map((l) => {
      return {
        anchor: levelShiftsAnchor(l.input.id),
        termParts: termParts(l.input.term),
        title: l.input.id,
        levelUrl: levelUrl(l),
        tables: compact >= 5 && levelUrl(l)
          ? []
          : [
              mJTable(l, home),
              ...(l.hyperfine.length > 0 ? [hyperfineTable(l, home)] : []),
              ...(l.hyperfine.length > 0 && !(compact >= 2 && levelUrl(l)) ? [hyperfineSublevelsTable(l, home)] : []),
            ],
      };
    }),
    lines: linesTable(s, home),
    fieldsText: v.configured.map((f) => f.text),
    energies: s.levels.map((l) => ({
      levelId: l.input.id,
      levelUrl: levelUrl(l),
      sectionAnchor: levelUrl(l) ? null : levelFieldSectionAnchor(l.input.id),
      solver: solverFact(l, v.fields.levels.get(l.input.id)!),
      table: compact >= 1 && levelUrl(l) ? null : energiesTable(l, v.fields.levels.get(l.input.id)!, v.configured, home, false),
    })),
    terms: v.fields.terms.map((t) => ({
      anchor: termAnchor(t.key),
      key: t.key,
      facts: termFacts(t),
      table: compact >= 3 ? null : termTable(t, v.configured, home),
      url: compact >= 3 ? `/${termPagePath(id, t.key)}` : null,
    })),
    lineLinks: s.lines.map((ln) => ({ lineId: ln.input.id, url: `/${linePagePath(id, ln.input.id)}`, summary: ln.summary })),
  };
}

/**
 * The level pages of a species. `split(levelId)` says whether a level's
 * sublevel transitions go to a page of their own (asked after rendering the
 * whole page once and finding it too large); then that page's view comes too.
 */
export function levelViews(
  v: SpeciesViewsInput,
  split: (levelId: string) => boolean = () => false,
  compact: OverviewCompaction = 0,
  /** Transitions pages still too large: one page per lower F instead. */
  splitByF: (levelId: string) => boolean = () => false,
  /** Only these levels (the build takes one level at a time, so its pages are never all in memory). */
  only: (levelId: string) => boolean = () => true,
): { levels: LevelView[]; transitions: TransitionsView[] } {
  const s = v.result;
  const id = s.input.id;
  const home: TableHome = { speciesId: id, csvBase: `species/${id}/csv`, exportUrl: exportPath(id) };
  const levels: LevelView[] = [];
  const transitions: TransitionsView[] = [];
  s.levels.forEach((l, i) => {
    if (!hasLevelPage(v.fields, l, compact) || !only(l.input.id)) return;
    const f = v.fields.levels.get(l.input.id)!;
    const path = levelPagePath(id, l.input.id);
    const crumbs = [
      { text: "Species", href: "/" },
      { text: s.input.label, href: `/${speciesPath(id)}#${levelAnchor(l.input.id)}` },
    ];
    const table = transitionsTable(l, f, v.configured, home);
    const separate = table !== null && split(l.input.id);
    levels.push({
      kind: "level",
      path,
      title: `${s.input.label} ${l.input.id}`,
      crumbs: [...crumbs, { text: l.input.id, href: null }],
      speciesId: id,
      speciesLabel: s.input.label,
      levelId: l.input.id,
      termParts: termParts(l.input.term),
      anchor: levelFieldSectionAnchor(l.input.id),
      axisIndex: i + 1,
      facts: [solverFact(l, f), ...validityFacts(f)],
      sublevelShifts: [
        ...(compact >= 5 ? [mJTable(l, home)] : []),
        ...(compact >= 5 && l.hyperfine.length > 0 ? [hyperfineTable(l, home)] : []),
        ...(compact >= 2 && l.hyperfine.length > 0 ? [hyperfineSublevelsTable(l, home)] : []),
      ],
      energies: energiesTable(l, f, v.configured, home, true),
      plots: levelPlots(l, f, v.configured),
      transitions: separate ? null : table,
      transitionsUrl: separate ? `/${path}transitions/` : null,
    });
    if (separate) {
      const tPath = `${path}transitions/`;
      const byF = splitByF(l.input.id);
      const lowerFs = [...new Set(f.transitions.map((t) => t.lower.F2))].sort((a, b) => a - b);
      const common = {
        kind: "transitions" as const,
        speciesId: id,
        speciesLabel: s.input.label,
        levelId: l.input.id,
        levelUrl: `/${path}`,
        termParts: termParts(l.input.term),
      };
      const fSlug = (F2: number) => `F-${pageSlug(formatDoubled(F2))}/`;
      transitions.push({
        ...common,
        path: tPath,
        title: `${s.input.label} ${l.input.id} transitions`,
        crumbs: [...crumbs, { text: l.input.id, href: `/${path}` }, { text: "transitions", href: null }],
        transitions: byF ? null : table,
        parts: byF ? lowerFs.map((F2) => ({ text: `from F = ${formatDoubled(F2)}`, url: `/${tPath}${fSlug(F2)}` })) : [],
        lowerF2: null,
      });
      if (byF) {
        for (const F2 of lowerFs) {
          transitions.push({
            ...common,
            path: `${tPath}${fSlug(F2)}`,
            title: `${s.input.label} ${l.input.id} transitions from F = ${formatDoubled(F2)}`,
            crumbs: [...crumbs, { text: l.input.id, href: `/${path}` }, { text: "transitions", href: `/${tPath}` }, { text: `from F = ${formatDoubled(F2)}`, href: null }],
            transitions: transitionsTable(l, f, v.configured, home, F2),
            parts: [],
            lowerF2: F2,
          });
        }
      }
    }
  });
  return { levels, transitions };
}

function atFieldView(ln: LineResult, a: LineAtFieldResult, home: TableHome, levelOf: (id: string) => LevelFieldResult): AtFieldView {
  const tesla = exportText(a.field.tesla, 30);
  return {
    anchor: lineAtFieldAnchor(ln.input.id, tesla),
    fieldText: a.field.text,
    heading: `at ${a.field.text}`,
    regime: a.regime,
    model: a.model,
    basis: modelBasis(a),
    modelText: lineModelText(ln, a, levelOf),
    plot: atFieldPlot(ln, a),
    // the linear pattern gets a table too when the line has a wavelength: its absolute frequencies
    table: a.model === "J-resolved linear pattern" && ln.frequencyHz === null ? null : atFieldTable(ln, a, home),
    linear: a.model === "J-resolved linear pattern",
  };
}

/**
 * The line pages of a species. `split(lineId)` says whether a line's fields
 * go to pages of their own (the build asks after rendering the whole page
 * once and finding it too large); then the per-field views come too.
 */
/**
 * The line pages of a species. `split(lineId)` sends a line's fields to
 * pages of their own, and `splitField(lineId, tesla)` a field's components
 * to pages per polarization (each asked after rendering the page once and
 * finding it too large).
 */
export function lineViews(
  v: SpeciesViewsInput,
  split: (lineId: string) => boolean,
  splitField: (lineId: string, tesla: string) => boolean = () => false,
  /** Only these lines (the build takes one line at a time, so its pages are never all in memory). */
  only: (lineId: string) => boolean = () => true,
): { lines: LineView[]; lineFields: LineFieldView[] } {
  const s = v.result;
  const id = s.input.id;
  const home: TableHome = { speciesId: id, csvBase: `species/${id}/csv`, exportUrl: exportPath(id) };
  const lines: LineView[] = [];
  const lineFields: LineFieldView[] = [];
  for (const ln of s.lines) {
    if (!only(ln.input.id)) continue;
    const f = v.fields.lines.get(ln.input.id)!;
    const url = `/${linePagePath(id, ln.input.id)}`;
    const crumbs = [
      { text: "Species", href: "/" },
      { text: s.input.label, href: `/${speciesPath(id)}#${lineAnchor(ln.input.id)}` },
    ];
    const positive = f.atFields.filter((a) => a.field.tesla.gt(0));
    const separate = split(ln.input.id);
    const atFields = positive.map((a) => atFieldView(ln, a, home, (lid) => v.fields.levels.get(lid)!));
    lines.push({
      kind: "line",
      path: linePagePath(id, ln.input.id),
      title: `${s.input.label} ${ln.input.id}`,
      crumbs: [...crumbs, { text: ln.input.id, href: null }],
      speciesId: id,
      speciesLabel: s.input.label,
      lineId: ln.input.id,
      heading: `${ln.input.id}: ${ln.upper.input.id} → ${ln.lower.input.id}`,
      pattern: ln.pattern,
      couplingNote: lineCouplingNote(ln),
      summary: ln.summary,
      components: componentsTable(ln, home),
      observer: observerView(ln, home),
      componentsAnchor: lineComponentsAnchor(ln.input.id),
      fieldsAnchor: lineFieldsAnchor(ln.input.id),
      hyperfine: f.hyperfine ? hyperfineGroupsTable(ln, f.hyperfine, home, f) : null,
      hyperfineComponents: f.hyperfine ? hyperfineComponentsTable(ln, f.hyperfine, home, f) : null,
      lock: lockView(ln, f.hyperfine, home, f.hyperfineOffsetU),
      wavelengths: wavelengthsText(ln.input),
      wavelengthSplit: ln.lorentzDlambdaPerT
        ? { anchor: lineDlambdaSectionAnchor(ln.input.id), text: lorentzWavelengthText(ln)!, table: wavelengthSplitTable(ln, v.configured, home)! }
        : null,
      atFields: separate ? null : atFields,
      fieldLinks: separate
        ? positive.map((a) => ({ text: a.field.text, url: `/${lineFieldPagePath(id, ln.input.id, exportText(a.field.tesla, 30))}`, regime: a.regime, model: a.model }))
        : [],
    });
    if (!separate) continue;
    positive.forEach((a, k) => {
      const tesla = exportText(a.field.tesla, 30);
      const path = lineFieldPagePath(id, ln.input.id, tesla);
      const fieldCrumbs = [...crumbs, { text: ln.input.id, href: url }];
      const common = { kind: "line-field" as const, speciesId: id, speciesLabel: s.input.label, lineId: ln.input.id, lineUrl: url };
      const whole = atFields[k]!;
      const byPolarization = whole.table !== null && splitField(ln.input.id, tesla);
      const parts = byPolarization
        ? POLARIZATION_PARTS.map((part) => ({ part, components: a.components.filter((c) => part.test(c)) })).filter((x) => x.components.length > 0)
        : [];
      lineFields.push({
        ...common,
        path,
        title: `${s.input.label} ${ln.input.id} at ${a.field.text}`,
        crumbs: [...fieldCrumbs, { text: a.field.text, href: null }],
        atField: byPolarization ? { ...whole, table: null } : whole,
        tesla,
        polarization: null,
        parts: parts.map(({ part, components }) => ({ text: part.text, url: `/${path}${part.key}/`, count: components.length })),
      });
      for (const { part, components } of parts) {
        const t = atFieldTable(ln, { ...a, components }, home);
        lineFields.push({
          ...common,
          path: `${path}${part.key}/`,
          title: `${s.input.label} ${ln.input.id} at ${a.field.text}, ${part.text}`,
          crumbs: [...fieldCrumbs, { text: a.field.text, href: `/${path}` }, { text: part.text, href: null }],
          atField: {
            ...whole,
            anchor: `${whole.anchor}:${part.key}`,
            heading: `${whole.heading}, ${part.text}`,
            plot: atFieldPlot(ln, { ...a, components }),
            table: { ...t, id: `${t.id}:${part.key}`, csvPath: t.csvPath.replace(/\.csv$/, `-${part.key}.csv`), caption: `${t.caption}, ${part.text}` },
          },
          parts: [],
          tesla,
          polarization: part.key,
        });
      }
    });
  }
  return { lines, lineFields };
}
