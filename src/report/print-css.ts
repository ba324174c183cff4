/**
 * Styles of the HTML report. Screen: one readable column. Print (A4, 15 mm margins, 180 mm of text
 * width): 10 pt text, figures the full text width and never split, headings kept with what follows,
 * table headers repeated on each page. Meaning never rests on colour alone: verdicts and severities are
 * words in the cells, the colour tints only help; the cautions box has a heavy black border that
 * survives black-and-white printing.
 */
export const REPORT_CSS = `
:root { color-scheme: light; }
* { box-sizing: border-box; }
body { margin: 0; background: #ffffff; color: #1a1a1a; font-family: "DejaVu Sans", "Helvetica Neue", Arial, sans-serif; font-size: 15px; line-height: 1.45; }
main { max-width: 980px; margin: 0 auto; padding: 24px 28px 40px; }
header h1 { font-size: 26px; margin: 0 0 4px; }
.byline { margin: 0 0 16px; color: #444444; }
h2 { font-size: 20px; margin: 28px 0 10px; padding-bottom: 3px; border-bottom: 1px solid #999999; }
p, ul { margin: 8px 0; }
ul { padding-left: 22px; }
.callout { border: 3px solid #000000; padding: 10px 16px; margin: 14px 0; background: #fff8e1; }
.callout.tone-ok { background: #eef7ee; }
.callout.tone-marginal { background: #fff4d6; }
.callout.tone-unsafe { background: #fde8e4; }
.callout-title { font-weight: bold; font-size: 17px; margin: 2px 0 6px; }
.callout li { margin: 3px 0; }
.table-block { margin: 12px 0 16px; overflow-x: auto; }
table { border-collapse: collapse; width: 100%; font-size: 13.5px; }
caption { text-align: left; font-weight: bold; padding: 4px 0; }
th, td { border-top: 1px solid #c8c8c8; border-bottom: 1px solid #c8c8c8; padding: 4px 8px; vertical-align: top; }
thead th { border-bottom: 2px solid #333333; text-align: left; }
th.num, td.num { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
table.facts th { text-align: left; font-weight: normal; color: #333333; width: 38%; }
tr.tone-ok td { background: #f1f8f1; }
tr.tone-marginal td { background: #fff6dc; }
tr.tone-unsafe td, tr.tone-error td { background: #fdeae6; font-weight: bold; }
tr.tone-warning td { background: #fff6dc; }
.note { font-size: 13px; color: #333333; margin: 4px 0; }
figure { margin: 16px 0 22px; }
figure img { display: block; width: 100%; height: auto; border: 1px solid #d0d0d0; }
figcaption { font-size: 13px; margin-top: 6px; color: #222222; }
footer { margin-top: 28px; padding-top: 8px; border-top: 1px solid #999999; font-size: 13px; color: #333333; }
@page { size: A4; margin: 15mm 15mm 17mm; }
@media print {
  body { font-size: 10pt; line-height: 1.35; }
  main { max-width: none; padding: 0; }
  header h1 { font-size: 17pt; }
  h2 { font-size: 13pt; margin-top: 16pt; break-after: avoid; page-break-after: avoid; }
  table { font-size: 8.5pt; }
  .table-block { overflow: visible; }
  thead { display: table-header-group; }
  tr, figure, .callout, table.facts { break-inside: avoid; page-break-inside: avoid; }
  figure img { max-height: 120mm; width: 100%; object-fit: contain; }
  figcaption, .note { font-size: 8.5pt; }
  .callout, tr td { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}
`;
