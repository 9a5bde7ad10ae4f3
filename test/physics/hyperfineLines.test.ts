import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec, dec } from "../../src/physics/decimal.js";
import { Rational } from "../../src/physics/rational.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { val } from "../../src/physics/constants/constant.js";
import { hyperfineGroupStrengths, hyperfineLinePattern } from "../../src/physics/hyperfineLines.js";

const muB_h = val(CODATA_2022.muB_h);
const q = (s: string) => Rational.parse(s);
const sum = (xs: Rational[]) => xs.reduce((a, b) => a.add(b), Rational.ZERO);

describe("hyperfineGroupStrengths", () => {
  const d2 = hyperfineGroupStrengths(3, 3, 1, 1); // 87Rb D2: I = 3/2, 5P3/2 → 5S1/2, E1
  const group = (Fl2: number, Fu2: number) => d2.find((g) => g.Fl2 === Fl2 && g.Fu2 === Fu2)!;

  it("gives Steck's 87Rb D2 shares from F = 2: 7/10, 1/4, 1/20 to F′ = 3, 2, 1", () => {
    // D. A. Steck, "Rubidium 87 D Line Data", relative hyperfine transition strength factors S_FF′
    expect(group(4, 6).shareOfLower).toEqual(q("7/10"));
    expect(group(4, 4).shareOfLower).toEqual(q("1/4"));
    expect(group(4, 2).shareOfLower).toEqual(q("1/20"));
  });

  it("gives Steck's 87Rb D2 shares from F = 1: 5/12, 5/12, 1/6 to F′ = 2, 1, 0", () => {
    // Steck, same table
    expect(group(2, 4).shareOfLower).toEqual(q("5/12"));
    expect(group(2, 2).shareOfLower).toEqual(q("5/12"));
    expect(group(2, 0).shareOfLower).toEqual(q("1/6"));
    expect(d2.some((g) => g.Fl2 === 2 && g.Fu2 === 6)).toBe(false); // ΔF = 2 is forbidden for E1 (common practice)
  });

  it("makes the whole line sum to exactly 1, each lower F its statistical weight, each group its components", () => {
    for (const [I2, Ju2, Jl2, k] of [[3, 3, 1, 1], [3, 1, 1, 1], [7, 3, 1, 1], [5, 5, 1, 2], [0, 3, 1, 1]] as const) {
      const groups = hyperfineGroupStrengths(I2, Ju2, Jl2, k);
      expect(sum(groups.map((g) => g.strength))).toEqual(Rational.ONE);
      for (const g of groups) {
        expect(sum(g.components.map((c) => c.strength))).toEqual(g.strength);
        // 6j orthogonality: Σ_Fu (2Fu+1)(2Fl+1){…}²/(2I+1) = (2Fl+1)/((2I+1)(2Jl+1)) (Edmonds eq. 6.2.9)
        const fromLower = sum(groups.filter((h) => h.Fl2 === g.Fl2).map((h) => h.strength));
        expect(fromLower).toEqual(Rational.of(g.Fl2 + 1, (I2 + 1) * (Jl2 + 1)));
      }
    }
  });

  it("gives Steck's 87Rb D1 shares and the equal decay of F′ = 2 to F = 2 and F = 1", () => {
    const d1 = hyperfineGroupStrengths(3, 1, 1, 1);
    const g = (Fl2: number, Fu2: number) => d1.find((x) => x.Fl2 === Fl2 && x.Fu2 === Fu2)!;
    // Steck, D1 table of S_FF′ (from memory): F = 2 → F′ = 2, 1: 1/2, 1/2; F = 1 → F′ = 2, 1: 5/6, 1/6
    expect([g(4, 4), g(4, 2), g(2, 4), g(2, 2)].map((x) => x.shareOfLower.toString())).toEqual(["1/2", "1/2", "5/6", "1/6"]);
    // decay of F′ = 2 weights those by 2F+1: 5·(1/2) : 3·(5/6) = 1 : 1
    expect(g(4, 4).shareOfUpper).toEqual(q("1/2"));
    expect(g(2, 4).shareOfUpper).toEqual(q("1/2"));
  });

  it("marks exactly the two stretched σ± lines F = 2, mF = ±2 → F′ = 3, mF′ = ±3 as cycling on 87Rb D2", () => {
    const cycling = d2.flatMap((g) => g.components.filter((c) => c.cycling).map((c) => [g.Fl2, c.mFl2, g.Fu2, c.mFu2]));
    // the closed cycling transition of Rb D2 (Steck; common practice in laser cooling)
    expect(cycling.sort()).toEqual([[4, -4, 6, -6], [4, 4, 6, 6]].sort());
    expect(hyperfineGroupStrengths(3, 1, 1, 1).some((g) => g.components.some((c) => c.cycling))).toBe(false); // D1 has none
  });

  it("gives the stretched cycling line 1/16 of the whole line, 1/7 of its 7/16 group", () => {
    const c = group(4, 6).components.find((x) => x.cycling && x.mFu2 === 6)!;
    // (j 1 j−1; −j 1 j−1)² = 1/(2j+1) = 1/7 for j = 3 (Edmonds table 2, from memory);
    // group share 7/10 (Steck) of the F = 2 weight 5/8 gives 7/16
    expect(c.strength).toEqual(q("1/16"));
    expect(c.polarization).toBe("sigma+");
  });
});

