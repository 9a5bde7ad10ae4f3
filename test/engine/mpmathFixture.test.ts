/**
 * An independent check at fields that are not configured (4.7 G, 0.37 T):
 * test/fixtures/field/calculator-mpmath.json, written by
 * scripts/fixtures/calculator_mpmath.py with 50-digit mpmath (each level's
 * whole LS term on the full Kronecker-product basis |mL mS mI⟩, no M
 * blocks, so 87Rb 5²P3/2 is solved with 5²P1/2 as the atlas solves it;
 * dipole operator on the orbital part from sympy's exact 3j symbols), from
 * CODATA 2022 μB/h, g_e, m_e and D. A. Steck's Rubidium 87 and Cesium D Line
 * Data as in data/species/*.yaml. Checked: the float64 calculator to 1e-9
 * relative or 1 Hz (1e-12 for strengths), and the exact path of `npm run at`
 * to 1e-20 of the largest value compared.
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
  levels: {
    species: string; level: string; J2: number; I2: number; gJ: string; gI: string; A: string; B: string;
    term: { S2: number; L: number; gL: string; gS: string; levels: { level: string; J2: number; energy_Hz: string; gJ: string; gJ_given: boolean; A: string; B: string }[] };
    at: { B_T: string; states: { F: string; mF: string; E_Hz: string }[] }[];
  }[];
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
      // the whole term the fixture solved: the same listed partners, energies, constants and gJ in use
      const data = bySpecies.get(lv.species)!.data;
      const term = data.terms.find((t) => t.partners.some((p) => p.level === lv.level));
      if (lv.term.levels.length === 1) {
        expect(term, `${lv.species} ${lv.level} has no partners`).toBeUndefined();
        continue;
      }
      expect(term!.partners.map((p) => p.level).sort()).toEqual(lv.term.levels.map((x) => x.level).sort());
      expect([term!.S2, term!.L]).toEqual([lv.term.S2, lv.term.L]);
      // gL = 1 − m_e/M and gS = −g_e, computed by the script from CODATA 2022: 40 digits
      expect(new Dec(term!.gL).minus(lv.term.gL).abs().toNumber()).toBeLessThan(1e-35);
      expect(new Dec(term!.gS).eq(new Dec(lv.term.gS))).toBe(true);
      for (const x of lv.term.levels) {
        const p = term!.partners.find((q) => q.level === x.level)!;
        const l = data.levels.find((q) => q.id === x.level)!;
        expect(new Dec(p.energy).eq(new Dec(x.energy_Hz)), `${x.level} energy`).toBe(true);
        expect([new Dec(l.A).eq(new Dec(x.A)), new Dec(l.B).eq(new Dec(x.B))], `${x.level} A, B`).toEqual([true, true]);
        // a given gJ digit for digit; the LS one (from the script's own operators) to its 40 printed digits
        if (x.gJ_given) expect(new Dec(l.gJ).eq(new Dec(x.gJ)), `${x.level} gJ`).toBe(true);
        else expect(new Dec(l.gJ).minus(x.gJ).abs().toNumber(), `${x.level} gJ (LS)`).toBeLessThan(1e-35);
      }
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
        // 5²P3/2 is solved with its listed partner 5²P1/2 (src/results/lineModel.ts)
        expect(fl.model).toBe("term hyperfine–Zeeman eigenstates");
        expect(ex.model).toBe("term hyperfine–Zeeman eigenstates");
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
