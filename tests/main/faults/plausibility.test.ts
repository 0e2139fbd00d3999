/**
 * Fault suite, plausibility (issue 14): well-formed but absurd inputs get warnings that name the
 * entry, distinct from errors (the file stays valid): E typed in MPa, densities and strengths off
 * the ranges of real steel strand, rod and rope, negative or excessive pretension, impossible
 * temperature changes and ice, sags of a unit slip. Ranges and their sources:
 * main/common/project/plausibility/ranges.ts.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { serializeProject, validateProject } from '../../../main/common/project/index.ts';
import { failureHint } from '../../../main/common/project/plausibility/failure-hint.ts';
import { plausibilityWarnings, resultWarnings } from '../../../main/common/project/plausibility/plausibility-warnings.ts';
import type { ProjectFile, SolveReport } from '../../../solver/index.ts';
import { runStayset } from '../cli/run-stayset.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';

const demo = (name: string): ProjectFile => JSON.parse(readFileSync(new URL(`../../../assets/${name}`, import.meta.url), 'utf8')) as ProjectFile;

function warned(edit: (p: ProjectFile) => void): string[] {
  const p = sampleMast();
  edit(p);
  expect(validateProject(p).ok).toBe(true); // a warning, not an error
  return plausibilityWarnings(p);
}

describe('plausibility warnings', () => {
  it('none for realistic projects (the demos and the sample mast)', () => {
    expect(plausibilityWarnings(sampleMast())).toEqual([]);
    expect(plausibilityWarnings(demo('demo-mast.stayset'))).toEqual([]);
    expect(plausibilityWarnings(demo('demo-canopy.stayset'))).toEqual([]);
  });

  it.each<[string, (p: ProjectFile) => void, RegExp]>([
    ['E typed in MPa', (p) => { p.sections[1].E = 160_000; }, /^sections\[1\] "GUY": E = 160,000 Pa .*typed in MPa/],
    ['E of a fibre, not steel', (p) => { p.sections[1].E = 10e9; }, /^sections\[1\] "GUY": E = 10 GPa is outside 80 GPa–220 GPa/],
    ['mass per length in g/m', (p) => { p.sections[1].massPerLength = 1250; }, /^sections\[1\] "GUY": mass per length 1,250 kg\/m .* outside 7,000–11,000 kg\/m³/],
    ['breaking load in kN', (p) => { p.sections[1].breakingLoad = 250; }, /^sections\[1\] "GUY": breaking load 250 N .* outside 400 MPa–2,200 MPa/],
    ['negative pretension', (p) => { p.members[2].pretension = -5000; }, /^members\[2\] "G2": pretension -5,000 N is negative/],
    ['pretension above the breaking load', (p) => { p.members[3].pretension = 300e3; }, /^members\[3\] "G3": pretension 300,000 N exceeds the breaking load/],
    ['pretension in kN (sag of a unit slip)', (p) => { p.members[1].pretension = 20; }, /^members\[1\] "G1": pretension 20 N gives a self-weight sag of about/],
    ['ΔT of a million kelvin', (p) => { p.loadCases[0].temperatureChange = 1e6; }, /^loadCases\[0\] "SW": temperature change 1\.00e\+6 K is beyond ±100 K/],
    ['ice a kilometre thick', (p) => { p.loadCases[1].ice = { thickness: 1000 }; }, /^loadCases\[1\] "HX": radial ice 1,000 m is beyond 0\.2 m/],
  ])('%s', (_what, edit, message) => {
    const w = warned(edit);
    expect(w.some((m) => message.test(m)), w.join('\n')).toBe(true);
  });

  it('a sag of a quarter of the span in the results is reported with member and case', () => {
    const p = sampleMast();
    const report = { cases: [{ id: 'SW', members: [{ id: 'G1', sag: 12 }, { id: 'G2', sag: 0.1 }] }] } as unknown as SolveReport;
    const w = resultWarnings(p, report);
    expect(w).toHaveLength(1);
    expect(w[0]).toMatch(/^members\[1\] "G1": sags 12 m in case "SW", 33\.3 % of its span/); // chord √(20² + 30²) = 36.06 m
  });

  it('a failed solve names the implausible entries', () => {
    const p = sampleMast();
    p.sections[1].E = 160_000;
    expect(failureHint(p)).toMatch(/may be the cause: sections\[1\] "GUY": E = 160,000 Pa/);
    expect(failureHint(sampleMast())).toBe('');
  });
});

describe('validate and check show the warnings', () => {
  let tmp: ReturnType<typeof makeTempDir>;
  beforeEach(() => (tmp = makeTempDir('stayset-plaus-')));
  afterEach(() => tmp.cleanup());

  it('validate: valid (exit 0) with the warning on stderr and in --json', () => {
    const p = sampleMast();
    p.sections[1].E = 160_000;
    writeFileSync(path.join(tmp.dir, 'mpa.stayset'), serializeProject(p));
    const text = runStayset(['validate', 'mpa.stayset'], tmp.dir);
    expect(text.code).toBe(0);
    expect(text.stderr).toMatch(/warning: mpa\.stayset: sections\[1\] "GUY": E = 160,000 Pa/);
    const json = runStayset(['validate', 'mpa.stayset', '--json'], tmp.dir);
    const out = JSON.parse(json.stdout) as { valid: boolean; warnings: string[] };
    expect(out.valid).toBe(true);
    expect(out.warnings[0]).toMatch(/^mpa.stayset: sections\[1\] "GUY"/);
    expect(out.warnings).toContainEqual(expect.stringMatching(/members\[1\] "G1": pretension 20,000 N strains section "GUY"/));
  });

  it('check: the report carries the warnings', () => {
    const p = sampleMast();
    p.loadCases[0].temperatureChange = 5000;
    writeFileSync(path.join(tmp.dir, 'hot.stayset'), serializeProject(p));
    const r = runStayset(['check', 'hot.stayset', '--json'], tmp.dir);
    expect(JSON.parse(r.stdout).plausibility).toEqual([expect.stringMatching(/^loadCases\[0\] "SW": temperature change 5,000 K/)]);
  });
});
