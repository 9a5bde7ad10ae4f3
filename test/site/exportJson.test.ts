import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { exportsOf } from "../support/exports.js";
import { tempDir } from "../support/runBuild.js";

// A small folder that exercises every rule of the export contract (README,
// "The JSON export"). Atomic inputs are handbook values used as input only;
// the check values below name their own sources.
const FILES: Record<string, string> = {
  "site.yaml": `title: "Export test"\nfields: ["0 G", "1 G", "1000 G", "0.1 T", "3.2289 G"]\n`,
  "species/rb87.yaml": `id: rb87
label: "87Rb"
mass: "86.909180531 u"
nucleus: { spin: 3/2, gI: "-0.0009951414(10)" }
levels:
  - id: 5s-S1/2
    config: 5s
    term: 2S1/2
    gJ: "2.002331130000000000000000001"
    hyperfine: { A: "3417.341305452145 MHz" }
    source: "D. A. Steck, Rubidium 87 D Line Data"
  - id: 5p-P3/2
    config: 5p
    term: 2Po3/2
    gJ: "1.3362"
    source: "D. A. Steck, Rubidium 87 D Line Data (hyperfine left out here)"
lines:
  - { id: D2, upper: 5p-P3/2, lower: 5s-S1/2, wavelength: "780.241209686 nm" }
`,
  // a J = 0 level needs a species of its own: one atom has only integer or only half-integer J
  "species/sr88.yaml": `id: sr88
label: "88Sr"
levels:
  - { id: 5s2-1S0, config: 5s2, term: 1S0, source: "J = 0 level for the null-g rule" }
`,
  "species/h1.yaml": `id: h1
label: "1H"
nucleus: { spin: 1/2, moment: "2.792847351 muN" }
levels:
  - { id: 1s, config: 1s, term: 2S1/2, hyperfine: { A: "1420.405751768 MHz" }, source: "hydrogen maser frequency" }
`,
  "species/ca40-ion.yaml": `id: ca40-ion
label: "40Ca+"
levels:
  - { id: 4s-S1/2, config: 4s, term: 2S1/2, source: "NIST ASD" }
  - { id: 3d-D5/2, config: 3d, term: 2D5/2, source: "NIST ASD" }
lines:
  - { id: "729", upper: 3d-D5/2, lower: 4s-S1/2, wavelength: "729.347 nm", multipole: E2 }
`,
};

let exports: Map<string, string>;
const exportOf = (id: string) => JSON.parse(exports.get(id)!);

beforeAll(() => {
  const dir = tempDir("atlas-export-");
  for (const [rel, text] of Object.entries(FILES)) {
    mkdirSync(join(dir, rel, ".."), { recursive: true });
    writeFileSync(join(dir, rel), text);
  }
  exports = exportsOf(dir);
});

