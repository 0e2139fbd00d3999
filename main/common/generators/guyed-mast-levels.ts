import type { GuyedMastParams } from './guyed-mast.ts';

/** The per-level parameters of a guyed mast: each is one shared value or one value per guy level. */
export const PER_LEVEL_KEYS = ['anchorRadius', 'guy', 'pretensionShare', 'pretension'] as const;

/**
 * Make every per-level list follow the number of guy levels: a list that is too long loses its
 * last entries, one that is too short repeats its last entry for the new levels (a shared single
 * value stays shared). So changing the number of guy levels never leaves "3 values given for 2 guy
 * levels"; the form then shows one field per level for the caller to adjust. Returns a new object.
 */
export function fitGuyedMastLevels(p: GuyedMastParams): GuyedMastParams {
  const n = Array.isArray(p.guyLevels) ? p.guyLevels.length : 0;
  const out = { ...p } as Record<string, unknown>;
  for (const key of PER_LEVEL_KEYS) {
    const v = out[key];
    if (!Array.isArray(v) || n === 0) continue;
    out[key] = v.length === 0 ? v : Array.from({ length: n }, (_, k) => v[Math.min(k, v.length - 1)]);
  }
  return out as unknown as GuyedMastParams;
}

/** Value of a per-level parameter at level k (a shared value applies to every level). */
export function atLevel<T>(v: T | T[] | undefined, k: number): T | undefined {
  return Array.isArray(v) ? v[Math.min(k, v.length - 1)] : v;
}
