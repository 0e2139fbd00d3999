/**
 * The design state written by unstressed lengths: what the crew builds and what does not depend
 * on the order of tensioning.
 *
 * Every member that carries a pretension or an unstressed length is rewritten with its cut length
 * L0 = stressFreeLength(chord, P/A, E) (solver/model/build-model.ts; the same number as the
 * schedule's cut length, since the stress-free length of n equal elements is n times that of one).
 * A pretension member and its unstressed-length twin carry the same force at the modelled chord;
 * their tangents differ at order S0/E, so the design state compared against in solver/sequence
 * and solver/asbuilt is always this rewritten project.
 */
import type { MemberSpec, ProjectFile } from '../project/types.ts';
import { memberUnstressedLength } from '../tuning/tuning-variables.ts';

/** Design unstressed length per member id, m (members with neither pretension nor length: absent). */
export function designUnstressedLengths(project: ProjectFile): Map<string, number> {
  const out = new Map<string, number>();
  for (const m of project.members) {
    if (m.pretension === undefined && m.unstressedLength === undefined) continue;
    out.set(m.id, memberUnstressedLength(project, m));
  }
  return out;
}

/** A copy of the project with every prestressed member given by its unstressed length (input untouched). */
export function withUnstressedLengths(project: ProjectFile, lengths: ReadonlyMap<string, number> = designUnstressedLengths(project)): ProjectFile {
  const members = project.members.map((m): MemberSpec => {
    const L0 = lengths.get(m.id);
    if (L0 === undefined) return { ...m };
    const copy: MemberSpec = { ...m, unstressedLength: L0 };
    delete copy.pretension;
    return copy;
  });
  return { ...project, members };
}

/**
 * Stress-free length of a member at a temperature change ΔT (K) from the reference, m: with the
 * element law S = E(ε − αΔT) and ε = (l² − L0²)/(2L0²) (solver/elements/truss-tl.ts) the stress
 * vanishes at l = L0·√(1 + 2αΔT) (= L0(1 + αΔT) to first order). This is the length the crew marks
 * on a cable lying unloaded at the day's temperature.
 */
export function stressFreeLengthAt(L0: number, alpha: number, deltaT: number): number {
  return L0 * Math.sqrt(1 + 2 * alpha * deltaT);
}

/** d/dΔT of stressFreeLengthAt, m/K. */
export function stressFreeLengthPerKelvin(L0: number, alpha: number, deltaT: number): number {
  return (L0 * alpha) / Math.sqrt(1 + 2 * alpha * deltaT);
}
