/**
 * Whether a new scene or new load arrows would be drawn exactly as the shown ones, so the view
 * can keep them (View3D.vue). Project edits are immutable and share unchanged parts: parts are
 * compared by reference, the members element by element on what buildSceneData reads of them
 * (id, kind, ends) when only other fields changed (a pretension edit copies the members array).
 */
import type { CaseResult, MemberSpec, ProjectFile } from '../../solver/index.ts';
import type { SceneOptions } from './scene-data.ts';

/** buildSceneData's arguments. */
export interface SceneInputs extends SceneOptions {
  project: ProjectFile;
  result: CaseResult | null;
}

/** loadArrows' arguments and the geometry build they are drawn on (its origin and size). */
export interface LoadsInputs {
  project: ProjectFile;
  caseId: string | null;
  show: boolean;
  /** Displayed node positions, m. */
  positions: Float64Array;
  /** Geometry builds of the view so far (a new build may move the drawing's origin). */
  geometry: number;
}

/** True when members a and b are drawn alike: same ids, kinds and end nodes in the same order. */
export function membersDrawnAlike(a: readonly MemberSpec[], b: readonly MemberSpec[]): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  for (let j = 0; j < a.length; j++) {
    const x = a[j], y = b[j];
    if (x !== y && (x.id !== y.id || x.kind !== y.kind || x.from !== y.from || x.to !== y.to)) return false;
  }
  return true;
}

/**
 * True when buildSceneData(b) gives the scene of buildSceneData(a). The utilisation colours read
 * the members' design data (sections, design basis, check settings): in that mode any change of
 * the members or those parts counts.
 */
export function sceneDrawnAlike(a: SceneInputs, b: SceneInputs): boolean {
  if (a.result !== b.result || a.deformationScale !== b.deformationScale || a.colour !== b.colour || a.checks !== b.checks || a.sagPoints !== b.sagPoints) return false;
  const sa = a.shape ?? null, sb = b.shape ?? null;
  if (sa !== sb && (!sa || !sb || sa.fields !== sb.fields || sa.start !== sb.start || sa.chains !== sb.chains)) return false;
  const p = a.project, q = b.project;
  if (p === q) return true;
  if (p.nodes !== q.nodes) return false;
  if (b.colour === 'utilisation') {
    return p.members === q.members && p.sections === q.sections && p.designBasis === q.designBasis && p.checks === q.checks && p.groups === q.groups;
  }
  return membersDrawnAlike(p.members, q.members);
}

/** True when loadArrows for b would draw the arrows of a (the same case loads at the same positions). */
export function loadsDrawnAlike(a: LoadsInputs, b: LoadsInputs): boolean {
  if (a.show !== b.show || a.caseId !== b.caseId || a.geometry !== b.geometry) return false;
  if (!b.show) return true;
  const p = a.project, q = b.project;
  if (p !== q && (p.nodes !== q.nodes || p.loadCases !== q.loadCases || p.combinations !== q.combinations || p.windDirections !== q.windDirections
    || p.patchWind !== q.patchWind || p.memberLoss !== q.memberLoss)) return false;
  if (a.positions === b.positions) return true;
  if (a.positions.length !== b.positions.length) return false;
  for (let i = 0; i < a.positions.length; i++) if (a.positions[i] !== b.positions[i]) return false;
  return true;
}
