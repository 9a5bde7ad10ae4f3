/**
 * The laser-bench keys of the export (README, "The JSON export"): absolute
 * frequencies of the hyperfine groups and of every component at every
 * field, and the lock points, from the demo's 87Rb data (D. A. Steck's
 * constants) and a copy of it without wavelengths.
 */
import { mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { exportsOf } from "../support/exports.js";
import { DEMO_DATA, tempDir } from "../support/runBuild.js";

type Json = Record<string, any>;
let dir: string;
let rb: Json;
let bare: Json;
const MHZ = new Dec("1e6");
const THZ = new Dec("1e12");
// c = 299 792 458 m/s exactly (SI definition)
const C = new Dec("299792458");

beforeAll(() => {
  dir = tempDir("atlas-lock-");
  const species = readFileSync(join(DEMO_DATA, "species/rb87.yaml"), "utf8");
  mkdirSync(join(dir, "species"));
  writeFileSync(join(dir, "site.yaml"), readFileSync(join(DEMO_DATA, "site.yaml"), "utf8"));
  writeFileSync(join(dir, "species/rb87.yaml"), species);
  writeFileSync(
    join(dir, "species/rb87-bare.yaml"),
    species.replace(/^id: rb87$/m, "id: rb87-bare").replace(/^ {4}wavelength: .*\n/gm, ""),
  );
  const exports = exportsOf(dir);
  rb = JSON.parse(exports.get("rb87")!);
  bare = JSON.parse(exports.get("rb87-bare")!);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const line = (e: Json, id: string) => e.lines.find((l: Json) => l.id === id);
const dec = (s: string) => new Dec(s);

describe("absolute frequencies of the hyperfine groups", () => {
  it("put 87Rb D2 F = 2 → F′ = 3 at 384.228 115 2 THz", () => {
    const g = line(rb, "D2").hyperfine_groups.find((x: Json) => x.F_lower === "2" && x.F_upper === "3");
    // from memory: Steck, "Rubidium 87 D Line Data", D2 hyperfine structure: F = 2 → F′ = 3 at 384.228 115 2 THz.
    // The demo data give λ to 12 digits and A′, B′ to a few kHz: compare to the handbook's last digit (±50 kHz).
    expect(dec(g.frequency_Hz).div(THZ).sub("384.2281152").abs().lt("0.00000005")).toBe(true);
  });

  it("are the line frequency plus the group offset, E_F′ − E_F from the levels' zero-field hyperfine energies, and c over the vacuum wavelength", () => {
    for (const ln of rb.lines) {
      const upper = rb.levels.find((l: Json) => l.id === ln.upper);
      const lower = rb.levels.find((l: Json) => l.id === ln.lower);
      const zf = (lv: Json, F: string) => dec(lv.hyperfine.find((h: Json) => h.F === F).zero_field_Hz);
      expect(ln.hyperfine_groups.length).toBeGreaterThan(0);
      for (const g of ln.hyperfine_groups) {
        const offset = zf(upper, g.F_upper).sub(zf(lower, g.F_lower));
        // 30 significant digits: 1e-15 Hz at 384 THz
        expect(dec(g.frequency_Hz).sub(ln.frequency_Hz).sub(offset).abs().lt("1e-12"), `${ln.id} ${g.F_lower}→${g.F_upper}`).toBe(true);
        expect(dec(g.vacuum_wavelength_m).mul(g.frequency_Hz).div(C).sub(1).abs().lt("1e-28")).toBe(true);
      }
    }
  });

  it("are null without a wavelength, while the offsets stay", () => {
    const g = line(bare, "D2").hyperfine_groups[0];
    expect([g.frequency_Hz, g.vacuum_wavelength_m]).toEqual([null, null]);
    expect(g.offset_Hz).toBe(line(rb, "D2").hyperfine_groups[0].offset_Hz);
  });
});

describe("absolute frequencies of the components at each field", () => {
  it("equal the line frequency plus E_upper − E_lower of the two states in the levels' field tables", () => {
    let checked = 0;
    for (const ln of rb.lines) {
      const table = (id: string, i: number) => rb.levels.find((l: Json) => l.id === id).field_table[i].states as Json[];
      ln.at_fields.forEach((a: Json, i: number) => {
        const energy = (id: string, label: string) => {
          const m = /^F=([^,]+), mF=(.+)$/.exec(label);
          if (!m) return null;
          const st = table(id, i).find((s) => s.F === m[1] && s.mF === m[2]);
          return st ? dec(st.E_Hz) : null;
        };
        for (const c of a.components) {
          // the shift as exported is the frequency less the line centre, for every model
          expect(dec(c.frequency_Hz).sub(ln.frequency_Hz).sub(c.shift_Hz).abs().lt("1e-12")).toBe(true);
          const eu = energy(ln.upper, c.upper);
          const el = energy(ln.lower, c.lower);
          if (eu === null || el === null) continue;
          // both sides rounded to 30 significant digits in the export: agreement to 1e-12 Hz
          expect(dec(c.frequency_Hz).sub(ln.frequency_Hz).sub(eu.sub(el)).abs().lt("1e-12"), `${ln.id} at ${a.B_T} T: ${c.upper} → ${c.lower}`).toBe(true);
          checked++;
        }
      });
    }
    // 87Rb D1 and D2 at seven fields, in the hyperfine–Zeeman model throughout
    expect(checked).toBeGreaterThan(500);
  });

  it("are null without a wavelength", () => {
    expect(line(bare, "D2").at_fields.every((a: Json) => a.components.every((c: Json) => c.frequency_Hz === null))).toBe(true);
  });
});

describe("uncertainties of the weak-field hyperfine components and the linear limits", () => {
  it("give the D2 cycling component's shift_Hz_per_T_u = √((μB/h·3u(gJ′)/2)² + (μB/h·u(gJ)/2)² + (s·u(μB/h))²), gI cancelling", () => {
    const g = line(rb, "D2").hyperfine_groups.find((x: Json) => x.F_lower === "2" && x.F_upper === "3");
    const c = g.components.find((x: Json) => x.mF_upper === "3" && x.mF_lower === "2");
    // gJ′ = 1.3362(13), gJ = 2.00233113(20) (Steck); μB/h = 13 996 244 917.1(4.4) Hz/T (CODATA 2022)
    const mu = dec("13996244917.1");
    const s = dec("1.5").mul("1.3362").sub(dec("0.5").mul("2.00233113"));
    const hand = mu.mul("0.00195").pow(2).add(mu.mul("0.0000001").pow(2)).add(s.mul("4.4").pow(2)).sqrt();
    expect(dec(c.shift_Hz_per_T_u).div(hand).sub(1).abs().lt("1e-9")).toBe(true);
  });

  it("give a group's vacuum wavelength the uncertainty λ·u(ν)/ν (∂λ/∂ν = −c/ν², textbook), and mark strengths at a field as not propagated", () => {
    const g = line(rb, "D2").hyperfine_groups.find((x: Json) => x.F_lower === "2" && x.F_upper === "3");
    const want = dec(g.vacuum_wavelength_m).mul(g.frequency_Hz_u).div(g.frequency_Hz);
    expect(dec(g.vacuum_wavelength_m_u).sub(want).abs().lt(want.mul("1e-25"))).toBe(true);
    // 4.6 kHz at 384 THz is 1.2e-11 relative: 9.3e-18 m at 780 nm (hand arithmetic)
    expect(dec(g.vacuum_wavelength_m_u).toNumber()).toBeCloseTo(9.33e-18, 19);
    const c = line(rb, "D2").at_fields[1].components[0];
    expect([c.relative_strength_u, c.relative_strength_u_note]).toEqual([null, "not propagated"]);
  });

  it("mark the limits of the linear regime as not propagated, their _u keys null", () => {
    const lv = rb.levels.find((l: Json) => l.id === "5s-S1/2");
    expect(lv.linear_validity.uncertainty).toBe("not propagated");
    expect(lv.linear_validity.within_1_percent_up_to_T_u).toBeNull();
    expect(lv.linear_validity.within_1_kHz_up_to_T_u).toBeNull();
  });
});

describe("lock points", () => {
  it("name a crossover's shared level as a string and its pair as a two-element array", () => {
    const lp = line(rb, "D2").lock_points as Json[];
    expect(lp.find((p) => p.kind === "crossover" && p.F_lower === "2" && Array.isArray(p.F_upper) && p.F_upper.join() === "2,3")).toBeDefined();
    expect(lp.find((p) => p.kind === "crossover" && p.F_upper === "2" && Array.isArray(p.F_lower) && p.F_lower.join() === "1,2")).toBeDefined();
    for (const p of lp) {
      const pair = [p.F_lower, p.F_upper].filter(Array.isArray);
      expect(pair.length, JSON.stringify(p)).toBe(p.kind === "crossover" ? 1 : 0);
      expect(Object.keys(p).sort()).toEqual(["F_lower", "F_upper", "frequency_Hz", "frequency_Hz_u", "kind", "offset_Hz", "offset_Hz_u"]);
    }
    // 6 transitions, 6 crossovers sharing a ground level, 2 sharing an excited level (common practice for 87Rb D2)
    expect(lp.filter((p) => p.kind === "transition")).toHaveLength(6);
    expect(lp.filter((p) => p.kind === "crossover")).toHaveLength(8);
  });

  it("put the F′ = 2/3 crossover of F = 2 133.3 MHz below F = 2 → F′ = 3, in rising frequency", () => {
    const lp = line(rb, "D2").lock_points as Json[];
    const f = (pred: (p: Json) => boolean) => dec(lp.find(pred)!.frequency_Hz);
    const below = f((p) => p.kind === "transition" && p.F_lower === "2" && p.F_upper === "3").sub(f((p) => p.kind === "crossover" && p.F_lower === "2" && String(p.F_upper) === "2,3")).div(MHZ);
    // from memory: Steck, "Rubidium 87 D Line Data": the crossover lies 133.3 MHz below the cycling transition
    expect(below.sub("133.3").abs().lt("0.05")).toBe(true);
    for (let i = 1; i < lp.length; i++) expect(dec(lp[i]!.frequency_Hz).gte(lp[i - 1]!.frequency_Hz)).toBe(true);
  });

  it("give F = 2 → F′ = 3 of D2 the offset uncertainty √((9u(A′)/4)² + (u(B′)/4)² + (3u(A)/4)²), and a crossover the mean of its groups' offsets with A shared", () => {
    const lp = line(rb, "D2").lock_points as Json[];
    // Steck, "Rubidium 87 D Line Data" (uncertainties from memory): u(A′) = 2.0 kHz, u(B′) = 3.7 kHz, u(A) = 45 µHz;
    // E_F = A K/2 + B(…) (textbook Casimir formula): E(F′ = 3) = 9A′/4 + B′/4, E(F = 2) = 3A/4
    const hand = (x: string, y: string, z: string) => dec(x).pow(2).add(dec(y).pow(2)).add(dec(z).pow(2)).sqrt();
    const cycling = lp.find((p) => p.kind === "transition" && p.F_lower === "2" && p.F_upper === "3")!;
    expect(dec(cycling.offset_Hz_u).sub(hand("4500", "925", "0.00003375")).abs().lt("1e-20")).toBe(true);
    // crossover F = 2 → F′ = 2/3: the mean of 2→2 and 2→3, E(F′ = 2) = −3A′/4 − 3B′/4 (Casimir formula): (3A′/4 − B′/4) − 3A/4
    const cross = lp.find((p) => p.kind === "crossover" && p.F_lower === "2" && String(p.F_upper) === "2,3")!;
    expect(dec(cross.offset_Hz_u).sub(hand("1500", "925", "0.00003375")).abs().lt("1e-20")).toBe(true);
    // the demo's D2 wavelength has no uncertainty, so the absolute frequency carries the offset's alone
    expect(cycling.frequency_Hz_u).toBe(cycling.offset_Hz_u);
  });

  it("keep their offsets from the line centre without a wavelength", () => {
    const with_ = line(rb, "D2").lock_points as Json[];
    const without = line(bare, "D2").lock_points as Json[];
    expect(without.map((p) => p.offset_Hz)).toEqual(with_.map((p) => p.offset_Hz));
    expect(without.every((p) => p.frequency_Hz === null)).toBe(true);
  });
});
