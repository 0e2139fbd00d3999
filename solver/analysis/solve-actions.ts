/**
 * The cases a project's design actions make, solved after its load cases and combinations and
 * appended to the same report (so envelopes, checks and the app take them like any case):
 * - wind from N directions (WindDirectionsSpec): "<id> <direction>°";
 * - patch wind (PatchWindSpec): "<id> / patch k", then "<id> max" and "<id> min";
 * - member loss (MemberLossSpec): "<id> / <member>" per removed member;
 * - ice with wind (IceWithWindSpec) and unbalanced ice (UnbalancedIceSpec): load cases of ice-cases.ts.
 * An action whose case is not in the project is skipped: projects derived for tuning, sequences
 * or as-built fitting keep only their own cases (a validated file always has the cases).
 * Fields of every appended case have the full model's layout (a removed member's elements are
 * slack with zero force, its interior nodes on the line between its ends).
 */
import type { LoadCaseSpec, ProjectFile } from '../project/types.ts';
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { CaseFields, ProjectSolution } from '../results/types.ts';
import type { SolveControl } from './progress.ts';
import type { CaseSolution } from './solve-case.ts';
import type { Workspace } from './workspace.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveCaseLoads, resolveNamedCaseLoads } from '../loads/resolve-case-loads.ts';
import { patchCases } from '../loads/patch-wind.ts';
import { windDirectionCases } from '../loads/wind-directions.ts';
import { iceWithWindCases, unbalancedIceCases } from '../loads/ice-cases.ts';
import { dynamicFactorOf, lostMembers, memberEndForces, projectWithout } from '../loads/member-loss.ts';
import { combinePatchResults } from '../results/patch-combination.ts';
import { createWorkspace } from './workspace.ts';
import { solveCase } from './solve-case.ts';

/** True when the project has any action that adds cases (see the file comment). */
export function hasActionCases(project: ProjectFile): boolean {
  return Boolean(project.patchWind?.length || project.memberLoss?.length || project.windDirections?.length || project.iceWithWind?.length || project.unbalancedIce?.length);
}

/** The actions whose cases exist in the project (see the file comment). */
function activeActions(project: ProjectFile) {
  const hasWindCase = (id: string) => Boolean(project.loadCases.find((c) => c.id === id)?.wind);
  const hasIceCase = (id: string) => Boolean(project.loadCases.find((c) => c.id === id)?.ice);
  const hasCase = (id: string) => project.loadCases.some((c) => c.id === id) || (project.combinations ?? []).some((c) => c.id === id);
  return {
    directions: (project.windDirections ?? []).filter((s) => hasWindCase(s.case)),
    patches: (project.patchWind ?? []).filter((s) => hasWindCase(s.meanCase)),
    losses: (project.memberLoss ?? []).filter((s) => hasCase(s.fromCase)),
    iceWinds: (project.iceWithWind ?? []).filter((s) => hasIceCase(s.iceCase) && hasWindCase(s.windCase)),
    unbalanced: (project.unbalancedIce ?? []).filter((s) => hasIceCase(s.case)),
  };
}

/** Ids of the cases the actions of a project add, in the order they are solved. */
export function actionCaseIds(project: ProjectFile, model: AnalysisModel = buildModel(project)): string[] {
  const ids: string[] = [];
  const act = activeActions(project);
  for (const spec of act.directions) ids.push(...windDirectionCases(project, spec).map((c) => c.id));
  for (const spec of act.patches) ids.push(...patchCases(model, project, spec).map((p) => p.id), `${spec.id} max`, `${spec.id} min`);
  for (const spec of act.losses) ids.push(...lostMembers(project, spec).map((m) => `${spec.id} / ${m}`));
  for (const c of derivedIceCases(project, act)) ids.push(c.id);
  return ids;
}

/** The load cases of the ice actions (ice with wind, then unbalanced ice), each with its spec id. */
function derivedIceCases(project: ProjectFile, act: ReturnType<typeof activeActions>): (LoadCaseSpec & { specId: string })[] {
  return [
    ...act.iceWinds.flatMap((s) => iceWithWindCases(project, s).map((c) => ({ ...c, specId: s.id }))),
    ...act.unbalanced.flatMap((s) => unbalancedIceCases(project, s).map((c) => ({ ...c, specId: s.id }))),
  ];
}

/**
 * The load case behind an action case id (wind directions, ice with wind, unbalanced ice), for
 * its purpose; undefined for other ids.
 */
export function derivedLoadCase(project: ProjectFile, id: string): LoadCaseSpec | undefined {
  const act = activeActions(project);
  for (const spec of act.directions) { const c = windDirectionCases(project, spec).find((x) => x.id === id); if (c) return c; }
  return derivedIceCases(project, act).find((c) => c.id === id);
}

