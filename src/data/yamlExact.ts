/**
 * YAML reading that keeps every scalar's text exactly as written, with its
 * position, and refuses the parts of YAML a data file never needs and an
 * attacker might use (anchors and aliases, deep nesting, huge files).
 *
 * The failsafe schema makes every scalar a string, so no scalar is ever
 * turned into a JavaScript number: `gJ: 2.0023311300000000000000001`
 * arrives as its 27 characters.
 */
import { isAlias, isMap, isPair, isScalar, isSeq, LineCounter, parseDocument, type Node, type Scalar, type YAMLMap, type YAMLSeq } from "yaml";
import { didYouMean } from "./didYouMean.js";
import type { Place, ProblemSink } from "./inputError.js";

/** Largest file read, in bytes. Bigger files are refused before reading. */
export const MAX_FILE_BYTES = 2 * 1024 * 1024;
/** Deepest nesting of lists and maps accepted (a species file needs 4). */
export const MAX_DEPTH = 20;

const START: Place = { line: 1, column: 1 };

/** Decoded, parsed YAML with a position for any node. */
export class YamlSource {
  constructor(
    readonly root: Node | null,
    private readonly lc: LineCounter,
    readonly sink: ProblemSink,
  ) {}

  place(node: Node | null | undefined): Place {
    const offset = node?.range?.[0];
    return offset === undefined ? START : this.placeOfOffset(offset);
  }

  placeOfOffset(offset: number): Place {
    const p = this.lc.linePos(offset);
    return { line: p.line, column: p.col };
  }
}

/** First offset where `bytes` stop being valid UTF-8, or -1. Used only to place the problem. */
function firstBadUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i] ?? 0;
    const n = b < 0x80 ? 0 : b >= 0xc2 && b <= 0xdf ? 1 : b >= 0xe0 && b <= 0xef ? 2 : b >= 0xf0 && b <= 0xf4 ? 3 : -1;
    if (n < 0) return i;
    for (let k = 1; k <= n; k++) if (((bytes[i + k] ?? 0) & 0xc0) !== 0x80) return i;
    i += n + 1;
  }
  return -1;
}

function placeOfByte(bytes: Uint8Array, offset: number): Place {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset; i++) {
    if (bytes[i] === 0x0a) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

/** Decode as UTF-8, refusing anything else (a lab's files may come from many editors). */
export function decodeUtf8(bytes: Uint8Array, sink: ProblemSink): string | null {
  if (bytes.length > MAX_FILE_BYTES) {
    sink.add(START, `file is ${bytes.length} bytes, more than the limit of ${MAX_FILE_BYTES} bytes`, "a data file is a few kilobytes; split it or remove what is not data");
    return null;
  }
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    const at = firstBadUtf8(bytes);
    sink.add(at < 0 ? START : placeOfByte(bytes, at), "file is not valid UTF-8 text", "save it as UTF-8 (most editors offer this under 'encoding')");
    return null;
  }
}

/**
 * Parse one YAML document. Syntax errors are reported with yaml's own
 * position; anchors, aliases, explicit tags and nesting beyond MAX_DEPTH
 * are reported too.
 * Returns null when the file has any such problem, so that nothing reads a
 * half-understood tree.
 */
export function parseYaml(text: string, sink: ProblemSink): YamlSource | null {
  const lc = new LineCounter();
  const before = sink.count;
  const doc = parseDocument(text, {
    lineCounter: lc,
    schema: "failsafe",
    prettyErrors: false,
    uniqueKeys: true,
    keepSourceTokens: false,
  });
  const src = new YamlSource(doc.contents as Node | null, lc, sink);
  const seen = new Set<string>();
  for (const e of doc.errors) {
    const p = lc.linePos(e.pos[0]);
    const at = { line: p.line, column: p.col };
    const key = `${at.line}:${at.column}`;
    if (seen.has(key)) continue;
    seen.add(key);
    if (e.code === "RESOURCE_EXHAUSTION") {
      sink.add(at, "YAML is nested too deeply to read", `a data file needs at most ${MAX_DEPTH} levels of nesting`);
    } else {
      const first = e.message.split("\n")[0] ?? e.message;
      sink.add(at, `YAML syntax error: ${first}`, yamlHint(e.code));
    }
  }
  if (sink.count > before) return null;
  checkTree(src, src.root, 0, text);
  return sink.count > before ? null : src;
}

function yamlHint(code: string): string {
  switch (code) {
    case "DUPLICATE_KEY":
      return "each key may appear only once in a map; remove or rename one";
    case "BAD_INDENT":
    case "MISSING_CHAR":
      return "check the indentation and closing brackets on this and the lines above";
    case "MULTIPLE_DOCS":
      return "put one species in each file and remove the '---' separator";
    case "TAB_AS_INDENT":
      return "indent with spaces, not tabs";
    default:
      return "see the YAML syntax near this position; quoting the value often helps";
  }
}

