/**
 * Species results kept between builds, so a rebuild after editing one
 * species computes and renders only that species.
 *
 * An entry is one "pack" file per species: every file the species wrote
 * (pages, CSV, export JSON, forwarding maps, bench sheet) and its small
 * summary, named by a key that hashes everything the files depend on: the
 * species file's path and bytes, the site settings that reach species
 * pages (title, lab, fields, constants edition, site address), and the code
 * version (src/, templates/, package-lock.json).
 *
 * Two values on every page change whenever any species changes: the build
 * date and the data-folder version (footer, bench sheet, export
 * `data_version`). The cached copy is rendered with placeholders of the same
 * length in their place, and they are filled in as each file is written, so
 * a page from the cache is byte for byte the page an uncached build writes
 * (same length, so the page-size splits are decided the same way). A species
 * whose input contains a placeholder's text is built without the cache.
 *
 * Where: ATLAS_CACHE, else `.atlas-cache/` beside the output folder
 * (`ATLAS_CACHE=off` builds without a cache). Packs are written to a
 * temporary name and renamed, so a killed build never leaves half an entry;
 * after a published build, entries it did not use are dropped (unless
 * another build used them meanwhile), so the cache holds one build's worth.
 * The cache is a speed-up only: a pack that cannot be read is recomputed,
 * and a pack that cannot be written is skipped.
 */
import { createHash } from "node:crypto";
import { closeSync, existsSync, mkdirSync, openSync, readdirSync, readFileSync, renameSync, rmSync, statSync, utimesSync, writeSync } from "node:fs";
import { dirname, join, relative, resolve, sep } from "node:path";
import { threadId } from "node:worker_threads";
import type { SpeciesSummary } from "./speciesBuild.js";
import { ROOT } from "./paths.js";
import { alive } from "./publish.js";

/** Bumped when the pack format or what a key covers changes. */
const FORMAT = "atlas-species-pack-1";

/** Stand-ins for the build date (an ISO date-time, 24 characters) and the data version (12 hex digits). */
export const DATE_TOKEN = "~~atlas-build-date-x7q~~";
export const VERSION_TOKEN = "~atlas-dv-z~";

export interface BuildStamp {
  date: string;
  dataVersion: string;
}

/** True when placeholders of these lengths can stand for the stamp (always, for dates in years 0–9999). */
export function stampFits(stamp: BuildStamp): boolean {
  return stamp.date.length === DATE_TOKEN.length && stamp.dataVersion.length === VERSION_TOKEN.length;
}

/** True when text (an input file) contains a placeholder, so placeholders could not be told from data. */
export function holdsToken(bytes: Uint8Array): boolean {
  const b = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return b.includes(DATE_TOKEN) || b.includes(VERSION_TOKEN);
}

const DATE_BYTES = Buffer.from(DATE_TOKEN);
const VERSION_BYTES = Buffer.from(VERSION_TOKEN);

/** Put the stamp in place of the placeholders, in place (same lengths). */
export function fillStamp(buf: Buffer, stamp: BuildStamp): Buffer {
  for (const [token, value] of [
    [DATE_BYTES, stamp.date],
    [VERSION_BYTES, stamp.dataVersion],
  ] as const) {
    for (let at = buf.indexOf(token); at >= 0; at = buf.indexOf(token, at + token.length)) buf.write(value, at, "latin1");
  }
  return buf;
}

/** Where the cache lives for an output folder; null when turned off. */
export function cacheRoot(out: string, setting: string | undefined): string | null {
  if (setting === "off") return null;
  return setting ? resolve(setting) : join(dirname(resolve(out)), ".atlas-cache");
}

/** The folder of species packs inside a cache root. */
export const packDir = (root: string): string => join(root, "species");

/** sha-256 of the files below src/ and templates/ and of package-lock.json: what the output can depend on besides the data. */
export function codeVersion(root: string = ROOT): string {
  const h = createHash("sha256");
  const walk = (dir: string): void => {
    if (!existsSync(dir)) return;
    const entries = readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
    for (const e of entries) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.isFile()) {
        const bytes = readFileSync(p);
        h.update(relative(root, p).split(sep).join("/")).update("\0").update(String(bytes.length)).update("\0").update(bytes);
      }
    }
  };
  walk(join(root, "src"));
  walk(join(root, "templates"));
  const lock = join(root, "package-lock.json");
  if (existsSync(lock)) h.update("package-lock.json\0").update(readFileSync(lock));
  return h.digest("hex");
}

