/**
 * Print CSS of the crew sheet and the calculation report: A4 or US Letter portrait, black and
 * white, the caution in the top margin of every page and "page N of M" with a footer at the
 * bottom (CSS Paged Media margin boxes, printed by Chromium), table headers repeating on every
 * page, rows never split.
 */
import type { PaperSize } from '../schedule/schedule-types.ts';
import { cssPageSize } from '../schedule/paper.ts';

/** A CSS string, not HTML: drop quotes, backslashes, angle brackets and line breaks. */
const cssText = (t: string) => t.replace(/["\\<>\r\n]/g, '');

export function printCss(o: { paper: PaperSize; footer: string; caution: string; header?: string }): string {
  const size = cssPageSize(o.paper);
  return `@page { size: ${size}; margin: 16mm 10mm 14mm 10mm;
  @top-left { content: "${cssText(o.header ?? '')}"; font: 7pt sans-serif; }
  @top-right { content: "CAUTION: ${cssText(o.caution)}"; font: bold 6.5pt sans-serif; width: 60%; text-align: right; }
  @bottom-left { content: "${cssText(o.footer)}"; font: 7pt sans-serif; }
  @bottom-right { content: "page " counter(page) " of " counter(pages); font: 7pt sans-serif; } }
html { color: #000; background: #fff; }
body { font: 8pt/1.3 "DejaVu Sans", "Liberation Sans", Arial, sans-serif; margin: 0; }
h1 { font-size: 14pt; margin: 0 0 2mm; }
h2 { font-size: 11pt; margin: 5mm 0 1.5mm; border-bottom: 1.5pt solid #000; break-after: avoid; }
h3 { font-size: 9.5pt; margin: 4mm 0 1mm; break-after: avoid; }
.caution { border: 2.5pt solid #000; padding: 2mm 3mm; margin: 2mm 0 3mm; font-size: 9.5pt; font-weight: bold; }
.caution::before { content: "CAUTION — "; }
table { border-collapse: collapse; width: 100%; margin: 0 0 3mm; }
caption { text-align: left; font-weight: bold; padding: 1mm 0; caption-side: top; }
thead { display: table-header-group; }
tr { break-inside: avoid; }
th, td { border: 0.6pt solid #000; padding: 0.6mm 1mm; vertical-align: top; }
thead th { border-bottom: 1.5pt solid #000; text-align: left; }
.num { text-align: right; font-variant-numeric: tabular-nums; }
small { font-size: 6.5pt; }
.fail { font-weight: bold; text-decoration: underline; }
table.meta { width: auto; }
table.meta th { text-align: left; padding-right: 4mm; border: none; }
table.meta td { border: none; }
section.page-break { break-before: page; }
@media screen { body { max-width: 190mm; margin: 8mm auto; } }`;
}
