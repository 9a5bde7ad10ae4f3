/**
 * Issue 11 §5: M2 and E3 lines through the loader, the results and the
 * export: the Sr 5s² ¹S0 → 5s5p ³P°2 magnetic-quadrupole line and the
 * 171Yb⁺ 467 nm electric-octupole clock line, with their fine-structure
 * partners and hyperfine structure treated as for the other multipoles.
 */
import { describe, expect, it } from "vitest";
import { speciesExport } from "../../src/site/exportJson.js";
import { checkStrengthSums } from "../../src/checks/strengthSums.js";
import { Dec } from "../../src/physics/decimal.js";
import { computeFrom } from "./speciesFrom.js";

// Input only: Sr 5s5p ³P term (all three J listed) and the M2 line to ³P°2.
const SR = `id: sr88
label: "88Sr"
levels:
  - { id: 1S0, config: 5s2, term: 1S0, source: "test input" }
  - { id: 3P0, config: 5s5p, term: 3Po0, energy: "14317.507 cm-1", source: "test input" }
  - { id: 3P1, config: 5s5p, term: 3Po1, energy: "14504.334 cm-1", source: "test input" }
  - { id: 3P2, config: 5s5p, term: 3Po2, energy: "14898.545 cm-1", source: "test input" }
lines:
  - { id: "671", upper: 3P2, lower: 1S0, wavelength: "671.206 nm", multipole: M2 }
`;
// Input only: 171Yb⁺ ground level with its hyperfine constant and 2F°7/2 with an assumed one.
const YB = `id: yb171-ion
label: "171Yb+"
nucleus: { spin: 1/2, moment: "0.49367 muN" }
levels:
  - { id: S1/2, config: 6s, term: 2S1/2, hyperfine: { A: "12642.812118466 MHz" }, source: "test input" }
  - { id: F7/2, config: 4f13 6s2, term: 2Fo7/2, gJ: "1.145", hyperfine: { A: "-905 MHz" }, energy: "21418.75 cm-1", source: "test input" }
lines:
  - { id: "467", upper: F7/2, lower: S1/2, wavelength: "466.881 nm", multipole: E3 }
`;
const meta = { constantsEdition: "CODATA 2022", dataVersion: "000000000000" };

describe("M2 and E3 lines", () => {
  it("give the Sr 1S0 → 3P2 M2 line its quintuplet, no g_eff with the reason, and its export", () => {
    const { result, fields, configured } = computeFrom(SR);
    const ln = result.lines[0]!;
    expect(ln.k).toBe(2);
    // g(3P2) = 3/2 (LS, common practice), J = 0 below: shifts 0, ±3/2, ±3 (by hand)
    expect(ln.pattern).toBe("(0) 3; 6 / 2");
    expect(ln.summary).toBe("quadrupole quintuplet, spacing 3/2 Lorentz units");
    expect(ln.gEff).toBeNull();
    expect(ln.gEffNote).toMatch(/magnetic-quadrupole \(M2\)/);
    const e = JSON.parse(JSON.stringify(speciesExport(result, meta, { result: fields, configured })));
    expect(e.lines[0].multipole).toBe("M2");
    expect(e.lines[0].g_eff).toBeNull();
    expect(e.lines[0].components.map((c: { delta_m: number }) => c.delta_m)).toEqual([-2, -1, 0, 1, 2]);
    expect(checkStrengthSums(e, "x.json")).toEqual([]);
  });

  it("take the M2 line's components at a field from the ³P term states with the line's own J pair only, and say why", () => {
    const { fields } = computeFrom(SR, ["1 T"]);
    const a = fields.lines.get("671")!.atFields[0]!;
    expect(a.model).toBe("term Zeeman eigenstates");
    expect(a.reduced).toBe("own J pair");
    // every Δm = q of a rank-2 line, q = −2 … 2, and the strengths normalized to 1 over them
    expect(new Set(a.components.map((c) => c.q))).toEqual(new Set([-2, -1, 0, 1, 2]));
    const total = a.components.reduce((s, c) => s.add(c.strength), new Dec(0));
    expect(total.sub(1).abs().lt("1e-40")).toBe(true);
  });

  it("give the 171Yb+ 467 nm E3 line its hyperfine groups F = 0 → F′ = 3 (1/4) and F = 1 → F′ = 3, 4 (3/16, 9/16)", () => {
    // sympy fixture (test/fixtures/wigner-sympy.json, scripts/fixtures/wigner_sympy.py)
    const { result, fields, configured } = computeFrom(YB);
    const f = fields.lines.get("467")!;
    const groups = f.hyperfine!.map((g) => [g.Fu2 / 2, g.Fl2 / 2, g.strength.toString()]);
    expect(groups).toEqual([
      [4, 1, "9/16"],
      [3, 1, "3/16"],
      [3, 0, "1/4"],
    ]);
    const ln = result.lines[0]!;
    expect(ln.k).toBe(3);
    expect(ln.components).toHaveLength(14);
    expect(ln.gEffNote).toMatch(/electric-octupole \(E3\) line: .* Δm = ±2 and ±3 components/);
    const e = JSON.parse(JSON.stringify(speciesExport(result, meta, { result: fields, configured })));
    expect(e.lines[0].multipole).toBe("E3");
    expect(checkStrengthSums(e, "x.json")).toEqual([]);
    expect(f.atFields.find((a) => a.field.tesla.gt(0))!.model).toBe("hyperfine–Zeeman eigenstates");
  });
});
