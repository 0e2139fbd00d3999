import type { GeneratorRecord, ProjectFile } from '../../../solver/index.ts';
import type { ApplyOutcome } from './apply-generated.ts';
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

/** Run (or re-run) a generator record on a project: its old parts are replaced, other edits kept. */
export function runGenerator(project: ProjectFile, record: GeneratorRecord): ApplyOutcome {
  return applyGenerated(project, record, partsOf(record));
}
