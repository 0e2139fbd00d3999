// Messages for bad input name the entry and the problem (format: `members[3] "G2": ...`), and
// every problem is reported, not just the first.
import { describe, expect, it } from 'vitest';
import { MAX_ERRORS, parseProjectText, validateProject } from '../../../../main/common/project/index.ts';
import { SPEC_SUBSET, fixtureText } from './fixtures.ts';

function errorsOf(doc: unknown): string[] {
  const r = validateProject(doc);
  return r.ok ? [] : r.errors;
}

// Tests build deliberately malformed documents, so they edit them untyped.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Loose = Record<string, any>;

function base(): Loose {
  return JSON.parse(SPEC_SUBSET) as Loose;
}

describe('schema errors in Stayset words', () => {
  it('names a missing node reference by member index and id', () => {
    const r = parseProjectText(fixtureText('bad-missing-node.stayset.json'));
    expect(r.ok ? [] : r.errors).toEqual(['members[2] "G2": node "TOP2" does not exist']);
  });

  it('"at" with two numbers, a string or a non-finite number', () => {
    for (const at of [[0, 0], [0, 'a', 0], [0, 0, Infinity], [0, 0, NaN], [0, 0, 0, 0]]) {
      const doc = base();
      doc.nodes[0].at = at;
      expect(errorsOf(doc)).toEqual(['nodes[0] "A": "at" must be 3 finite numbers']);
    }
    const doc = base();
    doc.nodes[0].at = 'origin';
    expect(errorsOf(doc)).toEqual(['nodes[0] "A": "at" must be 3 finite numbers (got "origin")']);
  });

  it('a number too large for a double (parsed as Infinity) is not finite', () => {
    const r = parseProjectText(SPEC_SUBSET.replace('"diameter": 0.016', '"diameter": 1e999'));
    expect(r.ok ? [] : r.errors).toEqual(['sections[0] "strand": "diameter" must be a finite number (got Infinity)']);
  });

  it('both pretension and unstressedLength', () => {
    const doc = base();
    doc.members[0].pretension = 5000;
    expect(errorsOf(doc)).toEqual(['members[0] "G1": give either "pretension" or "unstressedLength", not both']);
  });

  it('unknown properties are errors, with a spelling hint', () => {
    const doc = base();
    doc.members[0].pretention = 5000;
    doc.nodez = [];
    expect(errorsOf(doc)).toEqual([
      'project: unknown top-level property "nodez" (did you mean "nodes"?)',
      'members[0] "G1": unknown property "pretention" (did you mean "pretension"?)',
    ]);
  });

  it('kind, segments and missing required fields', () => {
    const doc = base();
    doc.members[0].kind = 'rope';
    doc.members[0].segments = 2.5;
    delete doc.members[0].section;
    expect(errorsOf(doc)).toEqual([
      'members[0] "G1": "section" is required',
      'members[0] "G1": "kind" must be one of cable, bar, beam (got "rope")',
      'members[0] "G1": "segments" must be a whole number of at least 1 (got 2.5)',
    ]);
    doc.members[0].section = 'strand';
    doc.members[0].kind = 'bar';
    doc.members[0].segments = 0;
    expect(errorsOf(doc)).toEqual(['members[0] "G1": "segments" must be a whole number of at least 1 (got 0)']);
  });

  it('nested paths inside an entry and inside top-level objects', () => {
    const doc = base();
    doc.loadCases[0].nodalLoads[0].force = [1, 2];
    doc.checks = { sagLimits: [{ group: 'g', limit: { fraction: 0.1 } }] };
    doc.groups = [{ id: 'g', members: ['G1'] }];
    expect(errorsOf(doc)).toEqual([
      'loadCases[0] "dead": "nodalLoads[0].force" must be 3 finite numbers',
      'checks: "sagLimits[0].limit" must be either {"fractionOfSpan": number > 0} or {"absolute": metres > 0}',
    ]);
  });

  it('empty lists of nodes, members and load cases', () => {
    const doc = base();
    doc.nodes = [];
    doc.members = [];
    doc.loadCases = [];
    const errors = errorsOf(doc);
    expect(errors).toContain('project: "nodes" must have at least 1 entry');
    expect(errors).toContain('project: "members" must have at least 1 entry');
    expect(errors).toContain('project: "loadCases" must have at least 1 entry');
  });

  it('tuning target with an unknown kind', () => {
    const doc = base();
    doc.tuning = { variables: [], targets: [{ kind: 'stiffness', case: 'dead' }] };
    expect(errorsOf(doc)).toEqual([
      'tuning: "targets[0]" needs "kind" to be one of sag, tensionShare, noSlack, plumb, reaction',
    ]);
  });
});

