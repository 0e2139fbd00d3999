import type { GeneratorRecord, ProjectFile } from '../../../solver/index.ts';
import type { ApplyOutcome, DanglingChoice } from './apply-generated.ts';
import { applyGenerated } from './apply-generated.ts';
import type { GuyedMastParams } from './guyed-mast.ts';
import { generateGuyedMast } from './guyed-mast.ts';
import type { RadialNetParams } from './radial-net.ts';
import { generateRadialNet } from './radial-net.ts';
import type { SaddleNetParams } from './saddle-net.ts';
import { generateSaddleNet } from './saddle-net.ts';
import type { GeneratedParts } from './types.ts';

/** Parts a generator record makes (throws GeneratorInputError naming bad parameters). */
export function partsOf(record: GeneratorRecord): GeneratedParts {
  switch (record.kind) {
    case 'guyedMast': return generateGuyedMast(record.id, record.params as unknown as GuyedMastParams);
    case 'saddleNet': return generateSaddleNet(record.id, record.params as unknown as SaddleNetParams);
    case 'radialNet': return generateRadialNet(record.id, record.params as unknown as RadialNetParams);
  }
}

/** Key nodes (roles) of the record's previous run in `project`, or null when there is none or it no longer runs. */
function previousKeyNodes(project: ProjectFile, id: string): Record<string, string> | null {
  const old = project.generators?.find((g) => g.id === id);
  if (!old) return null;
  try {
    return partsOf(old).keyNodes;
  } catch {
    return null;
  }
}

/**
 * Run (or re-run) a generator record on a project: its old parts are replaced, other edits kept;
 * loads and checks on its nodes follow the new geometry; the user's parts that used parts it no
 * longer makes are re-attached or dropped per `choice` (see applyGenerated). The outcome lists
 * them (`dangling`) so a caller can ask first and run again with the answer.
 */
export function runGenerator(project: ProjectFile, record: GeneratorRecord, choice: DanglingChoice = 'reattach'): ApplyOutcome {
  return applyGenerated(project, record, partsOf(record), choice, previousKeyNodes(project, record.id));
}
