/**
 * The schedule's tuning section from the run kept in the project (`tuning.lastRun`,
 * TuningRunRecord): targets with the value reached, variables with their final value, the
 * tuner's explanation — and a note when the project's pretensions no longer are the run's.
 */
import { resolveVariables } from '../../../solver/index.ts';
import type { ProjectFile, TuningRunRecord, TuningRunTarget } from '../../../solver/index.ts';
import type { ScheduleTuning } from './schedule-types.ts';
import { formatForce, formatLength, formatNumber, unitLabels, type ScheduleUnits } from './schedule-units.ts';

/** Relative difference above which a group's pretension is taken as changed since the run. */
const CHANGED = 1e-6;

export function scheduleTuning(project: ProjectFile, rec: TuningRunRecord, units: ScheduleUnits, groupLabel: (id: string) => string, notes: string[]): ScheduleTuning {
  const l = unitLabels(units);
  const variables = rec.variables ?? [];
  let current = new Map<string, number>();
  try {
    current = new Map(resolveVariables(project).filter((v) => v.by === 'pretension').map((v) => [v.group, v.initial]));
  } catch {
    // The tuning set-up no longer resolves (a group was removed): nothing to compare.
  }
  const changed = variables.filter((v) => v.by === 'pretension' && current.has(v.group)
    && Math.abs(current.get(v.group)! - v.final) > CHANGED * Math.max(Math.abs(v.final), 1));
  for (const v of changed) {
    notes.push(`The pretension of ${groupLabel(v.group)} is ${formatForce(units, current.get(v.group)!)} ${l.force}; the tuning run of ${rec.date} left ${formatForce(units, v.final)} ${l.force} — the tuning record is not the current state.`);
  }
  return {
    summary: rec.summary,
    status: rec.status ?? '',
    date: rec.date,
    targets: (rec.targets ?? []).map((t) => ({ label: t.label, met: t.met, value: targetValueText(units, t) })),
    variables: variables.map((v) => ({
      group: groupLabel(v.group), by: v.by,
      value: v.by === 'pretension' ? `${formatForce(units, v.final)} ${l.force}` : `length factor ${formatNumber(v.final, 5)}`,
    })),
    diagnosis: rec.diagnosis ?? [],
  };
}

function targetValueText(units: ScheduleUnits, t: TuningRunTarget): string {
  const l = unitLabels(units);
  if (t.kind === 'noSlack') return `least tension ${formatForce(units, t.value)} ${l.force} (must stay above 0)`;
  const op = t.sense === 'equal' ? 'target' : 'limit';
  if (t.unit === 'share') return `${formatNumber(t.value * 100, 2)} % (${op} ${formatNumber(t.limit * 100, 2)} %)`;
  if (t.unit === 'm') return `${formatLength(units, t.value)} ${l.length} (${op} ${formatLength(units, t.limit)} ${l.length})`;
  return `${formatForce(units, t.value)} ${l.force} (${op} ${formatForce(units, t.limit)} ${l.force})`;
}
