import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { solveHyperfineZeeman } from "../../../src/physics/field/hyperfineZeeman.js";
import { fieldPlotSvg, type FieldPlotInput } from "../../../src/site/plots/fieldPlot.js";
import { checkXml } from "./xmlCheck.js";

// 87Rb 5S1/2: D. A. Steck, "Rubidium 87 D Line Data" (from memory)
const level = {
  J2: 1,
  I2: 3,
  gJ: dec("2.00233113"),
  gI: dec("-0.0009951414"),
  A: dec("3417341305.452145"),
  B: dec("0"),
  muB_h: val(CODATA_2022.muB_h),
};
const fields = ["0", "0.0001", "0.001", "0.01", "0.03", "0.1", "0.2", "0.3"].map(dec);
const solved = fields.map((b) => solveHyperfineZeeman(level, b));
const input: FieldPlotInput = {
  id: "rb87-ground",
  title: "87Rb 5²S1/2 sublevels against field",
  description: "Energies of the eight hyperfine–Zeeman sublevels from 0 to 0.3 T.",
  fields,
  curves: solved[0]!.map((s, i) => ({
    label: `F=${s.F2 / 2}, mF=${s.mF2 % 2 === 0 ? s.mF2 / 2 : `${s.mF2}/2`}`,
    energies: solved.map((states) => states[i]!.energy),
  })),
  rules: [{ tesla: dec("0.1"), label: "0.1 T magnet" }],
};

describe("fieldPlotSvg", () => {
  for (const axis of ["linear", "log"] as const) {
    it(`draws one labelled curve per sublevel on a ${axis} field axis as well-formed accessible SVG`, () => {
      const svg = fieldPlotSvg(input, axis);
      const { problems, elements } = checkXml(svg);
      expect(problems).toEqual([]);
      expect(elements[0]).toBe("svg");
      expect(svg).toContain('role="img"');
      expect(svg).toMatch(/aria-labelledby="rb87-ground-title rb87-ground-desc"/);
      expect(svg).toContain('<title id="rb87-ground-title">');
      // 2I+1 times 2J+1 = 8 sublevels for I = 3/2, J = 1/2 (common practice)
      expect(svg.match(/class="curve"/g)).toHaveLength(8);
      expect(svg.match(/class="curve-label"/g)).toHaveLength(8);
      expect(svg).toContain("F=2, mF=2");
      expect(svg).toMatch(/Energy E\/h \((MHz|GHz)\)/);
      expect(svg).toMatch(/Magnetic field B \((mT|T)/);
      expect(svg.match(/class="rule"/g)).toHaveLength(1);
      expect(svg).not.toMatch(/fill="#(?!000|fff)/); // black and white only
      expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    });
  }

  it("uses a different dash or marker for neighbouring curves", () => {
    const svg = fieldPlotSvg(input, "linear");
    const dashes = [...svg.matchAll(/<path class="curve"[^>]*?(?:stroke-dasharray="([^"]*)")?\/>/g)].map((m) => m[1] ?? "");
    for (let i = 1; i < dashes.length && i < 6; i++) expect(dashes[i]).not.toBe(dashes[i - 1]);
  });

  it("drops the zero field from the log version only", () => {
    const lin = fieldPlotSvg(input, "linear").match(/<path class="curve" d="([^"]*)"/)![1]!;
    const log = fieldPlotSvg(input, "log").match(/<path class="curve" d="([^"]*)"/)![1]!;
    expect(lin.split("L")).toHaveLength(8);
    expect(log.split("L")).toHaveLength(7);
  });

  it("produces the same text every time", () => {
    expect(fieldPlotSvg(input, "log")).toBe(fieldPlotSvg(input, "log"));
    expect(fieldPlotSvg({ ...input }, "linear")).toBe(fieldPlotSvg(input, "linear"));
  });

  it("refuses a curve whose length does not match the fields", () => {
    expect(() => fieldPlotSvg({ ...input, curves: [{ label: "x", energies: [dec("1")] }] }, "linear")).toThrow(RangeError);
  });
});
