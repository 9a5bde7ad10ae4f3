import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../src/physics/decimal.js";
import { Rational } from "../../src/physics/rational.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { val } from "../../src/physics/constants/constant.js";
import { hyperfineLinePattern } from "../../src/physics/hyperfineLines.js";
import { absoluteFrequency, lockPoints, strongestTransition, vacuumWavelength, type LockGroup, type LockPoint } from "../../src/physics/lockPoints.js";
import { SPEED_OF_LIGHT } from "../../src/physics/units.js";

const MHZ = new Dec("1e6");
const THZ = new Dec("1e12");

// 87Rb D2 with the constants of data/species/rb87.yaml (D. A. Steck, "Rubidium 87 D Line Data"):
// A(5S1/2) = 3417.341305452145 MHz, A(5P3/2) = 84.7185 MHz, B(5P3/2) = 12.4965 MHz, λ = 780.241209686 nm (vacuum).
const d2 = hyperfineLinePattern({
  I2: 3,
  gI: dec("-0.0009951414"),
  upper: { J2: 3, gJ: dec("1.3362"), A: dec("84.7185e6"), B: dec("12.4965e6") },
  lower: { J2: 1, gJ: dec("2.00233113"), A: dec("3417.341305452145e6"), B: dec("0") },
  k: 1,
  muB_h: val(CODATA_2022.muB_h),
});
const nu0 = SPEED_OF_LIGHT.div(dec("780.241209686e-9"));
const points = lockPoints(d2, nu0);
const name = (p: LockPoint) => `${p.kind === "crossover" ? "CO " : ""}${p.Fl2.map((x) => x / 2).join(",")}>${p.Fu2.map((x) => x / 2).join(",")}`;
const find = (label: string) => points.find((p) => name(p) === label)!;

describe("absoluteFrequency and vacuumWavelength", () => {
  it("repeat the worked examples (87Rb D2, F = 2 → F′ = 3)", () => {
    // Worked example of the doc comments; figures computed independently with Python's decimal module (50 digits).
    expect(nu0.toSignificantDigits(18).toString()).toBe("384230484468576.547");
    const g = d2.find((x) => x.Fl2 === 4 && x.Fu2 === 6)!;
    expect(g.offset.toSignificantDigits(13).toString()).toBe("-2369265229.089");
    const nu = absoluteFrequency(nu0, g.offset);
    expect(nu.toSignificantDigits(18).toString()).toBe("384228115203347.458");
    expect(vacuumWavelength(nu, SPEED_OF_LIGHT).toSignificantDigits(12).toString()).toBe("0.000000780246020886");
  });

  it("puts F = 2 → F′ = 3 at 384.228 115 2 THz", () => {
    // from memory: Steck, "Rubidium 87 D Line Data", 87Rb D2 transition hyperfine structure (F = 2 → F′ = 3: 384.228 115 2 THz).
    // The demo data carry λ to 12 digits and A′, B′ to ±4 kHz: compare to the handbook's last digit (±50 kHz).
    const nu = find("2>3").frequencyHz!;
    expect(nu.div(THZ).sub("384.2281152").abs().lt("0.00000005")).toBe(true);
  });
});

