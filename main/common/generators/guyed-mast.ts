import type { GroupSpec, MemberSpec, NodeSpec, SectionSpec, Vec3 } from '../../../solver/index.ts';
import { DEFAULT_GUY_PRETENSION_SHARE } from '../../../solver/index.ts';
import type { GeneratedParts, SectionInput } from './types.ts';
import { ParamCheck, roundCoord, sectionSpec } from './types.ts';
import { metres } from './generator-notes.ts';
import { stickMastParts, stickMembers } from './guyed-mast-stick.ts';

/**
 * Parameters of a guyed mast. Lengths m, angles degrees (counter-clockwise from +x in plan),
 * forces N. z is up; the mast stands on `base`.
 */
export interface GuyedMastParams {
  /** Mast height above the base, m. */
  height: number;
  /** Base point [x, y, z], m (default origin). */
  base?: Vec3;
  /** Heights of the guy levels above the base, m, ascending. */
  guyLevels: number[];
  guysPerLevel: 3 | 4;
  /** Anchor radius in plan from the mast axis, m: one value shared by every level (shared anchors) or one per level. */
  anchorRadius: number | number[];
  /** Plan direction of the first guy, degrees (default 0); the others follow at 360/n. */
  anchorOrientation?: number;
  /** Anchor height relative to the base, m (default 0). */
  anchorElevation?: number;
  /**
   * 'lattice': triangular lattice of legs, horizontals and diagonals as bars, each leg foot pinned
   * on the foundation; 'singleBar': one equivalent bar per span between guy levels; 'stick':
   * beam-columns on the mast axis (guyed-mast-stick.ts), which may stand above the top guy level.
   */
  mastModel?: 'lattice' | 'singleBar' | 'stick';
  /** Stick model: the beam section (default the lattice's equivalent beam). Lengths m. */
  stickSection?: { shape: 'latticeEquivalent' } | { shape: 'tube'; diameter: number; wall: number };
  /** Stick model: target element length, m (default 2). */
  stickElementLength?: number;
  /** Face width of the triangular lattice (side of the triangle), m. */
  faceWidth: number;
  /** Target panel height, m (default = faceWidth). */
  panelHeight?: number;
  /** Solidity ratio of one face (wind), default 0.2. */
  solidity?: number;
  /** Lattice force coefficient on the face area (default: C_f(φ), solver/loads/lattice-force-coefficient.ts). */
  latticeDragFactor?: number;
  leg: SectionInput;
  /** Horizontals and diagonals (lattice model only; no wind area of their own: the lattice drag covers them; iced on their diameter). */
  bracing?: SectionInput;
  /** Guy section (or one per level). */
  guy: SectionInput | SectionInput[];
  /** Elements per guy (default 12). */
  guySegments?: number;
  /** Guy pretension as a share of its breaking load (default 0.10, common practice), or one per level. */
  pretensionShare?: number | number[];
  /** Absolute guy pretension, N (overrides the share), or one per level. */
  pretension?: number | number[];
}

const perLevel = <T>(v: T | T[], k: number): T => (Array.isArray(v) ? v[k] : v);

