/** Which tab of the right panel is shown (inspector, wind and ice, checks, tuning, project); display only. */
import { defineStore } from 'pinia';
import { ref } from 'vue';

export type RightTab = 'inspector' | 'loads' | 'checks' | 'tuning' | 'project';

export const useLayoutStore = defineStore('layout', () => {
  const rightTab = ref<RightTab>('inspector');
  function showRight(tab: RightTab): void {
    rightTab.value = tab;
  }
  return { rightTab, showRight };
});
