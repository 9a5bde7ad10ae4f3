import { describe, expect, it } from "vitest";
import { speciesExport } from "../../src/site/exportJson.js";
import { lineCouplingNote, levelCouplingNote, patternLimitTag } from "../../src/site/couplingNote.js";
import { computeFrom } from "./speciesFrom.js";

// Input only (not check values): argon levels in jK coupling and a mercury-like 3P1,
// as the demo data has them (NIST ASD energies; measured g recalled from memory).
const ARGON = `id: ar40
label: "40Ar"
mass: "39.96238312 u"
levels:
  - id: ground
    config: 3p6
    term: 1S0
    source: "test input"
  - id: 1s5
    config: 3p5 4s
    term: "2[3/2]o2"
    coupling: { scheme: jK, core: "2Po3/2", l: 0 }
    gJ: "1.506"
    energy: "93143.7600 cm-1"
    source: "test input"
  - id: 1s4
    config: 3p5 4s
    term: "2[3/2]o1"
    coupling: { scheme: jK, core: "2Po3/2", l: 0 }
    gJ: "1.404"
    energy: "93750.5978 cm-1"
    source: "test input"
  - id: 2p9
    config: 3p5 4p
    term: "2[5/2]3"
    coupling: { scheme: jK, core: "2Po3/2", l: 1 }
    energy: "105462.7596 cm-1"
    source: "test input"
  - id: pp
    config: 3p5 4p
    term: "(3/2,1/2)1"
    coupling: { scheme: jj, l: [1, 1] }
    source: "test input"
lines:
  - id: cooling
    upper: 2p9
    lower: 1s5
    wavelength: "811.7542 nm"
  - id: resonance
    upper: 1s4
    lower: ground
    wavelength: "106.66599 nm"
`;

const MERCURY = `id: hg202
label: "202Hg"
levels:
  - id: 1S0
    config: 6s2
    term: 1S0
    source: "test input"
  - id: 3P1
    config: 6s6p
    term: 3Po1
    gJ: "1.486"
    source: "test input"
  - id: 3P2
    config: 6s6p
    term: 3Po2
    gJ: "1.5008"
    source: "test input"
  - id: 3S1
    config: 6s7s
    term: 3S1
    source: "test input"
lines:
  - id: "254"
    upper: 3P1
    lower: 1S0
  - id: "546"
    upper: 3S1
    lower: 3P2
`;

