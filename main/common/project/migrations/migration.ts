/**
 * One step of the project-file migration chain: a pure function from a document of format
 * version `fromVersion` to the same document at version `fromVersion + 1`.
 *
 * Adding a format version N+1:
 * 1. bump CURRENT_FORMAT_VERSION in format-version.ts and ship stayset-project.vN+1 schema/types;
 * 2. write `migrations/vN-to-vN+1.ts` exporting a Migration with fromVersion N that returns a
 *    new object (never mutate the input) whose `version` is N+1;
 * 3. append it to PROJECT_MIGRATIONS in registry.ts and add a test with a vN fixture.
 */
export type ProjectDocument = Record<string, unknown>;

export interface Migration {
  fromVersion: number;
  /** Short description for logs and the "migrated from" notice. */
  summary: string;
  migrate(doc: ProjectDocument): ProjectDocument;
}

/** Migrations ordered by fromVersion; must form an unbroken chain up to the current version. */
export type MigrationRegistry = readonly Migration[];
