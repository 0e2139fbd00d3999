/**
 * Field descriptors of the design-data editors: the check rules that have no table of their own
 * (checks.minimumTension, checks.memberDesign, checks.twistLimits), the design data of sections
 * (solver/project/types.ts SectionSpec), prescribed support displacements of a load case and the
 * moment of a nodal load. SI in the file (Pa, m, m⁴, N·m, rad); display units through
 * renderer/units. Read and written by model/field-spec.ts, drawn by components/actions/EntryList.vue.
 */
import type { ProjectFile } from '../../solver/index.ts';
import { formatWithUnit, type QuantityKind } from '../../main/common/units/index.ts';
import { freshId } from './project-edits.ts';
import { refChoices, type Entry, type FieldContext, type FieldSpec } from './field-spec.ts';

const positive = { test: (v: number) => v > 0, words: 'must be > 0' };
const share = { test: (v: number) => v >= 0 && v <= 1, words: 'must be a share from 0 to 1' };
const DEFAULT = { value: '', label: '— (default)' };
const opts = (values: readonly string[]) => [DEFAULT, ...values.map((v) => ({ value: v, label: v }))];

export const MINIMUM_TENSION_FIELDS: FieldSpec[] = [
  { path: 'group', label: 'group', type: 'ref', ref: 'group', required: true },
  { path: 'shareOfInstallation', label: 'share of T_install', type: 'number', rule: share, placeholder: 'not checked', title: 'Minimum tension as a share of the member’s installation tension (0.1 = 10 %)' },
  { path: 'shareOfBreaking', label: 'share of MBL', type: 'number', rule: share, placeholder: 'not checked', title: 'Minimum tension as a share of the section’s minimum breaking load (0.02 = 2 %)' },
];

export const MEMBER_DESIGN_FIELDS: FieldSpec[] = [
  { path: 'group', label: 'group', type: 'ref', ref: 'group', required: true },
  { path: 'role', label: 'role', type: 'select', options: opts(['leg', 'bracing', 'redundant', 'other']), title: 'Sets the default slenderness limit' },
  { path: 'bucklingLengthFactor', label: 'buckling length factor', type: 'number', rule: positive, placeholder: '1 × system length', title: 'Buckling length as a factor on the member’s length between its end nodes' },
  { path: 'bucklingLength', label: 'buckling length', type: 'number', kind: 'length', rule: positive, placeholder: 'from the factor', title: 'Absolute buckling length; wins over the factor' },
  { path: 'slendernessLimit', label: 'slenderness limit', type: 'number', rule: positive, placeholder: 'from the role', title: 'Largest slenderness L_cr / i allowed' },
];

export const TWIST_LIMIT_FIELDS: FieldSpec[] = [
  { path: 'nodes', label: 'nodes', type: 'list', required: true, pick: 'nodes', title: 'Nodes at one level; the twist is their rotation about the vertical through their plan centroid' },
  { path: 'limit', label: 'twist limit', type: 'number', unit: '°', required: true, rule: positive },
];

