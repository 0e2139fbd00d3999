/**
 * Case results packed for the trip from a helper worker (main/analysis/packed-cases.ts): unpacked
 * they are the solver's own records — same keys in the same order (JSON text identical), the same
 * doubles bit for bit (−0 and NaN included), beam end actions where the solver gives them — and a
 * case whose records do not follow the shared id lists travels unchanged. Reference: the serial
 * solveProject report itself.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveProject, type CaseResult, type ProjectFile } from '../../../solver/index.ts';
import { packCases, unpackCases } from '../../../main/analysis/packed-cases.ts';

const demo = (name: string): ProjectFile => JSON.parse(readFileSync(new URL(`../../../assets/${name}`, import.meta.url), 'utf8')) as ProjectFile;

/** Every number of a case in order, as bit patterns (so −0 ≠ 0 and NaN = NaN). */
function bits(cases: CaseResult[]): string[] {
  const out: string[] = [];
  const view = new DataView(new ArrayBuffer(8));
  const walk = (v: unknown): void => {
    if (typeof v === 'number') { view.setFloat64(0, v); out.push(view.getBigUint64(0).toString(16)); }
    else if (Array.isArray(v)) v.forEach(walk);
    else if (v && typeof v === 'object') Object.values(v).forEach(walk);
  };
  walk(cases);
  return out;
}

const roundTrip = (cases: CaseResult[]): CaseResult[] => unpackCases(structuredClone(packCases(cases).packed));

describe('packed case results', () => {
  it.each(['demo-mast.stayset', 'demo-tube-mast.stayset', 'demo-canopy.stayset'])('%s: unpacked = solved, key order and bits', (name) => {
    const cases = solveProject(demo(name)).report.cases;
    const back = roundTrip(cases);
    expect(JSON.stringify(back)).toBe(JSON.stringify(cases));
    expect(bits(back)).toEqual(bits(cases));
  });

  it('the tube mast carries beam end actions through', () => {
    const cases = solveProject(demo('demo-tube-mast.stayset')).report.cases;
    const withBeam = cases.flatMap((c) => c.members).filter((m) => m.beam).length;
    expect(withBeam).toBeGreaterThan(0);
    expect(roundTrip(cases).flatMap((c) => c.members).filter((m) => m.beam).length).toBe(withBeam);
  });

  it('−0, NaN and a case with other records survive; the numbers travel as transferable arrays', () => {
    const cases = solveProject(demo('demo-mast.stayset')).report.cases.slice(0, 3);
    cases[0].members[0].sag = -0;
    cases[0].nodes[0].displacement[2] = Number.NaN;
    cases[2].members = cases[2].members.slice(1); // not the shared member list: sent as it is
    const { packed, transfer } = packCases(cases);
    expect(packed.heads[2]).toBe(cases[2]);
    expect(transfer.every((b) => b instanceof ArrayBuffer)).toBe(true);
    const back = unpackCases(packed);
    expect(Object.is(back[0].members[0].sag, -0)).toBe(true);
    expect(Number.isNaN(back[0].nodes[0].displacement[2])).toBe(true);
    expect(bits(back)).toEqual(bits(cases));
    expect(back[2].members.length).toBe(cases[2].members.length);
  });
});
