/**
 * The stick model of a guyed mast: one line of beam-columns on the mast axis, split into elements
 * of about `stickElementLength`, with a node at every guy level (all guys of a level attach
 * there). The section is the equivalent beam of the triangular lattice (faceWidth, leg, bracing,
 * panelHeight; solver's latticeMastEquivalent) or a circular tube. The base is a pivot: pinned in
 * translation and restrained in twist ("xyzrz"), free to rotate in bending — the usual guyed-mast
 * base. Any length of mast above the top guy level is a cantilever (e.g. an antenna mast).
 */
import type { MemberSpec, SectionSpec, Vec3 } from '../../../solver/index.ts';
import { circularTube, latticeMastEquivalent } from '../../../solver/index.ts';
import type { GuyedMastParams } from './guyed-mast.ts';
import { sectionSpec } from './types.ts';

/** Steel density for the stick section's mass, kg/m³ (common practice). */
const STEEL_DENSITY = 7850;
/** Poisson's ratio for G = E/(2(1 + ν)) when the leg section gives no G (steel, common practice). */
const STEEL_POISSON = 0.3;

export interface StickParts {
  section: SectionSpec;
  /** Mast node heights above the base: the base, every guy level and the top. */
  levels: number[];
  /** Elements per span between consecutive levels. */
  segments: number[];
}

export function stickMastParts(sectionId: string, p: GuyedMastParams): StickParts {
  const E = p.leg.E;
  const G = p.leg.G ?? E / (2 * (1 + STEEL_POISSON));
  const shape = p.stickSection ?? { shape: 'latticeEquivalent' as const };
  const props = shape.shape === 'tube'
    ? circularTube(shape.diameter, shape.wall, STEEL_DENSITY)
    : latticeMastEquivalent({
      legs: 3, faceWidth: p.faceWidth, legArea: p.leg.area, diagonalArea: p.bracing?.area ?? p.leg.area,
      panelHeight: p.panelHeight ?? p.faceWidth, E, G, density: STEEL_DENSITY,
    });
  const base = sectionSpec(sectionId, { ...p.leg, massPerLength: round(props.massPerLength), diameter: shape.shape === 'tube' ? shape.diameter : undefined }, {
    G, Iy: props.Iy, Iz: props.Iz, J: props.J,
    label: shape.shape === 'tube' ? `mast tube ${shape.diameter * 1000} × ${shape.wall * 1000} mm` : 'mast (equivalent beam of the lattice)',
  });
  base.area = props.area;
  if (shape.shape !== 'tube') base.lattice = { faceWidth: p.faceWidth, solidity: p.solidity ?? 0.2, ...(p.latticeDragFactor !== undefined ? { dragFactor: p.latticeDragFactor } : {}) };
  else delete base.lattice;
  const levels = [0, ...p.guyLevels, p.height].filter((z, i, a) => i === 0 || z > a[i - 1] + 1e-9);
  const h = p.stickElementLength ?? 2;
  const segments = levels.slice(1).map((z, i) => Math.max(1, Math.ceil((z - levels[i]) / h - 1e-9)));
  return { section: base, levels, segments };
}

const round = (v: number) => Number(v.toPrecision(6));

/** Beam members of the stick between consecutive level nodes. */
export function stickMembers(recordId: string, nodeIds: string[], parts: StickParts): MemberSpec[] {
  return nodeIds.slice(1).map((to, k) => ({
    id: `${recordId}/mast ${k + 1}`, kind: 'beam', from: nodeIds[k], to, section: parts.section.id,
    segments: parts.segments[k], generatedBy: recordId,
  }));
}

export type { Vec3 };
