/**
 * Brings a parsed document to the current format version: checks "format" and "version",
 * refuses files from a newer Stayset, and applies the registry's steps one version at a time.
 * Pure: the input is never changed (each step gets its own deep copy).
 */
import { CURRENT_FORMAT_VERSION, PROJECT_FORMAT } from './format-version.ts';
import { PROJECT_MIGRATIONS } from './registry.ts';
import type { MigrationRegistry, ProjectDocument } from './migration.ts';

export type MigrateOutcome =
  | { ok: true; doc: ProjectDocument; migratedFrom?: number }
  | { ok: false; errors: string[] };

export interface MigrateOptions {
  registry?: MigrationRegistry;
  currentVersion?: number;
}

function isRecord(v: unknown): v is ProjectDocument {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

const NOT_OURS = `this is not a Stayset project file (expected "format": "${PROJECT_FORMAT}")`;

export function migrateDocument(data: unknown, options: MigrateOptions = {}): MigrateOutcome {
  const registry = options.registry ?? PROJECT_MIGRATIONS;
  const current = options.currentVersion ?? CURRENT_FORMAT_VERSION;
  if (!isRecord(data)) {
    const what = Array.isArray(data) ? 'a list' : data === null ? 'null' : `a ${typeof data}`;
    return { ok: false, errors: [`project: the file holds ${what}, not a project object; ${NOT_OURS}`] };
  }
  if (!('format' in data)) return { ok: false, errors: [`project: "format" is missing; ${NOT_OURS}`] };
  if (data.format !== PROJECT_FORMAT) {
    return { ok: false, errors: [`project: "format" is ${JSON.stringify(data.format)}; ${NOT_OURS}`] };
  }
  const version = data.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { ok: false, errors: [`project: "version" must be a whole number of at least 1 (got ${JSON.stringify(version)})`] };
  }
  if (version > current) {
    return {
      ok: false,
      errors: [`project: this file was written by a newer Stayset (format version ${version}); this version reads up to ${current}`],
    };
  }
  let doc: ProjectDocument = data;
  for (let v = version; v < current; v++) {
    const step = registry.find((m) => m.fromVersion === v);
    if (!step) return { ok: false, errors: [`project: no migration from format version ${v} to ${v + 1} in this build`] };
    let next: ProjectDocument;
    try {
      next = step.migrate(structuredClone(doc));
    } catch (e) {
      return { ok: false, errors: [`project: migration from format version ${v} failed: ${(e as Error).message}`] };
    }
    if (!isRecord(next) || next.version !== v + 1) {
      return { ok: false, errors: [`project: migration from format version ${v} did not produce version ${v + 1}`] };
    }
    doc = next;
  }
  return version < current ? { ok: true, doc, migratedFrom: version } : { ok: true, doc };
}
