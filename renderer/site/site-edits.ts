/**
 * Pure edits of the project's tensioning sequences and site measurement sets (solver/project/
 * site-types.ts). Each returns a new project (the input is never changed) or throws an Error
 * naming the entry; the Sequence and As-built screens pass them to the project store's edit(), so
 * each is one validated undo step. SI values (N, m, K) in and out.
 */
import type {
  PositionMeasurementSpec, ProjectFile, SiteMeasurementSetSpec, TensioningSequenceSpec, TensioningStepSpec, TensionMeasurementSpec,
} from '../../solver/index.ts';

function freshId(taken: readonly string[], base: string): string {
  if (!taken.includes(base)) return base;
  for (let k = 2; ; k++) if (!taken.includes(`${base} ${k}`)) return `${base} ${k}`;
}

/**
 * `entry` with `patch` applied (a key patched to undefined is removed), after checking that a new
 * id is not empty and not taken among `ids`; `what` names the kind of entry in the messages.
 */
function patched<T extends { id: string }>(entry: T, patch: Partial<T>, ids: readonly { id: string }[], what: string): T {
  if (patch.id !== undefined && patch.id !== entry.id) {
    if (!patch.id.trim()) throw new Error(`${what} "${entry.id}": the id may not be empty`);
    if (ids.some((s) => s.id === patch.id)) throw new Error(`${what} "${patch.id}" exists already`);
  }
  const next = { ...entry, ...patch } as T & Record<string, unknown>;
  for (const [k, v] of Object.entries(patch)) if (v === undefined) delete next[k];
  return next;
}

function sequenceAt(p: ProjectFile, id: string): number {
  const i = (p.sequences ?? []).findIndex((s) => s.id === id);
  if (i < 0) throw new Error(`sequence "${id}" does not exist`);
  return i;
}

function setAt(p: ProjectFile, id: string): number {
  const i = (p.siteMeasurements ?? []).findIndex((s) => s.id === id);
  if (i < 0) throw new Error(`site measurement set "${id}" does not exist`);
  return i;
}

function withSequence(p: ProjectFile, id: string, change: (s: TensioningSequenceSpec) => TensioningSequenceSpec): ProjectFile {
  const i = sequenceAt(p, id);
  const sequences = [...p.sequences!];
  sequences[i] = change(sequences[i]);
  return { ...p, sequences };
}

function withSet(p: ProjectFile, id: string, change: (s: SiteMeasurementSetSpec) => SiteMeasurementSetSpec): ProjectFile {
  const i = setAt(p, id);
  const sets = [...p.siteMeasurements!];
  sets[i] = change(sets[i]);
  return { ...p, siteMeasurements: sets };
}

/** The project's groups that hold a cable, as steps tensioned by force (a start the user edits). */
export function defaultSteps(p: ProjectFile): TensioningStepSpec[] {
  const cables = new Set(p.members.filter((m) => m.kind === 'cable').map((m) => m.id));
  const groups = (p.groups ?? []).filter((g) => g.members.some((id) => cables.has(id)) && g.members.every((id) => cables.has(id)));
  const smallest = groups.filter((g) => !groups.some((h) => h !== g && h.members.length < g.members.length && h.members.every((id) => g.members.includes(id))));
  if (smallest.length) return smallest.map((g) => ({ group: g.id, setBy: 'force' as const }));
  return [...cables].map((id) => ({ members: [id], setBy: 'force' as const }));
}

/** Add a sequence (steps: the smallest cable groups, or every cable) and return its id with the project. */
export function addSequence(p: ProjectFile): { project: ProjectFile; id: string } {
  const id = freshId((p.sequences ?? []).map((s) => s.id), 'sequence');
  const steps = defaultSteps(p);
  if (!steps.length) throw new Error('the project has no cable to tension');
  return { project: { ...p, sequences: [...(p.sequences ?? []), { id, steps }] }, id };
}

export function removeSequence(p: ProjectFile, id: string): ProjectFile {
  const i = sequenceAt(p, id);
  const sequences = p.sequences!.filter((_, k) => k !== i);
  const next: ProjectFile = { ...p, sequences };
  if (!sequences.length) delete next.sequences;
  return next;
}

/** Change top-level fields of a sequence; `undefined` values remove the field. Renaming checks the id is free. */
export function updateSequence(p: ProjectFile, id: string, patch: Partial<Omit<TensioningSequenceSpec, 'steps'>>): ProjectFile {
  return withSequence(p, id, (s) => patched<TensioningSequenceSpec>(s, patch, p.sequences ?? [], 'sequence'));
}

export function addStep(p: ProjectFile, id: string, step: TensioningStepSpec): ProjectFile {
  return withSequence(p, id, (s) => ({ ...s, steps: [...s.steps, step] }));
}

