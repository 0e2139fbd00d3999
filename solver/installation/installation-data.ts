/**
 * Installation data of a project: cut lengths, the tension to set at each installation
 * temperature, and cable frequencies for site checks.
 *
 * Temperature table (full nonlinear solves, no approximation): the design state is the reference
 * case (solver/tuning/reference-case.ts, normally dead load) at the reference temperature
 * T_ref = meta.referenceTemperature. Installing at T with the same unstressed lengths means the
 * reference case solved at ΔT = T − T_ref (added to the case's own ΔT) — one solve per
 * temperature on one workspace, each warm-started from the previous temperature's solution.
 * The tension reported per member is the one at its lower end (where guys are usually tensioned,
 * at the anchor; common practice).
 *
 * Frequencies (cable-frequency.ts, Irvine 1981) use the reference state: deformed chord length and
 * inclination, mean of the end tensions, mass per length and EA of the section.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { MemberKind, ProjectFile } from '../project/types.ts';
import type { CaseResult, MemberResult } from '../results/types.ts';
import type { OutcomeMessage } from '../results/message-types.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveCaseLoads } from '../loads/resolve-case-loads.ts';
import { createWorkspace } from '../analysis/workspace.ts';
import { solveCase } from '../analysis/solve-case.ts';
import { referenceCaseId } from '../tuning/reference-case.ts';
import { memberCutLengths } from './cut-length.ts';
import { cableFrequencies, type CableFrequencies } from './cable-frequency.ts';

/** 15 °C, used when meta.referenceTemperature is missing (common practice; say so in output). */
export const DEFAULT_REFERENCE_TEMPERATURE = 288.15;

/** −20 °C … +40 °C in 5 °C steps, K. */
export function defaultInstallationTemperatures(): number[] {
  return Array.from({ length: 13 }, (_, i) => 253.15 + 5 * i);
}

export interface MemberInstallation {
  id: string;
  kind: MemberKind;
  section: string;
  /** Unstressed (cut) length at T_ref, m. */
  cutLength: number;
  /** Tension at the lower end in the reference state, N. */
  installationTension: number;
  /** Sag in the reference state, m. */
  sag: number;
  /** Frequencies in the reference state (cables with mass and positive tension only), else null. */
  frequencies: CableFrequencies | null;
  /** Reference-state geometry and section data for site checks (site-check-member.ts). */
  chordLength: number;
  /** Chord inclination to the horizontal, radians (≥ 0). */
  inclination: number;
  /** Horizontal distance between the end points, m. */
  horizontalSpan: number;
  /** Height of the upper end above the lower end, m (≥ 0). */
  heightDifference: number;
  /** kg/m. */
  massPerLength: number;
  /** E·A, N. */
  axialStiffness: number;
}

/**
 * A note on the installation data (words at the edge: main/common/report/installation-text.ts).
 * - referenceTemperatureAssumed: meta.referenceTemperature is not set; quantities.temperature (K) used
 * - rowNotConverged: the table row at quantities.temperature (K) did not converge; refs.status
 */
export type InstallationNote = OutcomeMessage<'referenceTemperatureAssumed' | 'rowNotConverged'>;

export interface TemperatureRow {
  /** Installation temperature, K. */
  temperature: number;
  /** T − T_ref, K. */
  deltaT: number;
  converged: boolean;
  message?: string;
  /** Tension at the lower end per member (model.members order), N; NaN when not converged. */
  tensions: number[];
}

export interface InstallationData {
  referenceCase: string;
  referenceTemperature: number;
  /** True when meta.referenceTemperature was missing and the default was used. */
  referenceTemperatureAssumed: boolean;
  members: MemberInstallation[];
  /** Member ids in table column order (same as members). */
  memberIds: string[];
  table: TemperatureRow[];
  warnings: InstallationNote[];
}

/** Tension at the lower end of a member: tensionStart when `from` is lower, else tensionEnd. */
export function lowerEndTension(m: MemberResult, fromZ: number, toZ: number): number {
  return fromZ <= toZ ? m.tensionStart : m.tensionEnd;
}

