// The migration framework, exercised with a test-only chain, and the shipped step 1 → 2.
import { describe, expect, it } from 'vitest';
import { CURRENT_FORMAT_VERSION, migrateDocument, parseProjectText } from '../../../../main/common/project/index.ts';
import type { Migration } from '../../../../main/common/project/index.ts';
import { PROJECT_MIGRATIONS } from '../../../../main/common/project/migrations/registry.ts';
import { fixtureText } from './fixtures.ts';
import { runChecks, solveProject } from '../../../../solver/index.ts';

// Test-only steps: v1 → v2 renames members[].segments to members[].divisions; v2 → v3 adds a list.
const toV2: Migration = {
  fromVersion: 1,
  summary: 'rename segments to divisions',
  migrate: (doc) => ({
    ...doc,
    version: 2,
    members: (doc.members as Record<string, unknown>[]).map(({ segments, ...m }) => ({ ...m, divisions: segments })),
  }),
};
const toV3: Migration = { fromVersion: 2, summary: 'add notes list', migrate: (doc) => ({ ...doc, version: 3, notes: [] }) };

const v1 = { format: 'stayset-project', version: 1, members: [{ id: 'M', segments: 4 }] };

describe('migration framework', () => {
  it('the shipped chain reaches the current version with no gaps', () => {
    expect(CURRENT_FORMAT_VERSION).toBe(2);
    for (let v = 1; v < CURRENT_FORMAT_VERSION; v++) expect(PROJECT_MIGRATIONS.some((m) => m.fromVersion === v)).toBe(true);
  });

  it('applies each step in order and reports the starting version', () => {
    const r = migrateDocument(structuredClone(v1), { registry: [toV3, toV2], currentVersion: 3 });
    expect(r).toEqual({
      ok: true,
      migratedFrom: 1,
      doc: { format: 'stayset-project', version: 3, members: [{ id: 'M', divisions: 4 }], notes: [] },
    });
  });

  it('never changes its input', () => {
    const input = structuredClone(v1);
    migrateDocument(input, { registry: [toV2, toV3], currentVersion: 3 });
    expect(input).toEqual(v1);
  });

  it('a current-version document passes through untouched, with no migratedFrom', () => {
    const doc = { format: 'stayset-project', version: 3 };
    expect(migrateDocument(doc, { registry: [toV2, toV3], currentVersion: 3 })).toEqual({ ok: true, doc });
  });

  it('a gap in the chain is an error', () => {
    const r = migrateDocument(v1, { registry: [toV3], currentVersion: 3 });
    expect(r).toEqual({ ok: false, errors: ['project: no migration from format version 1 to 2 in this build'] });
  });

  it('a step that forgets to bump the version, or throws, is reported', () => {
    const lazy: Migration = { fromVersion: 1, summary: 'no bump', migrate: (doc) => doc };
    expect(migrateDocument(v1, { registry: [lazy], currentVersion: 2 })).toEqual({
      ok: false,
      errors: ['project: migration from format version 1 did not produce version 2'],
    });
    const broken: Migration = { fromVersion: 1, summary: 'throws', migrate: () => { throw new Error('members missing'); } };
    expect(migrateDocument(v1, { registry: [broken], currentVersion: 2 })).toEqual({
      ok: false,
      errors: ['project: migration from format version 1 failed: members missing'],
    });
  });

  it('a newer file is refused with both version numbers', () => {
    const r = parseProjectText(fixtureText('bad-newer-version.stayset.json'));
    expect(r).toEqual({
      ok: false,
      errors: ['project: this file was written by a newer Stayset (format version 3); this version reads up to 2'],
    });
  });

  it('missing or foreign "format", and bad "version"', () => {
    expect(migrateDocument({ version: 1 })).toEqual({
      ok: false,
      errors: ['project: "format" is missing; this is not a Stayset project file (expected "format": "stayset-project")'],
    });
    expect(parseProjectText(fixtureText('bad-other-format.stayset.json'))).toEqual({
      ok: false,
      errors: ['project: "format" is "spreadsheet-export"; this is not a Stayset project file (expected "format": "stayset-project")'],
    });
    expect(migrateDocument({ format: 'stayset-project', version: '1' })).toEqual({
      ok: false,
      errors: ['project: "version" must be a whole number of at least 1 (got "1")'],
    });
    expect(migrateDocument([1, 2]).ok).toBe(false);
  });
});

describe('format 1 → 2: the resistance factor becomes the design basis', () => {
  const base = { format: 'stayset-project', version: 1, meta: { name: 'x', notes: 'old note' }, checks: { resistanceFactor: 0.4, upliftNodes: ['A'] } };

  it('φ becomes the allowable format with cable safety factor 1/φ and a note saying so', () => {
    const r = migrateDocument(structuredClone(base));
    if (!r.ok) throw new Error(r.errors.join('\n'));
    expect(r.migratedFrom).toBe(1);
    expect(r.doc.version).toBe(2);
    expect(r.doc.checks).toEqual({ upliftNodes: ['A'] });
    expect(r.doc.designBasis).toEqual({ format: 'allowable', allowable: { cableSafetyFactor: 2.5 } });
    const notes = (r.doc.meta as { notes: string }).notes;
    expect(notes.startsWith('old note\n')).toBe(true);
    expect(notes).toContain('φ = 0.4 on breaking load became designBasis');
    expect(notes).toContain('cableSafetyFactor: 2.5');
  });

  it('a file without φ gets the version-1 default 0.5, i.e. safety factor 2, and says it was the default', () => {
    const r = migrateDocument({ format: 'stayset-project', version: 1 });
    if (!r.ok) throw new Error(r.errors.join('\n'));
    expect(r.doc.designBasis).toEqual({ format: 'allowable', allowable: { cableSafetyFactor: 2 } });
    expect((r.doc.meta as { notes: string }).notes).toMatch(/φ = 0.5 \(the version-1 default\)/);
  });

  it('a version-1 fixture parses as version 2 and keeps the version-1 rule T / (φ·MBL) on its load cases', () => {
    const text = fixtureText('v1-kestrel-moor-mast.stayset.json');
    const phi = (JSON.parse(text) as { checks: { resistanceFactor: number } }).checks.resistanceFactor;
    const r = parseProjectText(text);
    if (!r.ok) throw new Error(r.errors.join('\n'));
    expect(r.migratedFrom).toBe(1);
    expect(r.project.version).toBe(2);
    const p = r.project;
    const report = solveProject(p).report;
    const check = runChecks(p, report);
    const first = report.cases[0];
    let worst = 0;
    for (const m of first.members) {
      const mbl = p.sections.find((s) => s.id === p.members.find((x) => x.id === m.id)!.section)!.breakingLoad;
      if (mbl) worst = Math.max(worst, m.tensionMax / (phi * mbl));
    }
    expect(worst).toBeGreaterThan(0);
    expect(check.cases.find((c) => c.id === first.id)!.maxUtilisation).toBeCloseTo(worst, 9);
  });
});
