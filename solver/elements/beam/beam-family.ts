/**
 * Beam-column family: 3D two-node co-rotational beam (beam-energy.ts), 3 translations and 3
 * rotations at each node, element DOFs [u_a, θ_a, u_b, θ_b] (θ of a fully released end absent).
 * Members of kind "beam"; their sections need G, Iy, Iz and J besides E and area.
 */
import type { ElementFamily, FamilyBlock, AssemblyContext } from '../family.ts';
import type { AnalysisModel } from '../../model/analysis-model.ts';
import type { ProjectFile } from '../../project/types.ts';
import { dofOf, type DofMap } from '../../model/dof-map.ts';
import { evaluateBeam } from './beam-kernel.ts';
import { LOCAL, RELEASE_A_ALL, RELEASE_B_ALL, type BeamConstants } from './beam-energy.ts';
import { beamStartFrame, releaseBits } from './beam-frame.ts';
import { writeEndActions } from './beam-results.ts';

export interface BeamData {
  /** Start frames e1, e2, e3 (9 per element of the block). */
  frame: Float64Array;
  EIy: Float64Array;
  EIz: Float64Array;
  GJ: Float64Array;
  releases: Uint8Array;
  /** (Iy + Iz)/A, m² — polar radius of gyration squared, for the torsional mass. */
  polarGyration2: Float64Array;
}

const REQUIRED = ['G', 'Iy', 'Iz', 'J'] as const;

function prepareBeams(project: ProjectFile, model: AnalysisModel, elements: Int32Array): BeamData {
  const n = elements.length;
  const data: BeamData = {
    frame: new Float64Array(9 * n), EIy: new Float64Array(n), EIz: new Float64Array(n), GJ: new Float64Array(n),
    releases: new Uint8Array(n), polarGyration2: new Float64Array(n),
  };
  for (let k = 0; k < n; k++) {
    const e = elements[k];
    const mt = model.members[model.elemMember[e]];
    const member = project.members[mt.index];
    const where = `members[${mt.index}] "${member.id}"`;
    const section = project.sections[mt.sectionIndex];
    for (const key of REQUIRED) {
      const v = section[key];
      if (!(typeof v === 'number' && v > 0)) {
        throw new Error(`${where}: a beam needs ${REQUIRED.join(', ')} on its section; sections[${mt.sectionIndex}] "${section.id}" has no positive ${key}`);
      }
    }
    const a = model.elemNodes[2 * e], b = model.elemNodes[2 * e + 1];
    const dx = [0, 1, 2].map((q) => model.coords[3 * b + q] - model.coords[3 * a + q]);
    beamStartFrame(dx, member, where, data.frame, 9 * k);
    const bits = releaseBits(member, where);
    let r = 0;
    if (e === mt.firstElement) r |= bits.start;
    if (e === mt.firstElement + mt.elementCount - 1) r |= bits.end;
    // releaseBits refuses torsion released at both ends, so at most one end is fully released.
    data.releases[k] = r;
    data.EIy[k] = section.E * section.Iy!;
    data.EIz[k] = section.E * section.Iz!;
    data.GJ[k] = section.G! * section.J!;
    data.polarGyration2[k] = (section.Iy! + section.Iz!) / section.area;
  }
  return data;
}

const consts: BeamConstants = {
  frame: new Float64Array(9), start: new Float64Array(3), Lr: 0, S0: 0, E: 0, A: 0, thermalStrain: 0, EIy: 0, EIz: 0, GJ: 0, releases: 0,
};
const x9 = new Float64Array(9);
const fe = new Float64Array(12);
const ke = new Float64Array(144);

