/**
 * Force coefficient of a lattice mast or tower section on its face area (solidity × face width per
 * unit height), as a function of the solidity ratio φ of the face:
 *   flat-sided members:          c_f = 1.76 C1 (1 − C2 φ + φ²)
 *   round members (subcritical): c_f = C1 (1 − C2 φ) + (C1 + 0.875) φ²
 * with C1 = 2.25, C2 = 1.5 for square and C1 = 1.9, C2 = 1.4 for triangular sections.
 * Recalled from EN 1993-3-1 Annex B (B.2.2.2, force coefficients of lattice sections), not read
 * here — check against the standard. (The same shape, c_f = 3.4φ² − 4.7φ + 3.4 triangular and
 * 4.0φ² − 5.9φ + 4.0 square, is recalled from ANSI/TIA-222 and agrees within a few per cent.)
 *
 * Ice: each member grows by 2t across the wind, so the face solidity becomes
 * φ_iced = min(1, φ (d + 2t)/d) for members of mean width d, and iced members count as round
 * (common practice: an ice coat rounds the section).
 */
export type LatticePlan = 'triangular' | 'square';
export type LatticeMembers = 'flat' | 'round';

const CONSTANTS: Record<LatticePlan, { c1: number; c2: number }> = {
  square: { c1: 2.25, c2: 1.5 },
  triangular: { c1: 1.9, c2: 1.4 },
};

/** c_f of a lattice section at solidity φ (0 < φ ≤ 1), see the file comment. */
export function latticeForceCoefficient(solidity: number, plan: LatticePlan, members: LatticeMembers): number {
  if (!(solidity > 0 && solidity <= 1)) throw new Error(`solidity ${solidity} must be in (0, 1]`);
  const { c1, c2 } = CONSTANTS[plan];
  const phi = solidity;
  return members === 'flat' ? 1.76 * c1 * (1 - c2 * phi + phi * phi) : c1 * (1 - c2 * phi) + (c1 + 0.875) * phi * phi;
}

/** Solidity and force coefficient of an iced lattice face: members of mean width d (m) under radial ice t (m). */
export function icedLattice(solidity: number, memberWidth: number, iceThickness: number, plan: LatticePlan): { solidity: number; forceCoefficient: number } {
  const phi = Math.min(1, (solidity * (memberWidth + 2 * iceThickness)) / memberWidth);
  return { solidity: phi, forceCoefficient: latticeForceCoefficient(phi, plan, 'round') };
}

/** The lattice data of a section (SectionSpec.lattice) that the drag needs. */
export interface LatticeFace {
  faceWidth: number;
  solidity: number;
  dragFactor?: number;
  share?: number;
  plan?: LatticePlan;
  members?: LatticeMembers;
  memberWidth?: number;
}

/**
 * Drag width of a lattice member line, m (drag force per unit length = q × this):
 *   C_f · φ · b · share,
 * b the face width, φ the face solidity (φ_iced under ice, see icedLattice) and C_f the section's
 * dragFactor when given, else latticeForceCoefficient(φ, plan, members) — plan default
 * 'triangular', members default 'flat' (the larger coefficient; common practice when the member
 * shape is not stated); iced members count as round. Under ice the member width d is
 * `memberWidth`, else `diameter` (the section's); without either the ice cannot be placed and
 * an error names the section. φ = 0 or share = 0 gives 0.
 */
export function latticeDragWidth(lat: LatticeFace, iceThickness: number, diameter: number | undefined, sectionId: string): number {
  const share = lat.share ?? 1;
  if (!(lat.solidity > 0) || !(share > 0)) return 0;
  const plan = lat.plan ?? 'triangular';
  let phi = lat.solidity, cf: number;
  if (iceThickness > 0) {
    const d = lat.memberWidth ?? diameter;
    if (!(d !== undefined && d > 0)) throw new Error(`sections "${sectionId}": lattice.memberWidth (or diameter) is needed to place ice on the lattice`);
    const iced = icedLattice(phi, d, iceThickness, plan);
    phi = iced.solidity;
    cf = lat.dragFactor ?? iced.forceCoefficient;
  } else {
    cf = lat.dragFactor ?? latticeForceCoefficient(phi, plan, lat.members ?? 'flat');
  }
  return cf * phi * lat.faceWidth * share;
}
