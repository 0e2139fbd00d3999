// The schema's design-basis parts describe exactly solver/project/design-basis-types.ts (same
// fields, optionality and order), read with the TypeScript compiler like schema-matches-types.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { projectSchema } from '../../../../main/common/project/index.ts';

type Schema = Record<string, unknown>;
const defs = (projectSchema as Schema).definitions as Record<string, Schema>;
const props = (s: Schema) => (s.properties as Record<string, Schema>);
const path = fileURLToPath(new URL('../../../../solver/project/design-basis-types.ts', import.meta.url));
const source = ts.createSourceFile(path, readFileSync(path, 'utf8'), ts.ScriptTarget.ES2022, true);

function fields(name: string): { name: string; optional: boolean }[] {
  const decl = source.statements.find((s): s is ts.InterfaceDeclaration => ts.isInterfaceDeclaration(s) && s.name.text === name);
  if (!decl) throw new Error(`interface ${name} not found`);
  return decl.members.filter(ts.isPropertySignature).map((p) => ({ name: p.name.getText(source), optional: !!p.questionToken }));
}
function schemaFields(s: Schema): { name: string; optional: boolean }[] {
  const required = new Set((s.required as string[] | undefined) ?? []);
  return Object.keys(props(s)).map((name) => ({ name, optional: !required.has(name) }));
}
function unionValues(name: string): string[] {
  const decl = source.statements.find((s): s is ts.TypeAliasDeclaration => ts.isTypeAliasDeclaration(s) && s.name.text === name)!;
  return (decl.type as ts.UnionTypeNode).types.map((t) => ((t as ts.LiteralTypeNode).literal as ts.StringLiteral).text);
}

const basis = defs.designBasis;
const checks = props(defs.checks);
const item = (s: Schema) => s.items as Schema;

describe('schema matches solver/project/design-basis-types.ts', () => {
  it.each([
    ['DesignBasis', basis],
    ['ActionFactors', props(basis).actionFactors],
    ['CombinationFactors', props(basis).combinationFactors],
    ['CableResistanceFactors', props(basis).cable],
    ['SteelMemberFactors', props(basis).steel],
    ['AllowableFactors', props(basis).allowable],
    ['MinimumTensionRule', item(checks.minimumTension)],
    ['MemberDesignRule', item(checks.memberDesign)],
    ['TwistLimit', item(checks.twistLimits)],
  ] as [string, Schema][])('%s: same fields, optionality and order', (name, schema) => {
    expect(schemaFields(schema)).toEqual(fields(name));
    expect(schema.additionalProperties).toBe(false);
  });

  it('enumerations match the unions', () => {
    expect(defs.casePurpose.enum).toEqual(unionValues('CasePurpose'));
    expect(props(defs.loadCase).action.enum).toEqual(unionValues('ActionKind'));
    expect(props(basis).format.enum).toEqual(unionValues('CheckFormat'));
    expect(props(defs.section).termination.enum).toEqual(unionValues('TerminationKind'));
    expect(props(defs.section).shape.enum).toEqual(unionValues('SectionShape'));
    expect(props(defs.section).bucklingCurve.enum).toEqual(unionValues('BucklingCurve'));
  });
});
