/**
 * The wind basis and profile of every load case with wind, for the CLI (`stayset wind`) and the
 * app's readout: what the speed stands for, the factors on the forces, and q(z) = ½ ρ V(z)².
 */
import type { ProjectFile, WindProfileRow } from '../../solver/index.ts';
import { DEFAULT_AIR_DENSITY, windForceFactor, windProfileRows } from '../../solver/index.ts';

export interface WindReadout {
  caseId: string;
  direction: number;
  /** Speed as entered, m/s, and what it stands for. */
  speed: number;
  basis: string;
  profile: string;
  airDensity: number;
  forceFactor: number;
  rows: WindProfileRow[];
}

/** Heights of the profile table, m: 2, 5, 10, 20, 30, … up to the highest node (and that height). */
export function readoutHeights(project: ProjectFile): number[] {
  const top = Math.max(10, ...project.nodes.map((n) => n.at[2]));
  const out = [2, 5];
  for (let z = 10; z < top; z += z < 20 ? 10 : z < 100 ? 10 : 50) out.push(z);
  out.push(Math.round(top * 100) / 100);
  return [...new Set(out)];
}

export function windReadout(project: ProjectFile): WindReadout[] {
  const heights = readoutHeights(project);
  return project.loadCases.filter((c) => c.wind).map((c) => {
    const w = c.wind!;
    const b = w.basis;
    const basis = b
      ? `${b.velocity === 'mean' ? 'mean' : 'peak (gust)'} speed averaged over ${b.averagingPeriod} s` +
        (b.gustFactor !== undefined ? `, gust factor ${b.gustFactor}` : '') + (b.structuralFactor !== undefined ? `, structural factor ${b.structuralFactor}` : '')
      : 'not stated (speed used as entered, no gust or structural factor)';
    const p = w.profile;
    const profile = !p ? 'power law, exponent 1/7 (default)' : p.kind === 'power' ? `power law, exponent ${p.exponent}` : p.kind === 'log' ? `logarithmic, roughness length ${p.roughnessLength} m` : 'uniform';
    return {
      caseId: c.id, direction: w.direction, speed: w.speed, basis, profile,
      airDensity: w.airDensity ?? DEFAULT_AIR_DENSITY, forceFactor: windForceFactor(w), rows: windProfileRows(w, heights),
    };
  });
}
