/**
 * Display units of the schedule. Values in the schedule model are SI (N, m, Hz, K); these
 * functions convert and format for SI (kN, m, °C) or US customary (kip, ft, °F).
 * Conversion factors are exact by definition: 1 ft = 0.3048 m (international foot, 1959);
 * 1 lbf = 4.4482216152605 N (so 1 kip = 4448.2216152605 N); °F = °C × 9/5 + 32.
 */
export type ScheduleUnits = 'SI' | 'US';

export const NEWTONS_PER_KIP = 4448.2216152605;
export const METRES_PER_FOOT = 0.3048;

export interface UnitLabels {
  force: string;
  length: string;
  temperature: string;
}

export function unitLabels(units: ScheduleUnits): UnitLabels {
  return units === 'US' ? { force: 'kip', length: 'ft', temperature: '°F' } : { force: 'kN', length: 'm', temperature: '°C' };
}

/** Force N → kN or kip. */
export function forceIn(units: ScheduleUnits, newtons: number): number {
  return units === 'US' ? newtons / NEWTONS_PER_KIP : newtons / 1000;
}

/** Length m → m or ft. */
export function lengthIn(units: ScheduleUnits, metres: number): number {
  return units === 'US' ? metres / METRES_PER_FOOT : metres;
}

/** Absolute temperature K → °C or °F. */
export function temperatureIn(units: ScheduleUnits, kelvin: number): number {
  const c = kelvin - 273.15;
  return units === 'US' ? (c * 9) / 5 + 32 : c;
}

/** Fixed decimals; '—' for a missing value; never "-0.0" (values that round to zero print unsigned). */
const text = (v: number | null | undefined, digits: number): string => {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  const s = v.toFixed(digits);
  return Number(s) === 0 ? (0).toFixed(digits) : s;
};

export function formatForce(units: ScheduleUnits, newtons: number | null | undefined): string {
  return text(newtons === null || newtons === undefined ? newtons : forceIn(units, newtons), units === 'US' ? 2 : 1);
}

/** Moment N·m → kN·m or kip·ft. */
export function formatMoment(units: ScheduleUnits, newtonMetres: number | null | undefined): string {
  if (newtonMetres === null || newtonMetres === undefined) return text(newtonMetres, 1);
  return text(units === 'US' ? newtonMetres / (NEWTONS_PER_KIP * METRES_PER_FOOT) : newtonMetres / 1000, units === 'US' ? 2 : 1);
}

export function momentLabel(units: ScheduleUnits): string {
  return units === 'US' ? 'kip·ft' : 'kN·m';
}

export function formatLength(units: ScheduleUnits, metres: number | null | undefined, digits = 3): string {
  return text(metres === null || metres === undefined ? metres : lengthIn(units, metres), digits);
}

export function formatTemperature(units: ScheduleUnits, kelvin: number): string {
  return text(temperatureIn(units, kelvin), 0);
}

export function formatNumber(v: number | null | undefined, digits: number): string {
  return text(v, digits);
}
