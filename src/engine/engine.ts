/**
 * The field calculator: every number of one species at any field B ≥ 0, in
 * float64, from the engine data the build writes (engineData.ts). One source
 * for the browser (src/browser/calculator.ts) and the tests; pure.
 *
 * What it computes, and from which physics (the same as the build's exact
 * tables, src/results/computeFields.ts, but in double precision):
 *  - every sublevel energy of every level: for a level of a term whose
 *    fine-structure partners are listed, the term Hamiltonian in |J mJ mI⟩
 *    over the listed J (termHyperfineZeeman.ts, float twin
 *    termHyperfineZeemanFloatSolver: hyperfine within each J, Zeeman
 *    coupling between J from the LS structure, the level's gJ within its
 *    own J; hyperfine matrix elements between different J not included);
 *    for any other level the hyperfine–Zeeman Hamiltonian of its J
 *    (hyperfineZeeman.ts, float twin solveHyperfineZeemanFloat); both
 *    diagonalized per M block, labels (F, mF) and high-field (mJ, mI) by the
 *    solvers' rule;
 *  - every sublevel transition frequency (upper minus lower energy) of the
 *    list the build made with sublevelTransitionPairs (in the engine data),
 *    for the levels with hyperfine structure;
 *  - each line's components (shift from the line centre, relative strength,
 *    polarization, state labels) from the model chooseLineModel picks for the
 *    line (src/results/lineModel.ts, shared with the build): the eigenstates
 *    of both levels, each from its own level's solver, with LS reduced
 *    elements between the J of the terms or the line's own J pair
 *    (lineReducedElement), or the J-resolved linear pattern; components
 *    are computed by lineComponentsFloat, those weaker than 1e-20 of the line
 *    left out, sorted by shift then by descending Δm, as the build does;
 *    with the line's frequency ν0 = c/λ (engine data), each component's
 *    absolute frequency ν0 + shift (lockPoints.ts absoluteFrequency).
 * Exact: no. Energies and frequencies agree with the 60-digit build to about
 * 1e-15 of the level's largest energy; strengths to about 1e-15 (absolute).
 * The tests hold it to 1e-9 relative or 1 Hz (1e-12 for strengths) at the
 * configured fields and between them (test/engine/).
 *
 * Preparation (matrix structure and labels: Dec and exact fractions, as
 * prepareHyperfineZeeman does) happens once per species on the first call
 * and is kept with the data object.
 *
 * Worked example: 87Rb 5²S1/2 at 0 T gives F = 1 at −5A/4 and F = 2 at 3A/4
 * (A = 3417.341305452145 MHz), and the clock transition |1, 0⟩ → |2, 0⟩ at
 * 2A = 6834.682610904290 MHz; the test compares every number of every demo
 * species with the exact build.
 */
import { Dec } from "../physics/decimal.js";
import { formatDoubled } from "../physics/quantum.js";
import { prepareHyperfineZeeman, type PreparedLevel } from "../physics/field/hyperfineZeeman.js";
import { solveHyperfineZeemanFloat, type FloatFieldState } from "../physics/field/hyperfineZeemanFloat.js";
import { prepareTerm } from "../physics/field/termHyperfineZeeman.js";
import { termHyperfineZeemanFloatSolver, type TermFloatState } from "../physics/field/termHyperfineZeemanFloat.js";
import { lineReducedElement, singleReducedElement } from "../physics/field/lineAtField.js";
import {
  lineComponentsFloat,
  statesFromHyperfineFloat,
  statesFromTermFloat,
  type FloatLineComponents,
  type FloatLineState,
} from "../physics/field/lineAtFieldFloat.js";
import { chooseLineModel, levelRegimeFloat, type LineSide } from "../results/lineModel.js";
import type { AtComponent, AtLine, AtResult, AtState, AtTransition, EngineData, EngineLevel, EngineLine } from "./types.js";

/** Components weaker than this share of the line are not listed (as computeFields). */
const NEGLIGIBLE = 1e-20;

const num = (s: string | null): number | null => (s === null ? null : Number(s));

interface PreparedLevelEntry {
  data: EngineLevel;
  prepared: PreparedLevel;
  linearUpTo: number | null;
  paschenBack: number | null;
  transitions: EngineLevel["transitions"];
  /** "F", "mF" of each sublevel in the solver's order (labels are structural: the same at every field). */
  labels: { F: string; mF: string }[];
}

interface PreparedTerm {
  /** The float64 term solver (termHyperfineZeemanFloat.ts) over the listed levels, in the engine data's partner order. */
  solve: (tesla: number) => TermFloatState[][];
  limit: number | null;
  paschenBack: number | null;
}

