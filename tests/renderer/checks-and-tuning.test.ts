/**
 * The design checks and the tuning slider as the renderer shows them, against the solver run
 * directly: the "Checks" colour mode marks exactly the members runChecks fails; a live slider
 * step shows the same tensions as solving the project with that pretension committed
 * (solveProject); the results store puts the live case in place of the analysed one and only
 * analysis inputs make results stale.
 */
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { CheckResult, ProjectFile, SolveReport } from '../../solver/index.ts';
import { createLiveResolver, runChecks, solveProject } from '../../solver/index.ts';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { buildLineBuffers, memberColour } from '../../renderer/view3d/line-buffers.ts';
import { CHECK_FAIL_COLOUR, CHECK_UNCHECKED_COLOUR, type Rgb } from '../../renderer/view3d/colour-scale.ts';
import { failureTarget } from '../../renderer/design/select-failure.ts';
import { commitPretension, sliderGroups } from '../../renderer/tuning/tuning-edits.ts';
import { useResultsStore } from '../../renderer/stores/results.ts';
import { useChecksStore } from '../../renderer/stores/checks.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { setCableFactor } from '../../renderer/model/check-settings-edits.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;
const LEVEL = 'mast/guys level 1';
let report: SolveReport;

beforeAll(() => {
  report = solveProject(demo).report;
});

describe('checks in the 3D view', () => {
  it('colours exactly the members runChecks fails in the check-fail colour, unchecked in grey', () => {
    // a cable factor of 8 only forces failures (the demo's worst T / MBL is about 0.14).
    const strict = setCableFactor(demo, 8);
    const checks = runChecks(strict, report);
    const failing = new Set(checks.members.filter((m) => m.status === 'fail').map((m) => m.id));
    expect(failing.size).toBeGreaterThan(0);
    const data = buildSceneData(strict, {
      result: report.cases[0], deformationScale: 1, colour: 'checks',
      checks: { members: new Map(checks.members.map((m) => [m.id, m.status])), nodes: new Map(checks.nodes.map((n) => [n.id, n.status])) },
    });
    const c: Rgb = [0, 0, 0];
    data.memberIds.forEach((id, j) => {
      memberColour(data, j, c);
      const status = checks.members.find((m) => m.id === id)?.status;
      if (failing.has(id)) expect(c).toEqual(CHECK_FAIL_COLOUR);
      else if (status !== 'pass' && !report.cases[0].slackMembers.includes(id)) expect(c).toEqual(CHECK_UNCHECKED_COLOUR);
      else expect(c).not.toEqual(CHECK_FAIL_COLOUR);
    });
    // Merged buffers (no per-member objects): every segment of a failing member carries the colour.
    const b = buildLineBuffers(data);
    for (let s = 0; s < b.taut.segmentCount; s++) {
      const red = b.taut.colours[6 * s] === Math.fround(CHECK_FAIL_COLOUR[0]) && b.taut.colours[6 * s + 1] === Math.fround(CHECK_FAIL_COLOUR[1]);
      expect(red).toBe(failing.has(data.memberIds[b.taut.segmentMember[s]]));
    }
  });

  it('a failing tilt check marks both of its nodes as failed nodes of the scene', () => {
    const strict: ProjectFile = { ...demo, checks: { ...demo.checks, tiltLimits: [{ base: 'mast/base', top: 'mast/P49a', limit: 1e-7 }] } };
    const checks = runChecks(strict, report);
    expect(checks.failures.some((f) => f.code === 'tilt')).toBe(true);
    const data = buildSceneData(strict, {
      result: report.cases[1], deformationScale: 1, colour: 'checks',
      checks: { members: new Map(checks.members.map((m) => [m.id, m.status])), nodes: new Map(checks.nodes.map((n) => [n.id, n.status])) },
    });
    const failed = [...data.failedNodes].map((i) => data.nodeIds[i]);
    expect(failed).toEqual(expect.arrayContaining(['mast/base', 'mast/P49a']));
  });

  it('a tilt failure selects both nodes; a non-converged case only switches the case', () => {
    const res = (code: CheckResult['code'], item: string, c: string): CheckResult => ({ code, item, case: c, format: 'limitState', purpose: 'serviceability', quantity: 'ratio', value: 2, limit: 1, ratio: 2, pass: false, source: '' });
    const tilt = failureTarget(demo, res('tilt', 'mast/base→mast/P49a', 'wind 0'));
    expect(tilt).toEqual({ kind: 'node', ids: ['mast/base', 'mast/P49a'], caseId: 'wind 0' });
    expect(failureTarget(demo, res('notConverged', 'hot', 'hot'))).toEqual({ kind: null, ids: [], caseId: 'hot' });
    expect(failureTarget(demo, res('minimumTension', 'mast/guy L1-1', 'cold')).kind).toBe('member');
    expect(failureTarget(demo, res('twist', 'mast/base+mast/P49a', 'cold')).ids).toEqual(['mast/base', 'mast/P49a']);
  });
});

