/**
 * Tuning targets (TuningTarget) evaluated on solved cases.
 *
 * Every target becomes a normalised gap g (dimensionless) the tuner drives:
 * - sag (≤):          g = max over group members of sag / limit − 1, limit = absolute m or
 *                     fractionOfSpan × deformed chord length; MemberResult.sag (largest vertical
 *                     distance below the chord).
 * - tensionShare (=): g = share / target − 1, share = mean over members of T_max / breakingLoad in
 *                     the reference case (reference-case.ts: the installation state under dead load).
 * - noSlack (≥ 0):    g = −T_min / T_scale, T_min the least element tension of the group in the case
 *                     and T_scale the group's mean pretension at the start (so g ≤ 0 when every
 *                     element is in tension). Slack elements report T_min ≤ 0.
 * - plumb (≤):        g = offset / tolerance − 1, offset = horizontal (x, y) distance of the top's
 *                     displacement relative to the base's displacement, m; tolerance in m.
 * - reaction (≤):     g = |R| / limit − 1, |R| the magnitude of the support reaction at the node, N.
 */
import type { ProjectFile, TuningTarget } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { membersOfGroup, groupExists } from '../checks/groups.ts';
import { referenceCaseId } from './reference-case.ts';
import type { TargetValue } from './tuning-types.ts';
import { memberPretension } from './tuning-variables.ts';

/** Case ids a target needs solved. */
export function targetCases(project: ProjectFile, t: TuningTarget): string[] {
  return t.kind === 'tensionShare' ? [referenceCaseId(project)] : [t.case];
}

/** Throws naming the target and the problem when a target cannot be evaluated on this project. */
export function validateTarget(project: ProjectFile, t: TuningTarget, index: number): void {
  const where = `tuning.targets[${index}] (${t.kind})`;
  const caseIds = new Set([...project.loadCases.map((c) => c.id), ...(project.combinations ?? []).map((c) => c.id)]);
  if ('case' in t && !caseIds.has(t.case)) throw new Error(`${where}: case "${t.case}" does not exist`);
  if ('group' in t) {
    if (!groupExists(project, t.group)) throw new Error(`${where}: group "${t.group}" does not exist`);
    if (membersOfGroup(project, t.group).size === 0) throw new Error(`${where}: group "${t.group}" has no members`);
  }
  const nodeIds = new Set(project.nodes.map((n) => n.id));
  const positive = (name: string, v: number) => {
    if (!(v > 0) || !Number.isFinite(v)) throw new Error(`${where}: ${name} must be a positive number, got ${v}`);
  };
  switch (t.kind) {
    case 'sag':
      positive('sag limit', 'absolute' in t.limit ? t.limit.absolute : t.limit.fractionOfSpan);
      break;
    case 'tensionShare': {
      if (!(t.share > 0 && t.share < 1)) throw new Error(`${where}: share must be between 0 and 1 (a fraction of the breaking load), got ${t.share}`);
      for (const id of membersOfGroup(project, t.group)) {
        const m = project.members.find((x) => x.id === id)!;
        const s = project.sections.find((x) => x.id === m.section);
        if (!s?.breakingLoad) throw new Error(`${where}: member "${id}" (section "${m.section}") has no breakingLoad`);
      }
      break;
    }
    case 'plumb':
      for (const n of [t.base, t.top]) if (!nodeIds.has(n)) throw new Error(`${where}: node "${n}" does not exist`);
      positive('tolerance', t.tolerance);
      break;
    case 'reaction': {
      const node = project.nodes.find((n) => n.id === t.node);
      if (!node) throw new Error(`${where}: node "${t.node}" does not exist`);
      if (!node.fixed) throw new Error(`${where}: node "${t.node}" is not a support (it has no fixed directions)`);
      positive('limit', t.limit);
      break;
    }
    case 'noSlack':
      break;
  }
}

function caseOf(results: Map<string, CaseResult>, id: string): CaseResult {
  const r = results.get(id);
  if (!r) throw new Error(`tuning: case "${id}" was not solved`);
  return r;
}

/**
 * Value and normalised gap of a target (see the file comment). `tensionScale` is the group's
 * mean starting pretension, N (used by noSlack).
 */