export function removeStep(p: ProjectFile, id: string, index: number): ProjectFile {
  return withSequence(p, id, (s) => {
    if (s.steps.length <= 1) throw new Error(`sequence "${id}": a sequence needs at least one step`);
    return { ...s, steps: s.steps.filter((_, k) => k !== index) };
  });
}

/** Move step `index` by `by` places (−1 earlier, +1 later); out of range is an error. */
export function moveStep(p: ProjectFile, id: string, index: number, by: number): ProjectFile {
  return withSequence(p, id, (s) => {
    const to = index + by;
    if (index < 0 || index >= s.steps.length || to < 0 || to >= s.steps.length) throw new Error(`sequence "${id}": step ${index + 1} cannot move there`);
    const steps = [...s.steps];
    [steps[index], steps[to]] = [steps[to], steps[index]];
    return { ...s, steps };
  });
}

export function updateStep(p: ProjectFile, id: string, index: number, step: TensioningStepSpec): ProjectFile {
  return withSequence(p, id, (s) => {
    if (index < 0 || index >= s.steps.length) throw new Error(`sequence "${id}": there is no step ${index + 1}`);
    const steps = [...s.steps];
    steps[index] = step;
    return { ...s, steps };
  });
}

/** Reorder the steps as the solver suggested (`order`: indices into the current steps). */
export function applyOrder(p: ProjectFile, id: string, order: readonly number[]): ProjectFile {
  return withSequence(p, id, (s) => {
    if (order.length !== s.steps.length || new Set(order).size !== order.length || order.some((k) => !(k >= 0 && k < s.steps.length))) {
      throw new Error(`sequence "${id}": the order ${order.map((k) => k + 1).join(', ')} does not list every step once`);
    }
    return { ...s, steps: order.map((k) => s.steps[k]) };
  });
}

/** Add a measurement set holding its first reading (a set needs at least one); returns its id with the project. */
export function addMeasurementSet(p: ProjectFile, first: TensionMeasurementSpec): { project: ProjectFile; id: string } {
  const id = freshId((p.siteMeasurements ?? []).map((s) => s.id), 'readings');
  const set: SiteMeasurementSetSpec = { id, tensions: [first] };
  return { project: { ...p, siteMeasurements: [...(p.siteMeasurements ?? []), set] }, id };
}

export function removeMeasurementSet(p: ProjectFile, id: string): ProjectFile {
  const i = setAt(p, id);
  const sets = p.siteMeasurements!.filter((_, k) => k !== i);
  const next: ProjectFile = { ...p, siteMeasurements: sets };
  if (!sets.length) delete next.siteMeasurements;
  return next;
}

export function updateMeasurementSet(p: ProjectFile, id: string, patch: Partial<Omit<SiteMeasurementSetSpec, 'tensions' | 'positions'>>): ProjectFile {
  return withSet(p, id, (s) => patched<SiteMeasurementSetSpec>(s, patch, p.siteMeasurements ?? [], 'site measurement set'));
}

export function addTension(p: ProjectFile, id: string, reading: TensionMeasurementSpec): ProjectFile {
  return withSet(p, id, (s) => ({ ...s, tensions: [...s.tensions, reading] }));
}

export function updateTension(p: ProjectFile, id: string, index: number, reading: TensionMeasurementSpec): ProjectFile {
  return withSet(p, id, (s) => {
    if (index < 0 || index >= s.tensions.length) throw new Error(`site measurement set "${id}": there is no reading ${index + 1}`);
    const tensions = [...s.tensions];
    tensions[index] = reading;
    return { ...s, tensions };
  });
}

export function removeTension(p: ProjectFile, id: string, index: number): ProjectFile {
  return withSet(p, id, (s) => ({ ...s, tensions: s.tensions.filter((_, k) => k !== index) }));
}

export function addPosition(p: ProjectFile, id: string, reading: PositionMeasurementSpec): ProjectFile {
  return withSet(p, id, (s) => ({ ...s, positions: [...(s.positions ?? []), reading] }));
}

export function updatePosition(p: ProjectFile, id: string, index: number, reading: PositionMeasurementSpec): ProjectFile {
  return withSet(p, id, (s) => {
    const positions = [...(s.positions ?? [])];
    if (index < 0 || index >= positions.length) throw new Error(`site measurement set "${id}": there is no position ${index + 1}`);
    positions[index] = reading;
    return { ...s, positions };
  });
}

export function removePosition(p: ProjectFile, id: string, index: number): ProjectFile {
  return withSet(p, id, (s) => {
    const positions = (s.positions ?? []).filter((_, k) => k !== index);
    const next = { ...s, positions };
    if (!positions.length) delete (next as Partial<SiteMeasurementSetSpec>).positions;
    return next;
  });
}