function assembleBeams(ctx: AssemblyContext, block: FamilyBlock, slots: Int32Array | null): void {
  const { model, dX, u, dT, fInt, state, values, fixed } = ctx;
  const data = block.data as BeamData;
  const dofs = block.elementDofs;
  const list = block.elements;
  for (let k = 0; k < list.length; k++) {
    const e = list[k];
    const o = 12 * k;
    for (let q = 0; q < 3; q++) {
      x9[q] = u[dofs[o + 6 + q]] - u[dofs[o + q]];
      consts.start[q] = dX[3 * e + q];
      x9[3 + q] = dofs[o + 3] >= 0 ? u[dofs[o + 3 + q]] : 0;
      x9[6 + q] = dofs[o + 9] >= 0 ? u[dofs[o + 9 + q]] : 0;
    }
    consts.frame.set(data.frame.subarray(9 * k, 9 * k + 9));
    consts.Lr = model.elemRefLength[e]; consts.S0 = model.elemS0[e]; consts.E = model.elemE[e]; consts.A = model.elemArea[e];
    consts.thermalStrain = model.elemAlpha[e] * dT;
    consts.EIy = data.EIy[k]; consts.EIz = data.EIz[k]; consts.GJ = data.GJ[k]; consts.releases = data.releases[k];
    evaluateBeam(consts, x9, fe, values ? ke : null);
    for (let p = 0; p < 12; p++) { const d = dofs[o + p]; if (d >= 0) fInt[d] += fe[p]; }
    const S = consts.S0 + consts.E * LOCAL[7];
    state.tension[e] = (consts.A * S * LOCAL[0]) / consts.Lr;
    state.slack[e] = 0;
    writeEndActions(consts, LOCAL, state.endForces, 12 * e);
    if (values && slots) {
      let s = 78 * k;
      for (let p = 0; p < 12; p++) {
        const dp = dofs[o + p];
        for (let q = 0; q <= p; q++, s++) {
          const dq = dofs[o + q];
          if (dp < 0 || dq < 0 || fixed[dp] || fixed[dq]) continue;
          values[slots[s]] += ke[12 * p + q];
        }
      }
    }
  }
}

function beamDofs(model: AnalysisModel, block: FamilyBlock, map: DofMap): Int32Array {
  const data = block.data as BeamData;
  const dofs = new Int32Array(12 * block.elements.length);
  block.elements.forEach((e, k) => {
    const ends = [model.elemNodes[2 * e], model.elemNodes[2 * e + 1]];
    const free = [(data.releases[k] & RELEASE_A_ALL) !== RELEASE_A_ALL, (data.releases[k] & RELEASE_B_ALL) !== RELEASE_B_ALL];
    for (let end = 0; end < 2; end++) {
      for (let q = 0; q < 3; q++) {
        dofs[12 * k + 6 * end + q] = 3 * ends[end] + q;
        dofs[12 * k + 6 * end + 3 + q] = free[end] ? dofOf(map, ends[end], 3 + q) : -1;
      }
    }
  });
  return dofs;
}

export const beamFamily: ElementFamily = {
  id: 'beam',
  kinds: ['beam'],
  dofsPerElement: 12,
  prepare: prepareBeams,
  markRotations(model, block, mark) {
    const data = block.data as BeamData;
    block.elements.forEach((e, k) => {
      if ((data.releases[k] & RELEASE_A_ALL) !== RELEASE_A_ALL) mark[model.elemNodes[2 * e]] = 1;
      if ((data.releases[k] & RELEASE_B_ALL) !== RELEASE_B_ALL) mark[model.elemNodes[2 * e + 1]] = 1;
    });
  },
  elementDofs: beamDofs,
  assemble: assembleBeams,
  /**
   * Half the element mass to each end's translations; rotary inertia by HRZ lumping of the cubic
   * element (Hinton, Rock & Zienkiewicz 1976: μL³/78 about the bending axes; recalled) and
   * μ r_p² L/2 about the axis (r_p² = (Iy + Iz)/A); the local tensor's diagonal in global axes.
   */
  lumpedMass(model, block, extra, mass) {
    const data = block.data as BeamData;
    block.elements.forEach((e, k) => {
      const mu = model.elemMassPerLength[e] + (extra ? extra[e] : 0);
      const L = model.elemUnstressedLength[e];
      const half = 0.5 * mu * L;
      const bend = (mu * L * L * L) / 78, twist = half * data.polarGyration2[k];
      const o = 12 * k;
      for (let end = 0; end < 2; end++) {
        for (let q = 0; q < 3; q++) {
          mass[block.elementDofs[o + 6 * end + q]] += half;
          const r = block.elementDofs[o + 6 * end + 3 + q];
          const c = data.frame[9 * k + q];
          if (r >= 0) mass[r] += bend + (twist - bend) * c * c;
        }
      }
    });
  },
};
