// The schema's "schedule" and "tuningRunRecord" definitions describe exactly the interfaces of
// solver/project/schedule-types.ts (same method as schema-matches-types.test.ts).
import { describe, expect, it } from 'vitest';
import { defs, items, schemaFields, typeFile, type Schema } from './type-fields.ts';

const { interfaceFields, interfaceNames } = typeFile('schedule-types.ts');

describe('schema matches solver/project/schedule-types.ts', () => {
  const pairs: [string, Schema][] = [
    ['ScheduleSpec', defs.schedule], ['TuningRunRecord', defs.tuningRunRecord],
    ['TuningRunTarget', items(defs.tuningRunRecord, 'targets')], ['TuningRunVariable', items(defs.tuningRunRecord, 'variables')],
  ];
  it.each(pairs)('%s: same fields, optionality and order', (name, schema) => {
    expect(schemaFields(schema)).toEqual(interfaceFields(name));
    expect(schema.additionalProperties).toBe(false);
  });
  it('every interface of schedule-types.ts is covered', () => {
    const declared = interfaceNames();
    expect(declared.filter((n) => !pairs.some(([p]) => p === n))).toEqual([]);
  });
  it('tuning.lastRun is the record', () => {
    expect(((defs.tuning.properties as Record<string, Schema>).lastRun).$ref).toBe('#/definitions/tuningRunRecord');
  });
});
