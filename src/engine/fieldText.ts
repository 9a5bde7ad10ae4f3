/**
 * A field typed by a person — in the calculator's box, in the page address
 * (#B=4.7G) or on the command line (`npm run at -- rb87 "4.7 G"`) — read
 * into an exact tesla value. One parser for the browser and the CLI.
 *
 * Accepted: "<number> <unit>" with a field unit of src/physics/units.ts
 * (T, mT, µT or uT, G, mG, kG; μ and µ both), the same without the space
 * ("4.7G", "0.47mT"), or a plain number, taken as tesla. Numbers as the
 * data files write them (src/data/numberText.ts), without uncertainty.
 * Refused: negative fields (the sign of m gives the direction), an
 * uncertainty, anything else; the message is one line.
 */
import type { Dec } from "../physics/decimal.js";
import { UNITS } from "../physics/units.js";
import { parseMeasured, parseQuantity } from "../data/numberText.js";

export type FieldParse = { ok: true; tesla: Dec; text: string } | { ok: false; message: string };

const FIELD_UNITS = Object.keys(UNITS).filter((u) => UNITS[u]!.kind === "field");

function fail(message: string): FieldParse {
  return { ok: false, message };
}

/**
 * Read a field. Examples: "4.7 G" → 0.00047 T, "0.47mT" → 0.00047 T,
 * "37 µT" → 0.000037 T, "0.37" → 0.37 T, "1e-3 T" → 0.001 T. Exact (Dec
 * from the digits written, unit factors exact by definition).
 */
export function parseFieldText(input: string): FieldParse {
  const text = input.trim().replace(/\s+/g, " ");
  if (text === "") return fail(`no field given; write e.g. "4.7 G", "0.47 mT" or "0.37 T" (units ${FIELD_UNITS.join(", ")})`);
  // "4.7G" → "4.7 G": a unit glued to the number
  const glued = /^([^\s]*?[\d.)])([A-Za-zµμ]+)$/.exec(text);
  const spaced = glued ? `${glued[1]} ${glued[2]}` : text;
  let tesla: Dec;
  if (/\s/.test(spaced)) {
    const q = parseQuantity(spaced, "field", "a field");
    if (!q.ok) return fail(`field "${text}": ${q.message}; ${q.hint}`);
    if (q.value.uncertainty !== null) return fail(`field "${text}" has an uncertainty; give the field alone, e.g. 4.7 G`);
    tesla = q.value.si;
  } else {
    const n = parseMeasured(spaced);
    if (!n.ok) return fail(`field "${text}": ${n.message}; write e.g. "4.7 G", "0.47 mT" or a number of tesla (units ${FIELD_UNITS.join(", ")})`);
    if (n.value.uncertainty !== null) return fail(`field "${text}" has an uncertainty; give the field alone, e.g. 4.7 G`);
    tesla = n.value.value;
  }
  if (tesla.isNegative() && !tesla.isZero()) return fail(`field "${text}" is negative; fields are magnitudes, 0 or more (the sign of m covers the direction)`);
  return { ok: true, tesla: tesla.abs(), text };
}
