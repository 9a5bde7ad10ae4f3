/**
 * The reader's unit for shift columns (Hz, kHz, MHz, GHz or cm⁻¹, per tesla
 * or per gauss), remembered across pages. Applies to columns whose <th> has
 * data-switchable; each cell carries its exact value in Hz/T
 * (data-hz-per-t), converted exactly by src/site/shiftUnits.ts and lined up
 * on the decimal point as the server does (alignParts, plainFormat.ts).
 * Without JavaScript the server's MHz/G stays. Bundled into the classic
 * script assets/units.js by src/build/bundleBrowser.ts.
 *
 * Also defines the global AtlasUnits { convert, UNITS, DEFAULT } for tests
 * and readers' scripts; in a context without a document it does nothing else.
 */
import { alignParts, type NumberParts } from "../site/plainFormat.js";
import { fillNumberCell as fill } from "./fillNumberCell.js";
import { convertShift, convertShiftUncertain, DEFAULT_SHIFT_UNIT, SHIFT_UNITS } from "../site/shiftUnits.js";
import { readShiftUnit, saveShiftUnit } from "./shiftUnitChoice.js";

(globalThis as Record<string, unknown>).AtlasUnits = { convert: convertShift, UNITS: SHIFT_UNITS, DEFAULT: DEFAULT_SHIFT_UNIT };


function apply(unit: string): void {
  for (const table of Array.from(document.querySelectorAll<HTMLTableElement>("table.atlas-table"))) {
    const head = table.tHead?.rows[0];
    if (!head) continue;
    Array.from(head.cells).forEach((th, col) => {
      if (!th.hasAttribute("data-switchable")) return;
      const u = th.querySelector(".unit");
      if (u) u.textContent = `(${unit})`;
      const tds: HTMLTableCellElement[] = [];
      const list: NumberParts[] = [];
      for (const tb of Array.from(table.tBodies)) {
        for (const tr of Array.from(tb.rows)) {
          const td = tr.cells[col];
          const v = td?.getAttribute("data-hz-per-t");
          // a cell with an uncertainty carries it in Hz/T too; both are converted exactly and shown in the concise form
          const u = td?.getAttribute("data-u-hz-per-t");
          const parts = v ? (u ? convertShiftUncertain(v, u, unit) : convertShift(v, unit)) : null;
          if (td && parts) {
            tds.push(td);
            list.push(parts);
          }
        }
      }
      const aligned = alignParts(list);
      tds.forEach((td, i) => fill(td, aligned[i]!));
    });
  }
}

function init(): void {
  if (!document.querySelector("th[data-switchable]")) return;
  const box = document.createElement("div");
  box.className = "unit-switch";
  const label = document.createElement("label");
  label.setAttribute("for", "unit-choice");
  label.textContent = "Shift unit";
  const select = document.createElement("select");
  select.id = "unit-choice";
  for (const u of SHIFT_UNITS) {
    const o = document.createElement("option");
    o.value = u;
    o.textContent = u;
    select.appendChild(o);
  }
  const unit = readShiftUnit();
  select.value = unit;
  box.appendChild(label);
  box.appendChild(select);
  const finder = document.getElementById("finder");
  const host = finder?.parentNode ?? document.body;
  host.insertBefore(box, finder ? finder.nextSibling : host.firstChild);
  if (unit !== DEFAULT_SHIFT_UNIT) apply(unit);
  select.addEventListener("change", () => {
    saveShiftUnit(select.value);
    apply(select.value);
  });
}

if (typeof document !== "undefined") {
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
}
