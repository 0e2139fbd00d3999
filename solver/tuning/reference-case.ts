import type { ProjectFile } from '../project/types.ts';

/**
 * The installation (reference) case: the pretension state under permanent load. Chosen as the
 * first load case that has self-weight and nothing else (no nodal loads, wind, ice or temperature
 * change); when no case is like that, the first load case. Common practice: the guy tensions set
 * at installation are those under dead load at the reference temperature.
 */
export function referenceCaseId(project: ProjectFile): string {
  const pure = project.loadCases.find(
    (c) => (c.selfWeight ?? true) && !(c.nodalLoads?.length) && !c.wind && !c.ice && !(c.temperatureChange ?? 0),
  );
  const chosen = pure ?? project.loadCases[0];
  if (!chosen) throw new Error('project has no load cases: at least one (usually dead load) is needed');
  return chosen.id;
}
