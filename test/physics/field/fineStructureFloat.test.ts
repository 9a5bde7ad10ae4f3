import { O_2P4_3P } from "./levels.js";
import { describe, expect, it } from "vitest";
import { dec } from "../../../src/physics/decimal.js";
import { toSI } from "../../../src/physics/units.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import { val } from "../../../src/physics/constants/constant.js";
import { orbitalG } from "../../../src/physics/lande.js";
import { solveFineStructure, type FineStructureTerm } from "../../../src/physics/field/fineStructure.js";
import { fineStructureFloatSolver } from "../../../src/physics/field/fineStructureFloat.js";

const muB_h = val(CODATA_2022.muB_h);
const gS = val(CODATA_2022.g_e).neg();
// Na 3p 2P1/2 and 2P3/2 level energies: NIST ASD (Juncar et al. 1981), from memory.
const na3p: FineStructureTerm = {
  S2: 1,
  L: 1,
  partners: [
    { J2: 1, energy: toSI(dec("16956.1702"), "cm-1") },
    { J2: 3, energy: toSI(dec("16973.3661"), "cm-1") },
  ],
  // 23Na atomic mass 22.9897692820 u: AME2020, from memory.
  gL: orbitalG(dec("22.9897692820"), val(CODATA_2022.m_e_u)),
  gS,
  muB_h,
};
// O I 2p⁴ ³P (NIST ASD, from memory; levels.ts): three partners, 3×3 blocks, no interval rule.
const oxygen = O_2P4_3P;

describe("fineStructureFloatSolver", () => {
  // The reference is the 60-digit Dec solver, itself checked against the mpmath fixture in fineStructure.test.ts.
  for (const [name, term] of [
    ["Na 3p", na3p],
    ["O 2p4 3P", oxygen],
  ] as const) {
    it(`gives the shifts and labels of the Dec solver for ${name} from weak to strong field`, () => {
      const solve = fineStructureFloatSolver(term);
      for (const B of ["0", "0.01", "0.5", "3", "-2", "100"]) {
        const exact = solveFineStructure(term, dec(B));
        const got = solve(Number(B));
        expect(got).toHaveLength(exact.length);
        // the largest matrix entry bounds the float64 rounding (common practice)
        const scale = 1e12 + Math.abs(muB_h.toNumber() * Number(B)) * 3;
        for (const s of exact) {
          const f = got.find((x) => x.J2 === s.J2 && x.mJ2 === s.mJ2)!;
          expect(f, `J2=${s.J2} mJ2=${s.mJ2}`).toBeDefined();
          expect(Math.abs(f.shift - s.shift.toNumber())).toBeLessThan(1e-13 * scale);
          expect(f.blockSize).toBe(s.uncoupled.length);
        }
      }
    });
  }
});
