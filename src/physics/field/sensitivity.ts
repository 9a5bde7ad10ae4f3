/**
 * Sensitivities of field-dependent numbers to the inputs of a level: the
 * partial derivatives that first-order uncertainty propagation
 * (physics/uncertain.ts, GUM §5.1) multiplies by each input's standard
 * uncertainty. All results are ∂(number)/∂(parameter) in the number's unit
 * per unit of the parameter (Hz per Hz for A and B, Hz per unit g, Hz per
 * Hz/T for μB/h, i.e. tesla).
 *
 * Single-J level (hyperfineZeeman.ts): H = A·I·J + B·Q + (μB/h)·B·(gJ·Jz + gI·Iz)
 * is linear in each of A, B, gJ, gI and μB/h, so by the Hellmann–Feynman
 * theorem (R. P. Feynman, Phys. Rev. 56, 340 (1939); textbook) the energy
 * of a non-degenerate eigenstate |ψ⟩ has
 *   ∂E/∂A = ⟨ψ|I·J|ψ⟩,  ∂E/∂B = ⟨ψ|Q|ψ⟩,
 *   ∂E/∂gJ = (μB/h)·B·⟨ψ|Jz|ψ⟩,  ∂E/∂gI = (μB/h)·B·⟨ψ|Iz|ψ⟩,
 *   ∂E/∂(μB/h) = B·⟨ψ|gJ·Jz + gI·Iz|ψ⟩,
 * one quadratic form per parameter on the eigenvector the solver already
 * has (no second diagonalization). Degeneracy: states of different M never
 * mix (M is conserved by H and by every ∂H/∂p), and within one M block the
 * eigenvalues are distinct except where two zero-field F levels coincide
 * (A = B = 0); at B = 0 with A ≠ 0 the block eigenvectors are the |F M⟩
 * states, in which I·J and Q are diagonal, so the expectation values are the
 * derivatives of the zero-field energies (e.g. ∂E_F/∂A = K/2) as they must
 * be. Exact: as exact as the eigenvector (Dec, ~1e-45 of the block norm).
 *
 * Breit–Rabi (J = 1/2 or I = 1/2, breitRabi.ts) has a closed form, and its
 * derivatives are analytic. With ΔE = A(2K+1)/2, y = (gS − gK)(μB/h)B,
 * D = ΔE² + 4mF·ΔE·y/(2K+1) + y², R = √D, σ = ±sgn(ΔE) (+ for F = K + 1/2):
 *   E = −ΔE/[2(2K+1)] + gK(μB/h)mF·B + σR/2,
 *   ∂R/∂ΔE = (ΔE + 2mF·y/(2K+1))/R,   ∂R/∂y = (y + 2mF·ΔE/(2K+1))/R,
 *   ∂E/∂A = (2K+1)/2·[−1/(2(2K+1)) + (σ/2)·∂R/∂ΔE],
 *   ∂E/∂gS = (σ/2)·∂R/∂y·(μB/h)B,   ∂E/∂gK = mF(μB/h)B − (σ/2)·∂R/∂y·(μB/h)B,
 *   ∂E/∂(μB/h) = gK·mF·B + (σ/2)·∂R/∂y·(gS − gK)B;
 * stretched states E = A·K/2 ± (μB/h)B(gS/2 + gK·K): ∂E/∂A = K/2,
 * ∂E/∂gS = ±(μB/h)B/2, ∂E/∂gK = ±(μB/h)B·K, ∂E/∂(μB/h) = ±B(gS/2 + gK·K).
 * (S is the spin-1/2 partner, K the other; for J = 1/2, S = J and K = I.)
 *
 * Worked example (test/physics/field/sensitivity.test.ts repeats it):
 * 87Rb 5²S1/2 (I = 3/2, A = 3417.341305452145 MHz, gJ = 2.00233113,
 * gI = −0.0009951414): the stretched |F=2, mF=2⟩ at 0.1 T has ∂E/∂A = 3/4,
 * ∂E/∂gJ = (μB/h)·B/2, ∂E/∂gI = 3(μB/h)·B/2 exactly; at B = 0, |F=1, mF=0⟩
 * has ∂E/∂A = −5/4 and no field derivatives.
 */
