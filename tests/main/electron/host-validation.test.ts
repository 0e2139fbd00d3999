/** Argument validation shared by both hosts: every method, with messages naming the argument. */
import { describe, expect, it } from 'vitest';
import { validateHostArgs } from '../../../main/common/host-validation.ts';
import { HOST_METHODS, isHostMethodName } from '../../../main/common/web-protocol.ts';
import { sampleMast } from '../store/sample-project.ts';

describe('validateHostArgs', () => {
  it('accepts good calls', () => {
    expect(validateHostArgs('open', [])).toEqual({ ok: true, value: [undefined] });
    expect(validateHostArgs('save', ['/p/a.stayset', sampleMast()])).toMatchObject({ ok: true });
    expect(validateHostArgs('autosave', [null, sampleMast()])).toMatchObject({ ok: true, value: [null, sampleMast()] });
    expect(validateHostArgs('setDirty', [true, 'x'])).toEqual({ ok: true, value: [true, 'x'] });
    expect(validateHostArgs('cancelAnalysis', ['0123456789abcdef'])).toMatchObject({ ok: true });
  });

  it.each([
    ['kind', [1], 'kind: expected at most 0 argument(s), got 1'],
    ['open', [''], 'open: argument 1 (path) must be a non-empty string'],
    ['open', ['a\0b'], 'open: argument 1 (path) contains a NUL character'],
    ['open', ['x'.repeat(5000)], 'open: argument 1 (path) is longer than 4096 characters'],
    ['save', ['/a.stayset', 'text'], 'save: argument 2 (project) must be a project object'],
    ['recover', ['ABC'], 'recover: argument 1 (id) must be an id of 8–64 hex digits'],
    ['setDirty', ['yes', 't'], 'setDirty: argument 1 (dirty) must be true or false'],
    ['setDirty', [true, 3], 'setDirty: argument 2 (title) must be a string'],
  ] as const)('%s %j → %s', (method, args, message) => {
    expect(validateHostArgs(method, [...args])).toEqual({ ok: false, error: message });
  });

  it('runs the full project validation and names the entry', () => {
    const p = sampleMast();
    p.members[2].to = 'NOWHERE';
    const r = validateHostArgs('runAnalysis', [p]);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.error).toMatch(/^runAnalysis: argument 1 \(project\) is not a valid project: .*NOWHERE/);
  });

  it('refuses non-array arguments and knows the method list', () => {
    expect(validateHostArgs('kind', 'x' as unknown)).toEqual({ ok: false, error: 'kind: arguments must be an array' });
    expect(HOST_METHODS).toContain('printReady');
    expect(isHostMethodName('constructor')).toBe(false);
    expect(isHostMethodName('__proto__')).toBe(false);
  });
});
