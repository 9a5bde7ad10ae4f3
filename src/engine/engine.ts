/**
 * The field calculator: every number of one species at any field B ≥ 0, in
 * float64, from the engine data the build writes (engineData.ts). One source
 * for the browser (src/browser/calculator.ts) and the tests; pure.
 *
 * What it computes, and from which physics (the same as the build's exact
 * tables, src/results/computeFields.ts, but in double precision):
 *  - every sublevel energy of every level: the hyperfine–Zeeman Hamiltonian
 *    diagonalized per M block (hyperfineZeeman.ts, float twin
 *    solveHyperfineZeemanFloat), labels (F, mF) and high-field (mJ, mI) by
 *    the solver's rule;
 *  - every sublevel transition frequency (upper minus lower energy) of the
 *    list the build made with sublevelTransitionPairs (in the engine data),
 *    for the levels with hyperfine structure;
 *  - each line's components (shift from the line centre, relative strength,
 *    polarization, state labels) from the model chooseLineModel picks for the
 *    line at this field (src/results/lineModel.ts, shared with the build):
 *    hyperfine–Zeeman eigenstates, fine-structure Paschen–Back eigenstates
 *    (fineStructureFloatEigen) or the J-resolved linear pattern; components
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
import { formatDoubled, mValues } from "../physics/quantum.js";
import { prepareHyperfineZeeman, type PreparedLevel } from "../physics/field/hyperfineZeeman.js";
import { solveHyperfineZeemanFloat, type FloatFieldState } from "../physics/field/hyperfineZeemanFloat.js";
import { fineStructureFloatEigen, type FineStructureFloatEigen, type FineStructureFloatEigenstate } from "../physics/field/fineStructureFloat.js";
import { lsReducedElement, singleReducedElement } from "../physics/field/lineAtField.js";
import {
  lineComponentsFloat,
  statesFromFineStructureFloat,
  statesFromHyperfineFloat,
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
  gJ: number;
  linearUpTo: number | null;
  paschenBack: number | null;
  transitions: EngineLevel["transitions"];
  /** "F", "mF" of each sublevel in the solver's order (labels are structural: the same at every field). */
  labels: { F: string; mF: string }[];
}

interface PreparedTerm {
  eigen: FineStructureFloatEigen;
  limit: number | null;
  paschenBack: number | null;
}

interface PreparedLine {
  data: EngineLine;
  /** Line frequency c/λ, Hz (float64: 384 THz to 0.06 Hz), or null without a wavelength. */
  centre: number | null;
  /** Components from hyperfine–Zeeman states (single reduced element). */
  hyperfine: FloatLineComponents;
  /** Components from fine-structure states (LS reduced elements, evaluated only when the model is chosen). */
  fineStructure: FloatLineComponents;
  linear: { upper: string; lower: string; q: number; polarization: AtComponent<number>["polarization"]; strength: number; shiftHzPerT: number }[];
}

