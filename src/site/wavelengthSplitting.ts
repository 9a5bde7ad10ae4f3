/**
 * Zeeman splittings of a line in wavelength units, for the line page and the
 * export: one Lorentz unit per tesla (LineResult.lorentzDlambdaPerT) and the
 * separation of the σ+ and σ− centroids at a field.
 */
import type { Dec } from "../physics/decimal.js";
import type { LineResult } from "../results/types.js";

/** pm per m; 1 pm/T is also 1 mÅ/kG. */
export const PM = "1e12";

/**
 * Separation (m) of the strength-weighted centroids of the σ+ and σ−
 * components at a field B (T): each centroid sits g_eff Lorentz units from
 * the line centre (g_eff is their first moment), so the separation is
 * 2·|g_eff|·λ²·μB/(hc)·B. Linear Zeeman pattern of the J-resolved line
 * (weak field, hyperfine structure not resolved). Null without a
 * wavelength, and for E2 lines (no g_eff).
 */
export function sigmaCentroidSeparation(ln: Pick<LineResult, "gEff" | "lorentzDlambdaPerT">, tesla: Dec): Dec | null {
  if (ln.gEff === null || ln.lorentzDlambdaPerT === null) return null;
  return ln.gEff.abs().mul(2).mul(ln.lorentzDlambdaPerT).mul(tesla);
}
