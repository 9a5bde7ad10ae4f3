/**
 * Tables: one filter box per page section (for all its tables), sorting by any column
 * (header buttons with aria-sort, exact decimal order from data-sort), and
 * row links that copy the row's full URL. Progressive enhancement: without
 * JavaScript the tables are complete and every row link still jumps to its
 * row. Bundled into the classic script assets/tables.js by
 * src/build/bundleBrowser.ts.
 *
 * Also defines the global AtlasTables { decimalKey, compareDecimal } for tests.
 */
import { plainText, shownKey } from "../site/cellText.js";
import { compareDecimal, decimalKey, type DecimalKey } from "../site/decimalText.js";
import { initUncertaintySwitch } from "./uncertaintySwitch.js";

(globalThis as Record<string, unknown>).AtlasTables = { decimalKey, compareDecimal };

interface FilterableTable extends HTMLTableElement {
  atlasClearFilter?: () => void;
}

/** A cell's sort key: data-sort, else its text as cellText.ts reads it (the page writes data-sort only where that would differ). */
function sortText(td: HTMLTableCellElement): string {
  const s = td.getAttribute("data-sort");
  return s === null ? shownKey(td.textContent ?? "") : s;
}

let counter = 0;

/** Tables with fewer rows than this get no filter box of their own section (one glance reads them). */
export const FILTER_MIN_ROWS = 10;

/** The part of the page a filter box serves: the table's top-level section (or the page's main). */
function sectionOf(table: HTMLTableElement): HTMLElement {
  let el: HTMLElement | null = table;
  let top: HTMLElement | null = null;
  while (el && el.tagName !== "MAIN") {
    if (el.tagName === "SECTION") top = el;
    el = el.parentElement;
  }
  return top ?? el ?? document.body;
}

/**
 * One filter box per section, filtering every table of the section (the
 * rows whose text holds every typed word stay); none where every table of
 * the section has fewer than FILTER_MIN_ROWS rows.
 */
function addFilters(tables: FilterableTable[]): void {
  const groups = new Map<HTMLElement, FilterableTable[]>();
  for (const t of tables) {
    const sec = sectionOf(t);
    groups.set(sec, [...(groups.get(sec) ?? []), t]);
  }
  for (const [sec, group] of groups) {
    const rows = group.flatMap((t) => Array.from(t.tBodies[0]?.rows ?? []));
    if (!group.some((t) => (t.tBodies[0]?.rows.length ?? 0) >= FILTER_MIN_ROWS)) continue;
    const n = ++counter;
    const heading = sec.querySelector("h1, h2");
    const title = heading ? plainText(heading.textContent ?? "") : "";
    const tools = document.createElement("div");
    tools.className = "table-tools";
    tools.setAttribute("data-for", sec.id || heading?.id || `section-${n}`);
    const label = document.createElement("label");
    label.className = "table-filter";
    label.setAttribute("for", `table-filter-${n}`);
    label.textContent = group.length > 1 ? `Filter the ${group.length} tables of this section` : "Filter rows";
    const input = document.createElement("input");
    input.type = "search";
    input.id = `table-filter-${n}`;
    input.autocomplete = "off";
    input.spellcheck = false;
    input.setAttribute("aria-label", "Filter rows" + (title ? `: ${title}` : ""));
    const count = document.createElement("span");
    count.className = "table-count";
    count.setAttribute("aria-live", "polite");
    tools.append(label, input, count);
    if (heading && heading.parentElement === sec) heading.after(tools);
    else sec.prepend(tools);

    // A row is found by its own text and by its table's caption (so "5p-P3/2" finds every table of that level).
    const captionOf = (t: HTMLTableElement) =>
      t.caption ? Array.from(t.caption.childNodes).map((c) => (c.nodeType === 1 && (c as Element).tagName === "A" ? "" : c.textContent ?? "")).join("") : "";
    const texts = group.flatMap((t) => {
      const cap = captionOf(t);
      return Array.from(t.tBodies[0]?.rows ?? []).map((r) => plainText(`${cap} ${r.textContent ?? ""}`).toLowerCase());
    });
    const applyFilter = () => {
      const words = plainText(input.value).toLowerCase().split(/\s+/).filter(Boolean);
      let shown = 0;
      rows.forEach((r, k) => {
        const ok = words.every((w) => texts[k]!.includes(w));
        r.hidden = !ok;
        if (ok) shown++;
      });
      count.textContent = words.length ? `${shown} of ${rows.length} rows` : "";
    };
    input.addEventListener("input", applyFilter);
    const clear = () => {
      input.value = "";
      applyFilter();
    };
    for (const t of group) t.atlasClearFilter = clear;
  }
}

