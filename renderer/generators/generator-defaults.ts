/**
 * Starting parameters for a new generator record in the Generate dialog (SI: m, N, Pa, kg/m).
 * Sections are typical catalogue-like values recalled from memory for steel round bar and spiral
 * strand (E = 210 GPa for bar, 150 GPa for strand: common practice); they are placeholders to be
 * replaced by the supplier's data. The base of a new mast is put beside the existing model so
 * the new parts do not overlap it.
 */
import type { GeneratorRecord, ProjectFile, Vec3 } from '../../solver/index.ts';
import type { GuyedMastParams, RadialNetParams, SaddleNetParams, SectionInput } from '../../main/common/generators/index.ts';
import { freshId } from '../model/project-edits.ts';

const roundBar = (d: number, label: string): SectionInput => ({
  E: 210e9, area: Math.PI * d * d / 4, massPerLength: 7850 * Math.PI * d * d / 4, diameter: d, thermalExpansion: 1.2e-5, label,
});
/** Spiral strand: metallic area ≈ 0.75 of the circle, breaking load ≈ 1.33 kN/mm² of it (recalled typical values). */
export const strand = (d: number, label: string): SectionInput => {
  const area = 0.75 * Math.PI * d * d / 4;
  return { E: 150e9, area, massPerLength: 8250 * area, breakingLoad: 1.33e9 * area, diameter: d, thermalExpansion: 1.2e-5, label };
};

/** Guy strand sizes offered in the mast form (diameters, m), with the data of `strand`. */
export const GUY_STRAND_SIZES = [0.008, 0.01, 0.012, 0.014, 0.016, 0.018, 0.02, 0.022, 0.026];

export function defaultGuyedMast(base: Vec3): GuyedMastParams {
  return {
    height: 24, base, guyLevels: [12, 23], guysPerLevel: 3, anchorRadius: 16, anchorOrientation: 90, mastModel: 'lattice',
    faceWidth: 0.45, panelHeight: 1.5, leg: roundBar(0.024, 'leg, round 24 mm'), bracing: roundBar(0.01, 'bracing, round 10 mm'),
    guy: strand(0.01, 'guy strand 10 mm'), guySegments: 8, pretensionShare: 0.1,
  };
}

export function defaultSaddleNet(centre: Vec3): SaddleNetParams {
  return {
    outline: 'rectangle', lengthX: 16, lengthY: 12, spacing: 2, centre, highPointHeight: 8, lowPointHeight: 3, netTension: 8000, edgeForceFactor: 6,
    netCable: strand(0.012, 'net cable 12 mm'), edgeCable: strand(0.026, 'edge cable 26 mm'),
    mast: { E: 210e9, area: 0.0041, massPerLength: 32, diameter: 0.27, thermalExpansion: 1.2e-5, label: 'mast tube 273 × 5' },
    backstay: strand(0.032, 'back-stay 32 mm'), backstaySegments: 6,
  };
}

export function defaultRadialNet(centre: Vec3): RadialNetParams {
  return {
    outerRadius: 12, innerRadius: 2, radialCount: 12, hoopCount: 2, centre, outerHeight: 3, mastHeight: 10, radialTension: 10000,
    radialCable: strand(0.016, 'radial cable 16 mm'), ringCable: strand(0.026, 'ring cable 26 mm'), hanger: strand(0.016, 'hanger 16 mm'),
    mast: { E: 210e9, area: 0.0041, massPerLength: 32, diameter: 0.27, thermalExpansion: 1.2e-5, label: 'mast tube 273 × 5' },
  };
}

/** A point on the ground beside the model: `clearance` m past its largest x, at its centre y and lowest z. */
export function besideModel(project: ProjectFile, clearance: number): Vec3 {
  if (project.nodes.length === 0) return [0, 0, 0];
  let xMax = -Infinity, yMin = Infinity, yMax = -Infinity, zMin = Infinity;
  for (const n of project.nodes) {
    xMax = Math.max(xMax, n.at[0]);
    yMin = Math.min(yMin, n.at[1]);
    yMax = Math.max(yMax, n.at[1]);
    zMin = Math.min(zMin, n.at[2]);
  }
  return [Math.round(xMax + clearance), Math.round((yMin + yMax) / 2), zMin];
}

export type GeneratorKind = GeneratorRecord['kind'];

/** An id for a new record of `kind` that no record and no part prefix uses yet. */
export function newRecordId(project: ProjectFile, kind: GeneratorKind): string {
  const prefix = kind === 'guyedMast' ? 'mast ' : kind === 'saddleNet' ? 'saddle ' : 'radial ';
  const used = new Set((project.generators ?? []).map((g) => g.id));
  for (const list of [project.nodes, project.members, project.sections, project.groups ?? []]) {
    for (const r of list) {
      const slash = r.id.indexOf('/');
      if (slash > 0) used.add(r.id.slice(0, slash));
    }
  }
  return freshId(prefix, used);
}
