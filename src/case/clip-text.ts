/**
 * Text from the user that is shown back: bounded and free of control characters.
 *
 * Error messages echo the value given (a 50 MB block scalar used to come back whole on stderr), and the case
 * name is printed in every output (newlines in it injected Markdown blocks into report.md; ESC and BEL reached
 * the terminal). Everything echoed goes through `clip`; the name through `cleanFreeText` when it is read.
 */

/** Longest value echoed in a message, characters: enough to recognise any value a case has. */
export const maxEchoChars = 80;

/** Longest case name kept, characters: a long title fits a chart title and a report heading. */
export const maxNameChars = 120;

/* C0 and C1 control characters, DEL, and the Unicode line and paragraph separators and bidirectional overrides
   (which can make a terminal or an editor show text in another order than it is stored). */
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/** Control characters written as \u001b escapes, so that they are visible and inert. */
export function escapeControl(text: string): string {
  return text.replace(CONTROL, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/** At most `max` characters (whole code points), with an ellipsis and the count of what was left out. */
export function clip(text: string, max = maxEchoChars): string {
  if (text.length <= max) return text;
  const points = [...text.slice(0, max + 1)];
  const kept = points.slice(0, max - 1).join('');
  return `${kept}... (${text.length.toLocaleString('en-US')} characters in all)`;
}

/** A value echoed in double quotes: control characters escaped, then clipped. */
export function quoted(text: string, max = maxEchoChars): string {
  return JSON.stringify(clip(text, max)).replace(CONTROL, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/**
 * Free text for display on one line: control characters and line breaks become spaces, runs of white space one
 * space, the ends trimmed, then at most `max` characters (an ellipsis marks the cut). `shortened` says whether
 * anything but white space was cut.
 */
export function cleanFreeText(text: string, max: number): { text: string; shortened: boolean } {
  const oneLine = text.replace(CONTROL, ' ').replace(/\s+/g, ' ').trim();
  const points = [...oneLine];
  if (points.length <= max) return { text: oneLine, shortened: false };
  return {
    text: `${points
      .slice(0, max - 1)
      .join('')
      .trimEnd()}\u2026`,
    shortened: true,
  };
}
