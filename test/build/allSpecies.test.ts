/**
 * The order in which species are handed to the workers: costliest first,
 * by an estimate from the sublevel counts. On the demo the estimate ranks
 * the species as their measured build times do (k40 2.5 s, cs133 1.4 s,
 * sr87 0.8 s, … sr88 0.08 s, cd114 0.05 s in one thread, on the
 * development machine; see docs-bench.md). 208Pb, three levels without
 * nuclear spin and one line, is the quickest: its physics took 7 ms against
 * 14 ms for cd114 (computeSpecies and computeFields, measured 2026-12-02).
 */
import { describe, expect, it } from "vitest";
import { estimateCost } from "../../src/build/allSpecies.js";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { DEMO_DATA } from "../support/runBuild.js";

describe("the species' estimated cost", () => {
  it("puts the demo's slowest species first and its quickest last", () => {
    const order = loadDataFolder(DEMO_DATA)
      .species.map((s) => ({ id: s.id, cost: estimateCost(s) }))
      .sort((a, b) => b.cost - a.cost)
      .map((s) => s.id);
    expect(order.slice(0, 3)).toEqual(["k40", "cs133", "sr87"]);
    expect(order.at(-1)).toBe("pb208");
  });
});
