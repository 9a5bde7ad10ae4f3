/**
 * Issue 10, defect 5: field-insensitive points. B = 0 is one when a
 * transition's first-order sensitivity vanishes; the search reaches the
 * larger of 1 T and twice the largest configured field; two-photon lines
 * ΔF = 0, ΔmF = ±2 are listed.
 */
import { describe, expect, it } from "vitest";
import { speciesExport } from "../../src/site/exportJson.js";
import { computeFrom } from "./speciesFrom.js";

// Input only: 87Rb 5²S1/2 constants of D. A. Steck, "Rubidium 87 D Line Data".
const RB = `id: rb87
label: "87Rb"
mass: "86.909180531 u"
nucleus: { spin: 3/2, gI: "-0.0009951414" }
levels:
  - id: 5s
    config: 5s
    term: 2S1/2
    gJ: "2.00233113"
    hyperfine: { A: "3417.341305452145 MHz" }
    source: "test input"
`;

/**
 * The field where d/dB [E(F=2, mF=1) − E(F=2, mF=0)] = 0, from the Breit–Rabi formula
 * E(F = I + 1/2, m) = −ΔE/(2(2I+1)) + gI·μB·m·B + (ΔE/2)·√(1 + 4mx/(2I+1) + x²), x = (gJ − gI)μB·B/ΔE
 * (common practice; Steck eq. 24), with I = 3/2, ΔE = 2A: bisection on the closed-form derivative, float64.
 */
function breitRabiPoint(): number {
  const muB = 13996244917.1; // Hz/T, CODATA 2022
  const gJ = 2.00233113;
  const gI = -0.0009951414;
  const dE = 2 * 3417.341305452145e6;
  const k = ((gJ - gI) * muB) / dE;
  const dfdB = (B: number) => {
    const x = k * B;
    return gI * muB + (dE / 2) * k * ((1 + 2 * x) / (2 * Math.sqrt(1 + x + x * x)) - x / Math.sqrt(1 + x * x));
  };
  let lo = 1.5;
  let hi = 6;
  expect(dfdB(lo) > 0 && dfdB(hi) < 0).toBe(true);
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (dfdB(mid) > 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe("field-insensitive points", () => {
  const { result, fields, configured } = computeFrom(RB, ["0 G", "1 G", "2 T"]);
  const level = fields.levels.get("5s")!;
  const find = (lo: [number, number], up: [number, number]) =>
    level.transitions.find((t) => t.lower.F2 === lo[0] && t.lower.mF2 === lo[1] && t.upper.F2 === up[0] && t.upper.mF2 === up[1])!;

  it("reports B = 0 for the clock line, in the export as { B_T: \"0\", Hz: 2A }", () => {
    const e = speciesExport(result, { constantsEdition: "CODATA 2022", dataVersion: "000000000000" }, { result: fields, configured });
    const clock = (JSON.parse(JSON.stringify(e.levels[0])) as { sublevel_transitions: { lower: { F: string; mF: string }; upper: { F: string; mF: string }; field_insensitive: unknown[] }[] }).sublevel_transitions.find(
      (t) => t.lower.F === "1" && t.lower.mF === "0" && t.upper.F === "2" && t.upper.mF === "0",
    )!;
    // mF = 0 ↔ mF = 0 is first-order field-insensitive at B = 0 (common practice); 2A = 6834.68261090429 MHz (Steck)
    // A is given here without an uncertainty and B = 0 holds for every input: both _u keys are null (README, "Uncertainties")
    expect(clock.field_insensitive[0]).toEqual({ B_T: "0", B_T_u: null, Hz: "6834682610.90429", Hz_u: null });
  });

  it("searches up to twice the largest configured field when that exceeds 1 T", () => {
    expect(level.insensitiveSearchTesla.toString()).toBe("4");
    const t = find([4, 0], [4, 2]);
    expect(t.fieldInsensitive).toHaveLength(1);
    const want = breitRabiPoint();
    expect(Math.abs(t.fieldInsensitive[0]!.tesla.toNumber() / want - 1)).toBeLessThan(1e-9);
    // with bias fields up to 0.3 T, the search stops at 1 T and this point is not reached
    const small = computeFrom(RB, ["0 G", "0.3 T"]).fields.levels.get("5s")!;
    expect(small.insensitiveSearchTesla.toString()).toBe("1");
    const s = small.transitions.find((x) => x.lower.F2 === 4 && x.lower.mF2 === 0 && x.upper.F2 === 4 && x.upper.mF2 === 2)!;
    expect(s.fieldInsensitive).toHaveLength(0);
  });

  it("lists the ΔF = 0, ΔmF = ±2 two-photon lines", () => {
    expect(find([4, -2], [4, 2]).kind).toBe("two-photon");
    expect(level.transitions.filter((t) => t.kind === "two-photon")).toHaveLength(8); // 4 with ΔF = 1, 3 in F = 2, 1 in F = 1 (counting)
  });
});
