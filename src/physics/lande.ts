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

/**
 * g = gL·cL + gS·cS as two exact coefficients: every coupling scheme gives
 * its Landé factor in this form, since each step is a projection that is
 * linear in the g factors of the parts.
 */
interface GForm {
  cL: Rational;
  cS: Rational;
}

const ORBIT: GForm = { cL: Rational.ONE, cS: Rational.ZERO };
const SPIN: GForm = { cL: Rational.ZERO, cS: Rational.ONE };

/**
 * The projection rule for J = a + b (the vector model): g_J = g_a·[J(J+1) + a(a+1) − b(b+1)]/[2J(J+1)]
 * + g_b·[J(J+1) + b(b+1) − a(a+1)]/[2J(J+1)]. Doubled a, b, J; J = 0 gives zero (no moment).
 */
function project(J2: number, a2: number, ga: GForm, b2: number, gb: GForm): GForm {
  if (J2 === 0) return { cL: Rational.ZERO, cS: Rational.ZERO };
  const jj = Rational.of(J2 * (J2 + 2), 4);
  const aa = Rational.of(a2 * (a2 + 2), 4);
  const bb = Rational.of(b2 * (b2 + 2), 4);
  const twoJJ = jj.mul(Rational.of(2));
  const fa = jj.add(aa).sub(bb).div(twoJJ);
  const fb = jj.add(bb).sub(aa).div(twoJJ);
  return { cL: ga.cL.mul(fa).add(gb.cL.mul(fb)), cS: ga.cS.mul(fa).add(gb.cS.mul(fb)) };
}

const atPhysical = (g: GForm, gL: Dec, gS: Dec): Dec => gL.mul(g.cL.toDecimal()).add(gS.mul(g.cS.toDecimal()));
const atExact = (g: GForm): Rational => g.cL.add(g.cS.mul(Rational.of(2)));

/** A jK (pair-coupled) level: parent term of the core (doubled S, L, doubled j1), outer electron's l, doubled K and J. */
export interface JKLevel {
  coreS2: number;
  coreL: number;
  coreJ2: number;
  l: number;
  K2: number;
  J2: number;
}

function jkForm(t: JKLevel): GForm {
  const core = project(t.coreJ2, 2 * t.coreL, ORBIT, t.coreS2, SPIN); // LS g of the parent term
  const gK = project(t.K2, t.coreJ2, core, 2 * t.l, ORBIT); // K = j1 + l
  return project(t.J2, t.K2, gK, 1, SPIN); // J = K + s, s = 1/2
}

/**
 * Landé factor of a jK (pair-coupled) level, written (2s+1)[K]J with the
 * parent term of the core: the core's j1 has its LS g, the outer electron's
 * orbit couples to it, K = j1 + l, and the outer spin to that, J = K + s:
 *   g_K = g_j1·[K(K+1) + j1(j1+1) − l(l+1)]/[2K(K+1)] + gL·[K(K+1) + l(l+1) − j1(j1+1)]/[2K(K+1)],
 *   g_J = g_K·[J(J+1) + K(K+1) − s(s+1)]/[2J(J+1)] + gS·[J(J+1) + s(s+1) − K(K+1)]/[2J(J+1)], s = 1/2.
 * Reference: G. Racah, Phys. Rev. 61, 537 (1942) for the coupling; the g
 * factor by the vector model as in H. E. White, "Introduction to Atomic
 * Spectra" (1934), ch. XIII, and Condon and Shortley (1935), §11.
 * Exact: no (gL, gS measured); the coefficients are exact rationals.
 * Returns null for J = 0. Selection: |j1 − l| ≤ K ≤ j1 + l and J = K ± 1/2
 * (the caller validates).
 *
 * Worked example: Ne 2p⁵3s 2[3/2]°2 (core ²P°3/2, l = 0) with gL = 1 and
 * gS = 2 gives g_K = 4/3 and g_J = (4/3)(3/4) + 2(1/4) = 3/2; 2p⁵3p 2[5/2]3
 * (l = 1) gives g_K = (4/3)(3/5) + 2/5 = 6/5 and g_J = (6/5)(5/6) + 2(1/6) = 4/3.
 */
export function landeJK(t: JKLevel, gL: Dec, gS: Dec): Dec | null {
  if (t.J2 === 0) return null;
  return atPhysical(jkForm(t), gL, gS);
}

/** landeJK with gL = 1 and gS = 2, as an exact reduced fraction. Exact: yes. Null for J = 0. Worked example: 2[3/2]2 on ²P3/2, l = 0 → 3/2. */
export function landeJKExact(t: JKLevel): Rational | null {
  if (t.J2 === 0) return null;
  return atExact(jkForm(t));
}

/** A jj-coupled pair of electrons: each electron's l and doubled j, and doubled J. */
export interface JJLevel {
  l1: number;
  j1_2: number;
  l2: number;
  j2_2: number;
  J2: number;
}

function jjForm(t: JJLevel): GForm {
  const g1 = project(t.j1_2, 2 * t.l1, ORBIT, 1, SPIN);
  const g2 = project(t.j2_2, 2 * t.l2, ORBIT, 1, SPIN);
  return project(t.J2, t.j1_2, g1, t.j2_2, g2);
}

/**
 * Landé factor of a jj-coupled level (j1, j2)J: each electron's j_i = l_i ± 1/2
 * has its one-electron LS g, g_ji = gL[j(j+1) − 3/4 + l(l+1)]/[2j(j+1)] + gS[j(j+1) + 3/4 − l(l+1)]/[2j(j+1)], and
 *   g_J = g_j1·[J(J+1) + j1(j1+1) − j2(j2+1)]/[2J(J+1)] + g_j2·[J(J+1) + j2(j2+1) − j1(j1+1)]/[2J(J+1)].
 * Reference: Condon and Shortley (1935), §11 (the vector-model projection),
 * and H. E. White (1934), ch. XIII (jj coupling).
 * Exact: no (gL, gS measured); the coefficients are exact rationals.
 * Returns null for J = 0. Selection: j_i = l_i ± 1/2, |j1 − j2| ≤ J ≤ j1 + j2
 * (the caller validates).
 *
 * Worked example: p² (3/2,1/2)1 with gL = 1, gS = 2: g(p3/2) = 4/3,
 * g(p1/2) = 2/3, and J = 1 (J(J+1) = 2) gives (4/3)(2 + 15/4 − 3/4)/4 + (2/3)(2 + 3/4 − 15/4)/4
 * = (4/3)(5/4) − (2/3)(1/4) = 3/2.
 */
export function landeJJ(t: JJLevel, gL: Dec, gS: Dec): Dec | null {
  if (t.J2 === 0) return null;
  return atPhysical(jjForm(t), gL, gS);
}

/** landeJJ with gL = 1 and gS = 2, as an exact reduced fraction. Exact: yes. Null for J = 0. Worked example: p² (3/2,1/2)1 → 3/2. */
export function landeJJExact(t: JJLevel): Rational | null {
  if (t.J2 === 0) return null;
  return atExact(jjForm(t));
}
