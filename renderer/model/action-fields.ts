/**
 * The fields of each design-action list and of a load case's area loads (solver/project/
 * actions-types.ts), a one-line summary per entry, and the entry a "+ Add" starts from. Units:
 * SI in the file; heights m, drag area m² (point) or m²/m of height (line), mass kg or kg/m,
 * pressures Pa. Ice fields are per metre of radial ice, kept in SI as typed.
 */
import type { AreaLoadSpec, ProjectFile } from '../../solver/index.ts';
import { stepResponsePeak } from '../../solver/index.ts';
import { formatWithUnit } from '../../main/common/units/index.ts';
import { freshId } from './project-edits.ts';
import { refChoices, type Entry, type FieldContext, type FieldSpec } from './field-spec.ts';
import type { ActionList } from './action-edits.ts';

const nonNegative = { test: (v: number) => v >= 0, words: 'must be ≥ 0' };
const ID: FieldSpec = { path: 'id', label: 'id', type: 'text', required: true };
const LABEL: FieldSpec = { path: 'label', label: 'label', type: 'text' };
const isLine = (e: Entry) => e.along !== undefined;
const isCoat = (e: Entry) => e.iceBehaviour === 'coat';
const perThickness = (e: Entry) => e.iceBehaviour === undefined || e.iceBehaviour === 'perThickness';

/** Highest node of the project, m (0 for none). */
function topHeight(project: ProjectFile): number {
  return project.nodes.reduce((z, n) => Math.max(z, n.at[2]), 0);
}
function topNode(project: ProjectFile): string {
  let best = project.nodes[0];
  for (const n of project.nodes) if (n.at[2] > best.at[2]) best = n;
  return best?.id ?? '';
}
/** A group of the mast bars when there is one (id mentions "mast" and not "guy"), else the first group. */
function mastGroup(project: ProjectFile): string {
  const groups = refChoices('group', project);
  return groups.find((g) => /mast|leg/i.test(g) && !/guy/i.test(g)) ?? groups[0] ?? '';
}

/**
 * An ancillary with its ice behaviour changed and the fields of the others dropped (the file
 * allows iceDragArea/iceMass only per thickness, coatWidth/coatLength only for a coat). A new
 * coat starts at 0.1 m wide and, on a point item, 1 m long: values to be edited.
 */
export function setIceBehaviour(e: Entry, v: string): Entry {
  const next = { ...e };
  if (v === '') delete next.iceBehaviour;
  else next.iceBehaviour = v;
  if (v !== '' && v !== 'perThickness') { delete next.iceDragArea; delete next.iceMass; }
  if (v !== 'coat') { delete next.coatWidth; delete next.coatLength; }
  else {
    next.coatWidth ??= 0.1;
    if (!isLine(e)) next.coatLength ??= 1;
  }
  return next;
}

export const ANCILLARY_FIELDS: FieldSpec[] = [
  ID, LABEL,
  { path: 'kind', label: 'kind', type: 'select', required: true, options: ['antenna', 'dish', 'feeder', 'ladder', 'platform', 'other'].map((v) => ({ value: v, label: v })) },
  {
    path: 'placement', label: 'placed', type: 'select', options: [{ value: 'point', label: 'at a node' }, { value: 'line', label: 'along a group, between heights' }],
    get: (e) => (isLine(e) ? 'line' : 'point'),
    set: (e, v, ctx) => {
      if ((v === 'line') === isLine(e)) return e;
      const next = { ...e };
      if (v === 'line') { delete next.node; delete next.coatLength; next.along = { group: mastGroup(ctx.project), from: 0, to: topHeight(ctx.project) }; }
      else { delete next.along; next.node = ctx.selectedNodes[0] ?? topNode(ctx.project); if (next.iceBehaviour === 'coat') next.coatLength ??= 1; }
      return next;
    },
  },
  { path: 'node', label: 'node', type: 'ref', ref: 'node', required: true, show: (e) => !isLine(e), pick: 'node' },
  { path: 'along.group', label: 'group', type: 'ref', ref: 'group', required: true, show: isLine },
  { path: 'along.from', label: 'from height', type: 'number', kind: 'length', required: true, show: isLine },
  { path: 'along.to', label: 'to height', type: 'number', kind: 'length', required: true, show: isLine },
  { path: 'dragArea', label: 'drag area C_f·A', type: 'number', kind: (e) => (isLine(e) ? 'dragAreaPerLength' : 'dragArea'), required: true, rule: nonNegative, title: 'Force coefficient × reference area (type the product, e.g. "1.2 * 0.8 m^2"); a line item per metre of height' },
  { path: 'mass', label: 'mass', type: 'number', kind: (e) => (isLine(e) ? 'massPerLength' : 'mass'), required: true, rule: nonNegative, title: 'A line item per metre of height' },
  { path: 'iceDragArea', show: perThickness, label: 'ice drag area', type: 'number', unit: (e) => (isLine(e) ? '(m²/m)/m ice' : 'm²/m ice'), rule: nonNegative, placeholder: '0: ice ignored', title: 'Drag area added per metre of radial ice thickness (SI)' },
  { path: 'iceMass', label: 'ice mass', type: 'number', unit: (e) => (isLine(e) ? '(kg/m)/m ice' : 'kg/m ice'), rule: nonNegative, placeholder: '0: ice ignored', title: 'Ice mass per metre of radial ice thickness (SI)', show: perThickness },
  {
    path: 'iceBehaviour', label: 'ice', type: 'select',
    options: [{ value: '', label: 'per ice thickness (default)' }, { value: 'perThickness', label: 'per ice thickness' }, { value: 'coat', label: 'a coat on a round body' }, { value: 'none', label: 'none (shielded)' }],
    title: 'How ice forms on the item: drag area and mass per metre of ice; a uniform coat on a round body of the coat width; or none',
    get: (e) => (typeof e.iceBehaviour === 'string' ? e.iceBehaviour : ''),
    set: (e, v) => setIceBehaviour(e, v),
  },
  { path: 'coatWidth', label: 'coat width', type: 'number', kind: 'smallLength', required: true, rule: { test: (v) => v > 0, words: 'must be > 0' }, show: isCoat, title: 'Outer width of the iced round body: the drag area grows by (w + 2t)/w' },
  { path: 'coatLength', label: 'coat length', type: 'number', kind: 'length', required: true, rule: { test: (v) => v > 0, words: 'must be > 0' }, show: (e) => isCoat(e) && !isLine(e), title: 'Length of the iced body (a line item is iced per metre of height)' },
];

