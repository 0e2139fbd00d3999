/**
 * Translates ajv errors into Stayset messages (`members[3] "G2": "segments" must be ...`).
 *
 * Expects errors from an ajv instance created with `verbose: true` (so each error carries its
 * parentSchema and data). A schema may carry `x-message` (a template, or templates keyed by
 * ajv keyword; {field} = quoted field path) and `x-field-up` (name the error after the parent
 * property, used for array items such as the components of a 3-vector).
 */
import type { ErrorObject } from 'ajv';
import { closestName } from './closest-name.ts';
import { messageAt, pointerToPath } from './error-path.ts';

const TYPE_WORDS: Record<string, string> = {
  number: 'a finite number',
  integer: 'a whole number',
  string: 'text (a string)',
  boolean: 'true or false',
  array: 'a list',
  object: 'an object',
};

function shortValue(v: unknown): string | undefined {
  if (typeof v === 'string') return JSON.stringify(v.length > 40 ? `${v.slice(0, 40)}…` : v);
  if (typeof v === 'number' || typeof v === 'boolean' || v === null) return String(v);
  return undefined;
}

function customTemplate(e: ErrorObject): string | undefined {
  const parent = e.parentSchema as Record<string, unknown> | undefined;
  const m = parent?.['x-message'];
  if (typeof m === 'string') return m;
  if (typeof m === 'object' && m !== null) {
    const t = (m as Record<string, unknown>)[e.keyword];
    if (typeof t === 'string') return t;
  }
  return undefined;
}

function defaultTemplate(e: ErrorObject): string {
  const p = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'type':
      return `{field} must be ${String(p.type).split(',').map((t) => TYPE_WORDS[t] ?? t).join(' or ')}`;
    case 'const':
      return `{field} must be ${JSON.stringify(p.allowedValue)}`;
    case 'enum':
      return `{field} must be one of ${(p.allowedValues as unknown[]).map((v) => String(v)).join(', ')}`;
    case 'minItems':
      return `{field} must have at least ${String(p.limit)} ${p.limit === 1 ? 'entry' : 'entries'}`;
    case 'maxItems':
      return `{field} must have at most ${String(p.limit)} entries`;
    case 'minimum':
      return `{field} must be at least ${String(p.limit)}`;
    case 'maximum':
      return `{field} must be at most ${String(p.limit)}`;
    case 'exclusiveMinimum':
      return `{field} must be greater than ${String(p.limit)}`;
    case 'exclusiveMaximum':
      return `{field} must be less than ${String(p.limit)}`;
    case 'minLength':
      return '{field} must not be empty';
    case 'pattern':
      return '{field} has an invalid form';
    case 'oneOf':
    case 'anyOf':
      return '{field} does not match any of the allowed forms';
    case 'discriminator':
      return '{field} has a missing or unknown "kind"';
    default:
      return `{field} ${e.message ?? 'is invalid'}`;
  }
}

/** One ajv error as a finished message. */
export function ajvErrorText(root: unknown, e: ErrorObject): string {
  const path = pointerToPath(e.instancePath);
  const p = e.params as Record<string, unknown>;
  if (e.keyword === 'required') {
    return messageAt(root, [...path, String(p.missingProperty)], '{field} is required');
  }
  if (e.keyword === 'additionalProperties') {
    const name = String(p.additionalProperty);
    const known = Object.keys(((e.parentSchema as Record<string, unknown>)?.properties ?? {}) as object);
    const guess = closestName(name, known);
    const hint = guess ? ` (did you mean ${JSON.stringify(guess)}?)` : '';
    const where = path.length === 0 ? 'unknown top-level property' : 'unknown property';
    return messageAt(root, [...path, name], `${where} {field}${hint}`);
  }
  const up = Number((e.parentSchema as Record<string, unknown> | undefined)?.['x-field-up'] ?? 0);
  const fieldPath = up > 0 ? path.slice(0, Math.max(0, path.length - up)) : path;
  const composite = Array.isArray(e.data) ? 'a list' : typeof e.data === 'object' && e.data !== null ? 'an object' : undefined;
  // A wrong-type list or object is named by kind; for other keywords it would only be noise.
  const got = up > 0 ? undefined : (shortValue(e.data) ?? (e.keyword === 'type' ? composite : undefined));
  const gotText = got !== undefined && e.keyword !== 'oneOf' ? ` (got ${got})` : '';
  return messageAt(root, fieldPath, (customTemplate(e) ?? defaultTemplate(e)) + gotText);
}

/**
 * Drops errors that only explain why each alternative of a failed oneOf/anyOf did not match
 * (the summary message covers them), then translates and de-duplicates, keeping order.
 */
export function ajvErrorsText(root: unknown, errors: readonly ErrorObject[]): string[] {
  const summaries = errors.filter((e) => e.keyword === 'oneOf' || e.keyword === 'anyOf');
  const kept = errors.filter(
    (e) =>
      !summaries.some(
        (s) => s !== e && e.schemaPath.startsWith(`${s.schemaPath}/`) && e.instancePath.startsWith(s.instancePath),
      ),
  );
  return [...new Set(kept.map((e) => ajvErrorText(root, e)))];
}
