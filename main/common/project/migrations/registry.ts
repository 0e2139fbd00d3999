/**
 * The production migration chain. Format version 1 is the first, so there is nothing to
 * migrate yet; see migration.ts for how to add a step.
 */
import type { MigrationRegistry } from './migration.ts';

export const PROJECT_MIGRATIONS: MigrationRegistry = [];
