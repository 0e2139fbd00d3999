/**
 * A file that was migrated from an older format version on load is never silently written back:
 * save() refuses, saveAs() may replace it (explicit choice) and keeps the old file as .bak.
 * Format version 1 is the first one, so the migration outcome is simulated by replacing
 * parseProjectText's result for files marked "OLD-FORMAT-MARK".
 */
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { makeTempDir } from './temp-dir.ts';
import { sampleMast } from './sample-project.ts';

vi.mock('../../../main/common/project/index.ts', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../../main/common/project/index.ts')>();
  return {
    ...real,
    parseProjectText: (text: string) => {
      const out = real.parseProjectText(text.replace('OLD-FORMAT-MARK', 'x'));
      return out.ok && text.includes('OLD-FORMAT-MARK') ? { ...out, migratedFrom: 0 } : out;
    },
  };
});

const { serializeProject } = await import('../../../main/common/project/index.ts');
const { readProjectFile, writeProjectFile } = await import('../../../main/store/project-files.ts');

let tmp: ReturnType<typeof makeTempDir>;
beforeEach(() => (tmp = makeTempDir()));
afterEach(() => tmp.cleanup());

describe('migrated files', () => {
  it('are flagged on load, refused by save and replaced only by save as', async () => {
    const file = path.join(tmp.dir, 'old.stayset');
    const old = sampleMast();
    old.meta = { ...old.meta, notes: 'OLD-FORMAT-MARK' };
    const oldText = serializeProject(old);
    writeFileSync(file, oldText);
    const read = await readProjectFile(file);
    expect(read.ok && read.opened.migratedFrom).toBe(0);
    const saved = await writeProjectFile(file, sampleMast(), 'save');
    expect(!saved.ok && saved.error).toMatch(/older format version 0; Save would upgrade it/);
    expect(readFileSync(file, 'utf8')).toBe(oldText);
    const savedAs = await writeProjectFile(file, sampleMast(), 'saveAs');
    expect(savedAs.ok).toBe(true);
    expect(readFileSync(file + '.bak', 'utf8')).toBe(oldText);
  });
});
