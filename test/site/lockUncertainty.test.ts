/**
 * Issue 11 §1 on the line pages: the hyperfine-group, hyperfine-component
 * and lock-point tables of the demo's 87Rb D2 line show their offsets,
 * absolute frequencies, gF values and shifts with standard uncertainties in
 * the concise form, each "(..)" in its own hideable element; the
 * field-insensitive points of the transitions table likewise.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { lockView } from "../../src/site/lockTables.js";
import { hyperfineComponentsTable, hyperfineGroupsTable, transitionsTable } from "../../src/site/fieldTables.js";
import { cellHtml } from "../../src/site/tableRows.js";
import type { Table } from "../../src/site/table.js";
import { computeFrom } from "../results/speciesFrom.js";

const rb = computeFrom(readFileSync("data/species/rb87.yaml", "utf8"), ["0 G", "3.23 G"]);
const ln = rb.result.lines.find((l) => l.input.id === "D2")!;
const f = rb.fields.lines.get("D2")!;
const home = { speciesId: "rb87", csvBase: "species/rb87/csv", exportUrl: "export/rb87.json" };
const cell = (t: Table, anchorPart: string, key: string) => {
  const row = t.rows.find((r) => r.anchor.includes(anchorPart))!;
  expect(row, anchorPart).toBeDefined();
  const k = t.columns.findIndex((c) => c.key === key);
  return { cell: row.cells[k]!, col: t.columns[k]! };
};
const plain = (s: string) => s.replaceAll("\u2009", "").replaceAll("\u2212", "-");

describe("uncertainties of the hyperfine and lock-point tables (87Rb D2)", () => {
  it("gives the cycling group F = 2 → F′ = 3 its offset −2369.2652(46) MHz: u = √((9u(A′)/4)² + (u(B′)/4)² + (3u(A)/4)²) = 4.59 kHz", () => {
    const t = hyperfineGroupsTable(ln, f.hyperfine!, home, f);
    // Steck, "Rubidium 87 D Line Data": −2369.265 MHz (from the A and B it tabulates), u(A′) = 2.0 kHz, u(B′) = 3.7 kHz (from memory)
    const { cell: c, col } = cell(t, "F=3", "off");
    expect(plain(c.text)).toBe("-2369.2652(46)");
    expect(cellHtml(c, col)).toContain('<span class="unc">(46)</span>');
  });

  it("gives the gF values of the groups their uncertainty from gJ and gI: gF′(F′ = 3) = gJ′/2 + gI/2, u = u(gJ′)/2 (hand formula, Steck eq. 22)", () => {
    const t = hyperfineGroupsTable(ln, f.hyperfine!, home, f);
    const { cell: c } = cell(t, "F=3", "gFu");
    // gJ′ = 1.3362(13) (Steck): u(gF′) = 0.00065, gI's part 5e-10 is far below
    expect(plain(c.text)).toMatch(/\(65\)$/);
  });

  it("gives the cycling component's shift (3/2·gJ′ − 1/2·gJ)·μB/h in MHz/G the uncertainty μB/h·(3/2)·u(gJ′) to two digits", () => {
    const t = hyperfineComponentsTable(ln, f.hyperfine!, home, f);
    const row = t.rows.find((r) => r.cells.some((c) => c.text === "cycling") && !r.anchor.includes("-3"))!;
    const k = t.columns.findIndex((c) => c.key === "shift");
    // μB/h = 1.399 624 924 MHz/G (CODATA 2022): 1.3996 × 1.5 × 0.0013 = 0.0027 MHz/G
    expect(plain(row.cells[k]!.text)).toMatch(/^1\.404\d*\(27\)$/);
  });

  it("lock-point table: frequencies and offsets from the line centre with u, the offset from the reference without", () => {
    const v = lockView(ln, f.hyperfine, home, f.hyperfineOffsetU)!;
    const nu = cell(v.table, "F=2-to-F=3", "nu");
    const off = cell(v.table, "F=2-to-F=3", "off");
    const ref = cell(v.table, "F=2-to-F=3", "ref");
    expect(plain(off.cell.text)).toBe("-2369.2652(46)");
    // 384.228 115 2 THz (Steck, from memory); the demo wavelength has no uncertainty, so ν carries the offset's 4.6 kHz = 0.0000000046 THz
    expect(plain(nu.cell.text)).toMatch(/^384\.2281152\d*\(46\)$/);
    expect(ref.cell.parts?.unc).toBeUndefined();
    // λ = c/ν with u(λ) = λ·u(ν)/ν: 780.246 nm × 4594 Hz / 384.228 THz = 9.3e−9 nm (hand arithmetic)
    const lambda = cell(v.table, "F=2-to-F=3", "lambda");
    expect(plain(lambda.cell.text)).toMatch(/^780\.24602088\d*\(93\)$/);
    // the crossover F = 2 → F′ = 2/3 lies between 2 → 2 and 2 → 3: spacing E(F′=3) − E(F′=2) = 3A′ + B′ (Casimir formula, textbook),
    // ground-state A cancels: u = √((3·2.0)² + 3.7²) kHz = 7.0 kHz (Steck's u(A′), u(B′), from memory)
    const pair = cell(v.table, "F=2-to-F=2,3", "pair");
    expect(plain(pair.cell.text)).toBe("266.6520(70)");
    expect(ref.cell.hz).toBeDefined();
  });

  it("writes the field-insensitive point's uncertainty in the transitions table in its own hideable element", () => {
    const lv = rb.result.levels.find((l) => l.input.id === "5s-S1/2")!;
    const t = transitionsTable(lv, rb.fields.levels.get("5s-S1/2")!, rb.configured, home)!;
    const k = t.columns.findIndex((c) => c.key === "insensitive");
    const withPoint = t.rows.map((r) => r.cells[k]!).find((c) => /^3\.2289/.test(plain(c.text)))!;
    // 3.2289 G for |1,−1⟩ ↔ |2,1⟩ (common practice for the 87Rb two-photon clock, from memory)
    expect(plain(withPoint.text)).toMatch(/^3\.2289\d*\(\d\d?\) G/);
    const html = cellHtml(withPoint, t.columns[k]!);
    expect(html).toMatch(/3\.228[\d\u2009]*<span class="unc unc-prose">\(\d\d?\)<\/span> G/);
  });
});
