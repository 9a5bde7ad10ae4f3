/**
 * How bright each Zeeman component looks from a direction at angle θ to the
 * magnetic field (the quantization axis): the angular distribution of a pure
 * multipole photon of rank k and component q = Δm = m_upper − m_lower.
 *
 * Formula. For a multipole of rank k (E1 and M1: k = 1; E2 and M2: 2; E3: 3)
 * and component q, the power radiated into the direction θ is proportional
 * to |X_kq(θ, φ)|², the vector spherical harmonic X_kq = L Y_kq / √(k(k+1))
 * (Jackson, "Classical Electrodynamics", 3rd ed. (1999), §9.7 and §9.8;
 * Blatt and Weisskopf, "Theoretical Nuclear Physics" (1952), ch. XII, app. B).
 * It is the same for an electric and a magnetic multipole of the same rank
 * (only the direction of linear polarization turns by 90°). In helicity form
 * (Rose, "Elementary Theory of Angular Momentum" (1957), §4.16 and ch. IV)
 *
 *     |X_kq(θ)|² = (2k+1)/(8π) · Σ_{λ = ±1} |d^k_{q λ}(θ)|²,
 *
 * with d^k the Wigner small-d matrix. This module's factor is
 *
 *     F_kq(θ) = Σ_{λ = ±1} |d^k_{q λ}(θ)|² = 8π/(2k+1) · |X_kq(θ)|²,
 *
 * which makes the dipole factors exactly the familiar ones: π (q = 0)
 * F = sin²θ, σ± (q = ±1) F = (1 + cos²θ)/2. The same normalization holds
 * for every rank: the average of F_kq over all directions is 2/(2k+1),
 * the same for every q, so a component's strength (its share of the total
 * emission, the squared 3j symbol) times F_kq(θ) is its relative intensity
 * seen at θ, and the strengths keep their meaning when integrated over all
 * directions. E2 and M2 (textbook closed forms, checked against sympy in
 * test/fixtures/angular-sympy.json): q = 0: 3 sin²θ cos²θ; |q| = 1:
 * (cos²θ + cos²2θ)/2; |q| = 2: (1 − cos⁴θ)/2.
 *
 * F_kq is even in q and in cos θ, a polynomial of degree k in cos²θ with
 * rational coefficients, so it is exact at every rational cos²θ: at θ = 0
 * (looking along the field, longitudinal) F = 1 for |q| = 1 and 0 for
 * every other q; at θ = 90° (transverse) a rational for every q.
 *
 * Selection rule: |q| ≤ k (otherwise there is no such multipole component;
 * the functions throw a RangeError).
 *
 * Worked example (E1, θ = 90°, the transverse Zeeman triplet): π 1, σ± 1/2,
 * so a normal triplet seen across the field shows σ : π : σ = 1 : 2 : 1
 * (with equal strengths 1/3 each); at θ = 0 the π component vanishes and
 * each σ has factor 1. At θ = 60° (cos²θ = 1/4): π 3/4, σ 5/8.
 *
 * No imports (decimal.js stays out of the page script that redraws the
 * stick plot in the browser); exact coefficients are BigInt fractions.
 */

/** A reduced fraction [numerator, denominator > 0]. */
export type Fraction = readonly [bigint, bigint];

function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

function frac(n: bigint, d: bigint): Fraction {
  if (d < 0n) [n, d] = [-n, -d];
  const g = gcd(n, d) || 1n;
  return [n / g, d / g];
}

function add(a: Fraction, b: Fraction): Fraction {
  return frac(a[0] * b[1] + b[0] * a[1], a[1] * b[1]);
}

function factorial(n: number): bigint {
  let f = 1n;
  for (let i = 2n; i <= BigInt(n); i++) f *= i;
  return f;
}

function binomial(n: number, r: number): bigint {
  return factorial(n) / (factorial(r) * factorial(n - r));
}

