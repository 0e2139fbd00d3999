/** Worker for the design benchmark: solves the given case ids of a project and posts the report. */
import { parentPort, workerData } from 'node:worker_threads';
import { solveProject } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

const { project, only } = workerData as { project: ProjectFile; only: string[] };
const t0 = performance.now();
const { report } = solveProject(project, {}, { only });
parentPort!.postMessage({ report, seconds: (performance.now() - t0) / 1000 });