describe("the species export", () => {
  it("carries the contract's keys for levels, sublevels, hyperfine levels, lines and components", () => {
    const e = exportOf("rb87");
    expect(e.id).toBe("rb87");
    const g = e.levels[0];
    expect(Object.keys(g)).toEqual(expect.arrayContaining(["id", "J", "gJ", "gJ_exact", "sublevels", "hyperfine", "field_table"]));
    expect(g.sublevels[0]).toEqual({ mJ: "-1/2", shift_Hz_per_T: expect.any(String), shift_Hz_per_T_u: expect.any(String) });
    expect(g.hyperfine.map((h: { F: string }) => h.F)).toEqual(["1", "2"]);
    expect(Object.keys(g.hyperfine[0].sublevels[0])).toEqual(["mF", "shift_Hz_per_T", "shift_Hz_per_T_u"]);
    const d2 = e.lines[0];
    expect(Object.keys(d2)).toEqual(expect.arrayContaining(["id", "upper", "lower", "g_eff", "pattern", "components"]));
    expect(Object.keys(d2.components[0])).toEqual(
      expect.arrayContaining(["mu", "ml", "delta_m", "polarization", "shift_lorentz", "shift_Hz_per_T", "strength"]),
    );
    // Na/Rb D2 pattern: Condon and Shortley (1935) ch. XVI.
    expect(d2.pattern).toBe("(1) 3, 5 / 3");
  });

  it("keeps a 25-digit measured gJ digit for digit", () => {
    // The input text itself is the check value: nothing may round it.
    expect(exportOf("rb87").levels[0].gJ).toBe("2.002331130000000000000000001");
  });

  it("feeds the measured gJ into gF and shifts while gJ_exact and the pattern stay LS", () => {
    const g = exportOf("rb87").levels[0];
    expect(g.gJ_exact).toBe("2");
    // gF(F=2) = gJ/4 + 3gI/4 (Steck, eq. 22, with I = 3/2, J = 1/2).
    expect(g.hyperfine[1].gF.startsWith("0.49983642645")).toBe(true);
  });

  it("gives null gJ and gJ_exact for J = 0 and null gF for F = 0", () => {
    const j0 = exportOf("sr88").levels.find((l: { id: string }) => l.id === "5s2-1S0");
    expect(j0.gJ).toBeNull();
    expect(j0.gJ_exact).toBeNull();
    const h = exportOf("h1").levels[0];
    // common practice: hydrogen 1s has F = 0 and F = 1; F = 0 has no g.
    expect(h.hyperfine[0].F).toBe("0");
    expect(h.hyperfine[0].gF).toBeNull();
  });

  it("derives gI from a moment as −(μ/I)(μN/μB)", () => {
    // CODATA 2022: μp = 2.792 847 351 μN, μN/μB = m_e/m_p; gI = −2μp·m_e/m_p = −0.0030420...
    expect(exportOf("h1").nucleus.gI.startsWith("-0.00304206")).toBe(true);
  });

  it("gives an empty hyperfine list without a nucleus", () => {
    expect(exportOf("ca40-ion").levels[0].hyperfine).toEqual([]);
  });

  it("gives null polarization to |Δm| = 2 components of a quadrupole line", () => {
    const e2 = exportOf("ca40-ion").lines[0];
    const quad = e2.components.filter((c: { delta_m: number }) => Math.abs(c.delta_m) === 2);
    expect(quad.length).toBe(4);
    expect(quad.every((c: { polarization: unknown }) => c.polarization === null)).toBe(true);
  });

  it("writes every configured field into field_table once, merging fields equal by value", () => {
    const table = exportOf("rb87").levels[0].field_table;
    // "1000 G" and "0.1 T" are one field; fields ascending.
    expect(table.map((t: { B_T: string }) => t.B_T)).toEqual(["0", "0.0001", "0.00032289", "0.1"]);
    expect(table[0].states).toHaveLength(8);
  });

  it("labels a level without nuclear spin F = J, mF = mJ with E = (μB/h)·gJ·mJ·B", () => {
    // (a level of a species with nuclear spin always has mI states, with A = B = 0 when none are listed)
    const p = exportOf("ca40-ion").levels[1];
    const at = p.field_table.find((t: { B_T: string }) => t.B_T === "0.0001");
    const top = at.states.find((s: { mF: string }) => s.mF === "5/2");
    expect(top.F).toBe("5/2");
    // LS gJ of 2D5/2 with gL = 1 (no mass given), gS = 2.00231930436092: 0.8 + 0.2·gS = 1.200463860872184;
    // 13 996 244 917.1 Hz/T (CODATA 2022) × 1.200463860872184 × 5/2 × 1e-4 T = 4 200 496.552 723 636 72… Hz (by hand)
    expect(top.E_Hz.startsWith("4200496.55272363672")).toBe(true);
  });

  it("finds the 87Rb two-photon field-insensitive point near 3.23 G", () => {
    const g = exportOf("rb87").levels[0];
    const t = g.sublevel_transitions.find(
      (x: { lower: { F: string; mF: string }; upper: { F: string; mF: string } }) =>
        x.lower.F === "1" && x.lower.mF === "-1" && x.upper.F === "2" && x.upper.mF === "1",
    );
    // from memory: the "magic" field of the |1,−1⟩ ↔ |2,1⟩ pair is about 3.23 G.
    expect(t.field_insensitive).toHaveLength(1);
    expect(Number(t.field_insensitive[0].B_T) * 1e4).toBeCloseTo(3.23, 2);
  });
});

describe("what the observer sees, in the export", () => {
  it("gives G from the measured g values and G_exact from the LS ones", () => {
    const d2 = exportOf("rb87").lines[0];
    // G = ḡ² − (gu − gl)²(16s − 7d² − 4)/80 (Landi Degl'Innocenti and Landolfi 2004, from memory)
    // worked by hand with gu = 1.3362, gl = 2.002331130000000000000000001 (python fractions): 1.340388232046999…
    expect(d2.G.startsWith("1.34038823204699999999999999")).toBe(true);
    // by hand from the D2 components (as Na D2): 13/9 − 1/9
    expect(d2.G_exact).toBe("4/3");
    // both g values are given without an uncertainty here, so G has none (README, "Uncertainties")
    expect(d2).toHaveProperty("G_u", null);
  });

  it("gives each component its exact angular factors along and across the field", () => {
    const d2 = exportOf("rb87").lines[0];
    // textbook: π sin²θ, σ (1 + cos²θ)/2
    for (const c of d2.components as { delta_m: number; angular_0deg: string; angular_90deg: string }[]) {
      expect([c.angular_0deg, c.angular_90deg]).toEqual(c.delta_m === 0 ? ["0", "1"] : ["1", "1/2"]);
    }
    expect(d2.angular_coefficients).toEqual({ "0": ["1", "-1"], "1": ["1/2", "1/2"] });
  });

  it("gives a quadrupole line null G and G_exact and its rank-2 angular factors", () => {
    const e2 = exportOf("ca40-ion").lines[0];
    expect(e2.G).toBeNull();
    expect(e2.G_exact).toBeNull();
    expect(e2).toHaveProperty("G_u", null);
    // textbook E2: q = 0 3 sin²θ cos²θ, |q| = 1 (cos²θ + cos²2θ)/2, |q| = 2 (1 − cos⁴θ)/2
    expect(e2.angular_coefficients).toEqual({ "0": ["0", "3", "-3"], "1": ["1/2", "-3/2", "2"], "2": ["1/2", "0", "-1/2"] });
    const q2 = e2.components.find((c: { delta_m: number }) => c.delta_m === 2);
    expect([q2.angular_0deg, q2.angular_90deg]).toEqual(["0", "1/2"]);
  });
});
