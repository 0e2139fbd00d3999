/**
 * End to end in headless Chromium against the real web host: the design actions and the design
 * basis edited in the app on the demo mast, without a text editor. An ancillary, a second patch
 * wind and a guy-loss case are added in the Actions tab (each edit one undo step, a bad node
 * refused with a message naming the entry), the wind basis shows q = ½ρV², the analysis runs and
 * the cases the actions add are offered in the results; then the check format is switched and the
 * combinations are built with the button.
 *
 * References: the same edits applied in Node to the same file — the case ids the solver makes for
 * them (actionCaseIds), the combinations of buildCombinations (the library function behind
 * `stayset combine`), and q = ½ρV² by hand.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { ProjectFile } from '../../solver/index.ts';
import { actionCaseIds, applyBuiltCombinations, buildCombinations, resolveDesignBasis } from '../../solver/index.ts';
import { startWebHost, type WebHost } from '../../main/web/web-server.ts';
import { launchBrowser, type Browser } from './browser.ts';
import { buildRenderer, REPO, SCREENSHOTS } from './serve-app.ts';

let root: string;
let file: string;
let host: WebHost;
let browser: Browser;
let page: Page;
let demo: ProjectFile;
const pageErrors: string[] = [];

const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, name) });
const saved = async () => JSON.parse(await readFile(file, 'utf8')) as ProjectFile;

beforeAll(async () => {
  await mkdir(SCREENSHOTS, { recursive: true });
  root = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-actions-'));
  const staticDir = await buildRenderer(path.join(root, 'renderer'));
  demo = JSON.parse(await readFile(path.join(REPO, 'assets', 'demo-mast.stayset'), 'utf8')) as ProjectFile;
  // Without the demo's own ancillaries and loss cases, so the entries added here are the first of their lists.
  delete demo.ancillaries;
  delete demo.memberLoss;
  file = path.join(root, 'mast.stayset');
  await writeFile(file, JSON.stringify(demo, null, 2));
  host = await startWebHost({ root, staticDir, assetsDir: null, userDataDir: path.join(root, 'data'), port: 0, initialPath: file });
  browser = await launchBrowser();
  page = await browser.context.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('console', (m) => { if (m.type() === 'error' && !m.text().includes('404')) pageErrors.push(m.text()); });
  await page.goto(host.url);
  await page.getByTestId('project-name').filter({ hasText: 'mast' }).waitFor({ timeout: 20_000 });
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await host?.close();
  if (root) await rm(root, { recursive: true, force: true });
});

async function setField(list: string, index: number, field: string, text: string): Promise<void> {
  const input = page.locator(`[data-testid="${list}"] [data-entry="${index}"] [data-field="${field}"]`);
  if ((await input.evaluate((el) => el.tagName)) === 'SELECT') await input.selectOption(text);
  else {
    await input.fill(text);
    await input.press('Enter');
  }
}
const undoTitle = () => page.getByTestId('undo').getAttribute('title');

describe('design actions and design basis in the app', () => {
  it('adds an ancillary, a patch wind and a guy loss on the demo mast, runs, and offers their cases', async () => {
    const top = demo.nodes.reduce((a, b) => (b.at[2] > a.at[2] ? b : a)).id;
    await page.getByTestId('right-tab-actions').click();
    await page.getByTestId('actions-panel').waitFor();

    // Ancillary: starts at the mast top; drag area and mass typed with units; one undo step each.
    await page.getByTestId('ancillaries-add').click();
    await expect.poll(() => page.locator('[data-testid="ancillaries"] [data-entry="0"] .summary').textContent()).toBe(`antenna, at ${top}`);
    await setField('ancillaries', 0, 'dragArea', '2.5');
    await setField('ancillaries', 0, 'mass', '80 kg');
    await expect.poll(undoTitle).toContain('Ancillaries "A1"');
    await setField('ancillaries', 0, 'mass', '95');
    expect(await page.locator('[data-testid="ancillaries"] [data-entry="0"] [data-field="mass"]').inputValue()).toBe('95');
    await page.getByTestId('undo').click();
    expect(await page.locator('[data-testid="ancillaries"] [data-entry="0"] [data-field="mass"]').inputValue()).toBe('80');
    // A node that does not exist: refused, the file validator's message names the entry.
    await setField('ancillaries', 0, 'node', 'no such node');
    expect(await page.getByTestId('ancillaries-errors').textContent()).toContain('ancillaries[0] "A1": node "no such node" does not exist');
    expect(await page.locator('[data-testid="ancillaries"] [data-entry="0"] [data-field="node"]').inputValue()).toBe(top);
    await setField('ancillaries', 0, 'mass', 'heavy');
    expect(await page.getByTestId('ancillaries-errors').textContent()).toContain('ancillaries[0] "A1" mass: "heavy"');
    await shot('59-ancillary.png');

    // Patch wind on "wind 60" (the demo has one on "wind 0"), patch factor 1.4.
    await page.getByTestId('patch-wind-add').click();
    await setField('patch-wind', 1, 'id', 'patch 60');
    await setField('patch-wind', 1, 'meanCase', 'wind 60');
    await setField('patch-wind', 1, 'patchFactor', '1.4');
    await setField('patch-wind', 1, 'patchFactor', '0.8');
    expect(await page.getByTestId('patch-wind-errors').textContent()).toContain('patchWind[1] "patch 60" patch factor: "0.8" must be > 1');

    // Guy loss: each guy of the top level in turn, from the wind case, 5 % damping.
    await page.getByTestId('member-loss-add').click();
    await setField('member-loss', 0, 'id', 'guy loss');
    await setField('member-loss', 0, 'fromCase', 'wind 0');
    await setField('member-loss', 0, 'group', 'mast/guys level 3');
    await setField('member-loss', 0, 'dampingRatio', '0.05');
    await shot('60-actions-tab.png');

    // Saved file = the same edits made in Node.
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(0);
    const file1 = await saved();
    const expected: ProjectFile = {
      ...demo,
      ancillaries: [{ id: 'A1', kind: 'antenna', node: top, dragArea: 2.5, mass: 80 }],
      patchWind: [...demo.patchWind!, { id: 'patch 60', meanCase: 'wind 60', patchFactor: 1.4 }],
      memberLoss: [{ id: 'guy loss', fromCase: 'wind 0', group: 'mast/guys level 3', dampingRatio: 0.05 }],
    };
    expect(file1.ancillaries).toEqual(expected.ancillaries);
    expect(file1.patchWind).toEqual(expected.patchWind);
    expect(file1.memberLoss).toEqual(expected.memberLoss);

    // The wind basis of a case and its velocity pressure at 10 m: q = ½ · 1.225 · 30² = 551.25 Pa (by hand), printed to the pressure resolution of 1 Pa.
    await page.getByTestId('right-tab-loads').click();
    await page.getByTestId('load-case-select').selectOption('wind 60');
    expect(await page.getByTestId('wind-q10').textContent()).toContain('= 551 Pa');
    expect(await page.locator('[data-testid="wind-basis"] [data-field="velocity"]').inputValue()).toBe('mean');
    await shot('61-wind-basis.png');

    // Run: the cases the actions add are in the results, as the solver names them.
    await page.getByTestId('run').click();
    await expect.poll(async () => (await page.getByTestId('analysis-state').textContent()) ?? '', { timeout: 240_000 }).toMatch(/cases converged|not converged/);
    const offered = await page.getByTestId('case-select').locator('option').evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value));
    const added = actionCaseIds(expected);
    expect(added).toContain('patch 60 max');
    expect(added.filter((id) => id.startsWith('guy loss / ')).length).toBe(3);
    for (const id of added) expect(offered).toContain(id);
    await page.getByTestId('case-select').selectOption(added.find((id) => id.startsWith('guy loss / '))!);
    await shot('62-guy-loss-case.png');
    // In US units the ancillary's mass reads in lb (80 kg / 0.45359237 kg/lb, NIST SP 811).
    await page.getByTestId('units-us').click();
    await page.getByTestId('right-tab-actions').click();
    await page.getByTestId('ancillaries-open-0').click();
    expect(await page.locator('[data-testid="ancillaries"] [data-entry="0"] [data-field="mass"]').inputValue()).toBe(String(Number((80 / 0.45359237).toPrecision(6))));
    await shot('64-ancillary-us-units.png');
    await page.getByTestId('units-si').click();
    expect(pageErrors).toEqual([]);
  }, 360_000);

  it('switches the check format and builds the combinations of the design basis with the button', async () => {
    await page.getByTestId('right-tab-project').click();
    const basis = page.getByTestId('design-basis');
    await basis.waitFor();
    await page.getByTestId('basis-format').selectOption('allowable');
    await expect.poll(undoTitle).toContain('Check format');
    // The allowable format shows its safety factors with their defaults.
    expect(await basis.locator('[data-field="allowable.cableSafetyFactor"]').getAttribute('placeholder')).toBe('2 (default)');
    await basis.locator('[data-case="ice + wind"] [data-field="action"]').selectOption('iceWithWind');
    await page.getByTestId('build-combinations').click();
    await page.getByTestId('build-result').waitFor();
    await shot('63-design-basis.png');
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(0);
    const file2 = await saved();
    // The same in Node: format, the action, then buildCombinations + applyBuiltCombinations.
    const reference: ProjectFile = {
      ...demo,
      designBasis: { ...demo.designBasis!, format: 'allowable' },
      loadCases: demo.loadCases.map((c) => (c.id === 'ice + wind' ? { ...c, action: 'iceWithWind' } : c)),
    };
    const built = buildCombinations(reference, resolveDesignBasis(reference), { withAccompanying: true });
    expect(built.combinations.length).toBeGreaterThan(0);
    expect(file2.designBasis?.format).toBe('allowable');
    expect(file2.loadCases.find((c) => c.id === 'ice + wind')?.action).toBe('iceWithWind');
    expect(file2.combinations).toEqual(applyBuiltCombinations(reference, built).combinations);
    expect(await page.getByTestId('build-result').textContent()).toContain(`${built.combinations.length} combination`);
    // One undo step takes the build back.
    await page.getByTestId('undo').click();
    expect((await page.getByTestId('undo').getAttribute('title')) ?? '').toContain('Action of ice + wind');
    expect(pageErrors).toEqual([]);
  }, 120_000);
  it('edits check rules, section design data, support displacements and bare guys in the app', async () => {
    // Check rules: a minimum tension on the guys, refused share named by entry, then 2 % of breaking.
    await page.getByTestId('right-tab-checks').click();
    const n = demo.checks?.minimumTension?.length ?? 0;
    await page.getByTestId('minimum-tension-add').click();
    await setField('minimum-tension', n, 'shareOfBreaking', '2');
    expect(await page.getByTestId('minimum-tension-errors').textContent()).toContain(`checks.minimumTension[${n}] share of MBL: "2" must be a share from 0 to 1`);
    await setField('minimum-tension', n, 'shareOfBreaking', '0.02');
    await expect.poll(undoTitle).toContain('Minimum tension');
    await shot('65-check-rules.png');

    // A second rule after it; then rule n (now a middle row) removed and brought back by undo: each
    // row keeps its renderer-side key, and the open row stays open on its own entry.
    const row = (i: number) => page.locator(`[data-testid="minimum-tension"] [data-entry="${i}"]`);
    const keyOfN = await row(n).getAttribute('data-key');
    await page.getByTestId('minimum-tension-add').click();
    const keyAdded = await row(n + 1).getAttribute('data-key');
    expect(keyAdded).not.toBe(keyOfN);
    expect(await row(n + 1).locator('.fields').count()).toBe(1); // an added row opens
    await page.getByTestId(`minimum-tension-remove-${n}`).click();
    await expect.poll(() => row(n).getAttribute('data-key')).toBe(keyAdded);
    expect(await row(n).locator('.fields').count()).toBe(1);
    await page.getByTestId('undo').click();
    await expect.poll(() => row(n + 1).getAttribute('data-key')).toBe(keyAdded);
    expect(await row(n).getAttribute('data-key')).toBe(keyOfN);
    expect(await row(n + 1).locator('.fields').count()).toBe(1);
    expect(await row(n).locator('.fields').count()).toBe(0);
    await page.getByTestId('undo').click(); // and the second rule's addition
    await expect.poll(() => page.locator('[data-testid="minimum-tension"] [data-entry]').count()).toBe(n + 1);

    // Section data under the sections table: yield strength of the leg tube in MPa.
    await page.getByTestId('tab-sections').click();
    await page.getByTestId('section-open-0').click();
    await setField('section', 0, 'yieldStrength', '235');
    await shot('66-section-data.png');

    // Case loads: a settlement of the base in the dead case, the guys of level 1 bare of ice.
    await page.getByTestId('right-tab-loads').click();
    expect(await page.getByTestId('right-tab-loads').textContent()).toBe('Case loads');
    await page.getByTestId('load-case-select').selectOption('dead');
    await page.getByTestId('displacement-add').click();
    await setField('displacement', 0, 'z', '-15');
    await setField('displacement', 0, 'rz', '0.01');
    expect(await page.getByTestId('displacement-errors').textContent()).toContain('displacements[0]: node "mast/base" is not restrained in rz');
    await page.getByTestId('displacements').scrollIntoViewIfNeeded();
    await shot('67-support-displacement.png');
    await page.getByTestId('load-case-select').selectOption('ice + wind');
    const bare = demo.groups!.find((g) => g.id === 'mast/guys level 1')!.members.slice(0, 3);
    const input = page.locator('[data-testid="ice-editor"] [data-field="ice.bareMembers"]');
    await input.fill(bare.join(', '));
    await input.press('Enter');
    await page.getByTestId('ice-editor').scrollIntoViewIfNeeded();
    await shot('68-ice-bare-guys.png');

    // An ancillary iced as a coat on a round body: the per-thickness fields give way to the coat's.
    await page.getByTestId('right-tab-actions').click();
    const k = (await saved()).ancillaries?.length ?? 0;
    await page.getByTestId('ancillaries-add').click();
    await setField('ancillaries', k, 'iceBehaviour', 'coat');
    await setField('ancillaries', k, 'coatWidth', '300'); // a small length: mm
    expect(await page.locator(`[data-testid="ancillaries"] [data-entry="${k}"] [data-field="iceMass"]`).count()).toBe(0);
    await shot('69-ancillary-ice-coat.png');

    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(0);
    const file3 = await saved();
    expect(file3.ancillaries?.[k]).toMatchObject({ iceBehaviour: 'coat', coatWidth: 0.3, coatLength: 1 });
    expect(file3.checks?.minimumTension?.[n]).toEqual({ group: 'mast/guys level 1', shareOfInstallation: 0.1, shareOfBreaking: 0.02 });
    expect(file3.sections[0]).toEqual({ ...demo.sections[0], yieldStrength: 235e6 });
    expect(file3.loadCases.find((c) => c.id === 'dead')?.displacements).toEqual([{ node: 'mast/base', z: -0.015 }]);
    expect(file3.loadCases.find((c) => c.id === 'ice + wind')?.ice).toEqual({ ...demo.loadCases.find((c) => c.id === 'ice + wind')!.ice, bareMembers: bare });
    expect(pageErrors).toEqual([]);
  }, 120_000);
});
