/**
 * First-order propagation of standard uncertainties.
 *
 * Method: the law of propagation of uncertainty of the GUM (JCGM 100:2008,
 * "Evaluation of measurement data — Guide to the expression of uncertainty
 * in measurement", §5.1, eq. (10)), kept in its component form: a derived
 * number y = f(x₁, …, x_N) carries, for every input x_i that has an
 * uncertainty, its contribution
 *
 *     c_i = (∂f/∂x_i) · u(x_i)          (same unit as y, with its sign),
 *
 * and its combined standard uncertainty is u(y) = √(Σ c_i²). Keeping the
 * signed contributions by input, instead of only u(y), is what keeps the
 * correlations of a shared input: the difference of two numbers that both
 * depend on the same A adds their A contributions before squaring (GUM
 * §5.2 with the correlation coming from the shared input, not entered by
 * hand). Inputs with distinct keys are taken as uncorrelated.
 *
 * Exact: the arithmetic is exact in the working precision of `Dec`; the
 * method itself is first order (terms in u² are dropped), which is what
 * the GUM's law of propagation is.
 *
 * Worked example (hand formula; D. A. Steck, "Rubidium 87 D Line Data",
 * eq. (22)): gF(F = 2) of 87Rb 5²S1/2 is gJ/4 + 3gI/4. With
 * gJ = 2.00233113(20) and gI = −0.0009951414(10),
 * u(gF) = √((0.00000020/4)² + (3·0.0000000010/4)²) = 5.00056…e-8.
 * `linear([[1/4, gJ], [3/4, gI]])` gives exactly that.
 */
import { Dec } from "./decimal.js";

/** Input keys are plain strings, e.g. "level:5s-S1/2:gJ", "const:muB_h". */
export type InputKey = string;

/** A number with its signed first-order contributions, by input key. */
export interface Uncertain {
  readonly value: Dec;
  /** (∂value/∂x)·u(x) for every input x with an uncertainty; empty when exact. */
  readonly parts: ReadonlyMap<InputKey, Dec>;
}

const NO_PARTS: ReadonlyMap<InputKey, Dec> = new Map();

/** An exact number (a fraction, a defined constant, an LS factor with gS = 2): no uncertainty. */
export function exact(value: Dec): Uncertain {
  return { value, parts: NO_PARTS };
}

/**
 * An input as read from a data file or a constants table: its value and
 * standard uncertainty (null or zero: exact). `key` names the input; two
 * inputs with the same key are the same number.
 */
export function measured(key: InputKey, value: Dec, u: Dec | null): Uncertain {
  if (u === null || u.isZero()) return exact(value);
  if (u.isNeg()) throw new RangeError(`negative standard uncertainty for ${key}`);
  return { value, parts: new Map([[key, u]]) };
}

/** Adds k·parts into a running map (the chain rule's inner sum). */
function addParts(into: Map<InputKey, Dec>, parts: ReadonlyMap<InputKey, Dec>, k: Dec): void {
  if (k.isZero()) return;
  for (const [key, c] of parts) {
    const prev = into.get(key);
    into.set(key, prev ? prev.add(c.mul(k)) : c.mul(k));
  }
}

/**
 * A derived number from its value and its partial derivatives with respect
 * to each operand (the chain rule): y = f(a₁, …), with ∂f/∂a_j given.
 * This is the one place contributions combine; every other helper here is
 * a special case of it.
 */
export function derived(value: Dec, slopes: ReadonlyArray<readonly [Dec, Uncertain]>): Uncertain {
  const parts = new Map<InputKey, Dec>();
  for (const [slope, a] of slopes) addParts(parts, a.parts, slope);
  for (const [key, c] of [...parts]) if (c.isZero()) parts.delete(key);
  return { value, parts: parts.size === 0 ? NO_PARTS : parts };
}

/** Σ k_j·a_j (+ constant): exact coefficients times uncertain numbers. */
export function linear(terms: ReadonlyArray<readonly [Dec, Uncertain]>, constant: Dec = new Dec(0)): Uncertain {
  const value = terms.reduce((s, [k, a]) => s.add(k.mul(a.value)), constant);
  return derived(value, terms);
}

export const plus = (a: Uncertain, b: Uncertain): Uncertain => linear([[new Dec(1), a], [new Dec(1), b]]);
export const minus = (a: Uncertain, b: Uncertain): Uncertain => linear([[new Dec(1), a], [new Dec(-1), b]]);
/** k·a with an exact k. */
export const scaled = (a: Uncertain, k: Dec): Uncertain => linear([[k, a]]);

/** a·b: ∂/∂a = b, ∂/∂b = a. */
export function times(a: Uncertain, b: Uncertain): Uncertain {
  return derived(a.value.mul(b.value), [
    [b.value, a],
    [a.value, b],
  ]);
}

/** a/b: ∂/∂a = 1/b, ∂/∂b = −a/b². */
export function divided(a: Uncertain, b: Uncertain): Uncertain {
  const q = a.value.div(b.value);
  return derived(q, [
    [new Dec(1).div(b.value), a],
    [q.div(b.value).neg(), b],
  ]);
}

/** √a: ∂/∂a = 1/(2√a). */
export function sqrtOf(a: Uncertain): Uncertain {
  const r = a.value.sqrt();
  return derived(r, [[new Dec(1).div(r.mul(2)), a]]);
}

/** Combined standard uncertainty √(Σ c_i²); null for an exact number. */
export function standardUncertainty(x: Uncertain): Dec | null {
  if (x.parts.size === 0) return null;
  let s = new Dec(0);
  for (const c of x.parts.values()) s = s.add(c.mul(c));
  return s.sqrt();
}

/**
 * Correlation coefficient r(a, b) = Σ c_a,i·c_b,i / (u(a)·u(b)) of two
 * derived numbers (GUM §5.2.2, from their shared inputs); null when either is exact.
 */
export function correlation(a: Uncertain, b: Uncertain): Dec | null {
  const ua = standardUncertainty(a);
  const ub = standardUncertainty(b);
  if (ua === null || ub === null || ua.isZero() || ub.isZero()) return null;
  let s = new Dec(0);
  for (const [key, c] of a.parts) {
    const d = b.parts.get(key);
    if (d) s = s.add(c.mul(d));
  }
  return s.div(ua.mul(ub));
}
