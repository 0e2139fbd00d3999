// The CLI's JSON writer against the reference it must reproduce: JSON.stringify(v, null, 2)
// (ECMA-262 JSON.stringify) with lists of plain numbers joined onto one line.
import { describe, expect, it } from 'vitest';
import { jsonOutput } from '../../../main/cli/format/json-output.ts';
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

  it('prints typed arrays as number lists', () => {
    expect(jsonOutput({ a: new Float64Array([1, 2.5]) })).toBe('{\n  "a": [1, 2.5]\n}\n');
  });

  it('appends the stats object as the last property, valid JSON', () => {
    const t = { inputSeconds: 0.1, analysisSeconds: 0.2, newtonSeconds: 0.3, outputSeconds: 0.05, seconds: 0.5 };
    const text = withStatsProperty(jsonOutput({ cases: [], disclaimer: 'x' }), t);
    expect(JSON.parse(text)).toEqual({ cases: [], disclaimer: 'x', stats: t });
  });
});
