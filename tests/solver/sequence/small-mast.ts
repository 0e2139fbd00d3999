/** A small guyed lattice mast (invented data) from the project's own generator, for sequence tests. */
import type { GeneratorRecord, ProjectFile } from '../../../solver/index.ts';
import { runGenerator } from '../../../main/common/generators/index.ts';

const strand = { E: 1.5e11, area: 1.15e-4, massPerLength: 0.95, breakingLoad: 153e3, diameter: 0.014, thermalExpansion: 1.2e-5 };

export function smallMast(): ProjectFile {
  const record: GeneratorRecord = {
    id: 'm', kind: 'guyedMast',
    params: {
      height: 24, guyLevels: [12, 23], guysPerLevel: 3, anchorRadius: 18, anchorOrientation: 90,
      mastModel: 'lattice', faceWidth: 0.5, panelHeight: 1.5, solidity: 0.2,
      leg: { E: 2.1e11, area: 5e-4, massPerLength: 4, diameter: 0.025, thermalExpansion: 1.2e-5 },
      bracing: { E: 2.1e11, area: 1e-4, massPerLength: 0.8, thermalExpansion: 1.2e-5 },
      guy: [strand, strand], guySegments: 6, pretensionShare: 0.1,
    },
  };
  const base: ProjectFile = {
    format: 'stayset-project', version: 1, meta: { name: 'small test mast', referenceTemperature: 288.15 },
    nodes: [], sections: [], members: [], loadCases: [{ id: 'dead' }],
  };
  return runGenerator(base, record).project;
}
