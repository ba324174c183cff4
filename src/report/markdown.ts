/**
 * The report as Markdown (CommonMark with GitHub tables): the same sections as the HTML, the figures as
 * links to the PNG files written beside it.
 */
import type { Block, ReportDocument, Section } from './document.js';

/** Escapes the characters that would start Markdown syntax inside running text or a table cell. */
export function escapeMarkdown(text: string): string {
  return text.replace(/([\\`*_[\]<>|#])/g, '\\$1');
}

function tableMd(columns: { title: string; align: 'left' | 'right' }[], rows: string[][]): string[] {
  const line = (cells: string[]): string => `| ${cells.map(escapeMarkdown).join(' | ')} |`;
  return [line(columns.map((c) => c.title)), `| ${columns.map((c) => (c.align === 'right' ? '---:' : ':---')).join(' | ')} |`, ...rows.map(line)];
}

function blockMd(b: Block): string {
  switch (b.kind) {
    case 'paragraph':
      return escapeMarkdown(b.text);
    case 'list':
      return b.items.map((i) => `- ${escapeMarkdown(i)}`).join('\n');
    case 'callout':
      return [`> **${escapeMarkdown(b.title)}**`, '>', ...b.items.map((i) => `> - ${escapeMarkdown(i)}`)].join('\n');
    case 'table':
      return [
        `**${escapeMarkdown(b.caption)}**`,
        '',
        ...tableMd(
          b.columns,
          b.rows.map((r) => r.cells),
        ),
        ...(b.notes.length > 0 ? ['', ...b.notes.map((n) => `*${escapeMarkdown(n)}*`)] : []),
      ].join('\n');
    case 'facts':
      return [
        `**${escapeMarkdown(b.caption)}**`,
        '',
        ...tableMd(
          [
            { title: 'Quantity', align: 'left' },
            { title: 'Value', align: 'left' },
          ],
          b.items.map(([t, v]) => [t, v]),
        ),
      ].join('\n');
    case 'figure':
      return `![${escapeMarkdown(b.alt)}](${b.file})\n\n*${escapeMarkdown(b.caption)}*`;
    default: {
      const never: never = b;
      throw new Error(`report markdown: unknown block ${JSON.stringify(never)}`);
    }
  }
}

function sectionMd(s: Section): string {
  return [`## ${escapeMarkdown(s.title)}`, ...s.blocks.map(blockMd)].join('\n\n');
}

export function reportMarkdown(doc: ReportDocument): string {
  return `${[`# ${escapeMarkdown(doc.title)}`, escapeMarkdown(doc.byline), ...doc.front.map(blockMd), ...doc.sections.map(sectionMd), '---', escapeMarkdown(doc.footer)].join('\n\n')}\n`;
}
