/**
 * The edits behind the design-data editors (check rules, every section field, support
 * displacements, nodal moments, ice groups and bare members, ancillary ice behaviour) through the
 * project store: field text read in display units into SI (NIST SP 811 factors), one undo step
 * per edit, refused edits with a message naming the entry, the fields not edited kept.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { editCaseDisplacement, editCheckRule, editSection } from '../../renderer/model/design-data-edits.ts';
import { DISPLACEMENT_FIELDS, MEMBER_DESIGN_FIELDS, MINIMUM_TENSION_FIELDS, NODAL_MOMENT_FIELD, SECTION_DESIGN_FIELDS, TWIST_LIMIT_FIELDS, newDesignEntry } from '../../renderer/model/design-data-fields.ts';
import { ACTION_FIELDS, setIceBehaviour } from '../../renderer/model/action-fields.ts';
import { addActionEntry, replaceActionEntry } from '../../renderer/model/action-edits.ts';
import { addNodalLoads, updateNodalLoad } from '../../renderer/model/settings-edits.ts';
import { withField } from '../../renderer/model/project-edits.ts';
import { applyFieldText, fieldText, type Entry, type FieldContext, type FieldSpec } from '../../renderer/model/field-spec.ts';
import { mastWithoutOwnActions } from './editor-demos.ts';

const mast = mastWithoutOwnActions();
const field = (fields: FieldSpec[], path: string) => fields.find((f) => f.path === path)!;
const ctxOf = (project: ProjectFile, units: 'SI' | 'US' = 'SI', selectedNodes: string[] = []): FieldContext => ({ project, units, selectedNodes, selectedMembers: [] });

// NIST SP 811 (2008) Appendix B: in = 0.0254 m, ft = 0.3048 m, lbf = 4.4482216152605 N (exact); kip = 1000 lbf.
const IN = 0.0254, FT = 0.3048, LBF = 4.4482216152605;

const loaded = (project: ProjectFile) => {
  const s = useProjectStore();
  s.load({ path: '/projects/p.stayset', name: 'p.stayset', project });
  return s;
};

describe('field text of the design-data editors', () => {
  const leg = mast.sections[0] as unknown as Entry;

  it('reads strengths, second moments and moments in the display unit and stores SI', () => {
    const fy = applyFieldText(field(SECTION_DESIGN_FIELDS, 'yieldStrength'), leg, '355', ctxOf(mast), 'sections[0] "mast/leg"');
    expect(fy.ok && fy.entry.yieldStrength).toBeCloseTo(355e6, 3);
    const fyUs = applyFieldText(field(SECTION_DESIGN_FIELDS, 'yieldStrength'), leg, '50', ctxOf(mast, 'US'), 'x');
    expect(fyUs.ok && fyUs.entry.yieldStrength).toBeCloseTo(50 * 1000 * LBF / (IN * IN), 3);
    const iy = applyFieldText(field(SECTION_DESIGN_FIELDS, 'Iy'), leg, '12.7', ctxOf(mast), 'x');
    expect(iy.ok && iy.entry.Iy).toBeCloseTo(12.7e-8, 18);
    const j = applyFieldText(field(SECTION_DESIGN_FIELDS, 'J'), leg, '1 in^4', ctxOf(mast), 'x');
    expect(j.ok && j.entry.J).toBeCloseTo(IN ** 4, 18);
    const m = applyFieldText(NODAL_MOMENT_FIELD, { node: 'n', force: [0, 0, 0] }, '1, 2.5, -3', ctxOf(mast), 'x');
    expect(m.ok && m.entry.moment).toEqual([1000, 2500, -3000]);
    const mUs = applyFieldText(NODAL_MOMENT_FIELD, { node: 'n', force: [0, 0, 0] }, '1, 0, 0', ctxOf(mast, 'US'), 'x');
    expect(mUs.ok && (mUs.entry.moment as number[])[0]).toBeCloseTo(1000 * LBF * FT, 9);
    const settle = applyFieldText(field(DISPLACEMENT_FIELDS, 'z'), { node: 'mast/base' }, '-12', ctxOf(mast), 'x');
    expect(settle.ok && settle.entry.z).toBeCloseTo(-0.012, 15);
  });

  it('shows every field of the demo sections as text that reads back to the same value', () => {
    for (const units of ['SI', 'US'] as const) {
      for (const s of mast.sections as unknown as Entry[]) {
        for (const f of SECTION_DESIGN_FIELDS) {
          if (f.show && !f.show(s)) continue;
          const text = fieldText(f, s, units);
          if (text === '' || f.get) continue;
          const r = applyFieldText(f, s, text, ctxOf(mast, units), 'x');
          expect(r.ok, `${String(s.id)} ${f.path} "${text}" (${units})`).toBe(true);
          const before = f.path.split('.').reduce<unknown>((o, k) => (o as Entry)[k], s);
          const after = f.path.split('.').reduce<unknown>((o, k) => (o as Entry)[k], (r as { entry: Entry }).entry);
          // Six significant digits shown: the value comes back within 1e-5 relative.
          if (typeof before === 'number') expect(Math.abs((after as number) - before)).toBeLessThanOrEqual(1e-5 * Math.abs(before));
          else expect(after).toEqual(before);
        }
      }
    }
  });

  it('names the entry and the field in every refusal', () => {
    const rule = { group: 'mast/guys', shareOfInstallation: 0.1 };
    expect(applyFieldText(field(MINIMUM_TENSION_FIELDS, 'shareOfBreaking'), rule, '1.5', ctxOf(mast), 'checks.minimumTension[0]'))
      .toEqual({ ok: false, error: 'checks.minimumTension[0] share of MBL: "1.5" must be a share from 0 to 1' });
    expect(applyFieldText(field(TWIST_LIMIT_FIELDS, 'limit'), { nodes: ['a'], limit: 1 }, '0', ctxOf(mast), 'checks.twistLimits[0]'))
      .toEqual({ ok: false, error: 'checks.twistLimits[0] twist limit: "0" must be > 0' });
    expect(applyFieldText(field(MEMBER_DESIGN_FIELDS, 'group'), { group: 'g' }, '', ctxOf(mast), 'checks.memberDesign[1]'))
      .toEqual({ ok: false, error: 'checks.memberDesign[1] group: a value is required' });
    expect(applyFieldText(NODAL_MOMENT_FIELD, { node: 'n', force: [0, 0, 0] }, '1, 2', ctxOf(mast), 'loadCases[0] "dead" nodalLoads[0]'))
      .toEqual({ ok: false, error: 'loadCases[0] "dead" nodalLoads[0] moment: "1, 2" is not three components "x, y, z"' });
    expect(applyFieldText(NODAL_MOMENT_FIELD, { node: 'n', force: [0, 0, 0] }, '1, 2, 3 kN', ctxOf(mast), 'loadCases[0] "dead" nodalLoads[0]'))
      .toEqual({ ok: false, error: expect.stringMatching(/^loadCases\[0\] "dead" nodalLoads\[0\] moment z: /) });
    expect(applyFieldText(field(SECTION_DESIGN_FIELDS, 'terminationEfficiency'), { id: 's' }, '1.2', ctxOf(mast), 'sections[3] "s"'))
      .toEqual({ ok: false, error: 'sections[3] "s" termination k_e: "1.2" must be in (0, 1]' });
  });
});

describe('design-data edits through the project store', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('adds, edits and removes check rules, one undo step each; bad groups and nodes refused naming the entry', () => {
    const s = loaded(mast);
    const n = mast.checks?.minimumTension?.length ?? 0;
    const entry = newDesignEntry('minimumTension', ctxOf(mast));
    expect(s.edit('Add', (p) => editCheckRule(p, 'minimumTension', n, entry as never))).toEqual({ ok: true });
    const share = applyFieldText(field(MINIMUM_TENSION_FIELDS, 'shareOfBreaking'), entry, '0.02', ctxOf(s.project!), 'x');
    expect(s.edit('Share', (p) => editCheckRule(p, 'minimumTension', n, (share as { entry: Entry }).entry as never))).toEqual({ ok: true });
    expect(s.project!.checks!.minimumTension![n]).toEqual({ ...entry, shareOfBreaking: 0.02 });
    const bad = s.edit('Group', (p) => editCheckRule(p, 'minimumTension', n, { group: 'nope', shareOfBreaking: 0.02 }));
    expect(bad).toEqual({ ok: false, errors: [`checks: minimumTension[${n}]: group "nope" does not exist`] });
    s.undo();
    expect(s.project!.checks!.minimumTension![n]).toEqual(entry);
    s.undo();
    expect(s.project).toBe(mast);
    const twist = s.edit('Twist', (p) => editCheckRule(p, 'twistLimits', 0, { nodes: ['mast/P10a', 'X9'], limit: 0.5 }));
    expect(twist).toEqual({ ok: false, errors: ['checks: twistLimits[0]: node "X9" does not exist'] });
    const level = newDesignEntry('twistLimits', ctxOf(mast));
    const topZ = Math.max(...mast.nodes.map((n) => n.at[2]));
    expect((level.nodes as string[]).length).toBeGreaterThanOrEqual(2);
    for (const id of level.nodes as string[]) expect(mast.nodes.find((n) => n.id === id)!.at[2]).toBeCloseTo(topZ, 3);
    expect(s.edit('Twist', (p) => editCheckRule(p, 'twistLimits', 0, level as never))).toEqual({ ok: true });
    expect(s.project!.checks!.twistLimits).toEqual([level]);
    expect(s.edit('Remove', (p) => editCheckRule(p, 'twistLimits', 0, undefined))).toEqual({ ok: true });
    expect(s.project!.checks!.twistLimits).toBeUndefined();
    expect(s.project!.checks!.noSlackGroups).toBe(mast.checks!.noSlackGroups);
  });

  it('edits one section field and keeps every other; a lattice field without face width is refused naming the section', () => {
    const s = loaded(mast);
    const guy = mast.sections[2] as unknown as Entry;
    const r = applyFieldText(field(SECTION_DESIGN_FIELDS, 'terminationEfficiency'), guy, '0.9', ctxOf(mast), 'sections[2]');
    expect(s.edit('k_e', (p) => editSection(p, 2, (r as { entry: Entry }).entry as never), 'sections', [2])).toEqual({ ok: true });
    expect(s.project!.sections[2]).toEqual({ ...mast.sections[2], terminationEfficiency: 0.9 });
    expect(s.project!.sections[0]).toBe(mast.sections[0]);
    const lattice = applyFieldText(field(SECTION_DESIGN_FIELDS, 'lattice.dragFactor'), guy, '2.1', ctxOf(mast), 'sections[2]');
    const bad = s.edit('C_f', (p) => editSection(p, 2, (lattice as { entry: Entry }).entry as never), 'sections', [2]);
    expect(bad.ok).toBe(false);
    expect((bad as { errors: string[] }).errors[0]).toMatch(/^sections\[2\] "mast\/guy L1"/);
    const on = applyFieldText(field(SECTION_DESIGN_FIELDS, 'lattice'), guy, 'yes', ctxOf(mast), 'sections[2]');
    expect(on.ok && on.entry.lattice).toEqual({ faceWidth: 1, solidity: 0.2 });
    const off = applyFieldText(field(SECTION_DESIGN_FIELDS, 'lattice'), mast.sections[0] as unknown as Entry, 'no', ctxOf(mast), 'sections[0]');
    expect(off.ok && 'lattice' in off.entry).toBe(false);
    s.undo();
    expect(s.project).toBe(mast);
    // A section in use cannot be removed: the validator names the members that use it.
    const used = s.edit('Remove', (p) => editSection(p, 2, undefined), 'sections', [2]);
    expect(used.ok).toBe(false);
    expect((used as { errors: string[] }).errors[0]).toMatch(/section "mast\/guy L1" does not exist/);
  });

  it('prescribes support displacements per case, refusing free directions and unknown nodes with the entry named', () => {
    const s = loaded(mast);
    const dead = mast.loadCases.findIndex((c) => c.id === 'dead');
    const entry = newDesignEntry('displacements', ctxOf(mast));
    expect(entry).toEqual({ node: 'mast/base', z: 0 });
    const settle = applyFieldText(field(DISPLACEMENT_FIELDS, 'z'), entry, '-20', ctxOf(mast), 'x');
    expect(s.edit('Settle', (p) => editCaseDisplacement(p, 'dead', 0, (settle as { entry: Entry }).entry as never))).toEqual({ ok: true });
    expect(s.project!.loadCases[dead].displacements).toEqual([{ node: 'mast/base', z: -0.02 }]);
    expect(s.project!.loadCases[dead].nodalLoads).toBe(mast.loadCases[dead].nodalLoads);
    const free = s.edit('Rot', (p) => editCaseDisplacement(p, 'dead', 0, { node: 'mast/base', z: -0.02, rz: 0.01 }));
    expect(free).toEqual({ ok: false, errors: [`loadCases[${dead}] "dead" displacements[0]: node "mast/base" is not restrained in rz; add rz to its "fixed" to prescribe it`] });
    const missing = s.edit('Node', (p) => editCaseDisplacement(p, 'dead', 0, { node: 'X9', z: 0 }));
    expect(missing).toEqual({ ok: false, errors: [`loadCases[${dead}] "dead": displacements[0]: node "X9" does not exist`] });
    expect(s.edit('Remove', (p) => editCaseDisplacement(p, 'dead', 0, undefined))).toEqual({ ok: true });
    expect('displacements' in s.project!.loadCases[dead]).toBe(false);
    s.undo();
    s.undo();
    expect(s.project).toBe(mast);
  });

  it('sets and clears the moment of a nodal load, keeping its force', () => {
    const i = 0;
    const c = mast.loadCases[i];
    const s = loaded(mast);
    const l = { node: mast.nodes[3].id, force: [100, 0, -50] as [number, number, number] };
    expect(s.edit('Load', (p) => addNodalLoads(p, c.id, [l.node], l.force))).toEqual({ ok: true });
    const start = s.project;
    const r = applyFieldText(NODAL_MOMENT_FIELD, l as unknown as Entry, '0, 0, 1.5', ctxOf(mast), 'x');
    expect(s.edit('M', (p) => updateNodalLoad(p, c.id, 0, (r as { entry: Entry }).entry as never))).toEqual({ ok: true });
    expect(s.project!.loadCases[i].nodalLoads![0]).toEqual({ ...l, moment: [0, 0, 1500] });
    const cleared = applyFieldText(NODAL_MOMENT_FIELD, s.project!.loadCases[i].nodalLoads![0] as unknown as Entry, '', ctxOf(mast), 'x');
    expect(cleared.ok && cleared.entry).toEqual(l);
    s.undo();
    expect(s.project).toBe(start);
  });

  it('ices chosen groups and leaves chosen guys bare; an unknown member is refused naming the case', () => {
    const i = mast.loadCases.findIndex((c) => c.ice);
    const c = mast.loadCases[i];
    const s = loaded(mast);
    const guy = mast.members.find((m) => m.kind === 'cable')!.id;
    const ice = { ...c.ice!, groups: ['mast/guys'], bareMembers: [guy] };
    expect(s.updateRowsIn('loadCases', [i], (row) => withField(row, 'ice', ice), 'Ice')).toEqual({ ok: true });
    expect(s.project!.loadCases[i].ice).toEqual(ice);
    const bad = s.updateRowsIn('loadCases', [i], (row) => withField(row, 'ice', { ...ice, bareMembers: ['G99'] }), 'Ice');
    expect(bad).toEqual({ ok: false, errors: [`loadCases[${i}] "${c.id}": ice.bareMembers: member "G99" does not exist`] });
    s.undo();
    expect(s.project).toBe(mast);
  });

  it('switches an ancillary between ice per thickness, a coat and none, keeping the file valid', () => {
    const s = loaded(mast);
    const top = mast.nodes.reduce((a, b) => (b.at[2] > a.at[2] ? b : a)).id;
    const point: Entry = { id: 'A1', kind: 'dish', node: top, dragArea: 0.8, mass: 30, iceDragArea: 2, iceMass: 40, label: 'link dish' };
    s.edit('Add', (p) => addActionEntry(p, 'ancillaries', point as never));
    const coat = setIceBehaviour(point, 'coat');
    expect(coat).toEqual({ id: 'A1', kind: 'dish', node: top, dragArea: 0.8, mass: 30, label: 'link dish', iceBehaviour: 'coat', coatWidth: 0.1, coatLength: 1 });
    expect(s.edit('Ice', (p) => replaceActionEntry(p, 'ancillaries', 0, coat as never))).toEqual({ ok: true });
    // The coat width is a small length, as a section's diameter: mm (SI), in (US); a typed unit wins.
    const width = applyFieldText(field(ACTION_FIELDS.ancillaries, 'coatWidth'), coat, '1200', ctxOf(s.project!), 'ancillaries[0] "A1"');
    expect(width.ok && width.entry.coatWidth).toBeCloseTo(1.2, 12);
    const typedM = applyFieldText(field(ACTION_FIELDS.ancillaries, 'coatWidth'), coat, '1.2 m', ctxOf(s.project!), 'ancillaries[0] "A1"');
    expect(typedM.ok && typedM.entry.coatWidth).toBeCloseTo(1.2, 12);
    const inches = applyFieldText(field(ACTION_FIELDS.ancillaries, 'coatWidth'), coat, '12', ctxOf(s.project!, 'US'), 'ancillaries[0] "A1"');
    expect(inches.ok && inches.entry.coatWidth).toBeCloseTo(12 * IN, 12); // 1 in = 0.0254 m (NIST SP 811)
    expect(applyFieldText(field(ACTION_FIELDS.ancillaries, 'coatWidth'), coat, '-1', ctxOf(s.project!), 'ancillaries[0] "A1"'))
      .toEqual({ ok: false, error: 'ancillaries[0] "A1" coat width: "-1" must be > 0' });
    // A line item ices per metre of height: no coat length.
    const line = applyFieldText(field(ACTION_FIELDS.ancillaries, 'placement'), coat, 'line', ctxOf(s.project!), 'x');
    expect(line.ok && 'coatLength' in line.entry).toBe(false);
    expect(s.edit('Line', (p) => replaceActionEntry(p, 'ancillaries', 0, (line as { entry: Entry }).entry as never))).toEqual({ ok: true });
    expect(s.edit('None', (p) => replaceActionEntry(p, 'ancillaries', 0, setIceBehaviour(p.ancillaries![0] as unknown as Entry, 'none') as never))).toEqual({ ok: true });
    expect(s.project!.ancillaries![0]).not.toHaveProperty('coatWidth');
    expect(s.project!.ancillaries![0].label).toBe('link dish');
    s.undo(); s.undo(); s.undo();
    expect(s.project!.ancillaries).toEqual([point]);
  });
});
