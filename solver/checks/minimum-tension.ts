/**
 * Minimum-tension limits per cable from checks.minimumTension: the larger of
 * shareOfInstallation × installation tension and shareOfBreaking × breaking load. The
 * installation tension is the member's `pretension` when given, else the mean of its end tensions
 * in the reference (installation) case. Forces N. Later rules override earlier ones per member.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { membersOfGroup } from './groups.ts';

export interface MinimumTensionLimit {
  limit: number;
  source: string;
  detail: Record<string, number>;
}

export function minimumTensionRules(project: ProjectFile, reference: CaseResult | undefined): Map<string, MinimumTensionLimit> {
  const out = new Map<string, MinimumTensionLimit>();
  const rules = project.checks?.minimumTension ?? [];
  if (!rules.length) return out;
  const sections = new Map(project.sections.map((s) => [s.id, s] as const));
  const refTension = new Map((reference?.members ?? []).map((m) => [m.id, (m.tensionStart + m.tensionEnd) / 2] as const));
  rules.forEach((rule, i) => {
    for (const id of membersOfGroup(project, rule.group)) {
      const m = project.members.find((x) => x.id === id)!;
      if (m.kind !== 'cable') continue;
      const installation = m.pretension ?? refTension.get(id);
      const mbl = sections.get(m.section)?.breakingLoad;
      const a = rule.shareOfInstallation !== undefined && installation !== undefined ? rule.shareOfInstallation * installation : 0;
      const b = rule.shareOfBreaking !== undefined && mbl ? rule.shareOfBreaking * mbl : 0;
      if (!(a > 0 || b > 0)) continue;
      out.set(id, {
        limit: Math.max(a, b),
        source: `project file (checks.minimumTension[${i}], group "${rule.group}")`,
        detail: { installationTension: installation ?? 0, breakingLoad: mbl ?? 0, shareOfInstallation: rule.shareOfInstallation ?? 0, shareOfBreaking: rule.shareOfBreaking ?? 0 },
      });
    }
  });
  return out;
}