function checkTree(src: YamlSource, node: unknown, depth: number, text: string): void {
  if (node === null || node === undefined) return;
  if (isAlias(node)) {
    src.sink.add(src.place(node), `YAML alias *${node.source} is not allowed`, "write the value out in full; anchors and aliases are refused in data files");
    return;
  }
  if (isPair(node)) {
    checkTree(src, node.key, depth, text);
    checkTree(src, node.value, depth, text);
    return;
  }
  const n = node as Node;
  if ((isScalar(n) || isMap(n) || isSeq(n)) && n.anchor) {
    // The node starts after its anchor; point at the anchor itself.
    const start = n.range?.[0] ?? 0;
    const amp = text.lastIndexOf(`&${n.anchor}`, start);
    src.sink.add(amp >= 0 ? src.placeOfOffset(amp) : src.place(n), `YAML anchor &${n.anchor} is not allowed`, "remove the anchor and write every value out in full; anchors and aliases are refused in data files");
  }
  if ((isScalar(n) || isMap(n) || isSeq(n)) && n.tag) {
    const shown = n.tag.replace(/^tag:yaml\.org,2002:/, "!!");
    let bang = text.lastIndexOf("!", n.range?.[0] ?? 0);
    while (bang > 0 && !/[\s,[{]/.test(text[bang - 1] ?? " ")) bang--; // back to the start of the tag token
    src.sink.add(bang >= 0 ? src.placeOfOffset(bang) : src.place(n), `YAML tag ${shown} is not allowed`, "remove the tag; values are read as text and checked by the loader");
  }
  if (isMap(n) || isSeq(n)) {
    if (depth >= MAX_DEPTH) {
      src.sink.add(src.place(n), `YAML is nested more than ${MAX_DEPTH} levels deep`, "a species file needs only a few levels: species → levels → level → hyperfine");
      return;
    }
    for (const item of n.items) checkTree(src, item, depth + 1, text);
  }
}

/** Plain scalars that YAML would read as "no value". */
const NULLISH = new Set(["", "~", "null", "Null", "NULL"]);

/** The text of a scalar exactly as written (plain) or as quoted; null for a plain empty/null value. */
export function scalarText(node: Scalar): string | null {
  if (node.type === "PLAIN" || node.type === undefined) {
    const s = typeof node.source === "string" ? node.source : String(node.value);
    return NULLISH.has(s) ? null : s;
  }
  return String(node.value);
}

export function describe(node: unknown): string {
  if (isMap(node)) return "a map (key: value lines)";
  if (isSeq(node)) return "a list";
  if (isScalar(node)) return `the text "${String(node.value)}"`;
  return "nothing";
}

/** A scalar's text with its place. */
export interface TextAt {
  text: string;
  at: Place;
}

/**
 * Typed access to one YAML map: reports unknown keys (with a did-you-mean
 * hint), missing required keys and wrong types to the sink, and hands out
 * exact texts with positions.
 */
export class MapReader {
  private readonly values = new Map<string, Node | null>();
  private readonly keyPlaces = new Map<string, Place>();

  constructor(
    readonly src: YamlSource,
    readonly map: YAMLMap,
    /** What this map is, for messages: "level", "species file", ... */
    readonly what: string,
    known: readonly string[],
  ) {
    for (const pair of map.items) {
      const keyNode = pair.key as Node | null;
      if (!isScalar(keyNode)) {
        src.sink.add(src.place(keyNode ?? map), `a key in this ${what} is not plain text`, `keys are names such as ${known.slice(0, 3).join(", ")}`);
        continue;
      }
      const key = String(keyNode.value);
      if (!known.includes(key)) {
        const guess = didYouMean(key, known);
        src.sink.add(
          src.place(keyNode),
          `unknown key "${key}" in ${what}`,
          guess ? `did you mean "${guess}"? Known keys: ${known.join(", ")}` : `known keys: ${known.join(", ")}`,
        );
        continue;
      }
      this.values.set(key, (pair.value as Node | null) ?? null);
      this.keyPlaces.set(key, src.place(keyNode));
    }
  }

  get at(): Place {
    return this.src.place(this.map);
  }

  has(key: string): boolean {
    const v = this.values.get(key);
    return v !== undefined && v !== null && !(isScalar(v) && scalarText(v) === null);
  }

  private missing(key: string, hint: string): void {
    this.src.sink.add(this.keyPlaces.get(key) ?? this.at, `${this.what} has no ${key}`, hint);
  }

  /** Text of a scalar value; null (and a problem, if required) when absent or not a scalar. */
  text(key: string, required: boolean, hint = `add "${key}: ..."`): TextAt | null {
    const v = this.values.get(key);
    if (v === undefined || v === null || (isScalar(v) && scalarText(v) === null)) {
      if (required) this.missing(key, hint);
      return null;
    }
    if (!isScalar(v)) {
      this.src.sink.add(this.src.place(v), `${key} in ${this.what} must be a single value, not ${describe(v)}`, hint);
      return null;
    }
    return { text: scalarText(v) ?? "", at: this.src.place(v) };
  }

  /** A non-empty text (free text fields such as source, label). */
  nonEmpty(key: string, required: boolean, hint?: string): TextAt | null {
    const t = this.text(key, required, hint);
    if (t && t.text.trim() === "") {
      this.src.sink.add(t.at, `${key} in ${this.what} is empty`, hint ?? `write something after "${key}:" or leave the key out`);
      return null;
    }
    return t;
  }

  map_(key: string, required: boolean, hint: string): YAMLMap | null {
    const v = this.values.get(key);
    if (v === undefined || v === null || (isScalar(v) && scalarText(v) === null)) {
      if (required) this.missing(key, hint);
      return null;
    }
    if (!isMap(v)) {
      this.src.sink.add(this.src.place(v), `${key} in ${this.what} must be a map (key: value lines), not ${describe(v)}`, hint);
      return null;
    }
    return v;
  }

  seq(key: string, required: boolean, hint: string): YAMLSeq | null {
    const v = this.values.get(key);
    if (v === undefined || v === null || (isScalar(v) && scalarText(v) === null)) {
      if (required) this.missing(key, hint);
      return null;
    }
    if (!isSeq(v)) {
      this.src.sink.add(this.src.place(v), `${key} in ${this.what} must be a list, not ${describe(v)}`, hint);
      return null;
    }
    return v;
  }
}