import { Dec, ONE, ZERO, decInt } from "../decimal.js";
import { Rational } from "../rational.js";
import { gF, hyperfineCoefficients, fValues } from "../hyperfine.js";
import { blockMatrix, blockMatrixFloat, blockOperators, type FieldState, type HyperfineZeemanLevel, type PreparedLevel } from "./hyperfineZeeman.js";
import { jzSquaredElement } from "./quadraticZeeman.js";
import { symmetricEigen } from "./symmetricEigen.js";
import { breitRabiCase } from "./breitRabi.js";
import { solveTermBlock, type PreparedTerm, type TermFieldState } from "./termHyperfineZeeman.js";

/** ∂(number)/∂p for the parameters of one level. */
export interface LevelSensitivity {
  A: Dec;
  B: Dec;
  gJ: Dec;
  gI: Dec;
  muB_h: Dec;
}

export const NO_SENSITIVITY: LevelSensitivity = { A: ZERO, B: ZERO, gJ: ZERO, gI: ZERO, muB_h: ZERO };

const KEYS = ["A", "B", "gJ", "gI", "muB_h"] as const;

/** a + k·b, parameter by parameter. */
export function combine(a: LevelSensitivity, b: LevelSensitivity, k: Dec = ONE): LevelSensitivity {
  const out = { ...a };
  for (const key of KEYS) out[key] = a[key].plus(b[key].mul(k));
  return out;
}

const ratDec = (r: Rational): Dec => (r.isZero() ? ZERO : decInt(r.num).div(decInt(r.den)));

function quadForm(v: readonly Dec[], m: readonly (readonly Dec[])[]): Dec {
  let s = ZERO;
  for (let i = 0; i < v.length; i++) {
    if (v[i]!.isZero()) continue;
    for (let j = 0; j < v.length; j++) {
      const x = m[i]![j]!;
      if (!x.isZero() && !v[j]!.isZero()) s = s.plus(v[i]!.mul(x).mul(v[j]!));
    }
  }
  return s;
}

/**
 * Hellmann–Feynman sensitivities of one eigenstate of the single-J solver
 * (hyperfineZeeman.ts) at field `tesla`: ∂E/∂A, ∂E/∂B, ∂E/∂gJ, ∂E/∂gI,
 * ∂E/∂(μB/h) (module comment). `state` is the solver's state at that field
 * (its basis and vector). Exact: to the eigenvector's precision. Worked
 * example: the module comment's 87Rb stretched state.
 */
export function stateSensitivity(level: HyperfineZeemanLevel, state: Pick<FieldState, "mF2" | "vector">, tesla: Dec): LevelSensitivity {
  const ops = blockOperators(level.I2, level.J2, state.mF2);
  const v = state.vector;
  let jz = ZERO;
  let iz = ZERO;
  for (let i = 0; i < v.length; i++) {
    const w = v[i]!.mul(v[i]!);
    jz = jz.plus(w.mul(ops.mJ[i]!));
    iz = iz.plus(w.mul(ops.mI[i]!));
  }
  const field = level.muB_h.mul(tesla);
  return {
    A: quadForm(v, ops.dipole),
    B: ops.quadrupole ? quadForm(v, ops.quadrupole) : ZERO,
    gJ: field.mul(jz),
    gI: field.mul(iz),
    muB_h: tesla.mul(level.gJ.mul(jz).plus(level.gI.mul(iz))),
  };
}

/**
 * Analytic sensitivities of the Breit–Rabi energy (breitRabi.ts) of
 * (F2, mF2) at `tesla`; formulas in the module comment. Exact: yes, up to
 * one Dec square root. Throws RangeError as breitRabiEnergy does.
 * Worked example: 87Rb |F=2, mF=2⟩ at 0.1 T: ∂E/∂A = 3/4, ∂E/∂gJ = (μB/h)(0.1 T)/2.
 */
