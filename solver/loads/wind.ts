import type { AnalysisModel } from '../model/analysis-model.ts';
import type { LoadCaseSpec, ProjectFile, WindSpec } from '../project/types.ts';
import type { FollowerLoad } from './case-loads.ts';
import { membersOfGroups } from '../checks/groups.ts';
import {
  DEFAULT_AIR_DENSITY,
  DEFAULT_CABLE_DRAG_COEFFICIENT,
  DEFAULT_ICED_DRAG_COEFFICIENT,
} from './defaults.ts';
import { latticeDragWidth } from './lattice-force-coefficient.ts';
import { iceThicknessPerElement } from './ice.ts';
import { windSpeedAt } from './wind-profile.ts';
import { windForceFactor } from './wind-basis.ts';
import { resolveWindCase, type WindCase } from './wind-case.ts';

/**
 * Drag area per unit length, m²/m (= m), of every element: Cd · D for round sections
 * (D + 2t when iced, Cd from the section or DEFAULT_(ICED_)CABLE_DRAG_COEFFICIENT), and
 * C_f · φ · faceWidth · share for lattice mast sections (latticeDragWidth: C_f = lattice.dragFactor
 * or C_f(φ) of lattice-force-coefficient.ts; ice raises φ to φ(d + 2t)/d). 0 = no wind on it.
 */
export function windDragWidths(model: AnalysisModel, project: ProjectFile, caseSpec: LoadCaseSpec): Float64Array {
  const cdD = new Float64Array(model.elementCount);
  const wind = caseSpec.wind;
  if (!wind) return cdD;
  const allowed = wind.groups && wind.groups.length > 0 ? membersOfGroups(project, wind.groups) : null;
  const iceT = iceThicknessPerElement(model, project, caseSpec.ice);
  for (const mt of model.members) {
    if (allowed && !allowed.has(mt.id)) continue;
    const section = project.sections[mt.sectionIndex];
    for (let k = 0; k < mt.elementCount; k++) {
      const e = mt.firstElement + k;
      if (section?.lattice) {
        cdD[e] = latticeDragWidth(section.lattice, iceT[e], section.diameter, section.id);
      } else if (model.elemDiameter[e] > 0) {
        const iced = iceT[e] > 0;
        const cd = section?.dragCoefficient ?? (iced ? DEFAULT_ICED_DRAG_COEFFICIENT : DEFAULT_CABLE_DRAG_COEFFICIENT);
        cdD[e] = cd * (model.elemDiameter[e] + 2 * iceT[e]);
      }
    }
  }
  return cdD;
}

/** Unit vector of the flow direction (degrees counter-clockwise from +x in the x–y plane). */
export function windDirectionVector(directionDeg: number): [number, number] {
  const a = (directionDeg * Math.PI) / 180;
  return [Math.cos(a), Math.sin(a)];
}

/**
 * Drag force on one straight element, N, added into out[0..2]:
 *   F = k ½ ρ (Cd D) |V_n| V_n · l,   V_n = V − (V·t) t,   k = gust × structural factor (wind-basis.ts),
 * with t the unit tangent of the current chord a → b, l its current length and V the wind
 * velocity at the chord's mid-height (a cross-flow drag model on the normal velocity component).
 */
export function elementDragForce(
  a: ArrayLike<number>, b: ArrayLike<number>, dragWidth: number, wind: WindSpec, out: Float64Array,
): void {
  const dx = b[0] - a[0], dy = b[1] - a[1], dz = b[2] - a[2];
  const l = Math.sqrt(dx * dx + dy * dy + dz * dz);
  out[0] = 0; out[1] = 0; out[2] = 0;
  if (!(l > 0) || !(dragWidth > 0)) return;
  const tx = dx / l, ty = dy / l, tz = dz / l;
  const v = windSpeedAt(0.5 * (a[2] + b[2]), wind.speed, wind.profile);
  const [cx, cy] = windDirectionVector(wind.direction);
  const vx = v * cx, vy = v * cy;
  const vt = vx * tx + vy * ty;
  const nx = vx - vt * tx, ny = vy - vt * ty, nz = -vt * tz;
  const vn = Math.sqrt(nx * nx + ny * ny + nz * nz);
  const c = 0.5 * (wind.airDensity ?? DEFAULT_AIR_DENSITY) * windForceFactor(wind) * dragWidth * vn * l;
  out[0] = c * nx; out[1] = c * ny; out[2] = c * nz;
}