/** What a species' files depend on besides its own file. */
export interface KeySettings {
  code: string;
  title: string;
  lab: string | null;
  siteUrl: string | null;
  pathPrefix: string;
  constants: string;
  fields: { text: string; tesla: string }[];
}

/** The key of one species' entry. */
export function speciesKey(file: string, bytes: Uint8Array, settings: KeySettings): string {
  const h = createHash("sha256");
  h.update(FORMAT).update("\0");
  h.update(JSON.stringify({ ...settings, file, tokens: [DATE_TOKEN, VERSION_TOKEN] })).update("\0");
  h.update(bytes);
  return h.digest("hex").slice(0, 40);
}

const packFile = (dir: string, key: string): string => join(dir, `${key}.pack`);

/**
 * Write one entry: a first line naming the format, a second line of JSON
 * (summary and [path, byte length] of each file), then the files' bytes.
 * Best effort: returns false (and leaves nothing behind) when it cannot.
 */
export function writePack(dir: string, key: string, summary: SpeciesSummary, files: [string, Buffer][]): boolean {
  const tmp = join(dir, `.tmp-${process.pid}-${threadId}-${key}`);
  let fd: number | null = null;
  try {
    mkdirSync(dir, { recursive: true });
    fd = openSync(tmp, "w");
    const header = JSON.stringify({ summary, files: files.map(([p, b]) => [p, b.length]) });
    writeSync(fd, `${FORMAT}\n${header}\n`);
    for (const [, b] of files) writeSync(fd, b);
    closeSync(fd);
    fd = null;
    renameSync(tmp, packFile(dir, key));
    return true;
  } catch {
    if (fd !== null) closeSync(fd);
    rmSync(tmp, { force: true });
    return false;
  }
}

/**
 * Read one entry and hand each file to `write` with the stamp filled in;
 * the entry's time is set to now (so a concurrent build's clean-up keeps
 * it). Null when there is no usable entry: nothing has been written then,
 * except when `write` itself failed (that error is thrown).
 */
export function restorePack(dir: string, key: string, stamp: BuildStamp, write: (path: string, bytes: Buffer) => void): SpeciesSummary | null {
  const file = packFile(dir, key);
  let pack: Buffer;
  let header: { summary: SpeciesSummary; files: [string, number][] };
  let start: number;
  try {
    pack = readFileSync(file);
    const first = pack.indexOf(10);
    const second = pack.indexOf(10, first + 1);
    if (first < 0 || second < 0 || pack.toString("latin1", 0, first) !== FORMAT) return null;
    header = JSON.parse(pack.toString("utf8", first + 1, second));
    start = second + 1;
    const total = header.files.reduce((a, [, n]) => a + n, 0);
    if (start + total !== pack.length) return null;
    const now = new Date();
    utimesSync(file, now, now);
  } catch {
    return null;
  }
  for (const [path, n] of header.files) {
    write(path, fillStamp(pack.subarray(start, start + n), stamp));
    start += n;
  }
  return header.summary;
}

/** True when an entry for the key exists (it may still turn out unreadable). */
export function hasPack(dir: string, key: string): boolean {
  return existsSync(packFile(dir, key));
}

/**
 * Before a build: remove temporary packs of builds that no longer run.
 * After a published build: also remove the entries it did not use, unless
 * touched since `since` (by a build running at the same time).
 */
export function pruneCache(dir: string, opts: { keep?: Set<string>; since?: number; isAlive?: (pid: number) => boolean }): void {
  const isAlive = opts.isAlive ?? alive;
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return;
  }
  for (const name of names) {
    const p = join(dir, name);
    try {
      const tmp = /^\.tmp-(\d+)-/.exec(name);
      if (tmp) {
        const pid = Number(tmp[1]);
        if (pid !== process.pid && !isAlive(pid)) rmSync(p, { force: true });
        continue;
      }
      if (!opts.keep || !name.endsWith(".pack")) continue;
      if (opts.keep.has(name.slice(0, -".pack".length))) continue;
      if (opts.since !== undefined && statSync(p).mtimeMs >= opts.since) continue;
      rmSync(p, { force: true });
    } catch {
      // another build removed it first
    }
  }
}
