/**
 * The programs the end-to-end suites drive: Debian's Chromium (playwright-core) and poppler's
 * pdftoppm / pdftotext. A missing program fails the suite with a message that says what to
 * install; the suites are skipped only when STAYSET_SKIP_BROWSER_TESTS=1 is set on purpose.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const CHROMIUM = process.env.STAYSET_CHROMIUM ?? '/usr/bin/chromium';

/** True when the browser suites are switched off deliberately (STAYSET_SKIP_BROWSER_TESTS=1). */
export const SKIP_BROWSER_TESTS = process.env.STAYSET_SKIP_BROWSER_TESTS === '1';

export type BrowserTool = 'chromium' | 'poppler';

function hasProgram(name: string): boolean {
  try {
    execFileSync(name, ['-v'], { stdio: 'ignore' });
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code !== 'ENOENT';
  }
}

/** Throws naming every missing program and how to install it (or how to skip on purpose). */
export function requireBrowserTools(tools: readonly BrowserTool[]): void {
  const missing: string[] = [];
  if (tools.includes('chromium') && !existsSync(CHROMIUM)) missing.push(`Chromium (${CHROMIUM}; package chromium, or set STAYSET_CHROMIUM)`);
  if (tools.includes('poppler') && !(hasProgram('pdftoppm') && hasProgram('pdftotext'))) missing.push('pdftoppm/pdftotext (package poppler-utils)');
  if (missing.length === 0) return;
  throw new Error(`end-to-end tests need ${missing.join(' and ')}: install them (apt-get install -y chromium poppler-utils), `
    + 'or set STAYSET_SKIP_BROWSER_TESTS=1 to skip the browser suites deliberately');
}
