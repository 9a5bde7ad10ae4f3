/**
 * One species built into the staging folder, the same way in a worker
 * thread (speciesWorker.ts) and in the main thread (a build with one
 * species to compute, or one core): buildSpecies with this build's frame,
 * each file written to the staging folder and, when the species is cached,
 * also kept for its cache entry, rendered with the stand-in build stamp
 * (see cache.ts).
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import type { SpeciesInput } from "../data/model.js";
import { InputProblems, ProblemSink } from "../data/inputError.js";
import { readSpeciesFile } from "../data/speciesFile.js";
import { decodeUtf8, parseYaml } from "../data/yamlExact.js";
import { editionByName } from "../physics/constants/editions.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { Dec } from "../physics/decimal.js";
import type { ConfiguredField } from "../results/fieldTypes.js";
import { fillStamp, PackWriter, type BuildStamp } from "./cache.js";
import type { RenderPage } from "./renderPages.js";
import { buildSpecies, type SiteFrame, type SpeciesSummary } from "./speciesBuild.js";

/** What every species of one build shares; plain data, so it can be handed to a worker. */
export interface SpeciesSetup {
  staging: string;
  /** Folder of cache packs; null when the build has no cache. */
  packs: string | null;
  constants: string;
  fields: { text: string; tesla: string }[];
  siteUrl: string | null;
  /** The frame with the real build stamp. */
  frame: SiteFrame;
  /** The stand-in stamp cached copies are rendered with (cache.ts); null without a cache. */
  sentinel: BuildStamp | null;
  /** Test only: "species" fails each species after its files are written (ATLAS_FAULT, see src/cli/build.ts). */
  fault?: string;
}

/** One species to build; plain data. */
export interface SpeciesTask {
  id: string;
  /** Path relative to the data folder ("species/rb87.yaml"). */
  file: string;
  /** The path shown in messages (as the loader shows it). */
  shown: string;
  /** The validated bytes of the file (see dataSnapshot.ts). */
  bytes: Uint8Array;
  /** Cache key, or null to build with the real stamp and keep no entry. */
  key: string | null;
}

/**
 * Stops writes into the staging folder before it is removed (on a signal):
 * a shared [halted, writes in progress] pair. A writer counts itself in and
 * then looks at the flag; the main thread sets the flag and then waits for
 * the count to reach zero, so no write starts or runs after halt returns.
 */
export class WriteGate {
  readonly cells: Int32Array;
  constructor(shared: SharedArrayBuffer = new SharedArrayBuffer(8)) {
    this.cells = new Int32Array(shared);
  }
  get shared(): SharedArrayBuffer {
    return this.cells.buffer as SharedArrayBuffer;
  }
  /** Run one write unless halted (then throw). */
  pass<T>(write: () => T): T {
    Atomics.add(this.cells, 1, 1);
    try {
      if (Atomics.load(this.cells, 0) !== 0) throw new Error("build stopped");
      return write();
    } finally {
      Atomics.sub(this.cells, 1, 1);
      Atomics.notify(this.cells, 1);
    }
  }
  /** Refuse further writes and wait (at most `ms`) for those under way. */
  halt(ms = 5000): void {
    Atomics.store(this.cells, 0, 1);
    const until = Date.now() + ms;
    for (let n = Atomics.load(this.cells, 1); n !== 0 && Date.now() < until; n = Atomics.load(this.cells, 1)) {
      Atomics.wait(this.cells, 1, n, 20);
    }
  }
}

/** Write one file below the staging folder (path relative to the site root). */
export function stagedWriter(staging: string, gate: WriteGate): (path: string, bytes: Uint8Array | string) => void {
  return (path, bytes) =>
    gate.pass(() => {
      const file = join(staging, path);
      mkdirSync(dirname(file), { recursive: true });
      writeFileSync(file, bytes);
    });
}

/** Parse a species from its validated bytes (in a worker, which has no copy of the loaded folder). */
export function speciesFromBytes(task: SpeciesTask): SpeciesInput {
  const sink = new ProblemSink(task.shown);
  const text = decodeUtf8(task.bytes, sink);
  const src = text === null ? null : parseYaml(text, sink);
  const read = src ? readSpeciesFile(src, task.file) : null;
  // The bytes passed validation in the main thread, so this is a bug, not an input problem.
  if (!read?.species || sink.count > 0) throw new InputProblems(sink.problems);
  return read.species;
}

export interface SpeciesTools {
  constants: ConstantsEdition;
  configured: ConfiguredField[];
  render: RenderPage;
  gate: WriteGate;
}

export function speciesTools(setup: SpeciesSetup, render: RenderPage, gate: WriteGate): SpeciesTools {
  return {
    constants: editionByName(setup.constants)!,
    configured: setup.fields.map((f) => ({ text: f.text, tesla: new Dec(f.tesla) })),
    render,
    gate,
  };
}

/** The frame with another stamp. */
function stamped(frame: SiteFrame, stamp: BuildStamp): SiteFrame {
  return { ...frame, build: { ...frame.build, date: stamp.date, dataVersion: stamp.dataVersion } };
}

/**
 * Build one species into the staging folder; keep its cache entry when the
 * task has a key. The summary is returned as JSON would give it back, so a
 * summary computed here, one passed from a worker and one read from the
 * cache are the same value.
 */
export function runSpeciesTask(task: SpeciesTask, input: SpeciesInput, setup: SpeciesSetup, tools: SpeciesTools): SpeciesSummary {
  const stage = stagedWriter(setup.staging, tools.gate);
  const stamp: BuildStamp = { date: setup.frame.build.date, dataVersion: setup.frame.build.dataVersion };
  const sentinel = task.key !== null && setup.packs ? setup.sentinel : null;
  // The cache entry is streamed to disk beside the staged files, never held whole.
  const pack = sentinel ? new PackWriter(setup.packs!, task.key!) : null;
  const write = sentinel
    ? (path: string, text: string) => {
        const bytes = Buffer.from(text);
        pack!.add(path, bytes);
        stage(path, fillStamp(bytes, sentinel, stamp));
      }
    : (path: string, text: string) => stage(path, text);
  let summary: SpeciesSummary;
  try {
    summary = buildSpecies(input, {
      constants: tools.constants,
      configured: tools.configured,
      siteUrl: setup.siteUrl,
      frame: sentinel ? stamped(setup.frame, sentinel) : setup.frame,
      render: tools.render,
      write,
    });
    if (setup.fault === "species") throw new Error(`building ${task.id} failed (ATLAS_FAULT=species)`);
  } catch (e) {
    pack?.abort();
    throw e;
  }
  const plain = JSON.parse(JSON.stringify(summary)) as SpeciesSummary;
  pack?.finish(plain);
  return plain;
}