interface PreparedLine {
  data: EngineLine;
  /** Line frequency c/λ, Hz (float64: 384 THz to 0.06 Hz), or null without a wavelength. */
  centre: number | null;
  /** Components from the levels' eigenstates, with the reduced elements the model asks for (prepared on first use). */
  components: () => FloatLineComponents;
  linear: { upper: string; lower: string; q: number; polarization: AtComponent<number>["polarization"]; strength: number; shiftHzPerT: number }[];
}

interface PreparedSpecies {
  muB_h: number;
  levels: Map<string, PreparedLevelEntry>;
  terms: Map<string, PreparedTerm>;
  /** Each level of a listed term: its term key and index in the term solver's output. */
  termIndex: Map<string, { key: string; index: number }>;
  lines: PreparedLine[];
}

const preparedCache = new WeakMap<EngineData, PreparedSpecies>();

function fraction(text: string): number {
  const [p, q] = text.split("/");
  return q === undefined ? Number(p) : Number(p) / Number(q);
}

function prepare(data: EngineData): PreparedSpecies {
  const muB_h = new Dec(data.muB_h);
  const levels = new Map<string, PreparedLevelEntry>();
  for (const l of data.levels) {
    const level = { J2: l.J2, I2: l.I2, gJ: new Dec(l.gJ), gI: new Dec(l.gI), A: new Dec(l.A), B: new Dec(l.B), muB_h };
    const prepared = prepareHyperfineZeeman(level);
    const labels: { F: string; mF: string }[] = new Array(prepared.size);
    for (const b of prepared.blocks) b.outIndex.forEach((pos, k) => (labels[pos] = { F: formatDoubled(b.fByRank[k]!), mF: formatDoubled(b.M2) }));
    levels.set(l.id, {
      data: l,
      prepared,
      linearUpTo: num(l.linearUpToT),
      paschenBack: num(l.paschenBackT),
      transitions: l.transitions,
      labels,
    });
  }
  const terms = new Map<string, PreparedTerm>();
  const termIndex = new Map<string, { key: string; index: number }>();
  for (const t of data.terms) {
    // the term solver's problem from the levels' own solver inputs (computeFields' termProblem does the same from the results)
    const partners = t.partners.map((p) => levels.get(p.level)!.data);
    const first = partners[0]!;
    const problem = {
      S2: t.S2,
      L: t.L,
      I2: first.I2,
      gL: new Dec(t.gL),
      gS: new Dec(t.gS),
      gI: new Dec(first.gI),
      muB_h,
      levels: t.partners.map((p, i) => ({ J2: p.J2, energy: new Dec(p.energy), gJ: new Dec(partners[i]!.gJ), A: new Dec(partners[i]!.A), B: new Dec(partners[i]!.B) })),
    };
    terms.set(t.key, { solve: termHyperfineZeemanFloatSolver(prepareTerm(problem)), limit: num(t.limitT), paschenBack: num(t.paschenBackT) });
    t.partners.forEach((p, index) => termIndex.set(p.level, { key: t.key, index }));
  }
  const lines = data.lines.map((ln): PreparedLine => {
    const u = levels.get(ln.upper)!.data;
    const l = levels.get(ln.lower)!.data;
    let components: FloatLineComponents | null = null;
    return {
      data: ln,
      centre: ln.frequencyHz === undefined || ln.frequencyHz === null ? null : Number(ln.frequencyHz),
      components: () => {
        if (components) return components;
        // the model does not change with the field: the reduced elements are the same at every field
        const choice = chooseLineModel(sideAtZero(termIndex.has(u.id)), sideAtZero(termIndex.has(l.id)), facts(ln, u, l));
        const reduced = choice.model === "hyperfine–Zeeman eigenstates" ? singleReducedElement : lineReducedElement(choice.reduced, u.L ?? 0, l.L ?? 0, u.S2 ?? 0, ln.k, u.J2, l.J2);
        return (components = lineComponentsFloat(ln.k, reduced));
      },
      linear: ln.linear.map((x) => ({
        upper: `mJ=${formatDoubled(x.mu2)}`,
        lower: `mJ=${formatDoubled(x.ml2)}`,
        q: x.deltaM,
        polarization: x.polarization,
        strength: fraction(x.strength),
        shiftHzPerT: Number(x.shiftHzPerT),
      })),
    };
  });
  return { muB_h: muB_h.toNumber(), levels, terms, termIndex, lines };
}

/** A level's side for the model choice where only its term membership matters (the model is the same at every field). */
const sideAtZero = (inTerm: boolean): LineSide => ({ hf: "zero field", fs: "zero field", inTerm });
const facts = (ln: EngineLine, u: EngineLevel, l: EngineLevel) => ({ sameSpin: u.S2 !== null && u.S2 === l.S2, multipole: ln.multipole, hyperfineBoth: ln.hyperfineBoth });

function prepared(data: EngineData): PreparedSpecies {
  let p = preparedCache.get(data);
  if (!p) preparedCache.set(data, (p = prepare(data)));
  return p;
}

