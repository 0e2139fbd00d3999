/**
 * Test helper: the fields of the project file's TypeScript contract (solver/project/*.ts, read
 * with the TypeScript compiler API) and of the JSON Schema, in the same form, so a test can
 * compare names, required/optional split and order.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { projectSchema } from '../../../../main/common/project/index.ts';

export type Schema = Record<string, unknown>;
export interface Field { name: string; optional: boolean }

export const rootSchema = projectSchema as Schema;
export const defs = rootSchema.definitions as Record<string, Schema>;

/** The `items` schema of array property `key` of `s`. */
export const items = (s: Schema, key: string): Schema => ((s.properties as Record<string, Schema>)[key].items as Schema);

/** Properties of a schema object, in order, optional unless required. */
export function schemaFields(s: Schema): Field[] {
  const required = new Set((s.required as string[] | undefined) ?? []);
  return Object.keys((s.properties as Schema | undefined) ?? {}).map((name) => ({ name, optional: !required.has(name) }));
}

/** Reader of one types file under solver/project (e.g. 'types.ts'). */
export function typeFile(file: string) {
  const path = fileURLToPath(new URL(`../../../../solver/project/${file}`, import.meta.url));
  const source = ts.createSourceFile(path, readFileSync(path, 'utf8'), ts.ScriptTarget.ES2022, true);
  const members = (list: ts.NodeArray<ts.TypeElement>): Field[] =>
    list.filter(ts.isPropertySignature).map((p) => ({ name: p.name.getText(source), optional: !!p.questionToken }));
  return {
    source,
    /** Fields of interface `name`, in order. */
    interfaceFields(name: string): Field[] {
      const decl = source.statements.find((s): s is ts.InterfaceDeclaration => ts.isInterfaceDeclaration(s) && s.name.text === name);
      if (!decl) throw new Error(`interface ${name} not found in ${file}`);
      return members(decl.members);
    },
    /** Fields of each object branch of union type `name`. */
    unionBranches(name: string): Field[][] {
      const decl = source.statements.find((s): s is ts.TypeAliasDeclaration => ts.isTypeAliasDeclaration(s) && s.name.text === name);
      if (!decl || !ts.isUnionTypeNode(decl.type)) throw new Error(`union ${name} not found in ${file}`);
      return decl.type.types.map((t) => {
        if (!ts.isTypeLiteralNode(t)) throw new Error(`${name}: branch is not an object type`);
        return members(t.members);
      });
    },
    /** Names of the interfaces the file declares. */
    interfaceNames: (): string[] => source.statements.filter(ts.isInterfaceDeclaration).map((s) => s.name.text),
  };
}
