/**
 * The part of a case's wind that does not depend on the geometry, resolved once per case:
 * flow direction (cos, sin), ½ρ and the profile's constants. The follower load (wind.ts,
 * WindFollowerLoad) then costs a logarithm and an exponential (power law, as powerLawRatio) or one
 * logarithm (log law) per element and residual, and allocates nothing: the same formulas as
 * windSpeedAt / elementDragForce (wind-profile.ts, wind.ts), in the same order of operations.
 */
import type { WindSpec } from '../project/types.ts';
import { windForceFactor } from './wind-basis.ts';
import { DEFAULT_AIR_DENSITY, DEFAULT_POWER_LAW_EXPONENT, DEFAULT_PROFILE_MIN_HEIGHT, DEFAULT_ROUGHNESS_LENGTH } from './defaults.ts';

export interface WindCase {
  speed10: number;
  /** 0 uniform, 1 power law, 2 log law. */
  kind: 0 | 1 | 2;
  exponent: number;
  /** Height below which the profile is held, m. */
  zMin: number;
  /** Log law: roughness length z0, m, and ln(10 / z0). */
  z0: number;
  logRef: number;
  /** Unit flow direction in the x–y plane. */
  cx: number;
  cy: number;
  /** ½ ρ × the wind basis force factor (gust × structural, wind-basis.ts), kg/m³. */
  halfRho: number;
}

export function resolveWindCase(wind: WindSpec): WindCase {
  const p = wind.profile ?? { kind: 'power' as const, exponent: DEFAULT_POWER_LAW_EXPONENT };
  const a = (wind.direction * Math.PI) / 180;
  const base = { speed10: wind.speed, cx: Math.cos(a), cy: Math.sin(a), halfRho: 0.5 * (wind.airDensity ?? DEFAULT_AIR_DENSITY) * windForceFactor(wind) };
  switch (p.kind) {
    case 'uniform':
      return { ...base, kind: 0, exponent: 0, zMin: 0, z0: 1, logRef: 1 };
    case 'power':
      return { ...base, kind: 1, exponent: p.exponent, zMin: DEFAULT_PROFILE_MIN_HEIGHT, z0: 1, logRef: 1 };
    case 'log': {
      const z0 = p.roughnessLength > 0 ? p.roughnessLength : DEFAULT_ROUGHNESS_LENGTH;
      return { ...base, kind: 2, exponent: 0, zMin: Math.max(DEFAULT_PROFILE_MIN_HEIGHT, 2 * z0), z0, logRef: Math.log(10 / z0) };
    }
  }
}
