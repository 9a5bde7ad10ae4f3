/**
 * The engine data the build writes per species: plain JSON (no decimal
 * objects), the solver inputs exactly as computeFields uses them, and a
 * classic script that registers them on `window.SublevelAtlasData`.
 */
import vm from "node:vm";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { engineData, engineDataScript } from "../../src/engine/engineData.js";
import { ENGINE_FORMAT } from "../../src/engine/types.js";
import { solverLevel } from "../../src/results/computeFields.js";
import { demoSpecies } from "./demo.js";

const { species, configured, constants } = demoSpecies();

describe("engineData", () => {
  it("is plain JSON, and carries computeFields' solver inputs digit for digit", () => {
    for (const sp of species) {
      const d = engineData(sp.result, sp.fields, constants, configured);
      expect(JSON.parse(JSON.stringify(d))).toEqual(d);
      expect(d.format).toBe(ENGINE_FORMAT);
      expect(d.fields.map((f) => f.text)).toEqual(configured.map((f) => f.text));
      sp.result.levels.forEach((l, i) => {
        const want = solverLevel(sp.result, l, constants);
        const got = d.levels[i]!;
        expect([got.id, got.J2, got.I2]).toEqual([l.input.id, want.J2, want.I2]);
        for (const k of ["gJ", "gI", "A", "B"] as const) expect(new Dec(got[k]).eq(want[k]), `${sp.id} ${l.input.id} ${k}`).toBe(true);
        expect(got.transitions.length).toBe(sp.fields.levels.get(l.input.id)!.transitions.length);
      });
      expect(d.lines.map((l) => l.id)).toEqual(sp.result.lines.map((l) => l.input.id));
    }
  });

  it("registers itself with a classic script", () => {
    const rb87 = species.find((s) => s.id === "rb87")!;
    const d = engineData(rb87.result, rb87.fields, constants, configured);
    const script = engineDataScript(d);
    expect(script).toMatch(/^\/\* [^\n]*\*\/\n\(window\.SublevelAtlasData \|\|= \{\}\)\["rb87"\] = \{/);
    const context = vm.createContext({ window: { SublevelAtlasData: { other: 1 } } });
    vm.runInContext(script, context);
    const registered = (context as unknown as { window: { SublevelAtlasData: Record<string, unknown> } }).window.SublevelAtlasData;
    expect(registered.other).toBe(1);
    expect(JSON.parse(JSON.stringify(registered.rb87))).toEqual(JSON.parse(JSON.stringify(d)));
    const fresh = vm.createContext({ window: {} });
    vm.runInContext(script, fresh);
    expect(Object.keys((fresh as unknown as { window: { SublevelAtlasData: object } }).window.SublevelAtlasData)).toEqual(["rb87"]);
  });
});
