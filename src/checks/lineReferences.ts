/** Every line of an export names an upper and a lower level that the export lists, and ids are unique. */
import { arrayAt, isObject, nameOf } from "./exportShape.js";

export function checkLineReferences(value: unknown, file: string): string[] {
  const problems: string[] = [];
  const levels = new Set<string>();
  arrayAt(value, "levels").forEach((l, i) => {
    const id = isObject(l) ? l.id : undefined;
    if (typeof id !== "string") return;
    if (levels.has(id)) problems.push(`${file}: level ${nameOf(l, i)} appears twice`);
    levels.add(id);
  });
  const lines = new Set<string>();
  arrayAt(value, "lines").forEach((ln, i) => {
    if (!isObject(ln)) return;
    if (typeof ln.id === "string") {
      if (lines.has(ln.id)) problems.push(`${file}: line ${nameOf(ln, i)} appears twice`);
      lines.add(ln.id);
    }
    for (const end of ["upper", "lower"] as const) {
      const ref = ln[end];
      if (typeof ref !== "string" || !levels.has(ref)) {
        problems.push(`${file}: line ${nameOf(ln, i)} has ${end} level ${JSON.stringify(ref)}, which is not among its levels`);
      }
    }
  });
  return problems;
}
