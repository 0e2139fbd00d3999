/**
 * Prints the tension schedule to PDF: a hidden window loads the app at `#/schedule?print=1`,
 * gets the project from openInitial(), calls printReady() once laid out; then printToPDF on the
 * paper of the project's display units (print-options.ts) and an atomic write of the PDF.
 */
import { BrowserWindow } from 'electron';
import type { ProjectFile } from '../../solver/index.ts';
import type { HostResult } from '../common/host-contract.ts';
import { writeFileAtomic } from '../store/atomic-write.ts';
import { appPageUrl } from './app-url.ts';
import { hardenWebContents } from './harden.ts';
import type { PrintJobs } from './print-jobs.ts';
import { printWindowOptions } from './window-options.ts';
import { schedulePdfOptions } from './print-options.ts';

export const PRINT_ROUTE = '/schedule?print=1';
// The print page solves the project itself before it reports ready; large models take a while.
const READY_TIMEOUT_MS = 180_000;

export async function printScheduleToPdf(
  project: ProjectFile,
  pdfPath: string,
  ctx: { preloadPath: string; printJobs: PrintJobs; allowedSenders: Set<number> },
): Promise<HostResult<{ path: string }>> {
  const win = new BrowserWindow(printWindowOptions(ctx.preloadPath));
  const id = win.webContents.id;
  hardenWebContents(win.webContents);
  ctx.allowedSenders.add(id);
  const ready = ctx.printJobs.add(id, project, READY_TIMEOUT_MS);
  ready.catch(() => undefined); // awaited below; this only keeps an early failure from going unhandled
  try {
    await win.loadURL(appPageUrl(PRINT_ROUTE));
    await ready;
    const pdf = await win.webContents.printToPDF(schedulePdfOptions(project));
    await writeFileAtomic(pdfPath, pdf);
    return { ok: true, value: { path: pdfPath } };
  } catch (e) {
    return { ok: false, error: `Printing the schedule failed: ${e instanceof Error ? e.message : String(e)}` };
  } finally {
    ctx.printJobs.remove(id);
    ctx.allowedSenders.delete(id);
    win.destroy();
  }
}
