/**
 * The kinds of quantity Stayset shows, their display unit in each unit system, and ONE precision
 * rule per kind (the same in the app, the CLI, the schedule and the reports).
 *
 * Values inside Stayset (project file, solver, results) are in the kind's base unit: SI (N, m, Pa,
 * kg, K, Hz, m/s), except `angle`, which the checks give in degrees, and `share`, a fraction.
 * base = display × toBase + offset (offset only for absolute temperatures). Factors are exact
 * (unit-factors.ts, NIST SP 811 Appendix B).
 *
 * Precision rule: each kind has one resolution in its base unit (forces 10 N, lengths 1 mm,
 * displacements 0.1 mm, sags 1 mm, …); a value prints with the fewest decimals of its display unit that
 * resolve it: decimals = ⌈−log10(resolution / toBase)⌉, at least 0 (kN 2, kip 3, m 3, ft 3, mm 1,
 * in 3; sags mm 0, in 2). Kinds whose values span decades (thermal expansion) keep significant digits instead.
 * The resolutions are common practice for tension schedules and site work.
 */
import {
  ICE_POINT_KELVIN, KELVIN_PER_FAHRENHEIT_DEGREE, KILOGRAMS_PER_POUND, METRES_PER_FOOT, METRES_PER_INCH,
  METRES_PER_SECOND_PER_MPH, NEWTONS_PER_KIP, NEWTONS_PER_POUND_FORCE,
} from './unit-factors.ts';

/** SI: kN, m, mm, °C. US customary: kip, ft, in, °F. */
export type UnitSystem = 'SI' | 'US';
export const UNIT_SYSTEMS: readonly UnitSystem[] = ['SI', 'US'];

export type QuantityKind =
  | 'force' | 'moment' | 'length' | 'displacement' | 'smallLength' | 'sag' | 'area'
  | 'stress' | 'strength' | 'modulus' | 'shearModulus' | 'secondMoment' | 'dragArea' | 'dragAreaPerLength'
  | 'pressure' | 'massPerLength' | 'mass' | 'period'
  | 'temperature' | 'temperatureChange' | 'thermalExpansion'
  | 'frequency' | 'angle' | 'speed' | 'ratio' | 'share' | 'slenderness' | 'count';

/** A resolution in the base unit (decimals follow per display unit), or significant digits. */
export type Precision = { resolution: number } | { significant: number };

export interface DisplayUnit {
  /** Label after values and in column headers ('' for pure numbers). */
  label: string;
  /** base = display × toBase + offset. */
  toBase: number;
  offset?: number;
}

export interface KindInfo {
  /** Words for messages: "a length", "a force", … */
  noun: string;
  units: Record<UnitSystem, DisplayUnit>;
  precision: Precision;
}

const same = (u: DisplayUnit): Record<UnitSystem, DisplayUnit> => ({ SI: u, US: u });
const IN = METRES_PER_INCH;
const FT = METRES_PER_FOOT;
const KIP = NEWTONS_PER_KIP;
const KSI = NEWTONS_PER_KIP / (IN * IN);

