/**
 * HTML → PDF through headless Chromium (playwright-core driving the system browser, as the e2e
 * tests do). The browser is STAYSET_CHROMIUM or /usr/bin/chromium. playwright-core is loaded only
 * when a PDF is asked for. Page size and margins come from the document's @page rule.
 */
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { writeFileAtomic } from '../store/atomic-write.ts';
import type { CliIO } from './cli-io.ts';

export const DEFAULT_CHROMIUM = '/usr/bin/chromium';

export async function printPdf(html: string): Promise<Uint8Array> {
  const executablePath = process.env.STAYSET_CHROMIUM ?? DEFAULT_CHROMIUM;
  if (!existsSync(executablePath)) throw new Error(`no Chromium at ${executablePath} (set STAYSET_CHROMIUM, or write --html and print it from a browser)`);
  const { chromium } = await import('playwright-core');
  const browser = await chromium.launch({ executablePath, headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'] });
  try {
    const page = await browser.newPage();
    await page.setContent(html, { waitUntil: 'load' });
    return await page.pdf({ printBackground: true, preferCSSPageSize: true });
  } finally {
    await browser.close();
  }
}

/**
 * Prints `html` to `pdfOut` (relative to io.cwd) atomically and says so on stderr; on failure says
 * why (naming `file`, the project) and leaves any existing file unchanged. True when written.
 */
export async function writePdfOutput(io: CliIO, file: string, pdfOut: string, html: string): Promise<boolean> {
  try {
    await writeFileAtomic(resolve(io.cwd, pdfOut), await printPdf(html));
  } catch (e) {
    io.err(`${file}: printing the PDF failed: ${(e as Error).message}; existing files are unchanged\n`);
    return false;
  }
  io.err(`wrote ${pdfOut}\n`);
  return true;
}
