/**
 * Column definitions of the model tables: how each cell reads from a row (SI) and writes back.
 * Numeric columns carry a QuantityKind and are entered unit-aware (renderer/units/parse-quantity.ts; display through main/common/units); the header
 * shows the display unit. Optional columns accept an empty cell (field removed from the file).
 */
import type { LoadCaseSpec, MemberSpec, NodeSpec, ProjectFile, SectionSpec } from '../../solver/index.ts';
import type { QuantityKind } from '../../main/common/units/index.ts';
import type { TableName, TableRow } from '../model/table-names.ts';
import { withField } from '../model/project-edits.ts';

export type CellValue = string | number | boolean | undefined;

export interface Column<R> {
  key: string;
  label: string;
  /** Text, a unit-aware quantity, a choice, a check box or a read-only summary. */
  type: 'text' | 'quantity' | 'choice' | 'flag' | 'summary';
  kind?: QuantityKind;
  choices?: readonly string[];
  optional?: boolean;
  /** Whole numbers only (segments). */
  integer?: boolean;
  /** Same field in the file (for messages): `members[3] "G2": pretension …`. */
  help?: string;
  get(row: R): CellValue;
  /** Returns the changed row (immutable). Absent for read-only columns. */
  set?(row: R, value: CellValue): R;
}

function field<R extends object>(key: string, label: string, type: Column<R>['type'], extra: Partial<Column<R>> = {}): Column<R> {
  return {
    key, label, type, ...extra,
    get: (row) => (row as Record<string, CellValue>)[key],
    set: (row, value) => withField(row, key, value),
  };
}

function coordinate(axis: 0 | 1 | 2): Column<NodeSpec> {
  return {
    key: 'xyz'[axis], label: 'xyz'[axis], type: 'quantity', kind: 'length',
    get: (n) => n.at[axis],
    set: (n, v) => {
      const at: [number, number, number] = [n.at[0], n.at[1], n.at[2]];
      at[axis] = v as number;
      return { ...n, at };
    },
  };
}

/** Setting one of pretension / unstressed length clears the other (they are exclusive). */
function exclusive(key: 'pretension' | 'unstressedLength', label: string, kind: QuantityKind): Column<MemberSpec> {
  const other = key === 'pretension' ? 'unstressedLength' : 'pretension';
  return {
    key, label, type: 'quantity', kind, optional: true,
    help: 'Exclusive with the other of pretension / unstressed length: setting one clears the other.',
    get: (m) => m[key],
    set: (m, v) => (v === undefined ? withField(m, key, undefined) : withField(withField(m, other, undefined), key, v)),
  };
}

function nodalSummary(c: LoadCaseSpec): string {
  const loads = c.nodalLoads ?? [];
  if (!loads.length) return '—';
  return `${loads.length} nodal load${loads.length === 1 ? '' : 's'}`;
}

export const NODE_COLUMNS: Column<NodeSpec>[] = [
  field('id', 'Id', 'text'),
  coordinate(0), coordinate(1), coordinate(2),
  field('fixed', 'Fixed', 'text', { optional: true, help: 'Restrained translations: any of x, y, z (xyz = pinned); empty = free.' }),
];

export const MEMBER_COLUMNS: Column<MemberSpec>[] = [
  field('id', 'Id', 'text'),
  field('kind', 'Kind', 'choice', { choices: ['cable', 'bar'] }),
  field('from', 'From', 'text'),
  field('to', 'To', 'text'),
  field('section', 'Section', 'text'),
  field('segments', 'Segments', 'quantity', { kind: 'count', optional: true, integer: true }),
  exclusive('pretension', 'Pretension', 'force'),
  exclusive('unstressedLength', 'Unstressed length', 'length'),
];

export const SECTION_COLUMNS: Column<SectionSpec>[] = [
  field('id', 'Id', 'text'),
  field('E', 'E', 'quantity', { kind: 'modulus' }),
  field('area', 'Area', 'quantity', { kind: 'area' }),
  field('massPerLength', 'Mass', 'quantity', { kind: 'massPerLength', optional: true }),
  field('breakingLoad', 'Breaking load', 'quantity', { kind: 'force', optional: true }),
  field('thermalExpansion', 'α', 'quantity', { kind: 'thermalExpansion', optional: true }),
  field('diameter', 'Diameter', 'quantity', { kind: 'smallLength', optional: true }),
];

export const LOAD_CASE_COLUMNS: Column<LoadCaseSpec>[] = [
  field('id', 'Id', 'text'),
  field('label', 'Label', 'text', { optional: true }),
  { key: 'selfWeight', label: 'Self-weight', type: 'flag', get: (c) => c.selfWeight ?? true, set: (c, v) => withField(c, 'selfWeight', v === true ? undefined : false) },
  field('temperatureChange', 'ΔT', 'quantity', { kind: 'temperatureChange', optional: true }),
  { key: 'nodalLoads', label: 'Nodal loads', type: 'summary', get: nodalSummary },
  { key: 'wind', label: 'Wind', type: 'summary', get: (c) => (c.wind ? `${c.wind.speed} m/s → ${c.wind.direction}°` : '—') },
  { key: 'ice', label: 'Ice', type: 'summary', get: (c) => (c.ice ? `${+(c.ice.thickness * 1000).toPrecision(4)} mm` : '—') },
];

export const COLUMNS: { [K in TableName]: Column<TableRow[K]>[] } = {
  nodes: NODE_COLUMNS,
  members: MEMBER_COLUMNS,
  sections: SECTION_COLUMNS,
  loadCases: LOAD_CASE_COLUMNS,
};

/**
 * A new row for `table` with a fresh id and sensible defaults taken from the existing rows (the
 * first member of a project goes between its first two nodes, with its first section).
 */
export function newRow<K extends TableName>(table: K, id: string, rows: TableRow[K][], project?: ProjectFile): TableRow[K] {
  const last = rows[rows.length - 1] as unknown;
  switch (table) {
    case 'nodes': {
      const n = last as NodeSpec | undefined;
      return { id, at: n ? [n.at[0] + 1, n.at[1], n.at[2]] : [0, 0, 0] } as TableRow[K];
    }
    case 'members': {
      const m = last as MemberSpec | undefined;
      const nodes = project?.nodes ?? [];
      return { id, kind: m?.kind ?? 'cable', from: m?.from ?? nodes[0]?.id ?? '', to: m?.to ?? nodes[1]?.id ?? '', section: m?.section ?? project?.sections[0]?.id ?? '' } as TableRow[K];
    }
    case 'sections': {
      const s = last as SectionSpec | undefined;
      return withField({ ...(s ?? { E: 160e9, area: 1e-4 }), id }, 'label', undefined) as TableRow[K];
    }
    default:
      return { id, selfWeight: true } as TableRow[K];
  }
}
