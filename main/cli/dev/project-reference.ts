/**
 * The project-file reference (docs/project-file-reference.md) as Markdown, built from the JSON
 * Schema alone: one table per object (top level, then each definition) with every field, its
 * type, whether it is required, and its `description` (meaning and unit). Pure: schema in, text
 * out; written by write-project-reference.ts, compared with the committed file by a test.
 */

/** The part of JSON Schema (draft-07) the project schema uses. */
export interface SchemaNode {
  description?: string;
  type?: string;
  $ref?: string;
  const?: unknown;
  enum?: unknown[];
  items?: SchemaNode;
  properties?: Record<string, SchemaNode>;
  required?: string[];
  oneOf?: SchemaNode[];
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  definitions?: Record<string, SchemaNode>;
  title?: string;
}

/** Definitions that are plain values: written inline as a type, listed once under "Value types". */
const VALUE_TYPES: Record<string, string> = {
  id: 'id',
  idList: 'list of ids',
  vec3: '[x, y, z]',
  positive: 'number > 0',
  nonNegative: 'number ≥ 0',
  absoluteTemperature: 'number > 0 (K)',
  releaseLetters: 'letters of x, y, z',
};

const anchor = (name: string): string => name.toLowerCase();
const refName = (ref: string): string => ref.replace('#/definitions/', '');
const cell = (text: string): string => text.replace(/\|/g, '\\|').replace(/\n/g, ' ');

function refText(ref: string): string {
  const name = refName(ref);
  return VALUE_TYPES[name] ?? `[${name}](#${anchor(name)})`;
}

/** A short type text of a schema node: "number > 0", "array of [node](#node)", "one of `a`, `b`". */
export function typeText(node: SchemaNode): string {
  if (node.$ref) return refText(node.$ref);
  if (node.const !== undefined) return `\`${JSON.stringify(node.const)}\``;
  if (node.enum) return `one of ${node.enum.map((v) => `\`${JSON.stringify(v)}\``).join(', ')}`;
  if (node.oneOf) return node.oneOf.map(typeText).join(' or ');
  if (node.type === 'array') return node.items ? `array of ${node.items.properties ? 'objects' : typeText(node.items)}` : 'array';
  if (node.type === 'object') return 'object';
  if (node.type === 'number' || node.type === 'integer') {
    const lo = node.exclusiveMinimum !== undefined ? `> ${node.exclusiveMinimum}` : node.minimum !== undefined ? `≥ ${node.minimum}` : '';
    const hi = node.maximum !== undefined ? `≤ ${node.maximum}` : '';
    const range = [lo, hi].filter(Boolean).join(', ');
    return range ? `${node.type} ${range}` : node.type;
  }
  return node.type ?? 'any';
}

interface Row { field: string; type: string; required: boolean; meaning: string }

/** Rows of an object's fields, inline objects and arrays of inline objects expanded as "a.b" and "a[].b". */
function rows(node: SchemaNode, prefix = ''): Row[] {
  const out: Row[] = [];
  const required = new Set(node.required ?? []);
  for (const [name, child] of Object.entries(node.properties ?? {})) {
    const field = `${prefix}${name}`;
    out.push({ field, type: typeText(child), required: required.has(name), meaning: child.description ?? '' });
    if (child.properties) out.push(...rows(child, `${field}.`));
    else if (child.items?.properties) out.push(...rows(child.items, `${field}[].`));
  }
  return out;
}

function table(list: Row[]): string[] {
  return [
    '| field | type | required | meaning and unit |',
    '| --- | --- | --- | --- |',
    ...list.map((r) => `| \`${r.field}\` | ${cell(r.type)} | ${r.required ? 'yes' : ''} | ${cell(r.meaning)} |`),
  ];
}

function variantTitle(v: SchemaNode, i: number): string {
  const kind = v.properties?.kind?.const;
  return kind !== undefined ? `\`kind: ${JSON.stringify(kind)}\`` : `form ${i + 1}`;
}

function definitionSection(name: string, def: SchemaNode): string[] {
  const out = [`### ${name}`, ''];
  if (def.description) out.push(def.description, '');
  if (def.properties) {
    out.push(...table(rows(def)), '');
  } else if (def.oneOf) {
    out.push('One of:', '');
    def.oneOf.forEach((v, i) => out.push(`${variantTitle(v, i)}`, '', ...table(rows(v)), ''));
  } else {
    out.push(`Type: ${typeText(def)}.`, '');
  }
  return out;
}

/** Every property of the schema (top level, definitions, nested, variants) that has no description. */
export function undescribedFields(schema: SchemaNode): string[] {
  const missing: string[] = [];
  const walk = (node: SchemaNode, path: string): void => {
    for (const [name, child] of Object.entries(node.properties ?? {})) {
      if (!child.description) missing.push(`${path}.${name}`);
      walk(child, `${path}.${name}`);
    }
    if (node.items) walk(node.items, `${path}[]`);
    node.oneOf?.forEach((v, i) => walk(v, `${path}|${i}`));
  };
  walk(schema, '');
  for (const [name, def] of Object.entries(schema.definitions ?? {})) {
    if (!def.description) missing.push(`#${name}`);
    walk(def, `#${name}`);
  }
  return missing;
}

export function projectReferenceMarkdown(schema: SchemaNode, schemaPath: string): string {
  const defs = schema.definitions ?? {};
  const out: string[] = [
    '# Project file reference',
    '',
    `<!-- Generated from ${schemaPath} by \`npm run gen:reference\`; do not edit by hand. -->`,
    '',
    `Every field of a Stayset project file (\`.stayset\`, ${schema.title ?? 'format "stayset-project"'}), with its type and its meaning and unit, from the`,
    `descriptions in the JSON Schema \`${schemaPath}\` that validates every file on load.`,
    'Units are SI throughout: m, N, kg, Pa, s; absolute temperatures and temperature changes in K (15 °C = 288.15 K);',
    'angles in degrees unless a field says rad; z is up. Forces are positive along the global axes; member tension is positive.',
    '',
    '> Results are for review by a qualified engineer; local codes and licensed practice govern.',
    '',
    '## Top level',
    '',
    ...table(rows(schema)),
    '',
    '## Objects',
    '',
  ];
  for (const [name, def] of Object.entries(defs)) {
    if (name in VALUE_TYPES) continue;
    out.push(...definitionSection(name, def));
  }
  out.push('## Value types', '', '| name | written as | meaning |', '| --- | --- | --- |');
  for (const [name, text] of Object.entries(VALUE_TYPES)) {
    if (defs[name]) out.push(`| ${name} | ${cell(text)} | ${cell(defs[name].description ?? '')} |`);
  }
  return `${out.join('\n')}\n`;
}