export function breitRabiSensitivity(level: HyperfineZeemanLevel, F2: number, mF2: number, tesla: Dec): LevelSensitivity {
  const { K2, gS, gK, upper } = breitRabiCase(level, F2, mF2);
  const jIsHalf = level.J2 === 1;
  const { A, muB_h } = level;
  const K = decInt(K2).div(2);
  const mF = decInt(mF2).div(2);
  let dA: Dec, dgS: Dec, dgK: Dec, dmu: Dec;
  if (Math.abs(mF2) === K2 + 1) {
    const s = mF2 > 0 ? ONE : ONE.neg();
    dA = K.div(2);
    dgS = s.mul(muB_h).mul(tesla).div(2);
    dgK = s.mul(muB_h).mul(tesla).mul(K);
    dmu = s.mul(tesla).mul(gS.div(2).plus(gK.mul(K)));
  } else {
    const twoKPlus1 = decInt(K2 + 1);
    const dE = A.mul(twoKPlus1).div(2);
    const y = gS.minus(gK).mul(muB_h).mul(tesla);
    const R = dE.mul(dE).plus(mF.mul(4).mul(dE).mul(y).div(twoKPlus1)).plus(y.mul(y)).sqrt();
    const sigma = (dE.isNegative() ? ONE.neg() : ONE).mul(upper ? ONE : ONE.neg());
    const dRdE = dE.plus(mF.mul(2).mul(y).div(twoKPlus1)).div(R);
    const dRdy = y.plus(mF.mul(2).mul(dE).div(twoKPlus1)).div(R);
    const half = sigma.div(2);
    dA = twoKPlus1.div(2).mul(ONE.neg().div(twoKPlus1.mul(2)).plus(half.mul(dRdE)));
    const zeeman = muB_h.mul(tesla);
    dgS = half.mul(dRdy).mul(zeeman);
    dgK = mF.mul(zeeman).minus(half.mul(dRdy).mul(zeeman));
    dmu = gK.mul(mF).mul(tesla).plus(half.mul(dRdy).mul(gS.minus(gK)).mul(tesla));
  }
  return jIsHalf ? { A: dA, B: ZERO, gJ: dgS, gI: dgK, muB_h: dmu } : { A: dA, B: ZERO, gJ: dgK, gI: dgS, muB_h: dmu };
}

/**
 * Sensitivities of the first-order slope (μB/h)·gF·mF (Hz/T) of (F2, mF2):
 * gF is linear in gJ and gI with exact weights w_J, w_I (hyperfine.ts), so
 * ∂/∂gJ = (μB/h)·w_J·mF, ∂/∂gI = (μB/h)·w_I·mF, ∂/∂(μB/h) = gF·mF; A and B
 * do not enter. Zero for F = 0. Exact: yes. Worked example: 87Rb F = 2,
 * mF = 1: ∂/∂gJ = (μB/h)/4, ∂/∂gI = 3(μB/h)/4.
 */
export function linearSlopeSensitivity(level: HyperfineZeemanLevel, F2: number, mF2: number): LevelSensitivity {
  const g = gF(level.gJ, level.gI, level.I2, level.J2, F2);
  if (g === null) return NO_SENSITIVITY;
  const wJ = gF(ONE, ZERO, level.I2, level.J2, F2)!;
  const wI = gF(ZERO, ONE, level.I2, level.J2, F2)!;
  const mF = decInt(mF2).div(2);
  return { A: ZERO, B: ZERO, gJ: level.muB_h.mul(wJ).mul(mF), gI: level.muB_h.mul(wI).mul(mF), muB_h: g.mul(mF) };
}

/**
 * Analytic sensitivities of the within-J second-order coefficient
 * β(F, mF) = (gJ − gI)²(μB/h)²·Σ_{F′} r_F′/g_F′ of quadraticZeeman.ts, with
 * r_F′ = |⟨F′ mF|Jz|F mF⟩|² and the gap g_F′ = E_F − E_F′ = A·(a_F − a_F′) +
 * B·(b_F − b_F′) (hyperfine.ts coefficients): ∂β/∂gJ = 2β/(gJ − gI) =
 * −∂β/∂gI, ∂β/∂(μB/h) = 2β/(μB/h), ∂β/∂A = −(gJ − gI)²(μB/h)²·Σ r·(a_F − a_F′)/g²
 * (B likewise). Null where β is (a gap is zero). Exact: yes.
 * Worked example: 87Rb β(2, 0) = (gJ − gI)²(μB/h)²/(8A): ∂β/∂A = −β/A.
 */
