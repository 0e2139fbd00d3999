/**
 * The failed check codes of every member and node, gathered in one pass over the failures, so the
 * per-item lists of a check report cost O(failures + members + nodes) rather than a scan of all
 * failures for every item.
 * Member codes: the failures whose item is the member (MEMBER_CODES only). Node codes: the
 * displacement and uplift failures at the node first, then tilt (item "base→top") and twist
 * (item "a+b+…") failures naming it, each in the order of `failures`.
 */
import type { CheckCode, CheckResult } from './check-types.ts';

export const STRENGTH_CODES: readonly CheckCode[] = ['cableResistance', 'barTension', 'barBuckling', 'beamColumn'];
export const MEMBER_CODES: readonly CheckCode[] = [...STRENGTH_CODES, 'cableServiceTension', 'minimumTension', 'slack', 'sag', 'slenderness'];
const MEMBER_CODE_SET: ReadonlySet<CheckCode> = new Set(MEMBER_CODES);

export interface FailedItems {
  members: Map<string, CheckCode[]>;
  nodes: Map<string, CheckCode[]>;
}

function push(map: Map<string, CheckCode[]>, key: string, code: CheckCode): void {
  const list = map.get(key);
  if (list) list.push(code);
  else map.set(key, [code]);
}

export function failedCodesByItem(failures: readonly CheckResult[]): FailedItems {
  const members = new Map<string, CheckCode[]>();
  const direct = new Map<string, CheckCode[]>();
  const named = new Map<string, CheckCode[]>();
  for (const f of failures) {
    if (MEMBER_CODE_SET.has(f.code)) push(members, f.item, f.code);
    else if (f.code === 'displacement' || f.code === 'uplift') push(direct, f.item, f.code);
    else if (f.code === 'tilt') for (const id of new Set(f.item.split('→'))) push(named, id, 'tilt');
    else if (f.code === 'twist') for (const id of new Set(f.item.split('+'))) push(named, id, 'twist');
  }
  const nodes = direct;
  for (const [id, codes] of named) {
    const list = nodes.get(id);
    if (list) list.push(...codes);
    else nodes.set(id, codes);
  }
  return { members, nodes };
}
