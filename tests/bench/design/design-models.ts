/** The benchmark models and their 72 design cases (invented data). */
import type { GeneratorRecord, LoadCaseSpec, ProjectFile } from '../../../solver/index.ts';
import { runGenerator } from '../../../main/common/generators/index.ts';
import { strandSection } from '../../fixtures/make-demos.ts';

/** 12 wind directions × (no ice, 25 mm ice) × ΔT ∈ {−30, 0, +30} K = 72 cases. */
export function designCases(): LoadCaseSpec[] {
  const out: LoadCaseSpec[] = [];
  for (let d = 0; d < 360; d += 30) for (const ice of [false, true]) for (const dt of [-30, 0, 30]) {
    out.push({
      id: `w${d}${ice ? ' ice' : ''} dT${dt}`,
      wind: { direction: d, speed: ice ? 20 : 32 },
      ...(ice ? { ice: { thickness: 0.025 } } : {}),
      temperatureChange: dt,
    });
  }
  return out;
}

const empty = (): ProjectFile => ({ format: 'stayset-project', version: 2, nodes: [], sections: [], members: [], loadCases: designCases() });

export function benchMast(): ProjectFile {
  const record: GeneratorRecord = {
    id: 'mast', kind: 'guyedMast',
    params: {
      height: 150, guyLevels: [30, 60, 90, 120, 148], guysPerLevel: 3, anchorRadius: [45, 70, 95, 105, 110],
      faceWidth: 1.2, panelHeight: 2, solidity: 0.18,
      leg: { E: 2.1e11, area: 2.5e-3, massPerLength: 19.6, diameter: 0.056, thermalExpansion: 1.2e-5 },
      bracing: { E: 2.1e11, area: 3.1e-4, massPerLength: 2.5, thermalExpansion: 1.2e-5 },
      guy: [18, 20, 22, 24, 26].map((mm) => strandSection(mm / 1000, `guy ${mm} mm`)), guySegments: 16,
    },
  };
  const p = runGenerator(empty(), record).project;
  p.checks = { noSlackGroups: ['mast/guys'] };
  return p;
}

export function benchCanopy(): ProjectFile {
  const record: GeneratorRecord = {
    id: 'canopy', kind: 'saddleNet',
    params: {
      outline: 'rectangle', lengthX: 60, lengthY: 40, spacing: 2, highPointHeight: 20, lowPointHeight: 4,
      netTension: 20e3, edgeForceFactor: 8, backstayDistance: 18,
      netCable: strandSection(0.016, 'net'), edgeCable: strandSection(0.05, 'edge'), backstay: strandSection(0.06, 'stay'),
      mast: { E: 2.1e11, area: 1.2e-2, massPerLength: 95, diameter: 0.5, thermalExpansion: 1.2e-5 },
    },
  };
  const p = runGenerator(empty(), record).project;
  p.checks = { noSlackGroups: ['canopy/edge cables', 'canopy/back-stays'] };
  return p;
}
