// Panels, area loads, patch wind and member loss: every problem named by its entry
// (main/common/project/validation/actions-checks.ts and the schema), and the schema matches
// solver/project/actions-types.ts field by field.
import { describe, expect, it } from 'vitest';
import { validateProject } from '../../../../main/common/project/index.ts';
import { defs, schemaFields, typeFile, type Schema } from './type-fields.ts';
import { SPEC_SUBSET } from './fixtures.ts';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Loose = Record<string, any>;

function base(): Loose {
  const doc = JSON.parse(SPEC_SUBSET) as Loose;
  doc.nodes.push({ id: 'C', at: [40, 10, 30] }, { id: 'D', at: [0, 10, 0], fixed: 'xyz' });
  doc.panels = [{ id: 'P1', nodes: ['A', 'B', 'C', 'D'], region: 'roof' }];
  return doc;
}
const errorsOf = (doc: unknown): string[] => { const r = validateProject(doc); return r.ok ? [] : r.errors; };

describe('panels and area loads', () => {
  it('a valid panel with snow, cladding and pressure loads passes', () => {
    const doc = base();
    doc.loadCases[0].areaLoads = [{ kind: 'snow', value: 500 }, { kind: 'cladding', value: 50, panels: ['roof'] }, { kind: 'pressure', value: -300, coefficients: [{ region: 'P1', cp: 0.8 }] }];
    expect(errorsOf(doc)).toEqual([]);
  });

  it('unknown and repeated corners, too few corners, no area', () => {
    const doc = base();
    doc.panels.push({ id: 'P2', nodes: ['A', 'X', 'A'] }, { id: 'P3', nodes: ['A', 'B'] }, { id: 'P4', nodes: ['A', 'B', 'A'] }, { id: 'P1', nodes: ['A', 'B', 'C'] });
    doc.nodes.push({ id: 'E', at: [80, 0, 60] });
    doc.panels.push({ id: 'P5', nodes: ['A', 'B', 'E'] });
    const e = errorsOf(doc);
    expect(e).toContain('panels[1] "P2": node "X" does not exist');
    expect(e).toContain('panels[1] "P2": node "A" appears twice in the loop');
    expect(e).toContain('panels[2] "P3": "nodes" must list at least 3 corner nodes');
    expect(e).toContain('panels[4] "P1": id "P1" is already used by panels[0]');
    expect(e).toContain('panels[5] "P5": the loop encloses no area (its corners are in one line or at one place)');
  });

  it('area loads: negative snow, unknown panel or region, coefficients on snow, no panels at all', () => {
    const doc = base();
    doc.loadCases[0].areaLoads = [{ kind: 'snow', value: -5, coefficients: [{ region: 'roof', cp: 1 }] }, { kind: 'pressure', value: 1, panels: ['wall'], coefficients: [{ region: 'walls', cp: 1 }] }, { kind: 'hail', value: 1 }];
    const e = errorsOf(doc);
    expect(e).toContain('loadCases[0] "dead": areaLoads[0]: snow load must not be negative (got -5 Pa; it acts downward)');
    expect(e).toContain('loadCases[0] "dead": areaLoads[0]: coefficients apply to "pressure" loads only (this is "snow")');
    expect(e).toContain('loadCases[0] "dead": areaLoads[1]: panels: "wall" is neither a panel nor a region');
    expect(e).toContain('loadCases[0] "dead": areaLoads[1]: coefficients[0]: "walls" is neither a panel nor a region');
    expect(e.some((m) => m.startsWith('loadCases[0] "dead": "areaLoads[2].kind"'))).toBe(true);
    delete doc.panels;
    doc.loadCases[0].areaLoads = [{ kind: 'snow', value: 5 }];
    expect(errorsOf(doc)).toEqual(['loadCases[0] "dead": areaLoads[0]: the project has no panels to carry it (add "panels")']);
  });
});

