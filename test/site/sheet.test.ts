import { describe, expect, it } from "vitest";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { dec } from "../../src/physics/decimal.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { sheetNumberCell, speciesSheet } from "../../src/site/sheet.js";

const demo = loadDataFolder("data");
const constants = editionByName(demo.site.constants)!;
const rb = computeSpecies(demo.species.find((s) => s.id === "rb87")!, constants);
const sheet = speciesSheet(rb, { mList: true } as never);
const plain = (s: string) => s.replaceAll("\u2009", "");

describe("bench sheet numbers with their uncertainties", () => {
  const row = (anchor: string) => sheet.sublevels.rows.find((r) => r.anchor === anchor)!;
  const col = (key: string) => sheet.sublevels.columns.findIndex((c) => c.key === key);

  it("gives gF of 87Rb 5²S1/2 F = 2 and its shift per unit m in the concise form", () => {
    const r = row("sheet:level:5s-S1/2:F=2");
    // gF = gJ/4 + 3gI/4 with u = 5.000 56e-8 (Steck, "Rubidium 87 D Line Data", eq. 22; demo inputs; hand): (50) at 10⁻⁹
    expect(plain(r.cells[col("g")]!.text)).toBe("0.499836426(50)");
    // gF·μB/h with μB/h = 1.399 624 491 71(44) MHz/G (CODATA 2022): u = √((1.3996·5.0e-8)² + (0.4998·4.4e-10)²) = 7.0e-8 MHz/G (hand)
    const perM = r.cells[col("perM")]!;
    expect(plain(perM.text)).toBe("0.699583304(70)");
    expect(Number(perM.u)).toBeCloseTo(Number(dec("1.39962449171").mul("5.00056e-8").pow(2).add(dec("0.49983642645").mul("4.4e-10").pow(2)).sqrt()), 12);
  });

  it("keeps a measured gJ as written and gives g_eff of D2 its uncertainty from the measured g values", () => {
    // demo: gJ(5²P3/2) = 1.3362(13) (Steck); g_eff = (g_u + g_l)/2 + (g_u − g_l)·3/4 with J_u = 3/2, J_l = 1/2 (textbook),
    // so u(g_eff) = √((5/4·0.0013)² + (1/4·0.000 000 20)²) = 0.001 625 → (16) at 10⁻⁴, g_eff = 1.169 675 (hand)
    expect(plain(row("sheet:level:5p-P3/2").cells[col("g")]!.text)).toBe("1.3362(13)");
    const lc = sheet.lines.columns.findIndex((c) => c.key === "g_eff");
    const d2 = sheet.lines.rows.find((r) => r.anchor === "sheet:line:D2")!;
    expect(plain(d2.cells[lc]!.text)).toBe("1.1697(16)");
  });
});

describe("sheetNumberCell", () => {
  it("keeps the concise form up to nine significant digits and otherwise shows the value's six good digits", () => {
    // GUM §7.2.6 concise form: 0.499 836 426(50) needs nine digits
    expect(plain(sheetNumberCell(dec("0.49983642645"), dec("5.0e-8")).text)).toBe("0.499836426(50)");
    // an LS gJ of ²P1/2 (2/3 with gS = 2; textbook) whose u of 1.2e-15 would need fifteen digits: six digits, all good
    const ls = sheetNumberCell(dec("0.66587526274300"), dec("1.2e-15"));
    expect(plain(ls.text)).toBe("0.665875");
    expect(ls.u).toBeUndefined();
    // an exact number stays the plain six-digit form
    expect(plain(sheetNumberCell(dec("2"), null).text)).toBe("2.00000");
  });
});
