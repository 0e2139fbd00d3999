/**
 * Patch wind on guyed masts (PatchWindSpec): the patch cases S_i of EN 1993-3-1 Annex B, B.4.3.2
 * — the mean wind everywhere, with the wind force on the mast raised inside one patch at a time.
 *
 * What was read: the combination rule S = S_m ± √Σ (S_i − S_m)² of B.4.3.2.5(1), with S_i the
 * response to the mean wind with the increased patch load on span i (as quoted in public notes on
 * the standard). What is recalled, not read: the patches are the spans between adjacent guy
 * levels, the base span and the part above the top guy level; the patch raises the wind on the
 * mast itself (guys keep the mean wind) — check against the standard. The size of the increase
 * (patchFactor) is the user's input.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { PatchWindSpec, ProjectFile, WindSpec } from '../project/types.ts';
import type { CaseLoads, FollowerLoad } from './case-loads.ts';
import { resolveCaseLoads } from './resolve-case-loads.ts';
import { elementDragForce, windDragWidths } from './wind.ts';
import { sumFollowers } from './panel-loads.ts';

/** Heights are merged when closer than this, m. Common practice: far below any guy spacing. */
const LEVEL_TOLERANCE = 1e-3;

/**
 * Default patches: guy levels are the heights of nodes where a cable member ends on a node that
 * a bar or beam member also uses; the patches run base → first level → … → top level → top of the bars.
 */
export function defaultPatches(model: AnalysisModel): { from: number; to: number }[] {
  const barNode = new Set<number>();
  let zMin = Infinity, zMax = -Infinity;
  for (const m of model.members) {
    if (m.kind === 'cable') continue;
    for (const n of m.nodeChain) { barNode.add(n); const z = model.coords[3 * n + 2]; zMin = Math.min(zMin, z); zMax = Math.max(zMax, z); }
  }
  const levels: number[] = [];
  for (const m of model.members) {
    if (m.kind !== 'cable') continue;
    for (const n of [m.nodeChain[0], m.nodeChain[m.nodeChain.length - 1]]) {
      const z = model.coords[3 * n + 2];
      if (barNode.has(n) && z > zMin + LEVEL_TOLERANCE && !levels.some((l) => Math.abs(l - z) < LEVEL_TOLERANCE)) levels.push(z);
    }
  }
  if (!Number.isFinite(zMin)) return [];
  const cuts = [zMin, ...levels.sort((a, b) => a - b)];
  if (zMax > cuts[cuts.length - 1] + LEVEL_TOLERANCE) cuts.push(zMax);
  const out: { from: number; to: number }[] = [];
  for (let k = 0; k + 1 < cuts.length; k++) out.push({ from: cuts[k], to: cuts[k + 1] });
  return out;
}

/** Drag on the elements with a width > 0 (elementDragForce), lumped half per end node. */
function dragLoad(model: AnalysisModel, wind: WindSpec, widths: Float64Array): FollowerLoad {
  const active: number[] = [];
  for (let e = 0; e < model.elementCount; e++) if (widths[e] > 0) active.push(e);
  const fe = new Float64Array(3), a = new Float64Array(3), b = new Float64Array(3);
  return {
    accumulate(x, factor, f) {
      if (factor === 0) return;
      for (const e of active) {
        const i = model.elemNodes[2 * e], j = model.elemNodes[2 * e + 1];
        for (let d = 0; d < 3; d++) { a[d] = x[3 * i + d]; b[d] = x[3 * j + d]; }
        elementDragForce(a, b, widths[e], wind, fe);
        for (let d = 0; d < 3; d++) { const h = 0.5 * factor * fe[d]; f[3 * i + d] += h; f[3 * j + d] += h; }
      }
    },
  };
}

export interface PatchCase {
  /** "<id> / patch k" (k from 1). */
  id: string;
  range: { from: number; to: number };
  loads: CaseLoads;
}

/**
 * The patch cases of a PatchWindSpec: the mean case's loads plus (patchFactor − 1) × the drag on
 * the bar and beam members whose mid-height (modelled geometry) is inside the patch (from ≤ z < to; the
 * top patch includes its upper end).
 */
export function patchCases(model: AnalysisModel, project: ProjectFile, spec: PatchWindSpec): PatchCase[] {
  const mean = project.loadCases.find((c) => c.id === spec.meanCase);
  if (!mean?.wind) throw new Error(`patchWind "${spec.id}": meanCase "${spec.meanCase}" is not a load case with wind`);
  const ranges = spec.patches ?? defaultPatches(model);
  const all = windDragWidths(model, project, mean);
  const top = Math.max(...ranges.map((r) => r.to));
  return ranges.map((range, k) => {
    const widths = new Float64Array(model.elementCount);
    for (const m of model.members) {
      if (m.kind === 'cable') continue;
      for (let e = m.firstElement; e < m.firstElement + m.elementCount; e++) {
        const z = 0.5 * (model.coords[3 * model.elemNodes[2 * e] + 2] + model.coords[3 * model.elemNodes[2 * e + 1] + 2]);
        if (z >= range.from && (z < range.to || (range.to === top && z <= top))) widths[e] = (spec.patchFactor - 1) * all[e];
      }
    }
    const loads = resolveCaseLoads(model, project, mean);
    loads.follower = sumFollowers(loads.follower, dragLoad(model, mean.wind!, widths));
    return { id: `${spec.id} / patch ${k + 1}`, range, loads };
  });
}
