/**
 * JSON has no NaN or Infinity, and a result containing one is broken. `replaceNonFinite`
 * returns a deep copy with every non-finite number replaced by null, plus the paths where it
 * did so (e.g. `cases[0].members[2].sag`), so the caller can fail loudly. The path is kept as a
 * stack of keys and turned into text only where a non-finite number is found.
 */
export function replaceNonFinite<T>(value: T): { value: T; paths: string[] } {
  const paths: string[] = [];
  const stack: (string | number)[] = [];
  const pathText = (): string => {
    let s = '';
    for (const k of stack) s += typeof k === 'number' ? `[${k}]` : s === '' ? k : `.${k}`;
    return s;
  };
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
