/**
 * The paper of every printed document (tension schedule, crew sheet, calculation report), one
 * decision for the app, the desktop print window, the browser's print CSS and the CLI's PDF:
 * US Letter with US customary units, A4 with SI (common practice: Letter is the office paper
 * where feet and kips are, A4 elsewhere). The CLI's `--paper` may choose either.
 */
import type { ProjectFile } from '../../../solver/index.ts';
import type { UnitSystem } from '../units/index.ts';
import type { PaperSize } from './schedule-types.ts';

/** The paper that goes with a unit system: 'letter' for US, 'a4' for SI. */
export function paperForUnits(units: UnitSystem): PaperSize {
  return units === 'US' ? 'letter' : 'a4';
}

/** The CSS @page size of a paper (CSS Paged Media: the named sizes "A4" and "letter"), portrait. */
export function cssPageSize(paper: PaperSize): 'A4 portrait' | 'letter portrait' {
  return paper === 'letter' ? 'letter portrait' : 'A4 portrait';
}

/** Chromium's (Electron printToPDF) name of the page size of a paper. */
export function pdfPageSize(paper: PaperSize): 'A4' | 'Letter' {
  return paper === 'letter' ? 'Letter' : 'A4';
}

/**
 * The paper a project's schedule prints on when nothing else chooses it (the desktop print window):
 * that of its display units, SI when absent.
 */
export function schedulePaper(project: Pick<ProjectFile, 'display'>): PaperSize {
  return paperForUnits(project.display?.units ?? 'SI');
}