interface PreparedSpecies {
  muB_h: number;
  levels: Map<string, PreparedLevelEntry>;
  terms: Map<string, PreparedTerm>;
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
      gJ: level.gJ.toNumber(),
      linearUpTo: num(l.linearUpToT),
      paschenBack: num(l.paschenBackT),
      transitions: l.transitions,
      labels,
    });
  }
  const terms = new Map<string, PreparedTerm>();
  for (const t of data.terms) {
    terms.set(t.key, {
      eigen: fineStructureFloatEigen({
        S2: t.S2,
        L: t.L,
        partners: t.partners.map((p) => ({ J2: p.J2, energy: new Dec(p.energy) })),
        gL: new Dec(t.gL),
        gS: new Dec(t.gS),
        muB_h,
      }),
      limit: num(t.limitT),
      paschenBack: num(t.paschenBackT),
    });
  }
  const lines = data.lines.map((ln): PreparedLine => {
    const u = levels.get(ln.upper)!.data;
    const l = levels.get(ln.lower)!.data;
    return {
      data: ln,
      centre: ln.frequencyHz === undefined || ln.frequencyHz === null ? null : Number(ln.frequencyHz),
      hyperfine: lineComponentsFloat(ln.k, singleReducedElement),
      fineStructure: lineComponentsFloat(ln.k, lsReducedElement(u.L, l.L, u.S2, ln.k)),
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
  return { muB_h: muB_h.toNumber(), levels, terms, lines };
}

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
  const solved = new Map<string, FloatFieldState[]>();
  for (const [id, lv] of sp.levels) solved.set(id, solveHyperfineZeemanFloat(lv.prepared, tesla));

  const levels = [...sp.levels.values()].map((lv) => ({
    id: lv.data.id,
    states: solved.get(lv.data.id)!.map(
      (st): AtState<number> => ({
        F: formatDoubled(st.F2),
        mF: formatDoubled(st.mF2),
        E_Hz: st.energy,
        high_field: { mJ: formatDoubled(st.highField.mJ2), mI: formatDoubled(st.highField.mI2) },
      }),
    ),
  }));

  const transitions: AtTransition<number>[] = [];
  for (const lv of sp.levels.values()) {
    const states = solved.get(lv.data.id)!;
    for (const t of lv.transitions) {
      transitions.push({ level: lv.data.id, lower: lv.labels[t.lo]!, upper: lv.labels[t.up]!, kind: t.kind, Hz: states[t.up]!.energy - states[t.lo]!.energy });
    }
  }

  const termStates = new Map<string, FineStructureFloatEigenstate[]>();
  const side = (lv: PreparedLevelEntry): LineSide => {
    const term = lv.data.fineStructureTerm === null ? null : sp.terms.get(lv.data.fineStructureTerm)!;
    return {
      hf: levelRegimeFloat(tesla, lv.linearUpTo, lv.paschenBack),
      fs: levelRegimeFloat(tesla, term?.limit ?? null, term?.paschenBack ?? null),
      inTerm: term !== null,
    };
  };
  const fsStates = (lv: PreparedLevelEntry): FloatLineState[] => {
    const key = lv.data.fineStructureTerm;
    if (key === null) {
      // a level outside any treated term: |J mJ⟩ at its linear energy
      return mValues(lv.data.J2).map((m2) => ({
        label: `J=${formatDoubled(lv.data.J2)}, mJ=${formatDoubled(m2)}`,
        M2: m2,
        energy: (lv.gJ * sp.muB_h * tesla * m2) / 2,
        amplitudes: [{ J2: lv.data.J2, mJ2: m2, mI2: 0, amplitude: 1 }],
      }));
    }
    const term = sp.terms.get(key)!;
    let states = termStates.get(key);
    if (!states) termStates.set(key, (states = term.eigen.solve(tesla)));
    return statesFromFineStructureFloat(
      states.filter((s) => s.J2 === lv.data.J2),
      term.eigen.offsets.get(lv.data.J2)!,
    );
  };

  const lines = sp.lines.map((ln): AtLine<number> => {
    const u = sp.levels.get(ln.data.upper)!;
    const l = sp.levels.get(ln.data.lower)!;
    const { regime, model } = chooseLineModel(side(u), side(l), {
      sameSpin: u.data.S2 === l.data.S2,
      multipole: ln.data.multipole,
      hyperfineBoth: ln.data.hyperfineBoth,
    });
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
    let upper: FloatLineState[];
    let lower: FloatLineState[];
    let components: FloatLineComponents;
    if (model === "hyperfine–Zeeman eigenstates") {
      upper = statesFromHyperfineFloat(u.data.J2, solved.get(u.data.id)!);
      lower = statesFromHyperfineFloat(l.data.J2, solved.get(l.data.id)!);
      components = ln.hyperfine;
    } else {
      upper = fsStates(u);
      lower = fsStates(l);
      components = ln.fineStructure;
    }
    const list = components(upper, lower)
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
