/**
 * The search side of a benchmark-size atlas: 100 species, 2,000 levels and
 * 5,000 E1 lines, each level with nuclear spin I = 3/2 so it has hyperfine
 * levels, sublevels and sublevel transitions (every magnetic-dipole pair
 * ΔF = 0, ±1, ΔmF = 0, ±1 and every two-photon pair ΔmF = ±2, |ΔF| ≤ 2),
 * each line all its |Δm| ≤ 1 components, 7 bias fields. Only the shape
 * (ids, terms, J, F values, pairs, how many numbers) matters to the index;
 * the numbers are not data about any atom. Used by the search-size test and
 * by scripts/bench/searchBench.ts.
 */
import { dec } from "../../src/physics/decimal.js";
import { mValues } from "../../src/physics/quantum.js";
import type { SearchSpecies, SearchTransition } from "../../src/site/searchIndex.js";

export const SYNTHETIC_FIELDS = ["0 G", "0.5 G", "3.2 G", "10 G", "100 G", "0.1 T", "1 T"].map((text) => {
  const [v, u] = text.split(" ") as [string, string];
  return { text, tesla: u === "G" ? dec(v).mul("1e-4").toString() : v };
});

function transitionsOf(F2s: number[], li: number): SearchTransition[] {
  const states = F2s.flatMap((F2) => mValues(F2).map((mF2) => ({ F2, mF2 })));
  const out: SearchTransition[] = [];
  states.forEach((a, i) =>
    states.slice(i + 1).forEach((b) => {
      const dF = Math.abs(a.F2 - b.F2) / 2;
      const dm = Math.abs(a.mF2 - b.mF2) / 2;
      const m1 = dF <= 1 && dm <= 1 && !(dF === 0 && dm === 0);
      const twoPhoton = dm === 2 && dF <= 2;
      if (!m1 && !twoPhoton) return;
      // A few field-insensitive points, as a real level has: B = 0 for the 0–0 pairs, one small field for the ±1 two-photon pairs.
      const points =
        a.mF2 === 0 && b.mF2 === 0 && dF > 0
          ? [{ tesla: dec("0"), text: "0 G" }]
          : twoPhoton && a.mF2 === -b.mF2
            ? [{ tesla: dec(`${3 + (li % 7)}.2289e-4`), text: `${3 + (li % 7)}.228${li % 10} G` }]
            : [];
      out.push({ lower: a, upper: b, kind: twoPhoton ? "two-photon" : "magnetic-dipole", fieldInsensitive: points });
    }),
  );
  return out;
}

export function syntheticSearchAtlas(): SearchSpecies[] {
  const letters = ["S", "P", "D", "F"];
  const I2 = 3;
  return Array.from({ length: 100 }, (_, si) => {
    const id = `x${si}`;
    const levels = Array.from({ length: 20 }, (_, li) => {
      const L = li % 4;
      const J2 = Math.max(1, 2 * L + (li % 2 ? 1 : -1));
      const F2s: number[] = [];
      for (let F2 = Math.abs(J2 - I2); F2 <= J2 + I2; F2 += 2) F2s.push(F2);
      return {
        input: {
          id: `${4 + (li >> 2)}${letters[L]!.toLowerCase()}-${letters[L]}${J2}/2`,
          term: { text: `2${letters[L]}${L % 2 ? "o" : ""}${J2}/2`, multiplicity: 2, letter: letters[L]!, parity: L % 2 ? ("odd" as const) : null, J2 },
          energy: li === 0 ? null : { si: dec(`${li}1234.5678e6`) },
        },
        J2,
        gJ: dec(`1.${(si * 31 + li * 17) % 1000}3311`),
        hyperfine: F2s.map((F2, k) => ({ F2, gF: dec(`0.${(si + li + k) % 10}998364${k}`) })),
      };
    });
    const lines = Array.from({ length: 50 }, (_, ni) => {
      const upper = levels[(ni % 19) + 1]!;
      const lower = levels[ni % 19 === 0 ? 0 : ni % 19]!;
      const components: { mu2: number; ml2: number }[] = [];
      for (const mu2 of mValues(upper.J2)) for (const ml2 of mValues(lower.J2)) if (Math.abs(mu2 - ml2) <= 2) components.push({ mu2, ml2 });
      return {
        input: {
          id: `L${ni}`,
          upper: upper.input.id,
          lower: lower.input.id,
          wavelength: { si: dec(`${300 + ((si * 7 + ni * 13) % 1200)}.123456789e-9`) },
          multipole: "E1",
        },
        components,
        pattern: `(${ni % 3}) ${ni % 5}, ${(ni % 5) + 2} / ${(ni % 4) + 1}`,
      };
    });
    const transitions = new Map(levels.map((l, li) => [l.input.id, transitionsOf(l.hyperfine.map((h) => h.F2), li)] as const));
    return { id, label: `${si}X`, muB_h: dec("13996244917.1"), levels, lines, transitions };
  });
}
