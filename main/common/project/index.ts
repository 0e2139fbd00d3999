/**
 * Project file I/O that runs anywhere (no Node): JSON Schema validation (ajv), semantic
 * checks, migrations between format versions, canonical serialisation. See README.md.
 */
export { parseProjectText } from './parse-project.ts';
export { validateProject, projectErrors } from './validate-project.ts';
export { serializeProject } from './text/serialize-project.ts';
export { projectSchema } from './validation/schema-validator.ts';
export { migrateDocument } from './migrations/migrate-document.ts';
export { CURRENT_FORMAT_VERSION, PROJECT_FORMAT } from './migrations/format-version.ts';
export { MAX_ERRORS } from './outcome.ts';
export type { ParseOutcome, ValidationOutcome } from './outcome.ts';
export type { MigrateOutcome, MigrateOptions } from './migrations/migrate-document.ts';
export type { Migration, MigrationRegistry, ProjectDocument } from './migrations/migration.ts';
