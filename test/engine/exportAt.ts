/**
 * The export's field-dependent entries (field_table, sublevel_transitions'
 * at_fields, lines' at_fields) at configured field number i, gathered into
 * the calculator's answer shape (keys as README, "The JSON export").
 */
import type { AtResult } from "../../src/engine/types.js";

export type ExactAnswer = Omit<AtResult<string>, "B_T">;

interface ExportLevel {
  id: string;
  field_table: { states: ExactAnswer["levels"][number]["states"] }[];
  sublevel_transitions: { lower: { F: string; mF: string }; upper: { F: string; mF: string }; kind: "magnetic-dipole" | "two-photon"; at_fields: { Hz: string; Hz_u: string | null }[] }[];
}
interface ExportLine {
  id: string;
  at_fields: Omit<ExactAnswer["lines"][number], "id">[];
}

/** `exp` is a parsed export file or speciesExport(…)'s object. */
export function exportAt(exp: { levels: unknown[]; lines: unknown[] }, i: number): ExactAnswer {
  const levels = exp.levels as ExportLevel[];
  const lines = exp.lines as ExportLine[];
  return {
    levels: levels.map((l) => ({ id: l.id, states: l.field_table[i]!.states })),
    transitions: levels.flatMap((l) =>
      l.sublevel_transitions.map((t) => ({ level: l.id, lower: t.lower, upper: t.upper, kind: t.kind, Hz: t.at_fields[i]!.Hz, Hz_u: t.at_fields[i]!.Hz_u })),
    ),
    lines: lines.map((ln) => {
      const a = ln.at_fields[i]!;
      return { id: ln.id, model: a.model, regime: a.regime, components: a.components };
    }),
  };
}
