/**
 * Prints a crew sheet or the calculation report to PDF: the HTML comes from the site worker
 * (main/common/site/site-run.ts, the CLI's builders), is loaded into a hidden window with
 * JavaScript off (the documents have no scripts) and printed with the page size of its own @page
 * rule; the PDF is written atomically.
 */
import { BrowserWindow } from 'electron';
import type { HostResult } from '../common/host-contract.ts';
import { writeFileAtomic } from '../store/atomic-write.ts';
import { hardenWebContents } from './harden.ts';

export async function printHtmlToPdf(html: string, pdfPath: string): Promise<HostResult<{ path: string }>> {
  const win = new BrowserWindow({ width: 1000, height: 1400, show: false, webPreferences: { sandbox: true, contextIsolation: true, javascript: false, nodeIntegration: false } });
  hardenWebContents(win.webContents);
  try {
    await win.loadURL(`data:text/html;charset=utf-8,${encodeURIComponent(html)}`);
    const pdf = await win.webContents.printToPDF({ printBackground: true, preferCSSPageSize: true });
    await writeFileAtomic(pdfPath, pdf);
    return { ok: true, value: { path: pdfPath } };
  } catch (e) {
    return { ok: false, error: `Printing failed: ${e instanceof Error ? e.message : String(e)}` };
  } finally {
    win.destroy();
  }
}
