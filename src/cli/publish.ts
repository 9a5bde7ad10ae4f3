/**
 * Publishing a finished build in place of the old one. The build is written
 * to a fresh temporary folder beside the output; only when it is complete
 * and its self-checks pass is it renamed into place. Until that rename the
 * old output is never touched, so a failed, interrupted or killed build
 * leaves it byte-for-byte as it was.
 */
import { existsSync, mkdtempSync, renameSync, rmSync } from "node:fs";
import { basename, dirname, join } from "node:path";

/** A new empty folder next to `out`, on the same file system so the final rename is atomic. */
export function makeStagingDir(out: string): string {
  return mkdtempSync(join(dirname(out), `.atlas-build-${basename(out)}-`));
}

/**
 * Swap `staged` into `out`. With an old output present this is two renames
 * (old → aside, staged → out); the old copy is removed only afterwards. A
 * crash between the two renames leaves the old output in `<out>.previous`,
 * which the next build puts back before it starts (see recoverInterrupted).
 */
export function publish(staged: string, out: string): void {
  const aside = `${out}.previous`;
  if (existsSync(aside)) rmSync(aside, { recursive: true, force: true });
  if (existsSync(out)) renameSync(out, aside);
  renameSync(staged, out);
  rmSync(aside, { recursive: true, force: true });
}

/** Undo a publish that was cut between its two renames; remove stale staging folders. */
export function recoverInterrupted(out: string): void {
  const aside = `${out}.previous`;
  if (!existsSync(out) && existsSync(aside)) renameSync(aside, out);
}
