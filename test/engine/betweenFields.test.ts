/**
 * Between (and beyond) the configured fields, the float64 calculator agrees
 * with the exact path that `npm run at` prints (src/engine/exactAt.ts:
 * computeSpecies, computeFields with the field as a bias field), to 1e-9
 * relative or 1 Hz, for every demo species. The engine data are the ones
 * the build makes (configured fields only); the exact side is computed at
 * the new fields. test/cli/at.test.ts checks that the command prints exactly
 * this exact side.
 */
import { describe, expect, it } from "vitest";
import { engineAt } from "../../src/engine/engine.js";
import { atFromResults } from "../../src/engine/exactAt.js";
import { parseFieldText } from "../../src/engine/fieldText.js";
import type { ConfiguredField } from "../../src/results/fieldTypes.js";
import { demoSpecies } from "./demo.js";
import { expectAgrees } from "./compare.js";

// Not configured in data/site.yaml; from the weak-field region to past the last bias field (1 T).
const TEXTS = ["37 mG", "4.7 G", "2.2 mT", "0.37 T", "3 T"];
const fields: ConfiguredField[] = TEXTS.map((text) => {
  const p = parseFieldText(text);
  if (!p.ok) throw new Error(p.message);
  return { text, tesla: p.tesla };
});

const { species, configured } = demoSpecies(fields);

describe("field calculator between the configured fields", () => {
  it("uses fields that are not configured", () => {
    for (const f of fields) expect(configured.some((c) => c.tesla.eq(f.tesla))).toBe(false);
  });

  for (const sp of species) {
    it(`${sp.id}: agrees with the exact path of npm run at at ${TEXTS.join(", ")}`, () => {
      fields.forEach((f, i) => {
        const exact = atFromResults(sp.result, sp.fields, f, i);
        const answer = engineAt(sp.data, f.tesla.toNumber());
        expect(answer.B_T).toBe(Number(exact.B_T));
        expectAgrees(answer, exact, `${sp.id} at ${f.text}`);
      });
    });
  }
});
