/**
 * J-resolved Zeeman patterns of a line in the weak-field (linear) regime.
 *
 * Reference: E. U. Condon and G. H. Shortley, "The Theory of Atomic Spectra"
 * (1935), ch. XVI; strengths as squared 3j symbols as in Edmonds (1957) §5.4;
 * effective Landé factor from J. C. del Toro Iniesta, "Introduction to
 * Spectropolarimetry" (2003), eq. 3.44 (Shenstone–Blair / Landi Degl'Innocenti).
 */
import { Dec } from "./decimal.js";
import { Rational } from "./rational.js";
import { mValues } from "./quantum.js";
import { threeJ } from "./wigner.js";
import { polarizationOf, type Polarization } from "./polarization.js";

export { polarizationOf, type Polarization } from "./polarization.js";
export type Multipole = "E1" | "M1" | "E2" | "M2" | "E3";

/** Rank k of a multipole: 1 for E1 and M1, 2 for E2 and M2, 3 for E3 (the digit of its name). */
export function multipoleRank(m: Multipole): number {
  return Number(m.slice(1));
}

/** Whether a multipole is magnetic (M1, M2): its operator has a spin part as well as an orbital one. */
export function isMagneticMultipole(m: Multipole): boolean {
  return m.startsWith("M");
}

/**
 * Whether a multipole changes parity: an electric multipole Ek has parity
 * (−1)^k, a magnetic one Mk has (−1)^(k+1), so E1, M2 and E3 change it and
 * M1 and E2 keep it. Reference: Sobelman, "Atomic Spectra and Radiative
 * Transitions" (1979), §9.1 (common practice). Exact: yes.
 * Worked example: Sr 5s² ¹S0 → 5s5p ³P°2 (M2) changes parity; 40Ca⁺ 729 nm (E2) does not.
 */
export function multipoleChangesParity(m: Multipole): boolean {
  const k = multipoleRank(m);
  return isMagneticMultipole(m) ? k % 2 === 0 : k % 2 === 1;
}

/** The multipole's name in words, e.g. "electric octupole" for E3. */
export function multipoleName(m: Multipole): string {
  const kind = isMagneticMultipole(m) ? "magnetic" : "electric";
  const rank = ["dipole", "quadrupole", "octupole"][multipoleRank(m) - 1] ?? `rank-${multipoleRank(m)} multipole`;
  return `${kind} ${rank}`;
}

export interface PatternComponent {
  /** Doubled upper m. */
  mu2: number;
  /** Doubled lower m. */
  ml2: number;
  /** Δm = mu − ml (an ordinary integer). */
  deltaM: number;
  polarization: Polarization;
  /** Squared 3j symbol (Ju k Jl; −mu, Δm, ml); all strengths of a line sum to 1. Exact. */
  strength: Rational;
  /** gu·mu − gl·ml with the g values in use (measured where given). */
  shiftLorentz: Dec;
  /** The same with the exact LS values (gL = 1, gS = 2). */
  shiftLorentzExact: Rational;
  /** shiftLorentz·μB/h, in Hz/T. */
  shiftHzPerT: Dec;
}

export interface PatternLevel {
  /** Doubled J. */
  J2: number;
  /** g in use (measured or LS), null for J = 0. */
  g: Dec | null;
  /** Exact LS g (gL = 1, gS = 2), null for J = 0. */
  gExact: Rational | null;
}

/**
 * Every Zeeman component (mu, ml) of a line between an upper and a lower
 * level, for a multipole of rank k.
 *
 * Formula: strength = (Ju k Jl; −mu, Δm, ml)² with Δm = mu − ml; shift in
 * Lorentz units gu·mu − gl·ml; in Hz/T times μB/h.
 * Selection rules: |Δm| ≤ k and a non-zero 3j symbol (which also enforces the
 * triangle rule on Ju, k, Jl); components of zero strength are left out.
 * Exact: strengths and exact-LS shifts yes; shifts with measured g, no.
 * Ordered by shift (exact LS), then by Δm.
 *
 * Worked example (Na D2, 2P3/2 → 2S1/2, E1): six components; σ+ (3/2, 1/2)
 * strength 1/4, σ+ (1/2, −1/2) 1/12, π (±1/2, ±1/2) 1/6 each, σ− mirrored:
 * the textbook 3:1:2:2:1:3.
 */
export function lineComponents(upper: PatternLevel, lower: PatternLevel, k: number, muB_h: Dec): PatternComponent[] {
  const out: PatternComponent[] = [];
  const gu = upper.g ?? new Dec(0);
  const gl = lower.g ?? new Dec(0);
  const gue = upper.gExact ?? Rational.ZERO;
  const gle = lower.gExact ?? Rational.ZERO;
  for (const mu2 of mValues(upper.J2)) {
    for (const ml2 of mValues(lower.J2)) {
      const dm2 = mu2 - ml2;
      if (Math.abs(dm2) > 2 * k) continue;
      const s = threeJ(upper.J2, 2 * k, lower.J2, -mu2, dm2, ml2);
      if (s.sign === 0) continue;
      const mu = Rational.half(mu2);
      const ml = Rational.half(ml2);
      const shiftLorentz = gu.mul(mu.toDecimal()).sub(gl.mul(ml.toDecimal()));
      out.push({
        mu2,
        ml2,
        deltaM: dm2 / 2,
        polarization: polarizationOf(dm2 / 2),
        strength: s.squared,
        shiftLorentz,
        shiftLorentzExact: gue.mul(mu).sub(gle.mul(ml)),
        shiftHzPerT: shiftLorentz.mul(muB_h),
      });
    }
  }
  out.sort((a, b) => a.shiftLorentzExact.cmp(b.shiftLorentzExact) || a.deltaM - b.deltaM || a.mu2 - b.mu2);
  return out;
}

