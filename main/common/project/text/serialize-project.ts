/**
 * serializeProject: the canonical text of a project file.
 * - Key order follows the JSON Schema's `properties` order, which mirrors the field order of
 *   solver/project/types.ts (one source of order; free-form objects such as generator params
 *   keep the order they were written in).
 * - Two-space indent; lists of plain values (coordinates, id lists) stay on one line.
 * - Numbers use the shortest text that reads back to the same double (ECMAScript
 *   Number::toString), and -0 is kept as -0. Non-finite numbers cannot be written: throws.
 * - Ends with a newline.
 */
import type { ProjectFile } from '../../../../solver/index.ts';
import { projectSchema } from '../validation/schema-validator.ts';

type Schema = Record<string, unknown>;
const root = projectSchema as Schema;

function resolve(schema: Schema | undefined): Schema | undefined {
  let s = schema;
  while (s && typeof s.$ref === 'string') {
    const name = s.$ref.replace('#/definitions/', '');
    s = (root.definitions as Record<string, Schema>)[name];
  }
  return s;
}

/** The oneOf branch that describes `value`: by a "kind" const, else by its required keys. */
function branchFor(schema: Schema, value: Record<string, unknown>): Schema {
  const branches = (schema.oneOf as Schema[] | undefined) ?? [];
  const byKind = branches.find((b) => (b.properties as Record<string, Schema>)?.kind?.const === value.kind);
  if (byKind) return byKind;
  const byRequired = branches.find((b) => ((b.required as string[]) ?? []).every((k) => k in value));
  return byRequired ?? schema;
}

function isPlain(v: unknown): boolean {
  return v === null || typeof v !== 'object';
}

function numberText(v: number, path: string): string {
  if (!Number.isFinite(v)) throw new Error(`cannot save ${path}: ${v} is not a finite number`);
  return Object.is(v, -0) ? '-0' : JSON.stringify(v);
}

function write(value: unknown, schema: Schema | undefined, indent: string, path: string): string {
  if (typeof value === 'number') return numberText(value, path);
  if (isPlain(value)) return JSON.stringify(value) ?? 'null';
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    const itemSchema = resolve(schema?.items as Schema | undefined);
    const parts = value.map((v, i) => write(v, itemSchema, inner, `${path}[${i}]`));
    if (value.every(isPlain)) return `[${parts.join(', ')}]`;
    return `[\n${parts.map((p) => inner + p).join(',\n')}\n${indent}]`;
  }
  const obj = value as Record<string, unknown>;
  let s = schema;
  if (s?.oneOf) s = branchFor(s, obj);
  const props = (s?.properties as Record<string, Schema> | undefined) ?? {};
  const keys = Object.keys(obj).filter((k) => obj[k] !== undefined);
  const known = Object.keys(props).filter((k) => keys.includes(k));
  const ordered = [...known, ...keys.filter((k) => !(k in props))];
  if (ordered.length === 0) return '{}';
  const lines = ordered.map((k) => `${inner}${JSON.stringify(k)}: ${write(obj[k], resolve(props[k]), inner, `${path}.${k}`)}`);
  return `{\n${lines.join(',\n')}\n${indent}}`;
}

export function serializeProject(project: ProjectFile): string {
  return `${write(project, root, '', 'project')}\n`;
}