/** Check the parameters; throws GeneratorInputError naming each bad one. */
export function checkGuyedMastParams(p: GuyedMastParams, recordId: string): void {
  const c = new ParamCheck(`generators "${recordId}" params`);
  c.positive('height', p.height);
  c.positive('faceWidth', p.faceWidth);
  if (p.guysPerLevel !== 3 && p.guysPerLevel !== 4) c.fail(`guysPerLevel: ${String(p.guysPerLevel)} must be 3 or 4`);
  if (!Array.isArray(p.guyLevels) || p.guyLevels.length === 0) c.fail('guyLevels: give at least one guy level height');
  else p.guyLevels.forEach((z, k) => {
    c.positive(`guyLevels[${k}]`, z);
    if (z > p.height + 1e-9) c.failWith(`guyLevels[${k}]`, 'levelAboveTop', { level: metres(z), height: metres(p.height) });
    if (k > 0 && !(z > p.guyLevels[k - 1])) c.fail(`guyLevels[${k}]: levels must be ascending`);
  });
  const n = p.guyLevels?.length ?? 0;
  for (const [name, v] of [['anchorRadius', p.anchorRadius], ['guy', p.guy], ['pretensionShare', p.pretensionShare], ['pretension', p.pretension]] as const) {
    if (Array.isArray(v) && v.length !== n) c.fail(`${name}: ${v.length} values given for ${n} guy levels`);
  }
  for (let k = 0; k < n; k++) {
    c.positive(`anchorRadius${Array.isArray(p.anchorRadius) ? `[${k}]` : ''}`, perLevel(p.anchorRadius, k));
    c.section(`guy${Array.isArray(p.guy) ? `[${k}]` : ''}`, perLevel(p.guy, k));
    const g = perLevel(p.guy, k);
    if (p.pretension === undefined && g && !(g.breakingLoad && g.breakingLoad > 0)) c.fail('guy.breakingLoad: needed to set the pretension as a share of it (or give pretension)');
  }
  c.section('leg', p.leg);
  const stickLattice = p.mastModel === 'stick' && (p.stickSection?.shape ?? 'latticeEquivalent') === 'latticeEquivalent';
  if ((p.mastModel ?? 'lattice') === 'lattice' || stickLattice) c.section('bracing', p.bracing);
  if (p.mastModel === 'stick' && p.stickSection?.shape === 'tube') {
    c.positive('stickSection.diameter', p.stickSection.diameter);
    c.positive('stickSection.wall', p.stickSection.wall);
    if (p.stickSection.wall * 2 > p.stickSection.diameter) c.fail('stickSection.wall: more than half the diameter');
  }
  if (p.stickElementLength !== undefined) c.positive('stickElementLength', p.stickElementLength);
  if (p.mastModel === 'singleBar' && n > 0 && Math.abs(p.guyLevels[n - 1] - p.height) > 1e-9) {
    c.fail('guyLevels: the single-bar mast model is a pinned bar chain, so the top guy level must be at the mast top');
  }
  if (p.guySegments !== undefined) c.integer('guySegments', p.guySegments, 1, 200);
  c.throwIfAny();
}

/** Panel levels (heights above base) covering 0, every guy level and the top, each interval split into panels ≤ panelHeight. */
function panelLevels(p: GuyedMastParams): number[] {
  const keys = [0, ...p.guyLevels, p.height].filter((z, i, a) => i === 0 || z > a[i - 1] + 1e-9);
  const h = p.panelHeight ?? p.faceWidth;
  const out = [0];
  for (let i = 1; i < keys.length; i++) {
    const n = Math.max(1, Math.ceil((keys[i] - keys[i - 1]) / h - 1e-9));
    for (let k = 1; k <= n; k++) out.push(keys[i - 1] + ((keys[i] - keys[i - 1]) * k) / n);
  }
  return out;
}

/**
 * A guyed mast: triangular lattice (each leg foot pinned on the foundation, so the base takes
 * twist and the mast cannot spin about its axis), single bar line (pinned base) or stick of
 * beam-columns (pivot base), guys as multi-segment cables from anchors (fixed xyz) to the mast at
 * each guy level, pretensioned. Ids start with `<recordId>/` (the lattice's first foot, and the
 * other models' base node, is `<recordId>/base`); groups "<id>/mast legs", "<id>/mast bracing",
 * "<id>/guys", "<id>/guys level k".
 */
