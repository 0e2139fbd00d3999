/**
 * JSON for stdout: two-space indent like JSON.stringify(v, null, 2), but lists of plain numbers
 * (positions, displacements, forces) on one line, so results stay readable and compact.
 *
 * One linear pass over the value (no regular expression over the finished text, no per-number
 * path strings). The text is written as UTF-8 bytes into a reused buffer of CHUNK_BYTES and handed
 * out chunk by chunk (jsonOutputChunks), so the tens of megabytes of a large net are written while
 * they are built and never exist as millions of small strings (whose concatenation and garbage
 * collection cost more than the formatting itself).
 * Like JSON.stringify: non-finite numbers print as null, undefined properties are left out,
 * toJSON is honoured; typed arrays print as number lists; strings are escaped by JSON.stringify.
 */

/** Bytes per chunk handed to the writer (1 MiB). */
export const CHUNK_BYTES = 1 << 20;

export function jsonOutput(value: unknown): string {
  const parts: string[] = [];
  const rest = jsonOutputChunks(value, (chunk) => { parts.push(chunk); });
  parts.push(rest);
  return parts.join('');
}

/**
 * Writes the JSON text of `value` with its final newline: full chunks go to `emit` as they fill,
 * in order; the last part (never empty; for an object it ends in "\n}\n") is returned, so a
 * caller can still add to its end (run-times.ts withStatsProperty).
 */
export function jsonOutputChunks(value: unknown, emit: (chunk: string) => void, chunkBytes = CHUNK_BYTES): string {
  const w = new ByteWriter(emit, Math.max(64, chunkBytes));
  w.value(value, 0);
  w.byte(0x0a);
  return w.rest();
}

const NULL = 'null';

class ByteWriter {
  private readonly buf: Buffer;
  private pos = 0;
  private readonly keys = new Map<string, { bytes: Buffer; ascii: boolean }>();

  constructor(private readonly emit: (chunk: string) => void, private readonly chunkBytes: number) {
    this.buf = Buffer.allocUnsafe(chunkBytes);
  }

  /** False once a byte ≥ 0x80 (UTF-8 of a non-ASCII character) is in the chunk. */
  private asciiOnly = true;

  rest(): string {
    return this.chunkText();
  }

  /** The chunk as text: ASCII is copied as Latin-1 (no UTF-8 decoding needed). */
  private chunkText(): string {
    const s = this.buf.toString(this.asciiOnly ? 'latin1' : 'utf8', 0, this.pos);
    this.asciiOnly = true;
    return s;
  }

  private flush(): void {
    if (this.pos > 0) this.emit(this.chunkText());
    this.pos = 0;
  }

  /** Room for `bytes` more (flushes at a value boundary, so a character is never split). */
  private room(bytes: number): void {
    if (this.pos + bytes > this.chunkBytes) this.flush();
  }

  byte(b: number): void {
    if (this.pos >= this.chunkBytes) this.flush();
    this.buf[this.pos++] = b;
  }

  /** Text known to be ASCII and short (numbers, punctuation). */
  private ascii(s: string): void {
    const n = s.length;
    this.room(n);
    const buf = this.buf;
    let p = this.pos;
    for (let i = 0; i < n; i++) buf[p++] = s.charCodeAt(i);
    this.pos = p;
  }

  /** Any text (UTF-8); longer than a chunk goes out on its own. */
  private text(s: string): void {
    const max = 3 * s.length; // UTF-8 bytes per UTF-16 unit
    if (max > this.chunkBytes) { this.flush(); this.emit(s); return; }
    this.room(max);
    const bytes = this.buf.write(s, this.pos, 'utf8');
    if (bytes !== s.length) this.asciiOnly = false;
    this.pos += bytes;
  }

  private spaces(count: number): void {
    this.room(count);
    this.buf.fill(0x20, this.pos, this.pos + count);
    this.pos += count;
  }

