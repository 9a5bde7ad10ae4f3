/**
 * The page scripts evaluated in a node:vm context, as classic scripts see
 * them (one shared global), for tests without a browser. The scripts are
 * bundled from src/browser/ exactly as the build bundles them
 * (src/build/bundleBrowser.ts), once per test process.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import vm from "node:vm";
import { bundleBrowser } from "../../src/build/bundleBrowser.js";
import { tempDir } from "../support/runBuild.js";

export interface FinderRow {
  kind: string;
  href: string;
  label: string;
  answer?: string;
  column?: string;
}

export interface ClientGlobal {
  AtlasSearchData: unknown;
  AtlasFinder: {
    searchTokens(text: string): string[];
    parseQuery(text: string): { words: string[]; states: Record<string, number>[]; dm: number[] | null; field: { tesla: string } | null; transitions: string[] };
    createFinder(data: unknown): {
      search(text: string, limit?: number, options?: { unit?: string }): { rows: FinderRow[]; total: number; capped?: boolean };
      all(): FinderRow[];
    };
  };
  AtlasUnits: { convert(hzPerT: string, unit: string): { sign: string; int: string; frac: string; exp: string } | null; UNITS: string[] };
  AtlasTables: {
    decimalKey(s: string): unknown;
    compareDecimal(a: unknown, b: unknown): number;
  };
}

/** Run the given scripts (paths, or { code }) in order in one fresh context. */
export function clientContext(scripts: (string | { code: string })[]): ClientGlobal {
  const ctx = vm.createContext({});
  for (const s of scripts) vm.runInContext(typeof s === "string" ? readFileSync(s, "utf8") : s.code, ctx, typeof s === "string" ? { filename: s } : {});
  return ctx as unknown as ClientGlobal;
}

let bundled: string | null = null;

/** A page script as the build writes it: "units.js" is src/browser/units.ts bundled into a classic script. */
export function ASSET(name: string): string {
  if (!bundled) {
    bundled = tempDir("atlas-bundle-");
    bundleBrowser(bundled);
  }
  return join(bundled, "assets", name);
}
