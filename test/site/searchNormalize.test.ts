import { describe, expect, it } from "vitest";
import { searchTokens, termKeys } from "../../src/site/searchNormalize.js";
import { ELEMENT_NAMES, FIELD_UNITS, POLARIZATION_WORDS, elementOf } from "../../src/site/searchWords.js";

// Spellings of one term symbol a reader may type (common practice: plain, TeX, Unicode
// super/subscripts, the degree sign or a letter o for odd parity, and no multiplicity).
const SPELLINGS_2P3_2 = ["2P3/2", "2P_{3/2}", "²P₃/₂", "2P°3/2", "2Po3/2", "2P^o_{3/2}", "²P°₃/₂", "2p3/2", "2P₃⁄₂"];


describe("search normalization", () => {
  it("gives every common spelling of ²P°3/2 the same token", () => {
    for (const s of SPELLINGS_2P3_2) expect(searchTokens(s), s).toEqual(["2p3/2"]);
  });

  it("gives the spellings of a jK term (2[3/2]°2, Racah's pair-coupling notation) one token, with and without 2s+1", () => {
    // common practice: the noble-gas 1s5 level is written 2[3/2]°2, [3/2]2, ²[3/2]°₂ or with a TeX subscript
    for (const s of ["2[3/2]o2", "2[3/2]°2", "²[3/2]°₂", "2[3/2]_2", "2[3/2]2"]) expect(searchTokens(s), s).toEqual(["2[3/2]2"]);
    expect(termKeys("2[3/2]o2")).toEqual(["2[3/2]2", "[3/2]2"]);
    expect(searchTokens("[3/2]2")).toEqual(["[3/2]2"]);
  });

  it("keeps a jj term (j1,j2)J one token, with or without a space after the comma", () => {
    // common practice: (3/2,1/2)1, (3/2, 1/2)₁ and (3/2,1/2)°1 name one level
    for (const s of ["(3/2,1/2)1", "(3/2, 1/2)₁", "(3/2,1/2)°1", "(3/2,1/2)_1"]) expect(searchTokens(s), s).toEqual(["(3/2+1/2)1"]);
    expect(termKeys("(3/2,1/2)1")).toEqual(["(3/2+1/2)1"]);
    expect(searchTokens("Ar (3/2,1/2)1 F=2")).toEqual(["ar", "(3/2+1/2)1", "f=2"]);
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

  it("reads polarization words, Δm and two-word phrases into one token each", () => {
    // Spellings of the polarizations (common practice: π, σ+, σ−; "sigma plus"; Δm written Δm, dm or delta m).
    expect(searchTokens("D2 σ+")).toEqual(["d2", "σ+"]);
    expect(searchTokens("D2 σ−")).toEqual(["d2", "σ-"]);
    expect(searchTokens("D2 sigma plus")).toEqual(["d2", "σ+"]);
    expect(searchTokens("D2 Sigma-Minus")).toEqual(["d2", "σ-"]);
    expect(searchTokens("Δm = +1")).toEqual(["dm=1"]);
    expect(searchTokens("delta m=-1")).toEqual(["dm=-1"]);
    expect(searchTokens("dm=0")).toEqual(["dm=0"]);
    expect(searchTokens("field insensitive")).toEqual(["field-insensitive"]);
    expect(searchTokens("two photon")).toEqual(["two-photon"]);
    expect(searchTokens("Rb clock transition")).toEqual(["rb", "clock"]);
    // multipole names (common practice): E2 electric quadrupole, M2 magnetic quadrupole, E3 electric octupole
    expect(searchTokens("Sr magnetic quadrupole")).toEqual(["sr", "m2"]);
    expect(searchTokens("Yb+ octupole")).toEqual(["yb+", "e3"]);
    expect(searchTokens("electric-quadrupole line")).toEqual(["e2", "line"]);
    expect(searchTokens("0–0")).toEqual(["0-0"]);
    // Words that only contain a phrase's letters are left alone.
    expect(searchTokens("sigmaplusx twophotons")).toEqual(["sigmaplusx", "twophotons"]);
  });

  it("keeps the spellings of species as one token each", () => {
    expect(searchTokens("Rb-87")).toEqual(["rb-87"]);
    expect(searchTokens("87Rb")).toEqual(["87rb"]);
    expect(searchTokens("40Ca+")).toEqual(["40ca+"]);
    expect(searchTokens("caesium")).toEqual(["caesium"]);
  });
});

describe("word tables", () => {
  it("names elements by symbol with their common spellings", () => {
    // IUPAC names; American "cesium" and "aluminum", British "sulphur" (common practice).
    expect(ELEMENT_NAMES.rb).toEqual(["rubidium"]);
    expect(ELEMENT_NAMES.cs).toEqual(["caesium", "cesium"]);
    expect(ELEMENT_NAMES.al).toEqual(["aluminium", "aluminum"]);
    expect(ELEMENT_NAMES.s).toEqual(["sulfur", "sulphur"]);
    expect(ELEMENT_NAMES.hg).toEqual(["mercury"]);
    // 118 elements, hydrogen to oganesson (IUPAC periodic table, from memory).
    expect(Object.keys(ELEMENT_NAMES).length).toBe(118);
    expect(elementOf("87Rb")).toBe("rb");
    expect(elementOf("40Ca+")).toBe("ca");
    expect(elementOf("Fe I")).toBe("fe");
    expect(elementOf("133Cs")).toBe("cs");
  });

  it("gives polarization words the Δm they name (m_upper − m_lower)", () => {
    // σ+ for Δm = +1, π for 0, σ− for −1 (common practice; the export's polarization field uses the same sign).
    expect(POLARIZATION_WORDS["σ+"]).toEqual([1]);
    expect(POLARIZATION_WORDS["sigma-"]).toEqual([-1]);
    expect(POLARIZATION_WORDS.pi).toEqual([0]);
    expect(POLARIZATION_WORDS.sigma).toEqual([1, -1]);
  });

  it("reads field units as the unit table has them", () => {
    // 1 G = 1e-4 T exactly (SI Brochure, non-SI units); lower case as typed.
    expect(FIELD_UNITS.g).toBe("G");
    expect(FIELD_UNITS.t).toBe("T");
    expect(FIELD_UNITS.mt).toBe("mT");
    expect(FIELD_UNITS.kg).toBe("kG");
    expect(FIELD_UNITS["µt"]).toBe("µT");
    expect(FIELD_UNITS["μt"]).toBe("µT");
  });
});
