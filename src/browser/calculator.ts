/**
 * The field calculator in the page: the public global `SublevelAtlas` and
 * the form of templates/_includes/calculator.njk. Bundled by
 * src/build/bundleBrowser.ts into assets/calculator.js (a classic script,
 * works from file://); the numbers come from src/engine/engine.ts, the same
 * code the tests hold to the exact build.
 *
 *   SublevelAtlas.at("rb87", "4.7 G")   every number of rb87 at 4.7 G
 *   SublevelAtlas.at("rb87", 0.00047)   the same, field in tesla
 *   SublevelAtlas.atWithUncertainty("rb87", "4.7 G")   with standard uncertainties (…_u keys)
 *   SublevelAtlas.species()             ids whose engine data is on the page
 *
 * Engine data arrive in classic scripts species/<id>/engine-data.js that run
 * `(window.SublevelAtlasData ||= {})["rb87"] = {…}`.
 *
 * The form: a field box and a unit; the address `#B=4.7G` (or `#B=0.47mT`)
 * fills it and computes on load and whenever it changes. Results are written
 * with textContent only (no HTML from data), in tables laid out like the
 * build's. No inline script or style is used (the pages' CSP forbids both).
 */
import { engineAt, prepareEngine } from "../engine/engine.js";
import { engineAtWithUncertainty, prepareEngineUncertainty } from "../engine/engineUncertainty.js";
import { parseFieldText } from "../engine/fieldText.js";
import { ENGINE_FORMAT, type AtResult, type EngineData } from "../engine/types.js";
import { formatFloat } from "./formatFloat.js";
import { groupDigits, MINUS } from "../site/plainFormat.js";
import { polarizationSymbol } from "../site/format.js";

declare global {
  interface Window {
    SublevelAtlasData?: Record<string, EngineData>;
    SublevelAtlas?: SublevelAtlasApi;
  }
}

export interface SublevelAtlasApi {
  /** Every number of a species at a field: text with a unit ("4.7 G", "0.47 mT") or a number of tesla. */
  at(speciesId: string, field: string | number): AtResult<number>;
  /** The same with the standard uncertainties the form shows (E_Hz_u, Hz_u, shift_Hz_u, frequency_Hz_u; src/engine/engineUncertainty.ts). */
  atWithUncertainty(speciesId: string, field: string | number): AtResult<number>;
  /** Ids of the species whose engine data are loaded on this page. */
  species(): string[];
  /** A field text read into tesla (the parser `npm run at` uses). */
  tesla(field: string): number;
}

function loaded(): Record<string, EngineData> {
  return window.SublevelAtlasData ?? {};
}

function dataFor(speciesId: string): EngineData {
  const all = loaded();
  const data = Object.prototype.hasOwnProperty.call(all, speciesId) ? all[speciesId] : undefined;
  if (!data) {
    const have = Object.keys(all);
    throw new Error(`no field-calculator data for species "${speciesId}" on this page (${have.length ? `loaded: ${have.join(", ")}` : "none loaded"}); include species/${speciesId}/engine-data.js`);
  }
  if (data.format !== ENGINE_FORMAT) throw new Error(`engine data of "${speciesId}" are ${String(data.format)}, this calculator reads ${ENGINE_FORMAT}`);
  return data;
}

function teslaOf(field: string | number): number {
  if (typeof field === "number") {
    if (!Number.isFinite(field) || field < 0) throw new RangeError(`field ${field} T: give a finite number of tesla, 0 or more`);
    return field;
  }
  if (typeof field !== "string") throw new TypeError('field must be text such as "4.7 G" or a number of tesla');
  const p = parseFieldText(field);
  if (!p.ok) throw new RangeError(p.message);
  return p.tesla.toNumber();
}

const api: SublevelAtlasApi = Object.freeze({
  at: (speciesId: string, field: string | number) => engineAt(dataFor(speciesId), teslaOf(field)),
  atWithUncertainty: (speciesId: string, field: string | number) => engineAtWithUncertainty(dataFor(speciesId), teslaOf(field)),
  species: () => Object.keys(loaded()).sort(),
  tesla: (field: string) => teslaOf(field),
});
window.SublevelAtlas = api;

// ---------------------------------------------------------------- the form

const UNIT_ALIASES: Record<string, string> = { uT: "µT", "μT": "µT" };
const MHZ = 1e6;
const THZ = 1e12;
/** Significant digits that show an absolute frequency in THz to 1 kHz, as the build's tables do (absoluteDigits in lockTables.ts). */
const kHzDigits = (hz: number): number => Math.max(1, Math.floor(Math.log10(Math.abs(hz) / THZ)) + 1) + 9;

