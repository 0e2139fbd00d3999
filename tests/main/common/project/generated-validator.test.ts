// The precompiled validator must be generated from the schema as it stands now, and must not
// need eval (the renderer's Content-Security-Policy forbids it).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validatorSource } from '../../../../main/common/project/validation/validator-source.ts';

const generatedPath = new URL('../../../../main/common/project/validation/generated/stayset-project-v1.validate.js', import.meta.url);

describe('precompiled project validator', () => {
  it('is up to date with stayset-project.v1.schema.json (else run `npm run gen:schema`)', () => {
    expect(readFileSync(generatedPath, 'utf8')).toBe(validatorSource());
  });

  it('contains no eval, new Function or require', () => {
    const code = readFileSync(generatedPath, 'utf8');
    expect(code).not.toMatch(/new Function|\beval\(|\brequire\(/);
  });
});
