/**
 * The field calculator's files in a build: species/<id>/engine-data.js per
 * species (src/engine/engineData.ts, from the results the build has just
 * computed, so nothing is computed twice), and the name of the partial the
 * species pages include (templates/_includes/calculator.njk), which loads
 * assets/calculator.js and that file.
 */
import type { ConstantsEdition } from "../physics/constants/constant.js";
import type { SpeciesFieldResult } from "../results/computeFields.js";
import type { ConfiguredField } from "../results/fieldTypes.js";
import type { SpeciesResult } from "../results/types.js";
import { engineData, engineDataScript } from "../engine/engineData.js";
import { speciesPath } from "../site/pageUrls.js";

/** The calculator partial, for the species pages' render context (`calculatorPartial`). */
export const CALCULATOR_PARTIAL = "calculator.njk";

/** Where a species' engine data go, relative to the site root (the partial links /species/<id>/engine-data.js). */
export const engineDataPath = (speciesId: string): string => `${speciesPath(speciesId)}engine-data.js`;

/** Write species/<id>/engine-data.js with `write` (a path relative to the site root, and the text). */
export function writeEngineData(
  result: SpeciesResult,
  fields: SpeciesFieldResult,
  constants: ConstantsEdition,
  configured: readonly ConfiguredField[],
  write: (path: string, text: string) => void,
): void {
  write(engineDataPath(result.input.id), engineDataScript(engineData(result, fields, constants, configured)));
}
