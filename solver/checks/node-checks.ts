/**
 * Serviceability checks on nodes: displacement (horizontal by default, or total, or the component
 * along a given direction), tilt (horizontal offset of top relative to base over their height) and
 * twist (rotation about the vertical of a node set at one level: the mean change of the plan angle
 * of each node about the set's plan centroid, from the lattice face nodes). Lengths m, angles
 * degrees. Beam node rotations, where an element family provides them, are not read here yet.
 */
import type { CheckSettings, Vec3 } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';

export interface NodeMeasure {
  code: 'displacement' | 'tilt' | 'twist';
  item: string;
  value: number;
  limit: number;
  detail?: Record<string, number>;
}

/** Displacement measure of u along the rule's direction: horizontal (default), total, or |u·d|/|d|. */
export function displacementAlong(u: readonly number[], direction: 'horizontal' | 'total' | Vec3 | undefined): number {
  if (direction === undefined || direction === 'horizontal') return Math.hypot(u[0], u[1]);
  if (direction === 'total') return Math.hypot(u[0], u[1], u[2]);
  const n = Math.hypot(direction[0], direction[1], direction[2]);
  return Math.abs(u[0] * direction[0] + u[1] * direction[1] + u[2] * direction[2]) / n;
}

/**
 * Twist of a node set, degrees: mean over its nodes of the change of atan2(y − ȳ, x − x̄) from
 * the modelled to the deformed plan position (each centroid taken in its own state), wrapped to
 * (−180, 180]. Positive counter-clockwise seen from above.
 */
export function twistOf(modelled: readonly (readonly number[])[], deformed: readonly (readonly number[])[]): number {
  const centroid = (pts: readonly (readonly number[])[]) => [0, 1].map((k) => pts.reduce((s, p) => s + p[k], 0) / pts.length);
  const c0 = centroid(modelled), c1 = centroid(deformed);
  let sum = 0;
  for (let i = 0; i < modelled.length; i++) {
    const a0 = Math.atan2(modelled[i][1] - c0[1], modelled[i][0] - c0[0]);
    const a1 = Math.atan2(deformed[i][1] - c1[1], deformed[i][0] - c1[0]);
    let d = a1 - a0;
    while (d > Math.PI) d -= 2 * Math.PI;
    while (d <= -Math.PI) d += 2 * Math.PI;
    sum += d;
  }
  return ((sum / modelled.length) * 180) / Math.PI;
}

/** Every serviceability node measure of one converged case. */
export function nodeMeasures(s: CheckSettings, c: CaseResult): NodeMeasure[] {
  const byId = new Map(c.nodes.map((n) => [n.id, n] as const));
  const out: NodeMeasure[] = [];
  for (const l of s.displacementLimits ?? []) {
    const n = byId.get(l.node);
    if (n) out.push({ code: 'displacement', item: l.node, value: displacementAlong(n.displacement, l.direction), limit: l.limit });
  }
  for (const l of s.tiltLimits ?? []) {
    const b = byId.get(l.base), t = byId.get(l.top);
    if (!b || !t) continue;
    const h = Math.abs(t.position[2] - t.displacement[2] - (b.position[2] - b.displacement[2]));
    if (!(h > 0)) continue;
    const offset = Math.hypot(t.displacement[0] - b.displacement[0], t.displacement[1] - b.displacement[1]);
    out.push({ code: 'tilt', item: `${l.base}→${l.top}`, value: offset / h, limit: l.limit, detail: { offset, height: h } });
  }
  for (const l of s.twistLimits ?? []) {
    const nodes = l.nodes.map((id) => byId.get(id));
    if (nodes.some((n) => !n)) continue;
    const deformed = nodes.map((n) => n!.position);
    const modelled = nodes.map((n) => n!.position.map((p, k) => p - n!.displacement[k]));
    out.push({ code: 'twist', item: l.nodes.join('+'), value: Math.abs(twistOf(modelled, deformed)), limit: l.limit });
  }
  return out;
}
