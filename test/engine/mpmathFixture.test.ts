/**
 * An independent check at fields that are not configured (4.7 G, 0.37 T):
 * test/fixtures/field/calculator-mpmath.json, written by
 * scripts/fixtures/calculator_mpmath.py with 50-digit mpmath (full
 * Kronecker-product Hamiltonian, no M blocks; dipole operator from sympy's
 * exact 3j symbols), from CODATA 2022 μB/h and D. A. Steck's Rubidium 87 and
 * Cesium D Line Data as in data/species/*.yaml. Checked: the float64
 * calculator to 1e-9 relative or 1 Hz (1e-12 for strengths), and the exact
 * path of `npm run at` to 1e-20 of the largest value compared.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { engineAt } from "../../src/engine/engine.js";
import { exactAt } from "../../src/engine/exactAt.js";
import type { AtResult } from "../../src/engine/types.js";
import { ROOT } from "../support/runBuild.js";
import { demoSpecies } from "./demo.js";
import { close, HZ, STRENGTH } from "./compare.js";

interface Fixture {
  source: string;
  muB_h: string;
  fields: { text: string; tesla: string }[];
  levels: { species: string; level: string; J2: number; I2: number; gJ: string; gI: string; A: string; B: string; at: { B_T: string; states: { F: string; mF: string; E_Hz: string }[] }[] }[];
  lines: { species: string; line: string; at: { B_T: string; components: { upper: string; lower: string; delta_m: number; relative_strength: string; shift_Hz: string }[] }[] }[];
}

const fixture = JSON.parse(readFileSync(join(ROOT, "test/fixtures/field/calculator-mpmath.json"), "utf8")) as Fixture;
const { species, configured, constants, folder } = demoSpecies();
const bySpecies = new Map(species.map((s) => [s.id, s]));

/** Exact-path answers (as `npm run at` computes them), once per species and field. */
const exactCache = new Map<string, AtResult<string>>();
function exact(id: string, B_T: string): AtResult<string> {
  const key = `${id} ${B_T}`;
  let a = exactCache.get(key);
  if (!a) {
    const input = folder.species.find((s) => s.id === id)!;
    exactCache.set(key, (a = exactAt(input, constants, { text: `${B_T} T`, tesla: new Dec(B_T) })));
  }
  return a;
}

/** |a − b| ≤ 1e-20·scale in Dec. */
function expectExact(a: string, b: string, scale: Dec, what: string): void {
  const d = new Dec(a).sub(new Dec(b)).abs();
  if (d.gt(scale.mul("1e-20"))) expect.fail(`${what}: exact path ${a}, mpmath ${b}`);
}

function expectFloat(a: number, b: string, abs: number, what: string): void {
  if (!close(a, Number(b), abs)) expect.fail(`${what}: calculator ${a}, mpmath ${b}`);
}

describe("field calculator and npm run at against mpmath (calculator-mpmath.json)", () => {
  it("names its sources and uses fields that are not configured", () => {
    expect(fixture.source).toMatch(/CODATA 2022/);
    expect(fixture.source).toMatch(/Steck/);
    expect(fixture.fields.map((f) => f.text)).toEqual(["4.7 G", "0.37 T"]);
    for (const f of fixture.fields) expect(configured.some((c) => c.tesla.eq(new Dec(f.tesla)))).toBe(false);
  });

  it("was made from the demo data's constants (so it is not stale)", () => {
    expect(new Dec(fixture.muB_h).eq(new Dec(bySpecies.get("rb87")!.data.muB_h))).toBe(true);
    for (const lv of fixture.levels) {
      const d = bySpecies.get(lv.species)!.data.levels.find((l) => l.id === lv.level)!;
      expect([d.J2, d.I2]).toEqual([lv.J2, lv.I2]);
      for (const k of ["gJ", "gI", "A", "B"] as const) expect(new Dec(d[k]).eq(new Dec(lv[k])), `${lv.species} ${lv.level} ${k}`).toBe(true);
    }
  });

  for (const lv of fixture.levels) {
    it(`${lv.species} ${lv.level}: sublevel energies`, () => {
      const data = bySpecies.get(lv.species)!.data;
      for (const at of lv.at) {
        const scale = Dec.max(...at.states.map((s) => new Dec(s.E_Hz).abs()));
        const float = engineAt(data, Number(at.B_T)).levels.find((l) => l.id === lv.level)!.states;
        const ex = exact(lv.species, at.B_T).levels.find((l) => l.id === lv.level)!.states;
        expect(float.map((s) => `${s.F},${s.mF}`)).toEqual(at.states.map((s) => `${s.F},${s.mF}`));
        expect(ex.map((s) => `${s.F},${s.mF}`)).toEqual(at.states.map((s) => `${s.F},${s.mF}`));
        at.states.forEach((s, i) => {
          const what = `${lv.species} ${lv.level} at ${at.B_T} T F=${s.F} mF=${s.mF}`;
          expectFloat(float[i]!.E_Hz, s.E_Hz, HZ, what);
          expectExact(ex[i]!.E_Hz, s.E_Hz, scale, what);
        });
      }
    });
  }

  for (const ln of fixture.lines) {
    it(`${ln.species} ${ln.line}: components (positions and strengths)`, () => {
      const data = bySpecies.get(ln.species)!.data;
      for (const at of ln.at) {
        const fl = engineAt(data, Number(at.B_T)).lines.find((l) => l.id === ln.line)!;
        const ex = exact(ln.species, at.B_T).lines.find((l) => l.id === ln.line)!;
        expect(fl.model).toBe("hyperfine–Zeeman eigenstates");
        expect(ex.model).toBe("hyperfine–Zeeman eigenstates");
        const key = (c: { upper: string; lower: string }) => `${c.upper} → ${c.lower}`;
        const want = new Map(at.components.map((c) => [key(c), c]));
        expect(new Set(fl.components.map(key))).toEqual(new Set(want.keys()));
        expect(new Set(ex.components.map(key))).toEqual(new Set(want.keys()));
        const shiftScale = Dec.max(...at.components.map((c) => new Dec(c.shift_Hz).abs()));
        for (const c of fl.components) {
          const w = want.get(key(c))!;
          const what = `${ln.line} at ${at.B_T} T ${key(c)}`;
          expect(c.delta_m).toBe(w.delta_m);
          expectFloat(c.relative_strength, w.relative_strength, STRENGTH, `${what} strength`);
          expectFloat(c.shift_Hz, w.shift_Hz, HZ, `${what} shift`);
        }
        for (const c of ex.components) {
          const w = want.get(key(c))!;
          const what = `${ln.line} at ${at.B_T} T ${key(c)}`;
          // 1e-20 absolute: the exact path prints strengths (all below 1) at 20 digits, like the export
          expectExact(c.relative_strength, w.relative_strength, new Dec(1), `${what} strength`);
          expectExact(c.shift_Hz, w.shift_Hz, shiftScale, `${what} shift`);
        }
      }
    });
  }
});
