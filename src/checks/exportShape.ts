/** The parts of an export the checks read, typed loosely: a check must survive any broken input. */
export interface ExportLike {
  levels?: unknown;
  lines?: unknown;
}

export const isObject = (x: unknown): x is Record<string, unknown> => typeof x === "object" && x !== null && !Array.isArray(x);

/** The array under `key`, or [] when missing or not an array. */
export function arrayAt(x: unknown, key: string): unknown[] {
  if (!isObject(x)) return [];
  const v = x[key];
  return Array.isArray(v) ? v : [];
}

/** A short name of an item for messages: its id when it has one, else its index. */
export function nameOf(x: unknown, index: number): string {
  return isObject(x) && typeof x.id === "string" ? JSON.stringify(x.id) : `#${index}`;
}
