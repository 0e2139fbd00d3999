/**
 * Display helpers of the site screens: the same unit choice and rounding as the crew sheet and the
 * report (main/common/schedule/schedule-units.ts), so a value on screen reads as on paper.
 */
import { forceIn, formatForce, formatLength, formatNumber, formatTemperature, lengthIn, unitLabels, type ScheduleUnits } from '../../main/common/schedule/schedule-units.ts';
import { smallLength } from '../../main/common/report/print-css.ts';

export { forceIn, formatForce, formatLength, formatNumber, formatTemperature, lengthIn, unitLabels };

/** A small length (band, length change) in mm or in. */
export function small(units: ScheduleUnits, metres: number, digits = 1): string {
  const s = smallLength(units, metres, digits);
  return `${s.text} ${s.unit}`;
}

/** A tilt ratio as 1/N ("0" for none, "—" for none computed). */
export function tiltText(t: number | null | undefined): string {
  if (t === null || t === undefined || !Number.isFinite(t)) return '—';
  return t > 0 ? `1/${formatNumber(1 / t, 0)}` : '0';
}

/** Per degree of the display scale: per K = per °C; per °F is 5/9 of it. */
export function perDegree(units: ScheduleUnits, perKelvin: number): number {
  return units === 'US' ? (perKelvin * 5) / 9 : perKelvin;
}
