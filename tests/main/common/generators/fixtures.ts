import type { GeneratorRecord, ProjectFile } from '../../../../solver/index.ts';

/** Invented but plausible section data (galvanised strand / steel tube orders of magnitude). */
export const strand = (d: number) => ({
  E: 1.6e11, area: 0.6 * Math.PI * d * d / 4, massPerLength: 0.6 * Math.PI * d * d / 4 * 7850 * 1.05,
  breakingLoad: 1.2e9 * 0.6 * Math.PI * d * d / 4, diameter: d, thermalExpansion: 1.2e-5,
});

export const mastRecord = (over: Record<string, unknown> = {}): GeneratorRecord => ({
  id: 'mast', kind: 'guyedMast',
  params: {
    height: 30, guyLevels: [14, 28], guysPerLevel: 3, anchorRadius: 20, faceWidth: 0.5, panelHeight: 1,
    leg: { E: 2.1e11, area: 4e-4, massPerLength: 3.2, diameter: 0.025, thermalExpansion: 1.2e-5 },
    bracing: { E: 2.1e11, area: 1e-4, massPerLength: 0.8, thermalExpansion: 1.2e-5 },
    guy: strand(0.012), guySegments: 8, ...over,
  },
});

export const emptyProject = (): ProjectFile => ({
  format: 'stayset-project', version: 2, nodes: [], sections: [], members: [],
  loadCases: [{ id: 'dead' }, { id: 'wind', wind: { direction: 30, speed: 28 } }, { id: 'iced', ice: { thickness: 0.015 }, wind: { direction: 200, speed: 18 } }, { id: 'cold', temperatureChange: -35 }],
});
