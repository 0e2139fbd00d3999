/**
 * Turns a location inside a project document into the words used in messages:
 * the entry (`members[3] "G2"`, or `project` for the top level) and the field inside it
 * (`"nodalLoads[1].force"`). One naming scheme for schema and semantic errors alike.
 */

/** Path segments from the document root; numbers are array indices. */
export type DocPath = readonly (string | number)[];

/** Splits an ajv / RFC 6901 JSON Pointer ("/members/3/from") into segments. */
export function pointerToPath(pointer: string): (string | number)[] {
  if (pointer === '') return [];
  return pointer
    .slice(1)
    .split('/')
    .map((raw) => raw.replace(/~1/g, '/').replace(/~0/g, '~'))
    .map((seg) => (/^(0|[1-9]\d*)$/.test(seg) ? Number(seg) : seg));
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** `members[3] "G2"` for an entry of a top-level list; `checks` for a top-level object; `project` for the root. */
export function entryLabel(root: unknown, collection: string, index?: number): string {
  if (index === undefined) return collection;
  const list = isRecord(root) ? root[collection] : undefined;
  const entry = Array.isArray(list) ? list[index] : undefined;
  const id = isRecord(entry) ? entry.id : undefined;
  return typeof id === 'string' && id !== '' ? `${collection}[${index}] ${JSON.stringify(id)}` : `${collection}[${index}]`;
}

/** Renders segments as `nodalLoads[1].force` (no quotes). */
export function fieldPathText(path: DocPath): string {
  let out = '';
  for (const seg of path) {
    if (typeof seg === 'number') out += `[${seg}]`;
    else out += out === '' ? seg : `.${seg}`;
  }
  return out;
}

/**
 * Splits a document path into the entry label and the remaining field path.
 * Top-level lists name their entry by index and id; other top-level properties are the entry
 * themselves; an empty remainder means the message is about the entry as a whole.
 */
export function splitPath(root: unknown, path: DocPath): { entry: string; field: DocPath } {
  if (path.length === 0) return { entry: 'project', field: [] };
  const [head, second, ...rest] = path;
  const rootValue = isRecord(root) ? root[String(head)] : undefined;
  if (Array.isArray(rootValue) && typeof second === 'number') {
    return { entry: entryLabel(root, String(head), second), field: rest };
  }
  if (isRecord(rootValue) && path.length > 1) {
    return { entry: String(head), field: path.slice(1) };
  }
  return { entry: 'project', field: path };
}

/** One finished message: `entry: text`, with {field} in text replaced by the quoted field path. */
export function messageAt(root: unknown, path: DocPath, template: string): string {
  const { entry, field } = splitPath(root, path);
  const fieldText = field.length > 0 ? JSON.stringify(fieldPathText(field)) : 'the entry';
  return `${entry}: ${template.replace(/\{field\}/g, fieldText)}`;
}
