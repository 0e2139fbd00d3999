/**
 * Plausibility warnings for a valid project: entries that are well-formed but outside the ranges
 * of real steel strand, rod and rope or of physical site conditions (ranges.ts), and sags that
 * suggest a unit slip. Warnings are distinct from errors: the project stays valid and runs.
 * Each message names the entry like the validation errors do, e.g.
 *   sections[1] "GUY": E = 160,000 Pa is far below any structural material (typed in MPa? 160,000 MPa = 1.6e11 Pa)
 */
import type { MemberSpec, ProjectFile, SectionSpec, SolveReport } from '../../../../solver/index.ts';
import { STANDARD_GRAVITY } from '../../../../solver/index.ts';
import {
  ANY_MODULUS_MIN, CABLE_DENSITY, CABLE_MODULUS, CABLE_STRENGTH, ICE_DENSITY, MAX_ICE_THICKNESS,
  MAX_PRETENSION_STRAIN, MAX_SAG_RATIO, MAX_TEMPERATURE_CHANGE,
} from './ranges.ts';

const num = (v: number, digits = 3): string => (Math.abs(v) >= 1e6 || (Math.abs(v) < 1e-3 && v !== 0) ? v.toExponential(2) : Number(v.toPrecision(digits)).toLocaleString('en-US'));
const gpa = (pa: number): string => `${num(pa / 1e9)} GPa`;
const mpa = (pa: number): string => `${num(pa / 1e6)} MPa`;

function sectionWarnings(s: SectionSpec, i: number, usedByCable: boolean): string[] {
  const at = `sections[${i}] "${s.id}"`;
  const out: string[] = [];
  if (s.E < ANY_MODULUS_MIN) {
    out.push(`${at}: E = ${num(s.E)} Pa is far below any structural material (typed in MPa or kN/mm²? ${num(s.E)} MPa = ${num(s.E * 1e6)} Pa)`);
  } else if (usedByCable && (s.E < CABLE_MODULUS.min || s.E > CABLE_MODULUS.max)) {
    out.push(`${at}: E = ${gpa(s.E)} is outside ${gpa(CABLE_MODULUS.min)}–${gpa(CABLE_MODULUS.max)}, the range of steel strand, rope and rods (EN 1993-1-11, recalled)`);
  }
  if (usedByCable && s.massPerLength !== undefined && s.massPerLength > 0 && s.area > 0) {
    const rho = s.massPerLength / s.area;
    if (rho < CABLE_DENSITY.min || rho > CABLE_DENSITY.max) {
      out.push(`${at}: mass per length ${num(s.massPerLength)} kg/m over area ${num(s.area)} m² is ${num(rho)} kg/m³, outside ${num(CABLE_DENSITY.min)}–${num(CABLE_DENSITY.max)} kg/m³ for steel strand and rope (steel 7,850 kg/m³; mass in g/m, N/m, or area in mm²?)`);
    }
  }
  if (usedByCable && s.breakingLoad !== undefined && s.area > 0) {
    const f = s.breakingLoad / s.area;
    if (f < CABLE_STRENGTH.min || f > CABLE_STRENGTH.max) {
      out.push(`${at}: breaking load ${num(s.breakingLoad)} N over area ${num(s.area)} m² is ${mpa(f)}, outside ${mpa(CABLE_STRENGTH.min)}–${mpa(CABLE_STRENGTH.max)} for steel rods and strand (recalled; breaking load in kN, or area in mm²?)`);
    }
  }
  return out;
}

function chordOf(m: MemberSpec, at: Map<string, [number, number, number]>): number {
  const a = at.get(m.from), b = at.get(m.to);
  return a && b ? Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]) : 0;
}

