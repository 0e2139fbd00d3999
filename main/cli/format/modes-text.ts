/**
 * The readable form of a modal analysis: a header (case, DOFs, solves, time), the notes, then one
 * row per mode: frequency (Hz), period (s), effective modal mass share and cumulative share per
 * direction x, y, z (% of the movable mass).
 */
import type { ModalAnalysis } from '../../../solver/index.ts';
import { noteText } from '../../common/modes/modal-words.ts';
import { fixedText, formatValue } from '../../common/units/index.ts';
import { textTable } from './text-table.ts';

const percent = (share: number): string => formatValue(share, 'share', 'SI');

export function modesText(a: ModalAnalysis, disclaimer: string): string {
  const s = a.stats;
  const lines = [
    `Modes about case ${JSON.stringify(a.case)}: ${a.modes.length} modes, ${s.dofs} DOFs, ${s.solves} solves, ${fixedText(s.seconds, 3)} s`,
    `  movable mass x / y / z: ${a.movableMass.map((m) => fixedText(m, 1)).join(' / ')} kg`,
    ...a.notes.map((n) => `  note: ${noteText(n)}`),
    '',
  ];
  const r = 'right' as const;
  const rows = a.modes.map((m) => [
    String(m.number), formatValue(m.frequency, 'frequency', 'SI'), fixedText(m.period, 4),
    ...m.effectiveMassShare.map(percent), ...m.cumulativeShare.map(percent),
  ]);
  lines.push(textTable([
    { title: 'mode', align: r }, { title: 'f Hz', align: r }, { title: 'T s', align: r },
    { title: 'mx %', align: r }, { title: 'my %', align: r }, { title: 'mz %', align: r },
    { title: 'Σx %', align: r }, { title: 'Σy %', align: r }, { title: 'Σz %', align: r },
  ], rows));
  lines.push('', disclaimer, '');
  return lines.join('\n');
}
