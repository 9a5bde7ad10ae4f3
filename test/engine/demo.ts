/** The demo data folder computed on the exact (60-digit) path, and the engine data the build makes from it. */
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { computeFields, type SpeciesFieldResult } from "../../src/results/computeFields.js";
import type { ConfiguredField } from "../../src/results/fieldTypes.js";
import type { SpeciesResult } from "../../src/results/types.js";
import type { ConstantsEdition } from "../../src/physics/constants/constant.js";
import { engineData } from "../../src/engine/engineData.js";
import type { EngineData } from "../../src/engine/types.js";
import type { DataFolder } from "../../src/data/model.js";
import { DEMO_DATA } from "../support/runBuild.js";

export interface DemoSpecies {
  id: string;
  result: SpeciesResult;
  fields: SpeciesFieldResult;
  /** Engine data after a JSON round trip, as the page gets it. */
  data: EngineData;
}

export function loadDemo(): { folder: DataFolder; constants: ConstantsEdition } {
  const folder = loadDataFolder(DEMO_DATA);
  return { folder, constants: editionByName(folder.site.constants)! };
}

/**
 * Every demo species computed exactly at `fields` (default: the configured
 * ones), with engine data made from its results at the configured fields.
 */
export function demoSpecies(fields?: ConfiguredField[]): { species: DemoSpecies[]; configured: ConfiguredField[]; constants: ConstantsEdition; folder: DataFolder } {
  const { folder, constants } = loadDemo();
  const configured = folder.site.fields;
  const species = folder.species.map((input) => {
    const result = computeSpecies(input, constants);
    const f = computeFields(result, constants, fields ?? configured);
    const build = fields ? computeFields(result, constants, configured) : f;
    return { id: input.id, result, fields: f, data: JSON.parse(JSON.stringify(engineData(result, build, constants, configured))) as EngineData };
  });
  return { species, configured, constants, folder };
}
