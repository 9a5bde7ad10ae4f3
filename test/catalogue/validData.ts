/**
 * Valid data folders for tests and for the bad-input catalogue, which edits
 * them one problem at a time. The numbers are handbook values for 87Rb and
 * 88Sr recalled from memory; they serve as realistic input here, never as
 * check values.
 */

/** 87Rb: nucleus, three levels with hyperfine constants, two lines. Line numbers matter: the catalogue points at them. */
export const RB87 = `# yaml-language-server: $schema=../../schema/species.schema.json
id: rb87
label: "87Rb"
mass: "86.909180520 u"
nucleus:
  spin: 3/2
  gI: "-0.0009951414(10)"
  source: "handbook data"
notes: "Alkali test species."
levels:
  - id: 5s-S1/2
    config: 5s
    term: 2S1/2
    gJ: "2.00233113(20)"
    hyperfine: { A: "3417.341305452145 MHz" }
    source: "handbook data"
  - id: 5p-P1/2
    config: 5p
    term: 2Po1/2
    hyperfine: { A: "408.328 MHz" }
    energy: "12578.950 cm-1"
    source: "handbook data"
  - id: 5p-P3/2
    config: 5p
    term: 2Po3/2
    gJ: "1.3362(13)"
    hyperfine: { A: "84.7185 MHz", B: "12.4965 MHz" }
    energy: "12816.549 cm-1"
    source: "handbook data"
lines:
  - id: D1
    upper: 5p-P1/2
    lower: 5s-S1/2
    wavelength: "794.978851156 nm"
  - id: D2
    upper: 5p-P3/2
    lower: 5s-S1/2
    wavelength: "780.241209686 nm"
    multipole: E1
    source: "handbook data"
`;

/** 88Sr: no nucleus, J = 0 levels, one intercombination line. */
export const SR88 = `id: sr88
label: "88Sr"
levels:
  - id: 5s2-1S0
    config: 5s2
    term: 1S0
    source: "handbook data"
  - id: 5s5p-3P1
    config: 5s5p
    term: 3Po1
    source: "handbook data"
  - id: 5s5p-3P0
    config: 5s5p
    term: 3Po0
    source: "handbook data"
lines:
  - id: intercombination
    upper: 5s5p-3P1
    lower: 5s2-1S0
    wavelength: "689.449 nm"
`;

export const SITE = `title: "Test atlas"
lab: "Test lab"
fields: ["0 G", "1 G", "10 G", "1000 G", "0.1 T"]
constants: "CODATA 2022"
siteUrl: "https://example.org/atlas/"
pathPrefix: "/atlas/"
`;

/** Replace `find` (which must occur exactly once) by `put`. */
export function edit(text: string, find: string, put: string): string {
  const at = text.indexOf(find);
  if (at < 0 || text.indexOf(find, at + find.length) >= 0) throw new Error(`edit: ${JSON.stringify(find)} must occur exactly once`);
  return text.slice(0, at) + put + text.slice(at + find.length);
}

/** Insert `lines` (no trailing newline needed) after 1-based line `n`. */
export function insertAfter(text: string, n: number, lines: string): string {
  const all = text.split("\n");
  all.splice(n, 0, ...lines.replace(/\n$/, "").split("\n"));
  return all.join("\n");
}

export type FileMap = Record<string, string | Uint8Array>;

/** A complete valid folder: both species and a site.yaml. */
export function validFolder(): FileMap {
  return { "species/rb87.yaml": RB87, "species/sr88.yaml": SR88, "site.yaml": SITE };
}
