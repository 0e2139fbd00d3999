/**
 * What the desktop print window asks of printToPDF for the tension schedule: the paper of the
 * project's display units (main/common/schedule/paper.ts, the same paper the print page lays the
 * schedule out on and states in its @page rule), portrait, backgrounds printed. The @page rule
 * wins where it is given (preferCSSPageSize), so the PDF, the browser's Print and `stayset
 * schedule --pdf` print the same paper.
 */
import type { ProjectFile } from '../../solver/index.ts';
import { pdfPageSize, schedulePaper } from '../common/schedule/paper.ts';

export interface SchedulePdfOptions {
  pageSize: 'A4' | 'Letter';
  printBackground: true;
  landscape: false;
  preferCSSPageSize: true;
}

export function schedulePdfOptions(project: Pick<ProjectFile, 'display'>): SchedulePdfOptions {
  return { pageSize: pdfPageSize(schedulePaper(project)), printBackground: true, landscape: false, preferCSSPageSize: true };
}
