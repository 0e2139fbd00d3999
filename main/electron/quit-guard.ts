/**
 * The unsaved-changes decision when the window closes (or the app quits).
 *
 * States: clean → close at once. Dirty → ask "Save / Don't save / Cancel":
 *   Save        → ask the renderer to save (menu command 'save') and close when it reports
 *                 setDirty(false); a cancelled or failed save drops the pending close.
 *   Don't save  → forget the autosave of this project and close.
 *   Cancel      → stay open.
 */
import { plainProjectTitle } from './window-title.ts';

export type CloseChoice = 'save' | 'discard' | 'cancel';

/** Buttons of the prompt in order; the index is what the dialog returns. */
export const CLOSE_PROMPT = {
  buttons: ['Save', "Don't Save", 'Cancel'],
  defaultId: 0,
  cancelId: 2,
  choices: ['save', 'discard', 'cancel'] as CloseChoice[],
  message: (title: string) => `Save changes to ${title || 'the project'} before closing?`,
  detail: 'Your changes will be lost if you don\u2019t save them.',
};

export type CloseStep =
  | { kind: 'close' }
  | { kind: 'prompt' }
  | { kind: 'requestSave' }
  | { kind: 'discardAndClose' }
  | { kind: 'stay' };

export class QuitGuard {
  dirty = false;
  title = '';
  /** The last path the renderer autosaved for (null = untitled), so Don't Save can forget it. */
  lastAutosavePath: string | null | undefined;
  private closeAfterSave = false;
  private allowClose = false;

  setDirty(dirty: boolean, title: string): CloseStep {
    this.dirty = dirty;
    this.title = plainProjectTitle(title);
    if (!dirty && this.closeAfterSave) {
      this.closeAfterSave = false;
      this.allowClose = true;
      return { kind: 'close' };
    }
    return { kind: 'stay' };
  }

  /** The window is about to close: let it, or prevent it and prompt. */
  onCloseRequested(): CloseStep {
    if (this.allowClose || !this.dirty) {
      this.allowClose = true;
      return { kind: 'close' };
    }
    return { kind: 'prompt' };
  }

  onPromptAnswer(choiceIndex: number): CloseStep {
    const choice = CLOSE_PROMPT.choices[choiceIndex] ?? 'cancel';
    if (choice === 'save') {
      this.closeAfterSave = true;
      return { kind: 'requestSave' };
    }
    if (choice === 'discard') {
      this.allowClose = true;
      return { kind: 'discardAndClose' };
    }
    return { kind: 'stay' };
  }

  /** A save the close was waiting for was cancelled or failed: keep the window. */
  onSaveAbandoned(): void {
    this.closeAfterSave = false;
  }
}
