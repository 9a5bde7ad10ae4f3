/**
 * Sends a saved link on to the row's new page. When the address names an id
 * this page does not have, and the page has a forwarding map beside it
 * (<body data-moved="moved-anchors.js">, written by src/build/forwarding.ts),
 * the map is loaded as a classic script (works from file:// and over http)
 * and, if it knows the id, the browser goes to the page that holds it now,
 * replacing the old address in the history. Field-calculator addresses
 * ("#B=4.7G") are not ids and are left alone.
 */
import type { MovedMap } from "../build/forwarding.js";

declare global {
  interface Window {
    SublevelAtlasMoved?: MovedMap;
  }
}

function wantedId(): string | null {
  const raw = location.hash.slice(1);
  if (!raw || raw.startsWith("B=")) return null;
  try {
    return decodeURIComponent(raw);
  } catch {
    return raw;
  }
}

function go(map: MovedMap, old: string): void {
  const renamed = map.renamed?.[old];
  const k = renamed ? renamed[0] : map.ids[old];
  if (k === undefined) return;
  const id = renamed ? renamed[1] : old;
  const target = new URL(map.pages[k]!, location.href);
  target.hash = "#" + encodeURIComponent(id).replace(/%2F/g, "/").replace(/%3A/g, ":").replace(/%3D/g, "=").replace(/%2C/g, ",").replace(/%2B/g, "+");
  location.replace(target.href);
}

let loading = false;

function forward(): void {
  const id = wantedId();
  if (id === null || document.getElementById(id)) return;
  const file = document.body.getAttribute("data-moved");
  if (!file) return;
  if (window.SublevelAtlasMoved) return go(window.SublevelAtlasMoved, id);
  if (loading) return;
  loading = true;
  const script = document.createElement("script");
  script.src = file;
  script.onload = () => {
    loading = false;
    const wanted = wantedId();
    if (window.SublevelAtlasMoved && wanted !== null && !document.getElementById(wanted)) go(window.SublevelAtlasMoved, wanted);
  };
  script.onerror = () => {
    loading = false;
  };
  document.head.appendChild(script);
}

if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", forward);
else forward();
window.addEventListener("hashchange", forward);
