/** The production migration chain, one pure step per format version (see migration.ts). */
import type { MigrationRegistry } from './migration.ts';
import { v1ToV2 } from './v1-to-v2.ts';

export const PROJECT_MIGRATIONS: MigrationRegistry = [v1ToV2];
