/**
 * JSON Schema check of a project document against stayset-project.v1.schema.json (draft-07),
 * compiled once with ajv. Numbers must be finite (ajv strictNumbers: NaN and ±Infinity fail the
 * "number" type), every error is collected (allErrors), messages come from ajv-error-text.ts.
 */
import Ajv from 'ajv';
import type { ValidateFunction } from 'ajv';
import schema from '../stayset-project.v1.schema.json' with { type: 'json' };
import { ajvErrorsText } from './ajv-error-text.ts';

let compiled: ValidateFunction | undefined;

function validator(): ValidateFunction {
  if (!compiled) {
    const ajv = new Ajv({ allErrors: true, verbose: true, strictNumbers: true, discriminator: true });
    ajv.addKeyword({ keyword: 'x-message', schemaType: ['string', 'object'] });
    ajv.addKeyword({ keyword: 'x-field-up', schemaType: 'number' });
    compiled = ajv.compile(schema);
  }
  return compiled;
}

/** The project JSON Schema (draft-07) as shipped, for tools and editors. */
export const projectSchema: object = schema;

/** Schema errors of a parsed document as messages; empty when the document matches. */
export function schemaErrors(data: unknown): string[] {
  const validate = validator();
  if (validate(data)) return [];
  return ajvErrorsText(data, validate.errors ?? []);
}
