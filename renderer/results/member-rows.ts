/**
 * Rows of the results strip: one per member of the shown case, with utilisation
 * = T max / breaking load of the member's section (no resistance factor: the design checks apply
 * φ; this column is the plain ratio) and the groups the member belongs to.
 */
import type { CaseResult, ProjectFile } from '../../solver/index.ts';
import { designsByMember, memberUtilisation } from '../../solver/index.ts';

export interface MemberRow {
  id: string;
  group: string;
  /** N */
  tensionMax: number;
  /** N */
  tensionMin: number;
  /** T max / breaking load, or NaN when the section has no breaking load. */
  utilisation: number;
  slack: boolean;
  /** m */
  sag: number;
}

export type MemberRowKey = keyof MemberRow;

/** Group ids per member: from GroupSpec.members and MemberSpec.groups, file order, no repeats. */
export function groupsByMember(project: ProjectFile): Map<string, string[]> {
  const out = new Map<string, string[]>();
  const add = (member: string, group: string) => {
    const list = out.get(member) ?? [];
    if (!list.includes(group)) list.push(group);
    out.set(member, list);
  };
  for (const g of project.groups ?? []) for (const m of g.members) add(m, g.id);
  for (const m of project.members) for (const g of m.groups ?? []) add(m.id, g);
  return out;
}

export function memberRows(project: ProjectFile, result: CaseResult): MemberRow[] {
  const groups = groupsByMember(project);
  const designs = designsByMember(project);
  return result.members.map((r) => {
    const d = designs.get(r.id);
    const u = d ? memberUtilisation(d, r.tensionMax, r.tensionMin) : null;
    return {
      id: r.id,
      group: (groups.get(r.id) ?? []).join(', '),
      tensionMax: r.tensionMax,
      tensionMin: r.tensionMin,
      utilisation: u ?? Number.NaN,
      slack: r.slack,
      sag: r.sag,
    };
  });
}

/** Sort a copy by `key`; NaN (no breaking load) always last; ties keep file order. */
export function sortRows(rows: readonly MemberRow[], key: MemberRowKey, descending: boolean): MemberRow[] {
  const sign = descending ? -1 : 1;
  return rows
    .map((row, i) => ({ row, i }))
    .sort((a, b) => {
      const va = a.row[key];
      const vb = b.row[key];
      if (typeof va === 'number' && typeof vb === 'number') {
        const na = Number.isNaN(va);
        const nb = Number.isNaN(vb);
        if (na || nb) return na === nb ? a.i - b.i : na ? 1 : -1;
        return va === vb ? a.i - b.i : sign * (va - vb);
      }
      const c = String(va).localeCompare(String(vb), undefined, { numeric: true });
      return c === 0 ? a.i - b.i : sign * c;
    })
    .map((x) => x.row);
}
