/** Which tab of the right panel is shown (inspector, loads of a case, tuning); display only. */
import { defineStore } from 'pinia';
import { ref } from 'vue';

export type RightTab = 'inspector' | 'loads' | 'tuning';

export const useLayoutStore = defineStore('layout', () => {
  const rightTab = ref<RightTab>('inspector');
  function showRight(tab: RightTab): void {
    rightTab.value = tab;
  }
  return { rightTab, showRight };
});
