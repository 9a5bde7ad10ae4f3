/**
 * What a reader sees on the demo build's pages, checked in the generated
 * HTML: numbers, units, captions, dates, downloads and file names in the
 * forms the contributor guide promises.
 */
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { htmlFiles } from "../../src/build/anchors.js";
import { demoSite } from "../support/runBuild.js";

let site: string;
let pages: string[];
const html = (p: string) => readFileSync(join(site, p), "utf8");
/** The text a reader sees: tags, scripts and styles stripped, references decoded enough for these checks. */
const text = (p: string) =>
  html(p)
    .replace(/<(script|style)[^>]*>[\s\S]*?<\/\1>/g, "")
    .replace(/<[^>]+>/g, "")
    .replace(/&amp;/g, "&");

beforeAll(async () => {
  site = await demoSite();
  pages = htmlFiles(site);
}, 600_000);

describe("the pages of the demo build", () => {
  it("never show a numerical zero as a tiny power of ten", () => {
    // 60-digit arithmetic leaves residues near 1e-50 of the largest number; the rule (src/site/tableSpec.ts) shows them as 0.
    // Components weaker than 1e-20 of their line are not listed (src/results/computeFields.ts), and no tabulated
    // energy, shift or coefficient of the demo is physically below 1e-30 of its unit (common practice: Hz, MHz, Hz/G² scales).
    for (const p of pages) expect(text(p), p).not.toMatch(/×10⁻[³⁴⁵⁶⁷⁸⁹][⁰¹²³⁴⁵⁶⁷⁸⁹]/); // superscript digits are not one Unicode range
    // The 5p ²P term of 87Rb at 0 G: every shift is 0 (no field, no shift).
    const rb = html("species/rb87/index.html");
    const row = /<tr id="term:5p-2Po:J=1\/2:mJ=-1\/2">(.*?)<\/tr>/s.exec(rb)![1]!;
    const firstShift = /<td class="k-number"[^>]*>(.*?)<\/td>/s.exec(row)![1]!.replace(/<[^>]+>/g, "").replace(/[\u2007\u2008\u2009]/g, "");
    expect(firstShift).toBe("0");
  });

  it("write units in one style, with no caret powers", () => {
    for (const p of pages) expect(text(p), p).not.toMatch(/\^-?\d/);
    // CODATA 2022 gives μB/h in Hz/T (common practice: the unit of the Bohr magneton over h).
    expect(text("constants/index.html")).toContain("Hz/T");
  });

  it("caption tables with the typeset term, never the data file's spelling", () => {
    // data/species/rb87.yaml writes the 5p terms as 2Po1/2 and 2Po3/2.
    for (const p of ["species/rb87/index.html", "species/rb87/level/5p-P3_2/index.html", "species/rb87/line/D1/index.html"]) {
      const captions = [...html(p).matchAll(/<caption>(.*?)<\/caption>/gs)].map((m) => m[1]!);
      expect(captions.length, p).toBeGreaterThan(0);
      for (const c of captions) expect(c, p).not.toMatch(/2Po[13]\/2/);
    }
    expect(html("species/rb87/index.html")).toContain("5p-P1/2 ²P°₁/₂: sublevels mJ, linear shift");
  });

  it("date the build in words, keeping the ISO form in the page's metadata", () => {
    // The demo build's SOURCE_DATE_EPOCH is 1798761600: 1 January 2027, 00:00 UTC (common practice: Unix time).
    const page = html("species/rb87/index.html");
    expect(page).toContain('<meta name="build-date" content="2027-01-01T00:00:00.000Z">');
    expect(page).toContain('<time datetime="2027-01-01T00:00:00.000Z">1 January 2027, 00:00 UTC</time>');
  });

  it("say what each download is, and name CSV files readably", () => {
    const page = html("species/rb87/index.html");
    expect(page).toContain(">CSV of this table</a>");
    expect(page).toContain(">species JSON (all tables)</a>");
    for (const f of ["rb87-levels.csv", "rb87-5p-P3_2-field-energies.csv", "rb87-5s-S1_2-mF-shifts.csv"]) expect(existsSync(join(site, "species/rb87/csv", f)), f).toBe(true);
    for (const f of ["rb87-D2-components.csv", "rb87-5s-S1_2-transitions.csv", "rb87-D2-at-0.5G.csv"]) expect(existsSync(join(site, "species/rb87/csv", f)), f).toBe(true);
  });

  it("label the Δm = ±2 components of a quadrupole line as such", () => {
    // 40Ca+ 729 nm is 3d ²D5/2 → 4s ²S1/2, E2 (data/species/ca40-ion.yaml): components with Δm = ±2 exist (common practice).
    const page = text("species/ca40-ion/line/729/index.html");
    expect(page).toContain("Δm = +2");
    expect(page).toContain("Δm = −2");
  });
});
