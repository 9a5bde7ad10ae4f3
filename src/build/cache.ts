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
 * `data_version`). The cached copy is rendered with a stand-in stamp (a
 * date in 1901 and a fixed non-hex version, see sentinelFor) whose every
 * text form has the length of the real one, and the forms are replaced as
 * each file is written, so a page from the cache is byte for byte the page
 * an uncached build writes (same length, so the page-size splits are
 * decided the same way). A species whose input contains a form of the
 * stand-in is built without the cache.
 *
 * Where: ATLAS_CACHE, else `.atlas-cache/` beside the output folder
 * (`ATLAS_CACHE=off` builds without a cache; so do 0, false, no, none).
 * Packs are written to a temporary name and renamed, so a killed build
 * never leaves half an entry;
 * after a published build, entries it did not use are dropped (unless
 * another build used them meanwhile), so the cache holds one build's worth.
 * The cache is a speed-up only: a pack that cannot be read is recomputed,
 * and a pack that cannot be written is skipped.
 */
import { createHash } from "node:crypto";
import { closeSync, existsSync, fstatSync, mkdirSync, openSync, readdirSync, readFileSync, readSync, renameSync, rmSync, statSync, utimesSync, writeSync } from "node:fs";
import { dirname, join, relative, resolve, sep } from "node:path";
import { threadId } from "node:worker_threads";
import type { SpeciesSummary } from "./speciesBuild.js";
import { atlasFilters } from "../site/filters.js";
import { ROOT } from "./paths.js";
import { alive } from "./publish.js";

/** Bumped when the pack format or what a key covers changes. */
const FORMAT = "atlas-species-pack-2";

/** The two values of a build that every page shows. */
export interface BuildStamp {
  date: string;
  dataVersion: string;
}

/**
 * Every text form in which the stamp reaches a page: the ISO date (footer
 * <time datetime>, <meta>), the date as the `readableDate` template filter
 * writes it, and the data version. A new form (a new filter applied to the
 * date) must be added here; test/build/cachedBuild.test.ts fails until it is.
 */
export function stampForms(stamp: BuildStamp): string[] {
  const readable = (atlasFilters as Record<string, unknown>).readableDate;
  const forms = [stamp.date, stamp.dataVersion];
  if (typeof readable === "function") forms.splice(1, 0, String(readable(stamp.date)));
  return forms;
}

const VERSION_SENTINEL = "~atlas-dv-z~";

/**
 * The stand-in stamp a cached copy is rendered with: a date in 1901 (same
 * time of day for every build) whose every form has the byte length of the
 * real date's form, and a data version of 12 characters no hex digest
 * makes. Same lengths, so pages are exactly as long as with the real stamp
 * and the page-size splits come out the same. Null when there is none
 * (then the build does without the cache).
 */
export function sentinelFor(stamp: BuildStamp): BuildStamp | null {
  if (Buffer.byteLength(stamp.dataVersion) !== VERSION_SENTINEL.length) return null;
  const want = stampForms(stamp).map((f) => Buffer.byteLength(f));
  for (let day = 0; day < 365; day++) {
    const date = new Date(Date.UTC(1901, 0, 1 + day, 4, 5, 6, 789)).toISOString();
    const sentinel = { date, dataVersion: VERSION_SENTINEL };
    const forms = stampForms(sentinel);
    if (forms.length !== want.length || forms.some((f, i) => Buffer.byteLength(f) !== want[i])) continue;
    // Each form found on its own: none may hold another.
    if (forms.some((f, i) => f.length < 6 || forms.some((g, j) => i !== j && g.includes(f)))) continue;
    return sentinel;
  }
  return null;
}

/** True when input bytes contain a form of the sentinel, which then could not be told from data. */
export function holdsSentinel(bytes: Uint8Array, sentinel: BuildStamp): boolean {
  const b = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return stampForms(sentinel).some((f) => b.includes(f));
}

/** Put the real stamp in place of the sentinel's forms, in place (same byte lengths). */
export function fillStamp(buf: Buffer, sentinel: BuildStamp, stamp: BuildStamp): Buffer {
  const to = stampForms(stamp);
  stampForms(sentinel).forEach((form, i) => {
    const token = Buffer.from(form);
    const value = Buffer.from(to[i]!);
    if (value.length !== token.length) throw new Error(`stamp form "${to[i]}" is not as long as its stand-in "${form}"`);
    for (let at = buf.indexOf(token); at >= 0; at = buf.indexOf(token, at + token.length)) value.copy(buf, at);
  });
  return buf;
}

