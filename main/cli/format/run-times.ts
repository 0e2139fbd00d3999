/**
 * Where the time of a `stayset solve` went, s: reading and checking the file (input), the
 * model and its symbolic analysis, the Newton iterations of every case, building the output
 * text; `seconds` is all of the solve (analysis + Newton), as the solver measured it.
 */
import type { SolveReport } from '../../../solver/index.ts';
import { fixedText } from '../../common/units/index.ts';

export interface RunTimes {
  inputSeconds: number;
  analysisSeconds: number;
  newtonSeconds: number;
  outputSeconds: number;
  seconds: number;
}

export function runTimes(report: SolveReport, inputSeconds: number, outputSeconds: number): RunTimes {
  const s = report.stats;
  const newton = s?.newtonSeconds ?? report.cases.reduce((a, c) => a + c.stats.seconds, 0);
  return {
    inputSeconds, analysisSeconds: s?.analysisSeconds ?? 0, newtonSeconds: newton, outputSeconds, seconds: s?.seconds ?? newton,
  };
}

export function runTimesLine(t: RunTimes): string {
  return `Time: input ${fixedText(t.inputSeconds, 3)} s, analysis ${fixedText(t.analysisSeconds, 3)} s, Newton ${fixedText(t.newtonSeconds, 3)} s, `
    + `output ${fixedText(t.outputSeconds, 3)} s; the solve ${fixedText(t.seconds, 3)} s.`;
}

/** JSON text of an object ending in "\n}\n" with `"stats": {...}` added as its last property. */
export function withStatsProperty(json: string, t: RunTimes): string {
  const cut = json.lastIndexOf('\n}');
  const body = Object.entries(t).map(([k, v]) => `    ${JSON.stringify(k)}: ${Number.isFinite(v) ? v : 0}`).join(',\n');
  return `${json.slice(0, cut)},\n  "stats": {\n${body}\n  }${json.slice(cut)}`;
}
