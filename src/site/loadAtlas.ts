/**
 * Load, validate and compute a data folder once per process. The build
 * command validates first (to report input problems without starting
 * Eleventy), and .eleventy.js asks again for the same folder: the memo
 * makes that one computation.
 */
import { resolve } from "node:path";
import { loadDataFolder } from "../data/loadDataFolder.js";
import { editionByName } from "../physics/constants/editions.js";
import { timed } from "../cli/timings.js";
import { buildAtlas, type Atlas } from "./atlas.js";

const memo = new Map<string, Atlas>();

export interface AtlasOptions {
  dataDir: string;
  /** ISO date-time shown as the build date. */
  buildDate: string;
}

export function loadAtlas(opts: AtlasOptions): Atlas {
  const key = `${resolve(opts.dataDir)}\0${opts.buildDate}`;
  const hit = memo.get(key);
  if (hit) return hit;
  const folder = timed("load", () => loadDataFolder(opts.dataDir));
  // The data layer has checked the edition name against editions.ts.
  const constants = editionByName(folder.site.constants)!;
  // "compute": physics, page models, CSV and JSON text (ATLAS_TIMINGS=1 prints it).
  const atlas = timed("compute", () => buildAtlas(folder, constants, opts.buildDate));
  memo.set(key, atlas);
  return atlas;
}

/** The build date: SOURCE_DATE_EPOCH (seconds) when set, so builds can be reproduced; else now. */
export function buildDateFrom(env: NodeJS.ProcessEnv, now: () => Date = () => new Date()): string {
  const epoch = env.SOURCE_DATE_EPOCH;
  if (epoch !== undefined && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString();
  return now().toISOString();
}
