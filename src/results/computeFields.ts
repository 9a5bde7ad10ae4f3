/**
 * Field-dependent results of one species at the configured bias fields.
 * Pure: no file system, no clock. Which physics each number comes from is
 * chosen here, per level and per line, and said in the result (`model`,
 * `regime`) so the pages can state it.
 */
import { Dec, ZERO } from "../physics/decimal.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { prepareHyperfineZeeman, solverForPrepared, type HyperfineZeemanLevel } from "../physics/field/hyperfineZeeman.js";
import { hyperfineZeemanFloatSolver } from "../physics/field/hyperfineZeemanFloat.js";
import { quadraticZeemanCoefficient } from "../physics/field/quadraticZeeman.js";
import { linearValidity } from "../physics/field/validity.js";
import { sublevelTransitions } from "../physics/field/sublevelTransitions.js";
import {
  fitSpinOrbit,
  fineStructureSolver,
  linearPatternLimit,
  type FineStructureTerm,
} from "../physics/field/fineStructure.js";
import {
  lineComponentsAtField,
  lsReducedElement,
  singleReducedElement,
  statesFromFineStructure,
  statesFromHyperfine,
  type LineState,
  type ReducedElement,
} from "../physics/field/lineAtField.js";
import { hyperfineLinePattern } from "../physics/hyperfineLines.js";
import { formatDoubled, mValues } from "../physics/quantum.js";
import type { LevelResult, LineResult, SpeciesResult } from "./types.js";
import { quadraticPartners } from "./quadraticScope.js";
import { chooseLineModel, levelRegime, type LineSide } from "./lineModel.js";
import type {
  ConfiguredField,
  LevelFieldResult,
  LineAtFieldResult,
  LineComponentAtField,
  LineFieldResult,
  TermFieldResult,
} from "./fieldTypes.js";

/** Components weaker than this share of the line are not listed (numerical zeros of mixed states). */
const NEGLIGIBLE = new Dec("1e-20");
/** Samples per plot axis (float64 solves: plots need no more than pixel accuracy). */
const PLOT_POINTS = 81;

export interface SpeciesFieldResult {
  levels: Map<string, LevelFieldResult>;
  terms: TermFieldResult[];
  /** Term key of each level that belongs to a treated fine-structure term. */
  termOf: Map<string, TermFieldResult>;
  lines: Map<string, LineFieldResult>;
}

/**
 * Hyperfine constants of a level in a species with nuclear spin, or null
 * without one. A level that lists none (every J = 0 level, or constants
 * not measured) has A = B = 0: its nuclear sublevels and their Zeeman
 * shifts are still there.
 */
export function hyperfineConstants(s: SpeciesResult, l: LevelResult): { A: Dec; B: Dec } | null {
  if (s.I2 === 0) return null;
  const hf = l.input.hyperfine;
  return { A: hf ? hf.A.si : ZERO, B: hf?.B ? hf.B.si : ZERO };
}

/** The solver's view of a level; gJ = 0 stands in for J = 0 (no magnetic moment). */
export function solverLevel(s: SpeciesResult, l: LevelResult, c: ConstantsEdition): HyperfineZeemanLevel {
  const hf = hyperfineConstants(s, l);
  return {
    J2: l.J2,
    I2: hf ? s.I2 : 0,
    gJ: l.gJ ?? ZERO,
    gI: s.gI ?? ZERO,
    A: hf ? hf.A : ZERO,
    B: hf ? hf.B : ZERO,
    muB_h: val(c.muB_h),
  };
}

/** Field-insensitive points are searched up to the larger of 1 T and twice the largest configured field. */
export function insensitiveSearchLimit(fields: ConfiguredField[]): Dec {
  return Dec.max(new Dec(1), ...fields.map((f) => f.tesla.mul(2)));
}

function plotGrid(fields: ConfiguredField[]): { linear: Dec[]; log: Dec[] } | null {
  const positive = fields.map((f) => f.tesla).filter((t) => t.gt(0));
  if (positive.length === 0) return null;
  const max = Dec.max(...positive);
  const linear = Array.from({ length: PLOT_POINTS }, (_, i) => max.mul(i).div(PLOT_POINTS - 1));
  const lo = Dec.max(Dec.min(...positive).div(10), max.div("1e6"));
  const ratio = max.div(lo).pow(new Dec(1).div(PLOT_POINTS - 1));
  const log = Array.from({ length: PLOT_POINTS }, (_, i) => (i === PLOT_POINTS - 1 ? max : lo.mul(ratio.pow(i))));
  return { linear, log };
}

type PlotGrid = ReturnType<typeof plotGrid>;

