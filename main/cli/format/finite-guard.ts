/**
 * JSON has no NaN or Infinity, and a result containing one is broken. `replaceNonFinite`
 * returns a deep copy with every non-finite number replaced by null, plus the paths where it
 * did so (e.g. `cases[0].members[2].sag`), so the caller can fail loudly. `nonFinitePaths` only
 * lists the paths, without copying (the JSON writer prints a non-finite number as null itself).
 * The path is kept as a stack of keys and turned into text only where a non-finite number is found.
 */
export function replaceNonFinite<T>(value: T): { value: T; paths: string[] } {
  const paths: string[] = [];
  const stack: (string | number)[] = [];
  const pathText = (): string => pathOf(stack);
  const walk = (v: unknown): unknown => {
    if (typeof v === 'number') {
      if (Number.isFinite(v)) return v;
      paths.push(pathText());
      return null;
    }
    if (Array.isArray(v) || ArrayBuffer.isView(v)) {
      const list = v as unknown as ArrayLike<unknown>;
      const out = new Array<unknown>(list.length);
      for (let i = 0; i < list.length; i++) {
        const x = list[i];
        if (typeof x === 'number' && Number.isFinite(x)) { out[i] = x; continue; }
        stack.push(i);
        out[i] = walk(x);
        stack.pop();
      }
      return out;
    }
    if (typeof v === 'object' && v !== null) {
      const out: Record<string, unknown> = {};
      for (const k of Object.keys(v)) {
        stack.push(k);
        out[k] = walk((v as Record<string, unknown>)[k]);
        stack.pop();
      }
      return out;
    }
    return v;
  };
  return { value: walk(value) as T, paths };
}

/** The paths replaceNonFinite would report, found without copying the value (same walk order). */
export function nonFinitePaths(value: unknown): string[] {
  const paths: string[] = [];
  const stack: (string | number)[] = [];
  const pathText = (): string => pathOf(stack);
  const visit = (key: string | number, x: unknown): void => {
    if (typeof x === 'number') {
      if (x - x === 0) return; // finite
    } else if (x === null || typeof x !== 'object') return;
    stack.push(key);
    walk(x);
    stack.pop();
  };
  const walk = (v: unknown): void => {
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) paths.push(pathText());
      return;
    }
    if (Array.isArray(v) || ArrayBuffer.isView(v)) {
      const list = v as unknown as ArrayLike<unknown>;
      for (let i = 0; i < list.length; i++) visit(i, list[i]);
      return;
    }
    if (typeof v === 'object' && v !== null) {
      for (const k of Object.keys(v)) visit(k, (v as Record<string, unknown>)[k]);
    }
  };
  walk(value);
  return paths;
}

/** A key stack as a path text: `cases[0].members[2].sag`. */
function pathOf(stack: readonly (string | number)[]): string {
  let s = '';
  for (const k of stack) s += typeof k === 'number' ? `[${k}]` : s === '' ? k : `.${k}`;
  return s;
}