function caseLoadsOf(model: AnalysisModel, project: ProjectFile, id: string): CaseLoads {
  const loads = resolveNamedCaseLoads(model, project, id);
  if (!loads) throw new Error(`case "${id}" does not exist`);
  return loads;
}

export function appendActionCases(
  project: ProjectFile, model: AnalysisModel, ws: Workspace, solution: ProjectSolution,
  control: SolveControl, wanted: (id: string) => boolean,
): void {
  if (!hasActionCases(project)) return;
  const act = activeActions(project);
  const solved = (id: string): CaseSolution => {
    const k = solution.report.cases.findIndex((c) => c.id === id);
    if (k >= 0) return { result: solution.report.cases[k], fields: solution.fields[k] };
    return solveCase(ws, id, caseLoadsOf(model, project, id), { control });
  };
  const push = (s: CaseSolution) => { solution.report.cases.push(s.result); solution.fields.push(s.fields); };
  const tag = (caseId: string) => ({ caseIndex: solution.report.cases.length, caseCount: solution.report.cases.length + 1, caseId });

  for (const spec of act.directions) {
    for (const c of windDirectionCases(project, spec)) {
      if (!wanted(c.id) && !wanted(spec.id)) continue;
      push(solveCase(ws, c.id, resolveCaseLoads(model, project, c), { control, tag: tag(c.id) }));
    }
  }

  for (const spec of act.patches) {
    const cases = patchCases(model, project, spec);
    const ids = [spec.id, `${spec.id} max`, `${spec.id} min`, ...cases.map((c) => c.id)];
    if (!ids.some(wanted)) continue;
    const mean = solved(spec.meanCase);
    const patches = cases.map((c) => solveCase(ws, c.id, c.loads, { control, tag: tag(c.id) }));
    patches.forEach(push);
    push(combinePatchResults(model, `${spec.id} max`, 1, mean, patches));
    push(combinePatchResults(model, `${spec.id} min`, -1, mean, patches));
  }

  for (const c of derivedIceCases(project, act)) {
    if (!wanted(c.id) && !wanted(c.specId)) continue;
    push(solveCase(ws, c.id, resolveCaseLoads(model, project, c), { control, tag: tag(c.id) }));
  }

  for (const spec of act.losses) {
    const factor = dynamicFactorOf(spec);
    for (const member of lostMembers(project, spec)) {
      const id = `${spec.id} / ${member}`;
      if (!wanted(id) && !wanted(spec.id)) continue;
      const before = solved(spec.fromCase);
      const released = memberEndForces(model, before.fields, member);
      const reduced = projectWithout(project, member);
      const rModel = buildModel(reduced.project);
      const loads = caseLoadsOf(rModel, reduced.project, spec.fromCase);
      for (let d = 0; d < released.length; d++) if (!rModel.fixed[d]) loads.nodal[d] += (1 - factor) * released[d];
      const s = solveCase(createWorkspace(rModel), id, loads, { control, tag: tag(id) });
      s.result.reactions = s.result.reactions.filter((r) => !reduced.detached.has(r.node));
      push({ result: s.result, fields: fieldsInFullLayout(model, rModel, s.fields) });
    }
  }
}

/** Fields of a model with members removed, laid out as the full model's (see the file comment). */
function fieldsInFullLayout(full: AnalysisModel, reduced: AnalysisModel, f: CaseFields): CaseFields {
  const positions = new Float64Array(3 * full.nodeCount);
  positions.set(f.positions.subarray(0, 3 * full.userNodeCount));
  const elementTension = new Float64Array(full.elementCount);
  const elementSlack = new Uint8Array(full.elementCount);
  const byId = new Map(reduced.members.map((m) => [m.id, m] as const));
  for (const m of full.members) {
    const r = byId.get(m.id);
    const n = m.nodeChain.length - 1;
    const a = 3 * m.nodeChain[0], b = 3 * m.nodeChain[n];
    for (let k = 1; k < n; k++) {
      const to = 3 * m.nodeChain[k];
      for (let q = 0; q < 3; q++) {
        positions[to + q] = r ? f.positions[3 * r.nodeChain[k] + q] : positions[a + q] + ((positions[b + q] - positions[a + q]) * k) / n;
      }
    }
    for (let k = 0; k < m.elementCount; k++) {
      elementTension[m.firstElement + k] = r ? f.elementTension[r.firstElement + k] : 0;
      elementSlack[m.firstElement + k] = r ? f.elementSlack[r.firstElement + k] : 1;
    }
  }
  return { positions, elementTension, elementSlack };
}
