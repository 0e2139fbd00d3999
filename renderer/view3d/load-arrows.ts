/**
 * The loads of one case (or a combination: factor × each case's loads) as arrows for the 3D view:
 * nodal forces as arrows ending at their node, length proportional to |F| (the largest is
 * `maxLength` m long), and the wind as its direction of flow (degrees counter-clockwise from +x in
 * plan, toward which the air flows) and speed. Plain arrays; knows nothing of three.js.
 */
import type { LoadCaseSpec, ProjectFile } from '../../solver/index.ts';
import { windDirectionCases } from '../../solver/index.ts';

export interface LoadArrows {
  /** Arrow k runs from tails[3k..] to tips[3k..] (m, world coordinates). */
  tails: Float64Array;
  tips: Float64Array;
  count: number;
  /** Largest nodal force magnitude, N (0 without nodal loads). */
  maxForce: number;
  /** Wind of the case (the first wind of a combination's cases with a non-zero factor), or null. */
  wind: { direction: number; speed: number } | null;
}

/**
 * The load case behind `caseId`: a load case, or for the cases the design actions add (solver
 * solve-actions) the case they are made from — a wind direction's copy of its case with the wind
 * turned, a patch-wind case's mean-wind case, a member-loss case's starting case.
 */
export function caseSpecOf(project: ProjectFile, caseId: string): LoadCaseSpec | undefined {
  const own = project.loadCases.find((lc) => lc.id === caseId);
  if (own) return own;
  for (const spec of project.windDirections ?? []) {
    if (!caseId.startsWith(`${spec.id} `)) continue;
    try {
      const found = windDirectionCases(project, spec).find((c) => c.id === caseId);
      if (found) return found;
    } catch { /* the validator names a windDirections entry without a wind case */ }
  }
  for (const spec of project.patchWind ?? []) {
    if (caseId.startsWith(`${spec.id} `)) return project.loadCases.find((lc) => lc.id === spec.meanCase);
  }
  for (const spec of project.memberLoss ?? []) {
    if (caseId.startsWith(`${spec.id} `)) return project.loadCases.find((lc) => lc.id === spec.fromCase);
  }
  return undefined;
}

/** Nodal forces of `caseId` (a load case, a combination or a case of the design actions) summed per node, N. */
export function caseNodalForces(project: ProjectFile, caseId: string): { forces: Map<string, [number, number, number]>; wind: LoadArrows['wind'] } {
  const forces = new Map<string, [number, number, number]>();
  let wind: LoadArrows['wind'] = null;
  const combo = project.combinations?.find((c) => c.id === caseId);
  const parts = combo ? combo.factors : [{ case: caseId, factor: 1 }];
  for (const { case: id, factor } of parts) {
    const c = caseSpecOf(project, id);
    if (!c || factor === 0) continue;
    if (c.wind && !wind) wind = { direction: c.wind.direction, speed: c.wind.speed * Math.sqrt(Math.abs(factor)) };
    for (const l of c.nodalLoads ?? []) {
      const f = forces.get(l.node) ?? [0, 0, 0];
      for (let k = 0; k < 3; k++) f[k] += factor * l.force[k];
      forces.set(l.node, f);
    }
  }
  return { forces, wind };
}

/** Arrows for `caseId` at the displayed node positions (`nodeIds[i]` at positions[3i..]). */
export function loadArrows(project: ProjectFile, caseId: string | null, nodeIds: readonly string[], positions: Float64Array, maxLength: number): LoadArrows {
  const empty: LoadArrows = { tails: new Float64Array(0), tips: new Float64Array(0), count: 0, maxForce: 0, wind: null };
  if (!caseId) return empty;
  const { forces, wind } = caseNodalForces(project, caseId);
  const index = new Map(nodeIds.map((id, i) => [id, i]));
  const list = [...forces].filter(([id, f]) => index.has(id) && Math.hypot(...f) > 0);
  const maxForce = list.reduce((m, [, f]) => Math.max(m, Math.hypot(...f)), 0);
  const tails = new Float64Array(3 * list.length), tips = new Float64Array(3 * list.length);
  list.forEach(([id, f], k) => {
    const i = index.get(id)!;
    const mag = Math.hypot(...f);
    const len = maxLength * Math.max(0.25, mag / maxForce);
    for (let a = 0; a < 3; a++) {
      tips[3 * k + a] = positions[3 * i + a];
      tails[3 * k + a] = positions[3 * i + a] - (f[a] / mag) * len;
    }
  });
  return { tails, tips, count: list.length, maxForce, wind: wind ?? empty.wind };
}
