/**
 * Shapes of the field calculator: the engine data the build writes per
 * species (plain JSON, decimals as strings), and the answer at one field.
 * The answer has the keys of the JSON export's `field_table` and `at_fields`
 * entries (src/site/exportJson.ts): numbers (N = number) from the float64
 * engine, decimal strings (N = string) from the exact `npm run at`.
 */
import type { Multipole, Polarization } from "../physics/linePattern.js";
import type { LineModel } from "../results/lineModel.js";
import type { Regime } from "../results/fieldTypes.js";

export const ENGINE_FORMAT = "sublevel-atlas/engine@1";

/** One level as the engine needs it: the hyperfine–Zeeman solver's inputs and the regime limits. */
export interface EngineLevel {
  id: string;
  /** Doubled J and I (I2 = 0: no hyperfine structure in the solver). */
  J2: number;
  I2: number;
  /** gJ, gI, A/h (Hz), B/h (Hz), as decimal strings: the solver's own inputs (computeFields' solverLevel). */
  gJ: string;
  gI: string;
  A: string;
  B: string;
  /** Field (T) up to which the linear shifts are within 1 % (validity.ts), or null (no limit). */
  linearUpToT: string | null;
  /** Hyperfine Paschen–Back scale (T), or null. */
  paschenBackT: string | null;
  /** The level's term symbol typeset as the tables' captions write it (termText), e.g. "²P°₃/₂". */
  term: string;
  /** Key of the treated fine-structure term the level belongs to, or null. */
  fineStructureTerm: string | null;
  /** Doubled S and L (ordinary integer) of the level's term; null for a level outside LS coupling (jK, jj). */
  S2: number | null;
  L: number | null;
  /**
   * The level's sublevel transitions as the build lists them
   * (sublevelTransitionPairs): indices of the lower and upper sublevel in
   * the solver's (F, mF) order, and the kind. Empty without hyperfine structure.
   */
  transitions: { lo: number; up: number; kind: "magnetic-dipole" | "two-photon" }[];
  /** Signed first-order contributions (∂x/∂input)·u(input), by input key (results/inputUncertainties.ts), of the solver inputs gJ, gI, A, B and the level energy; only non-zero ones. Absent in data of older builds. */
  u?: { gJ?: Parts; gI?: Parts; A?: Parts; B?: Parts; energy?: Parts };
}

/** Signed contributions (∂x/∂input)·u(input) of one engine input, by input key, as decimal strings; only non-zero ones. */
export type Parts = Record<string, string>;

/**
 * A term whose fine-structure partners are all listed: with each partner
 * level's own entry (J, I, gJ, gI, A, B) these are the term solver's inputs
 * (termHyperfineZeeman.ts; computeFields' termProblem), and the regime limits.
 */
export interface EngineTerm {
  key: string;
  S2: number;
  L: number;
  /** Partner levels: id, doubled J, energy (Hz, decimal string). */
  partners: { level: string; J2: number; energy: string }[];
  gL: string;
  gS: string;
  /** First field (T) where the J-resolved linear pattern is off by 1 %, or null. */
  limitT: string | null;
  /** Fine-structure Paschen–Back scale (T), or null. */
  paschenBackT: string | null;
  /** Contributions to gL (through the mass) and gS (through g_e), as EngineLevel.u. */
  u?: { gL?: Parts; gS?: Parts };
}

/** One component of the J-resolved linear pattern (the model used when no level of the line mixes). */
export interface EngineLinearComponent {
  mu2: number;
  ml2: number;
  deltaM: number;
  polarization: Polarization;
  /** Exact strength as a fraction "p/q" (or an integer). */
  strength: string;
  /** Shift per tesla, Hz/T (decimal string). */
  shiftHzPerT: string;
}

export interface EngineLine {
  id: string;
  upper: string;
  lower: string;
  multipole: Multipole;
  /** Multipole rank k. */
  k: number;
  /** Both levels have hyperfine structure in the build's sense (computeFields' hyperfineConstants). */
  hyperfineBoth: boolean;
  /** Line frequency c/λ (the zero-field, hyperfine-free line centre), Hz, as a decimal string; null without a wavelength. Absent in data of older builds (read as null). */
  frequencyHz?: string | null;
  /** Contributions to frequencyHz (through the line's wavelength), as EngineLevel.u. */
  u?: { frequencyHz?: Parts };
  linear: EngineLinearComponent[];
}

/** Everything the float64 engine needs for one species; JSON-able. */
export interface EngineData {
  format: typeof ENGINE_FORMAT;
  id: string;
  label: string;
  /** Constants edition name and the μB/h (Hz/T) taken from it. */
  constants: string;
  muB_h: string;
  /** Contributions to muB_h (its CODATA uncertainty), as EngineLevel.u. */
  muB_h_u?: Parts;
  /** The build's configured bias fields, as written and in tesla. */
  fields: { text: string; tesla: string }[];
  levels: EngineLevel[];
  terms: EngineTerm[];
  lines: EngineLine[];
}

export interface AtState<N> {
  F: string;
  mF: string;
  E_Hz: N;
  /** Standard uncertainty of E_Hz (exact path only, `npm run at`; null when exact). */
  E_Hz_u?: N | null;
  /** Float64 calculator only (engineUncertainty.ts): true when E_Hz_u is a float-resolution bound, not a resolved value. */
  E_Hz_u_float?: boolean;
  high_field: { mJ: string; mI: string };
}

export interface AtTransition<N> {
  level: string;
  lower: { F: string; mF: string };
  upper: { F: string; mF: string };
  kind: "magnetic-dipole" | "two-photon";
  Hz: N;
  /** Standard uncertainty of Hz (exact path only; null when exact). */
  Hz_u?: N | null;
  /** As AtState.E_Hz_u_float. */
  Hz_u_float?: boolean;
}

export interface AtComponent<N> {
  upper: string;
  lower: string;
  delta_m: number;
  polarization: Polarization;
  relative_strength: N;
  shift_Hz: N;
  /** Standard uncertainties of shift_Hz and frequency_Hz (exact path only; null when exact). */
  shift_Hz_u?: N | null;
  frequency_Hz_u?: N | null;
  /** As AtState.E_Hz_u_float. */
  shift_Hz_u_float?: boolean;
  frequency_Hz_u_float?: boolean;
  /** Absolute frequency of the component, the line frequency c/λ + shift_Hz; null when the line has no wavelength. */
  frequency_Hz: N | null;
}

export interface AtLine<N> {
  id: string;
  model: LineModel;
  regime: Regime;
  components: AtComponent<N>[];
}

/** Every number of a species at one field. */
export interface AtResult<N> {
  B_T: N;
  levels: { id: string; states: AtState<N>[] }[];
  transitions: AtTransition<N>[];
  lines: AtLine<N>[];
}