  private number(x: number): void {
    this.ascii(x - x === 0 ? `${x}` : NULL);
  }

  /** `"key": ` for a property name (escaped once per distinct name). */
  private key(k: string): void {
    let cached = this.keys.get(k);
    if (cached === undefined) {
      const text = `${JSON.stringify(k)}: `;
      const bytes = Buffer.from(text, 'utf8');
      cached = { bytes, ascii: bytes.length === text.length };
      this.keys.set(k, cached);
    }
    const b = cached.bytes;
    if (b.length > this.chunkBytes) { this.flush(); this.emit(b.toString('utf8')); return; }
    this.room(b.length);
    if (!cached.ascii) this.asciiOnly = false;
    this.buf.set(b, this.pos);
    this.pos += b.length;
  }

  value(v: unknown, depth: number): void {
    if (typeof v === 'number') { this.number(v); return; }
    if (typeof v === 'string') { this.text(JSON.stringify(v)); return; }
    if (typeof v === 'boolean') { this.ascii(v ? 'true' : 'false'); return; }
    if (v === null || v === undefined || typeof v === 'function' || typeof v === 'symbol') { this.ascii(NULL); return; }
    if (typeof v === 'bigint') throw new TypeError('jsonOutput: a BigInt has no JSON form');
    if (typeof (v as { toJSON?: unknown }).toJSON === 'function') { this.value((v as { toJSON: () => unknown }).toJSON(), depth); return; }
    if (Array.isArray(v) || ArrayBuffer.isView(v)) { this.list(v as unknown as ArrayLike<unknown>, depth); return; }
    this.object(v as Record<string, unknown>, depth);
  }

  /**
   * Copies JSON.stringify's compact text of a flat object (isFlat), spaced as the pretty form:
   * "{" and "," of the object start a new indented line, ":" after a key gains a space, "," in a
   * number list becomes ", ", "}" goes on its own line. Strings are copied as they are.
   */
  private flatObject(compact: string, depth: number): void {
    if (compact === '{}') { this.ascii('{}'); return; }
    const inner = 2 * (depth + 1);
    // Worst case per character: "," → ",\n" + indent.
    const max = 3 * compact.length + (inner + 2) * compact.length;
    if (max > this.chunkBytes) { this.genericFlat(compact, depth); return; }
    this.room(max);
    const buf = this.buf;
    let p = this.pos;
    let inList = false;
    const n = compact.length;
    for (let i = 0; i < n; i++) {
      const c = compact.charCodeAt(i);
      if (c === 0x22) { // a string: copy up to its closing quote
        buf[p++] = c;
        for (i++; i < n; i++) {
          const d = compact.charCodeAt(i);
          if (d < 0x80) {
            buf[p++] = d;
            if (d === 0x22) break;
            if (d === 0x5c) buf[p++] = compact.charCodeAt(++i); // escaped character (ASCII)
          } else if (d < 0x800) {
            this.asciiOnly = false;
            buf[p++] = 0xc0 | (d >> 6); buf[p++] = 0x80 | (d & 63);
          } else if (d >= 0xd800 && d <= 0xdbff) { // surrogate pair (JSON.stringify escapes lone ones)
            this.asciiOnly = false;
            const cp = 0x10000 + ((d - 0xd800) << 10) + (compact.charCodeAt(++i) - 0xdc00);
            buf[p++] = 0xf0 | (cp >> 18); buf[p++] = 0x80 | ((cp >> 12) & 63);
            buf[p++] = 0x80 | ((cp >> 6) & 63); buf[p++] = 0x80 | (cp & 63);
          } else {
            this.asciiOnly = false;
            buf[p++] = 0xe0 | (d >> 12); buf[p++] = 0x80 | ((d >> 6) & 63); buf[p++] = 0x80 | (d & 63);
          }
        }
      } else if (c === 0x2c) { // ,
        buf[p++] = 0x2c;
        if (inList) buf[p++] = 0x20;
        else { buf[p++] = 0x0a; for (let t = 0; t < inner; t++) buf[p++] = 0x20; }
      } else if (c === 0x3a) { // :
        buf[p++] = 0x3a; buf[p++] = 0x20;
      } else if (c === 0x7b) { // {
        buf[p++] = 0x7b; buf[p++] = 0x0a; for (let t = 0; t < inner; t++) buf[p++] = 0x20;
      } else if (c === 0x7d) { // }
        buf[p++] = 0x0a; for (let t = 2; t < inner; t++) buf[p++] = 0x20; buf[p++] = 0x7d;
      } else {
        if (c === 0x5b) inList = true; else if (c === 0x5d) inList = false;
        buf[p++] = c;
      }
    }
    this.pos = p;
  }

