/**
 * Standard uncertainties of the field calculator's answer (engine.ts) at any
 * field B, by re-solving: for each uncertain input x_i (the keys of
 * results/inputUncertainties.ts: a measured gJ, gI or the nuclear moment, A,
 * B, level energies, the line's wavelength, the mass through gL, the CODATA
 * constants μB/h and g_e), every engine input that depends on it is moved by
 * ±t_i times its contribution (∂input/∂x_i)·u(x_i) (the engine data's `u`
 * parts), the whole species is solved at B for each sign, and
 *
 *     c_i = [f(x_i + t_i·u_i) − f(x_i − t_i·u_i)] / (2 t_i)      (same unit as f, signed)
 *     u(f) = √(Σ_i c_i²)
 *
 * for every answer f (sublevel energy, sublevel transition frequency, line
 * component shift and absolute frequency). This is the first-order
 * propagation of GUM (JCGM 100:2008) §5.1.2 with the sensitivity
 * coefficients evaluated numerically, as §5.1.3 allows (its Note 2, from
 * memory: the change of y for x_i moved by ±u(x_i)): a central difference
 * with step h_i = t_i·u_i gives ∂f/∂x_i to within O(h_i²) of the curvature
 * of f, i.e. first-order propagation to within O(u²). Correlations are kept: one perturbed
 * solve serves every answer, so a transition's c_i is the difference of its
 * two energies from the same solve, and a component's the difference of its
 * two levels' states. A component's absolute frequency ν0 + shift takes
 * the centre's part straight from the data (ν0 is linear in its one input).
 *
 * The step. float64 resolves an energy of E hertz to about 1e-15·E (the
 * engine agrees with the 60-digit build to that), so a step of only u_i
 * would drown a small contribution (87Rb A(5²S1/2) has u = 45 µHz beside
 * energies of GHz). The step is therefore enlarged: t_i = max(1, min over the
 * moved inputs v of STEP·|v| / |contribution to v|), i.e. the inputs move
 * by at least u_i, and the most-moved by STEP = 1e-4 of its value when u_i
 * is smaller (level energies, absolute, by 1e-6), inside the linear range (the
 * central difference's curvature error is ~STEP² relative) and far above
 * float noise. The answer's float noise bound is RESOLVED·√Σ(NOISE·S/t_i)²
 * (S the largest magnitude among the states involved, NOISE = 2e-15); when
 * u does not exceed it the answer's `…_u_float` flag is true and its u is
 * that bound, an upper limit rather than a value. (A step of u_i alone would
 * drown small contributions: see the 45 µHz above.)
 *
 * Exact: no (float64, first order). Inputs without an uncertainty (exact
 * fractions, LS factors with gS = 2 exactly, a defined constant) add nothing;
 * an answer with no uncertain input gets u = null. Relative strengths carry
 * no uncertainty here (as the export's relative_strength_u, not propagated).
 *
 * Worked example: 87Rb 5²S1/2 at 0 T, F = 1 lies at −5A/4, so its energy's
 * u is (5/4)·u(A) = (5/4)·45 µHz = 56 µHz (A = 3417.341305452145(45) MHz), and
 * the clock transition 2A has u = 2·45 µHz = 90 µHz; the tests repeat it and
 * compare with the export's _u keys (Hellmann–Feynman, an independent route).
 */
import { Dec } from "../physics/decimal.js";
import { engineAt, prepareEngine } from "./engine.js";
import type { AtResult, EngineData, Parts } from "./types.js";

/** Relative step of the moved inputs when their u is smaller (see the module comment); level energies (absolute, up to 1e15 Hz, beside fine-structure intervals a thousand times smaller) move by ENERGY_STEP. */
const STEP = 1e-4;
const ENERGY_STEP = 1e-6;
/** float64 noise of an answer relative to the largest magnitude in its solve (the engine agrees with 60 digits to ~1e-15; 2× margin). */
const NOISE = 2e-15;
/** A contribution counts as resolved when it exceeds its noise bound this many times. */
const RESOLVED = 10;

/** One uncertain input: its key and the step factor t. */
interface Input {
  key: string;
  t: number;
  plus: EngineData;
  minus: EngineData;
}

const cache = new WeakMap<EngineData, Input[]>();