/** Coefficients of ((1 + x)/2)^a · ((1 − x)/2)^b in powers of x (index = power), as integers over 2^(a+b). */
function halfAngleProduct(a: number, b: number): bigint[] {
  const out: bigint[] = new Array(a + b + 1).fill(0n);
  for (let i = 0; i <= a; i++) {
    for (let j = 0; j <= b; j++) {
      const c = binomial(a, i) * binomial(b, j) * (j % 2 === 0 ? 1n : -1n);
      out[i + j]! += c;
    }
  }
  return out;
}

const cache = new Map<string, Fraction[]>();

function check(k: number, q: number): void {
  if (!Number.isInteger(k) || k < 1 || !Number.isInteger(q) || Math.abs(q) > k) {
    throw new RangeError(`no multipole component q = ${q} of rank ${k}`);
  }
}

/**
 * The coefficients c_n of F_kq(θ) = Σ_n c_n (cos²θ)^n, n = 0 … k, exact.
 * Computed from the Wigner small-d formula (Wigner's sum, as in Rose (1957)
 * eq. 4.13) with cos²(θ/2) = (1 + cos θ)/2 and sin²(θ/2) = (1 − cos θ)/2.
 *
 * Worked example: k = 1, q = 0 gives [1, −1] (sin²θ); k = 1, q = ±1 gives
 * [1/2, 1/2]; k = 2, q = 0 gives [0, 3, −3].
 */
