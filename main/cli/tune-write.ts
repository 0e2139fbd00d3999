/**
 * `tune --write`: save the tuned project over FILE only if FILE is still the version tune read
 * (lost-update guard: an edit saved while tuning ran is kept, and tune says so), keeping the
 * previous file as FILE.bak and the file's mode, owner and symlinks (main/store/atomic-write.ts).
 */
import { writeFileAtomic } from '../store/atomic-write.ts';
import type { FileStamp } from '../store/file-stamp.ts';
import { WriteRefusedError } from '../store/write-keep.ts';

/** Write `text` to `target` (shown as `name`); null when written, else the message for stderr. */
export async function writeTunedFile(target: string, name: string, text: string, readStamp: FileStamp | undefined): Promise<string | null> {
  try {
    await writeFileAtomic(target, text, { backup: true, expect: readStamp });
    return null;
  } catch (e) {
    if (e instanceof WriteRefusedError && e.refusal === 'changed') {
      return `${name}: changed on disk while tune ran (another program or window saved it); the tuned pretensions were not written and that version is kept. Run tune again on the current file.`;
    }
    if (e instanceof WriteRefusedError) return `${name}: ${e.message}`;
    return `${name}: saving failed (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); the file is unchanged`;
  }
}
