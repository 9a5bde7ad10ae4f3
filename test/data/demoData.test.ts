/**
 * The demo data folder against published values (issue 10, "Demo data"):
 * the demo's numbers are checked here, never used as check values. Every
 * level and line names its source, and a value recalled rather than read
 * says so in its source.
 */
import { describe, expect, it } from "vitest";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import type { LevelInput, SpeciesInput } from "../../src/data/model.js";

const demo = loadDataFolder("data");
const species = (id: string): SpeciesInput => demo.species.find((s) => s.id === id)!;
const level = (s: string, id: string): LevelInput => species(s).levels.find((l) => l.id === id)!;

describe("demo data", () => {
  it("has 87Rb 5²P1/2 A = 408.328(15) MHz and no rounded gJ override", () => {
    const p = level("rb87", "5p-P1/2");
    // 408.328(15) MHz (from memory: D. A. Steck, "Rubidium 87 D Line Data", the handbook the file cites)
    expect(p.hyperfine!.A.si.toString()).toBe("408328000");
    expect(p.hyperfine!.A.siUncertainty!.toString()).toBe("15000");
    expect(p.gJ).toBeNull();
    expect(p.source).toMatch(/from memory/);
  });

  it("has 87Rb 5²S1/2 A = 3417.341305452145(45) MHz and 5²P3/2 A = 84.7185(20) MHz, B = 12.4965(37) MHz, each uncertainty marked as recalled", () => {
    const s = level("rb87", "5s-S1/2");
    // 3417.341305452145(45) MHz (from memory: D. A. Steck, "Rubidium 87 D Line Data")
    expect(s.hyperfine!.A.siUncertainty!.toString()).toBe("0.000045");
    expect(s.source).toMatch(/from memory/);
    const p = level("rb87", "5p-P3/2");
    // 84.7185(20) MHz and 12.4965(37) MHz (from memory: the same handbook)
    expect(p.hyperfine!.A.siUncertainty!.toString()).toBe("2000");
    expect(p.hyperfine!.B!.siUncertainty!.toString()).toBe("3700");
    expect(p.source).toMatch(/from memory/);
  });

  it("has 23Na 3²S1/2 gJ = 2.0022960(14)", () => {
    const g = level("na23", "3s-S1/2").gJ!;
    // 2.0022960(14) (from memory: D. A. Steck, "Sodium D Line Data", the handbook the file cites)
    expect(g.value.toString()).toBe("2.002296");
    expect(g.uncertainty!.toString()).toBe("0.0000014");
  });

  it("has a measured gJ near 1.486 for 202Hg 6s6p ³P1", () => {
    const g = level("hg202", "6s6p-3P1").gJ!;
    // about 1.486 (from memory: the NIST Atomic Spectra Database level compilation of Hg I); LS would give 1.5
    expect(Math.abs(g.value.toNumber() - 1.486)).toBeLessThan(0.001);
    expect(level("hg202", "6s6p-3P1").source).toMatch(/from memory/);
  });

  it("has 40Ar metastable 4s 2[3/2]°2 in jK coupling on a 2P°3/2 core, with a measured g near 1.50", () => {
    // textbook: the level is 2[3/2]°2 of 3p⁵(²P°3/2)4s in jK coupling (g = 3/2 with gS = 2);
    // from memory: NIST ASD, Ar I, its Landé g is listed as 1.506.
    const t = level("ar40", "3p5-4s-K3/2-J2").term;
    expect(t.scheme === "jK" && [t.K2, t.J2, t.core.text, t.l]).toEqual([3, 4, "2Po3/2", 0]);
    expect(Math.abs(Number(level("ar40", "3p5-4s-K3/2-J2").gJ!.text) - 1.5)).toBeLessThan(0.01);
  });

  it("has 208Pb 6p² in jj coupling, with (1/2,3/2)1 near the jj value 3/2 and (1/2,3/2)2 between jj and LS", () => {
    // textbook: jj g of (1/2,3/2)1 in p² is 3/2, of (1/2,3/2)2 is 7/6 (g(p1/2) = 2/3, g(p3/2) = 4/3 with gS = 2);
    // from memory: NIST ASD, Pb I, Landé g 1.501 (6p² ³P1) and 1.269 (6p² ³P2), the latter between 7/6 and the LS 3/2.
    const one = level("pb208", "6p2-j1/2-j3/2-J1");
    const two = level("pb208", "6p2-j1/2-j3/2-J2");
    expect(one.term.scheme === "jj" && [one.term.J2]).toEqual([2]);
    expect(Math.abs(one.gJ!.value.toNumber() - 1.5)).toBeLessThan(0.01);
    expect(two.gJ!.value.toNumber()).toBeGreaterThan(7 / 6);
    expect(two.gJ!.value.toNumber()).toBeLessThan(1.5);
  });

  it("names a source on every level and every line", () => {
    for (const s of demo.species) {
      for (const l of s.levels) expect(l.source.length, `${s.id} ${l.id}`).toBeGreaterThan(10);
      for (const ln of s.lines) expect((ln.source ?? "").length, `${s.id} ${ln.id}`).toBeGreaterThan(10);
    }
  });
});
