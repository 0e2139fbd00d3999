import type { ProjectFile } from '../project/types.ts';
import { groupExists } from './groups.ts';

/** Thrown by runChecks when the check settings refer to things that do not exist or are invalid. */
export class CheckInputError extends Error {
  constructor(readonly problems: string[]) {
    super(`Check settings are invalid:\n  ${problems.join('\n  ')}`);
    this.name = 'CheckInputError';
  }
}

/** Problems with `project.checks`, each naming the entry: unknown groups/nodes, non-positive limits. */
export function checkSettingsProblems(project: ProjectFile): string[] {
  const s = project.checks;
  if (!s) return [];
  const out: string[] = [];
  const nodes = new Set(project.nodes.map((n) => n.id));
  const pos = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v > 0;
  (s.noSlackGroups ?? []).forEach((g, i) => {
    if (!groupExists(project, g)) out.push(`checks.noSlackGroups[${i}]: group "${g}" does not exist`);
  });
  (s.sagLimits ?? []).forEach((l, i) => {
    if (!groupExists(project, l.group)) out.push(`checks.sagLimits[${i}]: group "${l.group}" does not exist`);
    const v = 'fractionOfSpan' in l.limit ? l.limit.fractionOfSpan : l.limit.absolute;
    if (!pos(v)) out.push(`checks.sagLimits[${i}]: limit ${v} must be a positive number`);
  });
  (s.displacementLimits ?? []).forEach((l, i) => {
    if (!nodes.has(l.node)) out.push(`checks.displacementLimits[${i}]: node "${l.node}" does not exist`);
    if (!pos(l.limit)) out.push(`checks.displacementLimits[${i}]: limit ${l.limit} m must be positive`);
  });
  (s.tiltLimits ?? []).forEach((l, i) => {
    for (const n of [l.base, l.top]) if (!nodes.has(n)) out.push(`checks.tiltLimits[${i}]: node "${n}" does not exist`);
    if (!pos(l.limit)) out.push(`checks.tiltLimits[${i}]: limit ${l.limit} must be a positive ratio`);
  });
  (s.upliftNodes ?? []).forEach((n, i) => {
    if (!nodes.has(n)) out.push(`checks.upliftNodes[${i}]: node "${n}" does not exist`);
  });
  (s.minimumTension ?? []).forEach((r, i) => {
    if (!groupExists(project, r.group)) out.push(`checks.minimumTension[${i}]: group "${r.group}" does not exist`);
    if (r.shareOfInstallation === undefined && r.shareOfBreaking === undefined) out.push(`checks.minimumTension[${i}]: give shareOfInstallation and/or shareOfBreaking`);
  });
  (s.memberDesign ?? []).forEach((r, i) => {
    if (!groupExists(project, r.group)) out.push(`checks.memberDesign[${i}]: group "${r.group}" does not exist`);
  });
  (s.twistLimits ?? []).forEach((l, i) => {
    for (const n of l.nodes) if (!nodes.has(n)) out.push(`checks.twistLimits[${i}]: node "${n}" does not exist`);
    if (!pos(l.limit)) out.push(`checks.twistLimits[${i}]: limit ${l.limit}° must be positive`);
  });
  return out;
}
