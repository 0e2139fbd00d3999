/** Projects that pass the schema but make models beyond the size budget (invented). */
import type { ProjectFile } from '../../../solver/index.ts';
import { sampleMast } from '../store/sample-project.ts';

/**
 * The sample mast with `guys` cable guys of 9,000 segments, guy "G7" of 10,000 (so it leads the
 * members that drive the size): 3 · (segments − 1) DOFs per guy, 12 guys ≈ 327,000 DOFs, above
 * the default budget of 300,000.
 */
export function oversizedMast(guys = 12): ProjectFile {
  const p = sampleMast();
  const template = p.members[1];
  p.members = [p.members[0]];
  for (let i = 0; i < guys; i++) {
    p.members.push({ ...template, id: `G${i + 1}`, to: `A${(i % 3) + 1}`, segments: i === 6 ? 10_000 : 9_000 });
  }
  return p;
}
