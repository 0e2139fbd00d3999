/**
 * The physical kinds of quantity the editors show, and their display units per unit system.
 * The file is always SI (m, N, Pa, kg, K); `toSI` is the exact factor from one display unit to SI.
 *
 * Factors: NIST SP 811 (2008), Appendix B, exact by definition for in, ft, lb, lbf:
 *   in = 0.0254 m, ft = 0.3048 m, lb = 0.45359237 kg, lbf = 4.4482216152605 N, kip = 1000 lbf.
 * A temperature *change* of 1 °F is 5/9 K (no offset: only differences are entered here).
 */
export type UnitSystem = 'SI' | 'US';

export type QuantityKind =
  | 'length'
  | 'smallLength'
  | 'force'
  | 'modulus'
  | 'area'
  | 'massPerLength'
  | 'temperatureChange'
  | 'thermalExpansion'
  | 'count'
  | 'mass'
  | 'dragArea'
  | 'dragAreaPerLength'
  | 'pressure'
  | 'moment'
  | 'strength'
  | 'secondMoment'
  | 'shearModulus';

export interface DisplayUnit {
  /** Label shown in column headers and after values. */
  label: string;
  /** mathjs unit expression for this display unit ('' for dimensionless). */
  mathUnit: string;
  /** Multiply a value in this unit by toSI to get SI. */
  toSI: number;
}

export interface KindInfo {
  /** The SI unit the file stores, as a mathjs expression ('' for dimensionless or special kinds). */
  siUnit: string;
  /** Words for messages: "a length", "a force", … */
  noun: string;
  units: Record<UnitSystem, DisplayUnit>;
}

const IN = 0.0254;
const FT = 0.3048;
const LB = 0.45359237;
const LBF = 4.4482216152605;

export const KINDS: Record<QuantityKind, KindInfo> = {
  length: {
    siUnit: 'm', noun: 'a length',
    units: { SI: { label: 'm', mathUnit: 'm', toSI: 1 }, US: { label: 'ft', mathUnit: 'ft', toSI: FT } },
  },
  smallLength: {
    siUnit: 'm', noun: 'a length',
    units: { SI: { label: 'mm', mathUnit: 'mm', toSI: 1e-3 }, US: { label: 'in', mathUnit: 'in', toSI: IN } },
  },
  force: {
    siUnit: 'N', noun: 'a force',
    units: { SI: { label: 'kN', mathUnit: 'kN', toSI: 1e3 }, US: { label: 'kip', mathUnit: 'kip', toSI: 1000 * LBF } },
  },
  modulus: {
    siUnit: 'Pa', noun: 'a stress (modulus)',
    units: { SI: { label: 'GPa', mathUnit: 'GPa', toSI: 1e9 }, US: { label: 'ksi', mathUnit: 'ksi', toSI: (1000 * LBF) / (IN * IN) } },
  },
  area: {
    siUnit: 'm^2', noun: 'an area',
    units: { SI: { label: 'mm²', mathUnit: 'mm^2', toSI: 1e-6 }, US: { label: 'in²', mathUnit: 'in^2', toSI: IN * IN } },
  },
  massPerLength: {
    siUnit: 'kg/m', noun: 'a mass per length',
    units: { SI: { label: 'kg/m', mathUnit: 'kg/m', toSI: 1 }, US: { label: 'lb/ft', mathUnit: 'lb/ft', toSI: LB / FT } },
  },
  temperatureChange: {
    siUnit: '', noun: 'a temperature change',
    units: { SI: { label: 'K', mathUnit: '', toSI: 1 }, US: { label: '°F', mathUnit: '', toSI: 5 / 9 } },
  },
  thermalExpansion: {
    siUnit: '', noun: 'a thermal expansion coefficient',
    units: { SI: { label: '1/K', mathUnit: '', toSI: 1 }, US: { label: '1/°F', mathUnit: '', toSI: 9 / 5 } },
  },
  count: {
    siUnit: '', noun: 'a number',
    units: { SI: { label: '', mathUnit: '', toSI: 1 }, US: { label: '', mathUnit: '', toSI: 1 } },
  },
  mass: {
    siUnit: 'kg', noun: 'a mass',
    units: { SI: { label: 'kg', mathUnit: 'kg', toSI: 1 }, US: { label: 'lb', mathUnit: 'lb', toSI: LB } },
  },
  /** Drag area C_f·A of an ancillary (m² in the file). */
  dragArea: {
    siUnit: 'm^2', noun: 'an area',
    units: { SI: { label: 'm²', mathUnit: 'm^2', toSI: 1 }, US: { label: 'ft²', mathUnit: 'ft^2', toSI: FT * FT } },
  },
  /** Drag area per length of a line ancillary (m²/m = m in the file). */
  dragAreaPerLength: {
    siUnit: 'm', noun: 'an area per length',
    units: { SI: { label: 'm²/m', mathUnit: 'm', toSI: 1 }, US: { label: 'ft²/ft', mathUnit: 'ft', toSI: FT } },
  },
  /** Area loads and velocity pressure (Pa in the file); psf = lbf/ft². */
  pressure: {
    siUnit: 'Pa', noun: 'a pressure',
    units: { SI: { label: 'Pa', mathUnit: 'Pa', toSI: 1 }, US: { label: 'psf', mathUnit: 'psf', toSI: LBF / (FT * FT) } },
  },
  /** Nodal moments (N·m in the file); kip·ft = 1000 lbf × 0.3048 m. */
  moment: {
    siUnit: 'N m', noun: 'a moment',
    units: { SI: { label: 'kN·m', mathUnit: 'kN m', toSI: 1e3 }, US: { label: 'kip·ft', mathUnit: 'kip ft', toSI: 1000 * LBF * FT } },
  },
  /** Yield strength (Pa in the file); ksi = 1000 lbf/in². */
  strength: {
    siUnit: 'Pa', noun: 'a stress',
    units: { SI: { label: 'MPa', mathUnit: 'MPa', toSI: 1e6 }, US: { label: 'ksi', mathUnit: 'ksi', toSI: (1000 * LBF) / (IN * IN) } },
  },
  /** Second moments of area and torsion constants (m⁴ in the file). */
  secondMoment: {
    siUnit: 'm^4', noun: 'a second moment of area',
    units: { SI: { label: 'cm⁴', mathUnit: 'cm^4', toSI: 1e-8 }, US: { label: 'in⁴', mathUnit: 'in^4', toSI: IN ** 4 } },
  },
  /** Shear modulus G (Pa in the file), shown as the Young's modulus is. */
  shearModulus: {
    siUnit: 'Pa', noun: 'a stress (modulus)',
    units: { SI: { label: 'GPa', mathUnit: 'GPa', toSI: 1e9 }, US: { label: 'ksi', mathUnit: 'ksi', toSI: (1000 * LBF) / (IN * IN) } },
  },
};

export function displayUnit(kind: QuantityKind, system: UnitSystem): DisplayUnit {
  return KINDS[kind].units[system];
}