export const PATCH_WIND_FIELDS: FieldSpec[] = [
  ID, LABEL,
  { path: 'meanCase', label: 'mean-wind case', type: 'ref', ref: 'windCase', required: true },
  { path: 'patchFactor', label: 'patch factor', type: 'number', required: true, rule: { test: (v) => v > 1, words: 'must be > 1 (wind force in the patch ÷ mean wind force)' }, title: 'Wind force inside a patch as a multiple of the mean wind force there; the standard derives it from the turbulence intensity' },
  { path: 'patches', label: 'patches', type: 'ranges', placeholder: 'spans between guy levels', title: 'Height ranges "from … to", separated by ";"' },
];

export const MEMBER_LOSS_FIELDS: FieldSpec[] = [
  ID, LABEL,
  { path: 'fromCase', label: 'from case', type: 'ref', ref: 'case', required: true, title: 'Load case or combination whose solved state the loss starts from' },
  { path: 'group', label: 'each member of group', type: 'ref', ref: 'group' },
  { path: 'members', label: 'members', type: 'list', pick: 'members', placeholder: 'ids, comma-separated' },
  { path: 'dampingRatio', label: 'damping ratio ζ', type: 'number', rule: { test: (v) => v >= 0 && v < 1, words: 'must be 0 ≤ ζ < 1' }, placeholder: '0 (undamped)' },
  {
    path: 'dynamicFactor', label: 'dynamic factor', type: 'number', rule: { test: (v) => v >= 1 && v <= 2, words: 'must be between 1 (static) and 2' },
    placeholder: (e) => `${stepResponsePeak(typeof e.dampingRatio === 'number' ? e.dampingRatio : 0).toFixed(3)} from ζ`,
    title: 'Dynamic amplification on the released force; default 1 + exp(−πζ/√(1−ζ²)), the peak of the damped step response (2 undamped)',
  },
];

export const WIND_DIRECTION_FIELDS: FieldSpec[] = [
  ID, LABEL,
  { path: 'case', label: 'wind case', type: 'ref', ref: 'windCase', required: true },
  { path: 'count', label: 'directions N', type: 'number', required: true, rule: { test: (v) => Number.isInteger(v) && v >= 1 && v <= 72, words: 'must be a whole number from 1 to 72' } },
  { path: 'azimuth', label: 'first direction', type: 'number', unit: '°', placeholder: '0', title: 'Degrees counter-clockwise from +x, direction the air flows toward (as the case wind)' },
];

export const PANEL_FIELDS: FieldSpec[] = [
  ID,
  { path: 'nodes', label: 'corner nodes', type: 'list', required: true, pick: 'nodes', title: 'In order around the loop; counter-clockwise seen from above = normal up' },
  { path: 'region', label: 'region', type: 'text', placeholder: 'none', title: 'Pressure coefficients may be given per region' },
  LABEL,
];

