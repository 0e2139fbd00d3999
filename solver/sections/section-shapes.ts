/**
 * Section properties of common mast shapes, in SI (m, m², m⁴, kg/m), for beam sections
 * (SectionSpec: area, Iy, Iz, J, massPerLength, diameter). Material constants are the caller's.
 * Fillets and root radii are ignored (a few per cent on tabulated rolled sections).
 */

export interface ShapeProperties {
  area: number;
  /** Second moments of area about the local y and z axes, m⁴. */
  Iy: number;
  Iz: number;
  /** Torsion constant, m⁴. */
  J: number;
  /** Mass per length for the given density, kg/m. */
  massPerLength: number;
  /** Outer diameter or width the wind sees, m. */
  diameter: number;
}

/**
 * Circular hollow section, outer diameter D and wall t (m):
 * A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64, J = 2I (exact for a circular tube), d = D − 2t.
 */
export function circularTube(D: number, t: number, density: number): ShapeProperties {
  if (!(D > 0 && t > 0 && 2 * t <= D)) throw new Error(`circular tube: need 0 < 2t ≤ D (got D = ${D}, t = ${t})`);
  const d = D - 2 * t;
  const area = (Math.PI * (D * D - d * d)) / 4;
  const I = (Math.PI * (D ** 4 - d ** 4)) / 64;
  return { area, Iy: I, Iz: I, J: 2 * I, massPerLength: density * area, diameter: D };
}

/** Solid round bar of diameter D (m): A = πD²/4, I = πD⁴/64, J = πD⁴/32. */
export function solidRound(D: number, density: number): ShapeProperties {
  if (!(D > 0)) throw new Error(`solid round: need D > 0 (got ${D})`);
  const area = (Math.PI * D * D) / 4;
  const I = (Math.PI * D ** 4) / 64;
  return { area, Iy: I, Iz: I, J: 2 * I, massPerLength: density * area, diameter: D };
}

/**
 * Equal-leg angle, leg b and thickness t (m), as two rectangles (b × t and (b − t) × t).
 * Principal axes are at 45° to the legs: Iy = I_u (major, about the axis through the heel's
 * diagonal direction), Iz = I_v (minor) — point the member's orientation vector along the u axis.
 * I_u,v = I_leg-axis ± |I_xy| (Mohr's circle for equal second moments); J = Σ b_i t³/3
 * (thin-walled open section, Saint-Venant; common practice).
 */
export function equalAngle(b: number, t: number, density: number): ShapeProperties {
  if (!(b > 0 && t > 0 && t < b)) throw new Error(`equal angle: need 0 < t < b (got b = ${b}, t = ${t})`);
  const a1 = b * t, a2 = (b - t) * t;
  const area = a1 + a2;
  // Rectangle 1 along x: centroid (b/2, t/2); rectangle 2 along y: centroid (t/2, t + (b − t)/2).
  const c = (a1 * (b / 2) + a2 * (t / 2)) / area; // centroid distance from the heel (both axes)
  const y1 = t / 2 - c, y2 = t + (b - t) / 2 - c, x1 = b / 2 - c, x2 = t / 2 - c;
  const Ix = (b * t ** 3) / 12 + a1 * y1 * y1 + (t * (b - t) ** 3) / 12 + a2 * y2 * y2;
  const Ixy = a1 * x1 * y1 + a2 * x2 * y2;
  return {
    area, Iy: Ix + Math.abs(Ixy), Iz: Ix - Math.abs(Ixy), J: ((b + (b - t)) * t ** 3) / 3,
    massPerLength: density * area, diameter: b,
  };
}

export interface LatticeMastInput {
  /** Number of legs: 3 (triangular) or 4 (square). */
  legs: 3 | 4;
  /** Face width between leg centres, m. */
  faceWidth: number;
  /** Area of one leg, m². */
  legArea: number;
  /** Area of one diagonal, m² (single-diagonal bracing in every face). */
  diagonalArea: number;
  /** Panel height (vertical distance between diagonal nodes), m. */
  panelHeight: number;
  /** Young's modulus of the bracing, Pa (for the face shear stiffness). */
  E: number;
  /** Shear modulus used for the equivalent J (J = GJ_eq / G), Pa. */
  G: number;
  /** Steel density, kg/m³ (mass of legs and diagonals per metre of mast). */
  density: number;
}

/**
 * Equivalent beam of a triangular or square lattice mast with single-diagonal bracing:
 * - A = n·A_leg; I = A_leg·b²/2 (triangle) or A_leg·b² (square) about any centroidal axis (legs
 *   as lumped areas at the corners, parallel-axis theorem; the legs' own I neglected — common practice);
 * - face shear stiffness S = E·A_d·sin φ·cos² φ (N), φ the diagonal's angle to the horizontal
 *   (Timoshenko & Gere, Theory of Elastic Stability, 1961, §2.20, single lacing; recalled);
 * - torsion as a closed thin-walled tube whose walls are the faces (Bredt):
 *   GJ = 4·A_enc²·S / (n·b), A_enc = √3 b²/4 (triangle) or b² (square); J = GJ/G.
 * The Euler–Bernoulli beam ignores the bracing's shear flexibility in bending (see the element).
 */
export function latticeMastEquivalent(p: LatticeMastInput): ShapeProperties {
  const { legs: n, faceWidth: b, legArea, diagonalArea, panelHeight: h } = p;
  if (!(n === 3 || n === 4)) throw new Error(`lattice mast: legs must be 3 or 4 (got ${String(n)})`);
  if (!(b > 0 && legArea > 0 && diagonalArea > 0 && h > 0)) throw new Error('lattice mast: face width, leg and diagonal areas and panel height must be positive');
  const area = n * legArea;
  const I = n === 3 ? (legArea * b * b) / 2 : legArea * b * b;
  const diag = Math.hypot(b, h);
  const sinPhi = h / diag, cosPhi = b / diag;
  const S = p.E * diagonalArea * sinPhi * cosPhi * cosPhi;
  const enclosed = n === 3 ? (Math.sqrt(3) * b * b) / 4 : b * b;
  const GJ = (4 * enclosed * enclosed * S) / (n * b);
  const massPerLength = p.density * (area + (n * diagonalArea * diag) / h);
  return { area, Iy: I, Iz: I, J: GJ / p.G, massPerLength, diameter: b };
}
