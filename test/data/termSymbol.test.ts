import { describe, expect, it } from "vitest";
import { parseLS, parseTermSymbol, L_LETTERS, type CouplingInput } from "../../src/data/termSymbol.js";

function term(text: string) {
  const r = parseLS(text);
  if (!r.ok) throw new Error(`${r.message}; ${r.hint}`);
  return r.value;
}

describe("parseTermSymbol", () => {
  it("reads 2S1/2 as S = 1/2, L = 0, J = 1/2, unmarked parity", () => {
    // 2S+1 = 2 → S = 1/2; S ↔ L = 0 (common practice)
    expect(term("2S1/2")).toEqual({ scheme: "LS", text: "2S1/2", multiplicity: 2, S2: 1, L: 0, letter: "S", J2: 1, parity: null });
  });

  it("reads both parity marks as odd", () => {
    // o and ° both mark odd parity (common practice)
    expect(term("2Po3/2").parity).toBe("odd");
    expect(term("2P°3/2").parity).toBe("odd");
    expect(term("2P°3/2").J2).toBe(3);
  });

  it("reads integer J for even multiplicity minus one", () => {
    // 3D2: S = 1, L = 2, J = 2 (common practice)
    const t = term("3D2");
    expect([t.S2, t.L, t.J2]).toEqual([2, 2, 4]);
  });

  it("skips J in the letter sequence, so K is L = 7", () => {
    // S P D F G H I K L M N O Q R T U V for L = 0..16 (common practice)
    expect(L_LETTERS.indexOf("K")).toBe(7);
    expect(term("1K7").L).toBe(7);
  });

  it.each([
    ["2J1/2", /J is skipped/],
    ["2X1/2", /not an L letter/],
    ["0S1/2", /less than 1/],
    ["2P5/2", /cannot arise from L = 1 and S = 1\/2/],
    ["2S1", /does not fit multiplicity 2/],
    ["3S1/2", /does not fit multiplicity 3/],
    ["1S1", /cannot arise/],
    ["2s1/2", /lower case/],
    ["S1/2", /multiplicity/],
    ["2P_{3/2}", /markup/],
    ["2P1/3", /not an integer or half-integer/],
  ])("refuses %s", (text, why) => {
    const r = parseTermSymbol(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(`${r.message}; ${r.hint}`).toMatch(why);
  });
});

const P32 = term("2Po3/2");
const P12 = term("2Po1/2");
const jK = (core: ReturnType<typeof term>, l: number): CouplingInput => ({ scheme: "jK", core, l });
const jj = (l1: number, l2: number): CouplingInput => ({ scheme: "jj", l: [l1, l2] });

describe("parseTermSymbol outside LS coupling", () => {
  it("reads the jK term 2[3/2]o2 on a 2Po3/2 core with an s electron as K = 3/2, J = 2, odd", () => {
    // Racah's pair-coupling notation (2s+1)[K]J (common practice), here the noble-gas 1s5 level
    const r = parseTermSymbol("2[3/2]o2", jK(P32, 0));
    expect(r.ok && r.value).toEqual({ scheme: "jK", text: "2[3/2]o2", multiplicity: 2, K2: 3, core: P32, l: 0, J2: 4, parity: "odd" });
  });

  it("reads the jj term (3/2,1/2)1 of two p electrons", () => {
    // jj notation (j1,j2)J (common practice)
    const r = parseTermSymbol("(3/2,1/2)1", jj(1, 1));
    expect(r.ok && r.value).toEqual({ scheme: "jj", text: "(3/2,1/2)1", j2s: [3, 1], l: [1, 1], J2: 2, parity: null });
  });

  it("reads a parity mark and the ° sign in both notations", () => {
    // o and ° both mark odd parity (common practice)
    const a = parseTermSymbol("2[5/2]°3", jK(P32, 1));
    const b = parseTermSymbol("(3/2,1/2)o2", jj(1, 0));
    expect([a.ok && a.value.parity, b.ok && b.value.parity]).toEqual(["odd", "odd"]);
  });

  it.each([
    ["2[3/2]o2", null, /no coupling.*\n?.*scheme: jK, core/],
    ["(3/2,1/2)1", null, /no coupling.*scheme: jj, l: \[1, 1\]/],
    ["2[3/2]o2", jj(1, 0), /coupling says scheme jj/],
    ["2[5/2]o2", jK(P32, 0), /K = 5\/2 cannot arise from the core's j1 = 3\/2 .* l = 0.*here 3\/2/],
    ["2[1/2]o2", jK(P12, 0), /J = 2 cannot arise from K = 1\/2 .*here 0, 1/],
    ["3[3/2]o2", jK(P32, 0), /2s\+1 = 3 .* is not 2/],
    ["(3/2,1/2)1", jj(0, 1), /j1 = 3\/2 cannot arise from l1 = 0 .*here 1\/2/],
    ["(3/2,1/2)3", jj(1, 1), /J = 3 cannot arise from j1 = 3\/2 and j2 = 1\/2.*here 1, 2/],
    ["(1,1/2)1", jj(1, 1), /j1 = 1 .* is not a half-integer/],
    ["2S1/2", jK(P32, 0), /is an LS term, but the level gives coupling/],
    ["2[3/2o2", jK(P32, 0), /not a jK term symbol/],
  ])("refuses %s with coupling %j", (text, coupling, why) => {
    const r = parseTermSymbol(text, coupling as CouplingInput | null);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(`${r.message}; ${r.hint}`).toMatch(why);
  });
});
