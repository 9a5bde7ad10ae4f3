/**
 * The snapshot a build takes of its data folder hashes the files as the
 * loader's data version does, so the build can tell that what it validated
 * is what it snapshotted.
 */
import { readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { loadWithSnapshot, snapshotData } from "../../src/build/dataSnapshot.js";
import { dataVersion } from "../../src/data/loadDataFolder.js";
import { smallDataFolder } from "../cli/smallData.js";
import { DEMO_DATA } from "../support/runBuild.js";

const dirs: string[] = [];
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

describe("the data snapshot", () => {
  it("has the loader's data version and the bytes of every species file", () => {
    const s = snapshotData(DEMO_DATA)!;
    expect(s.version).toBe(dataVersion(DEMO_DATA));
    expect(s.species.get("species/rb87.yaml")!.equals(readFileSync(join(DEMO_DATA, "species/rb87.yaml")))).toBe(true);
    expect([...s.species.keys()].every((k) => k.startsWith("species/"))).toBe(true);
  });

  it("changes with any file of the folder, and is null for a folder that is not there", () => {
    const dir = smallDataFolder();
    dirs.push(dir);
    const before = snapshotData(dir)!.version;
    writeFileSync(join(dir, "README.md"), "notes\n");
    expect(snapshotData(dir)!.version).not.toBe(before);
    expect(snapshotData(dir)!.version).toBe(dataVersion(dir));
    expect(snapshotData(join(dir, "absent"))).toBeNull();
  });

  it("is loaded together with the validated folder", () => {
    const { folder, snapshot } = loadWithSnapshot(DEMO_DATA);
    expect(snapshot.version).toBe(folder.dataVersion);
    expect(folder.species.every((s) => snapshot.species.has(s.file))).toBe(true);
  });
});
