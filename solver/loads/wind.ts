import type { AnalysisModel } from '../model/analysis-model.ts';
import type { LoadCaseSpec, ProjectFile, WindSpec } from '../project/types.ts';
import type { FollowerLoad } from './case-loads.ts';
import { membersOfGroups } from '../checks/groups.ts';
import {
  DEFAULT_AIR_DENSITY,
  DEFAULT_CABLE_DRAG_COEFFICIENT,
  DEFAULT_ICED_DRAG_COEFFICIENT,
  DEFAULT_LATTICE_DRAG_FACTOR,
} from './defaults.ts';
import { iceThicknessPerElement } from './ice.ts';
import { windSpeedAt } from './wind-profile.ts';
import { windForceFactor } from './wind-basis.ts';

/**
 * Drag area per unit length, m²/m (= m), of every element: Cd · D for round sections
 * (D + 2t when iced, Cd from the section or DEFAULT_(ICED_)CABLE_DRAG_COEFFICIENT), and
 * Cf · solidity · faceWidth · share for lattice mast sections (Cf = lattice.dragFactor or
 * DEFAULT_LATTICE_DRAG_FACTOR; ice on lattice sections is not modelled). 0 = no wind on it.
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
        const lat = section.lattice;
        cdD[e] = (lat.dragFactor ?? DEFAULT_LATTICE_DRAG_FACTOR) * lat.solidity * lat.faceWidth * (lat.share ?? 1);
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
  const l = Math.hypot(dx, dy, dz);
  out[0] = 0; out[1] = 0; out[2] = 0;
  if (!(l > 0) || !(dragWidth > 0)) return;
  const tx = dx / l, ty = dy / l, tz = dz / l;
  const v = windSpeedAt(0.5 * (a[2] + b[2]), wind.speed, wind.profile);
  const [cx, cy] = windDirectionVector(wind.direction);
  const vx = v * cx, vy = v * cy;
  const vt = vx * tx + vy * ty;
  const nx = vx - vt * tx, ny = vy - vt * ty, nz = -vt * tz;
  const vn = Math.hypot(nx, ny, nz);
  const c = 0.5 * (wind.airDensity ?? DEFAULT_AIR_DENSITY) * windForceFactor(wind) * dragWidth * vn * l;
  out[0] = c * nx; out[1] = c * ny; out[2] = c * nz;
}

/**
 * Wind drag of a load case as a follower load on the current geometry; each element's force
 * (elementDragForce) is lumped half to each end node. A case without wind gives a load that adds
 * nothing. Combination factors scale the force linearly through `factor`.
 */
export function createWindLoad(model: AnalysisModel, project: ProjectFile, caseSpec: LoadCaseSpec): FollowerLoad {
  const wind = caseSpec.wind;
  const widths = windDragWidths(model, project, caseSpec);
  const active: number[] = [];
  for (let e = 0; e < model.elementCount; e++) if (widths[e] > 0) active.push(e);
  const fe = new Float64Array(3);
  const a = new Float64Array(3), b = new Float64Array(3);
  return {
    accumulate(x: Float64Array, factor: number, f: Float64Array): void {
      if (!wind || factor === 0) return;
      for (const e of active) {
        const i = model.elemNodes[2 * e], j = model.elemNodes[2 * e + 1];
        for (let d = 0; d < 3; d++) { a[d] = x[3 * i + d]; b[d] = x[3 * j + d]; }
        elementDragForce(a, b, widths[e], wind, fe);
        for (let d = 0; d < 3; d++) {
          const h = 0.5 * factor * fe[d];
          f[3 * i + d] += h;
          f[3 * j + d] += h;
        }
      }
    },
  };
}
