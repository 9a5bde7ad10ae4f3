/** Result of parsing one piece of text: a value, or what is wrong and what would be right. */
export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string; hint: string };

export function ok<T>(value: T): Parsed<T> {
  return { ok: true, value };
}

export function bad<T = never>(message: string, hint: string): Parsed<T> {
  return { ok: false, message, hint };
}
