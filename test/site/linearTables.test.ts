import { describe, expect, it } from "vitest";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { mJTable } from "../../src/site/linearTables.js";

const demo = loadDataFolder("data");
const constants = editionByName(demo.site.constants)!;
const ca = computeSpecies(demo.species.find((s) => s.id === "ca40-ion")!, constants);
const plain = (s: string) => s.replaceAll("\u2009", "");

describe("the mJ table's gJ·mJ column", () => {
  it("carries |mJ|·u(gJ): 40Ca+ 3d ²D5/2 with the demo's measured gJ = 1.2003340(3)", () => {
    const l = ca.levels.find((x) => x.input.id === "3d-D5/2")!;
    const t = mJTable(l, { speciesId: "ca40-ion", csvBase: "species/ca40-ion/csv", exportUrl: "export/ca40-ion.json" });
    const gm = t.columns.findIndex((c) => c.key === "gm");
    const row = (m: string) => t.rows.find((r) => r.anchor.endsWith(`mJ=${m}`))!.cells[gm]!;
    // gJ·mJ = 5/2 · 1.2003340 = 3.0008350, u = 5/2 · 0.0000003 = 0.000 000 75 (hand; first-order propagation, textbook)
    expect(plain(row("5/2").text)).toBe("3.00083500(75)");
    expect(Number(row("5/2").u)).toBeCloseTo(7.5e-7, 15);
    // mJ = 1/2: 0.600 167 0 with u = 0.000 000 15
    expect(plain(row("1/2").text)).toBe("0.60016700(15)");
  });
});
