import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { defineConstant, listConstants, val } from "../../../src/physics/constants/constant.js";
import { EDITIONS, DEFAULT_EDITION, editionByName } from "../../../src/physics/constants/editions.js";
import { Dec, dec } from "../../../src/physics/decimal.js";

interface FixtureEntry {
  name: string;
  value: string;
  uncertainty: string;
  unit: string;
}
interface Fixture {
  edition: string;
  constants: Record<string, FixtureEntry>;
  related: Record<string, FixtureEntry>;
}

// Source: scipy 1.17 scipy.constants.physical_constants (CODATA 2022), written by scripts/fixtures/codata_scipy.py.
const fixture = JSON.parse(
  readFileSync(new URL("../../fixtures/codata2022-scipy.json", import.meta.url), "utf-8"),
) as Fixture;

function related(key: string): Dec {
  const entry = fixture.related[key];
  if (!entry) throw new Error(`fixture lacks related constant ${key}`);
  return dec(entry.value);
}

/** |a - b| ≤ tolerance */
function within(a: Dec, b: Dec, tolerance: Dec): boolean {
  return a.sub(b).abs().lte(tolerance);
}

describe("CODATA 2022 edition", () => {
  const constants = listConstants(CODATA_2022);

  it("is the edition the scipy fixture was generated from", () => {
    expect(fixture.edition).toBe("CODATA 2022");
    expect(CODATA_2022.edition).toBe("CODATA 2022");
  });

  it("lists exactly the constants the fixture covers", () => {
    expect(constants.map((c) => c.key).sort()).toEqual(Object.keys(fixture.constants).sort());
  });

  it.each(constants.map((c) => [c.key, c] as const))("has the scipy value and uncertainty for %s", (key, c) => {
    const ref = fixture.constants[key];
    expect(ref).toBeDefined();
    // Source: scipy.constants CODATA 2022 via the fixture; compared as decimals so "1.5e-08" equals "0.000000015".
    expect(dec(c.value).eq(dec(ref!.value))).toBe(true);
    expect(dec(c.uncertainty).eq(dec(ref!.uncertainty))).toBe(true);
  });

  it.each(constants.map((c) => [c.key, c] as const))("carries the scipy unit for %s", (key, c) => {
    // scipy writes an empty unit for dimensionless ratios where the edition writes "1".
    const refUnit = fixture.constants[key]!.unit || "1";
    expect(c.unit).toBe(refUnit);
  });

  it("gives the nuclear magneton in MHz/T, not Hz/T", () => {
    // Source: CODATA 2022 "nuclear magneton in MHz/T" = 7.622 593 2188(24) (scipy fixture).
    expect(CODATA_2022.muN_h.unit).toBe("MHz T^-1");
    expect(val(CODATA_2022.muN_h).eq(dec("7.6225932188"))).toBe(true);
  });

  it("names a non-empty reference for every constant", () => {
    for (const c of constants) expect(c.reference.trim().length).toBeGreaterThan(0);
    expect(CODATA_2022.reference.trim().length).toBeGreaterThan(0);
  });

  it("marks exactly c and h as exact", () => {
    // Source: the 2019 SI fixes h and c exactly; every other constant here is measured (common practice).
    const exact = constants.filter((c) => c.exact).map((c) => c.key).sort();
    expect(exact).toEqual(["c", "h"]);
  });

  it("freezes every record and the edition itself", () => {
    expect(Object.isFrozen(CODATA_2022)).toBe(true);
    for (const c of constants) expect(Object.isFrozen(c)).toBe(true);
    expect(() => {
      (CODATA_2022.muB_h as { value: string }).value = "1";
    }).toThrow(TypeError);
    expect(CODATA_2022.muB_h.value).toBe("13996244917.1");
  });

  it("is the default edition and found by its name", () => {
    expect(DEFAULT_EDITION).toBe("CODATA 2022");
    expect(editionByName("CODATA 2022")).toBe(CODATA_2022);
    expect(EDITIONS["CODATA 2022"]).toBe(CODATA_2022);
    expect(editionByName("CODATA 1986")).toBeUndefined();
  });
});

