/**
 * One species built three ways gives the same files: directly with the
 * build stamp, with placeholders for its cache entry (filled on write), and
 * restored from that entry; in a worker thread it gives the same files as
 * in this thread. The summary a worker hands back survives structured
 * cloning and JSON unchanged.
 */
import { mkdirSync, rmSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { restorePack, sentinelFor } from "../../src/build/cache.js";
import { loadWithSnapshot, type DataSnapshot } from "../../src/build/dataSnapshot.js";
import { pageRenderer } from "../../src/build/renderPages.js";
import { buildSpecies } from "../../src/build/speciesBuild.js";
import { runSpeciesTask, speciesFromBytes, speciesTools, stagedWriter, WriteGate, type SpeciesSetup, type SpeciesTask } from "../../src/build/speciesTask.js";
import { SpeciesPool } from "../../src/build/workerPool.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { siteFrameParts } from "../../src/site/siteSummary.js";
import type { DataFolder } from "../../src/data/model.js";
import { DEMO_DATA, tempDir } from "../support/runBuild.js";
import { treeFiles } from "../cli/treeHash.js";

// Two demo species: one without a nucleus, one with hyperfine structure.
const IDS = ["sr88", "na23"];
const parent = tempDir("atlas-species-task-");
let folder: DataFolder;
let snapshot: DataSnapshot;

function setup(name: string, packs: string | null = null): SpeciesSetup {
  const constants = editionByName(folder.site.constants)!;
  const fields = folder.site.fields.map((f) => ({ text: f.text, tesla: f.tesla.toString() }));
  const staging = join(parent, name);
  mkdirSync(staging, { recursive: true });
  const build = { date: "2027-01-01T00:00:00.000Z", constantsEdition: constants.edition, dataVersion: folder.dataVersion };
  return {
    staging,
    packs,
    constants: constants.edition,
    fields,
    siteUrl: null,
    frame: { title: folder.site.title, lab: folder.site.lab, build, sheets: siteFrameParts(constants, fields) },
    sentinel: packs ? sentinelFor(build) : null,
  };
}

function task(id: string, key: string | null): SpeciesTask {
  const input = folder.species.find((s) => s.id === id)!;
  return { id, file: input.file, shown: input.file, bytes: snapshot.species.get(input.file)!, key };
}

const differing = (a: Map<string, Buffer>, b: Map<string, Buffer>): string[] =>
  [...new Set([...a.keys(), ...b.keys()])].filter((k) => !a.get(k) || !b.get(k) || !a.get(k)!.equals(b.get(k)!)).sort();

beforeAll(() => {
  ({ folder, snapshot } = loadWithSnapshot(DEMO_DATA));
});
afterAll(() => rmSync(parent, { recursive: true, force: true }));

describe("a species", () => {
  it("built with placeholders, and restored from its cache entry, writes the bytes of a direct build", () => {
    const direct = setup("direct");
    const packs = join(parent, "packs");
    const cached = setup("cached", packs);
    const restored = setup("restored");
    const toolsOf = (s: SpeciesSetup) => speciesTools(s, pageRenderer(), new WriteGate());
    for (const id of IDS) {
      const a = runSpeciesTask(task(id, null), folder.species.find((s) => s.id === id)!, direct, toolsOf(direct));
      const b = runSpeciesTask(task(id, `key-${id}`), speciesFromBytes(task(id, null)), cached, toolsOf(cached));
      expect(b).toStrictEqual(a);
      const stamp = { date: restored.frame.build.date, dataVersion: restored.frame.build.dataVersion };
      expect(restorePack(packs, `key-${id}`, cached.sentinel!, stamp, stagedWriter(restored.staging, new WriteGate()))).toStrictEqual(a);
    }
    const want = treeFiles(direct.staging);
    expect(want.size).toBeGreaterThan(10);
    expect([...want.values()].some((b) => b.includes(direct.frame.build.date))).toBe(true);
    expect(differing(treeFiles(cached.staging), want)).toEqual([]);
    expect(differing(treeFiles(restored.staging), want)).toEqual([]);
  }, 120_000);

  it("built in worker threads writes the bytes of a build in this thread, and fails with the worker's message", async () => {
    const here = setup("here");
    const tools = speciesTools(here, pageRenderer(), new WriteGate());
    for (const id of IDS) runSpeciesTask(task(id, null), folder.species.find((s) => s.id === id)!, here, tools);

    const there = setup("there");
    const pool = new SpeciesPool(there, 2, new WriteGate());
    try {
      const done = await Promise.all(IDS.map((id) => pool.run(task(id, null))));
      expect(done.map((d) => d.summary.id)).toEqual(IDS);
      expect(done.every((d) => d.timings.some(([phase]) => phase === "physics"))).toBe(true);
    } finally {
      await pool.close();
    }
    expect(differing(treeFiles(there.staging), treeFiles(here.staging))).toEqual([]);

    const failing = new SpeciesPool({ ...setup("failing"), fault: "species" }, 1, new WriteGate());
    try {
      await expect(failing.run(task("sr88", null))).rejects.toThrow("building sr88 failed (ATLAS_FAULT=species)");
    } finally {
      await failing.close();
    }
  }, 120_000);

  it("has a summary that structured cloning gives back unchanged, and JSON in the form every path hands on", () => {
    const s = setup("summary");
    const input = folder.species.find((x) => x.id === "na23")!;
    const summary = buildSpecies(input, {
      constants: editionByName(s.constants)!,
      configured: folder.site.fields,
      siteUrl: null,
      frame: s.frame,
      render: pageRenderer(),
      write: () => {},
    });
    // What a worker posts: structured cloning keeps it whole.
    expect(structuredClone(summary)).toStrictEqual(summary);
    // What every path hands on (worker, this thread, cache) is the JSON form, so the three agree
    // (JSON writes -0 as 0; nothing else may change).
    const plain = JSON.parse(JSON.stringify(summary));
    expect(JSON.stringify(plain)).toBe(JSON.stringify(summary));
    expect(structuredClone(plain)).toStrictEqual(plain);
    expect(JSON.parse(JSON.stringify(plain))).toStrictEqual(plain);
  }, 60_000);
});
