/**
 * Child process for the fault suite: `write TARGET N TAG` replaces TARGET N times through the
 * store's atomic write; `recent DATA_DIR N TAG` adds N distinct paths to the recent list in DATA_DIR.
 * Prints one JSON line {"failures": [...]} at the end. Bundled to .mjs by the test for a fast start.
 */
import path from 'node:path';
import { writeFileAtomic } from '../../../../main/store/atomic-write.ts';
import { RecentProjects } from '../../../../main/store/recent-projects.ts';

const [mode, where, count, tag] = process.argv.slice(2);
const failures: string[] = [];
for (let i = 0; i < Number(count); i++) {
  try {
    if (mode === 'write') await writeFileAtomic(where, `${tag} ${i}\n`.repeat(2000), { backup: true });
    else await new RecentProjects(where).add(path.join('/projects', `${tag}-${i}.stayset`));
  } catch (e) {
    failures.push((e as Error).message);
  }
}
process.stdout.write(`${JSON.stringify({ failures })}\n`);
