/**
 * Wind from N directions (WindDirectionsSpec): copies of a load case whose wind blows toward
 * azimuth + k · 360°/N, k = 0 … N − 1, each solved as the case "<id> <direction>°" (direction
 * reduced to [0°, 360°), rounded to 0.001° in the id).
 */
import type { LoadCaseSpec, ProjectFile, WindDirectionsSpec } from '../project/types.ts';

export function windDirectionCases(project: ProjectFile, spec: WindDirectionsSpec): LoadCaseSpec[] {
  const base = project.loadCases.find((c) => c.id === spec.case);
  if (!base?.wind) throw new Error(`windDirections "${spec.id}": case "${spec.case}" is not a load case with wind`);
  const out: LoadCaseSpec[] = [];
  for (let k = 0; k < spec.count; k++) {
    const raw = (spec.azimuth ?? 0) + (k * 360) / spec.count;
    const direction = ((raw % 360) + 360) % 360;
    const name = Math.round(direction * 1000) / 1000;
    out.push({ ...base, id: `${spec.id} ${name}°`, wind: { ...base.wind, direction } });
  }
  return out;
}
