// Canonical text: key order of types.ts, stable, trailing newline, and every double read back
// bit for bit (IEEE 754 binary64 identity checked with Object.is).
import { describe, expect, it } from 'vitest';
import { parseProjectText, serializeProject } from '../../../../main/common/project/index.ts';
import type { ProjectFile } from '../../../../solver/index.ts';
import { SPEC_SUBSET, fixtureText } from './fixtures.ts';

function parsed(text: string): ProjectFile {
  const r = parseProjectText(text);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.project;
}

/** Deterministic pseudo-random doubles from random 64-bit patterns (xorshift64*, Vigna 2016). */
function randomDoubles(count: number): number[] {
  let s = 0x9e3779b97f4a7c15n;
  const out: number[] = [];
  const view = new DataView(new ArrayBuffer(8));
  while (out.length < count) {
    s ^= s >> 12n;
    s ^= (s << 25n) & 0xffffffffffffffffn;
    s ^= s >> 27n;
    view.setBigUint64(0, (s * 0x2545f4914f6cdd1dn) & 0xffffffffffffffffn);
    const d = view.getFloat64(0);
    if (Number.isFinite(d)) out.push(d);
  }
  return out;
}

/** A deep copy with every object's keys in reverse order. */
function reverseKeys(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(reverseKeys);
  if (typeof v !== 'object' || v === null) return v;
  return Object.fromEntries(Object.entries(v).reverse().map(([k, x]) => [k, reverseKeys(x)]));
}

describe('serializeProject', () => {
  it('round-trips the demo mast and is stable (serialising twice gives the same text)', () => {
    const p = parsed(fixtureText('kestrel-moor-mast.stayset.json'));
    const text = serializeProject(p);
    expect(text.endsWith('}\n')).toBe(true);
    expect(parsed(text)).toEqual(p);
    expect(serializeProject(parsed(text))).toBe(text);
  });

  it('writes keys in the order of the types, whatever order they were read in', () => {
    const p = parsed(SPEC_SUBSET);
    const scrambled = reverseKeys(p) as ProjectFile;
    expect(Object.keys(scrambled)[0]).not.toBe('format');
    const text = serializeProject(scrambled);
    expect(text).toBe(serializeProject(p));
    expect(Object.keys(JSON.parse(text))).toEqual(['format', 'version', 'nodes', 'sections', 'members', 'loadCases']);
    expect(Object.keys(JSON.parse(text).members[0])).toEqual(['id', 'kind', 'from', 'to', 'section', 'segments', 'unstressedLength']);
  });

  it('keeps short lists of numbers on one line', () => {
    expect(serializeProject(parsed(SPEC_SUBSET))).toContain('"at": [40, 0, 30]');
  });

  it('reads back 2000 random doubles and -0 exactly', () => {
    const p = parsed(SPEC_SUBSET);
    const values = [...randomDoubles(2000), -0, 5e-324, Number.MAX_VALUE, 0.1 + 0.2];
    p.installation = { temperatures: values };
    const back = JSON.parse(serializeProject(p)).installation.temperatures as number[];
    expect(back.length).toBe(values.length);
    expect(back.every((v, i) => Object.is(v, values[i]))).toBe(true);
  });

  it('keeps free-form generator parameters in the order written', () => {
    const p = parsed(SPEC_SUBSET);
    p.generators = [{ id: 'g', kind: 'radialNet', params: { zeta: 1, alpha: { b: 2, a: 1 } } }];
    const back = JSON.parse(serializeProject(p));
    expect(Object.keys(back.generators[0].params)).toEqual(['zeta', 'alpha']);
    expect(Object.keys(back.generators[0].params.alpha)).toEqual(['b', 'a']);
  });

  it('refuses to write a non-finite number, naming where it is', () => {
    const p = parsed(SPEC_SUBSET);
    p.nodes[1].at = [40, NaN, 30];
    expect(() => serializeProject(p)).toThrow('cannot save project.nodes[1].at[1]: NaN is not a finite number');
  });
});
