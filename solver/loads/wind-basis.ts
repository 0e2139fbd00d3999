/**
 * The basis of a wind action (WindBasisSpec): the factor on its forces and the velocity pressure
 * profile q(z) = ½ ρ V(z)² (Bernoulli) that reports show.
 */
import type { WindSpec } from '../project/types.ts';
import { DEFAULT_AIR_DENSITY } from './defaults.ts';
import { dynamicPressure, windSpeedAt } from './wind-profile.ts';

/** gustFactor × structuralFactor of the wind's basis (each 1 when not given: no factor applied). */
export function windForceFactor(wind: WindSpec): number {
  return (wind.basis?.gustFactor ?? 1) * (wind.basis?.structuralFactor ?? 1);
}

export interface WindProfileRow {
  /** Height above z = 0, m. */
  z: number;
  /** Wind speed of the profile, m/s. */
  speed: number;
  /** Velocity pressure ½ ρ V², Pa. */
  pressure: number;
  /** Pressure × force factor (what the drag uses), Pa. */
  factoredPressure: number;
}

/** The profile of a wind action at the given heights (m). */
export function windProfileRows(wind: WindSpec, heights: readonly number[]): WindProfileRow[] {
  const rho = wind.airDensity ?? DEFAULT_AIR_DENSITY;
  const k = windForceFactor(wind);
  return heights.map((z) => {
    const speed = windSpeedAt(z, wind.speed, wind.profile);
    const pressure = dynamicPressure(rho, speed);
    return { z, speed, pressure, factoredPressure: k * pressure };
  });
}
