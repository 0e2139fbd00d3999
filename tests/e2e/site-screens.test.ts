/**
 * The site screens end to end, in headless Chromium against the real web host on the demo mast
 * (it carries the sequences "top down" and "bottom up" and the readings "handover"):
 * open Sequence, run "top down" and read every value to set; open As built, run "handover" and
 * read every adjustment. Reference: the CLI on the same file (`stayset sequence --json`,
 * `stayset asbuilt --json`), formatted the way the screens and the crew sheet format them
 * (main/common/units). The crew sheet shown in the app is printed to PDF and
 * rendered with pdftoppm for a look (test-artifacts/site/).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { AsBuiltResult, SequenceResult } from '../../solver/index.ts';
import { formatValue, formatWithUnit } from '../../main/common/units/index.ts';
import { launchBrowser, type Browser } from './browser.ts';
import { requireBrowserTools, SKIP_BROWSER_TESTS } from './browser-tools.ts';
import { buildRenderer, REPO, SCREENSHOTS, startApp, type AppRig } from './serve-app.ts';
import { runStayset } from '../main/cli/run-stayset.ts';

const ARTIFACTS = path.join(REPO, 'test-artifacts', 'site');
let rig: AppRig;
let browser: Browser;
let page: Page;
const pageErrors: string[] = [];
const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, name) });

beforeAll(async () => {
  if (SKIP_BROWSER_TESTS) return;
  requireBrowserTools(['chromium', 'poppler']);
  await mkdir(SCREENSHOTS, { recursive: true });
  await mkdir(ARTIFACTS, { recursive: true });
  await buildRenderer();
  rig = await startApp();
  browser = await launchBrowser();
  page = await browser.context.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('console', (m) => { if (m.type() === 'error' && !m.text().includes('404')) pageErrors.push(m.text()); });
}, 180_000);

afterAll(async () => {
  await browser?.close();
  await rig?.close();
});

describe.skipIf(SKIP_BROWSER_TESTS)('site screens in the browser edition', () => {
  it('Sequence: the values to set are those of `stayset sequence --json`; the crew sheet prints', async () => {
    const cli = runStayset(['sequence', rig.demoPath, '--sequence', 'top down', '--json']);
    expect([0, 3], cli.stderr).toContain(cli.code);
    const expected: SequenceResult = JSON.parse(cli.stdout).sequences[0];
    await page.goto(rig.host.url);
    await expect.poll(() => page.getByTestId('project-name').textContent(), { timeout: 30_000 }).toContain('demo-mast');
    await shot('29-top-bar-site-buttons.png');
    await page.getByTestId('open-sequence').click();
    await page.getByTestId('sequence-choice').selectOption('top down');
    await page.getByTestId('sequence-run').click();
    await page.getByTestId('sequence-results').waitFor({ timeout: 120_000 });
    let compared = 0;
    for (const st of expected.stages) for (const s of st.settings) {
      const want = s.setBy === 'force' ? `${formatValue(s.value, 'force', 'SI')} kN` : `${formatValue(s.value, 'length', 'SI')} m`;
      const cell = page.locator(`tr[data-setting="${st.index}|${s.member}"] td[data-col="value"]`);
      expect(await cell.textContent(), `stage ${st.index} ${s.member}`).toBe(want);
      compared++;
    }
    expect(compared).toBe(9);
    expect(await page.getByTestId('sequence-states').locator('tbody tr').count()).toBeGreaterThanOrEqual(9 + 1);
    expect(await page.getByTestId('sequence-verdict').textContent()).toContain(expected.ok ? 'Every stage passes' : 'Some stage fails');
    await shot('30-site-sequence.png');

    await page.getByTestId('crew-sheet-show').click();
    const frame = page.getByTestId('document-frame');
    await frame.waitFor({ timeout: 120_000 });
    const html = (await frame.getAttribute('srcdoc')) ?? '';
    expect(html).toContain('qualified engineer');
    expect(html).toContain(`${formatValue(expected.stages[0].settings[0].value, 'force', 'SI')} kN`);
    await page.waitForTimeout(300);
    await shot('31-site-crew-sheet.png');
    // Print what the app shows, as the browser's Print would, and render page 1 for a look.
    const printer = await browser.context.newPage();
    await printer.setContent(html);
    const pdf = path.join(ARTIFACTS, 'crew-sheet.pdf');
    await writeFile(pdf, await printer.pdf({ preferCSSPageSize: true, printBackground: true }));
    await printer.close();
    execFileSync('pdftoppm', ['-png', '-r', '60', '-f', '1', '-l', '1', pdf, path.join(ARTIFACTS, 'crew-sheet')]);
    expect(execFileSync('pdftotext', [pdf, '-'], { encoding: 'utf8' })).toMatch(/page 1 of \d+/i);
    await page.getByTestId('document-close').click();
    expect(pageErrors).toEqual([]);
  }, 300_000);

  it('As built: the adjustments are those of `stayset asbuilt --json`', async () => {
    const cli = runStayset(['asbuilt', rig.demoPath, '--set', 'handover', '--json']);
    expect([0, 3], cli.stderr).toContain(cli.code);
    const expected: AsBuiltResult = JSON.parse(cli.stdout).sets[0];
    expect(expected.adjustments.length).toBeGreaterThan(0);
    await page.getByTestId('site-tab-asbuilt').click();
    await page.getByTestId('asbuilt-run').click();
    await page.getByTestId('asbuilt-results').waitFor({ timeout: 120_000 });
    const rows = page.getByTestId('asbuilt-adjustments').locator('tbody tr');
    expect(await rows.count()).toBe(expected.adjustments.length);
    for (const a of expected.adjustments) {
      const row = page.locator(`tr[data-adjustment="${a.member}"]`);
      const mm = formatWithUnit(Math.abs(a.lengthChange), 'smallLength', 'SI');
      expect(await row.locator('td[data-col="change"]').textContent(), a.member).toBe(`${a.lengthChange > 0 ? '+' : '−'}${mm}`);
      expect(await row.locator('td[data-col="target"]').textContent(), a.member).toBe(formatValue(a.targetTension, 'force', 'SI'));
    }
    const unidentified = expected.cables.filter((c) => !c.identified);
    expect(await page.getByTestId('asbuilt-unidentified').count()).toBe(unidentified.length ? 1 : 0);
    await shot('32-site-asbuilt.png');
    // The same result in US units (kip, in), reformatted without a new run.
    await page.getByTestId('site-units-us').click();
    const first = expected.adjustments[0];
    const inches = formatWithUnit(Math.abs(first.lengthChange), 'smallLength', 'US');
    expect(await page.locator(`tr[data-adjustment="${first.member}"] td[data-col="target"]`).textContent()).toBe(formatValue(first.targetTension, 'force', 'US'));
    expect(await page.locator(`tr[data-adjustment="${first.member}"] td[data-col="change"]`).textContent()).toBe(`${first.lengthChange > 0 ? '+' : '−'}${inches}`);
    await shot('32b-site-asbuilt-us.png');
    await page.getByTestId('site-units-si').click();
    expect(pageErrors).toEqual([]);
  }, 300_000);

  it('Report: the calculation report is built by the host and shown for printing', async () => {
    await page.getByTestId('report-show').click();
    const frame = page.getByTestId('document-frame');
    await frame.waitFor({ timeout: 180_000 });
    const html = (await frame.getAttribute('srcdoc')) ?? '';
    expect(html).toContain('Calculation report');
    expect(html).toContain('Governing results per check');
    expect(html).toContain('Tensioning sequence top down');
    expect(html).toContain('qualified engineer');
    await page.waitForTimeout(300);
    await shot('33-site-report.png');
    await page.getByTestId('document-close').click();
    await page.getByTestId('site-close').click();
    expect(await page.getByTestId('site-view').count()).toBe(0);
    expect(pageErrors).toEqual([]);
  }, 300_000);
});
