/**
 * A new, empty project: one load case (self-weight and pretension), the reference temperature of
 * the demos (15 °C, common practice for a design reference), no parts yet. It does not validate
 * until it has a node and a member (the banner says so); a generator or the tables add them.
 */
import type { ProjectFile } from '../../solver/index.ts';

export function blankProject(name: string): ProjectFile {
  return {
    format: 'stayset-project', version: 1,
    meta: { name: name.trim() || 'New project', referenceTemperature: 288.15 },
    nodes: [], sections: [], members: [],
    loadCases: [{ id: 'dead', label: 'self-weight and pretension' }],
  };
}
