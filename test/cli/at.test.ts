/**
 * `npm run at -- <species-id> <field> [--data DIR]`: prints the exact path's
 * answer (src/engine/exactAt.ts) as JSON; at a configured field that is the
 * JSON export's own entries, string for string; between configured fields the
 * float64 calculator agrees with it to 1e-9 relative or 1 Hz. Errors are one
 * line and exit 1.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { engineAt } from "../../src/engine/engine.js";
import { atFromResults } from "../../src/engine/exactAt.js";
import type { AtResult } from "../../src/engine/types.js";
import { speciesExport } from "../../src/site/exportJson.js";
import { computeFields } from "../../src/results/computeFields.js";
import { demoSpecies } from "../engine/demo.js";
import { expectAgrees } from "../engine/compare.js";
import { exportAt } from "../engine/exportAt.js";
import { DEMO_DATA, tempDir } from "../support/runBuild.js";
import { runAt } from "../support/runAt.js";
import { Dec } from "../../src/physics/decimal.js";

const between = { text: "4.7 G", tesla: new Dec("0.00047") }; // 1 G = 1e-4 T (common practice)
const { species, configured, constants, folder } = demoSpecies();
const rb87 = species.find((s) => s.id === "rb87")!;
const cs133 = species.find((s) => s.id === "cs133")!;

function parse(stdout: string): AtResult<string> {
  return JSON.parse(stdout) as AtResult<string>;
}

describe("npm run at", () => {
  it("prints the exact answer at a field between the configured ones, which the calculator matches", async () => {
    const r = await runAt(["rb87", "4.7 G"]);
    expect([r.code, r.stderr]).toEqual([0, ""]);
    const printed = parse(r.stdout);
    expect(Object.keys(printed)).toEqual(["B_T", "levels", "transitions", "lines"]);
    expect(printed.B_T).toBe("0.00047");
    // the same numbers, digit for digit, as the exact path computed in this process
    expect(printed).toEqual(atFromResults(rb87.result, computeFields(rb87.result, constants, [between]), between, 0));
    expectAgrees(engineAt(rb87.data, 0.00047), printed, "rb87 at 4.7 G");
    // decimals are strings of up to 30 significant digits, as in the export
    const e = printed.levels[0]!.states[0]!.E_Hz;
    expect(typeof e).toBe("string");
    expect(e.replace(/^-/, "").replace(".", "").replace(/^0+/, "").length).toBeGreaterThanOrEqual(25);
  });

  it("takes the field unquoted and --data, and prints the export's entries at a configured field", async () => {
    const r = await runAt(["cs133", "10", "G", "--data", DEMO_DATA]);
    expect([r.code, r.stderr]).toEqual([0, ""]);
    const printed = parse(r.stdout);
    const i = configured.findIndex((f) => f.text === "10 G");
    expect(i).toBeGreaterThanOrEqual(0);
    const exp = speciesExport(cs133.result, { constantsEdition: constants.edition, dataVersion: folder.dataVersion }, { result: cs133.fields, configured });
    const { B_T, ...rest } = printed;
    expect(B_T).toBe("0.001"); // 10 G = 0.001 T (1 G = 1e-4 T, common practice)
    expect(rest).toEqual(exportAt(exp, i));
  });

  it("refuses an unknown species, a bad field and missing arguments with one line and exit 1", async () => {
    const cases: [string[], RegExp][] = [
      [["rb88", "4.7 G"], /unknown species "rb88".*known: .*rb87/],
      [["rb87", "4.7 Hz"], /frequency unit, not a field unit/],
      [["rb87", "-1", "G"], /negative/],
      [["rb87", "lots"], /field "lots"/],
      [["rb87"], /no field given/],
      [[], /no species id/],
      [["rb87", "1 G", "--colour"], /unknown option --colour/],
    ];
    for (const [args, message] of cases) {
      const r = await runAt(args);
      expect(r.code, args.join(" ")).toBe(1);
      expect(r.stdout).toBe("");
      expect(r.stderr.trimEnd().split("\n"), args.join(" ")).toHaveLength(1);
      expect(r.stderr).toMatch(message);
    }
  });

  it("reports the problems of a bad data folder and exits 1", async () => {
    const dir = tempDir("atlas-at-");
    mkdirSync(join(dir, "species"));
    writeFileSync(join(dir, "species", "x.yaml"), "id: x\nlabel: X\nlevels: 3\n");
    const r = await runAt(["x", "1 G", "--data", dir]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/x\.yaml:\d+:\d+: /);
  });
});
