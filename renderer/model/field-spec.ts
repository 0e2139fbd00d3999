/**
 * Field descriptors of the entry editors (design actions, area loads): what a field is, how its
 * text is read (SI in the file, display units at the edge through main/common/units; typed units parsed by renderer/units) and written
 * back. One descriptor per field, so a new optional field of the file format is one line; fields
 * no descriptor names are kept by every edit and shown read-only.
 */
import type { ProjectFile } from '../../solver/index.ts';
import { parseQuantity } from '../units/parse-quantity.ts';
import { displayUnit, entryText, type QuantityKind, type UnitSystem } from '../../main/common/units/index.ts';
import { getPath, setPath } from './action-edits.ts';

/** What a reference field points at (its choices come from the project). */
export type RefSource = 'node' | 'member' | 'group' | 'loadCase' | 'windCase' | 'case';

export type Entry = Record<string, unknown>;

export interface FieldContext {
  project: ProjectFile;
  units: UnitSystem;
  /** Nodes and members picked in the 3D view, in pick order. */
  selectedNodes: readonly string[];
  selectedMembers: readonly string[];
}

export interface FieldSpec {
  /** Dotted path in the entry ("along.group"). */
  path: string;
  label: string;
  /**
   * text: a string; number: a number (a quantity when `kind` is set); select: one of `options`;
   * ref: an id of `ref`; list: comma-separated ids; ranges: height ranges "0 … 20; 20 … 40"
   * (length unit); pairs: "name: number, name: number" as [{ region, cp }]; vector: three
   * numbers "x, y, z" (each a quantity of `kind` when set) as [x, y, z].
   */
  type: 'text' | 'number' | 'select' | 'ref' | 'list' | 'ranges' | 'pairs' | 'vector';
  required?: boolean;
  /** Quantity kind of a number (display unit, unit-aware entry); may depend on the entry. */
  kind?: QuantityKind | ((e: Entry) => QuantityKind);
  /** Unit label of a number kept as typed (no kind), e.g. "°", "s", "m²/m per m of ice". */
  unit?: string | ((e: Entry) => string);
  /** Rule on the SI value of a number, with its words ("must be ≥ 0"). */
  rule?: { test: (v: number) => boolean; words: string };
  options?: readonly { value: string; label: string }[];
  ref?: RefSource;
  /** Text shown in an empty optional field: what applies when it is left out. */
  placeholder?: string | ((e: Entry, ctx: FieldContext) => string);
  title?: string;
  show?: (e: Entry) => boolean;
  /** A field whose value is derived (e.g. point or line item): read and write it here. */
  get?: (e: Entry) => string;
  set?: (e: Entry, value: string, ctx: FieldContext) => Entry;
  /** Offer "← picked" (the nodes or members selected in the 3D view). */
  pick?: 'node' | 'nodes' | 'members';
}

export type FieldOutcome = { ok: true; entry: Entry } | { ok: false; error: string };

const kindOf = (f: FieldSpec, e: Entry): QuantityKind | undefined => (typeof f.kind === 'function' ? f.kind(e) : f.kind);

/** Unit label shown beside a field ('' when none). */
export function unitLabel(f: FieldSpec, e: Entry, units: UnitSystem): string {
  const k = kindOf(f, e);
  if (k) return displayUnit(k, units).label;
  return typeof f.unit === 'function' ? f.unit(e) : f.unit ?? '';
}

function num(text: string, f: FieldSpec, e: Entry, units: UnitSystem, where: string): { ok: true; value: number } | { ok: false; error: string } {
  const k = kindOf(f, e);
  let v: number;
  if (k) {
    const r = parseQuantity(text, k, units, where);
    if (!r.ok) return r;
    v = r.value;
  } else {
    v = Number(text);
    if (!Number.isFinite(v)) return { ok: false, error: `${where}: "${text}" is not a number` };
  }
  if (f.rule && !f.rule.test(v)) return { ok: false, error: `${where}: "${text}" ${f.rule.words}` };
  return { ok: true, value: v };
}

const RANGE = /^\s*(\S+?)\s*(?:…|\.\.\.|\.\.|–|to|-)\s*(\S+)\s*$/;