describe("levels outside LS coupling through the loader", () => {
  const { result, fields } = computeFrom(ARGON);
  const level = (id: string) => result.levels.find((l) => l.input.id === id)!;

  it("gives the noble-gas metastable 2[3/2]°2 level the exact jK factor 3/2", () => {
    // textbook: np⁵(n+1)s 2[3/2]2 has g = 3/2 in jK coupling with gS = 2 (White 1934, ch. XIII).
    expect(level("1s5").gJExact!.toString()).toBe("3/2");
    expect(level("1s5").input.term.scheme).toBe("jK");
  });

  it("finds the compilation's measured g of Ar 1s5 within 1 % of the jK value (not marked)", () => {
    // from memory: NIST ASD, Ar I levels, Landé g of 3p5 4s 2[3/2]°2 = 1.506.
    expect(level("1s5").gJLS!.sub("1.506").abs().div("1.506").lt("0.01")).toBe(true);
    expect(level("1s5").gJDiffers).toBe(false);
  });

  it("uses the jK value where no g is measured, and says so", () => {
    // textbook: the stretched 2[5/2]3 level equals ³D3, g = 4/3 with gS = 2.
    expect(level("2p9").gJFrom).toBe("jK");
    expect(level("2p9").gJExact!.toString()).toBe("4/3");
    expect(level("2p9").gJ!.eq(level("2p9").gJLS!)).toBe(true);
  });

  it("gives the jj level its jj factor", () => {
    // textbook formula, worked by hand in test/physics/landeCoupling.test.ts: p² (3/2,1/2)1 → 3/2.
    expect(level("pp").gJFrom).toBe("jj");
    expect(level("pp").gJExact!.toString()).toBe("3/2");
  });

  it("writes the pattern of the 811 nm line from the exact jK factors", () => {
    // textbook: shift = g_u·m_u − g_l·m_l with g_u = 4/3, g_l = 3/2 (worked by hand):
    // π: −m/6 for |m| ≤ 2 → 0, 1/6, 2/6; σ: 4/3 − m_l/6 for m_l = −2..2 → 6/6 … 10/6.
    expect(result.lines.find((l) => l.input.id === "cooling")!.pattern).toBe("(0, 1, 2) 6, 7, 8, 9, 10 / 6");
  });

  it("keeps jK levels out of the LS term solver and the partner sum, and says why", () => {
    expect(fields.termOf.has("1s5")).toBe(false);
    expect(fields.levels.get("1s5")!.quadratic).toMatchObject({ scope: "J-only", notLS: "jK" });
  });

  it("marks the mixed 1s4 level, 20 % from its jK value 7/6, on the level and on its line", () => {
    // from memory: NIST ASD gives g = 1.404 for Ar 1s4; the pure jK value is 7/6 (textbook formula).
    expect(level("1s4").gJDiffers).toBe(true);
    expect(levelCouplingNote(level("1s4"))).toMatch(/^measured, 20 % from jK \(intermediate coupling; the jK pattern describes the jK limit, not the atom\)$/);
    const resonance = result.lines.find((l) => l.input.id === "resonance")!;
    expect(lineCouplingNote(resonance)).toMatch(/1s4 is 20 % from its jK value.*describes the jK limit, not the atom/);
    expect(lineCouplingNote(result.lines.find((l) => l.input.id === "cooling")!)).toBeNull();
  });

  it("exports the coupling scheme and the marks", () => {
    const e = speciesExport(result, { constantsEdition: "CODATA 2022", dataVersion: "000000000000" });
    const lv = (id: string) => e.levels.find((l) => l.id === id)!;
    expect([lv("ground").coupling, lv("1s5").coupling, lv("pp").coupling]).toEqual(["LS", "jK", "jj"]);
    expect([lv("1s4").gJ_LS_differs, lv("1s5").gJ_LS_differs]).toEqual([true, false]);
    expect(lv("1s5").gJ_exact).toBe("3/2");
    expect(e.lines.find((l) => l.id === "resonance")!.pattern_note).toMatch(/Intermediate coupling/);
    expect(e.lines.find((l) => l.id === "cooling")!.pattern_note).toBeNull();
  });
});

describe("intermediate coupling of LS levels", () => {
  const { result } = computeFrom(MERCURY);
  const level = (id: string) => result.levels.find((l) => l.input.id === id)!;
  const line = (id: string) => result.lines.find((l) => l.input.id === id)!;

  it("marks Hg 6s6p ³P1, whose measured gJ 1.486 is 1.0 % below the LS 1.5012", () => {
    // from memory: NIST ASD, Hg I, g(6s6p ³P°1) = 1.486; LS with gS = 2.00232 is (1 + gS)/2 = 1.50116
    // (textbook formula), so the difference is 1.01 %.
    expect(level("3P1").gJDiffers).toBe(true);
    expect(levelCouplingNote(level("3P1"))).toBe("measured, 1.0 % from LS (intermediate coupling; the LS pattern describes the LS limit, not the atom)");
    expect(patternLimitTag(line("254"))).toBe("LS limit (upper g 1.0 % off)");
  });

  it("leaves a measured gJ within 1 % of LS unmarked, and its lines without a note", () => {
    // 1.5008 is 0.02 % from 1.50116 (input chosen inside the 1 % band).
    expect(level("3P2").gJDiffers).toBe(false);
    expect(lineCouplingNote(line("546"))).toBeNull();
    expect(patternLimitTag(line("546"))).toBeNull();
  });
});
