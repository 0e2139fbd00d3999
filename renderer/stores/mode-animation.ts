/**
 * The vibration mode the 3D view animates (chosen in the Modes tab), or null. Holds the mode shape
 * over the model's DOFs and the member node chains (renderer/view3d/mode-shape.ts) for the project
 * document it was computed from; the view stops when the shown project is another document.
 */
import { defineStore } from 'pinia';
import { markRaw, shallowRef } from 'vue';
import type { ProjectFile } from '../../solver/index.ts';
import type { ModeShapeInput } from '../view3d/mode-shape.ts';

export interface PlayingMode {
  caseId: string;
  /** Mode number, 1 = lowest. */
  number: number;
  /** Hz */
  frequency: number;
  input: ModeShapeInput;
  project: ProjectFile;
}

export const useModeAnimationStore = defineStore('modeAnimation', () => {
  const playing = shallowRef<PlayingMode | null>(null);
  function play(mode: PlayingMode): void {
    playing.value = markRaw(mode);
  }
  function stop(): void {
    playing.value = null;
  }
  return { playing, play, stop };
});
