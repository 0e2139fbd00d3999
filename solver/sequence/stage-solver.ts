/**
 * One erection stage as a nonlinear solve: only the members in place are in the model.
 *
 * Member activation is done by building a sub-model (no change to the solver core): the stage's
 * project holds the members present, each with its unstressed length for that stage; user nodes
 * that no present member touches are fixed (they carry nothing, and a free node without members
 * would be a mechanism); temporary restraints add restrained directions. The one load case is
 * self-weight (optional) and the day's temperature change ΔT = T_day − T_ref.
 * Each solve warm-starts from the previous stage's positions (nodes matched by id, member interior
 * nodes by member id and index) and falls back to a cold start, so results are those of a separate
 * solve of the stage (tested).
 */
import type { NodeSpec, ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import type { AnalysisModel } from '../model/analysis-model.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveCaseLoads } from '../loads/resolve-case-loads.ts';
import { createWorkspace } from '../analysis/workspace.ts';
import { solveCase } from '../analysis/solve-case.ts';

export interface StageSpec {
  /** Ids of the members in place. */
  present: ReadonlySet<string>;
  /** Unstressed length per member id for this stage, m (members missing here keep the project's own). */
  lengths: ReadonlyMap<string, number>;
  /** Temporary restraints in place. */
  restraints: readonly { node: string; fixed: string }[];
  /** T_day − T_ref, K. */
  deltaT: number;
  selfWeight: boolean;
}

export const STAGE_CASE_ID = 'stage';

function mergeFixed(a: string | undefined, b: string): string {
  return [...'xyz'].filter((q) => (a ?? '').includes(q) || b.includes(q)).join('');
}

/** The stage as a project of its own (see the file comment). */
export function stageProject(design: ProjectFile, stage: StageSpec): ProjectFile {
  const members = design.members.filter((m) => stage.present.has(m.id)).map((m) => {
    const L0 = stage.lengths.get(m.id);
    if (L0 === undefined) return { ...m };
    const copy = { ...m, unstressedLength: L0 };
    delete copy.pretension;
    return copy;
  });
  const touched = new Set(members.flatMap((m) => [m.from, m.to]));
  const extra = new Map<string, string>();
  for (const r of stage.restraints) extra.set(r.node, mergeFixed(extra.get(r.node), r.fixed));
  const nodes = design.nodes.map((n): NodeSpec => {
    if (!touched.has(n.id)) return { ...n, fixed: 'xyz' };
    const add = extra.get(n.id);
    return add ? { ...n, fixed: mergeFixed(n.fixed, add) } : { ...n };
  });
  return {
    format: design.format, version: design.version, meta: design.meta, nodes, sections: design.sections, members,
    loadCases: [{ id: STAGE_CASE_ID, selfWeight: stage.selfWeight, temperatureChange: stage.deltaT }],
  };
}

function nodeKeys(model: AnalysisModel): string[] {
  const keys = new Array<string>(model.nodeCount);
  model.nodeIds.forEach((id, i) => { keys[i] = `n:${id}`; });
  for (const m of model.members) for (let k = 1; k < m.nodeChain.length - 1; k++) keys[m.nodeChain[k]] = `m:${m.id}#${k}`;
  return keys;
}

export interface StageSolution {
  result: CaseResult;
  /** Deformed positions by node key (see nodeKeys), m. */
  positions: Map<string, [number, number, number]>;
}

/** Solve one stage, warm-started from `previous` positions when given. */
export function solveStage(design: ProjectFile, stage: StageSpec, previous?: ReadonlyMap<string, [number, number, number]>): StageSolution {
  const project = stageProject(design, stage);
  const model = buildModel(project);
  const ws = createWorkspace(model);
  const loads = resolveCaseLoads(model, project, project.loadCases[0]);
  const keys = nodeKeys(model);
  let start: Float64Array | undefined;
  if (previous) {
    start = new Float64Array(model.coords);
    keys.forEach((k, i) => {
      const p = previous.get(k);
      if (p) for (let q = 0; q < 3; q++) if (!model.fixed[3 * i + q]) start![3 * i + q] = p[q];
    });
  }
  const s = solveCase(ws, STAGE_CASE_ID, loads, start ? { start } : {});
  const positions = new Map<string, [number, number, number]>();
  const x = s.fields.positions;
  keys.forEach((k, i) => positions.set(k, [x[3 * i], x[3 * i + 1], x[3 * i + 2]]));
  return { result: s.result, positions };
}