/**
 * Why a line of rank k ≥ 2 has no g_eff (shown where the number would be),
 * or null for a dipole line (E1, M1), which has one. Worked example: E3 →
 * "not defined for an electric-octupole (E3) line: … also has Δm = ±2 and ±3 components".
 */
export function gEffNote(m: Multipole): string | null {
  const k = multipoleRank(m);
  if (k === 1) return null;
  const higher = Array.from({ length: k - 1 }, (_, i) => `±${i + 2}`);
  const dms = higher.length === 1 ? higher[0]! : `${higher.slice(0, -1).join(", ")} and ${higher.at(-1)!}`;
  const name = multipoleName(m).replace(" ", "-");
  // "an E2", "an M2" (both letters are read with a vowel sound)
  return `not defined for ${/^[aeiou]/.test(name) ? "an" : "a"} ${name} (${m}) line: g_eff is the first moment of the σ components of a dipole line, and an ${m} line also has Δm = ${dms} components`;
}

/** Why a quadrupole (E2) line has no g_eff: gEffNote("E2"). */
export const QUADRUPOLE_G_EFF_NOTE = gEffNote("E2")!;

/**
 * Effective Landé factor of a line (the first moment of its σ components):
 * g_eff = (gu + gl)/2 + (gu − gl)[Ju(Ju+1) − Jl(Jl+1)]/4; a J = 0 level
 * contributes g = 0. Defined for dipole lines (E1, M1) only: callers give
 * null for E2 lines (QUADRUPOLE_G_EFF_NOTE). Exact: no when g values are measured.
 * Reference: del Toro Iniesta (2003), eq. 3.44.
 *
 * Worked example: Fe I 525.02 nm (upper z 7D°1, g = 3; lower a 5D0) gives 3;
 * Fe I 630.25 nm (lower z 5P°1, g = 5/2; upper e 5D0) gives 5/2: the two
 * solar magnetograph lines (Solanki, Space Sci. Rev. 63, 1 (1993)).
 */
export function effectiveLande(upper: { J2: number; g: Dec | null }, lower: { J2: number; g: Dec | null }): Dec {
  const gu = upper.g ?? new Dec(0);
  const gl = lower.g ?? new Dec(0);
  const ju = Rational.of(upper.J2 * (upper.J2 + 2), 4).toDecimal();
  const jl = Rational.of(lower.J2 * (lower.J2 + 2), 4).toDecimal();
  return gu.add(gl).div(2).add(gu.sub(gl).mul(ju.sub(jl)).div(4));
}

function lcm(a: bigint, b: bigint): bigint {
  let x = a;
  let y = b;
  while (y !== 0n) [x, y] = [y, x % y];
  return (a / x) * b;
}

/**
 * The classical notation of a Zeeman pattern, "(π shifts) σ shifts / d": the
 * distinct non-negative Lorentz-unit shifts of the π components in
 * parentheses, then those of the σ components, all as numerators over their
 * least common denominator d. Several π shifts share one pair of parentheses.
 * Uses the exact LS shifts. Exact: yes.
 *
 * Lines of rank k ≥ 2 (E2 and M2: k = 2; E3: k = 3) use the same notation
 * with every non-π group after the parentheses, the |Δm| = 1 shifts first
 * and each further |Δm| after a semicolon: "(π) Δm = ±1; Δm = ±2 / d" for
 * k = 2, "(π) ±1; ±2; ±3 / d" for k = 3. An empty group is written "none".
 *
 * Worked examples (Condon and Shortley, ch. XVI; White, "Introduction to
 * Atomic Spectra" (1934), ch. X): Na D1 "(2) 4 / 3"; Na D2 "(1) 3, 5 / 3";
 * a normal triplet "(0) 1 / 1"; Hg 546.1 nm (3S1 → 3P2) "(0, 1) 2, 3, 4 / 2".
 * E2, by hand from the LS g values: 40Ca+ 729 nm (3d ²D5/2 → 4s ²S1/2,
 * g = 6/5 and 2) "(2) 4, 8; 10, 14 / 5"; [O I] 557.7 nm (¹S0 → ¹D2, g = 1)
 * "(0) 1; 2 / 1". M2, by hand: Sr 5s² ¹S0 → 5s5p ³P°2 (g = 3/2; the J = 0
 * level gives no shift) "(0) 3; 6 / 2". E3, by hand: 171Yb⁺ 467 nm
 * (4f¹³6s² ²F°7/2 → 6s ²S1/2, g = 8/7 and 2) "(3) 5, 11; 13, 19; 21, 27 / 7".
 */
