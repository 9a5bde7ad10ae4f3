/**
 * Stable row anchors, built from physics keys only (species id, level id, F,
 * m, line id, component (mu, ml)), never from row order, so that a link in a
 * lab procedure lands on the same row after data is added, reordered or
 * rebuilt. Level and line ids may contain "/" and "+" (e.g. "5s-S1/2"); both
 * are legal in HTML ids and URL fragments, so ids are used as written. ":"
 * separates keys because ids cannot contain it (see src/data/ids.ts).
 *
 * Examples: level:5s-S1/2 · level:5s-S1/2:mJ=-1/2 · level:5s-S1/2:F=2 ·
 * level:5s-S1/2:F=2:mF=-1 · line:D2 · line:D2:mu=3/2,ml=1/2
 */
import { formatDoubled } from "../physics/quantum.js";

export const levelAnchor = (levelId: string) => `level:${levelId}`;
export const mJAnchor = (levelId: string, mJ2: number) => `level:${levelId}:mJ=${formatDoubled(mJ2)}`;
export const hyperfineAnchor = (levelId: string, F2: number) => `level:${levelId}:F=${formatDoubled(F2)}`;
export const mFAnchor = (levelId: string, F2: number, mF2: number) =>
  `level:${levelId}:F=${formatDoubled(F2)}:mF=${formatDoubled(mF2)}`;
export const lineAnchor = (lineId: string) => `line:${lineId}`;
export const componentAnchor = (lineId: string, mu2: number, ml2: number) =>
  `line:${lineId}:mu=${formatDoubled(mu2)},ml=${formatDoubled(ml2)}`;
/** A row of a level's field table: one state (F, mF) across all fields. */
export const fieldStateAnchor = (levelId: string, F2: number, mF2: number) =>
  `field:${levelId}:F=${formatDoubled(F2)}:mF=${formatDoubled(mF2)}`;
/** A transition between two sublevels of one level (lower state first). */
export const transitionAnchor = (levelId: string, a: { F2: number; mF2: number }, b: { F2: number; mF2: number }) =>
  `rf:${levelId}:F=${formatDoubled(a.F2)},mF=${formatDoubled(a.mF2)}:F=${formatDoubled(b.F2)},mF=${formatDoubled(b.mF2)}`;

// --- Sections and the field-dependent rows (level, line and per-field pages) ---

/** The section of a level's linear sublevel shifts (overview). */
export const levelShiftsAnchor = (levelId: string) => `level:${levelId}-shifts`;
/** The section of a level's field-dependent numbers (level page). */
export const levelFieldSectionAnchor = (levelId: string) => `field:${levelId}-section`;
/** The section of a line's J-resolved components (line page). */
export const lineComponentsAnchor = (lineId: string) => `line:${lineId}-components`;
/** The section of a line's hyperfine-resolved and field-dependent numbers (line page). */
export const lineFieldsAnchor = (lineId: string) => `line:${lineId}-fields`;
/** A line at one bias field; `tesla` as exported ("0.0001"). */
export const lineAtFieldAnchor = (lineId: string, tesla: string) => `line:${lineId}:B=${tesla}T`;
/** A line's splitting in wavelength at one bias field (line page, issue 11). */
export const lineDlambdaAnchor = (lineId: string, tesla: string) => `line:${lineId}:dlambda:B=${tesla}T`;
/** The section of a line's splitting in wavelength (line page). */
export const lineDlambdaSectionAnchor = (lineId: string) => `line:${lineId}-wavelength-splitting`;
/**
 * One component of a line at a field, named by its two states ("F=2, mF=1"
 * → "F=2,mF=1"). A pair of field eigenstates has one component at most
 * (q = M_u − M_l is fixed by the pair), so the two labels are a physics key.
 * Builds before the term solver named some strong-field components by
 * fine-structure states ("J=3/2,mJ=1/2-to-J=1/2,mJ=1/2"); that form stays as
 * an alias of the strongest component of the same high-field pair
 * (LineComponentAtField.aliasLabels, Row.aliases).
 */
export const componentAtFieldAnchor = (lineId: string, tesla: string, upperLabel: string, lowerLabel: string) =>
  `${lineAtFieldAnchor(lineId, tesla)}:${upperLabel}-to-${lowerLabel}`.replace(/\s+/g, "");
/** A hyperfine group F → F′ of a line. */
export const hyperfineGroupAnchor = (lineId: string, Fu2: number, Fl2: number) =>
  `hfl:${lineId}:F=${formatDoubled(Fu2)}-to-F=${formatDoubled(Fl2)}`;
/** A hyperfine Zeeman component (F, mF) → (F′, mF′) of a line. */
export const hyperfineComponentAnchor = (lineId: string, Fu2: number, mFu2: number, Fl2: number, mFl2: number) =>
  `hfc:${lineId}:F=${formatDoubled(Fu2)},mF=${formatDoubled(mFu2)}-to-F=${formatDoubled(Fl2)},mF=${formatDoubled(mFl2)}`;
/** The section of a line's lock points (line page). */
export const lineLockAnchor = (lineId: string) => `line:${lineId}-lock-points`;
/**
 * A lock point of a line, lower level first as the absorption is read:
 * lock:D2:F=2-to-F=3 (the transition F = 2 → F′ = 3), lock:D2:F=2-to-F=2,3
 * (the crossover of F′ = 2 and 3 from F = 2), lock:D2:F=1,2-to-F=2 (the
 * crossover of F = 1 and 2 to F′ = 2). The F values (doubled) are ascending.
 */
export const lockPointAnchor = (lineId: string, Fl2: readonly number[], Fu2: readonly number[]) =>
  `lock:${lineId}:F=${Fl2.map(formatDoubled).join(",")}-to-F=${Fu2.map(formatDoubled).join(",")}`;
/** A fine-structure term ("5p 2P°" → "5p-2Po") and its states. */
export const termKey = (key: string) => key.replace(/\s+/g, "-").replace(/°/g, "o");
export const termAnchor = (key: string) => `term:${termKey(key)}`;
export const termStateAnchor = (key: string, J2: number, mJ2: number) => `term:${termKey(key)}:J=${formatDoubled(J2)}:mJ=${formatDoubled(mJ2)}`;