const isLattice = (e: Entry) => e.lattice !== undefined;
export const SECTION_DESIGN_FIELDS: FieldSpec[] = [
  { path: 'id', label: 'id', type: 'text', required: true },
  { path: 'label', label: 'label', type: 'text' },
  { path: 'E', label: 'E', type: 'number', kind: 'modulus', required: true, rule: positive, title: 'Young’s modulus (strands: the effective modulus)' },
  { path: 'area', label: 'area', type: 'number', kind: 'area', required: true, rule: positive, title: 'Metallic cross-section area' },
  { path: 'massPerLength', label: 'mass', type: 'number', kind: 'massPerLength', rule: { test: (v) => v >= 0, words: 'must be ≥ 0' }, placeholder: '0' },
  { path: 'breakingLoad', label: 'breaking load', type: 'number', kind: 'force', rule: positive, placeholder: 'none: no cable check' },
  { path: 'diameter', label: 'diameter', type: 'number', kind: 'smallLength', rule: positive, placeholder: 'none: no wind, no ice', title: 'Outer diameter (wind and ice)' },
  { path: 'dragCoefficient', label: 'drag coefficient', type: 'number', rule: positive, placeholder: 'default of the loads', title: 'C_d on the diameter' },
  { path: 'thermalExpansion', label: 'thermal expansion α', type: 'number', kind: 'thermalExpansion', placeholder: '0' },
  { path: 'termination', label: 'termination', type: 'select', options: opts(['socketMetal', 'socketResin', 'swaged', 'wedgeSocket', 'clips', 'preformedGrip']), title: 'Cable end termination, for its efficiency k_e' },
  { path: 'terminationEfficiency', label: 'termination k_e', type: 'number', rule: { test: (v) => v > 0 && v <= 1, words: 'must be in (0, 1]' }, placeholder: 'from the termination', title: 'Overrides the termination’s efficiency' },
  { path: 'yieldStrength', label: 'yield strength f_y', type: 'number', kind: 'strength', rule: positive, placeholder: 'none: no bar check' },
  { path: 'shape', label: 'shape', type: 'select', options: opts(['solidRound', 'tubeHotFinished', 'tubeColdFormed', 'angle', 'rolledI', 'other']), title: 'For the buckling-curve and radius-of-gyration defaults' },
  { path: 'bucklingCurve', label: 'buckling curve', type: 'select', options: opts(['a0', 'a', 'b', 'c', 'd']), title: 'EN 1993-1-1 Table 6.2; default from the shape' },
  { path: 'radiusOfGyration', label: 'radius of gyration', type: 'number', kind: 'smallLength', rule: positive, placeholder: 'solid round: diameter/4', title: 'Least radius of gyration' },
  { path: 'G', label: 'shear modulus G', type: 'number', kind: 'shearModulus', rule: positive, placeholder: 'beams only' },
  { path: 'Iy', label: 'I_y', type: 'number', kind: 'secondMoment', rule: positive, placeholder: 'beams only', title: 'Second moment of area about the local y axis' },
  { path: 'Iz', label: 'I_z', type: 'number', kind: 'secondMoment', rule: positive, placeholder: 'beams only', title: 'Second moment of area about the local z axis' },
  { path: 'J', label: 'torsion constant J', type: 'number', kind: 'secondMoment', rule: positive, placeholder: 'beams only' },
  {
    path: 'lattice', label: 'lattice segment', type: 'select', options: [{ value: 'no', label: 'no' }, { value: 'yes', label: 'yes: lattice drag' }],
    title: 'The members stand for a lattice mast segment: the wind sees the lattice faces',
    get: (e) => (isLattice(e) ? 'yes' : 'no'),
    set: (e, v) => {
      if ((v === 'yes') === isLattice(e)) return e;
      const next = { ...e };
      if (v === 'yes') next.lattice = { faceWidth: 1, solidity: 0.2 };
      else delete next.lattice;
      return next;
    },
  },
  { path: 'lattice.faceWidth', label: 'face width', type: 'number', kind: 'length', required: true, rule: positive, show: isLattice },
  { path: 'lattice.solidity', label: 'solidity φ', type: 'number', required: true, rule: { test: (v) => v > 0 && v <= 1, words: 'must be in (0, 1]' }, show: isLattice },
  { path: 'lattice.plan', label: 'plan', type: 'select', options: opts(['triangular', 'square']), show: isLattice },
  { path: 'lattice.members', label: 'face members', type: 'select', options: opts(['flat', 'round']), show: isLattice, title: 'Flat-sided or round members, for C_f(φ)' },
  { path: 'lattice.memberWidth', label: 'member width', type: 'number', kind: 'smallLength', rule: positive, show: isLattice, placeholder: 'the diameter', title: 'Mean width of the face members across the wind, for the iced solidity' },
  { path: 'lattice.share', label: 'drag share', type: 'number', rule: share, show: isLattice, placeholder: '1', title: 'Share of the whole-mast lattice drag this member line carries; 0 = bracing with no drag of its own' },
  { path: 'lattice.dragFactor', label: 'C_f', type: 'number', rule: positive, show: isLattice, placeholder: 'C_f(φ)', title: 'Force coefficient on the face area; empty = C_f(φ) of the loads' },
];

export const DISPLACEMENT_FIELDS: FieldSpec[] = [
  { path: 'node', label: 'node', type: 'ref', ref: 'node', required: true, pick: 'node', title: 'A support node; each direction given must be restrained in its "fixed"' },
  ...(['x', 'y', 'z'] as const).map((d): FieldSpec => ({ path: d, label: d, type: 'number', kind: 'smallLength', placeholder: 'free' })),
  ...(['rx', 'ry', 'rz'] as const).map((d): FieldSpec => ({ path: d, label: d, type: 'number', unit: 'rad', placeholder: 'free' })),
];

