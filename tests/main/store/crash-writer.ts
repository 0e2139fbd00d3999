/**
 * Child process for the crash test: saves two versions of a project alternately to one target,
 * forever, through the store's atomic write. Prints "ready" after the first complete save.
 * Usage: node --import tsx crash-writer.ts TARGET VERSION_A_FILE VERSION_B_FILE
 * (the crash test runs it bundled to one .mjs file for a fast start).
 */
import { readFileSync } from 'node:fs';
import { writeFileAtomic } from '../../../main/store/atomic-write.ts';

const [target, fileA, fileB] = process.argv.slice(2);
const versions = [readFileSync(fileA, 'utf8'), readFileSync(fileB, 'utf8')];

async function loop(): Promise<void> {
  for (let i = 0; ; i++) {
    await writeFileAtomic(target, versions[i % 2], { backup: true });
    if (i === 0) process.stdout.write('ready\n');
  }
}

void loop();