export const KINDS: Record<QuantityKind, KindInfo> = {
  force: { noun: 'a force', precision: { resolution: 10 }, units: { SI: { label: 'kN', toBase: 1e3 }, US: { label: 'kip', toBase: KIP } } },
  moment: { noun: 'a moment', precision: { resolution: 10 }, units: { SI: { label: 'kN·m', toBase: 1e3 }, US: { label: 'kip·ft', toBase: KIP * FT } } },
  length: { noun: 'a length', precision: { resolution: 1e-3 }, units: { SI: { label: 'm', toBase: 1 }, US: { label: 'ft', toBase: FT } } },
  displacement: { noun: 'a displacement', precision: { resolution: 1e-4 }, units: { SI: { label: 'mm', toBase: 1e-3 }, US: { label: 'in', toBase: IN } } },
  /**
   * Sag of a cable below its chord (results, check and tuning limits, site readings): mm / in to
   * 1 mm, as sags are read on site with a tape (common practice); one kind so every sag agrees.
   */
  sag: { noun: 'a sag', precision: { resolution: 1e-3 }, units: { SI: { label: 'mm', toBase: 1e-3 }, US: { label: 'in', toBase: IN } } },
  smallLength: { noun: 'a length', precision: { resolution: 1e-4 }, units: { SI: { label: 'mm', toBase: 1e-3 }, US: { label: 'in', toBase: IN } } },
  area: { noun: 'an area', precision: { resolution: 1e-7 }, units: { SI: { label: 'mm²', toBase: 1e-6 }, US: { label: 'in²', toBase: IN * IN } } },
  stress: { noun: 'a stress', precision: { resolution: 1e5 }, units: { SI: { label: 'MPa', toBase: 1e6 }, US: { label: 'ksi', toBase: KSI } } },
  modulus: { noun: 'a stress (modulus)', precision: { resolution: 1e8 }, units: { SI: { label: 'GPa', toBase: 1e9 }, US: { label: 'ksi', toBase: KSI } } },
  /** Yield strength; ksi = 1000 lbf/in². */
  strength: { noun: 'a stress', precision: { resolution: 1e5 }, units: { SI: { label: 'MPa', toBase: 1e6 }, US: { label: 'ksi', toBase: KSI } } },
  /** Shear modulus G, shown as the Young's modulus is. */
  shearModulus: { noun: 'a stress (modulus)', precision: { resolution: 1e8 }, units: { SI: { label: 'GPa', toBase: 1e9 }, US: { label: 'ksi', toBase: KSI } } },
  /** Second moments of area and torsion constants (m⁴); they span decades, so significant digits. */
  secondMoment: { noun: 'a second moment of area', precision: { significant: 4 }, units: { SI: { label: 'cm⁴', toBase: 1e-8 }, US: { label: 'in⁴', toBase: IN ** 4 } } },
  /** Drag area C_f·A of a point ancillary (m²). */
  dragArea: { noun: 'an area', precision: { resolution: 1e-3 }, units: { SI: { label: 'm²', toBase: 1 }, US: { label: 'ft²', toBase: FT * FT } } },
  /** Drag area per length of a line ancillary (m²/m = m). */
  dragAreaPerLength: { noun: 'an area per length', precision: { resolution: 1e-4 }, units: { SI: { label: 'm²/m', toBase: 1 }, US: { label: 'ft²/ft', toBase: FT } } },
  /** Area loads and velocity pressure; psf = lbf/ft². */
  pressure: { noun: 'a pressure', precision: { resolution: 1 }, units: { SI: { label: 'Pa', toBase: 1 }, US: { label: 'psf', toBase: NEWTONS_PER_POUND_FORCE / (FT * FT) } } },
  massPerLength: { noun: 'a mass per length', precision: { resolution: 1e-3 }, units: { SI: { label: 'kg/m', toBase: 1 }, US: { label: 'lb/ft', toBase: KILOGRAMS_PER_POUND / FT } } },
  mass: { noun: 'a mass', precision: { resolution: 0.1 }, units: { SI: { label: 'kg', toBase: 1 }, US: { label: 'lb', toBase: KILOGRAMS_PER_POUND } } },
  temperature: {
    noun: 'a temperature', precision: { resolution: 0.1 },
    units: {
      SI: { label: '°C', toBase: 1, offset: ICE_POINT_KELVIN },
      US: { label: '°F', toBase: KELVIN_PER_FAHRENHEIT_DEGREE, offset: ICE_POINT_KELVIN - 32 * KELVIN_PER_FAHRENHEIT_DEGREE },
    },
  },
  temperatureChange: { noun: 'a temperature change', precision: { resolution: 0.1 }, units: { SI: { label: 'K', toBase: 1 }, US: { label: '°F', toBase: KELVIN_PER_FAHRENHEIT_DEGREE } } },
  thermalExpansion: { noun: 'a thermal expansion coefficient', precision: { significant: 3 }, units: { SI: { label: '1/K', toBase: 1 }, US: { label: '1/°F', toBase: 1 / KELVIN_PER_FAHRENHEIT_DEGREE } } },
  period: { noun: 'a period', precision: { resolution: 1e-3 }, units: same({ label: 's', toBase: 1 }) },
  frequency: { noun: 'a frequency', precision: { resolution: 0.001 }, units: same({ label: 'Hz', toBase: 1 }) },
  angle: { noun: 'an angle', precision: { resolution: 0.001 }, units: same({ label: '°', toBase: 1 }) },
  speed: { noun: 'a speed', precision: { resolution: 0.01 }, units: { SI: { label: 'm/s', toBase: 1 }, US: { label: 'mph', toBase: METRES_PER_SECOND_PER_MPH } } },
  ratio: { noun: 'a ratio', precision: { resolution: 0.001 }, units: same({ label: '', toBase: 1 }) },
  share: { noun: 'a share', precision: { resolution: 0.001 }, units: same({ label: '%', toBase: 0.01 }) },
  slenderness: { noun: 'a slenderness', precision: { resolution: 0.1 }, units: same({ label: '', toBase: 1 }) },
  count: { noun: 'a number', precision: { resolution: 1 }, units: same({ label: '', toBase: 1 }) },
};

export function displayUnit(kind: QuantityKind, system: UnitSystem): DisplayUnit {
  return KINDS[kind].units[system];
}

/** The unit label of a kind in a system, e.g. "kN", "kip", "mm" ('' for pure numbers). */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return KINDS[kind].units[system].label;
}

/** Every kind's unit label in a system, e.g. `unitLabels('US').force === 'kip'`. */
export function unitLabels(system: UnitSystem): Record<QuantityKind, string> {
  return Object.fromEntries(Object.entries(KINDS).map(([k, info]) => [k, info.units[system].label])) as Record<QuantityKind, string>;
}