export const NODAL_MOMENT_FIELD: FieldSpec = {
  path: 'moment', label: 'moment', type: 'vector', kind: 'moment', placeholder: 'none',
  title: 'Mx, My, Mz about the global axes (nodes with rotations only)',
};

/** Number and unit for summaries. */
function q(v: unknown, kind: QuantityKind, ctx: FieldContext): string {
  return formatWithUnit(v as number, kind, ctx.units);
}

export type DesignList = 'minimumTension' | 'memberDesign' | 'twistLimits' | 'sections' | 'displacements';

/** One line per entry for the collapsed list. */
export function designSummary(list: DesignList, e: Entry, ctx: FieldContext): string {
  switch (list) {
    case 'minimumTension': {
      const parts = [e.shareOfInstallation !== undefined ? `${+(100 * (e.shareOfInstallation as number)).toPrecision(4)} % of installation` : '', e.shareOfBreaking !== undefined ? `${+(100 * (e.shareOfBreaking as number)).toPrecision(4)} % of breaking` : ''].filter(Boolean);
      return `${e.group}: ≥ ${parts.join(' and ') || '—'}`;
    }
    case 'memberDesign':
      return `${e.group}${e.role ? `, ${e.role}` : ''}${e.bucklingLength !== undefined ? `, L_cr ${q(e.bucklingLength, 'length', ctx)}` : e.bucklingLengthFactor !== undefined ? `, L_cr = ${e.bucklingLengthFactor} L` : ''}`;
    case 'twistLimits':
      return `${(e.nodes as string[]).join(', ')} ≤ ${e.limit}°`;
    case 'sections':
      return `E ${q(e.E, 'modulus', ctx)}, A ${q(e.area, 'area', ctx)}${e.diameter !== undefined ? `, ⌀ ${q(e.diameter, 'smallLength', ctx)}` : ''}${e.lattice ? ', lattice' : ''}`;
    case 'displacements': {
      const dirs = (['x', 'y', 'z'] as const).filter((d) => e[d] !== undefined).map((d) => `${d} ${q(e[d], 'smallLength', ctx)}`);
      const rots = (['rx', 'ry', 'rz'] as const).filter((d) => e[d] !== undefined).map((d) => `${d} ${e[d]} rad`);
      return `${e.node}: ${[...dirs, ...rots].join(', ') || 'nothing prescribed'}`;
    }
  }
}

/** A group of cables (guys) when there is one, else the first group. */
function guyGroup(project: ProjectFile): string {
  const groups = refChoices('group', project);
  return groups.find((g) => /guy|cable/i.test(g)) ?? groups[0] ?? '';
}
function barGroup(project: ProjectFile): string {
  const groups = refChoices('group', project);
  return groups.find((g) => /mast|leg/i.test(g) && !/guy/i.test(g)) ?? groups[0] ?? '';
}

/** The entry "+ Add" makes (valid as it stands where the project allows one). */
export function newDesignEntry(list: DesignList, ctx: FieldContext): Entry {
  const p = ctx.project;
  switch (list) {
    case 'minimumTension':
      return { group: guyGroup(p), shareOfInstallation: 0.1 };
    case 'memberDesign':
      return { group: barGroup(p), role: 'leg' };
    case 'twistLimits': {
      // The picked nodes (two or more), else the nodes at the level of the highest (at least the two highest).
      if (ctx.selectedNodes.length >= 2) return { nodes: [...ctx.selectedNodes], limit: 0.5 };
      const byHeight = [...p.nodes].sort((a, b) => b.at[2] - a.at[2]);
      const level = byHeight.filter((n) => Math.abs(n.at[2] - byHeight[0].at[2]) < 1e-3).map((n) => n.id);
      return { nodes: level.length >= 2 ? level : byHeight.slice(0, 2).map((n) => n.id), limit: 0.5 };
    }
    case 'sections':
      return { id: freshId('S', p.sections.map((s) => s.id)), E: 200e9, area: 1e-4 };
    case 'displacements': {
      const picked = p.nodes.find((n) => n.id === ctx.selectedNodes[0] && n.fixed);
      const support = picked ?? p.nodes.find((n) => n.fixed?.includes('z')) ?? p.nodes.find((n) => n.fixed);
      const dir = support?.fixed?.includes('z') ? 'z' : (['x', 'y'] as const).find((d) => support?.fixed?.includes(d)) ?? 'z';
      return { node: support?.id ?? '', [dir]: 0 };
    }
  }
}
