/**
 * Fine-structure Paschen–Back effect of one LS term: the fine-structure
 * partners (same S and L, every allowed J) in a magnetic field of any
 * strength, from the weak-field Zeeman regime through the intermediate
 * region to the Paschen–Back limit.
 *
 * Hamiltonian, as frequencies E/h (Hz), in the uncoupled basis |mL mS⟩:
 *
 *   H = Σ_J E_J·P_J + (μB/h)·B·(gL·mL + gS·mS),
 *
 * with P_J the projector on the J level and E_J its listed energy. When the
 * Landé interval rule holds, Σ_J E_J·P_J = c + ζ·L·S exactly (ζ the
 * spin–orbit constant, c the (2J+1)-weighted centre of the term), which is
 * the textbook form; building it from the listed E_J instead keeps the
 * zero-field limit exact for terms with three or more partners, where the
 * interval rule holds only approximately. With two partners both forms are
 * identical. Atomic sign convention: gS = −g_e ≈ +2.0023, gL = 1 − m_e/M or 1.
 *
 * H conserves mJ = mL + mS, so it splits into blocks of at most
 * 2·min(L, S) + 1 states, each diagonalized by Jacobi rotations in Dec
 * (fineStructureEigen.ts). Only the search for the linear-pattern limit uses
 * the float64 twin (fineStructureFloat.ts): it needs many solves and returns
 * a threshold, not an energy.
 *
 * Hyperfine structure is left out. That is fine when the hyperfine
 * splittings (A·(I+1/2)… typically MHz to a few GHz) are small against both
 * the fine-structure interval and the Zeeman energies of interest: the
 * fine-structure decoupling then happens at fields (tesla) where I and J are
 * already decoupled (hyperfine Paschen–Back), so the electron-only energies
 * plus a near-constant A·mJ·mI correction describe the levels. It is NOT fine
 * near zero field for levels whose hyperfine structure is resolved, nor for
 * heavy atoms or light ones with very small fine-structure intervals where the
 * two scales meet (e.g. the 2P term of Li, with a 10 GHz interval). The
 * build's energies, transitions and lines of such levels come from the term
 * solver (termHyperfineZeeman.ts, hyperfine within each J); this module
 * gives the fine-structure states alone (a term's Paschen–Back table) and
 * the field where the J-resolved linear pattern is off by 1 %.
 *
 * References: E. U. Condon and G. H. Shortley, "The Theory of Atomic Spectra"
 * (1935), §16.3 (the Paschen–Back effect); H. A. Bethe and E. E. Salpeter,
 * "Quantum Mechanics of One- and Two-Electron Atoms" (1957), §47; Clebsch–Gordan
 * coefficients from 3j symbols, Edmonds (1957) eq. (3.7.3).
 */
import { Dec, ZERO, decInt } from "../decimal.js";
import { Rational } from "../rational.js";
import { coupledValues, mValues } from "../quantum.js";
import { threeJ } from "../wigner.js";
import { landeLS } from "../lande.js";
import { symmetricEigen } from "./fineStructureEigen.js";
import { fineStructureFloatSolver } from "./fineStructureFloat.js";

/** One fine-structure level of the term: doubled J and its energy (Hz, any common zero). */
export interface FineStructurePartner {
  J2: number;
  energy: Dec;
}

/** One LS term with all its fine-structure partners and the constants to use. */
export interface FineStructureTerm {
  /** Doubled total spin S. */
  S2: number;
  /** Orbital angular momentum L (ordinary integer). */
  L: number;
  /** Every J of the term, |L−S| … L+S, each once (any order). */
  partners: FineStructurePartner[];
  /** Orbital g-factor, 1 − m_e/M or 1. */
  gL: Dec;
  /** Spin g-factor in the atomic sign convention, −g_e ≈ +2.0023. */
  gS: Dec;
  /** Bohr magneton over h, Hz/T (constants edition). */
  muB_h: Dec;
}

