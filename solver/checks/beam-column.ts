/**
 * Combined axial force and bending of a beam-column, by the linear interaction
 *   N_Ed / N_Rd + |M_y,Ed| / M_y,Rd + |M_z,Ed| / M_z,Rd ≤ 1
 * with N_Rd = N_b,Rd in compression (flexural buckling, buckling.ts) and N_t,Rd in tension, and
 * M_Rd = W f_y / γ_M (elastic or plastic modulus as the section gives it). Named here as a
 * conservative simplification (common practice) of EN 1993-1-1 §6.3.3, whose interaction
 * factors are not used; lateral-torsional buckling is not checked (closed and solid sections).
 * Written against a small interface — member axial force and end moments — so any beam family
 * can feed it. Forces N, moments N·m.
 */

/** Member forces of one case: axial force (tension positive) and end moments about y and z. */
export interface BeamColumnForces {
  axial: number;
  momentsY: readonly number[];
  momentsZ: readonly number[];
}

export interface BeamColumnResistance {
  tension: number;
  compression: number;
  momentY: number;
  momentZ: number;
}

export interface BeamColumnResult {
  ratio: number;
  axialShare: number;
  bendingShareY: number;
  bendingShareZ: number;
}

export function beamColumnInteraction(f: BeamColumnForces, r: BeamColumnResistance): BeamColumnResult {
  const axialShare = f.axial >= 0 ? f.axial / r.tension : -f.axial / r.compression;
  const maxAbs = (v: readonly number[]) => v.reduce((m, x) => Math.max(m, Math.abs(x)), 0);
  const bendingShareY = maxAbs(f.momentsY) / r.momentY;
  const bendingShareZ = maxAbs(f.momentsZ) / r.momentZ;
  return { ratio: axialShare + bendingShareY + bendingShareZ, axialShare, bendingShareY, bendingShareZ };
}
