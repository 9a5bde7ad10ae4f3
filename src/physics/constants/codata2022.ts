/**
 * CODATA 2022 recommended values, the ones Sublevel Atlas needs.
 *
 * Reference: P. J. Mohr, D. B. Newell, B. N. Taylor and E. Tiesinga,
 * "CODATA recommended values of the fundamental physical constants: 2022",
 * as released by the NIST Physical Measurement Laboratory (2024).
 * test/physics/constants/codata2022.test.ts checks every value against
 * scipy.constants (which carries CODATA 2022 from scipy 1.15 on) through
 * the fixture test/fixtures/codata2022-scipy.json.
 */
import { ConstantsEdition, defineConstant } from "./constant.js";

const REF = "CODATA 2022 recommended values (Mohr, Newell, Taylor, Tiesinga; NIST, 2024)";

export const CODATA_2022: ConstantsEdition = Object.freeze({
  edition: "CODATA 2022",
  reference: REF,
  muB_h: defineConstant({
    key: "muB_h",
    name: "Bohr magneton in Hz/T",
    symbol: "μB/h",
    value: "13996244917.1",
    uncertainty: "4.4",
    unit: "Hz T^-1",
    reference: REF,
  }),
  muB_hc: defineConstant({
    key: "muB_hc",
    name: "Bohr magneton in inverse meter per tesla",
    symbol: "μB/(hc)",
    value: "46.686447719",
    uncertainty: "0.000000015",
    unit: "m^-1 T^-1",
    reference: REF,
  }),
  muB_eV: defineConstant({
    key: "muB_eV",
    name: "Bohr magneton in eV/T",
    symbol: "μB",
    value: "0.000057883817982",
    uncertainty: "0.000000000000018",
    unit: "eV T^-1",
    reference: REF,
  }),
  muB_k: defineConstant({
    key: "muB_k",
    name: "Bohr magneton in K/T",
    symbol: "μB/k",
    value: "0.67171381472",
    uncertainty: "0.00000000021",
    unit: "K T^-1",
    reference: REF,
  }),
  g_e: defineConstant({
    key: "g_e",
    name: "electron g factor",
    symbol: "g_e",
    value: "-2.00231930436092",
    uncertainty: "0.00000000000036",
    unit: "1",
    reference: REF,
  }),
  m_e_u: defineConstant({
    key: "m_e_u",
    name: "electron mass in u",
    symbol: "m_e",
    value: "0.0005485799090441",
    uncertainty: "0.0000000000000097",
    unit: "u",
    reference: REF,
  }),
  m_e_m_p: defineConstant({
    key: "m_e_m_p",
    name: "electron-proton mass ratio",
    symbol: "m_e/m_p = μN/μB",
    value: "0.0005446170214889",
    uncertainty: "0.0000000000000094",
    unit: "1",
    reference: REF,
  }),
  muN_h: defineConstant({
    key: "muN_h",
    name: "nuclear magneton in MHz/T",
    symbol: "μN/h",
    value: "7.6225932188",
    uncertainty: "0.0000000024",
    unit: "MHz T^-1",
    reference: REF,
  }),
  c: defineConstant({
    key: "c",
    name: "speed of light in vacuum",
    symbol: "c",
    value: "299792458",
    uncertainty: "0",
    unit: "m s^-1",
    reference: REF + "; exact in the SI",
  }),
  h: defineConstant({
    key: "h",
    name: "Planck constant",
    symbol: "h",
    value: "6.62607015e-34",
    uncertainty: "0",
    unit: "J Hz^-1",
    reference: REF + "; exact in the SI",
  }),
});