/** Spin–orbit constant fitted to the partners, and how well the interval rule holds. */
export interface SpinOrbitFit {
  /** ζ in Hz; null for a term with a single J (L = 0 or S = 0). */
  zeta: Dec | null;
  /** The (2J+1)-weighted centre of gravity the fit passes through when the rule holds, Hz. */
  centre: Dec;
  /** E_J − [centre + (ζ/2)(J(J+1) − L(L+1) − S(S+1))] per partner, Hz (zero with two partners). */
  residuals: { J2: number; residual: Dec }[];
  /** Root-mean-square residual, Hz: the departure from the Landé interval rule. */
  rms: Dec;
}

/** One eigenstate of the term at one field. */
export interface FineStructureState {
  /** Doubled mJ = mL + mS, conserved at every field. */
  mJ2: number;
  /** Doubled J of the zero-field level the state connects to. */
  J2: number;
  /** Doubled mL and mS of the uncoupled state it tends to at high field. */
  mL2: number;
  mS2: number;
  /** Energy, Hz, on the same zero as the partner energies. */
  energy: Dec;
  /** energy − E_J of the zero-field level it connects to (the sublevel shift), Hz. */
  shift: Dec;
  /** Amplitudes on |mL mS⟩ (block order: mS ascending); real, unit norm. */
  uncoupled: { mL2: number; mS2: number; amplitude: Dec }[];
  /** Amplitudes on |J mJ⟩ of the same mJ; the own-J amplitude is made positive. */
  coupled: { J2: number; amplitude: Dec }[];
}

/** (J(J+1) − L(L+1) − S(S+1))/2 = ⟨L·S⟩ in |(LS)J⟩, exact. */
function spinOrbitFactor(S2: number, L: number, J2: number): Rational {
  return Rational.of(J2 * (J2 + 2) - 4 * L * (L + 1) - S2 * (S2 + 2), 8);
}

function validate(term: FineStructureTerm): Map<number, Dec> {
  const wanted = coupledValues(2 * term.L, term.S2);
  const byJ = new Map<number, Dec>();
  for (const p of term.partners) {
    if (!wanted.includes(p.J2)) throw new RangeError(`J=${p.J2}/2 does not belong to the term S=${term.S2}/2, L=${term.L}`);
    if (byJ.has(p.J2)) throw new RangeError(`J=${p.J2}/2 listed twice`);
    byJ.set(p.J2, p.energy);
  }
  const missing = wanted.filter((j) => !byJ.has(j));
  if (missing.length) throw new RangeError(`term lacks the fine-structure partners J2 = ${missing.join(", ")}`);
  return byJ;
}

/**
 * Spin–orbit constant ζ from the listed partner energies.
 *
 * Formula: E_J = c + (ζ/2)[J(J+1) − L(L+1) − S(S+1)]; two partners give ζ
 * exactly (ζ = ΔE/J_> by the interval rule), three or more an ordinary
 * least-squares line through (X_J, E_J), unweighted, whose residuals measure
 * the departure from the Landé interval rule. Reference: Condon and Shortley
 * §7.2 (interval rule). Exact: no (one division in Dec).
 *
 * Worked example: Na 3p 2P1/2 16956.1702 cm⁻¹, 2P3/2 16973.3661 cm⁻¹ (NIST
 * ASD): ΔE = 17.1959 cm⁻¹, ζ = (2/3)·ΔE = 11.46393… cm⁻¹ = 343.6832… GHz.
 */