/** Read `text` typed into field `f` of `entry`; `where` names the entry for messages. */
export function applyFieldText(f: FieldSpec, entry: Entry, text: string, ctx: FieldContext, where: string): FieldOutcome {
  const at = `${where} ${f.label}`;
  const t = text.trim();
  if (f.set) return { ok: true, entry: f.set(entry, t, ctx) };
  if (t === '') {
    if (f.required) return { ok: false, error: `${at}: a value is required` };
    return { ok: true, entry: setPath(entry, f.path, undefined) };
  }
  let value: unknown;
  switch (f.type) {
    case 'number': {
      const r = num(t, f, entry, ctx.units, at);
      if (!r.ok) return r;
      value = r.value;
      break;
    }
    case 'list':
      value = t.split(',').map((s) => s.trim()).filter(Boolean);
      break;
    case 'vector': {
      const parts = t.split(/[,;]/).map((s) => s.trim());
      if (parts.length !== 3 || parts.some((s) => s === '')) return { ok: false, error: `${at}: "${t}" is not three components "x, y, z"` };
      const out: number[] = [];
      for (const [k, part] of parts.entries()) {
        const r = num(part, f, entry, ctx.units, `${at} ${'xyz'[k]}`);
        if (!r.ok) return r;
        out.push(r.value);
      }
      value = out;
      break;
    }
    case 'ranges': {
      const out: { from: number; to: number }[] = [];
      for (const part of t.split(';').map((s) => s.trim()).filter(Boolean)) {
        const m = RANGE.exec(part);
        if (!m) return { ok: false, error: `${at}: "${part}" is not a range like "0 … 20" (ranges separated by ";")` };
        const lo = parseQuantity(m[1], 'length', ctx.units, at), hi = parseQuantity(m[2], 'length', ctx.units, at);
        if (!lo.ok) return lo;
        if (!hi.ok) return hi;
        if (!(hi.value > lo.value)) return { ok: false, error: `${at}: in "${part}" the top must be above the bottom` };
        out.push({ from: lo.value, to: hi.value });
      }
      value = out;
      break;
    }
    case 'pairs': {
      const out: { region: string; cp: number }[] = [];
      for (const part of t.split(',').map((s) => s.trim()).filter(Boolean)) {
        const m = /^(.+?)\s*[:=]\s*(\S+)$/.exec(part);
        const cp = m ? Number(m[2]) : NaN;
        if (!m || !Number.isFinite(cp)) return { ok: false, error: `${at}: "${part}" is not "region: c_p" (pairs separated by ",")` };
        out.push({ region: m[1].trim(), cp });
      }
      value = out;
      break;
    }
    default:
      value = t;
  }
  return { ok: true, entry: setPath(entry, f.path, value) };
}

/** The text a field shows for `entry` ('' when unset). */
export function fieldText(f: FieldSpec, entry: Entry, units: UnitSystem): string {
  if (f.get) return f.get(entry);
  const v = getPath(entry, f.path);
  if (v === undefined || v === null) return '';
  switch (f.type) {
    case 'number': {
      const k = kindOf(f, entry);
      return k ? entryText(v as number, k, units) : String(Number((v as number).toPrecision(10)));
    }
    case 'list':
      return (v as string[]).join(', ');
    case 'vector': {
      const k = kindOf(f, entry);
      return (v as number[]).map((x) => (k ? entryText(x, k, units) : String(Number(x.toPrecision(10))))).join(', ');
    }
    case 'ranges':
      return (v as { from: number; to: number }[]).map((r) => `${entryText(r.from, 'length', units)} … ${entryText(r.to, 'length', units)}`).join('; ');
    case 'pairs':
      return (v as { region: string; cp: number }[]).map((p) => `${p.region}: ${p.cp}`).join(', ');
    default:
      return String(v);
  }
}

/** Fields of `entry` no descriptor covers (kept by every edit; shown read-only). */
export function otherFields(fields: readonly FieldSpec[], entry: Entry): [string, string][] {
  const known = new Set(fields.map((f) => f.path.split('.')[0]));
  return Object.entries(entry).filter(([k]) => !known.has(k)).map(([k, v]) => [k, JSON.stringify(v)]);
}

/** Ids a reference field may take, from the project. */
export function refChoices(source: RefSource, project: ProjectFile): string[] {
  switch (source) {
    case 'node': return project.nodes.map((n) => n.id);
    case 'member': return project.members.map((m) => m.id);
    case 'group': {
      const ids = new Set((project.groups ?? []).map((g) => g.id));
      for (const m of project.members) for (const g of m.groups ?? []) ids.add(g);
      return [...ids];
    }
    case 'loadCase': return project.loadCases.map((c) => c.id);
    case 'windCase': return project.loadCases.filter((c) => c.wind).map((c) => c.id);
    case 'case': return [...project.loadCases.map((c) => c.id), ...(project.combinations ?? []).map((c) => c.id)];
  }
}