const show = (x: number, sig: number): string => formatFloat(x, sig);

/** float64 carries about 16 significant digits: a concise value is not written with more. */
const MAX_DIGITS = 16;

/**
 * A value with its standard uncertainty in the concise form the tables use,
 * "4 271.676 631 815 18(56)": the value to the place of the uncertainty's
 * second significant digit (at most MAX_DIGITS significant digits; then the
 * uncertainty in units of the last digit written, at least 1), the
 * uncertainty in those units. Null when u is null (exact: the plain number).
 */
export function conciseFloat(x: number, u: number | null | undefined): { text: string; unc: string } | null {
  if (u === null || u === undefined || !(u > 0) || !Number.isFinite(x)) return null;
  let d = 1 - Math.floor(Math.log10(u));
  if (x !== 0) d = Math.min(d, MAX_DIGITS - 1 - Math.floor(Math.log10(Math.abs(x))));
  d = Math.max(0, Math.min(d, 100));
  if (Math.abs(x) >= 1e21) return null;
  const fixed = Math.abs(x).toFixed(d);
  const [int, frac = ""] = fixed.split(".") as [string, string?];
  const units = Math.max(1, Math.round(u * 10 ** d));
  const sign = x < 0 && /[1-9]/.test(fixed) ? MINUS : "";
  return { text: sign + groupDigits(int, false) + (frac ? "." + groupDigits(frac, true) : ""), unc: `(${units})` };
}
const signed = (q: string) => q.replace(/^-/, "\u2212");

function el<K extends keyof HTMLElementTagNameMap>(tag: K, text?: string, cls?: string): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  if (text !== undefined) e.textContent = text;
  if (cls) e.className = cls;
  return e;
}

interface Column {
  label: string;
  unit?: string;
  /** As the build's column kinds (classes k-text, k-quantum, k-number of atlas.css). */
  kind: "text" | "quantum" | "number";
}

/** A table like the build's (class atlas-table): caption, header, rows of text or number cells. */
/** A number cell: its text (value shown with `sig` digits when exact), the value in the column's base unit, and its standard uncertainty. */
interface NumberCell {
  text: string;
  value: number;
  /** The concise form (value and "(12)"), when the number has an uncertainty. */
  unc?: { text: string; unc: string } | null;
  /** The uncertainty is only a float64 resolution bound (engineUncertainty.ts). */
  bound?: boolean;
  /** Standard uncertainty in the column's base unit. */
  u?: number | null;
}

/** A number cell in the display unit (`scale` Hz per unit): concise form when u is given. */
function numberCell(value: number, u: number | null | undefined, scale: number, sig: number, bound?: boolean): NumberCell {
  const unc = conciseFloat(value / scale, u === null || u === undefined ? null : u / scale);
  return { text: show(value / scale, sig), value, unc, bound: bound === true, u: u ?? null };
}

function table(caption: string, columns: Column[], rows: (string | NumberCell)[][], cls: string): HTMLTableElement {
  const t = el("table", undefined, `atlas-table calc-table ${cls}`);
  t.appendChild(el("caption", caption));
  const head = t.createTHead().insertRow();
  for (const c of columns) {
    const th = el("th");
    th.scope = "col";
    th.textContent = c.label;
    if (c.unit) th.appendChild(el("span", ` (${c.unit})`, "unit"));
    th.className = `k-${c.kind}`;
    head.appendChild(th);
  }
  const body = t.createTBody();
  for (const r of rows) {
    const tr = body.insertRow();
    r.forEach((cell, i) => {
      const td = tr.insertCell();
      td.className = `k-${columns[i]!.kind}`;
      if (typeof cell === "string") td.textContent = cell;
      else {
        if (cell.unc) {
          td.textContent = cell.unc.text;
          // "(12)": hidden with the page's other uncertainties by the "Show uncertainties" switch (class hide-unc on the root)
          const unc = el("span", cell.unc.unc, "unc");
          if (cell.bound) unc.title = "at most: below the resolution of double precision";
          td.appendChild(unc);
          if (cell.u !== undefined && cell.u !== null) td.dataset.u = String(cell.u);
        } else td.textContent = cell.text;
        // full float64 value in the column's base unit (Hz, or a plain number)
        td.dataset.value = String(cell.value);
      }
    });
  }
  return t;
}

interface Widget {
  root: HTMLElement;
  species: string;
  level: string | null;
  line: string | null;
  input: HTMLInputElement;
  unit: HTMLSelectElement;
  status: HTMLElement;
  results: HTMLElement;
}

