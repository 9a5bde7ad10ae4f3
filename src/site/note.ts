/** Long cell text (sources, readings) folded into an expandable note; shared by the row writer and the sort keys. */

/** Notes longer than this fold into an expandable <details>; the summary shows their first words. */
export const NOTE_FOLD = 28;

/** The first words of a note, cut at a word boundary, with an ellipsis. */
export function noteSummary(text: string): string {
  if (text.length <= NOTE_FOLD) return text;
  const cut = text.lastIndexOf(" ", NOTE_FOLD);
  return `${text.slice(0, cut > 8 ? cut : NOTE_FOLD).replace(/[\s,;:(]+$/, "")}…`;
}

