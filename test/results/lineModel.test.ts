/**
 * The rule that picks a line's regime and model at a field (src/results/
 * lineModel.ts), shared by the exact build and the field calculator: its
 * worked examples on the demo data, the Dec and float64 regime functions
 * agreeing, and each branch of the choice. The rule is this project's
 * convention (Methods page); the expected models are what it states. Which
 * demo levels have listed partners is read from data/species/*.yaml.
 */
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { computeSpecies } from "../../src/results/computeSpecies.js";
import { computeFields } from "../../src/results/computeFields.js";
import { chooseLineModel, hadFineStructureLabels, levelRegime, levelRegimeFloat, strongerRegime, type LineSide } from "../../src/results/lineModel.js";
import { loadDemo } from "../engine/demo.js";

const { folder, constants } = loadDemo();
function lineAt(speciesId: string, lineId: string, tesla: string) {
  const s = computeSpecies(folder.species.find((x) => x.id === speciesId)!, constants);
  const f = computeFields(s, constants, [{ text: `${tesla} T`, tesla: new Dec(tesla) }]);
  const a = f.lines.get(lineId)!.atFields[0]!;
  return [a.regime, a.model];
}

describe("chooseLineModel", () => {
  it("repeats its worked examples on the demo data", () => {
    expect(lineAt("rb87", "D2", "0.0001")).toEqual(["intermediate", "term hyperfine–Zeeman eigenstates"]);
    expect(lineAt("ca40-ion", "729", "1")).toEqual(["linear Zeeman", "term Zeeman eigenstates"]);
    expect(lineAt("ca40-ion", "397", "1")).toEqual(["linear Zeeman", "term Zeeman eigenstates"]);
    expect(lineAt("ca40-ion", "397", "10")).toEqual(["intermediate", "term Zeeman eigenstates"]);
    // no partners listed (87Sr lists ³P₀ and ³P₁ but not ³P₂; Cd has one level per term)
    expect(lineAt("sr87", "689", "0.1")[1]).toBe("hyperfine–Zeeman eigenstates");
    expect(lineAt("cd114", "229", "1")[1]).toBe("J-resolved linear pattern");
  });

  it("takes each branch of the rule: the model follows the levels, never the regime", () => {
    const side = (hf: LineSide["hf"], fs: LineSide["fs"], inTerm: boolean): LineSide => ({ hf, fs, inTerm });
    const e1 = { sameSpin: true, multipole: "E1" as const, hyperfineBoth: true };
    const weak = side("linear Zeeman", "linear Zeeman", true);
    const mixed = side("Paschen–Back", "intermediate", true);
    const term = { model: "term hyperfine–Zeeman eigenstates", reduced: "LS" };
    expect(chooseLineModel(mixed, weak, e1)).toEqual({ regime: "Paschen–Back", ...term });
    // the same model at weak field and at zero field: no regime threshold
    expect(chooseLineModel(weak, weak, e1)).toEqual({ regime: "linear Zeeman", ...term });
    expect(chooseLineModel(side("zero field", "zero field", true), side("zero field", "zero field", false), e1)).toEqual({ regime: "zero field", ...term });
    // M1 or a change of spin: the term states, with the line's own J pair only
    expect(chooseLineModel(mixed, weak, { ...e1, multipole: "M1" })).toEqual({ regime: "Paschen–Back", model: "term hyperfine–Zeeman eigenstates", reduced: "own J pair" });
    expect(chooseLineModel(mixed, weak, { ...e1, sameSpin: false }).reduced).toBe("own J pair");
    // M2 is magnetic too (its spin part is not modelled); E2 and E3 act on the orbital coordinates, so LS applies
    expect(chooseLineModel(mixed, weak, { ...e1, multipole: "M2" }).reduced).toBe("own J pair");
    expect(chooseLineModel(mixed, weak, { ...e1, multipole: "E2" }).reduced).toBe("LS");
    expect(chooseLineModel(mixed, weak, { ...e1, multipole: "E3" }).reduced).toBe("LS");
    // no nuclear spin: the term states without hyperfine structure
    expect(chooseLineModel(weak, { ...weak, inTerm: false }, { ...e1, hyperfineBoth: false }).model).toBe("term Zeeman eigenstates");
    // neither level in a listed term
    expect(chooseLineModel({ ...mixed, inTerm: false }, { ...weak, inTerm: false }, e1).model).toBe("hyperfine–Zeeman eigenstates");
    expect(chooseLineModel({ ...weak, inTerm: false }, { ...weak, inTerm: false }, { ...e1, hyperfineBoth: false })).toEqual({
      regime: "linear Zeeman",
      model: "J-resolved linear pattern",
      reduced: "own J pair",
    });
    expect(strongerRegime("intermediate", "linear Zeeman")).toBe("intermediate");
  });

  it("says where builds before the term solver labelled components by fine-structure states (the rule they used)", () => {
    const side = (fs: LineSide["fs"], inTerm: boolean): LineSide => ({ hf: "Paschen–Back", fs, inTerm });
    const e1 = { sameSpin: true, multipole: "E1" as const, hyperfineBoth: true };
    expect(hadFineStructureLabels(side("intermediate", true), side("linear Zeeman", false), e1)).toBe(true);
    expect(hadFineStructureLabels(side("linear Zeeman", true), side("linear Zeeman", false), e1)).toBe(false);
    expect(hadFineStructureLabels(side("intermediate", true), side("linear Zeeman", false), { ...e1, multipole: "M1" })).toBe(false);
    // those builds had no M2 or E3 lines, so none of their rows needs an alias
    expect(hadFineStructureLabels(side("intermediate", true), side("linear Zeeman", false), { ...e1, multipole: "E3" })).toBe(false);
    expect(hadFineStructureLabels(side("intermediate", false), side("linear Zeeman", false), e1)).toBe(false);
  });

  it("places a field against a level's limits the same way in Dec and in float64", () => {
    const cases: [string, string | null, string | null][] = [
      ["0", "0.001", "0.1"],
      ["0.001", "0.001", "0.1"],
      ["0.0010001", "0.001", "0.1"],
      ["0.999", "0.001", "0.1"],
      ["1", "0.001", "0.1"],
      ["5", null, "0.1"],
      ["5", "0.001", null],
    ];
    for (const [b, lin, pb] of cases) {
      const dec = levelRegime(new Dec(b), lin === null ? null : new Dec(lin), pb === null ? null : new Dec(pb));
      const flt = levelRegimeFloat(Number(b), lin === null ? null : Number(lin), pb === null ? null : Number(pb));
      expect(flt, `${b} T`).toBe(dec);
    }
    expect(levelRegime(new Dec("1"), new Dec("0.001"), new Dec("0.1"))).toBe("Paschen–Back"); // from 10× the scale on
    expect(levelRegime(new Dec("0.999"), new Dec("0.001"), new Dec("0.1"))).toBe("intermediate");
  });
});
