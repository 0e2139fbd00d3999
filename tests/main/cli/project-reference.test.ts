// The project-file reference (docs/project-file-reference.md) is generated from the schema's
// descriptions: it must match what `npm run gen:reference` writes now, every field must be
// described, and every numeric field must say its unit (SI) or that it is a pure number.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { projectReferenceMarkdown, undescribedFields } from '../../../main/cli/dev/project-reference.ts';
import type { SchemaNode } from '../../../main/cli/dev/project-reference.ts';
import { REPO_ROOT } from './run-stayset.ts';

const SCHEMA_PATH = 'main/common/project/stayset-project.v1.schema.json';
const schema = JSON.parse(readFileSync(`${REPO_ROOT}${SCHEMA_PATH}`, 'utf8')) as SchemaNode;

/** A unit after a comma or bracket (", m", "(N)"), or words that mark a pure number. */
const UNIT = /(?:, |\()(?:N|m|kg|Pa|K|s|Hz|rad|degrees|m²|m⁴|N\/m|N·m|N·m\/rad|1\/K|kg\/m|kg\/m³|m\/s|m²\/m)(?=[,.;): ]|$)|dimensionless|\bratio\b|[Ff]actor|[Ss]hare|[Ff]raction|[Nn]umber of/;
const NUMERIC_REFS = new Set(['#/definitions/positive', '#/definitions/nonNegative', '#/definitions/absoluteTemperature']);

function numericFieldsWithoutUnit(node: SchemaNode, path: string, out: string[]): string[] {
  for (const [name, child] of Object.entries(node.properties ?? {})) {
    const numeric = child.type === 'number' || child.type === 'integer' || (child.$ref !== undefined && NUMERIC_REFS.has(child.$ref));
    if (numeric && !UNIT.test(child.description ?? '')) out.push(`${path}.${name}`);
    numericFieldsWithoutUnit(child, `${path}.${name}`, out);
  }
  if (node.items) numericFieldsWithoutUnit(node.items, `${path}[]`, out);
  node.oneOf?.forEach((v, i) => numericFieldsWithoutUnit(v, `${path}|${i}`, out));
  return out;
}

describe('project-file reference', () => {
  it('the committed docs/project-file-reference.md is what npm run gen:reference writes', () => {
    const committed = readFileSync(`${REPO_ROOT}docs/project-file-reference.md`, 'utf8');
    const fresh = projectReferenceMarkdown(schema, SCHEMA_PATH);
    // On failure: run `npm run gen:reference` and commit the result.
    expect(committed).toBe(fresh);
  });

  it('every field of the schema has a description', () => {
    expect(undescribedFields(schema)).toEqual([]);
  });

  it('every numeric field states its SI unit or that it is a pure number', () => {
    const out: string[] = [];
    numericFieldsWithoutUnit(schema, '', out);
    for (const [name, def] of Object.entries(schema.definitions ?? {})) numericFieldsWithoutUnit(def, `#${name}`, out);
    expect(out).toEqual([]);
  });

  it('lists every top-level field and every object of the schema, with its link target', () => {
    const text = projectReferenceMarkdown(schema, SCHEMA_PATH);
    for (const name of Object.keys(schema.properties ?? {})) expect(text).toContain(`| \`${name}\` |`);
    expect(text).toContain('### node');
    expect(text).toContain('| `at` | [x, y, z] | yes | Position [x, y, z], m (z up). |');
    expect(text).toContain('| `E` | number | yes | Young\'s modulus, Pa');
    for (const m of text.matchAll(/\]\(#([a-z0-9]+)\)/g)) expect(text).toContain(`### ${Object.keys(schema.definitions ?? {}).find((d) => d.toLowerCase() === m[1])}`);
    // A stale reference is caught: a new field without description shows up.
    const changed = structuredClone(schema);
    changed.definitions!.meta.properties!.projectNumber = { type: 'string' };
    expect(undescribedFields(changed)).toEqual(['#meta.projectNumber']);
    expect(projectReferenceMarkdown(changed, SCHEMA_PATH)).not.toBe(text);
  });
});
