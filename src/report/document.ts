/**
 * A report as plain data: sections of typed blocks that the HTML and Markdown writers both render,
 * so the two files say the same thing. Text is plain (the writers escape it); figures carry their PNG.
 */

export type Tone = 'ok' | 'marginal' | 'unsafe' | 'info' | 'warning' | 'error';

export interface TableColumn {
  title: string;
  align: 'left' | 'right';
}

export interface TableRow {
  cells: string[];
  /** Colour hint for the row (the words in the cells carry the meaning; colour only helps on screen). */
  tone?: Tone;
}

export type Block =
  | { kind: 'paragraph'; text: string }
  | { kind: 'list'; items: string[] }
  /** A boxed notice, e.g. the cautions, printed with a heavy border. */
  | { kind: 'callout'; title: string; items: string[]; tone: Tone }
  | { kind: 'table'; caption: string; columns: TableColumn[]; rows: TableRow[]; notes: string[] }
  /** Term and value pairs (e.g. the reference's numbers). */
  | { kind: 'facts'; caption: string; items: [string, string][] }
  | { kind: 'figure'; file: string; alt: string; caption: string; png: Buffer; width_px: number; height_px: number };

export interface Section {
  id: string;
  title: string;
  blocks: Block[];
}

export interface ReportDocument {
  title: string;
  /** One line under the title: tool, version, date, case file. */
  byline: string;
  /** Shown before the first section (cautions). */
  front: Block[];
  sections: Section[];
  /** Last line of the report. */
  footer: string;
}
