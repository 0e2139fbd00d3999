/**
 * CPU time of one cold solveProject call on a project file, in a fresh process (the solve alone,
 * as inside `stayset solve`; reading the file is not timed). Prints one JSON line
 * {"cpuSeconds", "wallSeconds", "seconds"} where seconds is the report's stats.seconds.
 * Used by cli-solve-bench.ts. Usage: node --import tsx tests/bench/solve-cpu-one.ts FILE
 */
import { readFileSync } from 'node:fs';
import { solveProject, type ProjectFile } from '../../solver/index.ts';

const project = JSON.parse(readFileSync(process.argv[2], 'utf8')) as ProjectFile;
const c0 = process.cpuUsage();
const t0 = performance.now();
const { report } = solveProject(project);
const wallSeconds = (performance.now() - t0) / 1000;
const c = process.cpuUsage(c0);
console.log(JSON.stringify({ cpuSeconds: (c.user + c.system) / 1e6, wallSeconds, seconds: report.stats?.seconds ?? 0 }));
