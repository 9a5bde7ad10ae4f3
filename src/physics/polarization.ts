/**
 * The polarization of a Zeeman component from its Δm = q = m_upper − m_lower:
 * σ+ for q = +1, π for 0, σ− for −1, none for the |q| ≥ 2 components of a
 * quadrupole (|q| = 2) or octupole (|q| = 2, 3) line (common practice). No
 * imports, so the page scripts bundle it.
 */
export type Polarization = "sigma+" | "pi" | "sigma-" | null;

/** The polarization of a component with Δm = q (an ordinary integer); |q| ≥ 2 has none. */
export function polarizationOf(deltaM: number): Polarization {
  if (deltaM === 1) return "sigma+";
  if (deltaM === 0) return "pi";
  if (deltaM === -1) return "sigma-";
  return null;
}
