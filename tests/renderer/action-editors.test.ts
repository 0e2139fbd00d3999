/**
 * The edits behind the design-action and design-basis editors, through the project store: field
 * text read in display units into SI (NIST SP 811 factors), one undo step per edit, refused edits
 * with the file validator's message naming the entry, fields the editors do not know kept, and
 * the combination builder giving what the library function behind `stayset combine` gives.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { applyBuiltCombinations, buildCombinations, resolveDesignBasis } from '../../solver/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { useResultsStore } from '../../renderer/stores/results.ts';
import { addActionEntry, editAreaLoad, replaceActionEntry, setPath } from '../../renderer/model/action-edits.ts';
import { ACTION_FIELDS, AREA_LOAD_FIELDS, MEMBER_LOSS_FIELDS, newActionEntry } from '../../renderer/model/action-fields.ts';
import { applyFieldText, fieldText, otherFields, type Entry, type FieldContext, type FieldSpec } from '../../renderer/model/field-spec.ts';
import { buildBasisCombinations, setBasisFactor, setBasisFormat, setCaseField, setCombinationPurpose } from '../../renderer/model/basis-edits.ts';
import { parseQuantity } from '../../renderer/units/parse-quantity.ts';
import { mastWithoutOwnActions, readDemo } from './editor-demos.ts';

const mast = mastWithoutOwnActions();
const canopy = readDemo('demo-canopy.stayset');
const field = (fields: FieldSpec[], path: string) => fields.find((f) => f.path === path)!;
const ctxOf = (project: ProjectFile, units: 'SI' | 'US' = 'SI', selectedNodes: string[] = []): FieldContext => ({ project, units, selectedNodes, selectedMembers: [] });
const top = mast.nodes.reduce((a, b) => (b.at[2] > a.at[2] ? b : a)).id;

// NIST SP 811 (2008) Appendix B: lb = 0.45359237 kg, ft = 0.3048 m, lbf = 4.4482216152605 N (exact).
const LB = 0.45359237, FT = 0.3048, LBF = 4.4482216152605;

describe('field text of the action editors', () => {
  const anc = ACTION_FIELDS.ancillaries;
  const point: Entry = { id: 'A1', kind: 'antenna', node: top, dragArea: 1, mass: 20 };

  it('reads quantities in the display unit and stores SI', () => {
    const us = ctxOf(mast, 'US');
    const m = applyFieldText(field(anc, 'mass'), point, '100', us, 'ancillaries[0] "A1"');
    expect(m.ok && m.entry.mass).toBeCloseTo(100 * LB, 12);
    const a = applyFieldText(field(anc, 'dragArea'), point, '10', us, 'ancillaries[0] "A1"');
    expect(a.ok && a.entry.dragArea).toBeCloseTo(10 * FT * FT, 12);
    const withUnit = applyFieldText(field(anc, 'dragArea'), point, '2500 cm^2', ctxOf(mast), 'x');
    expect(withUnit.ok && withUnit.entry.dragArea).toBeCloseTo(0.25, 12);
    // Area × force coefficient typed as a product.
    const product = applyFieldText(field(anc, 'dragArea'), point, '1.2 * 0.8 m^2', ctxOf(mast), 'x');
    expect(product.ok && product.entry.dragArea).toBeCloseTo(0.96, 12);
    expect(parseQuantity('1 psf', 'pressure', 'SI', 'p')).toEqual({ ok: true, value: expect.closeTo(LBF / (FT * FT), 9) });
    // A line item's drag area is per metre of height, mass per metre.
    const line: Entry = { ...point, node: undefined, along: { group: 'mast/mast legs', from: 10, to: 50 } };
    const lm = applyFieldText(field(anc, 'mass'), line, '3', us, 'x');
    expect(lm.ok && lm.entry.mass).toBeCloseTo(3 * LB / FT, 12);
  });

  it('names the entry and the field in every refusal', () => {
    const bad = applyFieldText(field(anc, 'mass'), point, 'heavy', ctxOf(mast), 'ancillaries[0] "A1"');
    expect(bad).toEqual({ ok: false, error: expect.stringMatching(/^ancillaries\[0\] "A1" mass: "heavy"/) });
    const negative = applyFieldText(field(anc, 'dragArea'), point, '-1', ctxOf(mast), 'ancillaries[0] "A1"');
    expect(negative).toEqual({ ok: false, error: 'ancillaries[0] "A1" drag area C_f·A: "-1" must be ≥ 0' });
    const empty = applyFieldText(field(anc, 'node'), point, ' ', ctxOf(mast), 'ancillaries[0] "A1"');
    expect(empty).toEqual({ ok: false, error: 'ancillaries[0] "A1" node: a value is required' });
    const count = applyFieldText(field(ACTION_FIELDS.windDirections, 'count'), { id: 'd', case: 'wind 0', count: 8 }, '6.5', ctxOf(mast), 'windDirections[0] "d"');
    expect(!count.ok && count.error).toBe('windDirections[0] "d" directions N: "6.5" must be a whole number from 1 to 72');
  });

  it('reads patch ranges and pressure coefficients, and writes them back the same', () => {
    const patches = field(ACTION_FIELDS.patchWind, 'patches');
    const e: Entry = { id: 'p', meanCase: 'wind 0', patchFactor: 1.5 };
    const r = applyFieldText(patches, e, '0 … 20; 20-40.5', ctxOf(mast), 'patchWind[0] "p"');
    expect(r.ok && r.entry.patches).toEqual([{ from: 0, to: 20 }, { from: 20, to: 40.5 }]);
    expect(fieldText(patches, (r as { entry: Entry }).entry, 'SI')).toBe('0 … 20; 20 … 40.5');
    const us = applyFieldText(patches, e, '0 … 100', ctxOf(mast, 'US'), 'x');
    expect(us.ok && (us.entry.patches as { to: number }[])[0].to).toBeCloseTo(100 * FT, 12);
    expect(applyFieldText(patches, e, '20 … 10', ctxOf(mast), 'patchWind[0] "p"')).toEqual({ ok: false, error: 'patchWind[0] "p" patches: in "20 … 10" the top must be above the bottom' });
    const cp = field(AREA_LOAD_FIELDS, 'coefficients');
    const c = applyFieldText(cp, { kind: 'pressure', value: 350 }, 'west: -0.9, east = 0.5', ctxOf(canopy), 'a');
    expect(c.ok && c.entry.coefficients).toEqual([{ region: 'west', cp: -0.9 }, { region: 'east', cp: 0.5 }]);
    expect(applyFieldText(cp, {}, 'west -0.9', ctxOf(canopy), 'a').ok).toBe(false);
  });

  it('keeps fields it does not know (a later optional field) through edits, and lists them', () => {
    const withIce: Entry = { ...point, ice: { thickness: 0.01, shape: 'cylinder' } };
    const r = applyFieldText(field(anc, 'mass'), withIce, '50', ctxOf(mast), 'x');
    expect(r.ok && r.entry).toEqual({ ...withIce, mass: 50 });
    expect(otherFields(anc, withIce)).toEqual([['ice', '{"thickness":0.01,"shape":"cylinder"}']]);
    expect(setPath({ along: { group: 'g' }, id: 'a' }, 'along.group', undefined)).toEqual({ id: 'a' });
  });

  it('shows the default dynamic factor from the damping ratio: 1 + exp(−πζ/√(1−ζ²))', () => {
    // Peak of the unit step response of a damped single-degree-of-freedom oscillator (recalled:
    // the overshoot exp(−πζ/√(1−ζ²)) of any structural-dynamics text); 2 without damping.
    const daf = field(MEMBER_LOSS_FIELDS, 'dynamicFactor').placeholder as (e: Entry) => string;
    expect(daf({})).toBe('2.000 from ζ');
    const zeta = 0.05;
    expect(daf({ dampingRatio: zeta })).toBe(`${(1 + Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta))).toFixed(3)} from ζ`);
  });
});

describe('action edits through the project store', () => {
  beforeEach(() => setActivePinia(createPinia()));
  const loaded = (project: ProjectFile) => {
    const s = useProjectStore();
    s.load({ path: '/projects/p.stayset', name: 'p.stayset', project });
    return s;
  };

  it('adds an ancillary on the picked node, edits it, and undoes each edit as one step', () => {
    const s = loaded(mast);
    const entry = newActionEntry('ancillaries', ctxOf(mast, 'SI', ['mast/P10a']));
    expect(entry).toEqual({ id: 'A1', kind: 'antenna', node: 'mast/P10a', dragArea: 1, mass: 20 });
    expect(s.edit('Add', (p) => addActionEntry(p, 'ancillaries', entry as never)).ok).toBe(true);
    const placed = applyFieldText(field(ACTION_FIELDS.ancillaries, 'placement'), entry, 'line', ctxOf(s.project!), 'x');
    expect(placed.ok && placed.entry.along).toEqual({ group: 'mast/mast legs', from: 0, to: s.project!.nodes.find((n) => n.id === top)!.at[2] });
    expect(placed.ok && 'node' in placed.entry).toBe(false);
    expect(s.edit('Placement', (p) => replaceActionEntry(p, 'ancillaries', 0, (placed as { entry: Entry }).entry as never)).ok).toBe(true);
    s.undo();
    expect(s.project!.ancillaries).toEqual([entry]);
    s.undo();
    expect(s.project!.ancillaries).toBeUndefined();
    expect(s.project).toBe(mast);
  });

  it('makes the results stale: the cases an action adds change with it; the design basis does not', () => {
    const s = loaded(mast);
    const r = useResultsStore();
    r.started(1, mast);
    r.assignRunId('a');
    r.onFinished({ runId: 'a', status: 'done', report: { cases: [] } });
    expect(r.isStaleFor(s.project)).toBe(false);
    s.edit('Basis', (p) => setBasisFormat(p, 'allowable'));
    expect(r.isStaleFor(s.project)).toBe(false);
    s.edit('Add', (p) => addActionEntry(p, 'ancillaries', { id: 'A1', kind: 'dish', node: top, dragArea: 0.8, mass: 30 }));
    expect(r.isStaleFor(s.project)).toBe(true);
  });

  it('"+ Add" makes an entry the validator accepts in every list, on both demos', () => {
    for (const demo of [mast, canopy]) {
      for (const list of ['ancillaries', 'patchWind', 'memberLoss', 'windDirections', 'panels'] as const) {
        setActivePinia(createPinia());
        const s = loaded(demo);
        const entry = newActionEntry(list, ctxOf(demo));
        expect(s.edit('Add', (p) => addActionEntry(p, list, entry as never)), `${list} on ${demo.meta?.name}`).toEqual({ ok: true });
        expect(s.project![list]!.length).toBe((demo[list]?.length ?? 0) + 1);
      }
    }
  });

  it('refuses an entry the validator rejects, naming it, and changes nothing', () => {
    const s = loaded(mast);
    const r = s.edit('Add', (p) => addActionEntry(p, 'memberLoss', { id: 'loss', fromCase: 'nope', group: 'mast/guys level 1' }));
    expect(r).toEqual({ ok: false, errors: ['memberLoss[0] "loss": fromCase: case "nope" does not exist (no load case or combination has this id)'] });
    expect(s.project).toBe(mast);
    const clash = s.edit('Add', (p) => addActionEntry(p, 'windDirections', { id: 'dead', case: 'wind 0', count: 6 }));
    expect(!clash.ok && clash.errors[0]).toBe('windDirections[0] "dead": id "dead" is already used by a load case or combination');
  });

  it('edits the area loads of a canopy case; a target that is no panel nor region is refused', () => {
    const s = loaded(canopy);
    const i = canopy.loadCases.findIndex((c) => c.id === 'snow');
    expect(s.edit('Add', (p) => editAreaLoad(p, 'snow', 2, { kind: 'pressure', value: -200, coefficients: [{ region: 'west', cp: 1.2 }] })).ok).toBe(true);
    expect(s.project!.loadCases[i].areaLoads).toHaveLength(3);
    const bad = s.edit('Panels', (p) => editAreaLoad(p, 'snow', 0, { kind: 'cladding', value: 60, panels: ['north'] }));
    expect(!bad.ok && bad.errors[0]).toBe(`loadCases[${i}] "snow": areaLoads[0]: panels: "north" is neither a panel nor a region`);
    s.edit('Remove', (p) => editAreaLoad(editAreaLoad(editAreaLoad(p, 'snow', 2, undefined), 'snow', 1, undefined), 'snow', 0, undefined));
    expect('areaLoads' in s.project!.loadCases[i]).toBe(false);
    s.undo();
    s.undo();
    expect(s.project).toBe(canopy);
  });
});

describe('design basis edits', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('switches the format, sets and clears a factor (back to the default), one undo step each', () => {
    const s = useProjectStore();
    s.load({ path: '/p.stayset', name: 'p.stayset', project: mast });
    s.edit('Format', (p) => setBasisFormat(p, 'allowable'));
    expect(resolveDesignBasis(s.project!).format).toBe('allowable');
    s.edit('Factor', (p) => setBasisFactor(p, 'allowable', 'cableSafetyFactor', 2.5));
    expect(resolveDesignBasis(s.project!).allowable.cableSafetyFactor.value).toBe(2.5);
    s.edit('Factor', (p) => setBasisFactor(p, 'allowable', 'cableSafetyFactor', undefined));
    expect(s.project!.designBasis).toEqual({ ...mast.designBasis, format: 'allowable' });
    expect(s.edit('Factor', (p) => setBasisFactor(p, 'steel', 'gammaM0', -1)).ok).toBe(false);
    s.undo(); s.undo(); s.undo();
    expect(s.project).toBe(mast);
    // A combination's purpose: set, cleared (ultimate when absent), refused for a bad value.
    s.edit('Purpose', (p) => setCombinationPurpose(p, 1, 'accidental'));
    expect(s.project!.combinations![1]).toEqual({ ...mast.combinations![1], purpose: 'accidental' });
    s.edit('Purpose', (p) => setCombinationPurpose(p, 1, undefined));
    expect('purpose' in s.project!.combinations![1]).toBe(false);
    const bad = s.edit('Purpose', (p) => setCaseField(p, 'dead', 'purpose', 'sometimes' as never));
    expect(!bad.ok && bad.errors[0]).toMatch(/^loadCases\[0\] "dead"/);
  });

  it('builds the combinations as the library behind `stayset combine --write` does, as one undo step', () => {
    const s = useProjectStore();
    s.load({ path: '/p.stayset', name: 'p.stayset', project: mast });
    s.edit('Action', (p) => setCaseField(p, 'cold', 'action', 'temperature'));
    const before = s.project!;
    expect(s.edit('Build', (p) => buildBasisCombinations(p).project).ok).toBe(true);
    const reference = applyBuiltCombinations(before, buildCombinations(before, resolveDesignBasis(before), { withAccompanying: true }));
    expect(s.project).toEqual(reference);
    expect(s.project!.combinations!.filter((c) => c.id.startsWith('basis/')).length).toBeGreaterThan(0);
    s.undo();
    expect(s.project).toBe(before);
    // Nothing to combine: refused with the reason.
    const bare = { ...mast, loadCases: mast.loadCases.map((c) => ({ ...c, action: undefined })) } as ProjectFile;
    expect(() => buildBasisCombinations(bare)).toThrow(/nothing to combine/);
  });
});