/** Every input key with a contribution anywhere in the data, with the (value, contribution) pairs it moves. */
function inputKeys(data: EngineData): Map<string, [string, string, number][]> {
  const keys = new Map<string, [string, string, number][]>();
  const add = (value: string | null | undefined, p: Parts | undefined, step = STEP) => {
    if (!p || value === null || value === undefined) return;
    for (const [k, c] of Object.entries(p)) {
      let list = keys.get(k);
      if (!list) keys.set(k, (list = []));
      list.push([value, c, step]);
    }
  };
  add(data.muB_h, data.muB_h_u);
  for (const l of data.levels) {
    add(l.gJ, l.u?.gJ);
    add(l.gI, l.u?.gI);
    add(l.A, l.u?.A);
    add(l.B, l.u?.B);
  }
  const byId = new Map(data.levels.map((l) => [l.id, l]));
  for (const t of data.terms) {
    add(t.gL, t.u?.gL);
    add(t.gS, t.u?.gS);
    for (const p of t.partners) add(p.energy, byId.get(p.level)?.u?.energy, ENERGY_STEP);
  }
  for (const ln of data.lines) add(ln.frequencyHz, ln.u?.frequencyHz);
  return keys;
}

/** A copy of the data with input `key` moved by `factor` times its contribution in every engine input. */
function moved(data: EngineData, key: string, factor: Dec): EngineData {
  const by = (p: Parts | undefined): Dec => (p && p[key] !== undefined ? new Dec(p[key]!).mul(factor) : new Dec(0));
  const move = (value: string, p: Parts | undefined): string => {
    const d = by(p);
    return d.isZero() ? value : new Dec(value).add(d).toString();
  };
  const muB = new Dec(data.muB_h);
  const dMuB = by(data.muB_h_u);
  const levels = new Map(data.levels.map((l) => [l.id, l]));
  const dGJ = (id: string): Dec => by(levels.get(id)?.u?.gJ);
  return {
    ...data,
    muB_h: move(data.muB_h, data.muB_h_u),
    levels: data.levels.map((l) => ({ ...l, gJ: move(l.gJ, l.u?.gJ), gI: move(l.gI, l.u?.gI), A: move(l.A, l.u?.A), B: move(l.B, l.u?.B) })),
    terms: data.terms.map((t) => ({
      ...t,
      gL: move(t.gL, t.u?.gL),
      gS: move(t.gS, t.u?.gS),
      partners: t.partners.map((p) => ({ ...p, energy: move(p.energy, levels.get(p.level)?.u?.energy) })),
    })),
    lines: data.lines.map((ln) => {
      const du = dGJ(ln.upper);
      const dl = dGJ(ln.lower);
      return {
        ...ln,
        frequencyHz: ln.frequencyHz === undefined || ln.frequencyHz === null ? ln.frequencyHz : move(ln.frequencyHz, ln.u?.frequencyHz),
        // shift/B = (μB/h)(g_u m_u − g_l m_l): moved with μB/h and both levels' gJ
        linear: ln.linear.map((x) => {
          const s = new Dec(x.shiftHzPerT);
          const d = s.mul(dMuB).div(muB).add(muB.add(dMuB).mul(du.mul(x.mu2).sub(dl.mul(x.ml2))).div(2));
          return d.isZero() ? x : { ...x, shiftHzPerT: s.add(d).toString() };
        }),
      };
    }),
  };
}

function inputs(data: EngineData): Input[] {
  let list = cache.get(data);
  if (list) return list;
  list = [];
  for (const [key, pairs] of inputKeys(data)) {
    let t = Infinity;
    for (const [v, c, step] of pairs) {
      const cv = Math.abs(Number(c));
      const vv = Math.abs(Number(v));
      if (cv > 0 && vv > 0) t = Math.min(t, (step * vv) / cv);
    }
    t = Number.isFinite(t) ? Math.max(1, t) : 1;
    const td = new Dec(t.toPrecision(3));
    list.push({ key, t: td.toNumber(), plus: moved(data, key, td), minus: moved(data, key, td.neg()) });
  }
  cache.set(data, list);
  return list;
}

/** Prepare the moved copies of a species ahead of its first answer with uncertainties (e.g. when the page is idle). */
export function prepareEngineUncertainty(data: EngineData): void {
  for (const x of inputs(data)) {
    prepareEngine(x.plus);
    prepareEngine(x.minus);
  }
}

/** Accumulates Σc² and the float noise bound of one answer. */
class Sum {
  sq = 0;
  noise = 0;
  unresolved = false;
  any = false;
  add(c: number, noise: number): void {
    this.any = true;
    // exactly 0: the input does not reach this answer (its solve was not moved)
    if (c === 0) return;
    this.sq += c * c;
    this.noise += noise * noise;
    if (Math.abs(c) < RESOLVED * noise) this.unresolved = true;
  }
  /** u, or null without an uncertain input; an unresolved u is the larger of it and the noise bound. */
  result(): { u: number | null; float: boolean } {
    // no input moved it at all (e.g. a ΔF = 0 transition at exactly 0 T): exact, as the export's null
    if (!this.any || (this.sq === 0 && this.noise === 0)) return { u: null, float: false };
    const u = Math.sqrt(this.sq);
    const bound = RESOLVED * Math.sqrt(this.noise);
    return u > bound ? { u, float: false } : { u: Math.max(u, bound), float: true };
  }
}

