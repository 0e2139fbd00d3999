/**
 * Member-level end tensions of a cable from its end points alone: the elastic catenary (Irvine,
 * Cable Structures, 1981, §2.2) of stress-free length L0, weight w per unstressed length and axial
 * stiffness EA hung between the deformed end points. Used for the minimum-tension check so the
 * verdict does not depend on how many elements the member was split into: a one-element cable
 * whose chord is shorter than its stress-free length is straight and force-free in the model, but
 * really hangs with a tension this function gives; with many elements the model converges to it.
 * Only gravity of the bare cable enters: cases that add load (ice, factored weight, wind on the
 * cable) give a higher real tension for the same end points, so the measure errs low (safe for a
 * minimum-tension check). Units: m, N, N/m.
 *
 * Unknowns H (horizontal component) and V0 (vertical component at end a, along the cable toward b,
 * positive up). With V(s) = V0 + w s along the unstressed arc length s:
 *   x(L0) = H L0/EA + (H/w)[asinh((V0 + w L0)/H) − asinh(V0/H)] = l
 *   z(L0) = (V0 L0 + w L0²/2)/EA + (H/w)[√(1 + ((V0 + w L0)/H)²) − √(1 + (V0/H)²)] = h
 * T_a = √(H² + V0²), T_b = √(H² + (V0 + w L0)²).
 */

export interface ChordTensionInput {
  /** Horizontal distance between the end points, m (≥ 0). */
  span: number;
  /** Height of end b above end a, m. */
  rise: number;
  /** Stress-free length, m. */
  unstressedLength: number;
  /** Weight per unstressed length, N/m (≥ 0). */
  weightPerLength: number;
  /** Axial stiffness E·A, N. */
  axialStiffness: number;
}

export interface ChordTension {
  /** Tension at end a and end b, N. */
  start: number;
  end: number;
  /** Horizontal component, N. */
  horizontal: number;
}

function straight(c: ChordTensionInput): ChordTension {
  const chord = Math.hypot(c.span, c.rise);
  const t = Math.max(0, (c.axialStiffness * (chord - c.unstressedLength)) / c.unstressedLength);
  const dv = (c.weightPerLength * c.unstressedLength * (chord > 0 ? c.rise / chord : 1)) / 2;
  return { start: Math.max(0, t - dv), end: Math.max(0, t + dv), horizontal: chord > 0 ? (t * c.span) / chord : 0 };
}

function residual(c: ChordTensionInput, H: number, V0: number): [number, number] {
  const { unstressedLength: L, weightPerLength: w, axialStiffness: EA } = c;
  const a = V0 / H, b = (V0 + w * L) / H;
  const x = (H * L) / EA + (H / w) * (Math.asinh(b) - Math.asinh(a));
  const z = (V0 * L + (w * L * L) / 2) / EA + (H / w) * (Math.sqrt(1 + b * b) - Math.sqrt(1 + a * a));
  return [x - c.span, z - c.rise];
}

/** End tensions of the elastic catenary through the end points; null if it cannot be solved. */
export function chordTension(c: ChordTensionInput): ChordTension | null {
  const { unstressedLength: L, weightPerLength: w, axialStiffness: EA } = c;
  if (!(L > 0) || !(EA > 0)) return null;
  if (w <= 0 || c.span < 1e-9 * L) return straight(c);
  const chord = Math.hypot(c.span, c.rise);
  // Start: the larger of the taut-bar estimate and a parabola-like hanging estimate (sag ratio ≈ 0.1 or from L0 > chord).
  const slackRatio = L > chord ? Math.sqrt(Math.max(1e-6, (3 * (L * L - chord * chord)) / (8 * c.span * c.span))) : 0;
  const hangH = (w * L * c.span) / (8 * Math.max(0.01, slackRatio) * chord);
  let H = Math.max(hangH, (EA * Math.max(0, chord - L) * c.span) / (L * chord));
  let V0 = -(w * L) / 2 + (H * c.rise) / c.span;
  let r = residual(c, H, V0);
  const scale = Math.max(chord, 1e-9);
  for (let it = 0; it < 100; it++) {
    const norm = Math.hypot(r[0], r[1]);
    if (norm <= 1e-12 * scale) break;
    const dH = 1e-7 * H, dV = 1e-7 * Math.max(H, Math.abs(V0));
    const rH = residual(c, H + dH, V0), rV = residual(c, H, V0 + dV);
    const j11 = (rH[0] - r[0]) / dH, j21 = (rH[1] - r[1]) / dH, j12 = (rV[0] - r[0]) / dV, j22 = (rV[1] - r[1]) / dV;
    const det = j11 * j22 - j12 * j21;
    if (!Number.isFinite(det) || det === 0) return null;
    let sH = -(j22 * r[0] - j12 * r[1]) / det, sV = -(-j21 * r[0] + j11 * r[1]) / det;
    let step = 1;
    // Keep H positive and the residual decreasing (backtracking).
    for (let k = 0; k < 40; k++) {
      const h2 = H + step * sH;
      if (h2 > 0) {
        const r2 = residual(c, h2, V0 + step * sV);
        if (Math.hypot(r2[0], r2[1]) < norm) { H = h2; V0 += step * sV; r = r2; break; }
      }
      step /= 2;
      if (k === 39) return null;
    }
    sH = 0; sV = 0;
  }
  if (Math.hypot(r[0], r[1]) > 1e-9 * scale) return null;
  const Vb = V0 + w * L;
  return { start: Math.hypot(H, V0), end: Math.hypot(H, Vb), horizontal: H };
}
