/**
 * Publishing a finished build in place of the old one. The build is written
 * to a fresh staging folder beside the output (same file system, so renames
 * are atomic); only when it is complete and its self-checks pass is it
 * renamed into place. Until that rename the old output is never touched, so
 * a failed, interrupted or killed build leaves it byte-for-byte as it was.
 *
 * Names beside `<out>` (all removed or restored by the next build):
 *  - `.atlas-build-<name>-<pid>-XXXXXX/` a staging folder of build <pid>;
 *  - `<out>.previous/` the old output during the two renames of publish.
 */
import { existsSync, mkdirSync, mkdtempSync, readdirSync, renameSync, rmSync } from "node:fs";
import { basename, dirname, join } from "node:path";

const stagingPrefix = (out: string): string => `.atlas-build-${basename(out)}-`;

/** A new empty folder next to `out`, named after this process so a later build can tell a dead build's leftovers. */
export function makeStagingDir(out: string, pid: number = process.pid): string {
  mkdirSync(dirname(out), { recursive: true });
  return mkdtempSync(join(dirname(out), `${stagingPrefix(out)}${pid}-`));
}

/** True when a process with this id exists (signal 0 only checks). */
export function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    // EPERM: it exists but belongs to someone else.
    return (e as { code?: string }).code === "EPERM";
  }
}

/**
 * Swap `staged` into `out`. With an old output present this is two renames
 * (old → aside, staged → out); the old copy is removed only afterwards. A
 * crash between the two renames leaves the old output in `<out>.previous`,
 * which the next build puts back before it starts (see recoverInterrupted).
 * Synchronous, so no signal handler can run between the renames.
 */
export function publish(staged: string, out: string): void {
  const aside = `${out}.previous`;
  if (existsSync(aside)) {
    if (existsSync(out)) rmSync(aside, { recursive: true, force: true });
    else renameSync(aside, out);
  }
  if (existsSync(out)) renameSync(out, aside);
  renameSync(staged, out);
  rmSync(aside, { recursive: true, force: true });
}

/**
 * Before a build: undo a publish that was cut between its two renames, drop
 * an `<out>.previous` left after a completed swap, and remove staging
 * folders of builds that no longer run (killed with SIGKILL, or a crash).
 * Staging folders of builds still running are left alone. Returns the paths
 * removed or restored, for the build's log.
 */
export function recoverInterrupted(out: string, isAlive: (pid: number) => boolean = alive): string[] {
  const done: string[] = [];
  const aside = `${out}.previous`;
  if (existsSync(aside)) {
    if (existsSync(out)) rmSync(aside, { recursive: true, force: true });
    else renameSync(aside, out);
    done.push(aside);
  }
  const parent = dirname(out);
  if (!existsSync(parent)) return done;
  const prefix = stagingPrefix(out);
  for (const name of readdirSync(parent)) {
    if (!name.startsWith(prefix)) continue;
    const pid = Number(/^(\d+)-/.exec(name.slice(prefix.length))?.[1] ?? NaN);
    // A name without a pid comes from an older build command: always stale.
    if (Number.isInteger(pid) && pid !== process.pid && isAlive(pid)) continue;
    rmSync(join(parent, name), { recursive: true, force: true });
    done.push(join(parent, name));
  }
  return done;
}
