/**
 * The report as an A4 PDF for a design note: the same document as the HTML and Markdown (document.ts), laid out
 * with PDFKit (a maintained PDF writer with font embedding and subsetting), the charts drawn as vector graphics from
 * their SVG by svg-to-pdfkit (text stays text, lines stay lines), the bundled DejaVu Sans embedded, so the file
 * needs no browser to make and no font on the reader's machine. The date of the report is the PDF's creation date,
 * so the same inputs give the same file.
 *
 * Layout (points, 1 pt = 1/72 in): A4 595.28 x 841.89, margins 56 pt (about 20 mm), text width 483 pt; body
 * 9.5 pt, tables 8 pt with a header row repeated on a new page, figures scaled to the text width with their caption
 * under them, "page n of N" at the foot of every page.
 */
import { createRequire } from 'node:module';
import type { Block, ReportDocument, TableColumn, TableRow, Tone } from './document.js';

type PdfDoc = PDFKit.PDFDocument;
type SvgToPdf = (doc: PdfDoc, svg: string, x: number, y: number, options: Record<string, unknown>) => void;

const MARGIN = 56;
const BODY = 9.5;
const SMALL = 8;
const INK = '#1a1a1a';
const MUTED = '#555555';
const RULE = '#999999';

/** Row and callout backgrounds, as the HTML report's print styles have them (print-css.ts). */
const TONE_FILL: Record<Tone, string | null> = {
  ok: '#f1f8f1',
  marginal: '#fff6dc',
  unsafe: '#fdeae6',
  error: '#fdeae6',
  warning: '#fff6dc',
  info: null,
};

/** What a figure block needs for the PDF besides what the HTML uses: its chart as SVG. */
export type FigureSvgs = ReadonlyMap<string, string>;

export interface PdfOptions {
  /** ISO date of the report (YYYY-MM-DD): the PDF's creation date. */
  date: string;
  /** SVG of each figure by its file name (figure blocks without one show their PNG). */
  figureSvgs: FigureSvgs;
}

/** The PDF bytes of a report. */
export async function reportPdf(report: ReportDocument, options: PdfOptions): Promise<Buffer> {
  const require = createRequire(import.meta.url);
  const { default: PDFDocument } = (await import('pdfkit')) as { default: PDFKit.PDFDocument };
  const svgToPdf = ((await import('svg-to-pdfkit')) as { default: SvgToPdf }).default;
  const created = new Date(`${options.date}T00:00:00Z`);
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN },
    bufferPages: true,
    autoFirstPage: true,
    info: {
      Title: report.title,
      Author: 'fincheck',
      Subject: report.byline,
      Creator: 'fincheck',
      Producer: 'fincheck (PDFKit)',
      CreationDate: created,
      ModDate: created,
    },
  });
  doc.registerFont('Body', require.resolve('dejavu-fonts-ttf/ttf/DejaVuSans.ttf'));
  doc.registerFont('Bold', require.resolve('dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf'));
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const ended = new Promise<void>((resolve, reject) => {
    doc.on('end', () => resolve());
    doc.on('error', reject);
  });

  const writer = new Writer(doc, svgToPdf, options.figureSvgs);
  writer.title(report.title, report.byline);
  for (const b of report.front) writer.block(b);
  for (const s of report.sections) {
    writer.heading(s.title);
    for (const b of s.blocks) writer.block(b);
  }
  writer.paragraph(report.footer, MUTED, SMALL);
  writer.pageNumbers();
  doc.end();
  await ended;
  return Buffer.concat(chunks);
}

class Writer {
  private readonly width: number;

  constructor(
    private readonly doc: PdfDoc,
    private readonly svgToPdf: SvgToPdf,
    private readonly svgs: FigureSvgs,
  ) {
    this.width = doc.page.width - 2 * MARGIN;
  }

  private get bottom(): number {
    return this.doc.page.height - MARGIN;
  }

  /** Starts a new page unless `height` pt still fit on this one. */
  private room(height: number): void {
    if (this.doc.y + height > this.bottom) this.doc.addPage();
  }

  private text(s: string, font: 'Body' | 'Bold', size: number, colour = INK, gap = 4): void {
    this.doc.font(font).fontSize(size).fillColor(colour);
    this.room(Math.min(this.doc.heightOfString(s, { width: this.width }), 3 * size));
    this.doc.text(s, MARGIN, this.doc.y, { width: this.width, lineGap: 1.5 });
    this.doc.moveDown(gap / size);
  }

