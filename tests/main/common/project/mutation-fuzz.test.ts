// Robustness: random damage to a valid project (deleted fields, wrong types, unknown keys,
// broken references) must never throw, must be reported, and every message must start with
// an entry label in the documented form (`members[3] "G2": ...`, `checks: ...`, `project: ...`).
import { describe, expect, it } from 'vitest';
import { validateProject } from '../../../../main/common/project/index.ts';
import { fixtureJson } from './fixtures.ts';

/** Small deterministic generator (Park–Miller minimal standard, 1988). */
function lcg(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 48271) % 2147483647;
    return s / 2147483647;
  };
}

type Path = (string | number)[];

function leafPaths(v: unknown, path: Path = [], out: Path[] = []): Path[] {
  if (Array.isArray(v)) v.forEach((x, i) => leafPaths(x, [...path, i], out));
  else if (typeof v === 'object' && v !== null) for (const [k, x] of Object.entries(v)) leafPaths(x, [...path, k], out);
  if (path.length > 0) out.push(path);
  return out;
}

function parentOf(doc: unknown, path: Path): Record<string | number, unknown> {
  let v = doc as Record<string | number, unknown>;
  for (const seg of path.slice(0, -1)) v = v[seg] as Record<string | number, unknown>;
  return v;
}

const LABEL = /^(project|meta|checks|tuning|installation|display|designBasis|[a-zA-Z]+\[\d+\]( "[^"]*")?): \S/;
const REPLACEMENTS: unknown[] = ['?', -1, 0, 1.5, true, null, [], {}, 'TOP9', 'xx', [1, 2]];

describe('damaged projects', () => {
  it('400 random mutations: never throws, labelled messages', () => {
    const base = fixtureJson('kestrel-moor-mast.stayset.json');
    const rand = lcg(20240601);
    let rejected = 0;
    for (let k = 0; k < 400; k++) {
      const doc = structuredClone(base);
      const paths = leafPaths(doc).filter((p) => p[0] !== 'format' && p[0] !== 'version' && p[0] !== 'meta');
      const path = paths[Math.floor(rand() * paths.length)];
      const parent = parentOf(doc, path);
      const key = path[path.length - 1];
      const action = rand();
      if (action < 0.25 && !Array.isArray(parent)) delete parent[key];
      else if (action < 0.35 && !Array.isArray(parent)) parent[`${String(key)}x`] = 1;
      else parent[key] = REPLACEMENTS[Math.floor(rand() * REPLACEMENTS.length)];
      const r = validateProject(doc);
      if (!r.ok) {
        rejected++;
        for (const m of r.errors) expect(m, `after changing ${JSON.stringify(path)}`).toMatch(LABEL);
      }
    }
    // Most damage is reportable; some (e.g. a label replaced by "?") is legitimately valid.
    expect(rejected).toBeGreaterThan(300);
  });
});