export function generateGuyedMast(recordId: string, p: GuyedMastParams): GeneratedParts {
  checkGuyedMastParams(p, recordId);
  const id = (s: string) => `${recordId}/${s}`;
  const [bx, by, bz] = p.base ?? [0, 0, 0];
  const nodes: NodeSpec[] = [];
  const members: MemberSpec[] = [];
  const sections: SectionSpec[] = [];
  const legIds: string[] = [], braceIds: string[] = [];
  const node = (nid: string, at: Vec3, fixed?: string) => {
    const n: NodeSpec = { id: nid, at: [roundCoord(at[0]), roundCoord(at[1]), roundCoord(at[2])] };
    if (fixed) n.fixed = fixed;
    nodes.push(n);
    return nid;
  };
  const member = (mid: string, kind: MemberSpec['kind'], from: string, to: string, section: string, list: string[], extra: Partial<MemberSpec> = {}) => {
    members.push({ id: mid, kind, from, to, section, generatedBy: recordId, ...extra });
    list.push(mid);
  };
  const az0 = p.anchorOrientation ?? 0;
  const lattice = (p.mastModel ?? 'lattice') === 'lattice';
  const latticeInfo = { faceWidth: p.faceWidth, solidity: p.solidity ?? 0.2, ...(p.latticeDragFactor !== undefined ? { dragFactor: p.latticeDragFactor } : {}) };
  const r = p.faceWidth / Math.sqrt(3);
  const footAt = (j: number): Vec3 => {
    const a = ((az0 + 120 * j) * Math.PI) / 180;
    return [bx + r * Math.cos(a), by + r * Math.sin(a), bz];
  };
  const stick = p.mastModel === 'stick';
  const baseId = node(id('base'), lattice ? footAt(0) : [bx, by, bz], stick ? 'xyzrz' : 'xyz');
  const attach: string[][] = []; // per guy level: node id per guy
  let topId = baseId;

  if (stick) {
    const parts = stickMastParts(id('mast'), p);
    sections.push(parts.section);
    const ids = [baseId, ...parts.levels.slice(1).map((z, k) => node(id(`M${k + 1}`), [bx, by, bz + z]))];
    for (const m of stickMembers(recordId, ids, parts)) member(m.id, 'beam', m.from, m.to, m.section, legIds, { segments: m.segments });
    p.guyLevels.forEach((zg) => {
      const k = parts.levels.findIndex((z) => Math.abs(z - zg) < 1e-9);
      attach.push(Array.from({ length: p.guysPerLevel }, () => ids[k]));
    });
    topId = ids[ids.length - 1];
  } else if (lattice) {
    // Each of the 3 leg lines carries a third of the whole-mast lattice drag (lattice.share; C_f
    // from the solidity unless latticeDragFactor is given); the bracing is part of the same
    // lattice (share 0: no drag of its own) and keeps its diameter for ice.
    sections.push(sectionSpec(id('leg'), p.leg, {
      lattice: { ...latticeInfo, share: 1 / 3 },
      label: p.leg.label ?? 'mast leg (a third of the lattice drag per leg)',
    }));
    sections.push(sectionSpec(id('bracing'), { ...p.bracing!, dragCoefficient: undefined }, {
      ...(p.bracing!.diameter ? { lattice: { ...latticeInfo, share: 0 } } : {}),
      label: p.bracing!.label ?? 'mast bracing',
    }));
    const levels = panelLevels(p);
    // Base: the three leg feet, each pinned on the foundation ("<id>/base", "<id>/base b", "… c").
    const ring: string[][] = [[baseId, node(id('base b'), footAt(1), 'xyz'), node(id('base c'), footAt(2), 'xyz')]];
    levels.forEach((z, k) => {
      if (k === 0) return;
      ring[k] = [0, 1, 2].map((j) => {
        const a = ((az0 + 120 * j) * Math.PI) / 180;
        return node(id(`P${k}${'abc'[j]}`), [bx + r * Math.cos(a), by + r * Math.sin(a), bz + z]);
      });
      for (let j = 0; j < 3; j++) {
        member(id(`leg ${k}${'abc'[j]}`), 'bar', ring[k - 1][j], ring[k][j], id('leg'), legIds);
        member(id(`hor ${k}${'abc'[j]}`), 'bar', ring[k][j], ring[k][(j + 1) % 3], id('bracing'), braceIds);
        member(id(`diag ${k}${'abc'[j]}`), 'bar', ring[k - 1][j], ring[k][(j + 1) % 3], id('bracing'), braceIds);
      }
    });
    topId = ring[levels.length - 1][0];
    p.guyLevels.forEach((zg) => {
      const k = levels.findIndex((z) => Math.abs(z - zg) < 1e-9);
      attach.push(Array.from({ length: p.guysPerLevel }, (_, g) => {
        // attach to the leg nearest in plan to the guy's direction
        const psi = az0 + (360 * g) / p.guysPerLevel;
        const j = Math.round((((psi - az0) % 360) + 360) % 360 / 120) % 3;
        return ring[k][j];
      }));
    });
  } else {
    sections.push(sectionSpec(id('mast'), p.leg, { lattice: latticeInfo, label: p.leg.label ?? 'mast (equivalent bar)' }));
    let below = baseId;
    p.guyLevels.forEach((zg, k) => {
      const nid = node(id(`M${k + 1}`), [bx, by, bz + zg]);
      member(id(`mast ${k + 1}`), 'bar', below, nid, id('mast'), legIds);
      attach.push(Array.from({ length: p.guysPerLevel }, () => nid));
      below = nid;
    });
    topId = below;
  }

  const groups: GroupSpec[] = [
    { id: id('mast legs'), label: lattice ? 'mast legs' : stick ? 'mast (beam-columns)' : 'mast', members: legIds },
  ];
  if (braceIds.length) groups.push({ id: id('mast bracing'), label: 'mast bracing', members: braceIds });
  const allGuys: string[] = [];
  const shared = !Array.isArray(p.anchorRadius);
  const anchorAt = new Map<string, string>();
  p.guyLevels.forEach((_, k) => {
    const sid = Array.isArray(p.guy) ? id(`guy L${k + 1}`) : id('guy');
    if (!sections.some((s) => s.id === sid)) sections.push(sectionSpec(sid, perLevel(p.guy, k), { label: perLevel(p.guy, k).label ?? 'guy strand' }));
    const g = perLevel(p.guy, k);
    const pre = p.pretension !== undefined ? perLevel(p.pretension, k) : (perLevel(p.pretensionShare ?? DEFAULT_GUY_PRETENSION_SHARE, k)) * (g.breakingLoad ?? 0);
    const R = perLevel(p.anchorRadius, k);
    const level: string[] = [];
    for (let j = 0; j < p.guysPerLevel; j++) {
      const psi = ((az0 + (360 * j) / p.guysPerLevel) * Math.PI) / 180;
      // levels with the same radius share their anchors (named after the first such level)
      const firstSame = shared ? 0 : p.guyLevels.findIndex((_, kk) => perLevel(p.anchorRadius, kk) === R);
      const key = shared ? `A${j + 1}` : `A${j + 1}-L${firstSame + 1}`;
      let aid = anchorAt.get(key);
      if (!aid) {
        aid = node(id(key), [bx + R * Math.cos(psi), by + R * Math.sin(psi), bz + (p.anchorElevation ?? 0)], 'xyz');
        anchorAt.set(key, aid);
      }
      member(id(`guy L${k + 1}-${j + 1}`), 'cable', aid, attach[k][j], sid, level, { segments: p.guySegments ?? 12, pretension: Math.round(pre) });
    }
    groups.push({ id: id(`guys level ${k + 1}`), label: `guys level ${k + 1}`, members: level });
    allGuys.push(...level);
  });
  groups.push({ id: id('guys'), label: 'all guys', members: allGuys });
  return { nodes, sections, members, groups, keyNodes: { base: baseId, top: topId, ...Object.fromEntries([...anchorAt].map(([k, v]) => [k, v])) } };
}
