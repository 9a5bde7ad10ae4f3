/** Results of one species from its YAML text, through the real loader: for the tests in test/results. */
import { rmSync } from "node:fs";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { computeFields, type SpeciesFieldResult } from "../../src/results/computeFields.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import type { ConfiguredField } from "../../src/results/fieldTypes.js";
import type { SpeciesResult } from "../../src/results/types.js";
import { writeFolder } from "../catalogue/writeFolder.js";

export interface Computed {
  result: SpeciesResult;
  fields: SpeciesFieldResult;
  configured: ConfiguredField[];
}

/** Load `yaml` as the only species of a folder with the given bias fields, and compute it with CODATA 2022. */
export function computeFrom(yaml: string, fields: string[] = ["0 G", "1 G", "10 G"]): Computed {
  const site = `fields: [${fields.map((f) => JSON.stringify(f)).join(", ")}]\n`;
  const dir = writeFolder({ "species/x.yaml": yaml, "site.yaml": site });
  try {
    const folder = loadDataFolder(dir);
    const result = computeSpecies(folder.species[0]!, CODATA_2022);
    const configured = folder.site.fields;
    return { result, fields: computeFields(result, CODATA_2022, configured), configured };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