  title(title: string, byline: string): void {
    this.text(title, 'Bold', 18, INK, 2);
    this.text(byline, 'Body', SMALL + 0.5, MUTED, 10);
  }

  heading(title: string): void {
    this.room(60);
    this.doc.moveDown(0.6);
    this.text(title, 'Bold', 13, INK, 5);
  }

  paragraph(s: string, colour = INK, size = BODY): void {
    this.text(s, 'Body', size, colour, 6);
  }

  private list(items: readonly string[], x: number, width: number): void {
    this.doc.font('Body').fontSize(BODY).fillColor(INK);
    for (const item of items) {
      this.room(Math.min(this.doc.heightOfString(item, { width: width - 12 }), 3 * BODY));
      const y = this.doc.y;
      this.doc.text('•', x, y, { width: 10 });
      this.doc.text(item, x + 12, y, { width: width - 12, lineGap: 1.5 });
      this.doc.moveDown(0.25);
    }
    this.doc.x = MARGIN;
  }

  private callout(title: string, items: readonly string[], tone: Tone): void {
    const pad = 8;
    const inner = this.width - 2 * pad;
    this.doc.font('Bold').fontSize(BODY);
    let height = this.doc.heightOfString(title, { width: inner }) + 4;
    this.doc.font('Body').fontSize(BODY);
    for (const i of items) height += this.doc.heightOfString(i, { width: inner - 12, lineGap: 1.5 }) + 0.25 * BODY;
    height += 2 * pad;
    this.room(height);
    const top = this.doc.y;
    const fill = TONE_FILL[tone];
    if (fill) this.doc.rect(MARGIN, top, this.width, height).fill(fill);
    this.doc.lineWidth(2).strokeColor(INK).rect(MARGIN, top, this.width, height).stroke();
    this.doc
      .font('Bold')
      .fontSize(BODY)
      .fillColor(INK)
      .text(title, MARGIN + pad, top + pad, { width: inner });
    this.doc.moveDown(0.3);
    this.list(items, MARGIN + pad, inner);
    this.doc.y = top + height + 8;
  }

  /**
   * Column widths: every column gets at least its longest unbreakable word (a number is never wrapped), then the
   * remaining width goes to the columns in proportion to how much more their longest cell needs.
   */
  private columnWidths(columns: readonly TableColumn[], rows: readonly TableRow[]): number[] {
    const pad = 8;
    const minimum: number[] = [];
    const natural: number[] = [];
    columns.forEach((c, k) => {
      const cells = [...rows.map((r) => ({ text: r.cells[k] ?? '', font: 'Body' as const })), { text: c.title, font: 'Bold' as const }];
      let least = 0;
      let full = 0;
      for (const { text, font } of cells) {
        this.doc.font(font).fontSize(SMALL);
        full = Math.max(full, this.doc.widthOfString(text));
        // A number with its unit ("+0.006 %") stays on one line: right-aligned cells are not broken.
        const words = c.align === 'right' && font === 'Body' ? [text] : text.split(/\s+/);
        for (const word of words) least = Math.max(least, this.doc.widthOfString(word));
      }
      minimum.push(least + pad);
      natural.push(Math.max(full, least) + pad);
    });
    const least = minimum.reduce((a, b) => a + b, 0);
    const spare = this.width - least;
    const wanted = natural.reduce((a, b, k) => a + (b - (minimum[k] ?? 0)), 0);
    // Words wider than the page (none in practice): scale everything down.
    if (spare <= 0) return minimum.map((w) => (w * this.width) / least);
    const share = wanted > 0 ? Math.min(1, spare / wanted) : 0;
    const widths = minimum.map((m, k) => m + share * ((natural[k] ?? m) - m));
    const total = widths.reduce((a, b) => a + b, 0);
    return widths.map((w) => (w * this.width) / total);
  }

  private rowHeight(cells: readonly string[], widths: readonly number[], font: 'Body' | 'Bold'): number {
    this.doc.font(font).fontSize(SMALL);
    return Math.max(...cells.map((c, k) => this.doc.heightOfString(c, { width: (widths[k] ?? 10) - 6 }))) + 5;
  }

