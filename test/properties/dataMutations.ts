/**
 * Random damage to a valid data folder, for the "never crash" property of
 * the loader: lines deleted, duplicated, swapped, keys renamed, values
 * replaced by edge cases, garbage and invalid bytes inserted, files
 * truncated, removed or added. Shared by the test and `npm run fuzz`.
 */
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { InputProblems } from "../../src/data/inputError.js";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";

/** Values that parsers and validators trip over. */
const EDGE_VALUES = [
  "", "0", "-0", "-1", "1e400", "-1e-400", "NaN", ".nan", ".inf", "-.inf", "~", "null", "true", "no", "0x1F", "0o17",
  "3/2", "-3/2", "99/2", "1/0", "0/0", "2Po3/2", "2P3/2", "7Zo1", "1S0", "2S1/2", "99Do99/2",
  "1 T", "1 G", "10 G", "-5 G", "1e9 T", "2.00233113(20)", "2.0(0)", "1.0(-1)", "1(((2)))", "12.4965 MHz", "-3417 MHz",
  "999999999999999999999999999999 MHz", "0.000000000000000000000001 GHz", "780.2 nm", "0 nm", "-1 nm", "12816.549 cm-1", "1 furlong",
  "E1", "M1", "E2", "E3", "\"\"", "''", "[]", "{}", "[1, 2]", "{ A: 1 }", "&x 1", "*x", "!!str 1", "!custom x", "|", ">", "- a",
  "\"unterminated", "'unterminated", "\\u0000", "é", "\u202e", "\ud800", "<script>", "a: b: c", "#", "? x",
];

/** Fragments inserted as raw text. */
const GARBAGE = ["\t", "\0", "\uFEFF", ": ", "- ", "  ", "\n", "\n\n", "---\n", "...\n", "%YAML 1.1\n", "{", "}", "[", "]", "\"", "'", "&a ", "*a", "!!binary ", "? ", "#", "\r", "\r\n", "\u2028", "x".repeat(2000)];

export type Mutation =
  | { kind: "deleteLine" | "duplicateLine" | "swapLines" | "truncate" | "renameKey"; at: number; b: number }
  | { kind: "setValue"; at: number; value: string }
  | { kind: "insert"; at: number; text: string }
  | { kind: "bytes"; at: number; byte: number };

export interface FileDamage {
  /** Index into the folder's files (modulo their number). */
  file: number;
  mutations: Mutation[];
  /** Instead of editing: remove the file, or add a stray one. */
  whole: "edit" | "remove" | "stray";
}

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constantFrom("deleteLine", "duplicateLine", "swapLines", "truncate", "renameKey"), at: fc.nat(), b: fc.nat() }) as fc.Arbitrary<Mutation>,
  fc.record({ kind: fc.constant("setValue" as const), at: fc.nat(), value: fc.oneof(fc.constantFrom(...EDGE_VALUES), fc.string({ maxLength: 12 })) }),
  fc.record({ kind: fc.constant("insert" as const), at: fc.nat(), text: fc.oneof(fc.constantFrom(...GARBAGE), fc.string({ maxLength: 8, unit: "grapheme" })) }),
  fc.record({ kind: fc.constant("bytes" as const), at: fc.nat(), byte: fc.integer({ min: 0x80, max: 0xff }) }),
);

export const damage: fc.Arbitrary<FileDamage> = fc.record({
  file: fc.nat(),
  mutations: fc.array(mutation, { minLength: 1, maxLength: 4 }),
  whole: fc.constantFrom("edit", "edit", "edit", "edit", "edit", "edit", "edit", "edit", "remove", "stray"),
});

