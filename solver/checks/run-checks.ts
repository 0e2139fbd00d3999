import type { CasePurpose, ProjectFile } from '../project/types.ts';
import type { CaseResult, SolveReport } from '../results/types.ts';
import type { CaseCheck, CheckCode, CheckReport, CheckResult, CheckWarning, ItemStatus, MemberCheck, NodeCheck } from './check-types.ts';
import { CheckInputError, checkSettingsProblems } from './check-settings.ts';
import { checksFor, purposeOf, resolveDesignBasis } from './design-basis.ts';
import { memberDesigns } from './member-design.ts';
import type { MemberDesign } from './member-design.ts';
import { nodeMeasures } from './node-checks.ts';
import { cableMeasureData, lowestEndTension } from './member-measure.ts';
import { membersOfGroup, membersOfGroups } from './groups.ts';
import { CABLE_DEFAULTS } from './basis-defaults.ts';
import { referenceCaseId } from '../tuning/reference-case.ts';
import { minimumTensionRules } from './minimum-tension.ts';
import { beamColumnInteraction } from './beam-column.ts';

import { failedCodesByItem, MEMBER_CODES } from './failed-items.ts';

/**
 * Design checks of every case and combination of a solved report under the project's design
 * basis (design-basis.ts: which purposes get strength and which serviceability checks):
 * - strength: cable design tension / F_Rd; bar tension / N_t,Rd; bar compression / N_b,Rd
 *   (EN 1993-1-1 §6.3.1 flexural buckling, buckling.ts); uplift at listed supports;
 * - serviceability: cable tension / serviceability limit (limit state); minimum tension per group
 *   (member-level measure, member-measure.ts); strain-slack in no-slack groups; sag; node
 *   displacement, tilt and twist (node-checks.ts);
 * - once: bar slenderness L_cr / i against its limit (EN 1993-3-1 Annex H).
 * componentOnly cases are skipped. Every result carries format, case, purpose, item, value, limit,
 * ratio and source; the governing one per (code, item) is kept. Throws CheckInputError on
 * settings that name missing groups or nodes.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
export function runChecks(project: ProjectFile, report: SolveReport): CheckReport {
  const problems = checkSettingsProblems(project);
  if (problems.length) throw new CheckInputError(problems);
  const s = project.checks ?? {};
  const basis = resolveDesignBasis(project);
  const format = basis.format;
  const designs = new Map(memberDesigns(project, basis).map((d) => [d.id, d] as const));
  const warnings = collectWarnings(project, basis.defaulted, [...designs.values()]);
  if (basis.actionFactors.prestress.value !== 1) warnings.push({ code: 'prestressFactorIgnored', items: [String(basis.actionFactors.prestress.value)] });
  const noSlack = new Set<string>();
  for (const g of s.noSlackGroups ?? []) {
    const ids = g === '*' ? project.members.filter((m) => m.kind === 'cable').map((m) => m.id) : [...membersOfGroup(project, g)];
    for (const id of ids) noSlack.add(id);
  }
  const sagRules = (s.sagLimits ?? []).map((l) => ({ members: membersOfGroups(project, [l.group]), limit: l.limit, group: l.group }));
  const refId = project.loadCases.length ? referenceCaseId(project) : '';
  const minRules = minimumTensionRules(project, report.cases.find((c) => c.id === refId && c.converged));
  const measureData = minRules.size ? cableMeasureData(project) : null;
  const unsolved = new Set<string>();

  const worst = new Map<string, CheckResult>();
  const keep = (r: CheckResult) => {
    const key = `${r.code}\u0000${r.item}`;
    const prev = worst.get(key);
    if (!prev || (prev.pass && !r.pass) || (prev.pass === r.pass && (r.ratio ?? -Infinity) > (prev.ratio ?? -Infinity))) worst.set(key, r);
  };
  const use = new Map<string, { u: number; c: string; t: number }>();
  const cases: CaseCheck[] = [];
  let strengthCases = 0, serviceCases = 0;

  for (const c of report.cases) {
    const purpose: CasePurpose = purposeOf(project, c.id) ?? 'serviceability';
    const what = checksFor(format, purpose);
    const cc: CaseCheck = { id: c.id, purpose, converged: c.converged, checked: what.strength || what.serviceability, pass: true, maxUtilisation: 0, maxUtilisationMember: '', failures: 0 };
    cases.push(cc);
    if (!cc.checked) continue;
    let fails = 0;
    const put = (r: Omit<CheckResult, 'format' | 'case' | 'purpose' | 'pass'> & { pass?: boolean }) => {
      const full: CheckResult = { format, case: c.id, purpose, ...r, pass: r.pass ?? (r.ratio === null ? false : r.ratio <= 1) };
      if (!full.pass) fails++;
      // The case's highest ratio over every check it runs (strength and serviceability alike).
      if (full.ratio !== null && full.ratio > cc.maxUtilisation) { cc.maxUtilisation = full.ratio; cc.maxUtilisationMember = full.item; }
      keep(full);
    };
    if (!c.converged) {
      put({ code: 'notConverged', item: c.id, quantity: 'none', value: 0, limit: 0, ratio: null, source: '' });
    } else {
      if (what.strength) strengthCases++;
      if (what.serviceability) serviceCases++;
      const positions = new Map(c.nodes.map((n) => [n.id, n.position as readonly number[]] as const));
      for (const m of c.members) {
        const d = designs.get(m.id);
        if (!d) continue;
        if (what.strength) {
          for (const r of strengthResults(d, m.tensionMax, m.tensionMin, m.beam?.maxBendingMoment)) {
            put(r);
            const prev = use.get(m.id);
            if (!prev || !Number.isFinite(prev.u) || r.ratio! > prev.u) use.set(m.id, { u: r.ratio!, c: c.id, t: m.tensionMax });
          }
        }
        if (!use.has(m.id) || (!Number.isFinite(use.get(m.id)!.u) && m.tensionMax > use.get(m.id)!.t)) use.set(m.id, { u: -Infinity, c: c.id, t: m.tensionMax });
        if (!what.serviceability) continue;
        if (d.kind === 'cable' && d.breakingLoad && format === 'limitState') {
          const share = basis.cable.serviceabilityShare;
          const lim = share.value * d.efficiency.value * d.breakingLoad;
          put({ code: 'cableServiceTension', item: m.id, quantity: 'force', value: m.tensionMax, limit: lim, ratio: m.tensionMax / lim, source: share.source });
        }
        const minRule = minRules.get(m.id);
        if (minRule && measureData) {
          const t = lowestEndTension(project, measureData, c, positions, m);
          if (!t.catenary) unsolved.add(m.id);
          const ratio = minRule.limit / Math.max(t.value, minRule.limit * 1e-6);
          put({ code: 'minimumTension', item: m.id, quantity: 'force', value: t.value, limit: minRule.limit, ratio, source: minRule.source, detail: minRule.detail });
        }
        if (noSlack.has(m.id) && m.slack) put({ code: 'slack', item: m.id, quantity: 'force', value: m.tensionMin, limit: 0, ratio: null, source: 'project file (checks.noSlackGroups)' });
        for (const r of sagRules) {
          if (!r.members.has(m.id)) continue;
          const lim = 'fractionOfSpan' in r.limit ? r.limit.fractionOfSpan * m.chordLength : r.limit.absolute;
          put({ code: 'sag', item: m.id, quantity: 'length', value: m.sag, limit: lim, ratio: m.sag / lim, source: `project file (checks.sagLimits, group "${r.group}")` });
        }
      }
      if (what.serviceability) {
        for (const n of nodeMeasures(s, c)) {
          put({ code: n.code, item: n.item, quantity: n.code === 'displacement' ? 'length' : n.code === 'tilt' ? 'ratio' : 'angle', value: n.value, limit: n.limit, ratio: n.value / n.limit, source: `project file (checks.${n.code}Limits)`, detail: n.detail });
        }
      }
      upliftResults(project, c).forEach(put);
    }
    cc.failures = fails;
    cc.pass = fails === 0;
  }
  for (const d of designs.values()) {
    if (d.kind === 'bar' && d.slenderness !== null && d.slendernessLimit) {
      const r = d.slenderness / d.slendernessLimit.value;
      keep({ code: 'slenderness', format, case: '', purpose: null, item: d.id, quantity: 'slenderness', value: d.slenderness, limit: d.slendernessLimit.value, ratio: r, pass: r <= 1, source: d.slendernessLimit.source, detail: { bucklingLength: d.bucklingLength, radiusOfGyration: d.radiusOfGyration ?? 0 } });
    }
  }
  if (unsolved.size) warnings.push({ code: 'chordTensionUnsolved', items: [...unsolved] });
  if (!strengthCases) warnings.push({ code: 'noStrengthCase', items: [] });
  if (!serviceCases) warnings.push({ code: 'noServiceabilityCase', items: [] });
  return assemble(project, report, basis, worst, use, cases, warnings);
}

function strengthResults(d: MemberDesign, tMax: number, tMin: number, moment?: number): Omit<CheckResult, 'format' | 'case' | 'purpose' | 'pass'>[] {
  const out: Omit<CheckResult, 'format' | 'case' | 'purpose' | 'pass'>[] = [];
  if (d.kind === 'cable') {
    if (d.resistance) out.push({ code: 'cableResistance', item: d.id, quantity: 'force', value: Math.max(0, tMax), limit: d.resistance, ratio: Math.max(0, tMax) / d.resistance, source: `${CABLE_DEFAULTS.breakingFactor.source}; k_e: ${d.efficiency.source}`, detail: { breakingLoad: d.breakingLoad ?? 0, ke: d.efficiency.value } });
    return out;
  }
  if (d.tensionResistance && tMax > 0) out.push({ code: 'barTension', item: d.id, quantity: 'force', value: tMax, limit: d.tensionResistance, ratio: tMax / d.tensionResistance, source: 'EN 1993-1-1 §6.2.3, N_pl,Rd = A f_y / γ_M0 (recalled, check against the standard)', detail: { fy: d.yieldStrength ?? 0, area: d.area } });
  if (d.beam && d.momentResistance && moment !== undefined && d.tensionResistance && d.compressionResistance) {
    // Largest bending moment at any element end about the weaker axis' modulus: conservative for both axes at once.
    const axial = tMin < 0 ? tMin : tMax;
    const r = beamColumnInteraction({ axial, momentsY: [moment], momentsZ: [] }, { tension: d.tensionResistance, compression: d.compressionResistance, momentY: d.momentResistance, momentZ: Infinity });
    out.push({ code: 'beamColumn', item: d.id, quantity: 'ratio', value: r.ratio, limit: 1, ratio: r.ratio, source: 'linear interaction N/N_Rd + M/M_Rd, a conservative simplification of EN 1993-1-1 §6.3.3 (common practice)', detail: { axialShare: r.axialShare, bendingShare: r.bendingShareY, moment } });
  }
  if (d.compressionResistance && tMin < 0) out.push({ code: 'barBuckling', item: d.id, quantity: 'force', value: -tMin, limit: d.compressionResistance, ratio: -tMin / d.compressionResistance, source: `EN 1993-1-1 §6.3.1 (6.47)–(6.50); curve ${d.curve}: ${d.curveSource}`, detail: { chi: d.chi ?? 0, lambdaBar: d.lambdaBar ?? 0, bucklingLength: d.bucklingLength, fy: d.yieldStrength ?? 0 } });
  return out;
}

function upliftResults(project: ProjectFile, c: CaseResult): Omit<CheckResult, 'format' | 'case' | 'purpose' | 'pass'>[] {
  const up = new Set(project.checks?.upliftNodes ?? []);
  return c.reactions.filter((r) => up.has(r.node) && r.force[2] < 0)
    .map((r) => ({ code: 'uplift' as const, item: r.node, quantity: 'force' as const, value: r.force[2], limit: 0, ratio: null, source: 'project file (checks.upliftNodes)' }));
}

function collectWarnings(project: ProjectFile, defaulted: boolean, designs: MemberDesign[]): CheckWarning[] {
  const w: CheckWarning[] = [];
  if (defaulted) w.push({ code: 'defaultBasis', items: [] });
  const cables = designs.filter((d) => d.kind === 'cable');
  const bars = designs.filter((d) => d.kind === 'bar');
  const add = (code: CheckWarning['code'], items: string[]) => { if (items.length) w.push({ code, items }); };
  add('noBreakingLoad', cables.filter((d) => d.breakingLoad === null).map((d) => d.id));
  add('terminationNotSet', cables.filter((d) => d.breakingLoad !== null && d.efficiency.source.startsWith('not set')).map((d) => d.id));
  add('noYieldStrength', bars.filter((d) => d.yieldStrength === null).map((d) => d.id));
  add('noRadiusOfGyration', bars.filter((d) => d.yieldStrength !== null && d.radiusOfGyration === null).map((d) => d.id));
  add('noSectionModulus', bars.filter((d) => d.kind === 'bar' && d.beam && d.yieldStrength !== null && d.momentResistance === null).map((d) => d.id));
  return w;
}

function assemble(
  project: ProjectFile, report: SolveReport, basis: CheckReport['basis'], worst: Map<string, CheckResult>,
  use: Map<string, { u: number; c: string; t: number }>, cases: CaseCheck[], warnings: CheckWarning[],
): CheckReport {
  const results = [...worst.values()].sort((a, b) => Number(a.pass) - Number(b.pass) || (b.ratio ?? Infinity) - (a.ratio ?? Infinity));
  const failures = results.filter((r) => !r.pass);
  const checkedMembers = new Set(results.filter((r) => MEMBER_CODES.includes(r.code)).map((r) => r.item));
  const failedItems = failedCodesByItem(failures);
  const members: MemberCheck[] = project.members.map((m) => {
    const u = use.get(m.id);
    const failed = failedItems.members.get(m.id) ?? [];
    const status: ItemStatus = failed.length ? 'fail' : checkedMembers.has(m.id) ? 'pass' : 'unchecked';
    return { id: m.id, status, utilisation: u && Number.isFinite(u.u) ? u.u : null, utilisationCase: u?.c ?? '', tensionMax: u?.t ?? 0, failed };
  });
  const s = project.checks ?? {};
  const checkedNodes = new Set<string>([
    ...(s.displacementLimits ?? []).map((l) => l.node), ...(s.tiltLimits ?? []).flatMap((l) => [l.base, l.top]),
    ...(s.upliftNodes ?? []), ...(s.twistLimits ?? []).flatMap((l) => l.nodes),
  ]);
  const nodes: NodeCheck[] = project.nodes.map((n) => {
    const failed: CheckCode[] = failedItems.nodes.get(n.id) ?? [];
    return { id: n.id, status: failed.length ? 'fail' : checkedNodes.has(n.id) ? 'pass' : 'unchecked', failed };
  });
  const allConverged = cases.every((c) => !c.checked || c.converged) && report.cases.length === cases.length;
  return { pass: allConverged && failures.length === 0, allConverged, basis, results, failures, warnings, cases, members, nodes };
}