export function fitSpinOrbit(term: FineStructureTerm): SpinOrbitFit {
  const byJ = validate(term);
  const js = [...byJ.keys()].sort((a, b) => a - b);
  const xs = js.map((j) => spinOrbitFactor(term.S2, term.L, j).toDecimal());
  const es = js.map((j) => byJ.get(j)!);
  if (js.length === 1) {
    return { zeta: null, centre: es[0]!, residuals: [{ J2: js[0]!, residual: ZERO }], rms: ZERO };
  }
  const n = decInt(js.length);
  const xm = xs.reduce((s, x) => s.add(x), ZERO).div(n);
  const em = es.reduce((s, x) => s.add(x), ZERO).div(n);
  let sxx = ZERO;
  let sxe = ZERO;
  xs.forEach((x, i) => {
    sxx = sxx.add(x.sub(xm).pow(2));
    sxe = sxe.add(x.sub(xm).mul(es[i]!.sub(em)));
  });
  const zeta = sxe.div(sxx);
  const centre = em.sub(zeta.mul(xm));
  const residuals = js.map((j, i) => ({ J2: j, residual: es[i]!.sub(centre.add(zeta.mul(xs[i]!))) }));
  const rms = residuals.reduce((s, r) => s.add(r.residual.pow(2)), ZERO).div(n).sqrt();
  return { zeta, centre, residuals, rms };
}

/** Clebsch–Gordan ⟨L mL S mS | J M⟩ = (−1)^(L−S+M) √(2J+1) (L S J; mL mS −M), as Dec. */
function clebsch(L: number, S2: number, J2: number, mL2: number, mS2: number, M2: number): Dec {
  const w = threeJ(2 * L, S2, J2, mL2, mS2, -M2);
  if (w.sign === 0) return ZERO;
  const phase = (2 * L - S2 + M2) / 2;
  const sign = (Math.abs(phase) % 2 === 0 ? 1 : -1) * w.sign;
  const mag = w.squared.mul(Rational.of(J2 + 1)).toDecimal().sqrt();
  return sign < 0 ? mag.neg() : mag;
}

/** The uncoupled states of the block mJ, ordered by mS ascending. */
function blockBasis(L: number, S2: number, M2: number): { mL2: number; mS2: number }[] {
  return mValues(S2)
    .map((mS2) => ({ mL2: M2 - mS2, mS2 }))
    .filter((s) => Math.abs(s.mL2) <= 2 * L);
}

/**
 * Every eigenstate of the term at the field `tesla` (negative fields allowed:
 * they reverse the Zeeman term).
 *
 * Formula: block mJ of H = Σ_J E_J P_J + (μB/h)B(gL mL + gS mS) in |mL mS⟩,
 * ⟨mL mS|P_J|mL' mS'⟩ = CG(J; mL mS)·CG(J; mL' mS'), diagonalized numerically.
 * Labels: inside one mJ block the states do not cross at any field (one
 * symmetry class; von Neumann–Wigner; strictly so for the interval-rule
 * Hamiltonian, whose block is an unreduced tridiagonal matrix in mS), so the
 * n-th lowest state connects to the n-th lowest E_J with J ≥ |mJ| at zero
 * field and to the n-th lowest gL·mL + gS·mS at high field (for B > 0;
 * reversed order for B < 0). Exact: no (Jacobi, ~1e-55 relative).
 * Result sorted by J, then mJ.
 *
 * Worked example: Na 3p at B = 0 returns 2 states at E(2P1/2) and 4 at
 * E(2P3/2), each pure |J mJ⟩; at B → ∞ the state (J = 3/2, mJ = 1/2) tends to
 * |mL = 0, mS = +1/2⟩ with energy c + (μB/h)B·gS/2, its block partner
 * (J = 1/2, mJ = 1/2) to |mL = 1, mS = −1/2⟩ at c + (μB/h)B(gL − gS/2) − ζ/2.
 */
export function solveFineStructure(term: FineStructureTerm, tesla: Dec): FineStructureState[] {
  return fineStructureSolver(term)(tesla);
}

/**
 * solveFineStructure with the field-independent work done once: validation,
 * block bases, Clebsch–Gordan coefficients, the products E_J·CG·CG and the
 * Zeeman diagonal. The returned function gives exactly what
 * solveFineStructure(term, tesla) gives (same operations in the same order),
 * for callers that solve one term at several fields. Exact: no (as there).
 *
 * Worked example: fineStructureSolver(na3p)(B) equals
 * solveFineStructure(na3p, B) state by state (test).
 */
