// Test stand-in for a solver busy outside its Newton loop: never reads the cancel flag, and
// appends a heartbeat to the file named in project.meta.notes every few milliseconds, so a test
// can tell whether the thread is still running.
import { appendFileSync } from 'node:fs';
import { workerData } from 'node:worker_threads';

const file = workerData.project.meta.notes;
let last = 0;
for (;;) {
  const now = Date.now();
  if (now - last >= 5) {
    appendFileSync(file, '.');
    last = now;
  }
}
