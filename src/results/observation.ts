/**
 * What an observer sees of a line: the second-order effective Landé factor
 * G (dipole lines) and each component's angular factor F_kq(θ) at the two
 * views that are pre-rendered and exported, θ = 0 (along the field) and
 * θ = 90° (across it). The relative intensity of a component seen at θ is
 * its strength times F_kq(θ) (src/physics/angularFactor.ts).
 */
import { angularCoefficients, angularFactorAt, fractionText, type Fraction } from "../physics/angularFactor.js";
import type { Dec } from "../physics/decimal.js";
import { Rational } from "../physics/rational.js";
import { G_NOT_DEFINED_NOTE, secondOrderLande, secondOrderLandeExact } from "../physics/secondOrderLande.js";
import type { LineResult } from "./types.js";

export interface LineSecondOrder {
  /** G with the g values in use (measured where given); null above rank 1. */
  G: Dec | null;
  /** Its standard uncertainty from the g values' (results/linearUncertainties.ts); null when exact or above rank 1. */
  GU: Dec | null;
  /** G from the exact LS g values; null above rank 1. */
  GExact: Rational | null;
  /** Why G is null, for the pages; null when it is given. */
  GNote: string | null;
}

/** G of a line (rank 1 only; otherwise nulls and the note). */
export function lineSecondOrder(ln: LineResult): LineSecondOrder {
  if (ln.k !== 1) return { G: null, GU: null, GExact: null, GNote: G_NOT_DEFINED_NOTE };
  return {
    G: secondOrderLande({ J2: ln.upper.J2, g: ln.upper.gJ }, { J2: ln.lower.J2, g: ln.lower.gJ }),
    GU: ln.GU ?? null,
    GExact: secondOrderLandeExact({ J2: ln.upper.J2, g: ln.upper.gJExact }, { J2: ln.lower.J2, g: ln.lower.gJExact }),
    GNote: null,
  };
}

const ALONG: Fraction = [1n, 1n]; // cos²0 = 1
const ACROSS: Fraction = [0n, 1n]; // cos²90° = 0

function rational(f: Fraction): Rational {
  return Rational.of(f[0], f[1]);
}

/** F_kq at θ = 0 and θ = 90°, exact, for a component with Δm = q of a line of rank k. */
export function viewFactors(k: number, q: number): { along: Rational; across: Rational } {
  return { along: rational(angularFactorAt(k, q, ALONG)), across: rational(angularFactorAt(k, q, ACROSS)) };
}

/** The coefficients of F_kq in powers of cos²θ for each |Δm| the line has, as fraction strings, keyed by |Δm|. */
export function angularCoefficientTexts(ln: LineResult): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  const qs = [...new Set(ln.components.map((c) => Math.abs(c.deltaM)))].sort((a, b) => a - b);
  for (const q of qs) out[String(q)] = angularCoefficients(ln.k, q).map(fractionText);
  return out;
}
