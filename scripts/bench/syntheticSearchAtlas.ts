/**
 * The search side of a benchmark-size atlas: 100 species, 2,000 levels and
 * 5,000 E1 lines, each level with nuclear spin I = 3/2 so it has hyperfine
 * levels and sublevels, each line all its |Δm| ≤ 1 components. Only the
 * shape (ids, terms, J, F values, component pairs) matters to the index;
 * the numbers are not data about any atom. Used by the search-size test and
 * by scripts/bench/searchBench.ts.
 */
import { dec } from "../../src/physics/decimal.js";
import { mValues } from "../../src/physics/quantum.js";
import type { SearchSource } from "../../src/site/searchIndex.js";

export function syntheticSearchAtlas(): SearchSource {
  const letters = ["S", "P", "D", "F"];
  const I2 = 3;
  return {
    species: Array.from({ length: 100 }, (_, si) => {
      const levels = Array.from({ length: 20 }, (_, li) => {
        const L = li % 4;
        const J2 = Math.max(1, 2 * L + (li % 2 ? 1 : -1));
        const F2s: number[] = [];
        for (let F2 = Math.abs(J2 - I2); F2 <= J2 + I2; F2 += 2) F2s.push(F2);
        return {
          input: { id: `${4 + (li >> 2)}${letters[L]!.toLowerCase()}-${letters[L]}${J2}/2`, term: { text: `2${letters[L]}${L % 2 ? "o" : ""}${J2}/2` } },
          J2,
          hyperfine: F2s.map((F2) => ({ F2 })),
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
        };
      });
      return { id: `x${si}`, label: `${si}X`, url: `species/x${si}/`, result: { levels, lines } };
    }),
  };
}

