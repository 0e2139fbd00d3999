// The JSON Schema must describe exactly the fields of solver/project/types.ts (the contract):
// same property names, same required/optional split, same order (serializeProject writes keys
// in schema order, which is meant to be the types' order). Read with the TypeScript compiler API.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { projectSchema } from '../../../../main/common/project/index.ts';

type Schema = Record<string, unknown>;
const root = projectSchema as Schema;
const defs = root.definitions as Record<string, Schema>;

const typesPath = fileURLToPath(new URL('../../../../solver/project/types.ts', import.meta.url));
const source = ts.createSourceFile(typesPath, readFileSync(typesPath, 'utf8'), ts.ScriptTarget.ES2022, true);

interface Field {
  name: string;
  optional: boolean;
}

function members(list: ts.NodeArray<ts.TypeElement>): Field[] {
  return list.filter(ts.isPropertySignature).map((p) => ({ name: p.name.getText(source), optional: !!p.questionToken }));
}

function interfaceFields(name: string): Field[] {
  const decl = source.statements.find((s): s is ts.InterfaceDeclaration => ts.isInterfaceDeclaration(s) && s.name.text === name);
  if (!decl) throw new Error(`interface ${name} not found in types.ts`);
  return members(decl.members);
}

function unionBranches(name: string): Field[][] {
  const decl = source.statements.find((s): s is ts.TypeAliasDeclaration => ts.isTypeAliasDeclaration(s) && s.name.text === name);
  if (!decl || !ts.isUnionTypeNode(decl.type)) throw new Error(`union ${name} not found in types.ts`);
  return decl.type.types.map((t) => {
    if (!ts.isTypeLiteralNode(t)) throw new Error(`${name}: branch is not an object type`);
    return members(t.members);
  });
}

function schemaFields(s: Schema): Field[] {
  const required = new Set((s.required as string[] | undefined) ?? []);
  return Object.keys((s.properties as Schema | undefined) ?? {}).map((name) => ({ name, optional: !required.has(name) }));
}

const INTERFACES: [string, Schema][] = [
  ['ProjectFile', root],
  ['ProjectMeta', defs.meta],
  ['NodeSpec', defs.node],
  ['SectionSpec', defs.section],
  ['MemberSpec', defs.member],
  ['NodalLoadSpec', defs.nodalLoad],
  ['WindSpec', defs.wind],
  ['IceSpec', defs.ice],
  ['LoadCaseSpec', defs.loadCase],
  ['GroupSpec', defs.group],
  ['CombinationSpec', defs.combination],
  ['CheckSettings', defs.checks],
  ['TuningSpec', defs.tuning],
  ['InstallationSpec', defs.installation],
  ['GeneratorRecord', defs.generator],
  ['DisplaySettings', defs.display],
];

describe('schema matches solver/project/types.ts', () => {
  it.each(INTERFACES)('%s: same fields, optionality and order', (name, schema) => {
    expect(schemaFields(schema)).toEqual(interfaceFields(name));
    expect(schema.additionalProperties).toBe(false);
  });

  it.each([
    ['WindProfileSpec', defs.windProfile],
    ['TuningTarget', defs.tuningTarget],
    ['SagLimit', defs.sagLimit],
  ])('%s: one schema branch per union member', (name, schema) => {
    const branches = (schema.oneOf as Schema[]).map(schemaFields);
    expect(branches).toEqual(unionBranches(name));
  });

  it('every interface and union of types.ts is covered', () => {
    const declared = source.statements
      .filter((s) => ts.isInterfaceDeclaration(s) || (ts.isTypeAliasDeclaration(s) && ts.isUnionTypeNode(s.type)))
      .map((s) => (s as ts.InterfaceDeclaration).name.text);
    const covered = [...INTERFACES.map(([n]) => n), 'WindProfileSpec', 'TuningTarget', 'SagLimit', 'MemberKind'];
    expect(declared.filter((n) => !covered.includes(n))).toEqual([]);
  });
});
