/**
 * One read of the text (main/common/project/parse-project.ts, text/parsed-shape.ts): a file that
 * JSON.parse accepts is checked for what the strict scanner refuses (a property written twice in
 * one object, nesting beyond the limit) from the parsed value; the scanner runs only then. The
 * reference for "refused" is the strict scanner itself (scanJson, tested against RFC 8259 cases
 * in json-text.test.ts): every text here must get the scanner's verdict.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectText, serializeProject } from '../../../../main/common/project/index.ts';
import { scanJson, MAX_DEPTH } from '../../../../main/common/project/text/json-scan.ts';
import { parsedTextSuspect } from '../../../../main/common/project/text/parsed-shape.ts';

const demoText = (name: string): string => readFileSync(new URL(`../../../../assets/${name}`, import.meta.url), 'utf8');

describe('parsed-text check', () => {
  it.each(['demo-mast.stayset', 'demo-canopy.stayset', 'demo-tube-mast.stayset'])('%s is not suspect: the scanner does not run', (name) => {
    const text = demoText(name);
    expect(parsedTextSuspect(text, JSON.parse(text))).toBe(false);
    expect(scanJson(text)).toBeNull();
  });

  const cases: [string, string][] = [
    ['colons in names and values', '{"a:b": "12:30 at site: north", "c": ["x:y", {"d": ":"}]}'],
    ['a property twice', '{"a": 1, "b": {"e": 2, "e": 3}}'],
    ['a property twice, colons in the dropped value', '{"a": "x:y", "a": "z"}'],
    ['a property twice next to an escaped colon', '{"a": "\\u003a", "b": 1, "b": 2}'],
    ['an escaped colon only', '{"a": "\\u003a:"}'],
    ['nesting at the limit', `${'['.repeat(MAX_DEPTH)}${']'.repeat(MAX_DEPTH)}`],
    ['nesting beyond the limit', `${'['.repeat(MAX_DEPTH + 1)}${']'.repeat(MAX_DEPTH + 1)}`],
  ];
  it.each(cases)('%s: suspect whenever the scanner refuses', (_, text) => {
    const refused = scanJson(text) !== null;
    if (refused) expect(parsedTextSuspect(text, JSON.parse(text))).toBe(true);
  });

  it('parseProjectText still names a property written twice, with line and column', () => {
    const text = serializeProject(JSON.parse(demoText('demo-mast.stayset')))
      .replace('"format": "stayset-project",', '"format": "stayset-project",\n  "format": "stayset-project",');
    const out = parseProjectText(text);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.errors[0]).toMatch(/^not valid JSON at line 3, column 3: property "format" appears twice in the same object/);
  });

  it('parseProjectText accepts a project whose notes hold colons', () => {
    const p = JSON.parse(demoText('demo-mast.stayset'));
    p.meta = { ...(p.meta ?? {}), notes: 'Checked: 12:30; site: north ridge' };
    const out = parseProjectText(serializeProject(p));
    expect(out.ok, out.ok ? '' : out.errors.join('\n')).toBe(true);
  });
});
