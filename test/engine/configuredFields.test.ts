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
import { exportAt } from "./exportAt.js";
import { demoSpecies } from "./demo.js";
import { expectAgrees } from "./compare.js";

const { species, configured, constants, folder } = demoSpecies();

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

  it("exercises all four line models, the term solver's with and without nuclear spin among them", () => {
    const models = new Set<string>();
    for (const sp of species) for (const f of configured) for (const ln of engineAt(sp.data, f.tesla.toNumber()).lines) models.add(ln.model);
    expect([...models].sort()).toEqual(["J-resolved linear pattern", "hyperfine–Zeeman eigenstates", "term Zeeman eigenstates", "term hyperfine–Zeeman eigenstates"]);
  });
});
