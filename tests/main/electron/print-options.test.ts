// The desktop print window prints the schedule on the paper of the project's display units, the
// paper the print page lays it out on and the @page rule states (A4 for SI, US Letter for US —
// common practice), as the browser edition's print CSS and `stayset schedule --pdf` do.
import { describe, expect, it } from 'vitest';
import { schedulePdfOptions } from '../../../main/electron/print-options.ts';
import { cssPageSize, paperForUnits, pdfPageSize, schedulePaper } from '../../../main/common/schedule/paper.ts';
import { scheduleCss } from '../../../main/common/schedule/schedule-html.ts';
import { printCss } from '../../../main/common/report/print-css.ts';
import type { ScheduleDocument } from '../../../main/common/schedule/schedule-types.ts';

const doc = (paper: 'a4' | 'letter') => ({ paper, header: { projectName: 'P', issueDate: '2026-01-01' } }) as unknown as ScheduleDocument;

describe('paper of printed documents', () => {
  it('US customary units print on US Letter, SI on A4; a project without display units is SI', () => {
    expect(paperForUnits('US')).toBe('letter');
    expect(paperForUnits('SI')).toBe('a4');
    expect(schedulePaper({})).toBe('a4');
    expect(schedulePaper({ display: { units: 'US' } })).toBe('letter');
  });

  it('printToPDF gets the page size of that paper (Letter / A4) and keeps the page @page rule', () => {
    expect(schedulePdfOptions({ display: { units: 'US' } })).toEqual({ pageSize: 'Letter', printBackground: true, landscape: false, preferCSSPageSize: true });
    expect(schedulePdfOptions({ display: { units: 'SI' } }).pageSize).toBe('A4');
    expect(schedulePdfOptions({}).pageSize).toBe('A4');
  });

  it('the page size names agree: the CSS @page size of the schedule and the reports, and Chromium’s page size', () => {
    for (const paper of ['a4', 'letter'] as const) {
      const css = cssPageSize(paper);
      expect(scheduleCss(doc(paper))).toContain(`@page { size: ${css};`);
      expect(printCss({ paper, footer: 'f', caution: 'c' })).toContain(`@page { size: ${css};`);
      // CSS Paged Media names "A4" and "letter"; Chromium's printToPDF names "A4" and "Letter".
      expect(css.split(' ')[0].toLowerCase()).toBe(pdfPageSize(paper).toLowerCase());
    }
  });
});