describe('patch wind and member loss', () => {
  it('patch wind: mean case missing or without wind, factor ≤ 1, empty patch, id taken', () => {
    const doc = base();
    doc.loadCases.push({ id: 'w', wind: { direction: 0, speed: 30 } });
    doc.patchWind = [
      { id: 'pw', meanCase: 'w', patchFactor: 1.5, patches: [{ from: 0, to: 20 }] },
      { id: 'dead', meanCase: 'dead', patchFactor: 1 },
      { id: 'pw2', meanCase: 'nope', patchFactor: 2, patches: [{ from: 20, to: 10 }] },
    ];
    const e = errorsOf(doc);
    expect(e).toContain('patchWind[1] "dead": id "dead" is already used by a load case or combination');
    expect(e).toContain('patchWind[1] "dead": meanCase: load case "dead" has no wind');
    expect(e).toContain('patchWind[1] "dead": "patchFactor" must be greater than 1 (the patch increases the mean wind force) (got 1)');
    expect(e).toContain('patchWind[2] "pw2": meanCase: load case "nope" does not exist');
    expect(e).toContain('patchWind[2] "pw2": patches[0]: "to" (10 m) must be above "from" (20 m)');
    expect(e.filter((m) => m.startsWith('patchWind[0]'))).toEqual([]);
  });

  it('member loss: unknown case, member and group; nothing named; factor and damping both; ranges', () => {
    const doc = base();
    doc.memberLoss = [
      { id: 'ok', fromCase: 'dead', members: ['G1'], dampingRatio: 0.05 },
      { id: 'L1', fromCase: 'live', members: ['G9'], group: 'guys' },
      { id: 'L2', fromCase: 'dead' },
      { id: 'L3', fromCase: 'dead', members: ['G1'], dynamicFactor: 2.5, dampingRatio: 1 },
    ];
    const e = errorsOf(doc);
    expect(e).toContain('memberLoss[1] "L1": fromCase: case "live" does not exist (no load case or combination has this id)');
    expect(e).toContain('memberLoss[1] "L1": members: member "G9" does not exist');
    expect(e).toContain('memberLoss[1] "L1": group "guys" does not exist');
    expect(e).toContain('memberLoss[2] "L2": name the members to remove ("members" or "group")');
    expect(e).toContain('memberLoss[3] "L3": give either "dynamicFactor" or "dampingRatio", not both');
    expect(e).toContain('memberLoss[3] "L3": "dynamicFactor" must be from 1 (static) to 2 (sudden release without damping) (got 2.5)');
    expect(e).toContain('memberLoss[3] "L3": "dampingRatio" must be from 0 up to (not including) 1 (got 1)');
    expect(e.filter((m) => m.startsWith('memberLoss[0]'))).toEqual([]);
  });
});

describe('wind basis and directions', () => {
  it('basis fields and direction sets are checked, naming the entry', () => {
    const doc = base();
    doc.loadCases.push({ id: 'w', wind: { direction: 0, speed: 30, basis: { velocity: 'gust', averagingPeriod: 0, gustFactor: -1 } } });
    doc.windDirections = [{ id: 'dirs', case: 'dead', count: 0 }, { id: 'w', case: 'none', count: 8 }, { id: 'ok', case: 'w', count: 12, azimuth: 15 }];
    const e = errorsOf(doc);
    expect(e.some((m) => m.startsWith('loadCases[1] "w": "wind.basis.velocity"'))).toBe(true);
    expect(e.some((m) => m.startsWith('loadCases[1] "w": "wind.basis.averagingPeriod" must be positive'))).toBe(true);
    expect(e.some((m) => m.startsWith('loadCases[1] "w": "wind.basis.gustFactor" must be positive'))).toBe(true);
    expect(e).toContain('windDirections[0] "dirs": case: load case "dead" has no wind');
    expect(e.some((m) => m.startsWith('windDirections[0] "dirs": "count" must be a whole number from 1 to 72'))).toBe(true);
    expect(e).toContain('windDirections[1] "w": id "w" is already used by a load case or combination');
    expect(e).toContain('windDirections[1] "w": case: load case "none" does not exist');
    expect(e.filter((m) => m.startsWith('windDirections[2]'))).toEqual([]);
  });
});

// ---- schema ↔ actions-types.ts (same method as schema-matches-types.test.ts) ----
const { interfaceFields, interfaceNames } = typeFile('actions-types.ts');

describe('schema matches solver/project/actions-types.ts', () => {
  const pairs: [string, Schema][] = [
    ['PanelSpec', defs.panel], ['PressureCoefficientSpec', defs.pressureCoefficient], ['AreaLoadSpec', defs.areaLoad],
    ['PatchWindSpec', defs.patchWind], ['MemberLossSpec', defs.memberLoss],
    ['WindBasisSpec', defs.windBasis], ['WindDirectionsSpec', defs.windDirections], ['AncillarySpec', defs.ancillary],
    ['IceWithWindSpec', defs.iceWithWind], ['UnbalancedIceSpec', defs.unbalancedIce],
  ];
  it.each(pairs)('%s: same fields, optionality and order', (name, schema) => {
    expect(schemaFields(schema)).toEqual(interfaceFields(name));
    expect(schema.additionalProperties).toBe(false);
  });
  it('every interface of actions-types.ts is covered', () => {
    const declared = interfaceNames();
    expect(declared.filter((n) => !pairs.some(([p]) => p === n))).toEqual([]);
  });
});
