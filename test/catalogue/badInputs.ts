/**
 * Catalogue of bad data folders, one problem each on otherwise valid data.
 *
 * Shape: `files` is a function returning the folder's contents (paths
 * relative to the data folder, e.g. "species/rb87.yaml", "site.yaml", mapped
 * to text or bytes). It is a function so that importing this module does
 * nothing and large inputs (the 50 MB file) are only built when a case runs.
 *
 * `expect` matches one line of InputProblems.format() in full:
 * `^<folder>/<file>:<line>:<column>: <message>`, where `<folder>/` is the
 * location of the data folder itself (it differs from run to run; the regex
 * accepts any). Build
 * one with `at(file, line, column, /message/)`; for a problem with the
 * folder as a whole, `file` is "" and the line starts with the folder path.
 */
import { edit, insertAfter, RB87, SITE, SR88, type FileMap } from "./validData.js";

export type { FileMap };

export interface BadInput {
  name: string;
  files: () => FileMap;
  expect: RegExp;
}

const esc = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** The regex for one formatted problem line. */
/** `column` "any" accepts any column (where a parser decides it). */
export function at(file: string, line: number, column: number | "any", message: RegExp): RegExp {
  const where = file === "" ? "[^:]+" : `(?:.*/)?${esc(file)}`;
  return new RegExp(`^${where}:${line}:${column === "any" ? "\\d+" : column}: ${message.source}`);
}

const R = "species/rb87.yaml";
const S = "species/sr88.yaml";
/** rb87 edited, with a valid sr88 and site beside it. */
const rb = (text: string | Uint8Array): FileMap => ({ [R]: text, [S]: SR88, "site.yaml": SITE });
const sr = (text: string): FileMap => ({ [R]: RB87, [S]: text, "site.yaml": SITE });
const site = (text: string): FileMap => ({ [R]: RB87, [S]: SR88, "site.yaml": text });

/** A level and a line to test selection rules on rb87: the level after line 29, the line at the end. */
function rbWith(level: string, line: string): string {
  return insertAfter(RB87, 29, level).replace(/\n?$/, "\n") + line;
}
const LEVEL_4D52 = `  - id: 4d-D5/2
    config: 4d
    term: 2D5/2
    source: "handbook data"`;
const LEVEL_3P1 = `  - id: 5s5p-3P1
    config: 5s5p
    term: 3Po1
    source: "handbook data"`;
const LEVEL_4F72 = `  - id: 4f-F7/2
    config: 4f
    term: 2Fo7/2
    source: "handbook data"`;

const nested = (depth: number): string => "[".repeat(depth) + "]".repeat(depth);

