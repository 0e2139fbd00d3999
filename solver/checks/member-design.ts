/**
 * Design resistances of every member under the design basis — the one definition of utilisation
 * used by the checks, the tables, the 3D colours, the inspector, the schedule and the CLI:
 *   utilisation = design axial force / design resistance,
 * cables: F_Rd = k_e · MBL / d with d = breakingFactor · γ_R (limit state, EN 1993-1-11 §6.2 form,
 * recalled) or the safety factor (allowable); bars: tension N_t,Rd = A f_y / γ_M0 (or / Ω),
 * compression N_b,Rd = χ A f_y / γ_M1 (or / Ω) with χ from buckling.ts. Forces N, lengths m.
 */
import type { MemberSpec, ProjectFile, SectionSpec } from '../project/types.ts';
import type { ResolvedBasis } from './design-basis.ts';
import { cableResistanceDivisor, resolveDesignBasis } from './design-basis.ts';
import {
  CURVE_OF_SHAPE, DEFAULT_TERMINATION_EFFICIENCY, IMPERFECTION_FACTOR, SLENDERNESS_LIMIT, TERMINATION_EFFICIENCY,
} from './basis-defaults.ts';
import type { Sourced } from './basis-defaults.ts';
import { bucklingReduction, relativeSlenderness } from './buckling.ts';
import { membersOfGroup } from './groups.ts';

export interface CableDesign {
  kind: 'cable';
  id: string;
  breakingLoad: number | null;
  efficiency: Sourced;
  /** Design resistance, N (null without a breaking load). */
  resistance: number | null;
}

export interface BarDesign {
  kind: 'bar';
  id: string;
  /** True for beam-columns (kind "beam"): also checked for axial force and bending. */
  beam: boolean;
  /** Beams: M_Rd = W_el,min f_y / γ_M0 (or / Ω), N·m, W = min(Iy, Iz) / (diameter / 2); null without them. */
  momentResistance: number | null;
  yieldStrength: number | null;
  area: number;
  /** N_t,Rd, N (null without f_y). */
  tensionResistance: number | null;
  /** N_b,Rd, N (null without f_y or radius of gyration). */
  compressionResistance: number | null;
  systemLength: number;
  bucklingLength: number;
  radiusOfGyration: number | null;
  /** L_cr / i (null without i). */
  slenderness: number | null;
  slendernessLimit: Sourced | null;
  lambdaBar: number | null;
  chi: number | null;
  curve: string;
  curveSource: string;
}

export type MemberDesign = CableDesign | BarDesign;

/** k_e of a member: member value, section value, section termination kind, else 1.0 (flagged). */
export function terminationEfficiency(member: MemberSpec, section: SectionSpec | undefined): Sourced {
  if (member.terminationEfficiency !== undefined) return { value: member.terminationEfficiency, source: 'project file (member)' };
  if (section?.terminationEfficiency !== undefined) return { value: section.terminationEfficiency, source: 'project file (section)' };
  if (section?.termination) return TERMINATION_EFFICIENCY[section.termination];
  return DEFAULT_TERMINATION_EFFICIENCY;
}

function radiusOfGyration(s: SectionSpec): number | null {
  if (s.radiusOfGyration !== undefined) return s.radiusOfGyration;
  if (s.Iy !== undefined && s.Iz !== undefined && s.area > 0) return Math.sqrt(Math.min(s.Iy, s.Iz) / s.area);
  if (s.shape === 'solidRound') {
    // i = d/4 for a solid circle (I = π d⁴/64, A = π d²/4); d from the diameter or the area.
    const d = s.diameter ?? Math.sqrt((4 * s.area) / Math.PI);
    return d / 4;
  }
  return null;
}

