/**
 * Development tool: writes docs/project-file-reference.md from the project schema's descriptions.
 * Run with `npm run gen:reference` after editing main/common/project/stayset-project.v1.schema.json
 * (a test fails while the committed reference differs from what this writes).
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { projectReferenceMarkdown, undescribedFields } from './project-reference.ts';
import type { SchemaNode } from './project-reference.ts';

export const SCHEMA_PATH = 'main/common/project/stayset-project.v1.schema.json';
export const REFERENCE_PATH = 'docs/project-file-reference.md';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const schema = JSON.parse(readFileSync(`${root}${SCHEMA_PATH}`, 'utf8')) as SchemaNode;
const missing = undescribedFields(schema);
if (missing.length > 0) process.stderr.write(`note: ${missing.length} schema field(s) have no description: ${missing.join(', ')}\n`);
const target = `${root}${REFERENCE_PATH}`;
mkdirSync(dirname(target), { recursive: true });
writeFileSync(target, projectReferenceMarkdown(schema, SCHEMA_PATH));
process.stdout.write(`wrote ${target}\n`);
