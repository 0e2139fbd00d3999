import type { PanelSpec, ProjectFile, Vec3 } from '../../../solver/index.ts';
import type { GeneratedParts } from './types.ts';

const ownedBy = (recordId: string, id: string) => id.startsWith(`${recordId}/`);

function centroid(panel: PanelSpec, at: Map<string, Vec3>): Vec3 | null {
  const pts = panel.nodes.map((n) => at.get(n));
  if (pts.some((p) => !p)) return null;
  return [0, 1, 2].map((d) => pts.reduce((s, p) => s + p![d], 0) / pts.length) as Vec3;
}

const dist2 = (a: Vec3, b: Vec3) => (a[0] - b[0]) ** 2 + (a[1] - b[1]) ** 2 + (a[2] - b[2]) ** 2;

/**
 * Panels after a generator re-run. The generator's panels are replaced by the new run's; each new
 * panel takes the region of the old generated panel whose centre is nearest (ids are not stable
 * when the grid changes, places are), so pressure coefficients per region follow a finer or
 * coarser grid; a label is kept where the old panel is at the same place. The user's panels are kept; a corner on a generated node the
 * new run no longer makes moves to the nearest new node (noted); a panel left with repeated
 * corners is removed (noted).
 */
export function followPanels(project: ProjectFile, recordId: string, parts: GeneratedParts, notes: string[]): PanelSpec[] | undefined {
  if (!project.panels && !parts.panels) return undefined;
  const oldAt = new Map<string, Vec3>(project.nodes.map((n) => [n.id, n.at]));
  const newAt = new Map<string, Vec3>(parts.nodes.map((n) => [n.id, n.at]));
  const oldOwned = (project.panels ?? []).filter((p) => ownedBy(recordId, p.id) && (p.region !== undefined || p.label !== undefined));
  const oldCentres = oldOwned.map((p) => ({ p, c: centroid(p, oldAt) })).filter((x): x is { p: PanelSpec; c: Vec3 } => x.c !== null);
  const generated = (parts.panels ?? []).map((p) => {
    const c = centroid(p, newAt);
    if (!c || oldCentres.length === 0) return p;
    let best = oldCentres[0];
    for (const o of oldCentres) if (dist2(o.c, c) < dist2(best.c, c)) best = o;
    const samePlace = dist2(best.c, c) < 1e-12;
    return {
      ...p,
      ...(best.p.region !== undefined ? { region: best.p.region } : {}),
      ...(samePlace && best.p.label !== undefined ? { label: best.p.label } : {}),
    };
  });
  const newNodes = [...newAt.entries()];
  const nearestNew = (at: Vec3) => newNodes.reduce((a, b) => (dist2(b[1], at) < dist2(a[1], at) ? b : a))[0];
  const user: PanelSpec[] = [];
  for (const p of (project.panels ?? []).filter((x) => !ownedBy(recordId, x.id))) {
    const nodes = p.nodes.map((n) => {
      if (!ownedBy(recordId, n) || newAt.has(n) || !oldAt.has(n) || newNodes.length === 0) return n;
      const to = nearestNew(oldAt.get(n)!);
      notes.push(`panel "${p.id}": corner node "${n}" → "${to}" (nearest new node)`);
      return to;
    });
    if (new Set(nodes).size < nodes.length) { notes.push(`panel "${p.id}": two corners fell on one node: removed`); continue; }
    user.push(nodes.every((n, i) => n === p.nodes[i]) ? p : { ...p, nodes });
  }
  return [...user, ...generated];
}
