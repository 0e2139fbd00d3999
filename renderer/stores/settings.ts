/** Display settings: unit system, deformation scale, colour mode. Never affect results. */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import type { UnitSystem } from '../../main/common/units/index.ts';

/**
 * tension: members coloured by axial force; utilisation: by design force / design resistance (solver memberUtilisation); kind: by member
 * kind; checks: by design-check outcome (pass / fail / not checked, slack in its own colour).
 */
export type ColourMode = 'tension' | 'utilisation' | 'kind' | 'checks';

export const useSettingsStore = defineStore('settings', () => {
  const units = ref<UnitSystem>('SI');
  /** Multiplies displacements in the 3D view (1 = true scale). */
  const deformationScale = ref(1);
  const colourMode = ref<ColourMode>('tension');
  const showDeformed = ref(true);

  function setUnits(system: UnitSystem): void {
    units.value = system;
  }

  function toggleUnits(): void {
    units.value = units.value === 'SI' ? 'US' : 'SI';
  }

  /** Refuses non-finite or negative scales (keeps the previous one) and reports why. */
  function setDeformationScale(scale: number): string | null {
    if (!Number.isFinite(scale) || scale < 0) return `Deformation scale: ${scale} is not a number ≥ 0`;
    deformationScale.value = scale;
    return null;
  }

  function setColourMode(mode: ColourMode): void {
    colourMode.value = mode;
  }

  return { units, deformationScale, colourMode, showDeformed, setUnits, toggleUnits, setDeformationScale, setColourMode };
});
