/**
 * Wavelengths in standard air and in vacuum, and Zeeman splittings in
 * wavelength units.
 *
 * Standard air is dry air at 15 °C and 101 325 Pa (with the usual small CO2
 * content). Its refractive index follows Edlén (1966) with the constants as
 * revised by Birch & Downs (1994), the form adopted as the IAU standard
 * conversion by D. C. Morton, ApJS 130, 403 (2000), eq. (3):
 *
 *   n − 1 = 8.34254e-5 + 2.406147e-2/(130 − σ²) + 1.5998e-4/(38.9 − σ²),
 *   σ = 1/λ_vac in µm⁻¹ (the vacuum wavenumber),
 *
 * and λ_air = λ_vac / n. The constants are quoted from memory of the
 * published formula. The formula is an empirical fit: it is not exact; it
 * holds to about 1e-8 in n against the measurements it was fitted to,
 * between about 200 nm and 2 µm; outside that range this module gives no
 * air wavelength.
 */
import { Dec, ONE } from "./decimal.js";

/** Shortest vacuum wavelength (m) for which the air formula is used. */
export const AIR_FORMULA_MIN_M = new Dec("2e-7");
/** Longest vacuum wavelength (m) for which the air formula is used. */
export const AIR_FORMULA_MAX_M = new Dec("2e-6");
/** The formula's name, as the pages print it. */
export const AIR_FORMULA_NAME = "Edlén (1966) as revised by Birch & Downs (1994), the IAU standard of Morton (2000, ApJS 130, 403)";

const C0 = new Dec("8.34254e-5");
const C1 = new Dec("2.406147e-2");
const D1 = new Dec("130");
const C2 = new Dec("1.5998e-4");
const D2 = new Dec("38.9");
const UM = new Dec("1e-6");

/** Whether a vacuum (or air: the two differ by 3e-4) wavelength in metres lies in the formula's range. */
export function inAirFormulaRange(lambdaM: Dec): boolean {
  return lambdaM.gte(AIR_FORMULA_MIN_M) && lambdaM.lte(AIR_FORMULA_MAX_M);
}

/**
 * Refractive index n of standard air at the vacuum wavelength λ_vac (m),
 * by the formula in the module comment (not exact: an empirical fit, valid
 * 200 nm – 2 µm; throws outside that range).
 *
 * Worked example: λ_vac = 630 nm gives σ² = 2.519 526… µm⁻², and
 * n − 1 = 8.34254e-5 + 1.887 46…e-4 + 4.397 4…e-6 = 2.765 69…e-4.
 */
export function airRefractiveIndex(vacuumM: Dec): Dec {
  if (!inAirFormulaRange(vacuumM)) throw new RangeError(`vacuum wavelength ${vacuumM.toString()} m is outside the range of the air formula (200 nm to 2 µm)`);
  const sigma2 = ONE.div(vacuumM.div(UM)).pow(2);
  return ONE.plus(C0).plus(C1.div(D1.minus(sigma2))).plus(C2.div(D2.minus(sigma2)));
}

/**
 * Air wavelength λ_air = λ_vac / n(λ_vac) (m), standard air; same validity
 * and exactness as airRefractiveIndex.
 *
 * Worked example: λ_vac = 589.1583 nm (Na D2) gives λ_air = 588.995 06 nm.
 */
export function vacuumToAir(vacuumM: Dec): Dec {
  return vacuumM.div(airRefractiveIndex(vacuumM));
}

/**
 * Vacuum wavelength (m) of an air wavelength (m), standard air: the
 * solution of λ_vac = λ_air · n(λ_vac), by fixed-point iteration from
 * λ_vac = λ_air. Each step gains about the factor dn/dλ·λ ≈ 1e-5, so a few
 * steps reach the working precision; the result inverts vacuumToAir to
 * better than 1e-40 relative (the formula itself is not exact, see above).
 * Valid where λ_air is in 200 nm – 2 µm (throws outside).
 *
 * Worked example: λ_air = 630.2494 nm (Fe I) gives λ_vac = 630.423 70 nm.
 */
export function airToVacuum(airM: Dec): Dec {
  if (!inAirFormulaRange(airM)) throw new RangeError(`air wavelength ${airM.toString()} m is outside the range of the air formula (200 nm to 2 µm)`);
  let vac = airM;
  for (let i = 0; i < 30; i++) {
    const next = airM.mul(airRefractiveIndex(vac));
    if (next.minus(vac).abs().lte(airM.mul("1e-55"))) return next;
    vac = next;
  }
  return vac;
}

/**
 * Zeeman splitting in wavelength of one Lorentz unit per tesla (m/T): a
 * shift of Δν = (μB/h)·B moves the line by Δλ = λ²·Δν/c, so
 *
 *   Δλ_L / B = λ_vac² · μB/(hc).
 *
 * Not exact beyond the first order in Δν/ν (10⁻⁵ at 1 T in the visible);
 * λ is the vacuum wavelength, so this is the splitting in vacuum; in air
 * the splitting is smaller by the factor n (3e-4), below the digits the
 * trade quotes. Common practice (solar spectroscopy): Δλ = 4.6686e-13 λ² g B
 * with λ and Δλ in Å and B in G, i.e. Δλ_L/B = 4.6686e-13 λ[Å]² Å/G.
 * 1 pm/T equals 1 mÅ/kG.
 *
 * Worked example: λ = 630.4237 nm, μB/(hc) = 46.686 447 … m⁻¹/T (CODATA
 * 2022): Δλ_L/B = 18.554 8 pm/T, so Fe I 630.25 nm
 * (g_eff = 5/2) splits by 46.38… pm (mÅ) per T (kG) per σ component.
 */
export function lorentzWavelengthPerTesla(vacuumM: Dec, muB_hc: Dec): Dec {
  return vacuumM.pow(2).mul(muB_hc);
}
