/**
 * Angular-momentum quantum numbers as doubled integers: J = 3/2 is stored
 * as 3, m = -1/2 as -1. Doubling keeps half-integers exact in plain
 * integers and makes "integer or half-integer" a parity test.
 */

/** Doubled value of "3/2", "1", "-1/2", "0". Throws RangeError on anything else. */
export function parseDoubled(text: string): number {
  const m = /^([+-]?)(\d+)(?:\/(\d+))?$/.exec(text.trim());
  if (!m) throw new RangeError(`not an integer or half-integer: ${text}`);
  const sign = m[1] === "-" ? -1 : 1;
  const n = Number(m[2]);
  const d = m[3] === undefined ? 1 : Number(m[3]);
  if (!Number.isSafeInteger(n) || n > 1_000_000) throw new RangeError(`too large: ${text}`);
  if (d === 1) return sign * 2 * n;
  if (d === 2 && n % 2 === 1) return sign * n;
  throw new RangeError(`not an integer or half-integer: ${text}`);
}

/** "3/2", "1", "-1/2", "0" from a doubled value. */
export function formatDoubled(k: number): string {
  if (k % 2 === 0) return String(k / 2);
  return `${k}/2`;
}

/** The doubled m values -j, -j+1, ..., j of a doubled j, ascending. */
export function mValues(j2: number): number[] {
  const out: number[] = [];
  for (let m = 0 - j2; m <= j2; m += 2) out.push(m === 0 ? 0 : m); // never -0
  return out;
}

/** Doubled values |a-b|, ..., a+b allowed by the triangle rule for doubled a, b. */
export function coupledValues(a2: number, b2: number): number[] {
  const out: number[] = [];
  for (let c = Math.abs(a2 - b2); c <= a2 + b2; c += 2) out.push(c);
  return out;
}

/** True when doubled a, b, c satisfy the triangle rule with a + b + c integer. */
export function triangle(a2: number, b2: number, c2: number): boolean {
  return (a2 + b2 + c2) % 2 === 0 && c2 >= Math.abs(a2 - b2) && c2 <= a2 + b2;
}
