import { describe, expect, it } from "vitest";
import { esc, label, linearTicks, px, spreadLabels } from "../../../src/site/plots/svgParts.js";

describe("svgParts", () => {
  it("chooses 1-2-5 tick steps", () => {
    // 1, 2, 5 × 10^n tick steps (common practice)
    expect(linearTicks(0, 1)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(linearTicks(-33, 33, 8)).toEqual([-30, -20, -10, 0, 10, 20, 30]);
  });

  it("writes compact coordinates and labels without negative zero", () => {
    expect(px(-0.001)).toBe("0");
    expect(px(12.3456)).toBe("12.35");
    expect(label(-2.5)).toBe("−2.5");
    expect(label(0.1 + 0.2)).toBe("0.3");
    expect(esc('a<b & "c"')).toBe("a&lt;b &amp; &quot;c&quot;");
  });

  it("keeps direct labels at least a gap apart and inside the plot", () => {
    const out = spreadLabels([100, 101, 102, 300], 12, 50, 400);
    const sorted = [...out].sort((a, b) => a - b);
    for (let i = 1; i < sorted.length; i++) expect(sorted[i]! - sorted[i - 1]!).toBeGreaterThanOrEqual(12);
    expect(out[3]).toBe(300);
  });
});