export function fineStructureSolver(term: FineStructureTerm): (tesla: Dec) => FineStructureState[] {
  const byJ = validate(term);
  const Js = [...byJ.keys()];
  const jMax = Math.max(...Js);
  const blocks = mValues(jMax).map((M2) => {
    const basis = blockBasis(term.L, term.S2, M2);
    const blockJs = Js.filter((j) => j >= Math.abs(M2)).sort((a, b) => byJ.get(a)!.cmp(byJ.get(b)!) || a - b);
    const cg = blockJs.map((j) => basis.map((b) => clebsch(term.L, term.S2, j, b.mL2, b.mS2, M2)));
    const diag = basis.map((b) => term.gL.mul(b.mL2).add(term.gS.mul(b.mS2)).div(2));
    // E_J·CG(r)·CG(c) per entry, in the order they are added
    const terms = basis.map((_, r) => basis.map((__, c) => blockJs.map((j, n) => byJ.get(j)!.mul(cg[n]![r]!).mul(cg[n]![c]!))));
    return { M2, basis, blockJs, cg, diag, terms };
  });
  return (tesla: Dec) => {
    const zeeman = term.muB_h.mul(tesla);
    const out: FineStructureState[] = [];
    for (const { M2, basis, blockJs, cg, diag, terms } of blocks) {
      const h: Dec[][] = basis.map((_, r) =>
        basis.map((__, c) => {
          let x = r === c ? zeeman.mul(diag[r]!) : ZERO;
          for (const t of terms[r]![c]!) x = x.add(t);
          return x;
        }),
      );
      const pairs = symmetricEigen(h);
      const highOrder = basis
        .map((b, i) => ({ b, key: diag[i]! }))
        .sort((x, y) => (tesla.isNeg() ? y.key.cmp(x.key) : x.key.cmp(y.key)));
      pairs.forEach((pair, n) => {
        const J2 = blockJs[n]!;
        const high = highOrder[n]!.b;
        let coupled = blockJs.map((j, jn) => ({
          J2: j,
          amplitude: cg[jn]!.reduce((s, c, i) => s.add(c.mul(pair.vector[i]!)), ZERO),
        }));
        let vector = pair.vector;
        if (coupled[n]!.amplitude.isNeg()) {
          vector = vector.map((x) => x.neg());
          coupled = coupled.map((c) => ({ J2: c.J2, amplitude: c.amplitude.neg() }));
        }
        coupled.sort((a, b) => a.J2 - b.J2);
        out.push({
          mJ2: M2,
          J2,
          mL2: high.mL2,
          mS2: high.mS2,
          energy: pair.value,
          shift: pair.value.sub(byJ.get(J2)!),
          uncoupled: basis.map((b, i) => ({ mL2: b.mL2, mS2: b.mS2, amplitude: vector[i]! })),
          coupled,
        });
      });
    }
    return out.sort((a, b) => a.J2 - b.J2 || a.mJ2 - b.mJ2);
  };
}

/** Where the linear J-resolved pattern stops describing the term. */
export interface LinearLimit {
  /** First field (T, > 0) at which some sublevel shift departs from (μB/h)·B·gJ·mJ by the tolerance. */
  tesla: Dec;
  /** The sublevel that departs first. */
  J2: number;
  mJ2: number;
}

/**
 * Relative deviation per sublevel is |shift − slope·B| / |slope·B|, from the
 * float64 twin; sublevels with gJ·mJ = 0 or alone in their block get slope 0
 * and are skipped.
 */
