/**
 * The site screens' state and edits: every edit of a sequence or a set of readings is one
 * validated undo step of the project store (a refused edit changes nothing and names the entry);
 * runs go to the host's runSite and their results are kept with the project they were computed
 * for, so an edit marks them stale. The fake host answers with the solver run in this process.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { runSequence } from '../../solver/index.ts';
import type { StaysetHost } from '../../main/common/host-contract.ts';
import { runSiteRequest, type SiteRequest } from '../../main/common/site/site-run.ts';
import { setHost } from '../../renderer/host/client.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { useSiteStore } from '../../renderer/stores/site.ts';
import { addSequence, addTension, applyOrder, moveStep, removeStep, updateSequence, updateTension } from '../../renderer/site/site-edits.ts';

const demo = JSON.parse(readFileSync(new URL('../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;

function fakeHost(calls: SiteRequest[], answer?: (p: ProjectFile, r: SiteRequest) => Awaited<ReturnType<StaysetHost['runSite']>>): StaysetHost {
  return {
    runSite: async (p: ProjectFile, r: SiteRequest) => {
      calls.push(r);
      if (answer) return answer(p, r);
      try {
        return { ok: true, value: runSiteRequest(p, r) };
      } catch (e) {
        return { ok: false, error: (e as Error).message };
      }
    },
    cancelSite: async () => undefined,
  } as unknown as StaysetHost;
}

describe('site edits through the project store', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('each edit is one undo step; undo restores the sequence', () => {
    const store = useProjectStore();
    store.load({ path: null, name: 'demo', project: demo });
    expect(store.edit('Move step', (p) => moveStep(p, 'top down', 0, 1))).toEqual({ ok: true });
    expect(store.project!.sequences![0].steps.map((s) => s.group)).toEqual(['mast/guys level 2', 'mast/guys level 3', 'mast/guys level 1']);
    expect(store.edit('Temperature', (p) => updateSequence(p, 'top down', { temperature: 300 }))).toEqual({ ok: true });
    store.undo();
    expect(store.project!.sequences![0].temperature).toBe(281.15);
    store.undo();
    expect(store.project!.sequences![0].steps.map((s) => s.group)).toEqual(demo.sequences![0].steps.map((s) => s.group));
    expect(store.canUndo).toBe(false);
  });

  it('refuses bad edits with a message naming the entry and keeps the project', () => {
    const store = useProjectStore();
    store.load({ path: null, name: 'demo', project: demo });
    const before = store.project;
    const bad = store.edit('Order', (p) => applyOrder(p, 'top down', [0, 0, 1]));
    expect(bad).toEqual({ ok: false, errors: ['sequence "top down": the order 1, 1, 2 does not list every step once'] });
    const taken = store.edit('Rename', (p) => updateSequence(p, 'top down', { id: 'bottom up' }));
    expect(taken).toEqual({ ok: false, errors: ['sequence "bottom up" exists already'] });
    const last = store.edit('Remove', (p) => removeStep(removeStep(removeStep(p, 'top down', 0), 'top down', 0), 'top down', 0));
    expect(last.ok).toBe(false);
    const reading = store.edit('Reading', (p) => updateTension(p, 'handover', 40, demo.siteMeasurements![0].tensions[0]));
    expect(reading).toEqual({ ok: false, errors: ['site measurement set "handover": there is no reading 41'] });
    expect(store.project).toBe(before);
    expect(store.canUndo).toBe(false);
  });

  it('a new sequence starts with one step per smallest cable group', () => {
    const r = addSequence(demo);
    expect(r.id).toBe('sequence');
    expect(r.project.sequences!.at(-1)!.steps.map((s) => s.group)).toEqual(['mast/guys level 1', 'mast/guys level 2', 'mast/guys level 3']);
    const withReading = addTension(demo, 'handover', { member: 'mast/guy L1-1', method: 'sag', value: 0.3, accuracy: 0.05, temperature: 283.15 });
    expect(withReading.siteMeasurements![0].tensions).toHaveLength(demo.siteMeasurements![0].tensions.length + 1);
    expect(demo.siteMeasurements![0].tensions).toHaveLength(9); // the input is never changed
  });
});

describe('site store', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('runs the chosen sequence through the host and marks the result stale after an edit', async () => {
    const calls: SiteRequest[] = [];
    setHost(fakeHost(calls));
    const store = useProjectStore();
    store.load({ path: null, name: 'demo', project: demo });
    const site = useSiteStore();
    site.open('sequence');
    site.sequenceId = 'bottom up';
    await site.runSequence();
    expect(calls).toEqual([{ kind: 'sequence', id: 'bottom up', units: 'SI' }]);
    const direct = runSequence(demo, 'bottom up');
    expect(site.sequenceResult!.stages.flatMap((s) => s.settings.map((x) => x.value))).toEqual(direct.stages.flatMap((s) => s.settings.map((x) => x.value)));
    expect(site.sequenceStale).toBe(false);
    store.edit('Temperature', (p) => updateSequence(p, 'bottom up', { temperature: 290 }));
    expect(site.sequenceStale).toBe(true);
    site.sequenceId = 'top down';
    expect(site.sequenceResult).toBeNull(); // the result shown belongs to the chosen sequence only
    setHost(null);
  }, 60_000);

  it('shows the host\'s message for bad input, and nothing for a cancelled run', async () => {
    const calls: SiteRequest[] = [];
    setHost(fakeHost(calls, (_p, r) => (r.kind === 'asbuilt' ? { ok: false, error: 'cancelled: a newer request replaced it' } : { ok: false, error: 'sequence "x": step 1 names member "nope", which does not exist' })));
    useProjectStore().load({ path: null, name: 'demo', project: demo });
    const site = useSiteStore();
    await site.runSequence();
    expect(site.message).toEqual({ kind: 'error', text: 'sequence "x": step 1 names member "nope", which does not exist' });
    await site.runAsBuilt();
    expect(site.message).toBeNull();
    expect(site.asbuiltResult).toBeNull();
    expect(site.busy).toBeNull();
    setHost(null);
  });

  it('asks for the crew sheet in the display units and shows the document', async () => {
    const calls: SiteRequest[] = [];
    setHost(fakeHost(calls, () => ({ ok: true, value: { kind: 'document', html: '<p>sheet</p>', title: 'demo crew sheet top down' } })));
    useProjectStore().load({ path: null, name: 'demo', project: demo });
    const site = useSiteStore();
    await site.showDocument('crewSheet');
    expect(calls[0]).toMatchObject({ kind: 'crewSheet', id: 'top down', units: 'SI', paper: 'a4' });
    expect(site.document?.html).toBe('<p>sheet</p>');
    setHost(null);
  });
});
