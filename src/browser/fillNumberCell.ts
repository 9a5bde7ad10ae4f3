import type { NumberParts } from "../site/plainFormat.js";

/** Cell markup as the server writes it (cellHtml in src/site/tableRows.ts), for the page scripts that rewrite a number cell. */
export function fillNumberCell(td: HTMLTableCellElement, parts: NumberParts): void {
  const n = document.createElement("span");
  n.className = "n";
  n.appendChild(document.createTextNode(parts.sign + parts.int));
  const fr = document.createElement("span");
  fr.className = "frac";
  fr.textContent = parts.frac;
  if (parts.unc) {
    const unc = document.createElement("span");
    unc.className = "unc";
    unc.textContent = parts.unc;
    fr.appendChild(unc);
  }
  if (parts.exp) fr.appendChild(document.createTextNode(parts.exp));
  n.appendChild(fr);
  if (parts.pad) {
    const pad = document.createElement("span");
    pad.className = "pad";
    pad.textContent = parts.pad;
    n.appendChild(pad);
  }
  td.textContent = "";
  td.appendChild(n);
}
