/**
 * Every species of a build into the staging folder: each either restored
 * from the cache (cache.ts) or computed — in worker threads when more than
 * one species is to be computed and there is more than one core
 * (workerPool.ts), else here in the main thread (speciesTask.ts). The
 * summaries come back sorted by species id whatever finished first, so two
 * builds of the same data are byte-identical.
 *
 * Pool size: min(available parallelism, species to compute); 1 means no
 * worker (starting one costs more than it saves). The costliest species go
 * first (estimateCost), so the last species to finish is a small one.
 */
import { availableParallelism } from "node:os";
import { join } from "node:path";
import { setImmediate as turn } from "node:timers/promises";
import { shownPath } from "../data/loadDataFolder.js";
import type { DataFolder, SpeciesInput } from "../data/model.js";
import { hasPack, holdsSentinel, restorePack, speciesKey, type KeySettings } from "./cache.js";
import type { DataSnapshot } from "./dataSnapshot.js";
import { pageRenderer } from "./renderPages.js";
import type { SpeciesSummary } from "./speciesBuild.js";
import { runSpeciesTask, speciesTools, stagedWriter, WriteGate, type SpeciesSetup, type SpeciesTask, type SpeciesTools } from "./speciesTask.js";
import { addTiming, timed } from "./timings.js";
import { SpeciesPool } from "./workerPool.js";

/**
 * A rough cost of computing a species, for the order of work only: the
 * field solves grow as the cube of a level's sublevel count n = (2I+1)(2J+1),
 * the line tables as n_upper × n_lower at each field. On the demo it ranks
 * the species as their measured times do (k40, cs133, sr87 first).
 */
export function estimateCost(input: SpeciesInput): number {
  const nI = input.nucleus ? input.nucleus.I2 + 1 : 1;
  const n = new Map(input.levels.map((l) => [l.id, nI * (l.term.J2 + 1)]));
  let cost = 0;
  for (const k of n.values()) cost += k ** 3;
  for (const line of input.lines) cost += 20 * (n.get(line.upper) ?? 1) * (n.get(line.lower) ?? 1);
  return cost;
}

export interface AllSpeciesOptions {
  setup: SpeciesSetup;
  /** What the cache keys hash besides the species file; ignored without setup.packs. */
  settings: KeySettings;
  /** Threads to use at most (default: the machine's available parallelism). */
  workers?: number;
}

export interface AllSpeciesResult {
  summaries: SpeciesSummary[];
  computed: number;
  reused: number;
  /** Cache keys this build used or wrote. */
  keys: Set<string>;
}

export async function buildAllSpecies(folder: DataFolder, snapshot: DataSnapshot, opts: AllSpeciesOptions): Promise<AllSpeciesResult> {
  const { setup } = opts;
  const stamp = { date: setup.frame.build.date, dataVersion: setup.frame.build.dataVersion };
  const sentinel = setup.sentinel;
  const caching = setup.packs !== null && sentinel !== null && !holdsSentinel(Buffer.from(JSON.stringify(opts.settings)), sentinel);
  const inputs = new Map(folder.species.map((s) => [s.id, s]));
  const tasks: SpeciesTask[] = folder.species.map((s) => {
    const bytes = snapshot.species.get(s.file);
    if (!bytes) throw new Error(`${s.file} is missing from the snapshot of the data folder`);
    const key = caching && !holdsSentinel(bytes, sentinel!) ? speciesKey(s.file, bytes, opts.settings, sentinel!) : null;
    return { id: s.id, file: s.file, shown: shownPath(join(folder.dir, s.file)), bytes, key };
  });

  const summaries = new Map<string, SpeciesSummary>();
  const keys = new Set<string>();
  const hits = tasks.filter((t) => t.key !== null && hasPack(setup.packs!, t.key));
  const cost = new Map(folder.species.map((s) => [s.id, estimateCost(s)]));
  const misses = tasks.filter((t) => !hits.includes(t)).sort((a, b) => cost.get(b.id)! - cost.get(a.id)! || (a.id < b.id ? -1 : 1));
  const gate = new WriteGate();
  const size = Math.max(1, Math.min(opts.workers ?? availableParallelism(), misses.length));
  const pool = size > 1 ? new SpeciesPool(setup, size, gate) : null;
  let tools: SpeciesTools | null = null;
  let failure: unknown = null;
  let reused = 0;

  const here = (task: SpeciesTask): void => {
    tools ??= speciesTools(setup, pageRenderer(), gate);
    summaries.set(task.id, runSpeciesTask(task, inputs.get(task.id)!, setup, tools));
  };
  const pending: Promise<void>[] = [];
  const compute = (task: SpeciesTask): void => {
    if (task.key) keys.add(task.key);
    const p = pool!.run(task).then(
      ({ summary, timings }) => {
        summaries.set(task.id, summary);
        for (const [phase, ms] of timings) addTiming(phase, ms);
      },
      (e: unknown) => {
        failure ??= e;
        // The build has failed: stop the other workers now rather than let them finish their species.
        void pool!.close();
      },
    );
    pending.push(p);
  };
  const later: SpeciesTask[] = [];

  try {
    for (const t of misses) pool ? compute(t) : later.push(t);
    // Restored in the main thread while the workers compute, yielding between species so signals and replies get through.
    const write = stagedWriter(setup.staging, gate);
    for (const t of hits) {
      if (failure) break;
      const summary = timed("cache", () => restorePack(setup.packs!, t.key!, sentinel!, stamp, write));
      if (summary) {
        summaries.set(t.id, summary);
        keys.add(t.key!);
        reused++;
      } else if (pool) compute(t);
      else later.push(t);
      await turn();
    }
    for (const t of later) {
      if (failure) break;
      if (t.key) keys.add(t.key);
      here(t);
      await turn();
    }
    await Promise.all(pending);
    if (failure) throw failure;
  } finally {
    await pool?.close();
  }

  const ids = [...summaries.keys()].sort((a, b) => a.localeCompare(b, "en"));
  return { summaries: ids.map((id) => summaries.get(id)!), computed: tasks.length - reused, reused, keys };
}
