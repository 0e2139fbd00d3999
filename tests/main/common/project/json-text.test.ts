// JSON syntax: the scanner must agree with JSON.parse (the engine's ECMA-404 / RFC 8259 parser,
// used as the reference) on which texts are valid, and locate problems by line and column.
import { describe, expect, it } from 'vitest';
import { scanJson, lineColumn } from '../../../../main/common/project/text/json-scan.ts';
import { parseProjectText } from '../../../../main/common/project/index.ts';
import { SPEC_SUBSET, fixtureText } from './fixtures.ts';

const SAMPLES = [
  '0', '-0', '1.5e-3', '1E+9', '-12.25', '01', '1.', '.5', '-', '+1', '1e', '0x10', '1.2.3',
  '"a"', '"\\u00e9\\n"', '"\\x"', '"tab\there"', '"open', "'single'",
  'true', 'false', 'null', 'tru', 'nul', 'True', 'NaN', 'Infinity',
  '[]', '[1, 2]', '[1,]', '[,1]', '[1 2]', '[', '[[[]]]',
  '{}', '{"a": 1}', '{"a": 1,}', '{a: 1}', '{"a" 1}', '{"a": }', '{"a": 1 "b": 2}', '{',
  ' \n {"a": [1, {"b": null}]} \n', '{} {}', '[] x', '',
];

describe('JSON syntax scanner', () => {
  it.each(SAMPLES)('agrees with JSON.parse on %j', (text) => {
    let valid = true;
    try {
      JSON.parse(text);
    } catch {
      valid = false;
    }
    expect(scanJson(text) === null).toBe(valid);
  });

  it('flags a property written twice in one object (JSON.parse would keep only the last)', () => {
    const p = scanJson('{\n  "E": 1,\n  "E": 2\n}');
    expect(p?.problem).toBe('property "E" appears twice in the same object');
    expect(lineColumn('{\n  "E": 1,\n  "E": 2\n}', p!.offset)).toEqual({ line: 3, column: 3 });
  });

  it('line and column of a missing value', () => {
    const text = '{\n  "a": 1,\n  "b": }';
    const p = scanJson(text)!;
    expect(lineColumn(text, p.offset)).toEqual({ line: 3, column: 8 });
  });
});

describe('parseProjectText on broken text', () => {
  it('empty and blank files', () => {
    for (const text of ['', '   \n\t', '\uFEFF']) {
      expect(parseProjectText(text)).toEqual({ ok: false, errors: ['the file is empty (no JSON at all)'] });
    }
  });

  it('a truncated file says so, with where it ends', () => {
    const text = fixtureText('bad-truncated.stayset.json');
    const lines = text.split('\n');
    const r = parseProjectText(text);
    expect(r.ok).toBe(false);
    const msg = r.ok ? '' : r.errors[0];
    expect(msg).toMatch(/^the file is truncated: it ends at line (\d+), column (\d+) in the middle of the JSON/);
    const [, line, column] = /line (\d+), column (\d+)/.exec(msg)!;
    expect(Number(line)).toBe(lines.length);
    expect(Number(column)).toBe(lines[lines.length - 1].length + 1);
  });

  it('every cut of a valid file is reported as truncated, never as a crash', () => {
    for (let cut = 1; cut < SPEC_SUBSET.trimEnd().length; cut += 7) {
      const r = parseProjectText(SPEC_SUBSET.slice(0, cut));
      expect(r.ok).toBe(false);
      expect(r.ok ? '' : r.errors[0]).toMatch(/^the file is truncated/);
    }
  });

  it('a trailing comma: line and column of the comma\'s closing brace', () => {
    const text = '{ "format": "stayset-project",\n  "version": 1, }';
    expect(parseProjectText(text)).toEqual({
      ok: false,
      errors: ['not valid JSON at line 2, column 17: a comma before "}" (trailing commas are not allowed)'],
    });
  });

  it('text that is not JSON at all', () => {
    const r = parseProjectText(fixtureText('bad-not-json.stayset.json'));
    expect(r).toEqual({ ok: false, errors: ['not valid JSON at line 1, column 1: unexpected "#" where a value was expected'] });
  });

  it('a leading byte-order mark is accepted', () => {
    expect(parseProjectText(`\uFEFF${SPEC_SUBSET}`).ok).toBe(true);
  });
});

describe('nesting limit', () => {
  it('refuses absurdly deep nesting with a message instead of a stack overflow', () => {
    const deep = `${'['.repeat(100_000)}${']'.repeat(100_000)}`;
    expect(scanJson(deep)?.problem).toBe('lists and objects nested more than 200 deep');
    expect(scanJson(`${'['.repeat(200)}${']'.repeat(200)}`)).toBeNull();
  });
});
