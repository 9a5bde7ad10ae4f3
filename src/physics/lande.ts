/**
 * Landé g-factors of LS-coupled levels.
 *
 * Reference: H. A. Bethe and E. E. Salpeter, "Quantum Mechanics of One- and
 * Two-Electron Atoms" (1957), §45; the same expression in any atomic-physics
 * text (e.g. Foot, "Atomic Physics", eq. 5.15 with gS kept general).
 */
import { Dec } from "./decimal.js";
import { Rational } from "./rational.js";

/** The two projection coefficients of gJ = gL·cL + gS·cS, exact. J = 0 has none. */
function projections(S2: number, L: number, J2: number): { cL: Rational; cS: Rational } | null {
  if (J2 === 0) return null;
  const jj = Rational.of(J2 * (J2 + 2), 4); // J(J+1)
  const ss = Rational.of(S2 * (S2 + 2), 4); // S(S+1)
  const ll = Rational.of(L * (L + 1)); // L(L+1)
  const twoJJ = jj.mul(Rational.of(2));
  return { cL: jj.sub(ss).add(ll).div(twoJJ), cS: jj.add(ss).sub(ll).div(twoJJ) };
}

/**
 * LS Landé factor with the given orbital and spin g-factors:
 * gJ = gL[J(J+1) − S(S+1) + L(L+1)]/[2J(J+1)] + gS[J(J+1) + S(S+1) − L(L+1)]/[2J(J+1)].
 * Exact: no (gL, gS are measured numbers); the coefficients are exact rationals.
 * Returns null for J = 0, which has no magnetic moment and no g.
 * Selection: any S, L, J with J in |L−S|..L+S (the caller validates).
 *
 * Worked example: 2P3/2 with gL = 1, gS = 2.00231930436092 (CODATA 2022 −g_e)
 * gives 2/3 + (1/3)·2.00231930436092 = 1.33410643478697333…
 */
export function landeLS(S2: number, L: number, J2: number, gL: Dec, gS: Dec): Dec | null {
  const p = projections(S2, L, J2);
  if (!p) return null;
  return gL.mul(p.cL.toDecimal()).add(gS.mul(p.cS.toDecimal()));
}

/**
 * LS Landé factor with gL = 1 and gS = 2, as an exact reduced fraction: the
 * value the classical pattern notation is written in.
 * Exact: yes. Returns null for J = 0.
 *
 * Worked example: 2P3/2 → 4/3; 2P1/2 → 2/3; 3P2 → 3/2; 5D0 → null; 7D1 → 3.
 */
export function landeExact(S2: number, L: number, J2: number): Rational | null {
  const p = projections(S2, L, J2);
  if (!p) return null;
  return p.cL.add(p.cS.mul(Rational.of(2)));
}

/**
 * Orbital g-factor corrected for the finite nuclear mass, gL = 1 − m_e/M
 * (Bethe and Salpeter §45; M the atomic mass in u, m_e the electron mass in u).
 * Without a mass, gL = 1. Exact: no.
 *
 * Worked example: M = 86.909180531 u, m_e = 0.0005485799090441 u (CODATA 2022)
 * gives gL = 0.99999368789… (the 87Rb value tabulated by Steck, 0.99999369).
 */
export function orbitalG(massU: Dec | null, electronMassU: Dec): Dec {
  if (massU === null) return new Dec(1);
  return new Dec(1).sub(electronMassU.div(massU));
}

/** Spin g-factor gS = −g_e (positive, about 2.0023), from the constants edition. Exact: no. */
export function spinG(electronG: Dec): Dec {
  return electronG.neg();
}
