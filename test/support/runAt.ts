/** Run `npm run at`'s command (src/cli/at.ts) in a child process, as a user would. */
import { spawn } from "node:child_process";
import { join } from "node:path";
import { ROOT } from "./runBuild.js";

export interface AtRun {
  code: number | null;
  stdout: string;
  stderr: string;
}

export function runAt(args: string[], env: Record<string, string> = {}): Promise<AtRun> {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", join(ROOT, "src/cli/at.ts"), ...args], {
      cwd: ROOT,
      env: { ...process.env, ...env },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("error", reject);
    child.on("close", (code) => resolvePromise({ code, stdout, stderr }));
  });
}
