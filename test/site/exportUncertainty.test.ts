import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { checkExportSchema } from "../../src/checks/exportSchema.js";
import { withU } from "../../src/site/exportJson.js";
import { realExport } from "../checks/realExport.js";

/** Every key of an object tree ending in "_u", with its path. */
function uKeys(x: unknown, path = ""): [string, unknown][] {
  if (Array.isArray(x)) return x.flatMap((v, i) => uKeys(v, `${path}/${i}`));
  if (x && typeof x === "object") return Object.entries(x).flatMap(([k, v]) => [...(k.endsWith("_u") ? [[`${path}/${k}`, v] as [string, unknown]] : []), ...uKeys(v, `${path}/${k}`)]);
  return [];
}

describe("standard uncertainties in the export", () => {
  it("writes a '_u' key beside a decimal, null when the number is exact", () => {
    expect(withU("gF", dec("0.5"), dec("5e-8"))).toEqual({ gF: "0.5", gF_u: "0.00000005" });
    expect(withU("gF", dec("0.5"), null)).toEqual({ gF: "0.5", gF_u: null });
    expect(withU("gF", null, dec("1"))).toEqual({ gF: null, gF_u: null });
  });

  it("gives 87Rb's gF, shifts, gJ and gI their uncertainties, beside the values, in the same unit", () => {
    const e = realExport("rb87");
    const ground = e.levels.find((l: { id: string }) => l.id === "5s-S1/2");
    const f2 = ground.hyperfine.find((h: { F: string }) => h.F === "2");
    // gF = gJ/4 + 3gI/4 with gJ = 2.00233113(20), gI = −0.0009951414(10) (Steck): u = 5.000 56×10⁻⁸ (hand)
    expect(dec(f2.gF_u).toExponential(5)).toBe("5.00056e-8");
    expect(f2.sublevels.every((s: Record<string, unknown>) => "shift_Hz_per_T_u" in s)).toBe(true);
    // mF = 0 does not shift: exact
    expect(f2.sublevels.find((s: { mF: string }) => s.mF === "0").shift_Hz_per_T_u).toBeNull();
    expect(ground.gJ_u).toBe("0.0000002");
    // the older key stays, with the same number
    expect(dec(ground.gJ_uncertainty).eq(dec(ground.gJ_u))).toBe(true);
    expect(e.nucleus.gI_u).toBe("0.000000001");
    // the hyperfine A of 5²S1/2 is given without an uncertainty (demo data): its zero-field energies are exact
    expect(f2.zero_field_Hz_u).toBeNull();
  });

  it("writes only non-negative decimals or null under '_u', each beside its number, and the schema takes them", () => {
    for (const id of ["rb87", "sr88"] as const) {
      const e = realExport(id);
      const keys = uKeys(e);
      expect(keys.length).toBeGreaterThan(10);
      for (const [path, v] of keys) {
        expect(v === null || (typeof v === "string" && !v.startsWith("-")), path).toBe(true);
      }
      expect(checkExportSchema(e, `${id}.json`)).toEqual([]);
    }
  });

  it("reports a negative or numeric uncertainty against the schema", () => {
    const e = realExport("rb87");
    e.levels[0].hyperfine[0].gF_u = "-1e-8";
    e.gL_u = 1e-10;
    const problems = checkExportSchema(e, "rb87.json").join("\n");
    expect(problems).toMatch(/\/levels\/0\/hyperfine\/0\/gF_u/);
    expect(problems).toMatch(/\/gL_u/);
  });
});