function render(w: Widget, data: EngineData, answer: AtResult<number>, fieldText: string): number {
  const frag = document.createDocumentFragment();
  const terms = new Map(data.levels.map((l) => [l.id, l]));
  const at = fieldText;
  let tables = 0;
  const levels = answer.levels.filter((l) => w.level === null || l.id === w.level);
  const showLevels = w.line === null;
  if (showLevels && levels.length > 0) {
    const sec = el("section", undefined, "calc-part");
    sec.appendChild(el("h3", `Sublevel energies at ${at}`));
    for (const l of levels) {
      const lv = terms.get(l.id)!;
      const hf = lv.I2 > 0;
      sec.appendChild(
        table(
          `${l.id} ${lv.term}: sublevel energies at ${at}, from the level centre`,
          [
            { label: hf ? "F" : "J", kind: "quantum" },
            { label: hf ? "mF" : "mJ", kind: "quantum" },
            ...(hf ? [{ label: "high-field mJ", kind: "quantum" as const }, { label: "high-field mI", kind: "quantum" as const }] : []),
            { label: `E at ${at}`, unit: "MHz", kind: "number" },
          ],
          l.states.map((s) => [
            s.F,
            signed(s.mF),
            ...(hf ? [signed(s.high_field.mJ), signed(s.high_field.mI)] : []),
            numberCell(s.E_Hz, s.E_Hz_u, MHZ, 12, s.E_Hz_u_float),
          ]),
          "calc-energies",
        ),
      );
      tables++;
    }
    frag.appendChild(sec);
  }
  const transitions = answer.transitions.filter((t) => w.level === null || t.level === w.level);
  if (showLevels && transitions.length > 0) {
    const sec = el("section", undefined, "calc-part");
    sec.appendChild(el("h3", `Sublevel transitions at ${at}`));
    for (const l of levels) {
      const mine = transitions.filter((t) => t.level === l.id);
      if (mine.length === 0) continue;
      sec.appendChild(
        table(
          `${l.id} ${terms.get(l.id)!.term}: transitions between sublevels at ${at} (microwave and radio frequency)`,
          [
            { label: "lower (F, mF)", kind: "text" },
            { label: "upper (F, mF)", kind: "text" },
            { label: "kind", kind: "text" },
            { label: `f at ${at}`, unit: "MHz", kind: "number" },
          ],
          mine.map((t) => [
            `${t.lower.F}, ${signed(t.lower.mF)}`,
            `${t.upper.F}, ${signed(t.upper.mF)}`,
            t.kind === "two-photon" ? "2-photon" : "M1",
            numberCell(t.Hz, t.Hz_u, MHZ, 12, t.Hz_u_float),
          ]),
          "calc-transitions",
        ),
      );
      tables++;
    }
    frag.appendChild(sec);
  }
  const lines = answer.lines.filter((l) => (w.line === null ? w.level === null : l.id === w.line));
  if (lines.length > 0) {
    const sec = el("section", undefined, "calc-part");
    sec.appendChild(el("h3", `Line components at ${at}`));
    for (const ln of lines) {
      const absolute = ln.components.some((c) => c.frequency_Hz !== null);
      sec.appendChild(el("p", `${ln.id} at ${at}: ${ln.regime}; from ${ln.model}.`, "calc-model"));
      sec.appendChild(
        table(
          `${ln.id} at ${at}: components (${ln.model})`,
          [
            { label: "upper state", kind: "text" },
            { label: "lower state", kind: "text" },
            { label: "polarization", kind: "text" },
            { label: "relative strength", kind: "number" },
            { label: "shift from line centre", unit: "MHz", kind: "number" },
            ...(absolute ? [{ label: "frequency", unit: "THz", kind: "number" as const }] : []),
          ],
          ln.components.map((c) => [
            signed(c.upper.replace(/=-/g, "=\u2212")),
            signed(c.lower.replace(/=-/g, "=\u2212")),
            polarizationSymbol(c.polarization, c.delta_m),
            { text: show(c.relative_strength, 6), value: c.relative_strength },
            numberCell(c.shift_Hz, c.shift_Hz_u, MHZ, 10, c.shift_Hz_u_float),
            ...(absolute && c.frequency_Hz !== null ? [numberCell(c.frequency_Hz, c.frequency_Hz_u, THZ, kHzDigits(c.frequency_Hz), c.frequency_Hz_u_float)] : []),
          ]),
          "calc-components",
        ),
      );
      tables++;
    }
    frag.appendChild(sec);
  }
  w.results.replaceChildren(frag);
  return tables;
}

