/**
 * Issue 10, defect 6: E2 lines get a pattern string in the dipole notation
 * (|Δm| = 1 then |Δm| = 2 shifts after the π group), a one-line summary of
 * their own, and no g_eff (the dipole formula has no standard meaning
 * there), with the reason for the pages.
 */
import { describe, expect, it } from "vitest";
import { speciesExport } from "../../src/site/exportJson.js";
import { computeFrom } from "./speciesFrom.js";

// Input only: [O I] 557.7 nm (2p4 ¹S0 → ¹D2, E2), 40Ca+ 729 nm (3d ²D5/2 → 4s ²S1/2, E2); no measured g.
const O = `id: o16
label: "16O"
levels:
  - { id: 1D2, config: 2p4, term: 1D2, energy: "15867.862 cm-1", source: "test input" }
  - { id: 1S0, config: 2p4, term: 1S0, energy: "33792.583 cm-1", source: "test input" }
lines:
  - { id: "557.7", upper: 1S0, lower: 1D2, wavelength: "557.7339 nm", multipole: E2 }
`;
const CA = `id: ca40-ion
label: "40Ca+"
levels:
  - { id: 4s, config: 4s, term: 2S1/2, source: "test input" }
  - { id: 3d52, config: 3d, term: 2D5/2, source: "test input" }
lines:
  - { id: "729", upper: 3d52, lower: 4s, wavelength: "729.347 nm", multipole: E2 }
`;

describe("quadrupole (E2) lines", () => {
  it("give [O I] 557.7 nm a quintuplet pattern and no g_eff (was 1.99993 from the dipole formula)", () => {
    const { result, fields, configured } = computeFrom(O);
    const ln = result.lines[0]!;
    // ¹S0 → ¹D2 with g(¹D2) = 1 (LS, common practice): Δm = 0, ±1, ±2 at 0, ±1, ±2 Lorentz units (by hand)
    expect(ln.pattern).toBe("(0) 1; 2 / 1");
    expect(ln.summary).toBe("normal quadrupole quintuplet");
    expect(ln.gEff).toBeNull();
    expect(ln.gEffNote).toMatch(/quadrupole/);
    const e = JSON.parse(JSON.stringify(speciesExport(result, { constantsEdition: "CODATA 2022", dataVersion: "000000000000" }, { result: fields, configured })));
    expect(e.lines[0].g_eff).toBeNull();
    expect(e.lines[0].pattern).toBe("(0) 1; 2 / 1");
  });

  it("give 40Ca+ 729 nm the pattern (2) 4, 8; 10, 14 / 5", () => {
    const ln = computeFrom(CA).result.lines[0]!;
    // LS g = 6/5 and 2 (common practice); shifts gu·mu − gl·ml by hand (see test/physics/linePattern.test.ts)
    expect(ln.pattern).toBe("(2) 4, 8; 10, 14 / 5");
    expect(ln.gEff).toBeNull();
    expect(ln.summary).toMatch(/^quadrupole pattern: 2 components with Δm = 0, 4 with Δm = ±1, 4 with Δm = ±2/);
  });
});
