/**
 * The validated input: what src/data hands to the physics. Every number is
 * a Dec made from the source text, converted to SI (Hz, T, m, u) where it
 * carries a unit. Quantum numbers are doubled integers (see physics/quantum.ts).
 */
import type { Dec } from "../physics/decimal.js";
import type { Multipole } from "../physics/linePattern.js";

export interface SourcePos {
  file: string;
  line: number;
  column: number;
}

/** A measured number: value, standard uncertainty if given, and the text it came from. */
export interface Measured {
  value: Dec;
  uncertainty: Dec | null;
  /** The text as written in the file, e.g. "2.00233113(20)". */
  text: string;
}

/** A quantity with a unit, converted to SI. */
export interface Quantity extends Measured {
  /** Unit as written. */
  unit: string;
  /** Value in Hz, T, m or u. */
  si: Dec;
  /** Uncertainty in Hz, T, m or u. */
  siUncertainty: Dec | null;
}

/** An LS term symbol, e.g. "2Po3/2". */
export interface LSTerm {
  scheme: "LS";
  /** As written, e.g. "2Po3/2". */
  text: string;
  /** 2S+1 */
  multiplicity: number;
  /** Doubled S. */
  S2: number;
  /** Orbital L (integer, not doubled). */
  L: number;
  /** Letter as written, upper case: S, P, D, ... */
  letter: string;
  /** Doubled J. */
  J2: number;
  /** "odd" when the term carries a parity mark (o or °), else null (unmarked). */
  parity: "odd" | null;
}

/**
 * A jK (pair-coupled) level, written (2s+1)[K]J, e.g. "2[3/2]o2": the core's
 * parent term (its j1), the outer electron's l, K = j1 + l, J = K + s.
 */
export interface JKTerm {
  scheme: "jK";
  /** As written, e.g. "2[3/2]o2". */
  text: string;
  /** 2s+1 of the outer electron (always 2). */
  multiplicity: number;
  /** Doubled K. */
  K2: number;
  /** The core's parent term (LS), whose J is j1. */
  core: LSTerm;
  /** Orbital l of the outer electron. */
  l: number;
  /** Doubled J. */
  J2: number;
  parity: "odd" | null;
}

/** A jj-coupled pair of electrons, written (j1,j2)J, e.g. "(3/2,1/2)1". */
export interface JJTerm {
  scheme: "jj";
  /** As written, e.g. "(3/2,1/2)1". */
  text: string;
  /** Doubled j of each electron. */
  j2s: [number, number];
  /** Orbital l of each electron. */
  l: [number, number];
  /** Doubled J. */
  J2: number;
  parity: "odd" | null;
}

/** A level's term: LS, jK or jj coupling. S2, L and letter exist for LS terms only. */
export type TermSymbol = LSTerm | JKTerm | JJTerm;

/** The LS term of a level, or null when the level is written in another coupling scheme. */
export function lsTerm(t: TermSymbol): LSTerm | null {
  return t.scheme === "LS" ? t : null;
}

export interface HyperfineInput {
  /** Magnetic-dipole constant A as a frequency (Hz). */
  A: Quantity;
  /** Electric-quadrupole constant B as a frequency (Hz); zero when absent. */
  B: Quantity | null;
}

export interface LevelInput {
  id: string;
  config: string;
  term: TermSymbol;
  /** Measured gJ; overrides the LS value. */
  gJ: Measured | null;
  hyperfine: HyperfineInput | null;
  /** Level energy above the species' ground level, as a frequency (Hz); needed for fine-structure partners. */
  energy: Quantity | null;
  source: string;
  notes: string | null;
  pos: SourcePos;
}

export interface NucleusInput {
  /** Doubled nuclear spin I. */
  I2: number;
  /** gI in Bohr magnetons, atomic sign convention (H = μB·gI·I·B). Exactly one of gI, moment is set. */
  gI: Measured | null;
  /** Nuclear magnetic moment in nuclear magnetons (signed), the alternative to gI. */
  moment: Measured | null;
  source: string | null;
}

/** The multipoles a line may be (one list, in src/physics/linePattern.ts). */
export type { Multipole };

export interface LineInput {
  id: string;
  upper: string;
  lower: string;
  /** Vacuum wavelength (m), if given; converted from air when the file gives it in air. */
  wavelength: Quantity | null;
  /** The medium the file gives the wavelength in (vacuum when not said). */
  medium: "vacuum" | "air";
  /** Wavelength in standard air (m), given or converted; null without a wavelength or outside the air formula's range (physics/airWavelength.ts). */
  airWavelength: Quantity | null;
  multipole: Multipole;
  source: string | null;
  notes: string | null;
  pos: SourcePos;
}

export interface SpeciesInput {
  id: string;
  label: string;
  /** Atomic mass in u, if given. */
  mass: Quantity | null;
  nucleus: NucleusInput | null;
  levels: LevelInput[];
  lines: LineInput[];
  notes: string | null;
  /** Path of the file, relative to the data folder. */
  file: string;
}

export interface FieldInput {
  /** As written, e.g. "10 G". */
  text: string;
  /** Field in tesla. */
  tesla: Dec;
}

export interface SiteInput {
  title: string;
  /** Lab or group name shown in headers and on printed sheets. */
  lab: string | null;
  /** Bias fields to tabulate, ascending, duplicates (by value) merged. */
  fields: FieldInput[];
  /** Constants edition name, e.g. "CODATA 2022". */
  constants: string;
  /** Base URL of the hosted site, printed on cheat sheets; null if not set. */
  siteUrl: string | null;
  /** Path prefix when hosted under a sub-path, e.g. "/atlas/"; "/" by default. */
  pathPrefix: string;
}

export interface DataFolder {
  dir: string;
  site: SiteInput;
  species: SpeciesInput[];
  /** Hash of every file in the data folder (sha-256, hex, first 12). */
  dataVersion: string;
}
