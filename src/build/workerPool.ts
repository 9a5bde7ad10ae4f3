/**
 * Worker threads that build species side by side (speciesWorker.ts). The
 * workers run TypeScript through tsx, as the build command does. On Node 20
 * `execArgv: ["--import", "tsx"]` is not enough: tsx registers its hooks
 * only in the main thread, and a worker does not inherit them. So a worker
 * starts from a two-line bootstrap that registers tsx through its API
 * (found from this file, so from any working directory and the same way
 * under vitest) and then imports speciesWorker.ts.
 *
 * Failure: a task's error (or a worker that dies) rejects that task; the
 * caller then calls close(), which waits until every worker has stopped, so
 * nothing writes into the staging folder after the build has failed and
 * removes it. Signals: while the pool is open, SIGINT and SIGTERM first
 * halt every write into the staging folder (WriteGate), then the build
 * command's own handler removes the folder and exits.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { pathToFileURL } from "node:url";
import { Worker } from "node:worker_threads";
import type { SpeciesSummary } from "./speciesBuild.js";
import type { SpeciesSetup, SpeciesTask, WriteGate } from "./speciesTask.js";

export type WorkerReply =
  | { id: string; summary: SpeciesSummary; timings: [string, number][] }
  | { id: string; error: { message: string; stack: string } };

export interface TaskDone {
  summary: SpeciesSummary;
  timings: [string, number][];
}

/** The worker's bootstrap (evaluated as a script): register tsx in this thread, then load the worker module. */
function bootstrap(): string {
  const manifest = createRequire(import.meta.url).resolve("tsx/package.json");
  const api = join(dirname(manifest), JSON.parse(readFileSync(manifest, "utf8")).exports["./esm/api"].import.default);
  const worker = new URL("./speciesWorker.ts", import.meta.url).href;
  return `import(${JSON.stringify(pathToFileURL(api).href)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(worker)}); });`;
}

/** An error from a worker, with the worker's stack (shown by ATLAS_DEBUG=1). */
function workerError(message: string, stack?: string): Error {
  const e = new Error(message);
  if (stack) e.stack = stack;
  return e;
}

interface Job {
  task: SpeciesTask;
  resolve: (done: TaskDone) => void;
  reject: (e: Error) => void;
}

interface Slot {
  worker: Worker;
  job: Job | null;
  dead: boolean;
}

export class SpeciesPool {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private broken: Error | null = null;
  private closed = false;
  private readonly onSignal: (signal: NodeJS.Signals) => void;

  constructor(setup: SpeciesSetup, size: number, private readonly gate: WriteGate) {
    const code = bootstrap();
    for (let i = 0; i < size; i++) {
      const worker = new Worker(code, { eval: true, workerData: { setup, gate: gate.shared } });
      const slot: Slot = { worker, job: null, dead: false };
      worker.on("message", (reply: WorkerReply) => this.settle(slot, reply));
      worker.on("error", (e) => this.fail(slot, workerError(`worker failed${slot.job ? ` while building ${slot.job.task.shown}` : ""}: ${e.message}`, e.stack)));
      worker.on("exit", (code) => {
        if (!this.closed) this.fail(slot, workerError(`worker stopped (exit code ${code})${slot.job ? ` while building ${slot.job.task.shown}` : ""}`));
      });
      this.slots.push(slot);
    }
    // Before the build command's handlers (prepended): stop the workers' writes, then let those run.
    this.onSignal = (signal) => {
      this.gate.halt();
      // Nobody else listens: do what the signal would have done without us.
      if (process.listenerCount(signal) === 1) {
        process.removeListener(signal, this.onSignal);
        process.kill(process.pid, signal);
      }
    };
    process.prependListener("SIGINT", this.onSignal);
    process.prependListener("SIGTERM", this.onSignal);
  }

  get size(): number {
    return this.slots.length;
  }

  /** Build one species in the next free worker. */
  run(task: SpeciesTask): Promise<TaskDone> {
    return new Promise((resolve, reject) => {
      if (this.broken || this.closed) return reject(this.broken ?? new Error("species pool is closed"));
      this.queue.push({ task, resolve, reject });
      this.dispatch();
    });
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.dead || slot.job || this.queue.length === 0) continue;
      slot.job = this.queue.shift()!;
      slot.worker.postMessage(slot.job.task);
    }
  }

  private settle(slot: Slot, reply: WorkerReply): void {
    const job = slot.job;
    slot.job = null;
    if (!job) return;
    if ("error" in reply) job.reject(workerError(reply.error.message, reply.error.stack));
    else job.resolve({ summary: reply.summary, timings: reply.timings });
    this.dispatch();
  }

  /** A worker died: its task and every queued task fail. */
  private fail(slot: Slot, e: Error): void {
    if (slot.dead) return;
    slot.dead = true;
    this.broken ??= e;
    slot.job?.reject(e);
    slot.job = null;
    for (const job of this.queue.splice(0)) job.reject(this.broken);
  }

  private closing: Promise<void> | null = null;

  /** Stop every worker (queued and running tasks fail) and wait until all have stopped; every call waits for the same. */
  close(): Promise<void> {
    this.closing ??= (async () => {
      this.closed = true;
      const stopped = new Error("species pool is closed");
      for (const job of this.queue.splice(0)) job.reject(stopped);
      for (const slot of this.slots) slot.job?.reject(stopped);
      await Promise.all(this.slots.map((s) => s.worker.terminate()));
      process.removeListener("SIGINT", this.onSignal);
      process.removeListener("SIGTERM", this.onSignal);
    })();
    return this.closing;
  }
}
