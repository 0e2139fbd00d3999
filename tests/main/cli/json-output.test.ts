// The CLI's JSON writer against the reference it must reproduce: JSON.stringify(v, null, 2)
// (ECMA-262 JSON.stringify) with lists of plain numbers joined onto one line.
import { describe, expect, it } from 'vitest';
import { jsonOutput, jsonOutputChunks } from '../../../main/cli/format/json-output.ts';
import { nonFinitePaths, replaceNonFinite } from '../../../main/cli/format/finite-guard.ts';
import { withStatsProperty } from '../../../main/cli/format/run-times.ts';

/** Reference: the standard pretty printer, then number lists put on one line. */
function reference(v: unknown): string {
  const pretty = JSON.stringify(v, null, 2);
  return `${pretty.replace(/\[\n\s*((?:-?[\d.eE+-]+|null)(?:,\n\s*(?:-?[\d.eE+-]+|null))*)\n\s*\]/g, (_m, body: string) => `[${body.split(/,\n\s*/).join(', ')}]`)}\n`;
}

describe('jsonOutput', () => {
  const sample = {
    cases: [
      { id: 'dead "1"', converged: true, nodes: [{ id: 'A', position: [1.5, -2e-7, 1e21], displacement: [0, -0, 3] }], empty: [], none: {} },
      { id: 'b', skipped: undefined, mixed: [1, 'a', null, [2, 3]], nested: [[1, 2], [3, null]], flags: [true, false] },
    ],
    nonFinite: [NaN, Infinity, 1],
    text: 'line\nbreak \u2028 é',
    date: new Date(0),
  };

  it('matches JSON.stringify(v, null, 2) with number lists on one line', () => {
    expect(jsonOutput(sample)).toBe(reference(sample));
  });

  it('parses back to what JSON.parse(JSON.stringify(v)) gives', () => {
    expect(JSON.parse(jsonOutput(sample))).toEqual(JSON.parse(JSON.stringify(sample)));
  });

  // Flat objects (only numbers, strings, booleans, null and number lists) take the re-spacing of
  // JSON.stringify's compact text; strings with escapes, ":" "," "{" "}" "[" "]" inside, non-ASCII
  // text (2-, 3- and 4-byte UTF-8) and lone surrogates must come out as the reference writes them.
  const flat = {
    members: [
      { id: 'X0_1', tensionMax: 48711.5641242316, slack: false, sag: 0, none: null, skip: undefined, f: () => 1 },
      { id: 'a,b:{c}[d] "q" \\ \t', list: [1, -2.5e-9, null, NaN], empty: [], é: 'ü€😀', lone: '\ud800x' },
      { 'key with "quotes"': 1, nested: { a: [1, 2] } },
      {},
    ],
  };

  it('writes flat objects as the reference does', () => {
    expect(jsonOutput(flat)).toBe(reference(flat));
  });

  it('gives the same text in chunks of any size (never splitting a character)', () => {
    for (const v of [sample, flat]) {
      const whole = jsonOutput(v);
      for (const size of [64, 97, 200]) {
        const chunks: string[] = [];
        const rest = jsonOutputChunks(v, (c) => { chunks.push(c); }, size);
        expect(chunks.length).toBeGreaterThan(0);
        for (const c of chunks) expect(Buffer.byteLength(c)).toBeLessThanOrEqual(size);
        expect(chunks.join('') + rest).toBe(whole);
        expect(rest.endsWith('}\n')).toBe(true);
      }
    }
  });

  it('a string longer than a chunk goes out whole', () => {
    const v = { text: 'é'.repeat(300), n: [1, 2] };
    const chunks: string[] = [];
    const rest = jsonOutputChunks(v, (c) => { chunks.push(c); }, 64);
    expect(chunks.join('') + rest).toBe(reference(v));
  });

  it('nonFinitePaths lists what replaceNonFinite replaces, in the same order', () => {
    const v = { a: [1, NaN, { b: -Infinity }], c: new Float64Array([0, Infinity]), d: { e: 'x', f: null, g: [[NaN]] } };
    expect(nonFinitePaths(v)).toEqual(replaceNonFinite(v).paths);
    expect(nonFinitePaths(v)).toEqual(['a[1]', 'a[2].b', 'c[1]', 'd.g[0][0]']);
    expect(nonFinitePaths(sample)).toEqual(['nonFinite[0]', 'nonFinite[1]']);
  });

  it('prints typed arrays as number lists', () => {
    expect(jsonOutput({ a: new Float64Array([1, 2.5]) })).toBe('{\n  "a": [1, 2.5]\n}\n');
  });

  it('appends the stats object as the last property, valid JSON', () => {
    const t = { inputSeconds: 0.1, analysisSeconds: 0.2, newtonSeconds: 0.3, outputSeconds: 0.05, seconds: 0.5 };
    const text = withStatsProperty(jsonOutput({ cases: [], disclaimer: 'x' }), t);
    expect(JSON.parse(text)).toEqual({ cases: [], disclaimer: 'x', stats: t });
  });
});