function compute(w: Widget, fieldText: string): void {
  const started = performance.now();
  try {
    const data = dataFor(w.species);
    const p = parseFieldText(fieldText);
    if (!p.ok) throw new RangeError(p.message);
    const tesla = p.tesla.toNumber();
    const answer = engineAtWithUncertainty(data, tesla);
    const n = render(w, data, answer, p.text);
    w.input.removeAttribute("aria-invalid");
    w.root.dataset.tesla = String(tesla);
    const ms = performance.now() - started;
    w.status.textContent = `Computed at ${p.text} (${p.tesla.toString()} T): ${n} table${n === 1 ? "" : "s"} in ${ms < 1 ? "under 1" : Math.round(ms)} ms, in double precision; the exact tables at the bias fields are the reference.`;
  } catch (e) {
    w.results.replaceChildren();
    delete w.root.dataset.tesla;
    w.input.setAttribute("aria-invalid", "true");
    w.status.textContent = `Cannot compute: ${e instanceof Error ? e.message : String(e)}`;
  }
}

/** "#B=4.7G" → { value: "4.7", unit: "G" } for the form, or null when the address holds no field. */
export function fieldFromHash(hash: string): { value: string; unit: string } | null {
  const m = /^#B=(.*)$/.exec(hash);
  if (!m) return null;
  let text: string;
  try {
    text = decodeURIComponent(m[1]!).trim();
  } catch {
    return null;
  }
  const parts = /^([+-]?[\d.]+(?:[eE][+-]?\d+)?)\s*([A-Za-zµμ]*)$/.exec(text);
  if (!parts) return { value: text, unit: "" };
  return { value: parts[1]!, unit: UNIT_ALIASES[parts[2]!] ?? parts[2]! };
}

function setUp(root: HTMLElement): void {
  const form = root.querySelector("form");
  const input = root.querySelector<HTMLInputElement>("input[name=field]");
  const unit = root.querySelector<HTMLSelectElement>("select[name=unit]");
  const status = root.querySelector<HTMLElement>(".calc-status");
  const results = root.querySelector<HTMLElement>(".calc-results");
  if (!form || !input || !unit || !status || !results || !root.dataset.species) return;
  const w: Widget = {
    root,
    species: root.dataset.species,
    level: root.dataset.level || null,
    line: root.dataset.line || null,
    input,
    unit,
    status,
    results,
  };
  const units = Array.from(unit.options).map((o) => o.value);
  const fromForm = () => `${input.value.trim()} ${unit.value}`;
  form.addEventListener("submit", (ev) => {
    ev.preventDefault();
    compute(w, fromForm());
    // keep the field in the address (shareable) unless the address points at a table row
    if (input.value.trim() !== "" && (location.hash === "" || location.hash.startsWith("#B="))) {
      history.replaceState(null, "", `#B=${encodeURIComponent(input.value.trim() + unit.value)}`);
    }
  });
  const fromHash = () => {
    const f = fieldFromHash(location.hash);
    if (!f) return;
    if (units.includes(f.unit)) {
      input.value = f.value;
      unit.value = f.unit;
      compute(w, `${f.value} ${f.unit}`);
    } else {
      // a unit the list does not offer (kG, or none: tesla): show the field in tesla
      const p = parseFieldText(`${f.value}${f.unit ? ` ${f.unit}` : ""}`);
      input.value = p.ok ? p.tesla.toString() : f.value + f.unit;
      unit.value = "T";
      compute(w, p.ok ? `${input.value} T` : `${f.value} ${f.unit}`);
    }
  };
  window.addEventListener("hashchange", fromHash);
  root.hidden = false;
  if (fieldFromHash(location.hash)) fromHash();
  else {
    // prepare the species while the page is idle, so the first answer is quick
    const idle = (window as { requestIdleCallback?: (f: () => void) => void }).requestIdleCallback ?? ((f: () => void) => setTimeout(f, 50));
    idle(() => {
      try {
        prepareEngine(dataFor(w.species));
        prepareEngineUncertainty(dataFor(w.species));
      } catch {
        // reported when the reader computes
      }
    });
  }
}

let started = false;
function start(): void {
  if (started) return;
  started = true;
  for (const root of Array.from(document.querySelectorAll<HTMLElement>("[data-calculator]"))) setUp(root);
}

// Engine data come in deferred scripts after this one: wait until all have run.
if (document.readyState === "complete") start();
else {
  document.addEventListener("DOMContentLoaded", start);
  window.addEventListener("load", start);
}
