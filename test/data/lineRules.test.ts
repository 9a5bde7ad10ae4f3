import { describe, expect, it } from "vitest";
import { multipoleRuleBreak } from "../../src/data/lineRules.js";
import { parseTermSymbol } from "../../src/data/termSymbol.js";
import type { Multipole } from "../../src/data/model.js";

const t = (s: string) => {
  const r = parseTermSymbol(s);
  if (!r.ok) throw new Error(r.message);
  return r.value;
};
const allowed = (m: Multipole, up: string, low: string) => multipoleRuleBreak(m, t(up), t(low)) === null;

describe("multipoleRuleBreak", () => {
  it("allows the alkali D lines as E1", () => {
    // D1 2P1/2→2S1/2 and D2 2P3/2→2S1/2 are E1 (common practice)
    expect(allowed("E1", "2Po1/2", "2S1/2")).toBe(true);
    expect(allowed("E1", "2Po3/2", "2S1/2")).toBe(true);
  });

  it("refuses J = 0 ↔ J = 0 for E1, M1 and E2", () => {
    // 0 ↔ 0 is strictly forbidden for one-photon transitions (common practice)
    for (const m of ["E1", "M1", "E2"] as const) expect(allowed(m, "3Po0", "1S0")).toBe(false);
  });

  it("applies |ΔJ| ≤ 1 to E1 and M1, |ΔJ| ≤ 2 to E2", () => {
    // 2D5/2 → 2S1/2 is the E2 line of Ca+ at 729 nm (common practice)
    expect(allowed("E1", "2D5/2", "2S1/2")).toBe(false);
    expect(allowed("M1", "2D5/2", "2S1/2")).toBe(false);
    expect(allowed("E2", "2D5/2", "2S1/2")).toBe(true);
    expect(allowed("E2", "2Fo7/2", "2S1/2")).toBe(false);
  });

  it("refuses E2 for 0 ↔ 1 and 1/2 ↔ 1/2", () => {
    // E2 needs the triangle (J, 2, J'): J + J' ≥ 2 (common practice)
    expect(allowed("E2", "3Po1", "1S0")).toBe(false);
    expect(allowed("E2", "2Po1/2", "2S1/2")).toBe(false);
    expect(allowed("E2", "3P2", "1S0")).toBe(true);
  });

  it("refuses E1 only when both terms are marked odd", () => {
    // E1 changes parity (Laporte rule, common practice); unmarked terms are left alone
    expect(allowed("E1", "2Po3/2", "2Po1/2")).toBe(false);
    expect(allowed("M1", "2Po3/2", "2Po1/2")).toBe(true);
    expect(allowed("E1", "2P3/2", "2P1/2")).toBe(true);
  });
});
