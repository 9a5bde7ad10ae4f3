import { rmSync } from "node:fs";
import fc from "fast-check";
import { afterAll, describe, expect, it } from "vitest";
import { DEMO_DATA, tempDir } from "../support/runBuild.js";
import { applyDamage, damage, loadOrExplain, ScratchFolder } from "./dataMutations.js";
import { RUNS } from "./arbitraries.js";

const scratch = new ScratchFolder(DEMO_DATA, tempDir("atlas-mutate-"));
afterAll(() => rmSync(scratch.dir, { recursive: true, force: true }));

describe("the data loader given randomly damaged demo files", () => {
  it("loads the undamaged copy", () => {
    expect(loadOrExplain(scratch.dir)).toEqual({ ok: true });
  });

  it("never crashes: it loads or reports problems at file:line:column", () => {
    let refused = 0;
    fc.assert(
      fc.property(damage, (d) => {
        if (!scratch.with(d, () => loadOrExplain(scratch.dir)).ok) refused++;
      }),
      { numRuns: RUNS },
    );
    // Most damage must be caught; a generator that only made harmless edits would test nothing.
    expect(refused).toBeGreaterThan(RUNS / 4);
  });

  it("damages what it is asked to (the mutations really edit)", () => {
    const text = Buffer.from("id: x\nlabel: y\n");
    expect(applyDamage(text, [{ kind: "deleteLine", at: 1, b: 0 }]).toString()).toBe("id: x\n");
    expect(applyDamage(text, [{ kind: "setValue", at: 0, value: "NaN" }]).toString()).toBe("id: NaN\nlabel: y\n");
    expect(applyDamage(text, [{ kind: "bytes", at: 0, byte: 0xff }])[0]).toBe(0xff);
  });
});