describe('semantic errors', () => {
  it('duplicate ids, and a combination named like a load case', () => {
    const doc = base();
    doc.nodes.push({ id: 'A', at: [1, 1, 1] });
    doc.combinations = [{ id: 'dead', factors: [{ case: 'dead', factor: 1.2 }] }];
    expect(errorsOf(doc)).toEqual([
      'nodes[2] "A": id "A" is already used by nodes[0]',
      'combinations[0] "dead": id "dead" is already used by load case loadCases[0]',
    ]);
  });

  it('from = to, zero length, E, area, massPerLength and unstressedLength', () => {
    const doc = base();
    doc.nodes.push({ id: 'C', at: [40, 0, 30] });
    doc.members.push({ id: 'G2', kind: 'bar', from: 'B', to: 'C', section: 'strand' });
    doc.members.push({ id: 'G3', kind: 'bar', from: 'A', to: 'A', section: 'strand' });
    doc.sections.push({ id: 'rod', E: 0, area: -1e-4, massPerLength: -2 });
    doc.members[0].unstressedLength = 0;
    expect(errorsOf(doc)).toEqual([
      'sections[1] "rod": E must be positive (got 0 Pa)',
      'sections[1] "rod": area must be positive (got -0.0001 m²)',
      'sections[1] "rod": massPerLength must not be negative (got -2 kg/m)',
      'members[0] "G1": unstressedLength must be positive (got 0 m)',
      'members[1] "G2": zero length: nodes "B" and "C" are at the same position',
      'members[2] "G3": "from" and "to" are the same node "A"',
    ]);
  });

  it('references from groups, combinations, loads, checks and tuning', () => {
    const doc = base();
    doc.groups = [{ id: 'guys', members: ['G1', 'G9'] }];
    doc.combinations = [{ id: 'uls', factors: [{ case: 'wind', factor: 1.5 }] }];
    doc.loadCases[0].wind = { direction: 0, speed: 20, groups: ['stays'] };
    doc.checks = { noSlackGroups: ['*', 'stays'], displacementLimits: [{ node: 'TOP', limit: 0.1 }], upliftNodes: ['Z'] };
    doc.tuning = {
      variables: [{ group: 'guys', by: 'pretension', min: 9, max: 1 }],
      targets: [{ kind: 'plumb', base: 'A', top: 'TOP', case: 'uls2', tolerance: 0.01 }],
    };
    expect(errorsOf(doc)).toEqual([
      'loadCases[0] "dead": wind: group "stays" does not exist',
      'groups[0] "guys": member "G9" does not exist',
      'combinations[0] "uls": factors[0]: load case "wind" does not exist',
      'checks: noSlackGroups: group "stays" does not exist',
      'checks: displacementLimits[0]: node "TOP" does not exist',
      'checks: upliftNodes: node "Z" does not exist',
      'tuning: targets[0]: case "uls2" does not exist (no load case or combination has this id)',
      'tuning: targets[0]: node "TOP" does not exist',
      'tuning: variables[0]: "min" (9) is greater than "max" (1)',
    ]);
  });

  it('groups named only in member.groups exist (MemberSpec.groups adds membership)', () => {
    const doc = base();
    doc.members[0].groups = ['stays'];
    doc.checks = { noSlackGroups: ['stays'] };
    expect(errorsOf(doc)).toEqual([]);
  });

  it('collects every problem of a file, schema and semantic together', () => {
    const r = parseProjectText(fixtureText('bad-many-problems.stayset.json'));
    expect(r.ok).toBe(false);
    expect(r.ok ? [] : r.errors).toHaveLength(6);
  });

  it('caps a long list and says how many more there were', () => {
    const doc = base();
    for (let k = 0; k < 80; k++) doc.members.push({ id: `M${k}`, kind: 'cable', from: 'A', to: `N${k}`, section: 'strand' });
    const errors = errorsOf(doc);
    expect(errors).toHaveLength(MAX_ERRORS + 1);
    expect(errors[MAX_ERRORS]).toBe(`… and ${80 - MAX_ERRORS} more problems`);
  });

  it('never throws on arbitrary JSON values', () => {
    for (const v of [null, 0, 'x', [], {}, { format: 'stayset-project', version: 1, nodes: 'x', members: [1, null], loadCases: {} }]) {
      expect(validateProject(v).ok).toBe(false);
    }
  });
});
