/** Words for the installation-data notes (solver/installation), in the display units. */
import type { InstallationNote } from '../../../solver/index.ts';
import { messageQuantityText, type UnitSystem } from '../units/index.ts';

export function installationNoteText(n: InstallationNote, units: UnitSystem): string {
  const t = messageQuantityText(n.quantities.temperature, units);
  switch (n.code) {
    case 'referenceTemperatureAssumed':
      return `meta.referenceTemperature is not set: ${t} assumed`;
    case 'rowNotConverged':
      return `installation at ${t} did not converge (${String(n.refs.status)})`;
  }
}
