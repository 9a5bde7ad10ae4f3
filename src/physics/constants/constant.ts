/**
 * A physical constant as a frozen record that cannot exist without its
 * source. Values and uncertainties are kept as the exact text of the
 * published table so that nothing passes through binary floating point.
 */
import { Dec, dec } from "../decimal.js";

export interface Constant {
  /** Short key used in code and on the constants page, e.g. "muB_h". */
  readonly key: string;
  /** Name as the publishing table words it. */
  readonly name: string;
  /** Symbol for display, plain text. */
  readonly symbol: string;
  /** Value as published, decimal text. */
  readonly value: string;
  /** Standard uncertainty as published, decimal text; "0" for exact values. */
  readonly uncertainty: string;
  readonly unit: string;
  /** Where the number comes from; never empty. */
  readonly reference: string;
  /** True when the value is exact by definition of the SI. */
  readonly exact: boolean;
}

export function defineConstant(c: Omit<Constant, "exact">): Constant {
  if (!c.reference || !c.reference.trim()) throw new Error(`constant ${c.key} has no reference`);
  dec(c.value);
  dec(c.uncertainty);
  return Object.freeze({ ...c, exact: new Dec(c.uncertainty).isZero() });
}

/** One edition of a constants table: the constants the physics needs, by key. */
export interface ConstantsEdition {
  readonly edition: string;
  readonly reference: string;
  readonly muB_h: Constant;
  readonly muB_hc: Constant;
  readonly muB_eV: Constant;
  readonly muB_k: Constant;
  readonly g_e: Constant;
  readonly m_e_u: Constant;
  readonly m_e_m_p: Constant;
  readonly muN_h: Constant;
  readonly c: Constant;
  readonly h: Constant;
}

/** Value of a constant as a decimal. */
export function val(c: Constant): Dec {
  return new Dec(c.value);
}

/** All constants of an edition in a fixed display order. */
export function listConstants(e: ConstantsEdition): Constant[] {
  return [e.muB_h, e.muB_hc, e.muB_eV, e.muB_k, e.g_e, e.m_e_u, e.m_e_m_p, e.muN_h, e.c, e.h];
}