export const AREA_LOAD_FIELDS: FieldSpec[] = [
  { path: 'kind', label: 'kind', type: 'select', required: true, options: [{ value: 'snow', label: 'snow (per plan area, down)' }, { value: 'cladding', label: 'cladding (per true area, down)' }, { value: 'pressure', label: 'pressure (normal, follows)' }] },
  { path: 'value', label: 'value', type: 'number', kind: 'pressure', required: true, title: 'Pressure: positive pushes on the top face, negative is suction' },
  { path: 'panels', label: 'panels or regions', type: 'list', placeholder: 'every panel' },
  { path: 'coefficients', label: 'c_p by region', type: 'pairs', show: (e) => e.kind === 'pressure', placeholder: 'c_p = 1', title: '"region: c_p, panel id: c_p" — a panel id wins over its region' },
];

export const ACTION_FIELDS: Record<ActionList, FieldSpec[]> = {
  ancillaries: ANCILLARY_FIELDS,
  patchWind: PATCH_WIND_FIELDS,
  memberLoss: MEMBER_LOSS_FIELDS,
  windDirections: WIND_DIRECTION_FIELDS,
  panels: PANEL_FIELDS,
};

const ids = (project: ProjectFile, list: ActionList) => (project[list] ?? []).map((e) => e.id);
const allCaseIds = (p: ProjectFile) => [...p.loadCases.map((c) => c.id), ...(p.combinations ?? []).map((c) => c.id), ...ids(p, 'patchWind'), ...ids(p, 'memberLoss'), ...ids(p, 'windDirections')];

/** The entry "+ Add" makes: a fresh id, the picked node or members, the first wind case. */
export function newActionEntry(list: ActionList, ctx: FieldContext): Entry {
  const p = ctx.project;
  const windCase = refChoices('windCase', p)[0] ?? '';
  switch (list) {
    case 'ancillaries':
      return { id: freshId('A', ids(p, list)), kind: 'antenna', node: ctx.selectedNodes[0] ?? topNode(p), dragArea: 1, mass: 20 };
    case 'patchWind':
      return { id: freshId('patch ', allCaseIds(p)), meanCase: windCase, patchFactor: 1.5 };
    case 'memberLoss': {
      const guys = refChoices('group', p).find((g) => /guy/i.test(g));
      const base = { id: freshId('loss ', allCaseIds(p)), fromCase: p.loadCases[0]?.id ?? '' };
      return ctx.selectedMembers.length ? { ...base, members: [...ctx.selectedMembers] } : guys ? { ...base, group: guys } : { ...base, members: [p.members[0]?.id ?? ''] };
    }
    case 'windDirections':
      return { id: freshId('dir ', allCaseIds(p)), case: windCase, count: 8 };
    case 'panels':
      return { id: freshId('P', ids(p, list)), nodes: ctx.selectedNodes.length >= 3 ? [...ctx.selectedNodes] : p.nodes.slice(0, 3).map((n) => n.id) };
  }
}

export function newAreaLoad(): AreaLoadSpec {
  return { kind: 'snow', value: 500 };
}

/** One line per entry for the collapsed list. */
export function actionSummary(list: ActionList | 'areaLoads', e: Entry, ctx: FieldContext): string {
  const u = ctx.units;
  const len = (v: unknown) => formatWithUnit(v as number, 'length', u);
  switch (list) {
    case 'ancillaries': {
      const along = e.along as { group: string; from: number; to: number } | undefined;
      return `${e.kind}, ${along ? `along ${along.group} ${len(along.from)}–${len(along.to)}` : `at ${e.node}`}`;
    }
    case 'patchWind': return `on ${e.meanCase}, ×${e.patchFactor}${e.patches ? `, ${(e.patches as unknown[]).length} patches` : ''}`;
    case 'memberLoss': return `from ${e.fromCase}: ${e.group ? `each of ${e.group}` : ''}${e.group && e.members ? ' + ' : ''}${e.members ? (e.members as string[]).join(', ') : ''}`;
    case 'windDirections': return `${e.case} from ${e.count} directions`;
    case 'panels': return `${(e.nodes as string[]).length} corners${e.region ? `, ${e.region}` : ''}`;
    case 'areaLoads': return `${e.kind} ${formatWithUnit(e.value as number, 'pressure', u)}${e.panels ? ` on ${(e.panels as string[]).join(', ')}` : ''}`;
  }
}

/** Name of entry `index` of `list` in messages, as the file validator names it. */
export function entryWhere(list: string, index: number, e: Entry): string {
  return typeof e.id === 'string' ? `${list}[${index}] "${e.id}"` : `${list}[${index}]`;
}
