/** Which tab of the right panel is shown (inspector, wind and ice, checks, tuning, project, design actions); display only. */
import { defineStore } from 'pinia';
import { ref } from 'vue';

export type RightTab = 'inspector' | 'loads' | 'checks' | 'tuning' | 'project' | 'actions';

export const useLayoutStore = defineStore('layout', () => {
  const rightTab = ref<RightTab>('inspector');
  /** The load case last chosen in a loads editor: its loads are drawn when no result case is shown. */
  const loadCaseId = ref<string | null>(null);
  function showRight(tab: RightTab): void {
    rightTab.value = tab;
  }
  return { rightTab, showRight, loadCaseId };
});
