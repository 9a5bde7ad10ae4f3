import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { basename, dirname, join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { makeStagingDir, publish, recoverInterrupted } from "../../src/build/publish.js";
import { tempDir } from "../support/runBuild.js";

let parent = "";
afterEach(() => rmSync(parent, { recursive: true, force: true }));

function site(dir: string, text: string): void {
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, "index.html"), text);
}

describe("publishing", () => {
  it("makes the staging folder beside the output, creating missing parents, named with the pid", () => {
    parent = tempDir();
    const out = join(parent, "a", "b", "_site");
    const s = makeStagingDir(out, 4242);
    expect(dirname(s)).toBe(dirname(out));
    expect(basename(s)).toMatch(/^\.atlas-build-_site-4242-\w{6}$/);
  });

  it("swaps the staged folder in and leaves nothing aside", () => {
    parent = tempDir();
    const out = join(parent, "_site");
    site(out, "old");
    const s = makeStagingDir(out);
    site(s, "new");
    publish(s, out);
    expect(readFileSync(join(out, "index.html"), "utf8")).toBe("new");
    expect(readdirSync(parent)).toEqual(["_site"]);
  });

  it("removes staging folders of dead builds and keeps those of running ones", () => {
    parent = tempDir();
    const out = join(parent, "_site");
    site(out, "old");
    const dead = makeStagingDir(out, 111);
    const running = makeStagingDir(out, 222);
    const legacy = join(parent, ".atlas-build-_site-Zq9x1a");
    mkdirSync(legacy);
    const removed = recoverInterrupted(out, (pid) => pid === 222);
    expect(removed.sort()).toEqual([dead, legacy].sort());
    expect(existsSync(running)).toBe(true);
    expect(readFileSync(join(out, "index.html"), "utf8")).toBe("old");
  });

  it("puts the old output back when a publish was cut after moving it aside", () => {
    parent = tempDir();
    const out = join(parent, "_site");
    site(`${out}.previous`, "old");
    recoverInterrupted(out, () => false);
    expect(readFileSync(join(out, "index.html"), "utf8")).toBe("old");
    expect(readdirSync(parent)).toEqual(["_site"]);
  });

  it("drops an old copy left aside after the new output was already in place", () => {
    parent = tempDir();
    const out = join(parent, "_site");
    site(out, "new");
    site(`${out}.previous`, "old");
    recoverInterrupted(out, () => false);
    expect(readFileSync(join(out, "index.html"), "utf8")).toBe("new");
    expect(readdirSync(parent)).toEqual(["_site"]);
  });

  it("leaves folders of other outputs in the same parent alone", () => {
    parent = tempDir();
    const out = join(parent, "_site");
    const other = makeStagingDir(join(parent, "_site2"), 111);
    recoverInterrupted(out, () => false);
    expect(existsSync(other)).toBe(true);
  });
});