function levelFields(s: SpeciesResult, l: LevelResult, c: ConstantsEdition, fields: ConfiguredField[], plotFields: PlotGrid): LevelFieldResult {
  const level = solverLevel(s, l, c);
  // one preparation shared by the exact solver and its float64 twin
  const prepared = prepareHyperfineZeeman(level);
  const solve = solverForPrepared(prepared);
  const perField = fields.map((f) => solve(f.tesla));
  const hasHf = level.I2 > 0;
  const first = perField[0] ?? solve(ZERO);
  const partners = quadraticPartners(s, l, c, (lv) => hyperfineConstants(s, lv));
  const searchTo = insensitiveSearchLimit(fields);
  const quadratic = (F2: number, mF2: number): Dec | null => {
    // without nuclear spin the level's own part is exactly 0 (no F′ partners)
    const own = hasHf ? quadraticZeemanCoefficient(level, F2, mF2) : ZERO;
    const extra = partners.coefficient(F2, mF2);
    return own === null || extra === null ? null : own.plus(extra);
  };
  const rows = first.map((st, i) => ({
    F2: st.F2,
    mF2: st.mF2,
    highField: st.highField,
    energies: perField.map((states) => states[i]!.energy),
    quadraticPerTesla2: quadratic(st.F2, st.mF2),
  }));
  const grid = hasHf ? plotFields : null;
  const solveFloat = hasHf ? hyperfineZeemanFloatSolver(prepared) : null;
  const sample = (bs: Dec[]) => {
    const solved = bs.map((b) => solveFloat!(b.toNumber()));
    return { fields: bs, energies: rows.map((_, i) => solved.map((states) => states.energy[i]!)) };
  };
  return {
    rows,
    hyperfineListed: hasHf ? l.input.hyperfine !== null : null,
    quadratic: { scope: partners.scope, included: partners.included, missingJ2: partners.missingJ2 },
    statesAtFields: perField,
    validity: hasHf ? linearValidity(level) : null,
    transitions: hasHf
      ? sublevelTransitions(level, fields.map((f) => f.tesla), { statesAtFields: perField, quadraticExtra: partners.coefficient, toTesla: searchTo })
      : [],
    insensitiveSearchTesla: searchTo,
    plot: grid ? { linear: sample(grid.linear), log: sample(grid.log) } : null,
  };
}

/** Group levels into LS terms whose every J is listed with an energy. */
function fineStructureTerms(s: SpeciesResult, c: ConstantsEdition, fields: ConfiguredField[]): TermFieldResult[] {
  const groups = new Map<string, LevelResult[]>();
  for (const l of s.levels) {
    if (!l.input.energy) continue;
    const t = l.input.term;
    const key = `${l.input.config} ${t.multiplicity}${t.letter}${t.parity ? "°" : ""}`;
    groups.set(key, [...(groups.get(key) ?? []), l]);
  }
  const out: TermFieldResult[] = [];
  for (const [key, levels] of groups) {
    if (levels.length < 2) continue;
    const { S2, L } = levels[0]!.input.term;
    const expected = new Set<number>();
    for (let j2 = Math.abs(2 * L - S2); j2 <= 2 * L + S2; j2 += 2) expected.add(j2);
    const have = new Set(levels.map((l) => l.J2));
    if (have.size !== levels.length || have.size !== expected.size || ![...expected].every((j) => have.has(j))) continue;
    const term: FineStructureTerm = {
      S2,
      L,
      partners: levels.map((l) => ({ J2: l.J2, energy: l.input.energy!.si })),
      gL: s.gL,
      gS: s.gS,
      muB_h: val(c.muB_h),
    };
    // bases, Clebsch–Gordan products and Zeeman diagonal prepared once for all configured fields
    const solveAt = fineStructureSolver(term);
    const energies = levels.map((l) => l.input.energy!.si).sort((a, b) => a.cmp(b));
    let interval = ZERO;
    for (let i = 1; i < energies.length; i++) interval = Dec.max(interval, energies[i]!.sub(energies[i - 1]!));
    out.push({
      key,
      config: levels[0]!.input.config,
      levelIds: levels.map((l) => l.input.id),
      S2,
      L,
      fit: fitSpinOrbit(term),
      limit: linearPatternLimit(term),
      atFields: fields.map((f) => solveAt(f.tesla)),
      paschenBackTesla: interval.isZero() ? null : interval.div(val(c.muB_h)),
    });
  }
  return out;
}

// levelRegime is kept exported here for callers of this module; the rule lives in lineModel.ts.
export { levelRegime };

/** States of a level without mixing: |J mJ⟩ with the linear energy, for the lower level of a fine-structure-mixed line. */
function isolatedStates(l: LevelResult, tesla: Dec, muB_h: Dec): LineState[] {
  return mValues(l.J2).map((m2) => ({
    label: `J=${formatDoubled(l.J2)}, mJ=${formatDoubled(m2)}`,
    M2: m2,
    energy: (l.gJ ?? ZERO).mul(muB_h).mul(tesla).mul(m2).div(2),
    amplitudes: [{ J2: l.J2, mJ2: m2, mI2: 0, amplitude: new Dec(1) }],
  }));
}

function componentsOf(upper: LineState[], lower: LineState[], k: number, reduced: ReducedElement): LineComponentAtField[] {
  return lineComponentsAtField(upper, lower, k, reduced)
    .filter((x) => x.strength.gt(NEGLIGIBLE))
    .map((x) => ({
      upperLabel: upper[x.upper]!.label,
      lowerLabel: lower[x.lower]!.label,
      q: x.q,
      polarization: x.polarization,
      strength: x.strength,
      shiftHz: x.shift,
    }))
    .sort((a, b) => a.shiftHz.cmp(b.shiftHz) || b.q - a.q);
}