/** Prepare a species ahead of its first answer (e.g. when the page is idle). */
export function prepareEngine(data: EngineData): void {
  prepared(data);
}

/**
 * Every number of the species at `tesla` (a float ≥ 0). See the module
 * comment; the answer has the keys of the export's field_table and at_fields
 * entries, with numbers as JavaScript numbers.
 */
export function engineAt(data: EngineData, tesla: number): AtResult<number> {
  if (!(tesla >= 0) || !Number.isFinite(tesla)) throw new RangeError("field must be a finite number of tesla, 0 or more");
  const sp = prepared(data);
  const termSolved = new Map<string, TermFloatState[][]>();
  for (const [key, t] of sp.terms) termSolved.set(key, t.solve(tesla));
  const solved = new Map<string, FloatFieldState[]>();
  const termStates = (id: string): TermFloatState[] | null => {
    const at = sp.termIndex.get(id);
    return at ? termSolved.get(at.key)![at.index]! : null;
  };
  for (const [id, lv] of sp.levels) if (!sp.termIndex.has(id)) solved.set(id, solveHyperfineZeemanFloat(lv.prepared, tesla));
  /** A level's energies in the solvers' (F, mF) order. */
  const energies = (id: string): number[] => termStates(id)?.map((s) => s.energy) ?? solved.get(id)!.map((s) => s.energy);

  const levels = [...sp.levels.values()].map((lv) => {
    const ts = termStates(lv.data.id);
    const states = ts
      ? ts.map((st) => ({ F2: st.F2, mF2: st.mF2, energy: st.energy, highField: st.highField }))
      : solved.get(lv.data.id)!.map((st) => ({ F2: st.F2, mF2: st.mF2, energy: st.energy, highField: st.highField }));
    return {
      id: lv.data.id,
      states: states.map(
        (st): AtState<number> => ({
          F: formatDoubled(st.F2),
          mF: formatDoubled(st.mF2),
          E_Hz: st.energy,
          high_field: { mJ: formatDoubled(st.highField.mJ2), mI: formatDoubled(st.highField.mI2) },
        }),
      ),
    };
  });

  const transitions: AtTransition<number>[] = [];
  for (const lv of sp.levels.values()) {
    const e = energies(lv.data.id);
    for (const t of lv.transitions) {
      transitions.push({ level: lv.data.id, lower: lv.labels[t.lo]!, upper: lv.labels[t.up]!, kind: t.kind, Hz: e[t.up]! - e[t.lo]! });
    }
  }

  const side = (lv: PreparedLevelEntry): LineSide => {
    const term = lv.data.fineStructureTerm === null ? null : sp.terms.get(lv.data.fineStructureTerm)!;
    return {
      hf: levelRegimeFloat(tesla, lv.linearUpTo, lv.paschenBack),
      fs: levelRegimeFloat(tesla, term?.limit ?? null, term?.paschenBack ?? null),
      inTerm: term !== null,
    };
  };
  /** A level's states for a line: the term solver's or the single-J solver's, labelled as the build labels them. */
  const lineStates = (lv: PreparedLevelEntry): FloatLineState[] => {
    const ts = termStates(lv.data.id);
    return ts ? statesFromTermFloat(lv.data.I2, ts) : statesFromHyperfineFloat(lv.data.J2, solved.get(lv.data.id)!, lv.data.I2);
  };

  const lines = sp.lines.map((ln): AtLine<number> => {
    const u = sp.levels.get(ln.data.upper)!;
    const l = sp.levels.get(ln.data.lower)!;
    const { regime, model } = chooseLineModel(side(u), side(l), facts(ln.data, u.data, l.data));
    if (model === "J-resolved linear pattern") {
      return {
        id: ln.data.id,
        model,
        regime,
        components: ln.linear.map((x) => ({
          upper: x.upper,
          lower: x.lower,
          delta_m: x.q,
          polarization: x.polarization,
          relative_strength: x.strength,
          shift_Hz: x.shiftHzPerT * tesla,
          frequency_Hz: ln.centre === null ? null : ln.centre + x.shiftHzPerT * tesla,
        })),
      };
    }
    const upper = lineStates(u);
    const lower = lineStates(l);
    const list = ln
      .components()(upper, lower)
      .filter((x) => x.strength > NEGLIGIBLE)
      .sort((a, b) => a.shift - b.shift || b.q - a.q)
      .map(
        (x): AtComponent<number> => ({
          upper: upper[x.upper]!.label,
          lower: lower[x.lower]!.label,
          delta_m: x.q,
          polarization: x.polarization,
          relative_strength: x.strength,
          shift_Hz: x.shift,
          frequency_Hz: ln.centre === null ? null : ln.centre + x.shift,
        }),
      );
    return { id: ln.data.id, model, regime, components: list };
  });

  return { B_T: tesla, levels, transitions, lines };
}
