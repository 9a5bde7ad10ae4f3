/**
 * Comparison of a float64 calculator answer with an exact one (decimal
 * strings): the tolerance the calculator promises, 1e-9 relative or 1 Hz
 * absolute for frequencies (whichever is larger), 1e-9 relative or 1e-12
 * absolute for relative strengths; absolute frequencies (ν0 + shift) as
 * their shift, plus the float64 spacing near ν0. Components are matched by their state
 * labels; a component only one side lists must be weaker than 1e-15 (both
 * sides drop those under 1e-20, and near that threshold float64 and Dec may
 * fall on different sides).
 */
import { expect } from "vitest";
import type { AtResult } from "../../src/engine/types.js";
import type { ExactAnswer } from "./exportAt.js";

export type { ExactAnswer };

export const REL = 1e-9;
export const HZ = 1;
export const STRENGTH = 1e-12;
const UNMATCHED = 1e-15;

export function close(a: number, b: number, abs: number): boolean {
  return Math.abs(a - b) <= Math.max(REL * Math.max(Math.abs(a), Math.abs(b)), abs);
}

function expectClose(a: number, exact: string, abs: number, what: string): void {
  const b = Number(exact);
  if (!close(a, b, abs)) expect.fail(`${what}: calculator ${a}, exact ${exact} (difference ${a - b})`);
}

/** Assert that the calculator's answer matches the exact one within the tolerance; returns the number of values compared. */
export function expectAgrees(float: AtResult<number>, exact: ExactAnswer, where: string): number {
  let n = 0;
  expect(float.levels.map((l) => l.id), `${where}: levels`).toEqual(exact.levels.map((l) => l.id));
  exact.levels.forEach((l, i) => {
    const fl = float.levels[i]!;
    expect(fl.states.map((s) => [s.F, s.mF, s.high_field]), `${where} ${l.id}: labels`).toEqual(l.states.map((s) => [s.F, s.mF, s.high_field]));
    l.states.forEach((s, k) => {
      expectClose(fl.states[k]!.E_Hz, s.E_Hz, HZ, `${where} ${l.id} F=${s.F} mF=${s.mF} E_Hz`);
      n++;
    });
  });
  const label = (t: { level: string; lower: { F: string; mF: string }; upper: { F: string; mF: string }; kind: string }) =>
    `${t.level} ${t.lower.F},${t.lower.mF} → ${t.upper.F},${t.upper.mF} ${t.kind}`;
  expect(float.transitions.map(label), `${where}: transitions`).toEqual(exact.transitions.map(label));
  exact.transitions.forEach((t, i) => {
    expectClose(float.transitions[i]!.Hz, t.Hz, HZ, `${where} ${label(t)} Hz`);
    n++;
  });
  expect(float.lines.map((l) => l.id), `${where}: lines`).toEqual(exact.lines.map((l) => l.id));
  exact.lines.forEach((ln, i) => {
    const fl = float.lines[i]!;
    expect([fl.model, fl.regime], `${where} line ${ln.id}: model and regime`).toEqual([ln.model, ln.regime]);
    for (let k = 1; k < fl.components.length; k++) {
      expect(fl.components[k]!.shift_Hz, `${where} line ${ln.id}: sorted by shift`).toBeGreaterThanOrEqual(fl.components[k - 1]!.shift_Hz);
    }
    const key = (c: { upper: string; lower: string }) => `${c.upper} → ${c.lower}`;
    // the J-resolved pattern repeats labels only when it lists the same pair twice; it never does
    const floatByKey = new Map(fl.components.map((c) => [key(c), c]));
    expect(floatByKey.size, `${where} line ${ln.id}: unique components`).toBe(fl.components.length);
    const seen = new Set<string>();
    for (const c of ln.components) {
      const f = floatByKey.get(key(c));
      seen.add(key(c));
      if (!f) {
        expect(Number(c.relative_strength), `${where} line ${ln.id} ${key(c)} missing from the calculator`).toBeLessThan(UNMATCHED);
        continue;
      }
      expect([f.delta_m, f.polarization], `${where} line ${ln.id} ${key(c)}`).toEqual([c.delta_m, c.polarization]);
      expectClose(f.relative_strength, c.relative_strength, STRENGTH, `${where} line ${ln.id} ${key(c)} relative_strength`);
      expectClose(f.shift_Hz, c.shift_Hz, HZ, `${where} line ${ln.id} ${key(c)} shift_Hz`);
      // the absolute frequency ν0 + shift: the shift's tolerance, plus the float64 spacing near ν0 (0.0625 Hz at 384 THz)
      if (c.frequency_Hz === null || f.frequency_Hz === null) expect([f.frequency_Hz, c.frequency_Hz], `${where} line ${ln.id} ${key(c)} frequency_Hz`).toEqual([null, null]);
      else {
        const allowed = Math.max(REL * Math.abs(Number(c.shift_Hz)), HZ) + 2 * Number.EPSILON * Number(c.frequency_Hz);
        const diff = f.frequency_Hz - Number(c.frequency_Hz);
        if (!(Math.abs(diff) <= allowed)) expect.fail(`${where} line ${ln.id} ${key(c)} frequency_Hz: calculator ${f.frequency_Hz}, exact ${c.frequency_Hz} (difference ${diff})`);
      }
      n += 3;
    }
    for (const c of fl.components) {
      if (!seen.has(key(c))) expect(c.relative_strength, `${where} line ${ln.id} ${key(c)} only in the calculator`).toBeLessThan(UNMATCHED);
    }
  });
  return n;
}
