/**
 * Every default of the design basis, each with its source. "read:" names where the value was
 * read; "recalled" marks a value quoted from memory of the named document — check it against
 * your own copy and its national annex; "common practice" marks a value of the trade without a
 * single citable source. Results are for review by a qualified engineer; local codes and licensed
 * practice govern.
 */
import type { BucklingCurve, SectionShape, TerminationKind } from '../project/types.ts';

/** A default value with its source, as printed beside it on every report. */
export interface Sourced {
  value: number;
  source: string;
}

const MAST_FACTORS = 'recalled, check against the standard: EN 1993-3-1 Annex A, Table A.1, partial factors for reliability class 2';

export const LIMIT_STATE_DEFAULTS = {
  permanent: { value: 1.1, source: MAST_FACTORS },
  permanentFavourable: { value: 1.0, source: MAST_FACTORS },
  prestress: { value: 1.0, source: 'recalled, check against the standard: EN 1990 §6.4.3, γ_P = 1.0 for prestress in persistent situations' },
  wind: { value: 1.4, source: MAST_FACTORS },
  ice: { value: 1.4, source: MAST_FACTORS },
  temperature: { value: 1.4, source: MAST_FACTORS },
  accidental: { value: 1.0, source: 'recalled, check against the standard: EN 1990 §6.4.3.3, accidental design situations, factors 1.0' },
} satisfies Record<string, Sourced>;

export const COMBINATION_DEFAULTS = {
  wind: { value: 0.6, source: 'recalled, check against the standard: EN 1990 Annex A1, Table A1.1, ψ0 wind = 0.6' },
  ice: { value: 0.5, source: 'recalled, check against the standard: EN 1993-3-1 Annex C, combination of ice and wind' },
  temperature: { value: 0.6, source: 'recalled, check against the standard: EN 1990 Annex A1, Table A1.1, ψ0 temperature = 0.6' },
} satisfies Record<string, Sourced>;

export const CABLE_DEFAULTS = {
  breakingFactor: {
    value: 1.5,
    source: 'recalled, check against the standard: EN 1993-1-11 §6.2, F_Rd = F_uk / (1.5 γ_R) (the branch F_k/γ_R on the 0.2 % proof force is not used)',
  },
  partialFactor: {
    value: 1.0,
    source: 'recalled, check against the standard: EN 1993-1-11 §6.2 recommends γ_R between 0.9 and 1.0 by case; 1.0 taken',
  },
  serviceabilityShare: {
    value: 0.5,
    source: 'recalled, check against the standard: EN 1993-1-11 §7, stress limit 0.50 of the breaking strength under the characteristic combination',
  },
} satisfies Record<string, Sourced>;

const GAMMA_M_SOURCE = 'read: EN 1993-1-1 §6.1 recommended γ_M0 = γ_M1 = 1.00 (as summarised at steelcalculator.app, EN 1993 column design guide); EN 1993-3-1 and national annexes may differ';
export const STEEL_DEFAULTS = {
  gammaM0: { value: 1.0, source: GAMMA_M_SOURCE },
  gammaM1: { value: 1.0, source: GAMMA_M_SOURCE },
} satisfies Record<string, Sourced>;

export const ALLOWABLE_DEFAULTS = {
  cableSafetyFactor: { value: 2.0, source: 'common practice: a safety factor of 2.0 on the minimum breaking load of guys and structural strand' },
  memberSafetyFactor: { value: 1.67, source: 'recalled, check against the standard: AISC 360 allowable strength design, Ω = 1.67 for tension yield and compression' },
} satisfies Record<string, Sourced>;

/** End-termination efficiency k_e by kind. */
export const TERMINATION_EFFICIENCY: Record<TerminationKind, Sourced> = {
  socketMetal: { value: 1.0, source: 'recalled, check against the standard: EN 1993-1-11 §6.2 loss factor k_e, metal-filled socket 1.0' },
  socketResin: { value: 1.0, source: 'recalled, check against the standard: EN 1993-1-11 §6.2 loss factor k_e, resin-filled socket 1.0' },
  swaged: { value: 0.9, source: 'recalled, check against the standard: EN 1993-1-11 §6.2 loss factor k_e, swaged fitting 0.9' },
  wedgeSocket: { value: 0.8, source: 'common practice: wedge sockets develop about 80 % of the rope breaking load; the maker\'s data govern' },
  clips: { value: 0.8, source: 'common practice: correctly fitted wire-rope clips develop about 80 % of the rope breaking load' },
  preformedGrip: { value: 0.9, source: 'common practice: helical preformed dead-ends are rated near 90–100 % of the strand; the maker\'s data govern' },
};

/** Efficiency when neither the member, its section nor a termination kind gives one (a warning is printed). */
export const DEFAULT_TERMINATION_EFFICIENCY: Sourced = {
  value: 1.0,
  source: 'not set: k_e = 1.0 assumed (full breaking load); give the end fitting',
};

/** Imperfection factors α of the buckling curves. */
export const IMPERFECTION_FACTOR: Record<BucklingCurve, number> = { a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 };
export const IMPERFECTION_SOURCE = 'read: EN 1993-1-1 Table 6.1 (as quoted in the Dlubal knowledge base article 000604)';

/** Buckling curve by section shape (EN 1993-1-1 Table 6.2). */
export const CURVE_OF_SHAPE: Record<SectionShape, { curve: BucklingCurve; source: string }> = {
  tubeHotFinished: { curve: 'a', source: 'read: EN 1993-1-1 Table 6.2, hot-finished hollow sections, curve a (S235–S420) (steelcalculator.app summary)' },
  tubeColdFormed: { curve: 'c', source: 'read: EN 1993-1-1 Table 6.2, cold-formed hollow sections, curve c (steelcalculator.app summary)' },
  solidRound: { curve: 'c', source: 'recalled, check against the standard: EN 1993-1-1 Table 6.2, U-, T- and solid sections, curve c' },
  angle: { curve: 'b', source: 'recalled, check against the standard: EN 1993-1-1 Table 6.2, L-sections, curve b' },
  rolledI: { curve: 'c', source: 'recalled, check against the standard: EN 1993-1-1 Table 6.2, rolled I about z–z (h/b ≤ 1.2), curve c, taken for both axes' },
  other: { curve: 'c', source: 'recalled, check against the standard: EN 1993-1-1 Table 6.2; curve c taken for shapes not listed' },
};

/** Slenderness limits λ = L_cr / i by member role (EN 1993-3-1 Annex H). */
export const SLENDERNESS_LIMIT: Record<'leg' | 'bracing' | 'redundant', Sourced> = {
  leg: { value: 120, source: 'read: EN 1993-3-1:2006 Annex H.2(1), leg members generally not more than 120' },
  bracing: { value: 200, source: 'recalled, check against the standard: EN 1993-3-1 Annex H.3, bracing members 200' },
  redundant: { value: 250, source: 'recalled, check against the standard: EN 1993-3-1 Annex H, redundant members 250' },
};

/** λ1 = π √(E / f_y) (EN 1993-1-1 §6.3.1.3, eq. 6.50; 93.9 ε for E = 210 GPa). */
export const LAMBDA1_SOURCE = 'read: EN 1993-1-1 §6.3.1.3 eq. (6.50), λ̄ = L_cr/(i λ1), λ1 = π√(E/f_y) = 93.9ε';
