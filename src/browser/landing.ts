/**
 * Landing on a row keeps its context. When the address names a row of a
 * table (from the finder, a saved link, or a link within the site), the
 * row is marked, the page shows its table from the top, and the table box
 * scrolls the row to just below its sticky column headings; when the
 * finder said which column holds the answer (sessionStorage, set just
 * before it navigates), the box also scrolls sideways to bring that cell
 * into view beside the pinned first column, and marks it. Runs on load,
 * after the other page scripts, and on every change of the address's #.
 */

const KEY = "sublevel-atlas:landing";
/** Room left above a landed table and between the headings and the row, px. */
const GAP = 6;

/** Say which column answers the question, for the landing on `href` (absolute or relative to this page). */
export function rememberLanding(href: string, column: string | undefined): void {
  try {
    if (column) sessionStorage.setItem(KEY, JSON.stringify({ url: new URL(href, location.href).href, column }));
    else sessionStorage.removeItem(KEY);
  } catch {
    /* storage refused (some file:// settings): the row still lands, without the column */
  }
}

/** The remembered column if it was meant for this very address. */
function rememberedColumn(): string | undefined {
  try {
    const raw = sessionStorage.getItem(KEY);
    if (!raw) return undefined;
    const { url, column } = JSON.parse(raw) as { url: string; column: string };
    const here = new URL(location.href);
    const there = new URL(url);
    const same = (u: URL) => u.pathname.replace(/index\.html$/, "") + decodeURIComponent(u.hash);
    return same(here) === same(there) ? column : undefined;
  } catch {
    return undefined;
  }
}

function targetRow(): HTMLTableRowElement | null {
  const raw = location.hash.slice(1);
  if (!raw) return null;
  let el = document.getElementById(raw);
  if (!el) {
    try {
      el = document.getElementById(decodeURIComponent(raw));
    } catch {
      return null;
    }
  }
  return el instanceof HTMLTableRowElement && el.closest("table.atlas-table") ? el : null;
}

/** Land on the row the address names (if it is a table row). */
export function land(column: string | undefined = rememberedColumn()): void {
  const row = targetRow();
  if (!row) return;
  // A row inside a folded block is shown, and so is a row a table filter had hidden (tables.ts).
  for (let d = row.closest("details"); d; d = d.parentElement?.closest("details") ?? null) d.open = true;
  if (row.hidden) (row.closest("table") as (HTMLTableElement & { atlasClearFilter?: () => void }) | null)?.atlasClearFilter?.();
  for (const old of Array.from(document.querySelectorAll(".landed, .landed-cell"))) old.classList.remove("landed", "landed-cell");
  row.classList.add("landed");
  const table = row.closest("table")!;
  const head = table.tHead;
  const wrap = row.closest<HTMLElement>(".table-wrap");
  if (!wrap || !head) {
    row.scrollIntoView({ block: "center" });
    return;
  }
  // The table box from its top (it is never taller than the window), then the row just below the headings.
  window.scrollBy(0, wrap.getBoundingClientRect().top - GAP);
  if (wrap.scrollHeight > wrap.clientHeight + 1) {
    // The heading row as drawn: its cells are sticky, the thead box is not.
    const headHeight = Math.max(...Array.from(head.rows[0]?.cells ?? []).map((th) => th.getBoundingClientRect().height), 0);
    wrap.scrollTop += row.getBoundingClientRect().top - (wrap.getBoundingClientRect().top + headHeight + GAP);
  }
  if (!column) return;
  const col = Array.from(head.rows[0]?.cells ?? []).findIndex((th) => th.getAttribute("data-key") === column);
  const cell = col >= 0 ? row.cells[col] : undefined;
  if (!cell) return;
  cell.classList.add("landed-cell");
  const first = row.cells[0];
  const pinned = first && getComputedStyle(first).position === "sticky" && first !== cell ? first.getBoundingClientRect().width : 0;
  // The visible part of the box right of the pinned column (the window may cut the box on a phone).
  const w = wrap.getBoundingClientRect();
  const from = w.left + pinned;
  const to = Math.min(w.right, document.documentElement.clientWidth);
  const c = cell.getBoundingClientRect();
  // A cell that fits is shown whole; a wider one from its start, where the answer begins.
  if (c.width > to - from - GAP || c.left < from) wrap.scrollLeft += c.left - from - GAP;
  else if (c.right > to) wrap.scrollLeft += c.right - to + GAP;
}

/** Land now, again once everything is laid out (fonts, the browser's own jump), and on every change of the #. */
export function initLanding(): void {
  land();
  window.addEventListener("load", () => land());
  // After the other scripts' own handlers of the same change (a filter cleared, a row scrolled to).
  window.addEventListener("hashchange", () => requestAnimationFrame(() => land()));
}
