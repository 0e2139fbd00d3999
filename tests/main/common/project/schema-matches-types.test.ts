// The JSON Schema must describe exactly the fields of solver/project/types.ts (the contract):
// same property names, same required/optional split, same order (serializeProject writes keys
// in schema order, which is meant to be the types' order). Read with the TypeScript compiler API.
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { defs, rootSchema, schemaFields, typeFile, type Schema } from './type-fields.ts';

const root = rootSchema;
const { source, interfaceFields, unionBranches } = typeFile('types.ts');

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
