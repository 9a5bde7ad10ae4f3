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
import { airWavelengthCell, glanceTable, linesTable } from "../../src/site/linearTables.js";
import { computeFrom } from "../results/speciesFrom.js";
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
    // with its uncertainty from μB/(hc) (CODATA 2022, 3.2e-10 relative; the air wavelength is given exact): u ≈ 6e-9 pm/T
    const text = lorentzWavelengthText(ln)!.replaceAll("\u2009", "");
    expect(text).toMatch(/18\.55478\d*\(\d\d\) pm\/T = 18\.55478\d*\(\d\d\) mÅ\/kG/);
    const u = Number(/18\.(\d+)\((\d\d)\) pm/.exec(text)![2]) * 10 ** -/18\.(\d+)\(/.exec(text)![1]!.length;
    expect(u / 18.5548).toBeGreaterThan(2.5e-10);
    expect(u / 18.5548).toBeLessThan(3.5e-10);
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

describe("wavelengths and splittings with their uncertainties", () => {
  // Fe I 630.25 nm in air with an uncertainty of 0.3 pm (invented input, on the NIST ASD value from memory)
  const { result } = computeFrom(`id: x
label: "X"
levels:
  - { id: lo, config: 3d6 4s2, term: 5D0, source: test }
  - { id: up, config: 3d6 4s 4p, term: 5Po1, gJ: "2.487(3)", source: test }
lines:
  - { id: L, upper: up, lower: lo, wavelength: "630.2494(3) nm", medium: air, multipole: E1, source: test }
`);
  const line = result.lines[0]!;
  const plain = (s: string) => s.replaceAll("\u2009", "");

  it("shows the converted vacuum wavelength with the given one's uncertainty, the given one as written", () => {
    // λ_vac = n·λ_air with n ≈ 1.000 277 (Edlén/Birch & Downs, Morton 2000): u(λ_vac) = n·0.0003 nm = 0.000 30 nm to two digits
    expect(plain(wavelengthsText(line.input)!)).toBe("λ = 630.42370(30) nm in vacuum, 630.2494(3) nm in standard air (as given)");
    const t = linesTable(result, home);
    const row = t.rows[0]!;
    expect(plain(row.cells[t.columns.findIndex((c) => c.key === "wavelength")]!.text)).toBe("630.42370(30)");
    expect(row.cells[t.columns.findIndex((c) => c.key === "air_wavelength")]!.text).toBe("630.2494(3)");
  });

  it("gives each splitting in wavelength its uncertainty: 2·u(λ)/λ relative for a Lorentz unit, g_eff's and λ's for the σ separation", () => {
    // Δλ₁ = λ²·μB/(hc) (textbook): relative u = 2·u(λ)/λ = 2·0.0003/630.4237 = 9.5e-7 (μB/(hc) adds 3e-10, negligible)
    const t = wavelengthSplitTable(line, [{ text: "1 T", tesla: dec("1") } as never], home)!;
    const col = (key: string, unit: string) => t.columns.findIndex((c) => c.key === key && c.unit === unit);
    const row = t.rows[0]!;
    const lor = row.cells[col("lorentz", "pm")]!;
    expect(Number(lor.u) / Number(lor.sort)).toBeCloseTo(9.52e-7, 8);
    // σ separation 2·g·Δλ₁·B, J = 0 lower level so g_eff = g_u (textbook): relative u = √((0.003/2.487)² + (9.5e-7)²) = 1.206e-3
    const sep = row.cells[col("sigma", "pm")]!;
    expect(Number(sep.u) / Number(sep.sort)).toBeCloseTo(1.2063e-3, 6);
    // mÅ is ten times pm, uncertainty too
    const sepA = row.cells[col("sigmaA", "mÅ")]!;
    expect(Number(sepA.u)).toBeCloseTo(Number(sep.u) * 10, 12);
    // 2·g_u = 4.974 with u = 2·0.003 (hand), two significant digits of u (GUM §7.2.6)
    expect(plain(lorentzWavelengthText(line)!)).toMatch(/2·\|g_eff\| = 4\.9740\(60\) Lorentz units/);
  });
});

describe("the at-a-glance shift per unit m", () => {
  const rb = computeSpecies(demo.species.find((s) => s.id === "rb87")!, constants);
  const t = glanceTable(rb, { speciesId: "rb87", csvBase: "species/rb87/csv", exportUrl: "export/rb87.json" }, dec(constants.muB_h.value));
  const perM = t.columns.findIndex((c) => c.key === "per_m");

  it("carries gF·μB/h's uncertainty, in MHz/G and for the unit switch in Hz/T", () => {
    // 87Rb 5²S1/2 F = 2: gF = gJ/4 + 3gI/4 (Steck eq. 22) with u(gF) = 5.000 56e-8 (hand, test/results/linearUncertainties.test.ts);
    // u = √((μB/h·u(gF))² + (gF·u(μB/h))²), μB/h = 13 996 244 917.1(4.4) Hz/T (CODATA 2022)
    const row = t.rows.find((r) => r.anchor === "glance:level:5s-S1/2:F=2")!;
    const cell = row.cells[perM]!;
    const gF = dec("2.00233113").div(4).add(dec("-0.0009951414").mul(3).div(4));
    const hand = dec("13996244917.1").mul(dec("5.00056e-8")).pow(2).add(gF.mul(dec("4.4")).pow(2)).sqrt();
    expect(Number(cell.uHzPerT) / Number(hand)).toBeCloseTo(1, 4);
    // 1 G = 1e-4 T and 1 MHz = 1e6 Hz (common practice): MHz/G = Hz/T × 1e-10
    expect(Number(cell.u) / (Number(hand) * 1e-10)).toBeCloseTo(1, 4);
    expect(plain(cell.text)).toMatch(/^0\.69958\d*\(\d\d\)$/);
  });
  const plain = (s: string) => s.replaceAll("\u2009", "");
});
