/**
 * Lightweight build timings, printed by the build command when
 * ATLAS_TIMINGS=1. Phases accumulate (a phase may be entered once per
 * species); the report goes to stderr as one `timing <phase> <ms>` line per
 * phase so scripts (scripts/bench/bench.ts) can read it. Recording costs one
 * clock read per call and never changes what is built.
 */
import { performance } from "node:perf_hooks";

const totals = new Map<string, number>();

/** Run `fn`, adding its wall time to `phase`. */
export function timed<T>(phase: string, fn: () => T): T {
  const t0 = performance.now();
  try {
    return fn();
  } finally {
    totals.set(phase, (totals.get(phase) ?? 0) + performance.now() - t0);
  }
}

/** The async form of timed. */
export async function timedAsync<T>(phase: string, fn: () => Promise<T>): Promise<T> {
  const t0 = performance.now();
  try {
    return await fn();
  } finally {
    totals.set(phase, (totals.get(phase) ?? 0) + performance.now() - t0);
  }
}

/** Every phase recorded so far, in order of first use, in milliseconds. */
export function timingTotals(): [string, number][] {
  return [...totals.entries()];
}

/** The lines the build prints: `timing <phase> <ms>`, ms with one decimal. */
export function formatTimings(entries: [string, number][] = timingTotals()): string {
  return entries.map(([phase, ms]) => `timing ${phase} ${ms.toFixed(1)}`).join("\n");
}

/** Parse formatTimings output (other lines ignored). */
export function parseTimings(text: string): Map<string, number> {
  const out = new Map<string, number>();
  for (const m of text.matchAll(/^timing (\S+) (\d+(?:\.\d+)?)$/gm)) out.set(m[1]!, Number(m[2]));
  return out;
}

/** Add time measured elsewhere (a worker thread's phases) to `phase`. */
export function addTiming(phase: string, ms: number): void {
  totals.set(phase, (totals.get(phase) ?? 0) + ms);
}
