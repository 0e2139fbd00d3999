import type { WindProfileSpec } from '../project/types.ts';
import {
  DEFAULT_POWER_LAW_EXPONENT,
  DEFAULT_PROFILE_MIN_HEIGHT,
  DEFAULT_ROUGHNESS_LENGTH,
} from './defaults.ts';

/**
 * Mean wind speed V(z), m/s, at height z (m above z = 0) for a speed V10 at 10 m:
 * - power law:   V(z) = V10 (z/10)^α                         (Hellmann power law)
 * - logarithmic: V(z) = V10 ln(z/z0) / ln(10/z0)             (log law, e.g. EN 1991-1-4 eq. 4.4 shape)
 * - uniform:     V(z) = V10
 * Below z_min (DEFAULT_PROFILE_MIN_HEIGHT, raised to 2·z0 for the log law so ln stays positive)
 * the profile is held at V(z_min); this includes heights at or below zero.
 */
export function windSpeedAt(z: number, speed10: number, profile: WindProfileSpec | undefined): number {
  const p: WindProfileSpec = profile ?? { kind: 'power', exponent: DEFAULT_POWER_LAW_EXPONENT };
  switch (p.kind) {
    case 'uniform':
      return speed10;
    case 'power': {
      const zz = Math.max(z, DEFAULT_PROFILE_MIN_HEIGHT);
      return speed10 * powerLawRatio(zz, p.exponent);
    }
    case 'log': {
      const z0 = p.roughnessLength > 0 ? p.roughnessLength : DEFAULT_ROUGHNESS_LENGTH;
      const zz = Math.max(z, DEFAULT_PROFILE_MIN_HEIGHT, 2 * z0);
      return (speed10 * Math.log(zz / z0)) / Math.log(10 / z0);
    }
  }
}

/**
 * (z/10)^α for z > 0, computed as exp(α ln(z/10)): within about one unit in the last place of
 * Math.pow, and 2–2.5× faster in V8 (it runs per element and residual in the follower wind).
 */
export function powerLawRatio(z: number, exponent: number): number {
  return Math.exp(exponent * Math.log(z / 10));
}

/** Dynamic pressure q = ½ ρ V², Pa (Bernoulli). */
export function dynamicPressure(airDensity: number, speed: number): number {
  return 0.5 * airDensity * speed * speed;
}
