/**
 * Development tool: writes the precompiled project validator next to the schema.
 * Run with `npm run gen:schema` after editing main/common/project/stayset-project.v1.schema.json.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { validatorSource } from '../../common/project/validation/validator-source.ts';

const target = fileURLToPath(new URL('../../common/project/validation/generated/stayset-project-v1.validate.js', import.meta.url));
writeFileSync(target, validatorSource());
process.stdout.write(`wrote ${target}\n`);
