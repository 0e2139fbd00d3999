import type { GroupSpec, MemberSpec, NodeSpec, PanelSpec, SectionSpec, Vec3 } from '../../../solver/index.ts';
import type { GeneratedParts, SectionInput } from './types.ts';
import { ParamCheck, sectionSpec } from './types.ts';
import type { NetLink } from './form-found-net.ts';
import { balanceMastTop, formFindNet, nodeAt } from './form-found-net.ts';

/**
 * A four-point saddle (hypar-like) cable net: an orthogonal grid of cables along x and y over a
 * rectangle or an ellipse in plan, edge cables around it, two high points (at ±x) on masts with two
 * back-stays each, two low points (at ±y) anchored. The shape is form-found by force densities, so
 * the generated geometry is in equilibrium under pretension alone (self-weight moves it a little).
 * Lengths m, forces N; z up; the plan centre is `centre`.
 */
export interface SaddleNetParams {
  outline: 'rectangle' | 'ellipse';
  /** Plan size along x and y (rectangle sides, ellipse axes), m. */
  lengthX: number;
  lengthY: number;
  /** Grid spacing, m (rounded so an even number of bays fits each way). */
  spacing: number;
  /** Ground point under the centre [x, y, z], m (default origin). */
  centre?: Vec3;
  /** Heights above the ground of the high points (mast tops) and the low points (anchors), m. */
  highPointHeight: number;
  lowPointHeight: number;
  /** Net cable tension (per cable, horizontal-ish), N; edge cables get edgeForceFactor × its force density. */
  netTension: number;
  edgeForceFactor?: number;
  /** Plan distance of each back-stay anchor behind its mast base, m (default = highPointHeight), and the angle between the two stays, degrees (default 60). */
  backstayDistance?: number;
  backstaySpread?: number;
  netCable: SectionInput;
  edgeCable: SectionInput;
  mast: SectionInput;
  backstay: SectionInput;
  /** Elements per back-stay (default 6). */
  backstaySegments?: number;
}

