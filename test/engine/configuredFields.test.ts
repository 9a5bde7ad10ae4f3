/**
 * At every configured field of the demo data, the float64 calculator gives
 * the numbers of the exact build: the JSON export's field_table energies,
 * the sublevel transitions' at_fields and the lines' at_fields components,
 * computed here on the Dec path (computeSpecies, computeFields,
 * speciesExport), to 1e-9 relative or 1 Hz (compare.ts).
 */
import { describe, expect, it } from "vitest";
import { engineAt } from "../../src/engine/engine.js";
import { speciesExport } from "../../src/site/exportJson.js";
import type { AtResult } from "../../src/engine/types.js";
import { demoSpecies } from "./demo.js";
import { expectAgrees } from "./compare.js";

const { species, configured, constants, folder } = demoSpecies();

type Exact = Omit<AtResult<string>, "B_T">;

/** The field-dependent keys of one level and one line of the export (see README, "The JSON export"). */
interface ExportLevel {
  id: string;
  field_table: { states: Exact["levels"][number]["states"] }[];
  sublevel_transitions: { lower: { F: string; mF: string }; upper: { F: string; mF: string }; kind: "magnetic-dipole" | "two-photon"; at_fields: { Hz: string }[] }[];
}
interface ExportLine {
  id: string;
  at_fields: Omit<Exact["lines"][number], "id">[];
}

/** The export's entries at configured field i, gathered into the calculator's shape. */
function exportAt(exp: ReturnType<typeof speciesExport>, i: number): Exact {
  const levels = exp.levels as unknown as ExportLevel[];
  const lines = exp.lines as unknown as ExportLine[];
  return {
    levels: levels.map((l) => ({ id: l.id, states: l.field_table[i]!.states })),
    transitions: levels.flatMap((l) =>
      l.sublevel_transitions.map((t) => ({ level: l.id, lower: t.lower, upper: t.upper, kind: t.kind, Hz: t.at_fields[i]!.Hz })),
    ),
    lines: lines.map((ln) => {
      const a = ln.at_fields[i]!;
      return { id: ln.id, model: a.model, regime: a.regime, components: a.components };
    }),
  };
}

describe("field calculator at the configured fields of the demo data", () => {
  for (const sp of species) {
    it(`${sp.id}: every energy, transition and line component equals the export's`, () => {
      const exp = speciesExport(sp.result, { constantsEdition: constants.edition, dataVersion: folder.dataVersion }, { result: sp.fields, configured });
      let compared = 0;
      configured.forEach((f, i) => {
        const answer = engineAt(sp.data, f.tesla.toNumber());
        expect(answer.B_T).toBe(f.tesla.toNumber());
        compared += expectAgrees(answer, exportAt(exp, i), `${sp.id} at ${f.text}`);
      });
      expect(compared).toBeGreaterThan(0);
    });
  }

  it("exercises all three line models and the fine-structure terms", () => {
    const models = new Set<string>();
    for (const sp of species) for (const f of configured) for (const ln of engineAt(sp.data, f.tesla.toNumber()).lines) models.add(ln.model);
    expect([...models].sort()).toEqual(["J-resolved linear pattern", "fine-structure Paschen–Back eigenstates", "hyperfine–Zeeman eigenstates"]);
  });
});