export function installationData(project: ProjectFile, options: { temperatures?: number[] } = {}): InstallationData {
  const model = buildModel(project);
  const ws = createWorkspace(model);
  const refId = referenceCaseId(project);
  const spec = project.loadCases.find((c) => c.id === refId)!;
  const tRefGiven = project.meta?.referenceTemperature;
  const tRef = tRefGiven ?? DEFAULT_REFERENCE_TEMPERATURE;
  const warnings: InstallationNote[] = [];
  if (tRefGiven === undefined) warnings.push({ code: 'referenceTemperatureAssumed', quantities: { temperature: { value: tRef, kind: 'temperature' } }, refs: {} });
  const temps = options.temperatures ?? project.installation?.temperatures ?? defaultInstallationTemperatures();
  temps.forEach((t, i) => {
    if (!(t > 0) || !Number.isFinite(t)) throw new Error(`installation.temperatures[${i}]: ${t} is not an absolute temperature in K`);
  });

  const baseLoads = resolveCaseLoads(model, project, spec);
  const ref = solveCase(ws, refId, baseLoads);
  if (!ref.result.converged) throw new Error(`reference case '${refId}' did not converge: ${ref.result.message ?? ref.result.status}`);
  const z = (nodeIndex: number) => model.coords[3 * nodeIndex + 2];
  const lowerTensions = (r: CaseResult) => model.members.map((m, k) => {
    const chain = m.nodeChain;
    return lowerEndTension(r.members[k], z(chain[0]), z(chain[chain.length - 1]));
  });

  const cut = memberCutLengths(model);
  const refTensions = lowerTensions(ref.result);
  const members: MemberInstallation[] = model.members.map((m, k) => {
    const spec = project.members[m.index];
    const section = project.sections[m.sectionIndex];
    const r = ref.result.members[k];
    const x = ref.fields.positions;
    const a = 3 * m.nodeChain[0], b = 3 * m.nodeChain[m.nodeChain.length - 1];
    const dz = x[b + 2] - x[a + 2];
    const horizontal = Math.hypot(x[b] - x[a], x[b + 1] - x[a + 1]);
    const meanTension = 0.5 * (r.tensionStart + r.tensionEnd);
    const mass = section.massPerLength ?? 0;
    const frequencies = m.kind === 'cable' && mass > 0 && meanTension > 0
      ? cableFrequencies({ length: r.chordLength, inclination: Math.atan2(Math.abs(dz), horizontal), tension: meanTension, massPerLength: mass, axialStiffness: section.E * section.area })
      : null;
    return {
      id: spec.id, kind: m.kind, section: section.id, cutLength: cut[k], installationTension: refTensions[k], sag: r.sag, frequencies,
      chordLength: r.chordLength, inclination: Math.atan2(Math.abs(dz), horizontal), horizontalSpan: horizontal,
      heightDifference: Math.abs(dz), massPerLength: mass, axialStiffness: section.E * section.area,
    };
  });

  let start: Float64Array | undefined = ref.fields.positions;
  const table: TemperatureRow[] = temps.map((temperature) => {
    const deltaT = temperature - tRef;
    const loads = { ...baseLoads, temperatureChange: baseLoads.temperatureChange + deltaT };
    const s = solveCase(ws, `${refId} at ${(temperature - 273.15).toFixed(1)} °C`, loads, { start });
    if (!s.result.converged) {
      warnings.push({ code: 'rowNotConverged', quantities: { temperature: { value: temperature, kind: 'temperature' } }, refs: { status: s.result.status } });
      return { temperature, deltaT, converged: false, message: s.result.message, tensions: model.members.map(() => NaN) };
    }
    start = s.fields.positions;
    return { temperature, deltaT, converged: true, tensions: lowerTensions(s.result) };
  });
  return {
    referenceCase: refId, referenceTemperature: tRef, referenceTemperatureAssumed: tRefGiven === undefined,
    members, memberIds: members.map((m) => m.id), table, warnings,
  };
}
