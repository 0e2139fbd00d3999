/**
 * Section shapes against independent numbers: the closed forms of a circular tube and a solid
 * round (any strength-of-materials text), and numerical integration over a fine grid for the equal
 * angle (principal second moments from the grid's Ix, Iy, Ixy — Mohr's circle).
 */
import { describe, expect, it } from 'vitest';
import { circularTube, equalAngle, latticeMastEquivalent, solidRound } from '../../../solver/sections/section-shapes.ts';

describe('section shapes', () => {
  it('circular tube and solid round', () => {
    const t = circularTube(0.2, 0.01, 7850);
    expect(t.area).toBeCloseTo(Math.PI * 0.19 * 0.01, 12); // π·(D − t)·t for a tube
    expect(t.Iy).toBeCloseTo((Math.PI / 64) * (0.2 ** 4 - 0.18 ** 4), 14);
    expect(t.J).toBeCloseTo(2 * t.Iy, 14);
    const s = solidRound(0.05, 7850);
    expect(s.J).toBeCloseTo((Math.PI * 0.05 ** 4) / 32, 16);
    expect(s.massPerLength).toBeCloseTo(7850 * Math.PI * 0.025 ** 2, 10);
  });

  it('equal angle: principal second moments match a grid integration of the L shape', () => {
    const b = 0.1, th = 0.01, g = 1000, h = b / g;
    let A = 0, Sx = 0, Sy = 0, Ixx = 0, Iyy = 0, Ixy = 0;
    for (let i = 0; i < g; i++) for (let j = 0; j < g; j++) {
      const x = (i + 0.5) * h, y = (j + 0.5) * h;
      if (x > th && y > th) continue;
      A += h * h; Sx += x * h * h; Sy += y * h * h; Ixx += y * y * h * h; Iyy += x * x * h * h; Ixy += x * y * h * h;
    }
    const cx = Sx / A, cy = Sy / A;
    const ix = Ixx - A * cy * cy, iy = Iyy - A * cx * cx, ixy = Ixy - A * cx * cy;
    const mean = (ix + iy) / 2, rad = Math.hypot((ix - iy) / 2, ixy);
    const a = equalAngle(b, th, 7850);
    expect(a.area / A).toBeCloseTo(1, 6);
    expect(a.Iy / (mean + rad)).toBeCloseTo(1, 4);
    expect(a.Iz / (mean - rad)).toBeCloseTo(1, 4);
  });

  it('lattice mast: leg areas at the corners, Bredt torsion from the face shear stiffness', () => {
    const p = { legs: 3 as const, faceWidth: 1, legArea: 1e-3, diagonalArea: 2e-4, panelHeight: 1, E: 2e11, G: 8e10, density: 7850 };
    const s = latticeMastEquivalent(p);
    // Three legs on a circle of radius b/√3: I = Σ A r² cos² = 3 A (b²/3)/2.
    expect(s.Iy).toBeCloseTo(3 * 1e-3 * (1 / 3) / 2, 12);
    const S = 2e11 * 2e-4 * Math.SQRT1_2 * 0.5;
    expect(s.J * p.G).toBeCloseTo((4 * (Math.sqrt(3) / 4) ** 2 * S) / 3, 0);
    const q = latticeMastEquivalent({ ...p, legs: 4 });
    expect(q.Iy).toBeCloseTo(4 * 1e-3 * 0.25, 12);
  });
});