export function quadraticSensitivity(level: HyperfineZeemanLevel, F2: number, mF2: number): LevelSensitivity | null {
  const { I2, J2, gJ, gI, A, muB_h } = level;
  const Bq = I2 >= 2 && J2 >= 2 ? level.B : ZERO;
  const fs = fValues(I2, J2);
  const cF = hyperfineCoefficients(I2, J2, F2);
  const dg = gJ.minus(gI);
  const scale = dg.mul(dg).mul(muB_h).mul(muB_h);
  let sum = ZERO;
  let dA = ZERO;
  let dB = ZERO;
  for (const Fp2 of [F2 - 2, F2 + 2]) {
    if (!fs.includes(Fp2) || Math.abs(mF2) > Fp2) continue;
    const r = jzSquaredElement(J2, I2, F2, Fp2, mF2);
    if (r.isZero()) continue;
    const cP = hyperfineCoefficients(I2, J2, Fp2);
    const da = ratDec(cF.a.sub(cP.a));
    const db = ratDec(cF.b.sub(cP.b));
    const gap = A.mul(da).plus(Bq.mul(db));
    if (gap.isZero()) return null;
    const rd = ratDec(r);
    sum = sum.plus(rd.div(gap));
    dA = dA.minus(rd.mul(da).div(gap.mul(gap)));
    dB = dB.minus(rd.mul(db).div(gap.mul(gap)));
  }
  const beta = sum.mul(scale);
  if (beta.isZero()) return { ...NO_SENSITIVITY };
  return {
    A: dA.mul(scale),
    B: I2 >= 2 && J2 >= 2 ? dB.mul(scale) : ZERO,
    gJ: beta.mul(2).div(dg),
    gI: beta.mul(-2).div(dg),
    muB_h: beta.mul(2).div(muB_h),
  };
}

/** One sublevel solved alone at `tesla` (its M block only): eigenvector and Dec slope. */
function solveOne(prepared: PreparedLevel, F2: number, mF2: number, tesla: Dec): { vector: Dec[]; slope: Dec } {
  const block = prepared.blocks.find((b) => b.M2 === mF2);
  const k = block?.fByRank.indexOf(F2) ?? -1;
  if (!block || k < 0) throw new RangeError(`no sublevel F=${F2}/2, mF=${mF2}/2`);
  const scale = prepared.muB_h.mul(tesla);
  const n = block.basis.length;
  const eig = symmetricEigen(blockMatrix(block, scale), n > 2 ? blockMatrixFloat(block, scale.toNumber()) : undefined);
  const vector = eig.vectors[k]!;
  let z = ZERO;
  for (let i = 0; i < n; i++) z = z.plus(vector[i]!.mul(vector[i]!).mul(block.zeeman[i]!));
  return { vector, slope: z.mul(prepared.muB_h) };
}

/** Relative step of the central difference in B at a field-insensitive point. */
export const INSENSITIVE_STEP = new Dec("1e-12");

/**
 * Sensitivities of a field-insensitive point B* > 0 of the line upper ↔ lower
 * (df/dB = 0 there, f = E_upper − E_lower) and of the frequency f* there.
 *
 * Implicit-function theorem: with g(B, p) = ∂f/∂B, g(B*(p), p) = 0 gives
 *   ∂(B*)/∂p = −(∂²f/∂B∂p)/(∂²f/∂B²),
 * and since ∂f/∂B = 0 at B*, ∂(f*)/∂p = ∂f/∂p at B* (the B-dependence drops
 * out to first order). Method: ∂f/∂p is the Hellmann–Feynman expression
 * (stateSensitivity); its B-derivative ∂²f/∂B∂p and ∂²f/∂B² (from the
 * Hellmann–Feynman slopes) are central differences at B* ± h, h = 1e-12·B*,
 * from two Dec solves of the two sublevels' blocks (not one per parameter);
 * ∂f/∂p at B* is the mean of the two, good to O(h²). At 60 digits the
 * truncation error (~(h/B_scale)², B_scale ~ A/(μB/h)) and the rounding
 * error (~1e-45/1e-12) are both far below 1e-20 of the result. Exact: no.
 *
 * Worked example (the MC check of test/results/fieldUncertainty.test.ts):
 * 87Rb |F=1, mF=−1⟩ ↔ |F=2, mF=1⟩ at B* ≈ 3.2289 G: ∂(B*)/∂gI is large and
 * positive in magnitude because B* ∝ −gI/(gJ − gI)²·A/(μB/h) to leading order.
 */
