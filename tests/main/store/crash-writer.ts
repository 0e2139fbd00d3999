/**
 * Child process for the crash test: saves two versions of a project alternately to one target,
 * forever, through the store's atomic write. Before save i it prints "begin i", after it
 * "done i" (stdout is a pipe, written synchronously), so the test knows where each kill landed.
 * Usage: node --import tsx crash-writer.ts TARGET VERSION_A_FILE VERSION_B_FILE
 * (the crash test runs it bundled to one .mjs file for a fast start).
 */
import { readFileSync } from 'node:fs';
import { writeFileAtomic } from '../../../main/store/atomic-write.ts';

const [target, fileA, fileB] = process.argv.slice(2);
const versions = [readFileSync(fileA, 'utf8'), readFileSync(fileB, 'utf8')];

async function loop(): Promise<void> {
  for (let i = 0; ; i++) {
    process.stdout.write(`begin ${i}\n`);
    await writeFileAtomic(target, versions[i % 2], { backup: true });
    process.stdout.write(`done ${i}\n`);
  }
}

void loop();
