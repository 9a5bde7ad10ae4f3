import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { toSI } from "../../../src/physics/units.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { solveFineStructure, type FineStructureTerm } from "../../../src/physics/field/fineStructure.js";
import { lineComponentsAtField, lsReducedElement, statesFromFineStructure } from "../../../src/physics/field/lineAtField.js";
import { stickPlotSvg, type StickPlotInput } from "../../../src/site/plots/stickPlot.js";
import { checkXml } from "./xmlCheck.js";

const muB_h = val(CODATA_2022.muB_h);
const gS = val(CODATA_2022.g_e).neg();
// Na 3p energies: NIST ASD (Juncar et al. 1981), from memory
const E32 = toSI(dec("16973.3661"), "cm-1");
const p: FineStructureTerm = { S2: 1, L: 1, partners: [{ J2: 1, energy: toSI(dec("16956.1702"), "cm-1") }, { J2: 3, energy: E32 }], gL: dec("1"), gS, muB_h };
const s: FineStructureTerm = { S2: 1, L: 0, partners: [{ J2: 1, energy: dec("0") }], gL: dec("1"), gS, muB_h };
const B = dec("1");
const up = statesFromFineStructure(solveFineStructure(p, B), E32).filter((x) => x.label.startsWith("J=3/2"));
const low = statesFromFineStructure(solveFineStructure(s, B), dec("0"));
const comps = lineComponentsAtField(up, low, 1, lsReducedElement(1, 0, 1, 1)).filter((c) => c.strength.gt("1e-6"));
const c = val(CODATA_2022.c);
const input: StickPlotInput = {
  id: "na-d2-1T",
  title: "Na D2 at 1 T",
  description: "Six Zeeman components of the sodium D2 line at 1 tesla.",
  sticks: comps.map((x) => ({ shift: x.shift, strength: x.strength, polarization: x.polarization })),
  wavelength: c.div(E32), // λ0 = c/ν0 of the 2P3/2 level above the ground level
  speedOfLight: c,
};

describe("stickPlotSvg", () => {
  it("draws one stick per component with axes in frequency and wavelength offset, as well-formed SVG", () => {
    const svg = stickPlotSvg(input);
    const { problems } = checkXml(svg);
    expect(problems).toEqual([]);
    // Na D2 has six Zeeman components (Condon and Shortley ch. XVI)
    expect(svg.match(/class="stick"/g)).toHaveLength(6);
    expect(svg.match(/data-polarization="pi"/g)).toHaveLength(2);
    expect(svg.match(/data-polarization="sigma\+"/g)).toHaveLength(2);
    expect(svg).toMatch(/Frequency offset Δν \(GHz\)/);
    expect(svg).toContain("Wavelength offset Δλ (pm)");
    expect(svg).toContain("Relative strength");
    expect(svg).toContain('role="img"');
    expect(svg).toContain('<g class="legend">');
    expect(svg).toContain("σ+ (Δm = +1)");
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });

  it("tells π from σ by line style, not by colour", () => {
    const svg = stickPlotSvg(input);
    const pi = svg.match(/<line class="stick" data-polarization="pi"[^>]*>/)![0];
    const sigma = svg.match(/<line class="stick" data-polarization="sigma-"[^>]*>/)![0];
    expect(pi).not.toContain("stroke-dasharray");
    expect(sigma).toContain("stroke-dasharray");
    expect(svg).not.toMatch(/stroke="#(?!000)/);
  });

  it("omits the wavelength axis when no wavelength is given and is deterministic", () => {
    const svg = stickPlotSvg({ ...input, wavelength: null });
    expect(svg).not.toContain("Wavelength offset");
    expect(stickPlotSvg(input)).toBe(stickPlotSvg(input));
  });
});

describe("stick plot legend", () => {
  it("stands where no stick reaches into it", async () => {
    const { stickPlotSvg: plot } = await import("../../../src/site/plots/stickPlot.js");
    const { dec: d } = await import("../../../src/physics/decimal.js");
    // A pattern whose tallest sticks sit at both ends and in the middle: every top corner is taken.
    const sticks = [-1, -0.5, 0, 0.5, 1].map((x) => ({ shift: d(String(x * 1e6)), strength: d("1"), polarization: x === 0 ? ("pi" as const) : ("sigma+" as const) }));
    const svg = plot({ id: "p", title: "t", description: "d", sticks, wavelength: null, speedOfLight: d("299792458") });
    const box = /<g class="legend"><rect x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)"/.exec(svg)!;
    const [bx, by, bw, bh] = box.slice(1).map(Number) as [number, number, number, number];
    for (const m of svg.matchAll(/<line class="stick"[^>]* x1="([\d.]+)"[^>]* y2="([\d.]+)"/g)) {
      const [x, top] = [Number(m[1]), Number(m[2])];
      const inside = x >= bx && x <= bx + bw && top <= by + bh;
      expect(inside, `stick at x=${x} reaching y=${top}`).toBe(false);
    }
  });
});
