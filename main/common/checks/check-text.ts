/**
 * Words and units for the structured check results of the solver (CheckResult, CheckWarning,
 * ResolvedBasis) — the one formatter the CLI `check`, the app's Checks tab and the schedule share,
 * so all three print the same numbers. Units and precision from main/common/units (SI kN, m, mm;
 * US kip, ft, in); displacements and sags print in mm / in (kinds displacement, sag).
 */
import type { CheckCode, CheckResult, CheckWarning, ResolvedBasis } from '../../../solver/index.ts';
import { fixedText, formatValue, formatWithUnit, type UnitSystem } from '../units/index.ts';

export const CHECK_NAMES: Record<CheckCode, string> = {
  cableResistance: 'cable resistance',
  cableServiceTension: 'cable service tension',
  minimumTension: 'minimum tension',
  slack: 'slack',
  sag: 'sag',
  barTension: 'bar tension',
  barBuckling: 'bar buckling',
  beamColumn: 'beam-column N + M',
  slenderness: 'slenderness',
  displacement: 'displacement',
  tilt: 'tilt',
  twist: 'twist',
  uplift: 'uplift',
  notConverged: 'not converged',
};

export const PURPOSE_NAMES = { ultimate: 'ultimate', serviceability: 'serviceability', accidental: 'accidental', componentOnly: 'component only' } as const;
export const FORMAT_NAMES = { limitState: 'limit state', allowable: 'allowable' } as const;

/** One printed row of a check result. */
export interface CheckRow {
  check: string;
  item: string;
  case: string;
  purpose: string;
  format: string;
  value: string;
  limit: string;
  ratio: string;
  verdict: 'pass' | 'FAIL';
  source: string;
}

/** A value of the result's quantity with its unit. */
export function quantityText(r: Pick<CheckResult, 'quantity' | 'code'>, v: number, units: UnitSystem): string {
  switch (r.quantity) {
    case 'force': return formatWithUnit(v, 'force', units);
    case 'length': return formatWithUnit(v, r.code === 'displacement' ? 'displacement' : r.code === 'sag' ? 'sag' : 'length', units);
    case 'ratio': return r.code === 'tilt' ? tiltText(v) : formatValue(v, 'ratio', units);
    case 'angle': return formatWithUnit(v, 'angle', units);
    case 'slenderness': return formatValue(v, 'slenderness', units);
    default: return '';
  }
}

/** A tilt (offset / height) as "1/N"; '0' for none. */
export function tiltText(v: number): string {
  return v > 0 ? `1/${fixedText(1 / v, 0)}` : '0';
}

export function checkRow(r: CheckResult, units: UnitSystem): CheckRow {
  const yesNo = r.ratio === null;
  return {
    check: CHECK_NAMES[r.code],
    item: r.item,
    case: r.case,
    purpose: r.purpose ? PURPOSE_NAMES[r.purpose] : '',
    format: FORMAT_NAMES[r.format],
    value: r.code === 'notConverged' ? '' : quantityText(r, r.value, units),
    limit: yesNo ? (r.code === 'slack' ? 'no slack' : r.code === 'uplift' ? 'Fz ≥ 0' : '') : `${r.code === 'minimumTension' ? '≥ ' : '≤ '}${quantityText(r, r.limit, units)}`,
    ratio: yesNo ? '—' : formatValue(r.ratio, 'ratio', units),
    verdict: r.pass ? 'pass' : 'FAIL',
    source: r.source,
  };
}

export function warningText(w: CheckWarning): string {
  const some = (n = 3) => `${w.items.slice(0, n).map((i) => `"${i}"`).join(', ')}${w.items.length > n ? ` and ${w.items.length - n} more` : ''}`;
  switch (w.code) {
    case 'noBreakingLoad': return `${w.items.length} cable(s) have no breaking load and are not checked for resistance (${some()})`;
    case 'noYieldStrength': return `${w.items.length} bar(s) have no yield strength and are not checked for tension or buckling (${some()})`;
    case 'noRadiusOfGyration': return `${w.items.length} bar(s) have no radius of gyration (give section.radiusOfGyration or shape "solidRound") and are not checked for buckling (${some()})`;
    case 'terminationNotSet': return `${w.items.length} cable(s) have no end fitting: efficiency k_e = 1.0 assumed (${some()})`;
    case 'defaultBasis': return 'the project has no designBasis: the limit-state defaults are used (each with its source below)';
    case 'chordTensionUnsolved': return `minimum tension judged on element forces only for ${some()} (the member catenary could not be solved)`;
    case 'prestressFactorIgnored': return `designBasis.actionFactors.prestress = ${w.items[0]} is not applied: every case starts from the installed pretension (factor 1)`;
    case 'noServiceabilityCase': return 'no case or combination has purpose serviceability: deformation, sag and minimum-tension limits were not checked';
    case 'noSectionModulus': return `${w.items.length} beam(s) lack Iy, Iz or diameter for the section modulus and are not checked for bending (${some()})`;
    case 'noStrengthCase': return 'no case or combination is checked for strength (ultimate or accidental; any non-component case in the allowable format)';
  }
}

/** The design basis as printed on every check report and schedule: one line per factor, with its source. */
export function basisLines(b: ResolvedBasis): string[] {
  const f = (label: string, s: { value: number; source: string }) => `${label} = ${fixedText(s.value, 3)}  (${s.source})`;
  const out = [`Design basis: ${b.label} — format ${FORMAT_NAMES[b.format]}${b.defaulted ? ' (defaults: the project has no designBasis)' : ''}`];
  if (b.format === 'limitState') {
    const a = b.actionFactors;
    out.push(f('  γ_G permanent', a.permanent), f('  γ_G,inf permanent favourable', a.permanentFavourable), f('  γ_P prestress', a.prestress),
      f('  γ_Q wind', a.wind), f('  γ_Q ice', a.ice), f('  γ_Q temperature', a.temperature), f('  γ_A accidental', a.accidental));
    out.push(f('  cable F_Rd = k_e·MBL / (b·γ_R), b', b.cable.breakingFactor), f('  cable γ_R', b.cable.partialFactor),
      f('  cable serviceability limit, share of k_e·MBL', b.cable.serviceabilityShare), f('  γ_M0', b.steel.gammaM0), f('  γ_M1', b.steel.gammaM1));
  } else {
    out.push(f('  cable safety factor on k_e·MBL', b.allowable.cableSafetyFactor), f('  member safety factor', b.allowable.memberSafetyFactor));
  }
  const p = b.combinationFactors;
  out.push(f('  ψ0 wind', p.wind), f('  ψ0 ice', p.ice), f('  ψ0 temperature', p.temperature));
  return out;
}