describe("lockPoints", () => {
  it("lists the 87Rb D2 resonances from F = 2 in the order a saturated-absorption spectrum shows them", () => {
    // common practice (and Steck's figure of the 87Rb D2 hyperfine structure): from F = 2, in rising frequency,
    // F′ = 1, crossover 1/2, F′ = 2, crossover 1/3, crossover 2/3, F′ = 3; from F = 1: F′ = 0, crossover 0/1, F′ = 1, crossover 0/2, crossover 1/2, F′ = 2.
    const fromF2 = points.filter((p) => p.Fl2.length === 1 && p.Fl2[0] === 4).map(name);
    expect(fromF2).toEqual(["2>1", "CO 2>1,2", "2>2", "CO 2>1,3", "CO 2>2,3", "2>3"]);
    const fromF1 = points.filter((p) => p.Fl2.length === 1 && p.Fl2[0] === 2).map(name);
    expect(fromF1).toEqual(["1>0", "CO 1>0,1", "1>1", "CO 1>0,2", "CO 1>1,2", "1>2"]);
    // two crossovers share an upper level (F′ = 1, F′ = 2) with the two ground levels 6.8 GHz apart: 14 in all
    expect(points.filter((p) => p.Fl2.length === 2).map(name).sort()).toEqual(["CO 1,2>1", "CO 1,2>2"]);
    expect(points).toHaveLength(14);
    for (let i = 1; i < points.length; i++) expect(points[i]!.offset.gte(points[i - 1]!.offset)).toBe(true);
  });

  it("puts the F′ = 2/3 crossover 133.3 MHz below F = 2 → F′ = 3", () => {
    // from memory: Steck, "Rubidium 87 D Line Data": the 2–3 crossover lies 133.3 MHz below F = 2 → F′ = 3
    // (half the 266.650 MHz F′ = 2 – F′ = 3 interval).
    const below = find("2>3").frequencyHz!.sub(find("CO 2>2,3").frequencyHz!).div(MHZ);
    expect(below.sub("133.3").abs().lt("0.05")).toBe(true);
    // worked example of lockPoints: (E_3′ − E_2′)/2 = (3A′ + B′)/2 = (254.1555 + 12.4965)/2 MHz = 133.326 MHz (by hand, from the demo's A′ and B′)
    expect(below.toString()).toBe("133.326");
  });

  it("puts each crossover halfway between the handbook's hyperfine levels", () => {
    // from memory: Steck, 5²P3/2 hyperfine shifts from the level centre: F′ = 3 +193.7407, F′ = 2 −72.9112,
    // F′ = 1 −229.8518, F′ = 0 −302.0738 MHz (uncertainties ≤ 9 kHz); ground: F = 2 at +2563.005979, F = 1 at −4271.676632 MHz.
    const upper: Record<number, string> = { 6: "193.7407", 4: "-72.9112", 2: "-229.8518", 0: "-302.0738" };
    const lower: Record<number, string> = { 4: "2563.005979", 2: "-4271.676632" };
    const mid = (xs: number[], table: Record<number, string>) => xs.map((x) => new Dec(table[x]!)).reduce((a, b) => a.add(b)).div(xs.length);
    for (const p of points) {
      const expected = mid(p.Fu2, upper).sub(mid(p.Fl2, lower));
      // the demo's A′ and B′ reproduce the handbook's levels to about 3 kHz
      expect(p.offset.div(MHZ).sub(expected).abs().lt("0.005"), name(p)).toBe(true);
    }
  });

  it("gives transitions their group strength, crossovers the spacing of their pair, and picks the strongest transition", () => {
    // Steck: F = 2 → F′ = 3 carries 7/10 of the F = 2 share (5/8) of the line: 7/16, the largest group of D2.
    expect(strongestTransition(points)).toBe(find("2>3"));
    expect(find("2>3").strength).toEqual(Rational.of(7, 16));
    expect(find("CO 2>2,3").strength).toBeNull();
    // from memory, Steck: F′ = 3 – F′ = 2 is 266.650 MHz
    expect(find("CO 2>2,3").spacing.div(MHZ).sub("266.650").abs().lt("0.005")).toBe(true);
  });

  it("leaves out a pair at one frequency and works without a line centre", () => {
    // invented input: two groups from one lower level that coincide (upper A = B = 0)
    const groups: LockGroup[] = [
      { Fu2: 5, Fl2: 4, offset: dec("10"), strength: Rational.of(1, 2) },
      { Fu2: 3, Fl2: 4, offset: dec("10"), strength: Rational.of(1, 2) },
    ];
    const p = lockPoints(groups, null);
    expect(p.map((x) => x.kind)).toEqual(["transition", "transition"]);
    expect(p.every((x) => x.frequencyHz === null)).toBe(true);
    // equal strengths: the lower frequency (here the first listed, with equal frequencies) is the reference
    expect(strongestTransition(p)).toBe(p[0]);
    expect(strongestTransition([])).toBeNull();
  });
});
