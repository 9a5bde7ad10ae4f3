/**
 * The θ control of a line page's "What the observer sees" section: buttons
 * for 0° and 90°, a number box and a slider for any angle; each change
 * redraws the observer stick plot with the heights of
 * src/site/plots/observerGeometry.ts, the code the build drew it with
 * (strength × F_kq(θ) from src/physics/angularFactor.ts). On screen the live
 * plot replaces the two pre-rendered views; print shows those two (CSS).
 * Without JavaScript the control stays hidden. Bundled into the classic
 * script assets/observer.js by src/build/bundleBrowser.ts.
 */
import { observedHeights, stickTopY, thetaText, type ObservedStick } from "../site/plots/observerGeometry.js";
import { px } from "../site/plots/svgParts.js";

/** Redraw the live plot of `section` at θ (degrees). */
export function drawAt(section: HTMLElement, thetaDeg: number): void {
  const k = Number(section.getAttribute("data-k"));
  const live = section.querySelector(".obs-live svg");
  if (!live) return;
  const groups = Array.from(live.querySelectorAll<SVGGElement>("g.obs-stick"));
  const sticks: ObservedStick[] = groups.map((g) => ({ q: Number(g.getAttribute("data-q")), strength: Number(g.getAttribute("data-strength")) }));
  const heights = observedHeights(sticks, k, thetaDeg);
  groups.forEach((g, i) => {
    const y = px(stickTopY(heights[i]!));
    g.querySelector("line")?.setAttribute("y2", y);
    g.querySelector("g.obs-marker")?.setAttribute("transform", `translate(0 ${y})`);
    if (heights[i]! > 0) g.removeAttribute("opacity");
    else g.setAttribute("opacity", "0.3");
    g.setAttribute("data-height", String(heights[i]));
  });
  const text = `θ = ${thetaText(thetaDeg)}`;
  const label = live.querySelector("text.obs-theta");
  if (label) label.textContent = text;
  const title = live.querySelector("title");
  if (title) title.textContent = title.textContent!.replace(/θ = [^ ]+/, text);
}

function setUp(section: HTMLElement): void {
  const control = section.querySelector<HTMLElement>(".theta-control");
  const num = section.querySelector<HTMLInputElement>("input.theta-number");
  const range = section.querySelector<HTMLInputElement>("input.theta-range");
  const status = section.querySelector<HTMLElement>(".theta-status");
  if (!control || !num || !range) return;
  const apply = (theta: number, from: HTMLInputElement | null) => {
    if (!Number.isFinite(theta) || theta < 0 || theta > 180) {
      num.setAttribute("aria-invalid", "true");
      if (status) status.textContent = "θ runs from 0° to 180°";
      return;
    }
    num.removeAttribute("aria-invalid");
    if (from !== num) num.value = String(theta);
    if (from !== range) range.value = String(theta);
    drawAt(section, theta);
    if (status) status.textContent = `plot drawn for θ = ${thetaText(theta)}`;
  };
  for (const b of Array.from(section.querySelectorAll<HTMLButtonElement>("button[data-theta]"))) {
    b.addEventListener("click", () => apply(Number(b.getAttribute("data-theta")), null));
  }
  num.addEventListener("input", () => {
    if (num.value.trim() !== "") apply(Number(num.value), num);
  });
  range.addEventListener("input", () => apply(Number(range.value), range));
  control.hidden = false;
  section.classList.add("live");
  const start = Number(num.value);
  apply(num.value.trim() !== "" && Number.isFinite(start) ? start : 90, null);
}

for (const s of Array.from(document.querySelectorAll<HTMLElement>("section[data-observer]"))) setUp(s);
