/**
 * The schedule's natural frequencies: the first modes of the structure (solver/modes) about the
 * reference case, with the modal notes or the reason there are none in the report's words
 * (report-modes.ts), so the schedule and the calculation report say the same.
 */
import type { ModalOutcome } from '../../../solver/index.ts';
import { modalNoteText, modalRefusalText } from '../report/report-modes.ts';
import type { ScheduleFrequencies } from './schedule-types.ts';

/** How many modes the schedule prints (the report prints every mode computed). */
export const SCHEDULE_MODE_COUNT = 6;

export function scheduleFrequencies(m: ModalOutcome, count = SCHEDULE_MODE_COUNT): ScheduleFrequencies {
  if (!m.ok) return { case: 'case' in m.refusal ? m.refusal.case : '', modes: [], notes: [modalRefusalText(m.refusal)] };
  const a = m.analysis;
  return {
    case: a.case,
    modes: a.modes.slice(0, count).map((x) => ({ number: x.number, frequency: x.frequency, period: x.period })),
    notes: a.notes.map(modalNoteText),
  };
}
