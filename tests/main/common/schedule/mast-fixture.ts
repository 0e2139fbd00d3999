import type { ProjectFile } from '../../../../solver/index.ts';
import { generateGuyedMast } from '../../../../main/common/generators/guyed-mast.ts';
import { applyGenerated } from '../../../../main/common/generators/apply-generated.ts';

/**
 * An invented 60 m guyed mast (site "Harrow Fell", fictional) on single equivalent bars, two guy
 * levels of three guys, strand properties typical of 16 mm / 20 mm spiral strand (rounded values,
 * common practice). Cases: dead, wind at 0°, a cold snap (ΔT = −25 K), one combination.
 */
export function mastProject(options: { mastModel?: 'lattice' | 'singleBar'; guySegments?: number; height?: number } = {}): ProjectFile {
  const height = options.height ?? 60;
  const base: ProjectFile = {
    format: 'stayset-project', version: 2,
    meta: { name: 'Harrow Fell relay mast', site: 'Harrow Fell (fictional)', client: 'Example Telecom', engineer: 'A. N. Engineer', referenceTemperature: 283.15 },
    nodes: [], sections: [], members: [],
    loadCases: [
      { id: 'dead', label: 'Dead load', selfWeight: true },
      { id: 'wind0', label: 'Wind 0°, 24 m/s', selfWeight: true, wind: { direction: 0, speed: 24 } },
      { id: 'cold', label: 'Cold −25 K', selfWeight: true, temperatureChange: -25 },
    ],
    combinations: [{ id: 'ULS1', label: '1.2 dead + 1.4 wind', factors: [{ case: 'dead', factor: 1.2 }, { case: 'wind0', factor: 1.4 }] }],
  };
  const params = {
    height, guyLevels: options.mastModel === 'lattice' ? [height / 2, height - 2] : [height / 2, height], guysPerLevel: 3 as const, anchorRadius: [0.45 * height, 0.7 * height],
    mastModel: options.mastModel ?? 'singleBar', faceWidth: 0.9,
    leg: { E: 210e9, area: 2.4e-3, massPerLength: 60, diameter: 0.9, label: 'mast equivalent' },
    bracing: { E: 210e9, area: 2e-4, massPerLength: 2 },
    guy: [
      { E: 160e9, area: 150e-6, massPerLength: 1.25, breakingLoad: 230e3, thermalExpansion: 12e-6, diameter: 0.016, label: '16 mm strand' },
      { E: 160e9, area: 240e-6, massPerLength: 2.0, breakingLoad: 360e3, thermalExpansion: 12e-6, diameter: 0.02, label: '20 mm strand' },
    ],
    guySegments: options.guySegments ?? 10,
  };
  const parts = generateGuyedMast('mast', params);
  const rec = { id: 'mast', kind: 'guyedMast' as const, params: params as unknown as Record<string, unknown> };
  const p = applyGenerated(base, rec, parts).project;
  p.checks = { noSlackGroups: ['mast/guys'], tiltLimits: [{ base: parts.keyNodes.base, top: parts.keyNodes.top, limit: 0.01 }] };
  return p;
}