export function evaluateTarget(
  project: ProjectFile, t: TuningTarget, results: Map<string, CaseResult>, tensionScale: (group: string) => number,
): TargetValue {
  switch (t.kind) {
    case 'sag': {
      const r = caseOf(results, t.case);
      const ids = membersOfGroup(project, t.group);
      let worst: TargetValue | null = null;
      for (const m of r.members) {
        if (!ids.has(m.id)) continue;
        const limit = 'absolute' in t.limit ? t.limit.absolute : t.limit.fractionOfSpan * m.chordLength;
        const gap = m.sag / limit - 1;
        if (!worst || gap > worst.gap) worst = { value: m.sag, limit, sense: 'atMost', gap, governing: m.id, unit: 'm' };
      }
      if (!worst) throw new Error(`tuning: no results for group "${t.group}" in case "${t.case}"`);
      return worst;
    }
    case 'tensionShare': {
      const r = caseOf(results, referenceCaseId(project));
      const ids = membersOfGroup(project, t.group);
      let sum = 0;
      let count = 0;
      let governing = '';
      let top = -Infinity;
      for (const m of r.members) {
        if (!ids.has(m.id)) continue;
        const spec = project.members.find((x) => x.id === m.id)!;
        const mbl = project.sections.find((s) => s.id === spec.section)!.breakingLoad!;
        const share = m.tensionMax / mbl;
        sum += share;
        count++;
        if (share > top) { top = share; governing = m.id; }
      }
      const value = sum / count;
      return { value, limit: t.share, sense: 'equal', gap: value / t.share - 1, governing, unit: 'share' };
    }
    case 'noSlack': {
      const r = caseOf(results, t.case);
      const ids = membersOfGroup(project, t.group);
      let min = Infinity;
      let governing = '';
      for (const m of r.members) {
        if (!ids.has(m.id)) continue;
        const tmin = m.slack ? Math.min(0, m.tensionMin) : m.tensionMin;
        if (tmin < min) { min = tmin; governing = m.id; }
      }
      const scale = Math.max(1, tensionScale(t.group));
      return { value: min, limit: 0, sense: 'atMost', gap: -min / scale, governing, unit: 'N' };
    }
    case 'plumb': {
      const r = caseOf(results, t.case);
      const base = r.nodes.find((n) => n.id === t.base);
      const top = r.nodes.find((n) => n.id === t.top);
      if (!base || !top) throw new Error(`tuning: nodes "${t.base}"/"${t.top}" missing from case "${t.case}"`);
      const dx = top.displacement[0] - base.displacement[0];
      const dy = top.displacement[1] - base.displacement[1];
      const offset = Math.hypot(dx, dy);
      return { value: offset, limit: t.tolerance, sense: 'atMost', gap: offset / t.tolerance - 1, governing: t.top, unit: 'm' };
    }
    case 'reaction': {
      const r = caseOf(results, t.case);
      const reaction = r.reactions.find((x) => x.node === t.node);
      const f = reaction ? Math.hypot(...reaction.force) : 0;
      return { value: f, limit: t.limit, sense: 'atMost', gap: f / t.limit - 1, governing: t.node, unit: 'N' };
    }
  }
}

/**
 * The group's mean starting pretension |P|, N (the noSlack scale; 1000 N when the group has
 * none), from the project as given; cached per group.
 */
export function createTensionScale(project: ProjectFile): (group: string) => number {
  const scales = new Map<string, number>();
  return (group) => {
    let s = scales.get(group);
    if (s === undefined) {
      const ms = [...membersOfGroup(project, group)].map((id) => project.members.find((m) => m.id === id)!);
      s = ms.reduce((acc, m) => acc + Math.abs(memberPretension(project, m)), 0) / Math.max(1, ms.length);
      if (!(s > 0)) s = 1000;
      scales.set(group, s);
    }
    return s;
  };
}

/**
 * The targets that one solved case decides (each target reads one case: targetCases), evaluated
 * on it: [target index, value] in target order. `project` is the project as given (targets,
 * groups and breaking loads do not change with the variables).
 */
export function createCaseTargetEvaluator(project: ProjectFile): (result: CaseResult) => [number, TargetValue][] {
  const targets = project.tuning?.targets ?? [];
  const tensionScale = createTensionScale(project);
  const onCase = targets.map((t) => targetCases(project, t)[0]);
  return (result) => {
    const results = new Map([[result.id, result]]);
    const out: [number, TargetValue][] = [];
    targets.forEach((t, i) => { if (onCase[i] === result.id) out.push([i, evaluateTarget(project, t, results, tensionScale)]); });
    return out;
  };
}
