import { describe, expect, it } from "vitest";
import { searchTokens, termKeys } from "../../src/site/searchNormalize.js";
import { ASSET, clientContext } from "./searchClient.js";

// Spellings of one term symbol a reader may type (common practice: plain, TeX, Unicode
// super/subscripts, the degree sign or a letter o for odd parity, and no multiplicity).
const SPELLINGS_2P3_2 = ["2P3/2", "2P_{3/2}", "²P₃/₂", "2P°3/2", "2Po3/2", "2P^o_{3/2}", "²P°₃/₂", "2p3/2", "2P₃⁄₂"];

const INPUTS = [
  ...SPELLINGS_2P3_2,
  "P3/2", "3P2", "3Po2", "³P°₂", "1S0", "5D4", "e5D2", "5s-S1/2", "5p-P°3/2", "6s6p-3P1",
  "F=2", "F = 2", "f=2", "mF=-1", "mF = −1", "mF=+1", "mF=−0", "F=2 mF=1", "F=2, mF=+1", "F=1.5", "mJ=-1/2", "m=1/2", "mu=3/2 ml=1/2",
  "729", "780.24", "780.241\u2009209", "D2", "rb87 D2", "87Rb", "40Ca+", "ca40-ion", "  D2  ", "", "σ+", "hg202 546",
];

describe("search normalization", () => {
  it("gives every common spelling of ²P°3/2 the same token", () => {
    for (const s of SPELLINGS_2P3_2) expect(searchTokens(s), s).toEqual(["2p3/2"]);
  });

  it("keeps the multiplicity-free form for readers who type only P3/2", () => {
    expect(searchTokens("P3/2")).toEqual(["p3/2"]);
    expect(termKeys("2Po3/2")).toEqual(["2p3/2", "p3/2"]);
    expect(termKeys("3Po2")).toEqual(["3p2", "p2"]);
  });

  it("writes quantum-number assignments one way: no spaces, ASCII minus, no plus, halves as fractions", () => {
    expect(searchTokens("F = 2")).toEqual(["f=2"]);
    expect(searchTokens("mF = −1")).toEqual(["mf=-1"]);
    expect(searchTokens("mF=+1")).toEqual(["mf=1"]);
    expect(searchTokens("mF=−0")).toEqual(["mf=0"]);
    expect(searchTokens("F=1.5, mF=-0.5")).toEqual(["f=3/2", "mf=-1/2"]);
    expect(searchTokens("F=2 mF=1")).toEqual(["f=2", "mf=1"]);
  });

  it("drops parity marks inside level ids and leaves numbers and line ids alone", () => {
    expect(searchTokens("5p-P°3/2")).toEqual(["5p-p3/2"]);
    expect(searchTokens("780.24")).toEqual(["780.24"]);
    // Digits copied from a page keep its thin-space grouping (U+2009).
    expect(searchTokens("780.241\u2009209")).toEqual(["780.241209"]);
    expect(searchTokens("rb87 D2")).toEqual(["rb87", "d2"]);
    expect(searchTokens("729")).toEqual(["729"]);
  });

  it("agrees token for token with the copy in the finder script", () => {
    const client = clientContext([ASSET("finder.js")]);
    for (const s of INPUTS) expect([...client.AtlasFinder.searchTokens(s)], JSON.stringify(s)).toEqual(searchTokens(s));
  });
});
