/**
 * One species from input to files: compute (exact results at the configured
 * fields) → page view models → rendered pages, CSV files, the JSON export →
 * written, and then dropped. What the site-wide pages need of the species
 * comes back as a small summary. The build runs this once per species, in
 * turn or in worker threads, so memory holds one species at a time.
 */
import { Dec, exportText } from "../physics/decimal.js";
import { val, type ConstantsEdition } from "../physics/constants/constant.js";
import type { SpeciesInput } from "../data/model.js";
import { computeSpecies } from "../results/computeSpecies.js";
import { computeFields } from "../results/computeFields.js";
import type { ConfiguredField } from "../results/fieldTypes.js";
import { tableCsv } from "../site/csv.js";
import { speciesExport } from "../site/exportJson.js";
import { exportPath, htmlFile, levelPagePath, sheetPath, speciesPath } from "../site/pageUrls.js";
import { searchData, type SearchData, type SearchSpecies, type SearchTransition } from "../site/searchIndex.js";
import { fieldText } from "../site/fieldTables.js";
import { sheetAddress, speciesSheet, type SpeciesSheet } from "../site/sheet.js";
import { scanIds } from "../site/idScan.js";
import type { Table } from "../site/table.js";
import { hasLevelPage, levelViews, lineViews, overviewView, termViews, type OverviewCompaction, type PageView, type SpeciesViewsInput } from "../site/speciesViews.js";
import { hasPagesBelow, movedMap, movedScript, MOVED_FILE, type AnchorAlias, type PageIds } from "./forwarding.js";
import type { RenderPage } from "./renderPages.js";
import { timed } from "./timings.js";
import { CALCULATOR_PARTIAL, writeEngineData } from "./writeEngineData.js";

/**
 * A line or level page above this size is split: a line gets one page per
 * bias field, a level a page for its transitions (the budget for any page
 * is 500 kB; the margin is for what a later edit adds).
 */
export const PAGE_LIMIT = 450_000;
/** A species overview above this size leaves more to its level pages (its budget is 250 kB). */
export const OVERVIEW_LIMIT = 235_000;

/** What every page of the build shares: the frame of the layout and of the bench sheets. */
export interface SiteFrame {
  title: string;
  lab: string | null;
  build: { date: string; constantsEdition: string; dataVersion: string };
  sheets: { fields: { text: string; lorentzMHz: string }[]; bohr: string };
}

export interface SpeciesBuildContext {
  constants: ConstantsEdition;
  configured: ConfiguredField[];
  siteUrl: string | null;
  frame: SiteFrame;
  render: RenderPage;
  /** Write a file of the site (path relative to the site root). */
  write: (path: string, text: string) => void;
}

/** What the site-wide pages and the search need of a species. */
export interface SpeciesSummary {
  id: string;
  label: string;
  url: string;
  exportUrl: string;
  summary: { levels: number; lines: number; nuclearSpin: string | null };
  /** The compact rows of the all-species bench sheet. */
  sheet: SpeciesSheet;
  search: SearchData;
  /** Bytes written per kind of page, for the benchmark. */
  pages: number;
}

function tablesOf(view: PageView): Table[] {
  switch (view.kind) {
    case "overview":
      return [
        view.glance,
        view.levels,
        ...view.shiftSections.flatMap((s) => s.tables),
        view.lines,
        ...view.energies.flatMap((e) => (e.table ? [e.table] : [])),
        ...view.terms.flatMap((t) => (t.table ? [t.table] : [])),
      ];
    case "level":
      return [...view.sublevelShifts, view.energies, ...(view.transitions ? [view.transitions] : [])];
    case "transitions":
      return view.transitions ? [view.transitions] : [];
    case "term":
      return [view.table];
    case "line":
      return [
        view.components,
        ...(view.hyperfine ? [view.hyperfine, view.hyperfineComponents!] : []),
        ...(view.lock ? [view.lock.table] : []),
        ...(view.wavelengthSplit ? [view.wavelengthSplit.table] : []),
        view.observer.factors,
        ...(view.atFields ?? []).flatMap((a) => (a.table ? [a.table] : [])),
      ];
    case "line-field":
      return view.atField.table ? [view.atField.table] : [];
  }
}