export function patternNotation(components: PatternComponent[], k: number): string | null {
  if (!Number.isInteger(k) || k < 1) return null;
  const distinct = (dm: number): Rational[] => {
    const seen = new Map<string, Rational>();
    for (const c of components) {
      if (Math.abs(c.deltaM) !== dm) continue;
      const a = c.shiftLorentzExact.abs();
      seen.set(a.toString(), a);
    }
    return [...seen.values()].sort((a, b) => a.cmp(b));
  };
  const pi = distinct(0);
  const rest = Array.from({ length: k }, (_, i) => distinct(i + 1));
  let d = 1n;
  for (const r of [...pi, ...rest.flat()]) d = lcm(d, r.den);
  const nums = (rs: Rational[]) => (rs.length === 0 ? "none" : rs.map((r) => ((r.num * d) / r.den).toString()).join(", "));
  return `(${nums(pi)}) ${rest.map(nums).join("; ")} / ${d}`;
}

/**
 * One-line reading of a pattern, from the exact LS shifts.
 * Dipole lines (k = 1): "no splitting", "normal triplet" (π at 0, σ at ±1
 * Lorentz unit), "triplet, σ at ±g" (π at 0, one σ shift g ≠ 1), or
 * "anomalous: n π and m σ components".
 * Quadrupole (k = 2: E2, M2) and octupole (k = 3: E3) lines, in their own
 * words: "no splitting"; "normal quadrupole quintuplet" when Δm = 0, ±1, ±2
 * fall at 0, ±1, ±2 Lorentz units (both g = 1, or a J = 0 level with g = 1
 * on the other), "normal octupole septuplet" likewise up to ±3;
 * "quadrupole quintuplet, spacing s Lorentz units" for 0, ±s, ±2s
 * ("octupole septuplet, …" for 0, ±s, ±2s, ±3s); else "quadrupole pattern:
 * n components with Δm = 0, m with Δm = ±1, p with Δm = ±2, spread over ±x
 * Lorentz units" ("octupole pattern: …, r with Δm = ±3, …"), counting
 * components of non-zero strength, x the largest shift.
 *
 * Worked examples: a singlet dipole line 1P1 → 1S0 is a "normal triplet";
 * [O I] 557.7 nm (¹S0 → ¹D2, E2) is a "normal quadrupole quintuplet"; Sr
 * ¹S0 → ³P°2 (M2, g = 3/2) a "quadrupole quintuplet, spacing 3/2 Lorentz
 * units"; 171Yb⁺ 467 nm (E3) an "octupole pattern: 2 components with Δm = 0,
 * 4 with Δm = ±1, 4 with Δm = ±2, 4 with Δm = ±3, spread over ±27/7 Lorentz units".
 */
export function patternSummary(components: PatternComponent[], k = 1): string {
  if (components.every((c) => c.shiftLorentzExact.isZero())) return "no splitting";
  const shifts = (dm: number) => new Set(components.filter((c) => Math.abs(c.deltaM) === dm).map((c) => c.shiftLorentzExact.abs().toString()));
  const count = (dm: number) => components.filter((c) => Math.abs(c.deltaM) === dm).length;
  const piShifts = shifts(0);
  const sigmaShifts = shifts(1);
  if (k >= 2) {
    const [name, many] = k === 2 ? ["quadrupole", "quintuplet"] : k === 3 ? ["octupole", "septuplet"] : [`rank-${k}`, `${2 * k + 1}-component pattern`];
    const ranks = Array.from({ length: k }, (_, i) => i + 1);
    if (piShifts.size === 1 && piShifts.has("0") && ranks.every((dm) => shifts(dm).size === 1)) {
      const s = components.find((c) => Math.abs(c.deltaM) === 1)!.shiftLorentzExact.abs();
      const evenlySpaced = ranks.every((dm) => components.find((c) => Math.abs(c.deltaM) === dm)!.shiftLorentzExact.abs().cmp(s.mul(Rational.of(dm))) === 0);
      if (evenlySpaced) return s.cmp(Rational.ONE) === 0 ? `normal ${name} ${many}` : `${name} ${many}, spacing ${s.toString()} Lorentz units`;
    }
    let widest = Rational.ZERO;
    for (const c of components) if (c.shiftLorentzExact.abs().cmp(widest) > 0) widest = c.shiftLorentzExact.abs();
    const counts = ranks.map((dm) => `${count(dm)} with Δm = ±${dm}`).join(", ");
    return `${name} pattern: ${count(0)} components with Δm = 0, ${counts}, spread over ±${widest.toString()} Lorentz units`;
  }
  if (piShifts.size === 1 && piShifts.has("0") && sigmaShifts.size === 1) {
    const s = [...sigmaShifts][0]!;
    return s === "1" ? "normal triplet" : `triplet, σ at ±${s} Lorentz units`;
  }
  return `anomalous: ${count(0)} π and ${count(1)} σ components`;
}
