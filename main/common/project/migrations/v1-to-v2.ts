/**
 * Format version 1 → 2: the design basis.
 *
 * Version 1 applied one resistance factor φ (checks.resistanceFactor, default 0.5) to the breaking
 * load in every case and combination: utilisation = T / (φ · MBL). Version 2 states the check
 * format in `designBasis`. The faithful translation of the old rule is the allowable format with
 * a cable safety factor 1/φ on the breaking load, so a migrated file gives the same cable verdicts
 * on its load cases; the note added to meta.notes says so and names what the engineer should
 * review (purposes of cases, factored combinations, the limit-state format). Pure: returns a new
 * document and never changes its input.
 */
import type { Migration, ProjectDocument } from './migration.ts';

/** The version-1 default of checks.resistanceFactor (its DEFAULT_RESISTANCE_FACTOR). */
const V1_DEFAULT_RESISTANCE_FACTOR = 0.5;

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The sentence the migration adds to meta.notes for a resistance factor φ (given or default). */
export function resistanceFactorNote(phi: number, given: boolean): string {
  const sf = Number((1 / phi).toPrecision(6));
  return `Format 2 migration: the version-1 resistance factor φ = ${phi}${given ? '' : ' (the version-1 default)'} on breaking load ` +
    `became designBasis { format: "allowable", allowable.cableSafetyFactor: ${sf} } (= 1/φ): cable tension ≤ MBL / ${sf}. ` +
    'Version 1 applied φ to factored combinations as well; review the purpose of each case and combination ' +
    '(load cases count as serviceability, combinations as ultimate unless set) or choose the limit-state format.';
}

export const v1ToV2: Migration = {
  fromVersion: 1,
  summary: 'checks.resistanceFactor φ becomes designBasis (allowable format, cable safety factor 1/φ)',
  migrate(doc: ProjectDocument): ProjectDocument {
    const checks = isRecord(doc.checks) ? { ...doc.checks } : undefined;
    const given = checks !== undefined && typeof checks.resistanceFactor === 'number' && checks.resistanceFactor > 0;
    const phi = given ? (checks!.resistanceFactor as number) : V1_DEFAULT_RESISTANCE_FACTOR;
    if (checks) delete checks.resistanceFactor;
    const meta = isRecord(doc.meta) ? { ...doc.meta } : {};
    const note = resistanceFactorNote(phi, given);
    meta.notes = typeof meta.notes === 'string' && meta.notes.length > 0 ? `${meta.notes}\n${note}` : note;
    const out: ProjectDocument = { ...doc, version: 2, meta };
    if (checks) out.checks = checks;
    if (out.designBasis === undefined) {
      out.designBasis = { format: 'allowable', allowable: { cableSafetyFactor: Number((1 / phi).toPrecision(6)) } };
    }
    return out;
  },
};
