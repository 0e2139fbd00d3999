/**
 * The schedule's tuning section from the run kept in the project (`tuning.lastRun`,
 * TuningRunRecord): targets with the value reached, variables with their final value, the
 * tuner's explanation — and a note when the project's pretensions no longer are the run's.
 */
import { resolveVariables } from '../../../solver/index.ts';
import type { ProjectFile, TuningRunRecord, TuningRunTarget } from '../../../solver/index.ts';
import type { ScheduleTuning } from './schedule-types.ts';
import { targetValueKind } from '../tuning/tuning-text.ts';
import { fixedText, formatValue, formatWithUnit, unitLabels, type UnitSystem } from '../units/index.ts';

/** Relative difference above which a group's pretension is taken as changed since the run. */
const CHANGED = 1e-6;

export function scheduleTuning(project: ProjectFile, rec: TuningRunRecord, units: UnitSystem, groupLabel: (id: string) => string, notes: string[]): ScheduleTuning {
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
    notes.push(`The pretension of ${groupLabel(v.group)} is ${formatValue(current.get(v.group)!, 'force', units)} ${l.force}; the tuning run of ${rec.date} left ${formatValue(v.final, 'force', units)} ${l.force} — the tuning record is not the current state.`);
  }
  return {
    summary: rec.summary,
    status: rec.status ?? '',
    date: rec.date,
    targets: (rec.targets ?? []).map((t) => ({ label: t.label, met: t.met, value: targetValueText(units, t) })),
    variables: variables.map((v) => ({
      group: groupLabel(v.group), by: v.by,
      value: v.by === 'pretension' ? `${formatValue(v.final, 'force', units)} ${l.force}` : `length factor ${fixedText(v.final, 5)}`,
    })),
    diagnosis: rec.diagnosis ?? [],
  };
}

function targetValueText(units: UnitSystem, t: TuningRunTarget): string {
  const l = unitLabels(units);
  if (t.kind === 'noSlack') return `least tension ${formatValue(t.value, 'force', units)} ${l.force} (must stay above 0)`;
  const op = t.sense === 'equal' ? 'target' : 'limit';
  if (t.unit === 'share') return `${formatWithUnit(t.value, 'share', units)} (${op} ${formatWithUnit(t.limit, 'share', units)})`;
  if (t.unit === 'm') {
    const kind = targetValueKind(t.kind, t.unit);
    return `${formatWithUnit(t.value, kind, units)} (${op} ${formatWithUnit(t.limit, kind, units)})`;
  }
  return `${formatValue(t.value, 'force', units)} ${l.force} (${op} ${formatValue(t.limit, 'force', units)} ${l.force})`;
}