export function generateSaddleNet(recordId: string, p: SaddleNetParams): GeneratedParts {
  const c = new ParamCheck(`generators "${recordId}" params`);
  for (const k of ['lengthX', 'lengthY', 'spacing', 'highPointHeight', 'lowPointHeight', 'netTension'] as const) c.positive(k, p[k]);
  if (p.outline !== 'rectangle' && p.outline !== 'ellipse') c.fail(`outline: "${String(p.outline)}" must be "rectangle" or "ellipse"`);
  for (const k of ['netCable', 'edgeCable', 'mast', 'backstay'] as const) c.section(k, p[k]);
  if (p.spacing > 0 && (p.lengthX / p.spacing < 2 || p.lengthY / p.spacing < 2)) c.fail('spacing: must allow at least two bays each way');
  c.throwIfAny();
  const id = (s: string) => `${recordId}/${s}`;
  const [cx, cy, cz] = p.centre ?? [0, 0, 0];
  const nx = 2 * Math.max(1, Math.round(p.lengthX / p.spacing / 2)), ny = 2 * Math.max(1, Math.round(p.lengthY / p.spacing / 2));
  const a = p.lengthX / 2, b = p.lengthY / 2, dx = p.lengthX / nx, dy = p.lengthY / ny;
  const inside = (i: number, j: number) => {
    if (p.outline === 'rectangle') return true;
    const u = (i * dx - a) / a, v = (j * dy - b) / b;
    return u * u + v * v <= 1 + 1e-9;
  };
  const index = new Map<string, number>();
  const ids: string[] = [];
  const start: number[] = [];
  for (let j = 0; j <= ny; j++) for (let i = 0; i <= nx; i++) {
    if (!inside(i, j)) continue;
    index.set(`${i},${j}`, ids.length);
    ids.push(id(`N${i}-${j}`));
    start.push(cx - a + i * dx, cy - b + j * dy, cz + 0.5 * (p.highPointHeight + p.lowPointHeight));
  }
  const at = (i: number, j: number) => index.get(`${i},${j}`);
  const fixed = new Uint8Array(ids.length);
  const high = [at(0, ny / 2)!, at(nx, ny / 2)!], low = [at(nx / 2, 0)!, at(nx / 2, ny)!];
  for (const k of high) { fixed[k] = 1; start[3 * k + 2] = cz + p.highPointHeight; }
  for (const k of low) { fixed[k] = 1; start[3 * k + 2] = cz + p.lowPointHeight; }
  const qNet = p.netTension / Math.min(dx, dy);
  const qEdge = qNet * (p.edgeForceFactor ?? 6);
  const links: NetLink[] = [];
  const boundary = new Set<number>();
  for (let j = 0; j <= ny; j++) for (let i = 0; i <= nx; i++) {
    const k = at(i, j);
    if (k === undefined) continue;
    if ([[1, 0], [-1, 0], [0, 1], [0, -1]].some(([di, dj]) => at(i + di, j + dj) === undefined)) boundary.add(k);
    const kx = at(i + 1, j), ky = at(i, j + 1);
    if (kx !== undefined && !(boundary.has(k) && isEdgeRun(at, i, j, 1, 0))) links.push({ id: id(`x ${i}-${j}`), from: k, to: kx, q: qNet, section: id('net'), group: id('net x') });
    if (ky !== undefined && !(boundary.has(k) && isEdgeRun(at, i, j, 0, 1))) links.push({ id: id(`y ${i}-${j}`), from: k, to: ky, q: qNet, section: id('net'), group: id('net y') });
  }
  // edge ring: boundary nodes in order of their angle about the centre (ellipse-normalised)
  const ring = [...boundary].sort((m, n) => ang(start, m, cx, cy, a, b) - ang(start, n, cx, cy, a, b));
  ring.forEach((k, r) => links.push({ id: id(`edge ${r + 1}`), from: k, to: ring[(r + 1) % ring.length], q: qEdge, section: id('edge'), group: id('edge cables') }));
  const net = formFindNet(recordId, ids, new Float64Array(start), fixed, links);

  const nodes: NodeSpec[] = ids.map((nid, k) => nodeAt(nid, net.coords, k, low.includes(k) ? 'xyz' : undefined));
  const members: MemberSpec[] = [...net.members];
  const groupOf = new Map<string, string[]>();
  links.forEach((l) => { const g = groupOf.get(l.group) ?? []; g.push(l.id); groupOf.set(l.group, g); });
  const mastIds: string[] = [], stayIds: string[] = [];
  const dist = p.backstayDistance ?? p.highPointHeight;
  const spread = ((p.backstaySpread ?? 60) * Math.PI) / 360;
  high.forEach((k, s) => {
    const top: Vec3 = nodes[k].at;
    const side = s === 0 ? -1 : 1;
    const base: Vec3 = [top[0], top[1], cz];
    const anchors: Vec3[] = [-1, 1].map((t) => [top[0] + side * dist * Math.cos(spread), top[1] + t * dist * Math.sin(spread), cz] as Vec3);
    const pull: Vec3 = [net.pull[3 * k], net.pull[3 * k + 1], net.pull[3 * k + 2]];
    const [nm, t1, t2] = balanceMastTop(top, base, anchors[0], anchors[1], pull, `generators "${recordId}" mast ${s + 1}`);
    const bid = id(`mast ${s + 1} base`);
    nodes.push({ id: bid, at: base, fixed: 'xyz' });
    members.push({ id: id(`mast ${s + 1}`), kind: 'bar', from: bid, to: ids[k], section: id('mast'), pretension: Math.round(nm), generatedBy: recordId });
    mastIds.push(id(`mast ${s + 1}`));
    anchors.forEach((an, t) => {
      const aid = id(`stay ${s + 1}${'ab'[t]} anchor`);
      nodes.push({ id: aid, at: an, fixed: 'xyz' });
      members.push({ id: id(`stay ${s + 1}${'ab'[t]}`), kind: 'cable', from: aid, to: ids[k], section: id('backstay'), segments: p.backstaySegments ?? 6, pretension: Math.round(t === 0 ? t1 : t2), generatedBy: recordId });
      stayIds.push(id(`stay ${s + 1}${'ab'[t]}`));
    });
  });
  const sections: SectionSpec[] = [
    sectionSpec(id('net'), p.netCable, { label: p.netCable.label ?? 'net cable' }),
    sectionSpec(id('edge'), p.edgeCable, { label: p.edgeCable.label ?? 'edge cable' }),
    sectionSpec(id('mast'), p.mast, { label: p.mast.label ?? 'mast' }),
    sectionSpec(id('backstay'), p.backstay, { label: p.backstay.label ?? 'back-stay' }),
  ];
  const groups: GroupSpec[] = [
    ...[...groupOf].map(([gid, m]) => ({ id: gid, label: gid.slice(recordId.length + 1), members: m })),
    { id: id('masts'), label: 'masts', members: mastIds },
    { id: id('back-stays'), label: 'back-stays', members: stayIds },
  ];
  return { nodes, sections, members, groups, panels: gridPanels(id, nx, ny, (i, j) => { const k = at(i, j); return k === undefined ? undefined : ids[k]; }), keyNodes: { high1: ids[high[0]], high2: ids[high[1]], low1: ids[low[0]], low2: ids[low[1]], centre: ids[at(nx / 2, ny / 2)!] } };
}

/**
 * One panel per grid cell, corners counter-clockwise seen from above (normal up): a quad where
 * all four corners exist, a triangle where three do (cells cut by an elliptic outline).
 */
function gridPanels(id: (s: string) => string, nx: number, ny: number, node: (i: number, j: number) => string | undefined): PanelSpec[] {
  const panels: PanelSpec[] = [];
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) {
    const corners = [node(i, j), node(i + 1, j), node(i + 1, j + 1), node(i, j + 1)].filter((c): c is string => c !== undefined);
    if (corners.length >= 3) panels.push({ id: id(`P${i}-${j}`), nodes: corners });
  }
  return panels;
}

/** True when the grid link from (i, j) along (di, dj) runs along the boundary (it is an edge cable instead). */
function isEdgeRun(at: (i: number, j: number) => number | undefined, i: number, j: number, di: number, dj: number): boolean {
  const k2 = [i + di, j + dj];
  const outside = (ii: number, jj: number) => at(ii, jj) === undefined;
  // both ends lack the same outward neighbour → the link lies on the outline
  return (dj === 0 && ((outside(i, j + 1) && outside(k2[0], k2[1] + 1)) || (outside(i, j - 1) && outside(k2[0], k2[1] - 1))))
    || (di === 0 && ((outside(i + 1, j) && outside(k2[0] + 1, k2[1])) || (outside(i - 1, j) && outside(k2[0] - 1, k2[1]))));
}

function ang(x: number[], k: number, cx: number, cy: number, a: number, b: number): number {
  return Math.atan2((x[3 * k + 1] - cy) / b, (x[3 * k] - cx) / a);
}
