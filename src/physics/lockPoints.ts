/**
 * Where a laser sits on a hyperfine-resolved line: the absolute frequency
 * and vacuum wavelength of each F → F′ group at zero field, and the
 * resonances a saturated-absorption (pump–probe) spectrum shows, namely the
 * F → F′ transitions and the crossovers halfway between two transitions
 * that share a level.
 *
 * Why crossovers sit at the midpoint (common practice; e.g. W. Demtröder,
 * "Laser Spectroscopy", the chapter on saturation spectroscopy): pump and
 * probe are counter-propagating beams of one frequency ν. Atoms of velocity
 * v along the beams see them Doppler-shifted the opposite way, ν(1 ± v/c).
 * When two transitions a and b start from the same lower level (or end in
 * the same upper level), the velocity class with ν(1 + v/c) = ν_a and
 * ν(1 − v/c) = ν_b is pumped on one and probed on the other through the
 * shared level, which happens at ν = (ν_a + ν_b)/2 to first order in v/c.
 * A crossover is seen only where its two transitions lie within about one
 * Doppler width of each other; this module lists every pair that shares a
 * level and leaves that judgement to the reader (the pair spacing is given).
 */
import { ZERO, type Dec } from "./decimal.js";
import type { Rational } from "./rational.js";

/** What a lock point needs of a hyperfine group F → F′ (HyperfineLineGroup has it). */
export interface LockGroup {
  /** Doubled upper F′ and lower F. */
  Fu2: number;
  Fl2: number;
  /** Zero-field frequency of the group from the hyperfine-free line centre, E_F′ − E_F, Hz. */
  offset: Dec;
  /** Share of the whole line (exact). */
  strength: Rational;
}

export interface LockPoint {
  kind: "transition" | "crossover";
  /**
   * Doubled lower F values, ascending: one for a transition and for a
   * crossover that shares its lower level, two for a crossover that shares
   * its upper level.
   */
  Fl2: number[];
  /** Doubled upper F′ values, ascending: one, or two for a crossover that shares its lower level. */
  Fu2: number[];
  /** Frequency from the hyperfine-free line centre at zero field, Hz. */
  offset: Dec;
  /** Absolute frequency ν0 + offset, Hz; null when the line centre is not known (no wavelength). */
  frequencyHz: Dec | null;
  /** The group's share of the line for a transition; null for a crossover (its strength depends on pump and probe). */
  strength: Rational | null;
  /** For a crossover, the spacing |ν_a − ν_b| of its two transitions (Hz); 0 for a transition. */
  spacing: Dec;
}

/**
 * Absolute frequency of a hyperfine group (or of any component) from the
 * line centre: ν = ν0 + Δ, with ν0 = c/λ the hyperfine-free line centre
 * (LineResult.frequencyHz) and Δ the component's offset from it
 * (HyperfineLineGroup.offset at zero field, or a Zeeman component's shift at
 * a field). Exact: the sum is exact in the working precision; ν is as good
 * as λ and the hyperfine constants are. Selection rules: none here (they
 * are in the offsets' source, hyperfineLines.ts).
 *
 * Worked example (87Rb D2, Steck's λ = 780.241 209 686 nm and constants):
 * ν0 = 299 792 458 / 780.241 209 686e-9 = 384 230 484 468 576.547… Hz; the
 * group F = 2 → F′ = 3 has offset (9A′/4 + B′/4) − 3A/4 = −2 369 265 229.089… Hz,
 * so ν = 384 228 115 203 347.458… Hz ≈ 384.228 115 203 THz (Steck's table:
 * 384.228 115 2 THz).
 */
export function absoluteFrequency(lineCentreHz: Dec, offsetHz: Dec): Dec {
  return lineCentreHz.add(offsetHz);
}

/**
 * Vacuum wavelength of a frequency: λ = c/ν, c = 299 792 458 m/s exactly
 * (the SI definition; pass SPEED_OF_LIGHT from units.ts). Exact: to the
 * working precision (60 digits). Selection rules: none.
 *
 * Worked example: ν = 384 228 115 203 347.458 Hz (87Rb D2, F = 2 → F′ = 3)
 * gives λ = 780.246 020 886…e-9 m, 4.811 pm longer than the line centre's
 * 780.241 209 686 nm (Δλ ≈ −λ·Δν/ν = 780.24 nm × 2.369 GHz / 384.23 THz).
 */