describe('tuning slider', () => {
  const tuned: ProjectFile = { ...demo, tuning: { variables: [{ group: LEVEL, by: 'pretension' }], targets: [] } };

  it('slider bounds are the tuner defaults: [0.01 · P0, 0.5 · MBL] (solver/tuning/tuning-variables.ts)', () => {
    const [g] = sliderGroups(tuned);
    const p0 = demo.members.find((m) => m.id === 'mast/guy L1-1')!.pretension!;
    const mbl = demo.sections.find((s) => s.id === 'mast/guy L1')!.breakingLoad!;
    expect(g.id).toBe(LEVEL);
    expect(g.value).toBeCloseTo(p0, 9);
    expect(g.min).toBeCloseTo(0.01 * p0, 9);
    expect(g.max).toBeCloseTo(0.5 * mbl, 9);
  });

  it('what the live step shows is what the committed project solves to', () => {
    const p = 24_000;
    const live = createLiveResolver(tuned, 'dead', LEVEL);
    live.setPretension(18_000); // a warm start from another slider position first
    const step = live.setPretension(p).result;
    const committed = commitPretension(tuned, LEVEL, p);
    for (const id of ['mast/guy L1-1', 'mast/guy L1-2', 'mast/guy L1-3']) expect(committed.members.find((m) => m.id === id)!.pretension).toBe(p);
    const dead = solveProject(committed).report.cases.find((c) => c.id === 'dead')!;
    for (const id of ['mast/guy L1-1', 'mast/guy L2-1', 'mast/guy L3-1']) {
      const a = step.members.find((m) => m.id === id)!.tensionMax;
      const b = dead.members.find((m) => m.id === id)!.tensionMax;
      expect(Math.abs(a - b) / b).toBeLessThan(1e-6);
    }
    expect(() => commitPretension(tuned, LEVEL, -5)).toThrow(/positive force/);
    expect(() => commitPretension(tuned, 'mast/guys level 2', 5000)).toThrow(/not a pretension variable/);
  });
});

describe('results store with a live case', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('shows the live case in place of the analysed one; the next analysis clears it', () => {
    const r = useResultsStore();
    r.started(1, demo);
    r.onFinished({ runId: 'a', status: 'done', report });
    const live = createLiveResolver(demo, 'dead', LEVEL).setPretension(30_000).result;
    r.setLive({ caseId: 'dead', group: LEVEL, pretension: 30_000, result: live });
    expect(r.currentCase).toBe(live);
    expect(r.effectiveReport!.cases[0]).toBe(live);
    expect(r.effectiveReport!.cases[1]).toBe(report.cases[1]);
    r.started(2, demo);
    r.onFinished({ runId: 'b', status: 'done', report });
    expect(r.currentCase).toBe(report.cases[0]);
  });

  it('checks follow the live case: the same verdict as checking the committed, re-solved project', () => {
    const tuned: ProjectFile = { ...demo, designBasis: { format: 'allowable', allowable: { cableSafetyFactor: 1 / 0.3 } }, tuning: { variables: [{ group: LEVEL, by: 'pretension' }], targets: [] } };
    const s = useProjectStore();
    s.load({ path: '/p/demo.stayset', name: 'demo.stayset', project: tuned });
    const r = useResultsStore();
    r.started(s.revision, tuned);
    r.onFinished({ runId: 'a', status: 'done', report });
    const checks = useChecksStore();
    const before = checks.report!.cases.find((c) => c.id === 'dead')!.maxUtilisation;
    const p = 45_000;
    r.setLive({ caseId: 'dead', group: LEVEL, pretension: p, result: createLiveResolver(tuned, 'dead', LEVEL).setPretension(p).result });
    const live = checks.report!.cases.find((c) => c.id === 'dead')!;
    const committed = commitPretension(tuned, LEVEL, p);
    const reference = runChecks(committed, solveProject(committed).report).cases.find((c) => c.id === 'dead')!;
    expect(live.maxUtilisation).toBeGreaterThan(before);
    expect(live.maxUtilisation).toBeCloseTo(reference.maxUtilisation, 6);
    expect(live.pass).toBe(reference.pass);
    expect(live.maxUtilisationMember).toBe(reference.maxUtilisationMember);
  });

  it('check-setting edits keep results current; a member edit makes them stale', () => {
    const r = useResultsStore();
    r.started(1, demo);
    r.onFinished({ runId: 'a', status: 'done', report });
    expect(r.isStaleFor(setCableFactor(demo, 1 / 0.3))).toBe(false);
    expect(r.isStaleFor(commitPretension({ ...demo, tuning: { variables: [{ group: LEVEL, by: 'pretension' }], targets: [] } }, LEVEL, 20_000))).toBe(true);
  });
});
