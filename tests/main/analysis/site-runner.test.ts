/**
 * Site requests run in the analysis worker give the same results as the solver called in this
 * process (the app and the CLI show one set of numbers), a document request returns the crew
 * sheet, bad input comes back as a message naming the entry, and a newer request cancels the older.
 */
import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { runSequence } from '../../../solver/index.ts';
import { SiteRunner } from '../../../main/analysis/site-runner.ts';
import { parseProjectText } from '../../../main/common/project/index.ts';

const demo = parseProjectText(readFileSync('assets/demo-mast.stayset', 'utf8'));
if (!demo.ok) throw new Error('demo mast does not parse');
const project = demo.project;
const runner = new SiteRunner();
afterAll(() => runner.dispose());

describe('SiteRunner', () => {
  it('runs a sequence in the worker with the numbers of runSequence in process', async () => {
    const r = await runner.run(project, { kind: 'sequence', id: 'top down' });
    expect(r.ok, r.ok ? '' : r.error).toBe(true);
    if (!r.ok || r.value.kind !== 'sequence') throw new Error('no sequence result');
    const local = runSequence(project, 'top down');
    expect(r.value.result.stages.map((s) => s.settings.map((x) => x.value))).toEqual(local.stages.map((s) => s.settings.map((x) => x.value)));
  }, 120_000);

  it('builds the crew sheet and names an unknown set', async () => {
    const sheet = await runner.run(project, { kind: 'crewSheet', id: 'top down', units: 'SI', paper: 'a4', issueDate: '2026-12-02' });
    if (!sheet.ok || sheet.value.kind !== 'document') throw new Error(sheet.ok ? 'not a document' : sheet.error);
    expect(sheet.value.html).toContain('qualified engineer');
    expect(sheet.value.title).toContain('crew sheet top down');
    const bad = await runner.run(project, { kind: 'asbuilt', id: 'nope' });
    expect(bad).toMatchObject({ ok: false, error: expect.stringContaining('"nope" does not exist') });
  }, 120_000);

  it('a newer request cancels the running one', async () => {
    const first = runner.run(project, { kind: 'asbuilt', id: 'handover' });
    const second = runner.run(project, { kind: 'sequence', id: 'bottom up' });
    expect(await first).toMatchObject({ ok: false, error: expect.stringContaining('cancelled') });
    expect((await second).ok).toBe(true);
  }, 120_000);
});
