import type { CheckSettings, LoadCaseSpec, NodalLoadSpec, NodeSpec, TuningSpec, TuningTarget, Vec3 } from '../../../solver/index.ts';
import type { NodeFollower, NodeWant } from './follow-parts.ts';
import { idPattern } from './follow-parts.ts';
import { count, generatorNote, metres, newtons, vectorQuantities, type GeneratorNote } from './generator-notes.ts';

/**
 * Loads, checks and tuning targets on a generator's nodes follow a re-run of it (see
 * NodeFollower for the order: role, same place, nearest allowed node). Nodal loads of one case
 * that put the same force on every free node of one generated family (ids that differ only in
 * their numbers, e.g. every "canopy/N#-#") follow as that pattern: the same total spread evenly
 * over the family's free nodes in the new run. Every change is described in `notes` (structured:
 * generator-notes.ts; quantities SI, N and m).
 */
export interface FollowContext {
  recordId: string;
  /** Old generated nodes (as in the project before the re-run) by id. */
  oldNodes: ReadonlyMap<string, NodeSpec>;
  /** The new run's nodes. */
  newNodes: readonly NodeSpec[];
  follower: NodeFollower;
  notes: GeneratorNote[];
}

const isFree = (n: NodeSpec) => !(n.fixed && /[xyz]/.test(n.fixed));

/** Follow one node reference; returns the new id, or null (reference dropped). Notes name `entry`. */
export function followNode(ctx: FollowContext, entry: string, id: string, want: NodeWant, avoid?: ReadonlySet<string>): string | null {
  const old = ctx.oldNodes.get(id);
  if (!old) return id; // not a node of this generator
  const to = ctx.follower.follow(old, want, avoid);
  if (!to) {
    ctx.notes.push(generatorNote('nodeUnplaced', { entry, node: id, want }));
    return null;
  }
  if (to.id !== id) {
    ctx.notes.push(generatorNote('nodeFollowed', { entry, node: id, to: to.id, how: to.how, want }, { distance: metres(to.distance), ...vectorQuantities('from', old.at, metres) }));
  } else if (to.distance > 0) {
    ctx.notes.push(generatorNote('nodeMoved', { entry, node: id, how: to.how }, { distance: metres(to.distance) }));
  }
  return to.id;
}

function addLoad(into: Map<string, Vec3>, node: string, f: Vec3): void {
  const had = into.get(node);
  into.set(node, had ? [had[0] + f[0], had[1] + f[1], had[2] + f[2]] : [f[0], f[1], f[2]]);
}

/** The nodal loads of one case after the re-run. */
export function followCaseLoads(ctx: FollowContext, c: LoadCaseSpec): NodalLoadSpec[] | undefined {
  const loads = c.nodalLoads;
  if (!loads?.some((l) => ctx.oldNodes.has(l.node))) return loads;
  const entry = `load case "${c.id}"`;
  const out = new Map<string, Vec3>();
  const mine = loads.filter((l) => ctx.oldNodes.has(l.node));
  // Patterns: equal forces on every free old node of one id family.
  const families = new Map<string, NodalLoadSpec[]>();
  for (const l of mine) {
    const key = `${idPattern(l.node)}|${l.force.join(',')}`;
    families.set(key, [...(families.get(key) ?? []), l]);
  }
  const patterned = new Set<NodalLoadSpec>();
  for (const [key, list] of families) {
    const pattern = key.slice(0, key.indexOf('|'));
    const oldFree = [...ctx.oldNodes.values()].filter((n) => isFree(n) && idPattern(n.id) === pattern);
    const covered = new Set(list.map((l) => l.node));
    if (list.length < 3 || oldFree.length !== covered.size || !oldFree.every((n) => covered.has(n.id))) continue;
    const targets = ctx.newNodes.filter((n) => isFree(n) && idPattern(n.id) === pattern);
    if (!targets.length) continue;
    const f = list[0].force;
    const each: Vec3 = [f[0] * list.length / targets.length, f[1] * list.length / targets.length, f[2] * list.length / targets.length];
    for (const t of targets) addLoad(out, t.id, each);
    list.forEach((l) => patterned.add(l));
    const total: Vec3 = [f[0] * list.length, f[1] * list.length, f[2] * list.length];
    ctx.notes.push(list.length === targets.length && targets.every((t) => covered.has(t.id))
      ? generatorNote('loadsStay', { entry, pattern }, { count: count(list.length), nodes: count(targets.length) })
      : generatorNote('loadsSpread', { entry, pattern }, {
        count: count(list.length), nodes: count(targets.length),
        ...vectorQuantities('force', f, newtons), ...vectorQuantities('each', each, newtons), ...vectorQuantities('total', total, newtons),
      }));
  }
  for (const l of loads) {
    if (patterned.has(l)) continue;
    const id = followNode(ctx, `${entry} load`, l.node, 'free');
    if (id !== null) addLoad(out, id, l.force);
  }
  return [...out].map(([node, force]) => ({ node, force }));
}

/** Check settings after the re-run (node references followed; group references handled by the caller). */
export function followChecks(ctx: FollowContext, ch: CheckSettings | undefined): CheckSettings | undefined {
  if (!ch) return ch;
  const out: CheckSettings = { ...ch };
  if (ch.displacementLimits) {
    out.displacementLimits = ch.displacementLimits.flatMap((d, i) => {
      const node = followNode(ctx, `checks.displacementLimits[${i}]`, d.node, 'free');
      return node === null ? [] : [{ ...d, node }];
    });
  }
  if (ch.tiltLimits) {
    out.tiltLimits = ch.tiltLimits.flatMap((t, i) => {
      const base = followNode(ctx, `checks.tiltLimits[${i}] base`, t.base, 'any');
      const top = followNode(ctx, `checks.tiltLimits[${i}] top`, t.top, 'any');
      return base === null || top === null || base === top ? [] : [{ ...t, base, top }];
    });
  }
  if (ch.upliftNodes) {
    out.upliftNodes = [...new Set(ch.upliftNodes.flatMap((n, i) => followNode(ctx, `checks.upliftNodes[${i}]`, n, 'support') ?? []))];
  }
  return out;
}

/** Tuning after the re-run: plumb and reaction targets follow their nodes. */
export function followTuning(ctx: FollowContext, t: TuningSpec | undefined): TuningSpec | undefined {
  if (!t) return t;
  const targets = t.targets.flatMap((g, i): TuningTarget[] => {
    if (g.kind === 'plumb') {
      const base = followNode(ctx, `tuning.targets[${i}] base`, g.base, 'any');
      const top = followNode(ctx, `tuning.targets[${i}] top`, g.top, 'any');
      return base === null || top === null ? [] : [{ ...g, base, top }];
    }
    if (g.kind === 'reaction') {
      const node = followNode(ctx, `tuning.targets[${i}] node`, g.node, 'support');
      return node === null ? [] : [{ ...g, node }];
    }
    return [g];
  });
  return { ...t, targets };
}
