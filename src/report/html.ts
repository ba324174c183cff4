/**
 * The report as one self-contained HTML file: styles inline, images as data: URIs (base64 PNG), no
 * scripts, no fonts or files fetched. Screen and A4 print layouts (print-css.ts).
 */
import type { Block, ReportDocument, Section, TableRow } from './document.js';
import { REPORT_CSS } from './print-css.js';

export function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

function rowHtml(row: TableRow, align: readonly ('left' | 'right')[]): string {
  const cells = row.cells.map((c, k) => `<td class="${align[k] === 'right' ? 'num' : 'text'}">${escapeHtml(c)}</td>`).join('');
  return `<tr${row.tone ? ` class="tone-${row.tone}"` : ''}>${cells}</tr>`;
}

function blockHtml(b: Block): string {
  switch (b.kind) {
    case 'paragraph':
      return `<p>${escapeHtml(b.text)}</p>`;
    case 'list':
      return `<ul>${b.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`;
    case 'callout':
      return `<aside class="callout tone-${b.tone}" role="note"><p class="callout-title">${escapeHtml(b.title)}</p><ul>${b.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul></aside>`;
    case 'table': {
      const align = b.columns.map((c) => c.align);
      const head = b.columns.map((c) => `<th class="${c.align === 'right' ? 'num' : 'text'}" scope="col">${escapeHtml(c.title)}</th>`).join('');
      const notes = b.notes.map((n) => `<p class="note">${escapeHtml(n)}</p>`).join('');
      return `<div class="table-block"><table><caption>${escapeHtml(b.caption)}</caption><thead><tr>${head}</tr></thead><tbody>${b.rows.map((r) => rowHtml(r, align)).join('')}</tbody></table>${notes}</div>`;
    }
    case 'facts':
      return `<div class="table-block"><table class="facts"><caption>${escapeHtml(b.caption)}</caption><tbody>${b.items
        .map(([term, value]) => `<tr><th scope="row">${escapeHtml(term)}</th><td>${escapeHtml(value)}</td></tr>`)
        .join('')}</tbody></table></div>`;
    case 'figure':
      return `<figure><img src="data:image/png;base64,${b.png.toString('base64')}" width="${b.width_px}" height="${b.height_px}" alt="${escapeHtml(b.alt)}"><figcaption>${escapeHtml(b.caption)}</figcaption></figure>`;
    default: {
      const never: never = b;
      throw new Error(`report html: unknown block ${JSON.stringify(never)}`);
    }
  }
}

function sectionHtml(s: Section): string {
  return `<section id="${escapeHtml(s.id)}"><h2>${escapeHtml(s.title)}</h2>\n${s.blocks.map(blockHtml).join('\n')}\n</section>`;
}

export function reportHtml(doc: ReportDocument): string {
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escapeHtml(doc.title)}</title>`,
    `<style>${REPORT_CSS}</style>`,
    '</head>',
    '<body>',
    '<main>',
    `<header><h1>${escapeHtml(doc.title)}</h1><p class="byline">${escapeHtml(doc.byline)}</p></header>`,
    doc.front.map(blockHtml).join('\n'),
    doc.sections.map(sectionHtml).join('\n'),
    `<footer><p>${escapeHtml(doc.footer)}</p></footer>`,
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