/**
 * Wind drag of a load case as a follower load on the current geometry; each element's force
 * (elementDragForce) is lumped half to each end node. A case without wind gives a load that adds
 * nothing. Combination factors scale the force linearly through `factor`.
 */
export function createWindLoad(model: AnalysisModel, project: ProjectFile, caseSpec: LoadCaseSpec): FollowerLoad {
  const widths = windDragWidths(model, project, caseSpec);
  let count = 0;
  for (let e = 0; e < model.elementCount; e++) if (widths[e] > 0) count++;
  const nodeA = new Int32Array(count), nodeB = new Int32Array(count), width = new Float64Array(count);
  for (let e = 0, k = 0; e < model.elementCount; e++) {
    if (!(widths[e] > 0)) continue;
    nodeA[k] = model.elemNodes[2 * e]; nodeB[k] = model.elemNodes[2 * e + 1]; width[k] = widths[e]; k++;
  }
  return new WindFollowerLoad(caseSpec.wind ? resolveWindCase(caseSpec.wind) : null, nodeA, nodeB, width);
}

/**
 * The case's wind as a follower load. The geometry-independent parts are resolved once per case
 * (wind-case.ts): per residual only the chord, the speed at its mid-height and the normal velocity
 * are computed, with no call per element. One class with number fields serves every case (it
 * replaced a closure made per case; with square roots in place of Math.hypot on the hot paths,
 * 1.16–1.24× on the design mast's 72 cases).
 */
class WindFollowerLoad implements FollowerLoad {
  private readonly kind: number;
  private readonly speed10: number;
  private readonly exponent: number;
  private readonly zMin: number;
  private readonly z0: number;
  private readonly logRef: number;
  private readonly cx: number;
  private readonly cy: number;
  private readonly halfRho: number;

  constructor(
    private readonly w: WindCase | null,
    private readonly nodeA: Int32Array, private readonly nodeB: Int32Array, private readonly width: Float64Array,
  ) {
    this.kind = w ? w.kind : 0;
    this.speed10 = w ? w.speed10 : 0;
    this.exponent = w ? w.exponent : 0;
    this.zMin = w ? w.zMin : 0;
    this.z0 = w ? w.z0 : 1;
    this.logRef = w ? w.logRef : 1;
    this.cx = w ? w.cx : 0;
    this.cy = w ? w.cy : 0;
    this.halfRho = w ? w.halfRho : 0;
  }

  accumulate(x: Float64Array, factor: number, f: Float64Array): void {
    if (!this.w || factor === 0) return;
    const { nodeA, nodeB, width, kind, speed10, exponent, zMin, z0, logRef, cx, cy, halfRho } = this;
    const count = nodeA.length;
    for (let k = 0; k < count; k++) {
      const i3 = 3 * nodeA[k], j3 = 3 * nodeB[k];
      const az = x[i3 + 2], bz = x[j3 + 2];
      const dx = x[j3] - x[i3], dy = x[j3 + 1] - x[i3 + 1], dz = bz - az;
      const l = Math.sqrt(dx * dx + dy * dy + dz * dz);
      if (!(l > 0)) continue;
      // elementDragForce term by term; V at mid-height as windSpeedAt (wind-profile.ts) with the
      // case's constants resolved.
      const tx = dx / l, ty = dy / l, tz = dz / l;
      const zm = 0.5 * (az + bz), zz = zm > zMin ? zm : zMin;
      const v = kind === 0 ? speed10
        : kind === 1 ? speed10 * Math.exp(exponent * Math.log(zz / 10))
          : (speed10 * Math.log(zz / z0)) / logRef;
      const vx = v * cx, vy = v * cy;
      const vt = vx * tx + vy * ty;
      const nx = vx - vt * tx, ny = vy - vt * ty, nz = -vt * tz;
      const vn = Math.sqrt(nx * nx + ny * ny + nz * nz);
      const c = halfRho * width[k] * vn * l;
      const h = 0.5 * factor;
      const fx = h * (c * nx), fy = h * (c * ny), fz = h * (c * nz);
      f[i3] += fx; f[i3 + 1] += fy; f[i3 + 2] += fz;
      f[j3] += fx; f[j3 + 1] += fy; f[j3 + 2] += fz;
    }
  }
}