export function vacuumWavelength(frequencyHz: Dec, speedOfLight: Dec): Dec {
  return speedOfLight.div(frequencyHz);
}

const key = (p: LockPoint) => `${p.kind === "transition" ? 0 : 1}:${p.Fl2.join(",")}:${p.Fu2.join(",")}`;

/**
 * The saturated-absorption resonances of a hyperfine-resolved line, sorted
 * by frequency: every group F → F′ as a transition, and a crossover at
 * (ν_a + ν_b)/2 for every pair of groups that share their lower F (two
 * upper F′) or share their upper F′ (two lower F). Pairs at the same
 * frequency give no separate crossover and are left out. Ties in frequency
 * list transitions first, then by lower and upper F.
 *
 * Formula: ν_CO = (ν_a + ν_b)/2 = ν0 + (Δ_a + Δ_b)/2 (module comment; common
 * practice). Exact: yes, given the offsets (the midpoint of two decimals).
 * Selection rules: those of the groups (hyperfineGroupStrengths: triangle
 * rules, groups of zero strength left out); a crossover needs a shared level.
 *
 * Worked example (87Rb D2, the demo data's Steck constants): six transitions
 * (F = 2 → F′ = 1, 2, 3; F = 1 → F′ = 0, 1, 2), six crossovers sharing F = 2
 * or F = 1, and two sharing F′ = 1 or F′ = 2 (6.8 GHz apart, wider than the
 * Doppler profile of a vapour cell, so not seen there); 14 points. The
 * crossover F = 2 → F′ = 2, 3 lies (E_3′ − E_2′)/2 = 133.326 MHz below
 * F = 2 → F′ = 3 (Steck: 133.3 MHz).
 */
export function lockPoints(groups: readonly LockGroup[], lineCentreHz: Dec | null): LockPoint[] {
  const at = (offset: Dec) => (lineCentreHz === null ? null : absoluteFrequency(lineCentreHz, offset));
  const points: LockPoint[] = groups.map((g) => ({
    kind: "transition",
    Fl2: [g.Fl2],
    Fu2: [g.Fu2],
    offset: g.offset,
    frequencyHz: at(g.offset),
    strength: g.strength,
    spacing: ZERO,
  }));
  for (let i = 0; i < groups.length; i++) {
    for (let j = i + 1; j < groups.length; j++) {
      const a = groups[i]!;
      const b = groups[j]!;
      const sharesLower = a.Fl2 === b.Fl2;
      if (!sharesLower && a.Fu2 !== b.Fu2) continue;
      const spacing = a.offset.sub(b.offset).abs();
      if (spacing.isZero()) continue;
      const offset = a.offset.add(b.offset).div(2);
      const pair = (x: number, y: number) => [Math.min(x, y), Math.max(x, y)];
      points.push({
        kind: "crossover",
        Fl2: sharesLower ? [a.Fl2] : pair(a.Fl2, b.Fl2),
        Fu2: sharesLower ? pair(a.Fu2, b.Fu2) : [a.Fu2],
        offset,
        frequencyHz: at(offset),
        strength: null,
        spacing,
      });
    }
  }
  return points.sort((p, q) => p.offset.comparedTo(q.offset) || (key(p) < key(q) ? -1 : key(p) > key(q) ? 1 : 0));
}

/**
 * The strongest transition of a list of lock points, or null when there is
 * none: the reference the lock-point offsets start from until the reader
 * picks another.
 *
 * Formula: the transition with the largest S(F′, F), its share of the whole
 * line (hyperfineGroupStrengths; Sobelman §9.3, Steck's S_FF′ weighted by
 * the lower level's statistical weight); the lowest frequency among equals
 * (the list is sorted by frequency). Exact: yes (fractions compared
 * exactly). Selection rules: transitions only; crossovers have no strength.
 *
 * Worked example: 87Rb D2 gives F = 2 → F′ = 3, 7/16 of the line
 * (5/8 of the atoms in F = 2 times its share 7/10).
 */
export function strongestTransition(points: readonly LockPoint[]): LockPoint | null {
  let best: LockPoint | null = null;
  for (const p of points) {
    if (p.kind !== "transition" || p.strength === null) continue;
    if (best === null || p.strength.cmp(best.strength!) > 0) best = p;
  }
  return best;
}

