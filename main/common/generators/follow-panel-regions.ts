/**
 * Regions of re-generated panels. The user names regions on generated panels (pressure
 * coefficients per region); a re-run makes new panels, each of which takes the region of the old
 * generated panel whose centroid is nearest to its own (plan and height, m), so the coefficients
 * keep applying to the same part of the surface.
 */
import type { PanelSpec, Vec3 } from '../../../solver/index.ts';
import { count, generatorNote, type GeneratorNote } from './generator-notes.ts';

function centroid(p: PanelSpec, at: Map<string, Vec3>): Vec3 | null {
  const c: Vec3 = [0, 0, 0];
  for (const id of p.nodes) {
    const x = at.get(id);
    if (!x) return null;
    c[0] += x[0]; c[1] += x[1]; c[2] += x[2];
  }
  return [c[0] / p.nodes.length, c[1] / p.nodes.length, c[2] / p.nodes.length];
}

/** New panels with the regions of the nearest old panels; `notes` says how many took one. */
export function followPanelRegions(
  oldPanels: readonly PanelSpec[], oldAt: Map<string, Vec3>, newPanels: readonly PanelSpec[], newAt: Map<string, Vec3>, notes: GeneratorNote[],
): PanelSpec[] {
  const named = oldPanels.flatMap((p) => {
    const c = p.region !== undefined ? centroid(p, oldAt) : null;
    return c ? [{ region: p.region!, c }] : [];
  });
  if (named.length === 0) return [...newPanels];
  let carried = 0;
  const out = newPanels.map((p) => {
    if (p.region !== undefined) return p;
    const c = centroid(p, newAt);
    if (!c) return p;
    let best = named[0], bestD = Infinity;
    for (const o of named) {
      const d = (o.c[0] - c[0]) ** 2 + (o.c[1] - c[1]) ** 2 + (o.c[2] - c[2]) ** 2;
      if (d < bestD) { bestD = d; best = o; }
    }
    carried++;
    return { ...p, region: best.region };
  });
  notes.push(generatorNote('panelRegionsCarried', { regions: [...new Set(named.map((n) => n.region))] }, { count: count(carried) }));
  return out;
}
