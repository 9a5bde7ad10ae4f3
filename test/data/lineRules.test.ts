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

  it("refuses J = 0 ↔ J = 0 for every multipole", () => {
    // 0 ↔ 0 is strictly forbidden for one-photon transitions (common practice)
    for (const m of ["E1", "M1", "E2", "M2", "E3"] as const) expect(allowed(m, "3Po0", "1S0")).toBe(false);
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

  it("accepts the Sr 1S0 → 3P2 line as M2 and the Yb+ 467 nm line as E3, and refuses them as a lower rank", () => {
    // Sr 5s2 1S0 ↔ 5s5p 3P°2 is M2, 171Yb+ 2S1/2 ↔ 4f13 6s2 2F°7/2 is E3 (common practice)
    expect(allowed("M2", "3Po2", "1S0")).toBe(true);
    expect(allowed("E3", "2Fo7/2", "2S1/2")).toBe(true);
    expect(allowed("M1", "3Po2", "1S0")).toBe(false);
    expect(allowed("E2", "2Fo7/2", "2S1/2")).toBe(false);
  });

  it("applies |ΔJ| ≤ 2 to M2 and |ΔJ| ≤ 3 to E3", () => {
    // rank-k multipole: |ΔJ| ≤ k (triangle rule, common practice)
    expect(allowed("M2", "2Fo7/2", "2S1/2")).toBe(false);
    expect(allowed("E3", "2Go9/2", "2S1/2")).toBe(false);
    expect(allowed("E3", "3Fo3", "1S0")).toBe(true);
  });

  it("refuses M2 for 0 ↔ 1 and E3 for every pair with J + J' < 3", () => {
    // triangle (J, k, J'): J + J' ≥ k (common practice)
    expect(allowed("M2", "3Po1", "1S0")).toBe(false);
    expect(allowed("M2", "2Po1/2", "2S1/2")).toBe(false);
    for (const [u, l] of [["3Po1", "1S0"], ["3Po2", "1S0"], ["3Po1", "3D1"], ["2Po1/2", "2S1/2"], ["2Po3/2", "2S1/2"]]) expect(allowed("E3", u!, l!)).toBe(false);
    expect(allowed("E3", "4Po5/2", "4D1/2")).toBe(true);
  });

  it("names the pairs E3 cannot join and the lower ranks to try instead", () => {
    const r = multipoleRuleBreak("E3", t("2Po3/2"), t("2S1/2"));
    expect(r?.message).toBe("E3 line J = 3/2 → J = 1/2 is forbidden");
    expect(r?.hint).toBe("E3 needs J + J' ≥ 3: 0 ↔ 1, 0 ↔ 2, 1 ↔ 1, 1/2 ↔ 1/2 and 1/2 ↔ 3/2 are forbidden; perhaps the line is E1, M2, M1 or E2");
  });

  it("refuses M2 and E3 between two terms marked odd, like E1", () => {
    // M2 and E3 change parity (Ek: (−1)^k, Mk: (−1)^(k+1); common practice)
    expect(allowed("M2", "3Po2", "3Po0")).toBe(false);
    expect(allowed("E3", "2Fo7/2", "2Po1/2")).toBe(false);
    expect(multipoleRuleBreak("M2", t("3Po2"), t("3Po0"))?.message).toBe("M2 line between two odd terms (3Po2 and 3Po0) is forbidden by parity");
    expect(allowed("E2", "3Po2", "3Po0")).toBe(true);
  });

  it("refuses E1 only when both terms are marked odd", () => {
    // E1 changes parity (Laporte rule, common practice); unmarked terms are left alone
    expect(allowed("E1", "2Po3/2", "2Po1/2")).toBe(false);
    expect(allowed("M1", "2Po3/2", "2Po1/2")).toBe(true);
    expect(allowed("E1", "2P3/2", "2P1/2")).toBe(true);
  });
});