const componentKey = (c: { upper: string; lower: string; delta_m: number }) => `${c.upper}|${c.lower}|${c.delta_m}`;

/**
 * The calculator's answer at `tesla` (engineAt) with the standard
 * uncertainty of every energy, transition, component shift and absolute
 * frequency: `E_Hz_u`, `Hz_u`, `shift_Hz_u`, `frequency_Hz_u` (null when no
 * input is uncertain), and `…_u_float` true when that u is only a float64
 * resolution bound. See the module comment for the method.
 */
export function engineAtWithUncertainty(data: EngineData, tesla: number): AtResult<number> {
  const base = engineAt(data, tesla);
  const list = inputs(data);
  // largest magnitude per level (the noise scale of its energies and transitions)
  const scale = new Map(base.levels.map((l) => [l.id, Math.max(0, ...l.states.map((s) => Math.abs(s.E_Hz)))]));
  const eSums = base.levels.map((l) => l.states.map(() => new Sum()));
  const tSums = base.transitions.map(() => new Sum());
  const sSums = base.lines.map((ln) => ln.components.map(() => new Sum()));
  const fSums = base.lines.map((ln) => ln.components.map(() => new Sum()));
  const lineScale = base.lines.map((ln, i) => {
    const d = data.lines[i]!;
    return Math.max(scale.get(d.upper) ?? 0, scale.get(d.lower) ?? 0, ...ln.components.map((c) => Math.abs(c.shift_Hz)));
  });
  for (const x of list) {
    const p = engineAt(x.plus, tesla);
    const m = engineAt(x.minus, tesla);
    const c = (a: number, b: number) => (a - b) / (2 * x.t);
    const noise = (s: number) => (NOISE * s) / x.t;
    base.levels.forEach((l, i) =>
      l.states.forEach((_, j) => eSums[i]![j]!.add(c(p.levels[i]!.states[j]!.E_Hz, m.levels[i]!.states[j]!.E_Hz), noise(scale.get(l.id)!))),
    );
    base.transitions.forEach((t, k) => tSums[k]!.add(c(p.transitions[k]!.Hz, m.transitions[k]!.Hz), noise(scale.get(t.level)!)));
    base.lines.forEach((ln, i) => {
      const pk = new Map(p.lines[i]!.components.map((q) => [componentKey(q), q]));
      const mk = new Map(m.lines[i]!.components.map((q) => [componentKey(q), q]));
      ln.components.forEach((comp, j) => {
        const key = componentKey(comp);
        const cp = pk.get(key) ?? p.lines[i]!.components[j]!;
        const cm = mk.get(key) ?? m.lines[i]!.components[j]!;
        sSums[i]![j]!.add(c(cp.shift_Hz, cm.shift_Hz), noise(lineScale[i]!));
        // ν0 + shift: the line centre's part is linear in its one input (taken from the data, not from a difference of 1e14-Hz floats)
        const centre = data.lines[i]!.u?.frequencyHz?.[x.key];
        if (comp.frequency_Hz !== null) fSums[i]![j]!.add(c(cp.shift_Hz, cm.shift_Hz) + (centre === undefined ? 0 : Number(centre)), noise(lineScale[i]!));
      });
    });
  }
  return {
    B_T: base.B_T,
    levels: base.levels.map((l, i) => ({
      id: l.id,
      states: l.states.map((s, j) => {
        const r = eSums[i]![j]!.result();
        return { ...s, E_Hz_u: r.u, E_Hz_u_float: r.float };
      }),
    })),
    transitions: base.transitions.map((t, k) => {
      const r = tSums[k]!.result();
      return { ...t, Hz_u: r.u, Hz_u_float: r.float };
    }),
    lines: base.lines.map((ln, i) => ({
      ...ln,
      components: ln.components.map((comp, j) => {
        const s = sSums[i]![j]!.result();
        const f = fSums[i]![j]!.result();
        return {
          ...comp,
          shift_Hz_u: s.u,
          shift_Hz_u_float: s.float,
          frequency_Hz_u: comp.frequency_Hz === null ? null : f.u,
          frequency_Hz_u_float: comp.frequency_Hz === null ? false : f.float,
        };
      }),
    })),
  };
}
