/**
 * Member-level lowest end tension of cables, the measure the minimum-tension check judges (so
 * its verdict does not depend on the number of elements): the larger of
 * - the elastic catenary through the deformed end points with the member's stress-free length
 *   (at the case's temperature change) and the bare cable's weight (chord-tension.ts), and
 * - the smaller of the first and last element forces (which carry wind on the cable when the
 *   member has several elements; with one element a hanging cable shows 0 here).
 * Forces N, lengths m.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult, MemberResult } from '../results/types.ts';
import { buildModel } from '../model/build-model.ts';
import { memberCutLengths } from '../installation/cut-length.ts';
import { STANDARD_GRAVITY } from '../model/constants.ts';
import { chordTension } from './chord-tension.ts';

export interface CableMeasureData {
  /** Stress-free length at the reference temperature, m, by member id (cables only). */
  unstressedLength: Map<string, number>;
}

const cache = new WeakMap<ProjectFile, CableMeasureData>();

/** Stress-free lengths of the project's cables (cached per project object). */
export function cableMeasureData(project: ProjectFile): CableMeasureData {
  const hit = cache.get(project);
  if (hit) return hit;
  const model = buildModel(project);
  const lengths = memberCutLengths(model);
  const unstressedLength = new Map<string, number>();
  model.members.forEach((m, k) => { if (m.kind === 'cable') unstressedLength.set(m.id, lengths[k]); });
  const data = { unstressedLength };
  cache.set(project, data);
  return data;
}

/** Uniform temperature change of a case or combination (Σ factor · ΔT), K. */
export function caseTemperatureChange(project: ProjectFile, id: string): number {
  const c = project.loadCases.find((x) => x.id === id);
  if (c) return c.temperatureChange ?? 0;
  const k = project.combinations?.find((x) => x.id === id);
  return (k?.factors ?? []).reduce((s, f) => s + f.factor * (project.loadCases.find((x) => x.id === f.case)?.temperatureChange ?? 0), 0);
}

/** Lowest end tension of a cable in a case, N; `catenary` false when only the element value could be used. */
export function lowestEndTension(
  project: ProjectFile, data: CableMeasureData, c: CaseResult, positions: Map<string, readonly number[]>, m: MemberResult,
): { value: number; catenary: boolean } {
  const elementValue = Math.max(0, Math.min(m.tensionStart, m.tensionEnd));
  const spec = project.members.find((x) => x.id === m.id);
  const L0ref = data.unstressedLength.get(m.id);
  if (!spec || L0ref === undefined) return { value: elementValue, catenary: false };
  const section = project.sections.find((s) => s.id === spec.section);
  const a = positions.get(spec.from), b = positions.get(spec.to);
  if (!section || !a || !b) return { value: elementValue, catenary: false };
  const L0 = L0ref * (1 + (section.thermalExpansion ?? 0) * caseTemperatureChange(project, c.id));
  const t = chordTension({
    span: Math.hypot(b[0] - a[0], b[1] - a[1]), rise: b[2] - a[2], unstressedLength: L0,
    weightPerLength: (section.massPerLength ?? 0) * STANDARD_GRAVITY, axialStiffness: section.E * section.area,
  });
  if (!t) return { value: elementValue, catenary: false };
  return { value: Math.max(elementValue, Math.min(t.start, t.end)), catenary: true };
}
