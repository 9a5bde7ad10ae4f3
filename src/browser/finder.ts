/**
 * The finder in the page: one search box for every species, level,
 * hyperfine level, sublevel, energy at a bias field, sublevel transition,
 * line, Zeeman component and constant of the site, as the reader types.
 * Each result says what it is and, where the answer is one number, shows
 * it; choosing one lands on its row (landing.ts). "/" focuses the box and
 * Esc clears it. The search itself is finderCore.ts; the data come from
 * the classic script assets/search-index.js (the global AtlasSearchData,
 * written by the build). Bundled with MiniSearch into the classic script
 * assets/finder.js by src/build/bundleBrowser.ts. Without JavaScript the
 * box stays hidden.
 *
 * Also defines the global AtlasFinder { createFinder, parseQuery,
 * searchTokens } for tests and benchmarks; in a context without a document
 * it does nothing else.
 */
import { searchTokens } from "../site/searchNormalize.js";
import type { SearchData } from "../site/searchIndex.js";
import { createFinder, parseQuery, type Finder } from "./finderCore.js";
import { initLanding, land, rememberLanding } from "./landing.js";
import { readShiftUnit } from "./shiftUnitChoice.js";

const g = globalThis as unknown as { AtlasFinder: unknown; AtlasSearchData?: SearchData; requestIdleCallback?: (f: () => void, o?: { timeout: number }) => void };
g.AtlasFinder = { createFinder, parseQuery, searchTokens };

/** True when the key went to a field that takes text (then "/" is the reader's own). */
function typing(t: EventTarget | null): boolean {
  const el = t as HTMLElement | null;
  return !!el && (el.isContentEditable || /^(INPUT|TEXTAREA|SELECT)$/.test(el.tagName));
}

function init(): void {
  initLanding();
  const box = document.getElementById("finder");
  const input = document.getElementById("finder-input") as HTMLInputElement | null;
  const list = document.getElementById("finder-results");
  const status = document.getElementById("finder-status");
  if (!box || !input || !list || !status || !g.AtlasSearchData) return;
  const base = document.body.getAttribute("data-root") || "./";
  let finder: Finder | null = null;
  const ready = () => (finder ??= createFinder(g.AtlasSearchData!));
  box.hidden = false;

  const clear = () => {
    list.textContent = "";
    list.hidden = true;
    status.textContent = "";
  };
  const render = () => {
    const text = input.value;
    if (!text.trim()) return clear();
    const r = ready().search(text, 25, { unit: readShiftUnit() });
    list.textContent = "";
    for (const row of r.rows) {
      const li = document.createElement("li");
      const a = document.createElement("a");
      a.href = base + row.href;
      if (row.column) a.setAttribute("data-column", row.column);
      const label = document.createElement("span");
      label.className = "finder-label";
      label.textContent = row.label;
      a.appendChild(label);
      if (row.answer) {
        const answer = document.createElement("span");
        answer.className = "finder-answer";
        answer.textContent = row.answer;
        a.append(" ", answer);
      }
      const kind = document.createElement("span");
      kind.className = "finder-kind";
      kind.textContent = row.kind;
      a.append(" ", kind);
      li.appendChild(a);
      list.appendChild(li);
    }
    list.hidden = r.rows.length === 0;
    status.textContent =
      r.total === 0
        ? "No matches"
        : r.total > r.rows.length
          ? `${r.capped ? `More than ${r.total - 1}` : r.total} matches, first ${r.rows.length} shown`
          : r.total === 1
            ? "1 match"
            : `${r.total} matches`;
  };
  const links = () => Array.from(list.querySelectorAll("a"));

  input.addEventListener("input", render);
  input.addEventListener("keydown", (e) => {
    const first = links()[0];
    if (e.key === "Enter" && first) {
      e.preventDefault();
      first.click();
    } else if (e.key === "ArrowDown" && first) {
      e.preventDefault();
      first.focus();
    } else if (e.key === "Escape") {
      e.preventDefault();
      input.value = "";
      clear();
    }
  });
  list.addEventListener("keydown", (e) => {
    const all = links();
    const at = all.indexOf(document.activeElement as HTMLAnchorElement);
    if (e.key === "ArrowDown" && at + 1 < all.length) {
      e.preventDefault();
      all[at + 1]!.focus();
    } else if (e.key === "ArrowUp") {
      e.preventDefault();
      if (at > 0) all[at - 1]!.focus();
      else input.focus();
    } else if (e.key === "Escape") {
      e.preventDefault();
      input.value = "";
      input.focus();
      clear();
    }
  });
  // Choosing a result: say which column answers it, then go. A jump within the page folds the list away.
  list.addEventListener("click", (e) => {
    const a = (e.target as Element | null)?.closest?.("a");
    if (!a) return;
    rememberLanding(a.href, a.getAttribute("data-column") ?? undefined);
    list.hidden = true;
    const to = new URL(a.href);
    // The same row again: no hashchange, so land here.
    if (to.href === location.href) {
      e.preventDefault();
      land();
    }
  });
  input.addEventListener("focus", () => {
    if (input.value.trim()) render();
  });
  // "/" anywhere but in a text field goes to the search box.
  document.addEventListener("keydown", (e) => {
    if (e.key !== "/" || e.ctrlKey || e.metaKey || e.altKey || typing(e.target)) return;
    e.preventDefault();
    input.focus();
    input.select();
  });
  clear();
  // Build the index once the page is idle, so the first keystroke is answered at once (npm run bench:search).
  if (g.requestIdleCallback) g.requestIdleCallback(ready, { timeout: 2000 });
  else setTimeout(ready, 0);
}

if (typeof document !== "undefined") {
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", init);
  else init();
}