/** Design data of every member (project.members order). */
export function memberDesigns(project: ProjectFile, basis: ResolvedBasis): MemberDesign[] {
  const sections = new Map(project.sections.map((s) => [s.id, s] as const));
  const at = new Map(project.nodes.map((n) => [n.id, n.at] as const));
  const rules = (project.checks?.memberDesign ?? []).map((r) => ({ rule: r, members: membersOfGroup(project, r.group) }));
  const divisor = cableResistanceDivisor(basis);
  const allowable = basis.format === 'allowable';
  const omega = basis.allowable.memberSafetyFactor.value;
  return project.members.map((m): MemberDesign => {
    const s = sections.get(m.section);
    if (m.kind === 'cable') {
      const efficiency = terminationEfficiency(m, s);
      const mbl = s?.breakingLoad && s.breakingLoad > 0 ? s.breakingLoad : null;
      return { kind: 'cable', id: m.id, breakingLoad: mbl, efficiency, resistance: mbl === null ? null : (efficiency.value * mbl) / divisor };
    }
    const a = at.get(m.from)!, b = at.get(m.to)!;
    const systemLength = Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
    const rule = rules.filter((r) => r.members.has(m.id)).map((r) => r.rule).at(-1);
    const bucklingLength = m.bucklingLength ?? rule?.bucklingLength ?? (rule?.bucklingLengthFactor ?? 1) * systemLength;
    const area = s?.area ?? 0;
    const fy = s?.yieldStrength ?? null;
    const E = s?.E ?? 0;
    const i = s ? radiusOfGyration(s) : null;
    const fromShape = CURVE_OF_SHAPE[s?.shape ?? 'other'];
    const curve = s?.bucklingCurve ?? fromShape.curve;
    const curveSource = s?.bucklingCurve ? 'project file (section)' : fromShape.source;
    const slenderness = i ? bucklingLength / i : null;
    const role = rule?.role;
    const slendernessLimit: Sourced | null = rule?.slendernessLimit !== undefined
      ? { value: rule.slendernessLimit, source: 'project file (checks.memberDesign)' }
      : role && role !== 'other' ? SLENDERNESS_LIMIT[role] : null;
    const lambdaBar = i && fy ? relativeSlenderness(bucklingLength, i, E, fy) : null;
    const chi = lambdaBar === null ? null : bucklingReduction(lambdaBar, IMPERFECTION_FACTOR[curve]);
    const g0 = allowable ? omega : basis.steel.gammaM0.value;
    const g1 = allowable ? omega : basis.steel.gammaM1.value;
    const W = s?.Iy !== undefined && s.Iz !== undefined && s.diameter ? Math.min(s.Iy, s.Iz) / (s.diameter / 2) : null;
    return {
      kind: 'bar', id: m.id, beam: m.kind === 'beam', momentResistance: m.kind === 'beam' && W && fy ? (W * fy) / g0 : null, yieldStrength: fy, area,
      tensionResistance: fy ? (area * fy) / g0 : null,
      compressionResistance: fy && chi !== null ? (chi * area * fy) / g1 : null,
      systemLength, bucklingLength, radiusOfGyration: i, slenderness, slendernessLimit, lambdaBar, chi, curve, curveSource,
    };
  });
}

/**
 * Utilisation of a member at axial forces N_max / N_min (N, tension positive): cables N_max / F_Rd;
 * bars the larger of N_max / N_t,Rd (tension) and −N_min / N_b,Rd (compression). null when the
 * member has no resistance data.
 */
export function memberUtilisation(d: MemberDesign, tensionMax: number, tensionMin: number): number | null {
  if (d.kind === 'cable') return d.resistance ? Math.max(0, tensionMax) / d.resistance : null;
  let u: number | null = null;
  if (d.tensionResistance) u = Math.max(0, tensionMax) / d.tensionResistance;
  if (d.compressionResistance && tensionMin < 0) u = Math.max(u ?? 0, -tensionMin / d.compressionResistance);
  return u;
}

const designCache = new WeakMap<ProjectFile, Map<string, MemberDesign>>();

/** memberDesigns under the project's own basis, by member id (cached per project object). */
export function designsByMember(project: ProjectFile): Map<string, MemberDesign> {
  let hit = designCache.get(project);
  if (!hit) {
    hit = new Map(memberDesigns(project, resolveDesignBasis(project)).map((d) => [d.id, d] as const));
    designCache.set(project, hit);
  }
  return hit;
}
