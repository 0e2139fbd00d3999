/**
 * JSON for stdout: two-space indent like JSON.stringify(v, null, 2), but lists of plain numbers
 * (positions, displacements, forces) on one line, so results stay readable and compact.
 * One linear pass over the value (no regular expression over the finished text): the cost stays
 * proportional to the output, also for the tens of megabytes of a large net.
 * Like JSON.stringify: non-finite numbers print as null, undefined properties are left out,
 * toJSON is honoured; typed arrays print as number lists.
 */
export function jsonOutput(value: unknown): string {
  const out: string[] = [];
  write(value, '', out);
  out.push('\n');
  return out.join('');
}

function isNumberList(v: ArrayLike<unknown>): boolean {
  if (v.length === 0) return false;
  for (let i = 0; i < v.length; i++) {
    const x = v[i];
    if (typeof x !== 'number' && x !== null) return false;
  }
  return true;
}

function numberText(x: number): string {
  return Number.isFinite(x) ? String(x) : 'null';
}

function write(v: unknown, indent: string, out: string[]): void {
  if (v !== null && typeof v === 'object' && typeof (v as { toJSON?: unknown }).toJSON === 'function') {
    v = (v as { toJSON: () => unknown }).toJSON();
  }
  if (v === null || v === undefined || typeof v === 'function' || typeof v === 'symbol') { out.push('null'); return; }
  if (typeof v === 'number') { out.push(numberText(v)); return; }
  if (typeof v === 'string') { out.push(JSON.stringify(v)); return; }
  if (typeof v === 'boolean') { out.push(v ? 'true' : 'false'); return; }
  if (typeof v === 'bigint') throw new TypeError('jsonOutput: a BigInt has no JSON form');
  const inner = `${indent}  `;
  if (Array.isArray(v) || ArrayBuffer.isView(v)) {
    const list = v as unknown as ArrayLike<unknown>;
    if (list.length === 0) { out.push('[]'); return; }
    if (isNumberList(list)) {
      const parts = new Array<string>(list.length);
      for (let i = 0; i < list.length; i++) { const x = list[i]; parts[i] = x === null ? 'null' : numberText(x as number); }
      out.push(`[${parts.join(', ')}]`);
      return;
    }
    out.push('[\n');
    for (let i = 0; i < list.length; i++) {
      if (i > 0) out.push(',\n');
      out.push(inner);
      write(list[i], inner, out);
    }
    out.push(`\n${indent}]`);
    return;
  }
  let first = true;
  for (const key of Object.keys(v as object)) {
    const x = (v as Record<string, unknown>)[key];
    if (x === undefined || typeof x === 'function' || typeof x === 'symbol') continue;
    out.push(first ? '{\n' : ',\n', inner, JSON.stringify(key), ': ');
    first = false;
    write(x, inner, out);
  }
  out.push(first ? '{}' : `\n${indent}}`);
}
