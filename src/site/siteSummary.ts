/**
 * What the site-wide pages (index, constants, methods, all-species bench
 * sheet) need: a small summary, never the species' results. Eleventy sees
 * only this as its global `atlas` data.
 */
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { listConstants } from "../physics/constants/constant.js";
import { bohrRule, fieldRules, sheetAddress, type SpeciesSheet } from "./sheet.js";
import { conciseText, partsText, unitText, writtenParts } from "./format.js";
import { textCell, type Table } from "./table.js";
import { makeTable } from "./tableSpec.js";

export interface SpeciesListing {
  id: string;
  label: string;
  url: string;
  exportUrl: string;
  summary: { levels: number; lines: number; nuclearSpin: string | null };
  sheet: SpeciesSheet;
}

export interface SiteSummary {
  title: string;
  lab: string | null;
  siteUrl: string | null;
  pathPrefix: string;
  build: { date: string; constantsEdition: string; dataVersion: string };
  constants: { edition: string; reference: string };
  constantsTable: Table;
  fields: { text: string; tesla: string }[];
  species: SpeciesListing[];
  sheets: {
    fields: ReturnType<typeof fieldRules>;
    bohr: string;
    all: SpeciesSheet[];
    allAddress: ReturnType<typeof sheetAddress>;
  };
}

/** The constants of the edition in use, one row each. */
export function constantsTable(constants: ConstantsEdition): Table {
  return makeTable<ReturnType<typeof listConstants>[number]>(
    {
      id: "constants",
      caption: `${constants.edition} values used by this build`,
      csvPath: "constants/constants.csv",
      anchor: (c) => `const:${c.key}`,
      columns: [
        { key: "symbol", label: "symbol", kind: "text", cell: (c) => textCell(c.symbol) },
        { key: "name", label: "quantity", kind: "text", cell: (c) => textCell(c.name) },
        {
          key: "value", label: "value (standard uncertainty)", kind: "number",
          cell: (c) => {
            const text = conciseText(c.value, c.exact ? null : c.uncertainty);
            const parts = writtenParts(text);
            return parts ? { text: partsText(parts), sort: c.value, parts } : textCell(text);
          },
        },
        { key: "exact", label: "exact", kind: "text", cell: (c) => textCell(c.exact ? "exact (SI)" : "") },
        { key: "unit", label: "unit", kind: "text", cell: (c) => textCell(unitText(c.unit)) },
        { key: "reference", label: "reference", kind: "note", cell: (c) => textCell(c.reference) },
      ],
    },
    listConstants(constants),
  );
}

export function siteFrameParts(constants: ConstantsEdition, fields: { text: string; tesla: string }[]) {
  return { fields: fieldRules(fields, constants), bohr: bohrRule(constants) };
}