export function angularCoefficients(k: number, q: number): Fraction[] {
  check(k, q);
  const key = `${k},${Math.abs(q)}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const qa = Math.abs(q);
  // in powers of x = cos θ, over the common denominator of each term
  let poly: Fraction[] = new Array(2 * k + 1).fill([0n, 1n] as Fraction);
  for (const lam of [1, -1]) {
    // d^k_{q lam}(θ) = Σ_s (−1)^(q−lam+s) √N / D_s · cos(θ/2)^(2k+lam−q−2s) · sin(θ/2)^(q−lam+2s)
    const N = factorial(k + qa) * factorial(k - qa) * factorial(k + lam) * factorial(k - lam);
    const terms: { sign: bigint; D: bigint; a: number; b: number }[] = [];
    for (let s = Math.max(0, lam - qa); s <= Math.min(k + lam, k - qa); s++) {
      terms.push({
        sign: (qa - lam + s) % 2 === 0 ? 1n : -1n,
        D: factorial(k + lam - s) * factorial(s) * factorial(qa - lam + s) * factorial(k - qa - s),
        a: 2 * k + lam - qa - 2 * s,
        b: qa - lam + 2 * s,
      });
    }
    for (const t of terms) {
      for (const u of terms) {
        // cos^(a_t + a_u)(θ/2) sin^(b_t + b_u)(θ/2): both exponents are even
        const alpha = (t.a + u.a) / 2;
        const beta = (t.b + u.b) / 2;
        const coef = frac(t.sign * u.sign * N, t.D * u.D * 2n ** BigInt(alpha + beta));
        halfAngleProduct(alpha, beta).forEach((c, n) => {
          if (c !== 0n) poly[n] = add(poly[n]!, [coef[0] * c, coef[1]]);
        });
      }
    }
  }
  poly = poly.map((c) => frac(c[0], c[1]));
  const out: Fraction[] = [];
  poly.forEach((c, n) => {
    if (n % 2 === 1) {
      if (c[0] !== 0n) throw new Error(`angular factor of rank ${k}, q = ${q} not even in cos θ`); // cannot happen (d-matrix symmetry)
    } else out.push(c);
  });
  cache.set(key, out);
  return out;
}

/** F_kq at an exact cos²θ given as a fraction; exact. θ = 0: cos²θ = 1; θ = 90°: 0. */
export function angularFactorAt(k: number, q: number, cos2: Fraction): Fraction {
  let acc: Fraction = [0n, 1n];
  let pow: Fraction = [1n, 1n];
  for (const c of angularCoefficients(k, q)) {
    acc = add(acc, frac(c[0] * pow[0], c[1] * pow[1]));
    pow = frac(pow[0] * cos2[0], pow[1] * cos2[1]);
  }
  return acc;
}

/** "p/q" or "p" of a fraction. */
export function fractionText(f: Fraction): string {
  return f[1] === 1n ? f[0].toString() : `${f[0]}/${f[1]}`;
}

/**
 * F_kq(θ) in double precision, θ in degrees (any real; the factor depends on
 * cos²θ only). The same coefficients as the exact functions: this is what the
 * line page's θ control redraws the stick plot with.
 */
export function angularFactor(k: number, q: number, thetaDeg: number): number {
  const c = Math.cos((thetaDeg * Math.PI) / 180);
  const c2 = thetaDeg % 180 === 90 || thetaDeg % 180 === -90 ? 0 : c * c;
  let acc = 0;
  let pow = 1;
  for (const f of angularCoefficients(k, q)) {
    acc += (Number(f[0]) / Number(f[1])) * pow;
    pow *= c2;
  }
  // rounding can leave a tiny negative value where F vanishes (π at θ = 0)
  return acc < 0 && acc > -1e-12 ? 0 : acc;
}

/**
 * The factor as a formula in θ for the pages, for the ranks whose closed
 * form is usual (k ≤ 2), else as the polynomial in cos²θ.
 */
export function angularFormulaText(k: number, q: number): string {
  const qa = Math.abs(q);
  if (k === 1) return qa === 0 ? "sin²θ" : "(1 + cos²θ)/2";
  if (k === 2) return qa === 0 ? "3 sin²θ cos²θ" : qa === 1 ? "(cos²θ + cos²2θ)/2" : "(1 − cos⁴θ)/2";
  const terms: string[] = [];
  angularCoefficients(k, q).forEach((c, n) => {
    if (c[0] === 0n) return;
    const mag = fractionText([c[0] < 0n ? -c[0] : c[0], c[1]]);
    const power = n === 0 ? "" : n === 1 ? "cos²θ" : `cos${String(2 * n).replace(/\d/g, (d) => "⁰¹²³⁴⁵⁶⁷⁸⁹"[Number(d)]!)}θ`;
    const body = n === 0 ? mag : mag === "1" ? power : `${mag} ${power}`;
    terms.push(terms.length === 0 ? (c[0] < 0n ? `−${body}` : body) : `${c[0] < 0n ? "−" : "+"} ${body}`);
  });
  return terms.join(" ");
}

/**
 * The sense of circular polarization of a σ component seen along the field
 * (θ = 0: the field points toward the observer, the light travels along B).
 *
 * A photon emitted along +z in a Δm = q = +1 transition (m_upper − m_lower
 * = +1) carries angular momentum +ħ along its direction of travel: positive
 * helicity. Its electric vector turns counter-clockwise as seen by an
 * observer looking toward the source. That is right-circular in the IEEE
 * and IAU (1973, Commission 40) convention, where Stokes V > 0, and
 * left-circular in the optics convention of Born and Wolf ("Principles of
 * Optics", §1.4.2) (conventions from memory). Seen against the field
 * (θ = 180°) every sense reverses; in absorption the same Δm absorbs the
 * same sense. Exact: yes (a convention). Selection rule: |q| = 1 only
 * (null otherwise: π and |q| ≥ 2 components are not seen, or not circular,
 * along the field).
 *
 * Worked example: σ+ (q = +1) viewed along the field: "counter-clockwise
 * seen looking toward the source: right-circular (IAU/IEEE, V > 0),
 * left-circular in the optics convention".
 */
export function circularSense(q: number): string | null {
  if (q === 1) return "counter-clockwise seen looking toward the source: right-circular (IAU/IEEE, V > 0), left-circular in the optics convention";
  if (q === -1) return "clockwise seen looking toward the source: left-circular (IAU/IEEE, V < 0), right-circular in the optics convention";
  return null;
}