/** Where the cache lives for an output folder; null when turned off ("off", or 0/false/no/none, which nobody means as a folder name). */
export function cacheRoot(out: string, setting: string | undefined): string | null {
  if (setting !== undefined && /^(off|0|false|no|none)$/i.test(setting.trim())) return null;
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
export function speciesKey(file: string, bytes: Uint8Array, settings: KeySettings, sentinel: BuildStamp): string {
  const h = createHash("sha256");
  h.update(FORMAT).update("\0");
  h.update(JSON.stringify({ ...settings, file, sentinel })).update("\0");
  h.update(bytes);
  return h.digest("hex").slice(0, 40);
}

const packFile = (dir: string, key: string): string => join(dir, `${key}.pack`);

/**
 * One entry, written as the species' files are: a first line naming the
 * format, the files' bytes one after another, the JSON index (summary and
 * [path, byte length] of each file), and a last line giving the index's
 * length. Streamed, so the entry never sits in memory whole. Best effort:
 * after a failure the writer only counts, and nothing is left behind.
 */
export class PackWriter {
  private fd: number | null = null;
  private readonly tmp: string;
  private readonly files: [string, number][] = [];

  constructor(private readonly dir: string, private readonly key: string) {
    this.tmp = join(dir, `.tmp-${process.pid}-${threadId}-${key}`);
    try {
      mkdirSync(dir, { recursive: true });
      this.fd = openSync(this.tmp, "w");
      writeSync(this.fd, `${FORMAT}\n`);
    } catch {
      this.abort();
    }
  }

  add(path: string, bytes: Uint8Array): void {
    if (this.fd === null) return;
    try {
      writeSync(this.fd, bytes);
      this.files.push([path, bytes.length]);
    } catch {
      this.abort();
    }
  }

  /** Close and publish the entry under its key; false when it could not be written. */
  finish(summary: SpeciesSummary): boolean {
    if (this.fd === null) return false;
    try {
      const index = Buffer.from(JSON.stringify({ summary, files: this.files }));
      writeSync(this.fd, index);
      writeSync(this.fd, `\n${String(index.length).padStart(TRAILER - 2, "0")}\n`);
      closeSync(this.fd);
      this.fd = null;
      renameSync(this.tmp, packFile(this.dir, this.key));
      return true;
    } catch {
      this.abort();
      return false;
    }
  }

  abort(): void {
    if (this.fd !== null) {
      try {
        closeSync(this.fd);
      } catch {
        // already closed
      }
    }
    this.fd = null;
    rmSync(this.tmp, { force: true });
  }
}

/** Carries an error of restorePack's `write` past its own clean-up. */
class WriteFailed extends Error {
  constructor(cause: unknown) {
    super("write failed", { cause });
  }
}

/** "\n" + 15 digits of the index length + "\n". */
const TRAILER = 17;

/** Write one entry from files in memory (tests, small entries). */
export function writePack(dir: string, key: string, summary: SpeciesSummary, files: [string, Uint8Array][]): boolean {
  const w = new PackWriter(dir, key);
  for (const [path, bytes] of files) w.add(path, bytes);
  return w.finish(summary);
}

interface PackIndex {
  summary: SpeciesSummary;
  /** [path, byte length] of each file, in the order of their bytes. */
  files: [string, number][];
}

/** Read `n` bytes at `at`, all or throw. */
function readAt(fd: number, at: number, n: number): Buffer {
  const b = Buffer.allocUnsafe(n);
  if (readSync(fd, b, 0, n, at) !== n) throw new Error("short read");
  return b;
}

/** The index of an open pack and where its files' bytes start; null when it is not a whole pack of this format. */
function readIndex(fd: number): { index: PackIndex; start: number } | null {
  const size = fstatSync(fd).size;
  const head = Buffer.byteLength(`${FORMAT}\n`);
  if (size < head + TRAILER || readAt(fd, 0, head).toString("latin1") !== `${FORMAT}\n`) return null;
  const trailer = readAt(fd, size - TRAILER, TRAILER).toString("latin1");
  if (!/^\n\d{15}\n$/.test(trailer)) return null;
  const indexLength = Number(trailer.slice(1, -1));
  const indexAt = size - TRAILER - indexLength;
  if (indexAt < head) return null;
  const index = JSON.parse(readAt(fd, indexAt, indexLength).toString("utf8")) as PackIndex;
  if (head + index.files.reduce((a, [, n]) => a + n, 0) !== indexAt) return null;
  return { index, start: head };
}

/** The index of a pack file (the benchmark reads the sizes of what a build wrote); null when unreadable. */
export function packIndex(file: string): PackIndex | null {
  let fd: number | null = null;
  try {
    fd = openSync(file, "r");
    return readIndex(fd)?.index ?? null;
  } catch {
    return null;
  } finally {
    if (fd !== null) closeSync(fd);
  }
}

/**
 * Read one entry, a file at a time, and hand each file to `write` with the
 * stamp filled in; the entry's time is set to now (so a concurrent build's
 * clean-up keeps it). Null when there is no usable entry; files handed over
 * before a damaged part was found are written again by the species'
 * recomputation (same paths). An error of `write` itself is thrown.
 */
export function restorePack(dir: string, key: string, sentinel: BuildStamp, stamp: BuildStamp, write: (path: string, bytes: Buffer) => void): SpeciesSummary | null {
  const file = packFile(dir, key);
  let fd: number;
  try {
    fd = openSync(file, "r");
  } catch {
    return null;
  }
  try {
    const found = readIndex(fd);
    if (!found) return null;
    const now = new Date();
    utimesSync(file, now, now);
    let at = found.start;
    for (const [path, n] of found.index.files) {
      const bytes = fillStamp(readAt(fd, at, n), sentinel, stamp);
      at += n;
      try {
        write(path, bytes);
      } catch (e) {
        throw new WriteFailed(e);
      }
    }
    return found.index.summary;
  } catch (e) {
    if (e instanceof WriteFailed) throw e.cause;
    return null;
  } finally {
    closeSync(fd);
  }
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