  private row(
    cells: readonly string[],
    widths: readonly number[],
    align: readonly ('left' | 'right')[],
    font: 'Body' | 'Bold',
    fill: string | null,
  ): void {
    const height = this.rowHeight(cells, widths, font);
    const top = this.doc.y;
    if (fill) this.doc.rect(MARGIN, top, this.width, height).fill(fill);
    this.doc.font(font).fontSize(SMALL).fillColor(INK);
    let x = MARGIN;
    cells.forEach((c, k) => {
      const w = widths[k] ?? 10;
      this.doc.text(c, x + 3, top + 2.5, { width: w - 6, align: align[k] === 'right' ? 'right' : 'left' });
      x += w;
    });
    this.doc
      .lineWidth(0.4)
      .strokeColor(RULE)
      .moveTo(MARGIN, top + height)
      .lineTo(MARGIN + this.width, top + height)
      .stroke();
    this.doc.y = top + height;
  }

  private table(caption: string, columns: readonly TableColumn[], rows: readonly TableRow[], notes: readonly string[]): void {
    const widths = this.columnWidths(columns, rows);
    const align = columns.map((c) => c.align);
    const head = columns.map((c) => c.title);
    const headHeight = this.rowHeight(head, widths, 'Bold');
    const firstRow = rows[0] ? this.rowHeight(rows[0].cells, widths, rows[0].tone === 'unsafe' ? 'Bold' : 'Body') : 0;
    this.room(2 * BODY + headHeight + firstRow);
    this.text(caption, 'Bold', BODY, INK, 3);
    this.row(head, widths, align, 'Bold', '#eeeeee');
    for (const r of rows) {
      const font = r.tone === 'unsafe' || r.tone === 'error' ? 'Bold' : 'Body';
      if (this.doc.y + this.rowHeight(r.cells, widths, font) > this.bottom) {
        this.doc.addPage();
        this.row(head, widths, align, 'Bold', '#eeeeee');
      }
      this.row(r.cells, widths, align, font, r.tone ? TONE_FILL[r.tone] : null);
    }
    this.doc.moveDown(0.4);
    for (const n of notes) this.paragraph(n, MUTED, SMALL);
    this.doc.moveDown(0.3);
  }

  private facts(caption: string, items: readonly [string, string][]): void {
    const rows: TableRow[] = items.map(([term, value]) => ({ cells: [term, value] }));
    const columns: TableColumn[] = [
      { title: 'Quantity', align: 'left' },
      { title: 'Value', align: 'left' },
    ];
    this.table(caption, columns, rows, []);
  }

  private figure(b: Extract<Block, { kind: 'figure' }>): void {
    const height = (this.width * b.height_px) / b.width_px;
    this.doc.font('Body').fontSize(SMALL);
    const captionHeight = this.doc.heightOfString(b.caption, { width: this.width });
    this.room(height + captionHeight + 10);
    const top = this.doc.y;
    const svg = this.svgs.get(b.file);
    if (svg !== undefined) {
      this.svgToPdf(this.doc, svg, MARGIN, top, {
        width: this.width,
        height,
        preserveAspectRatio: 'xMidYMid meet',
        fontCallback: (_family: string, bold: boolean) => (bold ? 'Bold' : 'Body'),
        warningCallback: () => undefined,
      });
    } else {
      this.doc.image(b.png, MARGIN, top, { width: this.width, height });
    }
    this.doc.y = top + height + 4;
    this.paragraph(b.caption, MUTED, SMALL);
    this.doc.moveDown(0.4);
  }

  block(b: Block): void {
    switch (b.kind) {
      case 'paragraph':
        this.paragraph(b.text);
        return;
      case 'list':
        this.list(b.items, MARGIN, this.width);
        this.doc.moveDown(0.3);
        return;
      case 'callout':
        this.callout(b.title, b.items, b.tone);
        return;
      case 'table':
        this.table(b.caption, b.columns, b.rows, b.notes);
        return;
      case 'facts':
        this.facts(b.caption, b.items);
        return;
      case 'figure':
        this.figure(b);
        return;
      default: {
        const never: never = b;
        throw new Error(`report pdf: unknown block ${JSON.stringify(never)}`);
      }
    }
  }

  /** "page n of N" centred under the text on every page (the pages are buffered until the end). */
  pageNumbers(): void {
    const range = this.doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      this.doc.switchToPage(i);
      const bottomMargin = this.doc.page.margins.bottom;
      this.doc.page.margins.bottom = 0;
      this.doc
        .font('Body')
        .fontSize(SMALL)
        .fillColor(MUTED)
        .text(`page ${i + 1} of ${range.count}`, MARGIN, this.doc.page.height - MARGIN / 2 - SMALL, { width: this.width, align: 'center' });
      this.doc.page.margins.bottom = bottomMargin;
    }
  }
}