export function computeFields(s: SpeciesResult, c: ConstantsEdition, fields: ConfiguredField[]): SpeciesFieldResult {
  const muB_h = val(c.muB_h);
  // the plot fields depend on the configured fields only: one grid for every level
  const grid = plotGrid(fields);
  const levels = new Map(s.levels.map((l) => [l.input.id, levelFields(s, l, c, fields, grid)]));
  const terms = fineStructureTerms(s, c, fields);
  const termOf = new Map<string, TermFieldResult>();
  for (const t of terms) for (const id of t.levelIds) termOf.set(id, t);

  const regimeOf = (l: LevelResult, tesla: Dec): LineSide => {
    const v = levels.get(l.input.id)!.validity;
    const t = termOf.get(l.input.id);
    return {
      hf: levelRegime(tesla, v?.relative.tesla ?? null, v?.paschenBackTesla ?? null),
      fs: levelRegime(tesla, t?.limit?.tesla ?? null, t?.paschenBackTesla ?? null),
      inTerm: t !== undefined,
    };
  };

  // Line states of a level at a field index, and reduced elements per (Lu, Ll, S, k): shared by all lines.
  const memo = <T>(cache: Map<string, T>, key: string, make: () => T): T => {
    let v = cache.get(key);
    if (v === undefined) cache.set(key, (v = make()));
    return v;
  };
  const fsStates = new Map<string, LineState[]>();
  const hfStates = new Map<string, LineState[]>();
  const reducedElements = new Map<string, ReducedElement>();
  const reducedOf = (Lu: number, Ll: number, S2: number, k: number): ReducedElement =>
    memo(reducedElements, `${Lu},${Ll},${S2},${k}`, () => {
      const raw = lsReducedElement(Lu, Ll, S2, k);
      const values = new Map<string, Dec>();
      return (Ju2, Jl2) => memo(values, `${Ju2},${Jl2}`, () => raw(Ju2, Jl2));
    });

  const lineResult = (ln: LineResult): LineFieldResult => {
    const u = ln.upper;
    const l = ln.lower;
    const hfu = hyperfineConstants(s, u);
    const hfl = hyperfineConstants(s, l);
    const hfBoth = hfu !== null && hfl !== null;
    const atFields = fields.map((f, at): LineAtFieldResult => {
      // the one rule shared with the field calculator (src/engine/)
      const { regime, model } = chooseLineModel(regimeOf(u, f.tesla), regimeOf(l, f.tesla), {
        sameSpin: u.input.term.S2 === l.input.term.S2,
        multipole: ln.input.multipole,
        hyperfineBoth: hfBoth,
      });
      const tu = termOf.get(u.input.id);
      const tl = termOf.get(l.input.id);
      if (model === "fine-structure Paschen–Back eigenstates") {
        const statesOf = (lv: LevelResult, t: TermFieldResult | undefined) =>
          memo(fsStates, `${lv.input.id}\u0000${at}`, () => {
            if (!t) return isolatedStates(lv, f.tesla, muB_h);
            const all = t.atFields[at]!.filter((st) => st.J2 === lv.J2);
            return statesFromFineStructure(all, lv.input.energy!.si);
          });
        const reduced = reducedOf(u.input.term.L, l.input.term.L, u.input.term.S2, ln.k);
        return {
          field: f,
          regime,
          model,
          components: componentsOf(statesOf(u, tu), statesOf(l, tl), ln.k, reduced),
        };
      }
      if (model === "hyperfine–Zeeman eigenstates") {
        const statesOf = (lv: LevelResult) =>
          memo(hfStates, `${lv.input.id}\u0000${at}`, () => statesFromHyperfine(lv.J2, levels.get(lv.input.id)!.statesAtFields[at]!));
        return {
          field: f,
          regime,
          model,
          components: componentsOf(statesOf(u), statesOf(l), ln.k, singleReducedElement),
        };
      }
      return {
        field: f,
        regime,
        model,
        components: ln.components.map((x) => ({
          upperLabel: `mJ=${formatDoubled(x.mu2)}`,
          lowerLabel: `mJ=${formatDoubled(x.ml2)}`,
          q: x.deltaM,
          polarization: x.polarization,
          strength: x.strength.toDecimal(),
          shiftHz: x.shiftHzPerT.mul(f.tesla),
        })),
      };
    });
    const hyperfine = hfBoth
      ? hyperfineLinePattern({
          I2: s.I2,
          gI: s.gI!,
          upper: { J2: u.J2, gJ: u.gJ ?? ZERO, ...hfu! },
          lower: { J2: l.J2, gJ: l.gJ ?? ZERO, ...hfl! },
          k: ln.k,
          muB_h,
        })
      : null;
    return { atFields, hyperfine };
  };

  return { levels, terms, termOf, lines: new Map(s.lines.map((ln) => [ln.input.id, lineResult(ln)])) };
}
