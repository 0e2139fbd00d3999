/**
 * Benchmark: re-solve time per pretension-slider step on a mast-sized model (a few thousand
 * DOFs): an invented 200 m lattice guyed mast from the guyed-mast generator, four guy levels of
 * three guys, 40 elements per guy. The slider moves the top guy level's pretension in 1 % steps;
 * every step is one warm-started Newton solve of the dead-load case (createLiveResolver).
 * Then a full tuning run on the same mast, warm session against rebuilding per solve.
 * Prints tables; nothing is asserted. Run alone: node --import tsx tests/bench/tuning/live-resolve-bench.ts
 */
import { fileURLToPath } from 'node:url';
import { createLiveResolver, solveNamedCases, tuneProject } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';
import { generateGuyedMast } from '../../../main/common/generators/guyed-mast.ts';
import { applyGenerated } from '../../../main/common/generators/apply-generated.ts';

export interface LiveResolveBenchResult {
  dofs: number;
  elements: number;
  coldSeconds: number;
  coldIterations: number;
  steps: number;
  medianStepSeconds: number;
  maxStepSeconds: number;
  meanStepIterations: number;
  warmShare: number;
}

export function mastForBench(height = 200): ProjectFile {
  const base: ProjectFile = {
    format: 'stayset-project', version: 2, meta: { name: 'Bench mast (invented)', referenceTemperature: 283.15 },
    nodes: [], sections: [], members: [], loadCases: [{ id: 'dead', selfWeight: true }],
  };
  const params = {
    height, guyLevels: [0.25, 0.5, 0.75, 0.97].map((f) => f * height), guysPerLevel: 3 as const, anchorRadius: 0.6 * height,
    mastModel: 'lattice' as const, faceWidth: 1.2, panelHeight: 1.0,
    leg: { E: 210e9, area: 1.5e-3, massPerLength: 12 }, bracing: { E: 210e9, area: 3e-4, massPerLength: 2.5 },
    guy: { E: 160e9, area: 300e-6, massPerLength: 2.5, breakingLoad: 450e3, thermalExpansion: 12e-6 }, guySegments: 40,
  };
  const parts = generateGuyedMast('mast', params);
  return applyGenerated(base, { id: 'mast', kind: 'guyedMast', params: params as unknown as Record<string, unknown> }, parts).project;
}

export function runLiveResolveBench(steps = 20): LiveResolveBenchResult {
  const project = mastForBench();
  const group = 'mast/guys level 4';
  const guy = project.members.find((m) => project.groups!.find((g) => g.id === group)!.members.includes(m.id))!;
  const p0 = guy.pretension ?? 45e3;
  const live = createLiveResolver(project, 'dead', group);
  const cold = live.setPretension(p0);
  if (!cold.result.converged) throw new Error(`bench mast did not converge: ${cold.result.message}`);
  const times: number[] = [];
  let iterations = 0;
  let warm = 0;
  for (let k = 1; k <= steps; k++) {
    const s = live.setPretension(p0 * (1 + 0.01 * k));
    if (!s.result.converged) throw new Error(`slider step ${k} did not converge: ${s.result.message}`);
    times.push(s.seconds);
    iterations += s.result.stats.iterations;
    if (s.warm) warm++;
  }
  const sorted = [...times].sort((a, b) => a - b);
  return {
    dofs: cold.result.stats.dofs, elements: cold.fields.elementTension.length,
    coldSeconds: cold.seconds, coldIterations: cold.result.stats.iterations, steps,
    medianStepSeconds: sorted[Math.floor(sorted.length / 2)], maxStepSeconds: sorted[sorted.length - 1],
    meanStepIterations: iterations / steps, warmShare: warm / steps,
  };
}

export interface TuneBenchRow { path: 'warm session' | 'rebuild each solve'; seconds: number; solves: number; summary: string }

/** Full tuning run on the same mast: four tension-share targets, one variable per guy level. */
export function runTuneBench(): TuneBenchRow[] {
  const project = mastForBench();
  project.tuning = {
    variables: [1, 2, 3, 4].map((k) => ({ group: `mast/guys level ${k}`, by: 'pretension' as const })),
    targets: [1, 2, 3, 4].map((k) => ({ kind: 'tensionShare' as const, group: `mast/guys level ${k}`, share: 0.08 + 0.01 * k })),
  };
  return (['warm session', 'rebuild each solve'] as const).map((path) => {
    const t0 = performance.now();
    const r = tuneProject(project, path === 'warm session' ? {} : { solveCases: solveNamedCases });
    return { path, seconds: (performance.now() - t0) / 1000, solves: r.evaluations, summary: r.summary };
  });
}

export function runLiveResolveBenchmark(): LiveResolveBenchResult {
  const r = runLiveResolveBench();
  console.log('\nLive re-solve per pretension-slider step (200 m lattice guyed mast, dead load, warm start)');
  console.log('   DOFs  elements  cold s  cold it  steps  median step s  max step s  it/step  warm');
  console.log(`${String(r.dofs).padStart(7)} ${String(r.elements).padStart(9)} ${r.coldSeconds.toFixed(3).padStart(7)} ${String(r.coldIterations).padStart(8)}`
    + ` ${String(r.steps).padStart(6)} ${r.medianStepSeconds.toFixed(4).padStart(14)} ${r.maxStepSeconds.toFixed(4).padStart(11)} ${r.meanStepIterations.toFixed(1).padStart(8)} ${(r.warmShare * 100).toFixed(0).padStart(4)} %`);
  console.log('\nTuning run on the same mast (4 guy levels, 4 tension-share targets)');
  console.log('path                  seconds  solves  outcome');
  for (const t of runTuneBench()) console.log(`${t.path.padEnd(20)} ${t.seconds.toFixed(2).padStart(8)} ${String(t.solves).padStart(7)}  ${t.summary}`);
  return r;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) runLiveResolveBenchmark();
