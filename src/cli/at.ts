/**
 * `npm run at -- <species-id> <field> [--data DIR]`: every number of one
 * species at one field, exactly (the build's 60-digit path with that field
 * as the only bias field), printed as JSON: `{ B_T, levels, transitions,
 * lines }` with the keys of the export's field_table and at_fields entries,
 * decimals as strings of up to 30 significant digits (src/engine/exactAt.ts),
 * each with its standard uncertainty as the export writes it (`E_Hz_u`,
 * `Hz_u`, `shift_Hz_u`, `frequency_Hz_u`; null when exact).
 *
 * The field is text such as "4.7 G", "0.47mT", "37 µT" or a number of tesla
 * (src/engine/fieldText.ts); words after the species id are joined, so
 * `npm run at -- rb87 4.7 G` works unquoted. DIR defaults to ATLAS_DATA or
 * "data". Exit codes: 0 printed; 1 unknown species, bad field, bad
 * arguments or a data folder with problems (one line each on stderr).
 */
import { resolve } from "node:path";
import { InputProblems } from "../data/inputError.js";
import { loadDataFolder } from "../data/loadDataFolder.js";
import { editionByName } from "../physics/constants/editions.js";
import { exactAt } from "../engine/exactAt.js";
import { parseFieldText } from "../engine/fieldText.js";

const USAGE = "usage: npm run at -- <species-id> <field> [--data DIR]   e.g. npm run at -- rb87 \"4.7 G\"";

class Stop extends Error {}

function main(argv: string[]): void {
  let dataDir = process.env.ATLAS_DATA || "data";
  const words: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === "--data") {
      const next = argv[++i];
      if (next === undefined) throw new Stop(`--data needs a folder; ${USAGE}`);
      dataDir = next;
    } else if (a.startsWith("--data=")) dataDir = a.slice("--data=".length);
    else if (a === "--help" || a === "-h") {
      process.stdout.write(USAGE + "\n");
      return;
    } else if (a.startsWith("--")) throw new Stop(`unknown option ${a}; ${USAGE}`);
    else words.push(a);
  }
  if (words.length < 2) throw new Stop(words.length === 0 ? `no species id and field given; ${USAGE}` : `no field given; ${USAGE}`);
  const [id, ...fieldWords] = words as [string, ...string[]];
  const field = parseFieldText(fieldWords.join(" "));
  if (!field.ok) throw new Stop(field.message);

  let folder;
  try {
    folder = loadDataFolder(resolve(dataDir));
  } catch (e) {
    if (e instanceof InputProblems) throw new Stop(`${e.format()}\n${e.problems.length} problem(s) in ${dataDir}`);
    throw e;
  }
  const species = folder.species.find((s) => s.id === id);
  if (!species) {
    const known = folder.species.map((s) => s.id).sort();
    throw new Stop(`unknown species "${id}" in ${dataDir}; known: ${known.join(", ")}`);
  }
  // the data layer has checked the edition name against editions.ts
  const constants = editionByName(folder.site.constants)!;
  const result = exactAt(species, constants, { text: field.text, tesla: field.tesla });
  process.stdout.write(JSON.stringify(result, null, 2) + "\n");
}

try {
  main(process.argv.slice(2));
} catch (e) {
  process.stderr.write(`at: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
}
