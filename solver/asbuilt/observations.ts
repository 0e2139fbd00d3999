/**
 * Site readings → lower-end tensions with standard uncertainties, using the site-check inversions
 * (solver/installation/site-check.ts) on the design-state geometry of each cable:
 * - dynamometer: T = reading at the lower end, σ_T = accuracy · T;
 * - frequency: tension from the Irvine (1981) frequency of the measured mode, at mid-length, then
 *   moved to the lower end (− m g h / 2, as site-check-member.ts); T ∝ f² for the string modes,
 *   so σ_T = 2 · accuracy · T_mid;
 * - sag: tension from the inextensible catenary through the measured sag, at mid-length, then to
 *   the lower end; T ∝ 1/sag, so σ_T = accuracy · T_mid.
 * The chord geometry is that of the design state at the reference temperature (the change with the
 * as-built lengths and the day's temperature is neglected, as in the schedule's site checks).
 */
import type { SiteMeasurementSetSpec } from '../project/site-types.ts';
import type { MemberInstallation } from '../installation/installation-data.ts';
import { tensionFromFrequency, tensionFromSag } from '../installation/site-check.ts';
import { STANDARD_GRAVITY } from '../model/constants.ts';
import { OutcomeError, withRefs } from '../results/outcome-error.ts';

export interface ObservedTension {
  index: number;
  member: string;
  method: 'dynamometer' | 'frequency' | 'sag';
  reading: number;
  temperature: number;
  tension: number;
  sigma: number;
}

/** Run an inversion for reading `at`; a problem it throws names the reading (refs entry, member). */
function naming(at: string, member: string, invert: () => number): number {
  try {
    return invert();
  } catch (e) {
    if (e instanceof OutcomeError) throw withRefs(e, { entry: at, member }, `${at}: `);
    throw new Error(`${at}: ${(e as Error).message}`, { cause: e });
  }
}

export function observedTensions(
  set: SiteMeasurementSetSpec, where: string, geometry: ReadonlyMap<string, MemberInstallation>, designTension: ReadonlyMap<string, number>,
): ObservedTension[] {
  return set.tensions.map((t, i) => {
    const at = `${where}.tensions[${i}]`;
    const g = geometry.get(t.member);
    if (!g) throw new Error(`${at}: member "${t.member}" does not exist or has no length to fit`);
    if (g.kind !== 'cable') throw new Error(`${at}: member "${t.member}" is a bar, not a cable`);
    if (!(t.value > 0) || !(t.accuracy > 0) || !(t.temperature > 0)) throw new Error(`${at}: value, accuracy and temperature must be positive`);
    const half = (g.massPerLength * STANDARD_GRAVITY * g.heightDifference) / 2;
    const target = Math.max(designTension.get(t.member) ?? 0, 1) + half;
    let mid: number;
    let relative: number;
    if (t.method === 'dynamometer') return { index: i, member: t.member, method: t.method, reading: t.value, temperature: t.temperature, tension: t.value, sigma: t.accuracy * t.value };
    if (t.method === 'frequency') {
      if (!(g.massPerLength > 0)) throw new Error(`${at}: member "${t.member}" has no mass per length, a frequency cannot give its tension`);
      mid = naming(at, t.member, () => tensionFromFrequency({
        length: g.chordLength, inclination: g.inclination, massPerLength: g.massPerLength, axialStiffness: g.axialStiffness,
        measuredFrequency: t.value, mode: t.mode ?? 'tautString', targetTension: target,
      }).tension);
      relative = 2 * t.accuracy;
    } else if (t.method === 'sag') {
      if (!(g.massPerLength > 0)) throw new Error(`${at}: member "${t.member}" has no mass per length, a sag cannot give its tension`);
      mid = naming(at, t.member, () => tensionFromSag({ horizontalSpan: g.horizontalSpan, heightDifference: g.heightDifference, massPerLength: g.massPerLength, measuredSag: t.value, targetTension: target }).tension);
      relative = t.accuracy;
    } else {
      throw new Error(`${at}: method must be dynamometer, frequency or sag`);
    }
    return { index: i, member: t.member, method: t.method, reading: t.value, temperature: t.temperature, tension: mid - half, sigma: relative * mid };
  });
}
