/**
 * Field-dependent results: exact energies at the configured bias fields,
 * the worth of the linear numbers, sublevel transitions, fine-structure
 * Paschen–Back terms and line components at each field.
 */
import type { Dec } from "../physics/decimal.js";
import type { LinearValidity } from "../physics/field/validity.js";
import type { SublevelTransition } from "../physics/field/sublevelTransitions.js";
import type { FineStructureState, LinearLimit, SpinOrbitFit } from "../physics/field/fineStructure.js";
import type { HyperfineLineGroup } from "../physics/hyperfineLines.js";
import type { ReducedElementKind } from "../physics/field/lineAtField.js";
import type { HyperfineGroupU } from "./fieldUncertainty.js";
import type { Polarization } from "../physics/linePattern.js";
import type { QuadraticScope } from "./quadraticScope.js";

export interface ConfiguredField {
  text: string;
  tesla: Dec;
}

/** One sublevel across all configured fields. */
export interface FieldRow {
  F2: number;
  mF2: number;
  /** The uncoupled state it tends to at high field (mI2 = 0 without nuclear spin). */
  highField: { mJ2: number; mI2: number };
  /** Energy E/h (Hz) from the hyperfine-free level centre, one per configured field. */
  energies: Dec[];
  /**
   * Second-order coefficient (Hz/T²): the level's own hyperfine partners F′
   * plus its listed fine-structure partners J′ (see LevelFieldResult.quadratic
   * for which); null when perturbation theory fails (degenerate levels).
   */
  quadraticPerTesla2: Dec | null;
  /** Standard uncertainty of each of `energies` (Hz; null: exact), src/results/fieldUncertainty.ts. */
  energiesU?: (Dec | null)[];
  /** Standard uncertainty of `quadraticPerTesla2` (Hz/T²; null: exact or no coefficient). */
  quadraticU?: Dec | null;
}

/**
 * Standard uncertainties of one sublevel transition's numbers (same units as
 * SublevelTransition; null: exact). A field-insensitive point whose
 * uncertainty could not be propagated (B = 0 reached only by an accidental
 * cancellation of first-order slopes) says so with `propagated: false`.
 */
export interface TransitionUncertainty {
  zeroFieldHz: Dec | null;
  firstOrderHzPerTesla: Dec | null;
  secondOrderHzPerTesla2: Dec | null;
  atFields: (Dec | null)[];
  fieldInsensitive: { tesla: Dec | null; hz: Dec | null; propagated: boolean }[];
}

/**
 * Which solver gave a level's field table, transitions, plots and line
 * states: the level alone (hyperfineZeeman.ts, |mJ mI⟩ of its J), or its
 * term with the listed fine-structure partners (termHyperfineZeeman.ts,
 * |J mJ mI⟩ over the listed J; hyperfine matrix elements between different
 * J not included).
 */
export type LevelSolver =
  | { kind: "single-J" }
  | {
      kind: "term";
      /** Term key, e.g. "5p 2P°". */
      term: string;
      /** The other listed levels of the term, by id. */
      partners: string[];
      /** Doubled J of every listed level of the term (the basis), ascending. */
      J2s: number[];
    };

export interface LevelFieldResult {
  /** The solver behind rows, transitions, plot and the level's line states. */
  solver: LevelSolver;
  rows: FieldRow[];
  /** Species with nuclear spin: whether the level lists hyperfine constants (false: A = B = 0 used); null without nuclear spin. */
  hyperfineListed: boolean | null;
  /** What the second-order coefficients of `rows` include (src/results/quadraticScope.ts). */
  quadratic: { scope: QuadraticScope; included: string[]; missingJ2: number[]; /** Set for a level outside LS coupling, whose partners are not treated. */ notLS?: "jK" | "jj" };
  /** Where the linear numbers of this J hold (single-J solver, information); null for a level without hyperfine structure. */
  validity: LinearValidity | null;
  transitions: SublevelTransition[];
  /** Standard uncertainties of `transitions`, same order. */
  transitionsU?: TransitionUncertainty[];
  /** Upper end of the field-insensitive search of `transitions`, T: max(1 T, twice the largest configured field). */
  insensitiveSearchTesla: Dec;
  /** Energies for the plots (float64, plot-only): sample fields (T) and one energy list per row. */
  plot: { linear: { fields: Dec[]; energies: number[][] }; log: { fields: Dec[]; energies: number[][] } } | null;
}

/** The fine-structure partners of one LS term treated together (Paschen–Back). */
export interface TermFieldResult {
  /** Key: configuration and term without J, e.g. "3p 2P°". */
  key: string;
  config: string;
  levelIds: string[];
  S2: number;
  L: number;
  fit: SpinOrbitFit;
  /** First field where the J-resolved linear pattern is off by more than 1 %. */
  limit: LinearLimit | null;
  /** States at each configured field. */
  atFields: FineStructureState[][];
  /** Standard uncertainty (Hz) of each state's shift at each field (same order; null when exact). */
  atFieldsU?: (Dec | null)[][];
  /** Standard uncertainty (Hz) of the fitted ζ, from the partners' energies; null when exact or without ζ. */
  zetaU?: Dec | null;
  /** Field scale of the fine-structure Paschen–Back regime: largest interval / (μB/h). */
  paschenBackTesla: Dec | null;
}

export type Regime = "zero field" | "linear Zeeman" | "intermediate" | "Paschen–Back";

export interface LineComponentAtField {
  upperLabel: string;
  lowerLabel: string;
  q: number;
  polarization: Polarization;
  /** Relative strength, sums to 1 over the line at this field. */
  strength: Dec;
  /** Frequency offset from the zero-field line centre (hyperfine-free), Hz. */
  shiftHz: Dec;
  /** Standard uncertainty of `shiftHz` (Hz; null: exact). */
  shiftHzU?: Dec | null;
  /**
   * The fine-structure state labels ("J=3/2, mJ=1/2") under which builds
   * before the term solver listed this component (the strongest one of its
   * high-field pair mJ → mJ′), so that links to those rows still land; absent
   * elsewhere. Pages only: not exported.
   */
  aliasLabels?: { upper: string; lower: string };
}

export interface LineAtFieldResult {
  field: ConfiguredField;
  regime: Regime;
  /**
   * Which states the components come from (src/results/lineModel.ts): the
   * term solver's for a level whose fine-structure partners are listed
   * ("term …"), the single-J hyperfine–Zeeman solver's otherwise, or the
   * J-resolved linear pattern (no nuclear spin, no partners).
   */
  model: "term hyperfine–Zeeman eigenstates" | "term Zeeman eigenstates" | "hyperfine–Zeeman eigenstates" | "J-resolved linear pattern";
  /** With the term models: the reduced elements between the J of the terms (lineModel.ts); absent otherwise (one J pair). */
  reduced?: ReducedElementKind;
  components: LineComponentAtField[];
}

export interface LineFieldResult {
  atFields: LineAtFieldResult[];
  /** Weak-field hyperfine-resolved pattern (both levels with hyperfine structure), else null. */
  hyperfine: HyperfineLineGroup[] | null;
  /**
   * Standard uncertainty (Hz; null: exact) of each hyperfine group offset and
   * lock point offset, by fieldUncertainty.lockKey(Fl2s, Fu2s); a group is the
   * lock point with one F on each side. A crossover's pair spacing is under
   * "spacing " + lockKey.
   */
  hyperfineOffsetU?: Map<string, Dec | null>;
  /** Standard uncertainties of each hyperfine group's gF values and components' shifts (Hz/T), in the order of `hyperfine`. */
  hyperfineU?: HyperfineGroupU[];
}
