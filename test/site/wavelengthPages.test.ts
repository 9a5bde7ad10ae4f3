/**
 * What the pages show of air and vacuum wavelengths and of the splitting in
 * wavelength (issue 11, section 2): the lines table's air column, the line
 * page's sentence and table.
 */
import { describe, expect, it } from "vitest";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { dec } from "../../src/physics/decimal.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { airWavelengthCell, linesTable } from "../../src/site/linearTables.js";
import { lorentzWavelengthText, wavelengthSplitTable, wavelengthsText } from "../../src/site/wavelengthSplitting.js";
import { airWavelengthOfCell } from "../../src/site/lockTables.js";

const demo = loadDataFolder("data");
const constants = editionByName(demo.site.constants)!;
const fe = computeSpecies(demo.species.find((s) => s.id === "fe56")!, constants);
const home = { speciesId: "fe56", csvBase: "species/fe56/csv", exportUrl: "export/fe56.json" };
const ln = fe.lines.find((l) => l.input.id === "630.25")!;

describe("wavelengths on the pages", () => {
  it("lines table has both wavelengths of Fe I 630.25 nm", () => {
    const t = linesTable(fe, home);
    const col = (key: string) => t.columns.findIndex((c) => c.key === key);
    const row = t.rows.find((r) => r.anchor === "line:630.25")!;
    // NIST ASD: 630.2494 nm in air (from memory); vacuum 630.424 nm as the demo carried it before (Edlén)
    expect(row.cells[col("air_wavelength")]!.text).toBe("630.2494");
    expect(row.cells[col("wavelength")]!.text).toMatch(/^630\.42/);
  });

  it("says the air formula does not reach a vacuum-ultraviolet line", () => {
    // H Lyman α, 121.567 nm in vacuum (NIST ASD, from memory), far below 200 nm
    const q = { value: dec("121.567"), uncertainty: null, text: "121.567 nm", unit: "nm", si: dec("121.567e-9"), siUncertainty: null };
    expect(airWavelengthCell({ wavelength: q, airWavelength: null }).text).toBe("outside the range of the air formula");
    expect(airWavelengthCell({ wavelength: null, airWavelength: null }).text).toBe("—");
  });

  it("line page names both wavelengths and which was given", () => {
    expect(wavelengthsText(ln.input)).toBe("λ = 630.4237 nm in vacuum, 630.2494 nm in standard air (as given)");
  });

  it("line page gives one Lorentz unit in pm/T and mÅ/kG, near the solar rule", () => {
    // Δλ = 4.6686e-13 λ² g B (Å, G), common practice in solar spectroscopy: 18.555 mÅ/kG at λ = 6304.24 Å, g = 1
    expect(lorentzWavelengthText(ln)).toMatch(/18\.5548 pm\/T = 18\.5548 mÅ\/kG/);
  });

  it("line page tabulates the σ centroid separation at every bias field above zero", () => {
    const t = wavelengthSplitTable(ln, demo.site.fields, home)!;
    expect(t.rows.length).toBe(demo.site.fields.filter((f) => f.tesla.gt(0)).length);
    const at1T = t.rows.find((r) => r.anchor === "line:630.25:dlambda:B=1T")!;
    const pm = t.columns.findIndex((c) => c.key === "sigma" && c.unit === "pm");
    // rule above with g = g_eff ≈ 5/2 (textbook LS; 2.5035 with gS = 2.00232): 2 × 4.6686e-13 × 6304.24² × 2.5035 × 1e4 G ≈ 0.929 Å
    expect(Number(at1T.cells[pm]!.sort)).toBeCloseTo(92.9, 1);
  });

  it("lock-point table gives the air wavelength of a frequency, to 9 digits", () => {
    // c = 299 792 458 m/s (SI); Na D2 at 589.1583264 nm in vacuum and 588.9950954 nm in air (from memory:
    // D. A. Steck, "Sodium D Line Data"; the handbook's air formula differs from the IAU one by about 1.5e-8 here)
    const hz = dec("299792458").div(dec("589.1583264e-9"));
    expect(Math.abs(Number(airWavelengthOfCell(hz).sort) - 588.9950954)).toBeLessThan(2e-5);
    // shown to 9 significant digits
    expect(airWavelengthOfCell(hz).text.replace(/\s/g, "")).toBe("588.995086");
    // H Lyman α, 121.567 nm (NIST ASD, from memory), below the formula's range
    expect(airWavelengthOfCell(dec("299792458").div(dec("121.567e-9"))).text).toBe("outside the range of the air formula");
  });
});
