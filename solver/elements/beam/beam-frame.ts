/**
 * Start frame of a beam member and its release bits.
 *
 * Local axes: x along the member from `from` to `to`; y = the part of the orientation vector
 * normal to x (normalised); z = x × y. I_y resists bending about local y (deflection along z),
 * I_z bending about local z (deflection along y). Without an orientation vector, global z is used,
 * or global x for a member within 1° of vertical (so a vertical mast's local y is global x)
 * — common practice in frame programs.
 */
import type { MemberSpec, Vec3 } from '../../project/types.ts';
import { RELEASE_AX, RELEASE_AY, RELEASE_AZ, RELEASE_BX, RELEASE_BY, RELEASE_BZ, RELEASE_A_ALL, RELEASE_B_ALL } from './beam-energy.ts';

/** sin of the smallest angle allowed between the orientation vector and the member axis. */
const PARALLEL_LIMIT = 1e-3;

/** Writes e1, e2, e3 (9 numbers) for axis vector dx (need not be unit). Throws when parallel. */
export function beamStartFrame(dx: ArrayLike<number>, member: MemberSpec, where: string, out: Float64Array, o: number): void {
  const L = Math.hypot(dx[0], dx[1], dx[2]);
  const e1: Vec3 = [dx[0] / L, dx[1] / L, dx[2] / L];
  const ref: Vec3 = member.orientation ?? (Math.abs(e1[2]) > Math.cos(Math.PI / 180) ? [1, 0, 0] : [0, 0, 1]);
  const rl = Math.hypot(ref[0], ref[1], ref[2]);
  const along = (ref[0] * e1[0] + ref[1] * e1[1] + ref[2] * e1[2]);
  const n: Vec3 = [ref[0] - along * e1[0], ref[1] - along * e1[1], ref[2] - along * e1[2]];
  const nl = Math.hypot(n[0], n[1], n[2]);
  if (!(rl > 0) || !(nl > PARALLEL_LIMIT * rl)) {
    throw new Error(`${where}: orientation [${ref.join(', ')}] is parallel to the member axis; give a vector across the member`);
  }
  const e2: Vec3 = [n[0] / nl, n[1] / nl, n[2] / nl];
  const e3: Vec3 = [e1[1] * e2[2] - e1[2] * e2[1], e1[2] * e2[0] - e1[0] * e2[2], e1[0] * e2[1] - e1[1] * e2[0]];
  out.set(e1, o); out.set(e2, o + 3); out.set(e3, o + 6);
}

/** Release bits of a member's start and end (letters x, y, z), validated. */
export function releaseBits(member: MemberSpec, where: string): { start: number; end: number } {
  const parse = (s: string | undefined, bits: [number, number, number], which: string): number => {
    let r = 0;
    for (const ch of (s ?? '').replace(/\s+/g, '')) {
      const k = 'xyz'.indexOf(ch);
      if (k < 0) throw new Error(`${where}: releases.${which} "${s}" may hold only the letters x, y, z (local axes)`);
      r |= bits[k];
    }
    return r;
  };
  const start = parse(member.releases?.start, [RELEASE_AX, RELEASE_AY, RELEASE_AZ], 'start');
  const end = parse(member.releases?.end, [RELEASE_BX, RELEASE_BY, RELEASE_BZ], 'end');
  if ((start & RELEASE_AX) && (end & RELEASE_BX)) throw new Error(`${where}: torsion (x) is released at both ends, the member would spin freely; release it at one end at most`);
  return { start, end };
}

export { RELEASE_A_ALL, RELEASE_B_ALL };
