/**
 * The components-at-a-field table gives each component's wavelength shift
 * Δλ = −Δν·λ²/c with its standard uncertainty (issue 11 §1).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { atFieldTable } from "../../src/site/fieldTables.js";
import { computeFrom } from "../results/speciesFrom.js";

const home = { speciesId: "x", csvBase: "species/x/csv", exportUrl: "export/x.json" };
const plain = (s: string) => s.replaceAll("\u2009", "").replaceAll("\u2212", "-");
/** "(46)" of a concise cell text, and the value's last decimal place, as a number in the cell's unit. */
function uncertaintyOf(text: string): number {
  const m = /^-?(\d+)(?:\.(\d+))?\((\d+)\)$/.exec(plain(text).trim());
  if (!m) throw new Error(`no concise uncertainty in ${text}`);
  return Number(m[3]) * 10 ** -(m[2]?.length ?? 0);
}

describe("wavelength shifts of the components at a field", () => {
  it("carry u(Δλ) = λ²/c·u(Δν) when the wavelength is exact (87Rb D2 at 1000 G; Δλ = −Δν λ²/c, common practice)", () => {
    const rb = computeFrom(readFileSync("data/species/rb87.yaml", "utf8"), ["1000 G"]);
    const ln = rb.result.lines.find((l) => l.input.id === "D2")!;
    const a = rb.fields.lines.get("D2")!.atFields[0]!;
    const t = atFieldTable(ln, a, home);
    const shiftCol = t.columns.findIndex((c) => c.key === "shift");
    const dlCol = t.columns.findIndex((c) => c.key === "dl");
    const row = t.rows.find((r) => /\(\d+\)/.test(r.cells[shiftCol]!.text) && /\(\d+\)/.test(r.cells[dlCol]!.text))!;
    expect(row).toBeDefined();
    // λ = 780.241209686 nm (Steck, given without uncertainty); c exact (SI)
    const lambda = 780.241209686e-9;
    const c = 299792458;
    const uShiftHz = uncertaintyOf(row.cells[shiftCol]!.text) * 1e6; // MHz column, rounded to two digits
    const uDlPm = uncertaintyOf(row.cells[dlCol]!.text);
    // both are rounded to two significant digits, so agree to within a few per cent
    expect(Math.abs(uDlPm / ((uShiftHz * lambda * lambda) / c / 1e-12) - 1)).toBeLessThan(0.06);
  });

  it("adds the wavelength's own uncertainty in quadrature: u(Δλ)² = (λ²/c·u(Δν))² + (2Δν·λ/c·u(λ))²", () => {
    // a made-up J = 1/2 → 1/2 line checks the algebra only; the values are not physics data
    const yaml = [
      "id: x", 'label: "X"',
      "levels:",
      "  - { id: a, config: 1s, term: 2S1/2, gJ: \"2.00000(20)\", source: test }",
      "  - { id: b, config: 2p, term: 2Po1/2, source: test }",
      "lines:",
      '  - { id: L, upper: b, lower: a, wavelength: "500.000(50) nm", multipole: E1, source: test }',
    ].join("\n");
    const r = computeFrom(yaml, ["1 T"]);
    const ln = r.result.lines[0]!;
    const a = r.fields.lines.get("L")!.atFields[0]!;
    const t = atFieldTable(ln, a, home);
    const dlCol = t.columns.findIndex((col) => col.key === "dl");
    const comp = a.components.find((c) => !c.shiftHz.isZero() && c.shiftHzU)!;
    const row = t.rows[a.components.indexOf(comp)]!;
    const lambda = new Dec("500e-9");
    const uLambda = new Dec("0.050e-9");
    const nu = new Dec(299792458).div(lambda);
    const byHand = comp.shiftHzU!.mul(lambda).div(nu).pow(2).plus(comp.shiftHz.mul(2).mul(uLambda).div(nu).pow(2)).sqrt().mul("1e12");
    const shown = uncertaintyOf(row.cells[dlCol]!.text);
    // the wavelength term dominates here (2·10⁻⁴ against 10⁻⁴ relative), so leaving it out would miss by a factor of about 2
    expect(byHand.toNumber()).toBeGreaterThan(2 * comp.shiftHzU!.mul(lambda).div(nu).mul("1e12").toNumber());
    expect(Math.abs(shown / byHand.toNumber() - 1)).toBeLessThan(0.05);
  });
});
