/**
 * The species cache's parts: placeholders for the build stamp, packs written
 * and read back, keys, and the clean-up that bounds the cache.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, utimesSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import {
  cacheRoot,
  codeVersion,
  DATE_TOKEN,
  fillStamp,
  hasPack,
  holdsToken,
  pruneCache,
  restorePack,
  speciesKey,
  stampFits,
  VERSION_TOKEN,
  writePack,
  type KeySettings,
} from "../../src/build/cache.js";
import type { SpeciesSummary } from "../../src/build/speciesBuild.js";
import { tempDir } from "../support/runBuild.js";

let dir = "";
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const stamp = { date: "2027-01-01T00:00:00.000Z", dataVersion: "0123456789ab" };
const summary = { id: "x", label: "X", url: "species/x/", exportUrl: "species/x/x.json", pages: 2 } as unknown as SpeciesSummary;
const settings: KeySettings = { code: "c", title: "T", lab: null, siteUrl: null, pathPrefix: "/", constants: "CODATA 2022", fields: [{ text: "1 G", tesla: "0.0001" }] };

describe("placeholders for the build stamp", () => {
  it("have the lengths of an ISO date-time and of a data version", () => {
    expect(stampFits(stamp)).toBe(true);
    expect(stampFits({ ...stamp, date: new Date(Date.UTC(12000, 0, 1)).toISOString() })).toBe(false);
  });

  it("are filled in place, every occurrence, leaving the rest alone", () => {
    const text = `built ${DATE_TOKEN} · <code>${VERSION_TOKEN}</code>; again ${DATE_TOKEN}`;
    expect(fillStamp(Buffer.from(text), stamp).toString()).toBe(`built ${stamp.date} · <code>${stamp.dataVersion}</code>; again ${stamp.date}`);
    expect(fillStamp(Buffer.from("nothing here"), stamp).toString()).toBe("nothing here");
  });

  it("are found in input that contains them", () => {
    expect(holdsToken(Buffer.from(`notes: "${VERSION_TOKEN}"`))).toBe(true);
    expect(holdsToken(Buffer.from("notes: plain"))).toBe(false);
  });
});

describe("cache keys", () => {
  it("change with the file's bytes, its name and each setting", () => {
    const base = speciesKey("species/a.yaml", Buffer.from("id: a\n"), settings);
    expect(speciesKey("species/a.yaml", Buffer.from("id: a\n"), settings)).toBe(base);
    const others = [
      speciesKey("species/a.yaml", Buffer.from("id: a \n"), settings),
      speciesKey("species/b.yaml", Buffer.from("id: a\n"), settings),
      speciesKey("species/a.yaml", Buffer.from("id: a\n"), { ...settings, code: "d" }),
      speciesKey("species/a.yaml", Buffer.from("id: a\n"), { ...settings, title: "U" }),
      speciesKey("species/a.yaml", Buffer.from("id: a\n"), { ...settings, lab: "L" }),
      speciesKey("species/a.yaml", Buffer.from("id: a\n"), { ...settings, siteUrl: "https://lab.example" }),
      speciesKey("species/a.yaml", Buffer.from("id: a\n"), { ...settings, pathPrefix: "/z/" }),
      speciesKey("species/a.yaml", Buffer.from("id: a\n"), { ...settings, fields: [{ text: "2 G", tesla: "0.0002" }] }),
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
  });
});

describe("packs", () => {
  it("give back every file with the stamp filled in, and the summary", () => {
    dir = tempDir();
    const files: [string, Buffer][] = [
      ["species/x/index.html", Buffer.from(`<footer>${DATE_TOKEN} ${VERSION_TOKEN}</footer>\n`)],
      ["species/x/x.json", Buffer.from(`{"data_version": "${VERSION_TOKEN}", "λ": "µ"}\n`)],
      ["species/x/empty.csv", Buffer.alloc(0)],
    ];
    expect(writePack(dir, "k1", summary, files)).toBe(true);
    expect(hasPack(dir, "k1")).toBe(true);
    const got = new Map<string, string>();
    const back = restorePack(dir, "k1", stamp, (p, b) => got.set(p, b.toString()));
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
    for (const key of ["k0", "k2", "k3"]) expect(restorePack(dir, key, stamp, (p) => writes.push(p))).toBeNull();
    expect(writes).toEqual([]);
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