export const BAD_INPUTS: readonly BadInput[] = [
  // --- YAML itself
  {
    name: "YAML syntax error: unclosed flow map",
    files: () => rb(edit(RB87, `hyperfine: { A: "408.328 MHz" }`, `hyperfine: { A: "408.328 MHz"`)),
    expect: at(R, 21, 5, /YAML syntax error: .*; .+/),
  },
  {
    name: "YAML duplicate key",
    files: () => rb(edit(RB87, `label: "87Rb"\n`, `label: "87Rb"\nlabel: "Rb-87"\n`)),
    expect: at(R, 4, 1, /YAML syntax error: Map keys must be unique; each key may appear only once/),
  },
  {
    name: "tab used for indentation",
    files: () => rb(edit(RB87, "  spin: 3/2", "\tspin: 3/2")),
    expect: at(R, 6, 1, /YAML syntax error: .*tab.*/i),
  },
  {
    name: "two YAML documents in one species file",
    files: () => rb(RB87 + "---\nid: other\n"),
    expect: at(R, 41, 1, /YAML syntax error: Source contains multiple documents.*one species in each file/),
  },
  {
    name: "YAML anchor",
    files: () => rb(edit(RB87, `  source: "handbook data"\nnotes`, `  source: &src "handbook data"\nnotes`)),
    expect: at(R, 8, 11, /YAML anchor &src is not allowed; .*write every value out in full/),
  },
  {
    name: "YAML alias",
    files: () => rb(edit(edit(RB87, `  source: "handbook data"\nnotes`, `  source: &src "handbook data"\nnotes`), `    source: "handbook data"\n  - id: 5p-P1/2`, `    source: *src\n  - id: 5p-P1/2`)),
    expect: at(R, 16, 13, /YAML alias \*src is not allowed/),
  },
  {
    name: "YAML tag",
    files: () => rb(edit(RB87, "spin: 3/2", "spin: !!float 1.5")),
    expect: at(R, 6, 9, /YAML tag !!float is not allowed; remove the tag/),
  },
  {
    name: "nesting deeper than the limit",
    files: () => rb(edit(RB87, `notes: "Alkali test species."`, `notes: ${nested(25)}`)),
    expect: at(R, 9, 27, /YAML is nested more than 20 levels deep/),
  },
  {
    name: "nesting deep enough to exhaust the parser",
    files: () => rb(edit(RB87, `notes: "Alkali test species."`, `notes: ${nested(20000)}`)),
    expect: at(R, 9, "any", /YAML is nested too deeply to read/),
  },
  // --- files and folder
  { name: "empty species file", files: () => rb(""), expect: at(R, 1, 1, /file is empty; a species file is a map/) },
  { name: "species file with only a comment", files: () => rb("# nothing yet\n"), expect: at(R, 1, 1, /file is empty/) },
  {
    name: "species file that is a list",
    files: () => rb("- id: rb87\n- label: 87Rb\n"),
    expect: at(R, 1, 1, /a species file must be a map \(key: value lines\), not a list/),
  },
  {
    name: "species file that is a scalar",
    files: () => rb("rubidium 87\n"),
    expect: at(R, 1, 1, /a species file must be a map .*, not the text "rubidium 87"/),
  },
  {
    name: "file that is not UTF-8",
    files: () => rb(Uint8Array.from([...Buffer.from("id: rb87\nlabel: \""), 0xff, 0xfe, ...Buffer.from("\"\n")])),
    expect: at(R, 2, 9, /file is not valid UTF-8 text; save it as UTF-8/),
  },
  {
    name: "50 MB species file",
    files: () => rb(new Uint8Array(50 * 1024 * 1024).fill(0x20)),
    expect: at(R, 1, 1, /file is 52428800 bytes, more than the limit of 2097152 bytes/),
  },
  {
    name: "file in species/ that is not YAML",
    files: () => ({ ...rb(RB87), "species/rb87.yaml.bak": RB87 }),
    expect: at("species/rb87.yaml.bak", 1, 1, /file in species\/ is not a species file; species files end in \.yaml or \.yml/),
  },
  {
    name: "data folder without species/",
    files: () => ({ "site.yaml": SITE }),
    expect: at("", 1, 1, /data folder has no species\/ folder/),
  },
  {
    name: "duplicate species id across files",
    files: () => ({ ...rb(RB87), "species/rb87-copy.yaml": RB87 }),
    expect: at("species/rb87.yaml", 2, 5, /species id "rb87" is already used; .*rb87-copy\.yaml \(line 2\) has the same id/),
  },
  // --- types and required keys
  {
    name: "levels is not a list",
    files: () => rb(RB87.slice(0, RB87.indexOf("levels:")) + "levels: 5s\n"),
    expect: at(R, 10, 9, /levels in species file must be a list, not the text "5s"/),
  },
  {
    name: "lines is not a list",
    files: () => rb(RB87.slice(0, RB87.indexOf("lines:")) + "lines: { D2: 780 }\n"),
    expect: at(R, 30, 8, /lines in species file must be a list, not a map/),
  },
  {
    name: "spin given as a list",
    files: () => rb(edit(RB87, "spin: 3/2", "spin: [3, 2]")),
    expect: at(R, 6, 9, /spin in nucleus must be a single value, not a list/),
  },
  {
    name: "level that is not a map",
    files: () => rb(insertAfter(RB87, 29, "  - 4d")),
    expect: at(R, 30, 5, /each level must be a map .*, not the text "4d"/),
  },
  {
    name: "empty list of levels",
    files: () => sr("id: sr88\nlabel: \"88Sr\"\nlevels: []\n"),
    expect: at(S, 3, 9, /levels is empty; list at least one level/),
  },
  { name: "missing species id", files: () => rb(edit(RB87, "id: rb87\n", "")), expect: at(R, 2, 1, /species file has no id; add 'id: /) },
  { name: "missing label", files: () => rb(edit(RB87, `label: "87Rb"\n`, "")), expect: at(R, 2, 1, /species file has no label/) },
  {
    name: "missing levels",
    files: () => sr("id: sr88\nlabel: \"88Sr\"\n"),
    expect: at(S, 1, 1, /species file has no levels; levels is a list/),
  },
  { name: "missing term", files: () => rb(edit(RB87, "    term: 2S1/2\n", "")), expect: at(R, 11, 5, /level has no term; add the LS term/) },
  { name: "missing level id", files: () => sr(edit(SR88, "  - id: 5s5p-3P0\n    config", "  - config")), expect: at(S, 12, 5, /level has no id/) },
  { name: "missing config", files: () => rb(edit(RB87, "    config: 5s\n", "")), expect: at(R, 11, 5, /level has no config/) },
  {
    name: "missing level source",
    files: () => sr(edit(SR88, `    term: 3Po0\n    source: "handbook data"\n`, "    term: 3Po0\n")),
    expect: at(S, 12, 5, /level has no source; name where the values come from/),
  },
  {
    name: "empty level source",
    files: () => sr(edit(SR88, `    term: 3Po0\n    source: "handbook data"\n`, `    term: 3Po0\n    source: ""\n`)),
    expect: at(S, 15, 13, /source in level is empty/),
  },
  {
    name: "missing upper level of a line",
    files: () => sr(edit(SR88, "    upper: 5s5p-3P1\n", "")),
    expect: at(S, 17, 5, /line has no upper/),
  },
  {
    name: "hyperfine without A",
    files: () => rb(edit(RB87, `hyperfine: { A: "408.328 MHz" }`, `hyperfine: { B: "0 MHz" }`)),
    expect: at(R, 20, 16, /hyperfine has no A/),
  },
  // --- unknown keys
  {
    name: "misspelt key multipole",
    files: () => rb(edit(RB87, "multipole: E1", "multipol: E1")),
    expect: at(R, 39, 5, /unknown key "multipol" in line; did you mean "multipole"\?/),
  },
  {
    name: "misspelt top-level key label",
    files: () => rb(edit(RB87, `label: "87Rb"`, `label: "87Rb"\nlable: "Rb"`)),
    expect: at(R, 4, 1, /unknown key "lable" in species file; did you mean "label"\?/),
  },
  {
    name: "unknown key in site.yaml",
    files: () => site(edit(SITE, "fields:", "feilds:")),
    expect: at("site.yaml", 3, 1, /unknown key "feilds" in site\.yaml; did you mean "fields"\?/),
  },
  // --- ids
  { name: "species id with upper case", files: () => rb(edit(RB87, "id: rb87", "id: Rb87")), expect: at(R, 2, 5, /species id "Rb87" has characters that are not allowed; .*perhaps "rb87"/) },
  { name: "level id with a space", files: () => sr(edit(SR88, "  - id: 5s5p-3P0", '  - id: "5s5p 3P0"')), expect: at(S, 12, 9, /level id "5s5p 3P0" has characters that are not allowed/) },
  { name: "line id with a colon", files: () => sr(edit(SR88, "  - id: intercombination", '  - id: "689:nm"')), expect: at(S, 17, 9, /line id "689:nm" has characters that are not allowed/) },
  {
    name: "duplicate level id",
    files: () => rb(insertAfter(RB87, 29, `  - id: 5s-S1/2\n    config: 5s\n    term: 2S1/2\n    source: "handbook data"`)),
    expect: at(R, 30, 9, /level id "5s-S1\/2" is used twice; the first is on line 11/),
  },
  {
    name: "two level ids with the same page name",
    files: () => rb(insertAfter(RB87, 29, `  - id: 5s-S1_2\n    config: 5s\n    term: 2S1/2\n    source: "handbook data"`)),
    expect: at(R, 30, 9, /level ids "5s-S1\/2" and "5s-S1_2" give the same page name "5s-S1_2"; .*the other is on line 11/),
  },
  { name: "duplicate line id", files: () => rb(edit(RB87, "  - id: D2", "  - id: D1")), expect: at(R, 35, 9, /line id "D1" is used twice; the first is on line 31/) },
  {
    name: "line naming a missing level",
    files: () => rb(edit(RB87, "upper: 5p-P3/2", "upper: 5p-P3/2x")),
    expect: at(R, 36, 12, /upper level "5p-P3\/2x" is not a level of this species; level ids nearby: 5p-P3\/2/),
  },
  { name: "line from a level to itself", files: () => rb(edit(RB87, "    lower: 5s-S1/2\n    wavelength: \"780", "    lower: 5p-P3/2\n    wavelength: \"780")), expect: at(R, 37, 12, /line connects level "5p-P3\/2" to itself/) },
  // --- multipoles and selection rules
  { name: "unknown multipole", files: () => rb(edit(RB87, "multipole: E1", "multipole: E4")), expect: at(R, 39, 16, /unknown multipole "E4"; .*one of E1, M1, E2, M2, E3/) },
  {
    name: "E1 with |ΔJ| = 2",
    files: () => rb(rbWith(LEVEL_4D52, "  - id: quad\n    upper: 4d-D5/2\n    lower: 5s-S1/2\n")),
    expect: at(R, 45, 9, /line quad: E1 line J = 5\/2 → J = 1\/2 changes J by 2; .*multipole: E2/),
  },
  {
    name: "M1 with |ΔJ| = 2",
    files: () => rb(rbWith(LEVEL_4D52, "  - id: quad\n    upper: 4d-D5/2\n    lower: 5s-S1/2\n    multipole: M1\n")),
    expect: at(R, 48, 16, /line quad: M1 line J = 5\/2 → J = 1\/2 changes J by 2/),
  },
  {
    name: "E2 with |ΔJ| = 3",
    files: () => rb(rbWith(LEVEL_4F72, "  - id: oct\n    upper: 4f-F7/2\n    lower: 5s-S1/2\n    multipole: E2\n")),
    expect: at(R, 48, 16, /line oct: E2 line J = 7\/2 → J = 1\/2 changes J by 3; E2 allows \|ΔJ\| ≤ 2/),
  },
  {
    name: "E1 between J = 0 and J = 0",
    files: () => sr(SR88 + "  - id: clock\n    upper: 5s5p-3P0\n    lower: 5s2-1S0\n"),
    expect: at(S, 21, 9, /line clock: E1 line J = 0 → J = 0 is forbidden/),
  },
  {
    name: "M1 between J = 0 and J = 0",
    files: () => sr(SR88 + "  - id: clock\n    upper: 5s5p-3P0\n    lower: 5s2-1S0\n    multipole: M1\n"),
    expect: at(S, 24, 16, /line clock: M1 line J = 0 → J = 0 is forbidden/),
  },
  {
    name: "E2 between J = 0 and J = 0",
    files: () => sr(SR88 + "  - id: clock\n    upper: 5s5p-3P0\n    lower: 5s2-1S0\n    multipole: E2\n"),
    expect: at(S, 24, 16, /line clock: E2 line J = 0 → J = 0 is forbidden/),
  },
  {
    name: "E2 between J = 1 and J = 0",
    files: () => sr(SR88 + "    multipole: E2\n"),
    expect: at(S, 21, 16, /line intercombination: E2 line J = 1 → J = 0 is forbidden; E2 needs J \+ J' ≥ 2/),
  },
  {
    name: "E2 between J = 1/2 and J = 1/2",
    files: () => rb(edit(RB87, `    wavelength: "794.978851156 nm"\n`, `    wavelength: "794.978851156 nm"\n    multipole: E2\n`)),
    expect: at(R, 35, 16, /line D1: E2 line J = 1\/2 → J = 1\/2 is forbidden/),
  },
  {
    name: "E3 between J = 1 and J = 0",
    files: () => sr(SR88 + "    multipole: E3\n"),
    expect: at(S, 21, 16, /line intercombination: E3 line J = 1 → J = 0 is forbidden; E3 needs J \+ J' ≥ 3: 0 ↔ 1, 0 ↔ 2, 1 ↔ 1, 1\/2 ↔ 1\/2 and 1\/2 ↔ 3\/2 are forbidden/),
  },
  {
    name: "M2 with |ΔJ| = 3",
    files: () => rb(rbWith(LEVEL_4F72, "  - id: oct\n    upper: 4f-F7/2\n    lower: 5s-S1/2\n    multipole: M2\n")),
    expect: at(R, 48, 16, /line oct: M2 line J = 7\/2 → J = 1\/2 changes J by 3; M2 allows \|ΔJ\| ≤ 2; .*multipole: E3 between levels of opposite parity/),
  },
  {
    name: "M2 between two odd terms",
    files: () => rb(RB87 + "  - id: fine\n    upper: 5p-P3/2\n    lower: 5p-P1/2\n    multipole: M2\n"),
    expect: at(R, 44, 16, /line fine: M2 line between two odd terms \(2Po3\/2 and 2Po1\/2\) is forbidden by parity; M2 connects terms of opposite parity/),
  },
  {
    name: "E1 between two odd terms",
    files: () => rb(RB87 + "  - id: fine\n    upper: 5p-P3/2\n    lower: 5p-P1/2\n"),
    expect: at(R, 41, 9, /line fine: E1 line between two odd terms \(2Po3\/2 and 2Po1\/2\) is forbidden by parity/),
  },
  // --- integer and half-integer J in one species
  {
    name: "integer-J level among half-integer-J levels",
    files: () => rb(rbWith(LEVEL_3P1, "")),
    expect: at(R, 32, 11, /level "5s5p-3P1" has integer J = 1, but the other levels of this species have half-integer J \(first: "5s-S1\/2", line 11\); .*one atom or ion has only integer or only half-integer J/),
  },
  {
    name: "line joining integer and half-integer J",
    files: () => rb(rbWith(LEVEL_3P1, "  - id: mixed\n    upper: 5s5p-3P1\n    lower: 5s-S1/2\n")),
    expect: at(R, 46, 12, /line mixed: upper level "5s5p-3P1" has integer J = 1 and lower level "5s-S1\/2" half-integer J = 1\/2; no photon joins integer and half-integer J/),
  },
  {
    name: "half-integer-J level among integer-J levels, with its line",
    files: () => sr(insertAfter(SR88, 15, `  - id: 5s-2S1/2\n    config: 5s\n    term: 2S1/2\n    source: "handbook data"`).replace(/\n?$/, "\n") + "  - id: stray\n    upper: 5s5p-3P1\n    lower: 5s-2S1/2\n"),
    expect: at(S, 18, 11, /level "5s-2S1\/2" has half-integer J = 1\/2, but the other levels of this species have integer J \(first: "5s2-1S0", line 4\)/),
  },
  // --- nucleus and hyperfine
  {
    name: "hyperfine but no nucleus",
    files: () => sr(edit(SR88, "    term: 3Po1\n", `    term: 3Po1\n    hyperfine: { A: "100 MHz" }\n`)),
    expect: at(S, 11, 16, /level has hyperfine constants but the species has no nucleus/),
  },
  {
    name: "hyperfine but nuclear spin 0",
    files: () => sr(edit(edit(SR88, "levels:\n", "nucleus:\n  spin: 0\nlevels:\n"), "    term: 3Po1\n", `    term: 3Po1\n    hyperfine: { A: "100 MHz" }\n`)),
    expect: at(S, 13, 16, /level has hyperfine constants but the nuclear spin is 0/),
  },
  {
    name: "B non-zero with I = 1/2",
    files: () => rb(edit(RB87, "spin: 3/2", "spin: 1/2")),
    expect: at(R, 27, 39, /hyperfine B is not zero but the nuclear spin is 1\/2; .*needs I ≥ 1/),
  },
  {
    name: "B non-zero with J = 1/2",
    files: () => rb(edit(RB87, `hyperfine: { A: "408.328 MHz" }`, `hyperfine: { A: "408.328 MHz", B: "1 MHz" }`)),
    expect: at(R, 20, 39, /hyperfine B is not zero but the level has J = 1\/2; .*needs J ≥ 1/),
  },
  { name: "negative nuclear spin", files: () => rb(edit(RB87, "spin: 3/2", "spin: -3/2")), expect: at(R, 6, 9, /nuclear spin -3\/2 is negative/) },
  { name: "nuclear spin not a half-integer", files: () => rb(edit(RB87, "spin: 3/2", "spin: 1/3")), expect: at(R, 6, 9, /nuclear spin "1\/3" is not an integer or half-integer/) },
  { name: "nuclear spin as a decimal", files: () => rb(edit(RB87, "spin: 3/2", "spin: 1.5")), expect: at(R, 6, 9, /nuclear spin "1\.5" is not an integer or half-integer; .*\(here 3\/2\)/) },
  {
    name: "both gI and moment",
    files: () => rb(edit(RB87, "  source: \"handbook data\"\nnotes", "  moment: \"+2.751818 muN\"\n  source: \"handbook data\"\nnotes")),
    expect: at(R, 8, 11, /nucleus gives both gI and moment; give exactly one/),
  },
  {
    name: "neither gI nor moment",
    files: () => rb(edit(RB87, `  gI: "-0.0009951414(10)"\n`, "")),
    expect: at(R, 6, 3, /nucleus with non-zero spin has neither gI nor moment/),
  },
  {
    name: "moment in a frequency unit",
    files: () => rb(edit(RB87, `  gI: "-0.0009951414(10)"`, `  moment: "2.751818 MHz"`)),
    expect: at(R, 7, 11, /moment: "MHz" is a frequency unit, not a moment unit; moment needs a moment unit; moment units are muN, μN, µN/),
  },
  // --- numbers
  { name: "malformed number", files: () => rb(edit(RB87, `gJ: "2.00233113(20)"`, `gJ: "2.0023x"`)), expect: at(R, 14, 9, /gJ: "2\.0023x" is not a number; write a decimal number/) },
  {
    name: "uncertainty with a decimal point in parentheses",
    files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: "1.3362(0.0013)"`)),
    expect: at(R, 26, 9, /gJ: "1\.3362\(0\.0013\)" is not a number; write the uncertainty in parentheses as digits of the last places/),
  },
  { name: "zero uncertainty", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: "1.3362(0)"`)), expect: at(R, 26, 9, /gJ: uncertainty \(0\) in "1\.3362\(0\)" is zero/) },
  { name: "NaN", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: .nan`)), expect: at(R, 26, 9, /gJ: "\.nan" is not a number; infinite and not-a-number values are not allowed/) },
  { name: "Infinity", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: .inf`)), expect: at(R, 26, 9, /gJ: "\.inf" is not a number; infinite/) },
  { name: "hexadecimal number", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: 0x1F`)), expect: at(R, 26, 9, /gJ: "0x1F" is not a number; hexadecimal/) },
  { name: "decimal comma", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: "1,3362"`)), expect: at(R, 26, 9, /gJ: "1,3362" is not a number; use a point, not a comma/) },
  { name: "number with more than 200 digits", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: 1.${"3".repeat(201)}`)), expect: at(R, 26, 9, /gJ: number has 202 digits, more than the limit of 200/) },
  { name: "exponent out of range", files: () => rb(edit(RB87, `gJ: "1.3362(13)"`, `gJ: 1e9999`)), expect: at(R, 26, 9, /gJ: exponent 9999 is out of range/) },
  // --- quantities
  { name: "mass not positive", files: () => rb(edit(RB87, `mass: "86.909180520 u"`, `mass: "-86.9 u"`)), expect: at(R, 4, 7, /mass -86\.9 u is not positive/) },
  { name: "mass in a length unit", files: () => rb(edit(RB87, `mass: "86.909180520 u"`, `mass: "86.9 nm"`)), expect: at(R, 4, 7, /mass: "nm" is a length unit, not a mass unit; mass needs a mass unit; mass units are u, Da/) },
  { name: "wavelength not positive", files: () => rb(edit(RB87, `"780.241209686 nm"`, `"0 nm"`)), expect: at(R, 38, 17, /wavelength 0 nm is not positive/) },
  { name: "wavelength in a frequency unit", files: () => rb(edit(RB87, `"780.241209686 nm"`, `"780 MHz"`)), expect: at(R, 38, 17, /wavelength: "MHz" is a frequency unit, not a length unit; wavelength needs a length unit; length units are m, µm, um, nm/) },
  { name: "unknown unit", files: () => rb(edit(RB87, `"780.241209686 nm"`, `"780.241209686 nmm"`)), expect: at(R, 38, 17, /wavelength: unknown unit "nmm" in "780\.241209686 nmm"; wavelength needs a length unit; length units are m,/) },
  { name: "wavelength without a unit", files: () => rb(edit(RB87, `"780.241209686 nm"`, `"780.241209686"`)), expect: at(R, 38, 17, /wavelength: "780\.241209686" has no unit; write wavelength as "<number> <unit>"/) },
  { name: "number glued to its unit", files: () => rb(edit(RB87, `"780.241209686 nm"`, `"780.241209686nm"`)), expect: at(R, 38, 17, /wavelength: "780\.241209686nm" needs a space between number and unit; write "780\.241209686 nm"/) },
  // --- air and vacuum wavelengths (issue 11, section 2)
  { name: "unknown medium", files: () => rb(edit(RB87, `"780.241209686 nm"\n`, `"780.241209686 nm"\n    medium: vaccum\n`)), expect: at(R, 39, 13, /unknown medium "vaccum"; did you mean vacuum\? medium is vacuum \(when left out\) or air/) },
  { name: "medium without a wavelength", files: () => rb(edit(RB87, `wavelength: "780.241209686 nm"`, `medium: air`)), expect: at(R, 38, 13, /medium: air without a wavelength; give the wavelength/) },
  { name: "air wavelength outside the air formula", files: () => rb(edit(RB87, `"780.241209686 nm"\n`, `"150 nm"\n    medium: air\n`)), expect: at(R, 38, 17, /air wavelength 150 nm is outside the range of the air formula \(200 nm to 2 µm\); give the vacuum wavelength/) },
  { name: "energy in a length unit", files: () => rb(edit(RB87, `energy: "12578.950 cm-1"`, `energy: "794.98 nm"`)), expect: at(R, 21, 13, /energy: "nm" is a length unit, not a frequency unit/) },
  // --- term symbols
  { name: "unknown L letter", files: () => rb(edit(RB87, "term: 2S1/2", "term: 2X1/2")), expect: at(R, 13, 11, /term: "X" is not an L letter \(term "2X1\/2"\); L letters are S P D F G H I K/) },
  { name: "J used as an L letter", files: () => rb(edit(RB87, "term: 2S1/2", "term: 2J1/2")), expect: at(R, 13, 11, /term: J is skipped in spectroscopic notation/) },
  { name: "multiplicity 0", files: () => rb(edit(RB87, "term: 2S1/2", "term: 0S1/2")), expect: at(R, 13, 11, /term: multiplicity 0 in term "0S1\/2" is less than 1/) },
  { name: "J not reachable from L and S", files: () => rb(edit(RB87, "term: 2Po3/2", "term: 2Po5/2")), expect: at(R, 25, 11, /term: J = 5\/2 cannot arise from L = 1 and S = 1\/2 \(term "2Po5\/2"\); J runs from \|L−S\| to L\+S, here 1\/2, 3\/2/) },
  { name: "integer J with half-integer S", files: () => rb(edit(RB87, "term: 2S1/2", "term: 2S1")), expect: at(R, 13, 11, /term: J = 1 in term "2S1" does not fit multiplicity 2; S = 1\/2 makes J a half-integer/) },
  { name: "term with lower-case letter", files: () => rb(edit(RB87, "term: 2S1/2", "term: 2s1/2")), expect: at(R, 13, 11, /term: L letter "s" in term "2s1\/2" is lower case; write it in upper case: 2S1\/2/) },
  { name: "term in markup", files: () => rb(edit(RB87, "term: 2S1/2", "term: 2S_{1/2}")), expect: at(R, 13, 11, /term: term "2S_\{1\/2\}" uses markup/) },
  // --- terms outside LS coupling (the 3P0 level of sr88, line 14, rewritten)
  { name: "jK term without coupling", files: () => sr(edit(SR88, "term: 3Po0", "term: 2[3/2]o2")), expect: at(S, 14, 11, /term: term "2\[3\/2\]o2" is written in jK coupling, but the level has no coupling; add the parent term and the outer electron's l, e.g. coupling: \{ scheme: jK/) },
  { name: "jK K the core and l cannot give", files: () => sr(edit(SR88, "term: 3Po0", "term: 2[5/2]o2\n    coupling: { scheme: jK, core: 2Po3/2, l: 0 }")), expect: at(S, 14, 11, /term: K = 5\/2 cannot arise from the core's j1 = 3\/2 \(2Po3\/2\) and the outer electron's l = 0 \(term "2\[5\/2\]o2"\); K runs from \|j1−l\| to j1\+l, here 3\/2/) },
  { name: "jK J the K cannot give", files: () => sr(edit(SR88, "term: 3Po0", "term: 2[3/2]o3\n    coupling: { scheme: jK, core: 2Po3/2, l: 0 }")), expect: at(S, 14, 11, /term: J = 3 cannot arise from K = 3\/2 and the outer electron's s = 1\/2 \(term "2\[3\/2\]o3"\); J = K ± 1\/2, here 1, 2/) },
  { name: "jj j the l cannot give", files: () => sr(edit(SR88, "term: 3Po0", `term: "(3/2,1/2)1"\n    coupling: { scheme: jj, l: [0, 1] }`)), expect: at(S, 14, 11, /term: j1 = 3\/2 cannot arise from l1 = 0 and s = 1\/2 \(term "\(3\/2,1\/2\)1"\); j = l ± 1\/2, here 1\/2/) },
  { name: "jj J the j cannot give", files: () => sr(edit(SR88, "term: 3Po0", `term: "(3/2,1/2)4"\n    coupling: { scheme: jj, l: [1, 1] }`)), expect: at(S, 14, 11, /term: J = 4 cannot arise from j1 = 3\/2 and j2 = 1\/2/) },
  { name: "coupling beside an LS term", files: () => sr(edit(SR88, "term: 3Po0", "term: 3Po0\n    coupling: { scheme: jK, core: 2Po3/2, l: 0 }")), expect: at(S, 14, 11, /term: term "3Po0" is an LS term, but the level gives coupling \(scheme jK\); leave coupling out/) },
  { name: "unknown coupling scheme", files: () => sr(edit(SR88, "term: 3Po0", "term: 2[3/2]o2\n    coupling: { scheme: JK, core: 2Po3/2, l: 0 }")), expect: at(S, 15, 25, /unknown coupling scheme "JK"; did you mean jK\?/) },
  { name: "jK coupling without core", files: () => sr(edit(SR88, "term: 3Po0", "term: 2[3/2]o2\n    coupling: { scheme: jK, l: 0 }")), expect: at(S, 15, 15, /coupling has no core; add the parent term of the core/) },
  { name: "jK core that is no LS term", files: () => sr(edit(SR88, "term: 3Po0", "term: 2[3/2]o2\n    coupling: { scheme: jK, core: 2Po5/2, l: 0 }")), expect: at(S, 15, 35, /coupling core: J = 5\/2 cannot arise from L = 1 and S = 1\/2/) },
  { name: "jj coupling with one l", files: () => sr(edit(SR88, "term: 3Po0", `term: "(3/2,1/2)1"\n    coupling: { scheme: jj, l: [1] }`)), expect: at(S, 15, "any", /l in a jj coupling lists 1 values; list the two electrons' l/) },
  // --- site.yaml
  { name: "site field malformed", files: () => site(edit(SITE, `"10 G"`, `"ten G"`)), expect: at("site.yaml", 3, 24, /field: "ten" is not a number; write a decimal number/) },
  { name: "site field with unknown unit", files: () => site(edit(SITE, `"10 G"`, `"10 Gauss"`)), expect: at("site.yaml", 3, 24, /field: unknown unit "Gauss" in "10 Gauss"; field needs a field unit; field units are T, mT/) },
  { name: "site field negative", files: () => site(edit(SITE, `"10 G"`, `"-10 G"`)), expect: at("site.yaml", 3, 24, /field "-10 G" is negative/) },
  { name: "site fields not a list", files: () => site(edit(SITE, `fields: ["0 G", "1 G", "10 G", "1000 G", "0.1 T"]`, `fields: "10 G"`)), expect: at("site.yaml", 3, 9, /fields in site\.yaml must be a list/) },
  { name: "site pathPrefix without slashes", files: () => site(edit(SITE, `pathPrefix: "/atlas/"`, `pathPrefix: "atlas"`)), expect: at("site.yaml", 6, 13, /pathPrefix "atlas" must start and end with "\/"; write "\/atlas\/"/) },
  { name: "site unknown constants edition", files: () => site(edit(SITE, `"CODATA 2022"`, `"CODATA 2018"`)), expect: at("site.yaml", 4, 12, /unknown constants edition "CODATA 2018"; known editions: CODATA 2022/) },
  { name: "site siteUrl not a web address", files: () => site(edit(SITE, `"https://example.org/atlas/"`, `"example dot org"`)), expect: at("site.yaml", 5, 10, /siteUrl "example dot org" is not a web address/) },
  { name: "site.yaml that is a list", files: () => site("- title\n"), expect: at("site.yaml", 1, 1, /site\.yaml must be a map/) },
];
