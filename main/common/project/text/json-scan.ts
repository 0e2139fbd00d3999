/**
 * A strict JSON (RFC 8259) syntax scanner that says where and what is wrong, because
 * JSON.parse messages differ between engines and rarely give a line and column.
 * It also finds a property name repeated in one object, which JSON.parse would resolve by
 * silently keeping the last value (so a value the user wrote would be lost).
 * It only scans; the value itself is built by JSON.parse afterwards.
 */

export interface JsonProblem {
  /** UTF-16 offset of the problem in the text. */
  offset: number;
  problem: string;
  /** True when the text ended before the value was complete. */
  truncated: boolean;
}

class Stop extends Error {
  constructor(readonly info: JsonProblem) {
    super(info.problem);
  }
}

/** Deepest nesting accepted; a project needs about 6 levels (and recursion must stay bounded). */
export const MAX_DEPTH = 200;

/** Characters that need no attention inside a string (sticky: matched from lastIndex). */
const PLAIN_RUN = /[^"\\\u0000-\u001f]*/y;
/** The characters a number can be made of (sticky). */
const NUMBER_RUN = /[-+\d.eE]*/y;

function describe(ch: string): string {
  if (ch === '\n') return 'a line break';
  if (ch === '\t') return 'a tab';
  return JSON.stringify(ch);
}

/** Scans `text`; returns the first problem, or null when it is valid JSON. */
export function scanJson(text: string): JsonProblem | null {
  let i = 0;
  let depth = 0;
  const fail = (problem: string, at = i): never => {
    throw new Stop({ offset: at, problem, truncated: false });
  };
  const end = (what: string): never => {
    throw new Stop({ offset: text.length, problem: `the file ends in the middle of ${what}`, truncated: true });
  };
  const ws = (): void => {
    for (;;) {
      const c = text.charCodeAt(i);
      if (c === 0x20 || c === 0x0a || c === 0x0d || c === 0x09) i++;
      else return;
    }
  };
  const str = (): string => {
    const start = i;
    i++; // opening quote
    for (;;) {
      PLAIN_RUN.lastIndex = i;
      PLAIN_RUN.test(text);
      i = PLAIN_RUN.lastIndex;
      if (i >= text.length) end('a string');
      const c = text[i];
      if (c === '"') {
        i++;
        const raw = text.slice(start + 1, i - 1);
        return raw.includes('\\') ? (JSON.parse(text.slice(start, i)) as string) : raw;
      }
      if (c === '\\') {
        const n = text[i + 1];
        if (n === undefined) end('a string');
        if (n === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) fail('bad \\u escape in a string');
          i += 6;
        } else if ('"\\/bfnrt'.includes(n)) i += 2;
        else fail(`bad escape "\\${n}" in a string`);
      } else if (c < ' ') fail(`${describe(c)} inside a string (strings must be on one line)`);
      else i++;
    }
  };
  const number = (): void => {
    NUMBER_RUN.lastIndex = i;
    const run = NUMBER_RUN.exec(text)![0];
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?$/.exec(run);
    if (!m && i + run.length >= text.length) end('a number');
    if (!m) fail('a malformed number');
    i += run.length;
  };
  /** `what` names the value for a truncation message; `key` (if any) is its property name. */
  const value = (what: string, key?: string): void => {
    ws();
    if (i >= text.length) end(key === undefined ? what : `the value of ${JSON.stringify(key)}`);
    const c = text[i];
    if (c === '{' || c === '[') {
      if (++depth > MAX_DEPTH) fail(`lists and objects nested more than ${MAX_DEPTH} deep`);
      if (c === '{') object();
      else array();
      depth--;
      return;
    }
    if (c === '"') {
      str();
      return;
    }
    if (c === '-' || (c >= '0' && c <= '9')) return number();
    for (const word of ['true', 'false', 'null']) {
      if (text.startsWith(word, i)) {
        i += word.length;
        return;
      }
      if (text.length - i < word.length && word.startsWith(text.slice(i))) end(`the word "${word}"`);
    }
    if (text.startsWith('NaN', i) || text.startsWith('Infinity', i)) fail('NaN and Infinity are not allowed in JSON');
    if (c === "'") fail('strings must use double quotes (")');
    fail(`unexpected ${describe(c)} where a value was expected`);
  };
  const object = (): void => {
    i++;
    const seen = new Set<string>();
    ws();
    if (text[i] === '}') {
      i++;
      return;
    }
    for (;;) {
      ws();
      if (i >= text.length) end('an object');
      if (text[i] !== '"') {
        fail(text[i] === '}' ? 'a comma before "}" (trailing commas are not allowed)' : `expected a property name in double quotes, found ${describe(text[i])}`);
      }
      const keyAt = i;
      const key = str();
      if (seen.has(key)) fail(`property ${JSON.stringify(key)} appears twice in the same object`, keyAt);
      seen.add(key);
      ws();
      if (i >= text.length) end('an object');
      if (text[i] !== ':') fail(`expected ":" after property ${JSON.stringify(key)}`);
      i++;
      value('a value', key);
      ws();
      if (i >= text.length) end('an object');
      if (text[i] === ',') i++;
      else if (text[i] === '}') {
        i++;
        return;
      } else fail(`expected "," or "}" after the value of ${JSON.stringify(key)}`);
    }
  };
  const array = (): void => {
    i++;
    ws();
    if (text[i] === ']') {
      i++;
      return;
    }
    for (;;) {
      ws();
      if (text[i] === ']') fail('a comma before "]" (trailing commas are not allowed)');
      value('a list');
      ws();
      if (i >= text.length) end('a list');
      if (text[i] === ',') i++;
      else if (text[i] === ']') {
        i++;
        return;
      } else fail(`expected "," or "]" in a list, found ${describe(text[i])}`);
    }
  };
  try {
    value('the file');
    ws();
    if (i < text.length) fail(`unexpected ${describe(text[i])} after the end of the JSON value`);
    return null;
  } catch (e) {
    if (e instanceof Stop) return e.info;
    throw e;
  }
}

/** 1-based line and column (in UTF-16 code units) of an offset. */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let k = 0; k < offset && k < text.length; k++) {
    if (text[k] === '\n') {
      line++;
      lineStart = k + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}
