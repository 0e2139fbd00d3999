/**
 * Value checks the schema leaves to code: material constants, member geometry, tuning bounds,
 * and finite numbers inside free-form generator parameters.
 * Runs on partly invalid documents too; values of the wrong type are skipped (the schema
 * reports those).
 */
import { entryLabel } from './error-path.ts';
import { entries, isRec, num, str } from './doc-access.ts';

/** Members shorter than this are "zero length", m. Common practice: far below any real member. */
export const MIN_MEMBER_LENGTH = 1e-9;

function positions(root: unknown): Map<string, [number, number, number]> {
  const at = new Map<string, [number, number, number]>();
  for (const { entry } of entries(root, 'nodes')) {
    const id = str(entry, 'id');
    const p = entry.at;
    if (id === undefined || at.has(id) || !Array.isArray(p) || p.length !== 3) continue;
    if (p.every((c) => typeof c === 'number' && Number.isFinite(c))) at.set(id, p as [number, number, number]);
  }
  return at;
}

function sectionErrors(root: unknown): string[] {
  const errors: string[] = [];
  for (const { index, entry } of entries(root, 'sections')) {
    const at = entryLabel(root, 'sections', index);
    const E = num(entry, 'E');
    const area = num(entry, 'area');
    const mass = num(entry, 'massPerLength');
    if (E !== undefined && E <= 0) errors.push(`${at}: E must be positive (got ${E} Pa)`);
    if (area !== undefined && area <= 0) errors.push(`${at}: area must be positive (got ${area} m²)`);
    if (mass !== undefined && mass < 0) errors.push(`${at}: massPerLength must not be negative (got ${mass} kg/m)`);
  }
  return errors;
}

function memberErrors(root: unknown): string[] {
  const errors: string[] = [];
  const at = positions(root);
  for (const { index, entry } of entries(root, 'members')) {
    const label = (): string => entryLabel(root, 'members', index); // built only for an error
    const from = str(entry, 'from');
    const to = str(entry, 'to');
    const L0 = num(entry, 'unstressedLength');
    if (L0 !== undefined && L0 <= 0) errors.push(`${label()}: unstressedLength must be positive (got ${L0} m)`);
    if (from === undefined || to === undefined) continue;
    if (from === to) {
      errors.push(`${label()}: "from" and "to" are the same node ${JSON.stringify(from)}`);
      continue;
    }
    const a = at.get(from);
    const b = at.get(to);
    if (a && b && Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]) < MIN_MEMBER_LENGTH) {
      errors.push(`${label()}: zero length: nodes ${JSON.stringify(from)} and ${JSON.stringify(to)} are at the same position`);
    }
  }
  return errors;
}

function tuningErrors(root: unknown): string[] {
  const tuning = isRec(root) ? root.tuning : undefined;
  const errors: string[] = [];
  for (const { index, entry } of entries(tuning, 'variables')) {
    const min = num(entry, 'min');
    const max = num(entry, 'max');
    if (min !== undefined && max !== undefined && min > max) {
      errors.push(`tuning: variables[${index}]: "min" (${min}) is greater than "max" (${max})`);
    }
  }
  return errors;
}

function nonFiniteIn(value: unknown, path: string, out: string[]): void {
  if (typeof value === 'number' && !Number.isFinite(value)) out.push(`${path} must be a finite number`);
  else if (Array.isArray(value)) value.forEach((v, i) => nonFiniteIn(v, `${path}[${i}]`, out));
  else if (isRec(value)) for (const [k, v] of Object.entries(value)) nonFiniteIn(v, `${path}.${k}`, out);
}

function generatorErrors(root: unknown): string[] {
  const errors: string[] = [];
  for (const { index, entry } of entries(root, 'generators')) {
    const found: string[] = [];
    nonFiniteIn(entry.params, 'params', found);
    for (const f of found) errors.push(`${entryLabel(root, 'generators', index)}: "${f.replace(' must', '" must')}`);
  }
  return errors;
}

export function valueErrors(root: unknown): string[] {
  return [...sectionErrors(root), ...memberErrors(root), ...tuningErrors(root), ...generatorErrors(root)];
}
