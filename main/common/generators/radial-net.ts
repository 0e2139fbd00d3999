import type { GroupSpec, MemberSpec, NodeSpec, PanelSpec, Vec3 } from '../../../solver/index.ts';
import type { GeneratedParts, SectionInput } from './types.ts';
import { ParamCheck, sectionSpec } from './types.ts';
import type { NetLink } from './form-found-net.ts';
import { formFindNet, nodeAt } from './form-found-net.ts';

/**
 * A radial cable net: radial cables from anchors on an outer circle (fixed xyz) to an inner ring
 * cable, hoop cables between, and hangers from the top of a central mast (pinned at the ground)
 * to the inner ring. Form-found by force densities, so it is in equilibrium under pretension
 * alone; by symmetry the hangers pull the mast top straight down and the mast carries that as
 * compression. Lengths m, forces N, z up.
 */
export interface RadialNetParams {
  outerRadius: number;
  innerRadius: number;
  radialCount: number;
  /** Hoop cables between the inner ring and the anchors (default 2). */
  hoopCount?: number;
  centre?: Vec3;
  /** Anchor height above ground and mast top height, m. */
  outerHeight: number;
  mastHeight: number;
  /** Radial cable tension, N; hoops, ring and hangers scale from it by force density. */
  radialTension: number;
  ringForceFactor?: number;
  hangerForceFactor?: number;
  radialCable: SectionInput;
  ringCable: SectionInput;
  hanger: SectionInput;
  mast: SectionInput;
}

export function generateRadialNet(recordId: string, p: RadialNetParams): GeneratedParts {
  const c = new ParamCheck(`generators "${recordId}" params`);
  for (const k of ['outerRadius', 'innerRadius', 'outerHeight', 'mastHeight', 'radialTension'] as const) c.positive(k, p[k]);
  c.integer('radialCount', p.radialCount, 3, 360);
  if (p.hoopCount !== undefined) c.integer('hoopCount', p.hoopCount, 0, 50);
  if (p.innerRadius >= p.outerRadius) c.fail('innerRadius: must be smaller than outerRadius');
  for (const k of ['radialCable', 'ringCable', 'hanger', 'mast'] as const) c.section(k, p[k]);
  c.throwIfAny();
  const id = (s: string) => `${recordId}/${s}`;
  const [cx, cy, cz] = p.centre ?? [0, 0, 0];
  const n = p.radialCount, hoops = p.hoopCount ?? 2, rings = hoops + 1; // ring 0 = inner ring
  const ids: string[] = [], start: number[] = [];
  const idx = (r: number, k: number) => r * n + k;
  for (let r = 0; r <= rings; r++) for (let k = 0; k < n; k++) {
    const rad = p.innerRadius + ((p.outerRadius - p.innerRadius) * r) / rings;
    const t = (2 * Math.PI * k) / n;
    ids.push(r === rings ? id(`anchor ${k + 1}`) : id(`R${r}-${k + 1}`));
    start.push(cx + rad * Math.cos(t), cy + rad * Math.sin(t), cz + p.outerHeight);
  }
  const top = ids.length;
  ids.push(id('mast top'));
  start.push(cx, cy, cz + p.mastHeight);
  const fixed = new Uint8Array(ids.length);
  for (let k = 0; k < n; k++) fixed[idx(rings, k)] = 1;
  fixed[top] = 1;
  const seg = (p.outerRadius - p.innerRadius) / rings;
  const qRad = p.radialTension / seg;
  const qRing = qRad * (p.ringForceFactor ?? 3), qHang = qRad * (p.hangerForceFactor ?? 0.5);
  const links: NetLink[] = [];
  for (let k = 0; k < n; k++) {
    for (let r = 0; r < rings; r++) links.push({ id: id(`radial ${k + 1}-${r + 1}`), from: idx(r, k), to: idx(r + 1, k), q: qRad, section: id('radial'), group: id('radials') });
    for (let r = 0; r < rings; r++) {
      links.push({ id: id(r === 0 ? `ring ${k + 1}` : `hoop ${r}-${k + 1}`), from: idx(r, k), to: idx(r, (k + 1) % n), q: r === 0 ? qRing : qRad * 0.5, section: id(r === 0 ? 'ring' : 'radial'), group: id(r === 0 ? 'inner ring' : 'hoops') });
    }
    links.push({ id: id(`hanger ${k + 1}`), from: top, to: idx(0, k), q: qHang, section: id('hanger'), group: id('hangers') });
  }
  const net = formFindNet(recordId, ids, new Float64Array(start), fixed, links);
  const nodes: NodeSpec[] = ids.map((nid, k) => nodeAt(nid, net.coords, k, k !== top && fixed[k] ? 'xyz' : undefined));
  const baseId = id('mast base');
  nodes.push({ id: baseId, at: [cx, cy, cz], fixed: 'xyz' });
  const members: MemberSpec[] = [...net.members, { id: id('mast'), kind: 'bar', from: baseId, to: ids[top], section: id('mast'), pretension: Math.round(net.pull[3 * top + 2]), generatedBy: recordId }];
  const groupOf = new Map<string, string[]>();
  links.forEach((l) => { const g = groupOf.get(l.group) ?? []; g.push(l.id); groupOf.set(l.group, g); });
  const groups: GroupSpec[] = [...[...groupOf].map(([gid, m]) => ({ id: gid, label: gid.slice(recordId.length + 1), members: m })), { id: id('masts'), label: 'mast', members: [id('mast')] }];
  // one panel per bay between adjacent radials and rings, corners outward then counter-clockwise (normal up)
  const panels: PanelSpec[] = [];
  for (let r = 0; r < rings; r++) for (let k = 0; k < n; k++) {
    const k1 = (k + 1) % n;
    panels.push({ id: id(`P${r + 1}-${k + 1}`), nodes: [ids[idx(r, k)], ids[idx(r + 1, k)], ids[idx(r + 1, k1)], ids[idx(r, k1)]] });
  }
  return {
    nodes, members, groups, panels,
    sections: [
      sectionSpec(id('radial'), p.radialCable, { label: p.radialCable.label ?? 'radial cable' }),
      sectionSpec(id('ring'), p.ringCable, { label: p.ringCable.label ?? 'inner ring cable' }),
      sectionSpec(id('hanger'), p.hanger, { label: p.hanger.label ?? 'hanger' }),
      sectionSpec(id('mast'), p.mast, { label: p.mast.label ?? 'central mast' }),
    ],
    keyNodes: { top: ids[top], base: baseId },
  };
}
