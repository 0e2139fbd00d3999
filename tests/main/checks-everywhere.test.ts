// One report everywhere: the CLI `check --json`, the app's Checks tab (checks store + the row
// formatter its CheckSummary uses) and the schedule give the same rows — format, case, purpose,
// item, value, limit, ratio and source — for a demo with a failing check; and for the demo mast
// after a slider drag ends (its pretension committed) and the analysis runs, the checks the
// analysis worker sends with the solve are shown as they are (none run on the UI thread).
import { readFileSync } from 'node:fs';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { runChecks, solveProject } from '../../solver/index.ts';
import { checkRow } from '../../main/common/checks/check-text.ts';
import { buildSchedule } from '../../main/common/schedule/build-schedule.ts';
import { scheduleHtml } from '../../main/common/schedule/schedule-html.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { useResultsStore } from '../../renderer/stores/results.ts';
import { useChecksStore } from '../../renderer/stores/checks.ts';
import { spawnSync } from 'node:child_process';
import { BIN, runStayset } from './cli/run-stayset.ts';
import { AnalysisRunner } from '../../main/analysis/analysis-runner.ts';
import type { AnalysisDone } from '../../main/common/host-contract.ts';
import { CHECKS_MARK } from '../../renderer/stores/checks.ts';
import { commitPretension } from '../../renderer/tuning/tuning-edits.ts';

function analyse(project: ProjectFile): Promise<AnalysisDone> {
  return new Promise((resolve) => {
    const runner = new AnalysisRunner({ progressIntervalMs: 1000, onProgress: () => undefined, onDone: (d) => resolve(d) });
    runner.start(project);
  });
}

describe('the same check results in the CLI, the Checks tab and the schedule', () => {
  it('demo canopy with a tight serviceability displacement limit', () => {
    const p = JSON.parse(readFileSync('assets/demo-canopy.stayset', 'utf8')) as ProjectFile;
    p.checks = { ...p.checks, displacementLimits: [{ node: 'canopy/N11-0', limit: 0.05 }] };
    const dir = mkdtempSync(path.join(tmpdir(), 'stayset-checks-'));
    const file = path.join(dir, 'tight.stayset');
    writeFileSync(file, JSON.stringify(p));

    const cli = runStayset(['check', file, '--json']);
    expect(cli.code).toBe(3);
    const cliRows = JSON.parse(cli.stdout).rows;

    const report = solveProject(p).report;
    setActivePinia(createPinia());
    useProjectStore().load({ path: file, name: 'tight.stayset', project: p });
    const results = useResultsStore();
    results.started(useProjectStore().revision, p);
    results.onFinished({ runId: 'a', status: 'done', report });
    const tab = useChecksStore().report!;
    const appRows = tab.results.map((r) => checkRow(r, 'SI'));

    const doc = buildSchedule({ project: p, report, checks: runChecks(p, report) }, { issueDate: '2026-12-02', units: 'SI' });
    // The schedule lists cables in full (the default): passing rows of other members are summarised.
    const summarised = new Set(p.members.filter((m) => m.kind !== 'cable').map((m) => m.id));
    expect(doc.checkRows).toEqual(appRows.filter((r) => r.verdict === 'FAIL' || !summarised.has(r.item)));
    expect(cliRows).toEqual(appRows);
    const failing = appRows.find((r) => r.check === 'displacement')!;
    expect(failing).toMatchObject({ item: 'canopy/N11-0', purpose: 'serviceability', format: 'limit state', verdict: 'FAIL', source: 'project file (checks.displacementLimits)' });
    // The printed schedule carries the basis with its sources and the same row.
    const html = scheduleHtml(doc);
    expect(html).toContain('Design basis');
    expect(html).toContain('EN 1993-1-11 §6.2');
    expect(html).toContain(failing.ratio);
  });

  it('demo mast after a slider drag ends: the analysis worker\'s checks, shown without a run on the UI thread, are the CLI\'s', async () => {
    const level = 'mast/guys level 1';
    const demo = JSON.parse(readFileSync('assets/demo-mast.stayset', 'utf8')) as ProjectFile;
    const tuned: ProjectFile = { ...demo, tuning: { ...demo.tuning, variables: [...(demo.tuning?.variables ?? []), { group: level, by: 'pretension' }], targets: demo.tuning?.targets ?? [] } };
    const p0 = tuned.members.find((m) => m.id === 'mast/guy L1-1')!.pretension!;
    const released = commitPretension(tuned, level, 1.4 * p0);
    const dir = mkdtempSync(path.join(tmpdir(), 'stayset-checks-'));
    const file = path.join(dir, 'released.stayset');
    writeFileSync(file, JSON.stringify(released));
    // The demo mast's report is larger than spawnSync's default 1 MB of output.
    const cli = spawnSync(process.execPath, [BIN, 'check', file, '--json'], { encoding: 'utf8', timeout: 120_000, maxBuffer: 256 * 1024 * 1024 });
    expect(cli.status, cli.stderr).toBe(0);
    const cliRows = JSON.parse(cli.stdout).rows;

    const done = await analyse(released);
    expect(done.status, done.error).toBe('done');
    expect(done.checks?.report).toBeTruthy();
    setActivePinia(createPinia());
    performance.clearMarks(CHECKS_MARK);
    useProjectStore().load({ path: file, name: 'released.stayset', project: released });
    const results = useResultsStore();
    results.started(useProjectStore().revision, released);
    results.onFinished(done);
    const tab = useChecksStore().report!;
    expect(performance.getEntriesByName(CHECKS_MARK)).toHaveLength(0);
    expect(tab.results.map((r) => checkRow(r, 'SI'))).toEqual(cliRows);
  }, 120_000);
});
