/**
 * Everything the templates need, computed once per build: the site model.
 * Templates only lay out what is here; they do no arithmetic.
 */
import type { DataFolder } from "../data/model.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { listConstants } from "../physics/constants/constant.js";
import { timed } from "../cli/timings.js";
import { computeSpecies } from "../results/computeSpecies.js";
import { computeFields, type SpeciesFieldResult } from "../results/computeFields.js";
import { publicBase } from "./publicBase.js";
import { bohrRule, fieldRules, sheetAddress, speciesSheet } from "./sheet.js";
import { fieldSections, fieldTables, type FieldSections } from "./fieldSections.js";
import type { SpeciesResult } from "../results/types.js";
import { tableCsv } from "./csv.js";
import { speciesExport } from "./exportJson.js";
import { speciesPage, type SpeciesPage } from "./speciesPage.js";
import { textCell, type Table } from "./table.js";

export interface BuildInfo {
  /** ISO date-time of the build (from SOURCE_DATE_EPOCH when set). */
  date: string;
  constantsEdition: string;
  dataVersion: string;
}

export interface SpeciesEntry {
  id: string;
  label: string;
  /** Page URL relative to the site root. */
  url: string;
  exportUrl: string;
  result: SpeciesResult;
  fields: SpeciesFieldResult;
  page: SpeciesPage;
  /** Field-dependent sections of the species page. */
  fieldPage: FieldSections;
  /** The species' own bench sheet (every m listed) and where a printed copy leads back to. */
  sheet: ReturnType<typeof speciesSheet>;
  sheetAddress: ReturnType<typeof sheetAddress>;
  /** Pretty-printed JSON export. */
  exportJson: string;
  summary: { levels: number; lines: number; nuclearSpin: string | null };
}

export interface Atlas {
  title: string;
  lab: string | null;
  /** Public address of the site root (siteUrl joined with pathPrefix), or null. */
  siteUrl: string | null;
  /** Path prefix when hosted under a sub-path ("/" by default). */
  pathPrefix: string;
  build: BuildInfo;
  constants: ConstantsEdition;
  constantsTable: Table;
  fields: { text: string; tesla: string }[];
  species: SpeciesEntry[];
  /** Every CSV file of the site: path relative to the root, and content. */
  csvFiles: { path: string; content: string }[];
  /** What every bench sheet shares, and the all-species sheet (compact rows). */
  sheets: {
    fields: ReturnType<typeof fieldRules>;
    bohr: ReturnType<typeof bohrRule>;
    all: ReturnType<typeof speciesSheet>[];
    allAddress: ReturnType<typeof sheetAddress>;
  };
}

export function buildAtlas(folder: DataFolder, constants: ConstantsEdition, buildDate: string): Atlas {
  const build: BuildInfo = { date: buildDate, constantsEdition: constants.edition, dataVersion: folder.dataVersion };
  const siteUrl = publicBase(folder.site.siteUrl, folder.site.pathPrefix);
  const fields = folder.site.fields.map((f) => ({ text: f.text, tesla: f.tesla.toString() }));
  const species = [...folder.species]
    .sort((a, b) => a.id.localeCompare(b.id, "en"))
    .map((input): SpeciesEntry => {
      const result = timed("physics", () => computeSpecies(input, constants));
      const fields = timed("physics", () => computeFields(result, constants, folder.site.fields));
      const url = `species/${input.id}/`;
      const page = speciesPage(result, `species/${input.id}/csv`);
      const fieldPage = fieldSections(result, fields, folder.site.fields, `species/${input.id}/csv`);
      const exportJson =
        JSON.stringify(speciesExport(result, build, { result: fields, configured: folder.site.fields }), null, 2) + "\n";
      return {
        id: input.id,
        label: input.label,
        url,
        exportUrl: `export/${input.id}.json`,
        result,
        fields,
        page,
        fieldPage,
        sheet: speciesSheet(result, { mList: true }),
        sheetAddress: sheetAddress(siteUrl, `species/${input.id}/sheet/`),
        exportJson,
        summary: {
          levels: input.levels.length,
          lines: input.lines.length,
          nuclearSpin: input.nucleus ? input.nucleus.I2 % 2 === 0 ? String(input.nucleus.I2 / 2) : `${input.nucleus.I2}/2` : null,
        },
      };
    });
  const constantsTable: Table = {
    id: "constants",
    caption: `${constants.edition} values used by this build`,
    csvPath: "constants/constants.csv",
    columns: [
      { key: "symbol", label: "symbol", kind: "text" },
      { key: "name", label: "quantity", kind: "text" },
      { key: "value", label: "value", kind: "text" },
      { key: "u", label: "standard uncertainty", kind: "text" },
      { key: "unit", label: "unit", kind: "text" },
      { key: "reference", label: "reference", kind: "text" },
    ],
    rows: listConstants(constants).map((c) => ({
      anchor: `const:${c.key}`,
      cells: [
        textCell(c.symbol),
        textCell(c.name),
        textCell(c.value),
        textCell(c.exact ? "exact" : c.uncertainty),
        textCell(c.unit),
        textCell(c.reference),
      ],
    })),
  };
  const tables: Table[] = [constantsTable];
  for (const s of species) {
    tables.push(s.page.levels, s.page.lines);
    for (const sec of s.page.levelSections) {
      tables.push(sec.sublevels);
      if (sec.hyperfine) tables.push(sec.hyperfine);
      if (sec.hyperfineSublevels) tables.push(sec.hyperfineSublevels);
    }
    for (const sec of s.page.lineSections) tables.push(sec.components);
    tables.push(...fieldTables(s.fieldPage));
  }
  return {
    title: folder.site.title,
    lab: folder.site.lab,
    siteUrl,
    pathPrefix: folder.site.pathPrefix,
    build,
    constants,
    constantsTable,
    fields,
    species,
    csvFiles: tables.map((t) => ({ path: t.csvPath, content: tableCsv(t) })),
    sheets: {
      fields: fieldRules(fields, constants),
      bohr: bohrRule(constants),
      all: species.map((s) => speciesSheet(s.result, { mList: false })),
      allAddress: sheetAddress(siteUrl, "sheet/"),
    },
  };
}
