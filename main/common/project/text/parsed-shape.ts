/**
 * What the strict scanner (json-scan.ts) would refuse in a text that JSON.parse accepted, told
 * from the parsed value and two native searches of the text instead of a second scan of it:
 * - a property name repeated in one object: JSON.parse keeps the last value, so the text then
 *   holds more ':' characters than the kept properties (one separator each) plus the ':' inside
 *   the kept strings (names and values). When the text has no "\u" escape (which could write a
 *   ':' the text search does not see), equal counts prove that no property was dropped;
 * - nesting deeper than MAX_DEPTH.
 * `suspect` is true when either may be the case; the caller then runs the scanner for the exact
 * place and message. Cost: one walk of the value (bounded recursion) and two indexOf loops.
 */
import { MAX_DEPTH } from './json-scan.ts';

function colonsIn(s: string): number {
  let n = 0;
  for (let i = s.indexOf(':'); i !== -1; i = s.indexOf(':', i + 1)) n++;
  return n;
}

interface Tally { keys: number; colons: number; tooDeep: boolean }

function walk(v: unknown, depth: number, t: Tally): void {
  if (typeof v === 'string') { if (v.length > 0) t.colons += colonsIn(v); return; }
  if (v === null || typeof v !== 'object') return;
  if (depth >= MAX_DEPTH) { t.tooDeep = true; return; }
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) {
      const x: unknown = v[i];
      if (x !== null && typeof x === 'object') walk(x, depth + 1, t);
      else if (typeof x === 'string') t.colons += colonsIn(x);
    }
    return;
  }
  for (const key of Object.keys(v)) {
    t.keys++;
    t.colons += colonsIn(key);
    const x = (v as Record<string, unknown>)[key];
    if (x !== null && typeof x === 'object') walk(x, depth + 1, t);
    else if (typeof x === 'string') t.colons += colonsIn(x);
  }
}

/** True when `text` (which JSON.parse turned into `value`) may repeat a property name or nest too deep. */
export function parsedTextSuspect(text: string, value: unknown): boolean {
  if (text.includes('\\u')) return true;
  const t: Tally = { keys: 0, colons: 0, tooDeep: false };
  walk(value, 0, t);
  return t.tooDeep || colonsIn(text) !== t.keys + t.colons;
}
