/**
 * JSON Schema check of a project document against stayset-project.v1.schema.json (draft-07),
 * through the precompiled validator in generated/ (no `new Function` at run time, so it works
 * under the app's Content-Security-Policy; see validator-source.ts). Numbers must be finite
 * (ajv strictNumbers: NaN and ±Infinity fail the "number" type); every error is collected;
 * messages come from ajv-error-text.ts.
 */
import schema from '../stayset-project.v1.schema.json' with { type: 'json' };
import validate from './generated/stayset-project-v1.validate.js';
import { ajvErrorsText } from './ajv-error-text.ts';

/** The project JSON Schema (draft-07) as shipped, for tools and editors. */
export const projectSchema: object = schema;

/** Schema errors of a parsed document as messages; empty when the document matches. */
export function schemaErrors(data: unknown): string[] {
  if (validate(data)) return [];
  return ajvErrorsText(data, validate.errors ?? []);
}
