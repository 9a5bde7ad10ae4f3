/**
 * The JSON exports of a data folder, made by the real code path of the
 * build (computeSpecies → computeFields → speciesExport, as
 * src/build/speciesBuild.ts does), without writing a site.
 */
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { computeFields } from "../../src/results/computeFields.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { speciesExport } from "../../src/site/exportJson.js";

/** Species id → export JSON text (two-space, final newline, as written by the build). */
export function exportsOf(dataDir: string): Map<string, string> {
  const folder = loadDataFolder(dataDir);
  const constants = editionByName(folder.site.constants)!;
  const out = new Map<string, string>();
  for (const input of folder.species) {
    const result = computeSpecies(input, constants);
    const fields = computeFields(result, constants, folder.site.fields);
    const json = speciesExport(result, { constantsEdition: constants.edition, dataVersion: folder.dataVersion }, { result: fields, configured: folder.site.fields });
    out.set(input.id, JSON.stringify(json, null, 2) + "\n");
  }
  return out;
}
