import { describe, expect, it } from "vitest";
import { parseTermSymbol, L_LETTERS } from "../../src/data/termSymbol.js";

function term(text: string) {
  const r = parseTermSymbol(text);
  if (!r.ok) throw new Error(`${r.message}; ${r.hint}`);
  return r.value;
}

describe("parseTermSymbol", () => {
  it("reads 2S1/2 as S = 1/2, L = 0, J = 1/2, unmarked parity", () => {
    // 2S+1 = 2 → S = 1/2; S ↔ L = 0 (common practice)
    expect(term("2S1/2")).toEqual({ text: "2S1/2", multiplicity: 2, S2: 1, L: 0, letter: "S", J2: 1, parity: null });
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