function applyText(text: string, m: Exclude<Mutation, { kind: "bytes" }>): string {
  const lines = text.split("\n");
  const i = m.at % Math.max(1, lines.length);
  switch (m.kind) {
    case "deleteLine":
      lines.splice(i, 1);
      return lines.join("\n");
    case "duplicateLine":
      lines.splice(i, 0, lines[i] ?? "");
      return lines.join("\n");
    case "swapLines": {
      const j = m.b % Math.max(1, lines.length);
      [lines[i], lines[j]] = [lines[j] ?? "", lines[i] ?? ""];
      return lines.join("\n");
    }
    case "truncate":
      return text.slice(0, m.at % (text.length + 1));
    case "renameKey":
      lines[i] = (lines[i] ?? "").replace(/^(\s*-?\s*)([A-Za-z_]+)(\s*:)/, (_, pre: string, key: string, colon: string) => `${pre}${key.slice(0, m.b % (key.length + 1))}${"x".repeat(m.b % 2)}${colon}`);
      return lines.join("\n");
    case "setValue":
      lines[i] = (lines[i] ?? "").replace(/^(\s*-?\s*[A-Za-z_]+\s*:\s*).*$/, (_, keyPart: string) => keyPart + m.value);
      return lines.join("\n");
    case "insert": {
      const at = m.at % (text.length + 1);
      return text.slice(0, at) + m.text + text.slice(at);
    }
  }
}

export function applyDamage(original: Buffer, mutations: Mutation[]): Buffer {
  let buf = original;
  for (const m of mutations) {
    if (m.kind === "bytes") {
      const at = m.at % (buf.length + 1);
      buf = Buffer.concat([buf.subarray(0, at), Buffer.from([m.byte]), buf.subarray(at)]);
    } else {
      buf = Buffer.from(applyText(buf.toString("utf8"), m), "utf8");
    }
  }
  return buf;
}

/** A writable copy of a data folder that can be damaged and restored file by file. */
export class ScratchFolder {
  readonly files: string[];
  private readonly originals = new Map<string, Buffer>();
  constructor(
    readonly source: string,
    readonly dir: string,
  ) {
    this.files = ["site.yaml", ...readdirSync(join(source, "species")).filter((n) => n.endsWith(".yaml")).map((n) => `species/${n}`)];
    mkdirSync(join(dir, "species"), { recursive: true });
    for (const f of this.files) {
      const bytes = readFileSync(join(source, f));
      this.originals.set(f, bytes);
      writeFileSync(join(dir, f), bytes);
    }
  }

  /** Apply one damage, run `fn`, put the folder back. */
  with<T>(d: FileDamage, fn: () => T): T {
    const f = this.files[d.file % this.files.length]!;
    const stray = join(this.dir, "species", "stray.yaml");
    try {
      if (d.whole === "remove") rmSync(join(this.dir, f));
      else if (d.whole === "stray") writeFileSync(stray, applyDamage(this.originals.get(f)!, d.mutations));
      else writeFileSync(join(this.dir, f), applyDamage(this.originals.get(f)!, d.mutations));
      return fn();
    } finally {
      rmSync(stray, { force: true });
      writeFileSync(join(this.dir, f), this.originals.get(f)!);
    }
  }
}

export type LoadOutcome = { ok: true } | { ok: false; lines: string[] };

/**
 * Load the folder: it either loads, or throws InputProblems whose every
 * line is `file:line:column: message`. Anything else (another exception, an
 * empty problem list, a malformed line) is thrown as a failure.
 */
export function loadOrExplain(dir: string): LoadOutcome {
  try {
    loadDataFolder(dir);
    return { ok: true };
  } catch (e) {
    if (!(e instanceof InputProblems)) throw new Error(`loadDataFolder crashed: ${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}`);
    const lines = e.format().split("\n");
    if (e.problems.length === 0) throw new Error("InputProblems with no problem in it");
    for (const l of lines) {
      if (!/^[^\n]+:\d+:\d+: \S/.test(l)) throw new Error(`problem line not in file:line:column form: ${JSON.stringify(l)}`);
      if (/\s+at \S+ \(|\.ts:\d+:\d+\)/.test(l)) throw new Error(`stack trace in a problem line: ${JSON.stringify(l)}`);
      if (/unexpected failure/.test(l)) throw new Error(`the loader caught its own bug: ${l}`);
    }
    return { ok: false, lines };
  }
}
