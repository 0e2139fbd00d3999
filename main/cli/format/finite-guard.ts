/**
 * JSON has no NaN or Infinity, and a result containing one is broken. `replaceNonFinite`
 * returns a deep copy with every non-finite number replaced by null, plus the paths where it
 * did so (e.g. `cases[0].members[2].sag`), so the caller can fail loudly.
 */
export function replaceNonFinite<T>(value: T): { value: T; paths: string[] } {
  const paths: string[] = [];
  const walk = (v: unknown, path: string): unknown => {
    if (typeof v === 'number') {
      if (Number.isFinite(v)) return v;
      paths.push(path);
      return null;
    }
    if (Array.isArray(v) || ArrayBuffer.isView(v)) return Array.from(v as ArrayLike<unknown>, (x, i) => walk(x, `${path}[${i}]`));
    if (typeof v === 'object' && v !== null) {
      const out: Record<string, unknown> = {};
      for (const [k, x] of Object.entries(v)) out[k] = walk(x, path === '' ? k : `${path}.${k}`);
      return out;
    }
    return v;
  };
  return { value: walk(value, '') as T, paths };
}