describe("defineConstant", () => {
  const base = {
    key: "x",
    name: "test constant",
    symbol: "x",
    value: "1.5",
    uncertainty: "0.1",
    unit: "1",
  };

  it("refuses a constant without a reference", () => {
    expect(() => defineConstant({ ...base, reference: "" })).toThrow(/reference/);
    expect(() => defineConstant({ ...base, reference: "   " })).toThrow(/reference/);
  });

  it("refuses a value or uncertainty that is not a decimal numeral", () => {
    expect(() => defineConstant({ ...base, value: "1.5(1)", reference: "r" })).toThrow(RangeError);
    expect(() => defineConstant({ ...base, uncertainty: "about 0.1", reference: "r" })).toThrow(RangeError);
  });

  it("derives exactness from a zero uncertainty", () => {
    expect(defineConstant({ ...base, uncertainty: "0", reference: "r" }).exact).toBe(true);
    expect(defineConstant({ ...base, reference: "r" }).exact).toBe(false);
  });
});

describe("consistency of the CODATA 2022 values among themselves", () => {
  const e = CODATA_2022;

  it("has μB/h = 13 996 244 917.1(4.4) Hz/T", () => {
    // Source: CODATA 2022, Bohr magneton in Hz/T = 1.399 624 491 71(44) e10 Hz/T (from memory; matches the scipy fixture).
    expect(val(e.muB_h).eq(dec("13996244917.1"))).toBe(true);
    expect(dec(e.muB_h.uncertainty).eq(dec("4.4"))).toBe(true);
  });

  it("has μN/μB equal to m_e/m_p within the stated uncertainties", () => {
    // Source: μN = eħ/(2 m_p), μB = eħ/(2 m_e), so μN/μB = m_e/m_p (textbook definition).
    const ratio = val(e.muN_h).mul(dec("1e6")).div(val(e.muB_h));
    const rel = dec(e.muN_h.uncertainty).div(val(e.muN_h)).add(dec(e.muB_h.uncertainty).div(val(e.muB_h)));
    const tol = ratio.mul(rel).add(dec(e.m_e_m_p.uncertainty));
    expect(within(ratio, val(e.m_e_m_p), tol)).toBe(true);
    // The check is not vacuous: a ratio off by 1e-9 relative is outside the tolerance.
    expect(within(ratio.mul(dec("1.000000001")), val(e.m_e_m_p), tol)).toBe(false);
  });

  it("has μB/(hc) equal to (μB/h)/c within its uncertainty", () => {
    // Source: definition; c exact (SI 2019). In cm^-1/T both sides are divided by 100.
    const perCm = val(e.muB_h).div(val(e.c)).div(dec("100"));
    const tol = dec(e.muB_hc.uncertainty).div(dec("100"));
    expect(within(perCm, val(e.muB_hc).div(dec("100")), tol)).toBe(true);
    // 0.466 864 477 19 cm^-1/T: CODATA 2022 μB/(hc) in cm^-1 (from memory; = 46.686 447 719 m^-1/T / 100).
    expect(within(perCm, dec("0.46686447719"), dec("2e-10"))).toBe(true);
  });

  it("has μB in eV/T equal to (μB/h)·h/e within its uncertainty", () => {
    // Source: definition; e = 1.602 176 634e-19 C exact (SI 2019, scipy fixture "related").
    const eV = val(e.muB_h).mul(val(e.h)).div(related("e"));
    const tol = dec(e.muB_eV.uncertainty).add(eV.mul(dec(e.muB_h.uncertainty)).div(val(e.muB_h)));
    expect(within(eV, val(e.muB_eV), tol)).toBe(true);
  });

  it("has μB/k equal to (μB/h)·h/k within its uncertainty", () => {
    // Source: definition; k = 1.380 649e-23 J/K exact (SI 2019, scipy fixture "related").
    const kelvin = val(e.muB_h).mul(val(e.h)).div(related("k"));
    const tol = dec(e.muB_k.uncertainty).add(kelvin.mul(dec(e.muB_h.uncertainty)).div(val(e.muB_h)));
    expect(within(kelvin, val(e.muB_k), tol)).toBe(true);
  });

  it("has m_e/m_p equal to m_e(u)/m_p(u) within the uncertainties", () => {
    // Source: scipy fixture "related" proton mass in u = 1.007 276 466 5789(83) u (CODATA 2022).
    const ratio = val(e.m_e_u).div(related("m_p_u"));
    const tol = dec(e.m_e_m_p.uncertainty).add(dec(e.m_e_u.uncertainty)).add(ratio.mul(dec("8.3e-12")));
    expect(within(ratio, val(e.m_e_m_p), tol)).toBe(true);
  });

  it("has a negative electron g factor slightly larger in size than 2", () => {
    // Source: CODATA sign convention g_e < 0; |g_e| - 2 ≈ 2.319e-3 is the anomaly (common practice).
    const g = val(e.g_e);
    expect(g.isNegative()).toBe(true);
    expect(within(g.abs().sub(dec("2")), dec("0.00231930436092"), dec("1e-15"))).toBe(true);
  });
});
