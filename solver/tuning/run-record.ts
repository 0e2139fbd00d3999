/**
 * A tuning run as the record kept in the project (`tuning.lastRun`, TuningRunRecord): targets
 * with the value reached, variables with their start and final values, the tuner's explanation.
 * Pure: the caller supplies the date (ISO 8601). Forces N, lengths m, shares 0..1.
 */
import type { TuningRunRecord } from '../project/types.ts';
import type { TuningResult } from './tuning-types.ts';

export function tuningRunRecord(result: Pick<TuningResult, 'status' | 'summary' | 'targets' | 'variables' | 'diagnosis'>, date: string): TuningRunRecord {
  return {
    date,
    summary: result.summary,
    status: result.status,
    targets: result.targets.map((t) => ({
      kind: t.target.kind, label: t.label, value: t.value, limit: t.limit, unit: t.unit, sense: t.sense, met: t.met,
      ...(t.governing ? { governing: t.governing } : {}),
    })),
    variables: result.variables.map((v) => ({
      group: v.group, by: v.by, initial: v.initial, final: v.final, ...(v.atBound ? { atBound: v.atBound } : {}),
    })),
    diagnosis: [...result.diagnosis],
  };
}