export function insensitivePointSensitivity(
  prepared: PreparedLevel, level: HyperfineZeemanLevel, upper: { F2: number; mF2: number }, lower: { F2: number; mF2: number }, tesla: Dec,
): { tesla: LevelSensitivity; hz: LevelSensitivity } {
  if (!tesla.gt(0)) throw new RangeError("the point must be at B > 0");
  const h = tesla.mul(INSENSITIVE_STEP);
  const at = (b: Dec) => {
    const u = solveOne(prepared, upper.F2, upper.mF2, b);
    const l = solveOne(prepared, lower.F2, lower.mF2, b);
    const s = combine(stateSensitivity(level, { mF2: upper.mF2, vector: u.vector }, b), stateSensitivity(level, { mF2: lower.mF2, vector: l.vector }, b), ONE.neg());
    return { s, g: u.slope.minus(l.slope) };
  };
  const plus = at(tesla.plus(h));
  const minus = at(tesla.minus(h));
  const gB = plus.g.minus(minus.g).div(h.mul(2));
  const dB = { ...NO_SENSITIVITY };
  const dHz = { ...NO_SENSITIVITY };
  for (const key of KEYS) {
    const gp = plus.s[key].minus(minus.s[key]).div(h.mul(2));
    dB[key] = gp.div(gB).neg();
    dHz[key] = plus.s[key].plus(minus.s[key]).div(2);
  }
  return { tesla: dB, hz: dHz };
}

/** ∂E/∂p of one eigenstate of the term solver (termHyperfineZeeman.ts), per listed level where the parameter is per level. */
export interface TermSensitivity {
  /** ∂E/∂E_J for each listed level (TermProblem.levels order). */
  energy: Dec[];
  A: Dec[];
  B: Dec[];
  /** ∂E/∂gJ of each level (its gJ within its own J). */
  gJ: Dec[];
  gI: Dec;
  gS: Dec;
  gL: Dec;
  muB_h: Dec;
}

/**
 * Hellmann–Feynman sensitivities of one eigenstate of the term solver at
 * `tesla` (same theorem as above; H of termHyperfineZeeman.ts is linear in
 * every E_J, A_J, B_J, gJ, gI, gS − gL and μB/h):
 *   ∂E/∂E_J = Σ_{i∈J} ψ_i² − δ(J = own J)   (energies are from the own level's E_J),
 *   ∂E/∂A_J = ψ_Jᵀ(I·J)ψ_J,  ∂E/∂B_J = ψ_JᵀQψ_J,
 *   ∂E/∂gJ_J = (μB/h)B·Σ_{i∈J} ψ_i²·mJ_i,  ∂E/∂gI = (μB/h)B·Σ ψ_i²·mI_i,
 *   ∂E/∂gS = −∂E/∂gL = (μB/h)B·Σ_{J≠J′} ψ_i·⟨i|Sz|j⟩·ψ_j,
 *   ∂E/∂(μB/h) = B·⟨ψ|Z|ψ⟩ = B·slope/(μB/h).
 * The degeneracy argument of the module comment holds block by block.
 * Exact: to the eigenvector's precision. Worked example: for a state alone
 * in its block (6Li 2P3/2 |mJ = 3/2, mI = 1⟩) ∂E/∂A = 3/2, ∂E/∂E_J = 0.
 */
export function termStateSensitivity(prepared: PreparedTerm, state: TermFieldState, tesla: Dec): TermSensitivity {
  const p = prepared.problem;
  const block = prepared.blocks.find((b) => b.M2 === state.mF2);
  if (!block) throw new RangeError(`no block M = ${state.mF2}/2`);
  const v = state.amplitudes.map((a) => a.amplitude);
  const n = v.length;
  const nl = p.levels.length;
  const energy = p.levels.map(() => ZERO);
  const A = p.levels.map(() => ZERO);
  const B = p.levels.map(() => ZERO);
  const gJ = p.levels.map(() => ZERO);
  let iz = ZERO;
  let sz = ZERO;
  const field = p.muB_h.mul(tesla);
  for (let li = 0; li < nl; li++) {
    const idx = [...block.basis.keys()].filter((i) => block.basis[i]!.level === li);
    if (idx.length === 0) continue;
    const ops = blockOperators(p.I2, p.levels[li]!.J2, state.mF2);
    const w = idx.map((i) => v[i]!);
    let norm = ZERO;
    let jz = ZERO;
    idx.forEach((i, r) => {
      const x = v[i]!.mul(v[i]!);
      norm = norm.plus(x);
      jz = jz.plus(x.mul(ops.mJ[r]!));
      iz = iz.plus(x.mul(ops.mI[r]!));
    });
    energy[li] = norm;
    A[li] = quadForm(w, ops.dipole);
    B[li] = ops.quadrupole ? quadForm(w, ops.quadrupole) : ZERO;
    gJ[li] = field.mul(jz);
  }
  const own = p.levels.findIndex((l) => l.J2 === state.J2);
  energy[own] = energy[own]!.minus(1);
  const dg = p.gS.minus(p.gL);
  for (let r = 0; r < n; r++) {
    for (let c = 0; c < n; c++) {
      if (block.basis[r]!.level === block.basis[c]!.level) continue;
      const z = block.zeeman[r]![c]!;
      if (!z.isZero()) sz = sz.plus(v[r]!.mul(z).mul(v[c]!));
    }
  }
  const sOff = dg.isZero() ? ZERO : field.mul(sz).div(dg);
  return { energy, A, B, gJ, gI: field.mul(iz), gS: sOff, gL: sOff.neg(), muB_h: state.slope.mul(tesla).div(p.muB_h) };
}

