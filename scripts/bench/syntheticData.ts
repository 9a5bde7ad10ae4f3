/**
 * A synthetic data folder of any size for the benchmark: species with
 * real-looking configurations, LS terms, nuclear spins, gI values and
 * hyperfine constants of the usual magnitudes, and lines that obey the
 * selection rules of the data contract (E1 between an even and an odd
 * level, |ΔJ| ≤ 1, no 0 ↔ 0). Deterministic for a given size. The numbers
 * only make the work realistic; they are not data about any atom.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";

export interface SyntheticSize {
  species: number;
  levels: number;
  lines: number;
  fields: number;
}

export const DEFAULT_SIZE: SyntheticSize = { species: 100, levels: 2000, lines: 5000, fields: 7 };

/** A small deterministic generator (mulberry32). */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Term {
  text: string;
  J2: number;
  odd: boolean;
}

const LETTERS = "SPDFGH";
/** LS terms 2S+1 L J for one or two valence electrons, with parity from the configuration. */
function termsOf(mult: number, L: number, odd: boolean): Term[] {
  const S2 = mult - 1;
  const out: Term[] = [];
  for (let J2 = Math.abs(2 * L - S2); J2 <= 2 * L + S2; J2 += 2) {
    const j = J2 % 2 === 0 ? String(J2 / 2) : `${J2}/2`;
    out.push({ text: `${mult}${LETTERS[L]}${odd ? "o" : ""}${j}`, J2, odd });
  }
  return out;
}

const ONE_ELECTRON = [
  { orb: "s", L: 0 },
  { orb: "p", L: 1 },
  { orb: "d", L: 2 },
  { orb: "f", L: 3 },
];
const SPINS2 = [1, 2, 3, 5, 7, 9];

const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
const digits = (r: () => number, n: number): string => Array.from({ length: n }, () => Math.floor(r() * 10)).join("");

/** The YAML of one species with `nLevels` levels and `nLines` lines. */
export function syntheticSpecies(k: number, nLevels: number, nLines: number): string {
  const r = rng(1000 + k);
  const twoElectron = k % 3 === 1;
  const hasNucleus = k % 3 !== 2;
  const I2 = hasNucleus ? pick(r, SPINS2) : 0;
  const mass = `${20 + (k % 200)}.${digits(r, 6)} u`;
  const lines: string[] = [
    `# Synthetic species ${k} for the benchmark (not data about any atom).`,
    `id: syn-${k}`,
    `label: "Synthetic ${k}"`,
    `mass: "${mass}"`,
  ];
  if (hasNucleus) {
    lines.push("nucleus:", `  spin: ${I2 % 2 === 0 ? I2 / 2 : `${I2}/2`}`, `  gI: "${r() < 0.5 ? "-" : ""}0.000${digits(r, 7)}"`, `  source: "benchmark generator"`);
  }
  lines.push(`notes: "Generated for timing the build."`, "levels:");
  const levels: { id: string; term: Term; energy: number }[] = [];
  let n = twoElectron ? 5 : 4;
  let energy = 0;
  while (levels.length < nLevels) {
    for (const { orb, L } of ONE_ELECTRON) {
      const odd = L % 2 === 1;
      const config = twoElectron ? `${n - 1}s${n}${orb}` : `${n}${orb}`;
      const mults = twoElectron ? [1, 3] : [2];
      for (const mult of mults) {
        for (const term of termsOf(mult, L, odd)) {
          if (levels.length >= nLevels) break;
          const id = `${config}-${term.text}`;
          lines.push(`  - id: ${id}`, `    config: ${config}`, `    term: ${term.text}`);
          if (r() < 0.3 && term.J2 > 0) lines.push(`    gJ: "${(1 + r()).toFixed(6)}(${1 + Math.floor(r() * 9)})"`);
          if (hasNucleus && term.J2 > 0 && r() < 0.6) {
            const A = `${r() < 0.15 ? "-" : ""}${(10 + r() * 3000).toFixed(4)} MHz`;
            const B = I2 >= 2 && term.J2 >= 2 && r() < 0.5 ? `, B: "${(r() * 40 - 20).toFixed(4)} MHz"` : "";
            lines.push(`    hyperfine: { A: "${A}"${B} }`);
          }
          if (levels.length > 0) lines.push(`    energy: "${energy.toFixed(3)} cm-1"`);
          lines.push(`    source: "benchmark generator"`);
          levels.push({ id, term, energy });
          energy += 100 + r() * 900;
        }
      }
    }
    n++;
  }
  lines.push("lines:");
  let made = 0;
  // E1 pairs: opposite parity, |ΔJ| ≤ 1, not 0 ↔ 0; upper is the higher level. Walk pairs in a fixed shuffled order.
  const pairs: [number, number][] = [];
  for (let i = 0; i < levels.length; i++) {
    for (let j = 0; j < i; j++) {
      const u = levels[i]!.term;
      const l = levels[j]!.term;
      if (u.odd === l.odd || Math.abs(u.J2 - l.J2) > 2 || (u.J2 === 0 && l.J2 === 0)) continue;
      pairs.push([i, j]);
    }
  }
  for (let i = pairs.length - 1; i > 0; i--) {
    const j = Math.floor(r() * (i + 1));
    [pairs[i], pairs[j]] = [pairs[j]!, pairs[i]!];
  }
  for (const [i, j] of pairs) {
    if (made >= nLines) break;
    const u = levels[i]!;
    const l = levels[j]!;
    const wavenumber = u.energy - l.energy; // cm-1
    const nm = 1e7 / wavenumber;
    lines.push(`  - id: L${made + 1}`, `    upper: ${u.id}`, `    lower: ${l.id}`, `    wavelength: "${nm.toFixed(4)} nm"`, "    multipole: E1", `    source: "benchmark generator"`);
    made++;
  }
  if (made < nLines) throw new Error(`species ${k}: only ${made} lines possible with ${nLevels} levels`);
  return lines.join("\n") + "\n";
}

const FIELDS = ["0 G", "0.5 G", "3.2 G", "10 G", "100 G", "0.1 T", "1 T", "2 T", "5 T", "10 T"];

/** Write the folder; species get levels/species and lines/species levels and lines each (rounded up). */
export function writeSyntheticData(dir: string, size: SyntheticSize): void {
  mkdirSync(join(dir, "species"), { recursive: true });
  const fields = FIELDS.slice(0, Math.max(1, Math.min(FIELDS.length, size.fields)));
  writeFileSync(
    join(dir, "site.yaml"),
    `title: "Benchmark atlas"\nlab: "Benchmark"\nfields: [${fields.map((f) => `"${f}"`).join(", ")}]\nconstants: "CODATA 2022"\n`,
  );
  const perLevels = Math.ceil(size.levels / size.species);
  const perLines = Math.ceil(size.lines / size.species);
  for (let k = 0; k < size.species; k++) writeFileSync(join(dir, "species", `syn-${k}.yaml`), syntheticSpecies(k, perLevels, perLines));
}
