/**
 * HTML → PDF through headless Chromium (playwright-core driving the system browser, as the e2e
 * tests do). The browser is STAYSET_CHROMIUM or /usr/bin/chromium. playwright-core is loaded only
 * when a PDF is asked for. Page size and margins come from the document's @page rule.
 */
import { existsSync } from 'node:fs';

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
