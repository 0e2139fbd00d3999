/**
 * A tuning run as the record kept in the project (`tuning.lastRun`, TuningRunRecord): targets
 * with the value reached (SI: N, m, shares 0..1), variables with their start and final values, and
 * the words of the run (target labels, summary, explanation) in the display units of the run, so
 * the schedule can print the record without the tuner. Pure: the caller supplies the date (ISO 8601).
 */
import type { ProjectFile, TuningResult, TuningRunRecord } from '../../../solver/index.ts';
import type { UnitSystem } from '../units/index.ts';
import { targetText, tuningDiagnosisText, tuningSummaryText } from './tuning-text.ts';

export function tuningRunRecord(result: TuningResult, project: ProjectFile, units: UnitSystem, date: string): TuningRunRecord {
  return {
    date,
    summary: tuningSummaryText(result, project, units),
    status: result.status,
    targets: result.targets.map((t) => ({
      kind: t.target.kind, label: targetText(project, t.target, units), value: t.value, limit: t.limit, unit: t.unit, sense: t.sense, met: t.met,
      ...(t.governing ? { governing: t.governing } : {}),
    })),
    variables: result.variables.map((v) => ({
      group: v.group, by: v.by, initial: v.initial, final: v.final, ...(v.atBound ? { atBound: v.atBound } : {}),
    })),
    diagnosis: tuningDiagnosisText(result, project, units),
  };
}
