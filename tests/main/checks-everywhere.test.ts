// One report everywhere: the CLI `check --json`, the app's Checks tab (checks store + the row
// formatter its CheckSummary uses) and the schedule give the same rows — format, case, purpose,
// item, value, limit, ratio and source — for a demo with a failing check.
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
import { runStayset } from './cli/run-stayset.ts';

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
});
