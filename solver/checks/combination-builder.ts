/**
 * Combination builder: from the load cases that name their `action`, the ultimate and
 * serviceability combinations of the design basis. Pure; the caller stores them as ordinary
 * combinations the user may edit. Generated ids start with "basis/" so a rebuild replaces exactly
 * those.
 *
 * Rules (the EN 1990 pattern of one leading variable action with the others accompanying at
 * ψ0, eq. 6.10 form for ultimate and the characteristic combination for serviceability — recalled,
 * check against the standard; the factors are the basis's, each with its source):
 * - wind leading:        γ_G G + γ_W W_i [+ γ_T ψ_T T_j]        (ultimate), and γ_G,inf G + γ_W W_i
 * - ice leading:         γ_G G + γ_I I_k   (an iceWithWind case carries its own reduced wind)
 * - temperature leading: γ_G G + γ_T T_j [+ γ_W ψ_W W_i]
 * - accidental:          G + A_m (factors 1.0, purpose accidental)
 * Serviceability repeats the wind, ice and temperature rules with γ = 1 (ψ kept). The allowable
 * format makes only these unfactored combinations, with purpose serviceability (its strength
 * checks run on every non-component case). `withAccompanying: false` leaves out the bracketed
 * terms (fewer combinations; the user then adds the governing pairs).
 * G is every case with action "permanent" (the installed pretension is in every case).
 */
import type { CasePurpose, CombinationSpec, LoadCaseSpec, ProjectFile } from '../project/types.ts';
import type { ResolvedBasis } from './design-basis.ts';

export const GENERATED_PREFIX = 'basis/';

export interface BuildOptions {
  withAccompanying?: boolean;
}

export interface BuiltCombinations {
  combinations: CombinationSpec[];
  /** Load cases that should be componentOnly (they hold one action each). */
  componentCases: string[];
  /** Structured problems: code + the case ids concerned. */
  problems: { code: 'noPermanentCase' | 'noVariableAction' | 'actionCaseHasSelfWeight'; cases: string[] }[];
}

type Term = { case: string; factor: number };

const round = (v: number) => Number(v.toPrecision(12));

function label(terms: Term[]): string {
  return terms.map((t) => `${round(t.factor)}·${t.case}`).join(' + ');
}

export function buildCombinations(project: ProjectFile, basis: ResolvedBasis, options: BuildOptions = {}): BuiltCombinations {
  const withAcc = options.withAccompanying ?? true;
  const of = (a: LoadCaseSpec['action']) => project.loadCases.filter((c) => c.action === a).map((c) => c.id);
  const G = of('permanent'), W = of('wind'), I = [...of('ice'), ...of('iceWithWind')], T = of('temperature'), A = of('accidental');
  const problems: BuiltCombinations['problems'] = [];
  if (!G.length) problems.push({ code: 'noPermanentCase', cases: [] });
  if (!W.length && !I.length && !T.length && !A.length) problems.push({ code: 'noVariableAction', cases: [] });
  const heavy = project.loadCases.filter((c) => c.action && c.action !== 'permanent' && (c.selfWeight ?? true)).map((c) => c.id);
  if (heavy.length) problems.push({ code: 'actionCaseHasSelfWeight', cases: heavy });

  const f = basis.actionFactors, psi = basis.combinationFactors;
  const out: CombinationSpec[] = [];
  const add = (name: string, purpose: CasePurpose, terms: Term[]) => {
    const factors = terms.filter((t) => t.factor !== 0).map((t) => ({ case: t.case, factor: round(t.factor) }));
    out.push({ id: `${GENERATED_PREFIX}${name}`, label: label(factors), factors, purpose });
  };
  const g = (factor: number): Term[] => G.map((c) => ({ case: c, factor }));

  const sets: { tag: string; purpose: CasePurpose; gamma: (k: keyof typeof f) => number }[] =
    basis.format === 'limitState'
      ? [
        { tag: 'ULS', purpose: 'ultimate', gamma: (k) => f[k].value },
        { tag: 'SLS', purpose: 'serviceability', gamma: () => 1 },
      ]
      : [{ tag: 'SLS', purpose: 'serviceability', gamma: () => 1 }];

  for (const s of sets) {
    const gG = s.gamma('permanent'), gW = s.gamma('wind'), gI = s.gamma('ice'), gT = s.gamma('temperature');
    for (const w of W) {
      add(`${s.tag} ${w}`, s.purpose, [...g(gG), { case: w, factor: gW }]);
      if (withAcc) for (const t of T) add(`${s.tag} ${w} + ${t}`, s.purpose, [...g(gG), { case: w, factor: gW }, { case: t, factor: gT * psi.temperature.value }]);
      if (s.purpose === 'ultimate') add(`${s.tag} ${w} (permanent favourable)`, s.purpose, [...g(f.permanentFavourable.value), { case: w, factor: gW }]);
    }
    for (const i of I) add(`${s.tag} ${i}`, s.purpose, [...g(gG), { case: i, factor: gI }]);
    for (const t of T) {
      add(`${s.tag} ${t}`, s.purpose, [...g(gG), { case: t, factor: gT }]);
      if (withAcc) for (const w of W) add(`${s.tag} ${t} + ${w}`, s.purpose, [...g(gG), { case: t, factor: gT }, { case: w, factor: gW * psi.wind.value }]);
    }
  }
  for (const a of A) add(`ALS ${a}`, 'accidental', [...g(1), { case: a, factor: f.accidental.value }]);
  const componentCases = project.loadCases.filter((c) => c.action && c.action !== 'permanent').map((c) => c.id);
  return { combinations: out, componentCases, problems };
}

/**
 * The project with the generated combinations in place of earlier generated ones (user
 * combinations kept, in order) and every action case without a purpose set to componentOnly.
 */
export function applyBuiltCombinations(project: ProjectFile, built: BuiltCombinations): ProjectFile {
  const kept = (project.combinations ?? []).filter((c) => !c.id.startsWith(GENERATED_PREFIX));
  const component = new Set(built.componentCases);
  return {
    ...project,
    loadCases: project.loadCases.map((c) => (component.has(c.id) && c.purpose === undefined ? { ...c, purpose: 'componentOnly' } : c)),
    combinations: [...kept, ...built.combinations],
  };
}
