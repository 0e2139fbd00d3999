/**
 * Forward simulation of a tensioning sequence, stage by stage, through the nonlinear solver.
 *
 * Principle (the unstressed-length method of erection analysis): every member is set to its
 * design unstressed length L0 when it is tensioned, and members not yet installed are absent.
 * The final state then has every member at L0 under the same loads as the design state, so it is
 * the design state whatever the order (for a unique equilibrium). What the crew reads on site
 * at each step is the simulation's output:
 * - by force: the tension at the lower end of the member in the stage where it is set, N;
 * - by length: the mark, the stress-free length at the day's temperature L0·√(1 + 2αΔT), m.
 * Tolerance bands: ±forceTolerance·value for force, ±lengthTolerance for length; each is also
 * given in the other quantity through the stage stiffness k = ∂T/∂(−L0) (forward difference,
 * one extra solve per member, step 1e-5·L0). Correction per kelvin: forward difference of a
 * solve of the stage at ΔT + 1 K (forces); ∂mark/∂T = L0·α/√(1 + 2αΔT) (lengths).
 * Two passes: pass 1 sets each member to L1 = L0·(1 + (1 − r)·T_d/(EA)) (T_d its tension in the
 * design state, so its strain at the design geometry is about r times the design strain), pass 2
 * to L0.
 */
import type { ProjectFile } from '../project/types.ts';
import type { ResolvedSequence } from './resolve-sequence.ts';
import type { MemberSetting, SequenceIssue, SequenceStage } from './sequence-types.ts';
import { solveStage, type StageSolution, type StageSpec } from './stage-solver.ts';
import { evaluateStage, lowerEnd } from './stage-evaluation.ts';
import { stressFreeLengthAt, stressFreeLengthPerKelvin } from './design-lengths.ts';

export interface SimulateOptions {
  /** Step order (indices into seq.steps); default as given. */
  order?: number[];
  passes?: 1 | 2;
  /** Pass-1 strain share r (two passes only). */
  share?: number;
  /** Compute settings (bands, stiffness, per-kelvin); false for quick ordering searches. */
  settings?: boolean;
  /** Design-state lower-end tensions by member id, N (needed for two passes). */
  designTension?: ReadonlyMap<string, number>;
  /** Stop at the first stage with an issue (ordering searches). */
  stopAtIssue?: boolean;
}

export interface Simulation {
  stages: SequenceStage[];
  issues: SequenceIssue[];
  final: StageSolution | null;
}

