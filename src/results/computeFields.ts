/**
 * Field-dependent results of one species at the configured bias fields.
 * Pure: no file system, no clock. Which physics each number comes from is
 * chosen here, per level and per line, and said in the result (`solver`,
 * `model`, `regime`) so the pages can state it.
 *
 * Levels: a level that belongs to a term whose fine-structure partners are
 * all listed with energies (fineStructureTerms) is solved with its term
 * (termHyperfineZeeman.ts: |J mJ mI⟩ over the listed J, hyperfine within
 * each J, Zeeman coupling between J from the LS structure, the level's gJ
 * within its own J) for its field table, transitions, plots and line
 * states, at every field; any other level with the single-J solver
 * (hyperfineZeeman.ts). Lines: components from the eigenstates of both
 * levels, each from its own level's solver (src/results/lineModel.ts).
 */
import { Dec, ZERO } from "../physics/decimal.js";
import { lsTerm, type LSTerm } from "../data/model.js";
import type { ConstantsEdition } from "../physics/constants/constant.js";
import { val } from "../physics/constants/constant.js";
import { prepareHyperfineZeeman, solverForPrepared, type HyperfineZeemanLevel, type UncoupledState } from "../physics/field/hyperfineZeeman.js";
import { hyperfineZeemanFloatSolver } from "../physics/field/hyperfineZeemanFloat.js";
import { quadraticZeemanCoefficient } from "../physics/field/quadraticZeeman.js";
import { linearValidity } from "../physics/field/validity.js";
import { sublevelTransitions } from "../physics/field/sublevelTransitions.js";
import { termSublevelTransitions } from "../physics/field/termSublevelTransitions.js";
import { prepareTerm, termHyperfineZeemanSolver, type PreparedTerm, type TermFieldState, type TermProblem } from "../physics/field/termHyperfineZeeman.js";
import { termHyperfineZeemanFloatSolver } from "../physics/field/termHyperfineZeemanFloat.js";
import {
  fineStructureShiftSlopes,
  fitSpinOrbit,
  fineStructureSolver,
  linearPatternLimit,
  spinOrbitSlopes,
  type FineStructureState,
  type FineStructureTerm,
} from "../physics/field/fineStructure.js";
import {
  lineComponentsAtField,
  lineReducedElement,
  singleReducedElement,
  statesFromHyperfine,
  statesFromTerm,
  type LineState,
  type ReducedElement,
} from "../physics/field/lineAtField.js";
import { hyperfineLinePattern } from "../physics/hyperfineLines.js";
import { lockPoints } from "../physics/lockPoints.js";
import { insensitivePointSensitivity, quadraticSensitivity, stateSensitivity, termInsensitivePointSensitivity, termStateSensitivity } from "../physics/field/sensitivity.js";
import { derived, exact, minus, plus, type Uncertain } from "../physics/uncertain.js";
import { speciesInputs, type SpeciesInputs } from "./inputUncertainties.js";
import { fromLevelSensitivity, fromTermSensitivity, hyperfineGroupsU, hyperfineOffsetsU, levelGJ, levelParamsU, partnerPartU, termParamsU, transitionUncertainties, uOf } from "./fieldUncertainty.js";
import { formatDoubled } from "../physics/quantum.js";
import type { LevelResult, LineResult, SpeciesResult } from "./types.js";
import { quadraticPartners } from "./quadraticScope.js";
import { chooseLineModel, hadFineStructureLabels, levelRegime, type LineSide } from "./lineModel.js";
import type {
  ConfiguredField,
  LevelFieldResult,
  LevelSolver,
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

/** A level's term solved at the configured fields: the prepared problem, each level's index in it, the states per field. */
interface TermSolve {
  term: TermFieldResult;
  prepared: PreparedTerm;
  index: Map<string, number>;
  atFields: TermFieldState[][][];
}

/** A level's states at one configured field as a line needs them, with each state's high-field (J, mJ) for the alias labels. */
interface LevelLineStates {
  states: LineState[];
  high: { J2: number; mJ2: number }[];
}

interface LevelComputed {
  result: LevelFieldResult;
  /** Energies as uncertain numbers, per configured field, in the order of the line states (fieldUncertainty.ts). */
  energiesU: Uncertain[][];
  /** Line states at configured field number `at` (made on first use). */
  lineStates: (at: number) => LevelLineStates;
}

function levelFields(
  s: SpeciesResult, l: LevelResult, c: ConstantsEdition, fields: ConfiguredField[], plotFields: PlotGrid, term: TermSolve | undefined,
  inputs: SpeciesInputs,
): LevelComputed {
  const level = solverLevel(s, l, c);
  const hasHf = level.I2 > 0;
  // the level's own parameters as uncertain numbers (A, B, gJ in use, gI, μB/h)
  const params = levelParamsU(l, inputs, hasHf);
  const partners = quadraticPartners(s, l, c, (lv) => hyperfineConstants(s, lv));
  const searchTo = insensitiveSearchLimit(fields);
  const quadratic = (F2: number, mF2: number): Dec | null => {
    // without nuclear spin the level's own part is exactly 0 (no F′ partners)
    const own = hasHf ? quadraticZeemanCoefficient(level, F2, mF2) : ZERO;
    const extra = partners.coefficient(F2, mF2);
    return own === null || extra === null ? null : own.plus(extra);
  };
  // the same coefficient as an uncertain number: own part analytic, partners' part through μB/h, gS, gL, energies, A and B (fieldUncertainty.ts)
  const quadraticU = (F2: number, mF2: number): Uncertain | null => {
    const extra = partners.coefficient(F2, mF2);
    if (extra === null) return null;
    let own: Uncertain = exact(ZERO);
    if (hasHf) {
      const value = quadraticZeemanCoefficient(level, F2, mF2);
      const sens = quadraticSensitivity(level, F2, mF2);
      if (value === null || sens === null) return null;
      own = fromLevelSensitivity(value, sens, params);
    }
    const at = partners.slopes(F2, mF2);
    return plus(own, partnerPartU(extra, inputs, at ? { at, levelId: l.input.id, partnerIds: partners.included } : undefined));
  };
  const common = {
    hyperfineListed: hasHf ? l.input.hyperfine !== null : null,
    quadratic: { scope: partners.scope, included: partners.included, missingJ2: partners.missingJ2, ...(partners.notLS ? { notLS: partners.notLS } : {}) },
    // where the linear numbers of this J hold (single-J solver; information, not a switch)
    validity: hasHf ? linearValidity(level) : null,
    insensitiveSearchTesla: searchTo,
  };
  const row = (st: { F2: number; mF2: number; highField: UncoupledState }, energies: Dec[], energiesU: Uncertain[]) => ({
    F2: st.F2,
    mF2: st.mF2,
    highField: st.highField,
    energies,
    quadraticPerTesla2: quadratic(st.F2, st.mF2),
    energiesU: energiesU.map(uOf),
    quadraticU: uOf(quadraticU(st.F2, st.mF2)),
  });
  const rowOf = (rows: { F2: number; mF2: number }[]) => {
    const index = new Map(rows.map((r, i) => [`${r.F2},${r.mF2}`, i]));
    return (x: { F2: number; mF2: number }) => index.get(`${x.F2},${x.mF2}`)!;
  };
  const memoAt = (make: (at: number) => LevelLineStates) => {
    const cache = new Map<number, LevelLineStates>();
    return (at: number) => {
      let v = cache.get(at);
      if (!v) cache.set(at, (v = make(at)));
      return v;
    };
  };

  if (term) {
    const index = term.index.get(l.input.id)!;
    const perField = term.atFields.map((sol) => sol[index]!);
    const first = perField[0] ?? termHyperfineZeemanSolver(term.prepared)(ZERO)[index]!;
    const grid = hasHf ? plotFields : null;
    const floatSolve = grid ? termHyperfineZeemanFloatSolver(term.prepared) : null;
    const sample = (bs: Dec[]) => {
      const solved = bs.map((b) => floatSolve!(b.toNumber())[index]!);
      return { fields: bs, energies: first.map((_, i) => solved.map((states) => states[i]!.energy)) };
    };
    const others = term.term.levelIds.filter((id) => id !== l.input.id);
    const termLevels = term.term.levelIds.map((id) => s.levels.find((x) => x.input.id === id)!);
    const tParams = termParamsU(termLevels, inputs, hasHf);
    const energiesU = perField.map((states, at) => states.map((st) => fromTermSensitivity(st.energy, termStateSensitivity(term.prepared, st, fields[at]!.tesla), tParams)));
    const transitions = hasHf
      ? termSublevelTransitions(term.prepared, index, level, fields.map((f) => f.tesla), perField, { quadraticExtra: partners.coefficient, toTesla: searchTo })
      : [];
    const solver: LevelSolver = {
      kind: "term",
      term: term.term.key,
      partners: others,
      J2s: term.prepared.problem.levels.map((x) => x.J2).sort((a, b) => a - b),
    };
    return {
      energiesU,
      result: {
        ...common,
        solver,
        rows: first.map((st, i) => row(st, perField.map((states) => states[i]!.energy), energiesU.map((u) => u[i]!))),
        transitions,
        transitionsU: transitionUncertainties(
          {
            level, params, rowOf: rowOf(first), energies: energiesU, quadratic: (x) => quadraticU(x.F2, x.mF2),
            point: (up, lo, tesla, hz) => {
              const r = termInsensitivePointSensitivity(term.prepared, index, up, lo, tesla);
              return { tesla: fromTermSensitivity(tesla, r.tesla, tParams), hz: fromTermSensitivity(hz, r.hz, tParams) };
            },
          },
          transitions,
        ),
        plot: grid ? { linear: sample(grid.linear), log: sample(grid.log) } : null,
      },
      lineStates: memoAt((at) => ({
        states: statesFromTerm(level.I2, perField[at]!),
        high: perField[at]!.map((st) => ({ J2: l.J2, mJ2: st.highField.mJ2 })),
      })),
    };
  }

  // one preparation shared by the exact solver and its float64 twin
  const prepared = prepareHyperfineZeeman(level);
  const solve = solverForPrepared(prepared);
  const perField = fields.map((f) => solve(f.tesla));
  const first = perField[0] ?? solve(ZERO);
  // Hellmann–Feynman on the eigenvectors already solved (no solve per input)
  const energiesU = perField.map((states, at) => states.map((st) => fromLevelSensitivity(st.energy, stateSensitivity(level, st, fields[at]!.tesla), params)));
  const transitions = hasHf
    ? sublevelTransitions(level, fields.map((f) => f.tesla), { statesAtFields: perField, quadraticExtra: partners.coefficient, toTesla: searchTo })
    : [];
  const grid = hasHf ? plotFields : null;
  const solveFloat = hasHf ? hyperfineZeemanFloatSolver(prepared) : null;
  const sample = (bs: Dec[]) => {
    const solved = bs.map((b) => solveFloat!(b.toNumber()));
    return { fields: bs, energies: first.map((_, i) => solved.map((states) => states.energy[i]!)) };
  };
  return {
    energiesU,
    result: {
      ...common,
      solver: { kind: "single-J" },
      rows: first.map((st, i) => row(st, perField.map((states) => states[i]!.energy), energiesU.map((u) => u[i]!))),
      transitions,
      transitionsU: transitionUncertainties(
        {
          level, params, rowOf: rowOf(first), energies: energiesU, quadratic: (x) => quadraticU(x.F2, x.mF2),
          point: (up, lo, tesla, hz) => {
            const r = insensitivePointSensitivity(prepared, level, up, lo, tesla);
            return { tesla: fromLevelSensitivity(tesla, r.tesla, params), hz: fromLevelSensitivity(hz, r.hz, params) };
          },
        },
        transitions,
      ),
      plot: grid ? { linear: sample(grid.linear), log: sample(grid.log) } : null,
    },
    lineStates: memoAt((at) => ({
      states: statesFromHyperfine(l.J2, perField[at]!, level.I2),
      high: perField[at]!.map((st) => ({ J2: l.J2, mJ2: st.highField.mJ2 })),
    })),
  };
}

/** The LS term of a level the term solver was given (only LS levels are grouped into terms). */
function lsTermOf(l: LevelResult): LSTerm {
  const t = lsTerm(l.input.term);
  if (!t) throw new RangeError(`level ${l.input.id} is not in LS coupling`);
  return t;
}

/** Group levels into LS terms whose every J is listed with an energy. */
/**
 * Standard uncertainties of a fine-structure term's state shifts and of its
 * spin–orbit constant: the Hellmann–Feynman slopes (fineStructureShiftSlopes)
 * and the fit's slopes (spinOrbitSlopes) chained to the partners' energies,
 * gL, gS and μB/h as uncertain inputs (shared keys, so correlations stay).
 */
function fineStructureUncertainties(term: FineStructureTerm, levels: LevelResult[], atFields: FineStructureState[][], fields: ConfiguredField[], inputs: SpeciesInputs) {
  const energyOf = new Map(levels.map((l) => [l.J2, inputs.level(l.input.id).energy ?? exact(l.input.energy!.si)]));
  const atFieldsU = atFields.map((states, i) =>
    states.map((st) => {
      const d = fineStructureShiftSlopes(term, st, fields[i]!.tesla);
      const slopes: [Dec, Uncertain][] = [...d.energies].map(([J2, k]) => [k, energyOf.get(J2)!]);
      slopes.push([d.gL, inputs.gL], [d.gS, inputs.gS], [d.muB_h, inputs.muB_h]);
      return uOf(derived(st.shift, slopes));
    }),
  );
  const zs = spinOrbitSlopes(term);
  const zetaU = zs ? uOf(derived(ZERO, [...zs].map(([J2, k]) => [k, energyOf.get(J2)!] as [Dec, Uncertain]))) : null;
  return { atFieldsU, zetaU };
}

function fineStructureTerms(s: SpeciesResult, c: ConstantsEdition, fields: ConfiguredField[], inputs: SpeciesInputs): { term: TermFieldResult; levels: LevelResult[] }[] {
  const groups = new Map<string, LevelResult[]>();
  for (const l of s.levels) {
    // the term solver treats LS terms only; a jK or jj level is solved within its own J
    const t = lsTerm(l.input.term);
    if (!l.input.energy || !t) continue;
    const key = `${l.input.config} ${t.multiplicity}${t.letter}${t.parity ? "°" : ""}`;
    groups.set(key, [...(groups.get(key) ?? []), l]);
  }
  const out: { term: TermFieldResult; levels: LevelResult[] }[] = [];
  for (const [key, levels] of groups) {
    if (levels.length < 2) continue;
    const { S2, L } = lsTermOf(levels[0]!);
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
    const atFields = fields.map((f) => solveAt(f.tesla));
    const energies = levels.map((l) => l.input.energy!.si).sort((a, b) => a.cmp(b));
    let interval = ZERO;
    for (let i = 1; i < energies.length; i++) interval = Dec.max(interval, energies[i]!.sub(energies[i - 1]!));
    out.push({
      levels,
      term: {
        key,
        config: levels[0]!.input.config,
        levelIds: levels.map((l) => l.input.id),
        S2,
        L,
        fit: fitSpinOrbit(term),
        limit: linearPatternLimit(term),
        atFields,
        ...fineStructureUncertainties(term, levels, atFields, fields, inputs),
        paschenBackTesla: interval.isZero() ? null : interval.div(val(c.muB_h)),
      },
    });
  }
  return out;
}

/**
 * The term solver's problem for the listed levels of one term: their
 * energies, each level's gJ in use within its own J (measured or LS; 0 for
 * J = 0) and its hyperfine constants (A = B = 0 where none are listed), the
 * species' gL, gS, gI and nuclear spin. Exact: copies only. Worked example:
 * 87Rb 5p ²P° gives levels J = 1/2 (A = 408.328 MHz, gJ LS) and J = 3/2
 * (A = 84.7185 MHz, B = 12.4965 MHz, gJ = 1.3362 measured), I = 3/2.
 */
export function termProblem(s: SpeciesResult, levels: LevelResult[], c: ConstantsEdition): TermProblem {
  const withHf = levels.map((l) => solverLevel(s, l, c));
  const { S2, L } = lsTermOf(levels[0]!);
  return {
    S2,
    L,
    I2: withHf[0]!.I2,
    gL: s.gL,
    gS: s.gS,
    gI: s.gI ?? ZERO,
    muB_h: val(c.muB_h),
    levels: levels.map((l, i) => ({ J2: l.J2, energy: l.input.energy!.si, gJ: withHf[i]!.gJ, A: withHf[i]!.A, B: withHf[i]!.B })),
  };
}

// levelRegime is kept exported here for callers of this module; the rule lives in lineModel.ts.
export { levelRegime };

const half = formatDoubled;

function componentsOf(
  upper: LevelLineStates, lower: LevelLineStates, k: number, reduced: ReducedElement, aliases: { Ju2: number; Jl2: number } | null,
  energiesU: { upper: Uncertain[]; lower: Uncertain[] },
): LineComponentAtField[] {
  const list = lineComponentsAtField(upper.states, lower.states, k, reduced)
    .filter((x) => x.strength.gt(NEGLIGIBLE))
    .map((x) => ({
      c: {
        upperLabel: upper.states[x.upper]!.label,
        lowerLabel: lower.states[x.lower]!.label,
        q: x.q,
        polarization: x.polarization,
        strength: x.strength,
        shiftHz: x.shift,
        // a difference of two uncertain energies: shared inputs (μB/h, gI) combine before squaring
        shiftHzU: uOf(minus(energiesU.upper[x.upper]!, energiesU.lower[x.lower]!)),
      } as LineComponentAtField,
      hu: upper.high[x.upper]!.mJ2,
      hl: lower.high[x.lower]!.mJ2,
    }));
  if (aliases) {
    // the strongest component of each high-field pair (mJ, mJ′) carries the fine-structure labels of earlier builds
    const best = new Map<string, (typeof list)[number]>();
    for (const x of list) {
      if (Math.abs(x.hu - x.hl) > 2 * k) continue;
      const key = `${x.hu},${x.hl}`;
      const b = best.get(key);
      if (!b || x.c.strength.gt(b.c.strength)) best.set(key, x);
    }
    for (const x of best.values()) {
      x.c.aliasLabels = { upper: `J=${half(aliases.Ju2)}, mJ=${half(x.hu)}`, lower: `J=${half(aliases.Jl2)}, mJ=${half(x.hl)}` };
    }
  }
  return list.map((x) => x.c).sort((a, b) => a.shiftHz.cmp(b.shiftHz) || b.q - a.q);
}

export function computeFields(s: SpeciesResult, c: ConstantsEdition, fields: ConfiguredField[]): SpeciesFieldResult {
  // the plot fields depend on the configured fields only: one grid for every level
  const grid = plotGrid(fields);
  const inputs = speciesInputs(s.input, c);
  const grouped = fineStructureTerms(s, c, fields, inputs);
  const terms = grouped.map((g) => g.term);
  const termOf = new Map<string, TermFieldResult>();
  for (const t of terms) for (const id of t.levelIds) termOf.set(id, t);
  // each listed term solved once per configured field, shared by its levels
  const solves = new Map<string, TermSolve>();
  for (const g of grouped) {
    const prepared = prepareTerm(termProblem(s, g.levels, c));
    const solve = termHyperfineZeemanSolver(prepared);
    const ts: TermSolve = { term: g.term, prepared, index: new Map(g.levels.map((l, i) => [l.input.id, i])), atFields: fields.map((f) => solve(f.tesla)) };
    for (const l of g.levels) solves.set(l.input.id, ts);
  }
  const computed = new Map(s.levels.map((l) => [l.input.id, levelFields(s, l, c, fields, grid, solves.get(l.input.id), inputs)]));
  const levels = new Map([...computed].map(([id, x]) => [id, x.result]));

  const regimeOf = (l: LevelResult, tesla: Dec): LineSide => {
    const v = levels.get(l.input.id)!.validity;
    const t = termOf.get(l.input.id);
    return {
      hf: levelRegime(tesla, v?.relative.tesla ?? null, v?.paschenBackTesla ?? null),
      fs: levelRegime(tesla, t?.limit?.tesla ?? null, t?.paschenBackTesla ?? null),
      inTerm: t !== undefined,
    };
  };

  const lineResult = (ln: LineResult): LineFieldResult => {
    const u = ln.upper;
    const l = ln.lower;
    const hfu = hyperfineConstants(s, u);
    const hfl = hyperfineConstants(s, l);
    const hfBoth = hfu !== null && hfl !== null;
    const ut = lsTerm(u.input.term);
    const lt = lsTerm(l.input.term);
    // the LS reduced elements need both levels in LS coupling with one S
    const facts = { sameSpin: ut !== null && lt !== null && ut.S2 === lt.S2, multipole: ln.input.multipole, hyperfineBoth: hfBoth };
    let reduced: ReducedElement | null = null;
    const gu = levelGJ(u, inputs);
    const gl = levelGJ(l, inputs);
    const atFields = fields.map((f, at): LineAtFieldResult => {
      // the one rule shared with the field calculator (src/engine/)
      const su = regimeOf(u, f.tesla);
      const sl = regimeOf(l, f.tesla);
      const choice = chooseLineModel(su, sl, facts);
      const { regime, model } = choice;
      if (model === "J-resolved linear pattern") {
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
            // (μB/h)·B·(g_u·m_u − g_l·m_l), with the gJ in use of each level
            shiftHzU: uOf(derived(x.shiftHzPerT.mul(f.tesla), [
              [val(c.muB_h).mul(f.tesla).mul(x.mu2).div(2), gu],
              [val(c.muB_h).mul(f.tesla).mul(-x.ml2).div(2), gl],
              [x.shiftHzPerT.mul(f.tesla).div(val(c.muB_h)), inputs.muB_h],
            ])),
          })),
        };
      }
      if (model === "hyperfine–Zeeman eigenstates") reduced = singleReducedElement;
      else reduced ??= lineReducedElement(choice.reduced, ut?.L ?? 0, lt?.L ?? 0, ut?.S2 ?? 0, ln.k, u.J2, l.J2);
      const aliases = hadFineStructureLabels(su, sl, facts) ? { Ju2: u.J2, Jl2: l.J2 } : null;
      return {
        field: f,
        regime,
        model,
        ...(model === "hyperfine–Zeeman eigenstates" ? {} : { reduced: choice.reduced }),
        components: componentsOf(computed.get(u.input.id)!.lineStates(at), computed.get(l.input.id)!.lineStates(at), ln.k, reduced, aliases, {
          upper: computed.get(u.input.id)!.energiesU[at]!,
          lower: computed.get(l.input.id)!.energiesU[at]!,
        }),
      };
    });
    const hyperfine = hfBoth
      ? hyperfineLinePattern({
          I2: s.I2,
          gI: s.gI!,
          upper: { J2: u.J2, gJ: u.gJ ?? ZERO, ...hfu! },
          lower: { J2: l.J2, gJ: l.gJ ?? ZERO, ...hfl! },
          k: ln.k,
          muB_h: val(c.muB_h),
        })
      : null;
    const hyperfineOffsetU = hyperfine
      ? hyperfineOffsetsU(s.I2, { J2: u.J2, p: levelParamsU(u, inputs, true) }, { J2: l.J2, p: levelParamsU(l, inputs, true) }, lockPoints(hyperfine, null))
      : undefined;
    const hyperfineU = hyperfine
      ? hyperfineGroupsU(s.I2, inputs.gI ?? exact(ZERO), { J2: u.J2, gJ: levelGJ(u, inputs) }, { J2: l.J2, gJ: levelGJ(l, inputs) }, inputs.muB_h, hyperfine)
      : undefined;
    return { atFields, hyperfine, ...(hyperfineOffsetU ? { hyperfineOffsetU } : {}), ...(hyperfineU ? { hyperfineU } : {}) };
  };

  return { levels, terms, termOf, lines: new Map(s.lines.map((ln) => [ln.input.id, lineResult(ln)])) };
}