describe("hyperfineLinePattern", () => {
  // 87Rb constants, D. A. Steck "Rubidium 87 D Line Data" (from memory)
  const pattern = hyperfineLinePattern({
    I2: 3,
    gI: dec("-0.0009951414"),
    upper: { J2: 3, gJ: dec("1.3362"), A: dec("84718500"), B: dec("12496500") },
    lower: { J2: 1, gJ: dec("2.00233113"), A: dec("3417341305.452145"), B: dec("0") },
    k: 1,
    muB_h,
  });

  it("places the cycling group at E(F′=3) − E(F=2) = 193.7407 MHz − 2563.0060 MHz", () => {
    const g = pattern.find((x) => x.Fl2 === 4 && x.Fu2 === 6)!;
    // Steck: F′ = 3 at +193.7407 MHz, F = 2 at +2563.005979 MHz from the centres (from memory)
    expect(g.offset.sub(dec("193740700").sub(dec("2563005979.089"))).abs().lt(dec("200"))).toBe(true);
  });

  it("shifts the stretched line by (3/2)gJ′ − (1/2)gJ Lorentz units, where gI cancels", () => {
    const g = pattern.find((x) => x.Fl2 === 4 && x.Fu2 === 6)!;
    const c = g.components.find((x) => x.mFu2 === 6)!;
    // stretched states |mJ = J, mI = I⟩ shift by gJ·J + gI·I exactly (common practice)
    const expected = dec("1.5").mul("1.3362").sub(dec("0.5").mul("2.00233113"));
    expect(c.shiftLorentz.sub(expected).abs().lt("1e-40")).toBe(true);
    expect(c.shiftHzPerT.sub(expected.mul(muB_h)).abs().lt("1e-30")).toBe(true);
  });

  it("counts F′ = 0 as unshifted so its components move only with the lower level", () => {
    const g = pattern.find((x) => x.Fl2 === 2 && x.Fu2 === 0)!;
    expect(g.gFu).toBeNull();
    for (const c of g.components) expect(c.shiftLorentz.add(g.gFl!.mul(c.mFl2).div(2)).abs().lt("1e-40")).toBe(true);
  });
});

// Source: sympy 1.14 sympy.physics.wigner (exact), written by scripts/fixtures/wigner_sympy.py.
interface HyperfineLineCase {
  name: string;
  k: number;
  Ju2: number;
  Jl2: number;
  I2: number | null;
  groups?: [number, number, string][];
  hyperfineComponents?: [number, number, number, number, string][];
}
const HF_CASES = (JSON.parse(readFileSync(new URL("../fixtures/wigner-sympy.json", import.meta.url), "utf-8")) as { multipoleLines: HyperfineLineCase[] }).multipoleLines.filter(
  (c) => c.I2 !== null,
);

describe("hyperfineGroupStrengths of rank 2 and 3 (M2, E3)", () => {
  it("gives every group and component of each fixture line the strength sympy gives, and no other", () => {
    expect(HF_CASES.map((c) => c.k)).toEqual(expect.arrayContaining([2, 3]));
    for (const c of HF_CASES) {
      const gs = hyperfineGroupStrengths(c.I2!, c.Ju2, c.Jl2, c.k);
      const groups = gs.map((g) => [g.Fu2, g.Fl2, g.strength.toString()]).sort((a, b) => Number(a[1]) - Number(b[1]) || Number(a[0]) - Number(b[0]));
      const wantGroups = [...c.groups!].sort((a, b) => a[1] - b[1] || a[0] - b[0]);
      expect(groups, c.name).toEqual(wantGroups); // sympy
      const comps = gs.flatMap((g) => g.components.map((x) => [g.Fu2, g.Fl2, x.mFu2, x.mFl2, x.strength.toString()]));
      const key = (r: (string | number)[]) => r.slice(0, 4).join(",");
      expect(new Map(comps.map((r) => [key(r), r[4]])), c.name).toEqual(new Map(c.hyperfineComponents!.map((r) => [key(r), r[4]]))); // sympy
    }
  });

  it("makes each M2 and E3 line sum to exactly 1 and each group's components to the group", () => {
    // 6j and 3j orthogonality (Edmonds 1957 eqs. 3.7.8, 6.2.9)
    for (const [I2, Ju2, Jl2, k] of [[9, 4, 0, 2], [1, 7, 1, 3], [3, 7, 1, 3], [5, 5, 3, 3], [2, 8, 4, 3]] as const) {
      const gs = hyperfineGroupStrengths(I2, Ju2, Jl2, k);
      expect(sum(gs.map((g) => g.strength)).equals(Rational.ONE)).toBe(true);
      for (const g of gs) expect(sum(g.components.map((x) => x.strength)).equals(g.strength)).toBe(true);
      expect(gs.flatMap((g) => g.components).some((x) => x.cycling)).toBe(false); // cycling is a rank-1 statement
    }
  });

  it("gives the 171Yb+ 467 nm E3 clock group F = 0 → F′ = 3 a quarter of the line, all in the Δm = 0 component among Δm = 0, ±1, ±2, ±3", () => {
    // I = 1/2, 2S1/2 F = 0 → 2F7/2 F′ = 3: (2F′+1)(2F+1){7/2 3 1/2; 0 1/2 3}²/(2I+1) = 7·1·(1/14)/2 = 1/4 (sympy, fixture above);
    // from mF = 0 each of the 7 components (3 3 0; −q q 0)² = 1/7 (Edmonds eq. 3.7.9)
    const gs = hyperfineGroupStrengths(1, 7, 1, 3);
    const clock = gs.find((g) => g.Fu2 === 6 && g.Fl2 === 0)!;
    expect(clock.strength.toString()).toBe("1/4");
    expect(clock.components.map((x) => [x.q, x.strength.toString()])).toEqual([-3, -2, -1, 0, 1, 2, 3].map((qq) => [qq, "1/28"]));
    expect(clock.shareOfLower.toString()).toBe("1"); // F = 0 reaches only F′ = 3 by rank 3 (triangle rule)
  });
});
