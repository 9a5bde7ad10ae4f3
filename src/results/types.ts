/**
 * Computed results of one species: what the site pages and the JSON export
 * are made from. Plain data; no formatting decisions here.
 */
import type { Dec } from "../physics/decimal.js";
import type { Rational } from "../physics/rational.js";
import type { PatternComponent } from "../physics/linePattern.js";
import type { LevelInput, LineInput, SpeciesInput } from "../data/model.js";

export interface SublevelShift {
  /** Doubled m (mJ or mF). */
  m2: number;
  /** Linear shift, Hz/T. */
  shiftHzPerT: Dec;
  /** Its standard uncertainty, Hz/T (results/linearUncertainties.ts); null when exact. */
  shiftHzPerTU?: Dec | null;
}

export interface HyperfineLevelResult {
  /** Doubled F. */
  F2: number;
  /** gF, null for F = 0. */
  gF: Dec | null;
  gFU?: Dec | null;
  /** Zero-field energy relative to the level centre, Hz. */
  zeroFieldHz: Dec;
  zeroFieldHzU?: Dec | null;
  sublevels: SublevelShift[];
}

export interface LevelResult {
  input: LevelInput;
  /** Doubled J. */
  J2: number;
  /** g in use: measured if given, else LS with gL = 1 − m_e/M and gS = −g_e; null for J = 0. */
  gJ: Dec | null;
  /**
   * Standard uncertainties (…U, same unit as the value) are filled by
   * results/linearUncertainties.ts for every result of computeSpecies;
   * null: exact, or no input with an uncertainty.
   */
  gJU?: Dec | null;
  /** Measured, or the coupling formula of the level's scheme (LS, jK, jj), or none for J = 0. */
  gJFrom: "measured" | "LS" | "jK" | "jj" | "none";
  /** Value from the level's coupling formula (LS, or jK / jj for levels written so) with the physical gL, gS (shown beside a measured one). */
  gJLS: Dec | null;
  gJLSU?: Dec | null;
  /** The same formula with gL = 1, gS = 2, exact. */
  gJExact: Rational | null;
  /**
   * A measured gJ differs from the coupling formula's value by more than 1 %
   * (intermediate coupling): the exact pattern notation then describes the
   * coupling limit, not the atom.
   */
  gJDiffers: boolean;
  sublevels: SublevelShift[];
  /** Empty without nuclear spin. */
  hyperfine: HyperfineLevelResult[];
}

export interface LineResult {
  input: LineInput;
  upper: LevelResult;
  lower: LevelResult;
  /** Multipole rank. */
  k: number;
  /** Effective Landé factor; null for lines of rank 2 or 3 (E2, M2, E3; gEffNote says why). */
  gEff: Dec | null;
  gEffU?: Dec | null;
  /** Standard uncertainty of G, the second-order effective Landé factor (results/observation.ts; rank 1 only), from the g values in use. */
  GU?: Dec | null;
  /** Why gEff is null, for the pages; null when it is given. */
  gEffNote: string | null;
  /** Classical notation from exact LS g values (rank 2 and 3: the |Δm| = 1 shifts, then after a semicolon each further |Δm|); null only for a rank below 1. */
  pattern: string | null;
  summary: string;
  /** With shiftLorentzU and shiftHzPerTU (standard uncertainties of shiftLorentz and shiftHzPerT) filled by linearUncertainties.ts. */
  components: (PatternComponent & { shiftLorentzU?: Dec | null; shiftHzPerTU?: Dec | null })[];
  /** Line frequency c/λ (Hz) when a wavelength is given. */
  frequencyHz: Dec | null;
  frequencyHzU?: Dec | null;
  /** Wavelength shift of one Lorentz unit per tesla, λ_vac²·μB/(hc) (m/T), when a wavelength is given (physics/airWavelength.ts). */
  lorentzDlambdaPerT: Dec | null;
  lorentzDlambdaPerTU?: Dec | null;
}

export interface SpeciesResult {
  input: SpeciesInput;
  gL: Dec;
  gLU?: Dec | null;
  gS: Dec;
  gSU?: Dec | null;
  /** gI in use (atomic sign convention), null without nucleus. */
  gI: Dec | null;
  gIU?: Dec | null;
  gIFrom: "gI" | "moment" | null;
  /** Doubled nuclear spin, 0 without nucleus. */
  I2: number;
  levels: LevelResult[];
  lines: LineResult[];
}