function floatDeviation(term: FineStructureTerm): (tesla: number) => { dev: number; J2: number; mJ2: number } {
  const solve = fineStructureFloatSolver(term);
  const slopes = solve(0).map((s) => {
    if (s.blockSize < 2 || s.mJ2 === 0) return 0;
    const g = landeLS(term.S2, term.L, s.J2, term.gL, term.gS);
    return g === null ? 0 : term.muB_h.mul(g).mul(s.mJ2).div(2).toNumber();
  });
  return (tesla) => {
    let worst = { dev: -1, J2: 0, mJ2: 0 };
    solve(tesla).forEach((s, i) => {
      const slope = slopes[i]!;
      if (slope === 0) return;
      const linear = slope * tesla;
      const dev = Math.abs(s.shift - linear) / Math.abs(linear);
      if (dev > worst.dev) worst = { dev, J2: s.J2, mJ2: s.mJ2 };
    });
    return worst;
  };
}

/**
 * The field at which the J-resolved linear pattern E_J + (μB/h)·B·gJ·mJ
 * (gJ the LS Landé factor with the term's gL, gS) is first off by more than
 * `tolerance` (default 1 %) in any sublevel shift, relative to that shift.
 *
 * Method: the relative error grows like B at low field (second-order mixing of
 * neighbouring J); start at a field where (μB/h)B is 1e-6 of the smallest
 * interval, double until the tolerance is passed, then bisect to 1e-9
 * relative. Sublevels with gJ·mJ = 0 (no linear shift to compare with) and
 * the stretched states (alone in their block, exactly linear) are skipped.
 * Returns null when no sublevel ever departs (single-J terms).
 * Exact: no, and float-derived: the search solves the float64 twin of the
 * solver (fineStructureFloat.ts), since the result is a threshold, not a
 * tabulated value; the shifts it compares are good to ~1e-16 of the
 * fine-structure interval, far below a 1 % test. The returned field is the
 * float bisection result rounded to 7 significant digits; trust about 6.
 * The tolerance is used as a float64 number. Reference for the physics:
 * Condon and Shortley §16.3.
 *
 * Worked example: Na 3p (ζ ≈ 343.7 GHz, gL = 1 − m_e/M) departs by 1 % first in
 * (J, mJ) = (1/2, −1/2) at 0.546551… T (mpmath fixture in the test).
 */
export function linearPatternLimit(term: FineStructureTerm, tolerance: Dec = new Dec("0.01")): LinearLimit | null {
  const byJ = validate(term);
  const energies = [...byJ.values()].sort((a, b) => a.cmp(b));
  if (energies.length < 2) return null;
  let gap: Dec | null = null;
  for (let i = 1; i < energies.length; i++) {
    const d = energies[i]!.sub(energies[i - 1]!);
    if (!d.isZero() && (gap === null || d.lt(gap))) gap = d;
  }
  if (gap === null) return null;
  const tol = tolerance.toNumber();
  const deviation = floatDeviation(term);
  let lo = gap.div(term.muB_h).mul(new Dec("1e-6")).toNumber();
  if (deviation(lo).dev >= tol) throw new RangeError("linear pattern fails already at the start field");
  let hi = lo * 2;
  let found = false;
  for (let i = 0; i < 200; i++) {
    if (deviation(hi).dev >= tol) {
      found = true;
      break;
    }
    lo = hi;
    hi = hi * 2;
  }
  if (!found) return null;
  while (hi - lo > hi * 1e-9) {
    const mid = (lo + hi) / 2;
    if (deviation(mid).dev >= tol) hi = mid;
    else lo = mid;
  }
  const at = deviation(hi);
  return { tesla: new Dec(hi.toPrecision(REPORTED_DIGITS)), J2: at.J2, mJ2: at.mJ2 };
}

/** Significant digits kept of the float64-bisected limit field (good to about 6). */
const REPORTED_DIGITS = 7;

/** Partial derivatives of one state's shift (Hz) with respect to the term's parameters. */
export interface FineStructureShiftSlopes {
  /** ∂shift/∂E_J' for every partner J' (doubled J → dimensionless slope). */
  energies: Map<number, Dec>;
  /** ∂shift/∂gL, ∂shift/∂gS (Hz). */
  gL: Dec;
  gS: Dec;
  /** ∂shift/∂(μB/h) (T). */
  muB_h: Dec;
}