function memberWarnings(m: MemberSpec, i: number, s: SectionSpec | undefined, chord: number): string[] {
  const at = `members[${i}] "${m.id}"`;
  const out: string[] = [];
  const P = m.pretension;
  if (P === undefined || !s) return out;
  if (m.kind === 'cable' && P < 0) out.push(`${at}: pretension ${num(P)} N is negative; a cable carries no compression, so it starts slack`);
  if (s.breakingLoad !== undefined && P > s.breakingLoad) out.push(`${at}: pretension ${num(P)} N exceeds the breaking load ${num(s.breakingLoad)} N of section "${s.id}"`);
  const strain = P / (s.E * s.area);
  if (strain > MAX_PRETENSION_STRAIN) {
    out.push(`${at}: pretension ${num(P)} N strains section "${s.id}" by ${num(100 * strain)} % (steel stays elastic below about 0.7 %): E or area in the wrong units?`);
  }
  const w = (s.massPerLength ?? 0) * STANDARD_GRAVITY;
  if (m.kind === 'cable' && P > 0 && w > 0 && chord > 0) {
    // Parabolic sag of a cable under its own weight, w L² / (8 H) with H ≈ P (Irvine 1981, shallow cable).
    const sag = (w * chord * chord) / (8 * P);
    if (sag > MAX_SAG_RATIO * chord) {
      out.push(`${at}: pretension ${num(P)} N gives a self-weight sag of about ${num(sag)} m on a ${num(chord)} m span (${num(100 * sag / chord)} %): pretension in kN, or mass per length too large?`);
    }
  }
  return out;
}

function caseWarnings(p: ProjectFile): string[] {
  const out: string[] = [];
  p.loadCases.forEach((c, i) => {
    const at = `loadCases[${i}] "${c.id}"`;
    const dT = c.temperatureChange;
    if (dT !== undefined && Math.abs(dT) > MAX_TEMPERATURE_CHANGE) out.push(`${at}: temperature change ${num(dT)} K is beyond ±${MAX_TEMPERATURE_CHANGE} K, outside any outdoor site (common practice)`);
    const t = c.ice?.thickness;
    if (t !== undefined && t > MAX_ICE_THICKNESS) out.push(`${at}: radial ice ${num(t)} m is beyond ${MAX_ICE_THICKNESS} m, above the ice classes of ISO 12494 (recalled): thickness in mm?`);
    const rho = c.ice?.density;
    if (rho !== undefined && (rho < ICE_DENSITY.min || rho > ICE_DENSITY.max)) out.push(`${at}: ice density ${num(rho)} kg/m³ is outside ${ICE_DENSITY.min}–${ICE_DENSITY.max} kg/m³ (rime to glaze, ISO 12494, recalled)`);
  });
  return out;
}

/** Warnings for a project that passed validation (before a run). */
export function plausibilityWarnings(p: ProjectFile): string[] {
  const cableSections = new Set(p.members.filter((m) => m.kind === 'cable').map((m) => m.section));
  const sections = new Map(p.sections.map((s) => [s.id, s] as const));
  const nodes = new Map(p.nodes.map((n) => [n.id, n.at] as const));
  return [
    ...p.sections.flatMap((s, i) => sectionWarnings(s, i, cableSections.has(s.id))),
    ...p.members.flatMap((m, i) => memberWarnings(m, i, sections.get(m.section), chordOf(m, nodes))),
    ...caseWarnings(p),
  ];
}

/** Warnings from results: cables that sag more than a quarter of their span in some case (the worst case per member). */
export function resultWarnings(p: ProjectFile, report: SolveReport): string[] {
  const nodes = new Map(p.nodes.map((n) => [n.id, n.at] as const));
  const index = new Map(p.members.map((m, i) => [m.id, i] as const));
  const worst = new Map<string, { ratio: number; sag: number; caseId: string }>();
  for (const c of report.cases) {
    for (const r of c.members ?? []) {
      const i = index.get(r.id);
      if (i === undefined || p.members[i].kind !== 'cable') continue;
      const chord = chordOf(p.members[i], nodes);
      if (!(chord > 0) || !Number.isFinite(r.sag)) continue;
      const ratio = r.sag / chord;
      if (ratio > MAX_SAG_RATIO && ratio > (worst.get(r.id)?.ratio ?? 0)) worst.set(r.id, { ratio, sag: r.sag, caseId: c.id });
    }
  }
  return [...worst].map(([id, w]) => `members[${index.get(id)}] "${id}": sags ${num(w.sag)} m in case "${w.caseId}", ${num(100 * w.ratio)} % of its span: a modulus, area or pretension in the wrong units?`);
}
