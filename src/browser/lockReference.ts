/**
 * The reference choice of the lock-point tables (line pages): a select box
 * above each table names the resonance the reader counts from (an
 * offset-lock or AOM plan starts from one of them), and the table's
 * "offset from reference" column is recomputed from each row's absolute
 * frequency, carried exactly in the cell's data-hz. The arithmetic is
 * src/site/lockOffsets.ts, the code the build wrote the column with, so
 * the strongest transition chosen again gives the server's digits. Without
 * JavaScript the select box stays hidden and the offsets count from the
 * strongest transition. Bundled into the classic script
 * assets/lockReference.js by src/build/bundleBrowser.ts.
 */
import { offsetFrom } from "../site/lockOffsets.js";
import { alignParts, type NumberParts } from "../site/plainFormat.js";
import { fillNumberCell as fill } from "./fillNumberCell.js";


/** Offsets of every row of `table` from the row whose id is `refId`; false when that row or its frequency is missing. */
export function applyReference(table: HTMLTableElement, refId: string): boolean {
  const cells = Array.from(table.querySelectorAll<HTMLTableCellElement>("tbody td[data-hz]"));
  const ref = cells.find((td) => td.parentElement?.id === refId)?.getAttribute("data-hz");
  if (!ref) return false;
  const done: { td: HTMLTableCellElement; sort: string }[] = [];
  const parts: NumberParts[] = [];
  for (const td of cells) {
    const o = offsetFrom(td.getAttribute("data-hz") ?? "", ref);
    if (!o) continue;
    done.push({ td, sort: o.sort });
    parts.push(o.parts);
  }
  const aligned = alignParts(parts);
  done.forEach(({ td, sort }, i) => {
    fill(td, aligned[i]!);
    td.setAttribute("data-sort", sort);
  });
  return true;
}

function setUp(box: HTMLElement): void {
  const table = document.getElementById(box.getAttribute("data-lock-table") ?? "") as HTMLTableElement | null;
  const select = box.querySelector("select");
  const choice = box.querySelector<HTMLElement>(".lock-choice");
  const fallback = box.querySelector<HTMLElement>(".lock-default");
  if (!table || !select || !choice) return;
  const update = () => {
    if (applyReference(table, select.value)) table.setAttribute("data-reference", select.value);
  };
  select.addEventListener("change", update);
  choice.hidden = false;
  if (fallback) fallback.textContent = "The last column gives each resonance's offset from the one chosen here.";
  // a reference kept by the browser across a reload (form state) is applied at once
  if (!select.options[select.selectedIndex]?.defaultSelected) update();
}

function init(): void {
  document.querySelectorAll<HTMLElement>("[data-lock-table]").forEach(setUp);
}

if (typeof document !== "undefined") {
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
}
