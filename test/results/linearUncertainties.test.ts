import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../src/physics/decimal.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { standardUncertainty, type Uncertain } from "../../src/physics/uncertain.js";
import { computeSpecies, levelLande } from "../../src/results/computeSpecies.js";
import { linearUncertain, sigmaSeparationU } from "../../src/results/linearUncertainties.js";
import { lineSecondOrder } from "../../src/results/observation.js";
import { loadDemo } from "../engine/demo.js";
import { computeFrom } from "./speciesFrom.js";

const { folder, constants } = loadDemo();
const rb87 = computeSpecies(folder.species.find((s) => s.id === "rb87")!, constants);
const level = (id: string) => rb87.levels.find((l) => l.input.id === id)!;
const close = (a: Dec, b: Dec, rel = "1e-12") => expect(a.sub(b).abs().lte(b.abs().mul(rel)), `${a} vs ${b}`).toBe(true);

describe("standard uncertainties of the linear numbers", () => {
  it("gives gF(F = 2) of 87Rb 5²S1/2 the hand formula's uncertainty", () => {
    // gF = gJ/4 + 3gI/4 (Steck, "Rubidium 87 D Line Data", eq. 22), with the demo's gJ = 2.00233113(20) and gI = −0.0009951414(10) (Steck)
    const u = dec("0.00000020").div(4).pow(2).add(dec("0.0000000010").mul(3).div(4).pow(2)).sqrt();
    const f2 = level("5s-S1/2").hyperfine.find((h) => h.F2 === 4)!;
    close(f2.gFU!, u);
    // 5.000 56…×10⁻⁸ (hand arithmetic of the line above)
    expect(f2.gFU!.toExponential(5)).toBe("5.00056e-8");
  });

  it("gives a linear sublevel shift |m|·√((gF·u(μB/h))² + (μB/h·u(gF))²)", () => {
    // shift = gF·mF·μB/h (textbook, weak-field Zeeman effect); μB/h = 13 996 244 917.1(4.4) Hz/T (CODATA 2022)
    const f2 = level("5s-S1/2").hyperfine.find((h) => h.F2 === 4)!;
    const top = f2.sublevels.find((s) => s.m2 === 4)!;
    const muB = dec("13996244917.1");
    const hand = f2.gF!.mul(dec("4.4")).pow(2).add(muB.mul(f2.gFU!).pow(2)).sqrt().mul(2);
    close(top.shiftHzPerTU!, hand);
    // the mF = 0 sublevel does not shift, whatever the inputs
    expect(f2.sublevels.find((s) => s.m2 === 0)!.shiftHzPerTU).toBeNull();
  });

  it("takes a measured gJ's own uncertainty and gives a hyperfine energy a·u(A) + b·u(B)", () => {
    expect(level("5p-P3/2").gJU!.eq(dec("0.0013"))).toBe(true);
    // 5²P1/2, A = 408.328(15) MHz (Steck): F = 2 lies at +3A/4 (J = 1/2, I = 3/2; textbook interval rule), so u = 3/4 · 15 kHz
    const f2 = level("5p-P1/2").hyperfine.find((h) => h.F2 === 4)!;
    close(f2.zeroFieldHzU!, dec("11250"));
    // 5²S1/2, A = 3417.341305452145(45) MHz (demo data, Steck, uncertainty from memory): F = 1 lies at −5A/4, so u = 5/4 · 45 µHz
    close(level("5s-S1/2").hyperfine.find((h) => h.F2 === 2)!.zeroFieldHzU!, dec("0.00005625"));
    // a level without hyperfine constants has exact zero-field energies (A = B = 0): none of 87Rb's; a synthetic one
    const { result } = computeFrom(`id: x
label: "X"
nucleus: { spin: 3/2, gI: "-0.0009951414(10)" }
levels:
  - { id: a, config: 5s, term: 2S1/2, source: test }
`);
    expect(result.levels[0]!.hyperfine.every((h) => (h.zeroFieldHzU ?? null) === null)).toBe(true);
  });

  it("propagates gL and gS into an LS gJ, and leaves a J = 0 level without one", () => {
    // 5²P1/2 has no measured gJ; the LS formula for L = 1, S = 1/2, J = 1/2 is gJ = (4/3)·gL − (1/3)·gS (textbook),
    // and gS = −g_e, so u(gJ)² = (4/3·u(gL))² + (1/3·u(g_e))²
    const p12 = level("5p-P1/2");
    const uGL = rb87.gLU!;
    const uGe = dec(CODATA_2022.g_e.uncertainty);
    close(p12.gJU!, uGL.mul(4).div(3).pow(2).add(uGe.div(3).pow(2)).sqrt());
    const sr = folder.species.find((s) => s.levels.some((l) => l.term.J2 === 0));
    if (sr) {
      const r = computeSpecies(sr, constants);
      for (const l of r.levels.filter((x) => x.J2 === 0)) expect(l.gJU).toBeNull();
    }
  });

  it("gives the line frequency c/λ the uncertainty c·u(λ)/λ²", () => {
    const { result } = computeFrom(`id: x
label: "X"
levels:
  - { id: a, config: 3s, term: 2S1/2, source: test }
  - { id: b, config: 3p, term: 2Po3/2, source: test }
lines:
  - { id: L, upper: b, lower: a, wavelength: "589.158(12) nm", multipole: E1, source: test }
`);
    // hand: c = 299 792 458 m/s exactly (SI); u(ν) = c·u(λ)/λ² (textbook first-order propagation)
    const c = dec("299792458");
    const lam = dec("589.158e-9");
    const line = result.lines[0]!;
    close(line.frequencyHzU!, c.mul(dec("0.012e-9")).div(lam.pow(2)));
    // Δλ per Lorentz unit per tesla = λ²·μB/(hc): relative u = 2·u(λ)/λ (μB/(hc) is 10⁻¹⁰ relative)
    close(line.lorentzDlambdaPerTU!.div(line.lorentzDlambdaPerT!), dec("0.024").div(dec("589.158")), "1e-6");
    // the σ centroid separation at 1 T: 2·g_eff·Δλ₁, with g_eff of ²P3/2 → ²S1/2 (4/3 and 2 with gL, gS near 1 and 2)
    const sep = sigmaSeparationU(line, dec("1"))!;
    close(sep.div(line.lorentzDlambdaPerTU!).div(line.gEff!.abs().mul(2)), dec("1"), "1e-4");
  });

  it("gives G of a line to a J = 0 level the uncertainty 2·g·u(g), and G of a doublet line its two slopes' sum", () => {
    const { result } = computeFrom(`id: x
label: "X"
levels:
  - { id: a, config: 4s2, term: 1S0, source: test }
  - { id: b, config: 4s4p, term: 3Po1, gJ: "1.50115(25)", source: test }
lines:
  - { id: L, upper: b, lower: a, multipole: E1, source: test }
`);
    const doublet = computeFrom(`id: y
label: "Y"
levels:
  - { id: c, config: 3s, term: 2S1/2, gJ: "2.00231(4)", source: test }
  - { id: d, config: 3p, term: 2Po3/2, gJ: "1.3342(6)", source: test }
lines:
  - { id: D2, upper: d, lower: c, multipole: E1, source: test }
`).result;
    // textbook: G = g_eff² = g² with a J = 0 level (Landi Degl'Innocenti and Landolfi 2004), so u(G) = 2·g·u(g)
    const L = result.lines.find((l) => l.input.id === "L")!;
    close(L.GU!, dec("1.50115").mul(2).mul(dec("0.00025")));
    // J_u = 3/2, J_l = 1/2: d = 3, s = 9/2, K = 16s − 7d² − 4 = 5 (hand); ḡ = (g_u + g_l)/2 + (g_u − g_l)·3/4,
    // ∂G/∂g_u = 2ḡ(1/2 + 3/4) − (g_u − g_l)·5/40, ∂G/∂g_l = 2ḡ(1/2 − 3/4) + (g_u − g_l)·5/40; the two measured g independent
    const gu = dec("1.3342");
    const gl = dec("2.00231");
    const gBar = gu.add(gl).div(2).add(gu.sub(gl).mul(3).div(4));
    const cross = gu.sub(gl).mul(5).div(40);
    const su = gBar.mul(2).mul(dec("1.25")).sub(cross);
    const sl = gBar.mul(2).mul(dec("-0.25")).add(cross);
    const D2 = doublet.lines.find((l) => l.input.id === "D2")!;
    close(D2.GU!, su.mul(dec("0.0006")).pow(2).add(sl.mul(dec("0.00004")).pow(2)).sqrt());
  });

  it("gives G no uncertainty above rank 1 and keeps the shared g_e of two LS levels correlated", () => {
    const { result } = computeFrom(`id: x
label: "X"
levels:
  - { id: a, config: 3s, term: 2S1/2, source: test }
  - { id: b, config: 3p, term: 2Po3/2, source: test }
  - { id: c, config: 3d, term: 2D5/2, source: test }
lines:
  - { id: D2, upper: b, lower: a, multipole: E1, source: test }
  - { id: Q, upper: c, lower: a, multipole: E2, source: test }
`);
    expect(result.lines.find((l) => l.input.id === "Q")!.GU ?? null).toBeNull();
    // without a mass gL = 1 exactly; gS = −g_e, so g(²S1/2) = g_e and g(²P3/2) = 1 + g_e/3 (textbook LS formula):
    // G = 4/3 at g_e = 2 moves with g_e through both levels at once, dG/dg_e = 3·(1/3) + (−2/3)·1 = 1/3 (slopes 3 and −2/3 at
    // the LS values, hand-worked in test/physics/secondOrderLande.test.ts; at the physical g_e they differ by 10⁻³ relative)
    const uGe = dec(CODATA_2022.g_e.uncertainty);
    close(result.lines.find((l) => l.input.id === "D2")!.GU!, uGe.div(3), "1e-2");
  });

  it("carries exactly the values the results show (the uncertainties belong to the numbers on the page)", () => {
    for (const sp of folder.species) {
      const r = computeSpecies(sp, constants);
      const all = linearUncertain(r, constants, levelLande);
      const same = (x: Uncertain | null, v: Dec | null) => {
        if (v === null) return expect(x === null || x.value.isZero()).toBe(true);
        expect(x, sp.id).not.toBeNull();
        expect(x!.value.sub(v).abs().lte(v.abs().mul("1e-45").add("1e-45")), `${sp.id}: ${x!.value} vs ${v}`).toBe(true);
      };
      same(all.gL, r.gL);
      same(all.gS, r.gS);
      same(all.gI, r.gI);
      for (const l of r.levels) {
        const lu = all.levels.get(l.input.id)!;
        same(lu.gJ, l.gJ);
        same(lu.gJLS, l.gJLS);
        l.sublevels.forEach((s, i) => same(lu.sublevels[i]!, s.shiftHzPerT));
        l.hyperfine.forEach((h, k) => {
          same(lu.hyperfine[k]!.gF, h.gF);
          same(lu.hyperfine[k]!.zeroFieldHz, h.zeroFieldHz);
          h.sublevels.forEach((s, i) => same(lu.hyperfine[k]!.sublevels[i]!, s.shiftHzPerT));
        });
      }
      for (const ln of r.lines) {
        const lu = all.lines.get(ln.input.id)!;
        same(lu.gEff, ln.gEff);
        same(lu.G, lineSecondOrder(ln).G);
        same(lu.frequencyHz, ln.frequencyHz);
        same(lu.lorentzDlambdaPerT, ln.lorentzDlambdaPerT);
        ln.components.forEach((c, i) => {
          same(lu.components[i]!.shiftLorentz, c.shiftLorentz);
          same(lu.components[i]!.shiftHzPerT, c.shiftHzPerT);
        });
      }
      // and the attached fields are these numbers' standard uncertainties
      expect(r.levels[0]!.gJU ?? null).toEqual(all.levels.get(r.levels[0]!.input.id)!.gJ === null ? null : standardUncertainty(all.levels.get(r.levels[0]!.input.id)!.gJ!));
    }
  });
});
