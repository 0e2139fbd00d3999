/**
 * Area loads on panels (AreaLoadSpec) → nodal loads of a case, by tributary area
 * (panel-geometry.ts):
 * - snow s (Pa on plan area) and cladding g (Pa on true area): fixed downward forces −s·A_k,plan
 *   and −g·A_k,true at the modelled geometry, added to the case's fixed nodal loads;
 * - pressure p·c_p (Pa, positive against the panel normal): F_k = −p c_p a_k on the deformed
 *   panel, a follower load evaluated inside every Newton iteration.
 *
 * Work consistency: on a closed surface of panels these forces are F = −p ∇V, V the enclosed
 * volume of the fan triangles, so the pressure is conservative there (tests check it by finite
 * differences). Load stiffness: the follower's derivative is not in the tangent (like wind drag,
 * see case-loads.ts) — the residual, hence the converged state, is exact; convergence is linear
 * where the pressure stiffness matters.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { AreaLoadSpec, LoadCaseSpec, PanelSpec, ProjectFile } from '../project/types.ts';
import type { CaseLoads, FollowerLoad } from './case-loads.ts';
import { panelShares } from './panel-geometry.ts';

interface ResolvedPanel {
  spec: PanelSpec;
  /** Model node index of each corner. */
  nodes: Int32Array;
}

function resolvePanels(model: AnalysisModel, project: ProjectFile): ResolvedPanel[] {
  const index = new Map(model.nodeIds.map((id, i) => [id, i] as const));
  return (project.panels ?? []).map((spec, p) => {
    const nodes = new Int32Array(spec.nodes.map((id) => {
      const i = index.get(id);
      if (i === undefined) throw new Error(`panels[${p}] "${spec.id}": node "${id}" does not exist`);
      return i;
    }));
    return { spec, nodes };
  });
}

function applies(load: AreaLoadSpec, panel: PanelSpec): boolean {
  if (!load.panels || load.panels.length === 0) return true;
  return load.panels.includes(panel.id) || (panel.region !== undefined && load.panels.includes(panel.region));
}

/** c_p of a panel under a pressure load: its own id first, then its region, else 1. */
export function pressureCoefficientOf(load: AreaLoadSpec, panel: PanelSpec): number {
  const list = load.coefficients ?? [];
  const own = list.find((c) => c.region === panel.id);
  if (own) return own.cp;
  const region = panel.region === undefined ? undefined : list.find((c) => c.region === panel.region);
  return region ? region.cp : 1;
}

/** Fixed nodal forces (N, 3 × nodeCount, added into `nodal`) of the snow and cladding loads of a case. */
export function addFixedAreaLoads(model: AnalysisModel, panels: ResolvedPanel[], loads: AreaLoadSpec[], nodal: Float64Array): void {
  let share = new Float64Array(12);
  for (const load of loads) {
    if (load.kind === 'pressure') continue;
    const measure = load.kind === 'snow' ? 'plan' : 'true';
    for (const p of panels) {
      if (!applies(load, p.spec)) continue;
      if (share.length < 3 * p.nodes.length) share = new Float64Array(3 * p.nodes.length);
      panelShares(model.coords, p.nodes, measure, share);
      for (let k = 0; k < p.nodes.length; k++) nodal[3 * p.nodes[k] + 2] -= load.value * share[3 * k + 2];
    }
  }
}

/** Follower load of the pressure loads of a case (null when there are none). */
export function createPanelPressureLoad(panels: ResolvedPanel[], loads: AreaLoadSpec[]): FollowerLoad | null {
  const terms: { nodes: Int32Array; pressure: number }[] = [];
  for (const load of loads) {
    if (load.kind !== 'pressure') continue;
    for (const p of panels) {
      if (!applies(load, p.spec)) continue;
      const pressure = load.value * pressureCoefficientOf(load, p.spec);
      if (pressure !== 0) terms.push({ nodes: p.nodes, pressure });
    }
  }
  if (terms.length === 0) return null;
  let share = new Float64Array(12);
  return {
    accumulate(x: Float64Array, factor: number, f: Float64Array): void {
      if (factor === 0) return;
      for (const t of terms) {
        if (share.length < 3 * t.nodes.length) share = new Float64Array(3 * t.nodes.length);
        panelShares(x, t.nodes, 'vector', share);
        const c = -factor * t.pressure;
        for (let k = 0; k < t.nodes.length; k++) {
          const i = 3 * t.nodes[k];
          f[i] += c * share[3 * k]; f[i + 1] += c * share[3 * k + 1]; f[i + 2] += c * share[3 * k + 2];
        }
      }
    },
  };
}

/** Two follower loads as one (either may be null). */
export function sumFollowers(a: FollowerLoad | null, b: FollowerLoad | null): FollowerLoad | null {
  if (!a) return b;
  if (!b) return a;
  return { accumulate(x, factor, f) { a.accumulate(x, factor, f); b.accumulate(x, factor, f); } };
}

/** The case's loads with its area loads added (the input object is changed and returned). */
export function withAreaLoads(model: AnalysisModel, project: ProjectFile, spec: LoadCaseSpec, loads: CaseLoads): CaseLoads {
  const list = spec.areaLoads ?? [];
  if (list.length === 0) return loads;
  const panels = resolvePanels(model, project);
  addFixedAreaLoads(model, panels, list, loads.nodal);
  loads.follower = sumFollowers(loads.follower, createPanelPressureLoad(panels, list));
  return loads;
}
