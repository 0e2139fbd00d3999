// The schema's "schedule" and "tuningRunRecord" definitions describe exactly the interfaces of
// solver/project/schedule-types.ts (same method as schema-matches-types.test.ts).
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { projectSchema } from '../../../../main/common/project/index.ts';

type Schema = Record<string, unknown>;
const defs = (projectSchema as Schema).definitions as Record<string, Schema>;
const typesPath = fileURLToPath(new URL('../../../../solver/project/schedule-types.ts', import.meta.url));
const source = ts.createSourceFile(typesPath, readFileSync(typesPath, 'utf8'), ts.ScriptTarget.ES2022, true);
function interfaceFields(name: string) {
  const decl = source.statements.find((s): s is ts.InterfaceDeclaration => ts.isInterfaceDeclaration(s) && s.name.text === name);
  if (!decl) throw new Error(`interface ${name} not found`);
  return decl.members.filter(ts.isPropertySignature).map((p) => ({ name: p.name.getText(source), optional: !!p.questionToken }));
}
function schemaFields(s: Schema) {
  const required = new Set((s.required as string[] | undefined) ?? []);
  return Object.keys((s.properties as Schema | undefined) ?? {}).map((name) => ({ name, optional: !required.has(name) }));
}
const items = (s: Schema, key: string) => ((s.properties as Record<string, Schema>)[key].items as Schema);

describe('schema matches solver/project/schedule-types.ts', () => {
  const pairs: [string, Schema][] = [
    ['ScheduleSpec', defs.schedule], ['TuningRunRecord', defs.tuningRunRecord],
    ['TuningRunTarget', items(defs.tuningRunRecord, 'targets')], ['TuningRunVariable', items(defs.tuningRunRecord, 'variables')],
  ];
  it.each(pairs)('%s: same fields, optionality and order', (name, schema) => {
    expect(schemaFields(schema)).toEqual(interfaceFields(name));
    expect(schema.additionalProperties).toBe(false);
  });
  it('every interface of schedule-types.ts is covered', () => {
    const declared = source.statements.filter(ts.isInterfaceDeclaration).map((s) => s.name.text);
    expect(declared.filter((n) => !pairs.some(([p]) => p === n))).toEqual([]);
  });
  it('tuning.lastRun is the record', () => {
    expect(((defs.tuning.properties as Record<string, Schema>).lastRun).$ref).toBe('#/definitions/tuningRunRecord');
  });
});
