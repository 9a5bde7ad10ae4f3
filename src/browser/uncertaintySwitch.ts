/**
 * The per-page switch "Show uncertainties": computed and measured numbers
 * carry their concise standard uncertainty, "0.699 583 30(12)", with the
 * "(12)" in its own element (<span class="unc">, written by
 * src/site/tableRows.ts and fillNumberCell.ts). Unticking the box puts the
 * class "hide-unc" on the root element, and the page's CSS
 * (templates/assets/interactive.css) makes every .unc invisible while it
 * keeps its width, so the digits stay lined up on their decimal points.
 * The value itself is not rounded again: hiding removes the "(12)" only.
 *
 * The choice is remembered for this page (by its path) in localStorage;
 * where storage throws (file:// in some browsers, private modes), the box
 * still works for the page's lifetime. Without JavaScript every
 * uncertainty is shown. Part of assets/tables.js.
 */

const KEY_PREFIX = "sublevel-atlas:hide-uncertainties:";
export const HIDE_CLASS = "hide-unc";

function key(): string {
  return KEY_PREFIX + location.pathname;
}

function readHidden(): boolean {
  try {
    return globalThis.localStorage?.getItem(key()) === "1";
  } catch {
    return false;
  }
}

function saveHidden(hidden: boolean): void {
  try {
    if (hidden) globalThis.localStorage?.setItem(key(), "1");
    else globalThis.localStorage?.removeItem(key());
  } catch {
    /* not remembered */
  }
}

function apply(hidden: boolean): void {
  document.documentElement.classList.toggle(HIDE_CLASS, hidden);
}

/** Adds the switch when the page shows any uncertainty; applies the page's remembered choice. */
export function initUncertaintySwitch(): void {
  if (!document.querySelector(".unc")) return;
  const box = document.createElement("div");
  box.className = "unc-switch";
  const input = document.createElement("input");
  input.type = "checkbox";
  input.id = "unc-choice";
  const label = document.createElement("label");
  label.setAttribute("for", "unc-choice");
  label.textContent = "Show uncertainties";
  box.append(input, label);
  const hidden = readHidden();
  input.checked = !hidden;
  apply(hidden);
  const after = document.querySelector(".unit-switch") ?? document.getElementById("finder");
  if (after?.parentNode) after.parentNode.insertBefore(box, after.nextSibling);
  else document.body.prepend(box);
  input.addEventListener("change", () => {
    saveHidden(!input.checked);
    apply(!input.checked);
  });
}
