/**
 * validateProject: format/version check and migration, then the JSON Schema and the semantic
 * checks (unique ids, references, values). Every problem is collected, not just the first.
 * The document is kept as written: no defaults are filled in (the solver applies them).
 */
import type { ProjectFile } from '../../../solver/index.ts';
import { capErrors } from './outcome.ts';
import type { ValidationOutcome } from './outcome.ts';
import { migrateDocument } from './migrations/migrate-document.ts';
import type { MigrateOptions } from './migrations/migrate-document.ts';
import { schemaErrors } from './validation/schema-validator.ts';
import { duplicateIdErrors } from './validation/id-checks.ts';
import { referenceErrors } from './validation/reference-checks.ts';
import { valueErrors } from './validation/value-checks.ts';
import { actionErrors } from './validation/actions-checks.ts';

/** Schema plus semantic problems of a current-version document (no migration). */
export function projectErrors(doc: unknown): string[] {
  const all = [...schemaErrors(doc), ...duplicateIdErrors(doc), ...referenceErrors(doc), ...valueErrors(doc), ...actionErrors(doc)];
  return [...new Set(all)];
}

export function validateProject(data: unknown, options: MigrateOptions = {}): ValidationOutcome {
  const migrated = migrateDocument(data, options);
  if (!migrated.ok) return migrated;
  const errors = projectErrors(migrated.doc);
  if (errors.length > 0) return { ok: false, errors: capErrors(errors) };
  const project = migrated.doc as unknown as ProjectFile;
  return migrated.migratedFrom === undefined ? { ok: true, project } : { ok: true, project, migratedFrom: migrated.migratedFrom };
}
