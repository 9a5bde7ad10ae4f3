/**
 * Load a lab's data folder: `<dir>/species/*.yaml` (or .yml), one species a
 * file, and an optional `<dir>/site.yaml`. Every file is validated and every
 * problem collected; the folder is returned only when there are none.
 */
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { isAbsolute, join, relative, resolve, sep } from "node:path";
import { AtlasInputError, InputProblems, ProblemSink, type Place } from "./inputError.js";
import type { DataFolder, SiteInput, SpeciesInput } from "./model.js";
import { defaultSite, readSiteFile } from "./siteFile.js";
import { readSpeciesFile } from "./speciesFile.js";
import { decodeUtf8, MAX_FILE_BYTES, parseYaml, type TextAt } from "./yamlExact.js";

const START: Place = { line: 1, column: 1 };
const SPECIES_EXT = /\.ya?ml$/;
/** Files in species/ that are not species and are not worth a complaint. */
const IGNORED = /^(\.|readme(\.|$))/i;

/**
 * The path shown to the user: relative to the working directory when the
 * file is inside it (so terminals and editors can open it), else absolute.
 */
export function shownPath(absPath: string): string {
  const rel = relative(process.cwd(), absPath);
  const inside = rel !== "" && !rel.startsWith("..") && !isAbsolute(rel);
  return (inside ? rel : absPath).split(sep).join("/");
}

/** Read one file as text, refusing oversized files without reading them. */
function readText(abs: string, sink: ProblemSink): string | null {
  const size = statSync(abs).size;
  if (size > MAX_FILE_BYTES) {
    sink.add(START, `file is ${size} bytes, more than the limit of ${MAX_FILE_BYTES} bytes`, "a data file is a few kilobytes; split it or remove what is not data");
    return null;
  }
  return decodeUtf8(readFileSync(abs), sink);
}

/** Run `read` for one file, turning an unexpected failure into a problem instead of a stack trace. */
function guarded<T>(sink: ProblemSink, read: () => T): T | null {
  try {
    return read();
  } catch (e) {
    const code = (e as { code?: string }).code;
    const why = code ? `cannot read the file (${code})` : `unexpected failure while reading this file: ${e instanceof Error ? e.message : String(e)}`;
    sink.add(START, why, code ? "check that it exists and is readable" : "this is a bug in Sublevel Atlas; please report it together with the file");
    return null;
  }
}

/** Every regular file below `dir`, as sorted "/"-separated relative paths. */
export function allFiles(dir: string, prefix = ""): string[] {
  const out: string[] = [];
  for (const e of readdirSync(join(dir, prefix), { withFileTypes: true })) {
    const rel = prefix ? `${prefix}/${e.name}` : e.name;
    if (e.isDirectory()) out.push(...allFiles(dir, rel));
    else if (e.isFile()) out.push(rel);
  }
  return out.sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/**
 * sha-256 over every file of the folder in sorted path order — for each:
 * path, NUL, byte length, NUL, bytes — as hex, first 12 characters.
 */
export function dataVersion(dir: string): string {
  const h = createHash("sha256");
  for (const rel of allFiles(dir)) {
    const bytes = readFileSync(join(dir, rel));
    h.update(rel, "utf8");
    h.update("\0");
    h.update(String(bytes.length));
    h.update("\0");
    h.update(bytes);
  }
  return h.digest("hex").slice(0, 12);
}

/** Validate a data folder. Throws InputProblems listing every problem found. */
export function loadDataFolder(dir: string): DataFolder {
  const root = resolve(dir);
  const problems: AtlasInputError[] = [];
  const folderSink = new ProblemSink(shownPath(root));
  const fail = (): never => {
    throw new InputProblems([...problems, ...folderSink.problems]);
  };

  let rootIsDir = false;
  try {
    rootIsDir = statSync(root).isDirectory();
  } catch {
    rootIsDir = false;
  }
  if (!rootIsDir) {
    folderSink.add(START, "data folder does not exist or is not a folder", "give the folder that holds species/ and site.yaml");
    fail();
  }

  // site.yaml
  let site: SiteInput | null = defaultSite();
  const siteAbs = join(root, "site.yaml");
  let siteExists = false;
  try {
    siteExists = statSync(siteAbs).isFile();
  } catch {
    siteExists = false;
  }
  for (const wrong of ["site.yml"]) {
    try {
      if (statSync(join(root, wrong)).isFile() && !siteExists) {
        folderSink.add(START, `found ${wrong} but no site.yaml`, "the site settings file must be named site.yaml");
      }
    } catch {
      /* absent: fine */
    }
  }
  if (siteExists) {
    const sink = new ProblemSink(shownPath(siteAbs));
    site = guarded(sink, () => {
      const text = readText(siteAbs, sink);
      const src = text === null ? null : parseYaml(text, sink);
      return src ? readSiteFile(src) : null;
    });
    problems.push(...sink.problems);
  }

  // species/
  const speciesDir = join(root, "species");
  let names: string[] = [];
  let speciesDirExists = true;
  try {
    names = readdirSync(speciesDir, { withFileTypes: true })
      .filter((e) => e.isFile())
      .map((e) => e.name)
      .sort();
  } catch {
    speciesDirExists = false;
    folderSink.add(START, "data folder has no species/ folder", "put one file per species in <data folder>/species/, e.g. species/rb87.yaml");
  }
  const species: SpeciesInput[] = [];
  const ids = new Map<string, { file: string; at: TextAt }>();
  const yamlNames = names.filter((n) => SPECIES_EXT.test(n));
  for (const name of names) {
    if (SPECIES_EXT.test(name) || IGNORED.test(name)) continue;
    const sink = new ProblemSink(shownPath(join(speciesDir, name)));
    sink.add(START, "file in species/ is not a species file", "species files end in .yaml or .yml; rename it or move it out of species/");
    problems.push(...sink.problems);
  }
  if (names.length > 0 && yamlNames.length === 0) {
    folderSink.add(START, "species/ has no .yaml files", "add one file per species, e.g. species/rb87.yaml");
  } else if (names.length === 0 && speciesDirExists) {
    folderSink.add(START, "species/ is empty", "add one file per species, e.g. species/rb87.yaml");
  }
  for (const name of yamlNames) {
    const abs = join(speciesDir, name);
    const shown = shownPath(abs);
    const sink = new ProblemSink(shown);
    const read = guarded(sink, () => {
      const text = readText(abs, sink);
      const src = text === null ? null : parseYaml(text, sink);
      return src ? readSpeciesFile(src, `species/${name}`) : null;
    });
    if (read?.id) {
      const first = ids.get(read.id.text);
      if (first) {
        sink.add(read.id.at, `species id "${read.id.text}" is already used`, `${first.file} (line ${first.at.at.line}) has the same id; every species needs its own id`);
      } else {
        ids.set(read.id.text, { file: shown, at: read.id });
      }
    }
    if (read?.species && sink.count === 0) species.push(read.species);
    problems.push(...sink.problems);
  }

  if (problems.length > 0 || folderSink.count > 0 || !site) fail();
  return { dir: root, site: site as SiteInput, species, dataVersion: dataVersion(root) };
}
