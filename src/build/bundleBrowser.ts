/**
 * Browser scripts from the project's own TypeScript: every entry in
 * src/browser/ is bundled by esbuild into a classic script (IIFE, no module
 * loader) in `<site>/assets/`, so that the pages run the same code as the
 * build (one engine, no hand copies) and still work from file://, where
 * module scripts do not load.
 *
 * Output is deterministic (no source maps, no timestamps), so two builds of
 * the same sources are byte-identical.
 */
import { buildSync } from "esbuild";
import { mkdirSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "../..");

/** Browser entry points: src/browser/<name>.ts → assets/<name>.js. */
export const BROWSER_ENTRIES: readonly string[] = ["forward", "calculator", "units", "tables", "finder", "lockReference", "observer"];

export function bundleBrowser(siteDir: string, entries: readonly string[] = BROWSER_ENTRIES): void {
  if (entries.length === 0) return;
  const outdir = join(siteDir, "assets");
  mkdirSync(outdir, { recursive: true });
  buildSync({
    entryPoints: entries.map((name) => join(ROOT, "src/browser", `${name}.ts`)),
    outdir,
    bundle: true,
    format: "iife",
    platform: "browser",
    // Chromium and Firefox of the last years; BigInt is needed by the exact formatting.
    target: "es2020",
    minify: true,
    legalComments: "none",
    charset: "utf8",
    logLevel: "silent",
  });
}