function enhance(table: FilterableTable): void {
  const tbody = table.tBodies[0];
  const head = table.tHead?.rows[0];
  if (!tbody || !head) return;
  const rows = Array.from(tbody.rows);

  // Sort buttons in the header cells.
  const ths = Array.from(head.cells);
  const sortBy = (col: number, dir: number) => {
    const keys = rows.map((r) => {
      const td = r.cells[col];
      return td ? sortText(td) : "";
    });
    const nums = keys.map((k) => (k === "" ? null : decimalKey(plainText(k))));
    const numeric = keys.every((k, i) => k === "" || nums[i] !== null);
    const order = rows.map((_r, i) => i);
    order.sort((a, b) => {
      const ea = keys[a] === "";
      const eb = keys[b] === "";
      if (ea || eb) return ea === eb ? a - b : ea ? 1 : -1; // empty cells last, both ways
      const c = numeric ? compareDecimal(nums[a] as DecimalKey, nums[b] as DecimalKey) : keys[a]!.localeCompare(keys[b]!, "en", { numeric: true });
      return c * dir || a - b;
    });
    const frag = document.createDocumentFragment();
    for (const i of order) frag.appendChild(rows[i]!);
    tbody.appendChild(frag);
  };
  ths.forEach((th, col) => {
    if (th.classList.contains("k-link")) return;
    const button = document.createElement("button");
    button.type = "button";
    button.className = "sort";
    while (th.firstChild) button.appendChild(th.firstChild);
    th.appendChild(button);
    button.addEventListener("click", () => {
      const dir = th.getAttribute("aria-sort") === "ascending" ? "descending" : "ascending";
      for (const other of ths) other.removeAttribute("aria-sort");
      th.setAttribute("aria-sort", dir);
      sortBy(col, dir === "ascending" ? 1 : -1);
    });
  });
}

// ---- Copy-link ----
let announcer: HTMLElement | null = null;
function announce(text: string): void {
  if (!announcer) {
    announcer = document.createElement("div");
    announcer.className = "visually-hidden";
    announcer.id = "atlas-announce";
    announcer.setAttribute("role", "status");
    announcer.setAttribute("aria-live", "polite");
    document.body.appendChild(announcer);
  }
  const a = announcer;
  a.textContent = "";
  // A fresh text node each time so repeated copies are announced again.
  setTimeout(() => {
    a.textContent = text;
  }, 30);
}

function copyFallback(text: string): boolean {
  const area = document.createElement("textarea");
  area.value = text;
  area.setAttribute("readonly", "");
  area.style.position = "fixed";
  area.style.opacity = "0";
  document.body.appendChild(area);
  area.select();
  let ok = false;
  try {
    ok = document.execCommand("copy");
  } catch {
    ok = false;
  }
  document.body.removeChild(area);
  return ok;
}

function copy(text: string): Promise<boolean> {
  if (navigator.clipboard?.writeText) {
    return navigator.clipboard.writeText(text).then(
      () => true,
      () => copyFallback(text),
    );
  }
  return Promise.resolve(copyFallback(text));
}

function onClick(e: MouseEvent): void {
  const a = (e.target as Element | null)?.closest?.("a.row-link");
  if (!a || e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
  const href = a.getAttribute("href") ?? "";
  if (href.charAt(0) !== "#") return;
  e.preventDefault();
  const url = location.href.split("#")[0] + href;
  const row = a.closest("tr");
  void copy(url).then((ok) => {
    if (ok) {
      document.querySelector("tr.row-copied")?.classList.remove("row-copied");
      row?.classList.add("row-copied");
      announce("Link copied");
    } else {
      location.hash = href;
      announce("Could not copy; the row's link is now in the address bar");
    }
  });
}

/** A row reached by its anchor is shown even when a filter had hidden it. */
function reveal(): void {
  const id = location.hash.slice(1);
  if (!id) return;
  let el = document.getElementById(id);
  try {
    if (!el) el = document.getElementById(decodeURIComponent(id));
  } catch {
    /* malformed escape */
  }
  if (!el || !el.hidden) return;
  const table = el.closest("table") as FilterableTable | null;
  if (table?.atlasClearFilter) {
    table.atlasClearFilter();
    el.scrollIntoView();
  }
}

function init(): void {
  const tables = Array.from(document.querySelectorAll<HTMLTableElement>("table.atlas-table"));
  tables.forEach(enhance);
  addFilters(tables);
  initUncertaintySwitch();
  document.addEventListener("click", onClick);
  window.addEventListener("hashchange", reveal);
}

if (typeof document !== "undefined") {
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
}
