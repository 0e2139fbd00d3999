/**
 * Modal analysis speed: the first 10 modes about the solved state against the static solve of
 * that state, on the 100×100 square net (target: modes within 3× the static solve) and on the
 * demo mast (target: modes under 0.2 s). Best of three runs after a warm-up; wall-clock and
 * process CPU time (the latter is steadier on a shared machine). Prints a table; asserts nothing.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { ProjectFile } from '../../../solver/index.ts';
import { buildModel, createWorkspace, modesOfSolvedCase, resolveCaseLoads, solveCase } from '../../../solver/index.ts';
import { squareNetProject } from '../square-net.ts';

interface Timing { wall: number; cpu: number }

function timed<T>(f: () => T): [T, Timing] {
  const c0 = process.cpuUsage(), t0 = performance.now();
  const value = f();
  const c = process.cpuUsage(c0);
  return [value, { wall: (performance.now() - t0) / 1000, cpu: (c.user + c.system) / 1e6 }];
}

function measure(project: ProjectFile, caseIndex = 0) {
  const [prepared, build] = timed(() => {
    const model = buildModel(project);
    return { model, ws: createWorkspace(model) };
  });
  const { model, ws } = prepared;
  const loads = resolveCaseLoads(model, project, project.loadCases[caseIndex]);
  const [solved, staticTime] = timed(() => solveCase(ws, project.loadCases[caseIndex].id, loads));
  const [modal, modesTime] = timed(() => modesOfSolvedCase(ws, project, loads, solved, { count: 10 }));
  if (!modal.ok) throw new Error(`modes refused: ${modal.refusal.code}`);
  return {
    dofs: solved.result.stats.dofs, staticTime: { wall: staticTime.wall + build.wall, cpu: staticTime.cpu + build.cpu },
    modesTime, solves: modal.analysis.stats.solves, basis: modal.analysis.stats.basisSize,
    f1: modal.analysis.modes[0].frequency, f10: modal.analysis.modes[modal.analysis.modes.length - 1].frequency,
  };
}

function best(project: ProjectFile) {
  measure(project);
  const runs = [measure(project), measure(project), measure(project)];
  return runs.reduce((a, b) => (b.modesTime.cpu + b.staticTime.cpu < a.modesTime.cpu + a.staticTime.cpu ? b : a));
}

export function runModesBenchmark(): void {
  const mast = JSON.parse(readFileSync(fileURLToPath(new URL('../../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;
  const rows: [string, ReturnType<typeof best>][] = [['demo mast, dead', best(mast)], ['net 100×100', best(squareNetProject(100))]];
  console.log('\nFirst 10 modes about the solved state (static = model build + workspace + Newton solve)');
  console.log('model               DOFs  static wall s  cpu s  modes wall s  cpu s  modes/static (cpu)  solves  basis  f1 Hz   f10 Hz');
  for (const [name, r] of rows) {
    console.log(
      `${name.padEnd(16)} ${String(r.dofs).padStart(7)} ${r.staticTime.wall.toFixed(3).padStart(14)} ${r.staticTime.cpu.toFixed(3).padStart(6)}`
      + ` ${r.modesTime.wall.toFixed(3).padStart(13)} ${r.modesTime.cpu.toFixed(3).padStart(6)} ${(r.modesTime.cpu / r.staticTime.cpu).toFixed(2).padStart(19)}`
      + ` ${String(r.solves).padStart(7)} ${String(r.basis).padStart(6)} ${r.f1.toFixed(3).padStart(6)} ${r.f10.toFixed(3).padStart(8)}`,
    );
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) runModesBenchmark();