  /** A flat object too long for one chunk: the general path on its parsed text. */
  private genericFlat(compact: string, depth: number): void {
    const o = JSON.parse(compact) as Record<string, unknown>;
    let first = true;
    const inner = 2 * (depth + 1);
    for (const k of Object.keys(o)) {
      if (first) this.byte(0x7b); else this.byte(0x2c);
      this.byte(0x0a);
      first = false;
      this.spaces(inner);
      this.key(k);
      this.value(o[k], depth + 1);
    }
    this.byte(0x0a);
    this.spaces(2 * depth);
    this.byte(0x7d);
  }

  private list(list: ArrayLike<unknown>, depth: number): void {
    const n = list.length;
    if (n === 0) { this.ascii('[]'); return; }
    if (isNumberList(list)) {
      this.byte(0x5b); // [
      for (let i = 0; i < n; i++) {
        if (i > 0) { this.byte(0x2c); this.byte(0x20); } // ", "
        const x = list[i];
        if (x === null) this.ascii(NULL); else this.number(x as number);
      }
      this.byte(0x5d); // ]
      return;
    }
    const inner = 2 * (depth + 1);
    this.byte(0x5b); this.byte(0x0a); // "[\n"
    for (let i = 0; i < n; i++) {
      if (i > 0) { this.byte(0x2c); this.byte(0x0a); } // ",\n"
      this.spaces(inner);
      this.value(list[i], depth + 1);
    }
    this.byte(0x0a);
    this.spaces(2 * depth);
    this.byte(0x5d);
  }

  private object(o: Record<string, unknown>, depth: number): void {
    if (isFlat(o)) { this.flatObject(JSON.stringify(o), depth); return; }
    let first = true;
    const inner = 2 * (depth + 1);
    for (const k of Object.keys(o)) {
      const x = o[k];
      if (x === undefined || typeof x === 'function' || typeof x === 'symbol') continue;
      if (first) this.byte(0x7b); else this.byte(0x2c); // "{" or ","
      this.byte(0x0a);
      first = false;
      this.spaces(inner);
      this.key(k);
      this.value(x, depth + 1);
    }
    if (first) { this.ascii('{}'); return; }
    this.byte(0x0a);
    this.spaces(2 * depth);
    this.byte(0x7d);
  }
}

/**
 * An object whose properties are all numbers, strings, booleans, null (or left out: undefined,
 * functions, symbols) or plain arrays of numbers and null: JSON.stringify writes it compactly in
 * native code, and flatObject only re-spaces that text.
 */
function isFlat(o: Record<string, unknown>): boolean {
  if (typeof o.toJSON === 'function' || ArrayBuffer.isView(o)) return false;
  const keys = Object.keys(o);
  for (let i = 0; i < keys.length; i++) {
    const x = o[keys[i]];
    if (x === null || typeof x !== 'object') continue;
    if (!Array.isArray(x) || !isNumberList(x)) return false;
  }
  return true;
}

function isNumberList(v: ArrayLike<unknown>): boolean {
  for (let i = 0; i < v.length; i++) {
    const x = v[i];
    if (typeof x !== 'number' && x !== null) return false;
  }
  return true;
}
