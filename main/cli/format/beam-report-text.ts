/**
 * Text tables of beam results and support moments for `stayset solve`: beam end actions (the
 * actions of the node on the member end in the member's local axes x along from → to, y, z; N
 * positive in tension, forces kN, moments kN·m) and support moments (kN·m, moment the support exerts).
 */
import type { CaseResult } from '../../../solver/index.ts';
import { formatValue } from '../../common/units/index.ts';

const force = (n: number): string => formatValue(n, 'force', 'SI');
const moment = (n: number): string => formatValue(n, 'moment', 'SI');
import { textTable } from './text-table.ts';

const r = 'right' as const;

/** Beam end-action table, or '' when the case has no beams. */
export function beamTable(c: CaseResult): string {
  const rows: string[][] = [];
  for (const m of c.members) {
    if (!m.beam) continue;
    for (const [where, a] of [['start', m.beam.start], ['end', m.beam.end]] as const) {
      const N = where === 'start' ? -a.fx : a.fx;
      rows.push([m.id, where, force(N), force(a.fy), force(a.fz), moment(a.mx), moment(a.my), moment(a.mz)]);
    }
  }
  if (rows.length === 0) return '';
  return textTable(
    [
      { title: 'beam' }, { title: 'end' }, { title: 'N kN', align: r }, { title: 'Vy kN', align: r }, { title: 'Vz kN', align: r },
      { title: 'T kN·m', align: r }, { title: 'My kN·m', align: r }, { title: 'Mz kN·m', align: r },
    ],
    rows,
  );
}

/** Support moments (kN·m), or '' when no support restrains or springs a rotation. */
export function supportMomentTable(c: CaseResult): string {
  const rows = c.reactions.filter((q) => q.moment).map((q) => [q.node, moment(q.moment![0]), moment(q.moment![1]), moment(q.moment![2])]);
  if (rows.length === 0) return '';
  return textTable([{ title: 'support' }, { title: 'Mx kN·m', align: r }, { title: 'My kN·m', align: r }, { title: 'Mz kN·m', align: r }], rows);
}
