/**
 * The calculation report's numbers are those of `stayset solve --json` and `stayset check --json`
 * on the same file: the test regenerates the report through the CLI and compares every member's
 * envelope tensions, utilisations, reaction envelope and the governing utilisation, and the natural
 * frequencies with `stayset modes --case dead --json`, formatted the way the report formats them.
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runStayset } from './run-stayset.ts';
import { smallMast } from '../../solver/sequence/small-mast.ts';
import { formatValue } from '../../../main/common/units/index.ts';
import { checkRow } from '../../../main/common/checks/check-text.ts';
import type { CheckResult } from '../../../solver/index.ts';
import { serializeProject } from '../../../main/common/project/index.ts';

interface CaseJson { id: string; converged: boolean; members: { id: string; tensionMax: number; tensionMin: number }[]; reactions: { node: string; force: number[] }[] }

function cells(html: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of html.matchAll(/data-n="([^"]+)">([^<]*)</g)) out.set(m[1].replace(/&amp;/g, '&').replace(/&quot;/g, '"'), m[2]);
  return out;
}

describe('stayset report', () => {
  it('prints the same numbers as solve --json and check --json', () => {
    const p = smallMast();
    p.loadCases.push({ id: 'wind 0', wind: { direction: 0, speed: 25 } }, { id: 'cold', temperatureChange: -20 });
    p.checks = { noSlackGroups: ['m/guys'], upliftNodes: ['m/base'], tiltLimits: [{ base: 'm/base', top: 'm/P16a', limit: 0.01 }] };
    p.sequences = [{ id: 'top down', steps: [{ group: 'm/guys level 2', setBy: 'force' }, { group: 'm/guys level 1', setBy: 'length' }] }];
    p.report = { documentNumber: 'T-1', revisions: [{ revision: 'B', date: '2026-12-01', description: 'test issue' }] };
    const dir = mkdtempSync(join(tmpdir(), 'stayset-report-'));
    try {
      const file = join(dir, 'mast.stayset');
      writeFileSync(file, serializeProject(p));
      const solve = runStayset(['solve', file, '--json']);
      expect(solve.code).toBe(0);
      const check = runStayset(['check', file, '--json']);
      expect([0, 3]).toContain(check.code);
      const out = join(dir, 'report.html');
      const rep = runStayset(['report', file, '--html', out, '--date', '2026-12-01']);
      expect(rep.code, rep.stderr).toBe(0);
      const html = readFileSync(out, 'utf8');
      const n = cells(html);
      const cases: CaseJson[] = JSON.parse(solve.stdout).cases;
      const members = p.members.map((m) => m.id);
      let compared = 0;
      for (const id of members) {
        const max = Math.max(...cases.map((c) => c.members.find((m) => m.id === id)!.tensionMax));
        const min = Math.min(...cases.map((c) => c.members.find((m) => m.id === id)!.tensionMin));
        expect(n.get(`env-max|${id}`), id).toBe(formatValue(max, 'force', 'SI'));
        expect(n.get(`env-min|${id}`), id).toBe(formatValue(min, 'force', 'SI'));
        compared += 2;
      }
      const checkJson = JSON.parse(check.stdout).check;
      for (const m of checkJson.members) {
        if (m.utilisation === null) continue;
        expect(n.get(`util|${m.id}`), m.id).toBe(formatValue(m.utilisation, 'ratio', 'SI'));
        compared++;
      }
      // The governing utilisation row appears exactly when the check reports utilisations.
      const utils = checkJson.members.filter((m: { utilisation: number | null }) => m.utilisation !== null).map((m: { utilisation: number }) => m.utilisation);
      const govUtil = [...n].find(([k]) => k.startsWith('gov-utilisation|'));
      if (utils.length) expect(govUtil![1]).toBe(formatValue(Math.max(...utils), 'ratio', 'SI'));
      else expect(govUtil).toBeUndefined();
      // Every other governing row is the first result of its check code in `check --json` (worst first), printed by the shared formatter.
      const results: CheckResult[] = checkJson.results;
      const codes = [...new Set(results.map((r) => r.code))];
      expect(codes.length).toBeGreaterThan(1);
      for (const code of codes) {
        const first = results.find((r) => r.code === code)!;
        const row = checkRow(first, 'SI');
        expect(n.get(`gov-${code}|${first.item}`), code).toBe(row.value);
        expect(n.get(`gov-${code}|${first.item}|ratio`), code).toBe(row.ratio);
      }
      expect([...n.keys()].filter((k) => k.startsWith('gov-') && !k.endsWith('|ratio') && !/^gov-(utilisation|leastTension)\|/.test(k))).toHaveLength(codes.length);
      const rMax = Math.max(...cases.map((c) => Math.hypot(...c.reactions.find((r) => r.node === 'm/base')!.force)));
      expect(n.get('react|m/base')).toBe(formatValue(rMax, 'force', 'SI'));
      expect(compared).toBeGreaterThan(100);
      const modes = runStayset(['modes', file, '--case', 'dead', '--json']);
      expect(modes.code, modes.stderr).toBe(0);
      const freqs: { number: number; frequency: number }[] = JSON.parse(modes.stdout).modes.modes;
      expect(freqs.length).toBeGreaterThan(0);
      for (const f of freqs) expect(n.get(`mode|${f.number}`), `mode ${f.number}`).toBe(formatValue(f.frequency, 'frequency', 'SI'));
      expect(html).toContain('test issue');
      expect(html).toContain('Tensioning sequence top down');
      expect(html).toContain('Results are for review by a qualified engineer');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('needs an output and refuses to overwrite the project', () => {
    expect(runStayset(['report', 'assets/demo-mast.stayset']).code).toBe(2);
    const r = runStayset(['report', 'assets/demo-mast.stayset', '--html', 'assets/demo-mast.stayset']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('is the project file itself');
  });
});