/**
 * Slopes of a state's shift, energy − E_J(own), by the Hellmann–Feynman
 * theorem: H = Σ_J E_J·P_J + (μB/h)·B·(gL·mL + gS·mS) is linear in each
 * parameter, so ∂E/∂p = ⟨ψ|∂H/∂p|ψ⟩ on the eigenvector:
 *   ∂E/∂E_J' = ⟨P_J'⟩ = (amplitude on |J' mJ⟩)²,
 *   ∂E/∂gL = (μB/h)·B·⟨mL⟩,  ∂E/∂gS = (μB/h)·B·⟨mS⟩,
 *   ∂E/∂(μB/h) = B·⟨gL·mL + gS·mS⟩,
 * and the shift subtracts E_J of its own level (slope 1 less on it).
 * Reference: H. Hellmann, "Einführung in die Quantenchemie" (1937);
 * R. P. Feynman, Phys. Rev. 56, 340 (1939). Non-degenerate states only: a
 * block of this Hamiltonian has no crossings (see solveFineStructure), so
 * within each mJ block the states stay non-degenerate, and at B = 0 the
 * eigenvectors are the |J mJ⟩ themselves, where the formula holds exactly.
 * Exact: no (the amplitudes carry the solver's ~1e-55 relative error).
 *
 * Worked example: at B = 0 every state is a pure |J mJ⟩, so its shift has
 * slope 0 on every E_J (own: 1 − 1) and on gL, gS, μB/h; in the Paschen–Back
 * limit the Na 3p state |mL = 0, mS = +1/2⟩ (J = 3/2, mJ = 1/2) has
 * ∂E/∂gS → (μB/h)·B/2 and ∂E/∂gL → 0 (test).
 */
export function fineStructureShiftSlopes(term: FineStructureTerm, state: FineStructureState, tesla: Dec): FineStructureShiftSlopes {
  let mL = ZERO;
  let mS = ZERO;
  for (const u of state.uncoupled) {
    const w = u.amplitude.pow(2);
    mL = mL.add(w.mul(u.mL2).div(2));
    mS = mS.add(w.mul(u.mS2).div(2));
  }
  const energies = new Map<number, Dec>(term.partners.map((p) => [p.J2, ZERO]));
  for (const c of state.coupled) energies.set(c.J2, c.amplitude.pow(2));
  energies.set(state.J2, energies.get(state.J2)!.sub(1));
  const field = term.muB_h.mul(tesla);
  return {
    energies,
    gL: field.mul(mL),
    gS: field.mul(mS),
    muB_h: tesla.mul(term.gL.mul(mL).add(term.gS.mul(mS))),
  };
}

/**
 * ∂ζ/∂E_J of the fitted spin–orbit constant, one per partner: the fit is
 * linear and homogeneous in the energies (ζ = Σ(x − x̄)(E − Ē)/Σ(x − x̄)²),
 * so the slope on E_J is ζ fitted to energies 1 at J and 0 elsewhere.
 * Exact: the slopes are the fit's own arithmetic on exact inputs. Null for
 * a single-J term (no ζ).
 *
 * Worked example: Na 3p (J = 1/2, 3/2): ζ = (2/3)(E_3/2 − E_1/2), slopes −2/3 and +2/3.
 */
export function spinOrbitSlopes(term: FineStructureTerm): Map<number, Dec> | null {
  if (term.partners.length < 2) return null;
  return new Map(
    term.partners.map((p) => [
      p.J2,
      fitSpinOrbit({ ...term, partners: term.partners.map((q) => ({ J2: q.J2, energy: q.J2 === p.J2 ? new Dec(1) : ZERO })) }).zeta!,
    ]),
  );
}
