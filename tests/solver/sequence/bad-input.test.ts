/** Sequences and measurement sets that name things that do not exist get messages naming the entry. */
import { describe, expect, it } from 'vitest';
import { runAsBuilt, runSequence } from '../../../solver/index.ts';
import { parseProjectText, serializeProject } from '../../../main/common/project/index.ts';
import { smallMast } from './small-mast.ts';

describe('sequence and site-measurement input', () => {
  it('names the step and the unknown member, group, node or repeated member', () => {
    const p = smallMast();
    p.sequences = [{ id: 's', steps: [{ members: ['m/guy L1-1'], setBy: 'force' }, { members: ['nope'], setBy: 'force' }] }];
    expect(() => runSequence(p, 's')).toThrow('sequences[0] "s".steps[1]: member "nope" does not exist');
    p.sequences = [{ id: 's', steps: [{ group: 'm/guys level 1', setBy: 'force' }, { members: ['m/guy L1-2'], setBy: 'length' }] }];
    expect(() => runSequence(p, 's')).toThrow('steps[1]: member "m/guy L1-2" is already tensioned in step 0');
    p.sequences = [{ id: 's', steps: [{ group: 'nope', setBy: 'force' }] }];
    expect(() => runSequence(p, 's')).toThrow('group "nope" does not exist');
    p.sequences = [{ id: 's', steps: [{ group: 'm/guys', setBy: 'force' }], temporaryRestraints: [{ node: 'X', fixed: 'xy' }] }];
    expect(() => runSequence(p, 's')).toThrow('temporaryRestraints[0]: node "X" does not exist');
    expect(() => runSequence(p, 'other')).toThrow('sequence "other" does not exist');
  });

  it('names the reading with an unknown member', () => {
    const p = smallMast();
    p.siteMeasurements = [{ id: 'm', tensions: [{ member: 'ghost', method: 'dynamometer', value: 1e4, accuracy: 0.02, temperature: 288.15 }] }];
    expect(() => runAsBuilt(p, 'm')).toThrow('siteMeasurements[0] "m".tensions[0]: member "ghost" does not exist');
  });

  it('the project file validates sequences and measurements (schema) and keeps them on save', () => {
    const p = smallMast();
    p.sequences = [{ id: 's', steps: [{ group: 'm/guys', setBy: 'force' }], forceTolerance: 0.05 }];
    p.siteMeasurements = [{ id: 'm', tensions: [{ member: 'm/guy L1-1', method: 'sag', value: 0.3, accuracy: 0.05, temperature: 288.15 }] }];
    p.report = { documentNumber: 'D-1', revisions: [{ revision: 'A', date: '2026-12-01', description: 'first' }] };
    const text = serializeProject(p);
    const back = parseProjectText(text);
    expect(back.ok).toBe(true);
    const bad = JSON.parse(text);
    bad.sequences[0].steps[0].setBy = 'torque';
    bad.siteMeasurements[0].tensions[0].method = 'guess';
    const r = parseProjectText(JSON.stringify(bad));
    expect(r.ok).toBe(false);
    const errors = r.ok ? [] : r.errors.join('\n');
    expect(errors).toContain('sequences');
    expect(errors).toContain('siteMeasurements');
  });
});
