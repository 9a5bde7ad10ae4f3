/** Physics inputs shared by the field tests, as published text. */
import { dec } from "../../../src/physics/decimal.js";
import { val } from "../../../src/physics/constants/constant.js";
import { CODATA_2022 } from "../../../src/physics/constants/codata2022.js";
import type { HyperfineZeemanLevel } from "../../../src/physics/field/hyperfineZeeman.js";
import type { FineStructureTerm } from "../../../src/physics/field/fineStructure.js";
import { toSI } from "../../../src/physics/units.js";

export const muB_h = val(CODATA_2022.muB_h); // CODATA 2022

/** 87Rb 5²S1/2 — D. A. Steck, "Rubidium 87 D Line Data" (I, gJ, gI, A). */
export const RB87_5S: HyperfineZeemanLevel = {
  J2: 1,
  I2: 3,
  gJ: dec("2.00233113"),
  gI: dec("-0.0009951414"),
  A: dec("3417.341305452145e6"),
  B: dec("0"),
  muB_h,
};

/** 87Rb 5²P3/2 — D. A. Steck, "Rubidium 87 D Line Data" (A, B, gJ). */
export const RB87_5P32: HyperfineZeemanLevel = {
  J2: 3,
  I2: 3,
  gJ: dec("1.3362"),
  gI: dec("-0.0009951414"),
  A: dec("84.7185e6"),
  B: dec("12.4965e6"),
  muB_h,
};

/** 133Cs 6²S1/2 — D. A. Steck, "Cesium D Line Data". */
export const CS133_6S: HyperfineZeemanLevel = {
  J2: 1,
  I2: 7,
  gJ: dec("2.00254032"),
  gI: dec("-0.00039885395"),
  A: dec("2298.1579425e6"),
  B: dec("0"),
  muB_h,
};

/** 40K 4²S1/2 — E. Arimondo, M. Inguscio, P. Violino, Rev. Mod. Phys. 49, 31 (1977). */
export const K40_4S: HyperfineZeemanLevel = {
  J2: 1,
  I2: 8,
  gJ: dec("2.00229421"),
  gI: dec("0.000176490"),
  A: dec("-285.7308e6"),
  B: dec("0"),
  muB_h,
};

/**
 * 1H 2²P3/2, an I = 1/2 level with J > 1/2: A = 24.7 MHz (from memory),
 * gJ = 4/3 (LS value), gI = −0.003042 (proton moment 2.7928 μN, from memory).
 * Only used to compare two methods with each other.
 */
export const H1_2P32: HyperfineZeemanLevel = {
  J2: 3,
  I2: 1,
  gJ: dec("4").div(dec("3")),
  gI: dec("-0.003042"),
  A: dec("24.7e6"),
  B: dec("0"),
  muB_h,
};

/**
 * O I 2p⁴ ³P2, ³P1, ³P0 at 0, 158.265, 226.977 cm⁻¹ (NIST ASD, from memory):
 * an inverted triplet with 3×3 blocks that does not follow the interval rule.
 */
export const O_2P4_3P: FineStructureTerm = {
  S2: 2,
  L: 1,
  partners: [
    { J2: 4, energy: toSI(dec("0"), "cm-1") },
    { J2: 2, energy: toSI(dec("158.265"), "cm-1") },
    { J2: 0, energy: toSI(dec("226.977"), "cm-1") },
  ],
  gL: dec("1"),
  gS: val(CODATA_2022.g_e).neg(),
  muB_h,
};