export function buildSpecies(input: SpeciesInput, ctx: SpeciesBuildContext): SpeciesSummary {
  const result = timed("physics", () => computeSpecies(input, ctx.constants));
  const fields = timed("physics", () => computeFields(result, ctx.constants, ctx.configured));
  timed("engine", () => writeEngineData(result, fields, ctx.constants, ctx.configured, ctx.write));
  const id = input.id;
  const v: SpeciesViewsInput = { result, fields, configured: ctx.configured, muB_h: val(ctx.constants.muB_h) };
  const atlas = ctx.frame;
  // Every page is written as soon as it is final; only its path and ids are kept (for the forwarding maps and the search index).
  const ids: PageIds[] = [];
  const render = (view: PageView, movedAnchors: string | null) =>
    timed("render", () => ctx.render(`species/${view.kind}.njk`, `/${htmlFile(view.path)}`, { view, atlas, pageTitle: view.title, movedAnchors, calculatorPartial: CALCULATOR_PARTIAL }));

  const keep = (view: PageView, html: string) => {
    ids.push({ path: view.path, ids: scanIds(html) });
    timed("write", () => {
      ctx.write(htmlFile(view.path), html);
      for (const t of tablesOf(view)) if (t.csvPath) ctx.write(t.csvPath, tableCsv(t));
    });
  };
  const tooLarge = (html: string, limit = PAGE_LIMIT) => Buffer.byteLength(html) > limit;
  // Every species has pages below its overview (a level or a line page) when it has a line or a level with hyperfine structure.
  const overviewMoved = input.lines.length > 0 || fields.terms.length > 0 || [...fields.levels.values()].some((f) => f.validity !== null) ? MOVED_FILE : null;

  // The overview first: as much as fits its budget, the rest left to the level pages.
  let compact: OverviewCompaction = 0;
  let overview = timed("views", () => overviewView(v, compact));
  let overviewHtml = render(overview, overviewMoved);
  while (tooLarge(overviewHtml, OVERVIEW_LIMIT) && compact < 5) {
    compact = (compact + 1) as OverviewCompaction;
    overview = timed("views", () => overviewView(v, compact));
    overviewHtml = render(overview, overviewMoved);
  }

  // Line pages, one line at a time: a page that is too large is rendered again split, first
  // one page per bias field, then (for a field that is still too large) one page per polarization.
  const splitLines = new Set<string>();
  const splitFields = new Set<string>();
  const fieldKey = (lineId: string, tesla: string) => `${lineId}\u0000${tesla}`;
  const final = (pages: { view: PageView; html: string }[]) => {
    const below = (view: PageView) => pages.some((p) => p.view !== view && p.view.path.startsWith(view.path));
    for (const { view, html } of pages) keep(view, below(view) ? render(view, MOVED_FILE) : html);
  };
  for (const line of input.lines) {
    for (;;) {
      const views = timed("views", () => lineViews(v, (l) => splitLines.has(l), (l, t) => splitFields.has(fieldKey(l, t)), (l) => l === line.id));
      const pages = [...views.lines, ...views.lineFields].map((view) => ({ view, html: render(view, null) }));
      let again = false;
      for (const { view, html } of pages) {
        if (!tooLarge(html)) continue;
        if (view.kind === "line" && !splitLines.has(view.lineId)) (splitLines.add(view.lineId), (again = true));
        else if (view.kind === "line-field" && view.polarization === null && !splitFields.has(fieldKey(view.lineId, view.tesla))) {
          splitFields.add(fieldKey(view.lineId, view.tesla));
          again = true;
        }
      }
      if (!again) {
        final(pages);
        break;
      }
    }
  }

  // Level pages likewise, one level at a time: one that is too large gets its transitions on a
  // page of their own, and a transitions page still too large gets one page per lower F.
  const splitLevels = new Set<string>();
  const byF = new Set<string>();
  for (const level of input.levels) {
    for (;;) {
      const views = timed("views", () => levelViews(v, (l) => splitLevels.has(l), compact, (l) => byF.has(l), (l) => l === level.id));
      const pages = [...views.levels, ...views.transitions].map((view) => ({ view, html: render(view, null) }));
      let again = false;
      for (const { view, html } of pages) {
        if (!tooLarge(html)) continue;
        if (view.kind === "level" && view.transitions && !splitLevels.has(view.levelId)) (splitLevels.add(view.levelId), (again = true));
        else if (view.kind === "transitions" && view.lowerF2 === null && !byF.has(view.levelId)) (byF.add(view.levelId), (again = true));
      }
      if (!again) {
        final(pages);
        break;
      }
    }
  }
  if (compact >= 3) for (const t of timed("views", () => termViews(v))) keep(t, render(t, null));
  const paths = [overview.path, ...ids.map((p) => p.path)];
  keep(overview, hasPagesBelow(overview.path, paths) === (overviewMoved !== null) ? overviewHtml : render(overview, hasPagesBelow(overview.path, paths) ? MOVED_FILE : null));

  // The plot-axis controls of the one-page layout were numbered by the level's position (axis-label-3);
  // they are named by level id now, and old links to the numbered forms are forwarded by position.
  const overviewAliases: AnchorAlias[] = [];
  result.levels.forEach((l, i) => {
    if (!fields.levels.get(l.input.id)?.plot) return;
    for (const part of ["label", "lin", "log"]) overviewAliases.push({ id: `axis-${part}-${i + 1}`, path: levelPagePath(id, l.input.id), target: `axis-${part}:${l.input.id}` });
  });
  // A compacted overview leaves a level's short energies table (table-field:<id>) to the level page,
  // whose full table is named table-field-full:<id>: old links to the short one are forwarded there.
  for (const l of result.levels) {
    const page = ids.find((p) => p.path === levelPagePath(id, l.input.id));
    const target = `table-field-full:${l.input.id}`;
    if (page?.ids.includes(target)) overviewAliases.push({ id: `table-field:${l.input.id}`, path: page.path, target });
  }
  // Forwarding maps, from the ids of the written pages.
  // Where each row is, for the search index: the overview first, so a row it shares with a detail page is found there.
  const rowPages = new Map<string, string>();
  for (const page of [...ids].sort((a, b) => Number(b.path === overview.path) - Number(a.path === overview.path))) {
    for (const rowId of page.ids) if (!rowPages.has(rowId)) rowPages.set(rowId, htmlFile(page.path));
  }
  for (const page of ids) {
    if (!hasPagesBelow(page.path, paths)) continue;
    const map = movedMap(page, ids, page.path === overview.path ? overviewAliases : []);
    if (map) ctx.write(`${page.path}${MOVED_FILE}`, movedScript(map));
  }

  const buildInfo = { constantsEdition: ctx.constants.edition, dataVersion: atlas.build.dataVersion };
  const exportJson = timed("export", () => JSON.stringify(speciesExport(result, buildInfo, { result: fields, configured: ctx.configured }), null, 2) + "\n");
  ctx.write(exportPath(id), exportJson);

  const sheetView = {
    id,
    label: input.label,
    url: speciesPath(id),
    sheet: speciesSheet(result, { mList: true }, { result: fields, maxTesla: Dec.max(new Dec(0), ...ctx.configured.map((f) => f.tesla)) }),
    sheetAddress: sheetAddress(ctx.siteUrl, sheetPath(id)),
  };
  const sheetHtml = timed("render", () => ctx.render("species/sheet.njk", `/${htmlFile(sheetPath(id))}`, { s: sheetView, atlas, pageTitle: `${input.label} bench sheet` }));
  ctx.write(htmlFile(sheetPath(id)), sheetHtml);

  const url = speciesPath(id);
  return {
    id,
    label: input.label,
    url,
    exportUrl: exportPath(id),
    summary: {
      levels: input.levels.length,
      lines: input.lines.length,
      nuclearSpin: input.nucleus ? (input.nucleus.I2 % 2 === 0 ? String(input.nucleus.I2 / 2) : `${input.nucleus.I2}/2`) : null,
    },
    sheet: speciesSheet(result, { mList: false }),
    search: timed("search", () => searchData(searchSpecies(v, (rowId) => rowPages.get(rowId) ?? null), ctx.configured.map((f) => ({ text: f.text, tesla: exportText(f.tesla, 30) })))),
    pages: ids.length + 1,
  };
}

/**
 * What the search index needs of a species: its results, each level's
 * sublevel transitions (field-insensitive points written as the transitions
 * table writes them), and where the build put each row.
 */
function searchSpecies(v: SpeciesViewsInput, pageOf: (rowId: string) => string | null): SearchSpecies {
  const s = v.result;
  const transitions = new Map<string, SearchTransition[]>();
  for (const l of s.levels) {
    const f = v.fields.levels.get(l.input.id);
    if (!f || !hasLevelPage(v.fields, l)) continue;
    transitions.set(l.input.id, f.transitions.map((t) => ({ ...t, fieldInsensitive: t.fieldInsensitive.map((p) => ({ tesla: p.tesla, text: fieldText(p.tesla, 7) })) })));
  }
  return { id: s.input.id, label: s.input.label, muB_h: v.muB_h, levels: s.levels, lines: s.lines, transitions, pageOf };
}
