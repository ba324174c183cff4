/**
 * The case name: free text shown in every output (terminal, JSON, chart titles, report headings). It is cleaned
 * where it is read, once, so that no output has to: one line (control characters and line breaks become spaces:
 * a newline in a name injected Markdown blocks into report.md, ESC and BEL reached the terminal) and at most
 * `maxNameChars` characters (a 100,000-character name overflowed chart titles and took 26 s to report), with a
 * warning when it was shortened. Outputs still escape it for their own format (HTML, SVG, Markdown).
 */
import { cleanFreeText, maxNameChars } from './clip-text.js';
import type { CaseWarning } from './types.js';

export function caseName(given: string | undefined, defaultName: string): { name: string; warning?: CaseWarning } {
  const fallback = cleanFreeText(defaultName, maxNameChars).text || 'unnamed case';
  if (given === undefined) return { name: fallback };
  const { text, shortened } = cleanFreeText(given, maxNameChars);
  if (text === '') return { name: fallback };
  if (!shortened) return { name: text };
  return {
    name: text,
    warning: {
      path: 'name',
      value: `${[...given].length.toLocaleString('en-US')} characters`,
      message: `the name is shortened to its first ${maxNameChars} characters in every output`,
    },
  };
}
