/**
 * Site checks of one member against the installation table: the target tension at the air
 * temperature of the reading (linear interpolation between the table's temperatures, which come
 * from full nonlinear solves), then the tension implied by a measured frequency or sag
 * (site-check.ts) and its difference from that target.
 *
 * The table gives the tension at the lower end; the inverses give the tension along the chord at
 * mid-length. Along a cable the tension rises with height by the weight per length times the
 * rise (Irvine, Cable Structures 1981, ch. 1: T = H secφ with dT/dz = m g), so the mid-length
 * tension is the lower-end one plus m g h / 2; the implied tension is reported at the lower end.
 *
 * Geometry, mass and EA are those of the reference state (InstallationData.members); the chord
 * changes with temperature only by the strain of the supports' movement, which these checks
 * ignore. Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { InstallationData, MemberInstallation } from './installation-data.ts';
import { STANDARD_GRAVITY, type CableMode } from './cable-frequency.ts';
import { tensionFromFrequency, tensionFromSag, type SiteCheckResult } from './site-check.ts';
import { OutcomeError } from '../results/outcome-error.ts';

export interface MemberSiteCheck extends SiteCheckResult {
  member: string;
  /** Air temperature of the reading, K. */
  temperature: number;
  /** Design tension at that temperature from the installation table, N. */
  targetTension: number;
}

function memberOf(data: InstallationData, id: string): { m: MemberInstallation; column: number } {
  const column = data.members.findIndex((x) => x.id === id);
  if (column < 0) throw new Error(`site check: member "${id}" does not exist`);
  const m = data.members[column];
  if (m.kind !== 'cable') throw new Error(`site check: member "${id}" is a bar, not a cable`);
  return { m, column };
}

/**
 * Target tension (N) of a member at temperature T (K): linear interpolation in the table.
 * Throws naming the range when T is outside it or the bracketing rows did not converge: an
 * OutcomeError `temperatureOutsideTable` (quantities temperature, low, high, K; refs member) or
 * `tableRowNotConverged` (quantities temperature, K), worded at the edge in the display units.
 */
export function targetTensionAt(data: InstallationData, memberId: string, temperature: number): number {
  const { column } = memberOf(data, memberId);
  const rows = [...data.table].sort((a, b) => a.temperature - b.temperature);
  const c = (k: number) => (k - 273.15).toFixed(1);
  if (rows.length === 0) throw new Error('site check: the installation table is empty');
  const lo = rows[0].temperature, hi = rows[rows.length - 1].temperature;
  if (!(temperature >= lo - 1e-9 && temperature <= hi + 1e-9)) {
    const K = (value: number) => ({ value, kind: 'temperature' as const });
    throw new OutcomeError(
      { code: 'temperatureOutsideTable', quantities: { temperature: K(temperature), low: K(lo), high: K(hi) }, refs: { member: memberId } },
      `site check: ${c(temperature)} °C is outside the installation table (${c(lo)} … ${c(hi)} °C)`,
    );
  }
  let i = 0;
  while (i < rows.length - 2 && rows[i + 1].temperature < temperature) i++;
  const a = rows[i], b = rows[Math.min(i + 1, rows.length - 1)];
  for (const r of [a, b]) {
    if (!r.converged) {
      throw new OutcomeError({ code: 'tableRowNotConverged', quantities: { temperature: { value: r.temperature, kind: 'temperature' } }, refs: { member: memberId } }, `site check: the table row at ${c(r.temperature)} °C did not converge`);
    }
  }
  if (b.temperature === a.temperature) return a.tensions[column];
  const t = (temperature - a.temperature) / (b.temperature - a.temperature);
  return a.tensions[column] + t * (b.tensions[column] - a.tensions[column]);
}

/** Shift a mid-length result to the lower end (see the file comment). */
function atLowerEnd(r: SiteCheckResult, m: MemberInstallation, target: number): SiteCheckResult {
  const half = (m.massPerLength * STANDARD_GRAVITY * m.heightDifference) / 2;
  const tension = r.tension - half;
  return { tension, difference: tension - target, relativeDifference: (tension - target) / target, candidates: r.candidates.map((c) => c - half) };
}

const midTarget = (m: MemberInstallation, lowerTarget: number) => lowerTarget + (m.massPerLength * STANDARD_GRAVITY * m.heightDifference) / 2;

/** Tension from a measured frequency (Hz) at air temperature T (K), against the table target. */
export function checkMemberFrequency(
  data: InstallationData, memberId: string, temperature: number, measuredFrequency: number, mode: CableMode = 'tautString',
): MemberSiteCheck {
  const { m } = memberOf(data, memberId);
  const targetTension = targetTensionAt(data, memberId, temperature);
  const r = tensionFromFrequency({
    length: m.chordLength, inclination: m.inclination, massPerLength: m.massPerLength, axialStiffness: m.axialStiffness,
    measuredFrequency, mode, targetTension: midTarget(m, targetTension),
  });
  return { ...atLowerEnd(r, m, targetTension), member: memberId, temperature, targetTension };
}

/** Tension from a measured largest vertical sag (m) at air temperature T (K), against the table target. */
export function checkMemberSag(data: InstallationData, memberId: string, temperature: number, measuredSag: number): MemberSiteCheck {
  const { m } = memberOf(data, memberId);
  const targetTension = targetTensionAt(data, memberId, temperature);
  const r = tensionFromSag({
    horizontalSpan: m.horizontalSpan, heightDifference: m.heightDifference, massPerLength: m.massPerLength, measuredSag,
    targetTension: midTarget(m, targetTension),
  });
  return { ...atLowerEnd(r, m, targetTension), member: memberId, temperature, targetTension };
}

/**
 * Taut-string frequency f1 = (1/2L)·√(T/m) (Irvine 1981, ch. 4) a member should show when its
 * lower-end tension is `lowerEndTension` (N): T is the mid-length tension, lower + m g h / 2.
 * Null for a member without mass or tension. The first out-of-plane mode; see cable-frequency.ts.
 */
export function expectedStringFrequency(m: MemberInstallation, lowerEndTension: number): number | null {
  const t = lowerEndTension + (m.massPerLength * STANDARD_GRAVITY * m.heightDifference) / 2;
  if (!(m.massPerLength > 0) || !(t > 0) || !Number.isFinite(t)) return null;
  return Math.sqrt(t / m.massPerLength) / (2 * m.chordLength);
}