export function simulateSequence(design: ProjectFile, L0: ReadonlyMap<string, number>, seq: ResolvedSequence, options: SimulateOptions = {}): Simulation {
  const order = options.order ?? seq.steps.map((_, i) => i);
  const passes = options.passes ?? 1;
  const share = options.share ?? 0.5;
  const deltaT = seq.temperature - seq.referenceTemperature;
  const stepped = new Set(seq.steps.flatMap((s) => s.members));
  const present = new Set(design.members.filter((m) => !stepped.has(m.id)).map((m) => m.id));
  const lengths = new Map(L0);
  const sectionOf = (id: string) => design.sections.find((s) => s.id === design.members.find((m) => m.id === id)!.section)!;
  const passOneLength = (id: string) => {
    const s = sectionOf(id);
    const td = options.designTension?.get(id) ?? 0;
    return L0.get(id)! * (1 + ((1 - share) * Math.max(td, 0)) / (s.E * s.area));
  };
  if (passes === 2) for (const id of stepped) lengths.set(id, passOneLength(id));
  const active = seq.restraints.map((r) => ({ ...r, on: true }));
  const stages: SequenceStage[] = [];
  const issues: SequenceIssue[] = [];
  let previous: StageSolution | null = null;
  const spec = (): StageSpec => ({ present, lengths, restraints: active.filter((r) => r.on), deltaT, selfWeight: seq.selfWeight });
  const totalSteps = order.length * passes;
  let run = 0;

  const record = (kind: 'step' | 'release', step: number, pass: number, members: string[], released: string[], sol: StageSolution, settings: MemberSetting[]) => {
    const index = stages.length + 1;
    const ev = evaluateStage(design, sol.result, index, seq.resistanceFactor, seq.plumb);
    stages.push({ index, kind, step, pass, members, released, converged: sol.result.converged, status: sol.result.status, settings, state: ev.state, tilt: ev.tilt, issues: ev.issues });
    issues.push(...ev.issues);
    return ev.issues.length > 0;
  };

  for (let pass = 1; pass <= passes; pass++) {
    for (const stepIndex of order) {
      run++;
      const step = seq.steps[stepIndex];
      for (const id of step.members) {
        present.add(id);
        lengths.set(id, pass === passes ? L0.get(id)! : passOneLength(id));
      }
      const sol = solveStage(design, spec(), previous?.positions);
      const settings = options.settings === false || !sol.result.converged ? [] : stepSettings(design, seq, spec(), sol, step.members, step.setBy, pass, deltaT);
      const bad = record('step', stepIndex, pass, [...step.members], [], sol, settings);
      if (sol.result.converged) previous = sol;
      if (bad && options.stopAtIssue) return { stages, issues, final: null };
      const releasing = active.filter((r) => r.on && r.releaseAfterStep !== null && r.releaseAfterStep === run && run < totalSteps);
      if (releasing.length) {
        for (const r of releasing) r.on = false;
        const rel = solveStage(design, spec(), previous?.positions);
        const badRelease = record('release', stepIndex, pass, [], releasing.map((r) => r.node), rel, []);
        if (rel.result.converged) previous = rel;
        if (badRelease && options.stopAtIssue) return { stages, issues, final: null };
      }
    }
  }
  const remaining = active.filter((r) => r.on);
  if (remaining.length) {
    for (const r of remaining) r.on = false;
    const rel = solveStage(design, spec(), previous?.positions);
    record('release', order[order.length - 1], passes, [], remaining.map((r) => r.node), rel, []);
    previous = rel.result.converged ? rel : null;
  }
  const last = stages[stages.length - 1];
  return { stages, issues, final: last.converged ? previous : null };
}

function stepSettings(
  design: ProjectFile, seq: ResolvedSequence, stage: StageSpec, sol: StageSolution, members: string[], setBy: 'force' | 'length', pass: number, deltaT: number,
): MemberSetting[] {
  const tension = (s: StageSolution, id: string) => lowerEnd(design, s.result.members.find((m) => m.id === id)!);
  const warmer = solveStage(design, { ...stage, deltaT: deltaT + 1 }, sol.positions);
  return members.map((id) => {
    const L = stage.lengths.get(id)!;
    const h = 1e-5 * L;
    const shorter = new Map(stage.lengths);
    shorter.set(id, L - h);
    const fd = solveStage(design, { ...stage, lengths: shorter }, sol.positions);
    const t0 = tension(sol, id);
    const stiffness = fd.result.converged ? (tension(fd, id) - t0) / h : NaN;
    const m = design.members.find((x) => x.id === id)!;
    const alpha = design.sections.find((s) => s.id === m.section)!.thermalExpansion ?? 0;
    if (setBy === 'force') {
      const d = seq.forceTolerance * Math.abs(t0);
      return {
        member: id, setBy, value: t0, band: [t0 - d, t0 + d], equivalentBand: [-d / stiffness, d / stiffness],
        perKelvin: warmer.result.converged ? tension(warmer, id) - t0 : NaN, stiffness, unstressedLength: L, pass,
      };
    }
    const mark = stressFreeLengthAt(L, alpha, deltaT);
    const d = seq.lengthTolerance;
    return {
      member: id, setBy, value: mark, band: [mark - d, mark + d], equivalentBand: [-d * stiffness, d * stiffness],
      perKelvin: stressFreeLengthPerKelvin(L, alpha, deltaT), stiffness, unstressedLength: L, pass,
    };
  });
}
