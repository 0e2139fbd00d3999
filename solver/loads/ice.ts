import type { AnalysisModel } from '../model/analysis-model.ts';
import type { IceSpec, ProjectFile } from '../project/types.ts';
import { membersOfGroups } from '../checks/groups.ts';
import { DEFAULT_ICE_DENSITY } from './defaults.ts';

/**
 * Mass of a uniform radial ice coat per unit length, kg/m, on a round section of diameter D (m)
 * with radial thickness t (m) and ice density ρ (kg/m³): the annulus area times density,
 *   m = ρ π ((D/2 + t)² − (D/2)²) = ρ π t (D + t).
 */
export function iceAnnulusMass(diameter: number, thickness: number, density: number): number {
  return density * Math.PI * thickness * (diameter + thickness);
}

/**
 * Radial ice thickness per element, m (0 where the element is not iced). An element is iced when
 * its member is in `ice.groups` (every member when absent), is not in `ice.bareMembers`, and its
 * section has a diameter > 0 or is a lattice with a memberWidth (the lattice face then grows,
 * lattice-force-coefficient.ts; the ice mass needs the diameter).
 */
export function iceThicknessPerElement(model: AnalysisModel, project: ProjectFile, ice: IceSpec | undefined): Float64Array {
  const t = new Float64Array(model.elementCount);
  if (!ice || !(ice.thickness > 0)) return t;
  const allowed = ice.groups && ice.groups.length > 0 ? membersOfGroups(project, ice.groups) : null;
  const bare = new Set(ice.bareMembers ?? []);
  for (const mt of model.members) {
    if ((allowed && !allowed.has(mt.id)) || bare.has(mt.id)) continue;
    const latticeWidth = project.sections[mt.sectionIndex]?.lattice?.memberWidth ?? 0;
    for (let k = 0; k < mt.elementCount; k++) {
      const e = mt.firstElement + k;
      if (model.elemDiameter[e] > 0 || latticeWidth > 0) t[e] = ice.thickness;
    }
  }
  return t;
}

/**
 * Extra mass per unstressed length from ice, kg/m per element (see iceAnnulusMass). The analysis
 * adds it to the self-weight (scaled with the gravity factor of the case or combination).
 */
export function iceMassPerLength(model: AnalysisModel, project: ProjectFile, ice: IceSpec): Float64Array {
  const t = iceThicknessPerElement(model, project, ice);
  const rho = ice.density ?? DEFAULT_ICE_DENSITY;
  const m = new Float64Array(model.elementCount);
  for (let e = 0; e < model.elementCount; e++) {
    if (t[e] > 0 && model.elemDiameter[e] > 0) m[e] = iceAnnulusMass(model.elemDiameter[e], t[e], rho);
  }
  return m;
}
