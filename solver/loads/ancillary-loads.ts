/**
 * Ancillaries (AncillarySpec) → fixed nodal loads of a case, at the modelled geometry:
 * - weight g · (mass + ice mass), downward; the mass when the case has self-weight, the ice
 *   mass (ancillaryIce, by the item's iceBehaviour) when it has ice of radial thickness t (like
 *   ice on members, with or without self-weight);
 * - wind k · q(z) · (drag area with its ice) along the wind direction (horizontal), q = ½ρV(z)²
 *   at the node's height, k the wind basis factor (wind-basis.ts). Ancillary drag does not follow
 *   the deformation (small items; common practice).
 * A line item is spread over the nodes of its group's members between `from` and `to`: each
 * distinct node height gets the tributary height (half way to its neighbours, clipped to the
 * range), shared equally by the nodes at that height.
 * `ancillaryNodalMass` gives the same masses per node (kg) without ice; the case loads carry them
 * with the case's ice (CaseLoads.ancillaryMass), which the modal analysis adds to the lumped mass.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { AncillarySpec, LoadCaseSpec, ProjectFile } from '../project/types.ts';
import type { CaseLoads } from './case-loads.ts';
import { membersOfGroup } from '../checks/groups.ts';
import { STANDARD_GRAVITY } from '../model/constants.ts';
import { DEFAULT_AIR_DENSITY, DEFAULT_ICE_DENSITY } from './defaults.ts';
import { iceAnnulusMass } from './ice.ts';
import { dynamicPressure, windSpeedAt } from './wind-profile.ts';
import { windDirectionVector } from './wind.ts';
import { windForceFactor } from './wind-basis.ts';

/** Nodes an ancillary acts on and the share of its (per-height) quantities each takes: m for line items, 1 for point items. */
export function ancillaryShares(model: AnalysisModel, project: ProjectFile, a: AncillarySpec): { node: number; share: number }[] {
  if (a.node !== undefined) {
    const i = model.nodeIds.indexOf(a.node);
    if (i < 0) throw new Error(`ancillaries "${a.id}": node "${a.node}" does not exist`);
    return [{ node: i, share: 1 }];
  }
  if (!a.along) return [];
  const { from, to } = a.along;
  const members = membersOfGroup(project, a.along.group);
  const nodes = new Set<number>();
  for (const m of model.members) if (members.has(m.id)) for (const n of m.nodeChain) { const z = model.coords[3 * n + 2]; if (z >= from - 1e-9 && z <= to + 1e-9) nodes.add(n); }
  const levels = new Map<number, number[]>();
  for (const n of nodes) { const z = Math.round(model.coords[3 * n + 2] * 1e6) / 1e6; const l = levels.get(z) ?? []; l.push(n); levels.set(z, l); }
  const zs = [...levels.keys()].sort((p, q) => p - q);
  const out: { node: number; share: number }[] = [];
  zs.forEach((z, k) => {
    const lo = k === 0 ? from : 0.5 * (zs[k - 1] + z), hi = k === zs.length - 1 ? to : 0.5 * (z + zs[k + 1]);
    const at = levels.get(z)!;
    for (const n of at) out.push({ node: n, share: (hi - lo) / at.length });
  });
  return out;
}

/**
 * Ice on one ancillary under radial ice t (m) of density ρ (kg/m³), per item (point) or per metre
 * of height (line item): its ice mass, kg (or kg/m), and its drag area with the ice, m² (or m²/m),
 * by its iceBehaviour (AncillarySpec): perThickness dragArea + iceDragArea·t, iceMass·t; coat
 * dragArea·(w + 2t)/w, ρπt(w + t)·(coatLength or 1 m); none: no ice.
 */
export function ancillaryIce(a: AncillarySpec, t: number, rho: number): { mass: number; dragArea: number } {
  if (!(t > 0)) return { mass: 0, dragArea: a.dragArea };
  switch (a.iceBehaviour ?? 'perThickness') {
    case 'none': return { mass: 0, dragArea: a.dragArea };
    case 'coat': {
      const w = a.coatWidth ?? 0;
      if (!(w > 0)) throw new Error(`ancillaries "${a.id}": iceBehaviour "coat" needs coatWidth`);
      const length = a.node !== undefined ? (a.coatLength ?? 0) : 1;
      return { mass: iceAnnulusMass(w, t, rho) * length, dragArea: (a.dragArea * (w + 2 * t)) / w };
    }
    default: return { mass: (a.iceMass ?? 0) * t, dragArea: a.dragArea + (a.iceDragArea ?? 0) * t };
  }
}

/** The case's loads with its ancillaries' weight, ice and wind added (the input object is changed and returned). */
export function withAncillaryLoads(model: AnalysisModel, project: ProjectFile, spec: LoadCaseSpec, loads: CaseLoads): CaseLoads {
  const list = project.ancillaries ?? [];
  if (list.length === 0) return loads;
  const t = spec.ice?.thickness ?? 0;
  const rho = spec.ice?.density ?? DEFAULT_ICE_DENSITY;
  const wind = spec.wind;
  const vibrating = new Float64Array(model.nodeCount);
  for (const a of list) {
    const iced = ancillaryIce(a, t, rho);
    const iceMass = iced.mass;
    const mass = (loads.selfWeight ? a.mass : 0) + iceMass;
    const drag = iced.dragArea;
    for (const { node, share } of ancillaryShares(model, project, a)) {
      vibrating[node] += (a.mass + iceMass) * share;
      loads.nodal[3 * node + 2] -= STANDARD_GRAVITY * mass * share;
      if (!wind || !(drag > 0)) continue;
      const q = windForceFactor(wind) * dynamicPressure(wind.airDensity ?? DEFAULT_AIR_DENSITY, windSpeedAt(model.coords[3 * node + 2], wind.speed, wind.profile));
      const [cx, cy] = windDirectionVector(wind.direction);
      loads.nodal[3 * node] += q * drag * share * cx;
      loads.nodal[3 * node + 1] += q * drag * share * cy;
    }
  }
  loads.ancillaryMass = vibrating;
  return loads;
}

/** Mass of the ancillaries per node, kg (nodeCount entries), for modal mass. */
export function ancillaryNodalMass(model: AnalysisModel, project: ProjectFile): Float64Array {
  const m = new Float64Array(model.nodeCount);
  for (const a of project.ancillaries ?? []) for (const { node, share } of ancillaryShares(model, project, a)) m[node] += a.mass * share;
  return m;
}
