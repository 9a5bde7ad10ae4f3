/**
 * The Hellmann–Feynman slopes of the fine-structure Paschen–Back states and
 * the slopes of the fitted spin–orbit constant, each against an independent
 * route: re-solving the term with one parameter moved by ±h (central
 * difference at 60 digits).
 */
import { O_2P4_3P } from "./levels.js";
import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../../src/physics/decimal.js";
import { toSI } from "../../../src/physics/units.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { fineStructureShiftSlopes, solveFineStructure, spinOrbitSlopes, type FineStructureTerm } from "../../../src/physics/field/fineStructure.js";

const muB_h = val(CODATA_2022.muB_h);
const gS = val(CODATA_2022.g_e).neg();
// O I 2p⁴ ³P (NIST ASD, from memory; levels.ts): three partners, 3×3 blocks, no interval rule.
const oxygen = O_2P4_3P;
// Na 3p 2P1/2 and 2P3/2 (NIST ASD, from memory)
const na3p: FineStructureTerm = {
  S2: 1,
  L: 1,
  partners: [
    { J2: 1, energy: toSI(dec("16956.1702"), "cm-1") },
    { J2: 3, energy: toSI(dec("16973.3661"), "cm-1") },
  ],
  gL: dec("1"),
  gS,
  muB_h,
};

const shiftOf = (term: FineStructureTerm, tesla: Dec, J2: number, mJ2: number) =>
  solveFineStructure(term, tesla).find((s) => s.J2 === J2 && s.mJ2 === mJ2)!.shift;

function centralDifference(move: (h: Dec) => FineStructureTerm, h: Dec, tesla: Dec, J2: number, mJ2: number): Dec {
  return shiftOf(move(h), tesla, J2, mJ2).sub(shiftOf(move(h.neg()), tesla, J2, mJ2)).div(h.mul(2));
}

function close(a: Dec, b: Dec, rel: string, what: string) {
  const scale = Dec.max(a.abs(), b.abs(), new Dec("1e-30"));
  expect(a.sub(b).abs().div(scale).lte(new Dec(rel)), `${what}: ${a} vs ${b}`).toBe(true);
}

describe("Hellmann–Feynman slopes of a fine-structure state's shift", () => {
  const tesla = dec("2.5"); // the intermediate regime of the O I 3P term (ζ/μB ≈ 3 T)
  for (const [J2, mJ2] of [[2, 0], [4, 2], [2, -2], [0, 0]] as const) {
    it(`agree with re-solving the O I 3P term at 2.5 T (J = ${J2 / 2}, mJ = ${mJ2 / 2})`, () => {
      const st = solveFineStructure(oxygen, tesla).find((s) => s.J2 === J2 && s.mJ2 === mJ2)!;
      const d = fineStructureShiftSlopes(oxygen, st, tesla);
      const h = new Dec("1e-20");
      close(d.gS, centralDifference((x) => ({ ...oxygen, gS: gS.add(x) }), h, tesla, J2, mJ2), "1e-15", "gS");
      close(d.gL, centralDifference((x) => ({ ...oxygen, gL: oxygen.gL.add(x) }), h, tesla, J2, mJ2), "1e-15", "gL");
      close(d.muB_h, centralDifference((x) => ({ ...oxygen, muB_h: muB_h.add(x) }), h, tesla, J2, mJ2), "1e-15", "μB/h");
      for (const p of oxygen.partners) {
        const moved = (x: Dec) => ({ ...oxygen, partners: oxygen.partners.map((q) => (q.J2 === p.J2 ? { J2: q.J2, energy: q.energy.add(x) } : q)) });
        close(d.energies.get(p.J2)!, centralDifference(moved, h, tesla, J2, mJ2), "1e-15", `E(J = ${p.J2 / 2})`);
      }
    });
  }

  it("vanish at zero field, where each state is a pure |J mJ⟩ (shift 0 whatever the parameters)", () => {
    for (const st of solveFineStructure(oxygen, new Dec(0))) {
      const d = fineStructureShiftSlopes(oxygen, st, new Dec(0));
      for (const k of d.energies.values()) expect(k.abs().lt("1e-40")).toBe(true);
      expect(d.gS.isZero() && d.gL.isZero() && d.muB_h.isZero()).toBe(true);
    }
  });

  it("tend to the uncoupled slopes in the Paschen–Back limit: ∂E/∂gS → (μB/h)·B·mS (Na 3p at 1000 T, textbook limit)", () => {
    const tesla = dec("1000");
    const st = solveFineStructure(na3p, tesla).find((s) => s.J2 === 3 && s.mJ2 === 1)!; // → |mL = 0, mS = +1/2⟩
    const d = fineStructureShiftSlopes(na3p, st, tesla);
    close(d.gS, muB_h.mul(tesla).div(2), "1e-3", "gS");
    expect(d.gL.abs().div(muB_h.mul(tesla)).lt("1e-3")).toBe(true);
  });
});

describe("slopes of the fitted spin–orbit constant", () => {
  it("are ∓2/3 for a doublet P term: ζ = (2/3)(E_3/2 − E_1/2) (interval rule, textbook)", () => {
    const s = spinOrbitSlopes(na3p)!;
    close(s.get(1)!, dec("-2").div(3), "1e-50", "E_1/2");
    close(s.get(3)!, dec("2").div(3), "1e-50", "E_3/2");
  });

  it("equal re-fitting with one energy moved, for the three-level O I 3P term", async () => {
    const { fitSpinOrbit } = await import("../../../src/physics/field/fineStructure.js");
    const s = spinOrbitSlopes(oxygen)!;
    const h = new Dec("1e6");
    for (const p of oxygen.partners) {
      const moved = (x: Dec) => fitSpinOrbit({ ...oxygen, partners: oxygen.partners.map((q) => (q.J2 === p.J2 ? { J2: q.J2, energy: q.energy.add(x) } : q)) }).zeta!;
      close(s.get(p.J2)!, moved(h).sub(moved(h.neg())).div(h.mul(2)), "1e-40", `E(J = ${p.J2 / 2})`);
    }
  });
});
