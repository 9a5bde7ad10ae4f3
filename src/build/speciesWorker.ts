/**
 * A worker thread of the species pool (workerPool.ts). It gets the build's
 * shared setup once (workerData) and then species tasks one message at a
 * time; each is parsed from the bytes the main thread validated, built into
 * the staging folder (speciesTask.ts), and answered with its small summary
 * and the time spent per phase. A failure is answered with its message and
 * stack, never thrown, so the main thread reports it as the build does.
 */
import { parentPort, workerData } from "node:worker_threads";
import { InputProblems } from "../data/inputError.js";
import { pageRenderer } from "./renderPages.js";
import { runSpeciesTask, speciesFromBytes, speciesTools, WriteGate, type SpeciesSetup, type SpeciesTask } from "./speciesTask.js";
import { timingTotals } from "./timings.js";
import type { WorkerReply } from "./workerPool.js";

const { setup, gate } = workerData as { setup: SpeciesSetup; gate: SharedArrayBuffer };
const tools = speciesTools(setup, pageRenderer(), new WriteGate(gate));

parentPort!.on("message", (task: SpeciesTask) => {
  const before = new Map(timingTotals());
  let reply: WorkerReply;
  try {
    const summary = runSpeciesTask(task, speciesFromBytes(task), setup, tools);
    const timings = timingTotals().map(([phase, ms]): [string, number] => [phase, ms - (before.get(phase) ?? 0)]);
    reply = { id: task.id, summary, timings };
  } catch (e) {
    const message = e instanceof InputProblems ? `${task.shown} did not parse again in a worker:\n${e.format()}` : e instanceof Error ? e.message : String(e);
    reply = { id: task.id, error: { message, stack: e instanceof Error ? (e.stack ?? message) : message } };
  }
  parentPort!.postMessage(reply);
});