/** TermSensitivity as one flat list (energy, A, B, gJ per level, then gI, gS, gL, μB/h) and back. */
function flatTerm(s: TermSensitivity): Dec[] {
  return [...s.energy, ...s.A, ...s.B, ...s.gJ, s.gI, s.gS, s.gL, s.muB_h];
}
function unflatTerm(x: Dec[], n: number): TermSensitivity {
  const part = (k: number) => x.slice(k * n, (k + 1) * n);
  return { energy: part(0), A: part(1), B: part(2), gJ: part(3), gI: x[4 * n]!, gS: x[4 * n + 1]!, gL: x[4 * n + 2]!, muB_h: x[4 * n + 3]! };
}

/**
 * insensitivePointSensitivity for a level solved with its term
 * (termHyperfineZeeman.ts): the same implicit-function theorem and the same
 * central difference in B (h = 1e-12·B*), with the two sublevels' M blocks
 * solved in Dec at B* ± h (solveTermBlock) and termStateSensitivity on their
 * eigenvectors. `level` indexes TermProblem.levels. Exact: no (as above).
 * Worked example: with one listed J it is insensitivePointSensitivity.
 */
export function termInsensitivePointSensitivity(
  prepared: PreparedTerm, level: number, upper: { F2: number; mF2: number }, lower: { F2: number; mF2: number }, tesla: Dec,
): { tesla: TermSensitivity; hz: TermSensitivity } {
  if (!tesla.gt(0)) throw new RangeError("the point must be at B > 0");
  const n = prepared.problem.levels.length;
  const h = tesla.mul(INSENSITIVE_STEP);
  // a block is solved once per field: the two sublevels of a ΔmF = 0 transition share it
  const solved = new Map<string, ReturnType<typeof solveTermBlock>>();
  const pick = (s: { F2: number; mF2: number }, b: Dec): TermFieldState => {
    const block = prepared.blocks.find((x) => x.M2 === s.mF2);
    const key = `${s.mF2}@${b.toString()}`;
    if (block && !solved.has(key)) solved.set(key, solveTermBlock(prepared, block, b));
    const st = block ? solved.get(key)!.find((x) => x.level === level && x.state.F2 === s.F2) : undefined;
    if (!st) throw new RangeError(`no sublevel F=${s.F2}/2, mF=${s.mF2}/2`);
    return st.state;
  };
  const at = (b: Dec) => {
    const u = pick(upper, b);
    const l = pick(lower, b);
    const su = flatTerm(termStateSensitivity(prepared, u, b));
    const sl = flatTerm(termStateSensitivity(prepared, l, b));
    return { s: su.map((x, i) => x.minus(sl[i]!)), g: u.slope.minus(l.slope) };
  };
  const plus = at(tesla.plus(h));
  const minus = at(tesla.minus(h));
  const gB = plus.g.minus(minus.g).div(h.mul(2));
  const dB = plus.s.map((x, i) => x.minus(minus.s[i]!).div(h.mul(2)).div(gB).neg());
  const dHz = plus.s.map((x, i) => x.plus(minus.s[i]!).div(2));
  return { tesla: unflatTerm(dB, n), hz: unflatTerm(dHz, n) };
}
