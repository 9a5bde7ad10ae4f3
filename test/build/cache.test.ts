/**
 * The species cache's parts: the stand-in build stamp, packs written
 * and read back, keys, and the clean-up that bounds the cache.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, utimesSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import {
  cacheRoot,
  codeVersion,
  fillStamp,
  hasPack,
  holdsSentinel,
  PackWriter,
  pruneCache,
  restorePack,
  sentinelFor,
  speciesKey,
  stampForms,
  writePack,
  type KeySettings,
} from "../../src/build/cache.js";
import { readableDate } from "../../src/site/format.js";
import type { SpeciesSummary } from "../../src/build/speciesBuild.js";
import { tempDir } from "../support/runBuild.js";

let dir = "";
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const stamp = { date: "2027-01-01T00:00:00.000Z", dataVersion: "0123456789ab" };
const summary = { id: "x", label: "X", url: "species/x/", exportUrl: "species/x/x.json", pages: 2 } as unknown as SpeciesSummary;
const settings: KeySettings = { code: "c", title: "T", lab: null, siteUrl: null, pathPrefix: "/", constants: "CODATA 2022", fields: [{ text: "1 G", tesla: "0.0001" }] };

describe("the stand-in build stamp", () => {
  const sentinel = sentinelFor(stamp)!;

  it("is a date in 1901 whose every form is as long as the real stamp's", () => {
    expect(sentinel.date).toMatch(/^1901-/);
    const real = stampForms(stamp);
    const stand = stampForms(sentinel);
    expect(real).toContain(readableDate(stamp.date));
    expect(stand.map((f) => Buffer.byteLength(f))).toEqual(real.map((f) => Buffer.byteLength(f)));
    // Month names and one- or two-digit days of other builds find stand-ins too.
    for (const date of ["2026-05-01T00:00:00.000Z", "2026-09-30T23:59:59.999Z", "2027-12-17T12:00:00.000Z"]) {
      const other = sentinelFor({ date, dataVersion: "abcdefabcdef" })!;
      expect(stampForms(other).map((f) => f.length)).toEqual(stampForms({ date, dataVersion: "abcdefabcdef" }).map((f) => f.length));
    }
    expect(sentinelFor({ ...stamp, dataVersion: "short" })).toBeNull();
  });

  it("is replaced in place by the real stamp, every form and occurrence, leaving the rest alone", () => {
    const [iso, readable, version] = stampForms(sentinel);
    const text = `<time datetime="${iso}">${readable}</time> · <code>${version}</code>; again ${iso}`;
    expect(fillStamp(Buffer.from(text), sentinel, stamp).toString()).toBe(
      `<time datetime="${stamp.date}">${readableDate(stamp.date)}</time> · <code>${stamp.dataVersion}</code>; again ${stamp.date}`,
    );
    expect(fillStamp(Buffer.from("nothing here"), sentinel, stamp).toString()).toBe("nothing here");
  });

  it("is found in input that contains one of its forms", () => {
    expect(holdsSentinel(Buffer.from(`notes: "${stampForms(sentinel)[1]}"`), sentinel)).toBe(true);
    expect(holdsSentinel(Buffer.from(`notes: "${sentinel.dataVersion}"`), sentinel)).toBe(true);
    expect(holdsSentinel(Buffer.from("notes: plain"), sentinel)).toBe(false);
  });
});

describe("cache keys", () => {
  it("change with the file's bytes, its name and each setting", () => {
    const sentinel = sentinelFor(stamp)!;
    const key = (file: string, text: string, s: KeySettings, st = sentinel) => speciesKey(file, Buffer.from(text), s, st);
    const base = key("species/a.yaml", "id: a\n", settings);
    expect(key("species/a.yaml", "id: a\n", settings)).toBe(base);
    const others = [
      key("species/a.yaml", "id: a \n", settings),
      key("species/b.yaml", "id: a\n", settings),
      key("species/a.yaml", "id: a\n", { ...settings, code: "d" }),
      key("species/a.yaml", "id: a\n", { ...settings, title: "U" }),
      key("species/a.yaml", "id: a\n", { ...settings, lab: "L" }),
      key("species/a.yaml", "id: a\n", { ...settings, siteUrl: "https://lab.example" }),
      key("species/a.yaml", "id: a\n", { ...settings, pathPrefix: "/z/" }),
      key("species/a.yaml", "id: a\n", { ...settings, fields: [{ text: "2 G", tesla: "0.0002" }] }),
      key("species/a.yaml", "id: a\n", settings, sentinelFor({ ...stamp, date: "2027-05-01T00:00:00.000Z" })!),
    ];
    expect(new Set([base, ...others]).size).toBe(others.length + 1);
  });

  it("cover the code: the version hashes src/, templates/ and package-lock.json", () => {
    dir = tempDir();
    mkdirSync(join(dir, "src"));
    mkdirSync(join(dir, "templates"));
    writeFileSync(join(dir, "src", "a.ts"), "1");
    writeFileSync(join(dir, "package-lock.json"), "{}");
    const v1 = codeVersion(dir);
    writeFileSync(join(dir, "templates", "p.njk"), "x");
    const v2 = codeVersion(dir);
    writeFileSync(join(dir, "package-lock.json"), "{ }");
    const v3 = codeVersion(dir);
    writeFileSync(join(dir, "README.md"), "not code");
    expect(new Set([v1, v2, v3]).size).toBe(3);
    expect(codeVersion(dir)).toBe(v3);
  });

  it("live beside the output unless ATLAS_CACHE names a folder or is off", () => {
    expect(cacheRoot("/a/b/_site", undefined)).toBe("/a/b/.atlas-cache");
    expect(cacheRoot("/a/b/_site", "/c/cache")).toBe("/c/cache");
    expect(cacheRoot("/a/b/_site", "off")).toBeNull();
    for (const off of ["0", "false", "No", "none"]) expect(cacheRoot("/a/b/_site", off)).toBeNull();
  });
});

describe("packs", () => {
  const sentinel = sentinelFor(stamp)!;

  it("give back every file with the stamp filled in, and the summary", () => {
    dir = tempDir();
    const files: [string, Buffer][] = [
      ["species/x/index.html", Buffer.from(`<footer>${sentinel.date} ${sentinel.dataVersion}</footer>\n`)],
      ["species/x/x.json", Buffer.from(`{"data_version": "${sentinel.dataVersion}", "λ": "µ"}\n`)],
      ["species/x/empty.csv", Buffer.alloc(0)],
    ];
    expect(writePack(dir, "k1", summary, files)).toBe(true);
    expect(hasPack(dir, "k1")).toBe(true);
    const got = new Map<string, string>();
    const back = restorePack(dir, "k1", sentinel, stamp, (p, b) => got.set(p, b.toString()));
    expect(back).toEqual(summary);
    expect([...got]).toEqual([
      ["species/x/index.html", `<footer>${stamp.date} ${stamp.dataVersion}</footer>\n`],
      ["species/x/x.json", `{"data_version": "${stamp.dataVersion}", "λ": "µ"}\n`],
      ["species/x/empty.csv", ""],
    ]);
    expect(readdirSync(dir)).toEqual(["k1.pack"]);
  });

  it("that are missing, cut short or of another format are not used, and nothing is written", () => {
    dir = tempDir();
    writePack(dir, "k1", summary, [["a.html", Buffer.from("abc")]]);
    const whole = readFileSync(join(dir, "k1.pack"));
    writeFileSync(join(dir, "k2.pack"), whole.subarray(0, whole.length - 1));
    writeFileSync(join(dir, "k3.pack"), Buffer.concat([Buffer.from("other-format\n"), whole.subarray(whole.indexOf(10) + 1)]));
    const writes: string[] = [];
    for (const key of ["k0", "k2", "k3"]) expect(restorePack(dir, key, sentinel, stamp, (p) => writes.push(p))).toBeNull();
    expect(writes).toEqual([]);
  });
});

describe("a pack being written", () => {
  const sentinel = sentinelFor(stamp)!;

  it("is streamed under a temporary name and appears only when finished; an aborted one leaves nothing", () => {
    dir = tempDir();
    const w = new PackWriter(dir, "k");
    w.add("a.html", Buffer.from("a"));
    expect(readdirSync(dir).filter((n) => n.endsWith(".pack"))).toEqual([]);
    expect(w.finish(summary)).toBe(true);
    expect(readdirSync(dir)).toEqual(["k.pack"]);
    const dropped = new PackWriter(dir, "j");
    dropped.add("b.html", Buffer.from("b"));
    dropped.abort();
    expect(dropped.finish(summary)).toBe(false);
    expect(readdirSync(dir)).toEqual(["k.pack"]);
  });

  it("whose files cannot be written where restored passes the error on", () => {
    dir = tempDir();
    writePack(dir, "k", summary, [["a.html", Buffer.from("a")]]);
    expect(() =>
      restorePack(dir, "k", sentinel, stamp, () => {
        throw new Error("disk full");
      }),
    ).toThrow("disk full");
  });
});

describe("clean-up", () => {
  it("drops entries the last build did not use, keeps used and recently touched ones, and temporary packs of live builds", () => {
    dir = tempDir();
    for (const k of ["used", "old", "recent"]) writePack(dir, k, summary, [["a", Buffer.from("a")]]);
    const long = new Date(Date.now() - 3_600_000);
    for (const k of ["used", "old"]) utimesSync(join(dir, `${k}.pack`), long, long);
    writeFileSync(join(dir, ".tmp-111-1-dead"), "");
    writeFileSync(join(dir, ".tmp-222-1-live"), "");
    pruneCache(dir, { keep: new Set(["used"]), since: Date.now() - 60_000, isAlive: (pid) => pid === 222 });
    expect(readdirSync(dir).sort()).toEqual([".tmp-222-1-live", "recent.pack", "used.pack"]);
  });

  it("before a build removes only dead builds' temporary packs", () => {
    dir = tempDir();
    writePack(dir, "k", summary, [["a", Buffer.from("a")]]);
    writeFileSync(join(dir, ".tmp-111-1-dead"), "");
    pruneCache(dir, { isAlive: () => false });
    expect(readdirSync(dir)).toEqual(["k.pack"]);
    pruneCache(join(dir, "absent"), {});
    expect(existsSync(join(dir, "absent"))).toBe(false);
  });
});
