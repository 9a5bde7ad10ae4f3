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
