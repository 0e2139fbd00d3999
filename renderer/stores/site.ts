/**
 * Work on site: which site screen is open (Sequence or As built), the sequence and measurement set
 * chosen there, and the last results and printable document. Runs go to the host (runSite: the
 * analysis worker; main/common/site/site-run.ts), one at a time; a result keeps the project it was
 * computed for, so the screens can say when an edit made it stale.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { defineStore, storeToRefs } from 'pinia';
import { computed, ref, shallowRef, toRaw } from 'vue';
import type { AsBuiltResult, ProjectFile, SequenceResult } from '../../solver/index.ts';
import type { StaysetHost } from '../../main/common/host-contract.ts';
import type { SiteOutcome, SiteRequest } from '../../main/common/site/site-run.ts';
import { paperForUnits } from '../../main/common/schedule/paper.ts';
import { getHost } from '../host/client.ts';
import { useProjectStore } from './project.ts';
import { useSettingsStore } from './settings.ts';

export type SiteScreen = 'sequence' | 'asbuilt';

interface Held<T> {
  result: T;
  project: ProjectFile;
}

/** Today as YYYY-MM-DD in local time (date of issue of a printed document). */
export function isoToday(now = new Date()): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}

/** A plain deep copy for the host (structured clone refuses Vue proxies; the web client sends JSON). */
function plain(p: ProjectFile): ProjectFile {
  return JSON.parse(JSON.stringify(toRaw(p))) as ProjectFile;
}

export const useSiteStore = defineStore('site', () => {
  const projectStore = useProjectStore();
  const { project } = storeToRefs(projectStore);
  const settings = useSettingsStore();

  const screen = ref<SiteScreen | null>(null);
  const sequenceId = ref('');
  const setId = ref('');
  const sequence = shallowRef<Held<SequenceResult> | null>(null);
  const asbuilt = shallowRef<Held<AsBuiltResult> | null>(null);
  /** The printable document shown over the site screen (crew sheet or report). */
  const document = shallowRef<{ html: string; title: string; request: SiteRequest } | null>(null);
  const busy = ref<SiteRequest['kind'] | null>(null);
  const message = ref<{ kind: 'info' | 'error'; text: string } | null>(null);
  const host = (): StaysetHost => getHost();

  const sequences = computed(() => project.value?.sequences ?? []);
  const sets = computed(() => project.value?.siteMeasurements ?? []);
  const currentSequence = computed(() => sequences.value.find((s) => s.id === sequenceId.value) ?? sequences.value[0] ?? null);
  const currentSet = computed(() => sets.value.find((s) => s.id === setId.value) ?? sets.value[0] ?? null);
  /** The shown result belongs to the chosen sequence and the current project. */
  const sequenceResult = computed(() => (sequence.value && sequence.value.result.id === currentSequence.value?.id ? sequence.value.result : null));
  const sequenceStale = computed(() => Boolean(sequence.value && sequence.value.project !== project.value));
  const asbuiltResult = computed(() => (asbuilt.value && asbuilt.value.result.id === currentSet.value?.id ? asbuilt.value.result : null));
  const asbuiltStale = computed(() => Boolean(asbuilt.value && asbuilt.value.project !== project.value));

  function open(which: SiteScreen): void {
    screen.value = which;
    message.value = null;
  }
  function close(): void {
    screen.value = null;
    document.value = null;
  }

  async function request(req: SiteRequest): Promise<SiteOutcome | null> {
    const p = project.value;
    if (!p) return null;
    busy.value = req.kind;
    message.value = null;
    try {
      const r = await host().runSite(plain(p), req);
      if (!r.ok) {
        if (!/^cancelled/.test(r.error)) message.value = { kind: 'error', text: r.error };
        return null;
      }
      return r.value;
    } catch (e) {
      message.value = { kind: 'error', text: (e as Error).message };
      return null;
    } finally {
      if (busy.value === req.kind) busy.value = null;
    }
  }

  async function runSequence(): Promise<void> {
    const s = currentSequence.value, p = project.value;
    if (!s || !p) return;
    const out = await request({ kind: 'sequence', id: s.id, units: settings.units });
    if (out?.kind === 'sequence') sequence.value = { result: out.result, project: p };
  }

  async function runAsBuilt(): Promise<void> {
    const s = currentSet.value, p = project.value;
    if (!s || !p) return;
    const out = await request({ kind: 'asbuilt', id: s.id, units: settings.units });
    if (out?.kind === 'asbuilt') asbuilt.value = { result: out.result, project: p };
  }

  function documentRequest(kind: 'crewSheet' | 'report'): SiteRequest | null {
    const common = { units: settings.units, paper: paperForUnits(settings.units), issueDate: isoToday() };
    if (kind === 'report') return { kind, ...common };
    const s = currentSequence.value;
    return s ? { kind, id: s.id, ...common } : null;
  }

  /** Build the crew sheet of the chosen sequence, or the calculation report, and show it. */
  async function showDocument(kind: 'crewSheet' | 'report'): Promise<void> {
    const req = documentRequest(kind);
    if (!req) return;
    const out = await request(req);
    if (out?.kind === 'document') document.value = { html: out.html, title: out.title, request: req };
  }

  /** Desktop: the host prints the document to a PDF chosen in a save dialog. */
  async function printToPdf(kind: 'crewSheet' | 'report'): Promise<void> {
    const p = project.value, req = documentRequest(kind);
    if (!p || !req) return;
    busy.value = req.kind;
    try {
      const r = await host().printSiteDocument(plain(p), req);
      if (r && !r.ok) message.value = { kind: 'error', text: r.error };
      else if (r) message.value = { kind: 'info', text: `Written to ${r.value.path}` };
    } catch (e) {
      message.value = { kind: 'error', text: (e as Error).message };
    } finally {
      busy.value = null;
    }
  }

  async function cancel(): Promise<void> {
    await host().cancelSite();
    busy.value = null;
  }

  return {
    screen, sequenceId, setId, sequence, asbuilt, document, busy, message, sequences, sets, currentSequence, currentSet,
    sequenceResult, sequenceStale, asbuiltResult, asbuiltStale, open, close, runSequence, runAsBuilt, showDocument, printToPdf, cancel,
  };
});
