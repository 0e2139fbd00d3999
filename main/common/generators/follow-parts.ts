import type { MemberSpec, NodeSpec, Vec3 } from '../../../solver/index.ts';

/**
 * How a reference to a generated node finds its place in a re-generated model.
 *
 * Order: 1. the node had a role in the old run (mast base, top, anchor k, high point …) and the
 * new run has the same role → that node; 2. the new run makes a node with the same id at the same
 * place (within 1 mm) → unchanged; 3. the nearest new node by position among the allowed ones
 * (free nodes for loads and displacement limits, supports for uplift and reactions). Lengths m.
 */
export type NodeWant = 'any' | 'free' | 'support';

export interface NodeFollow {
  /** New node id. */
  id: string;
  /** How it was found (for the notes): a role name, 'same' or 'nearest'. */
  how: string;
  /** Distance between the old and the new position, m. */
  distance: number;
}

/** Within this distance a node counts as being at the same place, m (common practice: 1 mm drawing tolerance). */
export const SAME_PLACE = 1e-3;

const NO_IDS: ReadonlySet<string> = new Set();
const isSupport = (n: NodeSpec) => Boolean(n.fixed && /[xyz]/.test(n.fixed));

export function distance(a: Vec3, b: Vec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

export class NodeFollower {
  private readonly byId: Map<string, NodeSpec>;
  private readonly roleOfOld = new Map<string, string>();

  constructor(
    private readonly newNodes: readonly NodeSpec[],
    oldKeyNodes: Record<string, string> | null,
    private readonly newKeyNodes: Record<string, string>,
  ) {
    this.byId = new Map(newNodes.map((n) => [n.id, n]));
    for (const [role, id] of Object.entries(oldKeyNodes ?? {})) if (!this.roleOfOld.has(id)) this.roleOfOld.set(id, role);
  }

  /** Where the old node `old` (its id and its position in the project before the re-run) goes. */
  /** `avoid`: new node ids not to choose by nearness (e.g. the other end of a member). */
  follow(old: NodeSpec, want: NodeWant, avoid: ReadonlySet<string> = NO_IDS): NodeFollow | null {
    const role = this.roleOfOld.get(old.id);
    const byRole = role !== undefined ? this.byId.get(this.newKeyNodes[role] ?? '') : undefined;
    if (byRole && this.allowed(byRole, want)) return { id: byRole.id, how: roleName(role!), distance: distance(old.at, byRole.at) };
    const same = this.byId.get(old.id);
    if (same && distance(same.at, old.at) <= SAME_PLACE && this.allowed(same, want)) return { id: same.id, how: 'same', distance: 0 };
    let best: NodeSpec | null = null;
    let bestD = Infinity;
    for (const n of this.newNodes) {
      if (!this.allowed(n, want) || avoid.has(n.id)) continue;
      const d = distance(n.at, old.at);
      if (d < bestD) { bestD = d; best = n; }
    }
    return best ? { id: best.id, how: bestD <= SAME_PLACE ? 'same' : 'nearest', distance: bestD } : null;
  }

  private allowed(n: NodeSpec, want: NodeWant): boolean {
    return want === 'any' || (want === 'free' ? !isSupport(n) : isSupport(n));
  }
}

function roleName(role: string): string {
  return role === 'top' ? 'mast top' : role === 'base' ? 'mast base' : role;
}

/** Midpoint of a member from node positions, or null when an end is unknown. */
export function midpoint(m: MemberSpec, at: ReadonlyMap<string, Vec3>): Vec3 | null {
  const a = at.get(m.from), b = at.get(m.to);
  return a && b ? [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2, (a[2] + b[2]) / 2] : null;
}

/**
 * The new member whose midpoint is nearest to `old`'s (old positions): of the same family (id
 * pattern, e.g. "mast/leg #a") when the new run has one, else of the same kind; or null.
 */
export function nearestMember(old: MemberSpec, oldAt: ReadonlyMap<string, Vec3>, candidates: readonly MemberSpec[], newAt: ReadonlyMap<string, Vec3>): MemberSpec | null {
  const p = midpoint(old, oldAt);
  if (!p) return null;
  const family = idPattern(old.id);
  const sameFamily = candidates.some((m) => idPattern(m.id) === family);
  let best: MemberSpec | null = null;
  let bestD = Infinity;
  for (const m of candidates) {
    if (m.kind !== old.kind || (sameFamily && idPattern(m.id) !== family)) continue;
    const q = midpoint(m, newAt);
    if (!q) continue;
    const d = distance(p, q);
    if (d < bestD) { bestD = d; best = m; }
  }
  return best;
}

/** "canopy/N12-3" → "canopy/N#-#": the id with its numbers blanked (the pattern of a generated family). */
export function idPattern(id: string): string {
  return id.replace(/\d+/g, '#');
}
