import type { MemberSpec, NodeSpec, Vec3 } from '../../../solver/index.ts';
import { solveForceDensity } from './force-density.ts';
import { GeneratorInputError, roundCoord } from './types.ts';
import { generatorNote, newtons } from './generator-notes.ts';

/** A link of a net to form-find: a one-element cable member between two net nodes. */
export interface NetLink {
  id: string;
  from: number;
  to: number;
  /** Force density N/m. */
  q: number;
  section: string;
  group: string;
}

export interface FormFoundNet {
  /** Node coordinates after form finding, 3 × nodes, m. */
  coords: Float64Array;
  /** Cable members pretensioned with N = q · l at the found geometry (exact equilibrium without self-weight). */
  members: MemberSpec[];
  /** Force all links exert on each node, 3 × nodes, N (non-zero at fixed nodes only). */
  pull: Float64Array;
}

/** Form-find a cable net by force densities and turn its links into pretensioned members. */
export function formFindNet(recordId: string, nodeIds: string[], start: Float64Array, fixed: Uint8Array, links: NetLink[]): FormFoundNet {
  const flat = new Int32Array(links.flatMap((l) => [l.from, l.to]));
  const coords = solveForceDensity({ coords: start, fixed, links: flat, q: new Float64Array(links.map((l) => l.q)) });
  const pull = new Float64Array(coords.length);
  const members: MemberSpec[] = links.map((l) => {
    const d = [0, 1, 2].map((k) => coords[3 * l.to + k] - coords[3 * l.from + k]);
    const len = Math.hypot(d[0], d[1], d[2]);
    for (let k = 0; k < 3; k++) { pull[3 * l.from + k] += l.q * d[k]; pull[3 * l.to + k] -= l.q * d[k]; }
    return { id: l.id, kind: 'cable', from: nodeIds[l.from], to: nodeIds[l.to], section: l.section, pretension: Math.round(l.q * len), generatedBy: recordId };
  });
  return { coords, members, pull };
}

export function nodeAt(id: string, x: ArrayLike<number>, i: number, fixed?: string): NodeSpec {
  const n: NodeSpec = { id, at: [roundCoord(x[3 * i]), roundCoord(x[3 * i + 1]), roundCoord(x[3 * i + 2])] };
  if (fixed) n.fixed = fixed;
  return n;
}

/**
 * Forces in a mast and two back-stays meeting at a top node that balance a given pull R (N) on the
 * node: solves N_m u_m + T1 u1 + T2 u2 = −R, u = unit vectors from the top toward each member's
 * other end (Cramer's rule). Returns axial forces (tension positive); the mast must come out in
 * compression and the stays in tension or the layout is reported as unable to balance.
 */
export function balanceMastTop(top: Vec3, mastBase: Vec3, stay1: Vec3, stay2: Vec3, pull: Vec3, where: string): [number, number, number] {
  const unit = (p: Vec3) => { const d = [p[0] - top[0], p[1] - top[1], p[2] - top[2]]; const l = Math.hypot(d[0], d[1], d[2]); return d.map((c) => c / l); };
  const a = [unit(mastBase), unit(stay1), unit(stay2)];
  const rhs = pull.map((c) => -c);
  const det3 = (c0: number[], c1: number[], c2: number[]) =>
    c0[0] * (c1[1] * c2[2] - c1[2] * c2[1]) - c1[0] * (c0[1] * c2[2] - c0[2] * c2[1]) + c2[0] * (c0[1] * c1[2] - c0[2] * c1[1]);
  const D = det3(a[0], a[1], a[2]);
  if (Math.abs(D) < 1e-9) throw new GeneratorInputError([`${where}: mast and back-stays are in one plane and cannot hold the top`]);
  const f: [number, number, number] = [det3(rhs, a[1], a[2]) / D, det3(a[0], rhs, a[2]) / D, det3(a[0], a[1], rhs) / D];
  if (!(f[0] < 0 && f[1] > 0 && f[2] > 0)) {
    throw new GeneratorInputError([generatorNote('backStaysCannotBalance', { entry: where }, { mast: newtons(f[0]), stayA: newtons(f[1]), stayB: newtons(f[2]) })]);
  }
  return f;
}
