/** `npm run serve` in a child process for the preview tests, with bounded waits. */
import { spawn, type ChildProcess } from "node:child_process";
import { join } from "node:path";
import { ROOT } from "../support/runBuild.js";
import { smallDataFolder } from "./smallData.js";

export interface Served {
  child: ChildProcess;
  url: string;
  data: string;
  out: string;
  output: () => string;
  stop: () => Promise<number | null>;
}

/** Start the preview on port 0 (after `edit` has changed the data folder, if given) and wait (bounded) for its address. */
export async function startServe(parent: string, edit?: (data: string) => void): Promise<Served> {
  const data = smallDataFolder(parent);
  edit?.(data);
  const out = join(parent, "_site");
  const child = spawn(process.execPath, ["--import", "tsx", join(ROOT, "src/cli/serve.ts"), "--port", "0"], {
    cwd: ROOT,
    env: { ...process.env, ATLAS_DATA: data, ATLAS_OUT: out, SOURCE_DATE_EPOCH: "1798761600" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let text = "";
  child.stdout!.on("data", (d) => (text += d));
  child.stderr!.on("data", (d) => (text += d));
  const url = await new Promise<string>((resolve, reject) => {
    const t = setTimeout(() => reject(new Error(`no address after 60 s:\n${text}`)), 60_000);
    const look = () => {
      const m = /serving .* at (http:\/\/[^ ]+\/) /.exec(text);
      if (m) {
        clearTimeout(t);
        resolve(m[1]!);
      }
    };
    child.stdout!.on("data", look);
    child.on("close", () => reject(new Error(`serve ended:\n${text}`)));
  });
  const stop = () =>
    new Promise<number | null>((resolve) => {
      if (child.exitCode !== null) return resolve(child.exitCode);
      const t = setTimeout(() => child.kill("SIGKILL"), 20_000);
      child.once("close", (code) => {
        clearTimeout(t);
        resolve(code);
      });
      child.kill("SIGTERM");
    });
  return { child, url, data, out, output: () => text, stop };
}

export interface VersionState {
  version: number;
  building: boolean;
  error: string | null;
}

export async function versionOf(url: string): Promise<VersionState> {
  return (await (await fetch(new URL("__atlas_version", url))).json()) as VersionState;
}

/** Poll the version endpoint until `ok` holds (at most `ms`). */
export async function waitForState(url: string, ok: (s: VersionState) => boolean, ms = 120_000): Promise<VersionState> {
  const until = Date.now() + ms;
  let last: VersionState | null = null;
  while (Date.now() < until) {
    last = await versionOf(url);
    if (ok(last)) return last;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`preview state never matched; last: ${JSON.stringify(last)}`);
}

